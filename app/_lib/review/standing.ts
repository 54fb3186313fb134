import { STATUS_LABELS, type DisplayStatus } from "@/db/revision-status";
import { openHolds, type HoldRecord } from "@/db/queries/holds";
import { newerApprovedRevision, reviewsOfRevision, type ReviewRecord, type RevisionContext, type RevisionStatus } from "@/db/queries/reviews";

export { STATUS_LABELS, type DisplayStatus };

export function displayStatus(status: RevisionStatus, supersededBy: { number: number } | undefined): DisplayStatus {
  return status === "approved" && supersededBy ? "superseded" : status;
}

export interface Standing {
  status: DisplayStatus;
  label: string;
  supersededBy?: { id: string; number: number };
  reviews: ReviewRecord[];
  approval?: ReviewRecord;
  holds: HoldRecord[];
}

/** Where a revision stands: status (superseded derived), its reviews and approval, open holds on its design. */
export async function revisionStanding(ctx: RevisionContext): Promise<Standing> {
  const [supersededBy, reviews, holds] = await Promise.all([
    ctx.status === "approved" ? newerApprovedRevision(ctx.designId, ctx.number) : Promise.resolve(undefined),
    reviewsOfRevision(ctx.id),
    openHolds(ctx.designId),
  ]);
  const status = displayStatus(ctx.status, supersededBy);
  return { status, label: STATUS_LABELS[status], supersededBy, reviews, approval: reviews.find((r) => r.decision === "approve"), holds };
}
