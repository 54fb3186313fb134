import { recordAudit } from "@/db/queries/audit";
import { attemptSucceeded, reserveAttempt, THROTTLE } from "@/db/queries/sign-in-throttle";
import { env } from "./env";
import { deliverSoon, enqueueMail } from "./outbox";
import { composeMail } from "./mail-template";
import { db } from "@/db/client";
import { findSignInCandidate } from "@/db/queries/users";
import { hashPassword, verifyPassword } from "./password";
import { requestIp } from "./request-ip";
import type { SignInInput } from "./schemas/account";
import { getSession } from "./session";
import { startSession } from "./start-session";
import { endSession } from "@/db/queries/sessions";

export type SignInOutcome = { ok: true; userId: string } | { ok: false; status: 401 | 429; message: string };

const BAD_CREDENTIALS = "That e-mail and password do not match an active account.";

// Verifying against a fixed hash when the e-mail is unknown keeps the timing the same either way.
let decoyHash: Promise<string> | undefined;

/** Checks credentials with throttling and audit, then starts a fresh session (renewed at sign-in). */
export async function signIn(input: SignInInput): Promise<SignInOutcome> {
  const ip = await requestIp();
  // Reserved before the password is checked, so parallel guesses are counted one by one.
  const attempt = await reserveAttempt(input.email, ip);
  if (!attempt.ok) {
    const minutes = Math.ceil(attempt.waitSeconds / 60);
    return { ok: false, status: 429, message: `Too many failed sign-ins. Try again in ${minutes} minute${minutes === 1 ? "" : "s"}, or reset your password.` };
  }
  const candidate = await findSignInCandidate(input.email);
  decoyHash ??= hashPassword("decoy-password-for-timing");
  const valid = await verifyPassword(candidate?.passwordHash ?? (await decoyHash), input.password);
  if (!candidate || !valid) {
    // The reservation stays as the recorded failure.
    await recordAudit({ organisationId: candidate?.organisationId, action: "sign-in-failed", subject: input.email, ip });
    if (attempt.ceilingReached && candidate) await warnOwner(candidate.userId, candidate.organisationId, input.email);
    return { ok: false, status: 401, message: BAD_CREDENTIALS };
  }
  await attemptSucceeded(attempt.attemptId, input.email, ip);
  await startSession(candidate.userId, candidate.organisationId);
  await recordAudit({ organisationId: candidate.organisationId, actorUserId: candidate.userId, action: "sign-in", ip });
  return { ok: true, userId: candidate.userId };
}

export async function signOut(): Promise<void> {
  const session = await getSession();
  if (session.userId) {
    await recordAudit({ organisationId: session.organisationId, actorUserId: session.userId, action: "sign-out", ip: await requestIp() });
  }
  // The record ends too, so a copy of the cookie is worthless from now on.
  if (session.sessionId) await endSession(session.sessionId);
  session.destroy();
}

/**
 * Many wrong passwords on one account from many places: the owner hears of it once per window
 * (the audit log records that the e-mail went out, which is also how "once" is kept).
 */
async function warnOwner(userId: string, organisationId: string, email: string): Promise<void> {
  const recent = await db("audit_events")
    .where({ action: "sign-in-attack-warned", subject: email })
    .where("at", ">", db.raw(`now() - make_interval(mins => ?)`, [THROTTLE.windowMinutes]))
    .first("id");
  if (recent) return;
  // The audit event (which keeps "once per window") and the e-mail commit together, so the log never
  // says the owner was warned while the warning was lost; the outbox retries it if the server is down.
  const mailId = await db.transaction(async (trx) => {
    await recordAudit({ organisationId, actorUserId: userId, action: "sign-in-attack-warned", subject: email }, trx);
    return enqueueMail(trx, {
      organisationId,
      to: email,
      ...composeMail({
        subject: "Many failed sign-ins on your Pierwise account",
        heading: "Many failed sign-ins on your account",
        paragraphs: [
          `In the last ${THROTTLE.windowMinutes} minutes there were at least ${THROTTLE.perAccountCeiling} wrong passwords for this account, from several places.`,
          "You can still sign in as usual. If this was not you, choose a longer password.",
        ],
        action: { label: "Choose a new password", url: `${env.appUrl}/reset` },
      }),
    });
  });
  await deliverSoon([mailId]);
}
