import { db } from "../client";
import { acceptedProjectIds } from "./engagements";
import { likePattern, MAX_PAGE_SIZE, type ListPage, type ListQuery } from "./list-page";
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

/**
 * One page of the organisation's projects with their criteria card and design count, in one
 * statement: the page's ids are picked first from an index that starts with the organisation and
 * serves the sort (index-only: organisation, sort column, id; migration 20261203500000), counted
 * in the same pass by a window count, and only those rows are joined to their card and
 * organisation. A later page steps over index entries only (about 300 to a page of the index),
 * never over joined rows. The design count and the card's jurisdiction (its sort) are columns
 * kept by triggers (20261204100100); `q` goes through the
 * trigram index over name, address and state, and matches a criteria card through its id (the
 * organisation's matching cards are looked up first, so their ids are known when the page is
 * planned). With
 * `engagedUserId`, also the projects that person holds an accepted engagement on (an outside
 * engineer): those ids are looked up first, so a person with none gets the organisation's index
 * alone, not an OR the index cannot serve.
 */
export async function listProjects(organisationId: string, query: ListQuery, engagedUserId?: string): Promise<ListPage<ProjectRow>> {
  const q = (query.q ?? "").trim().slice(0, 200);
  const sort = query.sort && Object.hasOwn(PROJECT_SORTS, query.sort) ? (query.sort as keyof typeof PROJECT_SORTS) : "updatedAt";
  const dir = query.dir === "asc" || query.dir === "desc" ? query.dir : "desc";
  const pageSize = Math.min(MAX_PAGE_SIZE, Math.max(1, Math.floor(query.pageSize ?? 20)));
  const page = Math.max(1, Math.floor(query.page ?? 1));
  const engaged: string[] = engagedUserId ? await acceptedProjectIds(engagedUserId).pluck("project_id") : [];

  // Ties broken by name (for state) and id, so pages neither repeat nor skip a project.
  const order = `${PROJECT_SORTS[sort]} ${dir}${NOT_NULL_SORTS.has(sort) ? "" : " nulls last"}${sort === "state" ? `, p.name ${dir}` : ""}, p.id ${dir}`;
  const picked = db("projects as p")
    .where((w) => {
      w.where("p.organisation_id", organisationId);
      if (engaged.length) w.orWhereIn("p.id", engaged);
    })
    .orderByRaw(order)
    .limit(pageSize)
    .offset((page - 1) * pageSize);
  // Without a search, the count is its own index-only aggregate (an InitPlan): half the time of a
  // window count, which keeps every project of the organisation in a tuplestore before the page's
  // first row (0.26 against 0.5 ms for 2,200 projects; db/README.md, fifth pass). A search keeps
  // the window count, so its trigram index is read once for page and count.
  if (!q) {
    const counted = db("projects as c").where((w) => {
      w.where("c.organisation_id", organisationId);
      if (engaged.length) w.orWhereIn("c.id", engaged);
    }).count("*");
    picked.select("p.id", counted.as("total"));
  } else picked.select("p.id", db.raw("count(*) over () as total"));
  if (q) {
    const pattern = likePattern(q);
    // The organisation's cards whose jurisdiction matches, first (a probe of their trigram index):
    // as known ids the planner ORs them with the projects' trigram index (a BitmapOr), while an
    // array computed inside the statement made it read every project of the organisation and test
    // each; with none (the usual case) there is no OR at all.
    const cards: string[] = await db("criteria_cards").where("organisation_id", organisationId)
      .whereRaw("jurisdiction ILIKE ? ESCAPE '\\'", [pattern]).pluck("id");
    // The expression is the one indexed by projects_search_trgm_idx (migration 20261202500000).
    picked.where((w) => {
      w.whereRaw("(p.name || ' ' || p.address || ' ' || p.state) ILIKE ? ESCAPE '\\'", [pattern]);
      if (cards.length) w.orWhereIn("p.criteria_card_id", cards);
    });
  }
  const rows: (ProjectRow & { total: string })[] = await db
    .from(picked.as("pg"))
    .join("projects as p", "p.id", "pg.id")
    .leftJoin("criteria_cards as c", "c.id", "p.criteria_card_id")
    .join("organisations as o", "o.id", "p.organisation_id")
    .select("p.id", "p.name", "p.address", "p.state", "c.jurisdiction", "p.updated_at as updatedAt", "o.name as organisationName", "p.design_count as designCount", "pg.total")
    .orderByRaw(order);
  let total = rows.length ? Number(rows[0].total) : 0;
  // A page past the end has no row to carry the count: count on its own (only then).
  if (!rows.length && page > 1) total = (await listProjects(organisationId, { ...query, page: 1, pageSize: 1 }, engagedUserId)).total;
  return {
    rows: rows.map(({ total: _total, ...r }) => ({ ...r, updatedAt: new Date(r.updatedAt).toISOString() })),
    total, page, pageSize, sort, dir, q,
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
