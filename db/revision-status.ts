/**
 * A revision's review status — the database enum `revision_status` — with the one set of words for
 * it: the label on badges and lists, and the phrase used in sentences ("revision 3 is in review").
 * "Superseded" is derived (an approved revision with a newer approval), never stored.
 * Client-safe (no database import).
 */
export const REVISION_STATUSES = ["draft", "in_review", "approved", "changes_requested"] as const;
export type RevisionStatus = (typeof REVISION_STATUSES)[number];
export type DisplayStatus = RevisionStatus | "superseded";

export const STATUS_LABELS: Record<DisplayStatus, string> = {
  draft: "Draft",
  in_review: "In review",
  approved: "Approved",
  changes_requested: "Changes requested",
  superseded: "Superseded",
};

/** The stored statuses' labels (the same words). */
export const REVISION_STATUS_LABELS: Record<RevisionStatus, string> = STATUS_LABELS;

/** The status in a sentence: "revision 3 is {phrase}". */
export const STATUS_PHRASES: Record<DisplayStatus, string> = {
  draft: "a draft",
  in_review: "in review",
  approved: "approved",
  changes_requested: "marked changes requested",
  superseded: "superseded",
};
