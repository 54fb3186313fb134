/**
 * ASD load combinations for a ground-mounted array (no live or rain load), ASCE 7 §2.4.1 [memory]:
 *   D;  D + S;  D + 0.6W;  D + 0.75(0.6W) + 0.75S;  0.6D + 0.6W.
 * ASCE 7-22 uses 0.7S in place of S (its snow map is strength level). Each combination that holds
 * W is repeated for every wind case (γ = 0°/180°, load cases A/B).
 *
 * @example asdCombinations("7-16", ["γ=0° A"]).map((c) => c.label)
 *   // ["D", "D + S", "D + 0.6W (γ=0° A)", "D + 0.75(0.6W) + 0.75S (γ=0° A)", "0.6D + 0.6W (γ=0° A)"]
 */
import type { Edition } from "../wind/kz";

export interface Combination {
  id: string;
  label: string;
  /** Factors on dead, snow and wind. */
  d: number;
  s: number;
  w: number;
  /** Index into the wind cases, or -1 when W is absent. */
  windCase: number;
}

export function asdCombinations(edition: Edition, windCaseLabels: string[]): Combination[] {
  const sf = edition === "7-22" ? 0.7 : 1;
  const sName = edition === "7-22" ? "0.7S" : "S";
  const out: Combination[] = [
    { id: "D", label: "D", d: 1, s: 0, w: 0, windCase: -1 },
    { id: "D+S", label: `D + ${sName}`, d: 1, s: sf, w: 0, windCase: -1 },
  ];
  windCaseLabels.forEach((c, i) => {
    out.push({ id: `D+0.6W:${i}`, label: `D + 0.6W (${c})`, d: 1, s: 0, w: 0.6, windCase: i });
    out.push({ id: `D+0.45W+0.75S:${i}`, label: `D + 0.75(0.6W) + 0.75${edition === "7-22" ? "(0.7S)" : "S"} (${c})`, d: 1, s: 0.75 * sf, w: 0.45, windCase: i });
    out.push({ id: `0.6D+0.6W:${i}`, label: `0.6D + 0.6W (${c})`, d: 0.6, s: 0, w: 0.6, windCase: i });
  });
  return out;
}
