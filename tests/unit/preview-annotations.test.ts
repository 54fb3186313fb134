/**
 * The preview's dimension lines, wind arrow, north marker, camera framing, 2D fallback elevation
 * and unit labels. Measured points and values come from the engine's preview geometry for the
 * same input; unit conversions cite their definitions.
 */
import { PerspectiveCamera, Vector3 } from "three";
import { describe, expect, it } from "vitest";
import { defaultDesignInput, designInputSchema, sizeParsedDesign } from "@/engine";
import type { PreviewGeometry } from "@/engine/geometry/preview";
import { cameraForView, sceneBounds, type ViewName } from "@/components/preview/camera-framing";
import { sideElevation } from "@/components/preview/elevation-mapping";
import { formatForceLb, formatLengthIn, northCaption, previewFigures } from "@/components/preview/preview-labels";
import { arrowParts, clearanceDimension, embedmentDimension, northMarker, windArrow } from "@/components/preview/scene-annotations";
import { toScene } from "@/components/preview/scene-mapping";

const demo = sizeParsedDesign(designInputSchema.parse(defaultDesignInput)).geometryPreview;
const sloped = sizeParsedDesign(designInputSchema.parse({
  ...defaultDesignInput,
  site: { ...defaultDesignInput.site, slopeAlongPct: -7, slopeAcrossPct: 11 },
  array: { ...defaultDesignInput.array, rows: 4, columns: 12, tiltDeg: 15 },
  posts: { ...defaultDesignInput.posts, count: 8 },
})).geometryPreview;
const CASES: [string, PreviewGeometry][] = [["demo input", demo], ["sloped 4 × 12 input", sloped]];

describe.each(CASES)("annotations (%s)", (_name, g) => {
  it("the clearance line spans the engine's clearance, straight up and down, at the engine's point", () => {
    const d = clearanceDimension(g);
    const c = g.dimensions.clearance;
    expect(d.from[1] - d.to[1]).toBeCloseTo(c.from.zFt - c.to.zFt, 9);
    expect(d.from[1] - d.to[1]).toBeCloseTo(c.valueIn / 12, 9);
    expect([d.from[0], d.to[0]]).toEqual([toScene(c.from)[0], toScene(c.to)[0]]);
    expect(d.from[2]).toBeCloseTo(d.to[2], 12);
  });

  it("the embedment line spans the engine's embedment and stands clear of that post's footing", () => {
    const d = embedmentDimension(g);
    const e = g.dimensions.embedment;
    const footing = g.footings.find((f) => f.postId === e.postId)!;
    expect(d.from[1] - d.to[1]).toBeCloseTo(e.valueIn / 12, 9);
    expect(d.from[1]).toBeCloseTo(e.from.zFt, 9);
    const offAxisFt = Math.hypot(d.from[0] - footing.xFt, d.from[2] - toScene({ xFt: footing.xFt, yFt: footing.yFt, zFt: 0 })[2]);
    expect(offAxisFt).toBeGreaterThan(footing.diameterFt / 2);
  });

  it("the wind arrow ends at the engine's centre of pressure and points the way the wind blows", () => {
    const a = windArrow(g, 5)!;
    expect(a).not.toBeNull();
    expect(a.head).toEqual(toScene(g.wind!.centreOfPressure!));
    const along = new Vector3(...a.head).sub(new Vector3(...a.tail));
    expect(along.length()).toBeCloseTo(5, 9);
    expect(along.normalize().dot(new Vector3(...toScene(g.wind!.direction)))).toBeCloseTo(1, 9);
  });

  it("the drawn wind arrow (shaft then cone) runs unbroken from the tail to the centre of pressure", () => {
    const a = windArrow(g, 5)!;
    const { shaft, cone } = arrowParts(a.tail, a.head);
    shaft.start.forEach((v, i) => expect(v).toBeCloseTo(a.tail[i], 9));
    shaft.end.forEach((v, i) => expect(v).toBeCloseTo(cone.start[i], 9));
    cone.end.forEach((v, i) => expect(v).toBeCloseTo(a.head[i], 9));
    expect(shaft.lengthFt + cone.lengthFt).toBeCloseTo(5, 9);
  });

  it("the north marker points along the engine's north (from the array azimuth), level", () => {
    const n = northMarker(g);
    expect(n.fromAzimuth).toBe(true);
    expect(n.north).toEqual(toScene(g.north));
    expect(n.north[1]).toBe(0);
    expect(n.at).toEqual(toScene(g.ground.corners[2]));
  });
});

describe("north marker and caption from the array azimuth", () => {
  const facing = (azimuthDeg: number) => sizeParsedDesign(designInputSchema.parse({
    ...defaultDesignInput, array: { ...defaultDesignInput.array, azimuthDeg },
  })).geometryPreview;
  // three.js is y-up with the engine's y going to −z (scene-mapping.ts). Compass convention
  // [common practice]: facing south (180°) north is behind the array, engine +y = three −z;
  // facing east (90°) someone facing the modules looks west and has north on their right hand,
  // engine +x = three +x.
  it("facing south, north is behind the array (three −z)", () => {
    const [x, y, z] = northMarker(facing(180)).north;
    expect([x, y, z]).toEqual([0, 0, -1]);
  });
  it("facing east, north is to the right of someone facing the modules (three +x)", () => {
    const [x, y, z] = northMarker(facing(90)).north;
    expect(x).toBeCloseTo(1, 12);
    expect(y).toBe(0);
    expect(z).toBeCloseTo(0, 12);
  });
  it("a result stored before the azimuth input (no north) is drawn facing south, and says so", () => {
    const older: Partial<PreviewGeometry> = { ...demo };
    delete older.north;
    const n = northMarker(older as PreviewGeometry);
    expect(n.fromAzimuth).toBe(false);
    expect(n.north).toEqual(toScene({ xFt: 0, yFt: 1, zFt: 0 }));
    expect(northCaption(undefined)).toMatch(/facing south.*before the array azimuth input/);
  });
  it("the caption names the azimuth and no longer assumes south", () => {
    expect(northCaption(135)).toBe("North marker from the array azimuth (135°).");
    expect(northCaption(180)).not.toMatch(/assumed/);
  });
});

describe.each(CASES)("camera framing (%s)", (_name, g) => {
  const bounds = sceneBounds(g);
  it("bounds hold every footing bottom and module corner", () => {
    const pts = [...g.footings.map((f) => toScene({ xFt: f.xFt, yFt: f.yFt, zFt: f.bottomZFt })), ...g.modules.flatMap((m) => m.corners.map(toScene))];
    for (const p of pts) for (let i = 0; i < 3; i++) {
      expect(p[i]).toBeGreaterThanOrEqual(bounds.min[i] - 1e-9);
      expect(p[i]).toBeLessThanOrEqual(bounds.max[i] + 1e-9);
    }
  });

  for (const view of ["home", "front", "side", "top"] as ViewName[]) {
    for (const aspect of [1280 / 440, 390 / 440]) {
      it(`the ${view} view at aspect ${aspect.toFixed(2)} has every corner of the bounds on screen`, () => {
        const fit = cameraForView(view, bounds, 35, aspect);
        const camera = new PerspectiveCamera(35, aspect, 0.1, fit.distanceFt * 10);
        camera.position.set(...fit.position);
        camera.lookAt(new Vector3(...fit.target));
        camera.updateMatrixWorld();
        for (const x of [bounds.min[0], bounds.max[0]]) for (const y of [bounds.min[1], bounds.max[1]]) for (const z of [bounds.min[2], bounds.max[2]]) {
          const ndc = new Vector3(x, y, z).project(camera);
          expect(Math.abs(ndc.x)).toBeLessThanOrEqual(1);
          expect(Math.abs(ndc.y)).toBeLessThanOrEqual(1);
        }
      });
    }
  }
});

describe.each(CASES)("2D side elevation (%s)", (_name, g) => {
  const e = sideElevation(g);
  const post = g.posts.find((p) => p.id === g.dimensions.embedment.postId)!;
  const footing = g.footings.find((f) => f.postId === post.id)!;
  it("draws the governing post and its footing at the engine's heights and sizes (svg y = −z)", () => {
    expect(e.post.y).toBeCloseTo(-post.topZFt, 9);
    expect(e.post.y + e.post.height).toBeCloseTo(-post.bottomZFt, 9);
    expect(e.post.width).toBeCloseTo(post.outsideDiameterFt, 9);
    expect(e.footing.width).toBeCloseTo(footing.diameterFt, 9);
    expect(e.footing.height).toBeCloseTo(footing.depthFt, 9);
  });
  it("keeps the clearance and embedment lengths", () => {
    expect(e.clearance.to[1] - e.clearance.from[1]).toBeCloseTo(g.dimensions.clearance.valueIn / 12, 9);
    expect(e.embedment.to[1] - e.embedment.from[1]).toBeCloseTo(g.dimensions.embedment.valueIn / 12, 9);
  });
  it("fits everything in its view box", () => {
    const [x, y, w, h] = e.viewBox;
    for (const [px, py] of [...e.panels.flat(), e.clearance.from, e.embedment.to, [e.footing.x, e.footing.y + e.footing.height]]) {
      expect(px).toBeGreaterThanOrEqual(x);
      expect(px).toBeLessThanOrEqual(x + w);
      expect(py).toBeGreaterThanOrEqual(y);
      expect(py).toBeLessThanOrEqual(y + h);
    }
  });
});

describe("labels", () => {
  it("gives lengths in inches (feet and inches when long) or millimetres", () => {
    expect(formatLengthIn(18, "imperial")).toBe("18 in");
    expect(formatLengthIn(78, "imperial")).toBe("78 in (6 ft 6 in)");
    // 1 in = 25.4 mm exactly (NIST SP 811, 2008 edition, Appendix B.8): 24 in = 609.6 mm.
    expect(formatLengthIn(24, "metric")).toBe("610 mm");
  });
  it("gives forces in pounds or kilonewtons", () => {
    expect(formatForceLb(10579, "imperial")).toBe("10,579 lb");
    // 1 lbf = 4.448222 N (NIST SP 811, 2008 edition, Appendix B.8): 1,000 lbf = 4.448 kN, shown to 0.1 kN.
    expect(formatForceLb(1000, "metric")).toBe("4.4 kN");
  });
  it("shows the engine's own clearance and embedment values", () => {
    const f = previewFigures(demo, "imperial");
    expect(f.clearance).toBe(formatLengthIn(demo.dimensions.clearance.valueIn, "imperial"));
    expect(f.embedment).toBe(formatLengthIn(demo.dimensions.embedment.valueIn, "imperial"));
    expect(f.wind).toContain(demo.wind!.label);
  });
});
