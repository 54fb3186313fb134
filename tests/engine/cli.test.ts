import { spawnSync } from "node:child_process";
import { readFileSync } from "node:fs";
import { join } from "node:path";
import { describe, expect, it } from "vitest";

const root = join(__dirname, "..", "..");
const run = (input: string, args: string[] = []) =>
  spawnSync("npx", ["tsx", "engine/cli.ts", ...args], { cwd: root, input, encoding: "utf8", timeout: 60_000 });
const fixture = JSON.parse(readFileSync(join(root, "tests/fixtures/in/design-default.json"), "utf8")).args;

describe("engine CLI", () => {
  it("prints the result as JSON for a design on stdin", () => {
    const r = run(JSON.stringify(fixture));
    expect(r.status).toBe(0);
    const out = JSON.parse(r.stdout);
    expect(out.footing.depthIn).toBeGreaterThan(0);
    expect(out.caution).toMatch(/licensed engineer/);
  }, 60_000);
  it("--text prints a readable summary", () => {
    const r = run(JSON.stringify(fixture), ["--text"]);
    expect(r.status).toBe(0);
    expect(r.stdout).toMatch(/Footing: 24 in hole/);
    expect(r.stdout).toMatch(/CAUTION/);
  }, 60_000);
  it("bad input exits 2 with the field errors", () => {
    const bad = { ...fixture, site: { ...fixture.site, windSpeedMph: 20 } };
    const r = run(JSON.stringify(bad));
    expect(r.status).toBe(2);
    expect(JSON.parse(r.stderr).errors).toEqual([{ path: "site.windSpeedMph", message: "Wind speed must be between 85 and 200 mph" }]);
  }, 60_000);
  it("non-JSON input exits 2", () => {
    const r = run("not json");
    expect(r.status).toBe(2);
    expect(r.stderr).toMatch(/JSON design object/);
  }, 60_000);
});
