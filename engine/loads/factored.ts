/**
 * Factored loads on each post for every ASD combination and tilt: the table the footing checks
 * read. Independent of the hole size, so it is built once per design.
 */
import type { ArrayLoadState } from "./array-loads";
import type { Combination } from "./combinations";

export interface FactoredPostLoad {
  postId: string;
  tiltDeg: number;
  combination: string;
  /** Factor on D, applied also to the pier's own weight. */
  deadFactor: number;
  shearLb: number;
  momentAtGradeLbFt: number;
  /** Array load down on the post (+ down; includes factored D, S, W). */
  downwardLb: number;
  /** Upward wind force in this combination (w × uplift), lb; 0 when wind presses down. */
  windUpliftLb: number;
  /** Factored tributary array dead load (d × D), lb. */
  deadResistLb: number;
  hasSnow: boolean;
  postHeightAboveGradeFt: number;
  /** Index of the wind case in this combination, -1 for none. */
  windCase: number;
}

export function factoredPostLoads(states: ArrayLoadState[], combos: Combination[]): FactoredPostLoad[] {
  const out: FactoredPostLoad[] = [];
  for (const st of states) {
    for (const p of st.posts) {
      for (const c of combos) {
        const w = c.windCase >= 0 ? p.wind[c.windCase] : { shearLb: 0, downwardLb: 0, momentAtGradeLbFt: 0 };
        out.push({
          postId: p.id,
          tiltDeg: st.tiltDeg,
          combination: c.label,
          deadFactor: c.d,
          shearLb: c.w * w.shearLb,
          momentAtGradeLbFt: c.w * w.momentAtGradeLbFt,
          downwardLb: c.d * p.deadLb + c.s * p.snowLb + c.w * w.downwardLb,
          windUpliftLb: Math.max(0, -c.w * w.downwardLb),
          deadResistLb: c.d * p.deadLb,
          hasSnow: c.s > 0,
          postHeightAboveGradeFt: p.heightAboveGradeFt,
          windCase: c.windCase,
        });
      }
    }
  }
  return out;
}

/** Keep only the rows whose (|shear|, |moment|) no other row exceeds in both: the lateral candidates. */
export function lateralFrontier(rows: FactoredPostLoad[]): FactoredPostLoad[] {
  const withLoad = rows.filter((r) => r.shearLb !== 0 || r.momentAtGradeLbFt !== 0);
  return withLoad.filter((r, i) =>
    !withLoad.some((o, j) => {
      const P = Math.abs(o.shearLb), M = Math.abs(o.momentAtGradeLbFt);
      const p = Math.abs(r.shearLb), m = Math.abs(r.momentAtGradeLbFt);
      return j !== i && P >= p && M >= m && (P > p || M > m || j < i);
    }),
  );
}
