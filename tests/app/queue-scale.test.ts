/**
 * Reads that used to sort or probe everything now read a page from an index (issue 19, migration
 * 20261204100000); these tests hold them to the same rows, order and counts:
 * - the engineer's queue in its default order (waiting, on hold, decided; oldest submission first
 *   in each) is read per state from the index, and must equal the whole visible queue sorted;
 * - reviews carry their revision's design and number, whatever a caller writes;
 * - "the newest decided revision of this design" (pinned comments, changes since the last review)
 *   is one probe of reviews by design, and must pick the same revision as looking through them all.
 */
import crypto from "node:crypto";
import { describe, expect, it } from "vitest";
import { db } from "@/db/client";
import { DEMO_ORG_ID, OTHER_ORG_ID } from "@/db/seeds/01_demo_accounts";
import { OTHER_PROJECT_ID } from "@/db/seeds/02_demo_projects";
import { engineerQueue, queueContractors, type QueueState } from "@/db/queries/engineer-queue";
import { lastReviewed, lastReviewedBy } from "@/db/queries/review-queue";
import { pinnedCommentsOfLatestDecision } from "@/db/queries/review-comments";
import { twoPostDesignInput } from "@/engine";
import { addRevision, DESIGNER, ENGINEER, makeDesign, userId } from "../support/review-fixtures";
import { engage, freshOutsideEngineer } from "../support/engagement-fixtures";

const facts = JSON.stringify({ projectName: "Queue order site", projectAddress: "1 Test Lane (invented)", projectState: "CO", criteria: null });

/** A decided review's columns (the checks on reviews want who, when and the name; an approval its licence and record). */
function decided(decision: "approve" | "request_changes", engineerId: string, at: Date) {
  return {
    decision, decided_by: engineerId, decided_at: at, engineer_name: "Test Engineer, P.E.",
    ...(decision === "approve" && { licence_number: "PE-T1", licence_state: "CO", verify_code: crypto.randomUUID(), facts_snapshot: facts }),
  };
}

const RANK: Record<QueueState, number> = { waiting: 0, on_hold: 1, decided: 2 };

describe("the engineer's queue in its default order", () => {
  it("lists every state's rows in the same order and counts as sorting the whole queue, on every page and in both directions", async () => {
    const engineer = await freshOutsideEngineer();
    const me = { userId: engineer.userId, organisationId: engineer.organisationId };
    const designer = await userId(DESIGNER);
    const base = Date.parse("2026-06-01T12:00:00Z");
    // 12 reviews, each on its own engaged project: waiting, sent back, approved, approved and then held.
    // Submission times interleave the states, and two pairs share a time (the id breaks the tie).
    const plan: { kind: "waiting" | "request_changes" | "approve" | "held"; minute: number }[] = [
      { kind: "approve", minute: 1 }, { kind: "waiting", minute: 2 }, { kind: "held", minute: 3 }, { kind: "request_changes", minute: 4 },
      { kind: "waiting", minute: 5 }, { kind: "waiting", minute: 5 }, { kind: "approve", minute: 6 }, { kind: "held", minute: 6 },
      { kind: "request_changes", minute: 7 }, { kind: "waiting", minute: 8 }, { kind: "approve", minute: 9 }, { kind: "request_changes", minute: 10 },
    ];
    const expected: { reviewId: string; state: QueueState; submittedAt: number }[] = [];
    for (const [i, step] of plan.entries()) {
      const d = await makeDesign({ projectName: `Queue order site ${i}` });
      await engage(d.projectId, engineer, "accepted");
      const submittedAt = new Date(base + step.minute * 60_000);
      const decidedAt = new Date(base + (step.minute + 30) * 60_000);
      const [review] = await db("reviews").insert({
        revision_id: d.revisionId, organisation_id: DEMO_ORG_ID, engineer_id: engineer.userId, submitted_by: designer, submitted_at: submittedAt,
        ...(step.kind === "waiting" ? {} : decided(step.kind === "request_changes" ? "request_changes" : "approve", engineer.userId, decidedAt)),
      }).returning("id");
      if (step.kind === "approve" || step.kind === "held") await db("revisions").where({ id: d.revisionId }).update({ status: "approved" });
      if (step.kind === "held") {
        await db("design_holds").insert({ design_id: d.designId, organisation_id: DEMO_ORG_ID, revision_id: d.revisionId, reason: "Hole P1 shallower than specified.", raised_by: designer });
      }
      expected.push({ reviewId: review.id, state: step.kind === "waiting" ? "waiting" : step.kind === "held" ? "on_hold" : "decided", submittedAt: submittedAt.getTime() });
    }
    // A review on a project whose engagement was revoked is not in the queue.
    const gone = await makeDesign();
    await engage(gone.projectId, engineer, "revoked");
    await db("reviews").insert({ revision_id: gone.revisionId, organisation_id: DEMO_ORG_ID, engineer_id: engineer.userId, submitted_by: designer, submitted_at: new Date(base) });

    const sorted = (dir: 1 | -1, state?: QueueState) => expected
      .filter((e) => !state || e.state === state)
      .sort((a, b) => dir * (RANK[a.state] - RANK[b.state]) || a.submittedAt - b.submittedAt || (a.reviewId < b.reviewId ? -1 : a.reviewId > b.reviewId ? 1 : 0))
      .map((e) => [e.reviewId, e.state]);
    const walk = async (query: { dir?: "asc" | "desc"; pageSize: number }, state?: QueueState) => {
      const rows: [string, QueueState][] = [];
      const totals = new Set<number>();
      for (let page = 1; page <= 20; page++) {
        const got = await engineerQueue(me, { ...query, page }, { state });
        totals.add(got.total);
        if (!got.rows.length) break;
        rows.push(...got.rows.map((r) => [r.reviewId, r.state] as [string, QueueState]));
      }
      return { rows, totals: [...totals] };
    };

    expect(expected.filter((e) => e.state === "on_hold")).toHaveLength(2);
    for (const pageSize of [1, 5, 20]) {
      expect(await walk({ pageSize })).toEqual({ rows: sorted(1), totals: [12] });
      expect(await walk({ pageSize, dir: "desc" })).toEqual({ rows: sorted(-1), totals: [12] });
    }
    for (const state of ["waiting", "on_hold", "decided"] as const) {
      const rows = sorted(1, state);
      expect(await walk({ pageSize: 3 }, state)).toEqual({ rows, totals: [rows.length] });
    }
    // A page past the end still says how many there are.
    const past = await engineerQueue(me, { page: 9, pageSize: 5 });
    expect([past.rows, past.total]).toEqual([[], 12]);
    // With the count capped (QUEUE_COUNT_CAP, 5 here): the same rows on every page, the total is
    // the cap and says so ("5+"), and it always reaches a page beyond the current one, so paging on
    // works; once the cap passes the whole queue the count is exact again.
    const cappedWalk: [string, QueueState][] = [];
    const seen: [number, number, boolean][] = [];
    for (let page = 1; page <= 7; page++) {
      const got = await engineerQueue(me, { page, pageSize: 2 }, {}, 5);
      seen.push([page, got.total, got.capped === true]);
      cappedWalk.push(...got.rows.map((r) => [r.reviewId, r.state] as [string, QueueState]));
    }
    expect(cappedWalk).toEqual(sorted(1));
    // cap = max(5, page × 2 + 2): 5, 6, 8, 10 (capped: 12 reviews are more), then 12, 14, 16 (exact;
    // page 7 is past the end and is counted on its own with its own page's cap).
    expect(seen).toEqual([[1, 5, true], [2, 6, true], [3, 8, true], [4, 10, true], [5, 12, false], [6, 12, false], [7, 12, false]]);
    // Six decided (three sent back, three approved, not held) and four waiting, counted to 3.
    expect(await engineerQueue(me, { pageSize: 1 }, { state: "decided" }, 3)).toMatchObject({ total: 3, capped: true });
    expect(await engineerQueue(me, { pageSize: 1 }, { state: "waiting" }, 3)).toMatchObject({ total: 3, capped: true });
    const exact = await engineerQueue(me, { pageSize: 1 }, { state: "waiting" }, 4);
    expect([exact.total, exact.capped]).toEqual([4, undefined]);
    const onHold = await engineerQueue(me, { pageSize: 2 }, { state: "on_hold" }, 1);
    expect([onHold.total, onHold.capped]).toEqual([2, undefined]);
    expect((await engineerQueue(me, { pageSize: 20 }, {}, 5)).capped).toBeUndefined();
    // The contractor filter lists the demo organisation (reviews on engaged projects), not another
    // contractor that engaged them but submitted nothing, nor their own firm (nothing of it submitted).
    await engage(OTHER_PROJECT_ID, engineer, "accepted", OTHER_ORG_ID);
    expect((await queueContractors(me)).map((c) => c.id)).toEqual([DEMO_ORG_ID]);
    // The rows carry their details, joined for the page only.
    const first = (await engineerQueue(me, { pageSize: 1 })).rows[0];
    expect(first).toMatchObject({ state: "waiting", contractor: "Example Ground-Mount Co. (demo)", decision: null, decidedAt: null });
    expect(first.projectName).toMatch(/^Queue order site \d+$/);
  });
});

describe("reviews carry their revision's design and number", () => {
  it("are copied from the revision on insert and cannot be written otherwise", async () => {
    const a = await makeDesign();
    const b = await makeDesign();
    const second = await addRevision(a.designId, twoPostDesignInput);
    const [review] = await db("reviews").insert({
      revision_id: second, organisation_id: DEMO_ORG_ID, engineer_id: await userId(ENGINEER), submitted_by: await userId(DESIGNER),
      design_id: b.designId, revision_number: 99,
    }).returning(["id", "design_id", "revision_number"]);
    expect([review.design_id, review.revision_number]).toEqual([a.designId, 2]);
    await db("reviews").where({ id: review.id }).update({ design_id: b.designId, revision_number: 7 });
    expect(await db("reviews").where({ id: review.id }).first("design_id", "revision_number")).toEqual({ design_id: a.designId, revision_number: 2 });
  });
});

describe("the newest decided revision of a design", () => {
  it("is the highest-numbered revision with a decision, at or before the one asked about, by anyone or by one engineer", async () => {
    const { designId, revisionId: r1 } = await makeDesign();
    const [r2, r3, r4] = [await addRevision(designId, twoPostDesignInput), await addRevision(designId, twoPostDesignInput), await addRevision(designId, twoPostDesignInput)];
    const demoEngineer = await userId(ENGINEER);
    const other = (await freshOutsideEngineer()).userId;
    const designer = await userId(DESIGNER);
    const submit = async (revisionId: string, decision?: { by: string; minute: number }) => {
      const [v] = await db("reviews").insert({
        revision_id: revisionId, organisation_id: DEMO_ORG_ID, engineer_id: decision?.by ?? demoEngineer, submitted_by: designer,
        ...(decision && decided("request_changes", decision.by, new Date(Date.parse("2026-06-01T12:00:00Z") + decision.minute * 60_000))),
      }).returning("id");
      return v.id as string;
    };
    // r1 sent back by the demo engineer, r2 by another engineer, r3 submitted and not decided yet.
    const v1 = await submit(r1, { by: demoEngineer, minute: 1 });
    const v2 = await submit(r2, { by: other, minute: 2 });
    await submit(r3);
    await db("review_comments").insert([
      { review_id: v1, field_path: "site.windSpeedMph", body: "First round: confirm the wind speed.", author_id: demoEngineer },
      { review_id: v2, field_path: "posts.holeDiameterIn", body: "Second round: widen the holes.", author_id: other },
    ]);

    const number = async (row: { id: string } | undefined) => (row ? (await db("revisions").where({ id: row.id }).first("number")).number : undefined);
    expect(await number(await lastReviewed(designId, 4))).toBe(2);
    expect(await number(await lastReviewed(designId, 2))).toBe(1);
    expect(await lastReviewed(designId, 1)).toBeUndefined();
    expect(await number(await lastReviewedBy(designId, 4, demoEngineer))).toBe(1);
    expect(await number(await lastReviewedBy(designId, 4, other))).toBe(2);
    expect((await lastReviewed(designId, 4))?.input).toEqual((await db("revisions").where({ id: r2 }).first("input")).input);

    const pinned = async (upTo: number) => (await pinnedCommentsOfLatestDecision(designId, upTo)).map((c) => [c.revisionNumber, c.body]);
    expect(await pinned(4)).toEqual([[2, "Second round: widen the holes."]]);
    expect(await pinned(1)).toEqual([[1, "First round: confirm the wind speed."]]);
    // Once r3 is sent back too, it is the newest decided one (its review went from open to decided).
    await db("reviews").where({ revision_id: r3 }).whereNull("decision").update(decided("request_changes", demoEngineer, new Date()));
    expect(await number(await lastReviewed(designId, 4))).toBe(3);
    expect(await pinned(3)).toEqual([]);
    expect(r4).toBeTruthy();
  });
});
