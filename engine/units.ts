/**
 * Unit conversion at the edges. The engine works in US customary units (ft, in, lb, psf, mph);
 * the app converts to metric for display with `toMetric` and back with
 * `fromMetric`. Every factor is a constant built from
 * the exact definitions below, so this module costs nothing to load in the browser (no unit
 * library). tests/engine/unit-factors.test.ts checks each factor against mathjs, which stays the
 * authority, through the `mathjs` expression kept beside it. An unknown unit throws, naming it.
 */
import { EngineInputError } from "./errors";

// Exact definitions (international yard and pound agreement, 1959; NIST SP 811, 2008, App. B).
/** 1 in = 25.4 mm, exactly. */
const MM_PER_IN = 25.4;
/** 1 ft = 12 in = 0.3048 m, exactly. */
const M_PER_FT = 0.3048;
/** 1 yd = 3 ft = 0.9144 m, exactly. */
const M_PER_YD = 0.9144;
/** 1 lb (mass) = 0.45359237 kg, exactly. */
const KG_PER_LB = 0.45359237;
/** 1 lbf = 1 lb × standard gravity 9.80665 m/s² = 4.4482216152605 N, exactly. */
const N_PER_LBF = KG_PER_LB * 9.80665;
/** 1 mi = 5280 ft = 1609.344 m, exactly. */
const M_PER_MI = 1609.344;

/**
 * Each customary unit the engine uses: its metric partner, the factor (multiply a customary value
 * by it to get the metric value) and the mathjs expression the test checks the factor against.
 */
const TABLE = {
  in: { metric: "mm", factor: MM_PER_IN, mathjs: ["inch", "mm"] },
  ft: { metric: "m", factor: M_PER_FT, mathjs: ["ft", "m"] },
  ft2: { metric: "m2", factor: M_PER_FT ** 2, mathjs: ["ft^2", "m^2"] },
  ft3: { metric: "m3", factor: M_PER_FT ** 3, mathjs: ["ft^3", "m^3"] },
  yd3: { metric: "m3", factor: M_PER_YD ** 3, mathjs: ["yd^3", "m^3"] },
  lb: { metric: "N", factor: N_PER_LBF, mathjs: ["lbf", "N"] },
  lbMass: { metric: "kg", factor: KG_PER_LB, mathjs: ["lbm", "kg"] },
  // kip = 1000 lbf → kN = 1000 N: the thousands cancel.
  kip: { metric: "kN", factor: N_PER_LBF, mathjs: ["1000 lbf", "kN"] },
  lbFt: { metric: "N_m", factor: N_PER_LBF * M_PER_FT, mathjs: ["lbf ft", "N m"] },
  kipFt: { metric: "kN_m", factor: N_PER_LBF * M_PER_FT, mathjs: ["1000 lbf ft", "kN m"] },
  // lbf/ft² → Pa, then Pa → kPa.
  psf: { metric: "kPa", factor: N_PER_LBF / M_PER_FT ** 2 / 1000, mathjs: ["lbf/ft^2", "kPa"] },
  psfPerFt: { metric: "kPa_per_m", factor: N_PER_LBF / M_PER_FT ** 3 / 1000, mathjs: ["lbf/ft^2/ft", "kPa/m"] },
  pcf: { metric: "kN_per_m3", factor: N_PER_LBF / M_PER_FT ** 3 / 1000, mathjs: ["lbf/ft^3", "kN/m^3"] },
  // ksi = 1000 lbf/in² → MPa = 10⁶ N/m²; with in² in m² (MM_PER_IN / 1000)².
  ksi: { metric: "MPa", factor: (1000 * N_PER_LBF) / (MM_PER_IN / 1000) ** 2 / 1e6, mathjs: ["1000 lbf/inch^2", "MPa"] },
  mph: { metric: "m_per_s", factor: M_PER_MI / 3600, mathjs: ["mi/h", "m/s"] },
  lbPerFt: { metric: "N_per_m", factor: N_PER_LBF / M_PER_FT, mathjs: ["lbf/ft", "N/m"] },
  in3: { metric: "mm3", factor: MM_PER_IN ** 3, mathjs: ["inch^3", "mm^3"] },
} as const;

export type CustomaryUnit = keyof typeof TABLE;
export type MetricUnit = (typeof TABLE)[CustomaryUnit]["metric"];

/**
 * The conversion table: multiply a customary value by `factor` to get the metric value.
 * @example UNIT_TABLE.ft // { metric: "m", factor: 0.3048 }
 */
export const UNIT_TABLE: Readonly<Record<CustomaryUnit, { metric: MetricUnit; factor: number }>> = Object.freeze(
  Object.fromEntries(Object.entries(TABLE).map(([k, d]) => [k, Object.freeze({ metric: d.metric, factor: d.factor })])) as Record<CustomaryUnit, { metric: MetricUnit; factor: number }>,
);

/** For the factor test: each unit's mathjs expression, from (customary) and to (metric). */
export const UNIT_MATHJS_EXPRESSIONS: Readonly<Record<CustomaryUnit, readonly [string, string]>> = Object.freeze(
  Object.fromEntries(Object.entries(TABLE).map(([k, d]) => [k, d.mathjs])) as Record<CustomaryUnit, readonly [string, string]>,
);

/** True when `name` is a customary unit in the table. */
export function isCustomaryUnit(name: string): name is CustomaryUnit {
  return Object.prototype.hasOwnProperty.call(UNIT_TABLE, name);
}

/**
 * Convert a customary value to its metric partner.
 * @example toMetric(10, "ft") // 3.048 (m)
 */
export function toMetric(value: number, from: CustomaryUnit): number {
  if (!isCustomaryUnit(from)) throw new EngineInputError("unit", `Unknown unit "${String(from)}"; use one of ${Object.keys(UNIT_TABLE).join(", ")}`);
  return value * UNIT_TABLE[from].factor;
}

/**
 * Convert a metric value back to the customary unit named.
 * @example fromMetric(3.048, "ft") // 10
 */
export function fromMetric(value: number, to: CustomaryUnit): number {
  if (!isCustomaryUnit(to)) throw new EngineInputError("unit", `Unknown unit "${String(to)}"; use one of ${Object.keys(UNIT_TABLE).join(", ")}`);
  return value / UNIT_TABLE[to].factor;
}
