import "server-only";
import { db } from "@/db/client";
import { recordAudit } from "@/db/queries/audit";
import { createInvitation, findInvitationById, listPendingInvitations, revokeInvitation as expireInvitation, type InvitationView } from "@/db/queries/invitations";
import { changeMembership, findMembership, listMembers, type MemberRow, type MembershipChange } from "@/db/queries/members";
import { ROLE_LABELS, type Role } from "@/db/roles";
import { assertOwned, assertRole, type CurrentUser } from "../auth";
import { env } from "../env";
import { AccessError, ConflictError, ValidationError, notFound } from "../errors";
import { invitationMail } from "../invitation-mail";
import { deliverSoon, enqueueMail } from "../outbox";
import { requestIp } from "../request-ip";
import { changeRolesSchema, inviteSchema, memberPatchSchema } from "../schemas/members";
import { INVITATION_TTL_MS, newToken } from "../tokens";
import type { Body } from "./input";

/**
 * The members admin's use cases (admins of the organisation): invite, revoke an invitation, change
 * roles, deactivate and reactivate. Who → whose → which role: a member of another organisation is
 * 404, a non-admin 403. No change may leave the organisation without an active admin.
 */

/** The organisation's members (deactivated ones too, so past work stays attributed) and pending invitations (admins). */
export async function membersOverview(user: CurrentUser): Promise<{ members: MemberRow[]; invitations: InvitationView[] }> {
  assertRole(user, "admin");
  const [members, invitations] = await Promise.all([listMembers(user.organisationId), listPendingInvitations(user.organisationId)]);
  return { members, invitations };
}

/** Who → whose → which role for one membership. */
async function adminAndMember(user: CurrentUser, membershipId: string): Promise<MemberRow> {
  const member = assertOwned(user, await findMembership(membershipId), "That member");
  assertRole(user, "admin");
  return member;
}

function lastAdmin(member: MemberRow, user: CurrentUser, what: string): ConflictError {
  const who = member.userId === user.userId ? "You are" : `${member.name} is`;
  return new ConflictError(`${who} the last active admin of ${user.organisationName}, so you cannot ${what}. Give another member the admin role first.`);
}

/**
 * Invites a person by e-mail with the given roles. The invitation, its audit event and its e-mail
 * (a single-use link, scrubbed from the outbox once delivered) commit together; a mail server that
 * is down does not undo the invitation: the outbox delivers it when the server answers.
 */
export async function inviteMember(user: CurrentUser, body: Body): Promise<{ email: string; invitationId: string }> {
  assertRole(user, "admin");
  const { email, roles } = inviteSchema.parse(await body());
  const existing = (await listMembers(user.organisationId)).find((m) => m.email === email);
  if (existing) {
    const why = existing.deactivatedAt ? "is a deactivated member: reactivate them in the list below instead" : "is already a member";
    throw ValidationError.field("email", `${email} ${why}.`);
  }
  const { token, tokenHash } = newToken();
  const ip = await requestIp();
  const { invitationId, mailId } = await db.transaction(async (trx) => {
    const invitationId = await createInvitation({ organisationId: user.organisationId, email, roles, tokenHash, invitedBy: user.userId, expiresAt: new Date(Date.now() + INVITATION_TTL_MS) }, trx);
    await recordAudit({ organisationId: user.organisationId, actorUserId: user.userId, action: "invitation-sent", subject: email, detail: { roles }, ip }, trx);
    const mailId = await enqueueMail(trx, {
      organisationId: user.organisationId, to: email, kind: "invitation", secretLink: true,
      ...invitationMail({ inviter: user.name, organisation: user.organisationName, roles, link: `${env.appUrl}/invite/${token}` }),
    });
    return { invitationId, mailId };
  });
  await deliverSoon([mailId]);
  return { email, invitationId };
}

/** Makes a pending invitation stop working at once. */
export async function revokeInvitation(user: CurrentUser, invitationId: string): Promise<{ email: string }> {
  const invitation = assertOwned(user, await findInvitationById(invitationId), "That invitation");
  assertRole(user, "admin");
  const ip = await requestIp();
  await db.transaction(async (trx) => {
    await expireInvitation(invitation.id, trx);
    await recordAudit({ organisationId: user.organisationId, actorUserId: user.userId, action: "invitation-revoked", subject: invitation.email, ip }, trx);
  });
  return { email: invitation.email };
}

/** Applies one change with its audit event in the same transaction; the last active admin is kept. */
async function applyChange(user: CurrentUser, member: MemberRow, wanted: MembershipChange, action: string, refused: string): Promise<MemberRow> {
  const ip = await requestIp();
  const result = await changeMembership(member.membershipId, wanted, (trx, before) => recordAudit({
    organisationId: user.organisationId, actorUserId: user.userId, action, subject: member.email, ip,
    detail: "roles" in wanted ? { from: before.roles, to: wanted.roles } : {},
  }, trx));
  if (!result.ok) throw result.reason === "last-admin" ? lastAdmin(member, user, refused) : notFound("That member");
  return member;
}

/**
 * Sets a member's roles. Approving a design is a licensed engineer's signature: an admin cannot
 * give the engineer role to their own membership (another admin does, or an invitation carries
 * it), so nobody can make themselves an approver. The audit event names who granted it.
 */
export async function changeRoles(user: CurrentUser, membershipId: string, body: Body): Promise<{ member: MemberRow; roles: string[] }> {
  const member = await adminAndMember(user, membershipId);
  const { roles } = changeRolesSchema.parse({ membershipId, ...((await body()) as object) });
  await setRoles(user, member, roles);
  return { member, roles: roles.map((r) => ROLE_LABELS[r] ?? r) };
}

async function setRoles(user: CurrentUser, member: MemberRow, roles: Role[]): Promise<void> {
  if (member.userId === user.userId && roles.includes("engineer") && !member.roles.includes("engineer")) {
    throw new AccessError(403, "You cannot give yourself the reviewing-engineer role: another admin must grant it.");
  }
  await applyChange(user, member, { roles }, "role-changed", "remove the admin role");
}

/** Deactivates (their sessions in the organisation end; past work stays attributed) or reactivates a member. */
export async function setMemberActive(user: CurrentUser, membershipId: string, active: boolean): Promise<MemberRow> {
  return setActive(user, await adminAndMember(user, membershipId), active);
}

function setActive(user: CurrentUser, member: MemberRow, active: boolean): Promise<MemberRow> {
  return applyChange(user, member, { active }, active ? "member-reactivated" : "member-deactivated", active ? "reactivate them" : "deactivate them");
}

/** The API's one door for a membership: `{ roles }` or `{ active }`, each the same use case as its form. */
export async function updateMember(user: CurrentUser, membershipId: string, body: Body): Promise<MemberRow> {
  const member = await adminAndMember(user, membershipId);
  const patch = memberPatchSchema.parse(await body());
  if (patch.roles) await setRoles(user, member, patch.roles);
  else await setActive(user, member, patch.active!);
  return (await findMembership(membershipId))!;
}

/** What the API answers about a member. */
export function memberView(m: MemberRow) {
  return { membershipId: m.membershipId, userId: m.userId, name: m.name, email: m.email, roles: m.roles, active: !m.deactivatedAt };
}
