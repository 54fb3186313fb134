// Array azimuth → true north in the preview's axes (x right when facing the modules, y toward the
// back/high edge, z up). Compass bearings are measured clockwise from true north, and the azimuth
// is the bearing the modules face [common practice: compass convention].
import { describe, expect, it } from "vitest";
import { defaultDesignInput, safeParseDesignInput, sizeDesign } from "../../engine/index";
import { northInPreviewAxes } from "../../engine/geometry/north";

type Draft = Record<string, Record<string, unknown>>;
const facing = (azimuthDeg: unknown) => {
  const d = structuredClone(defaultDesignInput) as unknown as Draft;
  d.array.azimuthDeg = azimuthDeg;
  return d;
};

describe("north from the array azimuth", () => {
  // Hand-worked, standing in front of the array and looking at the modules (looking toward +y):
  it("facing south (180°): you look north, so north is straight ahead, behind the array: +y", () => {
    expect(northInPreviewAxes(180)).toEqual({ xFt: 0, yFt: 1, zFt: 0 });
  });
  it("facing north (0° and 360°): you look south, so north is behind you, at the front: −y", () => {
    expect(northInPreviewAxes(0)).toEqual({ xFt: 0, yFt: -1, zFt: 0 });
    expect(northInPreviewAxes(360)).toEqual({ xFt: 0, yFt: -1, zFt: 0 });
  });
  it("facing east (90°): you stand east of the array looking west, and facing west north is on your right hand: +x", () => {
    expect(northInPreviewAxes(90)).toEqual({ xFt: 1, yFt: 0, zFt: 0 });
  });
  it("facing west (270°): you look east, and facing east north is on your left hand: −x", () => {
    expect(northInPreviewAxes(270)).toEqual({ xFt: -1, yFt: 0, zFt: 0 });
  });
  it("facing south-east (135°): you look north-west, so north is half right of straight ahead: (√½, √½)", () => {
    const n = northInPreviewAxes(135);
    expect(n.xFt).toBeCloseTo(Math.SQRT1_2, 12);
    expect(n.yFt).toBeCloseTo(Math.SQRT1_2, 12);
    expect(n.zFt).toBe(0);
  });
  it("is a horizontal unit vector at every azimuth", () => {
    for (let a = 0; a <= 360; a += 7.5) {
      const n = northInPreviewAxes(a);
      expect(Math.hypot(n.xFt, n.yFt, n.zFt)).toBeCloseTo(1, 12);
      expect(n.zFt).toBe(0);
    }
  });
});

describe("array azimuth input", () => {
  it("defaults to 180° (facing south) and reaches the preview geometry", () => {
    const r = sizeDesign(defaultDesignInput);
    expect(r.input.array.azimuthDeg).toBe(180);
    expect(r.geometryPreview.north).toEqual({ xFt: 0, yFt: 1, zFt: 0 });
    expect(sizeDesign(facing(90)).geometryPreview.north).toEqual(northInPreviewAxes(90));
  });
  it("outside 0–360° or not a number → a message naming the field and range", () => {
    for (const bad of [-1, 361, Number.NaN, "south"]) {
      const r = safeParseDesignInput(facing(bad));
      expect(r.ok).toBe(false);
      if (!r.ok) expect(r.issues).toEqual([{ path: "array.azimuthDeg", message: "Array azimuth must be between 0 and 360 degrees" }]);
    }
  });
  it("changes no load, depth or check: only the input echo and the north vector differ", () => {
    const strip = (azimuthDeg: number) => {
      const r = structuredClone(sizeDesign(facing(azimuthDeg))) as unknown as Record<string, Record<string, unknown>>;
      delete r.input.array;
      delete r.geometryPreview.north;
      return r;
    };
    const south = strip(180);
    for (const a of [0, 45, 90, 270, 359]) expect(strip(a)).toEqual(south);
  });
});
