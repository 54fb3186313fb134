/**
 * The access matrix: every route handler (each exported method of app/**\/route.ts) and every server
 * action (each exported function of app/**\/actions.ts), called in-process as each demo role of the
 * owning organisation, a member of the other organisation, and nobody.
 *
 * ADDING A ROUTE OR ACTION: add one row to MATRIX below (keep rows grouped by area). The first test
 * fails while any route or action is missing from it. Give a row a `setup(who)` when the call needs
 * data (create it for the demo organisation, fresh for each call) or changes something; it returns
 * `{ args }` for an action or `{ params, body, search }` for a route. Outcomes are explained at
 * `Expected` in tests/support/access-matrix.ts; `only({ admin: 200 })` means admin succeeds, other
 * demo members get 403, the other organisation 404, nobody 401 (pass `{ nobody: SIGN_IN }` for actions).
 */
import { afterAll, describe, expect, it } from "vitest";
import { db } from "@/db/client";
import { DEMO_PASSWORD } from "@/db/seeds/01_demo_accounts";
import { CALLERS, SIGN_IN, WHO, callAs, discoverEndpoints, everyone, formArgs, only, type MatrixRow } from "../support/access-matrix";

const MEMBERS = { admin: 200, designer: 200, engineer: 200, installer: 200, other: 200, nobody: 401 } as const;

const MATRIX: MatrixRow[] = [
  // ── foundation ───────────────────────────────────────────────────────────────────────────────
  { file: "app/api/health/route.ts", name: "GET", expect: everyone(200) },

  // ── sessions (issue 4) ───────────────────────────────────────────────────────────────────────
  { file: "app/api/session/route.ts", name: "GET", expect: MEMBERS },
  {
    file: "app/api/session/route.ts", name: "POST", expect: everyone(200),
    setup: async () => ({ body: { email: CALLERS.installer, password: DEMO_PASSWORD } }),
  },
  { file: "app/api/session/route.ts", name: "DELETE", expect: everyone(200) },
  {
    file: "app/(auth)/login/actions.ts", name: "signInAction", expect: everyone("→/projects"),
    setup: async () => ({ args: formArgs({ email: CALLERS.installer, password: DEMO_PASSWORD, next: "" }) }),
  },
  { file: "app/(auth)/login/actions.ts", name: "signOutAction", expect: everyone(SIGN_IN), setup: async () => ({ args: [] }) },
];

afterAll(async () => {
  await db("sign_in_failures").delete();
});

describe("access matrix", () => {
  it("lists every route handler and server action in app/ (add a row to MATRIX for a new one)", async () => {
    const found = await discoverEndpoints();
    const key = (e: { file: string; name: string }) => `${e.file} ${e.name}`;
    const listed = new Set(MATRIX.map(key));
    const missing = found.map(key).filter((k) => !listed.has(k));
    expect(missing, "routes/actions with no row in MATRIX").toEqual([]);
    const stale = MATRIX.map(key).filter((k) => !found.some((f) => key(f) === k));
    expect(stale, "rows in MATRIX for routes/actions that no longer exist").toEqual([]);
    expect(new Set(MATRIX.map(key)).size, "each route/action is listed once").toBe(MATRIX.length);
  });

  for (const row of MATRIX) {
    describe(`${row.file} ${row.name}`, () => {
      for (const who of WHO) {
        it(`as ${who} → ${row.expect[who]}`, async () => {
          const { outcome, detail } = await callAs(row, who);
          expect(outcome, `${row.file} ${row.name} as ${who}: ${detail}`).toBe(row.expect[who]);
        });
      }
    });
  }
});
