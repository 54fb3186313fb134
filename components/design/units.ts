import { toMetric, fromMetric, type CustomaryUnit } from "@/engine/units";
import { groupedNumber } from "@/components/ui/grouped-number";

/**
 * Imperial/metric display at the edges. The engine and the saved revisions stay in US customary
 * units; these helpers convert only what is shown and what is typed, with the engine's factors
 * (engine/units.ts: exact constants, checked against mathjs in tests).
 */
export type UnitSystem = "imperial" | "metric";

/** A quantity kind as the app shows it: the engine unit, the metric unit shown, the scale, decimals. */
export interface DisplayUnit {
  imperial: string;
  metric: string;
  /** Customary unit in the engine's table, and a scale applied first (e.g. lb → kip before kN). */
  engineUnit: CustomaryUnit | null;
  scale: number;
  decimals: { imperial: number; metric: number };
}

const u = (imperial: string, metric: string, engineUnit: CustomaryUnit | null, scale: number, di: number, dm: number): DisplayUnit => ({ imperial, metric, engineUnit, scale, decimals: { imperial: di, metric: dm } });

export const DISPLAY_UNITS = {
  in: u("in", "mm", "in", 1, 1, 0),
  ft: u("ft", "m", "ft", 1, 2, 2),
  lb: u("lb", "kN", "kip", 1 / 1000, 0, 2),
  lbMass: u("lb", "kg", "lbMass", 1, 1, 1),
  lbFt: u("lb·ft", "kN·m", "kipFt", 1 / 1000, 0, 2),
  kipFt: u("kip·ft", "kN·m", "kipFt", 1, 2, 2),
  psf: u("psf", "kPa", "psf", 1, 1, 2),
  psfPerFt: u("psf/ft", "kPa/m", "psfPerFt", 1, 0, 1),
  pcf: u("pcf", "kN/m³", "pcf", 1, 0, 1),
  ksi: u("ksi", "MPa", "ksi", 1, 0, 0),
  psi: u("psi", "MPa", "ksi", 1 / 1000, 0, 1),
  mph: u("mph", "m/s", "mph", 1, 0, 1),
  ft3: u("ft³", "m³", "ft3", 1, 2, 3),
  yd3: u("yd³", "m³", "yd3", 1, 2, 2),
  ft2: u("ft²", "m²", "ft2", 1, 1, 1),
  deg: u("°", "°", null, 1, 1, 1),
  pct: u("%", "%", null, 1, 1, 1),
  none: u("", "", null, 1, 2, 2),
} as const satisfies Record<string, DisplayUnit>;
export type UnitKind = keyof typeof DISPLAY_UNITS;

export function unitLabel(kind: UnitKind, system: UnitSystem): string {
  return DISPLAY_UNITS[kind][system];
}

/** Engine value → the number shown in `system`. */
export function toDisplay(value: number, kind: UnitKind, system: UnitSystem): number {
  const d = DISPLAY_UNITS[kind];
  if (system === "imperial" || !d.engineUnit) return value;
  return toMetric(value * d.scale, d.engineUnit);
}

/** A number typed in `system` → the engine value. */
export function fromDisplay(value: number, kind: UnitKind, system: UnitSystem): number {
  const d = DISPLAY_UNITS[kind];
  if (system === "imperial" || !d.engineUnit) return value;
  return fromMetric(value, d.engineUnit) / d.scale;
}

/** Rounds for display without trailing noise (0.30000000000000004 → 0.3). */
export function roundFor(value: number, kind: UnitKind, system: UnitSystem, extraDecimals = 0): number {
  const decimals = DISPLAY_UNITS[kind].decimals[system] + extraDecimals;
  const f = 10 ** decimals;
  return Math.round(value * f) / f;
}

/** "5.50 ft", "1.68 m", "1,234 lb". */
export function formatQuantity(value: number | null | undefined, kind: UnitKind, system: UnitSystem, opts: { decimals?: number } = {}): string {
  if (value === null || value === undefined || !Number.isFinite(value)) return "—";
  const shown = toDisplay(value, kind, system);
  const decimals = opts.decimals ?? DISPLAY_UNITS[kind].decimals[system];
  const text = groupedNumber(shown, decimals);
  const label = unitLabel(kind, system);
  return label ? (label === "°" || label === "%" ? `${text}${label}` : `${text} ${label}`) : text;
}
