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
}): Promise<void> {
  await db("audit_events").insert({
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

/** One page of an organisation's audit log, newest first, with the total for paging. */
export async function listAuditEvents(organisationId: string, page: { offset: number; limit: number }): Promise<{ rows: AuditRow[]; total: number }> {
  const [rows, [count]] = await Promise.all([
    db("audit_events as a")
      .leftJoin("users as u", "u.id", "a.actor_user_id")
      .where("a.organisation_id", organisationId)
      .orderBy([{ column: "a.at", order: "desc" }, { column: "a.id", order: "desc" }])
      .offset(page.offset)
      .limit(page.limit)
      .select("a.id", "a.at", "a.action", "u.name as actorName", "u.email as actorEmail", "a.subject", "a.detail", "a.ip"),
    db("audit_events").where("organisation_id", organisationId).count({ n: "*" }),
  ]);
  return { rows, total: Number(count.n) };
}
