import "server-only";
import { recordAudit } from "@/db/queries/audit";
import { acceptInvitation as claimInvitation, findInvitation } from "@/db/queries/invitations";
import { attemptSucceeded, reserveAttempt } from "@/db/queries/sign-in-throttle";
import { findUserByEmail } from "@/db/queries/users";
import { invitationProblem } from "../account-messages";
import { ConflictError, ValidationError } from "../errors";
import { hashPassword, verifyPassword } from "../password";
import { requestIp } from "../request-ip";
import { acceptAsExistingSchema, acceptAsNewSchema } from "../schemas/account";
import { startSession } from "../start-session";
import { hashToken } from "../tokens";
import type { Body } from "./input";

/**
 * Accepts an invitation (the link's token is the permission): a new person gives a name and
 * password, someone who already has an account proves it with their password (throttled like
 * sign-in). The link is claimed, the membership made and the audit event written in one
 * transaction; then they are signed in to the organisation.
 */
export async function acceptInvitation(token: string, body: Body): Promise<{ userId: string; organisationId: string }> {
  const tokenHash = hashToken(token);
  const invitation = await findInvitation(tokenHash);
  if (!invitation) throw new ConflictError(invitationProblem("unknown"));
  if (invitation.acceptedAt) throw new ConflictError(invitationProblem("used"));
  if (invitation.expiresAt.getTime() <= Date.now()) throw new ConflictError(invitationProblem("expired", invitation.organisationName));

  const ip = await requestIp();
  const fields = (await body()) as { name?: unknown; password?: unknown };
  const existing = await findUserByEmail(invitation.email);
  let who: Parameters<typeof claimInvitation>[1];
  if (existing) {
    const { password } = acceptAsExistingSchema.parse({ password: fields.password });
    const attempt = await reserveAttempt(invitation.email, ip);
    if (!attempt.ok) throw new ConflictError(`Too many failed attempts. Try again in ${Math.ceil(attempt.waitSeconds / 60)} minutes, or reset your password.`);
    if (!(await verifyPassword(existing.passwordHash, password))) {
      await recordAudit({ organisationId: invitation.organisationId, action: "sign-in-failed", subject: invitation.email, detail: { via: "invitation" }, ip });
      throw ValidationError.field("password", `That is not the password of the Pierwise account for ${invitation.email}.`);
    }
    await attemptSucceeded(attempt.attemptId, invitation.email, ip);
    who = { existingUserId: existing.id };
  } else {
    const input = acceptAsNewSchema.parse({ name: fields.name, password: fields.password });
    who = { newUser: { name: input.name, passwordHash: await hashPassword(input.password) } };
  }

  const result = await claimInvitation(tokenHash, who, (trx, accepted) => recordAudit({
    organisationId: accepted.organisationId, actorUserId: accepted.userId, action: "invitation-accepted", subject: accepted.email, detail: { roles: accepted.roles }, ip,
  }, trx));
  if (!result.ok) throw new ConflictError(invitationProblem(result.reason, invitation.organisationName));
  await startSession(result.userId, result.organisationId);
  return { userId: result.userId, organisationId: result.organisationId };
}

