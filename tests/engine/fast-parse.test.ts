// The validation fast path (engine/fast-parse.ts) must never differ from zod: on thousands of
// random drafts (valid designs with random fields set to valid, boundary, wrong-type, missing or
// extra values) it either declines or returns exactly what designInputSchema.parse returns, and
// safeParseDesignInput answers exactly as zod alone would.
import { fc, test as fcTest } from "@fast-check/vitest";
import { describe, expect, it } from "vitest";
import { designInputSchema, safeParseDesignInput, zodIssuesToFieldErrors } from "../../engine/index";
import { compileFastParser, fastParseDesignInput, fastParseStatus } from "../../engine/fast-parse";

// The generic (no code generation) version, for runtimes that block `new Function`.
const generic = compileFastParser(false).parse!;
import { PINNED_DESIGNS, pinnedJson } from "./pinned-designs";

type Obj = Record<string, unknown>;

const PATHS = [
  "projectName", "extraTop",
  "site", "site.edition", "site.riskCategory", "site.windSpeedMph", "site.exposure", "site.groundElevationFt", "site.topography",
  "site.topography.method", "site.topography.kzt", "site.topography.k1", "site.groundSnowPsf", "site.snowExposureCe", "site.snowThermalCt",
  "site.soil", "site.soil.method", "site.soil.soilClass", "site.soil.allowableBearingPsf", "site.soil.lateralBearingPsfPerFt", "site.soil.description",
  "site.frostDepthIn", "site.slopeAlongPct", "site.slopeAcrossPct", "site.waterTableDepthFt", "site.extra",
  "array", "array.moduleLengthIn", "array.moduleWidthIn", "array.moduleWeightLb", "array.orientation", "array.rows", "array.columns", "array.gapIn",
  "array.tiltDeg", "array.tiltSettingsDeg", "array.lowestEdgeClearanceIn", "array.rackingDeadPsf", "array.rackDepthIn", "array.flow", "array.slipperySurface",
  "posts", "posts.count", "posts.spacingFt", "posts.pipeSize", "posts.yieldKsi", "posts.holeDiameterIn", "posts.autoDiametersIn", "posts.maxAutoDepthIn",
  "posts.sweepDiametersIn", "posts.fixedDepthIn", "posts.constrainedAtGrade", "posts.isolatedPoleIncrease", "posts.concreteUnitWeightPcf",
  "posts.wasteAllowancePct", "posts.subtractPostDisplacement", "posts.depthIncrementIn", "posts.sideFrictionPsf",
];

const DELETE = Symbol("delete");
const long = (n: number) => "x".repeat(n);
const VALUES: unknown[] = [
  DELETE, undefined, null, true, false, NaN, Infinity, -Infinity, -0, 0, 0.5, 1, 1.2, 1.5, 2, 3, 4, 5, 6, 7, 7.5, 8, 12, 15, 18, 20, 21, 24, 25, 30, 36,
  40, 45, 50, 60, 61, 85, 96, 100, 110, 115, 120, 121, 150, 160, 200, 201, 240, 300, 360, 500, 2000, 15000, 20000, 20001, -1, -50, -51, -300, 1e308, 2.5e-320,
  "", "4", "3", " 4", "4.0", "6", "fill", "auto", "clear", "obstructed", "portrait", "landscape", "7-16", "7-22", "II", "IV", "C", "B", "5", "3-1/2",
  "class", "custom", "flat", "kzt", "hill", long(120), long(121), long(200), long(201),
  [], [12], [30, 12, 30], [10, 20, 45, 60], Array.from({ length: 20 }, (_, i) => 8 + i), Array.from({ length: 21 }, () => 12), Array.from({ length: 25 }, () => 30),
  [NaN], ["12"], [12, null], [8, 60], [7, 61],
  { method: "flat" }, { method: "flat", kzt: 2 }, { method: "kzt", kzt: 1.5 }, { method: "kzt" }, { method: "hill", k1: 0.3, k2: 0.5, k3: 0.4 }, { method: "hill", k1: 2, k2: 0, k3: 0 },
  { method: "class", soilClass: 3 }, { method: "class", soilClass: "2" }, { method: "class", soilClass: "fill" }, { method: "class", soilClass: 6 },
  { method: "custom", allowableBearingPsf: 2500, lateralBearingPsfPerFt: 180 }, { method: "custom", allowableBearingPsf: 2500, lateralBearingPsfPerFt: 180, description: "report" },
  { method: "custom", allowableBearingPsf: 2500, lateralBearingPsfPerFt: 180, description: undefined }, { method: "nope" }, {}, new Date(0), Object.create({ inherited: 1 }),
];

function setPath(root: Obj, path: string, value: unknown): void {
  const keys = path.split(".");
  let o: unknown = root;
  for (const k of keys.slice(0, -1)) {
    if (typeof o !== "object" || o === null) return;
    o = (o as Obj)[k];
  }
  if (typeof o !== "object" || o === null || Array.isArray(o)) return;
  const last = keys[keys.length - 1];
  if (value === DELETE) delete (o as Obj)[last];
  else (o as Obj)[last] = typeof value === "object" && value !== null && !(value instanceof Date) && Object.getPrototypeOf(value) === Object.prototype ? structuredClone(value) : Array.isArray(value) ? [...value] : value;
}

const bases = Object.values(PINNED_DESIGNS);
const mutation = fc.tuple(fc.constantFrom(...PATHS), fc.constantFrom(...VALUES));

describe("validation fast path", () => {
  it("is switched on for the current schema", () => {
    expect(fastParseStatus()).toEqual({ enabled: true, offReason: "" });
    expect(compileFastParser(false).parse).not.toBeNull();
  });

  it("accepts every pinned design with exactly zod's output, sharing no arrays or objects with the draft", () => {
    for (const d of bases) {
      const fast = fastParseDesignInput(d);
      expect(fast).toBeDefined();
      expect(pinnedJson(fast)).toBe(pinnedJson(designInputSchema.parse(d)));
      const raw = d as { site: unknown; array: { tiltSettingsDeg?: unknown }; posts: { sweepDiametersIn?: unknown; autoDiametersIn?: unknown } };
      expect(fast!.site).not.toBe(raw.site);
      if (raw.array.tiltSettingsDeg) expect(fast!.array.tiltSettingsDeg).not.toBe(raw.array.tiltSettingsDeg);
      if (raw.posts.sweepDiametersIn) expect(fast!.posts.sweepDiametersIn).not.toBe(raw.posts.sweepDiametersIn);
    }
    // Two parses of a draft with defaulted lists do not share the default list.
    const a = fastParseDesignInput(PINNED_DESIGNS.default)!, b = fastParseDesignInput(PINNED_DESIGNS.default)!;
    expect(a.posts.autoDiametersIn).not.toBe(b.posts.autoDiametersIn);
    expect(a.site.topography).not.toBe(b.site.topography);
  });

  let accepted = 0;
  fcTest.prop([fc.nat({ max: bases.length - 1 }), fc.array(mutation, { minLength: 0, maxLength: 4 })], { numRuns: 2500 })(
    "never differs from zod on random drafts",
    (bi, muts) => {
      const d = structuredClone(bases[bi]) as Obj;
      for (const [p, v] of muts) setPath(d, p, v);
      const z = designInputSchema.safeParse(d);
      const fast = fastParseDesignInput(d);
      if (fast !== undefined) {
        accepted++;
        expect(z.success, "fast path accepted what zod rejects").toBe(true);
        expect(pinnedJson(fast)).toBe(pinnedJson(z.data));
      }
      const g = generic(d);
      expect(g === undefined ? undefined : pinnedJson(g), "generic and generated versions agree").toBe(fast === undefined ? undefined : pinnedJson(fast));
      const s = safeParseDesignInput(d);
      if (z.success) expect(s.ok && pinnedJson(s.input)).toBe(pinnedJson(z.data));
      else expect(s).toEqual({ ok: false, issues: zodIssuesToFieldErrors(z.error) });
    },
    // Thousands of zod parses: generous on the shared, busy test machine.
    60_000,
  );
  it("took the fast path on a good share of those drafts", () => {
    expect(accepted).toBeGreaterThan(250);
  });
});
