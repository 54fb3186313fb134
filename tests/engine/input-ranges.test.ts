/**
 * One source for input ranges: the schema (engine/schema.ts). Every numeric input's range as the
 * engine reads it (engine/input-ranges.ts) is what the schema accepts, and every guard in the
 * engine on a design input either uses that range or is a general method's wider guard that
 * contains it (so the engine never refuses what a form or the API accepted).
 * Ranges are the product's input limits, not published values [common practice: app input limits].
 */
import fs from "node:fs";
import path from "node:path";
import { fileURLToPath } from "node:url";
import { describe, expect, it } from "vitest";
import { concreteForHole, concreteOrder, defaultDesignInput, designInputSchema, gradeHeights } from "@/engine";
import { inputRange, inputRanges } from "@/engine/input-ranges";

const ROOT = fileURLToPath(new URL("../..", import.meta.url));

/** The default design with one input set, and the section switched to the variant that has the input. */
function designWith(inputPath: string, value: number): unknown {
  const design = structuredClone(defaultDesignInput) as unknown as Record<string, Record<string, unknown>>;
  if (inputPath.startsWith("site.topography.")) design.site.topography = inputPath.endsWith("kzt") ? { method: "kzt", kzt: 1 } : { method: "hill", k1: 0.5, k2: 0.5, k3: 0.5 };
  if (/^site\.soil\.(allowable|lateral)/.test(inputPath)) design.site.soil = { method: "custom", allowableBearingPsf: 1500, lateralBearingPsfPerFt: 100 };
  const keys = inputPath.split(".");
  let node: Record<string, unknown> = design;
  for (const key of keys.slice(0, -1)) node = node[key] as Record<string, unknown>;
  const list = /(SettingsDeg|DiametersIn)$/.test(inputPath);
  node[keys.at(-1)!] = list ? [value] : value;
  return design;
}

function issuesAt(inputPath: string, value: number): string[] {
  const parsed = designInputSchema.safeParse(designWith(inputPath, value));
  return parsed.success ? [] : parsed.error.issues.filter((i) => i.path.join(".").replace(/\.\d+$/, "") === inputPath).map((i) => i.message);
}

/** Limits that also depend on another input (posts must fit under the array): the range check is what is compared. */
const rangeMessages = (messages: string[]) => messages.filter((m) => !/ wide array\b/.test(m));

describe("the ranges the engine reads are the schema's", () => {
  const paths = [...inputRanges().keys()];
  it("covers every numeric input", () => {
    // Each section has numeric inputs; spot-check a few named in the issue's drifts.
    expect(paths).toEqual(expect.arrayContaining(["posts.concreteUnitWeightPcf", "array.lowestEdgeClearanceIn", "array.tiltDeg", "posts.count", "posts.wasteAllowancePct"]));
    expect(paths.length).toBeGreaterThan(30);
  });

  it.each(paths)("%s", (inputPath) => {
    const { min, max, int } = inputRange(inputPath);
    const step = int ? 1 : 1e-6 * Math.max(1, max - min);
    expect(rangeMessages(issuesAt(inputPath, min)), `${inputPath} = ${min}`).toEqual([]);
    expect(rangeMessages(issuesAt(inputPath, max)), `${inputPath} = ${max}`).toEqual([]);
    expect(issuesAt(inputPath, min - step).length, `${inputPath} below ${min}`).toBeGreaterThan(0);
    expect(issuesAt(inputPath, max + step).length, `${inputPath} above ${max}`).toBeGreaterThan(0);
  });
});

/** General methods that accept more than one design does, and why; their range must contain the schema's. */
const WIDER_METHODS: Record<string, { scale: number; why: string }> = {
  "engine/snow/snow-load.ts array.tiltDeg": { scale: 1, why: "Cs of ASCE 7 Fig. 7.4-1 is defined to 90° roof slope" },
  "engine/concrete/concrete-for-hole.ts posts.holeDiameterIn": { scale: 1, why: "concrete for any hole, including as dug" },
  "engine/footing/embedment.ts posts.holeDiameterIn": { scale: 12, why: "the equation takes the diameter in feet" },
};

function engineFiles(dir = "engine"): string[] {
  return fs.readdirSync(path.join(ROOT, dir), { withFileTypes: true }).flatMap((e) => (e.isDirectory() ? engineFiles(`${dir}/${e.name}`) : e.name.endsWith(".ts") ? [`${dir}/${e.name}`] : []));
}

describe("every engine guard on a design input defers to the schema", () => {
  const guards = engineFiles().flatMap((file) =>
    [...fs.readFileSync(path.join(ROOT, file), "utf8").matchAll(/requireRange\("([\w.]+)", [^,]+, (-?[\d.e]+), (-?[\d.e]+),/g)]
      .filter((m) => inputRanges().has(m[1]))
      .map((m) => ({ file, inputPath: m[1], min: Number(m[2]), max: Number(m[3]) })),
  );
  it("finds the guards it checks", () => expect(guards.length).toBeGreaterThan(10));

  it.each(guards.map((g) => ({ ...g, label: `${g.file} ${g.inputPath} ${g.min}–${g.max}` })))("$label", ({ file, inputPath, min, max }) => {
    const schema = inputRange(inputPath);
    const wider = WIDER_METHODS[`${file} ${inputPath}`];
    if (!wider) return expect({ min, max }).toEqual({ min: schema.min, max: schema.max });
    expect(min * wider.scale).toBeLessThanOrEqual(schema.min);
    expect(max * wider.scale).toBeGreaterThanOrEqual(schema.max);
  });

  it("the guards that drifted now refuse what the schema refuses, in the schema's words", () => {
    const message = (inputPath: string, value: number) => issuesAt(inputPath, value)[0];
    expect(() => concreteForHole({ diameterIn: 24, depthIn: 60, unitWeightPcf: 95 })).toThrowError(message("posts.concreteUnitWeightPcf", 95));
    const hole = concreteForHole({ diameterIn: 24, depthIn: 60 });
    expect(() => concreteOrder({ hole, holes: 2, wasteAllowancePct: 60 })).toThrowError(message("posts.wasteAllowancePct", 60));
    expect(() => concreteOrder({ hole, holes: 21, wasteAllowancePct: 10 })).toThrowError(/Number of posts must be between 2 and 20/);
    expect(() => gradeHeights({ widthFt: 20, slopeLengthFt: 10, tiltDeg: 30, clearanceTiltDeg: 30, clearanceIn: 3, rackDepthIn: 6, slopeAlongPct: 0, slopeAcrossPct: 0, postXFt: [-5, 5] }))
      .toThrowError(message("array.lowestEdgeClearanceIn", 3));
  });
});
