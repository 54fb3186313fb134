import type { Knex } from "knex";
import { db } from "../client";
import { preparedRows } from "../prepared";
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
  // (reviewLists passes a union of picks, whose every branch names the organisation itself.)
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
      // Only a design whose newest approval is another revision can have superseded this one.
      db.raw(`(d.approved_revision_id is not null and d.approved_revision_id <> r.id
        and exists (select 1 from revisions n where n.design_id = r.design_id and n.status = 'approved' and n.number > r.number)) as superseded`),
      db.raw(`exists (select 1 from design_holds h where h.design_id = r.design_id and h.cleared_at is null) as "onHold"`),
    )
    .orderBy(`v.${order.column}`, order.order);
}

/**
 * Rows each list of the reviews page shows. Each row joins its revision, design, project and two
 * people, so the page's cost follows this number; the engineer's whole queue is paged on /queue,
 * and the page says how many wait in all (countWaitingFor).
 */
export const REVIEW_LIST_LIMIT = 25;

/** Revisions waiting for this engineer's decision, oldest submission first. */
export async function waitingFor(organisationId: string, engineerId: string, limit = REVIEW_LIST_LIMIT): Promise<QueueRow[]> {
  return queue(organisationId, (v) => v.where("engineer_id", engineerId).whereNull("decision").orderBy("submitted_at", "asc").limit(limit), { column: "submitted_at", order: "asc" });
}

/** How many reviews wait for this engineer in the organisation (an index-only count of the open-queue index). */
export async function countWaitingFor(organisationId: string, engineerId: string): Promise<number> {
  const [{ n }] = await db("reviews").where({ organisation_id: organisationId, engineer_id: engineerId }).whereNull("decision").count<{ n: string }[]>({ n: "*" });
  return Number(n);
}

/** The reviews page's three lists and the waiting count (see `reviewLists`). */
/** The reviews page counts waiting reviews up to this many; beyond, it says "1,000+". */
export const WAITING_COUNT_CAP = 1000;

export interface ReviewLists {
  waiting: QueueRow[] | null;
  /** How many wait, at most WAITING_COUNT_CAP; `waitingCapped` when there are more. */
  waitingTotal: number;
  waitingCapped: boolean;
  mine: QueueRow[] | null;
  decided: QueueRow[];
}

/**
 * The reviews page's lists in one statement, each picked exactly as `waitingFor`, `submittedBy` and
 * `recentlyDecided` pick it (filter, order and limit on reviews alone, through its index), then
 * joined once: one plan instead of three (planning the six-table join was most of each list's
 * time at ×1000), with the waiting count as an uncorrelated subquery run once. Lists the person's
 * roles do not show are not read (null).
 */
export async function reviewLists(organisationId: string, userId: string, roles: { engineer: boolean; designer: boolean }, limit = REVIEW_LIST_LIMIT, decidedLimit = 20, countCap = WAITING_COUNT_CAP): Promise<ReviewLists> {
  // Whole numbers from this module's callers, written into the statement's text (see below).
  const whole = (n: number) => Math.max(0, Math.floor(Number(n)) || 0);
  const literal = { skipBinding: true } as const;
  const pick = (list: string, filter: (q: Knex.QueryBuilder) => Knex.QueryBuilder) =>
    filter(db("reviews").where("organisation_id", organisationId)).select("*", db.raw("?::text as list", [list]));
  const parts = [
    ...(roles.engineer ? [pick("waiting", (v) => v.where("engineer_id", userId).whereNull("decision").orderBy("submitted_at", "asc").limit(whole(limit), literal))] : []),
    ...(roles.designer ? [pick("mine", (v) => v.where("submitted_by", userId).orderBy("submitted_at", "desc").limit(whole(limit), literal))] : []),
    pick("decided", (v) => v.whereNotNull("decision").orderBy("decided_at", "desc").limit(whole(decidedLimit), literal)),
  ];
  const built = queue(organisationId, () => db.unionAll(parts, true), { column: "list", order: "asc" })
    .select("v.list")
    .modify((qb) => {
      // Counted to countCap + 1 (WAITING_COUNT_CAP but in tests; index-only), so the count does not grow with the backlog.
      if (roles.engineer) qb.select(db.raw(`(select count(*) from (select 1 from reviews c where c.organisation_id = ? and c.engineer_id = ? and c.decision is null limit ${whole(countCap) + 1}) c) as "waitingTotal"`, [organisationId, userId]));
    })
    // Each list in its own order, as the single-list reads give it.
    .orderByRaw("case when v.list = 'waiting' then v.submitted_at end asc, case when v.list = 'mine' then v.submitted_at end desc, case when v.list = 'decided' then v.decided_at end desc")
    .toSQL();
  // Prepared, with a generic plan (db/prepared.ts): planning this join cost as much as running it.
  // The text is the same for every person with the same roles (ids are bindings); the limits are
  // written into it, since a generic plan takes a bound LIMIT for a tenth of the rows and, at
  // thousands of reviews, sorted them all. The planner's dependency statistics (20261206000000)
  // keep each pick on its index's order.
  const rows = await preparedRows<QueueRow & { list: string; waitingTotal?: string }>(built.sql, built.bindings);
  const counted = rows.length && rows[0].waitingTotal !== undefined ? Number(rows[0].waitingTotal) : 0;
  const of = (list: string) => rows.filter((r) => r.list === list).map(({ list: _list, waitingTotal: _total, ...r }) => r);
  return {
    waiting: roles.engineer ? of("waiting") : null,
    waitingTotal: Math.min(counted, countCap),
    waitingCapped: counted > countCap,
    mine: roles.designer ? of("mine") : null,
    decided: of("decided"),
  };
}

/** What this person submitted, newest first (each submission of each revision). */
export async function submittedBy(organisationId: string, userId: string, limit = REVIEW_LIST_LIMIT): Promise<QueueRow[]> {
  return queue(organisationId, (v) => v.where("submitted_by", userId).orderBy("submitted_at", "desc").limit(limit), { column: "submitted_at", order: "desc" });
}

/** Recent decisions in the organisation. */
export async function recentlyDecided(organisationId: string, limit = 20): Promise<QueueRow[]> {
  return queue(organisationId, (v) => v.whereNotNull("decision").orderBy("decided_at", "desc").limit(limit), { column: "decided_at", order: "desc" });
}

export interface FieldSpecRow {
  revisionId: string;
  number: number;
  designName: string;
  projectName: string;
  projectAddress: string;
  approvedAt: Date | null;
  /** The design, for the next page's cursor. */
  designId: string;
  superseded: boolean;
  onHold: boolean;
  depthIn: number;
  diameterIn: number;
  posts: number;
}

/** Rows per page of the field list; older current specs are one "Older specs" link away (keyset, `older`). */
export const FIELD_SPEC_LIMIT = 50;

/** Where a field-list page starts: after this current spec (its design's approval time and id). */
export interface FieldCursor {
  approvedAt: Date;
  designId: string;
}

/** `<ISO time>_<design id>` in a URL; anything else is no cursor (the first page). */
export function parseFieldCursor(text: string | undefined): FieldCursor | undefined {
  const m = /^(\d{4}-\d{2}-\d{2}T[\d:.]+Z)_([0-9a-f-]{36})$/i.exec(text ?? "");
  if (!m || Number.isNaN(Date.parse(m[1]))) return undefined;
  return { approvedAt: new Date(m[1]), designId: m[2].toLowerCase() };
}

export const fieldCursorText = (c: FieldCursor) => `${c.approvedAt.toISOString()}_${c.designId}`;

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
      "r.id as revisionId", "r.number", "d.id as designId", "d.name as designName", "p.name as projectName", "p.address as projectAddress",
      // A current spec's approval time is on its design; a superseded one's is its approval record's.
      superseded ? "a.decided_at as approvedAt" : "d.approved_at as approvedAt",
      db.raw(`${superseded ? "true" : "false"} as superseded`),
      db.raw(`exists (select 1 from design_holds h where h.design_id = r.design_id and h.cleared_at is null) as "onHold"`),
      "r.footing_depth_in as depthIn", "r.footing_diameter_in as diameterIn", "r.field_post_count as posts",
    );
}

/**
 * One page of the organisation's approved revisions: current specs first (newest approval first),
 * then the superseded ones. Current specs come straight from designs.approved_revision_id (kept by
 * a trigger) through an index on (organisation, approved_at), after `older` when given (keyset: a
 * later page costs what the first does); superseded ones are read only on the page where the
 * current ones run out, newest approval first. `more` says whether older current specs exist.
 */
export async function approvedSpecs(organisationId: string, options: { older?: FieldCursor; limit?: number } = {}): Promise<FieldSpecRow[] & { more?: boolean }> {
  const limit = options.limit ?? FIELD_SPEC_LIMIT;
  const scope = fieldScope(organisationId);
  const currentQuery = fieldSpecColumns(db("designs as d").join("revisions as r", "r.id", "d.approved_revision_id"), false)
    .where(scope)
    .whereNotNull("d.approved_revision_id")
    .orderBy([{ column: "d.approved_at", order: "desc" }, { column: "d.id", order: "desc" }])
    // One row more than shown tells whether another page exists.
    .limit(limit + 1);
  if (options.older) currentQuery.whereRaw("(d.approved_at, d.id) < (?, ?)", [options.older.approvedAt, options.older.designId]);
  const fetched: FieldSpecRow[] = await currentQuery;
  if (fetched.length > limit) return Object.assign(fetched.slice(0, limit), { more: true });
  const current = fetched;
  const superseded: FieldSpecRow[] = await fieldSpecColumns(
    db("reviews as a").join("revisions as r", "r.id", "a.revision_id").join("designs as d", "d.id", "r.design_id"), true)
    .where(scope)
    .where("a.organisation_id", organisationId)
    .where("a.decision", "approve")
    .whereRaw("r.id <> d.approved_revision_id")
    .orderBy("a.decided_at", "desc")
    .limit(limit - current.length);
  return Object.assign([...current, ...superseded], { more: false });
}

/**
 * The latest decided review of this design before revision `number` (by `engineerId` when given),
 * read backwards from the reviews index on (design_id, revision_number): one probe however many
 * revisions the design has (20261204100000). Only that revision's input is read.
 */
function lastDecided(designId: string, number: number, engineerId?: string) {
  const latest = db("reviews as v")
    .where("v.design_id", designId)
    .where("v.revision_number", "<", number)
    .whereNotNull("v.decision")
    .modify((qb) => { if (engineerId) qb.where("v.decided_by", engineerId); })
    .orderBy("v.revision_number", "desc")
    .limit(1)
    .select("v.revision_id");
  return db("revisions as r").whereIn("r.id", latest).first("r.id", "r.number", "r.input");
}

/** The latest revision of this design, before `number`, that this engineer decided (for "changes since your last review"). */
export async function lastReviewedBy(designId: string, number: number, engineerId: string): Promise<{ id: string; number: number; input: unknown } | undefined> {
  return lastDecided(designId, number, engineerId);
}

/** The latest earlier revision of this design that anyone decided. */
export async function lastReviewed(designId: string, number: number): Promise<{ id: string; number: number; input: unknown } | undefined> {
  return lastDecided(designId, number);
}
