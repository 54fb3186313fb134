"use client";

import { useActionState } from "react";
import { Field, FormStatus, SubmitButton, type ActionState } from "@/components/ui/form";
import { useClientValidation } from "@/components/ui/use-client-validation";
import { newPasswordSchema } from "@/app/_lib/schemas/account";
import { setNewPasswordAction } from "../actions";

export function NewPasswordForm({ token }: { token: string }) {
  const [state, action] = useActionState<ActionState, FormData>(setNewPasswordAction, {});
  const { clientErrors, onSubmit } = useClientValidation(newPasswordSchema, (form) => ({ password: form.get("password") ?? undefined }));
  return (
    <form action={action} onSubmit={onSubmit} className="space-y-4" noValidate>
      <input type="hidden" name="token" value={token} />
      <Field label="New password" name="password" type="password" autoComplete="new-password" required hint="At least 10 characters." error={clientErrors?.password ?? state.fieldErrors?.password} />
      <FormStatus state={state} />
      <SubmitButton pendingText="Saving…">Set password and sign in</SubmitButton>
    </form>
  );
}
