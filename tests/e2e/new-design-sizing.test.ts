/**
 * Issue 17, item 12, on the page: a design made from a criteria card where nothing passes on four
 * posts opens in the editor with revision 1's note saying plainly what to change; one from the demo
 * card opens passing. Screenshots with SCREENSHOTS=1.
 */
import { describe, expect, it } from "vitest";
import { db } from "@/db/client";
import type { CriteriaCardValues } from "@/db/queries/criteria-cards";
import { DEMO_ORG_ID } from "@/db/seeds/01_demo_accounts";
import { browserSuite } from "../support/browser-suite";
import { PHONE, baseUrl, shot, signedInContext } from "../support/browser";
import { DESIGNER, userId } from "../support/review-fixtures";

const suite = browserSuite();

async function projectWithCard(jurisdiction: string, values: CriteriaCardValues): Promise<string> {
  const author = await userId(DESIGNER);
  const [card] = await db("criteria_cards").insert({ organisation_id: DEMO_ORG_ID, jurisdiction, state: "CO", values: JSON.stringify(values), created_by: author }).returning("id");
  const [project] = await db("projects").insert({ organisation_id: DEMO_ORG_ID, name: `${jurisdiction} site (test)`, address: "1 Test Lane (invented)", state: "CO", criteria_card_id: card.id, created_by: author }).returning("id");
  return project.id;
}

describe("new design from the card, in the browser", () => {
  it("says what to change when nothing passes, and opens passing from the demo card", async () => {
    // 180 mph, exposure D, soil class 5 (invented card; inside the 85–200 mph range of engine/schema.ts).
    const extreme: CriteriaCardValues = { buildingCode: "IBC 2021", asceEdition: "7-22", riskCategory: "II", windSpeedMph: 180, exposure: "D", groundSnowPsf: 0, frostDepthIn: 12, soilClass: 5 };
    const projectId = await projectWithCard("Gale Point County", extreme);
    const page = await (suite.keep(await signedInContext(suite.browser, DESIGNER))).newPage();
    await page.goto(`${baseUrl()}/projects/${projectId}`);
    await page.getByLabel("New design name").fill("Array on four posts");
    await page.getByRole("button", { name: "Create design" }).click();
    await page.getByRole("heading", { level: 1, name: "Array on four posts" }).waitFor({ timeout: 20_000 });
    const header = await page.locator("main").innerText();
    expect(header).toMatch(/Fails a check at this size\..*To pass: .*Change the number of posts to \d+\./s);
    await shot(page, "new-design-advice-desktop");
    await page.setViewportSize(PHONE);
    await shot(page, "new-design-advice-phone");

    await page.goto(`${baseUrl()}/projects?q=Larkspur`);
    await page.getByRole("link", { name: "Larkspur Meadow residence (demo)" }).click();
    await page.getByLabel("New design name").fill("From the demo card");
    await page.getByRole("button", { name: "Create design" }).click();
    await page.getByRole("heading", { level: 1, name: "From the demo card" }).waitFor({ timeout: 20_000 });
    expect(await page.locator("main").innerText()).toContain("Every check passes.");
    await page.getByText("Passes every check.").first().waitFor();
  });
});
