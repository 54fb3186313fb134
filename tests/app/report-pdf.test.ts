/**
 * The calculation report, parsed back with pdf-parse: cover block with the approval record and its
 * overrides, a summary, inputs by label with units (no dotted input paths), the wind cases with
 * their γ glyph, the pinned project facts, and on every page the defer-to-code caution, "page n of
 * N" and the revision id.
 */
import { writeFileSync } from "node:fs";
import { PDFParse } from "pdf-parse";
import { describe, expect, it } from "vitest";
import { GET } from "@/app/api/revisions/[revisionId]/report.pdf/route";
import { PATCH as patchProject } from "@/app/api/projects/[projectId]/route";
import { POST as review } from "@/app/api/revisions/[revisionId]/review/route";
import { POST as submit } from "@/app/api/revisions/[revisionId]/submit/route";
import { inputGroups } from "@/app/_lib/review/report-text";
import { DISPLAY_UNITS } from "@/components/design/units";
import { db } from "@/db/client";
import { DEFER_TO_CODE, sizeDesign, twoPostDesignInput, type DesignInputDraft } from "@/engine";
import { FIELD_LABELS } from "@/engine/field-labels";
import { actAs, jsonRequest, params } from "../support/next-context";
import { DEMO_PASSWORD, DESIGNER, ENGINEER, INSTALLER, OUTSIDER, makeDesign, userId } from "../support/review-fixtures";

async function download(email: string | null, revisionId: string) {
  await actAs(email);
  return GET(jsonRequest("GET", `/api/revisions/${revisionId}/report.pdf`), params({ revisionId }));
}

async function pdfText(res: Response, sample?: string): Promise<{ text: string; pages: string[] }> {
  const bytes = new Uint8Array(await res.arrayBuffer());
  // PIERWISE_REPORT_SAMPLE=<folder> keeps the PDFs, to look at them (pdftoppm) while working on the layout.
  if (sample && process.env.PIERWISE_REPORT_SAMPLE) writeFileSync(`${process.env.PIERWISE_REPORT_SAMPLE}/${sample}.pdf`, bytes);
  const parser = new PDFParse({ data: bytes });
  const out = await parser.getText();
  await parser.destroy();
  const squash = (s: string) => s.replace(/\s+/g, " ");
  return { text: squash(out.text), pages: out.pages.map((p) => squash(p.text)) };
}

async function approve(revisionId: string, body: Record<string, unknown> = {}) {
  await actAs(DESIGNER);
  await submit(jsonRequest("POST", "/x", { engineerId: await userId(ENGINEER) }), params({ revisionId }));
  await actAs(ENGINEER);
  const res = await review(jsonRequest("POST", "/x", { decision: "approve", password: DEMO_PASSWORD, ...body }), params({ revisionId }));
  expect(res.status).toBe(200);
}

describe("GET /api/revisions/:id/report.pdf", () => {
  it("reports an approved revision with its approval record, footing, inputs with units and the caution on every page", async () => {
    const { revisionId } = await makeDesign();
    await approve(revisionId, { comments: [{ fieldPath: "site.exposure", body: "Exposure C confirmed on site visit." }] });

    const res = await download(INSTALLER, revisionId);
    expect(res.status).toBe(200);
    expect(res.headers.get("content-type")).toBe("application/pdf");
    const { text, pages } = await pdfText(res, "approved");
    const rev = await db("revisions").where({ id: revisionId }).first("result", "input");
    const result = rev.result;

    expect(text).toContain("Status Approved");
    // Demo licence: db/seeds/01_demo_accounts.ts (invented).
    expect(text).toContain("Approved by Eli Engineer, P.E., licence PE-000000-DEMO (CO), valid through");
    expect(text).toContain("Comment on Exposure category: Exposure C confirmed on site visit.");
    expect(text).toContain(`hole ${result.footing.diameterIn} in diameter × ${result.footing.depthIn} in deep`);
    expect(text).toContain("IBC §1807.3.2.1 Eq. 18-1"); // a footing check's source, as the engine names it
    expect(text).toContain("Call before you dig");
    expect(text).toMatch(/Scale 1 in = \d+ ft/); // the elevation is drawn to a stated scale
    expect(text).toContain("d = 0.5 · A · {1 + [1 + 4.36 · h / A]^½}"); // IBC 2021 Eq. 18-1, then its numbers

    // The wind cases print their γ (ASCE 7-16 Fig. 27.3-4 wind direction), not "?" in its place.
    expect(text).toContain("γ=0° A");
    expect(text).not.toMatch(/\?=\d+°/);
    for (const glyph of ["²", "³", "≤", "×", "°"]) expect(text, glyph).toContain(glyph);

    // Inputs by label with units, as grouped in the editor; no dotted input path, no internal tag.
    for (const g of inputGroups(rev.input)) {
      for (const [label, value] of g.rows) expect(text).toContain(`${label} ${value}`);
    }
    expect(text).toContain("Basic wind speed 115 mph"); // the two-post demo design's wind speed
    // Every input the label table gives a unit shows that unit beside its value.
    const unitOf = new Map(Object.values(FIELD_LABELS).filter((f) => f.unit).map((f) => [f.label, DISPLAY_UNITS[f.unit!].imperial]));
    for (const g of inputGroups(rev.input)) for (const [label, value] of g.rows) if (unitOf.has(label) && value !== "not given") expect(value.endsWith(unitOf.get(label)!), `${label}: ${value}`).toBe(true);
    expect(text).not.toMatch(/\b(site|array|posts)\.[a-zA-Z]/);
    expect(text).not.toContain("[memory");

    expect(pages.length).toBeGreaterThan(2);
    pages.forEach((page, i) => {
      expect(page, `page ${i + 1}`).toContain(`Caution: ${DEFER_TO_CODE}`);
      expect(page, `page ${i + 1}`).toContain(`Page ${i + 1} of ${pages.length}`);
      expect(page, `page ${i + 1}`).toContain(`Revision id ${revisionId}`);
      expect(page, `page ${i + 1}`).toMatch(/Approval check: http\S+\/verify\/[A-Za-z0-9_-]{22}/);
    });
  });

  it("prints the engineer's reason for each failing check approved anyway", async () => {
    // A 24 in hole: shallower than frost and too short laterally (IBC §1809.5; IBC §1807.3.2.1).
    const shallow: DesignInputDraft = { ...twoPostDesignInput, posts: { ...twoPostDesignInput.posts, fixedDepthIn: 24 } };
    const failing = sizeDesign(shallow).footing.checks.filter((c) => !c.pass);
    expect(failing.length).toBeGreaterThan(0);
    const { revisionId } = await makeDesign({ input: shallow });
    const reason = "Hole is socketed into sound sandstone; checked by hand as a rock socket.";
    await approve(revisionId, { overrides: failing.map((c) => ({ checkId: c.id, reason })) });
    const { text } = await pdfText(await download(DESIGNER, revisionId), "overrides");
    expect(text).toMatch(/APPROVED ALTHOUGH (A CHECK FAILS|\d CHECKS FAIL)/);
    for (const c of failing) expect(text).toContain(`${c.title} (ratio ${c.ratio.toFixed(2)}): ${reason}`);
  });

  it("keeps the approved project name, address and state after the project is edited", async () => {
    const { projectId, revisionId } = await makeDesign({ projectName: "Pinned facts ranch (invented)" });
    await approve(revisionId);
    await actAs(DESIGNER);
    expect((await patchProject(jsonRequest("PATCH", "/x", { name: "Renamed later", address: "5 Moved Road, Elsewhere, TX", state: "TX" }), params({ projectId }))).status).toBe(200);
    const { text } = await pdfText(await download(DESIGNER, revisionId));
    expect(text).toContain("Pinned facts ranch (invented) (as approved)");
    expect(text).toContain("1 Test Lane (invented), CO");
    expect(text).not.toContain("Renamed later");
    expect(text).not.toContain("Moved Road");
  });

  it("says NOT APPROVED on a draft, on every page", async () => {
    const { revisionId } = await makeDesign();
    const { text, pages } = await pdfText(await download(DESIGNER, revisionId), "draft");
    expect(text).toContain("Status Draft");
    expect(text).toContain("NOT APPROVED: not for construction.");
    pages.forEach((page, i) => expect(page, `page ${i + 1}`).toContain("NOT APPROVED"));
  });

  it("is for members of the revision's organisation", async () => {
    const { revisionId } = await makeDesign();
    expect((await download(null, revisionId)).status).toBe(401);
    expect((await download(OUTSIDER, revisionId)).status).toBe(404);
    expect((await download(DESIGNER, "00000000-0000-4000-8000-000000000000")).status).toBe(404);
  });
});
