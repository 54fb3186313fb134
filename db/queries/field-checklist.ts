import { db } from "../client";

export interface ChecklistTick {
  itemKey: string;
  ticked: boolean;
  tickedByName: string;
  tickedAt: Date;
}

/** The saved ticks of one revision's field checklist. */
export async function checklistTicks(revisionId: string): Promise<ChecklistTick[]> {
  return db("field_checklist_ticks as t")
    .join("users as u", "u.id", "t.ticked_by")
    .where("t.revision_id", revisionId)
    .select("t.item_key as itemKey", "t.ticked", "u.name as tickedByName", "t.ticked_at as tickedAt");
}

/** Ticks or unticks one item; the latest answer wins and records who gave it. */
export async function setChecklistTick(row: { revisionId: string; organisationId: string; itemKey: string; ticked: boolean; userId: string }): Promise<void> {
  await db("field_checklist_ticks")
    .insert({ revision_id: row.revisionId, organisation_id: row.organisationId, item_key: row.itemKey, ticked: row.ticked, ticked_by: row.userId, ticked_at: db.fn.now() })
    .onConflict(["revision_id", "item_key"])
    .merge(["ticked", "ticked_by", "ticked_at"]);
}
