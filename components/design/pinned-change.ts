/**
 * Whether a pinned comment's field has changed, for the editor in the browser: tiny and import-free
 * (beyond a type) so the editor's bundle does not grow with the label and value tables.
 */
import type { DiffValue } from "./revision-diff";

export const sameValue = (a: DiffValue, b: DiffValue) => (typeof a === "number" && typeof b === "number" ? Math.abs(a - b) < 1e-9 : a === b);

/** A form value as the revision diff stores it: lists as "12, 18, 24", blanks as null. */
export function comparable(value: unknown): DiffValue {
  if (Array.isArray(value)) return value.join(", ");
  if (value === undefined || value === "" || (typeof value === "number" && Number.isNaN(value))) return null;
  return value as DiffValue;
}

/** The value typed in the editor differs from the one the comment was made on. */
export function changedSince(valueThen: DiffValue, typed: unknown): boolean {
  return !sameValue(valueThen, comparable(typed));
}
