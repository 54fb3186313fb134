import { afterAll, beforeEach, describe, expect, it } from "vitest";
import { setNewPasswordAction } from "@/app/(auth)/reset/[token]/actions";
import { requestPasswordResetAction } from "@/app/(auth)/reset/actions";
import { cookies } from "next/headers";
import { GET as getSession, POST as postSession } from "@/app/api/session/route";
import { hashToken } from "@/app/_lib/tokens";
import { db } from "@/db/client";
import { passwordResetState } from "@/db/queries/password-resets";
import { formArgs } from "../support/access-matrix";
import { FRESH_PASSWORD, freshMember, freshReset, uniqueEmail } from "../support/accounts";
import { firstLink, mailTo } from "../support/mailbox";
import { actAs, jsonRequest, outcomeOf, resetRequest, sessionCookie } from "../support/next-context";

type State = { ok?: boolean; message?: string; fieldErrors?: Record<string, string[]> };
const run = async (action: (p: never, f: FormData) => Promise<unknown>, fields: Record<string, string>) =>
  outcomeOf(() => action(...(formArgs(fields) as [never, FormData])));
const stateOf = (o: Awaited<ReturnType<typeof run>>) => (o as { value: State }).value;
const signIn = (email: string, password: string) => postSession(jsonRequest("POST", "/api/session", { email, password }), {});

beforeEach(() => resetRequest({ ip: `198.51.100.${Math.floor(Math.random() * 200) + 1}` }));
afterAll(async () => {
  await db("sign_in_failures").delete();
});

describe("password reset", () => {
  it("answers the same whether or not the account exists, and e-mails only a real account", async () => {
    const member = await freshMember();
    const stranger = uniqueEmail("stranger");
    const known = stateOf(await run(requestPasswordResetAction, { email: member.email }));
    const unknown = stateOf(await run(requestPasswordResetAction, { email: stranger }));
    expect(known.message!.replace(member.email, "<e-mail>")).toBe(unknown.message!.replace(stranger, "<e-mail>"));
    expect(known.ok).toBe(true);
    await mailTo(member.email, { subject: /new Pierwise password/ });
    await expect(mailTo(stranger, { timeoutMs: 1500 })).rejects.toThrow(/no e-mail/);
  });

  it("follows the e-mailed link once: the new password works, the old one and the link do not", async () => {
    const member = await freshMember();
    await run(requestPasswordResetAction, { email: member.email });
    const link = firstLink(await mailTo(member.email, { subject: /new Pierwise password/ }));
    expect(link.startsWith(`${process.env.APP_URL}/reset/`)).toBe(true);
    const token = link.split("/reset/")[1];

    const stored = await db("password_resets as r").join("users as u", "u.id", "r.user_id").where("u.email", member.email).first("r.token_hash", "r.expires_at", "r.created_at");
    expect(stored.token_hash).toBe(hashToken(token)); // only the SHA-256 is kept
    expect((new Date(stored.expires_at).getTime() - new Date(stored.created_at).getTime()) / 60_000).toBeCloseTo(60, 1); // the issue: 1 hour
    expect(await passwordResetState(hashToken(token))).toBe("valid");

    const tooShort = stateOf(await run(setNewPasswordAction, { token, password: "short" }));
    expect(tooShort.fieldErrors?.password).toEqual(["Password must be at least 10 characters."]);
    expect(await passwordResetState(hashToken(token))).toBe("valid"); // a rejected attempt does not use the link

    expect(await run(setNewPasswordAction, { token, password: "a-new-password-1" })).toEqual({ kind: "redirect", location: "/projects" });
    expect(stateOf(await run(setNewPasswordAction, { token, password: "another-password-2" })).message).toMatch(/already been used/);

    resetRequest({ ip: "198.51.100.250" });
    expect((await signIn(member.email, FRESH_PASSWORD)).status).toBe(401);
    expect((await signIn(member.email, "a-new-password-1")).status).toBe(200);
    const hash = (await db("users").where({ email: member.email }).first("password_hash")).password_hash;
    expect(hash).toMatch(/^\$argon2id\$/);
    expect(hash).not.toContain("a-new-password-1");
    expect(await db("audit_events").where({ subject: member.email }).pluck("action")).toEqual(
      expect.arrayContaining(["password-reset-requested", "password-reset"]),
    );
  });

  it("ends sessions that began before the reset; the session the reset starts works", async () => {
    const member = await freshMember();
    await actAs(member.email);
    const before = sessionCookie()!;
    expect((await getSession(jsonRequest("GET", "/api/session"), {})).status).toBe(200);
    await new Promise((r) => setTimeout(r, 5)); // the old session must begin strictly earlier
    const token = await freshReset(member.userId);
    expect((await run(setNewPasswordAction, { token, password: "after-reset-password" })).kind).toBe("redirect");
    expect((await getSession(jsonRequest("GET", "/api/session"), {})).status).toBe(200); // the new session
    (await cookies()).set("pierwise_session", before); // someone still holding the old cookie
    expect((await getSession(jsonRequest("GET", "/api/session"), {})).status).toBe(401);
  });

  it("refuses an expired link with its own message and leaves the password alone", async () => {
    const member = await freshMember();
    const token = await freshReset(member.userId, new Date(Date.now() - 60_000));
    expect(await passwordResetState(hashToken(token))).toBe("expired");
    expect(stateOf(await run(setNewPasswordAction, { token, password: "too-late-password" })).message).toMatch(/expired.*1 hour/);
    expect((await signIn(member.email, FRESH_PASSWORD)).status).toBe(200);
  });

  it("a used link closes the person's other open links too", async () => {
    const member = await freshMember();
    const first = await freshReset(member.userId);
    const second = await freshReset(member.userId);
    expect((await run(setNewPasswordAction, { token: first, password: "first-new-password" })).kind).toBe("redirect");
    expect(await passwordResetState(hashToken(second))).toBe("used");
  });

  it("sends at most three links an hour to one person", async () => {
    const member = await freshMember();
    for (let i = 0; i < 5; i++) expect(stateOf(await run(requestPasswordResetAction, { email: member.email })).ok).toBe(true);
    await mailTo(member.email);
    await new Promise((r) => setTimeout(r, 500)); // let the detached sends finish
    expect(await db("password_resets").where({ user_id: member.userId }).count({ n: "*" })).toEqual([{ n: "3" }]);
  });
});
