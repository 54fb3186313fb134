/**
 * The server-paged tables (components/design/data-table.tsx) are drawn through the table
 * library (manual sorting and paging): sorting follows its rules [the library's documented defaults: a sorted
 * column flips, another column starts A→Z for text and largest-first otherwise], a column marked
 * unsortable has no sort button, and the sorted column says so to assistive technology. The
 * editor's revisions table is drawn on the server (links, a GET form) until the reader reaches for it.
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

describe("the editor's revisions table, below the fold", () => {
  const editorUrl = async (context: import("playwright-core").BrowserContext) => {
    const page = await context.newPage();
    await page.goto(`${baseUrl()}/projects/${DEMO_PROJECT_ID}`);
    const href = await page.getByRole("table", { name: "Designs" }).getByRole("link", { name: "12-module array on two posts" }).getAttribute("href");
    await page.close();
    return `${baseUrl()}${href}`;
  };

  it("is drawn on the server and sorts and filters without JavaScript", async () => {
    const context = suite.keep(await suite.browser.newContext({ viewport: DESKTOP, baseURL: baseUrl(), javaScriptEnabled: false }));
    expect((await context.request.post("/api/session", { data: { email: DESIGNER, password: "pierwise-demo" } })).ok()).toBe(true);
    const page = await context.newPage();
    await page.goto(await editorUrl(context));
    const table = page.getByRole("table", { name: "Revisions" });
    // Newest first by default; the revision column flips to oldest first.
    await table.getByRole("link", { name: /^Revision/ }).click();
    await page.waitForURL(/r_sort=number&r_dir=asc/);
    expect(await page.getByRole("table", { name: "Revisions" }).getByRole("columnheader", { name: /^Revision/ }).getAttribute("aria-sort")).toBe("ascending");
    // The filter is a GET form: Enter sends it, keeping the sort.
    await page.getByLabel("Filter revisions by note, author or status").fill("no such note anywhere");
    await page.getByLabel("Filter revisions by note, author or status").press("Enter");
    await page.waitForURL(/r_q=no\+such\+note\+anywhere/);
    expect(page.url()).toMatch(/r_sort=number/);
    expect(await page.getByRole("table", { name: "Revisions" }).innerText()).toContain("Nothing matches “no such note anywhere”.");
  });

  it("loads the browser's table only when the reader reaches for it", async () => {
    const context = suite.keep(await signedInContext(suite.browser, DESIGNER, DESKTOP));
    const page = await context.newPage();
    await page.goto(await editorUrl(context), { waitUntil: "networkidle" });
    const table = page.getByRole("table", { name: "Revisions" });
    // First load: the server's table (its sort controls are links), no table code run yet.
    expect(await table.getByRole("link", { name: /^Revision/ }).count()).toBe(1);
    expect(await table.getByRole("button").count()).toBe(0);
    // Tabbing into the filter swaps in the browser's table and keeps the keyboard there.
    await page.getByLabel("Filter revisions by note, author or status").focus();
    await table.getByRole("button", { name: /^Revision/ }).waitFor();
    await expect.poll(() => page.evaluate(() => document.activeElement?.id)).toBe("r_-filter");
    await table.getByRole("button", { name: /^Revision/ }).click();
    await page.waitForURL(/r_sort=number&r_dir=asc/);
    await expect.poll(() => table.getByRole("columnheader", { name: /^Revision/ }).getAttribute("aria-sort")).toBe("ascending");
  });
});
