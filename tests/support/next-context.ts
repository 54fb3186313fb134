/**
 * Runs route handlers and server actions in-process, as Next would for one request: a cookie jar
 * and request headers behind `next/headers`, a no-op `next/cache`, and helpers to sign in as a
 * demo person and to read what a redirect/forbidden/notFound call meant.
 * Loaded as a setup file of the integration project (tests/vitest.config.ts).
 */
import { sealData } from "iron-session";
import { vi } from "vitest";
import { isValidElement } from "react";
import { AccessRefused } from "@/components/ui/access-refused";

type Cookie = { name: string; value: string; options?: { secure?: boolean; httpOnly?: boolean; sameSite?: string } };
const jar = new Map<string, Cookie>();
const requestHeaders = new Map<string, string>();

const cookieStore = {
  get: (name: string) => jar.get(name),
  getAll: () => [...jar.values()],
  has: (name: string) => jar.has(name),
  set: (name: string | Cookie, value?: string, options?: { maxAge?: number } & Cookie["options"]) => {
    const cookie = typeof name === "string" ? { name, value: value ?? "", options } : name;
    if (options?.maxAge === 0 || cookie.value === "") jar.delete(cookie.name);
    else jar.set(cookie.name, cookie);
  },
  delete: (name: string) => jar.delete(name),
};

vi.mock("next/headers", () => ({
  cookies: async () => cookieStore,
  headers: async () => new Headers([...requestHeaders.entries()]),
}));

// next.config's experimental.authInterrupts, which `next build` passes to forbidden()/unauthorized().
process.env.__NEXT_EXPERIMENTAL_AUTH_INTERRUPTS = "true";

vi.mock("next/cache", () => ({
  revalidatePath: () => undefined,
  revalidateTag: () => undefined,
  unstable_cache: <T>(fn: T) => fn,
}));

/** Forget the signed-in user and start a fresh "request" from the given address (and with any extra request headers). */
export function resetRequest(options: { ip?: string; headers?: Record<string, string> } = {}): void {
  jar.clear();
  requestHeaders.clear();
  requestHeaders.set("x-forwarded-for", options.ip ?? "203.0.113.10");
  // The socket address the server's preload would stamp (db/lib/peer-address.cjs): the address requestIp() trusts.
  requestHeaders.set("x-pierwise-peer-address", options.ip ?? "203.0.113.10");
  for (const [name, value] of Object.entries(options.headers ?? {})) requestHeaders.set(name.toLowerCase(), value);
}
resetRequest();

export function sessionCookie(): string | undefined {
  return jar.get("pierwise_session")?.value;
}

/** The attributes the app last set the session cookie with (Secure, HttpOnly, SameSite). */
export function sessionCookieOptions(): Cookie["options"] {
  return jar.get("pierwise_session")?.options;
}

/** Signs in as a user by e-mail without going through the password check (for access tests). */
export async function actAs(email: string | null): Promise<void> {
  resetRequest();
  if (!email) return;
  const { db } = await import("@/db/client");
  const row = await db("users as u")
    .join("memberships as m", "m.user_id", "u.id")
    .where("u.email", email)
    .orderBy("m.created_at", "asc") // the first organisation joined, as sign-in picks it
    .first("u.id as userId", "m.organisation_id as organisationId");
  if (!row) throw new Error(`no such test user: ${email}`);
  const { sessionOptions } = await import("@/app/_lib/session");
  const options = sessionOptions();
  // Sessions are server-side records the cookie points at (app/_lib/start-session.ts).
  const { openSession } = await import("@/db/queries/sessions");
  const sessionId = await openSession({ userId: row.userId, organisationId: row.organisationId, ttlSeconds: options.ttl ?? 43_200, ip: null, userAgent: "test" });
  const seal = await sealData({ userId: row.userId, organisationId: row.organisationId, sessionId, signedInAt: Date.now() }, { password: options.password, ttl: options.ttl });
  jar.set(options.cookieName, { name: options.cookieName, value: seal });
}

export type Outcome<T> =
  | { kind: "value"; value: T }
  | { kind: "redirect"; location: string }
  | { kind: "status"; status: number };

/** What a server action or page loader ended in: a value, a redirect, or a 401/403/404 interrupt. */
export async function outcomeOf<T>(run: () => Promise<T>): Promise<Outcome<T>> {
  try {
    const value = await run();
    // A page's 404/403 is the <AccessRefused> it renders (app/_lib/page-access.tsx `refusable`), which Next turns into the status.
    if (isValidElement(value) && value.type === AccessRefused) return { kind: "status", status: (value.props as { status: number }).status };
    return { kind: "value", value };
  } catch (error) {
    const digest = (error as { digest?: string }).digest ?? "";
    if (digest.startsWith("NEXT_REDIRECT")) return { kind: "redirect", location: digest.split(";")[2] ?? "" };
    const fallback = digest.match(/^NEXT_HTTP_ERROR_FALLBACK;(\d+)/);
    if (fallback) return { kind: "status", status: Number(fallback[1]) };
    throw error;
  }
}

export function jsonRequest(method: string, url: string, body?: unknown): Request {
  return new Request(new URL(url, "http://127.0.0.1"), {
    method,
    headers: { "content-type": "application/json" },
    body: body === undefined ? undefined : typeof body === "string" ? body : JSON.stringify(body),
  });
}

/** Route handler context for dynamic segments, as Next 16 passes it. */
export function params<P extends Record<string, string>>(values: P): { params: Promise<P> } {
  return { params: Promise.resolve(values) };
}
