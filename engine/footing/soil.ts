/**
 * Presumptive soil values, IBC (2018/2021) Table 1806.2 [memory; verify against the printed code]:
 * allowable vertical foundation pressure (psf) and lateral bearing pressure (psf per ft below
 * natural grade). Fill, organic soil and mud have no presumptive value: the engine refuses them and
 * asks for values from a geotechnical report. §1806.3.4 lets isolated poles that tolerate ½ in of
 * ground movement use twice the lateral value — a designer's choice, shown to the reviewer.
 */
import { EngineInputError, requireRange } from "../errors";

export type SoilClassId = 1 | 2 | 3 | 4 | 5;
export const NO_PRESUMPTIVE_VALUE = ["fill", "organic", "mud"] as const;
export type UnratedSoil = (typeof NO_PRESUMPTIVE_VALUE)[number];

export const SOIL_CLASSES: Record<SoilClassId, { name: string; verticalPsf: number; lateralPsfPerFt: number }> = {
  1: { name: "Crystalline bedrock", verticalPsf: 12000, lateralPsfPerFt: 1200 },
  2: { name: "Sedimentary and foliated rock", verticalPsf: 4000, lateralPsfPerFt: 400 },
  3: { name: "Sandy gravel and/or gravel (GW and GP)", verticalPsf: 3000, lateralPsfPerFt: 200 },
  4: { name: "Sand, silty sand, clayey sand, silty gravel and clayey gravel (SW, SP, SM, SC, GM and GC)", verticalPsf: 2000, lateralPsfPerFt: 150 },
  5: { name: "Clay, sandy clay, silty clay, clayey silt, silt and sandy silt (CL, ML, MH and CH)", verticalPsf: 1500, lateralPsfPerFt: 100 },
};

export type SoilInput =
  | { method: "class"; soilClass: SoilClassId | UnratedSoil }
  | { method: "custom"; allowableBearingPsf: number; lateralBearingPsfPerFt: number; description?: string };

export interface SoilValues {
  description: string;
  verticalPsf: number;
  /** Lateral bearing per ft of depth as used (doubled when §1806.3.4 is chosen). */
  lateralPsfPerFt: number;
  lateralBasePsfPerFt: number;
  doubled: boolean;
  source: string;
}

/**
 * Soil values for design.
 * @example soilValues({ method: "class", soilClass: 4 }, false).lateralPsfPerFt // 150
 */
export function soilValues(soil: SoilInput, isolatedPoleIncrease: boolean): SoilValues {
  // Built as one literal per branch, keys in the published order (description, verticalPsf,
  // lateralBasePsfPerFt, source, lateralPsfPerFt, doubled): this runs once per design and the
  // intermediate object and spread it replaced were measurable in the bench.
  const factor = isolatedPoleIncrease ? 2 : 1;
  if (soil.method === "class") {
    if ((NO_PRESUMPTIVE_VALUE as readonly unknown[]).includes(soil.soilClass)) {
      throw new EngineInputError(
        "site.soil.soilClass",
        "Fill, organic soil and mud have no presumptive bearing value (IBC Table 1806.2): enter values from a geotechnical report as custom soil",
      );
    }
    const c = SOIL_CLASSES[soil.soilClass as SoilClassId];
    if (!c) throw new EngineInputError("site.soil.soilClass", "Soil class must be 1, 2, 3, 4 or 5 (IBC Table 1806.2)");
    return {
      description: `Class ${soil.soilClass}: ${c.name}`, verticalPsf: c.verticalPsf, lateralBasePsfPerFt: c.lateralPsfPerFt, source: "IBC Table 1806.2",
      lateralPsfPerFt: c.lateralPsfPerFt * factor, doubled: isolatedPoleIncrease,
    };
  }
  requireRange("site.soil.allowableBearingPsf", soil.allowableBearingPsf, 500, 20000, "Allowable bearing pressure", "psf");
  requireRange("site.soil.lateralBearingPsfPerFt", soil.lateralBearingPsfPerFt, 25, 2000, "Lateral bearing pressure", "psf per ft");
  return {
    description: soil.description || "Engineer's soil values",
    verticalPsf: soil.allowableBearingPsf,
    lateralBasePsfPerFt: soil.lateralBearingPsfPerFt,
    source: "engineer's input (geotechnical report)",
    lateralPsfPerFt: soil.lateralBearingPsfPerFt * factor,
    doubled: isolatedPoleIncrease,
  };
}
