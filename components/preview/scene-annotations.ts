/**
 * Dimension lines, the wind arrow and the north marker, mapped from the engine's geometry.
 * Stand-offs and arrow lengths are drawing choices (so labels do not sit inside parts); the
 * measured points and values are the engine's.
 */
import type { PreviewGeometry } from "@/engine/geometry/preview";
import { segment, toScene, type Segment, type Vec3 } from "./scene-mapping";
import { DRAW } from "./scene-style";

export interface DimensionLine { from: Vec3; to: Vec3; ticks: [Vec3, Vec3][]; labelAt: Vec3 }

const add = (a: Vec3, b: Vec3): Vec3 => [a[0] + b[0], a[1] + b[1], a[2] + b[2]];
const scale = (a: Vec3, k: number): Vec3 => [a[0] * k, a[1] * k, a[2] * k];

/**
 * `labelEnd` puts the label beside one end of the line: the clearance label at its top and the
 * embedment label at its bottom keep the two apart on screen when the lines stand close together.
 */
function verticalDimension(from: Vec3, to: Vec3, standOff: Vec3, labelEnd: "from" | "to"): DimensionLine {
  const a = add(from, standOff), b = add(to, standOff);
  const t = DRAW.tickFt / 2;
  const ticks: [Vec3, Vec3][] = [a, b].map((p) => [add(p, [-t, 0, 0]), add(p, [t, 0, 0])] as [Vec3, Vec3]);
  return { from: a, to: b, ticks, labelAt: labelEnd === "from" ? a : b };
}

/** Clearance: from the lowest edge straight down to grade, stood off toward the front (+z in three). */
export function clearanceDimension(g: PreviewGeometry): DimensionLine {
  const c = g.dimensions.clearance;
  return verticalDimension(toScene(c.from), toScene(c.to), [0, 0, DRAW.dimensionStandOffFt], "from");
}

/**
 * Embedment: from grade at the governing post down to the footing's bottom. The line runs just in
 * front of that footing (its radius plus a stand-off) so the concrete does not hide it.
 */
export function embedmentDimension(g: PreviewGeometry): DimensionLine {
  const e = g.dimensions.embedment;
  const footing = g.footings.find((f) => f.postId === e.postId) ?? g.footings[0];
  const out = (footing ? footing.diameterFt / 2 : 0) + DRAW.dimensionStandOffFt;
  return verticalDimension(toScene(e.from), toScene(e.to), [0, 0, out], "to");
}

export interface WindArrow { tail: Vec3; head: Vec3; direction: Vec3; lengthFt: number }

/**
 * The governing wind as an arrow ending at the engine's centre of pressure (or the beam's middle
 * when the engine gives none), pointing the way the wind blows. `lengthFt` is a drawing length.
 */
export function windArrow(g: PreviewGeometry, lengthFt: number): WindArrow | null {
  if (!g.wind) return null;
  const head = g.wind.centreOfPressure
    ? toScene(g.wind.centreOfPressure)
    : scale(add(toScene(g.beam.start), toScene(g.beam.end)), 0.5);
  const direction = toScene(g.wind.direction);
  return { tail: add(head, scale(direction, -lengthFt)), head, direction, lengthFt };
}

/** North for a result stored before the array azimuth input: such arrays were drawn facing south. */
const NORTH_IF_FACING_SOUTH = { xFt: 0, yFt: 1, zFt: 0 };

/**
 * The north marker, along the engine's `north` (from the array azimuth). Results saved before the
 * azimuth input have no `north`; they are drawn facing south as they were then (`fromAzimuth`
 * false). The marker sits at the ground's back-right corner, away from the dimension labels (the
 * engine's clearance and embedment points are at the front or on the post row).
 */
export function northMarker(g: PreviewGeometry): { at: Vec3; north: Vec3; fromAzimuth: boolean } {
  const corner = g.ground.corners[2];
  const north = (g as Partial<PreviewGeometry>).north;
  return { at: toScene(corner), north: toScene(north ?? NORTH_IF_FACING_SOUTH), fromAzimuth: north !== undefined };
}

/**
 * An arrow drawn as a shaft and a cone: the cone takes the last `headFraction` of the length and
 * ends at `head`. Drawing only.
 */
export function arrowParts(tail: Vec3, head: Vec3, headFraction = 0.25): { shaft: Segment; cone: Segment } {
  const neck: Vec3 = [
    head[0] + (tail[0] - head[0]) * headFraction,
    head[1] + (tail[1] - head[1]) * headFraction,
    head[2] + (tail[2] - head[2]) * headFraction,
  ];
  return { shaft: segment(tail, neck), cone: segment(neck, head) };
}

/** Arrow and marker sizes follow the scene's size, so they read on a 3-module or a 300-module array. */
export const markerSizeFor = (radiusFt: number) => Math.max(0.4, radiusFt * 0.045);

/** The north arrow's tip: the marker's length along north, level. */
export function northTip(g: PreviewGeometry, radiusFt: number): Vec3 {
  const n = northMarker(g);
  const size = markerSizeFor(radiusFt);
  return [n.at[0] + n.north[0] * size * 3, n.at[1], n.at[2] + n.north[2] * size * 3];
}

export interface SceneLabel {
  id: "embedment" | "clearance" | "wind" | "north";
  text: string;
  /** The scene point the label describes. */
  at: Vec3;
  /** Lower is more important: kept when labels compete for the same spot on screen. */
  priority: number;
  fit: "side" | "center";
}

/**
 * The scene's labels, most important first: the embedment (what the crew digs), the clearance,
 * the governing wind, then north. Where they would overlap on screen the less important ones are
 * hidden (label-placement.ts); the caption under the preview always carries every figure.
 */
export function sceneLabels(g: PreviewGeometry, figures: { clearance: string; embedment: string }, radiusFt: number, windText: string | null): SceneLabel[] {
  const size = markerSizeFor(radiusFt);
  const labels: SceneLabel[] = [
    { id: "embedment", text: `Embedment ${figures.embedment}`, at: embedmentDimension(g).labelAt, priority: 1, fit: "side" },
    { id: "clearance", text: `Clearance ${figures.clearance}`, at: clearanceDimension(g).labelAt, priority: 2, fit: "side" },
  ];
  const wind = windArrow(g, radiusFt * 0.45);
  if (wind && windText) labels.push({ id: "wind", text: windText, at: [wind.tail[0], wind.tail[1] + size * 3, wind.tail[2]], priority: 3, fit: "side" });
  const tip = northTip(g, radiusFt);
  labels.push({ id: "north", text: "N", at: [tip[0], tip[1] + size, tip[2]], priority: 4, fit: "center" });
  return labels;
}
