"use client";

import { useKeptForm } from "@/components/ui/use-kept-form";
import { Field, FormStatus, SubmitButton, type ActionState } from "@/components/ui/form";
import { RoleCheckboxes } from "@/components/ui/role-checkboxes";
import { useDeferredValidation } from "@/components/ui/use-deferred-validation";
import { ROLES } from "@/db/roles";
import { inviteMemberAction } from "../actions";

export function InviteForm() {
  const { clientErrors, onSubmit, onFocus } = useDeferredValidation(() => import("./invite-check").then((m) => m.checkInvite));
  const { state, formProps } = useKeptForm(inviteMemberAction, { resetOnSuccess: true, validate: onSubmit });
  const errors = clientErrors ?? state.fieldErrors;
  return (
    <form {...formProps} onFocus={onFocus} className="mt-4 grid gap-4 md:grid-cols-2" noValidate>
      <Field label="E-mail" name="email" type="email" autoComplete="off" required defaultValue={state.values?.email} error={errors?.email} />
      <RoleCheckboxes name="roles" idPrefix="invite-roles" roles={ROLES} checked={state.values?.roles?.split(",") ?? ["designer"]} error={errors?.roles} />
      <div className="flex flex-wrap items-center gap-3 md:col-span-2">
        <SubmitButton pendingText="Sending…">Send invitation</SubmitButton>
        <FormStatus state={state} />
      </div>
    </form>
  );
}
