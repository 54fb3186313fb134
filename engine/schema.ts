/**
 * The one input schema that forms, the API and the engine share. Grouped for a form: `site`,
 * `array`, `posts`. Units are in the field names. Defaults fill optional fields, so the parsed
 * `DesignInput` is complete. Each rule's message names the field and its allowed range.
 */
import { z } from "zod";
import { messageName } from "./field-labels";
import { arrayWidthFt } from "./geometry/array-dimensions";
import { choice, flag, num } from "./schema-helpers";
import { PIPE_SIZES } from "./footing/pipe";

const soilClassValue = z.preprocess(
  (v) => (typeof v === "string" && /^[1-5]$/.test(v) ? Number(v) : v),
  z.union([z.literal([1, 2, 3, 4, 5]), z.enum(["fill", "organic", "mud"])], {
    error: "Soil class must be 1, 2, 3, 4 or 5 (IBC Table 1806.2)",
  }),
).refine((v) => typeof v === "number", {
  error: "Fill, organic soil and mud have no presumptive bearing value (IBC Table 1806.2): enter values from a geotechnical report as custom soil",
});

const soilSchema = z.discriminatedUnion(
  "method",
  [
    z.object({ method: z.literal("class"), soilClass: soilClassValue }),
    z.object({
      method: z.literal("custom"),
      allowableBearingPsf: num(messageName("site.soil.allowableBearingPsf"), 500, 20000, "psf"),
      lateralBearingPsfPerFt: num(messageName("site.soil.lateralBearingPsfPerFt"), 25, 2000, "psf per ft"),
      description: z.string().max(200, { error: "Soil description must be at most 200 characters" }).optional(),
    }),
  ],
  { error: 'Soil method must be "class" (IBC Table 1806.2) or "custom" (engineer\'s values)' },
);

const topographySchema = z.discriminatedUnion(
  "method",
  [
    z.object({ method: z.literal("flat") }),
    z.object({ method: z.literal("kzt"), kzt: num(messageName("site.topography.kzt"), 1, 3) }),
    z.object({
      method: z.literal("hill"),
      k1: num(messageName("site.topography.k1"), 0, 1.5),
      k2: num(messageName("site.topography.k2"), 0, 1),
      k3: num(messageName("site.topography.k3"), 0, 1),
    }),
  ],
  { error: 'Topography method must be "flat", "kzt" or "hill"' },
);

export const siteSchema = z.object({
  edition: choice(messageName("site.edition"), ["7-16", "7-22"]),
  riskCategory: choice(messageName("site.riskCategory"), ["I", "II", "III", "IV"]).default("II"),
  windSpeedMph: num(messageName("site.windSpeedMph"), 85, 200, "mph"),
  exposure: choice(messageName("site.exposure"), ["B", "C", "D"]),
  groundElevationFt: num(messageName("site.groundElevationFt"), -300, 15000, "ft").default(0),
  topography: topographySchema.default({ method: "flat" }),
  groundSnowPsf: num(messageName("site.groundSnowPsf"), 0, 300, "psf").default(0),
  snowExposureCe: num(messageName("site.snowExposureCe"), 0.7, 1.3).default(1.0),
  snowThermalCt: num(messageName("site.snowThermalCt"), 0.85, 1.3).default(1.2),
  soil: soilSchema,
  frostDepthIn: num(messageName("site.frostDepthIn"), 0, 120, "in"),
  slopeAlongPct: num(messageName("site.slopeAlongPct"), -50, 50, "%").default(0),
  slopeAcrossPct: num(messageName("site.slopeAcrossPct"), -50, 50, "%").default(0),
  waterTableDepthFt: num(messageName("site.waterTableDepthFt"), 0, 200, "ft").optional(),
}, { error: "Site must be given: wind, exposure, snow, soil and frost for the site" });

export const arraySchema = z.object({
  moduleLengthIn: num(messageName("array.moduleLengthIn"), 30, 110, "in"),
  moduleWidthIn: num(messageName("array.moduleWidthIn"), 15, 60, "in"),
  moduleWeightLb: num(messageName("array.moduleWeightLb"), 10, 150, "lb"),
  orientation: choice(messageName("array.orientation"), ["portrait", "landscape"]),
  rows: num(messageName("array.rows"), 1, 8, "", { int: true }),
  columns: num(messageName("array.columns"), 1, 40, "", { int: true }),
  gapIn: num(messageName("array.gapIn"), 0, 12, "in").default(1),
  tiltDeg: num(messageName("array.tiltDeg"), 0, 60, "degrees"),
  tiltSettingsDeg: z
    .array(num("Each tilt setting", 0, 60, "degrees"), { error: "Tilt settings must be a list of angles in degrees" })
    .min(1, { error: "Tilt settings must list between 1 and 24 angles" })
    .max(24, { error: "Tilt settings must list between 1 and 24 angles" })
    .optional(),
  lowestEdgeClearanceIn: num(messageName("array.lowestEdgeClearanceIn"), 6, 120, "in"),
  rackingDeadPsf: num(messageName("array.rackingDeadPsf"), 0, 15, "psf").default(1.5),
  rackDepthIn: num(messageName("array.rackDepthIn"), 0, 24, "in").default(6),
  flow: choice(messageName("array.flow"), ["clear", "obstructed"]).default("clear"),
  slipperySurface: flag(messageName("array.slipperySurface")).default(true),
  /**
   * The compass bearing the modules face (the low edge's outward normal), clockwise from true
   * north: 180 faces south. Used only to orient the drawing (`geometryPreview.north`) and the field
   * spec; it changes no calculation, because the free-roof wind method checks both along-slope
   * wind directions (γ = 0° and 180°) whichever way the array faces.
   */
  azimuthDeg: num(messageName("array.azimuthDeg"), 0, 360, "degrees").default(180),
}, { error: "Array must be given: modules, rows and columns, tilt and clearance" });

const diameterList = (label: string) =>
  z.array(num(`Each ${label} diameter`, 8, 60, "in"), { error: `${label} diameters must be a list of numbers` })
    .min(1, { error: `${label} diameters must list between 1 and 20 sizes` })
    .max(20, { error: `${label} diameters must list between 1 and 20 sizes` });

export const postsSchema = z.object({
  count: num(messageName("posts.count"), 2, 20, "", { int: true }).default(2),
  spacingFt: num(messageName("posts.spacingFt"), 1, 40, "ft").optional(),
  pipeSize: choice(messageName("posts.pipeSize"), PIPE_SIZES),
  yieldKsi: num(messageName("posts.yieldKsi"), 25, 60, "ksi").default(35),
  holeDiameterIn: z.union([num(messageName("posts.holeDiameterIn"), 8, 60, "in"), z.literal("auto")], {
    error: 'Hole diameter must be between 8 and 60 in, or "auto"',
  }).default(24),
  autoDiametersIn: diameterList("Candidate").default([12, 18, 24, 30, 36]),
  maxAutoDepthIn: num(messageName("posts.maxAutoDepthIn"), 24, 240, "in").default(96),
  sweepDiametersIn: diameterList("Sweep").default([12, 18, 24, 30, 36]),
  fixedDepthIn: num(messageName("posts.fixedDepthIn"), 12, 360, "in").optional(),
  constrainedAtGrade: flag(messageName("posts.constrainedAtGrade")).default(false),
  isolatedPoleIncrease: flag(messageName("posts.isolatedPoleIncrease")).default(false),
  concreteUnitWeightPcf: num(messageName("posts.concreteUnitWeightPcf"), 100, 160, "pcf").default(145),
  wasteAllowancePct: num(messageName("posts.wasteAllowancePct"), 0, 50, "%").default(10),
  subtractPostDisplacement: flag(messageName("posts.subtractPostDisplacement")).default(false),
  depthIncrementIn: num(messageName("posts.depthIncrementIn"), 1, 12, "in").default(6),
  sideFrictionPsf: num(messageName("posts.sideFrictionPsf"), 0, 2000, "psf").optional(),
  // Added later: each has a default so revisions saved before them still parse.
  bearingPressure: choice(messageName("posts.bearingPressure"), ["gross", "net"]).default("gross"),
  soilUnitWeightPcf: num(messageName("posts.soilUnitWeightPcf"), 60, 150, "pcf").default(110),
  concreteStrengthPsi: num(messageName("posts.concreteStrengthPsi"), 2000, 10000, "psi").default(4000),
  maxAggregateIn: num(messageName("posts.maxAggregateIn"), 0.25, 1.5, "in").default(0.75),
  slumpIn: num(messageName("posts.slumpIn"), 1, 9, "in").default(4),
}, { error: "Posts must be given: number of posts, pipe size and hole" });

export const designInputSchema = z
  .object({ site: siteSchema, array: arraySchema, posts: postsSchema, projectName: z.string().max(120).optional() }, { error: "A design must be an object with site, array and posts sections" })
  .superRefine((v, ctx) => {
    const widthFt = arrayWidthFt(v.array);
    if (v.posts.spacingFt === undefined) {
      const min = Math.max(2, Math.ceil(widthFt / 40 - 1e-9));
      const max = Math.max(2, Math.floor(widthFt + 1e-9));
      if (v.posts.count < min || v.posts.count > max) {
        ctx.addIssue({ code: "custom", path: ["posts", "count"], message: `Number of posts must be between ${min} and ${Math.max(min, max)} for the ${widthFt.toFixed(2)} ft wide array (posts 1–40 ft apart)` });
      }
    }
    if (v.posts.spacingFt !== undefined && (v.posts.count - 1) * v.posts.spacingFt > widthFt) {
      const max = widthFt / (v.posts.count - 1);
      ctx.addIssue({ code: "custom", path: ["posts", "spacingFt"], message: `Post spacing must be between 1 and ${max.toFixed(2)} ft so the posts fit under the ${widthFt.toFixed(2)} ft wide array` });
    }
  });

/** The parsed, defaults-filled input the engine works on. */
export type DesignInput = z.output<typeof designInputSchema>;
/** What a form or API caller may send (optional fields may be left out). */
export type DesignInputDraft = z.input<typeof designInputSchema>;
