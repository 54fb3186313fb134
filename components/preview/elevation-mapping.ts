/**
 * Engine preview geometry → a 2D side elevation (looking along the array from its right end), for
 * browsers without WebGL. SVG units are feet: svg x = engine y (front/low edge on the left),
 * svg y = −engine z (up is up on screen). Pure functions; every point is the engine's, projected.
 */
import type { Point3Ft, PreviewGeometry } from "@/engine/geometry/preview";
import { DRAW } from "./scene-style";

export type Pt = [number, number];
export interface Rect { x: number; y: number; width: number; height: number }

export const project = (p: Point3Ft): Pt => [p.yFt, p.zFt === 0 ? 0 : -p.zFt];

export interface Elevation {
  viewBox: [number, number, number, number];
  groundNear: [Pt, Pt];
  groundFar: [Pt, Pt];
  panels: [Pt, Pt][];
  post: Rect;
  footing: Rect;
  beam: Pt;
  clearance: { from: Pt; to: Pt };
  embedment: { from: Pt; to: Pt };
  wind: { tail: Pt; head: Pt } | null;
  textSizeFt: number;
}

function uprightRect(yFt: number, widthFt: number, bottomZFt: number, topZFt: number): Rect {
  return { x: yFt - widthFt / 2, y: -topZFt, width: widthFt, height: topZFt - bottomZFt };
}

export function sideElevation(g: PreviewGeometry): Elevation {
  const [c0, c1, c2, c3] = g.ground.corners;
  const postId = g.dimensions.embedment.postId;
  const post = g.posts.find((p) => p.id === postId) ?? g.posts[0];
  const footing = g.footings.find((f) => f.postId === postId) ?? g.footings[0];
  const firstColumn = g.modules.filter((m) => m.column === 0);
  const panels = firstColumn.map((m) => [project(m.corners[0]), project(m.corners[3])] as [Pt, Pt]);

  const all: Pt[] = [c0, c1, c2, c3].map(project).concat(panels.flat(), [
    project({ xFt: 0, yFt: footing.yFt, zFt: footing.bottomZFt }),
  ]);
  const xs = all.map((p) => p[0]), ys = all.map((p) => p[1]);
  const minX = Math.min(...xs), maxX = Math.max(...xs), minY = Math.min(...ys), maxY = Math.max(...ys);
  const margin = Math.max(maxX - minX, maxY - minY) * 0.12;
  const textSizeFt = Math.max(maxX - minX, maxY - minY) * 0.05;
  // The dimension labels sit left of their lines (in front of the array): leave room for them.
  const labelRoomFt = textSizeFt * 11;

  const emb = g.dimensions.embedment;
  const out = footing.diameterFt / 2 + DRAW.dimensionStandOffFt;
  const embFrom = project(emb.from), embTo = project(emb.to);

  let wind: Elevation["wind"] = null;
  if (g.wind) {
    const head = project(g.wind.centreOfPressure ?? g.beam.start);
    const arrowFt = (maxX - minX) * 0.3;
    wind = { head, tail: [head[0] - g.wind.direction.yFt * arrowFt, head[1]] };
  }

  return {
    viewBox: [minX - labelRoomFt, minY - margin, maxX - minX + margin + labelRoomFt, maxY - minY + 2 * margin],
    groundNear: [project(c1), project(c2)],
    groundFar: [project(c0), project(c3)],
    panels,
    post: uprightRect(post.yFt, post.outsideDiameterFt, post.bottomZFt, post.topZFt),
    footing: uprightRect(footing.yFt, footing.diameterFt, footing.bottomZFt, footing.topZFt),
    beam: project(g.beam.start),
    clearance: { from: project(g.dimensions.clearance.from), to: project(g.dimensions.clearance.to) },
    // The front of the elevation is its left (engine −y), so "in front of the footing" is −x here.
    embedment: { from: [embFrom[0] - out, embFrom[1]], to: [embTo[0] - out, embTo[1]] },
    wind,
    textSizeFt,
  };
}
