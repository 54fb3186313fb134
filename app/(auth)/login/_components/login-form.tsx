"use client";

import Link from "next/link";
import { useActionState } from "react";
import { Field, FormStatus, SubmitButton, type ActionState } from "@/components/ui/form";
import { signInAction } from "../actions";

export function LoginForm({ next }: { next?: string }) {
  const [state, action] = useActionState<ActionState, FormData>(signInAction, {});
  return (
    <form action={action} className="space-y-4" noValidate>
      <input type="hidden" name="next" value={next ?? ""} />
      <Field label="E-mail" name="email" type="email" autoComplete="email" required defaultValue={state.values?.email} error={state.fieldErrors?.email} />
      <Field label="Password" name="password" type="password" autoComplete="current-password" required error={state.fieldErrors?.password} />
      <FormStatus state={state} />
      <div className="flex items-center justify-between">
        <SubmitButton pendingText="Signing in…">Sign in</SubmitButton>
        <Link href="/reset" className="text-sm text-accent-700 underline">Forgot password?</Link>
      </div>
    </form>
  );
}
