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

/** Every hold on a design, newest first (for the history on the review page). */
export async function allHolds(designId: string): Promise<HoldRecord[]> {
  return holdsQuery().where("h.design_id", designId).orderBy("h.raised_at", "desc");
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
export async function clearHoldRow(holdId: string, clearedBy: string, note: string): Promise<boolean> {
  const n = await db("design_holds").where({ id: holdId }).whereNull("cleared_at").update({ cleared_by: clearedBy, cleared_at: db.fn.now(), clear_note: note });
  return n === 1;
}
