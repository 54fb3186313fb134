/**
 * "Size it for me": the smallest hole from the candidate list that fits the post (≥ post + 4 in),
 * passes bearing and needs no more than the largest reasonable depth. When none does, the
 * candidate with the shallowest depth is returned with `reasonable: false`.
 */
import { bearingRatio, evaluateFooting, footingDepth, type FootingContext, type FootingEvaluation } from "../footing/evaluate-footing";

export function autoDiameter(ctx: FootingContext, candidatesIn: number[], maxDepthIn: number, postOutsideDiameterIn: number): {
  evaluation: FootingEvaluation;
  reasonable: boolean;
} {
  const sorted = [...new Set(candidatesIn)].sort((a, b) => a - b);
  const fitting = sorted.filter((d) => d >= postOutsideDiameterIn + 4 - 1e-9);
  const list = fitting.length ? fitting : [Math.ceil(postOutsideDiameterIn + 4)];
  let best = { diameterIn: list[0], depthIn: Infinity };
  for (const d of list) {
    const { depthIn } = footingDepth(ctx, d);
    if (depthIn <= maxDepthIn && bearingRatio(ctx, d, depthIn) <= 1 + 1e-9) return { evaluation: evaluateFooting(ctx, d), reasonable: true };
    if (depthIn < best.depthIn) best = { diameterIn: d, depthIn };
  }
  return { evaluation: evaluateFooting(ctx, best.diameterIn) as FootingEvaluation, reasonable: false };
}
