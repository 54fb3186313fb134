import type { UnitKind } from "@/components/format/quantity";

/** The unit kind of each numeric criterion (stored in mph, psf and in, shown in the reader's units). */
export const CRITERIA_NUMBER_KINDS = { windSpeedMph: "mph", groundSnowPsf: "psf", frostDepthIn: "in" } as const satisfies Record<string, UnitKind>;

/** Each numeric criterion's accepted range in its stored unit (app/_lib/schemas/project.ts, engine/schema.ts), for the hint. */
export const CRITERIA_NUMBER_RANGES: Record<keyof typeof CRITERIA_NUMBER_KINDS, [number, number]> = {
  windSpeedMph: [85, 200],
  groundSnowPsf: [0, 300],
  frostDepthIn: [0, 120],
};
