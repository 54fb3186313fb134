/**
 * Live results in the editor come from the engine in the browser: every keystroke updates the
 * footing with no request to the server, and typing away from the saved wind speed and back shows
 * the saved result again (not the one for the speed typed in between).
 */
import type { Browser, Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { DEMO_PROJECT_ID } from "../../db/seeds/02_demo_projects";
import { launch, shot, signedInContext } from "../support/browser";

let browser: Browser;
beforeAll(async () => {
  browser = await launch();
});
afterAll(async () => {
  await browser?.close();
});

/** What a designer reads after a keystroke: the footing line and its checks. */
const shown = (page: Page) => page.evaluate(() => `${document.querySelector('[data-testid="footing-spec"]')?.textContent}|${document.getElementById("res-checks")?.parentElement?.textContent}`);
const status = (page: Page) => page.getByRole("status").filter({ hasText: /saved revision|Up to date|fixing/ }).textContent();

async function typeWind(page: Page, mph: string) {
  const wind = page.getByLabel("Basic wind speed");
  await wind.click();
  await wind.press("Control+A");
  await page.keyboard.type(mph);
}

describe("live results", () => {
  it("typing 115 → 140 → 115 mph shows the 115 mph result again, computed without the server", async () => {
    const context = await signedInContext(browser, "designer@demo.pierwise.test");
    // A fresh design on the demo card (115 mph, db/seeds/02_demo_projects.ts), so no earlier suite's save changes the start.
    const created = await context.request.post(`/api/projects/${DEMO_PROJECT_ID}/designs`, { data: { name: `Live results ${Date.now()}` } });
    expect(created.status()).toBe(201);
    const { design } = await created.json();
    const page = await context.newPage();
    const calcRequests: string[] = [];
    page.on("request", (r) => {
      if (r.url().includes("/api/calc")) calcRequests.push(r.url());
    });
    await page.goto(`/projects/${DEMO_PROJECT_ID}/designs/${design.id}`);
    await page.getByTestId("footing-spec").waitFor();
    expect(await page.getByLabel("Basic wind speed").inputValue()).toBe("115");
    expect(await status(page)).toMatch(/Showing the saved revision/);
    const at115 = await shown(page);

    await typeWind(page, "140");
    // More wind, more moment at grade: the checks' demands change (ASCE 7-16 §26.10, qz ∝ V²).
    await expect.poll(() => shown(page), { timeout: 10_000 }).not.toBe(at115);
    expect(await status(page)).toMatch(/Up to date with your inputs/);
    const at140 = await shown(page);

    await typeWind(page, "115");
    await expect.poll(() => shown(page), { timeout: 10_000 }).toBe(at115);
    expect(await shown(page)).not.toBe(at140);
    expect(await status(page)).toMatch(/Showing the saved revision/);
    // The browser's result agrees with the one the server saved for these inputs.
    expect(await page.getByText("Saved result differs from the live one").count()).toBe(0);
    await shot(page, "editor-live-back-to-saved");
    expect(calcRequests).toEqual([]);
    await context.close();
  });
});
