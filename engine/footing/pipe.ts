/**
 * Standard-weight steel pipe posts and their allowable bending moment.
 *
 * Properties: AISC Shapes Database v15.0 (Pipe 2½–4 Std; 5 and 6 Std added [memory]): OD, nominal wall, plastic modulus Z,
 * weight. Design wall = 0.93 × nominal (AISC 360 §B4.2).
 * Strength: AISC 360-16 §F8, round HSS: compact when D/t ≤ 0.07 E/Fy, then Mn = Mp = Fy Z;
 * ASD allowable Ma = Mn / Ω, Ω = 1.67. Fy 35 ksi (ASTM A53 Gr. B) unless given.
 *
 * @example pipeAllowableMoment({ size: "3" }).allowableMomentKipFt // 3.82
 */
import { EngineInputError, requireOneOf, requireRange } from "../errors";

export const PIPE_SIZES = ["2-1/2", "3", "3-1/2", "4", "5", "6"] as const;
export type PipeSize = (typeof PIPE_SIZES)[number];

export const STD_PIPE: Record<PipeSize, { outsideDiameterIn: number; nominalWallIn: number; plasticModulusIn3: number; weightLbPerFt: number }> = {
  "2-1/2": { outsideDiameterIn: 2.875, nominalWallIn: 0.203, plasticModulusIn3: 1.37, weightLbPerFt: 5.8 },
  "3": { outsideDiameterIn: 3.5, nominalWallIn: 0.216, plasticModulusIn3: 2.19, weightLbPerFt: 7.58 },
  "3-1/2": { outsideDiameterIn: 4.0, nominalWallIn: 0.226, plasticModulusIn3: 3.03, weightLbPerFt: 9.12 },
  "4": { outsideDiameterIn: 4.5, nominalWallIn: 0.237, plasticModulusIn3: 4.05, weightLbPerFt: 10.8 },
  // Pipe 5 and 6 Std are [memory] (same database, not in ENGINEERING.md): confirm before shipping.
  "5": { outsideDiameterIn: 5.563, nominalWallIn: 0.258, plasticModulusIn3: 6.97, weightLbPerFt: 14.6 },
  "6": { outsideDiameterIn: 6.625, nominalWallIn: 0.28, plasticModulusIn3: 10.6, weightLbPerFt: 19.0 },
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
  const designWallIn = 0.93 * p.nominalWallIn;
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
    source: "AISC 360-16 §F8 (Ω = 1.67); AISC Shapes Database v15.0",
  };
}
