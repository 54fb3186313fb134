import { describe, expect, it } from "vitest";
import { concreteForHole, concreteOrder, slopeFactorCs, snowLoad } from "../../engine/index";

describe("concrete", () => {
  const hole = concreteForHole({ diameterIn: 24, depthIn: 60 });
  it("24 in × 60 in hole: 15.708 ft³ = 0.582 yd³, 2,278 lb at 145 pcf, 27 bags of 80 lb", () => {
    // Cylinder π b² d /4 [computed]; 145 pcf ASCE 7-16 Table C3.1-2 [memory]; 0.60 ft³ per 80-lb bag [common practice: bag labels]
    expect(hole.volumeFt3).toBeCloseTo(15.708, 3);
    expect(hole.volumeYd3).toBeCloseTo(0.582, 3);
    expect(hole.weightLb).toBeCloseTo(2278, 0);
    expect(hole.bags80Lb).toBe(27);
  });
  it("about 0.58 yd³ and roughly 2,300 lb per hole; two holes well under two cubic yards", () => {
    // common practice (trade plausibility, ENGINEERING.md §6)
    expect(hole.volumeYd3).toBeGreaterThan(0.55);
    expect(hole.volumeYd3).toBeLessThan(0.6);
    expect(Math.abs(hole.weightLb - 2300)).toBeLessThan(100);
    const job = concreteOrder({ hole, holes: 2, wasteAllowancePct: 10 });
    expect(job.totalYd3).toBeLessThan(1.5);
    expect(job.withWasteYd3).toBeCloseTo(job.totalYd3 * 1.1, 9);
    expect(job.orderYd3).toBe(1.5); // rounded up to ¼ yd³ [common practice]
  });
  it("subtracting the post's displacement removes π OD² d /4", () => {
    // Cylinder volumes [computed]
    const net = concreteForHole({ diameterIn: 24, depthIn: 60, postOutsideDiameterIn: 3.5, subtractPostDisplacement: true });
    expect(hole.volumeFt3 - net.volumeFt3).toBeCloseTo((Math.PI * (3.5 / 12) ** 2 * 5) / 4, 9);
  });
  it("names the field for a bad size", () => {
    expect(() => concreteForHole({ diameterIn: -1, depthIn: 60 })).toThrowError("Hole diameter must be between 4 and 120 in");
  });
});

describe("snow", () => {
  it("Ce 0.9, Ct 1.2, Is 1, pg 30 psf, θ 30° slippery: pf 22.68, Cs 0.727, ps 16.49 psf", () => {
    // ASCE 7-16 Eq. 7.3-1, Fig. 7.4-1 [computed] (ENGINEERING.md §6)
    const s = snowLoad({ edition: "7-16", groundSnowPsf: 30, ce: 0.9, ct: 1.2, is: 1, tiltDeg: 30, slippery: true });
    expect(s.pfPsf).toBeCloseTo(22.68, 2);
    expect(s.cs).toBeCloseTo(0.727, 3);
    expect(s.psPsf).toBeCloseTo(16.49, 2);
  });
  it("7-22 drops Is and uses 0.7S in combinations", () => {
    // ASCE 7-22 Eq. 7.3-1 and §2.4.1 (ENGINEERING.md §2) [memory]
    const s = snowLoad({ edition: "7-22", groundSnowPsf: 30, ce: 0.9, ct: 1.2, is: 1.2, tiltDeg: 30, slippery: true });
    expect(s.pfPsf).toBeCloseTo(22.68, 2);
    expect(s.combinationFactor).toBe(0.7);
  });
  it("Cs is 1 up to the knee and 0 at 70°", () => {
    // ASCE 7-16 Fig. 7.4-1 [memory]
    expect(slopeFactorCs(10, 1.2, true)).toBe(1);
    expect(slopeFactorCs(70, 1.2, false)).toBe(0);
    expect(slopeFactorCs(57.5, 1.2, false)).toBeCloseTo(0.5, 9);
  });
});
