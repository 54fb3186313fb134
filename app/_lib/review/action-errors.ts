import { ZodError } from "zod";
import { ConflictError } from "@/app/_lib/api";
import { AccessError } from "@/app/_lib/auth";
import type { ActionState } from "@/components/ui/action-state";

/**
 * Turns the expected failures of a review/field action into what its form shows: field errors
 * beside the fields, a message in the status line, and what was typed echoed back. Access errors
 * of the decision itself (licence, own design) are messages too: the engineer needs to read why.
 */
export function actionFailure(error: unknown, values: Record<string, string>): ActionState {
  if (error instanceof ZodError) {
    const fieldErrors: Record<string, string[]> = {};
    for (const issue of error.issues) (fieldErrors[issue.path.join(".") || "form"] ??= []).push(issue.message);
    return { message: "Check the highlighted fields.", fieldErrors, values };
  }
  if (error instanceof ConflictError) return { message: error.message, values };
  if (error instanceof AccessError && error.status === 403) return { message: error.message, values };
  throw error;
}
