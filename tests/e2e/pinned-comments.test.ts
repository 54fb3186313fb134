/**
 * Issue 17, item 6: the engineer's comments pinned to inputs show in the design editor beside the
 * field (worded label, engineer's name and time, never the input's path), and say "Resolved in this
 * revision" once the designer has saved a revision that changes that field.
 */
import { describe, expect, it } from "vitest";
import { db } from "@/db/client";
import { DEMO_ORG_ID } from "@/db/seeds/01_demo_accounts";
import { browserSuite } from "../support/browser-suite";
import { DESKTOP, PHONE, baseUrl, shot, signedInContext } from "../support/browser";
import { DESIGNER, ENGINEER, makeDesign, userId } from "../support/review-fixtures";

const suite = browserSuite();
const COMMENT = "The county sheet says 120 mph here; confirm the wind speed.";

describe("pinned comments in the editor", () => {
  it("shows the engineer's comment beside wind speed, then 'resolved in this revision' after the designer changes and saves it", async () => {
    const { projectId, designId, revisionId } = await makeDesign({ projectName: "Pinned comment paddock (demo)" });
    await db("revisions").where({ id: revisionId }).update({ status: "in_review" });
    await db("reviews").insert({ revision_id: revisionId, organisation_id: DEMO_ORG_ID, engineer_id: await userId(ENGINEER), submitted_by: await userId(DESIGNER) });

    // The engineer requests changes with a comment pinned to the basic wind speed, on the review page.
    const engineer = await (suite.keep(await signedInContext(suite.browser, ENGINEER))).newPage();
    await engineer.goto(`${baseUrl()}/reviews/${revisionId}`);
    await engineer.getByLabel("Request changes").check();
    await engineer.locator("#comment-0-field").selectOption("site.windSpeedMph");
    await engineer.locator("#comment-0-body").fill(COMMENT);
    // A second one on a field under "More site settings".
    await engineer.getByRole("button", { name: "Add another comment" }).click();
    await engineer.locator("#comment-1-field").selectOption("site.groundElevationFt");
    await engineer.locator("#comment-1-body").fill("Give the surveyed elevation.");
    await engineer.getByRole("button", { name: "Record decision" }).click();
    await engineer.getByText("Changes requested: the designer has been e-mailed.").waitFor();

    // The designer opens the editor: the comment sits in the wind speed field's own box.
    const designer = await (suite.keep(await signedInContext(suite.browser, DESIGNER))).newPage();
    await designer.goto(`${baseUrl()}/projects/${projectId}/designs/${designId}`);
    const windBox = designer.locator("div", { has: designer.locator("#in-site-windSpeedMph") }).filter({ has: designer.locator('[data-pinned-to="site.windSpeedMph"]') }).last();
    const note = windBox.locator('[data-pinned-to="site.windSpeedMph"]');
    await note.waitFor();
    const text = await note.innerText();
    expect(text).toContain(COMMENT);
    expect(text).toContain("Eli Engineer, P.E.");
    expect(text).toMatch(/on revision 1/);
    expect(text).toContain("Open: unchanged since revision 1.");
    // The folded "More site settings" opens so the comment on the elevation is in view too.
    expect(await designer.locator('[data-pinned-to="site.groundElevationFt"]').isVisible()).toBe(true);
    // The list at the top names the field in words; no input path anywhere a person reads.
    const panel = designer.getByRole("region", { name: /Engineer's comments on revision 1/ });
    expect(await panel.innerText()).toContain(`Basic wind speed: ${COMMENT}`);
    expect(await designer.locator("main").innerText()).not.toMatch(/\b(site|array|posts)\.[a-zA-Z]+/);
    await shot(designer, "editor-pinned-comment-desktop");
    await designer.setViewportSize(PHONE);
    await note.scrollIntoViewIfNeeded();
    await shot(designer, "editor-pinned-comment-phone");
    await designer.setViewportSize(DESKTOP);

    // Typing a new value says it still needs saving; saving resolves it in the new revision.
    await designer.getByLabel("Basic wind speed").fill("120");
    await note.getByText("Changed here: save a revision to resolve it.").waitFor();
    await designer.getByLabel("What changed").fill("Wind speed per the engineer's comment");
    await designer.getByRole("button", { name: "Save revision" }).click();
    await designer.getByText("Saved as revision 2.").waitFor();
    await note.getByText(/Resolved in this revision: 115 mph in revision 1, now 120 mph\./).waitFor();
    expect(await panel.innerText()).toContain("(1 open)");

    // A fresh load of the editor says the same.
    await designer.reload();
    await designer.locator('[data-pinned-to="site.windSpeedMph"]').getByText(/Resolved in this revision/).waitFor();
    await shot(designer, "editor-pinned-resolved-desktop");
  });
});
