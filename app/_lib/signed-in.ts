import { AccessError } from "./errors";
import { requireUser } from "./auth";
import { readSession } from "./session";

/**
 * The cheaper check for routes that read and write no organisation data (POST /api/calc, a pure
 * calculation): a session cookie that passed the full check (`requireUser`: active member,
 * password not changed since sign-in) in the last 2 seconds passes again without the database
 * round trip, which costs more than the calculation itself. So a member deactivated a moment ago
 * may run calculations for up to 2 seconds more, and can read nothing. Every route that touches
 * data keeps `requireUser` on each request.
 */
const PASSED_FOR_MS = 2000;
const MAX_KEPT = 1000;
const passed = new Map<string, number>();

export async function requireSignedInForCalculation(): Promise<void> {
  const session = await readSession();
  if (!session.userId || !session.organisationId) throw new AccessError(401, "Sign in to continue.");
  const key = `${session.userId}:${session.organisationId}:${session.signedInAt ?? 0}`;
  const now = Date.now();
  if ((passed.get(key) ?? 0) > now) return;
  await requireUser();
  if (passed.size >= MAX_KEPT) passed.delete(passed.keys().next().value!);
  passed.set(key, now + PASSED_FOR_MS);
}
