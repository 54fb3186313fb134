import type { Knex } from "knex";
import { db } from "../client";
import type { Role } from "../roles";
import { parseRoles, rolesLiteral } from "./users";

/**
 * Sign-ups waiting for their e-mailed link (db/migrations/20261203200000_sign_up_requests_outbox_kind.ts).
 * The token is stored as its SHA-256; the password as its argon2id hash until the link is used.
 */
export interface SignUpRequest {
  id: string;
  email: string;
  organisationName: string;
  name: string;
  passwordHash: string | null;
  roles: Role[];
  expiresAt: Date;
  usedAt: Date | null;
}

/**
 * Serialises the sign-ups of one address inside the caller's transaction (a lock held until it
 * ends), so a burst of forms for one inbox is counted exactly.
 */
export async function lockAddress(trx: Knex.Transaction, email: string): Promise<void> {
  await trx.raw("SELECT pg_advisory_xact_lock(hashtext('sign-up:' || ?))", [email]);
}

/** Sign-up mails sent to an address in the last hour: links for a new address, warnings for an existing one. */
export async function recentSignUpMails(trx: Knex.Transaction, email: string): Promise<number> {
  const [row] = await trx("email_outbox").where({ to: email }).whereIn("kind", ["sign-up", "sign-up-existing"])
    .where("created_at", ">", trx.raw("now() - interval '1 hour'")).count({ n: "*" });
  return Number(row.n);
}

export async function createSignUpRequest(trx: Knex.Transaction, input: {
  email: string; organisationName: string; name: string; passwordHash: string; roles: Role[]; tokenHash: string; expiresAt: Date;
}): Promise<string> {
  // Requests that expired a day ago are of no use to anyone: their password hashes go with them.
  await trx("sign_up_requests").where("expires_at", "<", trx.raw("now() - interval '1 day'")).delete();
  const [row] = await trx("sign_up_requests").insert({
    email: input.email, organisation_name: input.organisationName, name: input.name, password_hash: input.passwordHash,
    roles: rolesLiteral(trx, input.roles), token_hash: input.tokenHash, expires_at: input.expiresAt,
  }).returning("id");
  return row.id as string;
}

function toRequest(row: Record<string, unknown>): SignUpRequest {
  return {
    id: row.id as string, email: row.email as string, organisationName: row.organisation_name as string, name: row.name as string,
    passwordHash: (row.password_hash as string | null) ?? null, roles: parseRoles(row.roles), expiresAt: new Date(row.expires_at as string), usedAt: row.used_at ? new Date(row.used_at as string) : null,
  };
}

/** The request behind a link, for the page that shows what will be created. */
export async function findSignUpRequest(tokenHash: string): Promise<SignUpRequest | undefined> {
  const row = await db("sign_up_requests").where({ token_hash: tokenHash }).first();
  return row ? toRequest(row) : undefined;
}

export type SignUpClaim = { ok: true; request: SignUpRequest } | { ok: false; reason: "unknown" | "used" | "expired" };

/**
 * Claims a link inside the caller's transaction: a conditional update, so a second use (even a
 * simultaneous one) finds nothing to claim. The password hash leaves the row as it is claimed.
 */
export async function claimSignUpRequest(trx: Knex.Transaction, tokenHash: string): Promise<SignUpClaim> {
  const [before] = await trx("sign_up_requests").where({ token_hash: tokenHash }).whereNull("used_at").where("expires_at", ">", trx.fn.now()).forUpdate().select("*");
  if (!before) {
    const row = await trx("sign_up_requests").where({ token_hash: tokenHash }).first("used_at");
    return { ok: false, reason: !row ? "unknown" : row.used_at ? "used" : "expired" };
  }
  await trx("sign_up_requests").where({ id: before.id }).update({ used_at: trx.fn.now(), password_hash: null });
  return { ok: true, request: toRequest(before) };
}
