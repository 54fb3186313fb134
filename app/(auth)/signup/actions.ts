"use server";

import { redirect } from "next/navigation";
import { typedValues, type ActionState } from "@/components/ui/action-state";
import { forAction } from "@/app/_lib/action-errors";
import { signUpInput } from "@/app/_lib/schemas/account";
import { completeSignUp, requestSignUp } from "@/app/_lib/services/sign-up";

/**
 * Sign-up, step 1: the same answer for every valid form (app/_lib/services/sign-up.ts), so it never
 * tells whether the address has an account. The e-mail carries the link that finishes it.
 */
export async function signUpAction(_prev: ActionState, form: FormData): Promise<ActionState> {
  const values = { ...typedValues(form), extraRoles: form.getAll("extraRoles").join(",") };
  const sent = await forAction(() => requestSignUp(() => signUpInput(form)), values);
  if (!sent.ok) return sent.state;
  return { ok: true, message: sent.value.message, values };
}

/** Sign-up, step 2, from the e-mailed link: creates the organisation and its admin, signs them in, opens the members page. */
export async function confirmSignUpAction(_prev: ActionState, form: FormData): Promise<ActionState> {
  const done = await forAction(() => completeSignUp(String(form.get("token") ?? "")));
  if (!done.ok) return done.state;
  redirect("/admin/members?welcome=1");
}
