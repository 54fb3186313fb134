"use client";

import { useActionState } from "react";
import { Field, FormStatus, SubmitButton, type ActionState } from "@/components/ui/form";
import { useClientValidation } from "@/components/ui/use-client-validation";
import { acceptAsExistingSchema, acceptAsNewSchema } from "@/app/_lib/schemas/account";
import { acceptInvitationAction } from "../actions";

export function AcceptForm({ token, email, existingAccount }: { token: string; email: string; existingAccount: boolean }) {
  const [state, action] = useActionState<ActionState, FormData>(acceptInvitationAction, {});
  const { clientErrors, onSubmit } = useClientValidation(existingAccount ? acceptAsExistingSchema : acceptAsNewSchema, (form) => ({
    name: form.get("name") ?? undefined,
    password: form.get("password") ?? undefined,
  }));
  const errors = clientErrors ?? state.fieldErrors;
  return (
    <form action={action} onSubmit={onSubmit} className="space-y-4" noValidate>
      <input type="hidden" name="token" value={token} />
      <Field label="E-mail" name="email" type="email" value={email} readOnly autoComplete="username" hint="Invitations are for this address." />
      {existingAccount ? null : <Field label="Your name" name="name" autoComplete="name" required defaultValue={state.values?.name} error={errors?.name} />}
      <Field
        label={existingAccount ? "Your Pierwise password" : "Choose a password"}
        name="password"
        type="password"
        autoComplete={existingAccount ? "current-password" : "new-password"}
        required
        hint={existingAccount ? "You already have an account; sign in with it to join." : "At least 10 characters."}
        error={errors?.password}
      />
      <FormStatus state={state} />
      <SubmitButton pendingText="Joining…">{existingAccount ? "Sign in and join" : "Create account and join"}</SubmitButton>
    </form>
  );
}
