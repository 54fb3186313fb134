/**
 * Unit conversion at the edges. The engine works in US customary units (ft, in, lb, psf, mph);
 * the app converts to metric for display with `toMetric` and back with `fromMetric`
 * (components/design/units.ts). Factors are derived once from mathjs
 * (so they carry its exact definitions) and applied with plain multiplication, keeping mathjs
 * out of the hot path. An unknown unit throws, naming it.
 */
import { unit } from "mathjs";
import { EngineInputError } from "./errors";

/** Each customary unit the engine uses, its metric partner and the mathjs expression for it. */
const DEFINITIONS = {
  in: { metric: "mm", from: "inch", to: "mm" },
  ft: { metric: "m", from: "ft", to: "m" },
  ft2: { metric: "m2", from: "ft^2", to: "m^2" },
  ft3: { metric: "m3", from: "ft^3", to: "m^3" },
  yd3: { metric: "m3", from: "yd^3", to: "m^3" },
  lb: { metric: "N", from: "lbf", to: "N" },
  lbMass: { metric: "kg", from: "lbm", to: "kg" },
  kip: { metric: "kN", from: "1000 lbf", to: "kN" },
  lbFt: { metric: "N_m", from: "lbf ft", to: "N m" },
  kipFt: { metric: "kN_m", from: "1000 lbf ft", to: "kN m" },
  psf: { metric: "kPa", from: "lbf/ft^2", to: "kPa" },
  psfPerFt: { metric: "kPa_per_m", from: "lbf/ft^2/ft", to: "kPa/m" },
  pcf: { metric: "kN_per_m3", from: "lbf/ft^3", to: "kN/m^3" },
  ksi: { metric: "MPa", from: "1000 lbf/inch^2", to: "MPa" },
  mph: { metric: "m_per_s", from: "mi/h", to: "m/s" },
  lbPerFt: { metric: "N_per_m", from: "lbf/ft", to: "N/m" },
  in3: { metric: "mm3", from: "inch^3", to: "mm^3" },
} as const;

export type CustomaryUnit = keyof typeof DEFINITIONS;
export type MetricUnit = (typeof DEFINITIONS)[CustomaryUnit]["metric"];

function factorFor(expr: string, to: string): number {
  const [num, ...rest] = expr.split(" ");
  const hasNumber = Number.isFinite(Number(num));
  return unit(hasNumber ? Number(num) : 1, hasNumber ? rest.join(" ") : expr).toNumber(to);
}

/**
 * The conversion table: multiply a customary value by `factor` to get the metric value.
 * @example UNIT_TABLE.ft // { metric: "m", factor: 0.3048 }
 */
export const UNIT_TABLE: Readonly<Record<CustomaryUnit, { metric: MetricUnit; factor: number }>> =
  Object.freeze(
    Object.fromEntries(
      Object.entries(DEFINITIONS).map(([k, d]) => [k, { metric: d.metric, factor: factorFor(d.from, d.to) }]),
    ) as Record<CustomaryUnit, { metric: MetricUnit; factor: number }>,
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
