import type { Knex } from "knex";
import { db } from "../client";
import type { Role } from "../roles";
import { parseRoles, rolesLiteral } from "./users";
import { isUuid } from "../ids";

export interface MemberRow {
  membershipId: string;
  organisationId: string;
  userId: string;
  name: string;
  email: string;
  roles: Role[];
  joinedAt: string;
  deactivatedAt: string | null;
}

const memberColumns = [
  "m.id as membershipId",
  "m.organisation_id as organisationId",
  "u.id as userId",
  "u.name",
  "u.email",
  "m.roles",
  "m.created_at as joinedAt",
  "m.deactivated_at as deactivatedAt",
];

function toMember(row: Record<string, unknown>): MemberRow {
  return {
    ...(row as unknown as MemberRow),
    roles: parseRoles(row.roles),
    joinedAt: new Date(row.joinedAt as string).toISOString(),
    deactivatedAt: row.deactivatedAt ? new Date(row.deactivatedAt as string).toISOString() : null,
  };
}

/** Everyone who is or was a member, deactivated people included (their past work stays attributed). */
export async function listMembers(organisationId: string): Promise<MemberRow[]> {
  const rows = await db("memberships as m")
    .join("users as u", "u.id", "m.user_id")
    .where("m.organisation_id", organisationId)
    .orderBy("u.name")
    .select(memberColumns);
  return rows.map(toMember);
}

export async function findMembership(membershipId: string): Promise<MemberRow | undefined> {
  if (!isUuid(membershipId)) return undefined;
  const row = await db("memberships as m").join("users as u", "u.id", "m.user_id").where("m.id", membershipId).first(memberColumns);
  return row ? toMember(row) : undefined;
}

export type MembershipChange = { roles: Role[] } | { active: boolean };
export type ChangeResult = { ok: true; before: MemberRow } | { ok: false; reason: "last-admin" | "missing" };

/**
 * Changes one membership's roles or active state, refusing any change that would leave the
 * organisation without an active admin. All memberships of the organisation are locked first (in
 * id order) so two admins demoting each other at once cannot both succeed.
 */
export async function changeMembership(
  membershipId: string,
  change: MembershipChange,
  /** Runs inside the transaction after the change (the audit event), so both commit or neither does. */
  alongside?: (trx: Knex.Transaction, before: MemberRow) => Promise<void>,
): Promise<ChangeResult> {
  return db.transaction(async (trx) => {
    const target = await trx("memberships").where("id", membershipId).first("organisation_id");
    if (!target) return { ok: false, reason: "missing" } as const;
    const all = await trx("memberships").where("organisation_id", target.organisation_id).orderBy("id").forUpdate().select("id", "roles", "deactivated_at");
    const isActiveAdmin = (m: { roles: unknown; deactivated_at: unknown }) => !m.deactivated_at && parseRoles(m.roles).includes("admin");
    const current = all.find((m) => m.id === membershipId)!;
    const next = "roles" in change
      ? { roles: change.roles, deactivated_at: current.deactivated_at }
      : { roles: current.roles, deactivated_at: change.active ? null : new Date() };
    const adminsAfter = all.filter((m) => (m.id === membershipId ? isActiveAdmin(next) : isActiveAdmin(m))).length;
    if (adminsAfter === 0) return { ok: false, reason: "last-admin" } as const;

    const before = toMember(await trx("memberships as m").join("users as u", "u.id", "m.user_id").where("m.id", membershipId).first(memberColumns));
    if ("roles" in change) await trx("memberships").where("id", membershipId).update({ roles: rolesLiteral(trx, change.roles) });
    else await trx("memberships").where("id", membershipId).update({ deactivated_at: change.active ? null : trx.fn.now() });
    // A deactivated member's sessions in this organisation end with the membership.
    if ("active" in change && !change.active) {
      const member = await trx("memberships").where("id", membershipId).first("user_id");
      await trx("user_sessions").where({ user_id: member.user_id, organisation_id: target.organisation_id }).whereNull("ended_at").update({ ended_at: trx.fn.now() });
    }
    if (alongside) await alongside(trx, before);
    return { ok: true, before } as const;
  });
}
