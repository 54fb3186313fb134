/**
 * The whole design: validate, build loads at every tilt, choose or take the hole, size the depth,
 * check everything, add concrete, options, field list, warnings and the preview geometry.
 *
 * @example sizeDesign(defaultDesignInput).footing // { diameterIn: 24, depthIn: …, controllingCheck: "lateral", … }
 * @throws DesignInputError when the input fails the schema (each field named)
 */
import { concreteForHole } from "./concrete/concrete-for-hole";
import { concreteOrder } from "./concrete/concrete-order";
import { concreteSpecification } from "./concrete/concrete-spec";
import { designContext } from "./design-context";
import type { CheckId, FootingCheck } from "./footing/checks";
import { evaluateFooting, lateralRequirement, type FootingEvaluation } from "./footing/evaluate-footing";
import { smallestPipeFor } from "./footing/pipe";
import { previewGeometry } from "./geometry/preview";
import { BEAM_SHARING_CONTINUOUS, BEAM_SHARING_TWO_POSTS, DEFER_TO_CODE, SITE_CAUTIONS, WIND_METHOD_NOTE, sectionsUsed } from "./notices";
import { autoDiameter } from "./options/auto-diameter";
import { diameterSweep } from "./options/diameter-sweep";
import { tiltEnvelope } from "./options/tilt-envelope";
import { parseDesignInput } from "./parse";
import { governingLoads, postLoadTable, windCaseRow, windCaseRows } from "./result-sections";
import type { DesignInput } from "./schema";
import type { DesignResult, LateralRequirementWind } from "./types";
import type { DesignContext } from "./design-context";
import type { LateralRequirement } from "./footing/evaluate-footing";
import { collectWarnings, warningOf, type DesignWarning } from "./warnings";
import { qty, says } from "./quantity-text";
import { ENGINE_VERSION } from "./version";

/** The check with this id (a loop, not `find` with a fresh closure, on this per-design path). */
function checkById(checks: FootingCheck[], id: CheckId): FootingCheck {
  for (let i = 0; i < checks.length; i++) if (checks[i].id === id) return checks[i];
  throw new Error(`No ${id} check`);
}

/** The wind case behind a row (its own tilt setting's state), for the printed method. */
function windAt(ctx: DesignContext, tiltDeg: number, windCase: number): LateralRequirementWind | null {
  const i = ctx.tilts.indexOf(tiltDeg);
  if (i < 0 || windCase < 0) return null;
  const st = ctx.states[i];
  return { tiltDeg, heightFt: st.heights.meanHeightFt, velocity: st.velocity, surfaceAreaFt2: st.dims.surfaceAreaFt2, case: windCaseRow(st, windCase) };
}

function withWind(ctx: DesignContext, req: LateralRequirement | null): DesignResult["footing"]["lateralRequirement"] {
  if (!req) return null;
  const out = req as LateralRequirement & { wind: LateralRequirementWind | null };
  out.wind = windAt(ctx, req.governing.tiltDeg, req.governing.windCase);
  return out;
}

export function sizeDesign(raw: unknown): DesignResult {
  return sizeParsedDesign(parseDesignInput(raw));
}

/** As `sizeDesign`, for input already parsed by `designInputSchema` (skips validation). */
export function sizeParsedDesign(input: DesignInput): DesignResult {
  const ctx = designContext(input);
  const { main, pipe, footing: fctx } = ctx;
  const { posts, array } = input;
  const extra: DesignWarning[] = [];
  let ev: FootingEvaluation;
  const auto = posts.holeDiameterIn === "auto";
  if (auto) {
    const a = autoDiameter(fctx, posts.autoDiametersIn, posts.maxAutoDepthIn, pipe.outsideDiameterIn);
    ev = a.evaluation;
    if (!a.reasonable) extra.push(warningOf("AUTO_DIAMETER_NO_REASONABLE_DEPTH", says`No candidate hole gives a depth within ${qty(posts.maxAutoDepthIn, "in")} with bearing passing; the shallowest (${qty(ev.diameterIn, "in")}) is shown.`));
  } else ev = evaluateFooting(fctx, posts.holeDiameterIn as number);
  const diameterIn = ev.diameterIn;
  const hole = concreteForHole({
    diameterIn, depthIn: ev.depthIn, unitWeightPcf: posts.concreteUnitWeightPcf,
    postOutsideDiameterIn: pipe.outsideDiameterIn, subtractPostDisplacement: posts.subtractPostDisplacement && diameterIn > pipe.outsideDiameterIn,
  });
  const job = concreteOrder({ hole, holes: posts.count, wasteAllowancePct: posts.wasteAllowancePct });
  const sweep = diameterSweep(fctx, posts.sweepDiametersIn, { holes: posts.count, wasteAllowancePct: posts.wasteAllowancePct, postOutsideDiameterIn: pipe.outsideDiameterIn, subtractPostDisplacement: posts.subtractPostDisplacement, postBendingPass: ev.checks[5].pass });
  const envelope = ctx.tilts.length > 1 ? tiltEnvelope(fctx, ctx.tilts, diameterIn) : null;
  const lateral = checkById(ev.checks, "lateral");
  const controlling = checkById(ev.checks, ev.controllingCheck);
  const governingPostId = (controlling.governing ?? lateral.governing)?.postId ?? null;
  const windCase = (lateral.governing ?? controlling.governing)?.windCase ?? -1;
  const drawState = main;
  const { dims, heights, layout } = main;
  return {
    engineVersion: ENGINE_VERSION,
    projectName: input.projectName,
    input,
    caution: DEFER_TO_CODE,
    cautions: SITE_CAUTIONS,
    methodNote: WIND_METHOD_NOTE,
    references: sectionsUsed(input),
    geometry: {
      tiltDeg: array.tiltDeg, clearanceTiltDeg: ctx.clearanceTiltDeg, widthFt: dims.widthFt, slopeLengthFt: dims.slopeLengthFt,
      horizontalDepthFt: dims.slopeLengthFt * Math.cos((array.tiltDeg * Math.PI) / 180), moduleCount: dims.moduleCount,
      surfaceAreaFt2: dims.surfaceAreaFt2, lowestEdgeFt: heights.lowestEdgeFt, highestEdgeFt: heights.highestEdgeFt,
      meanHeightFt: heights.meanHeightFt, hOverL: main.hOverL, minClearanceIn: heights.minClearanceIn, postTopFt: heights.postTopFt,
      spacingFt: layout.spacingFt, overhangFt: layout.overhangFt,
      posts: main.posts.map((p) => ({ id: p.id, xFt: p.xFt, yFt: 0, tributaryWidthFt: p.tributaryWidthFt, gradeFt: p.gradeFt, heightAboveGradeFt: p.heightAboveGradeFt, loadShare: p.share, reactionFactor: p.reactionFactor })),
      postLoadSharing: main.posts.length > 2 ? BEAM_SHARING_CONTINUOUS : BEAM_SHARING_TWO_POSTS,
    },
    wind: { edition: input.site.edition, heightFt: heights.meanHeightFt, gustFactor: main.gustFactor, velocity: main.velocity, cases: windCaseRows(main), method: WIND_METHOD_NOTE },
    // Written out rather than spread (a spread is slow on this hot path); TypeScript insists every
    // SnowLoad field is listed, so a new one cannot be dropped silently.
    snow: {
      pfPsf: main.snow.pfPsf, cs: main.snow.cs, psPsf: main.snow.psPsf, minimumPmPsf: main.snow.minimumPmPsf,
      designPsf: main.snow.designPsf, combinationFactor: main.snow.combinationFactor, totalLb: main.snowTotalLb,
    },
    dead: { modulesLb: dims.moduleCount * array.moduleWeightLb, rackingLb: array.rackingDeadPsf * dims.surfaceAreaFt2, arrayLb: main.deadArrayLb, postLbPerFt: pipe.weightLbPerFt },
    postLoads: postLoadTable(ctx.rows, array.tiltDeg),
    governingLoads: governingLoads(ctx.rows),
    footing: {
      diameterIn, diameterMode: auto ? "auto" : "given", depthIn: ev.depthIn, depthFt: ev.depthIn / 12,
      depthMode: posts.fixedDepthIn !== undefined ? "given" : "sized", controllingCheck: ev.controllingCheck,
      requiredDepthIn: ev.requiredDepthIn, checks: ev.checks, pass: ev.pass, post: pipe, soil: fctx.soil,
      suggestedPipeSize: smallestPipeFor(checkById(ev.checks, "postBending").demand, posts.yieldKsi),
      lateralRequirement: withWind(ctx, lateralRequirement(fctx, ev)),
    },
    concrete: {
      perHole: hole, job,
      specification: concreteSpecification({ strengthPsi: posts.concreteStrengthPsi, maxAggregateIn: posts.maxAggregateIn, slumpIn: posts.slumpIn, frostDepthIn: input.site.frostDepthIn }),
    },
    options: { diameterSweep: sweep, tiltEnvelope: envelope },
    field: {
      posts: main.posts.map((p) => ({ id: p.id, heightAboveGradeIn: p.heightAboveGradeFt * 12, embedmentIn: ev.depthIn, postLengthIn: p.heightAboveGradeFt * 12 + ev.depthIn })),
      note: "Post length = height above its own grade + embedment, post standing on the hole bottom. Set posts level with a laser and use the cut list to trim or shim.",
      // Each tilt setting the rack will be used at (posts set for the steepest), lowest edge above grade.
      tiltSettings: ctx.states.map((s) => ({ tiltDeg: s.tiltDeg, lowestEdgeIn: s.heights.lowestEdgeFt * 12, minClearanceIn: s.heights.minClearanceIn, highestEdgeIn: s.heights.highestEdgeFt * 12 })),
    },
    warnings: collectWarnings(input, ctx.states, ev, extra),
    geometryPreview: previewGeometry(drawState, {
      azimuthDeg: array.azimuthDeg, gapIn: array.gapIn, rackDepthIn: array.rackDepthIn, postOutsideDiameterIn: pipe.outsideDiameterIn,
      diameterIn, depthIn: ev.depthIn, governingPostId, windCase,
    }),
  };
}
