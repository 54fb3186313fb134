import type { Knex } from "knex";
import { db } from "../client";
import { isUuid } from "../ids";

export const GROUND_FOUND = ["as_expected", "rock", "water", "fill", "caving"] as const;
export type GroundFound = (typeof GROUND_FOUND)[number];

export interface AsBuiltEntry {
  id: string;
  revisionId: string;
  organisationId: string;
  postId: string;
  measuredDiameterIn: number;
  measuredDepthIn: number;
  groundFound: GroundFound;
  notes: string;
  photoKeys: string[];
  recordedByName: string;
  recordedAt: Date;
}

function entries(trx: Knex = db) {
  return trx("as_built_entries as a")
    .join("users as u", "u.id", "a.recorded_by")
    .select(
      "a.id", "a.revision_id as revisionId", "a.organisation_id as organisationId", "a.post_id as postId",
      "a.measured_diameter_in as measuredDiameterIn", "a.measured_depth_in as measuredDepthIn", "a.ground_found as groundFound",
      "a.notes", "a.photo_keys as photoKeys", "u.name as recordedByName", "a.recorded_at as recordedAt",
    );
}

export async function asBuiltEntries(revisionId: string): Promise<AsBuiltEntry[]> {
  return entries().where("a.revision_id", revisionId).orderBy([{ column: "a.post_id" }, { column: "a.recorded_at" }]);
}

export async function getAsBuiltEntry(entryId: string): Promise<AsBuiltEntry | undefined> {
  if (!isUuid(entryId)) return undefined;
  return entries().where("a.id", entryId).first();
}

export async function insertAsBuilt(
  trx: Knex.Transaction,
  e: { revisionId: string; organisationId: string; postId: string; measuredDiameterIn: number; measuredDepthIn: number; groundFound: GroundFound; notes: string; photoKeys: string[]; recordedBy: string },
): Promise<string> {
  const [row] = await trx("as_built_entries")
    .insert({
      revision_id: e.revisionId, organisation_id: e.organisationId, post_id: e.postId,
      measured_diameter_in: e.measuredDiameterIn, measured_depth_in: e.measuredDepthIn, ground_found: e.groundFound,
      notes: e.notes, photo_keys: JSON.stringify(e.photoKeys), recorded_by: e.recordedBy,
    })
    .returning("id");
  return row.id;
}
