import { fieldLabel } from "@/components/design/fields";
import { ratioText } from "@/components/review/check-outcome";
import { calendarDateInWords, dateTimeInWords } from "@/components/ui/dates";
import type { Standing } from "@/app/_lib/review/standing";

/** Every submission of this revision and what was decided, with the approval record in full. */
export function ReviewHistory({ standing, revisionId, timeZone }: { standing: Standing; revisionId: string; timeZone: string }) {
  const when = (d: Date | null) => (d ? dateTimeInWords(d, timeZone) : "");
  const a = standing.approval;
  return (
    <section aria-labelledby="history-h" className="rounded-lg border border-slate-200 bg-white p-4">
      <h2 id="history-h" className="text-base font-semibold">Review record</h2>
      {a ? (
        <div className="mt-2 rounded-md border border-emerald-400 bg-emerald-50 p-3 text-sm">
          <p className="font-semibold">Approved for construction</p>
          <p>{a.engineerName}, licence {a.licenceNumber} ({a.licenceState}, valid through {calendarDateInWords(a.licenceExpiresOn)})</p>
          <p>{when(a.decidedAt)}</p>
          {a.overrides.length ? (
            <div className="mt-2 rounded border-2 border-red-600 bg-white p-2 text-red-950">
              <p className="font-semibold">Approved although {a.overrides.length === 1 ? "a check fails" : `${a.overrides.length} checks fail`}:</p>
              <ul className="mt-1 space-y-1">{a.overrides.map((o) => <li key={o.checkId}><strong>{o.title}</strong> (ratio {ratioText(o.ratio)}): {o.reason}</li>)}</ul>
            </div>
          ) : null}
          {a.letterFileKey ? <p><a className="underline" href={`/api/revisions/${revisionId}/letter`}>Signed letter</a></p> : null}
        </div>
      ) : null}
      {standing.reviews.length === 0 ? <p className="mt-2 text-sm text-slate-600">Not submitted for review yet.</p> : (
        <ol className="mt-2 space-y-3 text-sm">
          {standing.reviews.map((rv) => (
            <li key={rv.id} className="border-l-2 border-slate-200 pl-3">
              <p>Submitted by {rv.submittedByName} to {rv.engineerChosenName}, {when(rv.submittedAt)}</p>
              <p className="font-medium">
                {rv.decision === "approve" ? `Approved by ${rv.engineerName}` : rv.decision === "request_changes" ? `Changes requested by ${rv.engineerName}` : "Waiting for the engineer's decision"}
                {rv.decidedAt ? `, ${when(rv.decidedAt)}` : ""}
              </p>
              {rv.comments.length ? (
                <ul className="mt-1 space-y-1">
                  {rv.comments.map((c) => (
                    <li key={c.id} className="rounded bg-slate-50 p-2">
                      {c.fieldPath ? <a href={`#input-${c.fieldPath}`} className="mr-1 rounded bg-sky-100 px-1 text-xs text-sky-900 underline">{fieldLabel(c.fieldPath)}</a> : <span className="mr-1 text-xs text-slate-500">general</span>}
                      {c.body}
                    </li>
                  ))}
                </ul>
              ) : null}
            </li>
          ))}
        </ol>
      )}
    </section>
  );
}
