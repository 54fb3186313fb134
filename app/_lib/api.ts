import { AccessError, ConflictError, validationIssues, ValidationError, type FieldIssue } from "./errors";
import { assertNoControlCharacters, guardRequest, isConnectionFailure, readLimitedText, RequestError, ServiceUnavailableError, type GuardOptions } from "./request-guards";

/** One problem in an API answer: `{ errors: [{ path, message }] }`. */
export type FieldError = FieldIssue;
// Kept here for callers that import them beside apiRoute; they live in ./errors.
export { ConflictError, ValidationError };

export function errorResponse(status: number, errors: FieldError[]): Response {
  return Response.json({ errors }, { status });
}

/** Reads a JSON body; a body that is not JSON is a 422 naming the body, not a 500. */
export async function readJson(request: Request): Promise<unknown> {
  const text = await readLimitedText(request); // 413 past 1 MB, before parsing
  let value: unknown;
  try {
    value = JSON.parse(text);
  } catch {
    throw ValidationError.field("", "The request body must be JSON.");
  }
  assertNoControlCharacters(value); // 422 naming the field (NUL cannot be stored)
  return value;
}

/**
 * The one mapper from the error vocabulary (./errors) to JSON: access failures become 401/403/404,
 * invalid input 422 with `{ errors: [{ path, message }] }`, conflicts 409; anything else is a
 * logged 500 that leaks nothing.
 */
export function apiErrorResponse(error: unknown): Response {
  if (error instanceof RequestError) return errorResponse(error.status, [{ path: error.path, message: error.message }]);
  // The database (or another service) is down: say so with a 503 rather than a 500.
  if (isConnectionFailure(error)) return errorResponse(503, [{ path: "", message: new ServiceUnavailableError("The database").message }]);
  if (error instanceof AccessError) return errorResponse(error.status, [{ path: "", message: error.message }]);
  const issues = validationIssues(error);
  if (issues) return errorResponse(422, issues);
  if (error instanceof ConflictError) return Response.json({ errors: [{ path: "", message: error.message }], ...error.detail }, { status: 409 });
  console.error(error);
  return errorResponse(500, [{ path: "", message: "Something went wrong on our side; nothing was changed. Try again." }]);
}

type Handler<C> = (request: Request, context: C) => Promise<Response>;

/** Wraps a route handler so every failure is answered by apiErrorResponse. */
export function apiRoute<C = unknown>(handler: Handler<C>, guard: GuardOptions = {}): Handler<C> {
  return async (request, context) => {
    try {
      guardRequest(request, guard); // origin, content type and body size (request-guards.ts)
      return await handler(request, context);
    } catch (error) {
      return apiErrorResponse(error);
    }
  };
}
