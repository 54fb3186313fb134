"use server";

import { typedValues, type ActionState } from "@/components/ui/action-state";
import { forAction } from "@/app/_lib/action-errors";
import { requestPasswordReset } from "@/app/_lib/services/password-reset";

/** Asks for a reset link (app/_lib/services/password-reset.ts): the same answer whether or not the account exists. */
export async function requestPasswordResetAction(_prev: ActionState, form: FormData): Promise<ActionState> {
  const asked = await forAction(() => requestPasswordReset(() => ({ email: form.get("email") ?? undefined })), typedValues(form));
  if (!asked.ok) return asked.state;
  return { ok: true, message: asked.value.message, values: typedValues(form) };
}
