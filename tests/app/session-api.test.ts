import { afterAll, beforeEach, describe, expect, it } from "vitest";
import { DELETE, GET, POST } from "@/app/api/session/route";
import { db } from "@/db/client";
import { DEMO_PASSWORD } from "@/db/seeds/01_demo_accounts";
import { jsonRequest, resetRequest, sessionCookie } from "../support/next-context";

beforeEach(async () => {
  resetRequest();
  await db("sign_in_failures").delete();
});
afterAll(async () => {
  await db("sign_in_failures").delete();
});

describe("/api/session", () => {
  it("signs in, reports the user, organisation and roles, and signs out", async () => {
    const signIn = await POST(jsonRequest("POST", "/api/session", { email: "Engineer@Demo.Pierwise.test", password: DEMO_PASSWORD }), {});
    expect(signIn.status).toBe(200);
    expect(sessionCookie()).toBeTruthy();

    const me = await (await GET(jsonRequest("GET", "/api/session"), {})).json();
    expect(me.user.email).toBe("engineer@demo.pierwise.test");
    expect(me.organisation.name).toMatch(/Example Ground-Mount/);
    expect(me.roles).toEqual(["engineer"]);

    expect((await DELETE(jsonRequest("DELETE", "/api/session"), {})).status).toBe(200);
    expect(sessionCookie()).toBeUndefined();
    expect((await GET(jsonRequest("GET", "/api/session"), {})).status).toBe(401);

    const actions = await db("audit_events").where("subject", null).orWhereIn("action", ["sign-in", "sign-out"]).pluck("action");
    expect(actions).toEqual(expect.arrayContaining(["sign-in", "sign-out"]));
  });

  it("answers 401 with the same message for a wrong password and an unknown e-mail", async () => {
    const wrong = await POST(jsonRequest("POST", "/api/session", { email: "designer@demo.pierwise.test", password: "not-the-password" }), {});
    const unknown = await POST(jsonRequest("POST", "/api/session", { email: "nobody@nowhere.test", password: "whatever-password" }), {});
    expect(wrong.status).toBe(401);
    expect(unknown.status).toBe(401);
    expect((await wrong.json()).errors[0].message).toBe((await unknown.json()).errors[0].message);
    expect(sessionCookie()).toBeUndefined();
  });

  it("answers 422 naming the field for a malformed body", async () => {
    const response = await POST(jsonRequest("POST", "/api/session", { email: "not-an-email" }), {});
    expect(response.status).toBe(422);
    const { errors } = await response.json();
    expect(errors.map((e: { path: string }) => e.path)).toEqual(expect.arrayContaining(["email", "password"]));
    const notJson = await POST(jsonRequest("POST", "/api/session", "{oops"), {});
    expect(notJson.status).toBe(422);
  });

  it("slows an account down after five failures, even with the right password, and says so", async () => {
    for (let i = 0; i < 5; i++) {
      const r = await POST(jsonRequest("POST", "/api/session", { email: "installer@demo.pierwise.test", password: `wrong-${i}-password` }), {});
      expect(r.status).toBe(401);
    }
    const blocked = await POST(jsonRequest("POST", "/api/session", { email: "installer@demo.pierwise.test", password: DEMO_PASSWORD }), {});
    expect(blocked.status).toBe(429);
    expect((await blocked.json()).errors[0].message).toMatch(/Too many failed sign-ins. Try again in \d+ minute/);
    // The failures are rows in PostgreSQL, so a restart or another app server sees them too.
    expect(Number((await db("sign_in_failures").where("email", "installer@demo.pierwise.test").count({ n: "*" }))[0].n)).toBe(5);
  });

  it("stores only argon2 hashes, never a plain password", async () => {
    const hashes = await db("users").pluck("password_hash");
    expect(hashes.length).toBeGreaterThan(0);
    for (const hash of hashes) {
      expect(hash).toMatch(/^\$argon2id\$/);
      expect(hash).not.toContain(DEMO_PASSWORD);
    }
  });
});
