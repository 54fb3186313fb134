/**
 * An approval an engineer signs and an inspector can trust: failing checks need a reason each,
 * approving needs the engineer's password, nobody makes themselves an engineer, the approval pins
 * the project facts, clearing a hold tells everyone, and /verify/<code> answers the inspector.
 */
import { renderToStaticMarkup } from "react-dom/server";
import { describe, expect, it } from "vitest";
import { changeRolesAction } from "@/app/(workspace)/admin/members/actions";
import FieldSpecPage from "@/app/(workspace)/field/[revisionId]/page";
import { clearHoldAction } from "@/app/(workspace)/reviews/[revisionId]/actions";
import { PATCH as patchProject } from "@/app/api/projects/[projectId]/route";
import { POST as review } from "@/app/api/revisions/[revisionId]/review/route";
import { POST as submit } from "@/app/api/revisions/[revisionId]/submit/route";
import VerifyPage from "@/app/verify/[code]/page";
import { getRevisionContext } from "@/db/queries/reviews";
import { db } from "@/db/client";
import { sizeDesign, twoPostDesignInput, type DesignInputDraft } from "@/engine";
import { freshMember } from "../support/accounts";
import { mailTo } from "../support/mailbox";
import { actAs, jsonRequest, outcomeOf, params, resetRequest } from "../support/next-context";
import { ADMIN, DEMO_PASSWORD, DESIGNER, ENGINEER, INSTALLER, addRevision, makeDesign, userId } from "../support/review-fixtures";

// A hole given 24 in deep: shallower than the 36 in frost depth of the demo criteria and too short
// for the lateral load, so the frost and lateral embedment checks fail (IBC §1807.3.2.1; IBC §1809.5).
const SHALLOW: DesignInputDraft = { ...twoPostDesignInput, site: { ...twoPostDesignInput.site, frostDepthIn: 36 }, posts: { ...twoPostDesignInput.posts, fixedDepthIn: 24 } };
const failingIds = () => sizeDesign(SHALLOW).footing.checks.filter((c) => !c.pass).map((c) => c.id);

async function inReview(input?: DesignInputDraft) {
  const d = await makeDesign({ input });
  await actAs(DESIGNER);
  const res = await submit(jsonRequest("POST", "/x", { engineerId: await userId(ENGINEER) }), params({ revisionId: d.revisionId }));
  expect(res.status).toBe(200);
  return d;
}
async function decide(revisionId: string, body: unknown, who = ENGINEER) {
  await actAs(who);
  const res = await review(jsonRequest("POST", "/x", body), params({ revisionId }));
  return { status: res.status, body: await res.json() };
}
const html = async (node: Promise<React.ReactElement>) => renderToStaticMarkup(await node);

describe("failed checks are decided, never missed", () => {
  it("refuses to approve a failing revision without a reason per failing check (422 at overrides)", async () => {
    expect(failingIds().length).toBeGreaterThan(0);
    const d = await inReview(SHALLOW);
    const none = await decide(d.revisionId, { decision: "approve", password: DEMO_PASSWORD });
    expect(none.status).toBe(422);
    expect(none.body.errors[0]).toMatchObject({ path: "overrides", message: expect.stringMatching(/ratio \d+\.\d\d/) });
    const half = await decide(d.revisionId, { decision: "approve", password: DEMO_PASSWORD, overrides: [{ checkId: failingIds()[0], reason: "Checked by hand." }].slice(0, failingIds().length - 1) });
    expect(half.status).toBe(422);
    const short = await decide(d.revisionId, { decision: "approve", password: DEMO_PASSWORD, overrides: failingIds().map((checkId) => ({ checkId, reason: "ok" })) });
    expect(short.status).toBe(422);
    expect(short.body.errors[0].path).toBe("overrides.0.reason");
    const passing = await decide(d.revisionId, { decision: "approve", password: DEMO_PASSWORD, overrides: [...failingIds(), "bearing"].map((checkId) => ({ checkId, reason: "Reason long enough." })) });
    expect(passing.body.errors[0].path).toMatch(/^overrides\.\d+\.checkId$/);
    expect((await db("revisions").where({ id: d.revisionId }).first("status")).status).toBe("in_review");
  });

  it("approves with one reason per failing check, stores them with the approval, and shows them on the field spec", async () => {
    const d = await inReview(SHALLOW);
    const reason = "Rock at 20 in confirmed by probe; embedment in rock checked by hand calculation.";
    const out = await decide(d.revisionId, { decision: "approve", password: DEMO_PASSWORD, overrides: failingIds().map((checkId) => ({ checkId, reason })) });
    expect(out).toMatchObject({ status: 200, body: { status: "approved" } });
    const rec = await db("reviews").where({ revision_id: d.revisionId, decision: "approve" }).first("overrides");
    expect(rec.overrides.map((o: { checkId: string }) => o.checkId)).toEqual(failingIds());
    // The approval record is pinned: its overrides cannot be edited afterwards.
    await expect(db("reviews").where({ revision_id: d.revisionId }).update({ overrides: "[]" })).rejects.toThrow(/approval record/);

    await actAs(INSTALLER);
    const page = await html(FieldSpecPage({ params: Promise.resolve({ revisionId: d.revisionId }) }));
    expect(page).toContain("Approved although checks fail");
    expect(page).toContain(reason);
  });
});

describe("approval is a signature", () => {
  it("needs the engineer's own password: missing or wrong is 422 at password and nothing is recorded", async () => {
    const d = await inReview();
    const failuresNow = async () => Number((await db("sign_in_failures").where({ email: ENGINEER }).count<{ n: string }[]>("* as n"))[0].n);
    const before = await failuresNow();
    expect(await decide(d.revisionId, { decision: "approve" })).toMatchObject({ status: 422, body: { errors: [{ path: "password" }] } });
    expect(await decide(d.revisionId, { decision: "approve", password: "not-the-password" })).toMatchObject({ status: 422, body: { errors: [{ path: "password" }] } });
    expect((await db("revisions").where({ id: d.revisionId }).first("status")).status).toBe("in_review");
    expect(await failuresNow()).toBe(before + 1); // the wrong one counts against the sign-in limit
    expect((await decide(d.revisionId, { decision: "approve", password: DEMO_PASSWORD })).status).toBe(200);
  });

  it("stores the licence on file (number, state, expiry) with the approval", async () => {
    const d = await inReview();
    await decide(d.revisionId, { decision: "approve", password: DEMO_PASSWORD });
    const licence = await db("engineer_licences").where({ user_id: await userId(ENGINEER), state: "CO" }).first();
    const rec = await db("reviews").where({ revision_id: d.revisionId }).first();
    expect(rec).toMatchObject({ licence_number: licence.licence_number, licence_state: "CO" });
    expect(rec.licence_expires_on).toEqual(licence.expires_on);
  });

  it("refuses an admin giving the engineer role to their own membership (403); another admin may", async () => {
    const self = await freshMember({ roles: ["admin"] });
    await actAs(self.email);
    const form = new FormData();
    form.append("membershipId", self.membershipId);
    for (const r of ["admin", "engineer"]) form.append("roles", r);
    expect(await outcomeOf(() => changeRolesAction({}, form))).toEqual({ kind: "status", status: 403 });
    const roles = (await db("memberships").where({ id: self.membershipId }).first("roles")).roles;
    expect(String(roles)).not.toContain("engineer");

    await actAs(ADMIN);
    expect(await outcomeOf(() => changeRolesAction({}, form))).toMatchObject({ kind: "value", value: { ok: true } });
    const audit = await db("audit_events").where({ action: "role-changed", subject: self.email }).orderBy("at", "desc").first();
    expect(audit.actor_user_id).toBe(await userId(ADMIN)); // who granted it
    // A second active admin left in the demo organisation would change what later suites see
    // (the members page's last-admin guard): this one is done with.
    await db("memberships").where({ id: self.membershipId }).update({ deactivated_at: db.fn.now() });
  });
});

describe("the approval pins the facts it was given", () => {
  it("keeps the approved revision's name, address and state after the project is edited", async () => {
    const d = await inReview();
    const before = (await getRevisionContext(d.revisionId))!;
    await decide(d.revisionId, { decision: "approve", password: DEMO_PASSWORD });
    await actAs(DESIGNER);
    const res = await patchProject(jsonRequest("PATCH", "/x", { name: "Renamed after approval", address: "9 Other Road, Elsewhere, TX", state: "TX" }), params({ projectId: d.projectId }));
    expect(res.status).toBe(200);
    const after = (await getRevisionContext(d.revisionId))!;
    expect(after).toMatchObject({ projectName: before.projectName, projectAddress: before.projectAddress, projectState: "CO", factsPinned: true });
    // A new revision of the design reads the project as it is now.
    const next = await addRevision(d.designId, twoPostDesignInput);
    expect((await getRevisionContext(next))!).toMatchObject({ projectName: "Renamed after approval", projectState: "TX", factsPinned: false });
  });
});

describe("clearing a hold reaches everyone", () => {
  it("needs a note and a confirmation, e-mails the designer and the installer who logged the hole, and shows the note on the field spec", async () => {
    const d = await inReview();
    await decide(d.revisionId, { decision: "approve", password: DEMO_PASSWORD });
    const installer = await freshMember({ roles: ["installer"] });
    const [entry] = await db("as_built_entries").insert({ revision_id: d.revisionId, organisation_id: (await db("revisions").where({ id: d.revisionId }).first()).organisation_id, post_id: "P1", measured_diameter_in: 30, measured_depth_in: 30, ground_found: "rock", recorded_by: installer.userId }).returning("id");
    const [hold] = await db("design_holds").insert({ design_id: d.designId, organisation_id: (await db("designs").where({ id: d.designId }).first()).organisation_id, revision_id: d.revisionId, as_built_entry_id: entry.id, reason: "Hole P1: rock found.", raised_by: installer.userId }).returning("id");

    await actAs(ENGINEER);
    const form = (fields: Record<string, string>) => { const f = new FormData(); for (const [k, v] of Object.entries(fields)) f.append(k, v); return f; };
    const unconfirmed = await outcomeOf(() => clearHoldAction({}, form({ holdId: hold.id, note: "Pour as dug: rock socket is enough." })));
    expect(unconfirmed).toMatchObject({ kind: "value", value: { fieldErrors: { confirm: [expect.any(String)] } } });
    const note = "Pour as dug: 30 in into sound rock is enough for this post.";
    const done = await outcomeOf(() => clearHoldAction({}, form({ holdId: hold.id, note, confirm: "yes" })));
    expect(done).toMatchObject({ kind: "value", value: { ok: true, message: expect.stringMatching(/E-mailed your note/) } });

    expect((await mailTo(installer.email, { subject: /Hold cleared/ })).text).toContain(note);
    expect((await mailTo(DESIGNER, { subject: /Hold cleared/ })).text).toContain(note);
    await actAs(installer.email);
    const page = await html(FieldSpecPage({ params: Promise.resolve({ revisionId: d.revisionId }) }));
    expect(page).toContain(note);
    expect(page).toContain("Hold cleared by Eli Engineer");
  });
});

describe("/verify/<code>", () => {
  const verify = async (code: string) => html(VerifyPage({ params: Promise.resolve({ code }) }));

  it("shows the status, and says superseded once a newer revision is approved", async () => {
    resetRequest({ ip: "198.51.100.90" });
    const d = await inReview();
    await decide(d.revisionId, { decision: "approve", password: DEMO_PASSWORD });
    const { verify_code: code, } = await db("reviews").where({ revision_id: d.revisionId, decision: "approve" }).first("verify_code");
    expect(code).toMatch(/^[A-Za-z0-9_-]{22}$/);
    await actAs(null); // no sign-in needed
    const page = await verify(code);
    expect(page).toContain("Approved and current");
    expect(page).toContain("PE-000000-DEMO"); // demo licence, db/seeds/01_demo_accounts.ts (invented)
    expect(page).not.toContain("1 Test Lane"); // the street address is not shown, only city and state

    const next = await addRevision(d.designId, { ...twoPostDesignInput, array: { ...twoPostDesignInput.array, tiltDeg: 25 } });
    await actAs(DESIGNER);
    await submit(jsonRequest("POST", "/x", { engineerId: await userId(ENGINEER) }), params({ revisionId: next }));
    await decide(next, { decision: "approve", password: DEMO_PASSWORD });
    await actAs(null);
    expect(await verify(code)).toContain("Superseded by a newer approved revision");
    resetRequest();
  });

  it("answers a guessed code with the same page shape and nothing more", async () => {
    resetRequest({ ip: "198.51.100.91" });
    const page = await verify("AAAAAAAAAAAAAAAAAAAAAA");
    expect(page).toContain("No such approval");
    expect(page).not.toMatch(/Licence|Content hash|Engineer/);
    resetRequest();
  });

  it("is rate-limited per address", async () => {
    resetRequest({ ip: "198.51.100.92" });
    let last = "";
    for (let i = 0; i < 31; i++) last = await verify("BBBBBBBBBBBBBBBBBBBBBB");
    expect(last).toContain("Too many checks from this address");
    resetRequest();
  });
});
