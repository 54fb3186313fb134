"use server";

import { redirect } from "next/navigation";
import { z } from "zod";
import type { ActionState } from "@/components/ui/form";
import { signInSchema } from "@/app/_lib/schemas/account";
import { signIn, signOut } from "@/app/_lib/sign-in";

/** Only same-site paths are followed after sign-in. */
function safeNext(value: FormDataEntryValue | null): string {
  const next = typeof value === "string" ? value : "";
  return next.startsWith("/") && !next.startsWith("//") ? next : "/projects";
}

export async function signInAction(_prev: ActionState, form: FormData): Promise<ActionState> {
  const parsed = signInSchema.safeParse({ email: form.get("email"), password: form.get("password") });
  if (!parsed.success) return { message: "Check the highlighted fields.", fieldErrors: z.flattenError(parsed.error).fieldErrors };
  const outcome = await signIn(parsed.data);
  if (!outcome.ok) return { message: outcome.message };
  redirect(safeNext(form.get("next")));
}

export async function signOutAction(): Promise<void> {
  await signOut();
  redirect("/login");
}
