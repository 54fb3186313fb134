/**
 * Small zod builders whose every message names the field and the allowed range, plus the helper
 * that turns a zod error into `[{ path: "site.windSpeedMph", message }]` for forms and the API.
 */
import { z } from "zod";
import type { FieldIssue } from "./errors";

/** A finite number in [min, max]; NaN, Infinity, strings and missing values get the same message. */
export function num(label: string, min: number, max: number, unit = "", opts: { int?: boolean } = {}) {
  const range = `${label} must be ${opts.int ? "a whole number " : ""}between ${min} and ${max}${unit ? " " + unit : ""}`;
  const base = z.number({ error: (iss) => (iss.input === undefined ? `${label} is required (${range.replace(`${label} must be `, "")})` : range) });
  const ranged = base.min(min, { error: range }).max(max, { error: range });
  return opts.int ? ranged.int({ error: range }) : ranged;
}

/** One of a fixed set of strings, with a message listing them. */
export function choice<const T extends readonly [string, ...string[]]>(label: string, values: T) {
  return z.enum(values, { error: `${label} must be one of ${values.join(", ")}` });
}

/** A yes/no field. */
export function flag(label: string) {
  return z.boolean({ error: `${label} must be true or false` });
}

/** Zod error → list of field issues with dotted paths. */
export function zodIssuesToFieldErrors(error: z.ZodError): FieldIssue[] {
  return error.issues.map((i) => ({
    path: i.path.map(String).join(".") || "(input)",
    message: i.message,
  }));
}
