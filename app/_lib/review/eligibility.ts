import { approvalEligibility, listLicences, type LicenceRow } from "@/db/queries/licences";

export type Eligibility = { ok: true; licence: LicenceRow } | { ok: false; message: string };

/** The engineer deciding a review: a licence in the project's state, not expired (accounts' rule). */
export async function licenceEligibility(userId: string, state: string, now = new Date()): Promise<Eligibility> {
  const out = await approvalEligibility(userId, state, now);
  return out.ok ? out : { ok: false, message: out.reason };
}

/** The same rule, worded for the designer choosing that engineer. */
export async function engineerEligibility(userId: string, name: string, state: string, now = new Date()): Promise<Eligibility> {
  const out = await approvalEligibility(userId, state, now);
  if (out.ok) return out;
  const licence = (await listLicences(userId)).find((l) => l.state === state.toUpperCase());
  return {
    ok: false,
    message: licence
      ? `${name}'s licence in ${licence.state} expired on ${licence.expiresOn}; choose an engineer with a current ${licence.state} licence`
      : `${name} holds no licence in ${state}; choose an engineer licensed in ${state}`,
  };
}
