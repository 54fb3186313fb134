/**
 * The server-paged tables (components/design/data-table.tsx) draw themselves without the table
 * library's engine: sorting still follows its rules [the library's documented defaults: a sorted
 * column flips, another column starts A→Z for text and largest-first otherwise], a column marked
 * unsortable has no sort button, and the sorted column says so to assistive technology.
 */
import { describe, expect, it } from "vitest";
import { DEMO_PROJECT_ID } from "@/db/seeds/02_demo_projects";
import { browserSuite } from "../support/browser-suite";
import { DESKTOP, baseUrl, signedInContext } from "../support/browser";

const suite = browserSuite();
const DESIGNER = "designer@demo.pierwise.test";

describe("server-paged table", () => {
  it("sorts by the column clicked, in the library's order, and marks the sorted column", async () => {
    const context = suite.keep(await signedInContext(suite.browser, DESIGNER, DESKTOP));
    const page = await context.newPage();
    await page.goto(`${baseUrl()}/projects/${DEMO_PROJECT_ID}`);
    const table = page.getByRole("table", { name: "Designs" });
    await table.getByRole("link", { name: "12-module array on two posts" }).waitFor();

    // Text column: A→Z first, then flipped.
    await table.getByRole("button", { name: /^Design/ }).click();
    await page.waitForURL(/d_sort=name&d_dir=asc/);
    await expect.poll(() => table.getByRole("columnheader", { name: /^Design/ }).getAttribute("aria-sort")).toBe("ascending");
    await table.getByRole("button", { name: /^Design/ }).click();
    await page.waitForURL(/d_sort=name&d_dir=desc/);
    await expect.poll(() => table.getByRole("columnheader", { name: /^Design/ }).getAttribute("aria-sort")).toBe("descending");

    // A number column starts largest first; an unsortable column has no button.
    await table.getByRole("button", { name: /^Revision/ }).click();
    await page.waitForURL(/d_sort=latestNumber&d_dir=desc/);
    expect(await table.getByRole("columnheader", { name: /^Design/ }).getAttribute("aria-sort")).toBeNull();
    expect(await table.getByRole("columnheader", { name: "Approved" }).getByRole("button").count()).toBe(0);
    // Cells still draw through each column's own renderer (the revision as "Rev n").
    expect(await table.locator("tbody").innerText()).toMatch(/Rev \d+/);
  });
});
