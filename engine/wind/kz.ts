/**
 * Velocity pressure exposure coefficient Kz.
 *
 * Source: ASCE 7-16 Table 26.10-1 and its footnote formula; ASCE 7-22 Table 26.10-1 (new constants).
 * Kz = c (z / zg)^(2/α) for 15 ft ≤ z ≤ zg; below 15 ft the value at 15 ft applies.
 *   7-16: c 2.01; B α 7.0 zg 1200 ft; C 9.5 / 900; D 11.5 / 700.   [memory + open code]
 *   7-22: c 2.41; B α 7.5 zg 3280 ft; C 9.8 / 2460; D 11.5 / 1935. [memory + open code]
 * Choice: at z ≤ 15 ft the engine uses the tabulated values B 0.57, C 0.85, D 1.03 (the same
 * in both editions' tables); above 15 ft it uses the formula. Ground-mounted arrays almost always
 * sit below 15 ft, so the tabulated value is what a reviewer will check by hand.
 */
import { requireOneOf, requireRange } from "../errors";

// The allowed values, built once (these checks run for every tilt of every design).
const EDITIONS = ["7-16", "7-22"] as const;
const EXPOSURES = ["B", "C", "D"] as const;

export type Edition = "7-16" | "7-22";
export type Exposure = "B" | "C" | "D";

export const EXPOSURE_CONSTANTS: Record<Edition, { factor: number } & Record<Exposure, { alpha: number; zgFt: number }>> = {
  "7-16": { factor: 2.01, B: { alpha: 7.0, zgFt: 1200 }, C: { alpha: 9.5, zgFt: 900 }, D: { alpha: 11.5, zgFt: 700 } },
  "7-22": { factor: 2.41, B: { alpha: 7.5, zgFt: 3280 }, C: { alpha: 9.8, zgFt: 2460 }, D: { alpha: 11.5, zgFt: 1935 } },
};

/** Tabulated Kz at 0–15 ft, ASCE 7-16 / 7-22 Table 26.10-1 [memory]. */
export const KZ_AT_15FT_TABLE: Record<Exposure, number> = { B: 0.57, C: 0.85, D: 1.03 };

/**
 * Kz at height z above grade.
 * @param heightFt height z (ft), 0–500
 * @returns { kz, method } where method says whether the table or the formula was used
 * @example exposureCoefficientKz({ edition: "7-16", exposure: "C", heightFt: 10 }) // { kz: 0.85, method: "table" }
 */
export function exposureCoefficientKz(args: { edition: Edition; exposure: Exposure; heightFt: number }): {
  kz: number;
  method: "table" | "formula";
} {
  requireOneOf("edition", args.edition, EDITIONS, "ASCE 7 edition");
  requireOneOf("exposure", args.exposure, EXPOSURES, "Exposure category");
  requireRange("heightFt", args.heightFt, 0, 500, "Height above grade", "ft");
  if (args.heightFt <= 15) return { kz: KZ_AT_15FT_TABLE[args.exposure], method: "table" };
  const c = EXPOSURE_CONSTANTS[args.edition];
  const { alpha, zgFt } = c[args.exposure];
  const z = Math.min(args.heightFt, zgFt);
  return { kz: c.factor * Math.pow(z / zgFt, 2 / alpha), method: "formula" };
}

/** The power-law formula alone (no table), for comparison: at 15 ft, exposure C, 7-16 it gives 0.849. */
export function kzFormula(edition: Edition, exposure: Exposure, heightFt: number): number {
  const c = EXPOSURE_CONSTANTS[edition];
  const { alpha, zgFt } = c[exposure];
  const z = Math.min(Math.max(heightFt, 15), zgFt);
  return c.factor * Math.pow(z / zgFt, 2 / alpha);
}
