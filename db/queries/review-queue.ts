import type { Knex } from "knex";
import { db } from "../client";
import type { RevisionStatus } from "./reviews";

export interface QueueRow {
  revisionId: string;
  number: number;
  status: RevisionStatus;
  designId: string;
  designName: string;
  projectName: string;
  projectState: string;
  engineerName: string;
  submittedByName: string;
  submittedAt: Date;
  decidedAt: Date | null;
  /** A newer approved revision of the same design exists. */
  superseded: boolean;
  onHold: boolean;
}

/**
 * A queue's reviews are picked first (filter, order and limit on reviews alone, served by one of
 * the queue indexes), and only those rows are joined to their revision, design, project and people.
 */
function queue(organisationId: string, pick: (reviews: Knex.QueryBuilder) => Knex.QueryBuilder, order: { column: string; order: "asc" | "desc" }) {
  const picked = pick(db("reviews").where("organisation_id", organisationId).select("*"));
  return db
    .from(picked.as("v"))
    .join("revisions as r", "r.id", "v.revision_id")
    .join("designs as d", "d.id", "r.design_id")
    .join("projects as p", "p.id", "d.project_id")
    .join("users as e", "e.id", "v.engineer_id")
    .join("users as s", "s.id", "v.submitted_by")
    .select(
      "r.id as revisionId", "r.number", "r.status", "d.id as designId", "d.name as designName", "p.name as projectName", "p.state as projectState",
      "e.name as engineerName", "s.name as submittedByName", "v.submitted_at as submittedAt", "v.decided_at as decidedAt",
      db.raw(`exists (select 1 from revisions n where n.design_id = r.design_id and n.status = 'approved' and n.number > r.number) as superseded`),
      db.raw(`exists (select 1 from design_holds h where h.design_id = r.design_id and h.cleared_at is null) as "onHold"`),
    )
    .orderBy(`v.${order.column}`, order.order);
}

/** Revisions waiting for this engineer's decision, oldest submission first. */
export async function waitingFor(organisationId: string, engineerId: string): Promise<QueueRow[]> {
  return queue(organisationId, (v) => v.where("engineer_id", engineerId).whereNull("decision").orderBy("submitted_at", "asc").limit(100), { column: "submitted_at", order: "asc" });
}

/** What this person submitted, newest first (each submission of each revision). */
export async function submittedBy(organisationId: string, userId: string): Promise<QueueRow[]> {
  return queue(organisationId, (v) => v.where("submitted_by", userId).orderBy("submitted_at", "desc").limit(100), { column: "submitted_at", order: "desc" });
}

/** Recent decisions in the organisation. */
export async function recentlyDecided(organisationId: string): Promise<QueueRow[]> {
  return queue(organisationId, (v) => v.whereNotNull("decision").orderBy("decided_at", "desc").limit(30), { column: "decided_at", order: "desc" });
}

export interface FieldSpecRow {
  revisionId: string;
  number: number;
  designName: string;
  projectName: string;
  projectAddress: string;
  approvedAt: Date | null;
  superseded: boolean;
  onHold: boolean;
  depthIn: number;
  diameterIn: number;
  posts: number;
}

/** The most rows the field list shows. */
export const FIELD_SPEC_LIMIT = 200;

/**
 * Which designs a person's field list covers. Today: the organisation's own. Written as one
 * where-clause over `d` (designs) so another scope (for example projects an outside engineer is
 * engaged on) is one more `orWhereIn("d.project_id", …)` here, served by designs' own indexes.
 */
function fieldScope(organisationId: string) {
  return (qb: Knex.QueryBuilder) => qb.where("d.organisation_id", organisationId);
}

/** The shown rows' details: names, approval time, hold, footing columns (no result JSON is read). */
function fieldSpecColumns(qb: Knex.QueryBuilder, superseded: boolean) {
  return qb
    .join("projects as p", "p.id", "d.project_id")
    .select(
      "r.id as revisionId", "r.number", "d.name as designName", "p.name as projectName", "p.address as projectAddress",
      // A current spec's approval time is on its design; a superseded one's is its approval record's.
      superseded ? "a.decided_at as approvedAt" : "d.approved_at as approvedAt",
      db.raw(`${superseded ? "true" : "false"} as superseded`),
      db.raw(`exists (select 1 from design_holds h where h.design_id = r.design_id and h.cleared_at is null) as "onHold"`),
      "r.footing_depth_in as depthIn", "r.footing_diameter_in as diameterIn", "r.field_post_count as posts",
    );
}

/**
 * Approved revisions of the organisation: current specs first (newest approval first), then the
 * superseded ones. Current specs come straight from designs.approved_revision_id (kept by a
 * trigger) through an index on (organisation, approved_at); superseded ones are read only when
 * fewer than FIELD_SPEC_LIMIT current specs exist, newest approval first, so at most that many
 * current rows are stepped over.
 */
export async function approvedSpecs(organisationId: string): Promise<FieldSpecRow[]> {
  const scope = fieldScope(organisationId);
  const current: FieldSpecRow[] = await fieldSpecColumns(db("designs as d").join("revisions as r", "r.id", "d.approved_revision_id"), false)
    .where(scope)
    .whereNotNull("d.approved_revision_id")
    .orderBy("d.approved_at", "desc")
    .limit(FIELD_SPEC_LIMIT);
  if (current.length >= FIELD_SPEC_LIMIT) return current;
  const superseded: FieldSpecRow[] = await fieldSpecColumns(
    db("reviews as a").join("revisions as r", "r.id", "a.revision_id").join("designs as d", "d.id", "r.design_id"), true)
    .where(scope)
    .where("a.organisation_id", organisationId)
    .where("a.decision", "approve")
    .whereRaw("r.id <> d.approved_revision_id")
    .orderBy("a.decided_at", "desc")
    .limit(FIELD_SPEC_LIMIT - current.length);
  return [...current, ...superseded];
}

/** The latest revision of this design, before `number`, that this engineer decided (for "changes since your last review"). */
export async function lastReviewedBy(designId: string, number: number, engineerId: string): Promise<{ id: string; number: number; input: unknown } | undefined> {
  return db("revisions as r")
    .join("reviews as v", "v.revision_id", "r.id")
    .where({ "r.design_id": designId, "v.decided_by": engineerId })
    .where("r.number", "<", number)
    .orderBy("r.number", "desc")
    .first("r.id", "r.number", "r.input");
}

/** The latest earlier revision of this design that anyone decided. */
export async function lastReviewed(designId: string, number: number): Promise<{ id: string; number: number; input: unknown } | undefined> {
  return db("revisions as r")
    .join("reviews as v", "v.revision_id", "r.id")
    .where({ "r.design_id": designId })
    .whereNotNull("v.decision")
    .where("r.number", "<", number)
    .orderBy("r.number", "desc")
    .first("r.id", "r.number", "r.input");
}
