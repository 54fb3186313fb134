/**
 * Leftovers of the hardening issue's finding 6, read from the proxy that sets every answer's
 * security headers:
 * - HSTS (RFC 6797) is sent only when the person reached the app over https: the app's URL is
 *   https, or a trusted proxy (TRUSTED_PROXIES) terminated TLS and said so in X-Forwarded-Proto —
 *   the same rule as the session cookie's Secure flag. The header from anyone else counts for nothing.
 * - Every page whose URL carries a secret (e-mailed single-use links, the approval check's code)
 *   answers `Referrer-Policy: no-referrer` (W3C Referrer Policy §3.1), found from the route folders
 *   so that a new token page cannot be forgotten.
 */
import fs from "node:fs";
import path from "node:path";
import { NextRequest } from "next/server";
import { afterEach, describe, expect, it } from "vitest";
import { PEER_HEADER } from "@/app/_lib/request-ip";
import { proxy } from "@/proxy";

const realAppUrl = process.env.APP_URL;
afterEach(() => {
  delete process.env.TRUSTED_PROXIES;
  process.env.APP_URL = realAppUrl;
});

function answer(pathname: string, headers: Record<string, string> = {}) {
  return proxy(new NextRequest(`http://127.0.0.1:3000${pathname}`, { headers })).headers;
}

const hsts = (headers: Record<string, string>, pathname = "/login") => answer(pathname, headers).get("strict-transport-security");

describe("HSTS follows the request's real scheme", () => {
  it("is sent behind a trusted proxy that terminated TLS, on pages and API answers", () => {
    process.env.APP_URL = "http://127.0.0.1:3000";
    process.env.TRUSTED_PROXIES = "10.0.0.1";
    const viaProxy = { [PEER_HEADER]: "::ffff:10.0.0.1", "x-forwarded-proto": "https", "x-forwarded-for": "192.0.2.40" };
    expect(hsts(viaProxy)).toMatch(/^max-age=\d+/);
    expect(hsts(viaProxy, "/api/health")).toMatch(/^max-age=\d+/);
    // Only the entry the nearest proxy wrote (the last) counts.
    expect(hsts({ ...viaProxy, "x-forwarded-proto": "http, https" })).toMatch(/^max-age=\d+/);
  });

  it("is never turned on by a header from a caller that is not a trusted proxy", () => {
    process.env.APP_URL = "http://127.0.0.1:3000";
    expect(hsts({ [PEER_HEADER]: "192.0.2.41", "x-forwarded-proto": "https" })).toBeNull();
    process.env.TRUSTED_PROXIES = "10.0.0.1";
    expect(hsts({ [PEER_HEADER]: "192.0.2.41", "x-forwarded-proto": "https" })).toBeNull();
    // Without the socket's address (a development server without the preload) nothing is trusted.
    expect(hsts({ "x-forwarded-proto": "https" })).toBeNull();
    // The trusted proxy itself says plain http, or a client put https in front of its entry.
    expect(hsts({ [PEER_HEADER]: "10.0.0.1", "x-forwarded-proto": "http" })).toBeNull();
    expect(hsts({ [PEER_HEADER]: "10.0.0.1", "x-forwarded-proto": "https, http" })).toBeNull();
  });

  it("is sent when the app's URL is https, and a client cannot talk it out of it", () => {
    process.env.APP_URL = "https://pierwise.example.test";
    expect(hsts({})).toMatch(/^max-age=\d+/);
    expect(hsts({ [PEER_HEADER]: "192.0.2.42", "x-forwarded-proto": "http" })).toMatch(/^max-age=\d+/);
  });
});

/** Every page route under app/, as a URL pattern with its dynamic segments (route groups dropped). */
function pageRoutes(): { route: string; dynamic: string[] }[] {
  const appDir = path.join(process.cwd(), "app");
  const found: { route: string; dynamic: string[] }[] = [];
  const walk = (dir: string, segments: string[]) => {
    for (const entry of fs.readdirSync(dir, { withFileTypes: true })) {
      if (entry.isDirectory()) {
        if (entry.name.startsWith("_") || entry.name === "api") continue;
        walk(path.join(dir, entry.name), /^\(.*\)$/.test(entry.name) ? segments : [...segments, entry.name]);
      } else if (entry.name === "page.tsx") {
        found.push({ route: `/${segments.join("/")}`, dynamic: segments.filter((s) => s.startsWith("[")).map((s) => s.slice(1, -1)) });
      }
    }
  };
  walk(appDir, []);
  return found;
}

/** A dynamic segment named for a record id (a uuid checked for access) carries no secret; anything else does. */
const RECORD_ID = /Id$/;

describe("pages with a secret in their URL send no referrer", () => {
  const routes = pageRoutes();
  const tokenRoutes = routes.filter((r) => r.dynamic.some((name) => !RECORD_ID.test(name)));

  it("finds the token pages: the e-mailed links and the approval check", () => {
    // Each is a link the app sends or prints: services/password-reset.ts, members.ts (invitation),
    // sign-up.ts, engagements.ts, review/verify.ts. A new one fails here until it is judged.
    expect(tokenRoutes.map((r) => r.route).sort()).toEqual([
      "/engagements/[token]", "/invite/[token]", "/reset/[token]", "/signup/[token]", "/verify/[code]",
    ]);
  });

  it("every token page answers Referrer-Policy: no-referrer, with and without a trailing slash", () => {
    const secret = "k3Zp9xQ-secret_Token";
    for (const { route } of tokenRoutes) {
      const url = route.replace(/\[[^\]]+\]/g, secret);
      expect(answer(url).get("referrer-policy"), url).toBe("no-referrer");
      expect(answer(`${url}/`).get("referrer-policy"), `${url}/`).toBe("no-referrer");
    }
  });

  it("pages keyed by record ids keep same-origin referrers (the list is not everything)", () => {
    const id = "00000000-0000-4000-8000-000000000001";
    const others = routes.filter((r) => !tokenRoutes.includes(r));
    expect(others.length).toBeGreaterThan(10);
    for (const { route } of others) {
      const url = route.replace(/\[[^\]]+\]/g, id);
      expect(answer(url).get("referrer-policy"), url).toBe("same-origin");
    }
  });
});
