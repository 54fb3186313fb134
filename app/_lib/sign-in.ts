import { recordAudit } from "@/db/queries/audit";
import { clearFailures, recordFailure, secondsUntilAllowed } from "@/db/queries/sign-in-throttle";
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
  const wait = await secondsUntilAllowed(input.email, ip);
  if (wait > 0) {
    const minutes = Math.ceil(wait / 60);
    return { ok: false, status: 429, message: `Too many failed sign-ins. Try again in ${minutes} minute${minutes === 1 ? "" : "s"}, or reset your password.` };
  }
  const candidate = await findSignInCandidate(input.email);
  decoyHash ??= hashPassword("decoy-password-for-timing");
  const valid = await verifyPassword(candidate?.passwordHash ?? (await decoyHash), input.password);
  if (!candidate || !valid) {
    await recordFailure(input.email, ip);
    await recordAudit({ organisationId: candidate?.organisationId, action: "sign-in-failed", subject: input.email, ip });
    return { ok: false, status: 401, message: BAD_CREDENTIALS };
  }
  await clearFailures(input.email);
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
