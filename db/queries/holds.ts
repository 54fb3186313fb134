import type { Knex } from "knex";
import { db } from "../client";
import { isUuid } from "../ids";

export interface HoldRecord {
  id: string;
  designId: string;
  revisionId: string | null;
  asBuiltEntryId: string | null;
  reason: string;
  raisedBy: string;
  raisedByName: string;
  raisedAt: Date;
  clearedByName: string | null;
  clearedAt: Date | null;
  clearNote: string | null;
}

function holdsQuery(trx: Knex = db) {
  return trx("design_holds as h")
    .join("users as r", "r.id", "h.raised_by")
    .leftJoin("users as c", "c.id", "h.cleared_by")
    .select(
      "h.id", "h.design_id as designId", "h.revision_id as revisionId", "h.as_built_entry_id as asBuiltEntryId", "h.reason",
      "h.raised_by as raisedBy", "r.name as raisedByName", "h.raised_at as raisedAt", "c.name as clearedByName",
      "h.cleared_at as clearedAt", "h.clear_note as clearNote",
    );
}

/** Holds not yet cleared on a design, oldest first. */
export async function openHolds(designId: string): Promise<HoldRecord[]> {
  return holdsQuery().where("h.design_id", designId).whereNull("h.cleared_at").orderBy("h.raised_at", "asc");
}

export async function getHold(holdId: string): Promise<(HoldRecord & { organisationId: string }) | undefined> {
  if (!isUuid(holdId)) return undefined;
  return holdsQuery().select("h.organisation_id as organisationId").where("h.id", holdId).first();
}

export async function insertHold(trx: Knex.Transaction, h: { designId: string; organisationId: string; revisionId: string; asBuiltEntryId: string; reason: string; raisedBy: string }): Promise<string> {
  const [row] = await trx("design_holds")
    .insert({ design_id: h.designId, organisation_id: h.organisationId, revision_id: h.revisionId, as_built_entry_id: h.asBuiltEntryId, reason: h.reason, raised_by: h.raisedBy })
    .returning("id");
  return row.id;
}

/** Clears an open hold; false when it was already cleared. */
export async function clearHoldRow(holdId: string, clearedBy: string, note: string, trx: Knex = db): Promise<boolean> {
  const n = await trx("design_holds").where({ id: holdId }).whereNull("cleared_at").update({ cleared_by: clearedBy, cleared_at: db.fn.now(), clear_note: note });
  return n === 1;
}

/** Every hold raised on one revision, newest first (the field spec shows the cleared ones' notes). */
export async function holdsOfRevision(revisionId: string): Promise<HoldRecord[]> {
  return holdsQuery().where("h.revision_id", revisionId).orderBy("h.raised_at", "desc");
}

/**
 * Who must hear that a hold was cleared: the revision's author and whoever submitted it (the
 * designer side), and every installer who logged an as-built hole on it.
 */
export async function holdAudience(revisionId: string): Promise<{ email: string; name: string }[]> {
  const ids = db("revisions").where({ id: revisionId }).whereNotNull("author_id").select("author_id as id")
    .union((q) => q.from("reviews").where({ revision_id: revisionId }).select("submitted_by"))
    .union((q) => q.from("as_built_entries").where({ revision_id: revisionId }).select("recorded_by"));
  return db("users").whereIn("id", ids).orderBy("email").select("email", "name");
}

/** Open holds of the organisation, counted through the open-holds index (the list shows at most a page). */
export async function countOpenHolds(organisationId: string): Promise<number> {
  const [{ n }] = await db("design_holds").where({ organisation_id: organisationId }).whereNull("cleared_at").count<{ n: string }[]>({ n: "*" });
  return Number(n);
}

/**
 * `openHoldsOfOrganisation` and `countOpenHolds` in one statement (the count an uncorrelated
 * subquery over the open-holds index, run once); no row means no open hold, a count of 0.
 */
export async function openHoldsWithCount(organisationId: string, limit = 25): Promise<{ rows: Awaited<ReturnType<typeof openHoldsOfOrganisation>>; total: number }> {
  const rows = await openHoldsOfOrganisation(organisationId, limit, db.raw("(select count(*) from design_holds c where c.organisation_id = ? and c.cleared_at is null) as total", [organisationId]));
  return { rows: rows.map(({ total: _total, ...r }) => r), total: rows.length ? Number(rows[0].total) : 0 };
}

/**
 * Open holds of the organisation with the revision each was raised on, oldest first (at most
 * `limit`): the engineer's list opens with them. The page's holds are picked first (organisation,
 * open, oldest: the open-holds index) and only they are joined to names; an open hold has no
 * clearer, so no join for one. Planning the flat six-table join took ≈ 2.5 ms at ×1000 (its
 * execution 0.6 ms); picked first, ≈ 0.7 ms.
 */
export async function openHoldsOfOrganisation(organisationId: string, limit = 25, extra?: Knex.Raw): Promise<(HoldRecord & { designName: string; projectName: string; number: number | null; total?: string })[]> {
  const picked = db("design_holds").where("organisation_id", organisationId).whereNull("cleared_at").orderBy("raised_at", "asc").limit(limit).select("*");
  return db
    .from(picked.as("h"))
    .join("users as r", "r.id", "h.raised_by")
    .join("designs as d", "d.id", "h.design_id")
    .join("projects as p", "p.id", "d.project_id")
    .leftJoin("revisions as rv", "rv.id", "h.revision_id")
    .select(
      "h.id", "h.design_id as designId", "h.revision_id as revisionId", "h.as_built_entry_id as asBuiltEntryId", "h.reason",
      "h.raised_by as raisedBy", "r.name as raisedByName", "h.raised_at as raisedAt", db.raw(`null::text as "clearedByName"`),
      "h.cleared_at as clearedAt", "h.clear_note as clearNote", "d.name as designName", "p.name as projectName", "rv.number",
    )
    .modify((qb) => { if (extra) qb.select(extra); })
    .orderBy("h.raised_at", "asc");
}
