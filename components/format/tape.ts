import { formatQuantity, type UnitSystem } from "./quantity";

/**
 * Lengths as a crew's tape reads them. US units: feet and inches to the nearest ¼ in (crews lay out
 * in ft-in, not decimal feet [common practice]); metric: whole millimetres, the same text the
 * formatter gives everywhere else.
 */
const QUARTERS = ["", "¼", "½", "¾"];

export function ftIn(inches: number): string {
  const quarters = Math.round(Math.abs(inches) * 4);
  const sign = inches < 0 && quarters > 0 ? "−" : "";
  const ft = Math.floor(quarters / 48);
  const inPart = Math.floor((quarters % 48) / 4);
  const frac = QUARTERS[quarters % 4];
  const inText = `${inPart}${frac} in`;
  return ft > 0 ? `${sign}${ft} ft ${inText}` : `${sign}${inText}`;
}

/** Inches to the nearest ¼ with the fraction glyph: 52¾ in. */
export function quarterIn(inches: number): string {
  const quarters = Math.round(inches * 4);
  return `${Math.floor(quarters / 4)}${QUARTERS[quarters % 4]} in`;
}

/** A layout length (post position, height, cut length): "5 ft 6¼ in" / "1,683 mm". */
export function tapeLength(inches: number, system: UnitSystem): string {
  return system === "imperial" ? ftIn(inches) : formatQuantity(inches, "in", system);
}

/** A hole or edge measure in inches: "52¾ in" / "1,340 mm". */
export function tapeInches(inches: number, system: UnitSystem): string {
  return system === "imperial" ? quarterIn(inches) : formatQuantity(inches, "in", system);
}
