import type { ActionState } from "@/components/ui/action-state";
import { AccessError, ConflictError, validationIssues } from "./errors";
import { accessInterrupt } from "./page-access";
import { CONTROL_CHARACTERS_MESSAGE, hasControlCharacters } from "./request-guards";

/** A field's key in ActionState.fieldErrors: the dotted path without a trailing list index ("extraRoles.0" → "extraRoles"), "form" for the whole input. */
function fieldKey(path: string): string {
  return path.replace(/(\.\d+)+$/, "") || "form";
}

/**
 * The one mapper from the error vocabulary (./errors) to what a server action answers its form:
 * field errors beside the fields, a message in the status line, what was typed echoed back.
 * Access failures become the page responses (sign-in redirect, 404, 403 page), except a 403
 * whose reason the person must read (own design, licence), which is a message.
 */
export function actionState(error: unknown, values?: Record<string, string>, returnTo?: string): ActionState {
  const issues = validationIssues(error);
  if (issues) {
    const fieldErrors: Record<string, string[]> = {};
    for (const issue of issues) (fieldErrors[fieldKey(issue.path)] ??= []).push(issue.message);
    return { message: "Check the highlighted fields.", fieldErrors, values };
  }
  if (error instanceof ConflictError) return { message: error.message, values };
  if (error instanceof AccessError) {
    if (error.status === 403 && error.explained) return { message: error.message, values };
    accessInterrupt(error, returnTo);
  }
  throw error;
}

/**
 * A form post whose typed fields hold control characters (NUL cannot be stored; none belongs in a
 * field): the form state naming each such field, as the JSON API's 422 does; null when clean.
 * forAction applies it to every use case; actions that do not run through forAction call it first.
 */
export function controlCharacterState(values: Record<string, string>): ActionState | null {
  const fields = Object.keys(values).filter((k) => hasControlCharacters(values[k]) || hasControlCharacters(k));
  if (fields.length === 0) return null;
  const fieldErrors: Record<string, string[]> = {};
  for (const field of fields) fieldErrors[fieldKey(field)] = [CONTROL_CHARACTERS_MESSAGE];
  return { message: "Check the highlighted fields.", fieldErrors, values };
}

/** Runs a use case for a server action: its value, or the form state for an expected failure. */
export async function forAction<T>(run: () => Promise<T>, values?: Record<string, string>, returnTo?: string): Promise<{ ok: true; value: T } | { ok: false; state: ActionState }> {
  const refused = values ? controlCharacterState(values) : null;
  if (refused) return { ok: false, state: refused };
  try {
    return { ok: true, value: await run() };
  } catch (error) {
    return { ok: false, state: actionState(error, values, returnTo) };
  }
}
