/**
 * Concrete for the holes as the crew dug them. Augered holes come out wider and deeper than drawn
 * (a 24 in auger often cuts 26–28 in; a 60 in hole ends a few inches deeper) [common practice], so
 * the pour is ordered from the logged diameters and depths: each hole as dug less the post standing
 * in it (post on the hole bottom), plus the waste allowance; ready-mix to the next ¼ yd³ and 80-lb
 * premix bags (0.60 ft³ each [common practice: bag labels]); weight at the concrete unit weight
 * (145 pcf, normal-weight plain concrete [memory: ASCE 7-16 Table C3.1-2]).
 *
 * @example concreteFromHolesAsDug({ holes: [{ postId: "P1", diameterIn: 24, depthIn: 60 }, { postId: "P2", diameterIn: 24, depthIn: 60 }] }).totalYd3 // 1.164
 */
import { requireRange } from "../errors";
import { requireInput } from "../input-ranges";
import { bagsFor, FT3_PER_YD3 } from "./concrete-for-hole";

export interface HoleAsDug {
  postId: string;
  diameterIn: number;
  depthIn: number;
}

export interface HoleAsDugConcrete extends HoleAsDug {
  holeFt3: number;
  postFt3: number;
  concreteFt3: number;
  concreteYd3: number;
  weightLb: number;
  bags80Lb: number;
}

export interface ConcreteAsDug {
  holes: HoleAsDugConcrete[];
  totalFt3: number;
  totalYd3: number;
  totalWeightLb: number;
  wasteAllowancePct: number;
  withWasteFt3: number;
  withWasteYd3: number;
  /** Ready-mix to order, up to the next ¼ yd³. */
  orderYd3: number;
  bags80Lb: number;
}

export function concreteFromHolesAsDug(a: { holes: HoleAsDug[]; postOutsideDiameterIn?: number; unitWeightPcf?: number; wasteAllowancePct?: number }): ConcreteAsDug {
  const pcf = a.unitWeightPcf ?? 145;
  const waste = a.wasteAllowancePct ?? 10;
  const od = a.postOutsideDiameterIn ?? 0;
  requireInput("posts.concreteUnitWeightPcf", pcf, "pcf");
  requireInput("posts.wasteAllowancePct", waste, "%");
  requireRange("posts.outsideDiameterIn", od, 0, 24, "Post outside diameter", "in");
  const holes = a.holes.map((h) => {
    requireRange("measuredDiameterIn", h.diameterIn, Math.max(4, od + 0.01), 120, `Measured diameter of hole ${h.postId} (must exceed the post)`, "in");
    requireRange("measuredDepthIn", h.depthIn, 1, 720, `Measured depth of hole ${h.postId}`, "in");
    const d = h.depthIn / 12;
    const holeFt3 = (Math.PI * (h.diameterIn / 12) ** 2 * d) / 4;
    const postFt3 = (Math.PI * (od / 12) ** 2 * d) / 4;
    const concreteFt3 = holeFt3 - postFt3;
    return { ...h, holeFt3, postFt3, concreteFt3, concreteYd3: concreteFt3 / FT3_PER_YD3, weightLb: concreteFt3 * pcf, bags80Lb: bagsFor(concreteFt3, 80) };
  });
  let totalFt3 = 0;
  for (const h of holes) totalFt3 += h.concreteFt3;
  const withWasteFt3 = totalFt3 * (1 + waste / 100);
  return {
    holes,
    totalFt3,
    totalYd3: totalFt3 / FT3_PER_YD3,
    totalWeightLb: totalFt3 * pcf,
    wasteAllowancePct: waste,
    withWasteFt3,
    withWasteYd3: withWasteFt3 / FT3_PER_YD3,
    orderYd3: Math.ceil((withWasteFt3 / FT3_PER_YD3) * 4 - 1e-9) / 4,
    bags80Lb: bagsFor(withWasteFt3, 80),
  };
}
