// startingSize (engine/options/starting-size.ts): a new design's passing pipe and hole, or what to change.
import { fc, test as fcTest } from "@fast-check/vitest";
import { describe, expect, it } from "vitest";
import { defaultDesignInput, parseDesignInput, PIPE_SIZES, sizeParsedDesign, startingSize, type DesignInput } from "../../engine/index";

const base = parseDesignInput(defaultDesignInput);
const at = (windSpeedMph: number, over: Partial<DesignInput["site"]> = {}): DesignInput => ({ ...base, site: { ...base.site, windSpeedMph, ...over } });

describe("startingSize", () => {
  it("keeps the demo design as it is when it already passes with the smallest passing pipe", () => {
    const s = startingSize(base);
    expect(s.pass).toBe(true);
    expect(s.input.posts.pipeSize).toBe(base.posts.pipeSize);
    expect(s.input.posts.holeDiameterIn).toBe(base.posts.holeDiameterIn);
    expect(s.changes).toEqual([]);
  });

  it("leaves a given footing depth alone (a hole already dug is the engineer's call)", () => {
    const dug = { ...at(150), posts: { ...base.posts, fixedDepthIn: 24 } };
    const s = startingSize(dug);
    expect(s.input).toBe(dug);
    expect(s.pass).toBe(false);
    expect(s.advice.join(" ")).toMatch(/given footing depth/);
  });

  // 85–200 mph is the product's wind speed range (engine/schema.ts); exposure B–D per ASCE 7-16 §26.7.3.
  fcTest.prop([fc.integer({ min: 85, max: 200 }), fc.constantFrom("B", "C", "D"), fc.constantFrom(1, 2, 3, 4, 5)], { numRuns: 25 })(
    "passes with the smallest pipe that can, or says what to change",
    (windSpeedMph, exposure, soilClass) => {
      const input = at(windSpeedMph, { exposure: exposure as DesignInput["site"]["exposure"], soil: { method: "class", soilClass: soilClass as 1 } });
      const s = startingSize(input);
      expect(s.result.footing.pass).toBe(s.pass);
      if (s.pass) {
        expect(s.advice).toEqual([]);
        // One pipe size smaller fails with any candidate hole.
        const i = PIPE_SIZES.indexOf(s.input.posts.pipeSize);
        if (i > 0) {
          const smaller = sizeParsedDesign({ ...s.input, posts: { ...s.input.posts, pipeSize: PIPE_SIZES[i - 1], holeDiameterIn: "auto" } });
          expect(smaller.footing.pass && !smaller.warnings.some((w) => w.code === "AUTO_DIAMETER_NO_REASONABLE_DEPTH")).toBe(false);
        }
      } else {
        expect(s.advice.length).toBeGreaterThan(0);
        expect(s.advice.join(" ")).toMatch(/posts|auger|pipe/);
      }
    },
  );
});
