/**
 * Engine preview geometry → scene objects. Pure functions, no React.
 *
 * The engine draws in feet with x along the array, y horizontal toward the high edge and z up.
 * three.js is y-up, so a point (x, y, z) goes to (x, z, −y): the front of the array (the low edge)
 * faces the +z camera. Every position and size comes from the engine's geometry; this file only
 * swaps axes and turns segments and planes into the transforms three wants.
 */
import { Matrix4, Quaternion, Vector3 } from "three";
import type { Point3Ft, PreviewGeometry } from "@/engine/geometry/preview";
import { DRAW } from "./scene-style";

export type Vec3 = [number, number, number];
export type Quat = [number, number, number, number];

/** Engine point → three (y-up) position. */
export function toScene(p: Point3Ft): Vec3 {
  return [p.xFt, p.zFt, -p.yFt === 0 ? 0 : -p.yFt];
}

const v3 = (p: Vec3) => new Vector3(p[0], p[1], p[2]);
const quat = (q: Quaternion): Quat => [q.x, q.y, q.z, q.w];
const mid = (a: Vec3, b: Vec3): Vec3 => [(a[0] + b[0]) / 2, (a[1] + b[1]) / 2, (a[2] + b[2]) / 2];

/** An upright cylinder between two heights (posts, footings): centre, height and radius. */
export interface Upright { id: string; position: Vec3; heightFt: number; radiusFt: number }

export function postUprights(g: PreviewGeometry): Upright[] {
  return g.posts.map((p) => ({
    id: p.id,
    position: mid(toScene({ xFt: p.xFt, yFt: p.yFt, zFt: p.bottomZFt }), toScene({ xFt: p.xFt, yFt: p.yFt, zFt: p.topZFt })),
    heightFt: p.topZFt - p.bottomZFt,
    radiusFt: p.outsideDiameterFt / 2,
  }));
}

export function footingUprights(g: PreviewGeometry): Upright[] {
  return g.footings.map((f) => ({
    id: f.postId,
    position: mid(toScene({ xFt: f.xFt, yFt: f.yFt, zFt: f.bottomZFt }), toScene({ xFt: f.xFt, yFt: f.yFt, zFt: f.topZFt })),
    heightFt: f.depthFt,
    radiusFt: f.diameterFt / 2,
  }));
}

/** A straight member (beam, rail, arrow shaft): midpoint, length and the turn from +y onto it. */
export interface Segment { position: Vec3; lengthFt: number; quaternion: Quat; start: Vec3; end: Vec3 }

export function segment(start: Vec3, end: Vec3): Segment {
  const dir = v3(end).sub(v3(start));
  const lengthFt = dir.length();
  const q = lengthFt > 0 ? new Quaternion().setFromUnitVectors(new Vector3(0, 1, 0), dir.normalize()) : new Quaternion();
  return { position: mid(start, end), lengthFt, quaternion: quat(q), start, end };
}

export const beamSegment = (g: PreviewGeometry) => segment(toScene(g.beam.start), toScene(g.beam.end));
export const railSegments = (g: PreviewGeometry) => g.rails.map((r) => segment(toScene(r.start), toScene(r.end)));

/**
 * The turn that lays a unit box on the panel plane: box x along the array, box y along the
 * panel's normal, box z down the slope (x × normal = −upSlope, so the basis stays right-handed).
 */
export function panelQuaternion(g: PreviewGeometry): Quat {
  const normal = v3(toScene(g.panelPlane.normal));
  const upSlope = v3(toScene(g.panelPlane.upSlope));
  const along = new Vector3().crossVectors(upSlope, normal);
  const m = new Matrix4().makeBasis(along, normal, upSlope.clone().negate());
  return quat(new Quaternion().setFromRotationMatrix(m));
}

/** One module instance: where its centre sits and how big it is (x along the array, z along the slope). */
export interface ModuleInstance { row: number; column: number; position: Vec3; scale: Vec3 }

export function moduleInstances(g: PreviewGeometry): ModuleInstance[] {
  return g.modules.map((m) => ({
    row: m.row,
    column: m.column,
    position: toScene(m.centre),
    scale: [m.alongWidthFt, DRAW.moduleThicknessFt, m.alongSlopeFt],
  }));
}

/** The ground as two triangles over the engine's four corners (counter-clockwise seen from above). */
export function groundMesh(g: PreviewGeometry): { positions: Float32Array; indices: number[]; outline: Vec3[] } {
  const pts = g.ground.corners.map(toScene);
  return { positions: new Float32Array(pts.flat()), indices: [0, 1, 2, 0, 2, 3], outline: [...pts, pts[0]] };
}
