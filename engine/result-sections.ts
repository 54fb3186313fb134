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

function worst(rows: FactoredPostLoad[], value: (r: FactoredPostLoad) => number): FactoredPostLoad {
  return rows.reduce((a, r) => (value(r) > value(a) ? r : a));
}

const named = (r: FactoredPostLoad): GoverningLoad => ({ postId: r.postId, tiltDeg: r.tiltDeg, combination: r.combination, windCase: r.windCase });

export function governingLoads(rows: FactoredPostLoad[]) {
  const shear = worst(rows, (r) => Math.abs(r.shearLb));
  const moment = worst(rows, (r) => Math.abs(r.momentAtGradeLbFt));
  const up = worst(rows, (r) => -r.downwardLb);
  const down = worst(rows, (r) => r.downwardLb);
  return {
    shear: { ...named(shear), valueLb: Math.abs(shear.shearLb) },
    moment: { ...named(moment), valueLbFt: Math.abs(moment.momentAtGradeLbFt) },
    uplift: up.downwardLb < 0 ? { ...named(up), valueLb: -up.downwardLb } : null,
    downward: { ...named(down), valueLb: down.downwardLb },
  };
}
