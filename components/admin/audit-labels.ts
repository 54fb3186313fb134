import { ROLE_LABELS, type Role } from "@/db/roles";

/**
 * What each audit action reads as in the audit log: one table, in words. An action this table does
 * not know yet is worded from its name ("design-held" → "Design held"), so no code ever shows.
 */
export const AUDIT_ACTION_LABELS: Record<string, string> = {
  "sign-in": "Signed in",
  "sign-out": "Signed out",
  "signed-out-everywhere": "Signed out on every device",
  "sign-in-failed": "Failed sign-in",
  "sign-in-attack-warned": "Warned the owner of many failed sign-ins",
  "sign-up": "Created the organisation",
  "sign-up-requested": "Asked to create an organisation (link e-mailed)",
  "sign-up-attempt-existing": "Sign-up tried with this account's address (owner e-mailed)",
  "invitation-sent": "Sent an invitation",
  "invitation-revoked": "Cancelled an invitation",
  "invitation-accepted": "Accepted an invitation",
  "role-changed": "Changed roles",
  "member-deactivated": "Deactivated a member",
  "member-reactivated": "Reactivated a member",
  "password-reset-requested": "Asked for a password reset link",
  "password-reset": "Set a new password by reset link",
  "licence-saved": "Saved an engineering licence",
  "licence-removed": "Removed an engineering licence",
  "revision-submitted": "Submitted a revision for review",
  "revision-approved": "Approved a revision",
  "revision-changes-requested": "Asked for changes to a revision",
  "approval-signature-failed": "Approval refused: wrong password",
  "design-held": "Design put on hold by an as-built hole",
  "hold-cleared": "Cleared a hold",
  "engagement-invited": "Engaged an outside engineer",
  "engagement-accepted": "Outside engineer accepted",
  "engagement-declined": "Outside engineer declined",
  "engagement-revoked": "Ended an outside engineer's engagement",
  "mail-failed": "An e-mail could not be delivered",
};

export function auditActionLabel(action: string): string {
  const known = AUDIT_ACTION_LABELS[action];
  if (known) return known;
  const words = action.replace(/[-_.]+/g, " ").trim();
  return words ? words[0].toUpperCase() + words.slice(1) : "Recorded event";
}

function roleWords(roles: unknown): string {
  return Array.isArray(roles) ? roles.map((r) => ROLE_LABELS[r as Role] ?? String(r)).join(", ") : "";
}

/** The detail of an event in words (roles by their names, states, notes); empty when there is nothing to add. */
export function auditDetailWords(action: string, detail: Record<string, unknown> | null): string {
  const d = detail ?? {};
  if (action === "role-changed" && Array.isArray(d.from) && Array.isArray(d.to)) return `${roleWords(d.from) || "no role"} → ${roleWords(d.to) || "no role"}`;
  if (Array.isArray(d.roles)) return `roles: ${roleWords(d.roles)}`;
  if (typeof d.note === "string" && d.note) return `note: ${d.note}`;
  if (typeof d.state === "string") return `state ${d.state}`;
  return "";
}
