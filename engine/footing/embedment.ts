/**
 * Embedment depth of a post in a concrete-filled hole resisting lateral load and moment.
 *
 * Source: IBC (2018/2021) §1807.3.2.
 *  Nonconstrained, Eq. 18-1: d = 0.5 A {1 + [1 + 4.36 h/A]^½}, A = 2.34 P/(S1 b),
 *    S1 = allowable lateral bearing at d/3 = S·min(d, 12 ft)/3 [memory: 12 ft cap].
 *    Equivalent capacity form (rearranged, valid for P → 0): 4 d P + 4.36 M ≤ 4 d² S1 b / 2.34.
 *  Constrained at grade (slab or pavement), Eq. 18-2: d² = 4.25 P h/(S3 b), S3 = S·min(d, 12 ft),
 *    i.e. M ≤ S3 b d² / 4.25.
 * P lateral load (lb), h = M/P its height above grade (ft), b hole diameter (ft),
 * S lateral bearing pressure per ft of depth (psf/ft), doubled by §1806.3.4 when chosen.
 *
 * @example embedmentDepth({ lateralLoadLb: 1000, loadHeightFt: 4, diameterFt: 2, lateralBearingPsfPerFt: 150 })
 *   // { depthFt: 6.294, … }
 */
import { requireRange } from "../errors";

const S_DEPTH_CAP_FT = 12;

export interface LateralArgs {
  shearLb: number;
  momentLbFt: number;
  diameterFt: number;
  sPsfPerFt: number;
  constrained: boolean;
}

/** Demand / capacity of the lateral check at depth d (a load ratio: doubling the loads doubles it). */
export function lateralRatio(a: LateralArgs, depthFt: number): number {
  const P = Math.abs(a.shearLb);
  const M = Math.abs(a.momentLbFt);
  if (depthFt <= 0) return P + M > 0 ? Infinity : 0;
  const dS = Math.min(depthFt, S_DEPTH_CAP_FT);
  if (a.constrained) return (4.25 * M) / (a.sPsfPerFt * dS * a.diameterFt * depthFt * depthFt);
  const s1 = (a.sPsfPerFt * dS) / 3;
  return (4 * depthFt * P + 4.36 * M) / ((4 * depthFt * depthFt * s1 * a.diameterFt) / 2.34);
}

/**
 * Depth (ft) at which the lateral check just passes, in closed form or by Newton's method (fast:
 * this sits in the sizing loop). Below 12 ft, Eq. 18-1 becomes a d³ − 4P d − 4.36 M = 0 with
 * a = 4 S b /(3 × 2.34), convex for d > 0, so Newton from a point right of the root converges
 * monotonically; beyond 12 ft S1 is constant and the equation is quadratic.
 */
export function requiredLateralDepthFt(a: LateralArgs): { depthFt: number; converged: boolean } {
  const P = Math.abs(a.shearLb);
  const M = Math.abs(a.momentLbFt);
  // Loads far below a pound need no embedment; below this the cube of the depth underflows and
  // Newton's step would divide 0 by 0.
  if (P < 1e-9 && M < 1e-9) return { depthFt: 0, converged: true };
  const S = a.sPsfPerFt, b = a.diameterFt, cap = S_DEPTH_CAP_FT;
  let d: number;
  if (a.constrained) {
    d = Math.cbrt((4.25 * M) / (S * b));
    if (d > cap) d = Math.sqrt((4.25 * M) / (S * cap * b));
  } else {
    const k = (4 * S * b) / (3 * 2.34);
    d = Math.max(Math.sqrt((8 * P) / k), Math.cbrt((8.72 * M) / k));
    for (let i = 0; i < 60; i++) {
      const g = k * d * d * d - 4 * P * d - 4.36 * M;
      const next = d - g / (3 * k * d * d - 4 * P);
      if (Math.abs(next - d) < 1e-10) { d = next; break; }
      d = next;
    }
    if (d > cap) {
      // S1 = S·12/3: (4 × 4S b /2.34) d² − 4P d − 4.36 M = 0
      const q = (16 * S * b) / 2.34;
      d = (4 * P + Math.sqrt(16 * P * P + 4 * q * 4.36 * M)) / (2 * q);
    }
  }
  if (d > 60) return { depthFt: 60, converged: false };
  return { depthFt: d, converged: true };
}

/**
 * The lateral requirement worked through, from the same solution `requiredLateralDepthFt` finds:
 * every value a printed substitution needs, so a report shows the engine's own numbers instead of
 * re-deriving them. At the solved depth Eq. 18-1 is a fixed point: 0.5 A {1 + [1 + 4.36 h/A]^½}
 * with A = 2.34 P/(S1 b) and S1 = S·min(d, 12)/3 gives d back (IBC §1807.3.2.1); Eq. 18-2 likewise
 * gives d² = 4.25 P h/(S3 b) with S3 = S·min(d, 12) (§1807.3.2.2).
 */
export interface LateralWorking {
  constrained: boolean;
  /** |P|, lb. */
  shearLb: number;
  /** |M| at grade, lb-ft. */
  momentAtGradeLbFt: number;
  /** h = M/P, ft; null for a pure moment (P = 0). */
  loadHeightFt: number | null;
  diameterFt: number;
  /** S used (doubled when §1806.3.4 is chosen), psf/ft. */
  sPsfPerFt: number;
  /** Depth S1 or S3 is taken at: min(d, 12 ft). */
  bearingDepthFt: number;
  /** S1 = S·min(d, 12)/3 (nonconstrained) or S3 = S·min(d, 12) (constrained), psf. */
  bearingAtDepthPsf: number;
  /** A = 2.34 P/(S1 b), ft (nonconstrained with P > 0; else null). */
  aFt: number | null;
  /** The required depth, ft (the search limit of 60 ft when not converged). */
  depthFt: number;
  /** False when no depth up to 60 ft satisfies the equation: depthFt is then that limit. */
  converged: boolean;
}

export function lateralWorking(a: LateralArgs): LateralWorking {
  const P = Math.abs(a.shearLb);
  const M = Math.abs(a.momentLbFt);
  const r = requiredLateralDepthFt(a);
  const dS = Math.min(r.depthFt, S_DEPTH_CAP_FT);
  const bearing = a.constrained ? a.sPsfPerFt * dS : (a.sPsfPerFt * dS) / 3;
  const byMoment = P < 1e-9;
  return {
    constrained: a.constrained,
    shearLb: P,
    momentAtGradeLbFt: M,
    loadHeightFt: byMoment ? null : M / P,
    diameterFt: a.diameterFt,
    sPsfPerFt: a.sPsfPerFt,
    bearingDepthFt: dS,
    bearingAtDepthPsf: bearing,
    aFt: a.constrained || byMoment || bearing <= 0 ? null : (2.34 * P) / (bearing * a.diameterFt),
    depthFt: r.depthFt,
    converged: r.converged,
  };
}

export interface EmbedmentDepth {
  depthFt: number;
  /** S1 (nonconstrained, at d/3) or S3 (constrained, at d), psf. */
  lateralBearingAtDepthPsf: number;
  lateralBearingPsfPerFtUsed: number;
  equation: string;
  converged: boolean;
}

export function embedmentDepth(a: {
  lateralLoadLb: number;
  loadHeightFt: number;
  diameterFt: number;
  lateralBearingPsfPerFt: number;
  constrainedAtGrade?: boolean;
  isolatedPoleIncrease?: boolean;
}): EmbedmentDepth {
  requireRange("lateralLoadLb", a.lateralLoadLb, 0, 1e6, "Lateral load", "lb");
  requireRange("loadHeightFt", a.loadHeightFt, 0, 100, "Height of the lateral load above grade", "ft");
  requireRange("posts.holeDiameterIn", a.diameterFt, 0.25, 10, "Hole diameter", "ft");
  requireRange("site.soil.lateralBearingPsfPerFt", a.lateralBearingPsfPerFt, 25, 2000, "Lateral bearing pressure", "psf per ft");
  const s = a.lateralBearingPsfPerFt * (a.isolatedPoleIncrease ? 2 : 1);
  const constrained = a.constrainedAtGrade ?? false;
  const r = requiredLateralDepthFt({
    shearLb: a.lateralLoadLb,
    momentLbFt: a.lateralLoadLb * a.loadHeightFt,
    diameterFt: a.diameterFt,
    sPsfPerFt: s,
    constrained,
  });
  const dS = Math.min(r.depthFt, S_DEPTH_CAP_FT);
  return {
    depthFt: r.depthFt,
    lateralBearingAtDepthPsf: constrained ? s * dS : (s * dS) / 3,
    lateralBearingPsfPerFtUsed: s,
    equation: constrained ? "IBC §1807.3.2.2 Eq. 18-2 (constrained)" : "IBC §1807.3.2.1 Eq. 18-1 (nonconstrained)",
    converged: r.converged,
  };
}
