/**
 * The designer's day in the browser: sign in, create a project on the demo criteria card, build the
 * 12-module two-post design, watch the footing update when the wind speed changes, save two
 * revisions, meet a stale save, and read the diff. Screenshots at desktop and phone widths.
 */
import type { Browser, Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { DESKTOP, PHONE, baseUrl, launch, shot, signedInContext } from "../support/browser";

let browser: Browser;
beforeAll(async () => {
  browser = await launch();
});
afterAll(async () => {
  await browser?.close();
});

const spec = (page: Page) => page.getByTestId("footing-spec").textContent();
async function settled(page: Page) {
  await page.getByRole("status").filter({ hasText: /Up to date with your inputs/ }).waitFor({ timeout: 20_000 });
}

describe("design editor", () => {
  it("creates a project and a two-post design, updates results live and saves two revisions", async () => {
    const page = await browser.newPage({ viewport: DESKTOP });
    await page.goto(`${baseUrl()}/login`);
    await page.getByLabel("E-mail").fill("designer@demo.pierwise.test");
    await page.getByLabel("Password").fill("pierwise-demo");
    await page.getByRole("button", { name: "Sign in" }).click();
    await page.waitForURL(/\/projects/);

    await page.getByRole("link", { name: "New project" }).click();
    const name = `Browser test site ${Date.now()}`;
    await page.getByLabel("Project name").fill(name);
    await page.getByLabel("Design criteria card").selectOption({ label: "Juniper Flats County (demo), CO" });
    await page.getByRole("button", { name: "Create project" }).click();
    await page.getByRole("heading", { level: 1, name }).waitFor();

    await page.getByLabel("New design name").fill("12-module array on two posts");
    await page.getByRole("button", { name: "Create design" }).click();
    await page.getByRole("heading", { level: 1, name: "12-module array on two posts" }).waitFor({ timeout: 20_000 });
    // The design starts from the card (db/seeds/02_demo_projects.ts: 115 mph, invented county).
    expect(await page.getByLabel("Basic wind speed").inputValue()).toBe("115");
    expect(Number(await page.getByLabel("Rows").inputValue()) * Number(await page.getByLabel("Columns").inputValue())).toBe(12);

    await page.getByLabel("Number of posts").fill("2");
    await page.getByLabel("Pipe size").selectOption("5");
    await page.getByLabel("Hole diameter", { exact: true }).fill("30");
    await page.getByTestId("footing-spec").filter({ hasText: "30 in diameter" }).waitFor({ timeout: 20_000 });
    await settled(page);
    const before = await spec(page);

    await page.getByLabel("Basic wind speed").fill("150");
    // The footing spec changes on screen without a save (live results).
    await expect.poll(() => spec(page), { timeout: 20_000 }).not.toBe(before);
    await settled(page);
    const after = await spec(page);
    // More wind never gives a shallower footing (tests/engine/properties.test.ts).
    const depth = (s: string | null) => Number(/× ([\d.,]+) in deep/.exec(s ?? "")?.[1].replace(/,/g, ""));
    expect(depth(after)).toBeGreaterThanOrEqual(depth(before));
    await shot(page, "editor-desktop");

    await page.getByLabel("What changed").fill("Two 5 in posts, 30 in holes, 150 mph");
    await page.getByRole("button", { name: "Save revision" }).click();
    await page.getByText("Saved as revision 2.").waitFor();

    await page.getByLabel("Lowest edge clearance").fill("30");
    await page.waitForTimeout(400); // past the 300 ms debounce
    await settled(page);
    await page.getByLabel("What changed").fill("30 in clearance for snow");
    await page.getByRole("button", { name: "Save revision" }).click();
    await page.getByText("Saved as revision 3.").waitFor();

    // A field error shows beside the field and pauses results; saving is refused without losing what was typed.
    await page.getByLabel("Basic wind speed").fill("400");
    await page.getByText("Wind speed must be between 85 and 200 mph").first().waitFor();
    await shot(page, "editor-field-error");
    await page.getByRole("button", { name: "Save revision" }).click();
    await page.getByText("Not saved: fix the fields marked in red first.").waitFor();
    expect(await page.getByLabel("Basic wind speed").inputValue()).toBe("400");
    await page.getByLabel("Basic wind speed").fill("150");

    // Someone else saves meanwhile: the save is refused with a reload offer, and the form keeps its values.
    const url = new URL(page.url());
    const designId = url.pathname.split("/").pop()!;
    const current = await (await page.request.get(`${baseUrl()}/api/designs/${designId}`)).json();
    const other = await page.request.post(`${baseUrl()}/api/designs/${designId}/revisions`, { data: { baseRevisionId: current.latestRevision.id, input: current.latestRevision.input, note: "saved from elsewhere" } });
    expect(other.status()).toBe(201);
    await page.getByLabel("Lowest edge clearance").fill("32");
    await page.getByRole("button", { name: "Save revision" }).click();
    await page.getByRole("alert").filter({ hasText: /revision 4 since you opened it/ }).waitFor();
    expect(await page.getByLabel("Lowest edge clearance").inputValue()).toBe("32");
    await page.getByRole("button", { name: /Reload the latest/ }).isVisible();
    await shot(page, "editor-conflict");

    // The diff names what changed between revisions 2 and 3.
    const revs = (await (await page.request.get(`${baseUrl()}/api/designs/${designId}?sort=number&dir=asc`)).json()).revisions.rows;
    await page.goto(`${baseUrl()}${url.pathname}/diff?from=${revs[1].id}&to=${revs[2].id}`);
    await page.getByRole("heading", { name: "Revision 2 → revision 3" }).waitFor();
    const lowest = page.getByRole("row", { name: /Lowest edge clearance/ });
    expect(await lowest.textContent()).toMatch(/24 in.*30 in/);
    await shot(page, "diff-desktop");
    await page.close();
  });

  for (const [label, viewport] of [["desktop", DESKTOP], ["phone", PHONE]] as const) {
    it(`shows the demo project, its designs and the editor with the caution in view (${label})`, async () => {
      const context = await signedInContext(browser, "designer@demo.pierwise.test", viewport);
      const page = await context.newPage();
      // Earlier suites add many projects to the demo organisation: find the demo one by name.
      await page.goto("/projects?q=Larkspur");
      await page.getByRole("link", { name: "Larkspur Meadow residence (demo)" }).click();
      await page.getByRole("heading", { name: /Design criteria: Juniper Flats County/ }).waitFor();
      expect(await page.getByRole("table", { name: "Designs" }).textContent()).toMatch(/12-module array on two posts.*Draft/s);
      await shot(page, `project-${label}`);
      await page.getByRole("link", { name: "12-module array on two posts" }).click();
      await page.getByTestId("footing-spec").waitFor();
      await page.getByRole("note", { name: "Preliminary sizing caution" }).first().waitFor();
      expect(await page.getByRole("table", { name: "Revisions" }).textContent()).toMatch(/Rev 3 \(latest\)/);
      await page.waitForTimeout(1500); // let the 3D preview draw before the picture
      await shot(page, `editor-${label}-demo`);
      await page.goto("/projects");
      await shot(page, `projects-${label}`);
      await page.goto("/criteria");
      await shot(page, `criteria-${label}`);
      await context.close();
    });
  }

  it("lets an installer read a design but not edit it", async () => {
    const context = await signedInContext(browser, "installer@demo.pierwise.test");
    const page = await context.newPage();
    // Earlier suites add many projects to the demo organisation: find the demo one by name.
    await page.goto("/projects?q=Larkspur");
    await page.getByRole("link", { name: "Larkspur Meadow residence (demo)" }).click();
    await page.getByRole("link", { name: "12-module array on two posts" }).click();
    await page.getByTestId("footing-spec").waitFor();
    expect(await page.getByLabel("Basic wind speed").isDisabled()).toBe(true);
    expect(await page.getByRole("button", { name: "Save revision" }).count()).toBe(0);
    await context.close();
  });
});
