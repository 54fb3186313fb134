/**
 * Builds what every sizing path shares from a parsed input: the load state at each tilt, the
 * factored post-load table and the footing context. Hole size does not enter here.
 */
import { asdCombinations } from "./loads/combinations";
import { arrayLoads, type ArrayLoadState } from "./loads/array-loads";
import { factoredPostLoads, lateralFrontier, type FactoredPostLoad } from "./loads/factored";
import type { FootingContext } from "./footing/evaluate-footing";
import { pipeAllowableMoment, type PipeMoment } from "./footing/pipe";
import { soilValues } from "./footing/soil";
import type { DesignInput } from "./schema";

export interface DesignContext {
  tilts: number[];
  clearanceTiltDeg: number;
  states: ArrayLoadState[];
  main: ArrayLoadState;
  rows: FactoredPostLoad[];
  pipe: PipeMoment;
  footing: FootingContext;
}

export function designContext(input: DesignInput): DesignContext {
  const { site, array, posts } = input;
  const tilts = [...new Set([array.tiltDeg, ...(array.tiltSettingsDeg ?? [])])].sort((a, b) => a - b);
  const clearanceTiltDeg = tilts[tilts.length - 1];
  const states = tilts.map((t) => arrayLoads(input, t, clearanceTiltDeg));
  const main = states[tilts.indexOf(array.tiltDeg)];
  const combos = asdCombinations(site.edition, main.windCases.map((c) => c.label));
  const rows = factoredPostLoads(states, combos);
  const pipe = pipeAllowableMoment({ size: posts.pipeSize, yieldKsi: posts.yieldKsi });
  const footing: FootingContext = {
    rows,
    lateralRows: lateralFrontier(rows),
    soil: soilValues(site.soil as Parameters<typeof soilValues>[0], posts.isolatedPoleIncrease),
    pipe,
    constrained: posts.constrainedAtGrade,
    concretePcf: posts.concreteUnitWeightPcf,
    frostDepthIn: site.frostDepthIn,
    depthIncrementIn: posts.depthIncrementIn,
    fixedDepthIn: posts.fixedDepthIn,
    waterTableDepthFt: site.waterTableDepthFt,
    sideFrictionPsf: posts.sideFrictionPsf,
  };
  return { tilts, clearanceTiltDeg, states, main, rows, pipe, footing };
}
