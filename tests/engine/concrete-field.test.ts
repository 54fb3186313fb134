import { describe, expect, it } from "vitest";
import { concreteFromHolesAsDug, defaultDesignInput, parseDesignInput, safeParseDesignInput, sizeDesign, twoPostDesignInput } from "../../engine/index";

type Draft = Record<string, Record<string, unknown>>;
const variant = (base: unknown, f: (d: Draft) => void) => {
  const d = structuredClone(base) as Draft;
  f(d);
  return d;
};

describe("concrete from the holes as dug", () => {
  const two = [{ postId: "P1", diameterIn: 24, depthIn: 60 }, { postId: "P2", diameterIn: 24, depthIn: 60 }];
  it("two 24 in × 60 in holes take about 1.16 yd³; one holds about 2,280 lb at 145 pcf", () => {
    // [common practice] check values; cylinder π b² d / 4 = 15.708 ft³ per hole [computed]
    const c = concreteFromHolesAsDug({ holes: two, wasteAllowancePct: 0 });
    expect(c.totalYd3).toBeCloseTo(1.16, 2);
    expect(c.holes[0].weightLb).toBeCloseTo(2278, 0);
    expect(c.orderYd3).toBe(1.25); // ¼ yd³ steps: far below the 2 yd³ a rule of thumb orders
    expect(c.bags80Lb).toBe(53); // 31.42 ft³ / 0.60 ft³ per 80-lb bag [common practice: bag labels]
  });
  it("takes the post out of each hole and adds the waste allowance", () => {
    // Pipe 3½ Std OD 4.0 in (AISC Shapes Database v15.0 [memory]): π (4/12)² 5 / 4 = 0.4363 ft³ per 60 in hole [computed]
    const c = concreteFromHolesAsDug({ holes: two, postOutsideDiameterIn: 4, wasteAllowancePct: 10 });
    expect(c.holes[0].postFt3).toBeCloseTo(0.4363, 4);
    expect(c.holes[0].concreteFt3).toBeCloseTo(15.708 - 0.4363, 3);
    expect(c.withWasteFt3).toBeCloseTo(2 * (15.708 - 0.4363) * 1.1, 2);
    expect(c.orderYd3).toBe(1.25); // 33.60 ft³ = 1.244 yd³ → 1.25 [computed]
  });
  it("a hole dug wider and deeper needs more: 27 in × 64 in vs 24 in × 60 in", () => {
    // cylinder [computed]: 27² × 64 / (24² × 60) = 1.35
    const [a, b] = concreteFromHolesAsDug({ holes: [{ postId: "P1", diameterIn: 27, depthIn: 64 }, two[0]] }).holes;
    expect(a.concreteFt3 / b.concreteFt3).toBeCloseTo(1.35, 3);
  });
  it("refuses a hole narrower than the post, naming it", () => {
    expect(() => concreteFromHolesAsDug({ holes: [{ postId: "P2", diameterIn: 3, depthIn: 60 }], postOutsideDiameterIn: 4 })).toThrowError(/hole P2/);
  });
});

describe("concrete specification", () => {
  it("defaults to f'c 4,000 psi at 28 days, ¾ in aggregate, 4 in slump, with cold-weather guidance where the ground freezes", () => {
    // 4,000 psi, ¾ in, 4 in [common practice]; code minimum 2,000 psi IBC §1807.3.3 [memory]
    const s = sizeDesign(defaultDesignInput).concrete.specification;
    expect([s.compressiveStrengthPsi, s.maxAggregateIn, s.slumpIn, s.codeMinimumPsi]).toEqual([4000, 0.75, 4, 2000]);
    expect(s.coldSite).toBe(true); // frost depth 36 in
    expect(s.coldWeather.join(" ")).toMatch(/non-chloride accelerator.*freezing/);
    const warm = sizeDesign(variant(twoPostDesignInput, (d) => { d.site.frostDepthIn = 0; })).concrete.specification;
    expect(warm.coldSite).toBe(false);
    expect(warm.coldWeather).toEqual([]);
  });
  it("refuses a strength below the 2,000 psi code minimum, naming the field", () => {
    // IBC §1807.3.3: concrete backfill at least 2,000 psi [memory]
    const r = safeParseDesignInput(variant(twoPostDesignInput, (d) => { d.posts.concreteStrengthPsi = 1500; }));
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.issues).toContainEqual({ path: "posts.concreteStrengthPsi", message: "Concrete strength must be between 2000 and 10000 psi" });
  });
});

describe("inputs added later keep saved revisions valid", () => {
  it("an input without the new fields parses to their defaults", () => {
    const p = parseDesignInput(twoPostDesignInput);
    expect([p.posts.bearingPressure, p.posts.soilUnitWeightPcf, p.posts.concreteStrengthPsi, p.posts.maxAggregateIn, p.posts.slumpIn]).toEqual(["gross", 110, 4000, 0.75, 4]);
  });
});

describe("net bearing (engineer's option)", () => {
  it("credits the soil removed: net = gross − γsoil × depth, labelled, gross stays the default", () => {
    const gross = sizeDesign(defaultDesignInput);
    const net = sizeDesign(variant(defaultDesignInput, (d) => { d.posts.bearingPressure = "net"; d.posts.soilUnitWeightPcf = 110; }));
    const g = gross.footing.checks.find((c) => c.id === "bearing")!;
    const n = net.footing.checks.find((c) => c.id === "bearing")!;
    expect(net.footing.depthIn).toBe(gross.footing.depthIn);
    // overburden 110 pcf × depth (ft) [common practice: net bearing pressure]
    expect(n.demand).toBeCloseTo(g.demand - 110 * (gross.footing.depthIn / 12), 6);
    expect(n.source).toMatch(/net pressure.*engineer's option/);
    expect(g.source).not.toMatch(/net/);
    expect(net.warnings.map((w) => w.code)).toContain("NET_BEARING_USED");
  });
});

describe("tilt settings as the rack allows them", () => {
  it("lists each setting with its lowest edge; clearance is held at the steepest setting", () => {
    // geometry [computed]: the low edge rises as the tilt flattens about the beam; the steepest setting holds the clearance asked for
    const r = sizeDesign(variant(twoPostDesignInput, (d) => { d.array.tiltDeg = 20; d.array.tiltSettingsDeg = [10, 20, 30, 40, 35]; }));
    const t = r.field.tiltSettings;
    expect(t.map((x) => x.tiltDeg)).toEqual([10, 20, 30, 35, 40]);
    expect(r.geometry.clearanceTiltDeg).toBe(40);
    expect(t[4].minClearanceIn).toBeCloseTo((r.input.array.lowestEdgeClearanceIn), 6);
    for (let i = 1; i < t.length; i++) expect(t[i].lowestEdgeIn).toBeLessThan(t[i - 1].lowestEdgeIn);
    // seasonal adjustment = the envelope of the settings used
    expect(r.options.tiltEnvelope?.rows.map((x) => x.tiltDeg)).toEqual([10, 20, 30, 35, 40]);
    expect(r.footing.depthIn).toBe(Math.max(...r.options.tiltEnvelope!.rows.map((x) => x.requiredDepthIn)));
  });
});

describe("the report states the mix", () => {
  it("adds the specification and cold-weather lines to the concrete lines", async () => {
    const { concreteLines } = await import("../../app/_lib/review/report-model");
    // defaults [common practice]: 4,000 psi, ¾ in, 4 in; 2,000 psi minimum IBC §1807.3.3 [memory]
    const lines = concreteLines(sizeDesign(defaultDesignInput)).join("\n");
    expect(lines).toMatch(/Mix: f'c 4,000 psi at 28 days, aggregate 0\.75 in maximum, slump 4 in \(not below 2,000 psi/);
    expect(lines).toMatch(/non-chloride accelerator/);
  });
});
