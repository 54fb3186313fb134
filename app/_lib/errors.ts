import { ZodError } from "zod";
import type { FieldIssue } from "@/engine/errors";

/**
 * The one error vocabulary of the server side. Services throw these; exactly two mappers turn
 * them into answers: `apiRoute` (app/_lib/api.ts) into JSON, `actionState` (app/_lib/action-errors.ts)
 * into what a form shows. A zod error from parsing input is treated as a ValidationError.
 */
export type { FieldIssue };

/** Input that breaks a rule, naming each field at fault (422 from the API, messages beside form fields). */
export class ValidationError extends Error {
  constructor(readonly issues: FieldIssue[]) {
    super(issues.map((i) => (i.path ? `${i.path}: ${i.message}` : i.message)).join("; "));
    this.name = "ValidationError";
  }

  /** One field at fault, e.g. `ValidationError.field("engineerId", "Choose another engineer")`. */
  static field(path: string, message: string): ValidationError {
    return new ValidationError([{ path, message }]);
  }
}

/**
 * Who may do what, in the order the checks run: 401 signed out, 404 another organisation's (or a
 * missing) record, so ids cannot be probed, 403 a role or rule that forbids it. `explained` marks a
 * 403 the person must read the reason of (own design, licence) rather than a bare "forbidden" page.
 */
export class AccessError extends Error {
  constructor(
    readonly status: 401 | 403 | 404,
    message: string,
    readonly explained = false,
  ) {
    super(message);
    this.name = "AccessError";
  }
}

/** A record that is missing or belongs to another organisation (404). */
export function notFound(what = "That record"): AccessError {
  return new AccessError(404, `${what} was not found.`);
}

/** A conflict the caller can resolve, e.g. saving against a revision that is no longer the latest (409). */
export class ConflictError extends Error {
  constructor(message: string, readonly detail: Record<string, unknown> = {}) {
    super(message);
    this.name = "ConflictError";
  }
}

/** Field issues of a zod error, with dotted paths ("input.site.windSpeedMph"). */
export function zodIssues(error: ZodError, prefix: string[] = []): FieldIssue[] {
  return error.issues.flatMap((issue) =>
    // An unknown key is named as its own path, so the caller sees which field is not accepted.
    issue.code === "unrecognized_keys"
      ? issue.keys.map((key) => ({ path: [...prefix, ...issue.path.map(String), key].join("."), message: /^Unrecognized key/.test(issue.message) ? `${key} is not a field that can be set here` : `${key} is not a field that can be set here. ${issue.message}` }))
      : [{ path: [...prefix, ...issue.path.map(String)].join("."), message: issue.message }],
  );
}

/** The field issues of a validation failure (ours or a zod parse), or null for any other error. */
export function validationIssues(error: unknown): FieldIssue[] | null {
  if (error instanceof ValidationError) return error.issues;
  if (error instanceof ZodError) return zodIssues(error);
  return null;
}
