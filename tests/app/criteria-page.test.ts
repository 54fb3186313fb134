/**
 * Issue 19, fifth pass: /criteria reads one page of cards (20), in the order the whole list had
 * (state, then jurisdiction), with the organisation's count, so a page costs the same for ten
 * cards or a thousand. The pages together are the whole list, each card once.
 */
import { describe, expect, it } from "vitest";
import { db } from "@/db/client";
import { CRITERIA_PAGE_SIZE, criteriaCardsPage, listCriteriaCards } from "@/db/queries/criteria-cards";

// Invented jurisdictions; values as the schema stores them (the page only reads them back).
const VALUES = { buildingCode: "IBC 2021", asceEdition: "7-16", riskCategory: "II", windSpeedMph: 115, exposure: "C", groundSnowPsf: 30, frostDepthIn: 36, soilClass: 4 };

async function organisationWithCards(n: number): Promise<string> {
  const [org] = await db("organisations").insert({ name: `Criteria paging test ${crypto.randomUUID().slice(0, 6)} (invented)` }).returning("id");
  const states = ["WY", "CO", "AZ", "NM"];
  await db("criteria_cards").insert(Array.from({ length: n }, (_, i) => ({
    organisation_id: org.id, jurisdiction: `Test County ${String((i * 7) % n).padStart(2, "0")}`, state: states[i % states.length], values: JSON.stringify(VALUES),
  })));
  return org.id;
}

describe("criteria cards page", () => {
  it("pages the organisation's cards 20 at a time, in the whole list's order, with the count", async () => {
    const org = await organisationWithCards(45);
    const all = await listCriteriaCards(org);
    expect(all).toHaveLength(45);
    expect(CRITERIA_PAGE_SIZE).toBe(20);
    const pages = await Promise.all([1, 2, 3].map((p) => criteriaCardsPage(org, p)));
    expect(pages.map((p) => p.cards.length)).toEqual([20, 20, 5]);
    expect(pages.map((p) => p.total)).toEqual([45, 45, 45]);
    expect(pages.flatMap((p) => p.cards)).toEqual(all);
    // By state, then jurisdiction.
    const keys = pages.flatMap((p) => p.cards).map((c) => `${c.state} ${c.jurisdiction}`);
    expect(keys).toEqual([...keys].sort());
    expect(pages[0].cards[0]).toMatchObject({ organisationId: org, values: VALUES });
  });

  it("says the count on a page past the end, and reads nothing of another organisation", async () => {
    const org = await organisationWithCards(3);
    const past = await criteriaCardsPage(org, 9);
    expect(past).toMatchObject({ cards: [], total: 3, page: 9 });
    const [empty] = await db("organisations").insert({ name: "Criteria paging, no cards (invented)" }).returning("id");
    expect(await criteriaCardsPage(empty.id, 1)).toMatchObject({ cards: [], total: 0, page: 1 });
    // Hostile page numbers are page 1, never an error.
    for (const p of [Number.NaN, -4, 0, Number.POSITIVE_INFINITY]) expect((await criteriaCardsPage(org, p)).page).toBe(1);
  });
});
