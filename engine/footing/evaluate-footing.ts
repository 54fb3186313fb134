/**
 * Size (or check) one hole diameter: the depth each check needs, the design depth (largest need,
 * rounded up to the practical increment, or the given depth), and every check at that depth.
 *
 * Depth-setting checks: lateral (IBC §1807.3.2.1/.2), uplift, frost and minimum 12 in
 * (IBC §1809.4–1809.5). Diameter checks: bearing (Table 1806.2), hole ≥ post + 4 in (§1807.3.3),
 * post bending (AISC 360 §F8, independent of the hole).
 */
import type { FactoredPostLoad } from "../loads/factored";
import { bearingPressurePsf } from "./bearing";
import { makeCheck, type CheckId, type FootingCheck, type Governing } from "./checks";
import { lateralRatio, requiredLateralDepthFt } from "./embedment";
import type { PipeMoment } from "./pipe";
import { roundUpIn } from "./solve-depth";
import { pierConcreteWeightLb, upliftCapacityLb } from "./uplift";
import type { SoilValues } from "./soil";

export interface FootingContext {
  rows: FactoredPostLoad[];
  lateralRows: FactoredPostLoad[];
  soil: SoilValues;
  pipe: PipeMoment;
  constrained: boolean;
  concretePcf: number;
  frostDepthIn: number;
  depthIncrementIn: number;
  fixedDepthIn?: number;
  waterTableDepthFt?: number;
  sideFrictionPsf?: number;
}

export interface FootingEvaluation {
  diameterIn: number;
  depthIn: number;
  controllingCheck: CheckId;
  requiredDepthIn: Record<"lateral" | "uplift" | "frost", number>;
  checks: FootingCheck[];
  pass: boolean;
  lateralConverged: boolean;
}

/** Lateral check as load vs allowable load at the same height h = M/P (moment when P = 0). */
function lateralCheck(row: FactoredPostLoad | null, ratio: number, source: string, needIn: number): FootingCheck {
  if (!row) return makeCheck("lateral", 0, 1, "lb", source, null, needIn);
  const P = Math.abs(row.shearLb);
  const M = Math.abs(row.momentAtGradeLbFt);
  const byMoment = P < 1e-9;
  const demand = byMoment ? M : P;
  const c = makeCheck("lateral", demand, ratio > 0 ? demand / ratio : Infinity, byMoment ? "lb-ft" : "lb", source, gov(row), needIn);
  c.detail = byMoment ? "pure moment at grade" : `P = ${P.toFixed(0)} lb at h = M/P = ${(M / P).toFixed(2)} ft above grade`;
  return c;
}

const gov = (r: FactoredPostLoad): Governing => ({ postId: r.postId, tiltDeg: r.tiltDeg, combination: r.combination, windCase: r.windCase });
const LATERAL_SOURCE = (c: boolean) => (c ? "IBC §1807.3.2.2 Eq. 18-2" : "IBC §1807.3.2.1 Eq. 18-1");

export function evaluateFooting(ctx: FootingContext, diameterIn: number): FootingEvaluation {
  const b = diameterIn / 12;
  const lat = { diameterFt: b, sPsfPerFt: ctx.soil.lateralPsfPerFt, constrained: ctx.constrained };
  const upliftArgs = (r: FactoredPostLoad) => ({
    diameterFt: b, concretePcf: ctx.concretePcf, postLbPerFt: ctx.pipe.weightLbPerFt, postAboveGradeFt: r.postHeightAboveGradeFt,
    deadLb: r.deadResistLb / (r.deadFactor || 1), waterTableDepthFt: ctx.waterTableDepthFt, sideFrictionPsf: ctx.sideFrictionPsf,
  });
  const upliftCap = (r: FactoredPostLoad, d: number) => {
    const a = upliftArgs(r);
    const post = a.postLbPerFt * (a.postAboveGradeFt + d);
    return r.deadFactor * (pierConcreteWeightLb(a, d) + post + a.deadLb) + (a.sideFrictionPsf ?? 0) * Math.PI * b * d;
  };
  let latNeed = { ft: 0, row: null as FactoredPostLoad | null, converged: true };
  for (const r of ctx.lateralRows) {
    const s = requiredLateralDepthFt({ ...lat, shearLb: r.shearLb, momentLbFt: r.momentAtGradeLbFt });
    if (s.depthFt > latNeed.ft || !latNeed.row) latNeed = { ft: s.depthFt, row: r, converged: latNeed.converged && s.converged };
  }
  let upNeed = { ft: 0, row: null as FactoredPostLoad | null };
  for (const r of ctx.rows) {
    if (r.windUpliftLb <= 0 || r.hasSnow || upliftCap(r, 0) >= r.windUpliftLb) continue;
    let lo = 0, hi = 60;
    if (upliftCap(r, hi) < r.windUpliftLb) { upNeed = { ft: hi, row: r }; continue; }
    while (hi - lo > 1e-7) { const m = 0.5 * (lo + hi); if (upliftCap(r, m) >= r.windUpliftLb) hi = m; else lo = m; }
    if (hi > upNeed.ft) upNeed = { ft: hi, row: r };
  }
  const frostIn = Math.max(ctx.frostDepthIn, 12);
  const need = { lateral: latNeed.ft * 12, uplift: upNeed.ft * 12, frost: frostIn };
  const controllingCheck = (Object.keys(need) as (keyof typeof need)[]).reduce((a, k) => (need[k] > need[a] ? k : a), "frost" as keyof typeof need);
  const depthIn = ctx.fixedDepthIn ?? roundUpIn(need[controllingCheck], ctx.depthIncrementIn);
  const d = depthIn / 12;

  // Checks at the design depth: the worst row of each.
  let latWorst = { ratio: -1, row: null as FactoredPostLoad | null };
  for (const r of ctx.lateralRows) {
    const q = lateralRatio({ ...lat, shearLb: r.shearLb, momentLbFt: r.momentAtGradeLbFt }, d);
    if (q > latWorst.ratio) latWorst = { ratio: q, row: r };
  }
  let upWorst = { demand: 0, cap: 1, row: null as FactoredPostLoad | null };
  let brgWorst = { psf: 0, row: null as FactoredPostLoad | null };
  let bendWorst = { m: 0, row: null as FactoredPostLoad | null };
  for (const r of ctx.rows) {
    if (r.windUpliftLb > 0 && !r.hasSnow) {
      const cap = upliftCap(r, d);
      if (!upWorst.row || r.windUpliftLb / cap > upWorst.demand / upWorst.cap) upWorst = { demand: r.windUpliftLb, cap, row: r };
    }
    const pier = r.deadFactor * (pierConcreteWeightLb({ diameterFt: b, concretePcf: ctx.concretePcf, waterTableDepthFt: ctx.waterTableDepthFt }, d) + ctx.pipe.weightLbPerFt * (r.postHeightAboveGradeFt + d));
    const psf = bearingPressurePsf({ downwardLb: r.downwardLb, pierWeightLb: pier, diameterFt: b });
    if (psf > brgWorst.psf) brgWorst = { psf, row: r };
    if (Math.abs(r.momentAtGradeLbFt) > bendWorst.m || !bendWorst.row) bendWorst = { m: Math.abs(r.momentAtGradeLbFt), row: r };
  }
  const latRatio = Math.max(0, latWorst.ratio);
  const checks: FootingCheck[] = [
    lateralCheck(latWorst.row, latRatio, LATERAL_SOURCE(ctx.constrained), need.lateral),
    makeCheck("uplift", upWorst.demand, upWorst.row ? upWorst.cap : upliftCapacityLb({ ...upliftArgs(ctx.rows[0]), depthFt: d }), "lb", "ASCE 7 §2.4.1 0.6D + 0.6W; resisting weight × 0.6", upWorst.row && gov(upWorst.row), need.uplift),
    makeCheck("frost", frostIn, depthIn, "in", "IBC §1809.4 (frost), §1809.5 (12 in minimum)", null, need.frost),
    makeCheck("bearing", brgWorst.psf, ctx.soil.verticalPsf, "psf", ctx.soil.source, brgWorst.row && gov(brgWorst.row)),
    makeCheck("holeSize", ctx.pipe.outsideDiameterIn + 4, diameterIn, "in", "IBC §1807.3.3 [memory]", null),
    makeCheck("postBending", bendWorst.m / 1000, ctx.pipe.allowableMomentKipFt, "kip-ft", ctx.pipe.source, bendWorst.row && gov(bendWorst.row)),
  ];
  return { diameterIn, depthIn, controllingCheck, requiredDepthIn: need, checks, pass: checks.every((c) => c.pass), lateralConverged: latNeed.converged };
}
