/**
 * Uplift resistance of a concrete pier with its post.
 *
 * Capacity = 0.6 × (concrete + post + tributary array dead load) + optional side friction
 * (an engineer's allowable value, psf of shaft surface, off by default), against the uplift from
 * 0.6W (ASCE 7 §2.4.1 combination 0.6D + 0.6W) [memory]. Concrete below the water table counts
 * at its buoyant weight (unit weight − 62.4 pcf). The post is taken as filled; its steel replaces
 * a sliver of concrete, which is ignored.
 *
 * @example upliftCapacityLb({ depthFt: 5, diameterFt: 2, concretePcf: 145, postLbPerFt: 7.58,
 *   postAboveGradeFt: 4, deadLb: 500 }) // 0.6 × (2277.7 + 68.2 + 500) = 1707.5
 */
export const WATER_PCF = 62.4;

export interface UpliftArgs {
  diameterFt: number;
  concretePcf: number;
  postLbPerFt: number;
  postAboveGradeFt: number;
  deadLb: number;
  waterTableDepthFt?: number;
  sideFrictionPsf?: number;
}

/** Effective concrete weight of a pier of depth d (lb), buoyant below the water table. */
export function pierConcreteWeightLb(a: Pick<UpliftArgs, "diameterFt" | "concretePcf" | "waterTableDepthFt">, depthFt: number): number {
  const area = (Math.PI * a.diameterFt * a.diameterFt) / 4;
  const wt = a.waterTableDepthFt ?? Infinity;
  const dry = Math.min(depthFt, wt);
  const wet = Math.max(0, depthFt - wt);
  return area * (a.concretePcf * dry + (a.concretePcf - WATER_PCF) * wet);
}

export function upliftCapacityLb(a: UpliftArgs & { depthFt: number }): number {
  const post = a.postLbPerFt * (a.postAboveGradeFt + a.depthFt);
  const friction = (a.sideFrictionPsf ?? 0) * Math.PI * a.diameterFt * a.depthFt;
  return 0.6 * (pierConcreteWeightLb(a, a.depthFt) + post + a.deadLb) + friction;
}
