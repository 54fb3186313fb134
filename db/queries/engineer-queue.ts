import { db } from "../client";
import { preparedRows } from "../prepared";
import { likePattern, MAX_PAGE_SIZE, type ListPage, type ListQuery } from "./list-page";

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

/** A review's state from the review row alone; `held` is the CTE of the designs with an open hold. */
const STATE_SQL = `case when v.decision is null then 'waiting'
  when v.decision = 'approve' and v.design_id in (select id from held) then 'on_hold'
  else 'decided' end`;

/**
 * Sort names and their expressions over the `picked` rows. The default (state) puts waiting first,
 * then on hold, then decided; within a state, and for equal keys, oldest submission first.
 */
export const QUEUE_SORTS = {
  submittedAt: "submitted_at", decidedAt: "decided_at", contractor: "contractor", projectName: "project_name", designName: "design_name",
  state: "array_position(array['waiting', 'on_hold', 'decided'], state)",
} as const;
/** The default order's counts stop past this many rows (or a page past the current one): "1,000+". */
export const QUEUE_COUNT_CAP = 1000;

const NOT_NULL_SORTS = new Set(["submittedAt", "contractor", "projectName", "designName", "state"]);

export interface QueueFilter {
  /** Only this contractor's rows (an organisation id). */
  contractor?: string;
  state?: QueueState;
}

/**
 * One statement, built so its cost follows the page, not the engineer's whole history:
 * - `engaged`: the projects this engineer holds an accepted engagement on (a few rows);
 * - `held`: the designs with an open hold that a visible review can be on: in the organisation they
 *   are signed in to, or in an organisation that engaged them (open holds are few; read from the
 *   open-holds index alone; an engaging contractor's holds on other projects are harmless, since
 *   every use of `held` is on visible reviews). An approval is on hold when its design is held: it is
 *   recorded with its revision's status in one transaction (app/_lib/review/workflow.ts;
 *   20261203100000 refuses the status without the record), after which the pin keeps both, so an
 *   approval's revision is always an approved revision of that design;
 * - a review is visible when it is in the organisation they are signed in to, or its project
 *   (copied onto the review, 20261205100000) is an engaged one: both told from the index;
 * - the default order (state, no search) reads each state in its order straight from the
 *   `(engineer_id, decided or not, submitted_at, id)` index and stops at the page: waiting ones,
 *   then on hold, then decided. On-hold rows are the visible approvals of the held designs
 *   (`on_hold`, found through reviews' design index: as few as the open holds). The count is an
 *   index-only pass that stops past QUEUE_COUNT_CAP rows (or one page beyond the current page):
 *   the page then says "1,000+" (`capped`), so the count does not grow with the engineer's history;
 * - any other order or a search: `picked` is every visible review with its state and sort key
 *   (names joined only when the search or sort needs them), sorted and counted by a window count;
 * - only the page's rows are joined to revision, design, project and contractor; no result JSON is
 *   read (the footing figures and the failing checks' titles are columns, 20261204600000).
 */
function queueSql(user: { userId: string; organisationId: string }, query: ListQuery, filter: QueueFilter, countCap = QUEUE_COUNT_CAP) {
  const q = (query.q ?? "").trim().slice(0, 200);
  const sort = query.sort && Object.hasOwn(QUEUE_SORTS, query.sort) ? (query.sort as keyof typeof QUEUE_SORTS) : "state";
  const dir = query.dir === "asc" || query.dir === "desc" ? query.dir : "asc";
  const pageSize = Math.min(MAX_PAGE_SIZE, Math.max(1, Math.floor(query.pageSize ?? 20)));
  const page = Math.max(1, Math.floor(query.page ?? 1));
  const names = Boolean(q) || sort === "projectName" || sort === "designName";
  const contractorName = Boolean(q) || sort === "contractor";
  const bindings: unknown[] = [user.userId, user.organisationId];
  // Waiting is told by the review alone: no held revisions to look up.
  const waitingOnly = filter.state === "waiting";
  const contractor = filter.contractor && /^[0-9a-f-]{36}$/i.test(filter.contractor) ? filter.contractor : undefined;
  // The visible reviews' where-clause; its `?`s are bound once per use (`visibleBindings`).
  const visible = `v.engineer_id = ? AND (v.organisation_id = ? OR v.project_id IN (SELECT project_id FROM engaged))${contractor ? " AND v.organisation_id = ?" : ""}`;
  const visibleBindings = [user.userId, user.organisationId, ...(contractor ? [contractor] : [])];
  const order = `${QUEUE_SORTS[sort]} ${dir}${NOT_NULL_SORTS.has(sort) ? "" : " NULLS LAST"}, submitted_at, id`;
  const head = `
    WITH engaged AS MATERIALIZED (
      SELECT project_id, organisation_id FROM engagements WHERE engineer_user_id = ? AND status = 'accepted'
    ), held AS MATERIALIZED (
      SELECT DISTINCT h.design_id AS id FROM design_holds h
      WHERE h.cleared_at IS NULL AND (h.organisation_id = ? OR h.organisation_id IN (SELECT organisation_id FROM engaged))
        ${waitingOnly ? "AND false" : ""}
    )`;
  const columns = "v.id, v.revision_id, v.organisation_id, v.decision, v.submitted_at, v.decided_at";
  let body: string;
  let countedTo: number | undefined;
  if (sort === "state" && !q) {
    // Rows any page up to this one can need from one state: a later page reads further, not more states.
    const reach = page * pageSize;
    // Counts stop here (a count of the engineer's whole history would grow with it); past the cap
    // the page says "1,000+", and the cap always reaches one page beyond this one, so Next works.
    const cap = Math.max(countCap, reach + pageSize);
    // `(decision IS NOT NULL) IS FALSE / IS TRUE` match the index's second column as written
    // (a plain `decision IS NULL` would not: the planner compares expressions, not meanings).
    const waitingWhere = `${visible} AND (v.decision IS NOT NULL) IS FALSE`;
    const decidedWhere = `${visible} AND (v.decision IS NOT NULL) IS TRUE AND NOT (v.decision = 'approve' AND v.design_id IN (SELECT id FROM held))`;
    // On hold: the visible approvals of the held designs, found by design (few: open holds are few).
    // One index-only probe of the engineer's approvals per held design (`OFFSET 0` keeps each a
    // probe: flattened, the planner hashes the held designs against every approval of the engineer,
    // which grows with their history).
    const heldReviews = `, on_hold AS MATERIALIZED (
      SELECT a.id, a.submitted_at FROM held h CROSS JOIN LATERAL (
        SELECT v.id, v.submitted_at FROM reviews v WHERE ${visible} AND v.design_id = h.id AND v.decision = 'approve' OFFSET 0
      ) a
    )`;
    bindings.push(...visibleBindings); // on_hold
    if (filter.state !== "on_hold") bindings.push(...visibleBindings, cap + 1); // counts, written before the branches
    // Each state's rows up to `reach`, a CTE each, in the page's order of states (waiting first, or
    // decided first when descending). Without a state filter a later state is read only when the
    // earlier ones leave room on the page (a one-time filter, checked before its scan; CASE, so a
    // later count is taken only when needed): a first page of waiting reviews reads neither the
    // held designs' approvals nor the decided ones.
    const states: QueueState[] = !filter.state ? (dir === "asc" ? ["waiting", "on_hold", "decided"] : ["decided", "on_hold", "waiting"]) : [filter.state];
    const gate = (earlier: QueueState[]): { sql: string; bindings: unknown[] } => {
      const n = (state: QueueState) => `(SELECT count(*) FROM in_${state})`;
      if (!earlier.length) return { sql: "", bindings: [] };
      if (earlier.length === 1) return { sql: ` AND ${n(earlier[0])} < ?`, bindings: [reach] };
      return { sql: ` AND CASE WHEN ${n(earlier[0])} >= ? THEN false ELSE ${n(earlier[0])} + ${n(earlier[1])} < ? END`, bindings: [reach, reach] };
    };
    const branches = states.map((state, i) => {
      const g = gate(states.slice(0, i));
      if (state === "waiting") {
        return { name: "in_waiting", sql: `SELECT ${columns}, 'waiting' AS state FROM reviews v WHERE ${waitingWhere}${g.sql} ORDER BY v.submitted_at, v.id LIMIT ?`, bindings: [...visibleBindings, ...g.bindings, reach] };
      }
      if (state === "on_hold") {
        return {
          name: "in_on_hold",
          sql: `SELECT ${columns}, 'on_hold' AS state FROM reviews v WHERE v.id IN (SELECT id FROM on_hold ORDER BY submitted_at, id LIMIT ?)${g.sql}`,
          bindings: [reach, ...g.bindings],
        };
      }
      return { name: "in_decided", sql: `SELECT ${columns}, 'decided' AS state FROM reviews v WHERE ${decidedWhere}${g.sql} ORDER BY v.submitted_at, v.id LIMIT ?`, bindings: [...visibleBindings, ...g.bindings, reach] };
    });
    for (const b of branches) bindings.push(...b.bindings);
    // The total the page shows, counted up to cap + 1 rows (index-only; no join, no sort). The
    // limits are bindings, so every page and cap is one statement text (run prepared, below).
    const capped = (where: string) => `(SELECT count(*) FROM (SELECT 1 FROM reviews v WHERE ${where} LIMIT ?) c)`;
    const total = !filter.state ? capped(visible) : filter.state === "waiting" ? capped(waitingWhere) : filter.state === "decided" ? capped(decidedWhere) : "(SELECT count(*) FROM on_hold)";
    body = `${heldReviews}, counts AS MATERIALIZED (
      SELECT ${total} AS total
    )${branches.map((b) => `, ${b.name} AS MATERIALIZED (
      ${b.sql}
    )`).join("")}, picked AS (
      ${branches.map((b) => `SELECT * FROM ${b.name}`).join(" UNION ALL ")}
    ), page AS (
      SELECT picked.*, (SELECT total FROM counts) AS total, row_number() OVER (ORDER BY ${order}) AS ord
      FROM picked ORDER BY ${order} LIMIT ? OFFSET ?
    )`;
    countedTo = cap;
  } else {
    const where: string[] = [];
    const whereBindings: unknown[] = [];
    if (q) {
      where.push("(pn.name ILIKE ? ESCAPE '\\' OR dn.name ILIKE ? ESCAPE '\\' OR o.name ILIKE ? ESCAPE '\\')");
      whereBindings.push(likePattern(q), likePattern(q), likePattern(q));
    }
    const stateWhere = filter.state ? "WHERE state = ?" : "";
    body = `, visible AS (
      SELECT ${columns},
             ${contractorName ? "o.name" : "NULL::text"} AS contractor,
             ${names ? "pn.name AS project_name, dn.name AS design_name" : "NULL::text AS project_name, NULL::text AS design_name"},
             ${STATE_SQL} AS state
      FROM reviews v ${contractorName ? "JOIN organisations o ON o.id = v.organisation_id" : ""}
      ${names ? "JOIN designs dn ON dn.id = v.design_id JOIN projects pn ON pn.id = v.project_id" : ""}
      WHERE ${visible}
        ${where.map((w) => `AND ${w}`).join(" ")}
    ), picked AS (
      SELECT * FROM visible ${stateWhere}
    ), page AS (
      SELECT picked.*, count(*) OVER () AS total, row_number() OVER (ORDER BY ${order}) AS ord FROM picked ORDER BY ${order} LIMIT ? OFFSET ?
    )`;
    bindings.push(...visibleBindings, ...whereBindings);
    if (filter.state) bindings.push(filter.state);
  }
  bindings.push(pageSize, (page - 1) * pageSize);
  const sql = `${head}${body}
    SELECT page.id AS "reviewId", r.id AS "revisionId", r.number, d.id AS "designId", d.name AS "designName", p.id AS "projectId",
           p.name AS "projectName", p.state AS "projectState", o.id AS "organisationId", o.name AS contractor, page.state, page.decision,
           page.submitted_at AS "submittedAt", page.decided_at AS "decidedAt", page.total, page.ord,
           r.footing_depth_in AS "depthIn", r.footing_diameter_in AS "diameterIn", r.field_post_count AS posts,
           coalesce(r.footing_failing_checks, '[]'::jsonb) AS failing
    FROM page JOIN revisions r ON r.id = page.revision_id JOIN designs d ON d.id = r.design_id
    JOIN projects p ON p.id = d.project_id JOIN organisations o ON o.id = p.organisation_id
    ORDER BY page.ord`;
  // The default order's statement is the same text for every engineer and page: it runs prepared,
  // with a generic plan (db/prepared.ts). A search or another sort is planned for its values.
  return { sql, bindings, sort, dir, page, pageSize, q, countedTo, prepared: countedTo !== undefined };
}

async function queueRows(built: { sql: string; bindings: unknown[]; prepared: boolean }): Promise<any[]> {
  return built.prepared ? preparedRows(built.sql, built.bindings) : (await db.raw(built.sql, built.bindings as never[])).rows;
}

/** `countCap` is QUEUE_COUNT_CAP but for tests, which cannot make a thousand reviews cheaply. */
export async function engineerQueue(user: { userId: string; organisationId: string }, query: ListQuery, filter: QueueFilter = {}, countCap = QUEUE_COUNT_CAP): Promise<ListPage<EngineerQueueRow>> {
  const built = queueSql(user, query, filter, countCap);
  const rows = await queueRows(built);
  let total = rows.length ? Number(rows[0].total) : 0;
  let cap = built.countedTo;
  // A page past the end has no row to carry the count: count on its own (only then).
  if (!rows.length && built.page > 1) {
    // Counted to this page's cap, so a page past the end says the same count as the last one.
    const counted = queueSql(user, { ...query, page: 1, pageSize: 1 }, filter, built.countedTo ?? countCap);
    const first = (await queueRows(counted))[0];
    total = first ? Number(first.total) : 0;
    cap = counted.countedTo;
  }
  // Counted up to cap + 1: more than the cap is shown as "cap+".
  const capped = cap !== undefined && total > cap;
  if (capped) total = cap!;
  return {
    rows: (rows as (EngineerQueueRow & { submittedAt: Date; decidedAt: Date | null; failing: unknown; total: string; ord: string })[]).map(
      ({ total: _total, ord: _ord, ...r }) => ({
        ...r,
        submittedAt: new Date(r.submittedAt).toISOString(),
        decidedAt: r.decidedAt ? new Date(r.decidedAt).toISOString() : null,
        failing: (typeof r.failing === "string" ? JSON.parse(r.failing) : r.failing) as string[],
      })),
    total, ...(capped && { capped }), page: built.page, pageSize: built.pageSize, sort: built.sort, dir: built.dir, q: built.q,
  };
}

/**
 * The contractors that appear in this engineer's queue, for the filter: their own organisation when
 * a review of it was submitted to them, and each organisation that engaged them on a project with
 * a review submitted to them. One early-stopping probe per organisation (the engineer's reviews in
 * it, until one is on a project they are engaged on), not one per engagement. The `OFFSET 0` keeps
 * the planner from turning that EXISTS into a hash of every engaged project's designs (one designs
 * probe per engagement: 530 buffers for 100 engagements, against 26).
 */
export async function queueContractors(user: { userId: string; organisationId: string }): Promise<{ id: string; name: string }[]> {
  // Prepared (db/prepared.ts): planning it took longer than running it.
  return preparedRows<{ id: string; name: string }>(
    `SELECT o.id, o.name FROM organisations o
     WHERE (o.id = ? AND EXISTS (SELECT 1 FROM reviews v WHERE v.engineer_id = ? AND v.organisation_id = o.id))
        OR (o.id IN (SELECT g.organisation_id FROM engagements g WHERE g.engineer_user_id = ? AND g.status = 'accepted')
            AND EXISTS (SELECT 1 FROM reviews v
                        WHERE v.engineer_id = ? AND v.organisation_id = o.id
                          AND v.project_id IN (SELECT g.project_id FROM engagements g WHERE g.engineer_user_id = ? AND g.status = 'accepted' AND g.organisation_id = o.id)
                        OFFSET 0))
     ORDER BY o.name`,
    [user.organisationId, user.userId, user.userId, user.userId, user.userId],
  );
}
