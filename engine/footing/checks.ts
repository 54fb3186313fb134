/**
 * The footing checks, each reported as demand, capacity and utilisation ratio, with the post,
 * tilt and load combination that govern.
 */
export type CheckId = "lateral" | "uplift" | "frost" | "bearing" | "holeSize" | "postBending";
/** The checks that set the depth. */
export type DepthCheckId = "lateral" | "uplift" | "frost";

export interface Governing {
  postId: string;
  tiltDeg: number;
  combination: string;
  /** Index into the design's wind cases, -1 when the combination has no wind. */
  windCase: number;
}

export interface FootingCheck {
  id: CheckId;
  title: string;
  demand: number;
  capacity: number;
  unit: string;
  /** demand / capacity; ≤ 1 passes. */
  ratio: number;
  pass: boolean;
  governing: Governing | null;
  /** For the checks that set depth: the depth this check alone needs (in, unrounded). */
  requiredDepthIn: number | null;
  source: string;
  /** Extra words for the reviewer, e.g. the load height h used. */
  detail?: string;
}

export const CHECK_TITLES: Record<CheckId, string> = {
  lateral: "Lateral embedment",
  uplift: "Uplift",
  frost: "Frost and minimum depth",
  bearing: "Bearing under the base",
  holeSize: "Hole at least 4 in larger than the post",
  postBending: "Post bending at grade",
};

export function makeCheck(
  id: CheckId,
  demand: number,
  capacity: number,
  unit: string,
  source: string,
  governing: Governing | null,
  requiredDepthIn: number | null = null,
): FootingCheck {
  const ratio = capacity > 0 ? demand / capacity : demand > 0 ? Infinity : 0;
  return { id, title: CHECK_TITLES[id], demand, capacity, unit, ratio, pass: ratio <= 1 + 1e-9, governing, requiredDepthIn, source };
}
