/**
 * Camera framing from the geometry's bounds, for any array size, and the named views.
 */
import type { PreviewGeometry } from "@/engine/geometry/preview";
import { toScene, type Vec3 } from "./scene-mapping";

export interface Bounds { min: Vec3; max: Vec3; centre: Vec3; radiusFt: number }

/** Box around everything drawn: ground, footing bottoms, post tops and module corners. */
export function sceneBounds(g: PreviewGeometry): Bounds {
  const pts: Vec3[] = [
    ...g.ground.corners.map(toScene),
    ...g.footings.flatMap((f) => [toScene({ xFt: f.xFt, yFt: f.yFt, zFt: f.bottomZFt }), toScene({ xFt: f.xFt, yFt: f.yFt, zFt: f.topZFt })]),
    ...g.posts.map((p) => toScene({ xFt: p.xFt, yFt: p.yFt, zFt: p.topZFt })),
    ...g.modules.flatMap((m) => m.corners.map(toScene)),
  ];
  const min: Vec3 = [Infinity, Infinity, Infinity];
  const max: Vec3 = [-Infinity, -Infinity, -Infinity];
  for (const p of pts) for (let i = 0; i < 3; i++) {
    min[i] = Math.min(min[i], p[i]);
    max[i] = Math.max(max[i], p[i]);
  }
  const centre: Vec3 = [(min[0] + max[0]) / 2, (min[1] + max[1]) / 2, (min[2] + max[2]) / 2];
  const radiusFt = Math.hypot(max[0] - min[0], max[1] - min[1], max[2] - min[2]) / 2;
  return { min, max, centre, radiusFt };
}

export type ViewName = "home" | "front" | "side" | "top";

/** Unit directions from the target to the camera (three coordinates). Front looks at the low edge. */
const VIEW_DIRECTIONS: Record<ViewName, Vec3> = {
  home: [0.55, 0.45, 0.7],
  front: [0, 0, 1],
  side: [1, 0, 0],
  // Straight down would make OrbitControls' up vector degenerate; a hair toward the front avoids it.
  top: [0, 1, 0.001],
};

/**
 * Where the camera goes so the whole scene fits a perspective view of `fovDeg` (vertical) at
 * `aspect`: each corner of the bounds, seen along the view, must sit inside both half-angles.
 */
export function cameraForView(view: ViewName, bounds: Bounds, fovDeg: number, aspect: number): { position: Vec3; target: Vec3; distanceFt: number } {
  const tanV = Math.tan((fovDeg * Math.PI) / 360);
  const tanH = tanV * aspect;
  const d = unit(VIEW_DIRECTIONS[view]);
  const right = unit(cross([0, 1, 0], d));
  const up = cross(d, right);
  const c = bounds.centre;
  let distanceFt = 0;
  for (const x of [bounds.min[0], bounds.max[0]]) for (const y of [bounds.min[1], bounds.max[1]]) for (const z of [bounds.min[2], bounds.max[2]]) {
    const p: Vec3 = [x - c[0], y - c[1], z - c[2]];
    const depth = dot(p, d);
    distanceFt = Math.max(distanceFt, depth + Math.abs(dot(p, right)) / tanH, depth + Math.abs(dot(p, up)) / tanV);
  }
  distanceFt = Math.max(distanceFt * 1.08, bounds.radiusFt * 0.5);
  return { position: [c[0] + d[0] * distanceFt, c[1] + d[1] * distanceFt, c[2] + d[2] * distanceFt], target: c, distanceFt };
}

const dot = (a: Vec3, b: Vec3) => a[0] * b[0] + a[1] * b[1] + a[2] * b[2];
const cross = (a: Vec3, b: Vec3): Vec3 => [a[1] * b[2] - a[2] * b[1], a[2] * b[0] - a[0] * b[2], a[0] * b[1] - a[1] * b[0]];
const unit = (a: Vec3): Vec3 => {
  const len = Math.hypot(a[0], a[1], a[2]);
  return [a[0] / len, a[1] / len, a[2] / len];
};
