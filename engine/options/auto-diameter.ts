/**
 * "Size it for me": the smallest hole from the candidate list that fits the post (≥ post + 4 in),
 * passes bearing and needs no more than the largest reasonable depth. When none does, the
 * candidate with the shallowest depth is returned with `reasonable: false`.
 */
import { evaluateFooting, type FootingContext, type FootingEvaluation } from "../footing/evaluate-footing";

export function autoDiameter(ctx: FootingContext, candidatesIn: number[], maxDepthIn: number, postOutsideDiameterIn: number): {
  evaluation: FootingEvaluation;
  reasonable: boolean;
} {
  const sorted = [...new Set(candidatesIn)].sort((a, b) => a - b);
  const fitting = sorted.filter((d) => d >= postOutsideDiameterIn + 4 - 1e-9);
  const list = fitting.length ? fitting : [Math.ceil(postOutsideDiameterIn + 4)];
  let best: FootingEvaluation | null = null;
  for (const d of list) {
    const ev = evaluateFooting(ctx, d);
    const bearingOk = ev.checks.find((c) => c.id === "bearing")!.pass;
    if (ev.depthIn <= maxDepthIn && bearingOk) return { evaluation: ev, reasonable: true };
    if (!best || ev.depthIn < best.depthIn) best = ev;
  }
  return { evaluation: best!, reasonable: false };
}
