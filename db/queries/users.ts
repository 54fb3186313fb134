import type { Knex } from "knex";
import { db } from "../client";
import type { Role } from "../roles";

export interface MemberRecord {
  userId: string;
  email: string;
  name: string;
  organisationId: string;
  organisationName: string;
  roles: Role[];
  /** When the password was last reset; sessions that began earlier are no longer honoured. */
  passwordChangedAt?: Date | null;
  /** The organisation's IANA time zone, for dates in words. */
  timeZone?: string;
}

/** Postgres returns enum arrays as "{a,b}" text through pg; normalise either form. */
export function parseRoles(value: unknown): Role[] {
  if (Array.isArray(value)) return value as Role[];
  return String(value ?? "").replace(/[{}]/g, "").split(",").filter(Boolean) as Role[];
}

export function rolesLiteral(knex: Knex, roles: Role[]) {
  return knex.raw("?::member_role[]", [`{${roles.join(",")}}`]);
}

/** The active membership of a user in an organisation, or undefined when absent or deactivated. */
export async function findActiveMember(userId: string, organisationId: string): Promise<MemberRecord | undefined> {
  const row = await db("memberships as m")
    .join("users as u", "u.id", "m.user_id")
    .join("organisations as o", "o.id", "m.organisation_id")
    .where({ "m.user_id": userId, "m.organisation_id": organisationId })
    .whereNull("m.deactivated_at")
    .first("u.id as userId", "u.email", "u.name", "o.id as organisationId", "o.name as organisationName", "m.roles", "u.password_changed_at as passwordChangedAt", "o.time_zone as timeZone");
  return row ? { ...row, roles: parseRoles(row.roles) } : undefined;
}

/** For sign-in: the user's password hash and the first organisation where they are active. */
export async function findSignInCandidate(email: string) {
  return db("users as u")
    .join("memberships as m", "m.user_id", "u.id")
    .where("u.email", email.trim().toLowerCase())
    .whereNull("m.deactivated_at")
    .orderBy("m.created_at", "asc")
    .first("u.id as userId", "u.password_hash as passwordHash", "m.organisation_id as organisationId");
}

/** A person by e-mail (any organisation, active or not), for sign-up, invitations and resets. */
export async function findUserByEmail(email: string): Promise<{ id: string; name: string; email: string; passwordHash: string } | undefined> {
  return db("users").where("email", email.trim().toLowerCase()).first("id", "name", "email", "password_hash as passwordHash");
}

/** The roles of the membership sign-in picks (the first active one), to choose where the person lands. */
export async function findSignInRoles(userId: string): Promise<Role[]> {
  const row = await db("memberships").where({ user_id: userId }).whereNull("deactivated_at").orderBy("created_at", "asc").first("roles");
  return row ? parseRoles(row.roles) : [];
}
