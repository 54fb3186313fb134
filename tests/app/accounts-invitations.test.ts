import { beforeEach, describe, expect, it } from "vitest";
import { acceptInvitationAction } from "@/app/(auth)/invite/[token]/actions";
import { inviteMemberAction } from "@/app/(workspace)/admin/members/actions";
import { GET as getSession } from "@/app/api/session/route";
import { hashToken } from "@/app/_lib/tokens";
import { db } from "@/db/client";
import { DEMO_ORG_ID, OTHER_ORG_ID } from "@/db/seeds/01_demo_accounts";
import { formArgs } from "../support/access-matrix";
import { FRESH_PASSWORD, freshInvitation, freshMember, uniqueEmail } from "../support/accounts";
import { firstLink, mailTo } from "../support/mailbox";
import { actAs, jsonRequest, outcomeOf, resetRequest } from "../support/next-context";

type State = { ok?: boolean; message?: string; fieldErrors?: Record<string, string[]> };
const run = async (action: (p: never, f: FormData) => Promise<unknown>, fields: Record<string, string | string[]>) =>
  outcomeOf(() => action(...(formArgs(fields) as [never, FormData])));
const stateOf = (o: Awaited<ReturnType<typeof run>>) => (o as { value: State }).value;

async function inviteByMail(email: string, roles: string[]) {
  await actAs("admin@demo.pierwise.test");
  const sent = stateOf(await run(inviteMemberAction, { email, roles }));
  expect(sent.ok, sent.message).toBe(true);
  const mail = await mailTo(email, { subject: /invited you/ });
  const link = firstLink(mail);
  return { mail, link, token: link.split("/invite/")[1] };
}

beforeEach(() => resetRequest());

describe("invitations", () => {
  it("e-mails a 7-day single-use link whose token is stored only as its SHA-256, and the link lets a new person join", async () => {
    const email = uniqueEmail("crew");
    const { mail, link, token } = await inviteByMail(email, ["installer", "designer"]);
    expect(link.startsWith(`${process.env.APP_URL}/invite/`)).toBe(true);
    expect(mail.text).toMatch(/Installer, Designer|Designer, Installer/);

    const row = await db("invitations").where({ email }).first("token_hash", "expires_at", "created_at");
    expect(row.token_hash).toBe(hashToken(token));
    expect(JSON.stringify(await db("invitations").where({ email }))).not.toContain(token);
    const ttlDays = (new Date(row.expires_at).getTime() - new Date(row.created_at).getTime()) / 86_400_000;
    expect(ttlDays).toBeCloseTo(7, 2); // the issue: invitations expire in 7 days

    resetRequest();
    const accepted = await run(acceptInvitationAction, { token, name: "Cass Crew", password: "crew-password-1" });
    expect(accepted).toEqual({ kind: "redirect", location: "/projects" });
    const me = await (await getSession(jsonRequest("GET", "/api/session"), {})).json();
    expect(me.user).toMatchObject({ email, name: "Cass Crew" });
    expect(me.organisation.id).toBe(DEMO_ORG_ID);
    expect([...me.roles].sort()).toEqual(["designer", "installer"]);
    expect(await db("audit_events").where({ action: "invitation-sent", subject: email, organisation_id: DEMO_ORG_ID }).first()).toBeTruthy();
    expect(await db("audit_events").where({ action: "invitation-accepted", subject: email }).first()).toBeTruthy();
  });

  it("refuses a link used twice with a clear message and creates nobody twice", async () => {
    const { token, email } = await freshInvitation();
    expect((await run(acceptInvitationAction, { token, name: "First Use", password: "first-password-1" })).kind).toBe("redirect");
    resetRequest();
    const second = stateOf(await run(acceptInvitationAction, { token, name: "Second Use", password: "second-password-1" }));
    expect(second.message).toMatch(/already been used/);
    expect(await db("users").where({ email }).pluck("name")).toEqual(["First Use"]);
  });

  it("refuses an expired link and an unknown one, each with its own message", async () => {
    const { token } = await freshInvitation({ expiresAt: new Date(Date.now() - 1000) });
    expect(stateOf(await run(acceptInvitationAction, { token, name: "Late", password: "late-password-1" })).message).toMatch(/expired.*7 days.*Example Ground-Mount/);
    expect(stateOf(await run(acceptInvitationAction, { token: "made-up-token", name: "X", password: "made-up-password" })).message).toMatch(/not valid/);
  });

  it("keeps the invitation usable when the chosen password is too short", async () => {
    const { token, email } = await freshInvitation();
    const weak = stateOf(await run(acceptInvitationAction, { token, name: "Weak", password: "short" }));
    expect(weak.fieldErrors?.password).toEqual(["Password must be at least 10 characters."]);
    expect(await db("users").where({ email }).first()).toBeUndefined();
    expect((await db("invitations").where("token_hash", hashToken(token)).first("accepted_at")).accepted_at).toBeNull();
  });

  it("lets someone with an account elsewhere join by proving their password (a wrong one does not use the link)", async () => {
    // A fresh person of the other organisation (not the demo cast, whose single membership other tests rely on).
    const { email } = await freshMember({ organisationId: OTHER_ORG_ID, roles: ["designer"] });
    const { token } = await freshInvitation({ email, roles: ["engineer"] });
    const wrong = stateOf(await run(acceptInvitationAction, { token, password: "not-the-password" }));
    expect(wrong.fieldErrors?.password?.[0]).toMatch(/not the password/);
    expect((await db("invitations").where("token_hash", hashToken(token)).first("accepted_at")).accepted_at).toBeNull();

    resetRequest();
    expect(await run(acceptInvitationAction, { token, password: FRESH_PASSWORD })).toEqual({ kind: "redirect", location: "/projects" });
    const me = await (await getSession(jsonRequest("GET", "/api/session"), {})).json();
    expect(me.organisation.id).toBe(DEMO_ORG_ID);
    expect(me.roles).toEqual(["engineer"]);
    expect(await db("users").where({ email }).count({ n: "*" })).toEqual([{ n: "1" }]);
  });

  it("tells the admin beside the field when the person is already a member, and needs at least one role", async () => {
    await actAs("admin@demo.pierwise.test");
    const member = stateOf(await run(inviteMemberAction, { email: "installer@demo.pierwise.test", roles: ["installer"] }));
    expect(member.fieldErrors?.email?.[0]).toMatch(/already a member/);
    const noRole = stateOf(await run(inviteMemberAction, { email: uniqueEmail("x") }));
    expect(noRole.fieldErrors?.roles).toEqual(["Choose at least one role."]);
  });
});
