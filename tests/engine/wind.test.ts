import { describe, expect, it } from "vitest";
import {
  EngineInputError, arrayWindForce, exposureCoefficientKz, groundElevationFactor, kzFormula, netPressureCoefficients,
  topographicFactor, velocityPressure,
} from "../../engine/index";

describe("velocity pressure", () => {
  it("7-16, 115 mph, exposure C, z ≤ 15 ft: qz = 24.46 psf with tabulated Kz 0.85", () => {
    // ASCE 7-16 Eq. 26.10-1, Table 26.10-1 [computed] (ENGINEERING.md §6)
    const v = velocityPressure({ edition: "7-16", windSpeedMph: 115, exposure: "C", heightFt: 12 });
    expect(v.kz).toBe(0.85);
    expect(v.qzPsf).toBeCloseTo(24.46, 2);
    expect(v.kzMethod).toBe("table");
  });
  it("the formula Kz at 15 ft gives 24.43 psf", () => {
    // ASCE 7-16 Table 26.10-1 footnote formula, Kz = 2.01 (15/900)^(2/9.5) [memory + computed]
    const kz = kzFormula("7-16", "C", 15);
    expect(0.00256 * kz * 0.85 * 115 ** 2).toBeCloseTo(24.43, 2);
  });
  it("7-22 excludes Kd from qz: 28.78 psf, and qz·Kd = 24.46", () => {
    // ASCE 7-22 Eq. 26.10-1 [computed] (ENGINEERING.md §6)
    const v = velocityPressure({ edition: "7-22", windSpeedMph: 115, exposure: "C", heightFt: 12 });
    expect(v.qzPsf).toBeCloseTo(28.78, 2);
    expect(v.qzWithKdPsf).toBeCloseTo(24.46, 2);
  });
  it("tabulated Kz at 0–15 ft for B, C, D", () => {
    // ASCE 7-16 Table 26.10-1: 0.57, 0.85, 1.03 [memory]
    expect(exposureCoefficientKz({ edition: "7-16", exposure: "B", heightFt: 0 }).kz).toBe(0.57);
    expect(exposureCoefficientKz({ edition: "7-16", exposure: "D", heightFt: 15 }).kz).toBe(1.03);
  });
  it("Kz grows with height above 15 ft and is continuous at 15 ft within table rounding", () => {
    // ASCE 7-16 Table 26.10-1 formula [memory]
    const at20 = exposureCoefficientKz({ edition: "7-16", exposure: "C", heightFt: 20 }).kz;
    expect(at20).toBeGreaterThan(0.85);
    expect(at20).toBeCloseTo(0.9, 1); // Table 26.10-1 lists 0.90 at 20 ft, exposure C [memory]
  });
  it("Kzt from hill multipliers and Ke from elevation", () => {
    // ASCE 7-16 Eq. 26.8-1 Kzt = (1 + K1K2K3)²; Table 26.9-1 note Ke = e^(−0.0000362 zg) [memory]
    expect(topographicFactor({ method: "hill", k1: 0.3, k2: 0.5, k3: 0.4 })).toBeCloseTo(1.1236, 4);
    expect(groundElevationFactor(5000)).toBeCloseTo(Math.exp(-0.181), 6);
    expect(groundElevationFactor(0)).toBe(1);
  });
  it("refuses a wind speed out of range, naming the field and range", () => {
    expect(() => velocityPressure({ edition: "7-16", windSpeedMph: 250, exposure: "C", heightFt: 5 })).toThrowError(
      "Wind speed must be between 85 and 200 mph",
    );
    try {
      velocityPressure({ edition: "7-16", windSpeedMph: 50, exposure: "C", heightFt: 5 });
    } catch (e) {
      expect(e).toBeInstanceOf(EngineInputError);
      expect((e as EngineInputError).field).toBe("site.windSpeedMph");
    }
  });
});

describe("free-roof net pressure coefficients", () => {
  it("θ 30°, γ 0°, case A, clear: CNW = CNL = −1.8; p = −37.43 psf", () => {
    // ASCE 7-16 Fig. 27.3-4 [std, transcription]; p = qh G CN with qh 24.46, G 0.85 [computed]
    const cn = netPressureCoefficients({ tiltDeg: 30, windDirectionDeg: 0, flow: "clear" });
    expect(cn.A).toEqual({ windward: -1.8, leeward: -1.8 });
    expect(24.46 * 0.85 * cn.A.windward).toBeCloseTo(-37.43, 1);
  });
  it("θ 20° interpolates: CNW −1.30, CNL −1.50", () => {
    // ASCE 7-16 Fig. 27.3-4, linear interpolation 15°–22.5° [computed]
    const cn = netPressureCoefficients({ tiltDeg: 20, windDirectionDeg: 0, flow: "clear" });
    expect(cn.A.windward).toBeCloseTo(-1.3, 6);
    expect(cn.A.leeward).toBeCloseTo(-1.5, 6);
  });
  it("below 7.5° uses the 0° row for both directions; above 45° holds the 45° row", () => {
    // ASCE 7-16 Fig. 27.3-4 0° row: clear A 1.2, 0.3; obstructed B −1.1, −0.6 [std, transcription]
    expect(netPressureCoefficients({ tiltDeg: 5, windDirectionDeg: 180, flow: "clear" }).A).toEqual({ windward: 1.2, leeward: 0.3 });
    expect(netPressureCoefficients({ tiltDeg: 0, windDirectionDeg: 0, flow: "obstructed" }).B).toEqual({ windward: -1.1, leeward: -0.6 });
    expect(netPressureCoefficients({ tiltDeg: 55, windDirectionDeg: 180, flow: "clear" }).A).toEqual({ windward: 2.2, leeward: 2.5 });
  });
  it("γ 0° lifts (negative CN) and γ 180° presses down (positive) in clear flow at 30°", () => {
    // ASCE 7-16 Fig. 27.3-4 sign convention: + toward the top surface [std]
    const up = netPressureCoefficients({ tiltDeg: 30, windDirectionDeg: 0, flow: "clear" });
    const down = netPressureCoefficients({ tiltDeg: 30, windDirectionDeg: 180, flow: "clear" });
    expect(up.A.windward + up.A.leeward).toBeLessThan(0);
    expect(down.A.windward + down.A.leeward).toBeGreaterThan(0);
  });
  it("refuses tilt outside 0–60°", () => {
    expect(() => netPressureCoefficients({ tiltDeg: 70, windDirectionDeg: 0, flow: "clear" })).toThrowError("Tilt must be between 0 and 60 degrees");
  });
});

describe("array wind force (statics)", () => {
  const base = { qGustlessPsf: 24.46, gustFactor: 0.85, slopeLengthFt: 10, widthFt: 20, tiltDeg: 30, rackDepthFt: 0 };
  it("uniform CN: resultant at mid-slope, components N sin θ and N cos θ, no moment at the beam", () => {
    // Statics; centre of pressure x̄/L = (0.25 CNW + 0.75 CNL)/(CNW + CNL) = 0.5 (ENGINEERING.md §1)
    const f = arrayWindForce({ ...base, cn: { windward: -1.8, leeward: -1.8 }, windDirectionDeg: 0 });
    expect(f.normalForceLb).toBeCloseTo(24.46 * 0.85 * -1.8 * 200, 6);
    expect(f.centreOfPressureFromWindwardEdgeFt).toBeCloseTo(5, 9);
    expect(f.horizontalLb).toBeCloseTo(f.normalForceLb * 0.5, 6);
    expect(f.downwardLb).toBeCloseTo(f.normalForceLb * Math.cos(Math.PI / 6), 6);
    expect(Math.abs(f.momentAtPostTopLbFt)).toBeLessThan(1e-9);
  });
  it("case B centre of pressure follows the published ratio", () => {
    // x̄/L = (0.25·(−2.5) + 0.75·(−0.5))/(−3.0) = 0.3333 (ENGINEERING.md §1) [computed]
    const f = arrayWindForce({ ...base, cn: { windward: -2.5, leeward: -0.5 }, windDirectionDeg: 0 });
    expect(f.centreOfPressureFromWindwardEdgeFt! / 10).toBeCloseTo(1 / 3, 9);
    // Moment about the beam = N × (distance of the centre of pressure from mid-slope): statics.
    expect(Math.abs(f.momentAtPostTopLbFt)).toBeCloseTo(Math.abs(f.normalForceLb) * (5 - 10 / 3), 6);
  });
});
