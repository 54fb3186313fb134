/**
 * The outside reviewing engineer's journey in a browser: the designer engages an engineer by e-mail
 * from the project page; the engineer signs up from the e-mailed link as their firm (with their
 * licence), accepts, and is submitted a revision; they open it from their queue and request
 * changes; the designer sees the decision; revoking hides the project from the engineer again.
 * Screenshots of the queue at 1280 and 390 px go to /tmp/shots (outside-*) with SCREENSHOTS=1.
 */
import crypto from "node:crypto";
import type { Page } from "playwright-core";
import { describe, expect, it } from "vitest";
import { db } from "@/db/client";
import { browserSuite } from "../support/browser-suite";
import { DESKTOP, PHONE, baseUrl, shot, signedInContext } from "../support/browser";
import { firstLink, mailTo } from "../support/mailbox";
import { DESIGNER, makeDesign } from "../support/review-fixtures";

const suite = browserSuite();

function watch(page: Page, who: string): Page {
  page.on("pageerror", (e) => console.error(`[${who}] page error: ${e.message}`));
  page.on("console", (m) => {
    if (m.type() === "error" && !/404|Not Found/.test(m.text())) console.error(`[${who}] console: ${m.text()}`);
  });
  return page;
}

async function queueShots(page: Page, name: string) {
  for (const [label, viewport] of [["1280", DESKTOP], ["390", PHONE]] as const) {
    await page.setViewportSize(viewport);
    await page.goto(`${baseUrl()}/queue`);
    await page.getByRole("heading", { level: 1, name: "Review queue" }).waitFor();
    await shot(page, `outside-${name}-${label}`);
  }
  await page.setViewportSize(DESKTOP);
}

describe("outside engineer journey", () => {
  it("engage → sign up from the link → accept → review from the queue → designer sees it → revoke hides the project", async () => {
    const card = await db("criteria_cards").where({ state: "CO" }).first("id");
    const projectName = `Juniper ridge ${crypto.randomUUID().slice(0, 4)} (demo)`;
    const { projectId, revisionId } = await makeDesign({ projectName, name: "North field array", criteriaCardId: card?.id ?? null });
    const email = `olive-${crypto.randomUUID().slice(0, 8)}@outside-firm.test`;

    // 1. The designer engages the engineer from the project page.
    const designerContext = await signedInContext(suite.browser, DESIGNER);
    suite.keep(designerContext);
    const designer = watch(await designerContext.newPage(), "designer");
    await designer.goto(`${baseUrl()}/projects/${projectId}`);
    await designer.getByLabel("Engineer's e-mail").fill(email);
    await designer.getByLabel("Message (optional)").fill("North field, frost depth from the county sheet.");
    await designer.getByRole("button", { name: "Engage engineer" }).click();
    await designer.getByText(`Invitation e-mailed to ${email}.`).waitFor();
    await designer.getByText("Invited", { exact: true }).waitFor();

    // 2. The engineer, with no account, signs up from the e-mailed link as their firm, then accepts.
    const link = firstLink(await mailTo(email, { subject: /Review engagement/ }));
    expect(link.startsWith(`${baseUrl()}/engagements/`)).toBe(true);
    const engineerContext = await suite.browser.newContext({ viewport: DESKTOP, baseURL: baseUrl() });
    suite.keep(engineerContext);
    const engineer = watch(await engineerContext.newPage(), "engineer");
    await engineer.goto(link);
    await engineer.getByRole("heading", { level: 1, name: new RegExp(`Review ${projectName.replace(/[()]/g, "\\$&")}`) }).waitFor();
    await engineer.getByLabel(/My engineering firm/).check();
    await engineer.getByLabel("Firm name").fill("Ridge Line Structural (invented)");
    await engineer.getByLabel("Your name").fill("Olive Ridge, P.E.");
    await engineer.getByLabel("Password").fill("outside-firm-password");
    await engineer.getByLabel("Licensing state").selectOption("CO");
    await engineer.getByLabel("Licence number").fill("PE-123456-INVENTED");
    await engineer.getByLabel("Expires on").fill("2031-12-31");
    await engineer.getByRole("button", { name: "Create account" }).click();
    await engineer.waitForURL(/\/queue/);
    await engineer.getByRole("button", { name: `Accept the engagement on ${projectName}` }).click();
    await engineer.getByText("Engagement accepted").waitFor();

    // 3. The designer sees "Accepted" and submits the revision to the outside engineer.
    await mailTo("designer@demo.pierwise.test", { subject: /Olive Ridge, P\.E\. accepted the engagement/ });
    await designer.goto(`${baseUrl()}/projects/${projectId}`);
    await designer.getByText("Accepted", { exact: true }).waitFor();
    await designer.goto(`${baseUrl()}/reviews/${revisionId}`);
    await designer.locator("#engineerId").selectOption({ label: "Olive Ridge, P.E. (outside engineer, Ridge Line Structural (invented))" });
    await designer.getByRole("button", { name: "Submit for review" }).click();
    await designer.getByText("Submitted for review: the engineer has been e-mailed.").waitFor();
    await mailTo(email, { subject: /Review requested/ });

    // 4. The engineer opens it from their queue and requests changes with a pinned comment.
    await queueShots(engineer, "queue-waiting");
    await engineer.goto(`${baseUrl()}/queue`);
    const row = engineer.getByRole("row").filter({ hasText: projectName });
    await row.getByText("Waiting for you").waitFor();
    await row.getByText("for Example Ground-Mount Co. (demo)").waitFor();
    await row.getByRole("link", { name: "North field array, revision 1" }).click();
    await engineer.waitForURL(new RegExp(`/reviews/${revisionId}$`));
    await engineer.getByLabel("Request changes").check();
    await engineer.locator("#comment-0-field").selectOption("site.windSpeedMph");
    await engineer.locator("#comment-0-body").fill("Confirm the wind speed with the county's revised sheet.");
    await engineer.getByRole("button", { name: "Record decision" }).click();
    await engineer.getByText("Changes requested: the designer has been e-mailed.").waitFor();
    await queueShots(engineer, "queue-decided");

    // 5. The designer sees the decision, by e-mail and on the review page.
    const decision = await mailTo("designer@demo.pierwise.test", { subject: /North field array needs changes/ });
    expect(decision.text).toContain("Olive Ridge, P.E. (licence PE-123456-INVENTED, CO)");
    await designer.goto(`${baseUrl()}/reviews/${revisionId}`);
    await designer.getByText("Confirm the wind speed with the county's revised sheet.").first().waitFor();

    // 6. Revoking hides the project from the engineer; the decision stays on record.
    await designer.goto(`${baseUrl()}/projects/${projectId}`);
    await designer.getByRole("button", { name: "Revoke the engagement of Olive Ridge, P.E." }).click();
    await designer.getByText("Revoked", { exact: true }).waitFor();
    // The not-found page (a streamed page keeps its 200 status, so the page is what tells).
    for (const url of [`/projects/${projectId}`, `/reviews/${revisionId}`]) {
      await engineer.goto(`${baseUrl()}${url}`);
      await engineer.getByRole("heading", { level: 1, name: "Nothing here" }).waitFor();
      expect(await engineer.getByText(projectName).count(), url).toBe(0);
    }
    await engineer.goto(`${baseUrl()}/projects`);
    expect(await engineer.getByText(projectName).count()).toBe(0);
    await engineer.goto(`${baseUrl()}/queue`);
    expect(await engineer.getByText(projectName).count()).toBe(0);
    await designer.goto(`${baseUrl()}/reviews/${revisionId}`);
    await designer.getByText("Confirm the wind speed with the county's revised sheet.").first().waitFor();
  });

  it("shows the demo outside engineer's queue with the seeded revision waiting, at desktop and phone widths", async () => {
    const context = await signedInContext(suite.browser, "engineer@outside.pierwise.test");
    suite.keep(context);
    const page = watch(await context.newPage(), "demo outside engineer");
    await queueShots(page, "demo-queue");
    await page.goto(`${baseUrl()}/queue`);
    const row = page.getByRole("row").filter({ hasText: "Aspen Hollow cabin (demo)" });
    await row.getByText("Waiting for you").waitFor();
    // Only the engaged project is listed; the contractor's other demo project is not. Searched for by
    // its words: earlier suites add projects to the engineer's own firm, which can fill page 1.
    await page.goto(`${baseUrl()}/projects?q=${encodeURIComponent("(demo)")}`);
    await page.getByText("Aspen Hollow cabin (demo)").waitFor();
    expect(await page.getByText("Larkspur Meadow residence (demo)").count()).toBe(0);
  });
});
