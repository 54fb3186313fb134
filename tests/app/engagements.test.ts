/**
 * Outside reviewing engineers: every line of the engagements API, what an engaged engineer may read
 * and do (and nothing else of the contractor), submitting to them, revocation, and the queue.
 */
import { describe, expect, it } from "vitest";
import { GET as listMine } from "@/app/api/engagements/route";
import { POST as accept } from "@/app/api/engagements/[engagementId]/accept/route";
import { POST as decline } from "@/app/api/engagements/[engagementId]/decline/route";
import { GET as listProjectEngagements, POST as engageRoute } from "@/app/api/projects/[projectId]/engagements/route";
import { DELETE as revokeRoute } from "@/app/api/projects/[projectId]/engagements/[engagementId]/route";
import { GET as listProjects } from "@/app/api/projects/route";
import { GET as getProject } from "@/app/api/projects/[projectId]/route";
import { GET as getDesigns } from "@/app/api/projects/[projectId]/designs/route";
import { GET as getDesign } from "@/app/api/designs/[designId]/route";
import { GET as getRevision } from "@/app/api/revisions/[revisionId]/route";
import { GET as getFile } from "@/app/api/projects/[projectId]/files/[fileId]/route";
import { GET as getFiles } from "@/app/api/projects/[projectId]/files/route";
import { GET as getReport } from "@/app/api/revisions/[revisionId]/report.pdf/route";
import { POST as submit } from "@/app/api/revisions/[revisionId]/submit/route";
import { POST as review } from "@/app/api/revisions/[revisionId]/review/route";
import { db } from "@/db/client";
import { engineerQueue } from "@/db/queries/engineer-queue";
import { OTHER_ORG_ID } from "@/db/seeds/01_demo_accounts";
import { DEMO_CARD_ID, DEMO_PROJECT_ID, OTHER_PROJECT_ID } from "@/db/seeds/02_demo_projects";
import { OUTSIDE_ENGAGED_PROJECT_ID, OUTSIDE_ENGINEER_EMAIL } from "@/db/seeds/04_demo_outside_engineer";
import { firstLink, mailTo } from "../support/mailbox";
import { actAs, jsonRequest, params } from "../support/next-context";
import { freshDesign, freshFile } from "../support/project-fixtures";
import { ADMIN, DESIGNER, ENGINEER, INSTALLER, OUTSIDER, makeDesign } from "../support/review-fixtures";
import { engage, freshOutsideEngineer } from "../support/engagement-fixtures";

const call = async (handler: (r: Request, c: never) => Promise<Response>, method: string, p: Record<string, string>, body?: unknown) => {
  const response = await handler(jsonRequest(method, "/", body), params(p) as never);
  return { status: response.status, json: response.headers.get("content-type")?.includes("json") ? await response.json() : null };
};

describe("POST /api/projects/:projectId/engagements", () => {
  it("lets a designer engage an engineer by e-mail: 201 invited, and the engineer gets a link", async () => {
    const { projectId } = await freshDesign();
    const engineer = await freshOutsideEngineer();
    await actAs(DESIGNER);
    const { status, json } = await call(engageRoute, "POST", { projectId }, { email: engineer.email.toUpperCase(), message: "Hillside site, please review." });
    expect(status).toBe(201);
    expect(json).toMatchObject({ id: expect.any(String), status: "invited", email: engineer.email });
    const mail = await mailTo(engineer.email, { subject: /Review engagement/ });
    expect(mail.text).toContain("Hillside site, please review.");
    expect(firstLink(mail)).toMatch(/\/engagements\/[A-Za-z0-9_-]{40,}$/);
  });

  it("lets an admin engage too; 403 for the contractor's installer and engineer; 404 for anyone else; 401 signed out", async () => {
    const { projectId } = await freshDesign();
    const body = () => ({ email: `engage-${crypto.randomUUID().slice(0, 8)}@example.test` });
    await actAs(ADMIN);
    expect((await call(engageRoute, "POST", { projectId }, body())).status).toBe(201);
    for (const who of [INSTALLER, ENGINEER]) {
      await actAs(who);
      expect((await call(engageRoute, "POST", { projectId }, body())).status).toBe(403);
    }
    for (const who of [OUTSIDER, OUTSIDE_ENGINEER_EMAIL]) {
      await actAs(who);
      expect((await call(engageRoute, "POST", { projectId }, body())).status).toBe(404);
    }
    // The outside engineer engaged on this very project still may not engage others on it.
    await actAs(OUTSIDE_ENGINEER_EMAIL);
    expect((await call(engageRoute, "POST", { projectId: OUTSIDE_ENGAGED_PROJECT_ID }, body())).status).toBe(404);
    await actAs(null);
    expect((await call(engageRoute, "POST", { projectId }, body())).status).toBe(401);
  });

  it("answers 422 naming the e-mail field, and 409 for a second live engagement of the same person", async () => {
    const { projectId } = await freshDesign();
    await actAs(DESIGNER);
    const bad = await call(engageRoute, "POST", { projectId }, { email: "not an address" });
    expect(bad.status).toBe(422);
    expect(bad.json.errors[0].path).toBe("email");
    const own = await call(engageRoute, "POST", { projectId }, { email: "engineer@demo.pierwise.test" });
    expect(own.status).toBe(422);
    expect(own.json.errors[0].message).toMatch(/already a member/);
    const email = `twice-${crypto.randomUUID().slice(0, 8)}@example.test`;
    expect((await call(engageRoute, "POST", { projectId }, { email })).status).toBe(201);
    expect((await call(engageRoute, "POST", { projectId }, { email })).status).toBe(409);
  });
});

describe("GET and DELETE /api/projects/:projectId/engagements", () => {
  it("lists a project's engagements to its members only", async () => {
    const { projectId } = await freshDesign();
    const engineer = await freshOutsideEngineer();
    const id = await engage(projectId, engineer, "accepted");
    for (const who of [ADMIN, DESIGNER, ENGINEER, INSTALLER]) {
      await actAs(who);
      const { status, json } = await call(listProjectEngagements, "GET", { projectId });
      expect(status).toBe(200);
      expect(json.rows).toEqual([expect.objectContaining({ id, status: "accepted", email: engineer.email })]);
    }
    for (const who of [OUTSIDER, engineer.email]) {
      await actAs(who);
      expect((await call(listProjectEngagements, "GET", { projectId })).status).toBe(404);
    }
  });

  it("revokes (designer, admin): 200 revoked; installers 403; an engagement of another project 404", async () => {
    const { projectId } = await freshDesign();
    const other = await freshDesign();
    const engineer = await freshOutsideEngineer();
    const id = await engage(projectId, engineer, "accepted");
    await actAs(INSTALLER);
    expect((await call(revokeRoute, "DELETE", { projectId, engagementId: id })).status).toBe(403);
    await actAs(DESIGNER);
    expect((await call(revokeRoute, "DELETE", { projectId: other.projectId, engagementId: id })).status).toBe(404);
    const { status, json } = await call(revokeRoute, "DELETE", { projectId, engagementId: id });
    expect(status).toBe(200);
    expect(json.status).toBe("revoked");
    expect((await call(revokeRoute, "DELETE", { projectId, engagementId: id })).status).toBe(409);
    await mailTo(engineer.email, { subject: /Engagement ended/ });
  });
});

describe("GET /api/engagements and accept/decline", () => {
  it("lists the engineer's engagements across contractors with organisation and project", async () => {
    const engineer = await freshOutsideEngineer();
    const a = await freshDesign();
    await engage(a.projectId, engineer, "invited");
    await engage(OTHER_PROJECT_ID, engineer, "accepted", OTHER_ORG_ID);
    await actAs(engineer.email);
    const { status, json } = await call(listMine, "GET", {});
    expect(status).toBe(200);
    expect(json.rows).toHaveLength(2);
    expect(json.rows).toEqual(expect.arrayContaining([
      expect.objectContaining({ status: "invited", organisation: { id: expect.any(String), name: "Example Ground-Mount Co. (demo)" }, project: { id: a.projectId, name: expect.any(String), state: "CO" } }),
      expect.objectContaining({ status: "accepted", organisation: { id: OTHER_ORG_ID, name: "Other Example Solar Co. (demo)" }, project: expect.objectContaining({ id: OTHER_PROJECT_ID }) }),
    ]));
  });

  it("only the invited engineer answers (404 for anyone else); accepting needs a licence; a closed engagement is 409", async () => {
    const { projectId } = await freshDesign();
    const unlicensed = await freshOutsideEngineer({ licensed: false });
    const id = await engage(projectId, unlicensed, "invited");
    for (const who of [DESIGNER, ENGINEER, OUTSIDE_ENGINEER_EMAIL]) {
      await actAs(who);
      expect((await call(accept, "POST", { engagementId: id })).status).toBe(404);
    }
    await actAs(unlicensed.email);
    const noLicence = await call(accept, "POST", { engagementId: id });
    expect(noLicence.status).toBe(422);
    expect(noLicence.json.errors[0]).toMatchObject({ path: "licence" });
    await db("engineer_licences").insert({ user_id: unlicensed.userId, state: "CO", licence_number: "PE-LATE-1", expires_on: "2031-01-31" });
    const ok = await call(accept, "POST", { engagementId: id });
    expect(ok).toMatchObject({ status: 200, json: { id, status: "accepted" } });
    expect((await call(accept, "POST", { engagementId: id })).status).toBe(409);
    // The person who engaged them (here the demo admin, see engage()) hears of the answer.
    const told = await mailTo(ADMIN, { subject: new RegExp(`${unlicensed.email.slice(0, 12)}.* accepted the engagement`) });
    expect(told.text).toContain(`/projects/${projectId}`);
    const declined = await call(decline, "POST", { engagementId: id });
    expect(declined).toMatchObject({ status: 200, json: { status: "declined" } });
    await actAs(null);
    expect((await call(decline, "POST", { engagementId: id })).status).toBe(401);
  });
});

describe("what an engaged engineer may do", () => {
  it("reads the engaged project, its designs, revisions, uploads and reports; every other project of the contractor is 404", async () => {
    const engaged = await freshDesign();
    const file = await freshFile();
    const notEngaged = await freshDesign();
    const engineer = await freshOutsideEngineer();
    await engage(engaged.projectId, engineer, "accepted");
    await engage(file.projectId, engineer, "accepted");
    await actAs(engineer.email);
    expect((await call(getProject, "GET", { projectId: engaged.projectId })).status).toBe(200);
    expect((await call(getDesigns, "GET", { projectId: engaged.projectId })).json.rows).toHaveLength(1);
    expect((await call(getDesign, "GET", { designId: engaged.designId })).status).toBe(200);
    expect((await call(getRevision, "GET", { revisionId: engaged.revisionId })).status).toBe(200);
    expect((await getReport(jsonRequest("GET", "/"), params({ revisionId: engaged.revisionId }))).status).toBe(200);
    expect((await call(getFiles, "GET", { projectId: file.projectId })).json.rows).toHaveLength(1);
    expect((await getFile(jsonRequest("GET", "/"), params(file))).status).toBe(200);
    for (const [h, p] of [
      [getProject, { projectId: notEngaged.projectId }], [getProject, { projectId: DEMO_PROJECT_ID }], [getDesigns, { projectId: notEngaged.projectId }],
      [getDesign, { designId: notEngaged.designId }], [getRevision, { revisionId: notEngaged.revisionId }], [getFiles, { projectId: notEngaged.projectId }],
    ] as const) {
      expect((await call(h as never, "GET", p)).status, JSON.stringify(p)).toBe(404);
    }
    // A file of an engaged project asked for through another engaged project's path: 404.
    expect((await getFile(jsonRequest("GET", "/"), params({ projectId: engaged.projectId, fileId: file.fileId }))).status).toBe(404);
  });

  it("sees only engaged projects in GET /api/projects, each with the contractor's name, and the criteria card that project uses", async () => {
    const engineer = await freshOutsideEngineer();
    const { projectId } = await freshDesign();
    await db("projects").where({ id: projectId }).update({ criteria_card_id: DEMO_CARD_ID });
    await engage(projectId, engineer, "accepted");
    await engage(DEMO_PROJECT_ID, engineer, "revoked");
    await actAs(engineer.email);
    const { json } = await call(listProjects, "GET", {});
    expect(json.rows).toEqual([expect.objectContaining({ id: projectId, organisationName: "Example Ground-Mount Co. (demo)" })]);
    // Counted as its own organisation's kept count plus the engaged projects of other organisations.
    expect([json.total, json.capped]).toEqual([1, undefined]);
    expect((await call(getProject, "GET", { projectId })).json.criteriaCard.id).toBe(DEMO_CARD_ID);
  });

  it("an engineer engaged by two contractors cannot read one's data through the other's ids", async () => {
    const engineer = await freshOutsideEngineer();
    const ours = await freshDesign();
    await engage(ours.projectId, engineer, "accepted");
    // Engaged by the other contractor on its project, and on the demo contractor's project by a forged row of the
    // other contractor: the engagement must be the record's own organisation's to count.
    await engage(OTHER_PROJECT_ID, engineer, "accepted", OTHER_ORG_ID);
    const notOurs = await freshDesign();
    await engage(notOurs.projectId, engineer, "accepted", OTHER_ORG_ID);
    await actAs(engineer.email);
    expect((await call(getProject, "GET", { projectId: OTHER_PROJECT_ID })).status).toBe(200);
    expect((await call(getProject, "GET", { projectId: notOurs.projectId })).status).toBe(404);
    expect((await call(getDesign, "GET", { designId: notOurs.designId })).status).toBe(404);
    expect((await call(getRevision, "GET", { revisionId: notOurs.revisionId })).status).toBe(404);
  });

  it("is submitted to, decides with the usual licence checks, and the designer sees the decision; revoking hides everything but keeps the decision", async () => {
    const engineer = await freshOutsideEngineer();
    const d = await makeDesign();
    const stranger = await freshOutsideEngineer();
    await actAs(DESIGNER);
    // Not engaged yet: refused naming the field.
    const refused = await call(submit, "POST", { revisionId: d.revisionId }, { engineerId: engineer.userId });
    expect(refused.status).toBe(422);
    expect(refused.json.errors[0].path).toBe("engineerId");
    const engagementId = await engage(d.projectId, engineer, "accepted");
    expect((await call(submit, "POST", { revisionId: d.revisionId }, { engineerId: engineer.userId })).status).toBe(200);
    await mailTo(engineer.email, { subject: /Review requested/ });

    await engage(d.projectId, stranger, "accepted");
    await actAs(stranger.email);
    // Engaged on the project, but the review was submitted to someone else.
    expect((await call(review, "POST", { revisionId: d.revisionId }, { decision: "request-changes", comments: "Not mine to decide." })).status).toBe(403);

    await actAs(engineer.email);
    const queue = await engineerQueue({ userId: engineer.userId, organisationId: engineer.organisationId }, {}, { state: "waiting" });
    expect(queue.rows).toEqual([expect.objectContaining({ revisionId: d.revisionId, contractor: "Example Ground-Mount Co. (demo)", state: "waiting", failing: expect.any(Array) })]);
    const decided = await call(review, "POST", { revisionId: d.revisionId }, { decision: "request-changes", comments: [{ fieldPath: "site.windSpeedMph", body: "Use the county's 125 mph." }] });
    expect(decided).toMatchObject({ status: 200, json: { status: "changes_requested" } });
    const mail = await mailTo("designer@demo.pierwise.test", { subject: /needs changes/ });
    expect(mail.text).toContain("Use the county's 125 mph.");

    await actAs(DESIGNER);
    expect((await call(revokeRoute, "DELETE", { projectId: d.projectId, engagementId })).status).toBe(200);
    await actAs(engineer.email);
    expect((await call(getProject, "GET", { projectId: d.projectId })).status).toBe(404);
    expect((await call(getRevision, "GET", { revisionId: d.revisionId })).status).toBe(404);
    expect((await call(review, "POST", { revisionId: d.revisionId }, { decision: "approve" })).status).toBe(404);
    expect((await engineerQueue({ userId: engineer.userId, organisationId: engineer.organisationId }, {})).total).toBe(0);
    const kept = await db("reviews").where({ revision_id: d.revisionId, decided_by: engineer.userId }).first("decision");
    expect(kept?.decision).toBe("request_changes");
  });

  it("revoking withdraws a review still waiting for that engineer: the revision goes back to draft", async () => {
    const engineer = await freshOutsideEngineer();
    const d = await makeDesign();
    const engagementId = await engage(d.projectId, engineer, "accepted");
    await actAs(DESIGNER);
    expect((await call(submit, "POST", { revisionId: d.revisionId }, { engineerId: engineer.userId })).status).toBe(200);
    expect((await call(revokeRoute, "DELETE", { projectId: d.projectId, engagementId })).status).toBe(200);
    expect((await db("revisions").where({ id: d.revisionId }).first("status")).status).toBe("draft");
    expect(await db("reviews").where({ revision_id: d.revisionId }).whereNull("decision").first()).toBeUndefined();
  });
});

describe("the engineer's queue across contractors", () => {
  it("pages one queue over every contractor, filtered by contractor and by state (waiting, on hold, decided)", async () => {
    const engineer = await freshOutsideEngineer();
    const me = { userId: engineer.userId, organisationId: engineer.organisationId };
    const waiting = await makeDesign();
    const onHold = await makeDesign();
    await engage(waiting.projectId, engineer, "accepted");
    await engage(onHold.projectId, engineer, "accepted");
    await engage(OTHER_PROJECT_ID, engineer, "accepted", OTHER_ORG_ID);
    const otherRevision = (await db("revisions as r").join("designs as d", "d.id", "r.design_id").where("d.project_id", OTHER_PROJECT_ID).orderBy("r.number", "desc").first("r.id")).id;
    const designer = (await db("users").where({ email: DESIGNER }).first("id")).id;
    const outsider = (await db("users").where({ email: OUTSIDER }).first("id")).id;
    await db("reviews").insert([
      { revision_id: waiting.revisionId, organisation_id: (await db("projects").where({ id: waiting.projectId }).first("organisation_id")).organisation_id, engineer_id: engineer.userId, submitted_by: designer },
      { revision_id: otherRevision, organisation_id: OTHER_ORG_ID, engineer_id: engineer.userId, submitted_by: outsider },
    ]);
    // An approval by this engineer whose design an installer then put on hold.
    const [approval] = await db("reviews").insert({
      revision_id: onHold.revisionId, organisation_id: (await db("projects").where({ id: onHold.projectId }).first("organisation_id")).organisation_id, engineer_id: engineer.userId,
      submitted_by: designer, decision: "approve", decided_by: engineer.userId, decided_at: db.fn.now(), engineer_name: "Test", licence_number: "PE-T", licence_state: "CO",
      verify_code: crypto.randomUUID(), facts_snapshot: JSON.stringify({ projectName: "Queue test site", projectAddress: "1 Test Lane (invented)", projectState: "CO", criteria: null }),
    }).returning("organisation_id");
    // As the decision does: the approval record and the revision's status together.
    await db("revisions").where({ id: onHold.revisionId }).update({ status: "approved" });
    await db("design_holds").insert({ design_id: onHold.designId, organisation_id: approval.organisation_id, revision_id: onHold.revisionId, reason: "Hole P1 shallower than specified.", raised_by: designer });

    const all = await engineerQueue(me, {});
    expect(all.total).toBe(3);
    // Waiting first, then on hold (the default order).
    expect(all.rows.map((r) => r.state)).toEqual(["waiting", "waiting", "on_hold"]);
    expect(new Set(all.rows.map((r) => r.contractor))).toEqual(new Set(["Example Ground-Mount Co. (demo)", "Other Example Solar Co. (demo)"]));
    const theirs = await engineerQueue(me, {}, { contractor: OTHER_ORG_ID });
    expect(theirs.rows.map((r) => r.revisionId)).toEqual([otherRevision]);
    expect((await engineerQueue(me, {}, { state: "on_hold" })).rows.map((r) => r.revisionId)).toEqual([onHold.revisionId]);
    expect((await engineerQueue(me, { pageSize: 1, page: 2 })).rows).toHaveLength(1);
  });
});
