/**
 * Labels for the preview in the chosen unit system. Conversion goes through the engine's one unit
 * table (engine/units.ts); nothing here is engineering arithmetic, only display rounding.
 */
import { formatQuantity } from "@/components/format/quantity";
import { groupedNumber } from "@/components/ui/grouped-number";
import type { PreviewGeometry } from "@/engine/geometry/preview";

export type UnitSystem = "imperial" | "metric";

const grouped = (value: number, digits = 0) => groupedNumber(value, digits);

/** A length the engine gives in inches: "24 in" (or "72 in (6 ft 0 in)") / "610 mm". */
export function formatLengthIn(valueIn: number, units: UnitSystem): string {
  if (units === "metric") return formatQuantity(valueIn, "in", units);
  const wholeIn = Math.round(valueIn * 10) / 10;
  const text = `${grouped(wholeIn, Number.isInteger(wholeIn) ? 0 : 1)} in`;
  if (wholeIn < 24) return text;
  // Crews read long lengths in feet and inches.
  const ft = Math.floor(wholeIn / 12);
  const rest = Math.round((wholeIn - ft * 12) * 10) / 10;
  return `${text} (${ft} ft ${rest} in)`;
}

/** A force the engine gives in pounds: "10,579 lb" / "47.1 kN" (the one formatter). */
export function formatForceLb(valueLb: number, units: UnitSystem): string {
  return formatQuantity(valueLb, "lb", units);
}

/** Plain words for the engine's wind direction (γ) so a crew lead need not know the symbol. */
export function windWords(wind: NonNullable<PreviewGeometry["wind"]>): string {
  return wind.windDirectionDeg === 180 ? "onto the face, from the low edge" : "from behind the high edge";
}

export interface PreviewFigures {
  clearance: string;
  embedment: string;
  embedmentPostId: string;
  wind: string | null;
}

/** The figures shown beside the scene and on the 2D fallback, so both say the same thing. */
export function previewFigures(g: PreviewGeometry, units: UnitSystem): PreviewFigures {
  const w = g.wind;
  return {
    clearance: formatLengthIn(g.dimensions.clearance.valueIn, units),
    embedment: formatLengthIn(g.dimensions.embedment.valueIn, units),
    embedmentPostId: g.dimensions.embedment.postId,
    wind: w ? `${w.label}, ${windWords(w)}; normal force ${formatForceLb(w.normalForceLb, units)}` : null,
  };
}

// The scene's short wind label has a module of its own (wind-label.ts: no unit formatting, so the
// scene's chunk carries none of the formatter); kept importable from here for the 2D elevation.
export { windSceneLabel } from "./wind-label";

/** Where the north marker comes from; revisions saved before the azimuth input were drawn facing south. */
export function northCaption(azimuthDeg: number | undefined): string {
  return typeof azimuthDeg === "number"
    ? `North marker from the array azimuth (${azimuthDeg}°).`
    : "North marker drawn facing south: this revision was saved before the array azimuth input.";
}
