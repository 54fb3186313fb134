import type { Knex } from "knex";
import { db } from "../client";
import { listPage, type ListPage, type ListQuery } from "./list-page";
import { createRevision, type RevisionStatus } from "./revisions";
import { isUuid } from "../ids";

/** One array on its posts, within a project; its content lives in its revisions. */
export interface Design {
  id: string;
  projectId: string;
  organisationId: string;
  name: string;
  createdAt: Date;
}

export interface DesignRow {
  id: string;
  name: string;
  latestNumber: number | null;
  status: RevisionStatus | null;
  depthIn: number | null;
  diameterIn: number | null;
  pass: boolean | null;
  updatedAt: string;
}

export async function getDesign(id: string): Promise<Design | undefined> {
  if (!isUuid(id)) return undefined;
  return db("designs").where({ id }).first("id", "project_id as projectId", "organisation_id as organisationId", "name", "created_at as createdAt");
}

export const DESIGN_SORTS = { name: "d.name", latestNumber: "lr.number", status: "lr.status", depthIn: "lr.footing_depth_in", updatedAt: "coalesce(lr.created_at, d.created_at)" } as const;

/** One page of a project's designs with their latest revision's number, status and footing (stored columns, no JSON read). */
export async function listDesigns(projectId: string, query: ListQuery = {}): Promise<ListPage<DesignRow>> {
  const base = db("designs as d")
    .joinRaw(`left join lateral (select r.number, r.status, r.note, r.created_at, r.footing_depth_in, r.footing_diameter_in, r.footing_pass
      from revisions r where r.design_id = d.id order by r.number desc limit 1) lr on true`)
    .where("d.project_id", projectId);
  const page = await listPage<DesignRow & { updatedAt: Date }>(base, query, {
    sortable: DESIGN_SORTS,
    defaultSort: "updatedAt",
    defaultDir: "desc",
    notNull: ["name"],
    search: ["d.name", "lr.status", "lr.note"],
    select: (qb) =>
      qb.select("d.id", "d.name", "lr.number as latestNumber", "lr.status",
        db.raw("coalesce(lr.created_at, d.created_at) as \"updatedAt\""),
        "lr.footing_depth_in as depthIn", "lr.footing_diameter_in as diameterIn", "lr.footing_pass as pass"),
  });
  return { ...page, rows: page.rows.map((r) => ({ ...r, updatedAt: new Date(r.updatedAt).toISOString() })) };
}

/**
 * A new design and its revision 1 in one transaction: if the revision cannot be written, the
 * design is not left behind empty.
 */
export async function createDesignWithRevision(
  a: { projectId: string; organisationId: string; name: string; authorId: string; input: unknown; result: unknown; engineVersion: string; note: string },
  conn: Knex = db,
): Promise<{ designId: string; revisionId: string }> {
  return conn.transaction(async (trx) => {
    const [design] = await trx("designs").insert({ project_id: a.projectId, organisation_id: a.organisationId, name: a.name, created_by: a.authorId }).returning("id");
    const revision = await createRevision(
      { designId: design.id, organisationId: a.organisationId, baseRevisionId: null, input: a.input, result: a.result, engineVersion: a.engineVersion, note: a.note, authorId: a.authorId },
      trx,
    );
    await trx("projects").where({ id: a.projectId }).update({ updated_at: trx.fn.now() });
    return { designId: design.id, revisionId: revision.id };
  });
}
