import type { Knex } from "knex";
import { db } from "../client";

export type AuditAction =
  | "sign-in"
  | "sign-out"
  | "sign-in-failed"
  | "sign-up"
  | "invitation-sent"
  | "invitation-accepted"
  | "role-changed"
  | "member-deactivated"
  | "member-reactivated"
  | "password-reset-requested"
  | "password-reset"
  | (string & {});

export async function recordAudit(event: {
  organisationId?: string | null;
  actorUserId?: string | null;
  action: AuditAction;
  subject?: string | null;
  detail?: Record<string, unknown>;
  ip?: string | null;
}, trx: Knex = db): Promise<void> {
  // Pass the use case's transaction, so the event commits (or rolls back) with the change it records.
  await trx("audit_events").insert({
    organisation_id: event.organisationId ?? null,
    actor_user_id: event.actorUserId ?? null,
    action: event.action,
    subject: event.subject ?? null,
    detail: JSON.stringify(event.detail ?? {}),
    ip: event.ip ?? null,
  });
}

export interface AuditRow {
  id: string;
  at: Date;
  action: string;
  actorName: string | null;
  actorEmail: string | null;
  subject: string | null;
  detail: Record<string, unknown>;
  ip: string | null;
}

/** Where a keyset page starts: an event's time (microseconds since 1970, exact) and id. */
export interface AuditCursor {
  atMicros: string;
  id: string;
}

/** Counting stops here; the page then says "10,000+ events" instead of counting a long log. */
export const AUDIT_COUNT_CAP = 10_000;

/** "1733100000000000.123" from a URL; anything else is no cursor (never an error). */
export function parseAuditCursor(text: string | undefined): AuditCursor | undefined {
  const match = /^(\d{1,18})\.(\d{1,18})$/.exec(text ?? "");
  return match ? { atMicros: match[1], id: match[2] } : undefined;
}

export const auditCursorText = (c: AuditCursor) => `${c.atMicros}.${c.id}`;

export interface AuditPage {
  rows: (AuditRow & { cursor: AuditCursor })[];
  /** Events in the organisation's log, counted up to AUDIT_COUNT_CAP + 1. */
  total: number;
  totalCapped: boolean;
  hasOlder: boolean;
  hasNewer: boolean;
}

/**
 * One page of an organisation's audit log, newest first. Pages by keyset on (at, id), served by the
 * (organisation_id, at, id) index from either end, so the oldest page costs what the newest does:
 * `older` = the events after that cursor in newest-first order, `newer` = the ones before it,
 * `oldest` = the last page. `offset` is kept for callers that page by number (it reads what it skips).
 */
export async function listAuditEvents(
  organisationId: string,
  page: { limit: number; offset?: number; older?: AuditCursor; newer?: AuditCursor; oldest?: boolean },
): Promise<AuditPage> {
  const at = (c: AuditCursor) => db.raw("(timestamptz 'epoch' + ?::bigint * interval '1 microsecond')", [c.atMicros]);
  const ascending = Boolean(page.newer || page.oldest);
  const q = db("audit_events as a")
    .leftJoin("users as u", "u.id", "a.actor_user_id")
    .where("a.organisation_id", organisationId)
    .orderBy([{ column: "a.at", order: ascending ? "asc" : "desc" }, { column: "a.id", order: ascending ? "asc" : "desc" }])
    .limit(page.limit + 1)
    .select("a.id", "a.at", "a.action", "u.name as actorName", "u.email as actorEmail", "a.subject", "a.detail", "a.ip",
      db.raw(`(extract(epoch from a.at) * 1000000)::bigint::text as "atMicros"`));
  if (page.older) q.whereRaw("(a.at, a.id) < (?, ?)", [at(page.older), page.older.id]);
  if (page.newer) q.whereRaw("(a.at, a.id) > (?, ?)", [at(page.newer), page.newer.id]);
  if (page.offset && !page.older && !page.newer && !page.oldest) q.offset(page.offset);
  // Ordered by the index's own columns so the count is an index-only scan, not a bitmap heap scan.
  const counted = db.from(db("audit_events").where("organisation_id", organisationId).orderBy([{ column: "at", order: "desc" }, { column: "id", order: "desc" }])
    .limit(AUDIT_COUNT_CAP + 1).select("id").as("c")).count({ n: "*" });
  const [fetched, [count]] = await Promise.all([q, counted]);
  const more = fetched.length > page.limit;
  const shown = fetched.slice(0, page.limit);
  if (ascending) shown.reverse();
  const rows = shown.map(({ atMicros, ...row }) => ({ ...row, id: String(row.id), cursor: { atMicros, id: String(row.id) } })) as AuditPage["rows"];
  const total = Number(count.n);
  return {
    rows, total, totalCapped: total > AUDIT_COUNT_CAP,
    hasOlder: ascending ? Boolean(page.newer) : more,
    hasNewer: ascending ? more : Boolean(page.older) || Boolean(page.offset),
  };
}
