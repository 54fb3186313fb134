/**
 * Snow on the array: flat-roof snow load pf, slope factor Cs and sloped snow ps, on the
 * horizontal projection.
 *
 * Source [memory]: ASCE 7-16 Eq. 7.3-1 pf = 0.7 Ce Ct Is pg; Eq. 7.4-1 ps = Cs pf; Cs from
 * Fig. 7.4-1 (slippery unobstructed surfaces for glass modules); minimum pm (§7.3.4) for slopes
 * under 15°. ASCE 7-22 drops Is (pg is mapped per risk category) and uses 0.7S in ASD combinations.
 * Ct = 1.2 for an open structure (Table 7.3-2).
 *
 * @example snowLoad({ edition: "7-16", groundSnowPsf: 30, ce: 0.9, ct: 1.2, is: 1, tiltDeg: 30, slippery: true })
 *   // { pfPsf: 22.68, cs: 0.727, psPsf: 16.49, … }
 */
import { requireRange } from "../errors";
import type { Edition } from "../wind/kz";

/** Snow importance factor Is by risk category, ASCE 7-16 Table 1.5-2 [memory]. */
export const SNOW_IMPORTANCE: Record<"I" | "II" | "III" | "IV", number> = { I: 0.8, II: 1.0, III: 1.1, IV: 1.2 };

/** Roof slope factor Cs, ASCE 7-16 Fig. 7.4-1 [memory]: 1 up to a knee angle, then linear to 0 at 70°. */
export function slopeFactorCs(tiltDeg: number, ct: number, slippery: boolean): number {
  requireRange("array.tiltDeg", tiltDeg, 0, 90, "Tilt", "degrees");
  const knee = ct >= 1.2 ? (slippery ? 15 : 45) : ct > 1.0 ? (slippery ? 10 : 37.5) : slippery ? 5 : 30;
  if (tiltDeg <= knee) return 1;
  if (tiltDeg >= 70) return 0;
  return 1 - (tiltDeg - knee) / (70 - knee);
}

export interface SnowLoad {
  pfPsf: number;
  cs: number;
  psPsf: number;
  minimumPmPsf: number;
  /** Design snow on the horizontal projection (psf): ps, or pm where that governs. */
  designPsf: number;
  /** Factor on S in the ASD combinations: 1 (7-16) or 0.7 (7-22). */
  combinationFactor: number;
}

export function snowLoad(a: {
  edition: Edition;
  groundSnowPsf: number;
  ce: number;
  ct: number;
  is: number;
  tiltDeg: number;
  slippery: boolean;
}): SnowLoad {
  requireRange("site.groundSnowPsf", a.groundSnowPsf, 0, 300, "Ground snow load", "psf");
  requireRange("site.snowExposureCe", a.ce, 0.7, 1.3, "Snow exposure factor Ce", "");
  requireRange("site.snowThermalCt", a.ct, 0.85, 1.3, "Snow thermal factor Ct", "");
  const is = a.edition === "7-16" ? a.is : 1;
  const pfPsf = 0.7 * a.ce * a.ct * is * a.groundSnowPsf;
  const cs = slopeFactorCs(a.tiltDeg, a.ct, a.slippery);
  const psPsf = cs * pfPsf;
  const minimumPmPsf = a.tiltDeg < 15 ? (a.groundSnowPsf <= 20 ? is * a.groundSnowPsf : 20 * is) : 0;
  return {
    pfPsf,
    cs,
    psPsf,
    minimumPmPsf,
    designPsf: Math.max(psPsf, minimumPmPsf),
    combinationFactor: a.edition === "7-22" ? 0.7 : 1,
  };
}
