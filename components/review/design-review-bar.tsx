import Link from "next/link";
import { openHolds, type HoldRecord } from "@/db/queries/holds";
import { newerApprovedRevision } from "@/db/queries/reviews";
import type { RevisionStatus } from "@/db/revision-status";
import type { ClearHoldAction } from "./clear-hold-form";
import { HoldBanner } from "./hold-banner";
import type { UnitSystem } from "@/components/format/quantity";

export type DesignReviewReads = { holds: HoldRecord[]; newer: { id: string; number: number } | undefined };

/**
 * What the bar shows besides its props: the design's open holds and, for an approved revision, a
 * newer approved one. Read apart from the bar so the editor can read them beside its other reads
 * (one round trip fewer before the page is sent); only for a design the reader passed the check on.
 */
export async function designReviewReads(designId: string, revision: { status: RevisionStatus; number: number }): Promise<DesignReviewReads> {
  const [holds, newer] = await Promise.all([openHolds(designId), revision.status === "approved" ? newerApprovedRevision(designId, revision.number) : Promise.resolve(undefined)]);
  return { holds, newer };
}

/**
 * The review side of a design screen: the hold banner (every screen of a held design shows it),
 * a superseded notice, and the ways to the review, the field spec and the calculation report.
 */
export function DesignReviewBar({ reads: { holds, newer }, revisionId, status, clearAction, timeZone, units }: { reads: DesignReviewReads; revisionId: string; status: RevisionStatus; clearAction?: ClearHoldAction; timeZone?: string; units?: UnitSystem }) {
  const link = "rounded-md border border-slate-300 bg-white px-3 py-1.5 text-sm hover:bg-slate-50";
  return (
    <div className="mt-3 space-y-3">
      <HoldBanner holds={holds} clearAction={clearAction} timeZone={timeZone} units={units} />
      {newer ? <p role="status" className="rounded-md border border-slate-400 bg-slate-100 px-3 py-2 text-sm font-medium">Superseded: revision {newer.number} was approved after this one.</p> : null}
      <div className="no-print flex flex-wrap gap-2">
        <Link href={`/reviews/${revisionId}`} className={link}>
          {status === "draft" || status === "changes_requested" ? "Submit for review" : "Review record"}
        </Link>
        {status === "approved" ? <Link href={`/field/${revisionId}`} className={link}>Field spec</Link> : null}
        <a href={`/api/revisions/${revisionId}/report.pdf`} className={link}>Download calculation report (PDF)</a>
      </div>
    </div>
  );
}
