import { db } from "../client";
import { acceptedProjectIds } from "./engagements";
import { listPage, type ListPage, type ListQuery } from "./list-page";

/**
 * One reviewing engineer's queue across every contractor: each review submitted to them, in the
 * organisation they are signed in to or on a project they hold an accepted engagement on. Once an
 * engagement ends, that project's rows leave the queue (the decisions stay in the contractor's record).
 */
export type QueueState = "waiting" | "on_hold" | "decided";

export interface EngineerQueueRow {
  reviewId: string;
  revisionId: string;
  number: number;
  designId: string;
  designName: string;
  projectId: string;
  projectName: string;
  projectState: string;
  organisationId: string;
  contractor: string;
  state: QueueState;
  decision: "approve" | "request_changes" | null;
  submittedAt: string;
  decidedAt: string | null;
  depthIn: number | null;
  diameterIn: number | null;
  posts: number | null;
  /** Titles of the footing checks that fail (ratio above 1). */
  failing: string[];
}

const STATE_SQL = `case when v.decision is null then 'waiting'
  when v.decision = 'approve' and exists (select 1 from design_holds h where h.design_id = r.design_id and h.cleared_at is null) then 'on_hold'
  else 'decided' end`;

export const QUEUE_SORTS = {
  submittedAt: "v.submitted_at", decidedAt: "v.decided_at", contractor: "o.name", projectName: "p.name", designName: "d.name",
  // Waiting first, then on hold, then decided.
  state: `array_position(array['waiting', 'on_hold', 'decided'], ${STATE_SQL})`,
} as const;

export interface QueueFilter {
  /** Only this contractor's rows (an organisation id). */
  contractor?: string;
  state?: QueueState;
}

/** Reviews submitted to this engineer that they may still see (own organisation, or an accepted engagement). */
function visibleReviews(user: { userId: string; organisationId: string }) {
  return db("reviews as v")
    .join("revisions as r", "r.id", "v.revision_id")
    .join("designs as d", "d.id", "r.design_id")
    .join("projects as p", "p.id", "d.project_id")
    .join("organisations as o", "o.id", "p.organisation_id")
    .where("v.engineer_id", user.userId)
    .where((w) => w.where("v.organisation_id", user.organisationId).orWhereIn("p.id", acceptedProjectIds(user.userId)));
}

export async function engineerQueue(user: { userId: string; organisationId: string }, query: ListQuery, filter: QueueFilter = {}): Promise<ListPage<EngineerQueueRow>> {
  const base = visibleReviews(user);
  if (filter.contractor && /^[0-9a-f-]{36}$/i.test(filter.contractor)) base.where("p.organisation_id", filter.contractor);
  if (filter.state) base.whereRaw(`(${STATE_SQL}) = ?`, [filter.state]);
  const page = await listPage<EngineerQueueRow & { submittedAt: Date; decidedAt: Date | null; failing: unknown }>(base, query, {
    sortable: QUEUE_SORTS,
    defaultSort: "state",
    defaultDir: "asc",
    search: ["p.name", "d.name", "o.name"],
    select: (qb) =>
      qb.select(
        "v.id as reviewId", "r.id as revisionId", "r.number", "d.id as designId", "d.name as designName", "p.id as projectId", "p.name as projectName",
        "p.state as projectState", "o.id as organisationId", "o.name as contractor", "v.decision", "v.submitted_at as submittedAt", "v.decided_at as decidedAt",
        db.raw(`(${STATE_SQL}) as state`),
        db.raw(`(r.result->'footing'->>'depthIn')::float as "depthIn"`),
        db.raw(`(r.result->'footing'->>'diameterIn')::float as "diameterIn"`),
        db.raw(`jsonb_array_length(r.result->'field'->'posts') as posts`),
        db.raw(`coalesce((select jsonb_agg(c->>'title') from jsonb_array_elements(r.result->'footing'->'checks') c where (c->>'pass')::boolean is false), '[]'::jsonb) as failing`),
      ),
  });
  return {
    ...page,
    rows: page.rows.map((r) => ({
      ...r,
      submittedAt: new Date(r.submittedAt).toISOString(),
      decidedAt: r.decidedAt ? new Date(r.decidedAt).toISOString() : null,
      failing: (typeof r.failing === "string" ? JSON.parse(r.failing) : r.failing) as string[],
    })),
  };
}

/** The contractors that appear in this engineer's queue, for the filter. */
export async function queueContractors(user: { userId: string; organisationId: string }): Promise<{ id: string; name: string }[]> {
  return visibleReviews(user).distinct("o.id", "o.name").orderBy("o.name");
}
