/**
 * Concrete for one cylindrical hole.
 *
 * Volume π b² d / 4, less the post's displacement when chosen; 27 ft³ per yd³. Weight at 145 pcf
 * (normal-weight plain concrete, ASCE 7-16 Table C3.1-2 [memory]) unless given. Premix bag yield
 * ≈ 0.15 ft³ per 20 lb, so 40/60/80-lb bags give 0.30/0.45/0.60 ft³ [common practice: bag labels].
 *
 * @example concreteForHole({ diameterIn: 24, depthIn: 60 })
 *   // { volumeFt3: 15.708, volumeYd3: 0.582, weightLb: 2277.7, bags80Lb: 27, … }
 */
import { requireRange } from "../errors";
import { requireInput } from "../input-ranges";

export const FT3_PER_YD3 = 27;
export const BAG_YIELD_FT3 = { 40: 0.3, 60: 0.45, 80: 0.6 } as const;

/** Whole bags of premix for a volume (a module-level helper: it runs per hole and per sweep row). */
export function bagsFor(volumeFt3: number, lb: 40 | 60 | 80): number {
  return Math.ceil(volumeFt3 / BAG_YIELD_FT3[lb] - 1e-9);
}

export interface HoleConcrete {
  volumeFt3: number;
  volumeYd3: number;
  weightLb: number;
  bags40Lb: number;
  bags60Lb: number;
  bags80Lb: number;
  displacementFt3: number;
}

export function concreteForHole(a: {
  diameterIn: number;
  depthIn: number;
  unitWeightPcf?: number;
  postOutsideDiameterIn?: number;
  subtractPostDisplacement?: boolean;
}): HoleConcrete {
  requireRange("posts.holeDiameterIn", a.diameterIn, 4, 120, "Hole diameter", "in");
  requireRange("posts.depthIn", a.depthIn, 0, 720, "Hole depth", "in");
  const pcf = a.unitWeightPcf ?? 145;
  requireInput("posts.concreteUnitWeightPcf", pcf, "pcf");
  const d = a.depthIn / 12;
  const gross = (Math.PI * (a.diameterIn / 12) ** 2 * d) / 4;
  const od = a.postOutsideDiameterIn ?? 0;
  if (a.subtractPostDisplacement && od >= a.diameterIn) {
    requireRange("posts.holeDiameterIn", a.diameterIn, od + 0.01, 120, "Hole diameter (must exceed the post)", "in");
  }
  const displacementFt3 = a.subtractPostDisplacement ? (Math.PI * (od / 12) ** 2 * d) / 4 : 0;
  const volumeFt3 = gross - displacementFt3;
  return {
    volumeFt3,
    volumeYd3: volumeFt3 / FT3_PER_YD3,
    weightLb: volumeFt3 * pcf,
    bags40Lb: bagsFor(volumeFt3, 40),
    bags60Lb: bagsFor(volumeFt3, 60),
    bags80Lb: bagsFor(volumeFt3, 80),
    displacementFt3,
  };
}
