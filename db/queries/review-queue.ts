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

function queue(organisationId: string) {
  return db("reviews as v")
    .join("revisions as r", "r.id", "v.revision_id")
    .join("designs as d", "d.id", "r.design_id")
    .join("projects as p", "p.id", "d.project_id")
    .join("users as e", "e.id", "v.engineer_id")
    .join("users as s", "s.id", "v.submitted_by")
    .where("v.organisation_id", organisationId)
    .select(
      "r.id as revisionId", "r.number", "r.status", "d.id as designId", "d.name as designName", "p.name as projectName", "p.state as projectState",
      "e.name as engineerName", "s.name as submittedByName", "v.submitted_at as submittedAt", "v.decided_at as decidedAt",
      db.raw(`exists (select 1 from revisions n where n.design_id = r.design_id and n.status = 'approved' and n.number > r.number) as superseded`),
      db.raw(`exists (select 1 from design_holds h where h.design_id = r.design_id and h.cleared_at is null) as "onHold"`),
    )
    .orderBy("v.submitted_at", "desc")
    .limit(100);
}

/** Revisions waiting for this engineer's decision, oldest submission first. */
export async function waitingFor(organisationId: string, engineerId: string): Promise<QueueRow[]> {
  return queue(organisationId).where("v.engineer_id", engineerId).whereNull("v.decision").clearOrder().orderBy("v.submitted_at", "asc");
}

/** What this person submitted, newest first (each submission of each revision). */
export async function submittedBy(organisationId: string, userId: string): Promise<QueueRow[]> {
  return queue(organisationId).where("v.submitted_by", userId);
}

/** Recent decisions in the organisation. */
export async function recentlyDecided(organisationId: string): Promise<QueueRow[]> {
  return queue(organisationId).whereNotNull("v.decision").clearOrder().orderBy("v.decided_at", "desc").limit(30);
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

/** Approved revisions of the organisation, newest first, the superseded ones marked. */
export async function approvedSpecs(organisationId: string): Promise<FieldSpecRow[]> {
  return db("revisions as r")
    .join("designs as d", "d.id", "r.design_id")
    .join("projects as p", "p.id", "d.project_id")
    .where({ "r.organisation_id": organisationId, "r.status": "approved" })
    .select(
      "r.id as revisionId", "r.number", "d.name as designName", "p.name as projectName", "p.address as projectAddress",
      db.raw(`(select max(v.decided_at) from reviews v where v.revision_id = r.id and v.decision = 'approve') as "approvedAt"`),
      db.raw(`exists (select 1 from revisions n where n.design_id = r.design_id and n.status = 'approved' and n.number > r.number) as superseded`),
      db.raw(`exists (select 1 from design_holds h where h.design_id = r.design_id and h.cleared_at is null) as "onHold"`),
      db.raw(`(r.result->'footing'->>'depthIn')::float as "depthIn"`),
      db.raw(`(r.result->'footing'->>'diameterIn')::float as "diameterIn"`),
      db.raw(`jsonb_array_length(r.result->'field'->'posts') as posts`),
    )
    .orderBy([{ column: "superseded", order: "asc" }, { column: "approvedAt", order: "desc" }])
    .limit(200);
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
