/**
 * Forms keep what was typed and chosen after the server refuses them: the select a crew member
 * picked, the photos they attached, the state and criteria card of a new project. React resets a
 * form after its action; before useKeptForm a reset put selects back on their first option and
 * emptied file inputs.
 */
import type { Page } from "playwright-core";
import { describe, expect, it } from "vitest";
import { db } from "@/db/client";
import { browserSuite } from "../support/browser-suite";
import { DESKTOP, PHONE, baseUrl, signedInContext } from "../support/browser";
import { DESIGNER, INSTALLER, freshApproved, makeDesign } from "../support/review-fixtures";

// A valid 1×1 PNG, so the upload policy (sniffed by content) would accept it.
const PNG_1PX = Buffer.from("iVBORw0KGgoAAAANSUhEUgAAAAEAAAABCAYAAAAfFcSJAAAADUlEQVR42mP8z8BQDwAEhQGAhKmMIQAAAABJRU5ErkJggg==", "base64");

const suite = browserSuite();

async function as(email: string, viewport = DESKTOP): Promise<Page> {
  const context = await signedInContext(suite.browser, email, viewport);
  suite.keep(context);
  return context.newPage();
}

describe("forms keep what was chosen after an error", () => {
  it("as-built form: the post and the photos stay after a bad depth", async () => {
    const { revisionId } = await freshApproved();
    const page = await as(INSTALLER, PHONE);
    await page.goto(`${baseUrl()}/field/${revisionId}`);
    await page.getByRole("heading", { level: 1 }).waitFor();
    await page.getByLabel("Hole at post").selectOption("P2");
    await page.getByLabel("Photos of the hole (up to 6)").setInputFiles({ name: "hole.png", mimeType: "image/png", buffer: PNG_1PX });
    await page.getByLabel("Measured depth (in)").fill("about sixty");
    await page.getByLabel("Notes").fill("Dug by hand");
    await page.getByRole("button", { name: "Record this hole" }).click();
    await page.locator("#measuredDepthIn-error").waitFor();
    expect(await page.getByLabel("Hole at post").inputValue()).toBe("P2");
    expect(await page.getByLabel("Photos of the hole (up to 6)").evaluate((el) => (el as HTMLInputElement).files?.length ?? 0)).toBe(1);
    expect(await page.getByLabel("Notes").inputValue()).toBe("Dug by hand");
    expect(await page.getByLabel("Measured depth (in)").inputValue()).toBe("about sixty");
    expect(await db("as_built_entries").where({ revision_id: revisionId }).count<{ count: string }[]>("id as count")).toEqual([{ count: "0" }]);
  });

  it("new project form: state and criteria card stay after a bad longitude, and nothing is created", async () => {
    const card = await db("criteria_cards").where({ jurisdiction: "Cedar Basin County (demo)" }).first("id");
    const name = `Kept form site ${Date.now()}`;
    const page = await as(DESIGNER);
    await page.goto(`${baseUrl()}/projects/new`);
    await page.getByRole("heading", { level: 1 }).waitFor();
    await page.getByLabel("Project name").fill(name);
    await page.getByLabel("State").selectOption("WY");
    await page.getByLabel("Design criteria card").selectOption(card.id);
    await page.getByLabel("Longitude").fill("-500");
    await page.getByRole("button", { name: /create/i }).click();
    await page.locator("#field-longitude-error").waitFor();
    expect(await page.getByLabel("State").inputValue()).toBe("WY");
    expect(await page.getByLabel("Design criteria card").inputValue()).toBe(card.id);
    expect(await page.getByLabel("Project name").inputValue()).toBe(name);
    expect(await db("projects").where({ name }).first()).toBeUndefined();
  });
});

describe("field checklist", () => {
  it("keeps a tick across a reload, with who ticked it", async () => {
    const { revisionId } = await freshApproved();
    const page = await as(INSTALLER, PHONE);
    await page.goto(`${baseUrl()}/field/${revisionId}`);
    const locate = page.getByRole("checkbox", { name: "Utility locate called and marks on site before digging" });
    await locate.waitFor();
    expect(await locate.getAttribute("aria-checked")).toBe("false");
    await locate.click();
    await page.getByText(/^Ticked by /).waitFor();
    await page.reload();
    const after = page.getByRole("checkbox", { name: "Utility locate called and marks on site before digging" });
    expect(await after.getAttribute("aria-checked")).toBe("true");
    const row = await db("field_checklist_ticks").where({ revision_id: revisionId, item_key: "utility-locate" }).first();
    expect(row?.ticked).toBe(true);
  });

  it("shows the safety box and the preliminary-sizing caution above the fold on a phone", async () => {
    const { revisionId } = await freshApproved();
    const page = await as(INSTALLER, PHONE);
    await page.goto(`${baseUrl()}/field/${revisionId}`);
    const safety = page.getByRole("heading", { name: "Safety" });
    await safety.waitFor();
    const safetyTop = (await safety.boundingBox())!.y;
    expect(safetyTop).toBeLessThan(PHONE.height);
    // The caution box sits right under the safety box; its first line must start on the first screen too.
    const caution = page.getByText(/preliminary/i).first();
    expect((await caution.boundingBox())!.y).toBeLessThan(PHONE.height);
  });
});

describe("design editor edits", () => {
  it("Enter never saves a revision, and a reload brings unsaved inputs back with a notice", async () => {
    const { designId, projectId } = await makeDesign({ name: "Draft keeping array" });
    const page = await as(DESIGNER);
    await page.goto(`${baseUrl()}/projects/${projectId}/designs/${designId}`);
    const wind = page.getByLabel("Basic wind speed");
    await wind.waitFor();
    await wind.fill("131");
    await wind.press("Enter");
    await page.getByLabel("What changed").press("Enter");
    // Give a stray submit time to reach the server: none may arrive.
    await page.waitForTimeout(1_000);
    expect(await db("revisions").where({ design_id: designId }).count<{ count: string }[]>("id as count")).toEqual([{ count: "1" }]);

    // Leaving with unsaved edits asks first (the browser's own prompt).
    let asked = false;
    page.once("dialog", async (dialog) => {
      asked = dialog.type() === "beforeunload";
      await dialog.accept();
    });
    await page.reload();
    expect(asked).toBe(true);
    await page.getByText("Your unsaved inputs from this browser were brought back.").waitFor();
    expect(await page.getByLabel("Basic wind speed").inputValue()).toBe("131");
  });
});
