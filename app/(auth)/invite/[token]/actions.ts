"use server";

import { redirect } from "next/navigation";
import { typedValues, type ActionState } from "@/components/ui/action-state";
import { forAction } from "@/app/_lib/action-errors";
import { acceptInvitation } from "@/app/_lib/services/invitations";

/** Accepts an invitation (app/_lib/services/invitations.ts), then opens the projects. */
export async function acceptInvitationAction(_prev: ActionState, form: FormData): Promise<ActionState> {
  const fields = () => ({ name: form.get("name") ?? undefined, password: form.get("password") ?? undefined });
  const accepted = await forAction(() => acceptInvitation(String(form.get("token") ?? ""), fields), typedValues(form, ["password", "token"]));
  if (!accepted.ok) return accepted.state;
  redirect("/projects");
}
