import type { Metadata } from "next";
import Link from "next/link";
import QRCode from "qrcode";
import { hasRole, requireUser } from "@/app/_lib/auth";
import { env } from "@/app/_lib/env";
import { forPage, refusable } from "@/app/_lib/page-access";
import { bearing } from "@/app/_lib/review/field-format";
import { readerUnits } from "@/app/_lib/unit-preference";
import { formatBags, formatPipeSize, formatQuantity } from "@/components/format/quantity";
import { composedIn, sayIn, storedIn } from "@/components/format/quantity-text";
import { tapeInches, tapeLength } from "@/components/format/tape";
import { UnitsSwitch } from "@/components/format/units-switch";
import { checkOutcome } from "@/components/review/check-outcome";
import { calendarDateInWords, dateInWords, dateTimeInWords } from "@/components/ui/dates";
import { fmt } from "@/app/_lib/review/report-model";
import { verifyUrl } from "@/app/_lib/review/verify";
import { CheckSummary } from "@/components/review/check-summary";
import { holdsOfRevision } from "@/db/queries/holds";
import { revisionStanding } from "@/app/_lib/review/standing";
import { ownedRevision } from "@/app/_lib/review/workflow";
import { HoldBanner } from "@/components/review/hold-banner";
import { clearHoldAction } from "@/app/(workspace)/reviews/[revisionId]/actions";
import { StatusBadge } from "@/components/review/status-badge";
import { Caution } from "@/components/ui/caution";
import { SITE_CAUTION_TEXTS } from "@/engine/notices";
import { asBuiltEntries } from "@/db/queries/as-built";
import { pourFromAsBuilt } from "@/app/_lib/review/as-dug";
import { AsBuiltForm } from "./_components/as-built-form";
import { AsBuiltLog } from "./_components/as-built-log";
import { Checklist } from "./_components/checklist";
import { checklistTicks } from "@/db/queries/field-checklist";
import { FIELD_CHECKLIST } from "@/engine/field-checklist";
import { LaserCuts } from "./_components/laser-cuts";
import { PrintButton } from "./_components/print-button";

export const metadata: Metadata = { title: "Field spec" };


async function FieldSpecPage({ params }: { params: Promise<{ revisionId: string }> }) {
  const { revisionId } = await params;
  const { user, ctx } = await forPage(async () => {
    const user = await requireUser();
    return { user, ctx: await ownedRevision(user, revisionId) };
  }, `/field/${revisionId}`);
  const standing = await revisionStanding(ctx);
  const units = await readerUnits();
  const quarterIn = (inches: number) => tapeInches(inches, units);
  const ftIn = (inches: number) => tapeLength(inches, units);
  const q = (v: number, kind: Parameters<typeof formatQuantity>[1]) => formatQuantity(v, kind, units);

  if (ctx.status !== "approved") {
    return (
      <div className="mx-auto max-w-2xl space-y-4">
        <section role="alert" className="rounded-lg border-2 border-red-600 bg-red-50 p-5 text-red-950">
          <h1 className="text-2xl font-bold">Not approved for construction</h1>
          <p className="mt-2 text-base">
            Revision {ctx.number} of {ctx.designName} ({ctx.projectName}) is <strong>{standing.label.toLowerCase()}</strong>. Do not dig, pour or set posts from it.
            Only a revision an engineer has approved has a field spec.
          </p>
          <p className="mt-3"><Link href="/field" className="font-medium underline">See the approved field specs</Link></p>
        </section>
        <Caution />
      </div>
    );
  }

  const r = ctx.result;
  const a = standing.approval;
  // The QR code and short link open the public approval check, so an inspector can confirm on the
  // spot that this is the approved, current revision.
  const url = a?.verifyCode ? verifyUrl(a.verifyCode) : `${env.appUrl}/field/${ctx.id}`;
  const qr = await QRCode.toString(url, { type: "svg", margin: 0, errorCorrectionLevel: "M" });
  const [entries, holds, ticks] = await Promise.all([asBuiltEntries(ctx.id), holdsOfRevision(ctx.id), checklistTicks(ctx.id)]);
  const checklist = FIELD_CHECKLIST.map((item) => {
    const tick = ticks.find((t) => t.itemKey === item.key);
    const byline = tick ? `${tick.ticked ? "Ticked" : "Unticked"} by ${tick.tickedByName}, ${dateTimeInWords(tick.tickedAt, ctx.timeZone)}` : null;
    return { key: item.key, label: item.label, ticked: tick?.ticked ?? false, byline };
  });
  const cleared = holds.filter((h) => h.clearedAt);
  const x0 = r.geometry.posts[0]?.xFt ?? 0;
  const positions = new Map(r.geometry.posts.map((p) => [p.id, (p.xFt - x0) * 12]));
  const tilts = ctx.result.input.array.tiltSettingsDeg;
  // Revisions saved before the azimuth input carry none: say nothing rather than guess.
  const azimuthDeg = ctx.result.input.array.azimuthDeg as number | undefined;
  const big = "text-2xl font-bold tabular-nums";
  // Results saved before these were added carry none: show nothing rather than guess.
  const tiltSettings = (r.field.tiltSettings ?? []) as NonNullable<typeof r.field.tiltSettings>;
  const spec = r.concrete.specification as typeof r.concrete.specification | undefined;
  const asDug = pourFromAsBuilt(r, entries);

  return (
    <div className="field-spec mx-auto max-w-3xl space-y-4">
      <style>{`@page { size: letter; margin: 10mm; } @media print { .field-spec { font-size: 11px; } .field-spec section { break-inside: avoid; padding: 6px !important; } }`}</style>
      {standing.supersededBy ? (
        <section role="alert" className="rounded-lg border-2 border-slate-800 bg-slate-900 p-4 text-white">
          <p className="text-lg font-bold">SUPERSEDED: build from revision {standing.supersededBy.number} instead.</p>
          <Link href={`/field/${standing.supersededBy.id}`} className="no-print mt-1 inline-block underline">Open the field spec of revision {standing.supersededBy.number}</Link>
        </section>
      ) : null}
      <HoldBanner holds={standing.holds} timeZone={ctx.timeZone} units={units} clearAction={hasRole(user, "engineer") ? clearHoldAction : undefined} />

      {/* Safety and the preliminary-sizing caution come first, before the job details and any number: above the fold on a phone and on printed page 1. */}
      <Caution />
      <section aria-labelledby="safety-h" className="safety-box rounded-lg border-2 border-amber-400 bg-amber-50 p-4 text-amber-950">
        <h2 id="safety-h" className="text-lg font-semibold">Safety</h2>
        <ul className="mt-2 list-disc space-y-1 pl-5 text-base">{SITE_CAUTION_TEXTS.map((c, i) => <li key={i}>{sayIn(c, units)}</li>)}</ul>
      </section>
      <div className="flex items-start justify-between gap-4">
        <div>
          <p className="text-sm text-slate-600">{ctx.projectName}{ctx.projectAddress ? ` · ${ctx.projectAddress}` : ""}</p>
          <h1 className="text-2xl font-semibold">{ctx.designName}</h1>
          <p className="mt-1 flex flex-wrap items-center gap-2 text-sm">Revision {ctx.number} <StatusBadge status={standing.status} onHold={standing.holds.length > 0} /></p>
          {a ? <p className="text-sm text-slate-700">Approved for construction by {a.engineerName}, licence {a.licenceNumber} ({a.licenceState}, valid through {calendarDateInWords(a.licenceExpiresOn)}), {dateInWords(a.decidedAt, ctx.timeZone)}</p> : null}
        </div>
        <figure className="w-24 shrink-0 text-center">
          <div aria-hidden="true" dangerouslySetInnerHTML={{ __html: qr }} />
          <figcaption className="mt-1 text-[10px] leading-tight">Inspector: scan to check this approval</figcaption>
        </figure>
      </div>
      {a?.verifyCode ? <p className="text-sm">Approval check: <a className="break-all font-mono underline" href={url}>{url}</a></p> : null}
      <CheckSummary outcome={checkOutcome(r)} overrides={a?.overrides ?? []} units={units} />
      {cleared.length ? (
        <section aria-labelledby="cleared-h" className="rounded-lg border-2 border-sky-600 bg-sky-50 p-4 text-sky-950">
          <h2 id="cleared-h" className="text-lg font-semibold">Engineer&apos;s instructions after a hold</h2>
          <ul className="mt-2 space-y-2 text-base">
            {cleared.map((h) => (
              <li key={h.id}>
                <p className="font-semibold">{h.clearNote}</p>
                <p className="text-sm">Hold cleared by {h.clearedByName} on {dateTimeInWords(h.clearedAt, ctx.timeZone)}. The hold was: {composedIn(h.reason, units)}</p>
              </li>
            ))}
          </ul>
        </section>
      ) : null}
      <div className="no-print flex flex-wrap items-center gap-2">
        <UnitsSwitch units={units} />
        <PrintButton />
        <a href={`/api/revisions/${ctx.id}/report.pdf`} className="rounded-md border border-slate-300 bg-white px-4 py-3 text-base">Calculation report (PDF)</a>
      </div>

      <section aria-labelledby="holes-h" className="rounded-lg border-2 border-accent-700 bg-white p-4">
        <h2 id="holes-h" className="text-lg font-semibold">Every hole</h2>
        <div className="mt-2 grid grid-cols-2 gap-3">
          <div><p className="text-sm text-slate-600">Diameter</p><p className={big}>{quarterIn(r.footing.diameterIn)}</p></div>
          <div><p className="text-sm text-slate-600">Depth (at least)</p><p className={big}>{quarterIn(r.footing.depthIn)}</p>{units === "imperial" ? <p className="text-sm">{ftIn(r.footing.depthIn)}</p> : null}</div>
          <div><p className="text-sm text-slate-600">Post</p><p className="text-lg font-semibold">{formatPipeSize(r.footing.post.size, units)}, {r.field.posts.length} posts</p></div>
          <div><p className="text-sm text-slate-600">Tilt setting</p><p className={big}>{fmt(r.geometry.tiltDeg)}°</p>{tilts && tilts.length > 1 && tiltSettings.length === 0 ? <p className="text-sm">Seasonal settings: {tilts.join("°, ")}°</p> : null}{azimuthDeg !== undefined ? <p className="text-base font-semibold">Modules face {bearing(azimuthDeg)}</p> : null}</div>
          <div className="col-span-2"><p className="text-sm text-slate-600">Lowest panel edge above grade (hold at least)</p><p className={big}>{quarterIn(r.geometry.minClearanceIn)}</p></div>
        </div>
        {tiltSettings.length > 1 ? (
          <div className="mt-3">
            <h3 className="text-base font-semibold">Tilt settings the rack is used at</h3>
            <p className="text-sm text-slate-600">Posts are set for the steepest setting ({fmt(tiltSettings[tiltSettings.length - 1].tiltDeg)}°); the footing is sized for the worst of them.</p>
            <table className="mt-1 w-full text-base">
              <thead><tr className="text-left text-sm text-slate-600"><th className="py-1 pr-3 font-medium">Setting</th><th className="py-1 pr-3 font-medium">Lowest edge above grade</th><th className="py-1 font-medium">Closest to the ground</th></tr></thead>
              <tbody>
                {tiltSettings.map((t) => (
                  <tr key={t.tiltDeg} className="border-t border-slate-200"><td className="py-1 pr-3 font-semibold tabular-nums">{fmt(t.tiltDeg)}°</td><td className="py-1 pr-3 tabular-nums">{ftIn(t.lowestEdgeIn)}</td><td className="py-1 tabular-nums">{ftIn(t.minClearanceIn)}</td></tr>
                ))}
              </tbody>
            </table>
          </div>
        ) : null}
      </section>

      <section aria-labelledby="posts-h" className="rounded-lg border border-slate-200 bg-white p-4">
        <h2 id="posts-h" className="text-lg font-semibold">Posts</h2>
        <p className="text-sm text-slate-600">Positions measured along the row from post {r.field.posts[0]?.id}. Post length = above grade + below grade.</p>
        <ul className="mt-2 grid gap-3 sm:grid-cols-2">
          {r.field.posts.map((p) => (
            <li key={p.id} className="rounded-md border border-slate-300 p-3">
              <p className="text-lg font-bold">Post {p.id}</p>
              <dl className="mt-1 grid grid-cols-[auto_1fr] gap-x-3 text-base">
                <dt className="text-slate-600">Position</dt><dd className="font-semibold">{p.id === r.field.posts[0]?.id ? "Start: measure the others from here" : `${ftIn(positions.get(p.id) ?? 0)} from ${r.field.posts[0]?.id}`}</dd>
                <dt className="text-slate-600">Hole</dt><dd className="font-semibold">{quarterIn(r.footing.diameterIn)} × {quarterIn(p.embedmentIn)} deep</dd>
                <dt className="text-slate-600">Above grade</dt><dd className="font-semibold">{ftIn(p.heightAboveGradeIn)}</dd>
                <dt className="text-slate-600">Below grade</dt><dd className="font-semibold">{ftIn(p.embedmentIn)}</dd>
                <dt className="text-slate-600">Cut post to</dt><dd className="font-semibold">{ftIn(p.postLengthIn)}</dd>
              </dl>
            </li>
          ))}
        </ul>
        <p className="mt-2 text-sm text-slate-600">{r.field.note}</p>
      </section>

      <section aria-labelledby="concrete-h" className="rounded-lg border border-slate-200 bg-white p-4">
        <h2 id="concrete-h" className="text-lg font-semibold">Concrete to order</h2>
        <p className="mt-1 text-base"><strong className="text-xl">{q(r.concrete.job.orderYd3, "yd3")}</strong> ready-mix (the holes take {q(r.concrete.job.totalYd3, "yd3")}; with {fmt(r.concrete.job.wasteAllowancePct, 0)}% waste {q(r.concrete.job.withWasteYd3, "yd3")}, ordered up to the next {units === "imperial" ? "¼ yd³" : q(0.25, "yd3")})</p>
        <p className="text-base">or <strong>{formatBags(r.concrete.job.bags80Lb, 80, units)}</strong> premix ({formatBags(r.concrete.job.bags60Lb, 60, units)})</p>
        <p className="text-sm text-slate-600">About {q(r.concrete.perHole.volumeFt3, "ft3")} and {formatBags(r.concrete.perHole.bags80Lb, 80, units)} per hole.</p>
        {asDug ? (
          <div className="mt-3 rounded-md border-2 border-accent-700 p-3">
            <h3 className="text-base font-semibold">For the holes as dug</h3>
            <p className="text-base"><strong className="text-xl">{q(asDug.concrete.orderYd3, "yd3")}</strong> ready-mix (designed: {q(r.concrete.job.orderYd3, "yd3")}), or <strong>{formatBags(asDug.concrete.bags80Lb, 80, units)}</strong> (designed: {r.concrete.job.bags80Lb})</p>
            <p className="text-sm text-slate-600">The holes take {q(asDug.concrete.totalYd3, "yd3")} less the posts; with {fmt(asDug.concrete.wasteAllowancePct, 0)}% waste {q(asDug.concrete.withWasteYd3, "yd3")}. {asDug.loggedPostIds.length} of {r.field.posts.length} holes from the as-built log; the rest at the designed size.</p>
            <table className="mt-1 w-full text-sm">
              <thead><tr className="text-left text-slate-600"><th className="py-1 pr-2 font-medium">Hole</th><th className="py-1 pr-2 font-medium">As dug</th><th className="py-1 pr-2 font-medium">Concrete</th><th className="py-1 font-medium">Weight</th></tr></thead>
              <tbody>
                {asDug.concrete.holes.map((h) => (
                  <tr key={h.postId} className="border-t border-slate-200">
                    <td className="py-1 pr-2 font-semibold">{h.postId}</td>
                    <td className="py-1 pr-2 tabular-nums">{quarterIn(h.diameterIn)} × {quarterIn(h.depthIn)}{asDug.loggedPostIds.includes(h.postId) ? "" : " (designed)"}</td>
                    <td className="py-1 pr-2 tabular-nums">{q(h.concreteFt3, "ft3")} ({formatBags(h.bags80Lb, 80, units)})</td>
                    <td className="py-1 tabular-nums">{formatQuantity(h.weightLb, "lbMass", units, { decimals: 0, metricDecimals: 0 })}</td>
                  </tr>
                ))}
              </tbody>
            </table>
          </div>
        ) : null}
        {spec ? (
          <div className="mt-3">
            <h3 className="text-base font-semibold">Mix to order</h3>
            <p className="text-base">Strength <strong>{formatQuantity(spec.compressiveStrengthPsi, "psi", units)}</strong> at 28 days · largest stone <strong>{formatQuantity(spec.maxAggregateIn, "in", units, { decimals: 2 })}</strong> · slump <strong>{formatQuantity(spec.slumpIn, "in", units, { decimals: 2 })}</strong></p>
            <p className="text-sm text-slate-600">Never weaker than {formatQuantity(spec.codeMinimumPsi, "psi", units)}, the code minimum for concrete around posts.</p>
            {spec.coldWeather.length ? (
              <div className="mt-2 rounded-md border border-sky-300 bg-sky-50 p-2 text-sky-950">
                <p className="font-semibold">Cold site: the ground here freezes</p>
                <ul className="list-disc pl-5 text-sm">{spec.coldWeather.map((c) => <li key={c}>{storedIn(c, units)}</li>)}</ul>
              </div>
            ) : null}
          </div>
        ) : null}
      </section>

      <section aria-labelledby="check-h" className="rounded-lg border border-slate-200 bg-white p-4">
        <h2 id="check-h" className="text-lg font-semibold">Checklist</h2>
        <div className="mt-2"><Checklist revisionId={ctx.id} items={checklist} canTick={hasRole(user, "installer", "engineer")} /></div>
      </section>


      <LaserCuts postIds={r.field.posts.map((p) => p.id)} units={units} />

      <section aria-labelledby="asbuilt-h" className="no-print rounded-lg border border-slate-200 bg-white p-4">
        <h2 id="asbuilt-h" className="text-lg font-semibold">As-built log</h2>
        {hasRole(user, "installer", "engineer") ? (
          <div className="mt-2"><AsBuiltForm revisionId={ctx.id} postIds={r.field.posts.map((p) => p.id)} diameterIn={r.footing.diameterIn} depthIn={r.footing.depthIn} units={units} /></div>
        ) : <p className="mt-1 text-sm text-slate-600">The crew (installer role) records each hole here.</p>}
        <AsBuiltLog entries={entries} holds={holds} timeZone={ctx.timeZone} depthIn={r.footing.depthIn} diameterIn={r.footing.diameterIn} units={units} />
      </section>
    </div>
  );
}

// Its 404/403 with the words in the server HTML (app/_lib/page-access.tsx).
export default refusable(FieldSpecPage);
