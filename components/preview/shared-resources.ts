/**
 * Geometries and materials shared by every part of every preview on the page: unit shapes scaled
 * per part, so a new design makes no shape or material (only its few instance matrices and line
 * points). The parts (scene-parts.ts) use them and never dispose them.
 */
import { BoxGeometry, ConeGeometry, CylinderGeometry, DoubleSide, MeshLambertMaterial } from "three";
import { LineMaterial } from "three/examples/jsm/lines/LineMaterial.js";
import { COLOURS } from "./scene-style";

export const UNIT_BOX = new BoxGeometry(1, 1, 1);
export const UNIT_CYLINDER = new CylinderGeometry(0.5, 0.5, 1, 28);
export const UNIT_CONE = new ConeGeometry(0.5, 1, 20);

/**
 * Matte (Lambert) shading: a drawing of parts, not a rendering of materials. Its shader is a
 * fraction of the physically based one, which matters where there is no GPU: a software renderer
 * compiles each program on the CPU before the first frame and shades every pixel on the CPU.
 * Every part is drawn instanced (scene-parts.ts), so the solids share one program; the grade is
 * the second (double-sided). The arrows are flat colour: black under the lights with the colour as
 * its own glow gives exactly the unlit colour, from the same program as the parts.
 */
export const MATERIALS = {
  // One pass: the grade is a single open patch, so drawing its back faces first (three's default for
  // a transparent double-sided material, a second program) changes no pixel.
  ground: new MeshLambertMaterial({ color: COLOURS.ground, transparent: true, opacity: 0.45, side: DoubleSide, depthWrite: false, forceSinglePass: true }),
  footing: new MeshLambertMaterial({ color: COLOURS.footing }),
  post: new MeshLambertMaterial({ color: COLOURS.post }),
  beam: new MeshLambertMaterial({ color: COLOURS.beam }),
  rail: new MeshLambertMaterial({ color: COLOURS.rail }),
  moduleFrame: new MeshLambertMaterial({ color: COLOURS.moduleEdge }),
  moduleCell: new MeshLambertMaterial({ color: COLOURS.module }),
  wind: new MeshLambertMaterial({ color: 0x000000, emissive: COLOURS.wind }),
  north: new MeshLambertMaterial({ color: 0x000000, emissive: COLOURS.north }),
};

/** Screen-width lines (px): the ground's edge, and the dimension lines drawn over everything. */
export const LINE_MATERIALS = {
  // Marked transparent (at full opacity, so it looks the same) like the dimension lines: three
  // compiles an opaque and a transparent material into two programs, so this saves one.
  groundEdge: new LineMaterial({ color: COLOURS.groundEdge, linewidth: 1.5, transparent: true }),
  clearance: new LineMaterial({ color: COLOURS.clearance, linewidth: 2, depthTest: false, depthWrite: false, transparent: true }),
  embedment: new LineMaterial({ color: COLOURS.embedment, linewidth: 2, depthTest: false, depthWrite: false, transparent: true }),
};
