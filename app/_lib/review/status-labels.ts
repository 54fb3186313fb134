import type { RevisionStatus } from "@/db/revision-status";

/** Client-safe status words (no database import). "Superseded" is derived, never stored. */
export type DisplayStatus = RevisionStatus | "superseded";

export const STATUS_LABELS: Record<DisplayStatus, string> = {
  draft: "Draft",
  in_review: "In review",
  approved: "Approved",
  changes_requested: "Changes requested",
  superseded: "Superseded",
};
