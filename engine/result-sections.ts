/**
 * Summaries the result carries beside the checks: wind cases, the per-post combination table and
 * the governing load of each kind, named.
 */
import type { ArrayLoadState } from "./loads/array-loads";
import type { FactoredPostLoad } from "./loads/factored";
import type { CombinationRow, GoverningLoad, WindCaseResult } from "./types";

export function windCaseRows(st: ArrayLoadState): WindCaseResult[] {
  return st.windCases.map((c) => ({
    label: c.label, windDirectionDeg: c.windDirectionDeg, loadCase: c.loadCase, cnWindward: c.cn.windward, cnLeeward: c.cn.leeward,
    windwardPressurePsf: c.force.windwardPressurePsf, leewardPressurePsf: c.force.leewardPressurePsf, normalForceLb: c.force.normalForceLb,
    centreOfPressureFromWindwardEdgeFt: c.force.centreOfPressureFromWindwardEdgeFt, horizontalLb: c.force.horizontalLb,
    downwardLb: c.force.downwardLb, momentAtPostTopLbFt: c.force.momentAtPostTopLbFt,
  }));
}

export function postLoadTable(rows: FactoredPostLoad[], tiltDeg: number): { postId: string; tiltDeg: number; combinations: CombinationRow[] }[] {
  const byPost = new Map<string, CombinationRow[]>();
  for (const r of rows) {
    if (r.tiltDeg !== tiltDeg) continue;
    const list = byPost.get(r.postId) ?? [];
    list.push({ combination: r.combination, shearLb: r.shearLb, momentAtGradeLbFt: r.momentAtGradeLbFt, downwardLb: r.downwardLb, windUpliftLb: r.windUpliftLb });
    byPost.set(r.postId, list);
  }
  return [...byPost].map(([postId, combinations]) => ({ postId, tiltDeg, combinations }));
}

const named = (r: FactoredPostLoad): GoverningLoad => ({ postId: r.postId, tiltDeg: r.tiltDeg, combination: r.combination, windCase: r.windCase });

/** The largest shear, moment, uplift and downward load on any post, each with its combination named. */
export function governingLoads(rows: FactoredPostLoad[]) {
  let shear = rows[0], moment = rows[0], up = rows[0], down = rows[0];
  for (const r of rows) {
    if (Math.abs(r.shearLb) > Math.abs(shear.shearLb)) shear = r;
    if (Math.abs(r.momentAtGradeLbFt) > Math.abs(moment.momentAtGradeLbFt)) moment = r;
    if (r.downwardLb < up.downwardLb) up = r;
    if (r.downwardLb > down.downwardLb) down = r;
  }
  return {
    shear: { ...named(shear), valueLb: Math.abs(shear.shearLb) },
    moment: { ...named(moment), valueLbFt: Math.abs(moment.momentAtGradeLbFt) },
    uplift: up.downwardLb < 0 ? { ...named(up), valueLb: -up.downwardLb } : null,
    downward: { ...named(down), valueLb: down.downwardLb },
  };
}
