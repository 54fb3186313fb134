/**
 * On a real `next start` (the socket's address stamped by db/lib/peer-address.cjs, read by proxy.ts):
 * a server whose TRUSTED_PROXIES names the caller takes that caller's `X-Forwarded-Proto: https`
 * for https, so it sends `Strict-Transport-Security` (RFC 6797 §7.1) and a Secure session cookie
 * (RFC 6265 §4.1.2.5); the suite's own server, which trusts no proxy, ignores the same header.
 * Token pages answer `Referrer-Policy: no-referrer` (W3C Referrer Policy §3.1). Plain HTTP, no browser.
 */
import { spawn, type ChildProcess } from "node:child_process";
import path from "node:path";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { db } from "@/db/client";
import { freePort } from "@/db/lib/ports";
import { FRESH_PASSWORD, freshMember } from "../support/accounts";
import { waitForHttp } from "../support/runner";
import { baseUrl } from "../support/browser";

let proxied: ChildProcess | undefined;
let behindProxy: string;

beforeAll(async () => {
  const port = await freePort();
  behindProxy = `http://127.0.0.1:${port}`;
  // As behind a load balancer on this host: the loopback address is the trusted proxy.
  proxied = spawn(path.resolve("node_modules/.bin/next"), ["start", "-H", "127.0.0.1", "-p", String(port)], {
    env: { ...process.env, NODE_ENV: "production", APP_URL: behindProxy, TRUSTED_PROXIES: "127.0.0.1,::1" },
    stdio: ["ignore", "ignore", "inherit"],
  });
  await waitForHttp(`${behindProxy}/api/health`, 60_000);
}, 90_000);

afterAll(async () => {
  proxied?.kill("SIGTERM");
  await db.destroy();
});

const get = (server: string, route: string, headers: Record<string, string> = {}) => fetch(`${server}${route}`, { headers, redirect: "manual" });

describe("HSTS and Secure follow a trusted proxy's scheme on a real server", () => {
  it("behind the trusted proxy with X-Forwarded-Proto: https, pages and API answers carry HSTS", async () => {
    for (const route of ["/login", "/api/health"]) {
      const response = await get(behindProxy, route, { "x-forwarded-proto": "https" });
      expect(response.headers.get("strict-transport-security"), route).toMatch(/^max-age=\d+/);
      expect((await get(behindProxy, route)).headers.get("strict-transport-security"), `${route} over http`).toBeNull();
      expect((await get(behindProxy, route, { "x-forwarded-proto": "http" })).headers.get("strict-transport-security"), `${route} proxy says http`).toBeNull();
    }
  });

  it("the session cookie is Secure behind the trusted proxy over https", async () => {
    const { email } = await freshMember();
    const response = await fetch(`${behindProxy}/api/session`, {
      method: "POST", headers: { "content-type": "application/json", "x-forwarded-proto": "https" }, body: JSON.stringify({ email, password: FRESH_PASSWORD }),
    });
    expect(response.status).toBe(200);
    const cookie = response.headers.getSetCookie().find((c) => c.startsWith("pierwise_session="));
    expect(cookie).toMatch(/;\s*Secure/i);
  });

  it("a server that trusts no proxy ignores the same header", async () => {
    const response = await get(baseUrl(), "/login", { "x-forwarded-proto": "https" });
    expect(response.status).toBe(200);
    expect(response.headers.get("strict-transport-security")).toBeNull();
  });

  it("token pages answer no-referrer on the real server", async () => {
    for (const route of ["/engagements/not-a-real-token", "/invite/not-a-real-token", "/reset/not-a-real-token", "/signup/not-a-real-token", "/verify/not-a-real-code-0000"]) {
      expect((await get(baseUrl(), route)).headers.get("referrer-policy"), route).toBe("no-referrer");
    }
    expect((await get(baseUrl(), "/login")).headers.get("referrer-policy")).toBe("same-origin");
  });
});
