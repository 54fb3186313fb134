import type { UnitKind } from "@/components/format/quantity";

/** The unit kind of each numeric criterion (stored in mph, psf and in, shown in the reader's units). */
export const CRITERIA_NUMBER_KINDS = { windSpeedMph: "mph", groundSnowPsf: "psf", frostDepthIn: "in" } as const satisfies Record<string, UnitKind>;

/**
 * Each numeric criterion's accepted range in its stored unit, for the form's hint. A copy of the
 * bounds in engine/schema.ts's site schema rather than read from it: the form runs in the browser,
 * and the schema would bring zod into the criteria page's first load. tests/unit/criteria-ranges.test.ts
 * holds the copy to the schema.
 */
export const CRITERIA_NUMBER_RANGES: Record<keyof typeof CRITERIA_NUMBER_KINDS, [number, number]> = {
  windSpeedMph: [85, 200],
  groundSnowPsf: [0, 300],
  frostDepthIn: [0, 120],
};
