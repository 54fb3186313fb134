/**
 * Geometries and materials shared by every part of every preview on the page: unit shapes scaled
 * per part, so changing a design never allocates new GPU buffers. Parts pass them as props and
 * never dispose them.
 */
import { BoxGeometry, ConeGeometry, CylinderGeometry, DoubleSide, MeshBasicMaterial, MeshStandardMaterial } from "three";
import { LineMaterial } from "three/examples/jsm/lines/LineMaterial.js";
import { COLOURS } from "./scene-style";

export const UNIT_BOX = new BoxGeometry(1, 1, 1);
export const UNIT_CYLINDER = new CylinderGeometry(0.5, 0.5, 1, 28);
export const UNIT_CONE = new ConeGeometry(0.5, 1, 20);

export const MATERIALS = {
  ground: new MeshStandardMaterial({ color: COLOURS.ground, transparent: true, opacity: 0.45, side: DoubleSide, depthWrite: false, roughness: 1 }),
  footing: new MeshStandardMaterial({ color: COLOURS.footing, roughness: 0.95 }),
  post: new MeshStandardMaterial({ color: COLOURS.post, metalness: 0.5, roughness: 0.45 }),
  beam: new MeshStandardMaterial({ color: COLOURS.beam, metalness: 0.4, roughness: 0.5 }),
  rail: new MeshStandardMaterial({ color: COLOURS.rail, metalness: 0.4, roughness: 0.5 }),
  moduleFrame: new MeshStandardMaterial({ color: COLOURS.moduleEdge, metalness: 0.3, roughness: 0.5 }),
  moduleCell: new MeshStandardMaterial({ color: COLOURS.module, metalness: 0.2, roughness: 0.35 }),
  wind: new MeshBasicMaterial({ color: COLOURS.wind }),
  north: new MeshBasicMaterial({ color: COLOURS.north }),
};

/** Screen-width lines (px): the ground's edge, and the dimension lines drawn over everything. */
export const LINE_MATERIALS = {
  groundEdge: new LineMaterial({ color: COLOURS.groundEdge, linewidth: 1.5 }),
  clearance: new LineMaterial({ color: COLOURS.clearance, linewidth: 2, depthTest: false, depthWrite: false, transparent: true }),
  embedment: new LineMaterial({ color: COLOURS.embedment, linewidth: 2, depthTest: false, depthWrite: false, transparent: true }),
};
