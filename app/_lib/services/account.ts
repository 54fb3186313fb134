import "server-only";
import { db } from "@/db/client";
import { recordAudit } from "@/db/queries/audit";
import { removeLicence as deleteLicence, saveLicence as writeLicence, type LicenceRow } from "@/db/queries/licences";
import { endSessionsOf } from "@/db/queries/sessions";
import { assertRole, type CurrentUser } from "../auth";
import { ConflictError, ValidationError } from "../errors";
import { requestIp } from "../request-ip";
import { LICENSING_STATES, licenceSchema } from "../schemas/licence";
import type { Body } from "./input";

/**
 * A person's own account: an engineer's licences (one per licensing state; approval needs an
 * unexpired one in the project's state) and ending every session. Each change commits with its
 * audit event.
 */

/** Adds a licence for a state, or updates the number and expiry of the one already held there (engineers). */
export async function saveLicence(user: CurrentUser, body: Body): Promise<LicenceRow> {
  assertRole(user, "engineer");
  const licence = licenceSchema.parse(await body());
  const ip = await requestIp();
  await db.transaction(async (trx) => {
    await writeLicence(user.userId, licence, trx);
    await recordAudit({ organisationId: user.organisationId, actorUserId: user.userId, action: "licence-saved", subject: user.email, detail: licence, ip }, trx);
  });
  return licence;
}

/** Removes the licence held in one state (engineers). */
export async function removeLicence(user: CurrentUser, body: Body): Promise<{ state: string }> {
  assertRole(user, "engineer");
  const state = String(((await body()) as { state?: unknown }).state ?? "").trim().toUpperCase();
  if (!(LICENSING_STATES as readonly string[]).includes(state)) throw ValidationError.field("state", "Licensing state must be a US state, DC or territory code such as CO.");
  const ip = await requestIp();
  await db.transaction(async (trx) => {
    if (!(await deleteLicence(user.userId, state, trx))) throw new ConflictError(`You hold no recorded licence in ${state}.`);
    await recordAudit({ organisationId: user.organisationId, actorUserId: user.userId, action: "licence-removed", subject: user.email, detail: { state }, ip }, trx);
  });
  return { state };
}

/** Ends every session of this person, on every device, the current one included. */
export async function signOutEverywhere(user: CurrentUser): Promise<{ ended: number }> {
  const ip = await requestIp();
  const ended = await db.transaction(async (trx) => {
    const ended = await endSessionsOf(user.userId, { trx });
    await recordAudit({ organisationId: user.organisationId, actorUserId: user.userId, action: "signed-out-everywhere", subject: user.email, detail: { sessions: ended }, ip }, trx);
    return ended;
  });
  return { ended };
}
