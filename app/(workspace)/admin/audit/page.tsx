import type { Metadata } from "next";
import Link from "next/link";
import { requireRole } from "@/app/_lib/auth";
import { forPage, refusable } from "@/app/_lib/page-access";
import { auditCursorText, listAuditEvents, parseAuditCursor, type AuditRow } from "@/db/queries/audit";
import { shortDateTime } from "@/components/ui/dates";
import { auditActionLabel, auditDetailWords } from "@/components/admin/audit-labels";
import { auditSubjectNames } from "@/db/queries/audit-subjects";

export const metadata: Metadata = { title: "Audit log" };

const PER_PAGE = 25;
const AUDIT_COUNT_LABEL = "10,000+";

type Search = { older?: string; newer?: string; oldest?: string };

async function AuditPage({ searchParams }: { searchParams: Promise<Search> }) {
  const user = await forPage(() => requireRole("admin"), "/admin/audit");
  const search = await searchParams;
  // Keyset pages: a long log costs the same on its last page as on its first.
  const older = parseAuditCursor(search.older);
  const newer = older ? undefined : parseAuditCursor(search.newer);
  const oldest = !older && !newer && search.oldest === "1";
  const { rows, total, totalCapped, hasOlder, hasNewer } = await listAuditEvents(user.organisationId, { limit: PER_PAGE, older, newer, oldest });
  const subjectNames = await auditSubjectNames(user.organisationId, rows.map((r) => r.subject));
  // An id the organisation no longer holds stays out of sight: the log says what it was about in words or not at all.
  const about = (row: AuditRow) => (row.subject ? subjectNames.get(row.subject) ?? (/^[0-9a-f-]{36}$/i.test(row.subject) ? "" : row.subject) : "");
  const describe = (row: AuditRow) => auditDetailWords(row.action, row.detail as Record<string, unknown> | null);
  const newerHref = rows.length > 0 ? `/admin/audit?newer=${auditCursorText(rows[0].cursor)}` : "/admin/audit";
  const olderHref = rows.length > 0 ? `/admin/audit?older=${auditCursorText(rows[rows.length - 1].cursor)}` : "/admin/audit";
  const counted = totalCapped ? `${AUDIT_COUNT_LABEL} events` : `${total.toLocaleString("en-US")} ${total === 1 ? "event" : "events"}`;
  return (
    <>
      <div className="flex flex-wrap items-baseline justify-between gap-2">
        <h1 className="text-2xl font-semibold">Audit log</h1>
        <Link href="/admin/members" className="text-sm text-accent-700 underline">Members</Link>
      </div>
      <p className="mt-1 text-sm text-slate-600">
        Sign-ins, invitations, role changes, reviews, approvals and holds in {user.organisationName}, newest first. Times are in the organisation&apos;s time zone.
      </p>
      {/* Phones get one card per event instead of a table that scrolls sideways. */}
      <ol className="mt-4 space-y-2 md:hidden" aria-label="Audit events">
        {rows.map((row) => (
          <li key={row.id} className="rounded-lg border border-slate-200 bg-white p-3 text-sm">
            <div className={`font-medium ${row.action === "sign-in-failed" ? "text-red-700" : ""}`}>{auditActionLabel(row.action)}</div>
            <div>{row.actorName ?? <span className="text-slate-500">not signed in</span>}{about(row) ? <span className="break-all text-slate-600"> · {about(row)}</span> : null}</div>
            {describe(row) ? <div className="text-slate-500">{describe(row)}</div> : null}
            <div className="text-xs text-slate-500">
              <time dateTime={row.at.toISOString()}>{shortDateTime(row.at, user.timeZone)}</time> · from <span className="font-mono">{row.ip ?? "unknown"}</span>
            </div>
          </li>
        ))}
        {rows.length === 0 ? <li className="px-3 py-6 text-center text-slate-500">Nothing recorded on this page.</li> : null}
      </ol>
      <div className="mt-4 hidden overflow-x-auto rounded-lg border border-slate-200 bg-white md:block">
        <table className="w-full min-w-[44rem] text-left text-sm">
          <thead className="bg-slate-50 text-slate-700">
            <tr>
              <th scope="col" className="px-3 py-2 font-medium">When</th>
              <th scope="col" className="px-3 py-2 font-medium">Who</th>
              <th scope="col" className="px-3 py-2 font-medium">What</th>
              <th scope="col" className="px-3 py-2 font-medium">About</th>
              <th scope="col" className="px-3 py-2 font-medium">From</th>
            </tr>
          </thead>
          <tbody className="divide-y divide-slate-200">
            {rows.map((row) => (
              <tr key={row.id} className="align-top">
                <td className="whitespace-nowrap px-3 py-2"><time dateTime={row.at.toISOString()}>{shortDateTime(row.at, user.timeZone)}</time></td>
                <td className="px-3 py-2">{row.actorName ?? <span className="text-slate-500">not signed in</span>}</td>
                <td className={`px-3 py-2 ${row.action === "sign-in-failed" ? "text-red-700" : ""}`}>{auditActionLabel(row.action)}</td>
                <td className="px-3 py-2">
                  <span className="break-all">{about(row)}</span>
                  {describe(row) ? <span className="block text-slate-500">{describe(row)}</span> : null}
                </td>
                <td className="px-3 py-2 font-mono text-xs">{row.ip ?? ""}</td>
              </tr>
            ))}
            {rows.length === 0 ? (
              <tr><td colSpan={5} className="px-3 py-6 text-center text-slate-500">Nothing recorded on this page.</td></tr>
            ) : null}
          </tbody>
        </table>
      </div>
      <nav aria-label="Audit log pages" className="mt-3 flex flex-wrap items-center gap-4 text-sm">
        {hasNewer ? <Link href="/admin/audit" className="text-accent-700 underline">Newest</Link> : <span className="text-slate-600">Newest</span>}
        {hasNewer ? <Link href={newerHref} className="text-accent-700 underline">← Newer</Link> : <span className="text-slate-600">← Newer</span>}
        <span>{counted}</span>
        {hasOlder ? <Link href={olderHref} className="text-accent-700 underline">Older →</Link> : <span className="text-slate-600">Older →</span>}
        {hasOlder ? <Link href="/admin/audit?oldest=1" className="text-accent-700 underline">Oldest</Link> : <span className="text-slate-600">Oldest</span>}
      </nav>
    </>
  );
}

// Its 404/403 with the words in the server HTML (app/_lib/page-access.tsx).
export default refusable(AuditPage);
