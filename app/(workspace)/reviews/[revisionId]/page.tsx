import type { Metadata } from "next";
import Link from "next/link";
import { hasRole, isOutsider, requireUser } from "@/app/_lib/auth";
import { forPage, refusable } from "@/app/_lib/page-access";
import { checkOutcome, outcomeIn, overridesIn } from "@/components/review/check-outcome";
import { readerUnits } from "@/app/_lib/unit-preference";
import { formatQuantity } from "@/components/format/quantity";
import { warningIn } from "@/components/format/quantity-text";
import { UnitsSwitch } from "@/components/format/units-switch";
import { dateInWords } from "@/components/ui/dates";
import { engineerEligibility, licenceEligibility } from "@/app/_lib/review/eligibility";
import { checksTable, concreteLines, criteriaTable, fmt, governingLines, loadsTable, methodLines, windTable } from "@/app/_lib/review/report-model";
import { revisionStanding } from "@/app/_lib/review/standing";
import { ownedRevision } from "@/app/_lib/review/workflow";
import { fieldLabel } from "@/components/design/fields";
import { criteriaDifferences } from "@/components/design/criteria-differences";
import { inputValueText } from "@/components/design/input-values";
import { flatten as flatInputs, inputChanges } from "@/components/design/revision-diff";
import { CheckSummary } from "@/components/review/check-summary";
import { HoldBanner } from "@/components/review/hold-banner";
import { clearHoldAction } from "./actions";
import { PlainTable, rowCount } from "@/components/review/plain-table";
import { ChecksList } from "@/components/review/checks-list";
import { FootingPerPost } from "@/components/review/footing-per-post";
import { groupNotice, reviewInputGroups } from "@/components/review/review-inputs";
import { ReviewPreview } from "@/components/review/review-preview";
import { StatusBadge } from "@/components/review/status-badge";
import { Caution } from "@/components/ui/caution";
import type { DesignInput } from "@/engine";
import { listProjectFiles } from "@/db/queries/project-files";
import { organisationEngineers } from "@/db/queries/review-people";
import { engagedEngineers } from "@/db/queries/engagements";
import { lastReviewed, lastReviewedBy } from "@/db/queries/review-queue";
import { reviewsOfRevision } from "@/db/queries/reviews";
import { DecisionPanel } from "./_components/decision-form";
import { ReviewHistory } from "./_components/review-history";
import { SubmitPanel, type EngineerChoice } from "./_components/submit-form";

export const metadata: Metadata = { title: "Review" };

/** Member engineers and outside engineers engaged on the project, each once, named with their firm when outside. */
async function engineerChoices(organisationId: string, projectId: string) {
  const members = await organisationEngineers(organisationId);
  const outside = (await engagedEngineers(projectId)).filter((e) => !members.some((m) => m.userId === e.userId));
  return [...members, ...outside.map((e) => ({ userId: e.userId, name: `${e.name} (outside engineer${e.firmName ? `, ${e.firmName}` : ""})` }))];
}

async function ReviewPage({ params }: { params: Promise<{ revisionId: string }> }) {
  const { revisionId } = await params;
  const { user, ctx } = await forPage(async () => {
    const user = await requireUser();
    return { user, ctx: await ownedRevision(user, revisionId, { engaged: true }) };
  }, `/reviews/${revisionId}`);
  // An engaged outside engineer reads and reviews here; submitting stays with the contractor's designers.
  const outsider = isOutsider(user, ctx);
  const standing = await revisionStanding(ctx);
  const r = ctx.result;
  const isEngineer = hasRole(user, "engineer");
  const canSubmit = !outsider && hasRole(user, "designer") && (ctx.status === "draft" || ctx.status === "changes_requested");
  const canDecide = isEngineer && ctx.status === "in_review";
  const [files, previous, engineers, eligibility] = await Promise.all([
    listProjectFiles(ctx.projectId, { pageSize: 50 }),
    isEngineer ? lastReviewedBy(ctx.designId, ctx.number, user.userId) : lastReviewed(ctx.designId, ctx.number),
    canSubmit ? engineerChoices(user.organisationId, ctx.projectId) : Promise.resolve([]),
    canDecide ? licenceEligibility(user.userId, ctx.projectState) : Promise.resolve(null),
  ]);
  const choices: EngineerChoice[] = await Promise.all(
    engineers.filter((e) => e.userId !== user.userId).map(async (e) => {
      const ok = await engineerEligibility(e.userId, e.name, ctx.projectState);
      return { userId: e.userId, name: e.name, eligible: ok.ok, note: ok.ok ? `${ok.licence.state} licence ${ok.licence.licenceNumber}, valid to ${ok.licence.expiresOn}` : ok.message };
    }),
  );
  const previousComments = previous ? (await reviewsOfRevision(previous.id)).flatMap((rv) => rv.comments) : [];
  const changes = previous ? inputChanges(previous.input as DesignInput, ctx.input as DesignInput) : [];
  const pinned = new Map<string, string[]>();
  for (const rv of standing.reviews) for (const c of rv.comments) if (c.fieldPath) pinned.set(c.fieldPath, [...(pinned.get(c.fieldPath) ?? []), c.body]);
  const inputs = Object.entries(flatInputs(ctx.input));
  const offCard = criteriaDifferences(ctx.input, ctx.criteria?.values);
  const units = await readerUnits();
  const groups = reviewInputGroups(ctx.input, { changed: changes.map((c) => c.path), offCard, pinned }, units);
  const offCardRows = groups.flatMap((g) => g.rows.filter((row) => row.cardValue !== null));
  // Check titles in the reader's units for every panel below (the hole-size check names a length).
  const outcome = outcomeIn(checkOutcome(r), units);
  const criteria = criteriaTable(ctx, units);

  // Reading order, top to bottom on a phone: summary, what differs from the card, what changed,
  // the checks, the inputs; the long tables after, folded with their row counts; the decision last
  // on a phone (beside everything on a wide screen), reachable from the link at the top.
  return (
    <div className="space-y-6">
      <div className="space-y-2">
        <p className="text-sm text-slate-600">{outsider ? <Link href="/queue" className="underline">Review queue</Link> : <Link href="/reviews" className="underline">Reviews</Link>} · {ctx.projectName} ({ctx.projectState})</p>
        <h1 className="text-2xl font-semibold">{ctx.designName}: revision {ctx.number}</h1>
        <CheckSummary outcome={outcome} overrides={standing.approval?.overrides ?? []} units={units}
          lead={outcome.failing.length && ctx.status !== "approved" ? "A failing check can still be submitted and approved, but only with the engineer's written reason for each one." : undefined} />
        <div className="flex flex-wrap items-center gap-3 text-sm">
          <span>Status:</span> <StatusBadge status={standing.status} onHold={standing.holds.length > 0} />
          {/* One sentence, so a phone never starts a line with a lone "·". */}
          <span className="text-slate-600">saved by {ctx.authorName ?? "unknown"} on {dateInWords(ctx.createdAt, ctx.timeZone)}{ctx.factsPinned ? "; the project name and address are shown as they were at approval" : ""}</span>
        </div>
        <div className="no-print flex flex-wrap items-center gap-2 text-sm">
          <UnitsSwitch units={units} />
          {canDecide ? <a href="#decide-h" className="rounded-md bg-accent-700 px-3 py-2 font-medium text-white hover:bg-accent-800 lg:hidden">Go to your decision</a> : null}
          {canSubmit ? <a href="#submit-h" className="rounded-md bg-accent-700 px-3 py-2 font-medium text-white hover:bg-accent-800 lg:hidden">Go to submit</a> : null}
          <a href={`/api/revisions/${ctx.id}/report.pdf`} className="rounded-md bg-accent-700 px-3 py-2 font-medium text-white hover:bg-accent-800">Download calculation report (PDF)</a>
          <Link href={`/projects/${ctx.projectId}/designs/${ctx.designId}`} className="rounded-md border border-slate-300 px-3 py-2 hover:bg-slate-50">Open the design</Link>
          {ctx.status === "approved" ? <Link href={`/field/${ctx.id}`} className="rounded-md border border-slate-300 px-3 py-2 hover:bg-slate-50">Field spec for the crew</Link> : null}
        </div>
        {standing.supersededBy ? (
          <p role="status" className="rounded-md border border-slate-400 bg-slate-100 p-3 text-sm font-medium">
            Superseded: revision {standing.supersededBy.number} was approved after this one. <Link className="underline" href={`/reviews/${standing.supersededBy.id}`}>Open revision {standing.supersededBy.number}</Link>.
          </p>
        ) : null}
      </div>
      <HoldBanner holds={standing.holds} timeZone={ctx.timeZone} units={units} clearAction={isEngineer ? clearHoldAction : undefined} />
      <Caution />

      <div className="grid grid-cols-[minmax(0,1fr)] gap-6 lg:grid-cols-[minmax(0,1fr)_22rem]">
        <div className="min-w-0 space-y-6">
          <FootingPerPost posts={r.field.posts} diameterIn={r.footing.diameterIn} units={units} />

          <section aria-labelledby="card-diff-h" className={`rounded-lg border p-4 ${offCardRows.length ? "border-orange-300 bg-orange-50" : "border-slate-200 bg-white"}`}>
            <h2 id="card-diff-h" className="text-base font-semibold">
              {!ctx.criteria ? "No criteria card" : offCardRows.length ? `Differs from the criteria card (${offCardRows.length})` : "Matches the criteria card"}
            </h2>
            {!ctx.criteria ? <p className="mt-1 text-sm text-slate-700">No criteria card is applied to this project: every site value below was entered by the designer.</p>
              : offCardRows.length === 0 ? <p className="mt-1 text-sm text-slate-700">Every site value is the {ctx.criteria.jurisdiction} card&apos;s.</p> : (
              <ul className="mt-2 space-y-1 text-sm">
                {offCardRows.map((row) => (
                  <li key={row.path} className="flex flex-wrap gap-x-2"><a href={`#input-${row.path}`} className="font-medium underline">{row.label}</a> <strong>{row.value}</strong> <span className="rounded bg-orange-100 px-1 text-orange-950">card says {row.cardValue}</span></li>
                ))}
              </ul>
            )}
          </section>

          <section aria-labelledby="diff-h" className="rounded-lg border border-slate-200 bg-white p-4">
            <h2 id="diff-h" className="text-base font-semibold">{previous ? `Changes since revision ${previous.number}${isEngineer ? ", the last one you reviewed" : ", the last one reviewed"}` : "Changes since the last review"}</h2>
            {!previous ? <p className="mt-1 text-sm text-slate-600">No earlier revision of this design was reviewed{isEngineer ? " by you" : ""}: every input below is new to the review.</p> : changes.length === 0 ? <p className="mt-1 text-sm text-slate-600">No input changed.</p> : (
              <ul className="mt-2 space-y-1 text-sm">
                {changes.map((c) => <li key={c.path}><span className="font-medium">{c.label}</span>: {inputValueText(c.path, c.from, units)} → <strong>{inputValueText(c.path, c.to, units)}</strong></li>)}
              </ul>
            )}
            {previousComments.length ? (
              <div className="mt-3 text-sm">
                <p className="font-medium">Comments made on revision {previous!.number}:</p>
                <ul className="mt-1 space-y-1">{previousComments.map((c) => <li key={c.id} className="rounded bg-slate-50 p-2">{c.fieldPath ? <span className="mr-1 rounded bg-sky-100 px-1 text-xs text-sky-900">{fieldLabel(c.fieldPath)}</span> : null}{c.body}</li>)}</ul>
              </div>
            ) : null}
          </section>

          <ChecksList id="checks-h" table={checksTable(r, units)} />
          <section aria-labelledby="gov-h" className="rounded-lg border border-slate-200 bg-white p-4">
            <h2 id="gov-h" className="text-base font-semibold">Governing loads</h2>
            <ul className="mt-2 space-y-1 text-sm">{governingLines(r, units).map((g) => <li key={g}>{g}</li>)}</ul>
          </section>

          <section aria-labelledby="inputs-h" className="rounded-lg border border-slate-200 bg-white p-4">
            <h2 id="inputs-h" className="text-base font-semibold">Every input</h2>
            <p className="mt-1 text-xs text-slate-600">Grouped as in the editor. A group with an input off the card, changed or commented on is open.</p>
            {groups.map((g) => {
              const notice = groupNotice(g);
              return (
                <details key={g.title} open={Boolean(notice)} data-rows={g.rows.length} className="mt-3 border-t border-slate-100 pt-2">
                  <summary className="cursor-pointer text-sm font-semibold">
                    <h3 className="inline">{g.title}</h3> <span className="font-normal text-slate-600">({rowCount(g.rows.length, "input")}{notice ? `; ${notice}` : ""})</span>
                  </summary>
                  <dl className="mt-2 grid gap-x-6 text-sm sm:grid-cols-2">
                    {g.rows.map((row) => (
                      <div key={row.path} id={`input-${row.path}`} className={`flex flex-wrap justify-between gap-x-3 border-b border-slate-100 py-1 ${row.changed ? "bg-amber-50" : ""}`}>
                        <dt className="text-slate-700">{row.label}</dt>
                        <dd className="font-medium tabular-nums">{row.value}{row.changed ? <span className="ml-1 text-xs font-normal text-amber-800">(changed)</span> : null}</dd>
                        {row.cardValue !== null ? <dd className="w-full rounded bg-orange-100 px-2 py-1 text-xs font-medium text-orange-950">Differs from the criteria card: card says {row.cardValue}</dd> : null}
                        {row.comments.map((body, i) => <dd key={i} className="w-full rounded bg-sky-50 px-2 py-1 text-xs text-sky-950">Comment: {body}</dd>)}
                      </div>
                    ))}
                  </dl>
                </details>
              );
            })}
          </section>

          <section aria-labelledby="warn-h" className="rounded-lg border border-slate-200 bg-white p-4">
            <h2 id="warn-h" className="text-base font-semibold">Warnings ({r.warnings.length})</h2>
            {r.warnings.length === 0 ? <p className="mt-1 text-sm text-slate-600">None: no method limit is crossed.</p> : (
              <ul className="mt-2 space-y-1 text-sm">{r.warnings.map((w) => <li key={w.code + w.message}><strong className="uppercase">{w.severity}:</strong> {warningIn(w, units)}</li>)}</ul>
            )}
          </section>
          <PlainTable id="criteria-h" table={criteria} numericFrom={99} collapsed noun="criterion" plural="criteria" />
          <PlainTable id="wind-h" table={windTable(r, units)} collapsed noun="wind case" />
          <PlainTable id="loads-h" table={loadsTable(r, units)} numericFrom={2} collapsed />
          <section aria-labelledby="conc-h" className="rounded-lg border border-slate-200 bg-white p-4">
            <h2 id="conc-h" className="text-base font-semibold">Concrete and field dimensions</h2>
            <ul className="mt-2 space-y-1 text-sm">
              {concreteLines(r, units).map((c) => <li key={c}>{c}</li>)}
              <li>Lowest-edge clearance {formatQuantity(r.geometry.minClearanceIn, "in", units)} at {fmt(r.geometry.tiltDeg)}° tilt; post lengths under “Footing at each post”</li>
            </ul>
          </section>
          <section aria-labelledby="method-h" className="rounded-lg border border-slate-200 bg-white p-4">
            <h2 id="method-h" className="text-base font-semibold">Method, editions and sections</h2>
            <details className="mt-1">
              <summary className="cursor-pointer text-sm font-medium text-accent-800 hover:underline">Show the method ({rowCount(methodLines(r, units).length, "line")})</summary>
              <ul className="mt-2 list-disc space-y-1 pl-5 text-sm">{methodLines(r, units).map((m) => <li key={m}>{m}</li>)}</ul>
            </details>
          </section>
          <section aria-labelledby="files-h" className="rounded-lg border border-slate-200 bg-white p-4">
            <h2 id="files-h" className="text-base font-semibold">Uploads: soil report, photos ({files.total})</h2>
            {files.rows.length === 0 ? <p className="mt-1 text-sm text-slate-600">No files uploaded to this project.</p> : (
              <ul className="mt-2 grid gap-3 sm:grid-cols-2">
                {files.rows.map((f) => (
                  <li key={f.id} className="flex items-center gap-3 text-sm">
                    {f.thumbnailKey ? (
                      // eslint-disable-next-line @next/next/no-img-element
                      <img src={`/api/projects/${ctx.projectId}/files/${f.id}?variant=thumbnail`} alt={f.description || f.originalName} className="h-14 w-14 rounded object-cover" />
                    ) : <span className="flex h-14 w-14 items-center justify-center rounded bg-slate-100 text-xs">{f.kind === "document" ? "DOC" : "FILE"}</span>}
                    <span><a className="underline" href={`/api/projects/${ctx.projectId}/files/${f.id}`}>{f.originalName}</a><br /><span className="text-xs text-slate-600">{f.description}</span></span>
                  </li>
                ))}
              </ul>
            )}
          </section>
          <ReviewPreview input={ctx.input as DesignInput} result={r} units={units} />
        </div>

        <aside className="min-w-0 space-y-4">
          {isEngineer ? (
            <DecisionPanel open={canDecide} revisionId={ctx.id} failing={outcome.failing} inputs={inputs.map(([path]) => ({ path, label: fieldLabel(path) }))}
              licenceProblem={eligibility && !eligibility.ok ? eligibility.message : null}
              licenceNote={eligibility?.ok ? `Recorded with your name, ${eligibility.licence.state} licence ${eligibility.licence.licenceNumber} (valid through ${eligibility.licence.expiresOn}), the time and the project facts as they stand now. Approval pins this revision: it can never be changed.` : "Only an engineer licensed in the project's state can decide."} />
          ) : null}
          {!outsider && hasRole(user, "designer") ? <SubmitPanel open={canSubmit} resubmit={ctx.status === "changes_requested"} revisionId={ctx.id} engineers={choices} outcome={outcome} units={units} /> : null}
          <ReviewHistory standing={standing.approval ? { ...standing, approval: { ...standing.approval, overrides: overridesIn(standing.approval.overrides, units) } } : standing} revisionId={ctx.id} timeZone={ctx.timeZone} />
        </aside>
      </div>
    </div>
  );
}

// Its 404/403 with the words in the server HTML (app/_lib/page-access.tsx).
export default refusable(ReviewPage);
