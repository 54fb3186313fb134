"use server";

import { revalidatePath } from "next/cache";
import { z } from "zod";
import { typedValues, type ActionState } from "@/components/ui/action-state";
import { AccessError, assertOwned, assertRole, requireUser, type CurrentUser } from "@/app/_lib/auth";
import { env } from "@/app/_lib/env";
import { sendMail } from "@/app/_lib/mail";
import { forPage } from "@/app/_lib/page-access";
import { requestIp } from "@/app/_lib/request-ip";
import { changeRolesInput, changeRolesSchema, inviteInput, inviteSchema } from "@/app/_lib/schemas/members";
import { INVITATION_TTL_MS, newToken } from "@/app/_lib/tokens";
import { recordAudit } from "@/db/queries/audit";
import { createInvitation, findInvitationById, revokeInvitation } from "@/db/queries/invitations";
import { changeMembership, findMembership, listMembers, type MemberRow, type MembershipChange } from "@/db/queries/members";
import { ROLE_LABELS } from "@/db/roles";
import { invitationMail } from "./invitation-mail";

const PAGE = "/admin/members";

/** Who → whose → which role: a member of another organisation gets 404, a non-admin 403. */
async function adminAndMember(membershipId: FormDataEntryValue | null): Promise<{ user: CurrentUser; member: MemberRow }> {
  return forPage(async () => {
    const user = await requireUser();
    const member = assertOwned(user, await findMembership(String(membershipId ?? "")), "That member");
    assertRole(user, "admin");
    return { user, member };
  }, PAGE);
}

function lastAdminMessage(member: MemberRow, user: CurrentUser, what: string): string {
  const who = member.userId === user.userId ? "You are" : `${member.name} is`;
  return `${who} the last active admin of ${user.organisationName}, so you cannot ${what}. Give another member the admin role first.`;
}

export async function inviteMemberAction(_prev: ActionState, form: FormData): Promise<ActionState> {
  const user = await forPage(async () => {
    const user = await requireUser();
    assertRole(user, "admin");
    return user;
  }, PAGE);
  const values = { ...typedValues(form), roles: form.getAll("roles").join(",") };
  const parsed = inviteSchema.safeParse(inviteInput(form));
  if (!parsed.success) return { message: "Check the highlighted fields.", fieldErrors: z.flattenError(parsed.error).fieldErrors, values };
  const { email, roles } = parsed.data;
  const existing = (await listMembers(user.organisationId)).find((m) => m.email === email);
  if (existing) {
    const why = existing.deactivatedAt ? "is a deactivated member: reactivate them in the list below instead" : "is already a member";
    return { message: "Check the highlighted fields.", fieldErrors: { email: [`${email} ${why}.`] }, values };
  }
  const { token, tokenHash } = newToken();
  const expiresAt = new Date(Date.now() + INVITATION_TTL_MS);
  const invitationId = await createInvitation({ organisationId: user.organisationId, email, roles, tokenHash, invitedBy: user.userId, expiresAt });
  try {
    await sendMail({ to: email, ...invitationMail({ inviter: user.name, organisation: user.organisationName, roles, link: `${env.appUrl}/invite/${token}` }) });
  } catch (error) {
    console.error(error);
    await revokeInvitation(invitationId);
    return { message: "The invitation e-mail could not be sent, so no invitation was made. Try again in a minute.", values };
  }
  await recordAudit({ organisationId: user.organisationId, actorUserId: user.userId, action: "invitation-sent", subject: email, detail: { roles }, ip: await requestIp() });
  revalidatePath(PAGE);
  return { ok: true, message: `Invitation sent to ${email}. The link works once, for 7 days.` };
}

async function applyChange(form: FormData, change: (member: MemberRow) => MembershipChange | ActionState, audit: string, refused: string, done: string): Promise<ActionState> {
  const { user, member } = await adminAndMember(form.get("membershipId"));
  const wanted = change(member);
  if (!("roles" in wanted) && !("active" in wanted)) return wanted;
  const result = await changeMembership(member.membershipId, wanted);
  if (!result.ok) return { message: result.reason === "last-admin" ? lastAdminMessage(member, user, refused) : "That member was not found." };
  await recordAudit({
    organisationId: user.organisationId, actorUserId: user.userId, action: audit, subject: member.email, ip: await requestIp(),
    detail: "roles" in wanted ? { from: result.before.roles, to: wanted.roles } : {},
  });
  revalidatePath(PAGE);
  return { ok: true, message: done.replace("{name}", member.name) };
}

/**
 * Approving a design is a licensed engineer's signature: an admin cannot give the engineer role to
 * their own membership (another admin does, or an invitation carries it), so nobody can make
 * themselves an approver. The audit event names who granted it.
 */
function refuseSelfGrant(user: CurrentUser, member: MemberRow, roles: string[]): void {
  if (member.userId === user.userId && roles.includes("engineer") && !member.roles.includes("engineer")) {
    throw new AccessError(403, "You cannot give yourself the reviewing-engineer role: another admin must grant it.");
  }
}

export async function changeRolesAction(_prev: ActionState, form: FormData): Promise<ActionState> {
  const { user, member } = await adminAndMember(form.get("membershipId"));
  await forPage(async () => refuseSelfGrant(user, member, form.getAll("roles").map(String)), PAGE);
  return applyChange(form, () => {
    const parsed = changeRolesSchema.safeParse(changeRolesInput(form));
    if (!parsed.success) return { message: "Choose at least one role.", fieldErrors: z.flattenError(parsed.error).fieldErrors };
    return { roles: parsed.data.roles };
  }, "role-changed", "remove the admin role", `Roles saved for {name}: ${form.getAll("roles").map((r) => ROLE_LABELS[r as keyof typeof ROLE_LABELS] ?? r).join(", ")}.`);
}

export async function deactivateMemberAction(_prev: ActionState, form: FormData): Promise<ActionState> {
  return applyChange(form, () => ({ active: false }), "member-deactivated", "deactivate them", "{name} is deactivated: they can no longer sign in; their past work stays attributed to them.");
}

export async function reactivateMemberAction(_prev: ActionState, form: FormData): Promise<ActionState> {
  return applyChange(form, () => ({ active: true }), "member-reactivated", "reactivate them", "{name} is active again.");
}

export async function revokeInvitationAction(_prev: ActionState, form: FormData): Promise<ActionState> {
  const { user, invitation } = await forPage(async () => {
    const user = await requireUser();
    const invitation = assertOwned(user, await findInvitationById(String(form.get("invitationId") ?? "")), "That invitation");
    assertRole(user, "admin");
    return { user, invitation };
  }, PAGE);
  await revokeInvitation(invitation.id);
  await recordAudit({ organisationId: user.organisationId, actorUserId: user.userId, action: "invitation-revoked", subject: invitation.email, ip: await requestIp() });
  revalidatePath(PAGE);
  return { ok: true, message: `The invitation to ${invitation.email} no longer works.` };
}
