/**
 * Concrete for the whole job: the holes added up, a waste allowance on top (5–10 % is usual;
 * machine-dug holes often come out larger than planned) [common practice], ready-mix rounded up
 * to the next ¼ yd³ and bag counts for premix.
 *
 * @example concreteOrder({ hole: concreteForHole({ diameterIn: 24, depthIn: 60 }), holes: 2, wasteAllowancePct: 10 })
 *   // { totalYd3: 1.164, orderYd3: 1.5, bags80Lb: 58, … }
 */
import { requireInput } from "../input-ranges";
import { bagsFor, FT3_PER_YD3, type HoleConcrete } from "./concrete-for-hole";

export interface ConcreteOrder {
  holes: number;
  totalFt3: number;
  totalYd3: number;
  totalWeightLb: number;
  wasteAllowancePct: number;
  withWasteFt3: number;
  withWasteYd3: number;
  /** Ready-mix order, rounded up to ¼ yd³. */
  orderYd3: number;
  bags40Lb: number;
  bags60Lb: number;
  bags80Lb: number;
}

/** Ready-mix to order (yd³, up to the next ¼) for a volume that already includes waste. */
function orderYd3For(withWasteFt3: number): number {
  return Math.ceil((withWasteFt3 / FT3_PER_YD3) * 4 - 1e-9) / 4;
}

/**
 * Only the ready-mix order of `concreteOrder` (same checks, same arithmetic), for the diameter
 * sweep, which shows that one figure and need not build the whole order per diameter.
 */
export function concreteOrderYd3(a: { holeVolumeFt3: number; holes: number; wasteAllowancePct: number }): number {
  requireInput("posts.count", a.holes);
  requireInput("posts.wasteAllowancePct", a.wasteAllowancePct, "%");
  return orderYd3For(a.holeVolumeFt3 * a.holes * (1 + a.wasteAllowancePct / 100));
}

export function concreteOrder(a: { hole: HoleConcrete; holes: number; wasteAllowancePct: number }): ConcreteOrder {
  requireInput("posts.count", a.holes);
  requireInput("posts.wasteAllowancePct", a.wasteAllowancePct, "%");
  const totalFt3 = a.hole.volumeFt3 * a.holes;
  const withWasteFt3 = totalFt3 * (1 + a.wasteAllowancePct / 100);
  return {
    holes: a.holes,
    totalFt3,
    totalYd3: totalFt3 / FT3_PER_YD3,
    totalWeightLb: a.hole.weightLb * a.holes,
    wasteAllowancePct: a.wasteAllowancePct,
    withWasteFt3,
    withWasteYd3: withWasteFt3 / FT3_PER_YD3,
    orderYd3: orderYd3For(withWasteFt3),
    bags40Lb: bagsFor(withWasteFt3, 40),
    bags60Lb: bagsFor(withWasteFt3, 60),
    bags80Lb: bagsFor(withWasteFt3, 80),
  };
}
