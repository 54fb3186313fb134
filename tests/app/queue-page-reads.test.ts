/**
 * Issue 19, fourth pass: the queue and reviews pages read fewer and cheaper statements, with the
 * same rows and counts as before:
 * - the queue's failing checks come from `revisions.footing_failing_checks` (20261204600000), which
 *   must equal what the queue computed from the result JSON for every revision;
 * - the reviews page reads its three review lists and the waiting count in one statement, and the
 *   open holds with their count in another;
 * - the queue page reads only unanswered engagements, the same ones it filtered out of all of them.
 */
import { describe, expect, it } from "vitest";
import { db } from "@/db/client";
import { DEMO_ORG_ID } from "@/db/seeds/01_demo_accounts";
import { engineerQueue } from "@/db/queries/engineer-queue";
import { engagementsOfPerson, invitationsOfPerson } from "@/db/queries/engagements";
import { countOpenHolds, openHoldsOfOrganisation, openHoldsWithCount } from "@/db/queries/holds";
import { countWaitingFor, recentlyDecided, reviewLists, submittedBy, waitingFor, type QueueRow } from "@/db/queries/review-queue";
import { DESIGNER, ENGINEER, freshApproved, freshAsBuilt, freshInReview, makeDesign, userId } from "../support/review-fixtures";
import { engage, freshOutsideEngineer } from "../support/engagement-fixtures";

/** The failing checks as the queue read them before the column: from the stored result. */
const FROM_JSON = `coalesce((SELECT jsonb_agg(c->>'title') FROM jsonb_array_elements(r.result->'footing'->'checks') c
  WHERE (c->>'pass')::boolean IS FALSE), '[]'::jsonb)`;

describe("failing checks as a column", () => {
  it("equals the titles of the result's failing footing checks, in order, for every stored revision", async () => {
    await freshInReview();
    const rows = (await db.raw(`SELECT r.id, coalesce(r.footing_failing_checks, '[]'::jsonb) AS col, ${FROM_JSON} AS json FROM revisions r`)).rows as { id: string; col: string[]; json: string[] }[];
    expect(rows.length).toBeGreaterThan(0);
    // The seeded designs include one whose post bending check fails, so both cases are covered.
    expect(rows.some((r) => r.json.length > 0)).toBe(true);
    expect(rows.some((r) => r.json.length === 0)).toBe(true);
    for (const r of rows) expect({ id: r.id, failing: r.col }).toEqual({ id: r.id, failing: r.json });
  });

  it("cannot be written: it is worked out from the result", async () => {
    const d = await makeDesign();
    await expect(db("revisions").where({ id: d.revisionId }).update({ footing_failing_checks: JSON.stringify(["Forged"]) })).rejects.toThrow(/can only be updated to DEFAULT/);
  });

  it("is what the queue shows for each row", async () => {
    await freshInReview();
    const me = { userId: await userId(ENGINEER), organisationId: DEMO_ORG_ID };
    const page = await engineerQueue(me, { pageSize: 100 });
    expect(page.rows.length).toBeGreaterThan(0);
    const expected = new Map(((await db.raw(`SELECT r.id, ${FROM_JSON} AS json FROM revisions r WHERE r.id = ANY(?)`, [page.rows.map((r) => r.revisionId)])).rows as { id: string; json: string[] }[]).map((r) => [r.id, r.json]));
    for (const row of page.rows) expect(row.failing).toEqual(expected.get(row.revisionId));
  });
});

describe("reviews page lists with their counts in one statement", () => {
  it("reads the waiting, submitted and decided lists as the single-list reads do, with the waiting count", async () => {
    for (let i = 0; i < 3; i++) await freshInReview();
    await freshApproved();
    const engineer = await userId(ENGINEER);
    const designer = await userId(DESIGNER);
    const total = await countWaitingFor(DEMO_ORG_ID, engineer);
    expect(total).toBeGreaterThan(2);
    // Equal submission or decision times may come in either order (neither read breaks such ties).
    const key = (rows: QueueRow[] | null) => rows?.map((r) => `${r.revisionId} ${new Date(r.submittedAt).getTime()} ${r.decidedAt ? new Date(r.decidedAt).getTime() : ""} ${r.status} ${r.superseded} ${r.onHold} ${r.designName} ${r.projectName} ${r.engineerName} ${r.submittedByName}`).sort() ?? null;
    const byTime = (rows: QueueRow[] | null, at: (r: QueueRow) => Date | null) => rows?.map((r) => new Date(at(r) ?? 0).getTime()) ?? null;
    const engineerLists = await reviewLists(DEMO_ORG_ID, engineer, { engineer: true, designer: false }, 2, 3);
    expect(key(engineerLists.waiting)).toEqual(key(await waitingFor(DEMO_ORG_ID, engineer, 2)));
    expect(byTime(engineerLists.waiting, (r) => r.submittedAt)).toEqual(byTime(await waitingFor(DEMO_ORG_ID, engineer, 2), (r) => r.submittedAt));
    expect([engineerLists.waitingTotal, engineerLists.waitingCapped, engineerLists.mine]).toEqual([total, false, null]);
    expect(key(engineerLists.decided)).toEqual(key(await recentlyDecided(DEMO_ORG_ID, 3)));
    expect(byTime(engineerLists.decided, (r) => r.decidedAt)).toEqual(byTime(await recentlyDecided(DEMO_ORG_ID, 3), (r) => r.decidedAt));
    const designerLists = await reviewLists(DEMO_ORG_ID, designer, { engineer: false, designer: true }, 2, 3);
    expect([designerLists.waiting, designerLists.waitingTotal]).toEqual([null, 0]);
    expect(key(designerLists.mine)).toEqual(key(await submittedBy(DEMO_ORG_ID, designer, 2)));
    expect(byTime(designerLists.mine, (r) => r.submittedAt)).toEqual(byTime(await submittedBy(DEMO_ORG_ID, designer, 2), (r) => r.submittedAt));
    // Counted to a cap: past it, the cap and "more" (the page says "1,000+").
    const capped = await reviewLists(DEMO_ORG_ID, engineer, { engineer: true, designer: false }, 2, 3, 2);
    expect([capped.waitingTotal, capped.waitingCapped]).toEqual([2, true]);
    const exact = await reviewLists(DEMO_ORG_ID, engineer, { engineer: true, designer: false }, 2, 3, total);
    expect([exact.waitingTotal, exact.waitingCapped]).toEqual([total, false]);
  });

  it("gives the oldest open holds and the count of all of them", async () => {
    await freshAsBuilt({ hold: true });
    const held = await freshAsBuilt({ hold: true });
    const total = await countOpenHolds(DEMO_ORG_ID);
    // Picked first, then joined: each hold carries its names and revision number, and no clearer.
    const all = await openHoldsOfOrganisation(DEMO_ORG_ID, 1000);
    const row = all.find((h) => h.id === held.holdId)!;
    const revision = await db("revisions as r").join("designs as d", "d.id", "r.design_id").join("projects as p", "p.id", "d.project_id").where("r.id", held.revisionId).first("r.number", "d.name as designName", "p.name as projectName");
    expect(row).toMatchObject({ ...revision, designId: held.designId, revisionId: held.revisionId, raisedByName: expect.any(String), clearedByName: null, clearedAt: null });
    expect(all.map((h) => new Date(h.raisedAt).getTime())).toEqual(all.map((h) => new Date(h.raisedAt).getTime()).sort((a, b) => a - b));
    expect(total).toBeGreaterThan(1);
    expect(await openHoldsWithCount(DEMO_ORG_ID, 1)).toEqual({ rows: await openHoldsOfOrganisation(DEMO_ORG_ID, 1), total });
  });

  it("counts 0 where nothing waits and nothing is held", async () => {
    const firm = await freshOutsideEngineer();
    expect(await reviewLists(firm.organisationId, firm.userId, { engineer: true, designer: true })).toEqual({ waiting: [], waitingTotal: 0, waitingCapped: false, mine: [], decided: [] });
    expect(await openHoldsWithCount(firm.organisationId)).toEqual({ rows: [], total: 0 });
  });
});

describe("the queue page's unanswered engagements", () => {
  it("are the person's invited engagements, newest first, by account or by e-mail", async () => {
    const engineer = await freshOutsideEngineer();
    for (const status of ["invited", "accepted", "declined", "invited", "revoked"] as const) {
      const d = await makeDesign({ projectName: `Engagement list site ${status}` });
      await engage(d.projectId, engineer, status);
    }
    const all = await engagementsOfPerson(engineer.userId, engineer.email);
    expect(all.length).toBe(5);
    const invited = await invitationsOfPerson(engineer.userId, engineer.email);
    expect(invited.length).toBe(2);
    expect(invited).toEqual(all.filter((e) => e.status === "invited"));
  });
});
