/**
 * The one id check. Every id that arrives in a path, form or body is tested with this before it
 * reaches a query: PostgreSQL answers a malformed uuid with an error (a 500), and 36 dashes are
 * not an id. Callers treat a failed check as "not found".
 */
const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

export function isUuid(value: unknown): value is string {
  return typeof value === "string" && UUID.test(value);
}
