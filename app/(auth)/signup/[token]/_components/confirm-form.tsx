"use client";

import { useActionState } from "react";
import { FormStatus, SubmitButton, type ActionState } from "@/components/ui/form";
import { confirmSignUpAction } from "../../actions";

export function ConfirmSignUpForm({ token }: { token: string }) {
  const [state, action] = useActionState<ActionState, FormData>(confirmSignUpAction, {});
  return (
    <form action={action} className="space-y-4">
      <input type="hidden" name="token" value={token} />
      <FormStatus state={state} />
      <SubmitButton pendingText="Creating…">Create organisation</SubmitButton>
    </form>
  );
}
