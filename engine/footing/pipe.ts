/**
 * Standard-weight steel pipe posts and their allowable bending moment.
 *
 * Properties: AISC Shapes Database v15.0, rows "Pipe2-1/2STD" … "Pipe6STD" (type PIPE): OD,
 * nominal wall, design wall tdes, plastic modulus Z, nominal weight. The printed table could not be
 * read here, so every value is [memory]; each row is cross-checked in tests/engine/footing.test.ts
 * against the geometry it must come from (Z = (D³ − (D − 2 tdes)³)/6 for a thin ring; weight
 * 10.69 (D − tnom) tnom lb/ft, ASME B36.10M plain-end formula). Before the check Pipe 5 Std carried
 * Z = 6.97 in³, about 2 % above the database's 6.83 (unconservative); it is corrected below.
 * Strength: AISC 360-16 §F8, round HSS: compact when D/t ≤ 0.07 E/Fy, then Mn = Mp = Fy Z;
 * ASD allowable Ma = Mn / Ω, Ω = 1.67. Fy 35 ksi (ASTM A53 Gr. B) unless given.
 *
 * @example pipeAllowableMoment({ size: "3" }).allowableMomentKipFt // 3.82
 */
import { EngineInputError, requireOneOf, requireRange } from "../errors";

export const PIPE_SIZES = ["2-1/2", "3", "3-1/2", "4", "5", "6"] as const;
export type PipeSize = (typeof PIPE_SIZES)[number];

export interface PipeSection {
  outsideDiameterIn: number;
  nominalWallIn: number;
  /** Design wall thickness tdes as the database lists it (0.93 × nominal, AISC 360-16 §B4.2). */
  designWallIn: number;
  plasticModulusIn3: number;
  weightLbPerFt: number;
}

/** AISC Shapes Database v15.0, one row per size (row name beside it) [memory]. */
export const STD_PIPE: Record<PipeSize, PipeSection> = {
  "2-1/2": { outsideDiameterIn: 2.875, nominalWallIn: 0.203, designWallIn: 0.189, plasticModulusIn3: 1.37, weightLbPerFt: 5.8 }, // Pipe2-1/2STD
  "3": { outsideDiameterIn: 3.5, nominalWallIn: 0.216, designWallIn: 0.201, plasticModulusIn3: 2.19, weightLbPerFt: 7.58 }, // Pipe3STD
  "3-1/2": { outsideDiameterIn: 4.0, nominalWallIn: 0.226, designWallIn: 0.211, plasticModulusIn3: 3.03, weightLbPerFt: 9.12 }, // Pipe3-1/2STD
  "4": { outsideDiameterIn: 4.5, nominalWallIn: 0.237, designWallIn: 0.221, plasticModulusIn3: 4.05, weightLbPerFt: 10.8 }, // Pipe4STD
  "5": { outsideDiameterIn: 5.563, nominalWallIn: 0.258, designWallIn: 0.241, plasticModulusIn3: 6.83, weightLbPerFt: 14.6 }, // Pipe5STD (Z was 6.97)
  "6": { outsideDiameterIn: 6.625, nominalWallIn: 0.28, designWallIn: 0.261, plasticModulusIn3: 10.6, weightLbPerFt: 19.0 }, // Pipe6STD
};

/**
 * The smallest standard pipe whose allowable moment covers `momentKipFt`, or null if none does.
 * @example smallestPipeFor(3.5) // "3"
 */
export function smallestPipeFor(momentKipFt: number, yieldKsi = 35): PipeSize | null {
  for (const size of PIPE_SIZES) {
    if (pipeAllowableMoment({ size, yieldKsi }).allowableMomentKipFt >= momentKipFt) return size;
  }
  return null;
}

export const STEEL_E_KSI = 29000;
export const OMEGA_FLEXURE = 1.67;

export interface PipeMoment {
  size: PipeSize;
  outsideDiameterIn: number;
  designWallIn: number;
  plasticModulusIn3: number;
  weightLbPerFt: number;
  yieldKsi: number;
  compact: boolean;
  allowableMomentKipFt: number;
  source: string;
}

export function pipeAllowableMoment(a: { size: PipeSize; yieldKsi?: number }): PipeMoment {
  requireOneOf("posts.pipeSize", a.size, PIPE_SIZES, "Pipe size");
  const fy = a.yieldKsi ?? 35;
  requireRange("posts.yieldKsi", fy, 25, 60, "Post yield strength", "ksi");
  const p = STD_PIPE[a.size];
  const designWallIn = p.designWallIn;
  const compact = p.outsideDiameterIn / designWallIn <= (0.07 * STEEL_E_KSI) / fy;
  if (!compact) throw new EngineInputError("posts.yieldKsi", `Pipe ${a.size} Std is not compact at Fy ${fy} ksi; use a lower yield strength or another size`);
  return {
    size: a.size,
    outsideDiameterIn: p.outsideDiameterIn,
    designWallIn,
    plasticModulusIn3: p.plasticModulusIn3,
    weightLbPerFt: p.weightLbPerFt,
    yieldKsi: fy,
    compact,
    allowableMomentKipFt: (fy * p.plasticModulusIn3) / OMEGA_FLEXURE / 12,
    source: `AISC 360-16 §F8 (Ω = 1.67); AISC Shapes Database v15.0, Pipe${a.size}STD`,
  };
}
