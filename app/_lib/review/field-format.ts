/** Tape-measure lengths moved to the one formatter (components/format/tape.ts); the compass point stays here. */
export { ftIn, quarterIn } from "@/components/format/tape";

/** The eight compass points, each the middle of a 45° sector clockwise from north [common practice]. */
const POINTS = ["N", "NE", "E", "SE", "S", "SW", "W", "NW"];

/** A compass bearing as a crew reads it: 180° (S), 172.5° (S), 225° (SW). */
export function bearing(deg: number): string {
  return `${Number(deg.toFixed(1))}° (${POINTS[Math.round(deg / 45) % 8]})`;
}
