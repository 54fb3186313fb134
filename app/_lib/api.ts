import { ZodError } from "zod";
import { AccessError } from "./auth";
import { guardRequest, readLimitedText, RequestError, type GuardOptions } from "./request-guards";

export interface FieldError {
  path: string;
  message: string;
}

export function errorResponse(status: number, errors: FieldError[]): Response {
  return Response.json({ errors }, { status });
}

export function zodErrors(error: ZodError): FieldError[] {
  return error.issues.map((issue) => ({ path: issue.path.join("."), message: issue.message }));
}

/** Reads a JSON body; a body that is not JSON is a 422 naming the body, not a 500. */
export async function readJson(request: Request): Promise<unknown> {
  const text = await readLimitedText(request); // 413 past 1 MB, before parsing
  try {
    return JSON.parse(text);
  } catch {
    throw new ZodError([{ code: "custom", path: [], message: "The request body must be JSON.", input: undefined }]);
  }
}

/** A conflict the caller can resolve, e.g. saving against a revision that is no longer the latest. */
export class ConflictError extends Error {
  constructor(message: string, readonly detail: Record<string, unknown> = {}) {
    super(message);
  }
}

type Handler<C> = (request: Request, context: C) => Promise<Response>;

/**
 * Wraps a route handler: access failures become 401/403/404, invalid input 422 with
 * `{ errors: [{ path, message }] }`, conflicts 409; anything else is a logged 500.
 */
export function apiRoute<C = unknown>(handler: Handler<C>, guard: GuardOptions = {}): Handler<C> {
  return async (request, context) => {
    try {
      guardRequest(request, guard); // origin, content type and body size (request-guards.ts)
      return await handler(request, context);
    } catch (error) {
      if (error instanceof RequestError) return errorResponse(error.status, [{ path: error.path, message: error.message }]);
      if (error instanceof AccessError) return errorResponse(error.status, [{ path: "", message: error.message }]);
      if (error instanceof ZodError) return errorResponse(422, zodErrors(error));
      if (error instanceof ConflictError) return Response.json({ errors: [{ path: "", message: error.message }], ...error.detail }, { status: 409 });
      console.error(error);
      return errorResponse(500, [{ path: "", message: "Something went wrong on our side; nothing was changed. Try again." }]);
    }
  };
}
