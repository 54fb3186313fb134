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

/** Cards to a page on /criteria: an organisation can hold one per jurisdiction it builds in. */
export const CRITERIA_PAGE_SIZE = 20;

export interface CriteriaCardsPage {
  cards: CriteriaCard[];
  total: number;
  page: number;
  pageSize: number;
}

/**
 * One page of the organisation's cards, by state then jurisdiction (as `listCriteriaCards`). The
 * page's ids and the count come from one index-only pass over `(organisation_id, state,
 * jurisdiction, id)` (20261205100000), and only the page's cards are read with their values and
 * sources: the page costs the same whether the organisation has ten cards or a thousand.
 */
export async function criteriaCardsPage(organisationId: string, page: number): Promise<CriteriaCardsPage> {
  const pageSize = CRITERIA_PAGE_SIZE;
  const current = Number.isFinite(page) ? Math.min(100_000, Math.max(1, Math.floor(page))) : 1;
  const { rows } = await db.raw(
    `WITH picked AS (
       SELECT id, state, jurisdiction, count(*) OVER () AS total FROM criteria_cards WHERE organisation_id = ?
       ORDER BY state, jurisdiction, id LIMIT ? OFFSET ?
     )
     SELECT c.id, c.organisation_id AS "organisationId", c.jurisdiction, c.state, c.values, c.sources, c.updated_at AS "updatedAt", picked.total
     FROM picked JOIN criteria_cards c ON c.id = picked.id
     ORDER BY picked.state, picked.jurisdiction, picked.id`,
    [organisationId, pageSize, (current - 1) * pageSize],
  );
  // A page past the end carries no row to hold the count: count on its own (only then).
  const total = rows.length
    ? Number(rows[0].total)
    : current > 1 ? Number((await db("criteria_cards").where({ organisation_id: organisationId }).count({ n: "*" }))[0].n) : 0;
  return { cards: rows.map(({ total: _total, ...card }: CriteriaCard & { total: string }) => card), total, page: current, pageSize };
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
