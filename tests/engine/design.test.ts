import { describe, expect, it } from "vitest";
import { DEFER_TO_CODE, ENGINE_VERSION, defaultDesignInput, sizeDesign, twoPostDesignInput } from "../../engine/index";

type Draft = Record<string, Record<string, unknown>>;
const variant = (f: (d: Draft) => void) => {
  const d = structuredClone(defaultDesignInput) as unknown as Draft;
  f(d);
  return d;
};

describe("whole default design", () => {
  const r = sizeDesign(defaultDesignInput);
  it("is sensible: a few feet deep, a controlling check named, every check passing", () => {
    // common practice: a post footing for a small array is a few feet deep and at least the frost depth
    expect(r.footing.depthIn).toBeGreaterThanOrEqual(36);
    expect(r.footing.depthIn).toBeLessThanOrEqual(96);
    expect(r.footing.depthIn % 6).toBe(0);
    expect(["lateral", "uplift", "frost"]).toContain(r.footing.controllingCheck);
    expect(r.footing.checks.map((c) => c.id)).toEqual(["lateral", "uplift", "frost", "bearing", "holeSize", "postBending"]);
    for (const c of r.footing.checks) expect(c.ratio, c.id).toBeLessThanOrEqual(1);
    expect(r.footing.requiredDepthIn[r.footing.controllingCheck]).toBeGreaterThan(r.footing.depthIn - 6);
  });
  it("carries the defer-to-code caution, site cautions and the sections used", () => {
    expect(r.caution).toBe(DEFER_TO_CODE);
    expect(r.caution).toMatch(/authority having jurisdiction.*licensed engineer/);
    expect(r.cautions.join(" ")).toMatch(/Call before you dig.*utility-locate/);
    expect(r.cautions.join(" ")).toMatch(/leads as live/);
    expect(r.cautions.join(" ")).toMatch(/modules in high or gusty wind/);
    expect(r.references.asce).toBe("ASCE 7-16");
    expect(r.references.sections.join("\n")).toMatch(/Fig\. 27\.3-4/);
    expect(r.references.sections.join("\n")).toMatch(/§1807\.3\.2\.1/);
    expect(r.methodNote).toMatch(/7-22.*not implemented/);
    expect(r.engineVersion).toBe(ENGINE_VERSION);
  });
  it("lowest edge 18–24 in above grade", () => {
    // common practice (ENGINEERING.md §5)
    expect(r.geometry.lowestEdgeFt * 12).toBeGreaterThanOrEqual(18);
    expect(r.geometry.lowestEdgeFt * 12).toBeLessThanOrEqual(24 + 1e-9);
    expect(r.geometry.hOverL).toBeGreaterThan(0.25);
  });
  it("names the governing combination of each load", () => {
    expect(r.governingLoads.moment.combination).toMatch(/0\.6W/);
    expect(r.governingLoads.uplift?.combination).toMatch(/γ=0°/); // wind from behind the high edge lifts
    expect(r.governingLoads.downward.combination).toMatch(/S|γ=180°/);
  });
  it("concrete: per hole and for the job with waste", () => {
    expect(r.concrete.job.totalFt3).toBeCloseTo(r.concrete.perHole.volumeFt3 * 4, 9);
    expect(r.concrete.job.orderYd3).toBeGreaterThanOrEqual(r.concrete.job.withWasteYd3);
  });
  it("the preview block has everything to draw", () => {
    const g = r.geometryPreview;
    expect(g.modules).toHaveLength(12);
    expect(g.posts).toHaveLength(4);
    expect(g.footings[0].depthFt).toBeCloseTo(r.footing.depthFt, 9);
    expect(g.footings[0].topZFt).toBe(g.posts[0].gradeZFt);
    expect(g.dimensions.clearance.valueIn).toBeCloseTo(24, 6);
    expect(g.dimensions.clearance.from.zFt - g.dimensions.clearance.to.zFt).toBeCloseTo(2, 6);
    expect(g.wind?.label).toMatch(/γ=/);
    // Every module corner lies in the panel plane: (corner − centre) · normal = 0.
    for (const m of g.modules) for (const c of m.corners) {
      const dot = (c.xFt - m.centre.xFt) * g.panelPlane.normal.xFt + (c.yFt - m.centre.yFt) * g.panelPlane.normal.yFt + (c.zFt - m.centre.zFt) * g.panelPlane.normal.zFt;
      expect(Math.abs(dot)).toBeLessThan(1e-9);
    }
    expect(Math.min(...g.modules.flatMap((m) => m.corners.map((c) => c.zFt)))).toBeCloseTo(r.geometry.lowestEdgeFt, 9);
  });
  it("diameter sweep: wider holes never need more depth", () => {
    const rows = r.options.diameterSweep;
    expect(rows.map((x) => x.diameterIn)).toEqual([12, 18, 24, 30, 36]);
    for (let i = 1; i < rows.length; i++) expect(rows[i].depthIn).toBeLessThanOrEqual(rows[i - 1].depthIn);
  });
});

describe("design options and warnings", () => {
  it("the two-post case on 3 in pipe warns that post bending is over capacity and suggests a pipe", () => {
    const r = sizeDesign({ ...twoPostDesignInput, posts: { ...twoPostDesignInput.posts, pipeSize: "3" } });
    expect(r.warnings.map((w) => w.code)).toContain("CHECK_OVER_CAPACITY_POSTBENDING");
    expect(r.footing.suggestedPipeSize).toBe("5");
  });
  it("size it for me picks the smallest listed hole with a reasonable depth", () => {
    const r = sizeDesign(variant((d) => { d.posts.holeDiameterIn = "auto"; }));
    expect(r.footing.diameterMode).toBe("auto");
    const passing = r.options.diameterSweep.filter((s) => s.depthIn <= 96 && s.bearingPass && s.fitsPost);
    expect(r.footing.diameterIn).toBe(passing[0].diameterIn);
  });
  it("tilt envelope reports every setting and the governing tilt", () => {
    const r = sizeDesign(variant((d) => { d.array.tiltSettingsDeg = [15, 30, 45]; }));
    const env = r.options.tiltEnvelope!;
    expect(env.rows.map((x) => x.tiltDeg)).toEqual([15, 30, 45]);
    expect(env.rows.find((x) => x.tiltDeg === env.governingTiltDeg)!.requiredDepthIn).toBe(Math.max(...env.rows.map((x) => x.requiredDepthIn)));
    expect(r.footing.depthIn).toBeGreaterThanOrEqual(Math.max(...env.rows.map((x) => x.requiredDepthIn)));
    // The posts are set for the steepest setting: at 30° the lowest edge sits higher than 24 in.
    expect(r.geometry.minClearanceIn).toBeGreaterThan(24);
  });
  it("a given depth shallower than frost warns FROST_DEPTH_NOT_MET and flags failing checks", () => {
    const r = sizeDesign(variant((d) => { d.posts.fixedDepthIn = 24; }));
    const codes = r.warnings.map((w) => w.code);
    expect(r.footing.depthMode).toBe("given");
    expect(codes).toContain("FROST_DEPTH_NOT_MET");
    expect(codes).toContain("CHECK_OVER_CAPACITY_LATERAL");
    expect(r.footing.pass).toBe(false);
  });
  it("h/L outside 0.25–1.0 and tilt over 45° warn with codes", () => {
    const r = sizeDesign(variant((d) => { d.array.tiltDeg = 55; d.array.lowestEdgeClearanceIn = 96; }));
    const codes = r.warnings.map((w) => w.code);
    expect(codes).toContain("TILT_ABOVE_45");
    expect(codes).toContain("H_OVER_L_OUT_OF_RANGE");
  });
  it("7-22 notes that the free-roof method is used", () => {
    const r = sizeDesign(variant((d) => { d.site.edition = "7-22"; }));
    expect(r.warnings.map((w) => w.code)).toContain("FREE_ROOF_FOR_7_22");
    expect(r.references.asce).toBe("ASCE 7-22");
    // Same net pressure in both editions: qh·Kd·G·CN (7-22) = qz·G·CN (7-16), ASCE 7-22 Eq. 26.10-1 [computed]
    expect(r.wind.cases[0].windwardPressurePsf).toBeCloseTo(sizeDesign(defaultDesignInput).wind.cases[0].windwardPressurePsf, 9);
  });
  it("a slope along the array makes the downhill post taller and deeper-loaded", () => {
    const r = sizeDesign(variant((d) => { d.site.slopeAlongPct = 10; }));
    const [first, last] = [r.geometry.posts[0], r.geometry.posts.at(-1)!];
    expect(first.heightAboveGradeFt).toBeGreaterThan(last.heightAboveGradeFt);
    expect(r.geometry.minClearanceIn).toBeCloseTo(24, 6);
    expect(r.field.posts[0].postLengthIn).toBeGreaterThan(r.field.posts.at(-1)!.postLengthIn);
  });
  it("§1806.3.4 doubling and side friction show up as warnings for the reviewer", () => {
    const r = sizeDesign(variant((d) => { d.posts.isolatedPoleIncrease = true; d.posts.sideFrictionPsf = 100; }));
    const codes = r.warnings.map((w) => w.code);
    expect(codes).toEqual(expect.arrayContaining(["LATERAL_DOUBLED", "SIDE_FRICTION_USED"]));
    expect(r.footing.depthIn).toBeLessThanOrEqual(sizeDesign(defaultDesignInput).footing.depthIn);
  });
  it("custom soil values are used as given", () => {
    const r = sizeDesign(variant((d) => { d.site.soil = { method: "custom", allowableBearingPsf: 2500, lateralBearingPsfPerFt: 180, description: "Report 12" }; }));
    expect(r.footing.soil).toMatchObject({ verticalPsf: 2500, lateralPsfPerFt: 180 });
  });
});
