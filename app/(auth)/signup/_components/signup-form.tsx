"use client";

import { useKeptForm } from "@/components/ui/use-kept-form";
import { Field, FormStatus, SubmitButton, type ActionState } from "@/components/ui/form";
import { RoleCheckboxes } from "@/components/ui/role-checkboxes";
import { useClientValidation } from "@/components/ui/use-client-validation";
import { signUpInput, signUpSchema } from "@/app/_lib/schemas/account";
import { signUpAction } from "../actions";

export function SignUpForm() {
  const { clientErrors, onSubmit } = useClientValidation(signUpSchema, signUpInput);
  const { state, formProps } = useKeptForm(signUpAction, { validate: onSubmit });
  const errors = clientErrors ?? state.fieldErrors;
  const v = state.values;
  // Sent: the same words whether or not the address already had an account; the e-mail says which.
  if (state.ok) {
    return (
      <div role="status" className="space-y-2">
        <h2 className="text-lg font-semibold">Check your e-mail</h2>
        <p className="text-slate-700">{state.message}</p>
      </div>
    );
  }
  return (
    <form {...formProps} className="space-y-4" noValidate>
      <Field label="Company name" name="organisationName" autoComplete="organization" required defaultValue={v?.organisationName} error={errors?.organisationName} />
      <Field label="Your name" name="name" autoComplete="name" required defaultValue={v?.name} error={errors?.name} />
      <Field label="Work e-mail" name="email" type="email" autoComplete="email" required defaultValue={v?.email} error={errors?.email} />
      <Field label="Password" name="password" type="password" autoComplete="new-password" required hint="At least 10 characters." error={errors?.password} />
      <RoleCheckboxes
        name="extraRoles"
        legend="You will be the admin. Do you also…"
        roles={["designer", "installer"]}
        checked={v ? v.extraRoles.split(",") : ["designer"]}
        error={errors?.extraRoles}
      />
      <p className="text-xs text-slate-600">The reviewing-engineer role, which approves designs, is given by another admin or comes with an invitation: nobody gives it to themselves.</p>
      <FormStatus state={state} />
      <SubmitButton pendingText="Creating…">Create organisation</SubmitButton>
    </form>
  );
}
