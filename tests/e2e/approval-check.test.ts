/**
 * A failing design decided in a browser: the review page opens with the footing and every failing
 * check (desktop and phone); the engineer approves only with a reason per failing check and their
 * password; the installer's field spec shows the reasons; the inspector's phone opens the public
 * approval check without signing in. Screenshots to /tmp/shots with SCREENSHOTS=1 (the review
 * page's top as the viewport shows it, the verify page on a phone).
 */
import fs from "node:fs";
import type { Page } from "playwright-core";
import { describe, expect, it } from "vitest";
import { sizeDesign, twoPostDesignInput, type DesignInputDraft } from "@/engine";
import { db } from "@/db/client";
import { browserSuite } from "../support/browser-suite";
import { DESKTOP, PHONE, baseUrl, signedInContext } from "../support/browser";
import { DESIGNER, ENGINEER, INSTALLER, makeDesign } from "../support/review-fixtures";

const suite = browserSuite();

async function as(email: string | null, viewport = DESKTOP): Promise<Page> {
  const context = email ? await signedInContext(suite.browser, email, viewport) : await suite.browser.newContext({ viewport, baseURL: baseUrl() });
  suite.keep(context);
  const page = await context.newPage();
  page.on("pageerror", (e) => console.error(`[${email}] page error: ${e.message}`));
  return page;
}
/** What the screen shows without scrolling: the point of "at the top". */
async function top(page: Page, name: string) {
  if (process.env.SCREENSHOTS !== "1") return;
  const dir = process.env.SCREENSHOTS_DIR || "/tmp/shots";
  fs.mkdirSync(dir, { recursive: true });
  await page.screenshot({ path: `${dir}/${name}.png` });
}

// A 24 in hole: shallower than frost and too short laterally, so checks fail (IBC §1809.5; IBC §1807.3.2.1 Eq. 18-1).
const SHALLOW: DesignInputDraft = { ...twoPostDesignInput, posts: { ...twoPostDesignInput.posts, fixedDepthIn: 24 } };

describe("approval check", () => {
  it("shows failing checks first, approves them only with reasons and a password, and lets anyone verify the approval", async () => {
    const failing = sizeDesign(SHALLOW).footing.checks.filter((c) => !c.pass);
    expect(failing.length).toBeGreaterThan(0);
    const { revisionId } = await makeDesign({ input: SHALLOW, projectName: "Failing checks ranch (demo)", name: "Shallow holes" });
    const designer = await as(DESIGNER);
    await designer.goto(`${baseUrl()}/reviews/${revisionId}`);
    await designer.getByText("You can still submit it to ask for the engineer's judgement").waitFor();
    await designer.getByRole("button", { name: "Submit for review" }).click();
    await designer.getByText("Submitted for review: the engineer has been e-mailed.").waitFor();

    const engineer = await as(ENGINEER);
    for (const [label, viewport] of [["desktop", DESKTOP], ["phone", PHONE]] as const) {
      await engineer.setViewportSize(viewport);
      await engineer.goto(`${baseUrl()}/reviews/${revisionId}`);
      const summary = engineer.getByRole("region", { name: "Footing and checks" });
      await summary.waitFor();
      expect(await summary.isVisible()).toBe(true); // in view without scrolling
      for (const c of failing) expect(await summary.textContent()).toContain(c.title);
      await top(engineer, `review-top-failing-${label}`);
    }
    await engineer.setViewportSize(DESKTOP);
    await engineer.getByLabel("Approve for construction").check();
    await engineer.getByLabel("Your password, to sign the approval").fill("pierwise-demo");
    await engineer.getByRole("button", { name: "Sign and approve" }).click();
    await engineer.getByText("Give the reason you accept this check (10 to 2,000 characters)").first().waitFor();
    for (let i = 0; i < failing.length; i++) await engineer.locator(`#override-${i}`).fill(`Accepted after a site visit: rock at 20 in (check ${i + 1}).`);
    await engineer.getByLabel("Your password, to sign the approval").fill("pierwise-demo");
    await engineer.getByRole("button", { name: "Sign and approve" }).click();
    await engineer.getByText("Approved: the revision is pinned and the designer has been e-mailed.").waitFor();

    const installer = await as(INSTALLER, PHONE);
    await installer.goto(`${baseUrl()}/field/${revisionId}`);
    await installer.getByText("Accepted after a site visit: rock at 20 in (check 1).").waitFor();
    const link = await installer.getByRole("link", { name: /\/verify\// }).getAttribute("href");
    expect(link).toMatch(/\/verify\/[A-Za-z0-9_-]{22}$/);

    const inspector = await as(null, PHONE);
    await inspector.goto(link!);
    await inspector.getByRole("heading", { name: "Approved and current" }).waitFor();
    expect(await inspector.getByText("PE-000000-DEMO, CO").isVisible()).toBe(true); // demo licence (invented)
    await top(inspector, "verify-phone");
    await inspector.goto(`${baseUrl()}/verify/not-a-real-code-at-all`);
    await inspector.getByRole("heading", { name: "No such approval" }).waitFor();
    await top(inspector, "verify-unknown-phone");
  });
});
