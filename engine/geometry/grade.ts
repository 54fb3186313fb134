/**
 * Heights above sloping grade: lowest/highest edge, mean height, and each post's height above
 * its own grade.
 *
 * Grade is a plane through the origin (grade under the array centre):
 *   g(x, y) = slopeAlongPct/100 · x + slopeAcrossPct/100 · y   (ft; y + toward the back).
 * The beam is level. The panel height is fixed so the smallest vertical gap between the panel and
 * the ground anywhere beneath it equals the required lowest-edge clearance, at the steepest tilt
 * the rack allows (`clearanceTiltDeg`); flatter settings pivot about the beam and sit higher.
 * [common practice: clearance measured at the tightest point beneath the array]
 *
 * @example gradeHeights({ widthFt: 20, slopeLengthFt: 10, tiltDeg: 30, clearanceTiltDeg: 30,
 *   clearanceIn: 24, rackDepthIn: 6, slopeAlongPct: 0, slopeAcrossPct: 0, postXFt: [-5, 5] })
 *   // lowestEdgeFt 2, meanHeightFt 4.5, highestEdgeFt 7, postHeightAboveGradeFt [4, 4]
 */
import { requireRange } from "../errors";
import { requireInput } from "../input-ranges";

export interface GradeHeights {
  /** Heights are relative to grade at the array centre (ft). */
  lowestEdgeFt: number;
  highestEdgeFt: number;
  meanHeightFt: number;
  postTopFt: number;
  /** Smallest vertical gap between panel and ground beneath it at this tilt (in). */
  minClearanceIn: number;
  /** Where that gap occurs: plan point (ft). */
  minClearanceAt: { xFt: number; yFt: number };
  postGradeFt: number[];
  postHeightAboveGradeFt: number[];
}

const gradeAt = (x: number, y: number, along: number, across: number) => (along / 100) * x + (across / 100) * y;

/** Tilt in radians (module-level: gradeHeights runs for every tilt of every design). */
function rad(d: number): number {
  return (d * Math.PI) / 180;
}

function tightestCorner(widthFt: number, slopeLengthFt: number, tiltRad: number, along: number, across: number) {
  const halfDepth = (slopeLengthFt / 2) * Math.cos(tiltRad);
  const tan = Math.tan(tiltRad);
  // The four plan corners in the order x = −W/2, +W/2, each with y = −D/2, +D/2; the first
  // strictly smallest gap wins (loops over literal arrays, unrolled to avoid allocating them).
  let gapBest = Infinity, xBest = 0, yBest = 0;
  for (let i = 0; i < 4; i++) {
    const x = i < 2 ? -widthFt / 2 : widthFt / 2;
    const y = i % 2 === 0 ? -halfDepth : halfDepth;
    // Panel height above the beam-plane height at y, minus the ground there.
    const gapFt = y * tan - gradeAt(x, y, along, across);
    if (gapFt < gapBest) { gapBest = gapFt; xBest = x; yBest = y; }
  }
  return { gapFt: gapBest, xFt: xBest, yFt: yBest };
}

export function gradeHeights(a: {
  widthFt: number;
  slopeLengthFt: number;
  tiltDeg: number;
  clearanceTiltDeg: number;
  clearanceIn: number;
  rackDepthIn: number;
  slopeAlongPct: number;
  slopeAcrossPct: number;
  postXFt: number[];
}): GradeHeights {
  requireInput("array.lowestEdgeClearanceIn", a.clearanceIn, "in");
  requireRange("site.slopeAlongPct", a.slopeAlongPct, -50, 50, "Ground slope along the array", "%");
  requireRange("site.slopeAcrossPct", a.slopeAcrossPct, -50, 50, "Ground slope across the array", "%");
  const design = tightestCorner(a.widthFt, a.slopeLengthFt, rad(a.clearanceTiltDeg), a.slopeAlongPct, a.slopeAcrossPct);
  const meanHeightFt = a.clearanceIn / 12 - design.gapFt;
  const t = rad(a.tiltDeg);
  const now = tightestCorner(a.widthFt, a.slopeLengthFt, t, a.slopeAlongPct, a.slopeAcrossPct);
  const halfRise = (a.slopeLengthFt / 2) * Math.sin(t);
  const postTopFt = meanHeightFt - a.rackDepthIn / 12;
  const postGradeFt = a.postXFt.map((x) => gradeAt(x, 0, a.slopeAlongPct, a.slopeAcrossPct));
  return {
    lowestEdgeFt: meanHeightFt - halfRise,
    highestEdgeFt: meanHeightFt + halfRise,
    meanHeightFt,
    postTopFt,
    minClearanceIn: (meanHeightFt + now.gapFt) * 12,
    minClearanceAt: { xFt: now.xFt, yFt: now.yFt },
    postGradeFt,
    postHeightAboveGradeFt: postGradeFt.map((g) => postTopFt - g),
  };
}

export { gradeAt };
