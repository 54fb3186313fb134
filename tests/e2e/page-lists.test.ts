/**
 * The reviews page and the field list show a page, not everything (issue 19): the engineer's
 * waiting list shows its first rows with the total and a link to the full queue; the field list
 * shows 50 specs with an "Older specs" link to the next 50; the criteria page shows 20 cards a
 * page with the count and next and previous pages. Screenshots at 390 px and 1280 px go to
 * /tmp/shots with SCREENSHOTS=1.
 */
import { describe, expect, it } from "vitest";
import { db } from "@/db/client";
import { DEMO_ORG_ID } from "@/db/seeds/01_demo_accounts";
import { FIELD_SPEC_LIMIT, REVIEW_LIST_LIMIT } from "@/db/queries/review-queue";
import { CRITERIA_PAGE_SIZE } from "@/db/queries/criteria-cards";
import { browserSuite } from "../support/browser-suite";
import { DESKTOP, PHONE, baseUrl, shot, signedInContext } from "../support/browser";
import { DESIGNER, ENGINEER, INSTALLER, freshApproved, freshInReview, userId } from "../support/review-fixtures";
import { DEMO_PROJECT_ID } from "@/db/seeds/02_demo_projects";

const suite = browserSuite();

describe("lists that show a page", () => {
  it("reviews page: the first waiting reviews, how many wait in all, and the way to the full queue", async () => {
    const engineer = await userId(ENGINEER);
    const waiting = async () => Number((await db("reviews").where({ organisation_id: DEMO_ORG_ID, engineer_id: engineer }).whereNull("decision").count({ n: "*" }))[0].n);
    while ((await waiting()) <= REVIEW_LIST_LIMIT) await freshInReview();
    const total = await waiting();
    for (const viewport of [PHONE, DESKTOP]) {
      const context = suite.keep(await signedInContext(suite.browser, ENGINEER, viewport));
      const page = await context.newPage();
      await page.goto(`${baseUrl()}/reviews`);
      const heading = page.getByRole("heading", { name: /Waiting for your review/ });
      await expect(heading.innerText()).resolves.toBe(`Waiting for your review (first ${REVIEW_LIST_LIMIT} of ${total.toLocaleString("en-US")})`);
      const section = page.locator("section", { has: heading });
      expect(await section.locator("li").count()).toBe(REVIEW_LIST_LIMIT);
      await section.getByRole("link", { name: `All ${total.toLocaleString("en-US")} waiting, in your review queue` }).click();
      await page.waitForURL(/\/queue\?state=waiting/);
      expect(await page.evaluate(() => document.documentElement.scrollWidth <= window.innerWidth)).toBe(true);
      await page.goBack();
      await shot(page, `reviews-page-${viewport.width}`);
    }
  });

  it("field list: 50 specs a page and an older-specs link to the next ones", async () => {
    const current = async () => Number((await db("designs").where({ organisation_id: DEMO_ORG_ID }).whereNotNull("approved_revision_id").count({ n: "*" }))[0].n);
    while ((await current()) <= FIELD_SPEC_LIMIT) await freshApproved();
    for (const viewport of [PHONE, DESKTOP]) {
      const context = suite.keep(await signedInContext(suite.browser, INSTALLER, viewport));
      const page = await context.newPage();
      await page.goto(`${baseUrl()}/field`);
      const firstPage = await page.locator("main ul > li a").evaluateAll((links) => links.map((a) => a.getAttribute("href")));
      expect(firstPage).toHaveLength(FIELD_SPEC_LIMIT);
      await shot(page, `field-list-${viewport.width}`);
      await page.getByRole("link", { name: "Older specs" }).click();
      await page.waitForURL(/\/field\?older=/);
      const secondPage = await page.locator("main ul > li a").evaluateAll((links) => links.map((a) => a.getAttribute("href")));
      expect(secondPage.length).toBeGreaterThan(0);
      expect(secondPage.filter((href) => firstPage.includes(href))).toEqual([]);
      expect(await page.evaluate(() => document.documentElement.scrollWidth <= window.innerWidth)).toBe(true);
    }
  });

  it("criteria cards: 20 a page, how many in all, and next and previous pages", async () => {
    // Cards in the last state of the list's order, so other suites' cards keep their place.
    const count = async () => Number((await db("criteria_cards").where({ organisation_id: DEMO_ORG_ID }).count({ n: "*" }))[0].n);
    const values = { buildingCode: "IBC 2021", asceEdition: "7-16", riskCategory: "II", windSpeedMph: 115, exposure: "C", groundSnowPsf: 30, frostDepthIn: 36, soilClass: 4 };
    for (let i = 0; (await count()) <= CRITERIA_PAGE_SIZE; i++) {
      await db("criteria_cards").insert({ organisation_id: DEMO_ORG_ID, jurisdiction: `Zz Paging Test County ${crypto.randomUUID().slice(0, 6)} (invented)`, state: "WY", values: JSON.stringify(values) });
    }
    const total = await count();
    for (const viewport of [PHONE, DESKTOP]) {
      const context = suite.keep(await signedInContext(suite.browser, DESIGNER, viewport));
      const page = await context.newPage();
      await page.goto(`${baseUrl()}/criteria`);
      await expect(page.getByRole("status").filter({ hasText: "Cards" }).innerText()).resolves.toBe(`Cards 1–${CRITERIA_PAGE_SIZE} of ${total.toLocaleString("en-US")}`);
      const firstPage = await page.locator("main section h2[id^=card-]").allInnerTexts();
      expect(firstPage).toHaveLength(CRITERIA_PAGE_SIZE);
      expect(await page.evaluate(() => document.documentElement.scrollWidth <= window.innerWidth)).toBe(true);
      await shot(page, `criteria-page-${viewport.width}`);
      await page.getByRole("link", { name: "Next cards" }).click();
      await page.waitForURL(/\/criteria\?page=2/);
      const secondPage = await page.locator("main section h2[id^=card-]").allInnerTexts();
      expect(secondPage.length).toBe(Math.min(CRITERIA_PAGE_SIZE, total - CRITERIA_PAGE_SIZE));
      expect(secondPage.filter((name) => firstPage.includes(name))).toEqual([]);
      await page.getByRole("link", { name: "Previous cards" }).click();
      await page.waitForURL(/\/criteria\?page=1/);
      expect(await page.locator("main section h2[id^=card-]").allInnerTexts()).toEqual(firstPage);
    }
  });

  it("tables read on a phone without sideways scrolling: each row a card, each value beside its column name, a sort list", async () => {
    await freshInReview();
    const pages: [string, string, string][] = [
      [ENGINEER, "/queue", "Footing and failing checks"],
      [DESIGNER, "/projects", "Criteria card"],
      [DESIGNER, `/projects/${DEMO_PROJECT_ID}`, "Last saved"],
    ];
    for (const [who, path, column] of pages) {
      const context = suite.keep(await signedInContext(suite.browser, who, PHONE));
      const page = await context.newPage();
      await page.goto(`${baseUrl()}${path}`);
      const table = page.getByRole("table").first();
      await table.waitFor();
      // Nothing hidden past the right edge of the table's box (it used to need a sideways swipe nobody could see).
      const fits = await table.evaluate((t) => {
        const box = t.parentElement!;
        const cells = Array.from(t.querySelectorAll("td")).filter((c) => c.getBoundingClientRect().width > 0);
        return { box: box.scrollWidth <= box.clientWidth + 1, cells: cells.every((c) => c.getBoundingClientRect().right <= window.innerWidth + 1) };
      });
      expect(fits, path).toEqual({ box: true, cells: true });
      // Each value with its column's name beside it; the table is still a table of rows and cells.
      expect(await table.locator(`td[data-label="${column}"]`).first().evaluate((c) => getComputedStyle(c, "::before").content), path).toBe(`"${column}"`);
      expect(await table.getByRole("row").count(), path).toBeGreaterThan(1);
      await shot(page, `cards-${path.split("/")[1]}-390`);
      // The header row is hidden on a phone: sorting is a list.
      const sortBy = page.getByLabel("Sort by").first();
      expect(await sortBy.isVisible(), path).toBe(true);
      // At 1280 px it is a table with its header row, and the list is gone.
      await page.setViewportSize(DESKTOP);
      expect(await page.getByRole("columnheader", { name: new RegExp(column) }).first().isVisible(), path).toBe(true);
      expect(await sortBy.isVisible(), path).toBe(false);
    }
    // Sorting from the list goes to the server like a header click.
    const context = suite.keep(await signedInContext(suite.browser, DESIGNER, PHONE));
    const page = await context.newPage();
    await page.goto(`${baseUrl()}/projects`);
    await page.getByLabel("Sort by").selectOption({ label: "Project" });
    await page.waitForURL(/sort=name|sort=project/);
  });
});
