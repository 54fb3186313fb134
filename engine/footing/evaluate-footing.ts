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
import { makeCheck, type DepthCheckId, type FootingCheck, type Governing } from "./checks";
import { lateralRatio, requiredLateralDepthFt } from "./embedment";
import type { PipeMoment } from "./pipe";
import { roundUpIn } from "./solve-depth";
import { pierConcreteWeightLb } from "./uplift";
import { requiredUpliftDepthFt } from "./uplift-depth";
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

export interface FootingDepth {
  depthIn: number;
  need: Record<"lateral" | "uplift" | "frost", number>;
  controllingCheck: DepthCheckId;
  lateralConverged: boolean;
}

export interface FootingEvaluation {
  diameterIn: number;
  depthIn: number;
  controllingCheck: DepthCheckId;
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

/** The depth each check needs at this hole and the design depth (the cheap part, for sweeps). */
export function footingDepth(ctx: FootingContext, diameterIn: number, useFixed = true): FootingDepth {
  const b = diameterIn / 12;
  const S = ctx.soil.lateralPsfPerFt;
  const wp = ctx.pipe.weightLbPerFt;
  const isUplift = (r: FactoredPostLoad) => r.windUpliftLb > 0 && !r.hasSnow;
  const deadOf = (r: FactoredPostLoad) => (r.deadFactor ? r.deadResistLb / r.deadFactor : 0);

  let latNeed = { ft: 0, row: null as FactoredPostLoad | null, converged: true };
  for (const r of ctx.lateralRows) {
    const s = requiredLateralDepthFt({ shearLb: r.shearLb, momentLbFt: r.momentAtGradeLbFt, diameterFt: b, sPsfPerFt: S, constrained: ctx.constrained });
    if (s.depthFt > latNeed.ft || !latNeed.row) latNeed = { ft: s.depthFt, row: r, converged: latNeed.converged && s.converged };
  }
  let upNeed = { ft: 0, row: null as FactoredPostLoad | null };
  for (const r of ctx.rows) {
    if (!isUplift(r)) continue;
    const ft = requiredUpliftDepthFt({
      upliftLb: r.windUpliftLb, deadFactor: r.deadFactor, diameterFt: b, concretePcf: ctx.concretePcf, postLbPerFt: wp,
      postAboveGradeFt: r.postHeightAboveGradeFt, deadLb: deadOf(r), waterTableDepthFt: ctx.waterTableDepthFt, sideFrictionPsf: ctx.sideFrictionPsf,
    });
    if (ft > upNeed.ft) upNeed = { ft, row: r };
  }
  const frostIn = Math.max(ctx.frostDepthIn, 12);
  const need = { lateral: latNeed.ft * 12, uplift: upNeed.ft * 12, frost: frostIn };
  const controllingCheck = (Object.keys(need) as (keyof typeof need)[]).reduce((a, k) => (need[k] > need[a] ? k : a), "frost" as keyof typeof need);
  const fixed = useFixed ? ctx.fixedDepthIn : undefined;
  const depthIn = fixed ?? roundUpIn(need[controllingCheck], ctx.depthIncrementIn);
  return { depthIn, need, controllingCheck, lateralConverged: latNeed.converged };
}


export function evaluateFooting(ctx: FootingContext, diameterIn: number): FootingEvaluation {
  const { depthIn, need, controllingCheck, lateralConverged } = footingDepth(ctx, diameterIn);
  const b = diameterIn / 12;
  const S = ctx.soil.lateralPsfPerFt;
  const wp = ctx.pipe.weightLbPerFt;
  const friction = (ctx.sideFrictionPsf ?? 0) * Math.PI * b;
  const isUplift = (r: FactoredPostLoad) => r.windUpliftLb > 0 && !r.hasSnow;
  const deadOf = (r: FactoredPostLoad) => (r.deadFactor ? r.deadResistLb / r.deadFactor : 0);
  const frostIn = need.frost;
  const d = depthIn / 12;
  const concreteLb = pierConcreteWeightLb({ diameterFt: b, concretePcf: ctx.concretePcf, waterTableDepthFt: ctx.waterTableDepthFt }, d);
  // Checks at the design depth: the worst row of each.
  let latWorst = { ratio: -1, row: null as FactoredPostLoad | null };
  for (const r of ctx.lateralRows) {
    const q = lateralRatio({ shearLb: r.shearLb, momentLbFt: r.momentAtGradeLbFt, diameterFt: b, sPsfPerFt: S, constrained: ctx.constrained }, d);
    if (q > latWorst.ratio) latWorst = { ratio: q, row: r };
  }
  let up = { demand: 0, cap: 0, ratio: -1, row: null as FactoredPostLoad | null };
  let brg = { psf: 0, row: null as FactoredPostLoad | null };
  let bend = { m: 0, row: null as FactoredPostLoad | null };
  for (const r of ctx.rows) {
    const pier = concreteLb + wp * (r.postHeightAboveGradeFt + d);
    if (isUplift(r)) {
      const cap = r.deadFactor * (pier + deadOf(r)) + friction * d;
      if (r.windUpliftLb / cap > up.ratio) up = { demand: r.windUpliftLb, cap, ratio: r.windUpliftLb / cap, row: r };
    }
    const psf = bearingPressurePsf({ downwardLb: r.downwardLb, pierWeightLb: r.deadFactor * pier, diameterFt: b });
    if (psf > brg.psf) brg = { psf, row: r };
    if (Math.abs(r.momentAtGradeLbFt) > bend.m || !bend.row) bend = { m: Math.abs(r.momentAtGradeLbFt), row: r };
  }
  const upCap = up.row ? up.cap : 0.6 * (concreteLb + wp * d) + friction * d;
  const checks: FootingCheck[] = [
    lateralCheck(latWorst.row, Math.max(0, latWorst.ratio), LATERAL_SOURCE(ctx.constrained), need.lateral),
    makeCheck("uplift", up.demand, upCap, "lb", "ASCE 7 §2.4.1 0.6D + 0.6W; resisting weight × 0.6", up.row && gov(up.row), need.uplift),
    makeCheck("frost", frostIn, depthIn, "in", "IBC §1809.4 (frost), §1809.5 (12 in minimum)", null, need.frost),
    makeCheck("bearing", brg.psf, ctx.soil.verticalPsf, "psf", ctx.soil.source, brg.row && gov(brg.row)),
    makeCheck("holeSize", ctx.pipe.outsideDiameterIn + 4, diameterIn, "in", "IBC §1807.3.3 [memory]", null),
    makeCheck("postBending", bend.m / 1000, ctx.pipe.allowableMomentKipFt, "kip-ft", ctx.pipe.source, bend.row && gov(bend.row)),
  ];
  return { diameterIn, depthIn, controllingCheck, requiredDepthIn: need, checks, pass: checks.every((c) => c.pass), lateralConverged };
}

/** Worst bearing ratio at a hole and depth (for sweeps and automatic sizing). */
export function bearingRatio(ctx: FootingContext, diameterIn: number, depthIn: number): number {
  const b = diameterIn / 12, d = depthIn / 12;
  const concreteLb = pierConcreteWeightLb({ diameterFt: b, concretePcf: ctx.concretePcf, waterTableDepthFt: ctx.waterTableDepthFt }, d);
  let worst = 0;
  for (const r of ctx.rows) {
    const psf = bearingPressurePsf({ downwardLb: r.downwardLb, pierWeightLb: r.deadFactor * (concreteLb + ctx.pipe.weightLbPerFt * (r.postHeightAboveGradeFt + d)), diameterFt: b });
    if (psf > worst) worst = psf;
  }
  return worst / ctx.soil.verticalPsf;
}
