/**
 * True north as a horizontal unit vector in the preview's axes, from the array azimuth: the
 * compass bearing the modules face (the low edge's outward normal), clockwise from true north.
 * Drawing only: no load depends on it.
 *
 * Preview axes seen from above (z toward the eye): x to the right, y up the page. Someone standing
 * in front of the array looking at the modules looks along +y, and their right hand is +x. Compass
 * bearings grow clockwise seen from above [common practice], and so does the angle α measured
 * from +y toward +x in that view, so a direction at α has bearing α + B, where B is the bearing
 * of +y. The front (−y, α = 180°) faces the azimuth A, so B = A − 180°, and north (bearing 0°)
 * sits at α = 180° − A: (sin α, cos α, 0) = (sin A, −cos A, 0).
 *
 * Values within 1e-12 of zero are written as 0, so quarter turns give exact axes (sin 180° in
 * floating point is 1.2e-16).
 *
 * @example northInPreviewAxes(180) // { xFt: 0, yFt: 1, zFt: 0 }: facing south, north is behind
 * @example northInPreviewAxes(90)  // { xFt: 1, yFt: 0, zFt: 0 }: facing east, north is on the right
 */
import { requireRange } from "../errors";

const clean = (v: number) => (Math.abs(v) < 1e-12 ? 0 : v);

export function northInPreviewAxes(azimuthDeg: number): { xFt: number; yFt: number; zFt: number } {
  requireRange("array.azimuthDeg", azimuthDeg, 0, 360, "Array azimuth", "degrees");
  const a = (azimuthDeg * Math.PI) / 180;
  return { xFt: clean(Math.sin(a)), yFt: clean(-Math.cos(a)), zFt: 0 };
}
