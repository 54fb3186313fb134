/**
 * Geometries and materials shared by every part of every preview on the page: unit shapes scaled
 * per part, so changing a design never allocates new GPU buffers. Parts pass them as props and
 * never dispose them.
 */
import { BoxGeometry, ConeGeometry, CylinderGeometry, DoubleSide, MeshBasicMaterial, MeshLambertMaterial } from "three";
import { LineMaterial } from "three/examples/jsm/lines/LineMaterial.js";
import { COLOURS } from "./scene-style";

export const UNIT_BOX = new BoxGeometry(1, 1, 1);
export const UNIT_CYLINDER = new CylinderGeometry(0.5, 0.5, 1, 28);
export const UNIT_CONE = new ConeGeometry(0.5, 1, 20);

/**
 * Matte (Lambert) shading: a drawing of parts, not a rendering of materials. Its shader is a
 * fraction of the physically based one, which matters where there is no GPU: a software renderer
 * compiles each program on the CPU before the first frame and shades every pixel on the CPU.
 */
export const MATERIALS = {
  ground: new MeshLambertMaterial({ color: COLOURS.ground, transparent: true, opacity: 0.45, side: DoubleSide, depthWrite: false }),
  footing: new MeshLambertMaterial({ color: COLOURS.footing }),
  post: new MeshLambertMaterial({ color: COLOURS.post }),
  beam: new MeshLambertMaterial({ color: COLOURS.beam }),
  rail: new MeshLambertMaterial({ color: COLOURS.rail }),
  moduleFrame: new MeshLambertMaterial({ color: COLOURS.moduleEdge }),
  moduleCell: new MeshLambertMaterial({ color: COLOURS.module }),
  wind: new MeshBasicMaterial({ color: COLOURS.wind }),
  north: new MeshBasicMaterial({ color: COLOURS.north }),
};

/** Screen-width lines (px): the ground's edge, and the dimension lines drawn over everything. */
export const LINE_MATERIALS = {
  groundEdge: new LineMaterial({ color: COLOURS.groundEdge, linewidth: 1.5 }),
  clearance: new LineMaterial({ color: COLOURS.clearance, linewidth: 2, depthTest: false, depthWrite: false, transparent: true }),
  embedment: new LineMaterial({ color: COLOURS.embedment, linewidth: 2, depthTest: false, depthWrite: false, transparent: true }),
};
