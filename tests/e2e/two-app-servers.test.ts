/**
 * More than one app server on one database and one file store, as behind a load balancer: the
 * suite's `next start` (E2E_BASE_URL) and a second `next start` on another port, started here from
 * the same build with the same environment (DATABASE_URL, S3_*, SMTP_*, SESSION_SECRET). Pierwise
 * keeps no state in the web process, so a session, a save, the sign-in throttle and an upload made
 * through one server hold on the other. Plain HTTP, no browser.
 */
import { spawn, type ChildProcess } from "node:child_process";
import path from "node:path";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { twoPostDesignInput } from "@/engine";
import { db } from "@/db/client";
import { freePort } from "@/db/lib/ports";
import { THROTTLE } from "@/db/queries/sign-in-throttle";
import { FRESH_PASSWORD, freshMember } from "../support/accounts";
import { waitForHttp } from "../support/runner";
import { baseUrl } from "../support/browser";

let second: ChildProcess | undefined;
let serverA: string;
let serverB: string;
const throttledEmails: string[] = [];

beforeAll(async () => {
  serverA = baseUrl();
  const port = await freePort();
  serverB = `http://127.0.0.1:${port}`;
  second = spawn(path.resolve("node_modules/.bin/next"), ["start", "-H", "127.0.0.1", "-p", String(port)], {
    env: { ...process.env, NODE_ENV: "production", APP_URL: serverB },
    stdio: ["ignore", "ignore", "inherit"],
  });
  await waitForHttp(`${serverB}/api/health`, 60_000);
}, 90_000);

afterAll(async () => {
  second?.kill("SIGTERM");
  // The throttle rows of this test's own account only; nothing else is touched.
  if (throttledEmails.length) await db("sign_in_failures").whereIn("email", throttledEmails).delete();
  await db.destroy();
});

/** Signs in on one server and returns the session cookie it set. */
async function signIn(server: string, email: string, password: string): Promise<string> {
  const response = await fetch(`${server}/api/session`, { method: "POST", headers: { "content-type": "application/json" }, body: JSON.stringify({ email, password }) });
  expect(response.status).toBe(200);
  const cookie = response.headers.getSetCookie().find((c) => c.startsWith("pierwise_session="));
  expect(cookie).toBeDefined();
  return cookie!.split(";")[0];
}

function call(server: string, cookie: string, method: string, route: string, body?: unknown): Promise<Response> {
  return fetch(`${server}${route}`, {
    method,
    headers: { cookie, ...(body === undefined ? {} : { "content-type": "application/json" }) },
    body: body === undefined ? undefined : JSON.stringify(body),
  });
}

describe("two app servers on one database and one file store", () => {
  it("both servers answer health against the same database", async () => {
    for (const server of [serverA, serverB]) {
      expect(await (await fetch(`${server}/api/health`)).json()).toMatchObject({ ok: true, db: "up" });
    }
    expect(serverA).not.toBe(serverB);
  });

  it("a session made on one server works on the other, both ways", async () => {
    const { email } = await freshMember({ roles: ["designer"] });
    for (const [from, to] of [[serverA, serverB], [serverB, serverA]]) {
      const cookie = await signIn(from, email, FRESH_PASSWORD);
      const other = await call(to, cookie, "GET", "/api/session");
      expect(other.status).toBe(200);
      expect((await other.json()).user.email).toBe(email);
    }
  });

  it("a stale save on one server gets 409 against a save made on the other", async () => {
    const { email } = await freshMember({ roles: ["designer"] });
    const cookie = await signIn(serverA, email, FRESH_PASSWORD);
    const project = await (await call(serverA, cookie, "POST", "/api/projects", { name: `Two servers ranch ${Date.now()}`, state: "CO" })).json();
    const created = await call(serverA, cookie, "POST", `/api/projects/${project.project.id}/designs`, { name: "East array", input: twoPostDesignInput });
    expect(created.status).toBe(201);
    const { design, revisionId: first } = await created.json();

    const onB = await call(serverB, cookie, "POST", `/api/designs/${design.id}/revisions`, { baseRevisionId: first, input: { ...twoPostDesignInput, site: { ...twoPostDesignInput.site, windSpeedMph: 120 } }, note: "saved through server B" });
    expect(onB.status).toBe(201);
    const staleOnA = await call(serverA, cookie, "POST", `/api/designs/${design.id}/revisions`, { baseRevisionId: first, input: twoPostDesignInput, note: "saved through server A from the old base" });
    expect(staleOnA.status).toBe(409);
    expect((await staleOnA.json()).latestRevisionId).toBe((await onB.json()).revision.id);
  });

  it("sign-in throttling counts failures made on both servers", async () => {
    const { email } = await freshMember({ roles: ["installer"] });
    throttledEmails.push(email);
    // A fresh account, whose failure rows afterAll removes, so later suites' sign-ins are not held back.
    const attempt = (server: string, password: string) =>
      fetch(`${server}/api/session`, { method: "POST", headers: { "content-type": "application/json" }, body: JSON.stringify({ email, password }) });
    // THROTTLE.perEmail failures (db/queries/sign-in-throttle.ts), alternating servers: neither alone reaches the limit.
    for (let i = 0; i < THROTTLE.perEmail; i++) {
      expect((await attempt(i % 2 === 0 ? serverA : serverB, "not-the-password")).status).toBe(401);
    }
    // Now even the right password is held back on either server.
    for (const server of [serverA, serverB]) {
      const held = await attempt(server, FRESH_PASSWORD);
      expect(held.status).toBe(429);
      expect((await held.json()).errors[0].message).toMatch(/Too many failed sign-ins/);
    }
  });

  it("an upload through one server downloads through the other, byte for byte", async () => {
    const { email } = await freshMember({ roles: ["designer"] });
    const cookie = await signIn(serverB, email, FRESH_PASSWORD);
    const project = await (await call(serverB, cookie, "POST", "/api/projects", { name: `Two servers orchard ${Date.now()}`, state: "CO" })).json();
    const form = new FormData();
    form.set("file", new Blob([TINY_PNG], { type: "image/png" }), "site.png");
    form.set("description", "Uploaded through server B");
    const uploaded = await fetch(`${serverB}/api/projects/${project.project.id}/files`, { method: "POST", headers: { cookie }, body: form });
    expect(uploaded.status).toBe(201);
    const { file } = await uploaded.json();

    const download = await call(serverA, cookie, "GET", `/api/projects/${project.project.id}/files/${file.id}`);
    expect(download.status).toBe(200);
    expect(download.headers.get("content-type")).toBe("image/png");
    expect(Buffer.from(await download.arrayBuffer()).equals(TINY_PNG)).toBe(true);
  });
});

// A 1×1 PNG, made by hand for the upload.
const TINY_PNG = Buffer.from("iVBORw0KGgoAAAANSUhEUgAAAAEAAAABCAYAAAAfFcSJAAAADUlEQVR42mNkYPhfDwAChwGA60e6kgAAAABJRU5ErkJggg==", "base64");
