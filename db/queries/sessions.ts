import type { Knex } from "knex";
import { db } from "../client";
import { isUuid } from "../ids";

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
 * Whether the session is open for this user, marking it seen. The touch is skipped within a
 * minute of the last one, so a page that makes several requests writes at most once.
 */
export async function sessionIsOpen(sessionId: string, userId: string): Promise<boolean> {
  if (!isUuid(sessionId)) return false;
  const row = await db("user_sessions")
    .where({ id: sessionId, user_id: userId })
    .whereNull("ended_at")
    .where("expires_at", ">", db.fn.now())
    .first("id", db.raw("last_seen_at < now() - interval '1 minute' as stale"));
  if (!row) return false;
  if (row.stale) await db("user_sessions").where({ id: sessionId }).update({ last_seen_at: db.fn.now() });
  return true;
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
