/**
 * Issue 12, finding 11: submitting a revision while a newer revision of the same design is being
 * saved. Only the newest revision may be submitted, so the two must come out in one of two orders:
 * the save first (the submit is then refused with 409 and nothing is in review), or the submit
 * first (the new revision is written after the submission). Both succeeding with the submission
 * committed after the newer revision existed is the race this guards.
 */
import { describe, expect, it } from "vitest";
import { POST as submit } from "@/app/api/revisions/[revisionId]/submit/route";
import { POST as save } from "@/app/api/designs/[designId]/revisions/route";
import { db } from "@/db/client";
import { DEMO_ORG_ID } from "@/db/seeds/01_demo_accounts";
import { createRevision } from "@/db/queries/revisions";
import { actAs, jsonRequest, params } from "../support/next-context";
import { DESIGNER, ENGINEER, makeDesign, userId } from "../support/review-fixtures";

async function storedInput(revisionId: string) {
  return (await db("revisions").where({ id: revisionId }).first("input", "result", "engine_version")) as { input: Record<string, unknown>; result: unknown; engine_version: string };
}

const submitRequest = (revisionId: string, engineerId: string) =>
  submit(jsonRequest("POST", `/api/revisions/${revisionId}/submit`, { engineerId }), params({ revisionId }));

/** Resolves once some session of this database waits for a row lock (the submit, behind the save). */
async function someoneWaitsOnALock(): Promise<void> {
  for (;;) {
    const { rows } = await db.raw("SELECT count(*)::int AS n FROM pg_stat_activity WHERE datname = current_database() AND wait_event_type = 'Lock'");
    if (rows[0].n > 0) return;
    await new Promise((r) => setTimeout(r, 20));
  }
}

describe("submit racing a save of the same design", () => {
  it("a submit that arrives while a newer revision is being written waits for it, then is refused (409)", async () => {
    const engineerId = await userId(ENGINEER);
    const { designId, revisionId } = await makeDesign();
    const stored = await storedInput(revisionId);
    await actAs(DESIGNER);
    // A save in flight: its transaction has written revision 2 and holds the design, not yet committed.
    const inFlight = await db.transaction();
    let submitted: Promise<Response> | undefined;
    try {
      await createRevision({ designId, organisationId: DEMO_ORG_ID, baseRevisionId: revisionId, input: stored.input, result: stored.result,
        engineVersion: stored.engine_version, note: "saved meanwhile", authorId: await userId(DESIGNER) }, inFlight);
      submitted = submitRequest(revisionId, engineerId);
      // Either the submit finishes on its own (the race: it saw revision 1 as the newest), or it waits.
      await Promise.race([submitted, someoneWaitsOnALock()]);
      await inFlight.commit();
    } finally {
      if (!inFlight.isCompleted()) await inFlight.rollback();
    }
    const response = await submitted!;
    expect(response.status).toBe(409);
    expect((await response.json()).errors[0].message).toMatch(/not the newest/);
    expect((await db("revisions").where({ id: revisionId }).first("status")).status).toBe("draft");
    expect(await db("reviews").where({ revision_id: revisionId }).first()).toBeUndefined();
  });

  it("40 races through the API end in one of the two orders, never both at once", { timeout: 120_000 }, async () => {
    const engineerId = await userId(ENGINEER);
    const outcomes = { saveFirst: 0, submitFirst: 0 };
    for (let i = 0; i < 40; i++) {
      const { designId, revisionId } = await makeDesign();
      const { input } = await storedInput(revisionId);
      await actAs(DESIGNER);
      const [submitted, saved] = await Promise.all([
        submitRequest(revisionId, engineerId),
        save(jsonRequest("POST", `/api/designs/${designId}/revisions`, { baseRevisionId: revisionId, input, note: `race ${i}` }), params({ designId })),
      ]);
      expect(saved.status, `race ${i}: the save`).toBe(201);
      const newer = await db("revisions").where({ design_id: designId, number: 2 }).first("created_at");
      const review = await db("reviews").where({ revision_id: revisionId }).first("submitted_at");
      const status = (await db("revisions").where({ id: revisionId }).first("status")).status;
      if (submitted.status === 409) {
        outcomes.saveFirst++;
        expect([status, review], `race ${i}: refused submit changed nothing`).toEqual(["draft", undefined]);
      } else {
        outcomes.submitFirst++;
        expect(submitted.status, `race ${i}: the submit`).toBe(200);
        expect(status).toBe("in_review");
        // The submission happened while revision 1 was still the newest.
        expect(new Date(review.submitted_at).getTime(), `race ${i}: submitted after revision 2 was written`).toBeLessThan(new Date(newer.created_at).getTime());
      }
    }
    expect(outcomes.saveFirst + outcomes.submitFirst).toBe(40);
  });
});
