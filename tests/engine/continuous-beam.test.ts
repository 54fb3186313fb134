import { describe, expect, it } from "vitest";
import { defaultDesignInput, sizeDesign, twoPostDesignInput } from "../../engine/index";
import { continuousBeamShares } from "../../engine/geometry/continuous-beam";

describe("post reactions of a beam continuous over its posts", () => {
  it("two equal spans without overhang: 3/8, 10/8, 3/8 of w L", () => {
    // Continuous beam, two equal spans, uniform load: R = 3wL/8, 10wL/8, 3wL/8 (AISC Manual beam diagrams [memory]; three-moment equation [computed])
    const s = continuousBeamShares({ widthFt: 20, xFt: [-10, 0, 10] });
    [0.1875, 0.625, 0.1875].forEach((v, i) => expect(s[i]).toBeCloseTo(v, 12));
  });
  it("three equal spans without overhang: 0.4, 1.1, 1.1, 0.4 w L", () => {
    // Continuous beam, three equal spans, uniform load (AISC Manual beam diagrams [memory]; three-moment equation [computed])
    const s = continuousBeamShares({ widthFt: 30, xFt: [-15, -5, 5, 15] });
    [0.4, 1.1, 1.1, 0.4].forEach((v, i) => expect(s[i] * 3).toBeCloseTo(v, 12));
  });
  it("four posts with half-spacing overhangs: end posts 5 % above their tributary share", () => {
    // Three-moment equation by hand [computed]: M0 = −L²/8, M1 = M2 = −0.075 L², R0 = 1.05 wL, R1 = 0.95 wL.
    const s = continuousBeamShares({ widthFt: 20, xFt: [-7.5, -2.5, 2.5, 7.5] });
    [0.2625, 0.2375, 0.2375, 0.2625].forEach((v, i) => expect(s[i]).toBeCloseTo(v, 12));
  });
  it("two posts: statics, the tributary share exactly, also off-centre", () => {
    // Statics [computed]: R1 = W·(0 − x0)/L
    expect(continuousBeamShares({ widthFt: 20, xFt: [-5, 5] })).toEqual([0.5, 0.5]);
    const s = continuousBeamShares({ widthFt: 20, xFt: [-8, 4] });
    expect(s[1]).toBeCloseTo(8 / 12, 12);
    expect(s[0] + s[1]).toBeCloseTo(1, 12);
  });
  it("shares always sum to the whole load", () => {
    for (let n = 3; n <= 20; n++) {
      const sp = 30 / n;
      const s = continuousBeamShares({ widthFt: 30, xFt: Array.from({ length: n }, (_, i) => -((n - 1) * sp) / 2 + i * sp) });
      expect(s.reduce((a, b) => a + b, 0)).toBeCloseTo(1, 10);
    }
  });
  it("the default four-post design loads every post by its beam reaction and reports the factors", () => {
    const r = sizeDesign(defaultDesignInput);
    const f = r.geometry.posts.map((p) => p.reactionFactor);
    // default spacing = width / 4 with half-spacing overhangs: 1.05, 0.95, 0.95, 1.05 [computed, as above]
    [1.05, 0.95, 0.95, 1.05].forEach((v, i) => expect(f[i]).toBeCloseTo(v, 10));
    expect(r.geometry.postLoadSharing).toMatch(/continuous/);
    // P1's shear under D + 0.6W, γ=180° A is its beam share of the array's horizontal force
    const c = r.postLoads[0].combinations.find((x) => x.combination.includes("0.6W") && x.combination.includes("γ=180° A") && !x.combination.startsWith("0.6D"))!;
    expect(c.shearLb).toBeCloseTo(0.6 * 0.2625 * r.wind.cases[2].horizontalLb, 6);
  });
  it("two posts stay tributary (factor 1)", () => {
    const r = sizeDesign(twoPostDesignInput);
    expect(r.geometry.posts.map((p) => p.reactionFactor)).toEqual([1, 1]);
    expect(r.geometry.postLoadSharing).toMatch(/Two posts/);
  });
});

describe("the report's load table names the beam reaction factors", () => {
  it("lists each post's factor under the loads table", async () => {
    const { loadsTable } = await import("../../app/_lib/review/report-model");
    // factors 1.05 / 0.95 [computed, three-moment equation as above]
    expect(loadsTable(sizeDesign(defaultDesignInput)).note).toMatch(/P1 1\.05, P2 0\.95, P3 0\.95, P4 1\.05/);
  });
});
