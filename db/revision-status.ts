/** A revision's review status; also the database enum `revision_status`. Client-safe (no database import). */
export const REVISION_STATUSES = ["draft", "in_review", "approved", "changes_requested"] as const;
export type RevisionStatus = (typeof REVISION_STATUSES)[number];

export const REVISION_STATUS_LABELS: Record<RevisionStatus, string> = {
  draft: "Draft",
  in_review: "In review",
  approved: "Approved",
  changes_requested: "Changes requested",
};
