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

const NO_WIND = { shearLb: 0, downwardLb: 0, momentAtGradeLbFt: 0 };

export function factoredPostLoads(states: ArrayLoadState[], combos: Combination[]): FactoredPostLoad[] {
  const out: FactoredPostLoad[] = [];
  for (const st of states) {
    for (const p of st.posts) {
      for (const c of combos) {
        // NO_WIND is shared and only read (one fewer allocation per wind-free row).
        const w = c.windCase >= 0 ? p.wind[c.windCase] : NO_WIND;
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
  // Plain loops: the same test as before (row i goes when some other
  // row j has P ≥ p and M ≥ m, and is larger in one of them or is an identical earlier row), without
  // a closure per row; the sweep runs this over every tilt's rows.
  const withLoad: FactoredPostLoad[] = [];
  for (let i = 0; i < rows.length; i++) if (rows[i].shearLb !== 0 || rows[i].momentAtGradeLbFt !== 0) withLoad.push(rows[i]);
  const n = withLoad.length;
  const out: FactoredPostLoad[] = [];
  for (let i = 0; i < n; i++) {
    const p = Math.abs(withLoad[i].shearLb), m = Math.abs(withLoad[i].momentAtGradeLbFt);
    let dominated = false;
    for (let j = 0; j < n; j++) {
      if (j === i) continue;
      const P = Math.abs(withLoad[j].shearLb), M = Math.abs(withLoad[j].momentAtGradeLbFt);
      if (P >= p && M >= m && (P > p || M > m || j < i)) { dominated = true; break; }
    }
    if (!dominated) out.push(withLoad[i]);
  }
  return out;
}
