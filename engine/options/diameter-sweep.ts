/**
 * Diameter sweep: for each hole diameter, the depth it needs, the check that sets it, whether
 * every diameter-dependent check passes, and the concrete per hole and for the job — so a crew
 * can trade a wider hole for a shallower one.
 */
import { concreteForHole } from "../concrete/concrete-for-hole";
import { concreteOrderYd3 } from "../concrete/concrete-order";
import { bearingRatio, footingDepth, type FootingContext } from "../footing/evaluate-footing";
import type { DepthCheckId } from "../footing/checks";

export interface SweepRow {
  diameterIn: number;
  depthIn: number;
  controllingCheck: DepthCheckId;
  fitsPost: boolean;
  bearingPass: boolean;
  allChecksPass: boolean;
  volumeFt3PerHole: number;
  volumeYd3PerHole: number;
  weightLbPerHole: number;
  bags80LbPerHole: number;
  jobOrderYd3: number;
}

export function diameterSweep(
  ctx: FootingContext,
  diametersIn: number[],
  job: { holes: number; wasteAllowancePct: number; postOutsideDiameterIn: number; subtractPostDisplacement: boolean; postBendingPass: boolean },
): SweepRow[] {
  return [...new Set(diametersIn)].sort((a, b) => a - b).map((diameterIn) => {
    // Sized depth (a given depth does not apply to the sweep): lateral, uplift and frost pass by
    // construction; bearing and hole size depend on the diameter; post bending does not.
    const ev = footingDepth(ctx, diameterIn, false);
    const fitsPost = diameterIn >= job.postOutsideDiameterIn + 4 - 1e-9;
    const bearingPass = bearingRatio(ctx, diameterIn, ev.depthIn) <= 1 + 1e-9;
    const hole = concreteForHole({
      diameterIn, depthIn: ev.depthIn, unitWeightPcf: ctx.concretePcf,
      postOutsideDiameterIn: job.postOutsideDiameterIn, subtractPostDisplacement: job.subtractPostDisplacement && diameterIn > job.postOutsideDiameterIn,
    });
    const jobOrderYd3 = concreteOrderYd3({ holeVolumeFt3: hole.volumeFt3, holes: job.holes, wasteAllowancePct: job.wasteAllowancePct });
    return {
      diameterIn, depthIn: ev.depthIn, controllingCheck: ev.controllingCheck,
      fitsPost, bearingPass, allChecksPass: fitsPost && bearingPass && ev.lateralConverged && job.postBendingPass,
      volumeFt3PerHole: hole.volumeFt3, volumeYd3PerHole: hole.volumeYd3, weightLbPerHole: hole.weightLb,
      bags80LbPerHole: hole.bags80Lb, jobOrderYd3,
    };
  });
}
