import type { UnitSystem } from "./quantity";

/**
 * The reader's unit system, kept in a cookie so server pages (review, compare, field spec) and the
 * PDF report render in it too, and in localStorage for the editor's first paint. Not a secret and
 * not a session: a preference of this browser.
 */
export const UNITS_COOKIE = "pierwise-units";
export const UNITS_STORAGE_KEY = "pierwise-units";

export function parseUnitSystem(value: string | null | undefined): UnitSystem {
  return value === "metric" ? "metric" : "imperial";
}

/** Browser only: remembers the choice for a year. */
export function rememberUnitSystem(system: UnitSystem): void {
  document.cookie = `${UNITS_COOKIE}=${system}; path=/; max-age=31536000; samesite=lax`;
  try { window.localStorage.setItem(UNITS_STORAGE_KEY, system); } catch { /* storage may be off: the cookie is enough */ }
}
