import type { Knex } from "knex";
import { db } from "../client";

/** A review comment pinned to an input, with who made it and the revision it was made on. */
export interface PinnedCommentRow {
  id: string;
  fieldPath: string;
  body: string;
  createdAt: Date;
  authorName: string;
  revisionNumber: number;
  /** The whole input of the revision the comment was made on (to tell whether the field changed since). */
  revisionInput: Record<string, unknown>;
}

const json = <T>(v: unknown): T => (typeof v === "string" ? JSON.parse(v) : v) as T;

/**
 * The pinned comments of the design's most recent decision up to revision `upToNumber`: every
 * comment pinned to an input on the newest revision (at or before it) that an engineer decided on.
 * Older rounds were answered by the revisions that followed them; the latest round is what the
 * designer is working on now. Oldest comment first.
 */
export async function pinnedCommentsOfLatestDecision(designId: string, upToNumber: number, trx: Knex = db): Promise<PinnedCommentRow[]> {
  // One backward probe of reviews (design_id, revision_number), not a review lookup per earlier revision.
  const latest = trx("reviews as v")
    .where("v.design_id", designId)
    .where("v.revision_number", "<=", upToNumber)
    .whereNotNull("v.decision")
    .orderBy("v.revision_number", "desc")
    .limit(1)
    .select("v.revision_id");
  const decided = await trx("revisions as r").whereIn("r.id", latest).first("r.id", "r.number", "r.input");
  if (!decided) return [];
  const rows = await trx("review_comments as c")
    .join("reviews as v", "v.id", "c.review_id")
    .leftJoin("users as u", "u.id", "c.author_id")
    .where("v.revision_id", decided.id)
    .whereNotNull("v.decision")
    .whereNotNull("c.field_path")
    .orderBy("c.created_at", "asc")
    .select("c.id", "c.field_path as fieldPath", "c.body", "c.created_at as createdAt", trx.raw("coalesce(u.name, v.engineer_name) as \"authorName\""));
  const revisionInput = json<Record<string, unknown>>(decided.input);
  return rows.map((r) => ({ ...r, revisionNumber: Number(decided.number), revisionInput }));
}
