import { describe, expect, it } from "vitest";
import { defaultDesignInput, sizeDesign, twoPostDesignInput } from "../../engine/index";

type Draft = Record<string, Record<string, unknown>>;
const variant = (base: unknown, f: (d: Draft) => void) => {
  const d = structuredClone(base) as Draft;
  f(d);
  return d;
};
const codes = (r: ReturnType<typeof sizeDesign>) => r.warnings.map((w) => w.code);

describe("method limits named on every result", () => {
  it("wind along the rows (γ = 90°) is not evaluated, and every result says so as a warning", () => {
    // ASCE 7-16 §27.3.2 free roofs also have an along-ridge (γ = 90°) case, not evaluated here (engine README)
    for (const d of [defaultDesignInput, twoPostDesignInput, variant(defaultDesignInput, (x) => { x.site.edition = "7-22"; })]) {
      const w = sizeDesign(d).warnings.find((x) => x.code === "WIND_ALONG_ROWS_NOT_CHECKED");
      expect(w?.severity).toBe("warning");
      expect(w?.message).toMatch(/γ = 90°.*not checked/);
    }
  });
  it("a tilt below 7.5° is a warning naming the jump in the pressure table", () => {
    // ASCE 7-16 Fig. 27.3-4: rows at 7.5° and up; below it the 0° row (ENGINEERING.md §1)
    const r = sizeDesign(variant(twoPostDesignInput, (x) => { x.array.tiltDeg = 7.4; }));
    const w = r.warnings.find((x) => x.code === "TILT_BELOW_7_5");
    expect(w?.severity).toBe("warning");
    expect(w?.message).toMatch(/jump between that row and the 7\.5° row/);
    expect(codes(sizeDesign(variant(twoPostDesignInput, (x) => { x.array.tiltDeg = 7.5; })))).not.toContain("TILT_BELOW_7_5");
  });
  it("ASCE 7-22 below 15° warns that the 7-16 minimum snow rule was used", () => {
    // ASCE 7-16 §7.3.4: pm = Is pg for pg ≤ 20 psf, 20 Is above [memory]; 7-22 rule not read here
    const low = (edition: string) => variant(twoPostDesignInput, (x) => { x.site.edition = edition; x.site.groundSnowPsf = 30; x.array.tiltDeg = 10; });
    const r22 = sizeDesign(low("7-22"));
    expect(r22.snow.minimumPmPsf).toBe(20);
    expect(r22.warnings.find((x) => x.code === "SNOW_MINIMUM_7_16_RULE")?.message).toMatch(/ASCE 7-16 §7\.3\.4 rule/);
    expect(codes(sizeDesign(low("7-16")))).not.toContain("SNOW_MINIMUM_7_16_RULE");
    expect(codes(sizeDesign(variant(low("7-22"), (x) => { x.array.tiltDeg = 20; })))).not.toContain("SNOW_MINIMUM_7_16_RULE");
  });
});
