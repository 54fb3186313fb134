// The customary wording of engine sentences: digit grouping by a loop (this runs per design) must
// write exactly what the look-ahead regular expression it replaced wrote, for every number.
import { fc, test as fcTest } from "@fast-check/vitest";
import { describe, expect, it } from "vitest";
import { groupThousands, imperialText, qty } from "../../engine/quantity-text";

/** The grouping the engine used before (a comma before each run of three digits) [common practice]. */
const byRegex = (digits: string) => digits.replace(/\B(?=(\d{3})+(?!\d))/g, ",");

describe("customary number wording", () => {
  fcTest.prop([fc.integer({ min: -Number.MAX_SAFE_INTEGER, max: Number.MAX_SAFE_INTEGER })], { numRuns: 500 })(
    "groups any whole number's digits as the regular expression did",
    (n) => {
      expect(groupThousands(String(n))).toBe(byRegex(String(n)));
    },
  );

  it("leaves a number written otherwise (exponent, infinity, not a number) as the regular expression did", () => {
    for (const s of ["1e+21", "1.5e+21", "Infinity", "-Infinity", "NaN", "", "-"]) expect(groupThousands(s)).toBe(byRegex(s));
  });

  fcTest.prop([fc.double({ min: -1e7, max: 1e7, noNaN: true }), fc.constantFrom(undefined, 0, 1, 2, 3)], { numRuns: 500 })(
    "writes a quantity as before: rounded to its decimals, grouped, with a true minus sign",
    (value, decimals) => {
      const rounded = Number.isInteger(value) ? value : Number(value.toFixed(decimals ?? 1));
      const [whole, frac] = String(Math.abs(rounded)).split(".");
      const before = `${rounded < 0 ? "−" : ""}${byRegex(whole)}${frac ? `.${frac}` : ""} psi`;
      expect(imperialText([qty(value, "psi", decimals)])).toBe(before);
    },
  );

  it("writes the figures engine sentences carry", () => {
    // IBC §1807.3.3: concrete backfill of at least 2,000 psi (the engine's own code-minimum sentence).
    expect(imperialText(["at least ", qty(2000, "psi")])).toBe("at least 2,000 psi");
    expect(imperialText([qty(0.75, "in", 2)])).toBe("0.75 in");
    expect(imperialText([qty(-1234.56, "lbFt", 2)])).toBe("−1,234.56 lb-ft");
  });
});
