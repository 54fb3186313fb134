/**
 * Finding 3 of the hardening issue: sign-in throttling that an attacker can neither dodge nor
 * turn against a real person. Addresses come from the socket (X-Forwarded-For only through a
 * trusted proxy); attempts are counted atomically; failures on one account block only that
 * account from that address; past the account-wide ceiling the owner is e-mailed and a correct
 * password from an address without failures still works. Limits: db/queries/sign-in-throttle.ts
 * THROTTLE, the product's choice [common practice].
 */
import http from "node:http";
import { createRequire } from "node:module";
import { afterEach, beforeEach, describe, expect, it } from "vitest";
import { POST } from "@/app/api/session/route";
import { clientAddress, PEER_HEADER } from "@/app/_lib/request-ip";
import { db } from "@/db/client";
import { THROTTLE } from "@/db/queries/sign-in-throttle";
import { FRESH_PASSWORD, freshMember } from "../support/accounts";
import { mailTo } from "../support/mailbox";
import { jsonRequest, resetRequest } from "../support/next-context";

beforeEach(async () => {
  await db("sign_in_failures").delete();
});
afterEach(() => {
  delete process.env.TRUSTED_PROXIES;
});

const attempt = async (ip: string, email: string, password: string) => {
  resetRequest({ ip });
  return (await POST(jsonRequest("POST", "/api/session", { email, password }), {})).status;
};

describe("the caller's address", () => {
  it("is the socket's: a rotating X-Forwarded-For changes nothing unless the socket is a trusted proxy", () => {
    for (let i = 0; i < 5; i++) {
      expect(clientAddress(new Headers({ [PEER_HEADER]: "203.0.113.5", "x-forwarded-for": `198.51.100.${i}` }))).toBe("203.0.113.5");
    }
    expect(clientAddress(new Headers({ "x-forwarded-for": "198.51.100.1" }))).toBe("local");
    process.env.TRUSTED_PROXIES = "10.0.0.1";
    // The proxy appends the address it saw; anything to the left was written by the client.
    expect(clientAddress(new Headers({ [PEER_HEADER]: "::ffff:10.0.0.1", "x-forwarded-for": "6.6.6.6, 192.0.2.44" }))).toBe("192.0.2.44");
    expect(clientAddress(new Headers({ [PEER_HEADER]: "192.0.2.9", "x-forwarded-for": "6.6.6.6" }))).toBe("192.0.2.9");
  });

  it("is stamped by the server preload over any copy the client sent", async () => {
    createRequire(import.meta.url)("../../db/lib/peer-address.cjs");
    const server = http.createServer((req, res) => res.end(String(req.headers[PEER_HEADER])));
    await new Promise<void>((resolve) => server.listen(0, "127.0.0.1", resolve));
    const { port } = server.address() as { port: number };
    const seen = await (await fetch(`http://127.0.0.1:${port}/`, { headers: { [PEER_HEADER]: "6.6.6.6" } })).text();
    server.close();
    expect(seen).toMatch(/^(::ffff:)?127\.0\.0\.1$/);
  });
});

describe("sign-in throttling", () => {
  it("counts 30 parallel wrong passwords one by one: no more than the limit get through to the check", async () => {
    const { email } = await freshMember();
    resetRequest({ ip: "192.0.2.70" });
    const statuses = await Promise.all(Array.from({ length: 30 }, () => POST(jsonRequest("POST", "/api/session", { email, password: "wrong-password" }), {}).then((r) => r.status)));
    expect(statuses.filter((s) => s === 401)).toHaveLength(THROTTLE.perEmail);
    expect(statuses.filter((s) => s === 429)).toHaveLength(30 - THROTTLE.perEmail);
  });

  it("failures on one account never block another account, nor the same account from another address", async () => {
    const victim = await freshMember();
    const bystander = await freshMember();
    for (let i = 0; i < THROTTLE.perEmail; i++) expect(await attempt("192.0.2.80", victim.email, "wrong-password")).toBe(401);
    expect(await attempt("192.0.2.80", victim.email, FRESH_PASSWORD)).toBe(429);
    // The same shared address signs a different person in.
    expect(await attempt("192.0.2.80", bystander.email, FRESH_PASSWORD)).toBe(200);
    // The real owner, elsewhere, is not locked out by someone else's guesses.
    expect(await attempt("192.0.2.81", victim.email, FRESH_PASSWORD)).toBe(200);
  });

  it("past the account-wide ceiling: the owner is e-mailed once, guessing addresses wait, a clean address still signs in", async () => {
    const { email } = await freshMember();
    // Failures from many addresses, one each (a spread-out guessing attack).
    await db("sign_in_failures").insert(Array.from({ length: THROTTLE.perAccountCeiling }, (_, i) => ({ email, ip: `198.18.${Math.floor(i / 200)}.${i % 200}` })));
    expect(await attempt("198.18.0.1", email, "wrong-again")).toBe(429);
    expect(await attempt("192.0.2.90", email, "one-wrong-guess")).toBe(401);
    expect(await attempt("192.0.2.90", email, FRESH_PASSWORD)).toBe(429);
    expect(await attempt("192.0.2.91", email, "another-wrong-guess")).toBe(401);
    expect((await mailTo(email, { subject: /Many failed sign-ins/ })).subject).toMatch(/Many failed sign-ins/);
    expect(await db("audit_events").where({ action: "sign-in-attack-warned", subject: email })).toHaveLength(1);
    expect(await attempt("192.0.2.99", email, FRESH_PASSWORD)).toBe(200);
  });
});
