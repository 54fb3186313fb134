import type { Knex } from "knex";
import { db } from "../client";
import type { Role } from "../roles";
import { isUniqueViolation } from "./organisations";
import { parseRoles, rolesLiteral } from "./users";
import { isUuid } from "../ids";

export interface InvitationView {
  id: string;
  organisationId: string;
  organisationName: string;
  email: string;
  roles: Role[];
  invitedByName: string;
  expiresAt: Date;
  acceptedAt: Date | null;
}

/**
 * Records an invitation; older unaccepted invitations for the same person and organisation stop
 * working. Pass the use case's transaction so its audit event and e-mail commit with it.
 */
export async function createInvitation(input: {
  organisationId: string;
  email: string;
  roles: Role[];
  tokenHash: string;
  invitedBy: string;
  expiresAt: Date;
}, outer?: Knex.Transaction): Promise<string> {
  const run = async (trx: Knex.Transaction) => {
    await trx("invitations")
      .where({ organisation_id: input.organisationId, email: input.email })
      .whereNull("accepted_at")
      .where("expires_at", ">", trx.fn.now())
      .update({ expires_at: trx.fn.now() });
    const [row] = await trx("invitations")
      .insert({
        organisation_id: input.organisationId,
        email: input.email,
        roles: rolesLiteral(trx, input.roles),
        token_hash: input.tokenHash,
        invited_by: input.invitedBy,
        expires_at: input.expiresAt,
      })
      .returning("id");
    return row.id as string;
  };
  return outer ? run(outer) : db.transaction(run);
}

function invitationQuery(knex: Knex | Knex.Transaction) {
  return knex("invitations as i")
    .join("organisations as o", "o.id", "i.organisation_id")
    .join("users as u", "u.id", "i.invited_by")
    .select(
      "i.id", "i.organisation_id as organisationId", "o.name as organisationName", "i.email", "i.roles",
      "u.name as invitedByName", "i.expires_at as expiresAt", "i.accepted_at as acceptedAt",
    );
}

export async function findInvitation(tokenHash: string): Promise<InvitationView | undefined> {
  const row = await invitationQuery(db).where("i.token_hash", tokenHash).first();
  return row ? { ...row, roles: parseRoles(row.roles) } : undefined;
}

/** Invitations not yet accepted and not expired, newest first. */
export async function listPendingInvitations(organisationId: string): Promise<InvitationView[]> {
  const rows = await invitationQuery(db)
    .where("i.organisation_id", organisationId)
    .whereNull("i.accepted_at")
    .where("i.expires_at", ">", db.fn.now())
    .orderBy("i.created_at", "desc");
  return rows.map((row) => ({ ...row, roles: parseRoles(row.roles) }));
}

export async function findInvitationById(id: string): Promise<InvitationView | undefined> {
  if (!isUuid(id)) return undefined;
  const row = await invitationQuery(db).where("i.id", id).first();
  return row ? { ...row, roles: parseRoles(row.roles) } : undefined;
}

/** Makes a pending invitation stop working now. */
export async function revokeInvitation(id: string, knex: Knex = db): Promise<void> {
  await knex("invitations").where("id", id).whereNull("accepted_at").update({ expires_at: knex.fn.now() });
}

export type AcceptResult =
  | { ok: true; userId: string; organisationId: string; email: string; roles: Role[] }
  | { ok: false; reason: "unknown" | "used" | "expired" | "email-in-use" };

/**
 * Accepts an invitation in one transaction: the token is claimed with a conditional update (so a
 * second use, even a simultaneous one, finds nothing to claim), then the user is created (new
 * person) or found (existing person, already verified by the caller), then the membership is made
 * or reactivated with the invited roles. Any failure rolls all of it back.
 */
export async function acceptInvitation(
  tokenHash: string,
  who: { newUser: { name: string; passwordHash: string } } | { existingUserId: string },
  /** Runs inside the transaction once accepted (the audit event), so both commit or neither does. */
  alongside?: (trx: Knex.Transaction, accepted: { userId: string; organisationId: string; email: string; roles: Role[] }) => Promise<void>,
): Promise<AcceptResult> {
  try {
    return await db.transaction(async (trx) => {
      const [claimed] = await trx("invitations")
        .where("token_hash", tokenHash)
        .whereNull("accepted_at")
        .where("expires_at", ">", trx.fn.now())
        .update({ accepted_at: trx.fn.now() })
        .returning(["organisation_id", "email", "roles"]);
      if (!claimed) {
        const row = await trx("invitations").where("token_hash", tokenHash).first("accepted_at");
        return { ok: false, reason: !row ? "unknown" : row.accepted_at ? "used" : "expired" } as const;
      }
      let userId: string;
      if ("newUser" in who) {
        const [user] = await trx("users")
          .insert({ email: claimed.email, name: who.newUser.name, password_hash: who.newUser.passwordHash })
          .returning("id");
        userId = user.id;
      } else {
        const user = await trx("users").where({ id: who.existingUserId, email: claimed.email }).first("id");
        if (!user) throw new Error("the signed-in person is not the invited e-mail");
        userId = user.id;
      }
      const roles = parseRoles(claimed.roles);
      await trx("memberships")
        .insert({ organisation_id: claimed.organisation_id, user_id: userId, roles: rolesLiteral(trx, roles) })
        .onConflict(["organisation_id", "user_id"])
        .merge({ roles: rolesLiteral(trx, roles), deactivated_at: null });
      const accepted = { userId, organisationId: claimed.organisation_id as string, email: claimed.email as string, roles };
      if (alongside) await alongside(trx, accepted);
      return { ok: true, ...accepted } as const;
    });
  } catch (error) {
    if (isUniqueViolation(error)) return { ok: false, reason: "email-in-use" };
    throw error;
  }
}
