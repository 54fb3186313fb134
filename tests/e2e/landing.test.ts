import type { Browser } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { DESKTOP, PHONE, baseUrl, launch, shot } from "../support/browser";

let browser: Browser;
beforeAll(async () => {
  browser = await launch();
});
afterAll(async () => {
  await browser?.close();
});

describe("signed-out landing and sign-in", () => {
  for (const [label, viewport] of [["desktop", DESKTOP], ["phone", PHONE]] as const) {
    it(`says what Pierwise does and the caution (${label})`, async () => {
      const page = await browser.newPage({ viewport });
      await page.goto(baseUrl());
      await expect(page.getByRole("heading", { level: 1 }).textContent()).resolves.toMatch(/footings/i);
      await expect(page.getByRole("note", { name: "Preliminary sizing caution" }).textContent()).resolves.toMatch(/licensed professional engineer/);
      await shot(page, `landing-${label}`);
      await page.close();
    });
  }

  it("signs in through the form and lands on projects; a wrong password is explained", async () => {
    const page = await browser.newPage({ viewport: DESKTOP });
    await page.goto(`${baseUrl()}/login`);
    await page.getByLabel("E-mail").fill("designer@demo.pierwise.test");
    await page.getByLabel("Password").fill("definitely-wrong");
    await page.getByRole("button", { name: "Sign in" }).click();
    await page.getByText("do not match an active account").waitFor();
    await shot(page, "login-error");
    await page.getByLabel("Password").fill("pierwise-demo");
    await page.getByRole("button", { name: "Sign in" }).click();
    await page.waitForURL(/\/projects/, { timeout: 10_000 }).catch(async (e) => {
      await shot(page, "login-stuck");
      throw e;
    });
    expect(await page.getByRole("heading", { level: 1 }).textContent()).toMatch(/Projects/);
    await page.close();
  });
});
