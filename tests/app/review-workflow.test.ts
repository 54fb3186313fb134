/**
 * Review status changes through the API, and who may make each: draft → in review (designer) →
 * changes requested | approved (a licensed engineer who authored none of the design), with the
 * e-mails read back from the SMTP stand-in.
 */
import { beforeEach, describe, expect, it } from "vitest";
import { POST as submit } from "@/app/api/revisions/[revisionId]/submit/route";
import { POST as review } from "@/app/api/revisions/[revisionId]/review/route";
import { db } from "@/db/client";
import { twoPostDesignInput } from "@/engine";
import { firstLink, mailTo } from "../support/mailbox";
import { DEMO_PASSWORD } from "../support/review-fixtures";
import { actAs, jsonRequest, params } from "../support/next-context";
import { ADMIN, DESIGNER, ENGINEER, INSTALLER, OUTSIDER, addRevision, makeDesign, userId } from "../support/review-fixtures";

let engineerId: string;
beforeEach(async () => {
  engineerId = await userId(ENGINEER);
});

async function submitAs(email: string | null, revisionId: string, body: unknown = { engineerId }) {
  await actAs(email);
  const res = await submit(jsonRequest("POST", `/api/revisions/${revisionId}/submit`, body), params({ revisionId }));
  return { status: res.status, body: await res.json() };
}
async function decideAs(email: string | null, revisionId: string, body: unknown) {
  await actAs(email);
  const res = await review(jsonRequest("POST", `/api/revisions/${revisionId}/review`, body), params({ revisionId }));
  return { status: res.status, body: await res.json() };
}
const statusOf = async (id: string) => (await db("revisions").where({ id }).first("status")).status;

describe("submit for review", () => {
  it("moves a draft to in review and e-mails the engineer a link to the review page", async () => {
    const { revisionId } = await makeDesign();
    const out = await submitAs(DESIGNER, revisionId);
    expect(out).toMatchObject({ status: 200, body: { status: "in_review" } });
    expect(await statusOf(revisionId)).toBe("in_review");
    const mail = await mailTo(ENGINEER, { subject: /Review requested/ });
    expect(firstLink(mail)).toMatch(new RegExp(`/reviews/${revisionId}$`));
    const rec = await db("reviews").where({ revision_id: revisionId }).first();
    expect(rec).toMatchObject({ engineer_id: engineerId, submitted_by: await userId(DESIGNER), decision: null });
  });

  it("is for designers of the organisation only", async () => {
    const { revisionId } = await makeDesign();
    expect((await submitAs(null, revisionId)).status).toBe(401);
    expect((await submitAs(OUTSIDER, revisionId)).status).toBe(404);
    for (const who of [ENGINEER, INSTALLER, ADMIN]) expect((await submitAs(who, revisionId)).status).toBe(403);
    expect(await statusOf(revisionId)).toBe("draft");
  });

  it("names the field when the engineer is missing, not an engineer, or not licensed in the project's state", async () => {
    const { revisionId } = await makeDesign();
    const missing = await submitAs(DESIGNER, revisionId, {});
    expect(missing.status).toBe(422);
    expect(missing.body.errors[0].path).toBe("engineerId");
    const installer = await submitAs(DESIGNER, revisionId, { engineerId: await userId(INSTALLER) });
    expect(installer).toMatchObject({ status: 422, body: { errors: [{ path: "engineerId" }] } });
    // The demo engineer holds a CO licence only (db/seeds/01_demo_accounts.ts).
    const texas = await makeDesign({ state: "TX" });
    const unlicensed = await submitAs(DESIGNER, texas.revisionId);
    expect(unlicensed.status).toBe(422);
    expect(unlicensed.body.errors[0].message).toMatch(/no licence in TX/);
    expect(await statusOf(texas.revisionId)).toBe("draft");
  });

  it("refuses a revision already in review (409) and one that is not the newest", async () => {
    const { designId, revisionId } = await makeDesign();
    await submitAs(DESIGNER, revisionId);
    const again = await submitAs(DESIGNER, revisionId);
    expect(again.status).toBe(409);
    expect(again.body.errors[0].message).toMatch(/Only a draft or a revision with changes requested/);

    const other = await makeDesign();
    await addRevision(other.designId, { ...twoPostDesignInput, site: { ...twoPostDesignInput.site, windSpeedMph: 120 } });
    const old = await submitAs(DESIGNER, other.revisionId);
    expect(old.status).toBe(409);
    expect(old.body.errors[0].message).toMatch(/not the newest/);
    expect(designId).toBeTruthy();
  });
});

describe("superseded (derived)", () => {
  it("shows an approved revision as superseded once a newer revision of the design is approved", async () => {
    const { revisionStanding } = await import("@/app/_lib/review/standing");
    const { getRevisionContext } = await import("@/db/queries/reviews");
    const { designId, revisionId: first } = await makeDesign();
    await submitAs(DESIGNER, first);
    await decideAs(ENGINEER, first, { decision: "approve", password: DEMO_PASSWORD });
    expect((await revisionStanding((await getRevisionContext(first))!)).status).toBe("approved");
    // A later edit is a new draft revision; the approved one stays approved until the new one is approved.
    const second = await addRevision(designId, { ...twoPostDesignInput, array: { ...twoPostDesignInput.array, tiltDeg: 25 } });
    expect(await statusOf(second)).toBe("draft");
    expect((await revisionStanding((await getRevisionContext(first))!)).status).toBe("approved");
    await submitAs(DESIGNER, second);
    await decideAs(ENGINEER, second, { decision: "approve", password: DEMO_PASSWORD });
    const standing = await revisionStanding((await getRevisionContext(first))!);
    expect(standing.status).toBe("superseded");
    expect(standing.supersededBy?.id).toBe(second);
    expect(await statusOf(first)).toBe("approved"); // stored status never changes: the pin holds
  });
});

describe("decide a review", () => {
  it("requests changes with comments pinned to inputs; the designer is e-mailed; resubmission is allowed", async () => {
    const { designId, revisionId } = await makeDesign();
    await submitAs(DESIGNER, revisionId);
    const out = await decideAs(ENGINEER, revisionId, {
      decision: "request-changes",
      comments: [{ fieldPath: "site.windSpeedMph", body: "Use the county's 120 mph basic wind speed." }, { body: "Attach the soil report." }],
    });
    expect(out).toMatchObject({ status: 200, body: { status: "changes_requested" } });
    expect(await statusOf(revisionId)).toBe("changes_requested");
    const comments = await db("review_comments as c").join("reviews as r", "r.id", "c.review_id").where("r.revision_id", revisionId).orderBy("c.created_at").select("c.field_path", "c.body");
    expect(comments.map((c) => c.field_path)).toEqual(expect.arrayContaining(["site.windSpeedMph", null]));
    const mail = await mailTo(DESIGNER, { subject: /needs changes/ });
    expect(mail.text).toContain("[site.windSpeedMph] Use the county's 120 mph basic wind speed.");

    const revised = await addRevision(designId, { ...twoPostDesignInput, site: { ...twoPostDesignInput.site, windSpeedMph: 120 } });
    expect((await submitAs(DESIGNER, revised)).status).toBe(200);
    expect(await statusOf(revised)).toBe("in_review");
  });

  it("approves, recording the engineer's name, licence number, state and time, and e-mails the designer", async () => {
    const { revisionId } = await makeDesign();
    await submitAs(DESIGNER, revisionId);
    const out = await decideAs(ENGINEER, revisionId, { decision: "approve", password: DEMO_PASSWORD, comments: "Checked against the county criteria." });
    expect(out).toMatchObject({ status: 200, body: { status: "approved" } });
    const rec = await db("reviews").where({ revision_id: revisionId }).first();
    // Demo licence: db/seeds/01_demo_accounts.ts (invented number, CO).
    expect(rec).toMatchObject({ decision: "approve", engineer_name: "Eli Engineer, P.E.", licence_number: "PE-000000-DEMO", licence_state: "CO" });
    expect(rec.decided_at).toBeInstanceOf(Date);
    const mail = await mailTo(DESIGNER, { subject: /approved/ });
    expect(mail.text).toMatch(/PE-000000-DEMO, CO/);
    expect(mail.text).toContain(`/field/${revisionId}`);
  });

  it("needs a comment to request changes, and a known input path to pin one (422)", async () => {
    const { revisionId } = await makeDesign();
    await submitAs(DESIGNER, revisionId);
    const none = await decideAs(ENGINEER, revisionId, { decision: "request-changes" });
    expect(none).toMatchObject({ status: 422, body: { errors: [{ path: "comments" }] } });
    const bad = await decideAs(ENGINEER, revisionId, { decision: "request-changes", comments: [{ fieldPath: "site.colour", body: "?" }] });
    expect(bad).toMatchObject({ status: 422, body: { errors: [{ path: "comments.0.fieldPath" }] } });
    const word = await decideAs(ENGINEER, revisionId, { decision: "maybe" });
    expect(word).toMatchObject({ status: 422, body: { errors: [{ path: "decision" }] } });
    expect(await statusOf(revisionId)).toBe("in_review");
  });

  it("is for engineers of the organisation only", async () => {
    const { revisionId } = await makeDesign();
    await submitAs(DESIGNER, revisionId);
    expect((await decideAs(null, revisionId, { decision: "approve", password: DEMO_PASSWORD })).status).toBe(401);
    expect((await decideAs(OUTSIDER, revisionId, { decision: "approve", password: DEMO_PASSWORD })).status).toBe(404);
    for (const who of [DESIGNER, INSTALLER, ADMIN]) expect((await decideAs(who, revisionId, { decision: "approve", password: DEMO_PASSWORD })).status).toBe(403);
    expect(await statusOf(revisionId)).toBe("in_review");
  });

  it("only decides a revision in review (409)", async () => {
    const { revisionId } = await makeDesign();
    const draft = await decideAs(ENGINEER, revisionId, { decision: "approve", password: DEMO_PASSWORD });
    expect(draft.status).toBe(409);
    expect(draft.body.errors[0].message).toMatch(/Only a revision in review can be decided/);
    await submitAs(DESIGNER, revisionId);
    await decideAs(ENGINEER, revisionId, { decision: "approve", password: DEMO_PASSWORD });
    expect((await decideAs(ENGINEER, revisionId, { decision: "request-changes", comments: "late" })).status).toBe(409);
  });

  it("refuses an engineer who authored a revision of the design (403)", async () => {
    const { designId } = await makeDesign();
    const own = await addRevision(designId, twoPostDesignInput, ENGINEER);
    // A second engineer-designer could submit it; here the row is moved to review directly.
    await db("revisions").where({ id: own }).update({ status: "in_review" });
    await db("reviews").insert({ revision_id: own, organisation_id: (await db("revisions").where({ id: own }).first()).organisation_id, engineer_id: engineerId, submitted_by: await userId(DESIGNER) });
    const out = await decideAs(ENGINEER, own, { decision: "approve", password: DEMO_PASSWORD });
    expect(out.status).toBe(403);
    expect(out.body.errors[0].message).toBe("You cannot approve a design you authored.");
    expect(await statusOf(own)).toBe("in_review");
  });

  it("refuses an engineer whose licence for the project's state has expired (403, naming the date)", async () => {
    const { revisionId } = await makeDesign();
    await submitAs(DESIGNER, revisionId);
    await db("engineer_licences").where({ user_id: engineerId, state: "CO" }).update({ expires_on: "2024-05-01" });
    try {
      const out = await decideAs(ENGINEER, revisionId, { decision: "approve", password: DEMO_PASSWORD });
      expect(out.status).toBe(403);
      expect(out.body.errors[0].message).toMatch(/CO.*expired on 2024-05-01/);
      expect(await statusOf(revisionId)).toBe("in_review");
    } finally {
      await db("engineer_licences").where({ user_id: engineerId, state: "CO" }).update({ expires_on: "2030-12-31" });
    }
  });
});
