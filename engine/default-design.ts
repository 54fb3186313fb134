/**
 * A demo design: 12 modules (2 rows × 6 columns, portrait) on four 3½ in standard pipe posts,
 * ASCE 7-16, 115 mph, exposure C, ground snow 20 psf, frost 36 in, IBC soil class 4, 24 in holes,
 * 30° tilt, 24 in lowest-edge clearance. Invented data for the demo, not a real project.
 * Why four posts: on two posts a 12-module array at 115 mph puts about 9.9 kip-ft on each post at
 * grade, 2.6 × what a 3 in standard pipe allows (1.4 × a 4 in); `twoPostDesignInput` keeps that
 * case (with 5 in pipe and 30 in holes) for the benchmark and as an example of the warnings.
 */
import type { DesignInputDraft } from "./schema";

export const defaultDesignInput = {
  projectName: "Demo: 12-module ground array",
  site: {
    edition: "7-16",
    riskCategory: "II",
    windSpeedMph: 115,
    exposure: "C",
    groundElevationFt: 0,
    topography: { method: "flat" },
    groundSnowPsf: 20,
    snowExposureCe: 1.0,
    snowThermalCt: 1.2,
    soil: { method: "class", soilClass: 4 },
    frostDepthIn: 36,
    slopeAlongPct: 0,
    slopeAcrossPct: 0,
  },
  array: {
    moduleLengthIn: 69,
    moduleWidthIn: 41,
    moduleWeightLb: 45,
    orientation: "portrait",
    rows: 2,
    columns: 6,
    gapIn: 1,
    tiltDeg: 30,
    lowestEdgeClearanceIn: 24,
    rackingDeadPsf: 1.5,
    rackDepthIn: 6,
    flow: "clear",
    slipperySurface: true,
  },
  posts: {
    count: 4,
    pipeSize: "3-1/2",
    yieldKsi: 35,
    holeDiameterIn: 24,
    constrainedAtGrade: false,
    isolatedPoleIncrease: false,
    concreteUnitWeightPcf: 145,
    wasteAllowancePct: 10,
    subtractPostDisplacement: false,
    depthIncrementIn: 6,
  },
} as const satisfies DesignInputDraft;

/** The 12-module array on two posts: 5 in standard pipe, 30 in holes. */
export const twoPostDesignInput = {
  ...defaultDesignInput,
  projectName: "Demo: 12-module ground array on two posts",
  posts: { ...defaultDesignInput.posts, count: 2, pipeSize: "5", holeDiameterIn: 30 },
} as const satisfies DesignInputDraft;
