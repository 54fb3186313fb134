/**
 * The unit factors in engine/units.ts are written as constants from exact definitions; mathjs
 * stays the authority. Each factor must equal mathjs's conversion of the same expression to within
 * floating-point rounding (relative 1e-12). Definitions: NIST SP 811 (2008) Appendix B —
 * 1 in = 25.4 mm, 1 ft = 0.3048 m, 1 lb = 0.45359237 kg, standard gravity 9.80665 m/s²,
 * 1 mi = 1609.344 m (all exact).
 */
import { unit } from "mathjs";
import { describe, expect, it } from "vitest";
import { UNIT_MATHJS_EXPRESSIONS, UNIT_TABLE, type CustomaryUnit } from "../../engine/units";

/** "1000 lbf ft" → 1000 of "lbf ft"; "inch" → 1 inch. */
function mathjsFactor(from: string, to: string): number {
  const [first, ...rest] = from.split(" ");
  const count = Number(first);
  return Number.isFinite(count) ? unit(count, rest.join(" ")).toNumber(to) : unit(1, from).toNumber(to);
}

describe("unit factors written as constants", () => {
  const units = Object.keys(UNIT_TABLE) as CustomaryUnit[];

  it("cover every unit with a mathjs expression", () => {
    expect(Object.keys(UNIT_MATHJS_EXPRESSIONS).sort()).toEqual([...units].sort());
    expect(units.length).toBeGreaterThanOrEqual(17);
  });

  for (const u of units) {
    it(`${u} → ${UNIT_TABLE[u].metric} matches mathjs (${UNIT_MATHJS_EXPRESSIONS[u].join(" → ")})`, () => {
      const [from, to] = UNIT_MATHJS_EXPRESSIONS[u];
      const expected = mathjsFactor(from, to);
      expect(Math.abs(UNIT_TABLE[u].factor - expected) / expected).toBeLessThan(1e-12);
    });
  }

  it("engine/units.ts loads no unit library (the browser bundle stays without mathjs)", async () => {
    const fs = await import("node:fs");
    const source = fs.readFileSync(new URL("../../engine/units.ts", import.meta.url), "utf8");
    expect(source).not.toMatch(/from\s+["']mathjs["']/);
  });
});
