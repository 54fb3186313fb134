import { db } from "../client";
import { listLicences, type LicenceRow } from "./licences";
import { parseRoles } from "./users";
import type { Role } from "../roles";
import { isUuid } from "../ids";

/** People a review involves: the organisation's engineers (licences from db/queries/licences.ts). */

export interface OrgMember {
  userId: string;
  name: string;
  email: string;
  roles: Role[];
}

/** An active member of the organisation, or undefined. */
export async function activeMember(organisationId: string, userId: string): Promise<OrgMember | undefined> {
  if (!isUuid(userId)) return undefined;
  const row = await db("memberships as m")
    .join("users as u", "u.id", "m.user_id")
    .where({ "m.organisation_id": organisationId, "m.user_id": userId })
    .whereNull("m.deactivated_at")
    .first("u.id as userId", "u.name", "u.email", "m.roles");
  return row ? { ...row, roles: parseRoles(row.roles) } : undefined;
}

/** The organisation's active engineers, each with their licences, for the "choose an engineer" list. */
export async function organisationEngineers(organisationId: string): Promise<(OrgMember & { licences: LicenceRow[] })[]> {
  const rows = await db("memberships as m")
    .join("users as u", "u.id", "m.user_id")
    .where("m.organisation_id", organisationId)
    .whereNull("m.deactivated_at")
    .whereRaw("'engineer' = ANY(m.roles)")
    .orderBy("u.name")
    .select("u.id as userId", "u.name", "u.email", "m.roles");
  return Promise.all(rows.map(async (r) => ({ ...r, roles: parseRoles(r.roles), licences: await listLicences(r.userId) })));
}

export async function userEmailAndName(userId: string): Promise<{ email: string; name: string } | undefined> {
  return db("users").where({ id: userId }).first("email", "name");
}
