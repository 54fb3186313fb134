"use client";

import { memo } from "react";
import { bagSize, formatBags, formatFootingSize, formatPipeSize, formatQuantity, type UnitKind, type UnitSystem } from "@/components/format/quantity";
import { checkTitleIn, storedIn, warningIn } from "@/components/format/quantity-text";
import type { DesignResult } from "@/engine";
import { UtilisationBar } from "./utilisation-bar";
import { ScrollRegion } from "@/components/ui/scroll-region";

/** Everything the engine answers, in the order a designer reads it: the footing, its checks, concrete, loads, options, warnings. */
const CHECK_UNITS: Record<string, UnitKind> = { lb: "lb", "lb-ft": "lbFt", "kip-ft": "kipFt", in: "in", psf: "psf", ft: "ft" };
const CHECK_NAMES: Record<string, string> = { lateral: "lateral embedment", uplift: "uplift", frost: "frost and minimum depth" };

function Section({ title, children, id }: { title: string; children: React.ReactNode; id: string }) {
  return (
    <section aria-labelledby={id} className="rounded-lg border border-slate-200 bg-white p-3">
      <h3 id={id} className="mb-2 text-sm font-semibold text-slate-900">{title}</h3>
      {children}
    </section>
  );
}

const th = "px-2 py-1 text-left text-xs font-semibold text-slate-600 whitespace-nowrap";
const td = "px-2 py-1 tabular-nums whitespace-nowrap";
/** A post's continuous-beam reaction ÷ its tributary share (results saved before it was added have none). */
const fmtFactor = (f: number | undefined) => (f === undefined ? "—" : `${f.toFixed(3)} ×`);

export function FootingHeadline({ result, units }: { result: DesignResult; units: UnitSystem }) {
  const f = result.footing;
  const failing = f.checks.filter((c) => !c.pass);
  return (
    <div className={`rounded-lg border p-3 ${f.pass ? "border-accent-600 bg-accent-50" : "border-red-300 bg-red-50"}`}>
      <p className="text-xs font-medium tracking-wide text-slate-600 uppercase">Footing, each of {result.geometry.posts.length} holes</p>
      <p className="text-xl font-semibold text-slate-900" data-testid="footing-spec">
        {formatFootingSize(f.diameterIn, f.depthIn, units)}
      </p>
      <p className={`text-sm ${f.pass ? "text-accent-900" : "font-semibold text-red-800"}`}>
        {f.pass ? "Passes every check." : `Fails: ${failing.map((c) => checkTitleIn(c, units).toLowerCase()).join("; ")}.`}{" "}
        <span className="font-normal text-slate-700">Depth set by {CHECK_NAMES[f.controllingCheck] ?? f.controllingCheck}{f.diameterMode === "auto" ? "; hole size chosen for you" : ""}.</span>
      </p>
    </div>
  );
}

/**
 * The checks follow `result` at once (they say whether the footing passes); the tables below them
 * follow `detailResult`, which the editor hands over as a deferred value: React renders them after
 * the keystroke's frame, in slices that yield to the next keystroke, and skips them while a
 * re-render brings the same deferred result (ResultDetails is memoised).
 */
export function ResultsPanel({ result, detailResult = result, units }: { result: DesignResult; detailResult?: DesignResult; units: UnitSystem }) {
  return (
    <div className="space-y-3">
      <FootingChecks result={result} units={units} />
      <ResultDetails result={detailResult} units={units} />
    </div>
  );
}

function FootingChecks({ result, units }: { result: DesignResult; units: UnitSystem }) {
  const f = result.footing;
  const q = (v: number | null | undefined, k: UnitKind, d?: number) => formatQuantity(v, k, units, d === undefined ? {} : { decimals: d });
  return (
    <Section title="Footing checks" id="res-checks">
      <ul className="divide-y divide-slate-100">
        {f.checks.map((c) => {
          const k = CHECK_UNITS[c.unit] ?? "none";
          return (
            <li key={c.id} className="py-1.5">
              <div className="flex flex-wrap items-center justify-between gap-x-3 gap-y-1">
                <span className="text-sm text-slate-800">{checkTitleIn(c, units)}</span>
                <UtilisationBar ratio={c.ratio} />
              </div>
              <p className="text-xs text-slate-500">{q(c.demand, k)} needed of {q(c.capacity, k)} available{c.governing ? ` · post ${c.governing.postId}, ${c.governing.combination}` : ""}</p>
            </li>
          );
        })}
      </ul>
      {f.suggestedPipeSize && f.suggestedPipeSize !== result.input.posts.pipeSize ? <p className="mt-2 text-xs text-slate-700">Smallest standard pipe that carries the bending: {formatPipeSize(f.suggestedPipeSize, units)}.</p> : null}
    </Section>
  );
}

const ResultDetails = memo(function ResultDetails({ result, units }: { result: DesignResult; units: UnitSystem }) {
  const f = result.footing;
  const govIdx = result.governingLoads.moment.windCase;
  const gov = govIdx >= 0 ? result.wind.cases[govIdx] : null;
  const q = (v: number | null | undefined, k: UnitKind, d?: number) => formatQuantity(v, k, units, d === undefined ? {} : { decimals: d });
  return (
    <>
      <Section title="Concrete order" id="res-concrete">
        <dl className="grid grid-cols-2 gap-x-4 gap-y-1 text-sm">
          <dt className="text-slate-600">Per hole</dt><dd className="tabular-nums">{q(result.concrete.perHole.volumeFt3, "ft3")} · {formatBags(result.concrete.perHole.bags80Lb, 80, units)}</dd>
          <dt className="text-slate-600">{result.concrete.job.holes} holes + {result.concrete.job.wasteAllowancePct}% waste</dt><dd className="tabular-nums">{q(result.concrete.job.withWasteYd3, "yd3")}</dd>
          <dt className="font-medium text-slate-800">Order ready-mix</dt><dd className="font-semibold tabular-nums">{q(result.concrete.job.orderYd3, "yd3")}</dd>
          <dt className="text-slate-600">or bagged premix</dt><dd className="tabular-nums">{formatBags(result.concrete.job.bags80Lb, 80, units)} · {formatBags(result.concrete.job.bags60Lb, 60, units)}</dd>
        </dl>
      </Section>

      <Section title="Wind" id="res-wind">
        <p className="text-sm text-slate-700">
          qh = {q(result.wind.velocity.qzWithKdPsf, "psf")} at mean height {q(result.geometry.meanHeightFt, "ft")} (ASCE {result.wind.edition}).
          {gov ? <> Governing case for bending: <strong>{gov.label}</strong>.</> : null}
        </p>
        <ScrollRegion label="Wind cases table" className="mt-2">
          <table className="min-w-full text-sm">
            <thead><tr><th className={th}>Case</th><th className={th}>CN wind / lee</th><th className={th}>Net force</th><th className={th}>Sideways</th><th className={th}></th></tr></thead>
            <tbody>
              {result.wind.cases.map((c, i) => (
                <tr key={c.label} className={i === govIdx ? "bg-amber-50" : ""}>
                  <td className={td}>{c.label}</td>
                  <td className={td}>{c.cnWindward.toFixed(2)} / {c.cnLeeward.toFixed(2)}</td>
                  <td className={td}>{q(c.normalForceLb, "lb")}</td>
                  <td className={td}>{q(c.horizontalLb, "lb")}</td>
                  <td className={`${td} text-xs font-semibold text-amber-900`}>{i === govIdx ? "governs" : ""}</td>
                </tr>
              ))}
            </tbody>
          </table>
        </ScrollRegion>
      </Section>

      <Section title="Loads on each post (ASD, worst combination)" id="res-posts">
        <ScrollRegion label="Loads on each post table">
          <table className="min-w-full text-sm">
            <thead><tr><th className={th}>Post</th><th className={th}>Tilt</th><th className={th}>Beam reaction factor</th><th className={th}>Shear</th><th className={th}>Moment at grade</th><th className={th}>Wind uplift (0.6W, before dead load)</th><th className={th}>Down</th></tr></thead>
            <tbody>
              {result.postLoads.map((p) => {
                const max = (get: (r: (typeof p.combinations)[number]) => number) => Math.max(...p.combinations.map((r) => Math.abs(get(r))));
                return (
                  <tr key={`${p.postId}-${p.tiltDeg}`}>
                    <td className={td}>{p.postId}</td>
                    <td className={td}>{p.tiltDeg}°</td>
                    <td className={td}>{fmtFactor(result.geometry.posts.find((g) => g.id === p.postId)?.reactionFactor)}</td>
                    <td className={td}>{q(max((r) => r.shearLb), "lb")}</td>
                    <td className={td}>{q(max((r) => r.momentAtGradeLbFt), "lbFt")}</td>
                    <td className={td}>{q(max((r) => r.windUpliftLb), "lb")}</td>
                    <td className={td}>{q(max((r) => r.downwardLb), "lb")}</td>
                  </tr>
                );
              })}
            </tbody>
          </table>
        </ScrollRegion>
      </Section>

      <Section title="Hole diameter options" id="res-sweep">
        <ScrollRegion label="Hole diameter options table">
          <table className="min-w-full text-sm">
            <thead><tr><th className={th}>Hole</th><th className={th}>Depth</th><th className={th}>Set by</th><th className={th}>Concrete / hole</th><th className={th}>Job order</th><th className={th}>Checks</th></tr></thead>
            <tbody>
              {result.options.diameterSweep.map((r) => (
                <tr key={r.diameterIn} className={r.diameterIn === f.diameterIn ? "bg-accent-50" : ""}>
                  <td className={td}>{q(r.diameterIn, "in", 0)}{r.diameterIn === f.diameterIn ? " (chosen)" : ""}</td>
                  <td className={td}>{q(r.depthIn, "in")}</td>
                  <td className={td}>{CHECK_NAMES[r.controllingCheck] ?? r.controllingCheck}</td>
                  <td className={td}>{q(r.volumeFt3PerHole, "ft3")} · {r.bags80LbPerHole} × {bagSize(80, units)}</td>
                  <td className={td}>{q(r.jobOrderYd3, "yd3")}</td>
                  <td className={`${td} ${r.allChecksPass ? "" : "font-semibold text-red-700"}`}>{r.allChecksPass ? "pass" : !r.fitsPost ? "hole too small" : !r.bearingPass ? "bearing fails" : "fails"}</td>
                </tr>
              ))}
            </tbody>
          </table>
        </ScrollRegion>
      </Section>

      {result.options.tiltEnvelope ? (
        <Section title="Tilt settings" id="res-tilt">
          <table className="min-w-full text-sm">
            <thead><tr><th className={th}>Tilt</th><th className={th}>Depth needed</th><th className={th}>Set by</th><th className={th}>Moment at grade</th></tr></thead>
            <tbody>
              {result.options.tiltEnvelope.rows.map((r) => (
                <tr key={r.tiltDeg} className={r.tiltDeg === result.options.tiltEnvelope!.governingTiltDeg ? "bg-amber-50" : ""}>
                  <td className={td}>{r.tiltDeg}°{r.tiltDeg === result.options.tiltEnvelope!.governingTiltDeg ? " (governs)" : ""}</td>
                  <td className={td}>{q(r.requiredDepthIn, "in")}</td>
                  <td className={td}>{CHECK_NAMES[r.controllingCheck] ?? r.controllingCheck}</td>
                  <td className={td}>{q(r.maxMomentAtGradeLbFt, "lbFt")}</td>
                </tr>
              ))}
            </tbody>
          </table>
        </Section>
      ) : <p className="px-1 text-xs text-slate-500">One fixed tilt: add allowed tilt settings under Array to see the tilt envelope.</p>}

      <Section title={`Warnings (${result.warnings.length})`} id="res-warnings">
        {result.warnings.length === 0 ? <p className="text-sm text-slate-600">None: every method limit is respected.</p> : (
          <ul className="space-y-1 text-sm">
            {result.warnings.map((w) => (
              <li key={w.code + w.message} className={w.severity === "warning" ? "text-amber-900" : "text-slate-700"}>
                <span className="font-semibold">{w.severity === "warning" ? "Warning" : "Note"}:</span> {warningIn(w, units)}
              </li>
            ))}
          </ul>
        )}
      </Section>

      <details className="rounded-lg border border-slate-200 bg-white p-3 text-xs text-slate-600">
        <summary className="cursor-pointer font-medium text-slate-800">Method and references</summary>
        <p className="mt-2">{result.methodNote}</p>
        <ul className="mt-1 list-disc pl-4">{result.references.sections.map((s) => <li key={s}>{storedIn(s, units)}</li>)}</ul>
        <p className="mt-1">Engine {result.engineVersion}</p>
      </details>
    </>
  );
});
