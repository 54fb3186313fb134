/**
 * The criteria card form in metric (the `pierwise-units` cookie), at 390 px: labels and hints in
 * m/s, kPa and mm; what was typed stays after a validation error; the card stores mph, psf and in.
 * With JavaScript and without (the form posts to its server action either way).
 */
import type { Browser } from "playwright-core";
import { describe, expect, it } from "vitest";
import { db } from "@/db/client";
import { browserSuite } from "../support/browser-suite";
import { PHONE, baseUrl, shot } from "../support/browser";
import { DESIGNER } from "../support/review-fixtures";

const suite = browserSuite();

async function metricPhone(browser: Browser, javaScriptEnabled: boolean) {
  const context = suite.keep(await browser.newContext({ viewport: PHONE, baseURL: baseUrl(), javaScriptEnabled }));
  const res = await context.request.post("/api/session", { data: { email: DESIGNER, password: "pierwise-demo" } });
  expect(res.ok()).toBe(true);
  await context.addCookies([{ name: "pierwise-units", value: "metric", url: baseUrl() }]);
  return context.newPage();
}

describe("criteria card form in metric", () => {
  for (const js of [true, false]) {
    it(`shows and takes m/s, kPa and mm, keeps typed values after an error, stores mph/psf/in (${js ? "with" : "without"} JavaScript)`, async () => {
      const page = await metricPhone(suite.browser, js);
      await page.goto("/criteria");
      const row = (label: string) => page.locator("tr", { has: page.getByLabel(label, { exact: true }) });
      expect(await row("Design wind speed").locator("th").innerText()).toContain("(m/s)");
      expect(await row("Ground snow load").locator("th").innerText()).toContain("(kPa)");
      expect(await row("Frost depth").locator("th").innerText()).toContain("(mm)");
      // 85–200 mph × 0.44704 m/s per mph (exact, NIST SP 811) = 38–89.4 m/s.
      expect(await page.getByLabel("Design wind speed", { exact: true }).getAttribute("placeholder")).toBe("38–89.4");

      const jurisdiction = `Metric test county ${js ? "js" : "nojs"} (invented)`;
      await page.getByLabel("Jurisdiction", { exact: true }).fill(jurisdiction);
      await page.getByLabel("Building code in force", { exact: true }).fill("X"); // too short: a validation error
      await page.getByLabel("Design wind speed", { exact: true }).fill("100"); // 223.7 mph: over the 200 mph limit
      await page.getByLabel("Ground snow load", { exact: true }).fill("1.5");
      await page.getByLabel("Frost depth", { exact: true }).fill("900");
      for (const label of ["Building code in force", "ASCE 7 edition", "Risk category", "Design wind speed", "Exposure category", "Ground snow load", "Frost depth", "Presumed soil class"]) {
        await page.getByLabel(`${label}: source`).fill("County criteria sheet (invented)");
      }
      await page.getByRole("button", { name: "Add card" }).click();
      await expect.poll(() => page.getByText(/Building code is required/).count()).toBeGreaterThan(0);
      // The range reads in the units typed: 85–200 mph (engine/schema.ts) = 38–89.4 m/s.
      expect(await page.getByText(/between 38 and 89\.4 m\/s/).count()).toBeGreaterThan(0);
      expect(await page.getByText(/\bmph\b/).count()).toBe(0);
      expect(await page.getByLabel("Design wind speed", { exact: true }).inputValue()).toBe("100");
      expect(await page.getByLabel("Ground snow load", { exact: true }).inputValue()).toBe("1.5");
      expect(await page.getByLabel("Frost depth", { exact: true }).inputValue()).toBe("900");
      expect(await page.getByLabel("Jurisdiction", { exact: true }).inputValue()).toBe(jurisdiction);
      await shot(page, `criteria-card-metric-error-${js ? "js" : "nojs"}-390`);
      // No sideways scroll at 390 px, of the page or inside the form: every criterion's name and
      // every input lie within the screen, so a phone shows which row an input belongs to.
      expect(await page.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(PHONE.width);
      const outside = await page.evaluate((width) => {
        const form = document.querySelector("form:has(#cc-windSpeedMph)") ?? document.body;
        return [...form.querySelectorAll("th[scope=row], input:not([type=hidden]), select")]
          .map((el) => ({ el, box: el.getBoundingClientRect() }))
          .filter(({ box }) => box.width > 0 && (box.left < 0 || box.right > width))
          .map(({ el }) => (el as HTMLElement).getAttribute("aria-label") ?? el.id ?? el.textContent);
      }, PHONE.width);
      expect(outside).toEqual([]);

      await page.getByLabel("Building code in force", { exact: true }).fill("IBC 2021");
      await page.getByLabel("Design wind speed", { exact: true }).fill("40");
      await page.getByRole("button", { name: "Add card" }).click();
      // Already on /criteria, so wait for the saved card rather than for the address.
      await expect.poll(() => db("criteria_cards").where({ jurisdiction }).first("id"), { timeout: 15_000 }).toBeTruthy();
      await page.waitForURL(/\/criteria$/);
      const card = await db("criteria_cards").where({ jurisdiction }).first("id", "values");
      expect(card, "the card is saved").toBeTruthy();
      const values = card.values as Record<string, number>;
      expect(values.windSpeedMph).toBeCloseTo(40 / 0.44704, 6); // m/s → mph, 0.44704 exact (NIST SP 811)
      expect(values.groundSnowPsf).toBeCloseTo(1500 / 47.880259, 4); // 1 psf = 47.880259 Pa (NIST SP 811)
      expect(values.frostDepthIn).toBeCloseTo(900 / 25.4, 6); // 25.4 mm per in, exact (NIST SP 811)

      // Editing: the stored values read back in metric as typed, and saving unchanged keeps them exactly.
      await page.goto(`/criteria/${card.id}`);
      expect(await page.getByLabel("Design wind speed", { exact: true }).inputValue()).toBe("40");
      expect(await page.getByLabel("Ground snow load", { exact: true }).inputValue()).toBe("1.5");
      expect(await page.getByLabel("Frost depth", { exact: true }).inputValue()).toBe("900");
      await shot(page, `criteria-card-metric-edit-${js ? "js" : "nojs"}-390`);
      await page.getByRole("button", { name: "Save card" }).click();
      await page.waitForURL(/\/criteria$/);
      expect((await db("criteria_cards").where({ id: card.id }).first("values")).values).toEqual(values);
    });
  }
});
