import { toMetric, fromMetric, type CustomaryUnit } from "@/engine/units";
import { groupedNumber } from "@/components/ui/grouped-number";

/**
 * The one formatter for every number a person reads: each kind of quantity (length, force,
 * pressure, speed, volume, mass, …) has one unit word and one rounding per unit system, and every
 * screen, the printed report and the field spec go through `formatQuantity`, so the same value
 * reads the same everywhere. The engine and the saved revisions stay in US customary units; these
 * helpers convert only what is shown and what is typed, with the engine's factors (engine/units.ts:
 * exact constants, checked against mathjs in tests). Metric rounding: mm whole, m to 0.01, kN to
 * 0.1, m/s to 0.1, kPa to 0.01, m³ to 0.01 (0.001 per hole), kg to 0.1 [common practice].
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
  lb: u("lb", "kN", "kip", 1 / 1000, 0, 1),
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
  // Temperature is an offset, not a factor: formatQuantity converts it itself.
  degF: u("°F", "°C", null, 1, 0, 0),
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
  if (system === "imperial") return value;
  if (kind === "degF") return ((value - 32) * 5) / 9;
  if (!d.engineUnit) return value;
  return toMetric(value * d.scale, d.engineUnit);
}

/** A number typed in `system` → the engine value. */
export function fromDisplay(value: number, kind: UnitKind, system: UnitSystem): number {
  const d = DISPLAY_UNITS[kind];
  if (system === "imperial") return value;
  if (kind === "degF") return (value * 9) / 5 + 32;
  if (!d.engineUnit) return value;
  return fromMetric(value, d.engineUnit) / d.scale;
}

/** Rounds for display without trailing noise (0.30000000000000004 → 0.3). */
export function roundFor(value: number, kind: UnitKind, system: UnitSystem, extraDecimals = 0): number {
  const decimals = DISPLAY_UNITS[kind].decimals[system] + extraDecimals;
  const f = 10 ** decimals;
  return Math.round(value * f) / f;
}

/** "24.0 in" reads "24 in"; "5.50 ft" keeps its decimals. */
const trimZeros = (text: string) => text.replace(/(\d)\.0+(?!\d)/g, "$1");

export interface QuantityFormat {
  /** Decimals in US units (metric always follows the unit's metric rounding unless `metricDecimals`). */
  decimals?: number;
  metricDecimals?: number;
  /** Keep "24.0" rather than "24" (tables that line decimals up). */
  keepZeros?: boolean;
}

/**
 * The one way a quantity is written: "5.50 ft" / "1.68 m", "1,392 lb" / "6.2 kN", "18 in" / "457 mm".
 * `decimals` is the US-units precision (e.g. a value shown as typed); metric keeps its own rule.
 */
export function formatQuantity(value: number | null | undefined, kind: UnitKind, system: UnitSystem, opts: QuantityFormat = {}): string {
  if (value === null || value === undefined || !Number.isFinite(value)) return "—";
  const shown = toDisplay(value, kind, system);
  const decimals = system === "imperial" ? (opts.decimals ?? DISPLAY_UNITS[kind].decimals.imperial) : (opts.metricDecimals ?? DISPLAY_UNITS[kind].decimals.metric);
  // Rounded first, so −0.04 reads "0", never "−0".
  const rounded = Math.round(shown * 10 ** decimals) / 10 ** decimals || 0;
  const raw = groupedNumber(rounded, decimals);
  const text = opts.keepZeros ? raw : trimZeros(raw);
  const label = unitLabel(kind, system);
  return label ? (label === "°" || label === "%" ? `${text}${label}` : `${text} ${label}`) : text;
}

/** A plain count: "1,234" (bags, posts, holes): never converted. */
export function formatCount(n: number | null | undefined): string {
  if (n === null || n === undefined || !Number.isFinite(n)) return "—";
  return groupedNumber(Math.round(n), 0);
}

/** Premix bags: a count, with the bag named by its mass in the reader's units: "12 bags of 80 lb" / "12 bags of 36.3 kg". */
export function formatBags(count: number, bagLb: number, system: UnitSystem): string {
  return `${formatCount(count)} ${count === 1 ? "bag" : "bags"} of ${formatQuantity(bagLb, "lbMass", system, { decimals: 0 })}`;
}

/** A bag size on its own: "80-lb bags" / "36.3 kg bags". */
export function bagSize(bagLb: number, system: UnitSystem): string {
  return system === "imperial" ? `${bagLb}-lb bags` : `${formatQuantity(bagLb, "lbMass", system)} bags`;
}

/** ASME B36.10 nominal pipe size → its metric nominal diameter (DN), ISO 6708 [common practice]. */
const PIPE_DN: Record<string, number> = { "2-1/2": 65, "3": 80, "3-1/2": 90, "4": 100, "5": 125, "6": 150 };

/** A standard pipe by its trade size: "3 in standard pipe" / "DN 80 standard pipe (NPS 3)". */
export function formatPipeSize(size: string, system: UnitSystem): string {
  const nps = size.replace("-", " ");
  if (system === "imperial" || !PIPE_DN[size]) return `${nps} in standard pipe`;
  return `DN ${PIPE_DN[size]} standard pipe (NPS ${nps})`;
}

/** The footing in one phrase, the same on every screen: "18 in diameter × 66 in deep" / "457 mm diameter × 1,676 mm deep". */
export function formatFootingSize(diameterIn: number, depthIn: number, system: UnitSystem): string {
  return `${formatQuantity(diameterIn, "in", system)} diameter × ${formatQuantity(depthIn, "in", system)} deep`;
}
