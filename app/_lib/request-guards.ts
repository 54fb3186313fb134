import { env } from "./env";

/**
 * Checks every API request makes before its handler runs (called from apiRoute in api.ts):
 *
 * - Writes (POST, PUT, PATCH, DELETE) come only from the app's own origin. A browser names the
 *   page that sent a request in `Origin` (or, failing that, `Sec-Fetch-Site`); a page on another
 *   site, or on another port of this host, gets 403. Requests with neither header (scripts, API
 *   clients, curl) are not browsers acting for someone else and keep working.
 * - A write with a body sends JSON (`application/json`); anything else is 415, so a cross-site
 *   form or a `text/plain` fetch (which browsers send without asking first) is never parsed.
 *   The one upload route declares multipart instead and checks its form itself.
 * - A JSON body is at most MAX_JSON_BYTES: a larger declared length is refused with 413 before a
 *   byte is read, and a body without a declared length stops being read at the limit.
 */
export const MAX_JSON_BYTES = 1024 * 1024;
export const MAX_JSON_LABEL = "1 MB";

const WRITES = new Set(["POST", "PUT", "PATCH", "DELETE"]);

/** A refusal with an HTTP status that names what was wrong (`path` "" is the whole request/body). */
export class RequestError extends Error {
  constructor(readonly status: number, message: string, readonly path = "") {
    super(message);
  }
}

export interface GuardOptions {
  /** The body this route reads: JSON (the default) or multipart form data (uploads). */
  body?: "json" | "multipart";
}

function ownOrigins(request: Request): Set<string> {
  const origins = new Set<string>();
  try {
    origins.add(new URL(env.appUrl).origin);
  } catch {
    // A malformed APP_URL leaves only the request's own origin.
  }
  try {
    origins.add(new URL(request.url).origin);
  } catch {
    // Next always gives an absolute URL; nothing to add otherwise.
  }
  return origins;
}

/** Throws a RequestError when the request must not reach its handler. */
export function guardRequest(request: Request, options: GuardOptions = {}): void {
  if (!WRITES.has(request.method.toUpperCase())) return;
  const origin = request.headers.get("origin");
  if (origin !== null) {
    if (!ownOrigins(request).has(origin)) throw new RequestError(403, "This request came from another site or port; Pierwise accepts changes only from its own pages.");
  } else {
    const site = request.headers.get("sec-fetch-site");
    if (site !== null && site !== "same-origin" && site !== "none") throw new RequestError(403, "This request came from another site or port; Pierwise accepts changes only from its own pages.");
  }
  const hasBody = Number(request.headers.get("content-length") ?? 0) > 0 || request.headers.has("transfer-encoding") || (request.body !== null && !request.headers.has("content-length"));
  if (!hasBody) return;
  const type = (request.headers.get("content-type") ?? "").split(";")[0].trim().toLowerCase();
  // The upload route reads multipart itself, after its access checks, and names the field when the body is not a form.
  if (options.body === "multipart") return;
  if (type !== "application/json" && !/^application\/[a-z0-9.+-]+\+json$/.test(type)) {
    throw new RequestError(415, "Send the request body as JSON, with Content-Type: application/json.");
  }
  if (Number(request.headers.get("content-length") ?? 0) > MAX_JSON_BYTES) throw tooLarge();
}

const tooLarge = () => new RequestError(413, `The request body is larger than ${MAX_JSON_LABEL}; send at most ${MAX_JSON_LABEL} of JSON.`);

/** The body as text, reading no further than MAX_JSON_BYTES (a body without a declared length included). */
export async function readLimitedText(request: Request): Promise<string> {
  if (Number(request.headers.get("content-length") ?? 0) > MAX_JSON_BYTES) throw tooLarge();
  if (!request.body) return "";
  const reader = request.body.getReader();
  const chunks: Uint8Array[] = [];
  let total = 0;
  for (;;) {
    const { done, value } = await reader.read();
    if (done) break;
    total += value.byteLength;
    if (total > MAX_JSON_BYTES) {
      await reader.cancel().catch(() => undefined);
      throw tooLarge();
    }
    chunks.push(value);
  }
  return new TextDecoder("utf-8", { fatal: false }).decode(Buffer.concat(chunks));
}

// eslint-disable-next-line no-control-regex
const CONTROL = /[\u0000-\u0008\u000b\u000c\u000e-\u001f\u007f]/;

/** The one test for control characters (other than tab and line breaks), for JSON bodies and form posts alike. */
export function hasControlCharacters(text: string): boolean {
  return CONTROL.test(text);
}

export const CONTROL_CHARACTERS_MESSAGE = "Must not contain control characters (such as NUL); remove them and send again.";

/**
 * Every string in a JSON body, keys included, free of control characters other than tab and
 * line breaks: PostgreSQL cannot store NUL in text, and none of the others belongs in a field.
 * Throws a 422 naming the first field that has one.
 */
export function assertNoControlCharacters(value: unknown, path: string[] = [], depth = 0): void {
  if (depth > 64) throw new RequestError(422, "The request body is nested too deeply.");
  if (typeof value === "string") {
    if (CONTROL.test(value)) throw new RequestError(422, CONTROL_CHARACTERS_MESSAGE, path.join("."));
    return;
  }
  if (Array.isArray(value)) {
    value.forEach((v, i) => assertNoControlCharacters(v, [...path, String(i)], depth + 1));
    return;
  }
  if (value && typeof value === "object") {
    for (const [k, v] of Object.entries(value)) {
      if (CONTROL.test(k)) throw new RequestError(422, "Field names must not contain control characters.", path.join("."));
      assertNoControlCharacters(v, [...path, k], depth + 1);
    }
  }
}

/** How long a call to the file store or the mail server may take before the request gives up. */
export const SERVICE_TIMEOUT_MS = 10_000;

/** A service the app depends on (database, file store, mail) is down or too slow: 503, nothing to fix in the input. */
export class ServiceUnavailableError extends RequestError {
  constructor(what: string) {
    super(503, `${what} is not answering right now; nothing was changed. Try again in a minute.`);
  }
}

/** Runs a call to a service with a deadline; failure to connect or to answer in time becomes a 503. */
export async function withDeadline<T>(what: string, run: (signal: AbortSignal) => Promise<T>): Promise<T> {
  const signal = AbortSignal.timeout(SERVICE_TIMEOUT_MS);
  // Raced against the deadline too, for clients that ignore the signal.
  const deadline = new Promise<never>((_, reject) => signal.addEventListener("abort", () => reject(signal.reason), { once: true }));
  try {
    return await Promise.race([run(signal), deadline]);
  } catch (error) {
    if (signal.aborted || isConnectionFailure(error)) throw new ServiceUnavailableError(what);
    throw error;
  }
}

/** Errors that mean "could not reach it", from Node sockets, the S3 client, nodemailer, pg and knex's pool. */
export function isConnectionFailure(error: unknown): boolean {
  const e = error as { code?: string; name?: string; message?: string } | null;
  if (!e) return false;
  if (["ECONNREFUSED", "ECONNRESET", "ETIMEDOUT", "EHOSTUNREACH", "ENOTFOUND", "EPIPE", "ESOCKET", "ECONNECTION", "ETIMEOUT", "57P01", "57P02", "57P03", "53300"].includes(e.code ?? "")) return true;
  if (e.name === "KnexTimeoutError" || e.name === "TimeoutError" || e.name === "AbortError") return true;
  return /Connection terminated|connect ECONNREFUSED|the database system is (starting up|shutting down)/i.test(e.message ?? "");
}
