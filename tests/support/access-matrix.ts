/**
 * The machinery behind tests/app/access-matrix.test.ts: who the callers are, what a row says, how a
 * route handler or server action is called in-process, and how its outcome is read.
 *
 * A row names one exported HTTP method of an app/**\/route.ts or one exported function of an
 * app/**\/actions.ts, and the outcome expected for each caller. A row with side effects gives a
 * `setup(who)` that creates the owning organisation's data for that one call (fresh per caller, so
 * one caller's call cannot change another's) and returns the arguments, params or body.
 */
import fs from "node:fs";
import path from "node:path";
import { fileURLToPath } from "node:url";
import { actAs, outcomeOf } from "./next-context";

export const ROOT = fileURLToPath(new URL("../..", import.meta.url));

/** The callers: each demo role of the owning organisation (Example Ground-Mount Co.), a member of the other organisation, nobody. */
export const CALLERS = {
  admin: "admin@demo.pierwise.test",
  designer: "designer@demo.pierwise.test",
  engineer: "engineer@demo.pierwise.test",
  installer: "installer@demo.pierwise.test",
  other: "designer@other.pierwise.test", // admin + designer of the other organisation
  nobody: null,
  // Outside reviewing engineers (admin + engineer of their own firm): engaged and accepted on one demo
  // project (the seeded Aspen Hollow), engaged then revoked, never engaged (tests/support/engagement-fixtures.ts).
  engaged: "engineer@outside.pierwise.test",
  revoked: "revoked@outside.pierwise.test",
  unengaged: "unengaged@outside.pierwise.test",
} as const;
export type Who = keyof typeof CALLERS;
export const WHO = Object.keys(CALLERS) as Who[];

/**
 * An outcome: an HTTP status for route handlers; for server actions 200 (done), 422 (answered with a
 * message or field errors, nothing done), 403/404 (forbidden()/notFound()), or "→/path" for a redirect
 * (a signed-out caller of a protected action is sent to "→/login").
 */
export type Expected = 200 | 201 | 204 | 400 | 401 | 403 | 404 | 409 | 422 | 429 | `→/${string}`;
export const SIGN_IN = "→/login" as const;

/** What one call needs. Actions: `args` (default `[{}, new FormData()]`). Routes: `params`, `body`, `search`. */
export interface Call {
  args?: unknown[];
  params?: Record<string, string>;
  body?: unknown;
  search?: string;
}

export interface MatrixRow {
  /** Path from the repository root, e.g. "app/api/session/route.ts". */
  file: string;
  /** "GET", "POST"… for a route; the exported function's name for actions. */
  name: string;
  expect: Record<Who, Expected>;
  /** Creates what this one call needs (as the owning organisation) and returns its inputs. Runs before signing in as `who`. */
  setup?: (who: Who) => Promise<Call>;
}

/**
 * Expectations where only some callers succeed: members of the owning organisation without the role
 * get `member` (403), the other organisation's member gets `other` (404), nobody gets `nobody`.
 */
export function only(allowed: Partial<Record<Who, Expected>>, rest: { member?: Expected; other?: Expected; nobody?: Expected; outside?: Expected } = {}): Record<Who, Expected> {
  const member = rest.member ?? 403;
  // Outside engineers are another organisation to the contractor: like `other` unless a row says otherwise.
  const outside = rest.outside ?? allowed.other ?? rest.other ?? 404;
  return {
    engaged: allowed.engaged ?? outside,
    revoked: allowed.revoked ?? outside,
    unengaged: allowed.unengaged ?? outside,
    admin: allowed.admin ?? member,
    designer: allowed.designer ?? member,
    engineer: allowed.engineer ?? member,
    installer: allowed.installer ?? member,
    other: allowed.other ?? rest.other ?? 404,
    nobody: allowed.nobody ?? rest.nobody ?? 401,
  };
}

/** The same outcome for every caller (public routes and actions). */
export function everyone(outcome: Expected): Record<Who, Expected> {
  return { admin: outcome, designer: outcome, engineer: outcome, installer: outcome, other: outcome, nobody: outcome, engaged: outcome, revoked: outcome, unengaged: outcome };
}

/** `[prevState, formData]`, the arguments React's useActionState passes to an action. */
export function formArgs(fields: Record<string, string | string[]>): unknown[] {
  return [{}, toFormData(fields)];
}

export function toFormData(fields: Record<string, string | string[]>): FormData {
  const form = new FormData();
  for (const [key, value] of Object.entries(fields)) for (const v of [value].flat()) form.append(key, v);
  return form;
}

const METHODS = ["GET", "HEAD", "POST", "PUT", "PATCH", "DELETE", "OPTIONS"];

/** Every route handler method and server action in app/, read from the file system and the modules' exports. */
export async function discoverEndpoints(): Promise<{ file: string; name: string }[]> {
  const files = (fs.readdirSync(path.join(ROOT, "app"), { recursive: true }) as string[])
    .map((f) => path.join("app", f).split(path.sep).join("/"))
    .filter((f) => /(^|\/)(route|actions)\.tsx?$/.test(f))
    .sort();
  const found: { file: string; name: string }[] = [];
  for (const file of files) {
    const mod = (await import(path.join(ROOT, file))) as Record<string, unknown>;
    const isRoute = /\/route\.tsx?$/.test(file);
    for (const [name, value] of Object.entries(mod)) {
      if (typeof value !== "function") continue;
      if (isRoute && !METHODS.includes(name)) continue;
      found.push({ file, name });
    }
  }
  return found;
}

/** Runs one row as one caller and reads its outcome in the vocabulary of `Expected`. */
export async function callAs(row: Omit<MatrixRow, "expect">, who: Who): Promise<{ outcome: Expected | string; detail: string }> {
  const call = (await row.setup?.(who)) ?? {};
  await actAs(CALLERS[who]);
  const mod = (await import(path.join(ROOT, row.file))) as Record<string, (...args: unknown[]) => Promise<unknown>>;
  const fn = mod[row.name];
  if (typeof fn !== "function") throw new Error(`${row.file} does not export ${row.name}`);
  if (/\/route\.tsx?$/.test(row.file)) {
    const url = new URL(`/matrix${call.search ?? ""}`, "http://127.0.0.1");
    const hasBody = call.body !== undefined && !["GET", "HEAD"].includes(row.name);
    const request = new Request(url, {
      method: row.name,
      headers: hasBody ? { "content-type": "application/json" } : {},
      body: hasBody ? JSON.stringify(call.body) : undefined,
    });
    const response = (await fn(request, { params: Promise.resolve(call.params ?? {}) })) as Response;
    return { outcome: response.status as Expected, detail: (await response.text()).slice(0, 300) };
  }
  const outcome = await outcomeOf(() => fn(...(call.args ?? [{}, new FormData()])));
  if (outcome.kind === "redirect") return { outcome: `→${outcome.location.split("?")[0]}`, detail: outcome.location };
  if (outcome.kind === "status") return { outcome: outcome.status as Expected, detail: "" };
  const value = outcome.value as { ok?: boolean; message?: string; fieldErrors?: Record<string, unknown> } | undefined;
  const refused = value && typeof value === "object" && value.ok !== true && (value.message || Object.keys(value.fieldErrors ?? {}).length > 0);
  return { outcome: refused ? 422 : 200, detail: JSON.stringify(value ?? null).slice(0, 300) };
}
