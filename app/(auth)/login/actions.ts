"use server";

import { redirect } from "next/navigation";
import { z } from "zod";
import { typedValues, type ActionState } from "@/components/ui/action-state";
import { safeNext } from "@/app/_lib/safe-next";
import { signInSchema } from "@/app/_lib/schemas/account";
import { signIn, signOut } from "@/app/_lib/sign-in";
import { findSignInRoles } from "@/db/queries/users";
import { homeFor } from "@/components/ui/role-navigation";

/** Where a sign-in with no `next` lands: each role's own home (components/ui/role-navigation.ts). */
async function landing(userId: string): Promise<string> {
  return homeFor(await findSignInRoles(userId));
}

export async function signInAction(_prev: ActionState, form: FormData): Promise<ActionState> {
  const parsed = signInSchema.safeParse({ email: form.get("email"), password: form.get("password") });
  const values = typedValues(form);
  if (!parsed.success) return { message: "Check the highlighted fields.", fieldErrors: z.flattenError(parsed.error).fieldErrors, values };
  const outcome = await signIn(parsed.data);
  if (!outcome.ok) return { message: outcome.message, values };
  const next = form.get("next");
  redirect(typeof next === "string" && next ? safeNext(next) : await landing(outcome.userId));
}

export async function signOutAction(): Promise<void> {
  await signOut();
  redirect("/login");
}
