/**
 * Approval pins a revision in the database itself: direct SQL cannot change or delete an approved
 * revision, its approval record or that record's comments, while unapproved rows still move on.
 */
import { describe, expect, it } from "vitest";
import { db } from "@/db/client";
import { DEMO_ORG_ID } from "@/db/seeds/01_demo_accounts";
import { ENGINEER, DESIGNER, makeDesign, userId } from "../support/review-fixtures";

async function approvedRevision() {
  const { designId, revisionId } = await makeDesign();
  const engineer = await userId(ENGINEER);
  await db("revisions").where({ id: revisionId }).update({ status: "in_review" });
  const [review] = await db("reviews").insert({ revision_id: revisionId, organisation_id: DEMO_ORG_ID, engineer_id: engineer, submitted_by: await userId(DESIGNER) }).returning("id");
  await db("review_comments").insert({ review_id: review.id, body: "Looks right.", author_id: engineer });
  await db("reviews").where({ id: review.id }).update({ decision: "approve", decided_by: engineer, decided_at: db.fn.now(), engineer_name: "Eli Engineer, P.E.", licence_number: "PE-000000-DEMO", licence_state: "CO", verify_code: `pin-test-${review.id}`, facts_snapshot: JSON.stringify({ projectName: "x", projectAddress: "", projectState: "CO", criteria: null }) });
  await db("revisions").where({ id: revisionId }).update({ status: "approved" });
  return { designId, revisionId, reviewId: review.id as string };
}

const PINNED = /approved and pinned|approval record/;

describe("the approval pin (PostgreSQL trigger)", () => {
  it("refuses UPDATE of any column of an approved revision, by raw SQL", async () => {
    const { revisionId } = await approvedRevision();
    await expect(db.raw("UPDATE revisions SET input = '{}'::jsonb WHERE id = ?", [revisionId])).rejects.toThrow(PINNED);
    await expect(db.raw("UPDATE revisions SET status = 'draft' WHERE id = ?", [revisionId])).rejects.toThrow(PINNED);
    await expect(db.raw("UPDATE revisions SET note = 'edited later' WHERE id = ?", [revisionId])).rejects.toThrow(PINNED);
    const row = await db("revisions").where({ id: revisionId }).first("status", "note");
    expect(row).toEqual({ status: "approved", note: "" });
  });

  it("refuses DELETE of an approved revision, and of its design (the cascade hits the pin)", async () => {
    const { designId, revisionId } = await approvedRevision();
    await expect(db.raw("DELETE FROM revisions WHERE id = ?", [revisionId])).rejects.toThrow(PINNED);
    await expect(db.raw("DELETE FROM designs WHERE id = ?", [designId])).rejects.toThrow(PINNED);
    expect(await db("revisions").where({ id: revisionId }).first("id")).toBeTruthy();
  });

  it("refuses UPDATE and DELETE of the approval record and of its comments", async () => {
    const { reviewId } = await approvedRevision();
    await expect(db.raw("UPDATE reviews SET licence_number = 'PE-FORGED' WHERE id = ?", [reviewId])).rejects.toThrow(PINNED);
    await expect(db.raw("DELETE FROM reviews WHERE id = ?", [reviewId])).rejects.toThrow(PINNED);
    await expect(db.raw("UPDATE review_comments SET body = 'changed' WHERE review_id = ?", [reviewId])).rejects.toThrow(/approval record/);
    await expect(db.raw("DELETE FROM review_comments WHERE review_id = ?", [reviewId])).rejects.toThrow(/approval record/);
    await expect(db("review_comments").insert({ review_id: reviewId, body: "added afterwards", author_id: await userId(ENGINEER) })).rejects.toThrow(/approval record/);
    expect((await db("reviews").where({ id: reviewId }).first()).licence_number).toBe("PE-000000-DEMO");
  });

  it("lets rows that are not approved move on (draft → in_review → changes_requested) and be deleted", async () => {
    const { revisionId } = await makeDesign();
    await db.raw("UPDATE revisions SET status = 'in_review' WHERE id = ?", [revisionId]);
    await db.raw("UPDATE revisions SET status = 'changes_requested' WHERE id = ?", [revisionId]);
    expect((await db("revisions").where({ id: revisionId }).first("status")).status).toBe("changes_requested");
    await db.raw("DELETE FROM revisions WHERE id = ?", [revisionId]);
    expect(await db("revisions").where({ id: revisionId }).first()).toBeUndefined();
  });
});
