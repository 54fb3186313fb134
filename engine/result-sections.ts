/**
 * Summaries the result carries beside the checks: wind cases, the per-post combination table and
 * the governing load of each kind, named.
 */
import type { ArrayLoadState } from "./loads/array-loads";
import type { FactoredPostLoad } from "./loads/factored";
import type { CombinationRow, WindCaseResult } from "./types";

/** One wind case of a load state as the result reports it. */
export function windCaseRow(st: ArrayLoadState, i: number): WindCaseResult {
  const c = st.windCases[i];
  return {
    label: c.label, windDirectionDeg: c.windDirectionDeg, loadCase: c.loadCase, cnWindward: c.cn.windward, cnLeeward: c.cn.leeward,
    windwardPressurePsf: c.force.windwardPressurePsf, leewardPressurePsf: c.force.leewardPressurePsf, normalForceLb: c.force.normalForceLb,
    centreOfPressureFromWindwardEdgeFt: c.force.centreOfPressureFromWindwardEdgeFt, horizontalLb: c.force.horizontalLb,
    downwardLb: c.force.downwardLb, momentAtPostTopLbFt: c.force.momentAtPostTopLbFt,
  };
}

export function windCaseRows(st: ArrayLoadState): WindCaseResult[] {
  return st.windCases.map((c) => ({
    label: c.label, windDirectionDeg: c.windDirectionDeg, loadCase: c.loadCase, cnWindward: c.cn.windward, cnLeeward: c.cn.leeward,
    windwardPressurePsf: c.force.windwardPressurePsf, leewardPressurePsf: c.force.leewardPressurePsf, normalForceLb: c.force.normalForceLb,
    centreOfPressureFromWindwardEdgeFt: c.force.centreOfPressureFromWindwardEdgeFt, horizontalLb: c.force.horizontalLb,
    downwardLb: c.force.downwardLb, momentAtPostTopLbFt: c.force.momentAtPostTopLbFt,
  }));
}

export function postLoadTable(rows: FactoredPostLoad[], tiltDeg: number): { postId: string; tiltDeg: number; combinations: CombinationRow[] }[] {
  // Grouped by post in order of first appearance (a linear search over ≤ 20 posts is cheaper than
  // a Map and its spread for the few posts a design has).
  const out: { postId: string; tiltDeg: number; combinations: CombinationRow[] }[] = [];
  let last: { postId: string; tiltDeg: number; combinations: CombinationRow[] } | undefined;
  for (let i = 0; i < rows.length; i++) {
    const r = rows[i];
    if (r.tiltDeg !== tiltDeg) continue;
    if (!last || last.postId !== r.postId) {
      last = undefined;
      for (let j = 0; j < out.length; j++) if (out[j].postId === r.postId) { last = out[j]; break; }
      if (!last) { last = { postId: r.postId, tiltDeg, combinations: [] }; out.push(last); }
    }
    last.combinations.push({ combination: r.combination, shearLb: r.shearLb, momentAtGradeLbFt: r.momentAtGradeLbFt, downwardLb: r.downwardLb, windUpliftLb: r.windUpliftLb });
  }
  return out;
}

/** The largest shear, moment, uplift and downward load on any post, each with its combination named. */
export function governingLoads(rows: FactoredPostLoad[]) {
  let shear = rows[0], moment = rows[0], up = rows[0], down = rows[0];
  for (let i = 0; i < rows.length; i++) {
    const r = rows[i];
    if (Math.abs(r.shearLb) > Math.abs(shear.shearLb)) shear = r;
    if (Math.abs(r.momentAtGradeLbFt) > Math.abs(moment.momentAtGradeLbFt)) moment = r;
    if (r.downwardLb < up.downwardLb) up = r;
    if (r.downwardLb > down.downwardLb) down = r;
  }
  // Built directly in the order { postId, tiltDeg, combination, windCase, value } (no spreads).
  return {
    shear: { postId: shear.postId, tiltDeg: shear.tiltDeg, combination: shear.combination, windCase: shear.windCase, valueLb: Math.abs(shear.shearLb) },
    moment: { postId: moment.postId, tiltDeg: moment.tiltDeg, combination: moment.combination, windCase: moment.windCase, valueLbFt: Math.abs(moment.momentAtGradeLbFt) },
    uplift: up.downwardLb < 0 ? ({ postId: up.postId, tiltDeg: up.tiltDeg, combination: up.combination, windCase: up.windCase, valueLb: -up.downwardLb }) : null,
    downward: { postId: down.postId, tiltDeg: down.tiltDeg, combination: down.combination, windCase: down.windCase, valueLb: down.downwardLb },
  };
}
