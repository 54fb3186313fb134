/**
 * Hardening finding 11: the session cookie carries `Secure` whenever the app is reached over
 * https: the app's URL setting is https, or a trusted proxy (TRUSTED_PROXIES) terminated TLS and
 * said so in X-Forwarded-Proto. The header counts only from a trusted proxy. `Secure` keeps the
 * browser from sending the cookie over plain http (RFC 6265 §4.1.2.5).
 */
import { afterEach, beforeEach, describe, expect, it } from "vitest";
import { POST } from "@/app/api/session/route";
import { servedOverHttps, PEER_HEADER } from "@/app/_lib/request-ip";
import { db } from "@/db/client";
import { FRESH_PASSWORD, freshMember } from "../support/accounts";
import { jsonRequest, resetRequest, sessionCookie, sessionCookieOptions } from "../support/next-context";

const realAppUrl = process.env.APP_URL;
beforeEach(async () => {
  await db("sign_in_failures").delete();
});
afterEach(() => {
  delete process.env.TRUSTED_PROXIES;
  process.env.APP_URL = realAppUrl;
});

/** Signs a fresh member in through POST /api/session with the given request headers; the cookie's attributes. */
async function signInWith(ip: string, headers: Record<string, string> = {}) {
  const { email } = await freshMember();
  resetRequest({ ip, headers });
  const response = await POST(jsonRequest("POST", "/api/session", { email, password: FRESH_PASSWORD }), {});
  expect(response.status).toBe(200);
  expect(sessionCookie()).toBeTruthy();
  return sessionCookieOptions();
}

describe("the session cookie under https", () => {
  it("is Secure behind a trusted proxy that terminated TLS, and HttpOnly, SameSite=Lax always", async () => {
    process.env.TRUSTED_PROXIES = "10.0.0.1";
    const options = await signInWith("10.0.0.1", { "x-forwarded-proto": "https", "x-forwarded-for": "192.0.2.30" });
    expect(options).toMatchObject({ secure: true, httpOnly: true, sameSite: "lax" });
  });

  it("is Secure when the app's URL is https", async () => {
    process.env.APP_URL = "https://pierwise.example.test";
    expect(await signInWith("192.0.2.31")).toMatchObject({ secure: true });
  });

  it("ignores X-Forwarded-Proto from a caller that is not a trusted proxy, and over plain http is not Secure", async () => {
    expect(await signInWith("192.0.2.32", { "x-forwarded-proto": "https" })).toMatchObject({ secure: false });
    process.env.TRUSTED_PROXIES = "10.0.0.1";
    expect(await signInWith("192.0.2.33", { "x-forwarded-proto": "https" })).toMatchObject({ secure: false });
    // Through the trusted proxy over plain http: not Secure (the browser would drop a Secure cookie on http).
    expect(await signInWith("10.0.0.1", { "x-forwarded-proto": "http" })).toMatchObject({ secure: false });
  });

  it("reads only the entry the trusted proxy wrote (the last), not one the client put in front", () => {
    process.env.TRUSTED_PROXIES = "10.0.0.1";
    const via = (proto: string, peer = "::ffff:10.0.0.1") => servedOverHttps(new Headers({ [PEER_HEADER]: peer, "x-forwarded-proto": proto }), "http://127.0.0.1:3000");
    expect(via("https")).toBe(true);
    expect(via("HTTPS")).toBe(true);
    expect(via("https, http")).toBe(false);
    expect(via("http, https")).toBe(true);
    expect(via("https", "10.0.0.2")).toBe(false);
    expect(servedOverHttps(new Headers({ "x-forwarded-proto": "https" }), "http://127.0.0.1:3000")).toBe(false); // no socket address: a dev server
  });
});
