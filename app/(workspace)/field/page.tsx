import type { Metadata } from "next";
import Link from "next/link";
import { requireUser } from "@/app/_lib/auth";
import { forPage, refusable } from "@/app/_lib/page-access";
import { tapeInches } from "@/components/format/tape";
import { readerUnits } from "@/app/_lib/unit-preference";
import { StatusBadge } from "@/components/review/status-badge";
import { Caution } from "@/components/ui/caution";
import { approvedSpecs, fieldCursorText, parseFieldCursor } from "@/db/queries/review-queue";
import { shortDate } from "@/components/ui/dates";

export const metadata: Metadata = { title: "Field specs" };

/** The crew's list: only approved revisions have a field spec; superseded ones say so. */
async function FieldSpecsPage({ searchParams }: { searchParams: Promise<Record<string, string | string[] | undefined>> }) {
  const user = await forPage(() => requireUser(), "/field");
  const older = (await searchParams).older;
  const specs = await approvedSpecs(user.organisationId, { older: parseFieldCursor(Array.isArray(older) ? older[0] : older) });
  const last = specs.at(-1);
  const units = await readerUnits();
  return (
    <div className="mx-auto max-w-3xl space-y-4">
      <h1 className="text-2xl font-semibold">Field specs</h1>
      <p className="text-sm text-slate-600">Only designs an engineer has approved appear here. Build from a current spec, never a superseded one.</p>
      {specs.length === 0 ? <p className="rounded-lg border border-slate-200 bg-white p-4 text-base">No design is approved for construction yet.</p> : (
        <ul className="space-y-3">
          {specs.map((s) => (
            <li key={s.revisionId}>
              <Link href={`/field/${s.revisionId}`} className={`block rounded-lg border bg-white p-4 hover:border-accent-600 ${s.superseded ? "border-slate-200 bg-slate-50" : "border-slate-300"}`}>
                <p className="text-lg font-semibold">{s.projectName}: {s.designName}</p>
                {s.projectAddress ? <p className="text-sm text-slate-600">{s.projectAddress}</p> : null}
                <p className="mt-1 flex flex-wrap items-center gap-2 text-sm">
                  Revision {s.number} <StatusBadge status={s.superseded ? "superseded" : "approved"} onHold={s.onHold} />
                  {s.approvedAt ? <span className="text-slate-600">approved {shortDate(s.approvedAt, user.timeZone)}</span> : null}
                </p>
                <p className="mt-1 text-base">{s.posts} holes, {tapeInches(s.diameterIn, units)} across × {tapeInches(s.depthIn, units)} deep</p>
              </Link>
            </li>
          ))}
        </ul>
      )}
      {specs.more && last?.approvedAt ? (
        <p className="text-base">
          <Link href={`/field?older=${encodeURIComponent(fieldCursorText({ approvedAt: last.approvedAt, designId: last.designId }))}`} className="font-medium text-accent-800 underline">Older specs</Link>
        </p>
      ) : null}
      <Caution />
    </div>
  );
}

// Its 404/403 with the words in the server HTML (app/_lib/page-access.tsx).
export default refusable(FieldSpecsPage);
