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
import { baseUrl, launch, shot, signedInContext } from "../support/browser";
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
  // Read at DOMContentLoaded, without waiting for anything: the words must be in the server HTML
  // (Next's error shell alone has an empty body until scripts run: components/ui/access-refused.tsx).
  const response = await page.goto(path, { waitUntil: "domcontentloaded" });
  const text = await page.evaluate(() => document.body.innerText);
  return { status: response!.status(), text, url: page.url() };
}

/** The words of a refusal in the HTML as sent, and as a browser without JavaScript shows it. */
async function withoutScripts(email: string, path: string): Promise<{ status: number; html: string; shown: string }> {
  const context = await signedInContext(browser, email);
  contexts.push(context);
  const raw = await context.request.get(path, { maxRedirects: 0 });
  const noJs = await browser.newContext({ baseURL: baseUrl(), javaScriptEnabled: false, storageState: await context.storageState() });
  contexts.push(noJs);
  const page = await noJs.newPage();
  await page.goto(path);
  // Less the scripts: the page data (the RSC payload) carries the words too, in a script.
  const html = (await raw.text()).replace(/<script\b[\s\S]*?<\/script>/g, "");
  return { status: raw.status(), html, shown: await page.locator("body").innerText() };
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

describe("a 404 or 403 page's words", () => {
  it("are in the server HTML, shown without JavaScript, and stay once the page's scripts have run", async () => {
    const missing = `/projects/${crypto.randomUUID()}`;
    for (const [email, path, status, words] of [[DESIGNER, missing, 404, "Nothing here"], [DESIGNER, "/admin/members", 403, "Your role does not allow this page"]] as const) {
      const sent = await withoutScripts(email, path);
      expect(sent.status, path).toBe(status);
      expect(sent.html, path).toContain(words);
      expect(sent.shown, path).toContain(words);
      // With scripts: there from the first paint, and once the app has rendered it (styled), once only.
      const context = await signedInContext(browser, email);
      contexts.push(context);
      const page = await context.newPage();
      await page.addInitScript(() => {
        const w = window as unknown as { emptyAfterFirstText?: boolean };
        document.addEventListener("DOMContentLoaded", () => {
          let seen = document.body.innerText.trim().length > 0;
          new MutationObserver(() => {
            const has = document.body.innerText.trim().length > 0;
            if (seen && !has) w.emptyAfterFirstText = true;
            seen = seen || has;
          }).observe(document.body, { childList: true, subtree: true, characterData: true });
        });
      });
      await page.goto(path, { waitUntil: "domcontentloaded" });
      expect(await page.evaluate(() => document.body.innerText), path).toContain(words);
      // The app's own render replaces the plain words with the styled page (the link styled by the app's CSS).
      await page.locator("a.underline").filter({ hasText: status === 404 ? "Go to the start page" : "Back to projects" }).waitFor();
      expect(await page.getByRole("heading", { level: 1, name: words }).count(), path).toBe(1);
      expect(await page.evaluate(() => (window as unknown as { emptyAfterFirstText?: boolean }).emptyAfterFirstText ?? false), path).toBe(false);
      await shot(page, `refusal-${status}`);
    }
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
