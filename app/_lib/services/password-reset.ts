import "server-only";
import { db } from "@/db/client";
import { recordAudit } from "@/db/queries/audit";
import { consumePasswordReset, createPasswordReset } from "@/db/queries/password-resets";
import { findSignInCandidate, findUserByEmail } from "@/db/queries/users";
import { resetProblem } from "../account-messages";
import { env } from "../env";
import { ConflictError } from "../errors";
import { deliverSoon, enqueueMail } from "../outbox";
import { composeMail } from "../mail-template";
import { hashPassword } from "../password";
import { requestIp } from "../request-ip";
import { newPasswordSchema, resetRequestSchema } from "../schemas/account";
import { startSession } from "../start-session";
import { PASSWORD_RESET_TTL_MS, hashToken, newToken } from "../tokens";
import type { Body } from "./input";

/** More links than this per hour for one person are not sent (someone may be flooding their inbox). */
const MAX_LINKS_PER_HOUR = 3;

/** The link, its audit event and its e-mail (scrubbed from the outbox once delivered) commit together. */
async function issueResetLink(email: string, ip: string): Promise<void> {
  const user = await findUserByEmail(email);
  if (!user) return;
  const membership = await findSignInCandidate(user.email);
  const { token, tokenHash } = newToken();
  const mailId = await db.transaction(async (trx) => {
    if (!(await createPasswordReset(user.id, tokenHash, new Date(Date.now() + PASSWORD_RESET_TTL_MS), MAX_LINKS_PER_HOUR, trx))) return null;
    await recordAudit({ organisationId: membership?.organisationId, action: "password-reset-requested", subject: user.email, ip }, trx);
    return enqueueMail(trx, {
      organisationId: membership?.organisationId ?? null,
      to: user.email,
      kind: "password-reset",
      secretLink: true,
      ...composeMail({
        subject: "Set a new Pierwise password",
        heading: "Set a new password",
        paragraphs: [
          `Someone (we hope you) asked to set a new password for the Pierwise account ${user.email}.`,
          "The link works once, for 1 hour.",
        ],
        action: { label: "Choose a new password", url: `${env.appUrl}/reset/${token}` },
        footnote: "If you did not ask, ignore this e-mail: your password stays as it is.",
      }),
    });
  });
  if (mailId) await deliverSoon([mailId]);
}

/**
 * Asks for a reset link (anyone). Always gives the same answer, and answers before the link and
 * its e-mail are made, so neither the words nor the time taken tell whether an account uses the address.
 */
export async function requestPasswordReset(body: Body): Promise<{ email: string; message: string }> {
  const { email } = resetRequestSchema.parse(await body());
  const ip = await requestIp();
  void issueResetLink(email, ip).catch((error) => console.error("password reset link failed", error));
  return { email, message: `If a Pierwise account uses ${email}, we have sent it a link to set a new password. The link works once, for 1 hour.` };
}

/**
 * Sets the new password through a single-use link (the token is the permission): every other open
 * link and every session of the person end with it; then a fresh session starts. Returns whether the
 * person has an organisation to open.
 */
export async function completePasswordReset(token: string, body: Body): Promise<{ signedIn: boolean }> {
  const { password } = newPasswordSchema.parse(await body());
  const ip = await requestIp();
  const result = await consumePasswordReset(hashToken(token), await hashPassword(password), (trx, done) => recordAudit({
    organisationId: done.organisationId, actorUserId: done.userId, action: "password-reset", subject: done.email, ip,
  }, trx));
  if (!result.ok) throw new ConflictError(resetProblem(result.reason));
  const membership = await findSignInCandidate(result.email);
  if (!membership) return { signedIn: false };
  await startSession(result.userId, membership.organisationId);
  return { signedIn: true };
}
