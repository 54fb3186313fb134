/**
 * Diameter sweep: for each hole diameter, the depth it needs, the check that sets it, whether
 * every diameter-dependent check passes, and the concrete per hole and for the job — so a crew
 * can trade a wider hole for a shallower one.
 */
import { concreteForHole } from "../concrete/concrete-for-hole";
import { concreteOrder } from "../concrete/concrete-order";
import { evaluateFooting, type FootingContext } from "../footing/evaluate-footing";
import type { CheckId } from "../footing/checks";

export interface SweepRow {
  diameterIn: number;
  depthIn: number;
  controllingCheck: CheckId;
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
  job: { holes: number; wasteAllowancePct: number; postOutsideDiameterIn: number; subtractPostDisplacement: boolean },
): SweepRow[] {
  return [...new Set(diametersIn)].sort((a, b) => a - b).map((diameterIn) => {
    const ev = evaluateFooting(ctx, diameterIn);
    const hole = concreteForHole({
      diameterIn, depthIn: ev.depthIn, unitWeightPcf: ctx.concretePcf,
      postOutsideDiameterIn: job.postOutsideDiameterIn, subtractPostDisplacement: job.subtractPostDisplacement && diameterIn > job.postOutsideDiameterIn,
    });
    const order = concreteOrder({ hole, holes: job.holes, wasteAllowancePct: job.wasteAllowancePct });
    const check = (id: CheckId) => ev.checks.find((c) => c.id === id)!.pass;
    return {
      diameterIn, depthIn: ev.depthIn, controllingCheck: ev.controllingCheck,
      fitsPost: check("holeSize"), bearingPass: check("bearing"), allChecksPass: ev.pass,
      volumeFt3PerHole: hole.volumeFt3, volumeYd3PerHole: hole.volumeYd3, weightLbPerHole: hole.weightLb,
      bags80LbPerHole: hole.bags80Lb, jobOrderYd3: order.orderYd3,
    };
  });
}
