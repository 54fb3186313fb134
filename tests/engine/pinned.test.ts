// Whole-result pin: every number, key and key order of sizeDesign for the designs in
// pinned-designs.ts must equal the fixture written before the performance work, so speed-ups
// cannot change a result. A second call checks nothing is cached across calls in a way that leaks.
import { readFileSync } from "node:fs";
import { describe, expect, it } from "vitest";
import { parseDesignInput, sizeDesign, sizeParsedDesign } from "../../engine/index";
import { PINNED_DESIGNS, PINNED_FILE, pinnedJson } from "./pinned-designs";

const expected = JSON.parse(readFileSync(PINNED_FILE, "utf8")) as Record<string, unknown>;

describe("pinned whole results", () => {
  it("covers the default and the two-post design", () => {
    expect(Object.keys(expected)).toEqual(expect.arrayContaining(["default", "twoPost"]));
    expect(Object.keys(expected).sort()).toEqual(Object.keys(PINNED_DESIGNS).sort());
  });
  for (const [name, draft] of Object.entries(PINNED_DESIGNS)) {
    it(`${name}: sizeDesign equals the pinned result exactly`, () => {
      const got = JSON.parse(pinnedJson(sizeDesign(draft)));
      expect(got).toStrictEqual(expected[name]);
      // Key order too (the API serialises the result as is).
      expect(pinnedJson(sizeDesign(draft))).toBe(pinnedJson(expected[name]));
    });
    it(`${name}: sizeParsedDesign on parsed input gives the same, twice`, () => {
      const parsed = parseDesignInput(draft);
      const a = pinnedJson(sizeParsedDesign(parsed));
      const b = pinnedJson(sizeParsedDesign(parsed));
      expect(a).toBe(pinnedJson(expected[name]));
      expect(b).toBe(a);
    });
  }
});
