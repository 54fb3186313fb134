/**
 * Metric mode in the browser: with the units switch on metric, the editor, the review page, the
 * compare page and the field spec show no US unit word in their visible text, at desktop and phone
 * widths; the editor's inputs show rounded metric values (whole millimetres, 0.1 m/s); and the same
 * quantity (the footing, the largest wind uplift) reads the same on every screen and in the PDF.
 * Screenshots to /tmp/shots with SCREENSHOTS=1.
 */
import { PDFParse } from "pdf-parse";
import type { Page } from "playwright-core";
import { describe, expect, it } from "vitest";
import { db } from "@/db/client";
import { largestWindUpliftLb } from "@/components/design/revision-diff";
import { formatFootingSize, formatQuantity } from "@/components/format/quantity";
import type { DesignResult } from "@/engine";
import { browserSuite } from "../support/browser-suite";
import { DESKTOP, PHONE, baseUrl, shot, signedInContext } from "../support/browser";
import { DESIGNER, INSTALLER, freshApproved } from "../support/review-fixtures";

const suite = browserSuite();

/**
 * A US customary unit in visible text: unit words that are never English words, "in" only right
 * after a number or in a unit heading "(in)", so "in the hole" is allowed.
 */
const IMPERIAL = /\b(ft|lb|lbs|mph|psf|pcf|psi|ksi|kip)\b|yd³|ft³|ft²|°F|-lb\b|[\d¼½¾]\s*in\b|\(in\)/;

async function metricPage(email: string, viewport = DESKTOP): Promise<Page> {
  const context = suite.keep(await signedInContext(suite.browser, email, viewport));
  // What the units switch stores (components/format/unit-preference.ts).
  await context.addCookies([{ name: "pierwise-units", value: "metric", url: baseUrl() }]);
  const page = await context.newPage();
  page.on("pageerror", (e) => console.error(`[${email}] page error: ${e.message}`));
  return page;
}

/** The visible text (closed <details> and hidden elements are not in innerText). */
const visibleText = (page: Page) => page.evaluate(() => document.body.innerText);

function imperialWords(text: string): string[] {
  return text.split("\n").filter((line) => IMPERIAL.test(line));
}

async function approvedDesign() {
  const { designId, revisionId } = await freshApproved();
  const { project_id: projectId } = await db("designs").where({ id: designId }).first("project_id");
  const { result } = await db("revisions").where({ id: revisionId }).first("result");
  return { projectId: projectId as string, designId, revisionId, result: result as DesignResult };
}

describe("metric mode", () => {
  it("leaves no US unit word on the editor, review, compare and field spec pages, at both widths", async () => {
    const d = await approvedDesign();
    const pages: [string, string, string][] = [
      [DESIGNER, `/projects/${d.projectId}/designs/${d.designId}`, "editor"],
      [DESIGNER, `/reviews/${d.revisionId}`, "review"],
      [DESIGNER, `/projects/${d.projectId}/designs/${d.designId}/diff?from=${d.revisionId}&to=${d.revisionId}`, "compare"],
      [INSTALLER, `/field/${d.revisionId}`, "field-spec"],
    ];
    for (const [who, path, name] of pages) {
      for (const [width, viewport] of [["desktop", DESKTOP], ["phone", PHONE]] as const) {
        const page = await metricPage(who, viewport);
        await page.goto(`${baseUrl()}${path}`);
        if (name === "editor") await page.getByTestId("footing-spec").filter({ hasText: "mm diameter" }).waitFor({ timeout: 20_000 });
        else await page.getByRole("heading", { level: 1 }).first().waitFor();
        expect(imperialWords(await visibleText(page)), `${name} at ${width}`).toEqual([]);
        await shot(page, `metric-${name}-${width}`);
      }
    }
  });

  it("shows the editor's inputs rounded by the unit (whole mm, 0.1 m/s)", async () => {
    const d = await approvedDesign();
    const page = await metricPage(DESIGNER);
    await page.goto(`${baseUrl()}/projects/${d.projectId}/designs/${d.designId}`);
    await page.getByTestId("footing-spec").filter({ hasText: "mm diameter" }).waitFor({ timeout: 20_000 });
    // Each numeric input with the unit shown beside it.
    const fields = await page.$$eval("input[inputmode=decimal]", (inputs) => inputs.map((i) => ({ value: (i as HTMLInputElement).value, unit: i.parentElement?.querySelector("span")?.textContent ?? "" })));
    const mm = fields.filter((f) => f.unit === "mm" && f.value !== "");
    expect(mm.length).toBeGreaterThan(3);
    for (const f of mm) expect(f.value).toMatch(/^-?\d+(, -?\d+)*$/);
    const speed = fields.filter((f) => f.unit === "m/s");
    expect(speed).toHaveLength(1);
    expect(speed[0].value).toMatch(/^\d+(\.\d)?$/);
    // 115 mph (the two-post demo) = 51.4 m/s (1 mi = 1,609.344 m exactly, NIST SP 811, 2008 edition, App. B.8).
    expect(speed[0].value).toBe(formatQuantity(d.result.input.site.windSpeedMph, "mph", "metric").replace(" m/s", ""));
  });

  it("writes the same quantity the same way on the editor, review, compare, field spec and report", async () => {
    const d = await approvedDesign();
    const footing = formatFootingSize(d.result.footing.diameterIn, d.result.footing.depthIn, "metric");
    const uplift = formatQuantity(largestWindUpliftLb(d.result), "lb", "metric");
    const depth = formatQuantity(d.result.footing.depthIn, "in", "metric");
    const page = await metricPage(DESIGNER);
    const textOf = async (path: string, ready: () => Promise<unknown>) => {
      await page.goto(`${baseUrl()}${path}`);
      await ready();
      // textContent: the folded tables count too (the same words, open or closed).
      return page.evaluate(() => document.body.textContent ?? "");
    };
    const editor = await textOf(`/projects/${d.projectId}/designs/${d.designId}`, () => page.getByTestId("footing-spec").filter({ hasText: "mm diameter" }).waitFor({ timeout: 20_000 }));
    const review = await textOf(`/reviews/${d.revisionId}`, () => page.getByRole("heading", { level: 1 }).first().waitFor());
    const compare = await textOf(`/projects/${d.projectId}/designs/${d.designId}/diff?from=${d.revisionId}&to=${d.revisionId}`, () => page.getByRole("heading", { level: 1 }).first().waitFor());
    const field = await textOf(`/field/${d.revisionId}`, () => page.getByRole("heading", { level: 1 }).first().waitFor());
    const pdf = await page.request.get(`${baseUrl()}/api/revisions/${d.revisionId}/report.pdf`);
    const parser = new PDFParse({ data: new Uint8Array(await pdf.body()) });
    const report = (await parser.getText()).text.replace(/\s+/g, " ");
    await parser.destroy();

    for (const [name, text] of [["editor", editor], ["review", review], ["field spec", field], ["report", report]] as const) {
      expect(text, `footing on the ${name}`).toContain(footing);
    }
    expect(compare, "depth on the compare page").toContain(depth);
    for (const [name, text] of [["editor", editor], ["review", review], ["compare", compare], ["report", report]] as const) {
      expect(text, `largest wind uplift on the ${name}`).toContain(uplift);
    }
    // The report follows the same cookie: metric words, no US ones outside the standard's equations.
    expect(report).toContain("mm diameter");
  });
});
