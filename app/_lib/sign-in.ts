import { recordAudit } from "@/db/queries/audit";
import { clearFailures, recordFailure, secondsUntilAllowed } from "@/db/queries/sign-in-throttle";
import { findSignInCandidate } from "@/db/queries/users";
import { hashPassword, verifyPassword } from "./password";
import { requestIp } from "./request-ip";
import type { SignInInput } from "./schemas/account";
import { getSession } from "./session";

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
  const session = await getSession();
  session.destroy();
  session.userId = candidate.userId;
  session.organisationId = candidate.organisationId;
  session.signedInAt = Date.now();
  await session.save();
  await recordAudit({ organisationId: candidate.organisationId, actorUserId: candidate.userId, action: "sign-in", ip });
  return { ok: true, userId: candidate.userId };
}

export async function signOut(): Promise<void> {
  const session = await getSession();
  if (session.userId) {
    await recordAudit({ organisationId: session.organisationId, actorUserId: session.userId, action: "sign-out", ip: await requestIp() });
  }
  session.destroy();
}
