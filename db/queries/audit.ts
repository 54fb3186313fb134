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
