/**
 * Finding 6 of the hardening issue, in the browser: every main page is served with a nonce-based
 * content-security policy (no 'unsafe-inline' for scripts), frame-ancestors 'none', nosniff and a
 * referrer policy, and runs under it without a single violation: the app hydrates, the 3D preview
 * draws, and the report PDF downloads.
 */
import type { Browser, Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { db } from "@/db/client";
import { DEMO_PROJECT_ID } from "@/db/seeds/02_demo_projects";
import { baseUrl, launch, signedInContext } from "../support/browser";
import { DESIGNER, ENGINEER, INSTALLER, ADMIN, freshApproved } from "../support/review-fixtures";

let browser: Browser;
beforeAll(async () => {
  browser = await launch();
});
afterAll(async () => {
  await browser?.close();
  await db.destroy();
});

/** A page that records every CSP violation (the DOM event, CSP Level 3 §5.3) and console report. */
async function watched(page: Page): Promise<string[]> {
  const violations: string[] = [];
  await page.exposeFunction("__cspViolation", (v: string) => violations.push(v));
  await page.addInitScript(() => {
    document.addEventListener("securitypolicyviolation", (e) => {
      (window as unknown as { __cspViolation: (v: string) => void }).__cspViolation(`${e.violatedDirective} ${e.blockedURI} at ${location.pathname}`);
    });
  });
  page.on("console", (m) => {
    if (/Content Security Policy/i.test(m.text())) violations.push(`console: ${m.text()}`);
  });
  page.on("pageerror", (e) => violations.push(`page error: ${e.message}`));
  return violations;
}

async function visit(page: Page, path: string): Promise<void> {
  const response = await page.goto(path);
  expect(response, path).not.toBeNull();
  const headers = response!.headers();
  const csp = headers["content-security-policy"] ?? "";
  const scriptSrc = csp.split(";").find((d) => d.trim().startsWith("script-src")) ?? "";
  expect(scriptSrc, `${path} script-src`).toMatch(/'nonce-[A-Za-z0-9+/=]+'/);
  expect(scriptSrc, `${path} script-src`).not.toContain("'unsafe-inline'");
  expect(csp, path).toContain("frame-ancestors 'none'");
  expect(headers["x-content-type-options"], path).toBe("nosniff");
  expect(headers["referrer-policy"], path).toBeTruthy();
  expect(headers["permissions-policy"], path).toBeTruthy();
  await page.getByRole("heading", { level: 1 }).first().waitFor();
  // Hydration finished: the page's client code ran (it would not if its scripts were blocked).
  await page.waitForFunction(() => document.readyState === "complete");
}

describe("content-security policy on every main page", () => {
  it("signed out: landing, sign-in, sign-up and reset pages", async () => {
    const context = await browser.newContext({ baseURL: baseUrl() });
    const page = await context.newPage();
    const violations = await watched(page);
    for (const path of ["/", "/login", "/signup", "/reset", "/reset/not-a-real-token"]) await visit(page, path);
    // A token page never sends its address onward.
    expect((await page.goto("/reset/not-a-real-token"))!.headers()["referrer-policy"]).toBe("no-referrer");
    // The sign-in form works under the policy (its client script submits the server action).
    await page.goto("/login");
    await page.getByLabel("E-mail").fill(DESIGNER);
    await page.getByLabel("Password").fill("pierwise-demo");
    await page.getByRole("button", { name: /sign in/i }).click();
    await page.waitForURL(/\/projects/);
    expect(violations).toEqual([]);
    await context.close();
  });

  it("signed in: projects, the design editor with its 3D preview, reviews, field spec, criteria, account and admin", async () => {
    const approved = await freshApproved();
    const design = await db("designs").where({ project_id: DEMO_PROJECT_ID }).first("id");
    const byRole: [string, string[]][] = [
      [DESIGNER, ["/projects", `/projects/${DEMO_PROJECT_ID}`, `/projects/${DEMO_PROJECT_ID}/edit`, "/projects/new", `/projects/${DEMO_PROJECT_ID}/designs/${design.id}`, "/criteria", "/account"]],
      [ENGINEER, ["/reviews", `/reviews/${approved.revisionId}`]],
      [INSTALLER, ["/field", `/field/${approved.revisionId}`]],
      [ADMIN, ["/admin/members", "/admin/audit"]],
    ];
    for (const [email, paths] of byRole) {
      const context = await signedInContext(browser, email);
      const page = await context.newPage();
      const violations = await watched(page);
      for (const path of paths) {
        await visit(page, path);
        if (path.includes("/designs/")) {
          // The preview's canvas (WebGL through software rendering) appears: three.js runs under the policy.
          await page.getByTestId("design-preview").waitFor({ timeout: 30_000 });
          await page.locator("[data-testid=design-preview] canvas").first().waitFor({ timeout: 30_000 });
          await page.waitForTimeout(1500); // let the scene load its font and draw its labels
        }
      }
      if (email === INSTALLER) {
        // The report PDF downloads under the policy.
        const download = page.waitForEvent("download");
        await page.evaluate((href) => {
          const a = document.createElement("a");
          a.href = href;
          document.body.append(a);
          a.click();
        }, `/api/revisions/${approved.revisionId}/report.pdf`);
        expect((await download).suggestedFilename()).toMatch(/\.pdf$/);
      }
      expect(violations, email).toEqual([]);
      await context.close();
    }
  });

  it("API answers carry nosniff and refuse framing too", async () => {
    const response = await fetch(`${baseUrl()}/api/health`);
    expect(response.headers.get("x-content-type-options")).toBe("nosniff");
    expect(response.headers.get("x-frame-options")).toBe("DENY");
  });
});
