"use server";

import { revalidatePath } from "next/cache";
import { typedValues, type ActionState } from "@/components/ui/action-state";
import { forAction } from "@/app/_lib/action-errors";
import { requireUser } from "@/app/_lib/auth";
import { forPage } from "@/app/_lib/page-access";
import { changeRolesInput, inviteInput } from "@/app/_lib/schemas/members";
import { changeRoles, inviteMember, revokeInvitation, setMemberActive } from "@/app/_lib/services/members";

const PAGE = "/admin/members";

/** The form doors of the members admin; each use case is one function in app/_lib/services/members.ts. */
const signedIn = () => forPage(() => requireUser(), PAGE);
const id = (form: FormData, name: string) => String(form.get(name) ?? "");

export async function inviteMemberAction(_prev: ActionState, form: FormData): Promise<ActionState> {
  const user = await signedIn();
  const sent = await forAction(() => inviteMember(user, () => inviteInput(form)), { ...typedValues(form), roles: form.getAll("roles").join(",") }, PAGE);
  if (!sent.ok) return sent.state;
  revalidatePath(PAGE);
  return { ok: true, message: `Invitation sent to ${sent.value.email}. The link works once, for 7 days.` };
}

export async function changeRolesAction(_prev: ActionState, form: FormData): Promise<ActionState> {
  const user = await signedIn();
  const changed = await forAction(() => changeRoles(user, id(form, "membershipId"), () => changeRolesInput(form)), undefined, PAGE);
  if (!changed.ok) return changed.state;
  revalidatePath(PAGE);
  return { ok: true, message: `Roles saved for ${changed.value.member.name}: ${changed.value.roles.join(", ")}.` };
}

export async function deactivateMemberAction(_prev: ActionState, form: FormData): Promise<ActionState> {
  const user = await signedIn();
  const done = await forAction(() => setMemberActive(user, id(form, "membershipId"), false), undefined, PAGE);
  if (!done.ok) return done.state;
  revalidatePath(PAGE);
  return { ok: true, message: `${done.value.name} is deactivated: they can no longer sign in; their past work stays attributed to them.` };
}

export async function reactivateMemberAction(_prev: ActionState, form: FormData): Promise<ActionState> {
  const user = await signedIn();
  const done = await forAction(() => setMemberActive(user, id(form, "membershipId"), true), undefined, PAGE);
  if (!done.ok) return done.state;
  revalidatePath(PAGE);
  return { ok: true, message: `${done.value.name} is active again.` };
}

export async function revokeInvitationAction(_prev: ActionState, form: FormData): Promise<ActionState> {
  const user = await signedIn();
  const done = await forAction(() => revokeInvitation(user, id(form, "invitationId")), undefined, PAGE);
  if (!done.ok) return done.state;
  revalidatePath(PAGE);
  return { ok: true, message: `The invitation to ${done.value.email} no longer works.` };
}
