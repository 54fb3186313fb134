/**
 * Wind force on the array for one wind direction and load case, resolved at the post top.
 *
 * Method: ASCE 7-16 §27.3.2: p = qh G CN on each half of the surface (7-22: p = qh Kd G CN; pass
 * the product qh·Kd as `qGustlessPsf` for both editions — it is the same number). Each half's
 * force acts normal to the panel plane at its centroid (L/4 from its edge); the centre of pressure
 * from the windward edge is x̄/L = (0.25 CNW + 0.75 CNL)/(CNW + CNL).
 *
 * Axes (ft): x along the array width, y horizontal toward the back (high edge), z up; origin at
 * the post top (beam), which sits at mid-slope, `rackDepthFt` below the panel plane.
 * Signs: + CN toward the top surface; horizontal + toward the back; downward + down; overturning
 * moment + when it tips the post toward the back.
 *
 * @example arrayWindForce({ qGustlessPsf: 24.46, gustFactor: 0.85, cn: { windward: -1.8, leeward: -1.8 },
 *   windDirectionDeg: 0, slopeLengthFt: 10, widthFt: 20, tiltDeg: 30, rackDepthFt: 0.5 }).normalForceLb // -7485.8
 */
import { requireRange } from "../errors";
import type { CnPair, WindDirectionDeg } from "./net-pressure-coefficients";

export interface ArrayWindForce {
  windwardPressurePsf: number;
  leewardPressurePsf: number;
  /** Resultant normal force, + toward the top surface (lb). */
  normalForceLb: number;
  /** From the windward edge along the slope (ft); null when the halves form a pure couple. */
  centreOfPressureFromWindwardEdgeFt: number | null;
  horizontalLb: number;
  downwardLb: number;
  momentAtPostTopLbFt: number;
}

export function arrayWindForce(a: {
  qGustlessPsf: number;
  gustFactor: number;
  cn: CnPair;
  windDirectionDeg: WindDirectionDeg;
  slopeLengthFt: number;
  widthFt: number;
  tiltDeg: number;
  rackDepthFt: number;
}): ArrayWindForce {
  requireRange("array.slopeLengthFt", a.slopeLengthFt, 0.1, 200, "Array slope length", "ft");
  requireRange("array.widthFt", a.widthFt, 0.1, 500, "Array width", "ft");
  const L = a.slopeLengthFt;
  const halfAreaFt2 = (L * a.widthFt) / 2;
  const pw = a.qGustlessPsf * a.gustFactor * a.cn.windward;
  const pl = a.qGustlessPsf * a.gustFactor * a.cn.leeward;
  const t = (a.tiltDeg * Math.PI) / 180;
  const sin = Math.sin(t);
  const cos = Math.cos(t);
  // Slope coordinate of each half's centroid measured from the low edge.
  const sWind = a.windDirectionDeg === 180 ? L / 4 : (3 * L) / 4;
  const sLee = L - sWind;
  // Windward half first, then leeward, each adding to the same running sums.
  const sums = { horizontalLb: 0, downwardLb: 0, momentAtPostTopLbFt: 0 };
  addHalf(sums, pw * halfAreaFt2, sWind - L / 2, sin, cos, a.rackDepthFt);
  addHalf(sums, pl * halfAreaFt2, sLee - L / 2, sin, cos, a.rackDepthFt);
  const sumCn = a.cn.windward + a.cn.leeward;
  return {
    windwardPressurePsf: pw,
    leewardPressurePsf: pl,
    normalForceLb: (pw + pl) * halfAreaFt2,
    centreOfPressureFromWindwardEdgeFt:
      Math.abs(sumCn) < 1e-9 ? null : (L * (0.25 * a.cn.windward + 0.75 * a.cn.leeward)) / sumCn,
    ...sums,
  };
}

/**
 * Adds one half's resultant (force normal to the panel, lb, + toward the top surface) acting at
 * slope distance `sFromMidFt` from the mid-slope line: horizontal and downward force and the moment
 * about the post top (ft above it by `rackDepthFt`).
 */
function addHalf(
  sums: { horizontalLb: number; downwardLb: number; momentAtPostTopLbFt: number },
  normalLb: number,
  sFromMidFt: number,
  sin: number,
  cos: number,
  rackDepthFt: number,
): void {
  const fy = normalLb * sin;
  const fz = -normalLb * cos;
  const y = sFromMidFt * cos;
  const z = sFromMidFt * sin + rackDepthFt;
  sums.horizontalLb += fy;
  sums.downwardLb -= fz;
  sums.momentAtPostTopLbFt += fy * z - fz * y;
}
