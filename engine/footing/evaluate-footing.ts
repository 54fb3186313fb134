/**
 * Size (or check) one hole diameter: the depth each check needs, the design depth (largest need,
 * rounded up to the practical increment, or the given depth), and every check at that depth.
 *
 * Depth-setting checks: lateral (IBC §1807.3.2.1/.2), uplift, frost and minimum 12 in
 * (IBC §1809.4 depth of footings, 12 in minimum; §1809.5 frost protection). Diameter checks: bearing (Table 1806.2), hole ≥ post + 4 in (§1807.3.3),
 * post bending (AISC 360 §F8, independent of the hole).
 */
import { imperialText, qty, says } from "../quantity-text";
import type { FactoredPostLoad } from "../loads/factored";
import { bearingPressurePsf } from "./bearing";
import { FROST_CHECK_SOURCE, makeCheck, type DepthCheckId, type FootingCheck, type Governing } from "./checks";
import { lateralRatio, lateralWorking, requiredLateralDepthFt, type LateralWorking } from "./embedment";
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
  /** Net bearing (engineer's option): soil unit weight credited per ft of depth; undefined = gross. */
  netBearingSoilPcf?: number;
}

export interface FootingDepth {
  depthIn: number;
  need: Record<"lateral" | "uplift" | "frost", number>;
  controllingCheck: DepthCheckId;
  lateralConverged: boolean;
  /** The row whose lateral requirement is deepest (sets `need.lateral`); null without lateral rows. */
  lateralRow: FactoredPostLoad | null;
}

/**
 * The lateral requirement as the engine solved it: the row that needs the deepest embedment (which
 * can differ from the row with the largest ratio at the design depth, and can sit at another tilt
 * setting than the design tilt) and the equation worked through with its values.
 */
export interface LateralRequirement extends LateralWorking {
  governing: Governing;
  /** The row's factored loads (signed as in the post-load table). */
  downwardLb: number;
  windUpliftLb: number;
}

export interface FootingEvaluation {
  diameterIn: number;
  depthIn: number;
  controllingCheck: DepthCheckId;
  requiredDepthIn: Record<"lateral" | "uplift" | "frost", number>;
  checks: FootingCheck[];
  pass: boolean;
  lateralConverged: boolean;
  /** The row that sets `requiredDepthIn.lateral` (see `lateralRequirement`). */
  lateralRow: FactoredPostLoad | null;
}

/** Bearing: gross pressure, or net with the soil removed credited (its unit weight named in the source). */
function bearingCheck(pressurePsf: number, allowablePsf: number, soilSource: string, netSoilPcf: number | null | undefined, governing: Governing | null): FootingCheck {
  if (!netSoilPcf) return makeCheck("bearing", pressurePsf, allowablePsf, "psf", soilSource, governing);
  const sourceText = says`${soilSource}; net pressure, soil removed credited at ${qty(netSoilPcf, "pcf")} (engineer's option)`;
  const c = makeCheck("bearing", pressurePsf, allowablePsf, "psf", imperialText(sourceText), governing);
  c.sourceText = sourceText;
  return c;
}

/** Lateral check as load vs allowable load at the same height h = M/P (moment when P = 0). */
function lateralCheck(row: FactoredPostLoad | null, ratio: number, source: string, needIn: number): FootingCheck {
  if (!row) return makeCheck("lateral", 0, 1, "lb", source, null, needIn);
  const P = Math.abs(row.shearLb);
  const M = Math.abs(row.momentAtGradeLbFt);
  const byMoment = P < 1e-9;
  const demand = byMoment ? M : P;
  const c = makeCheck("lateral", demand, ratio > 0 ? demand / ratio : Infinity, byMoment ? "lb-ft" : "lb", source, gov(row), needIn);
  c.detailText = byMoment ? ["pure moment at grade"] : says`P = ${qty(Math.round(P), "lb")} at h = M/P = ${qty(M / P, "ft", 2)} above grade`;
  c.detail = imperialText(c.detailText);
  return c;
}

const gov = (r: FactoredPostLoad): Governing => ({ postId: r.postId, tiltDeg: r.tiltDeg, combination: r.combination, windCase: r.windCase });
const LATERAL_SOURCE = (c: boolean) => (c ? "IBC §1807.3.2.2 Eq. 18-2" : "IBC §1807.3.2.1 Eq. 18-1");

// The loops below sit in the sizing hot path (once per diameter, per tilt, per candidate), so they
// use plain locals instead of per-call helper closures and running-best objects: the closures were
// re-created (and, under tsx/esbuild keepNames, re-named with Object.defineProperty) on every call.
// The arithmetic and the order of every operation are unchanged.

/** Unfactored tributary dead load of a row (its factored dead over its factor), 0 when D is absent. */
function deadOf(r: FactoredPostLoad): number {
  return r.deadFactor ? r.deadResistLb / r.deadFactor : 0;
}

/** The depth each check needs at this hole and the design depth (the cheap part, for sweeps). */
export function footingDepth(ctx: FootingContext, diameterIn: number, useFixed = true): FootingDepth {
  const b = diameterIn / 12;
  const S = ctx.soil.lateralPsfPerFt;
  const wp = ctx.pipe.weightLbPerFt;

  const lateralRows = ctx.lateralRows;
  let latFt = 0, latRow: FactoredPostLoad | null = null, latConverged = true;
  for (let i = 0; i < lateralRows.length; i++) {
    const r = lateralRows[i];
    const s = requiredLateralDepthFt({ shearLb: r.shearLb, momentLbFt: r.momentAtGradeLbFt, diameterFt: b, sPsfPerFt: S, constrained: ctx.constrained });
    // `converged` is carried only when the deepest row changes (as before).
    if (s.depthFt > latFt || !latRow) { latFt = s.depthFt; latRow = r; latConverged = latConverged && s.converged; }
  }
  const rows = ctx.rows;
  let upFt = 0;
  for (let i = 0; i < rows.length; i++) {
    const r = rows[i];
    if (!(r.windUpliftLb > 0 && !r.hasSnow)) continue;
    const ft = requiredUpliftDepthFt({
      upliftLb: r.windUpliftLb, deadFactor: r.deadFactor, diameterFt: b, concretePcf: ctx.concretePcf, postLbPerFt: wp,
      postAboveGradeFt: r.postHeightAboveGradeFt, deadLb: deadOf(r), waterTableDepthFt: ctx.waterTableDepthFt, sideFrictionPsf: ctx.sideFrictionPsf,
    });
    if (ft > upFt) upFt = ft;
  }
  const frostIn = Math.max(ctx.frostDepthIn, 12);
  const need = { lateral: latFt * 12, uplift: upFt * 12, frost: frostIn };
  // The largest need, ties to the later key: reduce over lateral, uplift, frost starting at frost.
  let controllingCheck: DepthCheckId = "frost";
  if (need.lateral > need[controllingCheck]) controllingCheck = "lateral";
  if (need.uplift > need[controllingCheck]) controllingCheck = "uplift";
  const fixed = useFixed ? ctx.fixedDepthIn : undefined;
  const depthIn = fixed ?? roundUpIn(need[controllingCheck], ctx.depthIncrementIn);
  return { depthIn, need, controllingCheck, lateralConverged: latConverged, lateralRow: latRow };
}


export function evaluateFooting(ctx: FootingContext, diameterIn: number): FootingEvaluation {
  const { depthIn, need, controllingCheck, lateralConverged, lateralRow } = footingDepth(ctx, diameterIn);
  const b = diameterIn / 12;
  const S = ctx.soil.lateralPsfPerFt;
  const wp = ctx.pipe.weightLbPerFt;
  const friction = (ctx.sideFrictionPsf ?? 0) * Math.PI * b;
  const frostIn = need.frost;
  const d = depthIn / 12;
  const concreteLb = pierConcreteWeightLb({ diameterFt: b, concretePcf: ctx.concretePcf, waterTableDepthFt: ctx.waterTableDepthFt }, d);
  const overburdenPsf = ctx.netBearingSoilPcf ? ctx.netBearingSoilPcf * d : 0;
  // Checks at the design depth: the worst row of each.
  const lateralRows = ctx.lateralRows;
  let latRatio = -1, latRow: FactoredPostLoad | null = null;
  for (let i = 0; i < lateralRows.length; i++) {
    const r = lateralRows[i];
    const q = lateralRatio({ shearLb: r.shearLb, momentLbFt: r.momentAtGradeLbFt, diameterFt: b, sPsfPerFt: S, constrained: ctx.constrained }, d);
    if (q > latRatio) { latRatio = q; latRow = r; }
  }
  let upDemand = 0, upCapRow = 0, upRatio = -1, upRow: FactoredPostLoad | null = null;
  let brgPsf = 0, brgRow: FactoredPostLoad | null = null;
  let bendM = 0, bendRow: FactoredPostLoad | null = null;
  const rows = ctx.rows;
  for (let i = 0; i < rows.length; i++) {
    const r = rows[i];
    const pier = concreteLb + wp * (r.postHeightAboveGradeFt + d);
    if (r.windUpliftLb > 0 && !r.hasSnow) {
      const cap = r.deadFactor * (pier + deadOf(r)) + friction * d;
      if (r.windUpliftLb / cap > upRatio) { upDemand = r.windUpliftLb; upCapRow = cap; upRatio = r.windUpliftLb / cap; upRow = r; }
    }
    const psf = bearingPressurePsf({ downwardLb: r.downwardLb, pierWeightLb: r.deadFactor * pier, diameterFt: b, overburdenPsf });
    if (psf > brgPsf) { brgPsf = psf; brgRow = r; }
    if (Math.abs(r.momentAtGradeLbFt) > bendM || !bendRow) { bendM = Math.abs(r.momentAtGradeLbFt); bendRow = r; }
  }
  const upCap = upRow ? upCapRow : 0.6 * (concreteLb + wp * d) + friction * d;
  const checks: FootingCheck[] = [
    lateralCheck(latRow, Math.max(0, latRatio), LATERAL_SOURCE(ctx.constrained), need.lateral),
    makeCheck("uplift", upDemand, upCap, "lb", "ASCE 7 §2.4.1 0.6D + 0.6W; resisting weight × 0.6", upRow && gov(upRow), need.uplift),
    makeCheck("frost", frostIn, depthIn, "in", FROST_CHECK_SOURCE, null, need.frost),
    bearingCheck(brgPsf, ctx.soil.verticalPsf, ctx.soil.source, ctx.netBearingSoilPcf, brgRow && gov(brgRow)),
    makeCheck("holeSize", ctx.pipe.outsideDiameterIn + 4, diameterIn, "in", "IBC §1807.3.3 backfill (value as recalled; confirm against the printed code)", null),
    makeCheck("postBending", bendM / 1000, ctx.pipe.allowableMomentKipFt, "kip-ft", ctx.pipe.source, bendRow && gov(bendRow)),
  ];
  let pass = true;
  for (let i = 0; i < checks.length; i++) if (!checks[i].pass) { pass = false; break; }
  return { diameterIn, depthIn, controllingCheck, requiredDepthIn: need, checks, pass, lateralConverged, lateralRow };
}

/**
 * The lateral requirement of an evaluation worked through, from the same row and the same solver as
 * `requiredDepthIn.lateral`, so its depth is that need exactly. Built once per design (not in the
 * sizing loops).
 */
export function lateralRequirement(ctx: FootingContext, ev: FootingEvaluation): LateralRequirement | null {
  const row = ev.lateralRow;
  if (!row) return null;
  const w = lateralWorking({ shearLb: row.shearLb, momentLbFt: row.momentAtGradeLbFt, diameterFt: ev.diameterIn / 12, sPsfPerFt: ctx.soil.lateralPsfPerFt, constrained: ctx.constrained });
  return { governing: gov(row), downwardLb: row.downwardLb, windUpliftLb: row.windUpliftLb, ...w };
}

/** Worst bearing ratio at a hole and depth (for sweeps and automatic sizing). */
export function bearingRatio(ctx: FootingContext, diameterIn: number, depthIn: number): number {
  const b = diameterIn / 12, d = depthIn / 12;
  const concreteLb = pierConcreteWeightLb({ diameterFt: b, concretePcf: ctx.concretePcf, waterTableDepthFt: ctx.waterTableDepthFt }, d);
  const overburdenPsf = ctx.netBearingSoilPcf ? ctx.netBearingSoilPcf * d : 0;
  let worst = 0;
  for (const r of ctx.rows) {
    const psf = bearingPressurePsf({ downwardLb: r.downwardLb, pierWeightLb: r.deadFactor * (concreteLb + ctx.pipe.weightLbPerFt * (r.postHeightAboveGradeFt + d)), diameterFt: b, overburdenPsf });
    if (psf > worst) worst = psf;
  }
  return worst / ctx.soil.verticalPsf;
}
