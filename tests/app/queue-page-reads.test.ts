/**
 * Issue 19, fourth pass: the queue and reviews pages read fewer and cheaper statements, with the
 * same rows and counts as before:
 * - the queue's failing checks come from `revisions.footing_failing_checks` (20261204600000), which
 *   must equal what the queue computed from the result JSON for every revision;
 * - the reviews page reads each list with its count in one statement;
 * - the queue page reads only unanswered engagements, the same ones it filtered out of all of them.
 */
import { describe, expect, it } from "vitest";
import { db } from "@/db/client";
import { DEMO_ORG_ID } from "@/db/seeds/01_demo_accounts";
import { engineerQueue } from "@/db/queries/engineer-queue";
import { engagementsOfPerson, invitationsOfPerson } from "@/db/queries/engagements";
import { countOpenHolds, openHoldsOfOrganisation, openHoldsWithCount } from "@/db/queries/holds";
import { countWaitingFor, waitingFor, waitingForWithCount } from "@/db/queries/review-queue";
import { ENGINEER, freshAsBuilt, freshInReview, makeDesign, userId } from "../support/review-fixtures";
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
  it("gives the first waiting reviews and the count of all of them", async () => {
    for (let i = 0; i < 3; i++) await freshInReview();
    const engineer = await userId(ENGINEER);
    const total = await countWaitingFor(DEMO_ORG_ID, engineer);
    expect(total).toBeGreaterThan(2);
    expect(await waitingForWithCount(DEMO_ORG_ID, engineer, 2)).toEqual({ rows: await waitingFor(DEMO_ORG_ID, engineer, 2), total });
  });

  it("gives the oldest open holds and the count of all of them", async () => {
    await freshAsBuilt({ hold: true });
    await freshAsBuilt({ hold: true });
    const total = await countOpenHolds(DEMO_ORG_ID);
    expect(total).toBeGreaterThan(1);
    expect(await openHoldsWithCount(DEMO_ORG_ID, 1)).toEqual({ rows: await openHoldsOfOrganisation(DEMO_ORG_ID, 1), total });
  });

  it("counts 0 where nothing waits and nothing is held", async () => {
    const firm = await freshOutsideEngineer();
    expect(await waitingForWithCount(firm.organisationId, firm.userId)).toEqual({ rows: [], total: 0 });
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
