/**
 * The scene's parts for one design, as three.js objects built in one pass (scene.tsx mounts them
 * in the React Three Fiber canvas as one primitive, so a design is not a React tree of meshes):
 * grade, footings, posts, beam, rails, modules, the two dimension lines, the wind arrow and the
 * north marker. Every solid is an instanced draw of a shared unit shape with a shared material
 * (shared-resources.ts), so a whole design draws with three shader programs (instanced matte parts, the part-transparent
 * grade, screen-width lines) and a new design compiles none: only its small per-design buffers
 * (instance matrices, the grade's four corners, the lines' points) are new, and `dispose` frees them.
 */
import { BufferAttribute, BufferGeometry, Group, InstancedMesh, Matrix4, Mesh, Quaternion, Vector3, type BoxGeometry, type ConeGeometry, type CylinderGeometry, type MeshLambertMaterial } from "three";
import { Line2 } from "three/examples/jsm/lines/Line2.js";
import { LineGeometry } from "three/examples/jsm/lines/LineGeometry.js";
import type { LineMaterial } from "three/examples/jsm/lines/LineMaterial.js";
import type { PreviewGeometry } from "@/engine/geometry/preview";
import type { Bounds } from "./camera-framing";
import { arrowParts, clearanceDimension, embedmentDimension, markerSizeFor, northMarker, northTip, windArrow, type DimensionLine } from "./scene-annotations";
import { beamSegment, footingUprights, groundMesh, moduleInstances, panelQuaternion, postUprights, railSegments, type Quat, type Vec3 } from "./scene-mapping";
import { DRAW } from "./scene-style";
import { LINE_MATERIALS, MATERIALS, UNIT_BOX, UNIT_CONE, UNIT_CYLINDER } from "./shared-resources";

/** One instance of a unit shape: where, turned how, stretched how. */
interface Placement { position: Vec3; quaternion?: Quat; scale: Vec3 }

export interface SceneParts {
  group: Group;
  /** Frees this design's buffers (never the shared shapes and materials). */
  dispose: () => void;
}

const NO_TURN = new Quaternion();

export function buildParts(g: PreviewGeometry, bounds: Bounds): SceneParts {
  const group = new Group();
  const owned: { dispose: () => void }[] = [];
  const m = new Matrix4(), p = new Vector3(), q = new Quaternion(), s = new Vector3();

  const instanced = (shape: BoxGeometry | CylinderGeometry | ConeGeometry, material: MeshLambertMaterial, placements: Placement[], renderOrder = 0) => {
    if (placements.length === 0) return;
    const mesh = new InstancedMesh(shape, material, placements.length);
    placements.forEach((pl, i) => {
      p.set(...pl.position);
      if (pl.quaternion) q.set(...pl.quaternion);
      else q.copy(NO_TURN);
      mesh.setMatrixAt(i, m.compose(p, q, s.set(...pl.scale)));
    });
    mesh.computeBoundingSphere();
    mesh.renderOrder = renderOrder;
    group.add(mesh);
    owned.push(mesh);
  };
  const line = (points: Vec3[], material: LineMaterial, renderOrder = 0) => {
    const geometry = new LineGeometry();
    geometry.setPositions(points.flat());
    const l = new Line2(geometry, material);
    l.computeLineDistances();
    l.renderOrder = renderOrder;
    group.add(l);
    owned.push(geometry);
  };

  // Grade: the engine's sloped patch, part-transparent so the footings below it show.
  const ground = groundMesh(g);
  const groundGeometry = new BufferGeometry();
  groundGeometry.setAttribute("position", new BufferAttribute(ground.positions, 3));
  groundGeometry.setIndex(ground.indices);
  const groundSurface = new Mesh(groundGeometry, MATERIALS.ground);
  groundSurface.renderOrder = 2;
  group.add(groundSurface);
  owned.push(groundGeometry);
  line(ground.outline, LINE_MATERIALS.groundEdge);

  const upright = (u: { position: Vec3; heightFt: number; radiusFt: number }): Placement => ({ position: u.position, scale: [u.radiusFt * 2, u.heightFt, u.radiusFt * 2] });
  instanced(UNIT_CYLINDER, MATERIALS.footing, footingUprights(g).map(upright));
  instanced(UNIT_CYLINDER, MATERIALS.post, postUprights(g).map(upright));

  const member = (sectionFt: number) => (seg: { position: Vec3; quaternion: Quat; lengthFt: number }): Placement => ({ position: seg.position, quaternion: seg.quaternion, scale: [sectionFt, seg.lengthFt, sectionFt] });
  instanced(UNIT_BOX, MATERIALS.beam, [beamSegment(g)].map(member(DRAW.beamSectionFt)));
  instanced(UNIT_BOX, MATERIALS.rail, railSegments(g).map(member(DRAW.railSectionFt)));

  // Modules: a light frame at the module's full size and a dark cell just inside it, so rows and
  // columns read at any distance.
  const turn = panelQuaternion(g);
  const inset = DRAW.railSectionFt; // a frame about as wide as a rail is drawn
  const modules = moduleInstances(g);
  instanced(UNIT_BOX, MATERIALS.moduleFrame, modules.map((inst) => ({ position: inst.position, quaternion: turn, scale: inst.scale })));
  instanced(UNIT_BOX, MATERIALS.moduleCell, modules.map((inst) => ({
    position: inst.position,
    quaternion: turn,
    scale: [Math.max(inst.scale[0] - inset, inst.scale[0] * 0.9), inst.scale[1] * 1.2, Math.max(inst.scale[2] - inset, inst.scale[2] * 0.9)] as Vec3,
  })));

  // Dimension lines over everything; their labels are page text over the canvas (scene-labels.tsx).
  const dimension = (d: DimensionLine, material: LineMaterial) => {
    line([d.from, d.to], material, 15);
    for (const t of d.ticks) line(t, material, 15);
  };
  dimension(clearanceDimension(g), LINE_MATERIALS.clearance);
  dimension(embedmentDimension(g), LINE_MATERIALS.embedment);

  const size = markerSizeFor(bounds.radiusFt);
  const arrow = (tail: Vec3, head: Vec3, radiusFt: number, material: MeshLambertMaterial) => {
    const { shaft, cone } = arrowParts(tail, head);
    instanced(UNIT_CYLINDER, material, [{ position: shaft.position, quaternion: shaft.quaternion, scale: [radiusFt * 2, shaft.lengthFt, radiusFt * 2] }]);
    instanced(UNIT_CONE, material, [{ position: cone.position, quaternion: cone.quaternion, scale: [radiusFt * 5, cone.lengthFt, radiusFt * 5] }]);
  };
  const wind = windArrow(g, bounds.radiusFt * 0.45);
  if (wind) arrow(wind.tail, wind.head, size * 0.18, MATERIALS.wind);
  arrow(northMarker(g).at, northTip(g, bounds.radiusFt), size * 0.08, MATERIALS.north);

  return { group, dispose: () => owned.forEach((o) => o.dispose()) };
}
