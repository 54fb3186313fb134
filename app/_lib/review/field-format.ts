/**
 * How a tape measure reads: feet and inches to the nearest ¼ in. Crews lay out in ft-in, not in
 * decimal feet [common practice].
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

/** The eight compass points, each the middle of a 45° sector clockwise from north [common practice]. */
const POINTS = ["N", "NE", "E", "SE", "S", "SW", "W", "NW"];

/** A compass bearing as a crew reads it: 180° (S), 172.5° (S), 225° (SW). */
export function bearing(deg: number): string {
  return `${Number(deg.toFixed(1))}° (${POINTS[Math.round(deg / 45) % 8]})`;
}
