/**
 * Builds what every sizing path shares from a parsed input: the load state at each tilt, the
 * factored post-load table and the footing context. Hole size does not enter here.
 */
import { asdCombinations, type Combination } from "./loads/combinations";
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

// The ASD combinations depend only on the edition and the (fixed) wind-case labels, so they are
// built once per edition and reused; they stay inside the engine (only their label strings reach
// a result), so sharing them between designs is safe.
const COMBINATIONS = new Map<string, { labels: string[]; combos: Combination[] }>();
function combinationsFor(edition: DesignInput["site"]["edition"], windCases: { label: string }[]): Combination[] {
  const hit = COMBINATIONS.get(edition);
  if (hit && hit.labels.length === windCases.length && hit.labels.every((l, i) => l === windCases[i].label)) return hit.combos;
  const labels = windCases.map((c) => c.label);
  const combos = asdCombinations(edition, labels);
  COMBINATIONS.set(edition, { labels, combos });
  return combos;
}

export function designContext(input: DesignInput): DesignContext {
  const { site, array, posts } = input;
  const tilts = [...new Set([array.tiltDeg, ...(array.tiltSettingsDeg ?? [])])].sort((a, b) => a - b);
  const clearanceTiltDeg = tilts[tilts.length - 1];
  const states = tilts.map((t) => arrayLoads(input, t, clearanceTiltDeg));
  const main = states[tilts.indexOf(array.tiltDeg)];
  const combos = combinationsFor(site.edition, main.windCases);
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
    netBearingSoilPcf: posts.bearingPressure === "net" ? posts.soilUnitWeightPcf : undefined,
  };
  return { tilts, clearanceTiltDeg, states, main, rows, pipe, footing };
}
