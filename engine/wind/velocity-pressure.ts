/**
 * Velocity pressure qz at height z.
 *
 * Source: ASCE 7-16 Eq. 26.10-1: qz = 0.00256 Kz Kzt Kd Ke V² (psf, V in mph).
 *         ASCE 7-22 Eq. 26.10-1: qz = 0.00256 Kz Kzt Ke V²; Kd moves into the pressure equation.
 * Kd = 0.85 (Table 26.6-1, for the free-roof / MWFRS case) [memory].
 * V is the basic wind speed read from the map for the structure's risk category.
 *
 * @example velocityPressure({ edition: "7-16", windSpeedMph: 115, exposure: "C", heightFt: 10 })
 *   // { kz: 0.85, kzt: 1, ke: 1, kd: 0.85, qzPsf: 24.46 }
 */
import { requireRange } from "../errors";
import { groundElevationFactor } from "./ke";
import { exposureCoefficientKz, type Edition, type Exposure } from "./kz";
import { topographicFactor, type Topography } from "./kzt";

/** Wind directionality factor, ASCE 7-16/7-22 Table 26.6-1 [memory]. */
export const KD_DIRECTIONALITY = 0.85;

export interface VelocityPressureInput {
  edition: Edition;
  windSpeedMph: number;
  exposure: Exposure;
  heightFt: number;
  /** Kzt given directly (1–3), or omit for flat ground; see also `topography`. */
  kzt?: number;
  topography?: Topography;
  groundElevationFt?: number;
}

export interface VelocityPressure {
  kz: number;
  kzt: number;
  ke: number;
  kd: number;
  /** qz as the edition defines it: includes Kd for 7-16, excludes it for 7-22 (psf). */
  qzPsf: number;
  /** qz·Kd for 7-22, equal to qzPsf for 7-16: the product that multiplies G·CN in both (psf). */
  qzWithKdPsf: number;
  kzMethod: "table" | "formula";
  equation: string;
}

export function velocityPressure(input: VelocityPressureInput): VelocityPressure {
  requireRange("site.windSpeedMph", input.windSpeedMph, 85, 200, "Wind speed", "mph");
  const { kz, method } = exposureCoefficientKz({ edition: input.edition, exposure: input.exposure, heightFt: input.heightFt });
  let kzt = 1;
  if (input.kzt !== undefined) {
    requireRange("site.topography.kzt", input.kzt, 1, 3, "Topographic factor Kzt", "");
    kzt = input.kzt;
  } else kzt = topographicFactor(input.topography);
  const ke = groundElevationFactor(input.groundElevationFt ?? 0);
  const kd = KD_DIRECTIONALITY;
  const base = 0.00256 * kz * kzt * ke * input.windSpeedMph * input.windSpeedMph;
  const is716 = input.edition === "7-16";
  return {
    kz,
    kzt,
    ke,
    kd,
    qzPsf: is716 ? base * kd : base,
    qzWithKdPsf: base * kd,
    kzMethod: method,
    equation: is716 ? "ASCE 7-16 Eq. 26.10-1: qz = 0.00256 Kz Kzt Kd Ke V²" : "ASCE 7-22 Eq. 26.10-1: qz = 0.00256 Kz Kzt Ke V²",
  };
}
