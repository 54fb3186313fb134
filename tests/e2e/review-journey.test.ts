/**
 * The whole journey in a browser: designer submits → engineer requests changes with a pinned
 * comment → designer revises and resubmits → engineer approves → installer opens the field spec on
 * a phone, enters laser readings and an as-built hole, and downloads the report. Screenshots of
 * every page at desktop and phone widths go to /tmp/shots with SCREENSHOTS=1.
 *
 * The design editor's "save revision" is driven through its API (POST /api/designs/:id/revisions),
 * the same call the editor makes; every other step goes through the pages.
 */
import { PDFParse } from "pdf-parse";
import type { Page } from "playwright-core";
import { describe, expect, it } from "vitest";
import { twoPostDesignInput } from "@/engine";
import { db } from "@/db/client";
import { browserSuite } from "../support/browser-suite";
import { DESKTOP, PHONE, baseUrl, shot, signedInContext } from "../support/browser";
import { firstLink, mailTo } from "../support/mailbox";
import { DESIGNER, ENGINEER, INSTALLER, makeDesign } from "../support/review-fixtures";

const suite = browserSuite();

async function as(email: string, viewport = DESKTOP): Promise<Page> {
  const context = await signedInContext(suite.browser, email, viewport);
  suite.keep(context);
  const page = await context.newPage();
  // A broken client page shows up in the test output, not only as a timeout.
  page.on("pageerror", (e) => console.error(`[${email}] page error: ${e.message}`));
  page.on("console", (m) => {
    if (m.type() === "error") console.error(`[${email}] console: ${m.text()}`);
  });
  return page;
}

async function both(page: Page, url: string, name: string) {
  for (const [label, viewport] of [["desktop", DESKTOP], ["phone", PHONE]] as const) {
    await page.setViewportSize(viewport);
    await page.goto(url);
    await page.getByRole("heading", { level: 1 }).waitFor();
    await shot(page, `${name}-${label}`);
  }
  await page.setViewportSize(DESKTOP);
}

describe("review journey", () => {
  it("goes from draft to an approved field spec, with as-built and report", async () => {
    // A fresh design in CO (the demo engineer's licence state) under the seeded county criteria card, if present.
    const card = await db("criteria_cards").where({ state: "CO" }).first("id");
    const { designId, revisionId: rev1 } = await makeDesign({ projectName: "Journey ranch (demo)", name: "South field array", criteriaCardId: card?.id ?? null });

    // 1. Designer submits revision 1 from its review page.
    const designer = await as(DESIGNER);
    await both(designer, `${baseUrl()}/reviews/${rev1}`, "review-draft-designer");
    await designer.goto(`${baseUrl()}/reviews/${rev1}`);
    await designer.getByRole("button", { name: "Submit for review" }).click();
    await designer.getByText("Submitted for review: the engineer has been e-mailed.").waitFor();
    expect(await designer.getByText("In review").first().isVisible()).toBe(true);

    // 2. Engineer follows the e-mailed link and requests changes with a comment pinned to the wind speed.
    const link = firstLink(await mailTo(ENGINEER, { subject: /Review requested: Journey ranch/ }));
    expect(link).toBe(`${baseUrl()}/reviews/${rev1}`);
    const engineer = await as(ENGINEER);
    await both(engineer, `${baseUrl()}/reviews`, "reviews-queue-engineer");
    await both(engineer, link, "review-in-review-engineer");
    await engineer.goto(link);
    await engineer.getByLabel("Request changes").check();
    await engineer.locator("#comment-0-field").selectOption("site.windSpeedMph");
    await engineer.locator("#comment-0-body").fill("Use 120 mph: the county sheet was revised.");
    await engineer.getByRole("button", { name: "Record decision" }).click();
    await engineer.getByText("Changes requested: the designer has been e-mailed.").waitFor();
    const changesMail = await mailTo(DESIGNER, { subject: /needs changes/ });
    expect(changesMail.text).toContain("[Basic wind speed] Use 120 mph");

    // 3. Designer reads the comment, saves revision 2 with the change (the editor's save API) and resubmits it.
    await designer.goto(`${baseUrl()}/reviews/${rev1}`);
    await designer.getByText("Use 120 mph: the county sheet was revised.").first().waitFor();
    await both(designer, `${baseUrl()}/reviews/${rev1}`, "review-changes-requested-designer");
    const saved = await designer.request.post(`/api/designs/${designId}/revisions`, {
      data: { baseRevisionId: rev1, input: { ...twoPostDesignInput, site: { ...twoPostDesignInput.site, windSpeedMph: 120 } }, note: "Wind speed per the engineer's comment." },
    });
    expect(saved.status()).toBe(201);
    const rev2 = (await saved.json()).revision.id as string;
    await designer.goto(`${baseUrl()}/reviews/${rev2}`);
    await designer.getByRole("button", { name: "Submit for review" }).click();
    await designer.getByText("Submitted for review: the engineer has been e-mailed.").waitFor();
    await both(designer, `${baseUrl()}/reviews`, "reviews-queue-designer");

    // 4. Engineer sees what changed since revision 1 and approves.
    await engineer.goto(`${baseUrl()}/reviews/${rev2}`);
    await engineer.getByText("Changes since revision 1, the last one you reviewed").waitFor();
    expect(await engineer.getByText("Basic wind speed").first().isVisible()).toBe(true);
    await engineer.getByLabel("Approve for construction").check();
    await engineer.getByLabel("Your password, to sign the approval").fill("pierwise-demo");
    await engineer.getByRole("button", { name: "Sign and approve" }).click();
    await engineer.getByText("Approved: the revision is pinned and the designer has been e-mailed.").waitFor();
    await engineer.reload();
    await engineer.getByText("Approved for construction").first().waitFor();
    await both(engineer, `${baseUrl()}/reviews/${rev2}`, "review-approved-engineer");

    // 5. Installer on a phone: the list, the spec, the laser cut list, an as-built hole, the report.
    const installer = await as(INSTALLER, PHONE);
    await installer.goto(`${baseUrl()}/field`);
    await shot(installer, "field-list-phone");
    await installer.getByRole("link", { name: /Journey ranch \(demo\): South field array/ }).first().click();
    await installer.waitForURL(`**/field/${rev2}`);
    await installer.getByRole("heading", { name: "Every hole" }).waitFor();
    await shot(installer, "field-spec-phone");
    // Readings from post top down to the laser line: P2 reads 1.5 in more, so it stands 1.5 in high (common practice).
    await installer.getByLabel("Post P1", { exact: true }).fill("10");
    await installer.getByLabel("Post P2", { exact: true }).fill("11.5");
    await installer.getByText("Cut 1.5 in off the bottom").waitFor();

    const result = (await db("revisions").where({ id: rev2 }).first("result")).result;
    await installer.locator("#postId").selectOption("P1");
    await installer.locator("#measuredDiameterIn").fill(String(result.footing.diameterIn));
    await installer.locator("#measuredDepthIn").fill(String(result.footing.depthIn + 1));
    await installer.locator("#photos").setInputFiles({ name: "p1.png", mimeType: "image/png", buffer: TINY_PNG });
    await installer.getByRole("button", { name: "Record this hole" }).click();
    await installer.getByText("Hole P1 recorded.").waitFor();
    await installer.reload();
    await installer.getByText("Matches the spec").waitFor();
    await shot(installer, "field-spec-after-as-built-phone");

    const [download] = await Promise.all([installer.waitForEvent("download"), installer.getByRole("link", { name: "Calculation report (PDF)" }).click()]);
    const bytes = await (await download.createReadStream()).toArray();
    const parser = new PDFParse({ data: new Uint8Array(Buffer.concat(bytes)) });
    const text = (await parser.getText()).text.replace(/\s+/g, " ");
    await parser.destroy();
    expect(text).toContain(`Revision id ${rev2}`);
    // The report's cover block states the status beside its label.
    expect(text).toMatch(/Status:? Approved/);

    // The same spec at desktop width, and as printed.
    await installer.setViewportSize(DESKTOP);
    await shot(installer, "field-spec-desktop");
    await installer.emulateMedia({ media: "print" });
    await shot(installer, "field-spec-print");
    await installer.emulateMedia({ media: "screen" });

    // Revision 1 has no field spec: a clear refusal.
    await both(installer, `${baseUrl()}/field/${rev1}`, "field-not-approved");
    await installer.setViewportSize(PHONE);
    await installer.goto(`${baseUrl()}/field/${rev1}`);
    const refusal = installer.getByRole("heading", { name: "Not approved for construction" });
    await refusal.waitFor();
    expect(await refusal.isVisible()).toBe(true);
  });

  it("puts the design on hold from a shallow as-built hole, on every screen, until the engineer clears it", async () => {
    const { revisionId } = await makeDesign({ projectName: "Hold test orchard (demo)" });
    const designer = await as(DESIGNER);
    await designer.goto(`${baseUrl()}/reviews/${revisionId}`);
    await designer.getByRole("button", { name: "Submit for review" }).click();
    await designer.getByText("Submitted for review").waitFor();
    const engineer = await as(ENGINEER);
    await engineer.goto(`${baseUrl()}/reviews/${revisionId}`);
    await engineer.getByLabel("Approve for construction").check();
    await engineer.getByLabel("Your password, to sign the approval").fill("pierwise-demo");
    await engineer.getByRole("button", { name: "Sign and approve" }).click();
    await engineer.getByText("Approved: the revision is pinned").waitFor();

    const installer = await as(INSTALLER, PHONE);
    await installer.goto(`${baseUrl()}/field/${revisionId}`);
    await installer.locator("#postId").selectOption("P2");
    await installer.locator("#measuredDiameterIn").fill("30");
    await installer.locator("#measuredDepthIn").fill("40");
    await installer.locator("#groundFound").selectOption("rock");
    await installer.getByRole("button", { name: "Record this hole" }).click();
    await installer.getByText(/The design is now ON HOLD/).waitFor();
    await installer.reload();
    await installer.getByRole("alert", { name: "Design on hold" }).waitFor();
    await shot(installer, "field-spec-on-hold-phone");

    await engineer.goto(`${baseUrl()}/reviews/${revisionId}`);
    await engineer.getByRole("alert", { name: "Design on hold" }).waitFor();
    await both(engineer, `${baseUrl()}/reviews/${revisionId}`, "review-on-hold-engineer");
    await engineer.getByLabel(/^How was it resolved/).fill("Rock at 40 in: hole cored to 90 in and inspected.");
    // Clearing is confirmed in so many words: the note becomes the crew's instruction.
    await engineer.getByLabel(/^Work may go on as my note says/).check();
    await engineer.getByRole("button", { name: "Clear hold" }).click();
    await engineer.getByRole("alert", { name: "Design on hold" }).waitFor({ state: "detached" });
    await installer.reload();
    expect(await installer.getByRole("alert", { name: "Design on hold" }).count()).toBe(0);
    await installer.getByText("Rock at 40 in: hole cored to 90 in and inspected.").first().waitFor();
  });
});

// A 1×1 PNG, made by hand for the photo upload.
const TINY_PNG = Buffer.from("iVBORw0KGgoAAAANSUhEUgAAAAEAAAABCAYAAAAfFcSJAAAADUlEQVR42mNkYPhfDwAChwGA60e6kgAAAABJRU5ErkJggg==", "base64");
