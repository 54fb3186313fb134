import { db } from "../client";
import { acceptedProjectIds } from "./engagements";
import { likePattern, listPage, type ListPage, type ListQuery } from "./list-page";
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

export const PROJECT_SORTS = { name: "p.name", state: "p.state", jurisdiction: "c.jurisdiction", designCount: "p.design_count", updatedAt: "p.updated_at" } as const;

/**
 * One page of the organisation's projects with their criteria card and design count. The design
 * count is a column kept by a trigger (so sorting by it reads no designs); `q` goes through the
 * trigram index over name, address and state, and matches a criteria card through its id. With
 * `engagedUserId`, also the projects that person holds an accepted engagement on (an outside engineer).
 */
export async function listProjects(organisationId: string, query: ListQuery, engagedUserId?: string): Promise<ListPage<ProjectRow>> {
  const base = db("projects as p").leftJoin("criteria_cards as c", "c.id", "p.criteria_card_id").join("organisations as o", "o.id", "p.organisation_id")
    .where((w) => {
      w.where("p.organisation_id", organisationId);
      if (engagedUserId) w.orWhereIn("p.id", acceptedProjectIds(engagedUserId));
    });
  // Cards whose jurisdiction matches, looked up first (a few rows, trigram index): projects then
  // match by card id through their own index, which the planner can OR with the trigram index.
  const q = (query.q ?? "").trim().slice(0, 200);
  const cardIds: string[] = q
    ? await db("criteria_cards").where("organisation_id", organisationId).whereRaw("jurisdiction ILIKE ? ESCAPE '\\'", [likePattern(q)]).pluck("id")
    : [];
  const page = await listPage<ProjectRow>(base, query, {
    sortable: PROJECT_SORTS,
    defaultSort: "updatedAt",
    defaultDir: "desc",
    notNull: ["name", "state", "designCount", "updatedAt"],
    search: ["p.name", "p.address", "p.state", "c.jurisdiction"],
    // The expression is the one indexed by projects_search_trgm_idx (migration 20261202500000).
    match: (w, pattern) =>
      w.whereRaw("(p.name || ' ' || p.address || ' ' || p.state) ILIKE ? ESCAPE '\\'", [pattern])
        .orWhereIn("p.criteria_card_id", cardIds),
    select: (qb) =>
      qb.select("p.id", "p.name", "p.address", "p.state", "c.jurisdiction", "p.updated_at as updatedAt", "o.name as organisationName", "p.design_count as designCount"),
  });
  return { ...page, rows: page.rows.map((r) => ({ ...r, updatedAt: new Date(r.updatedAt).toISOString() })) };
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
