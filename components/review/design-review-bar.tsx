import Link from "next/link";
import { openHolds } from "@/db/queries/holds";
import { newerApprovedRevision } from "@/db/queries/reviews";
import type { RevisionStatus } from "@/db/revision-status";
import type { ClearHoldAction } from "./clear-hold-form";
import { HoldBanner } from "./hold-banner";
import type { UnitSystem } from "@/components/format/quantity";

/**
 * The review side of a design screen: the hold banner (every screen of a held design shows it),
 * a superseded notice, and the ways to the review, the field spec and the calculation report.
 */
export async function DesignReviewBar({ designId, revisionId, number, status, clearAction, timeZone, units }: { designId: string; revisionId: string; number: number; status: RevisionStatus; clearAction?: ClearHoldAction; timeZone?: string; units?: UnitSystem }) {
  const [holds, newer] = await Promise.all([openHolds(designId), status === "approved" ? newerApprovedRevision(designId, number) : Promise.resolve(undefined)]);
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
