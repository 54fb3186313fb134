/**
 * The calculation report, parsed back with pdf-parse: revision id, status and approval record,
 * footing depth, the checks, and the defer-to-code caution with a page number on every page.
 */
import { PDFParse } from "pdf-parse";
import { describe, expect, it } from "vitest";
import { GET } from "@/app/api/revisions/[revisionId]/report.pdf/route";
import { POST as review } from "@/app/api/revisions/[revisionId]/review/route";
import { POST as submit } from "@/app/api/revisions/[revisionId]/submit/route";
import { db } from "@/db/client";
import { DEFER_TO_CODE } from "@/engine";
import { DEMO_PASSWORD } from "../support/review-fixtures";
import { actAs, jsonRequest, params } from "../support/next-context";
import { DESIGNER, ENGINEER, INSTALLER, OUTSIDER, makeDesign, userId } from "../support/review-fixtures";

async function download(email: string | null, revisionId: string) {
  await actAs(email);
  return GET(jsonRequest("GET", `/api/revisions/${revisionId}/report.pdf`), params({ revisionId }));
}

async function pdfText(res: Response): Promise<{ text: string; pages: string[] }> {
  const parser = new PDFParse({ data: new Uint8Array(await res.arrayBuffer()) });
  const out = await parser.getText();
  await parser.destroy();
  const squash = (s: string) => s.replace(/\s+/g, " ");
  return { text: squash(out.text), pages: out.pages.map((p) => squash(p.text)) };
}

describe("GET /api/revisions/:id/report.pdf", () => {
  it("reports an approved revision with its approval record, footing depth and the caution on every page", async () => {
    const { revisionId } = await makeDesign();
    await actAs(DESIGNER);
    await submit(jsonRequest("POST", "/x", { engineerId: await userId(ENGINEER) }), params({ revisionId }));
    await actAs(ENGINEER);
    await review(jsonRequest("POST", "/x", { decision: "approve", password: DEMO_PASSWORD, comments: [{ fieldPath: "site.exposure", body: "Exposure C confirmed on site visit." }] }), params({ revisionId }));

    const res = await download(INSTALLER, revisionId);
    expect(res.status).toBe(200);
    expect(res.headers.get("content-type")).toBe("application/pdf");
    const { text, pages } = await pdfText(res);
    const result = (await db("revisions").where({ id: revisionId }).first("result")).result;

    expect(text).toContain(`Revision id ${revisionId}`);
    expect(text).toContain("Status: Approved");
    // Demo licence: db/seeds/01_demo_accounts.ts (invented).
    expect(text).toContain("Approved by Eli Engineer, P.E., licence PE-000000-DEMO (CO)");
    expect(text).toContain("Comment on site.exposure: Exposure C confirmed on site visit.");
    expect(text).toContain(`${result.footing.diameterIn} in diameter × ${result.footing.depthIn} in deep`);
    expect(text).toContain("IBC §1807.3.2.1 Eq. 18-1"); // a footing check's source, as the engine names it
    expect(text).toContain("site.windSpeedMph 115"); // an input, the two-post demo design's wind speed
    expect(text).toContain("Call before you dig");
    expect(pages.length).toBeGreaterThan(1);
    pages.forEach((page, i) => {
      expect(page, `page ${i + 1}`).toContain(`Caution: ${DEFER_TO_CODE}`);
      expect(page, `page ${i + 1}`).toContain(`Page ${i + 1} of ${pages.length}`);
    });
  });

  it("says a draft is not approved and not for construction", async () => {
    const { revisionId } = await makeDesign();
    const { text } = await pdfText(await download(DESIGNER, revisionId));
    expect(text).toContain("Status: Draft");
    expect(text).toContain("Not approved: not for construction.");
  });

  it("is for members of the revision's organisation", async () => {
    const { revisionId } = await makeDesign();
    expect((await download(null, revisionId)).status).toBe(401);
    expect((await download(OUTSIDER, revisionId)).status).toBe(404);
    expect((await download(DESIGNER, "00000000-0000-4000-8000-000000000000")).status).toBe(404);
  });
});
