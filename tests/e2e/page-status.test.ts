/**
 * Finding 11 of the hardening issue: a page that is not there, or not the visitor's, answers with its
 * real HTTP status (RFC 9110 §15.5.5 404 Not Found, §15.5.4 403 Forbidden), not 200 with a "not
 * found" text. The workspace has no loading boundary, so a page is rendered whole before anything is
 * sent: its own access check decides the status, and the page works without JavaScript.
 */
import crypto from "node:crypto";
import type { Browser, BrowserContext } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { db } from "@/db/client";
import { DEMO_CARD_ID, DEMO_PROJECT_ID, OTHER_PROJECT_ID } from "@/db/seeds/02_demo_projects";
import { baseUrl, launch, signedInContext } from "../support/browser";
import { DESIGNER, INSTALLER, OUTSIDER, freshApproved } from "../support/review-fixtures";

let browser: Browser;
const contexts: BrowserContext[] = [];
beforeAll(async () => {
  browser = await launch({ webgl: false });
});
afterAll(async () => {
  for (const c of contexts) await c.close();
  await browser?.close();
  await db.destroy();
});

async function statusOf(email: string | null, path: string): Promise<{ status: number; text: string; url: string }> {
  const context = email ? await signedInContext(browser, email) : await browser.newContext({ baseURL: baseUrl() });
  contexts.push(context);
  const page = await context.newPage();
  const response = await page.goto(path);
  // A 404/403 page's body is sometimes empty for a moment right after "load" (the client renders it
  // again); read it once it has text.
  await page.waitForFunction(() => document.body.innerText.trim().length > 0);
  const text = await page.locator("body").innerText();
  return { status: response!.status(), text, url: page.url() };
}

describe("page-level status codes", () => {
  it("answers 404 for a project, design or revision that does not exist or is another organisation's", async () => {
    const missing = crypto.randomUUID();
    for (const path of [`/projects/${missing}`, `/projects/${OTHER_PROJECT_ID}`, `/projects/${DEMO_PROJECT_ID}/designs/${missing}`, `/reviews/${missing}`, `/projects/not-an-id`]) {
      const page = await statusOf(DESIGNER, path);
      expect(page.status, path).toBe(404);
      expect(page.text, path).toContain("Nothing here");
    }
    // The other organisation's own designer reaches it: the 404 above is about access, not the route.
    expect((await statusOf(OUTSIDER, `/projects/${OTHER_PROJECT_ID}`)).status).toBe(200);
    expect((await statusOf(DESIGNER, `/projects/${DEMO_PROJECT_ID}`)).status).toBe(200);
  });

  it("answers 403 for a page the member's role does not allow", async () => {
    const { revisionId } = await freshApproved();
    for (const [email, path] of [[DESIGNER, "/admin/members"], [DESIGNER, "/admin/audit"], [INSTALLER, "/projects/new"], [INSTALLER, `/criteria/${DEMO_CARD_ID}`]] as const) {
      const page = await statusOf(email, path);
      expect(page.status, `${email} ${path}`).toBe(403);
      expect(page.text, path).toContain("Your role does not allow this page");
    }
    // The installer's own page of that revision is fine.
    expect((await statusOf(INSTALLER, `/field/${revisionId}`)).status).toBe(200);
  });

  it("sends a signed-out visitor to sign in with a redirect, coming back after", async () => {
    const page = await statusOf(null, `/projects/${DEMO_PROJECT_ID}`);
    expect(new URL(page.url).pathname).toBe("/login");
    expect(new URL(page.url).searchParams.get("next")).toBe(`/projects/${DEMO_PROJECT_ID}`);
  });
});

describe("pages without JavaScript", () => {
  it("shows a signed-in page whole and keeps a refused form's values, with the error beside the field", async () => {
    const context = await browser.newContext({ baseURL: baseUrl(), javaScriptEnabled: false });
    contexts.push(context);
    expect((await context.request.post("/api/session", { data: { email: DESIGNER, password: "pierwise-demo" } })).ok()).toBe(true);
    const page = await context.newPage();
    await page.goto("/projects/new");
    // A loading boundary would leave only its placeholder visible here: the page stays hidden until a script reveals it.
    expect(await page.getByRole("heading", { level: 1 }).isVisible()).toBe(true);
    const name = `No-script site ${crypto.randomUUID().slice(0, 6)}`;
    await page.getByLabel("Project name").fill(name);
    await page.getByLabel("State").selectOption("WY");
    await page.getByLabel("Longitude").fill("-500");
    await page.getByRole("button", { name: /create/i }).click();
    await page.waitForLoadState("load");
    expect(await page.locator("#field-longitude-error").isVisible()).toBe(true);
    expect(await page.getByLabel("Project name").inputValue()).toBe(name);
    expect(await page.getByLabel("State").inputValue()).toBe("WY");
    expect(await db("projects").where({ name }).first()).toBeUndefined();
  });
});
