/**
 * Errors the engine raises. Every message names the field and what to change, so a form can show
 * it beside the input and a reviewer can read it in a log.
 */

/** One problem with one input field, in the shape forms and the API share. */
export interface FieldIssue {
  /** Dotted path of the field, e.g. "site.windSpeedMph". */
  path: string;
  /** What is wrong and what is allowed, e.g. "Wind speed must be between 85 and 200 mph". */
  message: string;
}

/** A single calculation function was given a value outside its method's range. */
export class EngineInputError extends Error {
  readonly field: string;
  constructor(field: string, message: string) {
    super(message);
    this.name = "EngineInputError";
    this.field = field;
  }
  get issues(): FieldIssue[] {
    return [{ path: this.field, message: this.message }];
  }
}

/** A whole design input failed the schema; `issues` lists every field at fault. */
export class DesignInputError extends Error {
  readonly issues: FieldIssue[];
  constructor(issues: FieldIssue[]) {
    super(issues.map((i) => `${i.path}: ${i.message}`).join("; "));
    this.name = "DesignInputError";
    this.issues = issues;
  }
}

/**
 * Throw unless `value` is a finite number within [min, max].
 * @example requireRange("windSpeedMph", 120, 85, 200, "Wind speed", "mph") // passes
 */
export function requireRange(
  field: string,
  value: unknown,
  min: number,
  max: number,
  label: string,
  unit: string,
): asserts value is number {
  if (typeof value !== "number" || !Number.isFinite(value) || value < min || value > max) {
    throw new EngineInputError(field, `${label} must be between ${min} and ${max}${unit ? " " + unit : ""}`);
  }
}

/** Throw unless `value` is one of `allowed`. */
export function requireOneOf<T extends string | number>(
  field: string,
  value: unknown,
  allowed: readonly T[],
  label: string,
): asserts value is T {
  if (!allowed.includes(value as T)) {
    throw new EngineInputError(field, `${label} must be one of ${allowed.join(", ")}`);
  }
}
