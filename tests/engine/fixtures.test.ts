// Worked examples as fixtures: tests/fixtures/in/*.json (function + args) against
// tests/fixtures/out/*.json (expected values); each file names its published source.
import { readdirSync, readFileSync } from "node:fs";
import { join } from "node:path";
import { describe, expect, it } from "vitest";
import * as engine from "../../engine/index";

const dir = join(__dirname, "..", "fixtures");
const names = readdirSync(join(dir, "in")).filter((f) => f.endsWith(".json"));
const FUNCTIONS: Record<string, (args: never) => unknown> = {
  velocityPressure: engine.velocityPressure,
  netPressureCoefficients: engine.netPressureCoefficients,
  embedmentDepth: engine.embedmentDepth,
  concreteForHole: engine.concreteForHole,
  pipeAllowableMoment: engine.pipeAllowableMoment,
  snowLoad: engine.snowLoad,
  sizeDesign: engine.sizeDesign,
};

function get(obj: unknown, path: string): unknown {
  // Paths are dotted ("wind.velocity.qzPsf"); nested expected objects are flattened below.
  return path.split(".").reduce<unknown>((o, k) => (o as Record<string, unknown>)?.[k], obj);
}
function flatten(o: Record<string, unknown>, prefix = ""): [string, unknown][] {
  return Object.entries(o).flatMap(([k, v]) =>
    v && typeof v === "object" && !Array.isArray(v) ? flatten(v as Record<string, unknown>, `${prefix}${k}.`) : [[`${prefix}${k}`, v] as [string, unknown]],
  );
}

describe("fixtures", () => {
  it("has a fixture pair for every input, each naming its source", () => {
    expect(names.length).toBeGreaterThanOrEqual(10);
    for (const n of names) {
      const inp = JSON.parse(readFileSync(join(dir, "in", n), "utf8"));
      const out = JSON.parse(readFileSync(join(dir, "out", n), "utf8"));
      expect(inp.source, n).toMatch(/\S/);
      expect(out.source, n).toMatch(/\S/);
    }
  });
  for (const n of names) {
    it(n.replace(/\.json$/, ""), () => {
      const inp = JSON.parse(readFileSync(join(dir, "in", n), "utf8"));
      const out = JSON.parse(readFileSync(join(dir, "out", n), "utf8"));
      const fn = FUNCTIONS[inp.function];
      expect(fn, `unknown function ${inp.function}`).toBeTypeOf("function");
      const result = fn(inp.args as never);
      for (const [path, want] of flatten(out.expected)) {
        const got = get(result, path);
        if (typeof want === "number") {
          const tol = out.relativeTolerance !== undefined ? Math.abs(want) * out.relativeTolerance : out.tolerance;
          expect(Math.abs((got as number) - want), `${path}: got ${got}, want ${want} (${out.source})`).toBeLessThanOrEqual(tol);
        } else expect(got, path).toEqual(want);
      }
    });
  }
});
