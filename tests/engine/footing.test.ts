import { describe, expect, it } from "vitest";
import { embedmentDepth, lateralRatio, pipeAllowableMoment, smallestPipeFor, soilValues, upliftCapacityLb } from "../../engine/index";
import { STD_PIPE, type PipeSize } from "../../engine/footing/pipe";
import { requiredUpliftDepthFt } from "../../engine/footing/uplift-depth";

describe("IBC §1807.3.2 embedment", () => {
  it("Eq. 18-1: P 1000 lb, h 4 ft, b 2 ft, S 150 psf/ft → d = 6.294 ft", () => {
    // IBC 2018/2021 §1807.3.2.1 Eq. 18-1 [computed] (ENGINEERING.md §6)
    expect(embedmentDepth({ lateralLoadLb: 1000, loadHeightFt: 4, diameterFt: 2, lateralBearingPsfPerFt: 150 }).depthFt).toBeCloseTo(6.294, 3);
  });
  it("Eq. 18-1 with §1806.3.4 doubling → d = 4.740 ft", () => {
    // IBC 2018/2021 §1807.3.2.1 with §1806.3.4 [computed] (ENGINEERING.md §6)
    const r = embedmentDepth({ lateralLoadLb: 1000, loadHeightFt: 4, diameterFt: 2, lateralBearingPsfPerFt: 150, isolatedPoleIncrease: true });
    expect(r.depthFt).toBeCloseTo(4.74, 3);
    expect(r.lateralBearingPsfPerFtUsed).toBe(300);
  });
  it("Eq. 18-2 constrained: d = 3.84 ft", () => {
    // IBC 2018/2021 §1807.3.2.2 Eq. 18-2 [computed] (ENGINEERING.md §6)
    expect(embedmentDepth({ lateralLoadLb: 1000, loadHeightFt: 4, diameterFt: 2, lateralBearingPsfPerFt: 150, constrainedAtGrade: true }).depthFt).toBeCloseTo(3.84, 2);
  });
  it("the solved depth satisfies Eq. 18-1 as printed (d = 0.5A{1 + [1 + 4.36h/A]^½}, S1 at d/3)", () => {
    // IBC 2018/2021 §1807.3.2.1 Eq. 18-1 [std]: independent substitution
    const P = 2500, h = 6.5, b = 2.5, S = 100;
    const d = embedmentDepth({ lateralLoadLb: P, loadHeightFt: h, diameterFt: b, lateralBearingPsfPerFt: S }).depthFt;
    const A = (2.34 * P) / (((S * d) / 3) * b);
    expect(0.5 * A * (1 + Math.sqrt(1 + (4.36 * h) / A))).toBeCloseTo(d, 6);
    expect(lateralRatio({ shearLb: P, momentLbFt: P * h, diameterFt: b, sPsfPerFt: S, constrained: false }, d)).toBeCloseTo(1, 6);
  });
  it("beyond 12 ft, S1 stays at its 12 ft value [memory: cap]", () => {
    // IBC §1807.3.2.1 S1 at d/3, capped here at S·12/3 (ENGINEERING.md §3) [memory]
    const d = embedmentDepth({ lateralLoadLb: 5000, loadHeightFt: 10, diameterFt: 1, lateralBearingPsfPerFt: 100 }).depthFt;
    expect(d).toBeGreaterThan(12);
    expect(d).toBeLessThan(60);
    const A = (2.34 * 5000) / (((100 * 12) / 3) * 1);
    expect(0.5 * A * (1 + Math.sqrt(1 + (4.36 * 10) / A))).toBeCloseTo(d, 6);
  });
  it("names the field when the diameter is out of range", () => {
    expect(() => embedmentDepth({ lateralLoadLb: 1000, loadHeightFt: 4, diameterFt: 0, lateralBearingPsfPerFt: 150 })).toThrowError(/Hole diameter must be between/);
  });
});

describe("soil, uplift, post", () => {
  it("Table 1806.2 class 4: 2000 psf vertical, 150 psf/ft lateral", () => {
    // IBC 2018/2021 Table 1806.2 [memory; verify]
    expect(soilValues({ method: "class", soilClass: 4 }, false)).toMatchObject({ verticalPsf: 2000, lateralPsfPerFt: 150 });
    expect(soilValues({ method: "class", soilClass: 5 }, true).lateralPsfPerFt).toBe(200); // §1806.3.4 doubling
  });
  it("refuses fill with a message pointing to a geotechnical report", () => {
    // IBC Table 1806.2: no presumptive value for fill, organic soil, mud [memory]
    expect(() => soilValues({ method: "class", soilClass: "fill" }, false)).toThrowError(/geotechnical report/);
  });
  it("uplift capacity is 0.6 × (concrete + post + dead) and the closed-form depth meets it", () => {
    // ASCE 7 §2.4.1 0.6D + 0.6W (ENGINEERING.md §3) [memory]; 145 pcf concrete [memory]
    const cap = upliftCapacityLb({ depthFt: 5, diameterFt: 2, concretePcf: 145, postLbPerFt: 7.58, postAboveGradeFt: 4, deadLb: 500 });
    expect(cap).toBeCloseTo(0.6 * (Math.PI * 5 * 145 + 7.58 * 9 + 500), 6);
    const args = { diameterFt: 2, concretePcf: 145, postLbPerFt: 7.58, postAboveGradeFt: 4, deadLb: 500, waterTableDepthFt: 3 };
    const d = requiredUpliftDepthFt({ ...args, upliftLb: 2000, deadFactor: 0.6 });
    expect(upliftCapacityLb({ ...args, depthFt: d })).toBeCloseTo(2000, 6);
  });
  it("Pipe 3 Std at Fy 35 ksi: Ma = 3.82 kip-ft", () => {
    // AISC 360-16 §F8, Ma = Fy Z / 1.67, Z 2.19 in³ (AISC Shapes Database v15.0) [computed]
    expect(pipeAllowableMoment({ size: "3" }).allowableMomentKipFt).toBeCloseTo(3.82, 2);
    expect(pipeAllowableMoment({ size: "4", yieldKsi: 35 }).allowableMomentKipFt).toBeCloseTo((35 * 4.05) / 1.67 / 12, 9);
    expect(smallestPipeFor(3.9)).toBe("3-1/2");
  });
  it("every standard pipe matches its AISC Shapes Database v15.0 row and the geometry it comes from", () => {
    // AISC Shapes Database v15.0, rows PipeNSTD: OD, tdes, Z, weight [memory: printed table not read here].
    const rows: [PipeSize, number, number, number, number][] = [
      ["2-1/2", 2.875, 0.189, 1.37, 5.8], // Pipe2-1/2STD [memory]
      ["3", 3.5, 0.201, 2.19, 7.58], // Pipe3STD [memory]
      ["3-1/2", 4.0, 0.211, 3.03, 9.12], // Pipe3-1/2STD [memory]
      ["4", 4.5, 0.221, 4.05, 10.8], // Pipe4STD [memory]
      ["5", 5.563, 0.241, 6.83, 14.6], // Pipe5STD [memory]; was 6.97 in³, about 2 % high
      ["6", 6.625, 0.261, 10.6, 19.0], // Pipe6STD [memory]
    ];
    for (const [size, od, tdes, z, w] of rows) {
      const p = pipeAllowableMoment({ size });
      expect([p.outsideDiameterIn, p.designWallIn, p.plasticModulusIn3, p.weightLbPerFt]).toEqual([od, tdes, z, w]);
      // tdes = 0.93 tnom, AISC 360-16 §B4.2 [std], to the database's 3 decimals (±0.0015 in).
      expect(Math.abs(tdes - 0.93 * STD_PIPE[size].nominalWallIn)).toBeLessThan(0.0015);
      // Z of a ring (D³ − (D − 2t)³)/6 with t = tdes [computed]: within 0.6 % of the table.
      const zRing = (od ** 3 - (od - 2 * tdes) ** 3) / 6;
      expect(Math.abs(zRing / z - 1)).toBeLessThan(0.006);
      // Plain-end weight 10.69 (D − t) t lb/ft with t = tnom, ASME B36.10M [std]: within 0.5 %.
      const t = STD_PIPE[size].nominalWallIn;
      expect(Math.abs((10.69 * (od - t) * t) / w - 1)).toBeLessThan(0.005);
    }
  });
  it("refuses a yield strength out of range", () => {
    expect(() => pipeAllowableMoment({ size: "3", yieldKsi: 80 })).toThrowError("Post yield strength must be between 25 and 60 ksi");
  });
});
