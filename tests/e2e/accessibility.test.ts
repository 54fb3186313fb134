/**
 * Accessibility scan: axe-core (WCAG 2.x A/AA rules plus axe's best-practice landmark rules) on every
 * main page per role, at desktop (1280 px) and phone (390 px) widths. Any "critical" or "serious"
 * violation fails the test, listing rule, target and page. Also checks that "Skip to content" is
 * the first tab stop and that the editor's units switch is one tab stop moved by arrow keys
 * (WAI-ARIA Authoring Practices 1.2, Radio Group pattern, roving tabindex).
 */
import fs from "node:fs";
import path from "node:path";
import type { BrowserContext, Page } from "playwright-core";
import { describe, expect, it } from "vitest";
import { db } from "@/db/client";
import { browserSuite } from "../support/browser-suite";
import { DESKTOP, PHONE, baseUrl, shot } from "../support/browser";
import { ADMIN, DESIGNER, ENGINEER, INSTALLER, freshApproved, freshInReview, makeDesign } from "../support/review-fixtures";

const AXE_SOURCE = fs.readFileSync(path.join(process.cwd(), "node_modules/axe-core/axe.min.js"), "utf8");

const suite = browserSuite();

/** A context (signed in through the real sign-in API when an e-mail is given). bypassCSP lets axe's script in past the nonce policy. */
async function contextFor(email: string | null): Promise<BrowserContext> {
  const context = await suite.browser.newContext({ viewport: DESKTOP, baseURL: baseUrl(), bypassCSP: true });
  suite.keep(context);
  if (email) {
    const response = await context.request.post("/api/session", { data: { email, password: "pierwise-demo" } });
    if (!response.ok()) throw new Error(`sign-in as ${email} failed: ${response.status()}`);
  }
  return context;
}

type Finding = { id: string; impact: string; help: string; targets: string[] };

async function scan(page: Page): Promise<Finding[]> {
  if (!(await page.evaluate(() => "axe" in window))) await page.addScriptTag({ content: AXE_SOURCE });
  return page.evaluate(async () => {
    // @ts-expect-error axe is injected above
    const result = await window.axe.run(document, { resultTypes: ["violations"] });
    return result.violations
      .filter((v: { impact: string }) => v.impact === "critical" || v.impact === "serious")
      .map((v: { id: string; impact: string; help: string; nodes: { target: string[] }[] }) => ({
        id: v.id, impact: v.impact, help: v.help, targets: v.nodes.slice(0, 5).map((n) => n.target.join(" ")),
      }));
  });
}

/** Opens the page at both widths, scans it, and returns readable failure lines. */
async function scanBoth(page: Page, url: string, name: string): Promise<string[]> {
  const lines: string[] = [];
  for (const [label, viewport] of [["desktop", DESKTOP], ["phone", PHONE]] as const) {
    await page.setViewportSize(viewport);
    const response = await page.goto(url);
    expect(response?.status(), `${url} status`).toBeLessThan(400);
    await page.getByRole("heading", { level: 1 }).first().waitFor();
    await page.waitForLoadState("networkidle").catch(() => undefined);
    await shot(page, `a11y-${name}-${label}`);
    for (const f of await scan(page)) lines.push(`${name} (${label}, ${url}): ${f.impact} ${f.id} — ${f.help} — ${f.targets.join(" | ")}`);
  }
  return lines;
}

describe("accessibility (axe)", () => {
  it("finds no critical or serious violation on any main page, per role, at 1280 and 390 px", async () => {
    const design = await makeDesign({ projectName: "Axe scan ranch (demo)" });
    const inReview = await freshInReview();
    const approved = await freshApproved();
    const failures: string[] = [];

    const pages: [string | null, string, string][] = [
      [null, "/", "landing"],
      [null, "/login", "sign-in"],
      [null, "/signup", "sign-up"],
      [DESIGNER, "/projects", "projects"],
      [DESIGNER, `/projects/${design.projectId}`, "project"],
      [DESIGNER, `/projects/${design.projectId}/designs/${design.designId}`, "design-editor"],
      [DESIGNER, "/criteria", "criteria"],
      [ENGINEER, "/reviews", "review-queue"],
      [ENGINEER, `/reviews/${inReview.revisionId}`, "review"],
      [INSTALLER, "/field", "field-list"],
      [INSTALLER, `/field/${approved.revisionId}`, "field-spec"],
      [ADMIN, "/admin/members", "members"],
      [ADMIN, "/admin/audit", "audit-log"],
    ];
    const byRole = new Map<string | null, Page>();
    for (const [email, url, name] of pages) {
      if (!byRole.has(email)) {
        const page = await (await contextFor(email)).newPage();
        page.on("pageerror", (e) => console.error(`[${email ?? "signed out"}] page error: ${e.message}`));
        byRole.set(email, page);
      }
      failures.push(...(await scanBoth(byRole.get(email)!, `${baseUrl()}${url}`, name)));
    }
    expect(failures, `axe found critical/serious violations:\n${failures.join("\n")}`).toEqual([]);
  }, 900_000);

  it("makes 'Skip to content' the first tab stop, and it lands on the main landmark", async () => {
    const page = await (await contextFor(DESIGNER)).newPage();
    await page.goto(`${baseUrl()}/projects`);
    await page.keyboard.press("Tab");
    const first = await page.evaluate(() => ({ text: document.activeElement?.textContent?.trim(), href: document.activeElement?.getAttribute("href") }));
    expect(first).toEqual({ text: "Skip to content", href: "#content" });
    expect(await page.locator("main#content").count()).toBe(1);
  });

  it("gives the editor's units switch one tab stop, moved and chosen by the arrow keys", async () => {
    const design = await makeDesign({ projectName: "Axe units ranch (demo)" });
    const page = await (await contextFor(DESIGNER)).newPage();
    await page.goto(`${baseUrl()}/projects/${design.projectId}/designs/${design.designId}`);
    const group = page.getByRole("radiogroup", { name: /units/i });
    await group.waitFor();
    const radios = group.getByRole("radio");
    expect(await radios.count()).toBe(2);
    // Roving tabindex: exactly one radio is in the tab order, the checked one.
    const tabStops = await radios.evaluateAll((els) => els.filter((e) => e.getAttribute("tabindex") !== "-1").length);
    expect(tabStops).toBe(1);
    const checked = group.getByRole("radio", { checked: true });
    const before = await checked.textContent();
    await checked.focus();
    await page.keyboard.press("ArrowRight");
    const after = await group.getByRole("radio", { checked: true }).textContent();
    expect(after).not.toBe(before);
    expect(await page.evaluate(() => document.activeElement?.getAttribute("aria-checked"))).toBe("true");
    await page.keyboard.press("ArrowLeft");
    expect(await group.getByRole("radio", { checked: true }).textContent()).toBe(before);
  });
});
