/**
 * Finding 4 of the hardening issue: a session ends when it is ended. The cookie points at a
 * server-side record; sign-out, "sign out everywhere", a password reset and deactivation close
 * the record, and a replayed copy of the cookie is then signed out.
 */
import { cookies } from "next/headers";
import { beforeEach, describe, expect, it } from "vitest";
import { signOutEverywhereAction } from "@/app/(workspace)/account/actions";
import { POST as createProject } from "@/app/api/projects/route";
import { DELETE, GET, POST } from "@/app/api/session/route";
import { sessionOptions } from "@/app/_lib/session";
import { db } from "@/db/client";
import { changeMembership } from "@/db/queries/members";
import { consumePasswordReset } from "@/db/queries/password-resets";
import { hashPassword } from "@/app/_lib/password";
import { hashToken } from "@/app/_lib/tokens";
import { FRESH_PASSWORD, freshMember, freshReset } from "../support/accounts";
import { jsonRequest, outcomeOf, resetRequest, sessionCookie } from "../support/next-context";

beforeEach(async () => {
  await db("sign_in_failures").delete();
});

async function signInAs(email: string, password = FRESH_PASSWORD): Promise<string> {
  resetRequest();
  const response = await POST(jsonRequest("POST", "/api/session", { email, password }), {});
  expect(response.status).toBe(200);
  return sessionCookie()!;
}

/** Puts a copied cookie back, as an attacker replaying it would. */
async function replay(cookie: string): Promise<void> {
  resetRequest();
  (await cookies()).set(sessionOptions().cookieName, cookie);
}

const whoAmI = async () => (await GET(jsonRequest("GET", "/api/session"), {})).status;

describe("sessions that end", () => {
  it("a cookie replayed after DELETE /api/session is signed out and cannot create projects", async () => {
    const { email } = await freshMember({ roles: ["designer"] });
    const cookie = await signInAs(email);
    expect(await whoAmI()).toBe(200);
    expect((await DELETE(jsonRequest("DELETE", "/api/session"), {})).status).toBe(200);
    await replay(cookie);
    expect(await whoAmI()).toBe(401);
    expect((await createProject(jsonRequest("POST", "/api/projects", { name: "Replayed cookie site", state: "CO" }), {})).status).toBe(401);
  });

  it("sign out everywhere ends every session of the person, on every device", async () => {
    const { email, userId } = await freshMember({ roles: ["designer"] });
    const laptop = await signInAs(email);
    const phone = await signInAs(email);
    expect(await db("user_sessions").where({ user_id: userId }).whereNull("ended_at")).toHaveLength(2);
    await replay(phone);
    expect(await outcomeOf(() => signOutEverywhereAction())).toEqual({ kind: "redirect", location: "/login" });
    for (const cookie of [laptop, phone]) {
      await replay(cookie);
      expect(await whoAmI()).toBe(401);
    }
    expect(await db("audit_events").where({ action: "signed-out-everywhere", actor_user_id: userId })).toHaveLength(1);
  });

  it("deactivation and a password reset end open sessions", async () => {
    const deactivated = await freshMember({ roles: ["installer"] });
    const cookie = await signInAs(deactivated.email);
    expect((await changeMembership(deactivated.membershipId, { active: false })).ok).toBe(true);
    expect(await db("user_sessions").where({ user_id: deactivated.userId }).whereNull("ended_at")).toEqual([]);
    await replay(cookie);
    expect(await whoAmI()).toBe(401);

    const reset = await freshMember({ roles: ["designer"] });
    const before = await signInAs(reset.email);
    const token = await freshReset(reset.userId);
    expect((await consumePasswordReset(hashToken(token), await hashPassword("a-new-password-after-reset"))).ok).toBe(true);
    expect(await db("user_sessions").where({ user_id: reset.userId }).whereNull("ended_at")).toEqual([]);
    await replay(before);
    expect(await whoAmI()).toBe(401);
  });

  it("a cookie that names no session record (made before records existed) is signed out", async () => {
    const { email, userId } = await freshMember({ roles: ["designer"] });
    const cookie = await signInAs(email);
    await db("user_sessions").where({ user_id: userId }).delete();
    await replay(cookie);
    expect(await whoAmI()).toBe(401);
  });
});
