import type { DesignResult } from "@/engine";
import { ValidationError } from "./errors";

/**
 * `POST /api/calc?sections=footing,concrete`: API callers that need only part of the result name
 * the top-level sections they want, and the reply leaves the rest out (the preview geometry and
 * the per-post tables are most of its size). The engine version and the preliminary-sizing
 * cautions are always sent: a result never travels without them. No `sections`: the whole result.
 */
export const ALWAYS_SENT = ["engineVersion", "caution", "cautions"] as const satisfies readonly (keyof DesignResult)[];

export const RESULT_SECTIONS = [
  "input", "projectName", "methodNote", "references", "geometry", "wind", "snow", "dead", "postLoads", "governingLoads",
  "footing", "concrete", "options", "field", "warnings", "geometryPreview",
] as const satisfies readonly (keyof DesignResult)[];

export type ResultSection = (typeof RESULT_SECTIONS)[number];

/** Reads `?sections=`; null when absent (send everything). An unknown name is a 422 naming `sections`. */
export function sectionsFrom(url: URL): Set<ResultSection> | null {
  const raw = url.searchParams.getAll("sections").flatMap((s) => s.split(",")).map((s) => s.trim()).filter(Boolean);
  if (url.searchParams.has("sections") === false) return null;
  const known = new Set<string>([...RESULT_SECTIONS, ...ALWAYS_SENT]);
  const unknown = raw.filter((s) => !known.has(s));
  if (unknown.length > 0 || raw.length === 0) {
    const what = raw.length === 0 ? "No section named" : `Unknown section${unknown.length > 1 ? "s" : ""} ${unknown.map((s) => `"${s.slice(0, 40)}"`).join(", ")}`;
    throw ValidationError.field("sections", `${what}; name one or more of: ${RESULT_SECTIONS.join(", ")}.`);
  }
  return new Set(raw.filter((s): s is ResultSection => (RESULT_SECTIONS as readonly string[]).includes(s)));
}

/** The result with only the sections asked for (plus the version and cautions). */
export function pickSections(result: DesignResult, sections: Set<ResultSection> | null): Partial<DesignResult> {
  if (!sections) return result;
  const out: Record<string, unknown> = {};
  for (const key of ALWAYS_SENT) out[key] = result[key];
  for (const key of sections) if (result[key] !== undefined) out[key] = result[key];
  return out as Partial<DesignResult>;
}
