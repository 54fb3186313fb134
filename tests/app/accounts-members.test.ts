import { beforeEach, describe, expect, it } from "vitest";
import AuditPage from "@/app/(workspace)/admin/audit/page";
import { changeRolesAction, deactivateMemberAction, reactivateMemberAction } from "@/app/(workspace)/admin/members/actions";
import MembersPage from "@/app/(workspace)/admin/members/page";
import { GET as getSession, POST as postSession } from "@/app/api/session/route";
import { db } from "@/db/client";
import { listAuditEvents } from "@/db/queries/audit";
import { changeMembership, listMembers } from "@/db/queries/members";
import { DEMO_ORG_ID, OTHER_ORG_ID } from "@/db/seeds/01_demo_accounts";
import { formArgs } from "../support/access-matrix";
import { FRESH_PASSWORD, freshMember, uniqueEmail } from "../support/accounts";
import { actAs, jsonRequest, outcomeOf, resetRequest } from "../support/next-context";

type State = { ok?: boolean; message?: string };
const run = async (action: (p: never, f: FormData) => Promise<unknown>, fields: Record<string, string | string[]>) =>
  ((await outcomeOf(() => action(...(formArgs(fields) as [never, FormData])))) as { value: State }).value;

/** A fresh organisation with one admin, so "last admin" cases do not depend on the demo data. */
async function soloOrganisation() {
  const [org] = await db("organisations").insert({ name: "Solo Test Co" }).returning("id");
  const admin = await freshMember({ organisationId: org.id, roles: ["admin"] });
  return { organisationId: org.id as string, admin };
}

beforeEach(() => resetRequest());

describe("members admin", () => {
  it("changes a member's roles and records who changed what, from where", async () => {
    const member = await freshMember({ roles: ["designer"] });
    await actAs("admin@demo.pierwise.test");
    const state = await run(changeRolesAction, { membershipId: member.membershipId, roles: ["designer", "engineer"] });
    expect(state).toMatchObject({ ok: true });
    expect((await listMembers(DEMO_ORG_ID)).find((m) => m.membershipId === member.membershipId)?.roles).toEqual(["designer", "engineer"]);
    const event = await db("audit_events").where({ action: "role-changed", subject: member.email }).first();
    expect(event.detail).toEqual({ from: ["designer"], to: ["designer", "engineer"] });
    expect(event.ip).toBe("203.0.113.10"); // the address the test harness sends as x-forwarded-for
  });

  it("refuses to let the last admin drop their own admin role or deactivate themselves, and says why", async () => {
    const { admin } = await soloOrganisation();
    await actAs(admin.email);
    const demote = await run(changeRolesAction, { membershipId: admin.membershipId, roles: ["designer"] });
    expect(demote.ok).toBeUndefined();
    expect(demote.message).toMatch(/You are the last active admin of Solo Test Co, so you cannot remove the admin role/);
    const leave = await run(deactivateMemberAction, { membershipId: admin.membershipId });
    expect(leave.message).toMatch(/last active admin.*cannot deactivate/);
    const row = await db("memberships").where("id", admin.membershipId).first("roles", "deactivated_at");
    expect(row.deactivated_at).toBeNull();
    expect(String(row.roles)).toContain("admin");
  });

  it("lets an admin step down once another admin exists", async () => {
    const { organisationId, admin } = await soloOrganisation();
    await freshMember({ organisationId, roles: ["admin"] });
    await actAs(admin.email);
    expect(await run(changeRolesAction, { membershipId: admin.membershipId, roles: ["designer"] })).toMatchObject({ ok: true });
  });

  it("never leaves an organisation without an admin when two admins demote each other at once", async () => {
    const { organisationId, admin } = await soloOrganisation();
    const second = await freshMember({ organisationId, roles: ["admin"] });
    const results = await Promise.all([
      changeMembership(admin.membershipId, { roles: ["designer"] }),
      changeMembership(second.membershipId, { roles: ["designer"] }),
    ]);
    expect(results.filter((r) => r.ok)).toHaveLength(1);
    expect(results.filter((r) => !r.ok)).toEqual([{ ok: false, reason: "last-admin" }]);
    const admins = await db("memberships").where({ organisation_id: organisationId }).whereRaw("'admin' = ANY(roles)").count({ n: "*" });
    expect(admins).toEqual([{ n: "1" }]);
  });

  it("deactivation ends sign-in and the current session but keeps the person on record; reactivation restores them", async () => {
    const member = await freshMember({ roles: ["installer"] });
    await actAs(member.email);
    expect((await getSession(jsonRequest("GET", "/api/session"), {})).status).toBe(200);

    await actAs("admin@demo.pierwise.test");
    expect(await run(deactivateMemberAction, { membershipId: member.membershipId })).toMatchObject({ ok: true });

    await actAs(member.email); // the cookie they already hold
    expect((await getSession(jsonRequest("GET", "/api/session"), {})).status).toBe(401);
    resetRequest({ ip: "203.0.113.77" });
    expect((await postSession(jsonRequest("POST", "/api/session", { email: member.email, password: FRESH_PASSWORD }), {})).status).toBe(401);
    const listed = (await listMembers(DEMO_ORG_ID)).find((m) => m.membershipId === member.membershipId);
    expect(listed?.deactivatedAt).toBeTruthy(); // still listed, so past work stays attributed by name

    await actAs("admin@demo.pierwise.test");
    expect(await run(reactivateMemberAction, { membershipId: member.membershipId })).toMatchObject({ ok: true });
    resetRequest({ ip: "203.0.113.78" });
    expect((await postSession(jsonRequest("POST", "/api/session", { email: member.email, password: FRESH_PASSWORD }), {})).status).toBe(200);
    const actions = await db("audit_events").where({ subject: member.email }).pluck("action");
    expect(actions).toEqual(expect.arrayContaining(["member-deactivated", "member-reactivated"]));
  });

  it("the members and audit pages are for admins: others get 403, the signed-out go to sign-in", async () => {
    const page = (who: string | null, load: () => Promise<unknown>) => actAs(who).then(() => outcomeOf(load));
    const members = () => MembersPage({ searchParams: Promise.resolve({}) });
    const audit = () => AuditPage({ searchParams: Promise.resolve({}) });
    expect((await page("admin@demo.pierwise.test", members)).kind).toBe("value");
    expect(await page("designer@demo.pierwise.test", members)).toEqual({ kind: "status", status: 403 });
    expect(await page(null, members)).toEqual({ kind: "redirect", location: "/login?next=%2Fadmin%2Fmembers" });
    expect((await page("admin@demo.pierwise.test", audit)).kind).toBe("value");
    expect(await page("engineer@demo.pierwise.test", audit)).toEqual({ kind: "status", status: 403 });
    expect(await page(null, audit)).toEqual({ kind: "redirect", location: "/login?next=%2Fadmin%2Faudit" });
  });
});

describe("audit log", () => {
  it("pages through one organisation's events, newest first, and never shows another organisation's", async () => {
    const [org] = await db("organisations").insert({ name: "Audit Paging Co" }).returning("id");
    const rows = Array.from({ length: 30 }, (_, i) => ({
      organisation_id: org.id, action: "sign-in-failed", subject: `n${i}`, ip: "198.51.100.1", at: new Date(Date.UTC(2026, 0, 1, 0, i)),
    }));
    await db("audit_events").insert(rows);
    await db("audit_events").insert({ organisation_id: OTHER_ORG_ID, action: "sign-in", subject: uniqueEmail("elsewhere") });
    const first = await listAuditEvents(org.id, { offset: 0, limit: 25 });
    const second = await listAuditEvents(org.id, { offset: 25, limit: 25 });
    expect(first.total).toBe(30);
    expect(first.rows).toHaveLength(25);
    expect(first.rows[0].subject).toBe("n29");
    expect(second.rows.map((r) => r.subject)).toEqual(["n4", "n3", "n2", "n1", "n0"]);
  });
});

describe("members admin through the API (the same services as the forms)", () => {
  it("lists members and pending invitations, deactivates by PATCH, and keeps the last admin", async () => {
    const { GET: listRoute } = await import("@/app/api/members/route");
    const { PATCH: patchRoute } = await import("@/app/api/members/[membershipId]/route");
    const { POST: inviteRoute } = await import("@/app/api/invitations/route");
    const member = await freshMember({ roles: ["installer"] });
    await actAs("admin@demo.pierwise.test");
    const invitee = uniqueEmail("api-invitee");
    expect((await inviteRoute(jsonRequest("POST", "/api/invitations", { email: invitee, roles: ["designer"] }), {})).status).toBe(201);
    const off = await patchRoute(jsonRequest("PATCH", "/x", { active: false }), { params: Promise.resolve({ membershipId: member.membershipId }) });
    expect(off.status).toBe(200);
    expect((await off.json()).member).toMatchObject({ email: member.email, active: false });
    const listed = await (await listRoute(jsonRequest("GET", "/api/members"), {})).json();
    expect(listed.members.find((m: { email: string }) => m.email === member.email)).toMatchObject({ active: false, roles: ["installer"] });
    expect(listed.invitations.find((i: { email: string }) => i.email === invitee)).toMatchObject({ roles: ["designer"] });
    expect(await db("audit_events").where({ action: "member-deactivated", subject: member.email }).first()).toBeTruthy();

    const { admin } = await soloOrganisation();
    await actAs(admin.email);
    const both = await patchRoute(jsonRequest("PATCH", "/x", { roles: ["designer"], active: true }), { params: Promise.resolve({ membershipId: admin.membershipId }) });
    expect(both.status).toBe(422);
    const last = await patchRoute(jsonRequest("PATCH", "/x", { roles: ["designer"] }), { params: Promise.resolve({ membershipId: admin.membershipId }) });
    expect(last.status).toBe(409);
    expect((await last.json()).errors[0].message).toMatch(/last active admin of Solo Test Co/);
  });
});
