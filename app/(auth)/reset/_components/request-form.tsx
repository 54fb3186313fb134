"use client";

import { useActionState } from "react";
import { Field, FormStatus, SubmitButton, type ActionState } from "@/components/ui/form";
import { useClientValidation } from "@/components/ui/use-client-validation";
import { resetRequestSchema } from "@/app/_lib/schemas/account";
import { requestPasswordResetAction } from "../actions";

export function ResetRequestForm() {
  const [state, action] = useActionState<ActionState, FormData>(requestPasswordResetAction, {});
  const { clientErrors, onSubmit } = useClientValidation(resetRequestSchema, (form) => ({ email: form.get("email") ?? undefined }));
  return (
    <form action={action} onSubmit={onSubmit} className="space-y-4" noValidate>
      <Field label="E-mail" name="email" type="email" autoComplete="email" required defaultValue={state.values?.email} error={clientErrors?.email ?? state.fieldErrors?.email} />
      <FormStatus state={state} />
      <SubmitButton pendingText="Sending…">E-mail me a link</SubmitButton>
    </form>
  );
}
