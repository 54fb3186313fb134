/**
 * The calculation report as a PDF (pdfkit, built-in Helvetica). The defer-to-code statement and
 * the page number are drawn on every page after the content is laid out.
 */
import PDFDocument from "pdfkit";
import { DEFER_TO_CODE, SITE_CAUTIONS } from "@/engine";
import type { RevisionContext } from "@/db/queries/reviews";
import { checksTable, concreteLines, criteriaTable, fmt, governingLines, inputsTable, loadsTable, methodLines, windTable, type Table } from "./report-model";
import type { Standing } from "./standing";

// The built-in fonts speak Windows-1252 only: spell out the few symbols the engine's words use.
const SPELLED: Record<string, string> = { "≥": ">=", "≤": "<=", "Ω": "Omega", "→": "->", "≈": "~", "π": "pi", "−": "-", "√": "sqrt", "φ": "phi", "Δ": "delta", "θ": "theta", "°": "°" };
export function pdfSafe(text: string): string {
  return text.replace(/[^\x00-\xff–—‘’“”•…€™]/g, (c) => SPELLED[c] ?? "?");
}

const MARGIN = 48;
const FOOTER_HEIGHT = 64;

export async function renderReportPdf(ctx: RevisionContext, standing: Standing, generatedAt = new Date()): Promise<Buffer> {
  const doc = new PDFDocument({
    size: "LETTER",
    margins: { top: MARGIN, left: MARGIN, right: MARGIN, bottom: MARGIN + FOOTER_HEIGHT },
    bufferPages: true,
    info: { Title: pdfSafe(`Calculation report: ${ctx.projectName}, ${ctx.designName}, revision ${ctx.number}`), Author: "Pierwise" },
  });
  const chunks: Buffer[] = [];
  doc.on("data", (c: Buffer) => chunks.push(c));
  const done = new Promise<void>((resolve) => doc.on("end", () => resolve()));
  const width = doc.page.width - 2 * MARGIN;
  const r = ctx.result;

  const heading = (text: string) => {
    if (doc.y > doc.page.height - doc.page.margins.bottom - 60) doc.addPage();
    doc.moveDown(0.6).font("Helvetica-Bold").fontSize(12).fillColor("#0f3d3a").text(pdfSafe(text), MARGIN, doc.y, { width }).moveDown(0.2);
    doc.font("Helvetica").fontSize(9).fillColor("black");
  };
  const line = (text: string, options: { bold?: boolean } = {}) => {
    doc.font(options.bold ? "Helvetica-Bold" : "Helvetica").fontSize(9).text(pdfSafe(text), MARGIN, doc.y, { width });
  };
  const table = (t: Table, widths: number[]) => {
    heading(t.title);
    if (t.note) line(t.note);
    const total = widths.reduce((a, b) => a + b, 0);
    const cols = widths.map((w) => (w / total) * width);
    const row = (cells: string[], bold: boolean) => {
      doc.font(bold ? "Helvetica-Bold" : "Helvetica").fontSize(8);
      const h = Math.max(...cells.map((c, i) => doc.heightOfString(pdfSafe(c), { width: cols[i] - 4 })));
      if (doc.y + h > doc.page.height - doc.page.margins.bottom) doc.addPage();
      const y = doc.y;
      let x = MARGIN;
      cells.forEach((c, i) => {
        doc.text(pdfSafe(c), x, y, { width: cols[i] - 4 });
        x += cols[i];
      });
      doc.y = y + h + 2;
    };
    row(t.columns, true);
    for (const cells of t.rows) row(cells, false);
    doc.font("Helvetica").fontSize(9);
  };

  doc.font("Helvetica-Bold").fontSize(16).text("Pierwise calculation report", MARGIN, MARGIN);
  doc.font("Helvetica").fontSize(10).text(pdfSafe(`${ctx.projectName} (${ctx.projectState})${ctx.projectAddress ? `, ${ctx.projectAddress}` : ""}`));
  doc.text(pdfSafe(`Design "${ctx.designName}", revision ${ctx.number}`));
  doc.fontSize(8).text(`Revision id ${ctx.id}`).text(`Content hash ${ctx.contentHash}`);
  doc.text(pdfSafe(`Saved ${ctx.createdAt.toISOString()} by ${ctx.authorName ?? "unknown"}; engine ${ctx.engineVersion}; report generated ${generatedAt.toISOString()}`));

  heading(`Status: ${standing.label}`);
  if (standing.supersededBy) line(`Superseded by revision ${standing.supersededBy.number}: do not build from this revision.`, { bold: true });
  for (const h of standing.holds) line(`ON HOLD since ${h.raisedAt.toISOString()} (raised by ${h.raisedByName}): ${h.reason}`, { bold: true });
  if (standing.approval) {
    const a = standing.approval;
    line(`Approved by ${a.engineerName}, licence ${a.licenceNumber} (${a.licenceState}), on ${a.decidedAt?.toISOString()}.${a.letterFileKey ? " Signed letter on file." : ""}`, { bold: true });
  } else if (ctx.status !== "approved") {
    line("Not approved: not for construction.", { bold: true });
  }
  for (const rv of standing.reviews) {
    const what = rv.decision === "approve" ? "approved" : rv.decision === "request_changes" ? "requested changes" : "not yet decided";
    line(`Submitted ${rv.submittedAt.toISOString()} by ${rv.submittedByName} to ${rv.engineerChosenName}: ${what}${rv.decidedAt ? ` on ${rv.decidedAt.toISOString()} by ${rv.engineerName}` : ""}.`);
    for (const c of rv.comments) line(`    Comment${c.fieldPath ? ` on ${c.fieldPath}` : ""}: ${c.body}`);
  }

  table(criteriaTable(ctx), [3, 2, 4, 1.4]);
  table(inputsTable(ctx), [3, 4]);
  heading("Method, editions and sections used");
  for (const m of methodLines(r)) line(`• ${m}`);
  table(windTable(r), [2.4, 1, 1, 1.1, 1.1, 1.2, 1.2, 1.2]);
  heading("Governing loads");
  for (const g of governingLines(r)) line(g);
  table(loadsTable(r), [0.8, 3, 1, 1.2, 1.2, 1.2]);
  table(checksTable(r), [2.4, 1, 1, 0.7, 0.7, 0.8, 3]);
  heading("Field dimensions per post");
  for (const p of r.field.posts) line(`Post ${p.id}: ${fmt(p.heightAboveGradeIn)} in above grade + ${fmt(p.embedmentIn)} in embedded = ${fmt(p.postLengthIn)} in post; hole ${fmt(r.footing.diameterIn)} in diameter × ${fmt(r.footing.depthIn)} in deep`);
  line(`Lowest-edge clearance ${fmt(r.geometry.minClearanceIn)} in at ${fmt(r.geometry.tiltDeg)}° tilt. ${r.field.note}`);
  heading("Concrete");
  for (const c of concreteLines(r)) line(c);
  heading("Warnings");
  if (r.warnings.length === 0) line("None: no method limit is crossed.");
  for (const w of r.warnings) line(`[${w.severity}] ${w.message} (${w.code})`);
  heading("Cautions");
  for (const c of SITE_CAUTIONS) line(`• ${c}`);

  // Every page: the defer-to-code statement and "page i of n", drawn in the reserved bottom band.
  const range = doc.bufferedPageRange();
  for (let i = range.start; i < range.start + range.count; i++) {
    doc.switchToPage(i);
    const bottom = doc.page.margins.bottom;
    doc.page.margins.bottom = 0;
    const top = doc.page.height - MARGIN - FOOTER_HEIGHT + 8;
    doc.moveTo(MARGIN, top - 4).lineTo(doc.page.width - MARGIN, top - 4).strokeColor("#b45309").stroke();
    doc.font("Helvetica-Bold").fontSize(8).fillColor("#78350f").text(pdfSafe(`Caution: ${DEFER_TO_CODE}`), MARGIN, top, { width });
    doc.font("Helvetica").fontSize(8).fillColor("black")
      .text(pdfSafe(`${ctx.projectName} · ${ctx.designName} · revision ${ctx.number} · ${standing.label}`), MARGIN, doc.page.height - MARGIN - 10, { width: width - 80 })
      .text(`Page ${i - range.start + 1} of ${range.count}`, doc.page.width - MARGIN - 80, doc.page.height - MARGIN - 10, { width: 80, align: "right" });
    doc.page.margins.bottom = bottom;
  }
  doc.end();
  await done;
  return Buffer.concat(chunks);
}
