import type { DesignResult } from "@/engine/types";

/** JSON with object keys sorted: the database stores results as jsonb, which reorders keys. */
function canonical(value: unknown): string {
  return JSON.stringify(value, (_key, v: unknown) =>
    v && typeof v === "object" && !Array.isArray(v) ? Object.fromEntries(Object.entries(v as Record<string, unknown>).sort(([a], [b]) => (a < b ? -1 : a > b ? 1 : 0))) : v,
  );
}

/**
 * True when a result computed here equals the one the server stored, as stored: both through
 * JSON (so -0, undefined fields and key order do not count as differences).
 */
export function sameResult(live: DesignResult, saved: DesignResult): boolean {
  return canonical(JSON.parse(JSON.stringify(live))) === canonical(saved);
}
