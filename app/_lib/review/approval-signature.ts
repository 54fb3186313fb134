import type { CurrentUser } from "@/app/_lib/auth";
import { ValidationError } from "@/app/_lib/errors";
import { verifyPassword } from "@/app/_lib/password";
import { requestIp } from "@/app/_lib/request-ip";
import type { DesignResult } from "@/engine";
import { recordAudit } from "@/db/queries/audit";
import { attemptSucceeded, reserveAttempt } from "@/db/queries/sign-in-throttle";
import { findUserByEmail } from "@/db/queries/users";
import { checkOutcome, ratioText, type CheckOverride } from "@/components/review/check-outcome";

const invalid = (path: (string | number)[], message: string) => ValidationError.field(path.join("."), message);

/**
 * An approval of a revision with failing checks needs the engineer's reason for each one, and
 * nothing else: an override naming a check that passes (or none at all) is refused, so the stored
 * record says exactly which failures were accepted.
 */
export function decideOverrides(result: DesignResult, overrides: { checkId: string; reason: string }[]): CheckOverride[] {
  const { failing } = checkOutcome(result);
  overrides.forEach((o, i) => {
    if (!failing.some((f) => f.checkId === o.checkId)) {
      throw invalid(["overrides", i, "checkId"], failing.length
        ? `"${o.checkId}" is not a failing check of this revision; the failing checks are ${failing.map((f) => f.checkId).join(", ")}`
        : "No check of this revision fails: approve without overrides");
    }
    if (overrides.findIndex((x) => x.checkId === o.checkId) !== i) throw invalid(["overrides", i, "checkId"], `Give one reason per failing check; "${o.checkId}" is listed twice`);
  });
  const missing = failing.filter((f) => !overrides.some((o) => o.checkId === f.checkId));
  if (missing.length) {
    throw invalid(["overrides"], `This revision fails ${missing.map((f) => `${f.title} (ratio ${ratioText(f.ratio)})`).join(" and ")}: to approve it anyway, give your reason for each failing check`);
  }
  return failing.map((f) => ({ checkId: f.checkId, title: f.title, ratio: f.ratio, reason: overrides.find((o) => o.checkId === f.checkId)!.reason }));
}

/**
 * The engineer signs the approval with their password. Wrong guesses count against the same
 * per-account and per-address limits as sign-in, so a left-open session cannot be used to try
 * passwords faster than the sign-in page allows.
 */
export async function confirmSignature(user: CurrentUser, password: string): Promise<void> {
  const ip = await requestIp();
  if (!password) throw invalid(["password"], "Enter your password to sign the approval");
  const attempt = await reserveAttempt(user.email, ip);
  if (!attempt.ok) {
    const minutes = Math.ceil(attempt.waitSeconds / 60);
    throw invalid(["password"], `Too many wrong passwords. Try again in ${minutes} minute${minutes === 1 ? "" : "s"}.`);
  }
  const person = await findUserByEmail(user.email);
  if (!person || !(await verifyPassword(person.passwordHash, password))) {
    await recordAudit({ organisationId: user.organisationId, actorUserId: user.userId, action: "approval-signature-failed", subject: user.email, ip });
    throw invalid(["password"], "That is not your password: the approval was not recorded");
  }
  await attemptSucceeded(attempt.attemptId, user.email, ip);
}
