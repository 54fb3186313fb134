/**
 * Net pressure coefficients for a tilted open surface (the array "sail").
 *
 * Method: ASCE 7-16 §27.3.2, Fig. 27.3-4, open monoslope free roof. Linear interpolation between
 * the tabulated tilts 7.5°–45°; below 7.5° the figure's 0° row; above 45° the 45° row is used and
 * the design result warns that the figure does not cover it.
 * Sign: "+" acts toward the top (module) surface; negative values lift the array.
 *
 * @param tiltDeg panel tilt from horizontal, 0–60°
 * @param windDirectionDeg 0 = wind from behind the high edge, 180 = wind onto the face
 * @param flow "clear" (nothing under the array) or "obstructed" (≥ 50 % blocked beneath)
 * @example netPressureCoefficients({ tiltDeg: 30, windDirectionDeg: 0, flow: "clear" }).A
 *   // { windward: -1.8, leeward: -1.8 }
 */
import { requireOneOf, requireRange } from "../errors";
import { FREE_ROOF_GAMMA_0, FREE_ROOF_GAMMA_180, FREE_ROOF_TILTS_DEG, FREE_ROOF_ZERO_ROW, type FlowRow } from "./free-roof-table";

// The allowed values, built once (these checks run for every tilt of every design).
const WIND_DIRECTIONS = [0, 180] as const;
const FLOWS = ["clear", "obstructed"] as const;

export type WindDirectionDeg = 0 | 180;
export type Flow = "clear" | "obstructed";
export interface CnPair {
  windward: number;
  leeward: number;
}
export interface NetPressureCoefficients {
  A: CnPair;
  B: CnPair;
}

function pair(row: FlowRow, flow: Flow, c: "A" | "B"): readonly [number, number] {
  return row[flow][c];
}

// A module-level function rather than a closure inside netPressureCoefficients: this runs for every
// tilt of every design, and the closure was re-created on each call.
function pick(rows: readonly FlowRow[], tiltDeg: number, flow: Flow, c: "A" | "B"): CnPair {
  if (tiltDeg < FREE_ROOF_TILTS_DEG[0]) {
    const [w, l] = pair(FREE_ROOF_ZERO_ROW, flow, c);
    return { windward: w, leeward: l };
  }
  const t = Math.min(tiltDeg, 45);
  let i = 0;
  while (i < FREE_ROOF_TILTS_DEG.length - 2 && t > FREE_ROOF_TILTS_DEG[i + 1]) i++;
  const t0 = FREE_ROOF_TILTS_DEG[i];
  const t1 = FREE_ROOF_TILTS_DEG[i + 1];
  const f = (t - t0) / (t1 - t0);
  const a = pair(rows[i], flow, c);
  const b = pair(rows[i + 1], flow, c);
  return { windward: a[0] + f * (b[0] - a[0]), leeward: a[1] + f * (b[1] - a[1]) };
}

export function netPressureCoefficients(args: { tiltDeg: number; windDirectionDeg: WindDirectionDeg; flow: Flow }): NetPressureCoefficients {
  requireRange("array.tiltDeg", args.tiltDeg, 0, 60, "Tilt", "degrees");
  requireOneOf("windDirectionDeg", args.windDirectionDeg, WIND_DIRECTIONS, "Wind direction");
  requireOneOf("array.flow", args.flow, FLOWS, "Wind flow beneath the array");
  const { tiltDeg, flow } = args;
  const rows = args.windDirectionDeg === 0 ? FREE_ROOF_GAMMA_0 : FREE_ROOF_GAMMA_180;
  return { A: pick(rows, tiltDeg, flow, "A"), B: pick(rows, tiltDeg, flow, "B") };
}
