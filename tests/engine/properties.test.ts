// Rules that must always hold, checked over many random designs (fast-check).
import { fc, test as fcTest } from "@fast-check/vitest";
import { describe, expect, it } from "vitest";
import { defaultDesignInput, designInputSchema, parseDesignInput, requiredLateralDepthFt, sizeParsedDesign, type DesignInput } from "../../engine/index";
import { arrayLoads } from "../../engine/loads/array-loads";

const base = parseDesignInput(defaultDesignInput);
const design = (over: (d: DesignInput) => void): DesignInput => {
  const d = structuredClone(base);
  over(d);
  return d;
};
const opts = { numRuns: 60 };

describe("properties", () => {
  fcTest.prop([fc.integer({ min: 85, max: 199 }), fc.integer({ min: 1, max: 30 }), fc.constantFrom(2, 3, 4), fc.constantFrom(12, 24, 36)], opts)(
    "more wind never gives a shallower footing",
    (v, dv, count, hole) => {
      const a = sizeParsedDesign(design((d) => { d.site.windSpeedMph = v; d.posts.count = count; d.posts.holeDiameterIn = hole; }));
      const b = sizeParsedDesign(design((d) => { d.site.windSpeedMph = Math.min(200, v + dv); d.posts.count = count; d.posts.holeDiameterIn = hole; }));
      expect(b.footing.depthIn).toBeGreaterThanOrEqual(a.footing.depthIn);
    },
  );
  fcTest.prop([fc.constantFrom(1, 2, 3, 4), fc.integer({ min: 8, max: 40 }), fc.double({ min: 0, max: 45, noNaN: true })], opts)(
    "weaker soil never gives a shallower footing",
    (cls, windStep, tilt) => {
      const mk = (c: number) => design((d) => { d.site.soil = { method: "class", soilClass: c as 1 }; d.site.windSpeedMph = 85 + windStep * 2.5; d.array.tiltDeg = tilt; });
      expect(sizeParsedDesign(mk(cls + 1)).footing.depthIn).toBeGreaterThanOrEqual(sizeParsedDesign(mk(cls)).footing.depthIn);
    },
  );
  fcTest.prop([
    fc.double({ min: 0, max: 20000, noNaN: true }), fc.double({ min: 0, max: 200000, noNaN: true }),
    fc.double({ min: 0.5, max: 4, noNaN: true }), fc.double({ min: 0, max: 2, noNaN: true }),
    fc.constantFrom(100, 150, 200), fc.boolean(),
  ])("a wider hole never needs more depth for the lateral check", (P, M, b, db, S, constrained) => {
    const need = (diameterFt: number) => requiredLateralDepthFt({ shearLb: P, momentLbFt: M, diameterFt, sPsfPerFt: S, constrained }).depthFt;
    expect(need(b + db)).toBeLessThanOrEqual(need(b) + 1e-9);
  });
  fcTest.prop([
    fc.integer({ min: 2, max: 8 }), fc.double({ min: 0, max: 60, noNaN: true }), fc.double({ min: -20, max: 20, noNaN: true }),
    fc.integer({ min: 1, max: 4 }), fc.integer({ min: 2, max: 10 }),
  ], opts)("forces balance: the posts' reactions sum to the loads applied to the array", (count, tilt, along, rows, columns) => {
    const d = design((x) => {
      x.posts.count = count; x.array.tiltDeg = tilt; x.site.slopeAlongPct = along; x.array.rows = rows; x.array.columns = columns;
    });
    fc.pre(designInputSchema.safeParse(d).success); // only designs the schema accepts
    const st = arrayLoads(d, tilt, tilt);
    const sum = (f: (p: (typeof st.posts)[number]) => number) => st.posts.reduce((a, p) => a + f(p), 0);
    expect(sum((p) => p.deadLb)).toBeCloseTo(st.deadArrayLb, 6);
    expect(sum((p) => p.snowLb)).toBeCloseTo(st.snowTotalLb, 6);
    expect(sum((p) => p.tributaryWidthFt)).toBeCloseTo(st.dims.widthFt, 9);
    st.windCases.forEach((c, i) => {
      expect(sum((p) => p.wind[i].shearLb)).toBeCloseTo(c.force.horizontalLb, 6);
      expect(sum((p) => p.wind[i].downwardLb)).toBeCloseTo(c.force.downwardLb, 6);
      // The normal force resolves into exactly the horizontal and vertical components.
      expect(Math.hypot(c.force.horizontalLb, c.force.downwardLb)).toBeCloseTo(Math.abs(c.force.normalForceLb), 6);
      // Moment at each post's grade = share × (moment at post top + shear × post height).
      st.posts.forEach((p) => expect(p.wind[i].momentAtGradeLbFt).toBeCloseTo(p.share * (c.force.momentAtPostTopLbFt + c.force.horizontalLb * p.heightAboveGradeFt), 6));
    });
  });
  fcTest.prop([fc.double({ min: -30, max: 30, noNaN: true }), fc.double({ min: -30, max: 30, noNaN: true }), fc.double({ min: 5, max: 45, noNaN: true })], opts)(
    "on sloping ground the lowest edge keeps exactly its clearance at the tightest point",
    (along, across, tilt) => {
      const r = sizeParsedDesign(design((d) => { d.site.slopeAlongPct = along; d.site.slopeAcrossPct = across; d.array.tiltDeg = tilt; }));
      expect(r.geometry.minClearanceIn).toBeCloseTo(base.array.lowestEdgeClearanceIn, 6);
      r.geometry.posts.forEach((p) => expect(p.gradeFt + p.heightAboveGradeFt).toBeCloseTo(r.geometry.postTopFt, 9));
    },
  );
});

// A case fast-check found: a vanishing moment with no shear once gave NaN (0/0 in Newton's step).
describe("lateral depth at vanishing load", () => {
  it("is zero, not NaN, for loads far below a pound", () => {
    for (const constrained of [false, true]) {
      expect(requiredLateralDepthFt({ shearLb: 0, momentLbFt: 5e-324, diameterFt: 0.5, sPsfPerFt: 100, constrained }).depthFt).toBe(0);
      expect(requiredLateralDepthFt({ shearLb: 1e-12, momentLbFt: 0, diameterFt: 2, sPsfPerFt: 150, constrained }).depthFt).toBe(0);
    }
  });
});
