import type { Knex } from "knex";
import type { DesignResult } from "@/engine";
import { db } from "../client";
import { isUuid } from "../ids";

/** Revision statuses as stored; "superseded" is derived (see `displayStatus` in app/_lib/review/standing.ts). */
export type RevisionStatus = "draft" | "in_review" | "approved" | "changes_requested";

/** A revision with what review, field spec and report need around it: design, project, criteria. */
export interface RevisionContext {
  id: string;
  organisationId: string;
  designId: string;
  designName: string;
  projectId: string;
  projectName: string;
  projectAddress: string;
  projectState: string;
  number: number;
  status: RevisionStatus;
  input: Record<string, unknown>;
  result: DesignResult;
  engineVersion: string;
  contentHash: string;
  authorId: string | null;
  authorName: string | null;
  createdAt: Date;
  criteria: { jurisdiction: string; state: string; values: Record<string, unknown>; sources: Record<string, unknown> } | null;
  /** True when project name, address, state and criteria are the approval's snapshot, not the live project. */
  factsPinned: boolean;
  organisationName: string;
  /** IANA time zone the organisation's dates are shown in. */
  timeZone: string;
}

/** The project facts an approval was given, pinned with it (reviews.facts_snapshot). */
export interface FactsSnapshot {
  projectName: string;
  projectAddress: string;
  projectState: string;
  criteria: RevisionContext["criteria"];
}

export function factsOf(ctx: RevisionContext): FactsSnapshot {
  return { projectName: ctx.projectName, projectAddress: ctx.projectAddress, projectState: ctx.projectState, criteria: ctx.criteria };
}

const json = <T>(v: unknown): T => (typeof v === "string" ? JSON.parse(v) : v) as T;

export async function getRevisionContext(revisionId: string, trx: Knex = db): Promise<RevisionContext | undefined> {
  if (!isUuid(revisionId)) return undefined;
  const row = await trx("revisions as r")
    .join("designs as d", "d.id", "r.design_id")
    .join("projects as p", "p.id", "d.project_id")
    .leftJoin("criteria_cards as c", "c.id", "p.criteria_card_id")
    .leftJoin("users as u", "u.id", "r.author_id")
    .join("organisations as o", "o.id", "r.organisation_id")
    // An approved revision reads the facts pinned with its approval, never the live project.
    .leftJoin("reviews as ap", (j) => j.on("ap.revision_id", "r.id").andOnVal("ap.decision", "approve"))
    .where("r.id", revisionId)
    .first(
      "r.id", "r.organisation_id as organisationId", "r.design_id as designId", "d.name as designName",
      "p.id as projectId", "p.name as projectName", "p.address as projectAddress", "p.state as projectState",
      "r.number", "r.status", "r.input", "r.result", "r.engine_version as engineVersion", "r.content_hash as contentHash",
      "r.author_id as authorId", "u.name as authorName", "r.created_at as createdAt",
      "c.jurisdiction as cJurisdiction", "c.state as cState", "c.values as cValues", "c.sources as cSources",
      "o.name as organisationName", "o.time_zone as timeZone", "ap.facts_snapshot as snapshot",
    );
  if (!row) return undefined;
  const { cJurisdiction, cState, cValues, cSources, snapshot, ...rest } = row;
  const live: RevisionContext = {
    ...rest,
    input: json(rest.input),
    result: json(rest.result),
    criteria: cJurisdiction ? { jurisdiction: cJurisdiction, state: cState, values: json(cValues), sources: json(cSources ?? {}) } : null,
    factsPinned: false,
  };
  return snapshot ? { ...live, ...json<FactsSnapshot>(snapshot), factsPinned: true } : live;
}

/** Locks the revision row for a status change, so two decisions cannot race. */
export async function lockRevisionStatus(trx: Knex.Transaction, revisionId: string): Promise<RevisionStatus | undefined> {
  const row = await trx("revisions").where({ id: revisionId }).forUpdate().first("status");
  return row?.status;
}

export async function setRevisionStatus(trx: Knex.Transaction, revisionId: string, from: RevisionStatus[], to: RevisionStatus): Promise<boolean> {
  const n = await trx("revisions").where({ id: revisionId }).whereIn("status", from).update({ status: to });
  return n === 1;
}

/**
 * Locks the design row, as saving a revision does (createRevision), so a submit and a save of the
 * same design run one after the other: a submission then commits only while its revision is still
 * the newest, and a revision saved meanwhile waits for it (or makes it a 409).
 */
export async function lockDesign(trx: Knex.Transaction, designId: string): Promise<void> {
  await trx("designs").where({ id: designId }).forUpdate().first("id");
}

/** The highest revision number of a design (any status). */
export async function latestRevisionNumber(designId: string, trx: Knex = db): Promise<number> {
  const row = await trx("revisions").where({ design_id: designId }).max("number as n").first();
  return Number(row?.n ?? 0);
}

/** The newest approved revision of the design after `number`, if any: it supersedes this one. */
export async function newerApprovedRevision(designId: string, number: number): Promise<{ id: string; number: number } | undefined> {
  return db("revisions").where({ design_id: designId, status: "approved" }).where("number", ">", number).orderBy("number", "desc").first("id", "number");
}

/** Everyone who authored a revision of this design: none of them may decide its review. */
export async function designAuthorIds(designId: string, trx: Knex = db): Promise<string[]> {
  const rows = await trx("revisions").where({ design_id: designId }).whereNotNull("author_id").distinct("author_id");
  return rows.map((r) => r.author_id as string);
}

export interface ReviewRecord {
  id: string;
  revisionId: string;
  engineerId: string;
  engineerChosenName: string;
  submittedBy: string;
  submittedByName: string;
  submittedAt: Date;
  decision: "approve" | "request_changes" | null;
  decidedBy: string | null;
  decidedAt: Date | null;
  engineerName: string | null;
  licenceNumber: string | null;
  licenceState: string | null;
  licenceExpiresOn: string | null;
  letterFileKey: string | null;
  /** Failing checks approved anyway, each with the engineer's reason (empty for other decisions). */
  overrides: { checkId: string; title: string; ratio: number; reason: string }[];
  /** The public /verify/<code> code of an approval. */
  verifyCode: string | null;
  comments: { id: string; fieldPath: string | null; body: string; createdAt: Date }[];
}

/** The reviews of one revision, oldest first, each with its comments. */
export async function reviewsOfRevision(revisionId: string, trx: Knex = db): Promise<ReviewRecord[]> {
  const rows = await trx("reviews as v")
    .join("users as e", "e.id", "v.engineer_id")
    .join("users as s", "s.id", "v.submitted_by")
    .where("v.revision_id", revisionId)
    .orderBy("v.submitted_at", "asc")
    .select(
      "v.id", "v.revision_id as revisionId", "v.engineer_id as engineerId", "e.name as engineerChosenName",
      "v.submitted_by as submittedBy", "s.name as submittedByName", "v.submitted_at as submittedAt", "v.decision",
      "v.decided_by as decidedBy", "v.decided_at as decidedAt", "v.engineer_name as engineerName",
      "v.licence_number as licenceNumber", "v.licence_state as licenceState",
      trx.raw("to_char(v.licence_expires_on, 'YYYY-MM-DD') as \"licenceExpiresOn\""), "v.letter_file_key as letterFileKey",
      "v.overrides", "v.verify_code as verifyCode",
    );
  const comments = rows.length
    ? await trx("review_comments").whereIn("review_id", rows.map((r) => r.id)).orderBy("created_at", "asc")
        .select("id", "review_id as reviewId", "field_path as fieldPath", "body", "created_at as createdAt")
    : [];
  return rows.map((r) => ({ ...r, overrides: json(r.overrides ?? []), comments: comments.filter((c) => c.reviewId === r.id).map(({ reviewId: _r, ...c }) => c) }));
}

export async function insertReview(trx: Knex.Transaction, r: { revisionId: string; organisationId: string; engineerId: string; submittedBy: string }): Promise<string> {
  const [row] = await trx("reviews")
    .insert({ revision_id: r.revisionId, organisation_id: r.organisationId, engineer_id: r.engineerId, submitted_by: r.submittedBy })
    .returning("id");
  return row.id;
}

export async function recordDecision(
  trx: Knex.Transaction,
  reviewId: string,
  d: {
    decision: "approve" | "request_changes";
    decidedBy: string;
    engineerName: string;
    licence: { number: string; state: string; expiresOn: string } | null;
    letterFileKey: string | null;
    comments: { fieldPath: string | null; body: string }[];
    /** Approval only: what is pinned with it. */
    approval?: { overrides: ReviewRecord["overrides"]; facts: FactsSnapshot; verifyCode: string };
  },
): Promise<void> {
  // Comments first: once the review row says "approve" the trigger refuses new comments on it.
  if (d.comments.length) {
    await trx("review_comments").insert(d.comments.map((c) => ({ review_id: reviewId, field_path: c.fieldPath, body: c.body, author_id: d.decidedBy })));
  }
  await trx("reviews").where({ id: reviewId }).whereNull("decision").update({
    decision: d.decision,
    decided_by: d.decidedBy,
    decided_at: trx.fn.now(),
    engineer_name: d.engineerName,
    licence_number: d.licence?.number ?? null,
    licence_state: d.licence?.state ?? null,
    licence_expires_on: d.licence?.expiresOn ?? null,
    letter_file_key: d.letterFileKey,
    ...(d.approval
      ? { overrides: JSON.stringify(d.approval.overrides), facts_snapshot: JSON.stringify(d.approval.facts), verify_code: d.approval.verifyCode }
      : {}),
  });
}

/** Whether a decision that names this stored letter was committed (its file must then be kept). */
export async function letterIsRecorded(letterFileKey: string): Promise<boolean> {
  return Boolean(await db("reviews").where({ letter_file_key: letterFileKey }).first("id"));
}
