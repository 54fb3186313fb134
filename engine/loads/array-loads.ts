/**
 * Everything the array puts on its posts at one tilt: geometry, velocity pressure, the four wind
 * cases, dead and snow — unfactored, for the whole array and per post by tributary width.
 *
 * Statics: dead and snow act at the array centroid, which sits over the beam (mid-slope), so they
 * add vertical load only. Wind acts as resolved by `arrayWindForce`; at each post's grade the
 * overturning moment is M_top + H × (post height above its own grade). Each post takes its
 * share of every array load as a reaction of the beam continuous over the posts
 * (`continuousBeamShares`; with two posts that is the tributary share exactly), so the posts'
 * reactions sum to the applied loads.
 */
import type { DesignInput } from "../schema";
import { arrayDimensions, type ArrayDimensions } from "../geometry/array-dimensions";
import { gradeHeights, type GradeHeights } from "../geometry/grade";
import { continuousBeamShares } from "../geometry/continuous-beam";
import { postLayout, type PostLayout } from "../geometry/post-layout";
import { snowLoad, SNOW_IMPORTANCE, type SnowLoad } from "../snow/snow-load";
import { arrayWindForce, type ArrayWindForce } from "../wind/array-wind-force";
import { netPressureCoefficients, type CnPair, type WindDirectionDeg } from "../wind/net-pressure-coefficients";
import { velocityPressure, type VelocityPressure } from "../wind/velocity-pressure";

/** Gust-effect factor for a rigid structure, ASCE 7-16 §26.11.1 [memory]. */
export const GUST_FACTOR_RIGID = 0.85;

export interface WindCase {
  label: string;
  windDirectionDeg: WindDirectionDeg;
  loadCase: "A" | "B";
  cn: CnPair;
  force: ArrayWindForce;
}

export interface PostLoad {
  id: string;
  xFt: number;
  tributaryWidthFt: number;
  /** Fraction of every array load on this post (continuous-beam reaction / total load). */
  share: number;
  /** share ÷ tributary share: 1 for two posts; above 1 where continuity adds load. */
  reactionFactor: number;
  heightAboveGradeFt: number;
  gradeFt: number;
  deadLb: number;
  snowLb: number;
  /** Unfactored wind per case: shear (+ toward back), downward, moment at own grade. */
  wind: { shearLb: number; downwardLb: number; momentAtGradeLbFt: number }[];
}

export interface ArrayLoadState {
  tiltDeg: number;
  slopeAlongPct: number;
  slopeAcrossPct: number;
  dims: ArrayDimensions;
  layout: PostLayout;
  heights: GradeHeights;
  hOverL: number;
  velocity: VelocityPressure;
  gustFactor: number;
  windCases: WindCase[];
  deadArrayLb: number;
  snow: SnowLoad;
  snowTotalLb: number;
  posts: PostLoad[];
}

const CASES: [WindDirectionDeg, "A" | "B"][] = [[0, "A"], [0, "B"], [180, "A"], [180, "B"]];
/** The case labels, built once (they are the same strings for every tilt and design). */
const CASE_LABELS = CASES.map(([dir, lc]) => `γ=${dir}° ${lc}`);
/** Post ids "P1"…"P20", built once for the same reason. */
const POST_IDS = Array.from({ length: 20 }, (_, i) => `P${i + 1}`);

export function arrayLoads(input: DesignInput, tiltDeg: number, clearanceTiltDeg: number): ArrayLoadState {
  const { site, array, posts } = input;
  const dims = arrayDimensions(array);
  const layout = postLayout({ widthFt: dims.widthFt, count: posts.count, spacingFt: posts.spacingFt });
  const heights = gradeHeights({
    widthFt: dims.widthFt, slopeLengthFt: dims.slopeLengthFt, tiltDeg, clearanceTiltDeg,
    clearanceIn: array.lowestEdgeClearanceIn, rackDepthIn: array.rackDepthIn,
    slopeAlongPct: site.slopeAlongPct, slopeAcrossPct: site.slopeAcrossPct, postXFt: layout.xFt,
  });
  const horizontalFt = dims.slopeLengthFt * Math.cos((tiltDeg * Math.PI) / 180);
  const velocity = velocityPressure({
    edition: site.edition, windSpeedMph: site.windSpeedMph, exposure: site.exposure,
    heightFt: Math.max(0, heights.meanHeightFt), topography: site.topography, groundElevationFt: site.groundElevationFt,
  });
  // CN for each direction once (each call gives both load cases; the cases share it).
  const cn0 = netPressureCoefficients({ tiltDeg, windDirectionDeg: 0, flow: array.flow });
  const cn180 = netPressureCoefficients({ tiltDeg, windDirectionDeg: 180, flow: array.flow });
  const windCases: WindCase[] = [];
  for (let k = 0; k < CASES.length; k++) {
    const [dir, lc] = CASES[k];
    const cn = (dir === 0 ? cn0 : cn180)[lc];
    const force = arrayWindForce({
      qGustlessPsf: velocity.qzWithKdPsf, gustFactor: GUST_FACTOR_RIGID, cn, windDirectionDeg: dir,
      slopeLengthFt: dims.slopeLengthFt, widthFt: dims.widthFt, tiltDeg, rackDepthFt: array.rackDepthIn / 12,
    });
    windCases.push({ label: CASE_LABELS[k], windDirectionDeg: dir, loadCase: lc, cn, force });
  }
  const deadArrayLb = dims.moduleCount * array.moduleWeightLb + array.rackingDeadPsf * dims.surfaceAreaFt2;
  const snow = snowLoad({
    edition: site.edition, groundSnowPsf: site.groundSnowPsf, ce: site.snowExposureCe, ct: site.snowThermalCt,
    is: SNOW_IMPORTANCE[site.riskCategory], tiltDeg, slippery: array.slipperySurface,
  });
  const snowTotalLb = snow.designPsf * dims.widthFt * horizontalFt;
  const shares = continuousBeamShares({ widthFt: dims.widthFt, xFt: layout.xFt });
  const postLoads: PostLoad[] = layout.xFt.map((xFt, i) => {
    const share = shares[i];
    const hp = heights.postHeightAboveGradeFt[i];
    return {
      id: POST_IDS[i] ?? `P${i + 1}`, xFt, tributaryWidthFt: layout.tributaryWidthFt[i], share, reactionFactor: (share * dims.widthFt) / layout.tributaryWidthFt[i], heightAboveGradeFt: hp,
      gradeFt: heights.postGradeFt[i], deadLb: share * deadArrayLb, snowLb: share * snowTotalLb,
      wind: windCases.map(({ force: f }) => ({
        shearLb: share * f.horizontalLb,
        downwardLb: share * f.downwardLb,
        momentAtGradeLbFt: share * (f.momentAtPostTopLbFt + f.horizontalLb * hp),
      })),
    };
  });
  return {
    tiltDeg, slopeAlongPct: site.slopeAlongPct, slopeAcrossPct: site.slopeAcrossPct, dims, layout, heights, hOverL: heights.meanHeightFt / horizontalFt, velocity,
    gustFactor: GUST_FACTOR_RIGID, windCases, deadArrayLb, snow, snowTotalLb, posts: postLoads,
  };
}
