import { db } from "../client";
import { acceptedProjectIds } from "./engagements";
import { cappedTotal, countReach, likePattern, MAX_PAGE_SIZE, SEARCH_COUNT_CAP, type ListPage, type ListQuery } from "./list-page";
import { isUuid } from "../ids";

/** A customer site. */
export interface Project {
  id: string;
  organisationId: string;
  name: string;
  address: string;
  state: string;
  latitude: number | null;
  longitude: number | null;
  notes: string;
  criteriaCardId: string | null;
  createdAt: Date;
  updatedAt: Date;
}

/** What a designer can set on a project. */
export type ProjectFields = Omit<Project, "id" | "organisationId" | "createdAt" | "updatedAt">;

export interface ProjectRow {
  id: string;
  name: string;
  address: string;
  state: string;
  jurisdiction: string | null;
  designCount: number;
  updatedAt: string;
  /** The contractor's name: the caller's own organisation, or the one that engaged them on this project. */
  organisationName: string;
}

const columns = [
  "id", "organisation_id as organisationId", "name", "address", "state", "latitude", "longitude", "notes",
  "criteria_card_id as criteriaCardId", "created_at as createdAt", "updated_at as updatedAt",
];

export async function getProject(id: string): Promise<Project | undefined> {
  if (!isUuid(id)) return undefined;
  return db("projects").where({ id }).first(columns);
}

export const PROJECT_SORTS = { name: "p.name", state: "p.state", jurisdiction: "p.criteria_jurisdiction", designCount: "p.design_count", updatedAt: "p.updated_at" } as const;
const NOT_NULL_SORTS = new Set(["name", "state", "designCount", "updatedAt"]);

/** A search's count stops past this many matches (or a page past the current one): "1–20 of 1,000+". */
export const PROJECT_COUNT_CAP = SEARCH_COUNT_CAP;

/**
 * One page of the organisation's projects with their criteria card and design count, in one
 * statement whose cost follows the page, not the organisation: the page's ids are picked first
 * from an index that starts with the organisation and serves the sort (index-only: organisation,
 * sort column, id; migrations 20261203500000, 20261205100000), and only those rows are joined to
 * their card and organisation. A later page steps over index entries only (about 300 to a page of
 * the index), never over joined rows. The design count and the card's jurisdiction (its sort) are
 * columns kept by triggers (20261204100100).
 *
 * The count rides on the page's rows as an uncorrelated subquery (an InitPlan, run once):
 * - no search: the organisation's `project_count`, kept by triggers (20261205500000): one row,
 *   exact, whatever the organisation's size;
 * - a search: the matches counted up to PROJECT_COUNT_CAP + 1, or one page past the current page,
 *   whichever is more (`capped`: the table says "1–20 of 1,000+" and "Page 1 of 50+", as the
 *   engineer's queue does, and Next always works; `countReach` and `cappedTotal` of list-page.ts,
 *   shared with every list that caps its search's count). The page is picked apart from the count, so
 *   PostgreSQL can walk the sort's index and test each project against the pattern when matches are
 *   common (it stops at the page), and read the trigram index when they are rare.
 *
 * `q` is matched against `search_text` (the lowered name, address and state, 20261205500100): along
 * the default order's index, which carries it, or through its trigram index; it matches a criteria card
 * through its id (the organisation's matching cards are looked up first, so their ids are known
 * when the page is planned). With `engagedUserId`, also the projects that person holds an accepted
 * engagement on (an outside engineer): those ids are looked up first, so a person with none gets
 * the organisation's index alone, not an OR the index cannot serve; their count adds the engaged
 * projects of other organisations (a probe of each id).
 */
export async function listProjects(organisationId: string, query: ListQuery, engagedUserId?: string, countCap = PROJECT_COUNT_CAP): Promise<ListPage<ProjectRow>> {
  const q = (query.q ?? "").trim().slice(0, 200);
  const sort = query.sort && Object.hasOwn(PROJECT_SORTS, query.sort) ? (query.sort as keyof typeof PROJECT_SORTS) : "updatedAt";
  const dir = query.dir === "asc" || query.dir === "desc" ? query.dir : "desc";
  const pageSize = Math.min(MAX_PAGE_SIZE, Math.max(1, Math.floor(query.pageSize ?? 20)));
  const page = Math.max(1, Math.floor(query.page ?? 1));
  const engaged: string[] = engagedUserId ? await acceptedProjectIds(engagedUserId).pluck("project_id") : [];
  // The organisation's cards whose jurisdiction matches, first (a probe of their trigram index):
  // as known ids the planner ORs them with the projects' trigram index (a BitmapOr), while an
  // array computed inside the statement made it read every project of the organisation and test
  // each; with none (the usual case) there is no OR at all.
  const pattern = q ? likePattern(q) : "";
  const cards: string[] = q ? await db("criteria_cards").where("organisation_id", organisationId)
    .whereRaw("jurisdiction ILIKE ? ESCAPE '\\'", [pattern]).pluck("id") : [];
  /** The organisation's projects and the engaged ones, matching the search (`alias` is the table's). */
  const listed = (alias: string) => db(`projects as ${alias}`).where((w) => {
    w.where(`${alias}.organisation_id`, organisationId);
    if (engaged.length) w.orWhereIn(`${alias}.id`, engaged);
  }).where((w) => {
    if (!q) return;
    // The lowered name, address and state (20261205500100), in the trigram index and in the default
    // order's index, so a common word is tested index-only along the order and a rare one found
    // through the trigram index; LIKE of the lowered pattern is what ILIKE does per row.
    w.whereRaw(`${alias}.search_text LIKE lower(?) ESCAPE '\\'`, [pattern]);
    if (cards.length) w.orWhereIn(`${alias}.criteria_card_id`, cards);
  });
  // A search counts up to this many matches and one more (to know there are more).
  const cap = q ? countReach(countCap, page, pageSize) : undefined;
  const counted = () => {
    if (q) return db.from(listed("c").select(db.raw("1")).limit(cap! + 1).as("m")).select(db.raw("count(*) AS n"));
    if (!engaged.length) return db("organisations as o").where("o.id", organisationId).select("o.project_count as n");
    const outside = db("projects as e").whereIn("e.id", engaged).whereNot("e.organisation_id", organisationId).count("*");
    return db("organisations as o").where("o.id", organisationId).select(db.raw("o.project_count + ? AS n", [outside]));
  };

  // Ties broken by name (for state) and id, so pages neither repeat nor skip a project.
  const order = `${PROJECT_SORTS[sort]} ${dir}${NOT_NULL_SORTS.has(sort) ? "" : " nulls last"}${sort === "state" ? `, p.name ${dir}` : ""}, p.id ${dir}`;
  const picked = listed("p").select("p.id").orderByRaw(order).limit(pageSize).offset((page - 1) * pageSize);
  const rows: (ProjectRow & { total: string })[] = await db
    .from(picked.as("pg"))
    .join("projects as p", "p.id", "pg.id")
    .leftJoin("criteria_cards as c", "c.id", "p.criteria_card_id")
    .join("organisations as o", "o.id", "p.organisation_id")
    .select("p.id", "p.name", "p.address", "p.state", "c.jurisdiction", "p.updated_at as updatedAt", "o.name as organisationName", "p.design_count as designCount", counted().as("total"))
    .orderByRaw(order);
  let found = rows.length ? Number(rows[0].total) : 0;
  // A page past the end has no row to carry the count: count on its own (only then), to the same cap.
  if (!rows.length && page > 1) found = Number((await counted().first() as { n: string } | undefined)?.n ?? 0);
  return {
    rows: rows.map(({ total: _total, ...r }) => ({ ...r, updatedAt: new Date(r.updatedAt).toISOString() })),
    ...cappedTotal(found, cap), page, pageSize, sort, dir, q,
  };
}

const toRow = (f: Partial<ProjectFields>) => ({
  ...(f.name !== undefined && { name: f.name }),
  ...(f.address !== undefined && { address: f.address }),
  ...(f.state !== undefined && { state: f.state }),
  ...(f.latitude !== undefined && { latitude: f.latitude }),
  ...(f.longitude !== undefined && { longitude: f.longitude }),
  ...(f.notes !== undefined && { notes: f.notes }),
  ...(f.criteriaCardId !== undefined && { criteria_card_id: f.criteriaCardId }),
});

export async function createProject(organisationId: string, createdBy: string, fields: ProjectFields): Promise<string> {
  const [row] = await db("projects").insert({ ...toRow(fields), organisation_id: organisationId, created_by: createdBy }).returning("id");
  return row.id;
}

export async function updateProject(id: string, fields: Partial<ProjectFields>): Promise<void> {
  await db("projects").where({ id }).update({ ...toRow(fields), updated_at: db.fn.now() });
}
