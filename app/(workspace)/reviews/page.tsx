import type { Metadata } from "next";
import Link from "next/link";
import { hasRole, requireUser } from "@/app/_lib/auth";
import { forPage, refusable } from "@/app/_lib/page-access";
import { displayStatus } from "@/app/_lib/review/standing";
import { StatusBadge } from "@/components/review/status-badge";
import { Caution } from "@/components/ui/caution";
import { readerUnits } from "@/app/_lib/unit-preference";
import { composedIn } from "@/components/format/quantity-text";
import { dateInWords, shortDate } from "@/components/ui/dates";
import { openHoldsWithCount } from "@/db/queries/holds";
import { reviewLists, type QueueRow } from "@/db/queries/review-queue";

export const metadata: Metadata = { title: "Reviews" };

async function ReviewsPage() {
  const user = await forPage(() => requireUser(), "/reviews");
  const units = await readerUnits();
  const engineer = hasRole(user, "engineer");
  // Each list shows its first rows; the counts say how many there are in all. Two statements: the
  // open holds with their count, and the three review lists with the waiting count.
  const [openHolds, lists] = await Promise.all([
    engineer ? openHoldsWithCount(user.organisationId) : Promise.resolve({ rows: [], total: 0 }),
    reviewLists(user.organisationId, user.userId, { engineer, designer: hasRole(user, "designer") }),
  ]);
  const { rows: holds, total: holdCount } = openHolds;
  const { waiting, waitingTotal: waitingCount, waitingCapped, mine, decided } = lists;
  // The count stops at 1,000 (WAITING_COUNT_CAP): "1,000+" beyond.
  const waitingText = `${waitingCount.toLocaleString("en-US")}${waitingCapped ? "+" : ""}`;
  return (
    <div className="space-y-6">
      <h1 className="text-2xl font-semibold">Reviews</h1>
      {holds.length ? (
        <section aria-labelledby="holds-h" className="rounded-lg border-2 border-red-600 bg-red-50 p-4 text-red-950">
          <h2 id="holds-h" className="text-base font-semibold">On hold: the crew is waiting for an engineer ({holdCount > holds.length ? `oldest ${holds.length} of ${holdCount.toLocaleString("en-US")}` : holds.length})</h2>
          <ul className="mt-2 divide-y divide-red-200">
            {holds.map((h) => (
              <li key={h.id} className="py-2 text-sm">
                {h.revisionId ? <Link href={`/reviews/${h.revisionId}`} className="font-medium underline">{h.designName}, revision {h.number}</Link> : <span className="font-medium">{h.designName}</span>}
                <span> · {h.projectName}</span>
                <p>{composedIn(h.reason, units)}</p>
                <p className="text-xs">Raised by {h.raisedByName} on {dateInWords(h.raisedAt, user.timeZone)}</p>
              </li>
            ))}
          </ul>
        </section>
      ) : null}
      {waiting ? (
        <QueueTable timeZone={user.timeZone} title="Waiting for your review" rows={waiting} total={waitingCount} totalText={waitingText} empty="Nothing is waiting for your review." show="submitted"
          more={{ href: "/queue?state=waiting", label: `All ${waitingText} waiting, in your review queue` }} />
      ) : null}
      {mine ? <QueueTable timeZone={user.timeZone} title="Submitted by you" rows={mine} empty="You have not submitted a revision yet. Open a design and submit its newest revision for review." show="engineer" /> : null}
      <QueueTable timeZone={user.timeZone} title="Recent decisions in your organisation" rows={decided} empty="No review has been decided yet." show="decided" />
      <Caution />
    </div>
  );
}


function QueueTable({ title, rows, total, totalText, more, empty, show, timeZone }: {
  title: string; rows: QueueRow[]; total?: number; totalText?: string; more?: { href: string; label: string }; empty: string; show: "submitted" | "engineer" | "decided"; timeZone?: string;
}) {
  const when = (d: Date | null) => shortDate(d, timeZone);
  const id = title.toLowerCase().replace(/\W+/g, "-");
  return (
    <section aria-labelledby={id} className="rounded-lg border border-slate-200 bg-white p-4">
      <h2 id={id} className="text-base font-semibold">{title} ({total !== undefined && total > rows.length ? `first ${rows.length} of ${totalText ?? total.toLocaleString("en-US")}` : rows.length})</h2>
      {rows.length === 0 ? <p className="mt-1 text-sm text-slate-600">{empty}</p> : (
        <ul className="mt-2 divide-y divide-slate-100">
          {rows.map((r, i) => (
            <li key={`${r.revisionId}-${i}`} className="flex flex-wrap items-center justify-between gap-2 py-2 text-sm">
              <div>
                <Link href={`/reviews/${r.revisionId}`} className="font-medium text-accent-800 underline">{r.designName}, revision {r.number}</Link>
                <p className="text-xs text-slate-600">
                  {r.projectName} ({r.projectState}) ·{" "}
                  {show === "submitted" ? `submitted by ${r.submittedByName} on ${when(r.submittedAt)}` : show === "engineer" ? `to ${r.engineerName} on ${when(r.submittedAt)}` : `${r.engineerName}, ${when(r.decidedAt)}`}
                </p>
              </div>
              <StatusBadge status={displayStatus(r.status, r.superseded ? { number: 0 } : undefined)} onHold={r.onHold} />
            </li>
          ))}
        </ul>
      )}
      {more && total !== undefined && total > rows.length ? <p className="mt-2 text-sm"><Link href={more.href} className="font-medium text-accent-800 underline">{more.label}</Link></p> : null}
    </section>
  );
}

// Its 404/403 with the words in the server HTML (app/_lib/page-access.tsx).
export default refusable(ReviewsPage);
