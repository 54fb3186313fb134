import { fc, test as fcTest } from "@fast-check/vitest";
import { describe, expect, it } from "vitest";
import { UNIT_TABLE, fromMetric, levelingCuts, toMetric, type CustomaryUnit } from "../../engine/index";

describe("units", () => {
  it("exact factors for length, force and pressure", () => {
    // NIST SP 811 definitions: 1 in = 25.4 mm, 1 ft = 0.3048 m, 1 lbf = 4.4482216152605 N [std]
    expect(toMetric(1, "in")).toBeCloseTo(25.4, 12);
    expect(toMetric(10, "ft")).toBeCloseTo(3.048, 12);
    expect(toMetric(1, "lb")).toBeCloseTo(4.4482216152605, 10);
    expect(toMetric(1, "psf")).toBeCloseTo(0.0478802589803, 10);
    expect(toMetric(1, "kip")).toBeCloseTo(4.4482216152605, 10);
  });
  it("throws on an unknown unit, naming it", () => {
    expect(() => toMetric(1, "furlong" as CustomaryUnit)).toThrowError(/Unknown unit "furlong"/);
  });
  const units = Object.keys(UNIT_TABLE) as CustomaryUnit[];
  fcTest.prop([fc.constantFrom(...units), fc.double({ min: -1e6, max: 1e6, noNaN: true })])("round-trips every unit", (u, x) => {
    expect(fromMetric(toMetric(x, u), u)).toBeCloseTo(x, 6);
  });
});

describe("laser cut list", () => {
  it("cuts the difference off high posts and adds gravel under low ones", () => {
    // common practice (ENGINEERING.md §5)
    const r = levelingCuts({ referenceReadingIn: 10, readingsIn: [10, 11.5, 9.25] });
    expect(r.cutsIn).toEqual([0, 1.5, 0]);
    expect(r.gravelIn).toEqual([0, 0, 0.75]);
    expect(r.posts[2].instruction).toMatch(/gravel/);
  });
  it("after cutting and shimming, every top is level with the reference", () => {
    // common practice: top height ∝ reading; cut lowers, gravel raises
    const readings = [12.25, 9.5, 10, 14];
    const r = levelingCuts({ referenceReadingIn: 10, readingsIn: readings });
    readings.forEach((x, i) => expect(x - r.cutsIn[i] + r.gravelIn[i]).toBeCloseTo(10, 9));
  });
  it("names the reading at fault", () => {
    expect(() => levelingCuts({ referenceReadingIn: 10, readingsIn: [10, Number.NaN] })).toThrowError("Reading for post 2 must be between 0 and 240 in");
  });
});
