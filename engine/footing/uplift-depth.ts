/**
 * Depth at which the pier's uplift resistance (see uplift.ts) just equals the uplift, in closed
 * form: resistance is linear in depth above the water table and again (with buoyant concrete)
 * below it. Capped at 60 ft (the result then fails the uplift check and warns).
 *
 * @example requiredUpliftDepthFt({ upliftLb: 2000, deadFactor: 0.6, diameterFt: 2, concretePcf: 145,
 *   postLbPerFt: 7.58, postAboveGradeFt: 4, deadLb: 500 }) // ≈ 5.55
 */
import { WATER_PCF, type UpliftArgs } from "./uplift";

/** Depths are not sought beyond 60 ft: past that the answer is "change the design". */
export const MAX_DEPTH_FT = 60;

export function requiredUpliftDepthFt(a: UpliftArgs & { upliftLb: number; deadFactor: number }): number {
  const area = (Math.PI * a.diameterFt * a.diameterFt) / 4;
  const friction = (a.sideFrictionPsf ?? 0) * Math.PI * a.diameterFt;
  const c0 = a.deadFactor * (a.postLbPerFt * a.postAboveGradeFt + a.deadLb);
  if (c0 >= a.upliftLb) return 0;
  const c1 = a.deadFactor * (area * a.concretePcf + a.postLbPerFt) + friction;
  const d1 = (a.upliftLb - c0) / c1;
  const wt = a.waterTableDepthFt ?? Infinity;
  if (d1 <= wt) return Math.min(d1, MAX_DEPTH_FT);
  const c0w = c0 + a.deadFactor * area * WATER_PCF * wt;
  const c1w = a.deadFactor * (area * (a.concretePcf - WATER_PCF) + a.postLbPerFt) + friction;
  return Math.min((a.upliftLb - c0w) / c1w, MAX_DEPTH_FT);
}
