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
import { DESIGNER, ENGINEER, INSTALLER, addRevision, freshApproved } from "../support/review-fixtures";
import { DEMO_PROJECT_ID } from "@/db/seeds/02_demo_projects";

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

/**
 * The visible text (closed <details> and hidden elements are not in innerText), less the units
 * switch itself, whose other choice names the US units on purpose.
 */
const visibleText = (page: Page) => page.evaluate(() => {
  const switchText = Array.from(document.querySelectorAll('[role="radiogroup"][aria-label="Units"] [role="radio"]')).map((n) => (n as HTMLElement).innerText);
  return document.body.innerText.split("\n").filter((line) => !switchText.includes(line.trim())).join("\n");
});

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
    // A second revision with more wind and a higher edge, so the compare page has inputs and results that changed.
    const input = structuredClone(d.result.input) as unknown as { site: { windSpeedMph: number }; array: { lowestEdgeClearanceIn: number } };
    input.site.windSpeedMph = 140;
    input.array.lowestEdgeClearanceIn = 30;
    const second = await addRevision(d.designId, input as never);
    const pages: [string, string, string][] = [
      [DESIGNER, `/projects/${d.projectId}/designs/${d.designId}`, "editor"],
      [DESIGNER, `/reviews/${d.revisionId}`, "review"],
      [DESIGNER, `/projects/${d.projectId}/designs/${d.designId}/diff?from=${d.revisionId}&to=${second}`, "compare"],
      [INSTALLER, `/field/${d.revisionId}`, "field-spec"],
    ];
    for (const [who, path, name] of pages) {
      for (const [width, viewport] of [["desktop", DESKTOP], ["phone", PHONE]] as const) {
        const page = await metricPage(who, viewport);
        await page.goto(`${baseUrl()}${path}`);
        if (name === "editor") await page.getByTestId("footing-spec").filter({ hasText: "mm diameter" }).waitFor({ timeout: 20_000 });
        else await page.getByRole("heading", { level: 1 }).first().waitFor();
        expect(imperialWords(await visibleText(page)), `${name} at ${width}`).toEqual([]);
        // The compare page folds its unchanged results: those rows count too.
        if (name === "compare") expect(imperialWords(await page.evaluate(() => {
          const copy = document.body.cloneNode(true) as HTMLElement;
          copy.querySelectorAll("script, style").forEach((n) => n.remove());
          return (copy.textContent ?? "").replace(/([a-z0-9)])([A-Z])/g, "$1\n$2");
        })), "compare, folded rows").toEqual([]);
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

  it("words the text the app wrote in metric too: a new design's starting note, a hold's reason, the landing cautions, the report's method", async () => {
    // A new design from the demo card: revision 1's note says how the engine sized it (engine/options/starting-size.ts).
    const page = await metricPage(DESIGNER);
    await page.goto(`${baseUrl()}/projects/${DEMO_PROJECT_ID}`);
    await page.getByLabel("New design name").fill(`Metric start ${Date.now()}`);
    await page.getByRole("button", { name: "Create design" }).click();
    await page.getByTestId("footing-spec").filter({ hasText: "mm diameter" }).waitFor({ timeout: 20_000 });
    const note = await page.locator("main").innerText();
    expect(note).toContain("Started from the Juniper Flats County (demo) criteria card.");
    expect(imperialWords(await visibleText(page)), "editor of a new design").toEqual([]);
    await shot(page, "metric-new-design-desktop");

    // A hole logged shallower than the spec, in millimetres, on the phone: the hold's reason in mm on every screen.
    const d = await approvedDesign();
    const crew = await metricPage(INSTALLER, PHONE);
    await crew.goto(`${baseUrl()}/field/${d.revisionId}`);
    await crew.getByLabel("Measured diameter (mm)").fill(String(Math.round(d.result.footing.diameterIn * 25.4)));
    // 300 mm short of the specified depth (1 in = 25.4 mm exactly, NIST SP 811, 2008 edition, App. B.8).
    await crew.getByLabel("Measured depth (mm)").fill(String(Math.round(d.result.footing.depthIn * 25.4) - 300));
    await crew.getByRole("button", { name: "Record this hole" }).click();
    await crew.getByText(/ON HOLD: Hole P1 is [\d,]+ mm deep, shallower than the [\d,]+ mm specified\./).first().waitFor({ timeout: 20_000 });
    const hold = await db("design_holds").where({ revision_id: d.revisionId }).first("reason");
    expect(hold.reason, "saved as customary words for the e-mail and the API").toMatch(/ in deep, shallower than the \d+(\.\d)? in specified\./);
    await crew.reload();
    await crew.getByRole("alert", { name: "Design on hold" }).waitFor();
    expect(imperialWords(await visibleText(crew)), "field spec on hold").toEqual([]);
    await shot(crew, "metric-hold-field-phone");
    for (const [who, path, name] of [[ENGINEER, `/reviews/${d.revisionId}`, "review"], [ENGINEER, "/reviews", "reviews list"], [DESIGNER, `/projects/${d.projectId}/designs/${d.designId}`, "editor"]] as const) {
      const p = await metricPage(who);
      await p.goto(`${baseUrl()}${path}`);
      await p.getByText(/Hole P1 is [\d,]+ mm deep/).first().waitFor({ timeout: 20_000 });
      expect(imperialWords(await visibleText(p)), `${name} with the hold`).toEqual([]);
    }

    // The project page: its criteria card and its designs table.
    for (const [width, viewport] of [["desktop", DESKTOP], ["phone", PHONE]] as const) {
      const p = await metricPage(DESIGNER, viewport);
      await p.goto(`${baseUrl()}/projects/${DEMO_PROJECT_ID}`);
      await p.getByRole("heading", { name: /Design criteria: Juniper Flats County/ }).waitFor();
      expect(imperialWords(await visibleText(p)), `project page at ${width}`).toEqual([]);
      await shot(p, `metric-project-${width}`);
    }

    // The landing page's site cautions follow the cookie (the concrete strengths in MPa).
    const landing = await metricPage(DESIGNER);
    await landing.goto(baseUrl());
    expect(await landing.getByRole("region", { name: "On site, always" }).innerText()).toMatch(/MPa/);
    expect(imperialWords(await visibleText(landing)), "landing").toEqual([]);

    // The report's method in SI: no US unit word anywhere in it, the velocity pressure in its SI form.
    const pdf = await page.request.get(`${baseUrl()}/api/revisions/${d.revisionId}/report.pdf`);
    const parser = new PDFParse({ data: new Uint8Array(await pdf.body()) });
    const report = (await parser.getText()).text;
    await parser.destroy();
    expect(report).toContain("qz = 0.613");
    expect(imperialWords(report), "report").toEqual([]);
  });
});
