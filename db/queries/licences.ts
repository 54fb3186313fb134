import type { Knex } from "knex";
import { db } from "../client";

export interface LicenceRow {
  state: string;
  licenceNumber: string;
  /** The last day the licence is valid, as YYYY-MM-DD. */
  expiresOn: string;
}

/** A reviewing engineer's licences, one per licensing state. */
export async function listLicences(userId: string): Promise<LicenceRow[]> {
  return db("engineer_licences")
    .where("user_id", userId)
    .orderBy("state")
    .select("state", "licence_number as licenceNumber", db.raw(`to_char(expires_on, 'YYYY-MM-DD') as "expiresOn"`));
}

/** Adds a licence, or replaces the number and expiry of the one held in that state. */
export async function saveLicence(userId: string, licence: LicenceRow, knex: Knex = db): Promise<void> {
  await knex("engineer_licences")
    .insert({ user_id: userId, state: licence.state, licence_number: licence.licenceNumber, expires_on: licence.expiresOn })
    .onConflict(["user_id", "state"])
    .merge(["licence_number", "expires_on"]);
}

export async function removeLicence(userId: string, state: string, knex: Knex = db): Promise<number> {
  return knex("engineer_licences").where({ user_id: userId, state }).delete();
}

export type Eligibility = { ok: true; licence: LicenceRow } | { ok: false; reason: string };

/** Today's date where the calendar is read (UTC), as YYYY-MM-DD. */
function isoDay(date: Date): string {
  return date.toISOString().slice(0, 10);
}

/**
 * May this person approve a design for a project in `projectState` (two-letter code, e.g. "CO")?
 * Yes only with a licence held in that state whose expiry date (the last valid day) is today or
 * later. The review feature calls this before recording an approval, after checking the engineer
 * role and organisation with app/_lib/auth.ts; the reason is written for the engineer to read.
 *
 * @example
 *   await approvalEligibility(engineerId, "CO") // → { ok: true, licence: { state: "CO", … } }
 *   await approvalEligibility(engineerId, "TX") // → { ok: false, reason: "No licence held in TX: …" }
 */
export async function approvalEligibility(userId: string, projectState: string, asOf: Date = new Date()): Promise<Eligibility> {
  const state = projectState.trim().toUpperCase();
  const licence = (await listLicences(userId)).find((l) => l.state === state);
  if (!licence) {
    return { ok: false, reason: `No licence held in ${state}: an approval needs a licence in the project's state. Add it on your account page.` };
  }
  if (licence.expiresOn < isoDay(asOf)) {
    return { ok: false, reason: `Licence ${licence.licenceNumber} (${state}) expired on ${licence.expiresOn}. Renew it and update the expiry on your account page.` };
  }
  return { ok: true, licence };
}
