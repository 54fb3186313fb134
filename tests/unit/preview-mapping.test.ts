/**
 * The 3D preview's mapping from engine geometry to scene objects. Every expected value is read from
 * the engine's own preview geometry (engine/geometry/preview.ts) for the same input; the only fact
 * used besides it is the axis swap the scene promises (engine z-up → three y-up, front toward +z).
 */
import { Quaternion, Vector3 } from "three";
import { describe, expect, it } from "vitest";
import { defaultDesignInput, designInputSchema, sizeParsedDesign, type DesignInput } from "@/engine";
import type { Point3Ft, PreviewGeometry } from "@/engine/geometry/preview";
import {
  beamSegment, footingUprights, groundMesh, moduleInstances, panelQuaternion, postUprights, railSegments, toScene, type Vec3,
} from "@/components/preview/scene-mapping";

const TOL = 6; // digits for toBeCloseTo: 1e-6 ft

const flat = designInputSchema.parse(defaultDesignInput);
const sloped: DesignInput = designInputSchema.parse({
  ...defaultDesignInput,
  site: { ...defaultDesignInput.site, slopeAlongPct: 6, slopeAcrossPct: -9 },
  array: { ...defaultDesignInput.array, orientation: "landscape", rows: 3, columns: 5, tiltDeg: 20, tiltSettingsDeg: [10, 20, 35] },
  posts: { ...defaultDesignInput.posts, count: 3 },
});
const CASES: [string, PreviewGeometry][] = [
  ["demo input", sizeParsedDesign(flat).geometryPreview],
  ["sloped landscape input", sizeParsedDesign(sloped).geometryPreview],
];

const close = (a: Vec3 | Vector3, b: Vec3 | Point3Ft, digits = TOL) => {
  const av = Array.isArray(a) ? a : [a.x, a.y, a.z];
  const bv = Array.isArray(b) ? b : toScene(b);
  av.forEach((v, i) => expect(v).toBeCloseTo(bv[i], digits));
};
const at = (p: Vec3) => new Vector3(...p);
const q = (v: [number, number, number, number]) => new Quaternion(...v);

describe("axis swap", () => {
  it("sends engine (x along, y back, z up) to three (x, up, toward the front)", () => {
    expect(toScene({ xFt: 1, yFt: 2, zFt: 3 })).toEqual([1, 3, -2]);
  });
});

describe.each(CASES)("scene mapping (%s)", (_name, g) => {
  it("posts run from the engine's footing bottom to its attachment height at the post's diameter", () => {
    const ups = postUprights(g);
    expect(ups).toHaveLength(g.posts.length);
    ups.forEach((u, i) => {
      const p = g.posts[i];
      close(at(u.position).add(new Vector3(0, -u.heightFt / 2, 0)), { xFt: p.xFt, yFt: p.yFt, zFt: p.bottomZFt });
      close(at(u.position).add(new Vector3(0, u.heightFt / 2, 0)), { xFt: p.xFt, yFt: p.yFt, zFt: p.topZFt });
      expect(u.radiusFt * 2).toBeCloseTo(p.outsideDiameterFt, TOL);
    });
  });

  it("footings are cylinders from grade to the engine's depth at its diameter", () => {
    footingUprights(g).forEach((u, i) => {
      const f = g.footings[i];
      close(at(u.position).add(new Vector3(0, u.heightFt / 2, 0)), { xFt: f.xFt, yFt: f.yFt, zFt: f.topZFt });
      close(at(u.position).add(new Vector3(0, -u.heightFt / 2, 0)), { xFt: f.xFt, yFt: f.yFt, zFt: f.bottomZFt });
      expect(u.heightFt).toBeCloseTo(f.depthFt, TOL);
      expect(u.radiusFt * 2).toBeCloseTo(f.diameterFt, TOL);
    });
  });

  it("the beam and each rail, turned from +y and stretched, end at the engine's end points", () => {
    const pairs = [[beamSegment(g), g.beam] as const, ...railSegments(g).map((s, i) => [s, g.rails[i]] as const)];
    expect(pairs).toHaveLength(1 + g.rails.length);
    for (const [s, src] of pairs) {
      const half = new Vector3(0, s.lengthFt / 2, 0).applyQuaternion(q(s.quaternion));
      close(at(s.position).add(half), src.end);
      close(at(s.position).sub(half), src.start);
    }
  });

  it("each module instance, a unit box turned onto the panel and scaled, has the engine's corners", () => {
    const turn = q(panelQuaternion(g));
    close(new Vector3(0, 1, 0).applyQuaternion(turn), g.panelPlane.normal);
    close(new Vector3(0, 0, -1).applyQuaternion(turn), g.panelPlane.upSlope);
    const instances = moduleInstances(g);
    expect(instances).toHaveLength(g.modules.length);
    instances.forEach((m, i) => {
      const src = g.modules[i];
      close(m.position, src.centre);
      expect([m.scale[0], m.scale[2]]).toEqual([src.alongWidthFt, src.alongSlopeFt]);
      // Box corners at (∓w/2, 0, ±s/2): +z is down the slope, so (−,+) is the low-left corner.
      const corner = (sx: number, sz: number) => new Vector3(sx * m.scale[0] / 2, 0, sz * m.scale[2] / 2).applyQuaternion(turn).add(at(m.position));
      close(corner(-1, 1), src.corners[0]);
      close(corner(1, 1), src.corners[1]);
      close(corner(1, -1), src.corners[2]);
      close(corner(-1, -1), src.corners[3]);
    });
  });

  it("the ground plane is the engine's four corners, both triangles facing up", () => {
    const { positions, indices, outline } = groundMesh(g);
    // Float32 vertex storage: 1e-4 ft is far below a pixel.
    g.ground.corners.forEach((c, i) => close([positions[3 * i], positions[3 * i + 1], positions[3 * i + 2]], c, 4));
    expect(outline[0]).toEqual(outline[4]);
    for (let t = 0; t < indices.length; t += 3) {
      const [a, b, c] = indices.slice(t, t + 3).map((k) => new Vector3(positions[3 * k], positions[3 * k + 1], positions[3 * k + 2]));
      expect(new Vector3().crossVectors(b.clone().sub(a), c.clone().sub(a)).y).toBeGreaterThan(0);
    }
  });
});

describe("tilt settings", () => {
  it("each tilt the engine sizes turns the modules to that tilt's normal", () => {
    for (const tiltDeg of sloped.array.tiltSettingsDeg ?? []) {
      const g = sizeParsedDesign({ ...sloped, array: { ...sloped.array, tiltDeg } }).geometryPreview;
      expect(g.panelPlane.tiltDeg).toBe(tiltDeg);
      close(new Vector3(0, 1, 0).applyQuaternion(q(panelQuaternion(g))), g.panelPlane.normal);
    }
  });
});
