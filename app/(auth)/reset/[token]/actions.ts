"use server";

import { redirect } from "next/navigation";
import type { ActionState } from "@/components/ui/action-state";
import { forAction } from "@/app/_lib/action-errors";
import { completePasswordReset } from "@/app/_lib/services/password-reset";

/** Sets the new password through a single-use link, then signs the person in with a fresh session. */
export async function setNewPasswordAction(_prev: ActionState, form: FormData): Promise<ActionState> {
  const done = await forAction(() => completePasswordReset(String(form.get("token") ?? ""), () => ({ password: form.get("password") ?? undefined })));
  if (!done.ok) return done.state;
  redirect(done.value.signedIn ? "/projects" : "/login");
}
