/**
 * Everything a 3D preview needs to draw the design, already computed: the preview does no
 * engineering arithmetic of its own.
 *
 * Units ft. Axes: x along the array (right when facing the modules), y horizontal toward the back
 * (high edge), z up; origin on grade under the array centre. Grade z = along·x + across·y.
 * `north` turns these axes to the compass from the array azimuth (see north.ts).
 */
import type { ArrayLoadState } from "../loads/array-loads";
import { gradeAt } from "./grade";
import { northInPreviewAxes } from "./north";

export interface Point3Ft { xFt: number; yFt: number; zFt: number }

export interface PreviewGeometry {
  units: "ft";
  axes: string;
  /** True north as a horizontal unit vector in these axes, from the array azimuth (drawing only). */
  north: Point3Ft;
  ground: { slopeAlongPct: number; slopeAcrossPct: number; corners: Point3Ft[] };
  panelPlane: { tiltDeg: number; normal: Point3Ft; upSlope: Point3Ft; lowEdgeZFt: number; highEdgeZFt: number; widthFt: number; slopeLengthFt: number };
  posts: { id: string; xFt: number; yFt: number; gradeZFt: number; topZFt: number; bottomZFt: number; outsideDiameterFt: number }[];
  footings: { postId: string; xFt: number; yFt: number; topZFt: number; bottomZFt: number; diameterFt: number; depthFt: number }[];
  beam: { start: Point3Ft; end: Point3Ft };
  rails: { start: Point3Ft; end: Point3Ft }[];
  modules: { row: number; column: number; centre: Point3Ft; corners: Point3Ft[]; alongSlopeFt: number; alongWidthFt: number }[];
  dimensions: {
    clearance: { from: Point3Ft; to: Point3Ft; valueIn: number };
    embedment: { from: Point3Ft; to: Point3Ft; valueIn: number; postId: string };
  };
  wind: { windDirectionDeg: 0 | 180; loadCase: "A" | "B"; label: string; direction: Point3Ft; normalForceLb: number; centreOfPressure: Point3Ft | null } | null;
}

const P = (xFt: number, yFt: number, zFt: number): Point3Ft => ({ xFt, yFt, zFt });

/** Where the panel plane puts slope coordinate s (ft from the low edge), u across, lifted normal to it. */
interface Plane { L: number; cos: number; sin: number; meanHeightFt: number }
// Module-level rather than a closure per call: the preview places ~80 points per design.
function onPlane(pl: Plane, u: number, s: number, lift = 0): Point3Ft {
  return P(u, (s - pl.L / 2) * pl.cos - lift * pl.sin, pl.meanHeightFt + (s - pl.L / 2) * pl.sin + lift * pl.cos);
}

export function previewGeometry(
  st: ArrayLoadState,
  a: { azimuthDeg: number; gapIn: number; rackDepthIn: number; postOutsideDiameterIn: number; diameterIn: number; depthIn: number; governingPostId: string | null; windCase: number },
): PreviewGeometry {
  const { dims, heights } = st;
  const t = (st.tiltDeg * Math.PI) / 180;
  const cos = Math.cos(t), sin = Math.sin(t);
  const W = dims.widthFt, L = dims.slopeLengthFt;
  const pl: Plane = { L, cos, sin, meanHeightFt: heights.meanHeightFt };
  const slope = { along: st.slopeAlongPct, across: st.slopeAcrossPct };
  const along = slope.along, across = slope.across;
  const m = 3, hx = W / 2 + m, hy = (L / 2) * cos + m;
  const corners = [P(-hx, -hy, gradeAt(-hx, -hy, along, across)), P(hx, -hy, gradeAt(hx, -hy, along, across)), P(hx, hy, gradeAt(hx, hy, along, across)), P(-hx, hy, gradeAt(-hx, hy, along, across))];
  const depthFt = a.depthIn / 12;
  const posts = st.posts.map((p) => ({
    id: p.id, xFt: p.xFt, yFt: 0, gradeZFt: p.gradeFt, topZFt: heights.postTopFt, bottomZFt: p.gradeFt - depthFt, outsideDiameterFt: a.postOutsideDiameterIn / 12,
  }));
  const footings = posts.map((p) => ({ postId: p.id, xFt: p.xFt, yFt: 0, topZFt: p.gradeZFt, bottomZFt: p.bottomZFt, diameterFt: a.diameterIn / 12, depthFt }));
  const rack = a.rackDepthIn / 12;
  const beamZ = heights.postTopFt + rack / 4;
  const railCount = Math.max(2, Math.ceil((W - 1) / 4) + 1);
  const rails = Array.from({ length: railCount }, (_, i) => {
    const u = -W / 2 + 0.5 + ((W - 1) * i) / (railCount - 1);
    return { start: onPlane(pl, u, 0, -rack / 4), end: onPlane(pl, u, L, -rack / 4) };
  });
  const gapFt = a.gapIn / 12, ms = dims.moduleAlongSlopeIn / 12, mw = dims.moduleAlongWidthIn / 12;
  const rows = Math.round((L + gapFt) / (ms + gapFt)), cols = Math.round((W + gapFt) / (mw + gapFt));
  const modules = [];
  for (let r = 0; r < rows; r++) for (let c = 0; c < cols; c++) {
    const u0 = -W / 2 + c * (mw + gapFt), s0 = r * (ms + gapFt);
    modules.push({
      row: r, column: c, centre: onPlane(pl, u0 + mw / 2, s0 + ms / 2), alongSlopeFt: ms, alongWidthFt: mw,
      corners: [onPlane(pl, u0, s0), onPlane(pl, u0 + mw, s0), onPlane(pl, u0 + mw, s0 + ms), onPlane(pl, u0, s0 + ms)],
    });
  }
  const cx = heights.minClearanceAt.xFt, cy = heights.minClearanceAt.yFt;
  const gp = posts.find((p) => p.id === a.governingPostId) ?? posts[0];
  const wc = a.windCase >= 0 ? st.windCases[a.windCase] : null;
  const cop = wc && wc.force.centreOfPressureFromWindwardEdgeFt !== null
    ? onPlane(pl, 0, wc.windDirectionDeg === 180 ? wc.force.centreOfPressureFromWindwardEdgeFt : L - wc.force.centreOfPressureFromWindwardEdgeFt)
    : null;
  return {
    units: "ft",
    axes: "x along the array (right when facing the modules), y horizontal toward the back (high edge), z up; origin on grade under the array centre",
    north: northInPreviewAxes(a.azimuthDeg),
    ground: { slopeAlongPct: slope.along, slopeAcrossPct: slope.across, corners },
    panelPlane: { tiltDeg: st.tiltDeg, normal: P(0, -sin, cos), upSlope: P(0, cos, sin), lowEdgeZFt: heights.lowestEdgeFt, highEdgeZFt: heights.highestEdgeFt, widthFt: W, slopeLengthFt: L },
    posts, footings,
    beam: { start: P(-W / 2, 0, beamZ), end: P(W / 2, 0, beamZ) },
    rails, modules,
    dimensions: {
      clearance: { from: P(cx, cy, gradeAt(cx, cy, along, across) + heights.minClearanceIn / 12), to: P(cx, cy, gradeAt(cx, cy, along, across)), valueIn: heights.minClearanceIn },
      embedment: { from: P(gp.xFt, 0, gp.gradeZFt), to: P(gp.xFt, 0, gp.bottomZFt), valueIn: a.depthIn, postId: gp.id },
    },
    wind: wc && {
      windDirectionDeg: wc.windDirectionDeg, loadCase: wc.loadCase, label: wc.label,
      direction: P(0, wc.windDirectionDeg === 180 ? 1 : -1, 0), normalForceLb: wc.force.normalForceLb, centreOfPressure: cop,
    },
  };
}
