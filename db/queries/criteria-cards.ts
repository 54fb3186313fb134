import { db } from "../client";
import { isUuid } from "../ids";

/** A jurisdiction's design criteria, entered once per organisation and applied to its projects. */
export interface CriteriaCardValues {
  buildingCode: string;
  asceEdition: "7-16" | "7-22";
  riskCategory: "I" | "II" | "III" | "IV";
  windSpeedMph: number;
  exposure: "B" | "C" | "D";
  groundSnowPsf: number;
  frostDepthIn: number;
  soilClass: 1 | 2 | 3 | 4 | 5;
}
export type CriteriaSources = Partial<Record<keyof CriteriaCardValues, { source: string; checkedOn: string }>>;

export interface CriteriaCard {
  id: string;
  organisationId: string;
  jurisdiction: string;
  state: string;
  values: CriteriaCardValues;
  sources: CriteriaSources;
  updatedAt: Date;
}

const columns = ["id", "organisation_id as organisationId", "jurisdiction", "state", "values", "sources", "updated_at as updatedAt"];

export async function listCriteriaCards(organisationId: string): Promise<CriteriaCard[]> {
  return db("criteria_cards").where({ organisation_id: organisationId }).orderBy([{ column: "state" }, { column: "jurisdiction" }]).select(columns);
}

export async function getCriteriaCard(id: string): Promise<CriteriaCard | undefined> {
  if (!isUuid(id)) return undefined;
  return db("criteria_cards").where({ id }).first(columns);
}

export async function createCriteriaCard(a: { organisationId: string; jurisdiction: string; state: string; values: CriteriaCardValues; sources: CriteriaSources; createdBy: string }): Promise<string> {
  const [row] = await db("criteria_cards")
    .insert({ organisation_id: a.organisationId, jurisdiction: a.jurisdiction, state: a.state, values: JSON.stringify(a.values), sources: JSON.stringify(a.sources), created_by: a.createdBy })
    .returning("id");
  return row.id;
}

export async function updateCriteriaCard(id: string, a: { jurisdiction: string; state: string; values: CriteriaCardValues; sources: CriteriaSources }): Promise<void> {
  await db("criteria_cards").where({ id }).update({ jurisdiction: a.jurisdiction, state: a.state, values: JSON.stringify(a.values), sources: JSON.stringify(a.sources), updated_at: db.fn.now() });
}

/** True when another card of the organisation already uses this jurisdiction name. */
export async function jurisdictionTaken(organisationId: string, jurisdiction: string, exceptId?: string): Promise<boolean> {
  const q = db("criteria_cards").where({ organisation_id: organisationId }).whereRaw("lower(jurisdiction) = lower(?)", [jurisdiction]);
  if (exceptId) q.whereNot({ id: exceptId });
  return Boolean(await q.first("id"));
}
