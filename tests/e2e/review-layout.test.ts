/**
 * Issue 17, item 5: the review page leads with the summary, then what differs from the criteria
 * card, then the checks, then the inputs grouped as in the editor; long tables start folded with
 * their row count (and open without JavaScript); on a 390 px phone nothing scrolls sideways.
 * Prints the page height at 390 px and 1280 px (screenshots to /tmp/shots with SCREENSHOTS=1).
 */
import type { Page } from "playwright-core";
import { describe, expect, it } from "vitest";
import { applyCriteriaCard } from "@/db/design-defaults";
import { db } from "@/db/client";
import { defaultDesignInput, type DesignInputDraft } from "@/engine";
import { browserSuite } from "../support/browser-suite";
import { DESKTOP, PHONE, baseUrl, shot, signedInContext } from "../support/browser";
import { DEMO_ORG_ID } from "@/db/seeds/01_demo_accounts";
import { DESIGNER, ENGINEER, freshInReview, makeDesign, userId } from "../support/review-fixtures";

const suite = browserSuite();

/** Page y of the first element matching the selector (the page's own order as a reader scrolls it). */
const top = (page: Page, selector: string) => page.locator(selector).first().evaluate((el) => el.getBoundingClientRect().top + window.scrollY);
const pageSize = (page: Page) => page.evaluate(() => ({ height: document.documentElement.scrollHeight, width: document.documentElement.scrollWidth, viewport: window.innerWidth }));

describe("review page layout", () => {
  it("reads summary → card differences → checks → inputs, folds long tables with their counts, never scrolls sideways on a phone", async () => {
    // The seeded Cedar Basin card (invented: 125 mph, soil class 3); the design uses 140 mph and
    // soil class 5, on eight posts so the loads table is long (8 posts × 14 combinations).
    const card = await db("criteria_cards").where({ jurisdiction: "Cedar Basin County (demo)" }).first("id", "values");
    const base = applyCriteriaCard(structuredClone(defaultDesignInput) as unknown as DesignInputDraft, card.values);
    const input = { ...base, site: { ...base.site, windSpeedMph: 140, soil: { method: "class", soilClass: 5 } }, posts: { ...base.posts, count: 8 } } as DesignInputDraft;
    const { revisionId } = await makeDesign({ criteriaCardId: card.id, input });
    // In review with the demo engineer, so the decision form is on the page.
    await db("revisions").where({ id: revisionId }).update({ status: "in_review" });
    await db("reviews").insert({ revision_id: revisionId, organisation_id: DEMO_ORG_ID, engineer_id: await userId(ENGINEER), submitted_by: await userId(DESIGNER) });
    const stored = (await db("revisions").where({ id: revisionId }).first("result")).result;
    const loadRows = stored.postLoads.reduce((n: number, p: { combinations: unknown[] }) => n + p.combinations.length, 0);
    expect(loadRows).toBeGreaterThan(100);

    const context = suite.keep(await signedInContext(suite.browser, ENGINEER, PHONE));
    const page = await context.newPage();
    await page.goto(`${baseUrl()}/reviews/${revisionId}`);
    await page.getByRole("heading", { level: 1 }).waitFor();

    // 1. Order as read on the phone.
    const summary = await top(page, 'section[aria-label="Footing and checks"]');
    const cardDiff = await top(page, "#card-diff-h");
    const checks = await top(page, "#checks-h");
    const inputs = await top(page, "#inputs-h");
    const loads = await top(page, "#loads-h");
    const decision = await top(page, "#decide-h");
    expect(summary).toBeLessThan(cardDiff);
    expect(cardDiff).toBeLessThan(checks);
    expect(checks).toBeLessThan(inputs);
    expect(inputs).toBeLessThan(loads);
    expect(inputs).toBeLessThan(decision);

    // 2. The card differences, highlighted with the card's value beside.
    const diff = page.locator("section", { has: page.locator("#card-diff-h") });
    expect(await diff.innerText()).toMatch(/Basic wind speed\s+140 mph\s+card says 125 mph/);
    expect(await diff.innerText()).toMatch(/Presumed soil class\s+Presumed class 5.*card says Presumed class 3/s);

    // 3. The long loads table starts folded, its summary giving the count; it opens from the keyboard.
    const loadsFold = page.locator("section", { has: page.locator("#loads-h") }).locator("details");
    expect(await loadsFold.evaluate((d) => (d as HTMLDetailsElement).open)).toBe(false);
    expect(await loadsFold.locator("summary").innerText()).toContain(`(${loadRows} rows)`);
    expect(await loadsFold.locator("tbody tr").first().isVisible()).toBe(false);
    const postsFold = page.locator("section", { has: page.locator("#per-post-h") }).locator("details");
    expect(await postsFold.evaluate((d) => (d as HTMLDetailsElement).open)).toBe(false);
    expect(await postsFold.locator("summary").innerText()).toContain("(8 posts)");

    // 4. No sideways scrolling on the phone, folded or open.
    let size = await pageSize(page);
    console.log(`review page at 390 px: ${size.height} px tall, ${size.width} px wide`);
    await shot(page, "review-layout-phone");
    expect(size.width).toBeLessThanOrEqual(size.viewport);

    await loadsFold.locator("summary").focus();
    await page.keyboard.press("Enter");
    expect(await loadsFold.evaluate((d) => (d as HTMLDetailsElement).open)).toBe(true);
    expect(await loadsFold.locator("tbody tr").count()).toBe(loadRows);
    size = await pageSize(page);
    expect(size.width).toBeLessThanOrEqual(size.viewport);

    await page.setViewportSize(DESKTOP);
    await page.reload();
    await page.getByRole("heading", { level: 1 }).waitFor();
    const desktop = await page.evaluate(() => document.documentElement.scrollHeight);
    console.log(`review page at 1280 px: ${desktop} px tall`);
    await shot(page, "review-layout-desktop");
  });

  it("never breaks a size between its number and its unit in the footing-per-post table on a phone", async () => {
    const { revisionId } = await freshInReview();
    for (const units of ["imperial", "metric"]) {
      const context = suite.keep(await signedInContext(suite.browser, ENGINEER, PHONE));
      await context.addCookies([{ name: "pierwise-units", value: units, url: baseUrl() }]);
      const page = await context.newPage();
      await page.goto(`${baseUrl()}/reviews/${revisionId}`);
      const table = page.locator("section", { has: page.locator("#per-post-h") }).locator("table");
      await table.waitFor();
      // Each value on one line: its text's boxes share one top ("30 in", not "30" over "in").
      const lines = await table.locator("tbody td").evaluateAll((cells) => cells.map((c) => {
        const range = document.createRange();
        range.selectNodeContents(c);
        return { text: c.textContent, lines: new Set(Array.from(range.getClientRects()).map((r) => Math.round(r.top))).size };
      }));
      expect(lines.length).toBeGreaterThan(0);
      for (const l of lines) expect(l.lines, `${units}: ${l.text}`).toBe(1);
      expect(await page.evaluate(() => document.documentElement.scrollWidth <= window.innerWidth), units).toBe(true);
    }
  });

  it("keeps the \"over 1.00, fails\" mark in one box on a phone", async () => {
    // A hole given 24 in deep: short of the frost depth and laterally (IBC §1809.5; IBC §1807.3.2.1 Eq. 18-1), so checks fail.
    const base = structuredClone(defaultDesignInput) as unknown as DesignInputDraft & { posts: Record<string, unknown> };
    const { revisionId } = await makeDesign({ input: { ...base, posts: { ...base.posts, fixedDepthIn: 24 } } as DesignInputDraft });
    const page = await (suite.keep(await signedInContext(suite.browser, DESIGNER, PHONE))).newPage();
    await page.goto(`${baseUrl()}/reviews/${revisionId}`);
    const marks = page.locator('[data-ratio-over="true"] > span');
    await marks.first().waitFor();
    // Phone widths from 330 to 420 px: wherever a line ends, the mark moves whole.
    for (let width = 330; width <= 420; width += 6) {
      await page.setViewportSize({ width, height: PHONE.height });
      const boxes = await marks.evaluateAll((spans) => spans.filter((s) => s.getClientRects().length > 0).map((s) => s.getClientRects().length));
      expect(boxes.length).toBeGreaterThan(0);
      for (const n of boxes) expect(n, `at ${width} px`).toBe(1);
    }
  });
});
