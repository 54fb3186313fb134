// groupedNumber writes numbers without making an Intl.NumberFormat; Intl.NumberFormat("en-US")
// (ECMA-402, NumberFormat with minimum = maximum fraction digits) stays the authority it must match.
import { fc, test as fcTest } from "@fast-check/vitest";
import { describe, expect, it } from "vitest";
import { groupedNumber } from "@/components/ui/grouped-number";

const byIntl = (value: number, decimals: number) =>
  new Intl.NumberFormat("en-US", { minimumFractionDigits: decimals, maximumFractionDigits: decimals }).format(value);

describe("groupedNumber", () => {
  fcTest.prop([fc.double({ noNaN: false }), fc.integer({ min: 0, max: 6 })], { numRuns: 3000 })(
    "writes any number exactly as Intl.NumberFormat('en-US') does",
    (value, decimals) => {
      expect(groupedNumber(value, decimals)).toBe(byIntl(value, decimals));
    },
  );

  fcTest.prop([fc.double({ min: -1e9, max: 1e9, noNaN: true }), fc.integer({ min: 0, max: 6 })], { numRuns: 5000 })(
    "writes the editor's range of numbers (results, loads, sizes) as Intl.NumberFormat does",
    (value, decimals) => {
      expect(groupedNumber(value, decimals)).toBe(byIntl(value, decimals));
    },
  );

  fcTest.prop([fc.integer({ min: -10_000_000, max: 10_000_000 }), fc.integer({ min: 0, max: 4 }), fc.constantFrom(0.5, 0.25, 0.125, 0.005, 0.0005, 0.05)], { numRuns: 3000 })(
    "rounds halves (and near-halves) as Intl.NumberFormat does",
    (whole, decimals, part) => {
      const value = whole / 100 + Math.sign(whole || 1) * part;
      expect(groupedNumber(value, decimals)).toBe(byIntl(value, decimals));
    },
  );

  it("keeps Intl's writing of the edge cases", () => {
    for (const v of [-0, 0, Infinity, -Infinity, NaN, 1e21, -1e21, 1.5e300, 5e-324, -0.004, 999.995, 1234567.891]) {
      for (const d of [0, 1, 2, 3]) expect(groupedNumber(v, d)).toBe(byIntl(v, d));
    }
    // The editor's usual figures [common practice: US digit grouping].
    expect(groupedNumber(10579, 0)).toBe("10,579");
    expect(groupedNumber(-1234.5, 2)).toBe("-1,234.50");
  });
});
