/**
 * Fresh account data for tests and access-matrix rows: members, invitations and reset links made
 * straight in the database (fast; the flows that make them for real are tested in tests/app/accounts-*.test.ts).
 */
import crypto from "node:crypto";
import { hashPassword } from "@/app/_lib/password";
import { hashToken } from "@/app/_lib/tokens";
import { db } from "@/db/client";
import { rolesLiteral } from "@/db/queries/users";
import type { Role } from "@/db/roles";
import { DEMO_ORG_ID } from "@/db/seeds/01_demo_accounts";

export const uniqueEmail = (label = "person") => `${label}-${crypto.randomUUID().slice(0, 8)}@example.test`;

let sharedHash: Promise<string> | undefined;
export const FRESH_PASSWORD = "fresh-member-password";

/** A new member of an organisation (the demo one unless told), with a known password. */
export async function freshMember(options: { roles?: Role[]; organisationId?: string; deactivated?: boolean; email?: string } = {}) {
  sharedHash ??= hashPassword(FRESH_PASSWORD);
  const email = options.email ?? uniqueEmail("member");
  const [user] = await db("users").insert({ email, name: `Test ${email.split("@")[0]}`, password_hash: await sharedHash }).returning("id");
  const [membership] = await db("memberships")
    .insert({
      organisation_id: options.organisationId ?? DEMO_ORG_ID,
      user_id: user.id,
      roles: rolesLiteral(db, options.roles ?? ["designer"]),
      deactivated_at: options.deactivated ? db.fn.now() : null,
    })
    .returning("id");
  return { userId: user.id as string, membershipId: membership.id as string, email };
}

export async function userId(email: string): Promise<string> {
  return (await db("users").where({ email }).first("id")).id;
}

/** An invitation as if an admin had sent it; returns the plain token that the e-mailed link would carry. */
export async function freshInvitation(options: { organisationId?: string; email?: string; roles?: Role[]; expiresAt?: Date } = {}) {
  const token = crypto.randomBytes(32).toString("base64url");
  const [row] = await db("invitations")
    .insert({
      organisation_id: options.organisationId ?? DEMO_ORG_ID,
      email: options.email ?? uniqueEmail("invitee"),
      roles: rolesLiteral(db, options.roles ?? ["installer"]),
      token_hash: hashToken(token),
      invited_by: await userId("admin@demo.pierwise.test"),
      expires_at: options.expiresAt ?? new Date(Date.now() + 86_400_000),
    })
    .returning(["id", "email"]);
  return { token, id: row.id as string, email: row.email as string };
}

/** A reset link for a person; returns the plain token. */
export async function freshReset(forUserId: string, expiresAt = new Date(Date.now() + 3_600_000)) {
  const token = crypto.randomBytes(32).toString("base64url");
  await db("password_resets").insert({ user_id: forUserId, token_hash: hashToken(token), expires_at: expiresAt });
  return token;
}

/** A sign-up waiting for its e-mailed link, as if the form had been sent; returns the plain token. */
export async function freshSignUp(options: { email?: string; expiresAt?: Date } = {}) {
  sharedHash ??= hashPassword(FRESH_PASSWORD);
  const token = crypto.randomBytes(32).toString("base64url");
  const email = options.email ?? uniqueEmail("founder");
  await db("sign_up_requests").insert({
    email, organisation_name: "Fresh Sign-up Co (invented)", name: "Fresh Founder", password_hash: await sharedHash,
    roles: rolesLiteral(db, ["admin", "designer"]), token_hash: hashToken(token), expires_at: options.expiresAt ?? new Date(Date.now() + 86_400_000),
  });
  return { token, email };
}
