/**
 * Designs whose whole `sizeDesign` result is pinned in tests/fixtures/out/pinned-design-results.json,
 * so that performance work on the engine cannot change a single number, key or key order.
 * The variants reach the code paths the fast paths touch: several tilts (tilt envelope), auto
 * diameter, sloping ground, 7-22, water table, side friction, a given depth, constrained posts,
 * obstructed flow, low tilt, more posts with a given spacing, custom soil and a hill.
 *
 * Regenerate ONLY when a result is meant to change: `npx tsx tests/engine/pinned-designs.ts --write`.
 */
import { writeFileSync } from "node:fs";
import { fileURLToPath } from "node:url";
import { defaultDesignInput, sizeDesign, twoPostDesignInput } from "../../engine/index";

type Draft = Record<string, Record<string, unknown>>;
const variant = (base: unknown, f: (d: Draft) => void): unknown => {
  const d = structuredClone(base) as Draft;
  f(d);
  return d;
};

export const PINNED_DESIGNS: Record<string, unknown> = {
  default: defaultDesignInput,
  twoPost: twoPostDesignInput,
  twoPostSweep: variant(twoPostDesignInput, (d) => {
    d.array.tiltSettingsDeg = [10, 15, 20, 25, 30, 35, 40, 45];
    d.posts.sweepDiametersIn = [12, 18, 24, 30, 36];
  }),
  autoSlope722: variant(defaultDesignInput, (d) => {
    d.site.edition = "7-22";
    d.site.slopeAlongPct = 8;
    d.site.slopeAcrossPct = -5;
    d.site.groundElevationFt = 4000;
    d.site.waterTableDepthFt = 3;
    d.site.riskCategory = "III";
    d.posts.holeDiameterIn = "auto";
    d.posts.sideFrictionPsf = 100;
    d.array.tiltSettingsDeg = [5, 20, 50];
  }),
  autoNoneReasonable: variant(twoPostDesignInput, (d) => {
    d.posts.holeDiameterIn = "auto";
    d.posts.maxAutoDepthIn = 24;
    d.site.soil = { method: "class", soilClass: 5 };
  }),
  constrainedFixedDepth: variant(defaultDesignInput, (d) => {
    d.posts.constrainedAtGrade = true;
    d.posts.fixedDepthIn = 40;
    d.posts.isolatedPoleIncrease = true;
    d.posts.subtractPostDisplacement = true;
    d.array.flow = "obstructed";
    d.array.tiltDeg = 5;
    d.array.slipperySurface = false;
    d.site.groundSnowPsf = 40;
  }),
  manyPostsCustomSoilHill: variant(defaultDesignInput, (d) => {
    d.array.columns = 20;
    d.array.orientation = "landscape";
    d.array.rows = 3;
    d.posts.count = 6;
    d.posts.spacingFt = 12;
    d.posts.pipeSize = "6";
    d.site.exposure = "D";
    d.site.windSpeedMph = 160;
    d.site.topography = { method: "hill", k1: 0.3, k2: 0.6, k3: 0.5 };
    d.site.soil = { method: "custom", allowableBearingPsf: 2500, lateralBearingPsfPerFt: 180, description: "report 12" };
    d.array.lowestEdgeClearanceIn = 90;
    d.array.tiltSettingsDeg = [20, 40];
  }),
};

/**
 * JSON that keeps what plain JSON would blur: −0, ±Infinity, NaN and keys whose value is
 * undefined each become a tagged string, so "same JSON" means "same result".
 */
export function pinnedJson(value: unknown): string {
  return JSON.stringify(
    value,
    function (_k, v) {
      if (v === undefined) return "__undefined__";
      if (typeof v === "number") {
        if (Object.is(v, -0)) return "__-0__";
        if (!Number.isFinite(v)) return `__${v}__`;
      }
      return v;
    },
    1,
  );
}

export const PINNED_FILE = fileURLToPath(new URL("../fixtures/out/pinned-design-results.json", import.meta.url));

export function pinnedResults(): Record<string, unknown> {
  return Object.fromEntries(Object.entries(PINNED_DESIGNS).map(([k, d]) => [k, sizeDesign(d)]));
}

if (process.argv.includes("--write")) {
  writeFileSync(PINNED_FILE, pinnedJson(pinnedResults()) + "\n");
  console.log(`wrote ${PINNED_FILE}`);
}
