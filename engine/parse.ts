/**
 * Validate raw input against the one design schema.
 * @example parseDesignInput(defaultDesignInput).site.edition // "7-16"
 * @throws DesignInputError listing every field at fault, e.g. { path: "site.windSpeedMph", message: "Wind speed must be between 85 and 200 mph" }
 */
import { DesignInputError, type FieldIssue } from "./errors";
import { designInputSchema, type DesignInput } from "./schema";
import { zodIssuesToFieldErrors } from "./schema-helpers";

export function safeParseDesignInput(raw: unknown): { ok: true; input: DesignInput } | { ok: false; issues: FieldIssue[] } {
  const r = designInputSchema.safeParse(raw);
  return r.success ? { ok: true, input: r.data } : { ok: false, issues: zodIssuesToFieldErrors(r.error) };
}

export function parseDesignInput(raw: unknown): DesignInput {
  const r = safeParseDesignInput(raw);
  if (!r.ok) throw new DesignInputError(r.issues);
  return r.input;
}
