import type { Knex } from "knex";
import { db } from "../client";
import { isUuid } from "../ids";
import { preparedRows } from "../prepared";
import { parseRoles, type MemberRecord } from "./users";

/** Server-side session records (see the user_sessions migration). */
export interface SessionRow {
  id: string;
  createdAt: Date;
  lastSeenAt: Date;
  ip: string | null;
  userAgent: string | null;
}

export async function openSession(s: { userId: string; organisationId: string; ttlSeconds: number; ip: string | null; userAgent: string | null }): Promise<string> {
  const [row] = await db("user_sessions")
    .insert({
      user_id: s.userId, organisation_id: s.organisationId, ip: s.ip, user_agent: s.userAgent?.slice(0, 300) ?? null,
      expires_at: db.raw(`now() + make_interval(secs => ?)`, [s.ttlSeconds]),
    })
    .returning("id");
  return row.id;
}

/**
 * Every signed-in request's check in one statement: the session is open for this user (and marked
 * seen, skipped within a minute of the last touch, so a page making several requests writes at most
 * once) and they are an active member of the organisation (as `findActiveMember`). Undefined when
 * either fails. One round trip and one plan where every page paid two; the touch runs whether or
 * not the membership is still active.
 */
export async function openSessionMember(sessionId: string, userId: string, organisationId: string): Promise<MemberRecord | undefined> {
  if (!isUuid(sessionId) || !isUuid(userId) || !isUuid(organisationId)) return undefined;
  // Prepared (db/prepared.ts): every signed-in request runs it, and planning it cost more than
  // running it. Key lookups only, so PostgreSQL's own choice settles on the generic plan.
  const rows = await preparedRows<MemberRecord & { roles: unknown }>(
    `WITH s AS (
       SELECT id, last_seen_at < now() - interval '1 minute' AS stale FROM user_sessions
       WHERE id = ? AND user_id = ? AND ended_at IS NULL AND expires_at > now()
     ), touched AS (
       UPDATE user_sessions t SET last_seen_at = now() FROM s WHERE t.id = s.id AND s.stale RETURNING t.id
     )
     SELECT u.id AS "userId", u.email, u.name, o.id AS "organisationId", o.name AS "organisationName", m.roles,
            u.password_changed_at AS "passwordChangedAt", o.time_zone AS "timeZone"
     FROM s JOIN memberships m ON m.user_id = ? AND m.organisation_id = ? AND m.deactivated_at IS NULL
     JOIN users u ON u.id = m.user_id JOIN organisations o ON o.id = m.organisation_id
     LIMIT 1`,
    [sessionId, userId, userId, organisationId],
    { plan: "auto" },
  );
  const row = rows[0];
  return row ? { ...row, roles: parseRoles(row.roles) } : undefined;
}

export async function endSession(sessionId: string): Promise<void> {
  if (!isUuid(sessionId)) return;
  await db("user_sessions").where({ id: sessionId }).whereNull("ended_at").update({ ended_at: db.fn.now() });
}

/** Ends every open session of a user (sign out everywhere, password reset), or only those in one organisation (deactivation). */
export async function endSessionsOf(userId: string, options: { organisationId?: string; trx?: Knex.Transaction } = {}): Promise<number> {
  const q = (options.trx ?? db)("user_sessions").where({ user_id: userId }).whereNull("ended_at");
  if (options.organisationId) q.where({ organisation_id: options.organisationId });
  return q.update({ ended_at: db.fn.now() });
}

export async function activeSessions(userId: string): Promise<SessionRow[]> {
  return db("user_sessions")
    .where({ user_id: userId })
    .whereNull("ended_at")
    .where("expires_at", ">", db.fn.now())
    .orderBy("last_seen_at", "desc")
    .select("id", "created_at as createdAt", "last_seen_at as lastSeenAt", "ip", "user_agent as userAgent");
}
