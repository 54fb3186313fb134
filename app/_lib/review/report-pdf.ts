/**
 * The calculation report as an engineering document (pdfkit, Inter embedded so γ, ², ³, ≤, ×, °
 * and ½ print): cover block, a one-page summary, the elevation to scale, inputs by label with
 * units, criteria sources, the method with numbers substituted, the tables, cautions. Every page
 * carries the defer-to-code caution, "page n of N", the revision id and (once approved) the QR code
 * and short link of the public approval check; an unapproved revision says NOT APPROVED across
 * every page.
 */
import PDFDocument from "pdfkit";
import QRCode from "qrcode";
import { DEFER_TO_CODE } from "@/engine";
import { SITE_CAUTION_TEXTS } from "@/engine/notices";
import { formatFootingSize, formatPipeSize, formatQuantity, type UnitSystem } from "@/components/format/quantity";
import { checkTitleIn, composedIn, sayIn, storedIn, warningIn } from "@/components/format/quantity-text";
import { formatRatio, ratioWithVerdict } from "@/components/format/ratio";
import { fieldLabel } from "@/engine/field-labels";
import type { RevisionContext } from "@/db/queries/reviews";
import { checkOutcome } from "@/components/review/check-outcome";
import { calendarDateInWords, dateInWords, dateTimeInWords } from "@/components/ui/dates";
import { drawElevation } from "./report-drawing";
import { reportFont } from "./report-fonts";
import { methodSteps } from "./report-method";
import { checksTable, concreteLines, criterionValue, governingLines, loadsTable, windTable, type Table } from "./report-model";
import { inputGroups, userText } from "./report-text";
import type { Standing } from "./standing";
import { verifyUrl } from "./verify";

const F = { regular: "Inter", bold: "Inter-SemiBold" };

const MARGIN = 48;
const FOOTER_HEIGHT = 78;
const INK = "#0f172a", ACCENT = "#0f3d3a", BAD = "#b91c1c";

const CRITERIA_LABELS: Record<string, string> = {
  buildingCode: "Building code", asceEdition: "ASCE 7 edition", riskCategory: "Risk category", windSpeedMph: "Basic wind speed",
  exposure: "Exposure category", groundSnowPsf: "Ground snow load", frostDepthIn: "Frost depth", soilClass: "Presumptive soil class (IBC Table 1806.2)",
};
/** `units`: the reader's unit system; every number and unit word of the report follows it. */
export async function renderReportPdf(ctx: RevisionContext, standing: Standing, generatedAt = new Date(), units: UnitSystem = "imperial"): Promise<Buffer> {
  const doc = new PDFDocument({
    size: "LETTER",
    margins: { top: MARGIN, left: MARGIN, right: MARGIN, bottom: MARGIN + FOOTER_HEIGHT },
    bufferPages: true,
    info: { Title: `Calculation report: ${ctx.projectName}, ${ctx.designName}, revision ${ctx.number}`, Author: "Pierwise" },
  });
  doc.registerFont(F.regular, reportFont("Inter-Regular"));
  doc.registerFont(F.bold, reportFont("Inter-SemiBold"));
  const chunks: Buffer[] = [];
  doc.on("data", (c: Buffer) => chunks.push(c));
  const done = new Promise<void>((resolve) => doc.on("end", () => resolve()));
  const width = doc.page.width - 2 * MARGIN;
  const bottom = () => doc.page.height - doc.page.margins.bottom;
  const r = ctx.result;
  const tz = ctx.timeZone;
  const a = standing.approval;
  const outcome = checkOutcome(r);
  const approved = ctx.status === "approved" && a;
  const len = (inches: number) => formatQuantity(inches, "in", units, { decimals: 2 });

  const heading = (text: string, size = 12) => {
    if (doc.y > bottom() - 60) doc.addPage();
    doc.moveDown(0.6).font(F.bold).fontSize(size).fillColor(ACCENT).text(text, MARGIN, doc.y, { width }).moveDown(0.2);
    doc.font(F.regular).fontSize(9).fillColor(INK);
  };
  const line = (text: string, o: { bold?: boolean; colour?: string; size?: number; indent?: number } = {}) => {
    doc.font(o.bold ? F.bold : F.regular).fontSize(o.size ?? 9).fillColor(o.colour ?? INK).text(userText(text), MARGIN + (o.indent ?? 0), doc.y, { width: width - (o.indent ?? 0) });
    doc.fillColor(INK);
  };
  const table = (t: Table | { title: string; columns: string[]; rows: string[][]; note?: string }, widths: number[], o: { redWhen?: (row: string[]) => boolean } = {}) => {
    heading(t.title);
    if (t.note) line(t.note);
    const total = widths.reduce((x, y) => x + y, 0);
    const cols = widths.map((w) => (w / total) * width);
    const row = (cells: string[], bold: boolean, colour = INK) => {
      doc.font(bold ? F.bold : F.regular).fontSize(8);
      const texts = cells.map(userText);
      const h = Math.max(...texts.map((c, i) => doc.heightOfString(c, { width: cols[i] - 4 })));
      if (doc.y + h > bottom()) doc.addPage();
      const y = doc.y;
      let x = MARGIN;
      texts.forEach((c, i) => {
        doc.fillColor(colour).text(c, x, y, { width: cols[i] - 4 });
        x += cols[i];
      });
      doc.moveTo(MARGIN, y + h + 1).lineTo(MARGIN + width, y + h + 1).lineWidth(0.3).stroke("#cbd5e1");
      doc.y = y + h + 3;
    };
    row(t.columns, true);
    for (const cells of t.rows) row(cells, false, o.redWhen?.(cells) ? BAD : INK);
    doc.font(F.regular).fontSize(9).fillColor(INK);
  };
  const pairs = (rows: [string, string][], labelWidth = 150, o: { boldValues?: boolean } = {}) => {
    for (const [k, v] of rows) {
      doc.font(F.regular).fontSize(9);
      const h = Math.max(doc.heightOfString(userText(k), { width: labelWidth - 6 }), doc.heightOfString(userText(v), { width: width - labelWidth }));
      if (doc.y + h > bottom()) doc.addPage();
      const y = doc.y;
      doc.fillColor("#475569").text(userText(k), MARGIN, y, { width: labelWidth - 6 });
      doc.font(o.boldValues ? F.bold : F.regular).fillColor(INK).text(userText(v), MARGIN + labelWidth, y, { width: width - labelWidth });
      doc.y = y + h + 2;
    }
  };

  // ── Cover block ────────────────────────────────────────────────────────────────────────────
  doc.font(F.bold).fontSize(17).fillColor(ACCENT).text("Calculation report: preliminary footing sizing", MARGIN, MARGIN, { width });
  doc.font(F.regular).fontSize(10).fillColor(INK).text("Wind loads and concrete post footings of a ground-mounted fixed-tilt solar array", { width }).moveDown(0.5);
  pairs([
    ["Project", `${ctx.projectName}${ctx.factsPinned ? " (as approved)" : ""}`],
    ["Site", [ctx.projectAddress, ctx.projectState].filter(Boolean).join(", ")],
    ["Design", ctx.designName],
    ["Revision", `${ctx.number}, saved by ${ctx.authorName ?? "unknown"} on ${dateTimeInWords(ctx.createdAt, tz)}`],
    ["Content hash", ctx.contentHash],
    ["Status", `${standing.label}${standing.holds.length ? ", ON HOLD" : ""}`],
    ["Contractor", ctx.organisationName],
  ]);
  if (approved) {
    pairs([
      ["Approved by", `${a.engineerName}, licence ${a.licenceNumber} (${a.licenceState}), valid through ${calendarDateInWords(a.licenceExpiresOn)}`],
      ["Approved on", dateTimeInWords(a.decidedAt, tz)],
      ["Approval check", a.verifyCode ? verifyUrl(a.verifyCode) : "—"],
    ], 150, { boldValues: true });
    if (a.overrides.length) {
      doc.moveDown(0.3);
      line(`APPROVED ALTHOUGH ${a.overrides.length === 1 ? "A CHECK FAILS" : `${a.overrides.length} CHECKS FAIL`}: the engineer's reasons`, { bold: true, colour: BAD, size: 10 });
      for (const o of a.overrides) line(`${checkTitleIn(o, units)} (ratio ${formatRatio(o.ratio)}): ${o.reason}`, { colour: BAD, indent: 10 });
    }
  } else {
    doc.moveDown(0.3);
    line("NOT APPROVED: not for construction. A licensed engineer has not approved this revision.", { bold: true, colour: BAD, size: 11 });
  }
  if (standing.supersededBy) line(`Superseded by revision ${standing.supersededBy.number}: do not build from this revision.`, { bold: true, colour: BAD });
  for (const h of standing.holds) line(`ON HOLD since ${dateTimeInWords(h.raisedAt, tz)} (raised by ${h.raisedByName}): ${composedIn(h.reason, units)}`, { bold: true, colour: BAD });
  line(`Report generated ${dateTimeInWords(generatedAt, tz)}; calculation engine ${ctx.engineVersion}.`, { colour: "#475569", size: 8 });

  // ── Summary ────────────────────────────────────────────────────────────────────────────────
  heading("Summary", 14);
  line(`Every post: hole ${formatFootingSize(r.footing.diameterIn, r.footing.depthIn, units)}, ${formatPipeSize(r.footing.post.size, units)} post (${outcome.posts} posts). Depth set by ${r.footing.controllingCheck === "lateral" ? "lateral embedment" : r.footing.controllingCheck === "uplift" ? "uplift" : "frost and minimum depth"}.`, { bold: true, size: 10 });
  table({ title: "Footing per post", columns: ["Post", "Hole", "Above grade", "Below grade", "Post length"], rows: r.field.posts.map((p) => [p.id, `${len(r.footing.diameterIn)} × ${len(p.embedmentIn)}`, len(p.heightAboveGradeIn), len(p.embedmentIn), len(p.postLengthIn)]) }, [1, 2, 1.4, 1.4, 1.4]);
  heading("Concrete to order");
  for (const c of concreteLines(r, units)) line(c);
  table({ title: "Checks, governing first", columns: ["Check", "Ratio", "Result"], rows: [...r.footing.checks].sort((x, y) => y.ratio - x.ratio).map((c) => [checkTitleIn(c, units), ratioWithVerdict(c.ratio), c.pass ? "passes (≤ 1.00)" : "FAILS (> 1.00)"]) }, [4, 1, 2], { redWhen: (row) => row[2].startsWith("FAILS") });
  heading(`Warnings (${r.warnings.length})`);
  if (r.warnings.length === 0) line("None: no method limit is crossed.");
  for (const w of r.warnings) line(`${w.severity === "warning" ? "Warning" : "Note"}: ${warningIn(w, units)}`);

  // ── Elevation ──────────────────────────────────────────────────────────────────────────────
  doc.addPage();
  heading("Side elevation of the governing post (to scale)", 14);
  line("Looking along the array from its right end; the front (low edge) is on the left. Drawn from the same geometry as the elevation on screen.");
  drawElevation(doc, r, { x: MARGIN, y: doc.y + 10, width, height: bottom() - doc.y - 20 }, F, units);

  // ── Inputs and criteria ────────────────────────────────────────────────────────────────────
  doc.addPage();
  heading("Inputs of this revision", 14);
  for (const g of inputGroups(ctx.input, units)) {
    heading(g.title, 11);
    pairs(g.rows, 190);
  }
  if (ctx.criteria) {
    const c = ctx.criteria;
    table({
      title: `Design criteria card: ${c.jurisdiction} (${c.state})`,
      columns: ["Criterion", "Value", "Source", "Checked on"],
      rows: Object.entries(c.values).map(([key, value]) => {
        const src = (c.sources[key] ?? {}) as { source?: string; checkedOn?: string };
        return [CRITERIA_LABELS[key] ?? key, criterionValue(key, value, units), src.source ?? "no source given", src.checkedOn ? calendarDateInWords(src.checkedOn) : "—"];
      }),
    }, [2.6, 1.2, 4, 1.6]);
  } else {
    heading("Design criteria card");
    line("No criteria card is applied to this project: the site values above were entered by the designer.");
  }

  // ── Method ─────────────────────────────────────────────────────────────────────────────────
  heading("Method, with the governing case's numbers", 14);
  line(`${r.references.asce}; ${r.references.ibc}; ${r.references.aisc}. ${r.wind.method}`);
  // In metric the steps are in SI (report-method.ts): the velocity pressure in its SI form, the
  // other equations as they stand (dimensionally consistent).
  if (units === "metric") line("The steps below are in SI units: kN, m, kPa and MPa. The velocity pressure uses the equation's SI form (0.613, for N/m² with V in m/s); the other equations hold in any consistent units.", { colour: "#475569", size: 8 });
  for (const s of methodSteps(r, units)) {
    heading(s.title, 10);
    line(`Source: ${s.source}`, { colour: "#475569", size: 8 });
    for (const l of s.lines) line(l, { indent: 10 });
  }
  heading("Sections used");
  for (const s of r.references.sections) line(`• ${storedIn(s, units)}`);

  // ── Tables ─────────────────────────────────────────────────────────────────────────────────
  table(windTable(r, units), [2.4, 1, 1, 1.1, 1.1, 1.2, 1.2, 1.2]);
  heading("Governing loads");
  for (const g of governingLines(r, units)) line(g);
  table(loadsTable(r, units), [0.8, 3, 1, 1.2, 1.2, 1.2]);
  table(checksTable(r, units), [2.4, 1, 1, 0.7, 0.7, 0.8, 3], { redWhen: (row) => row[5] === "FAILS" });

  // ── Review record and cautions ─────────────────────────────────────────────────────────────
  heading("Review record");
  if (standing.reviews.length === 0) line("Not submitted for review.");
  for (const rv of standing.reviews) {
    const what = rv.decision === "approve" ? "approved" : rv.decision === "request_changes" ? "requested changes" : "not yet decided";
    line(`Submitted ${dateInWords(rv.submittedAt, tz)} by ${rv.submittedByName} to ${rv.engineerChosenName}: ${what}${rv.decidedAt ? ` on ${dateInWords(rv.decidedAt, tz)} by ${rv.engineerName}` : ""}.`.replace(/\.\.$/, "."));
    for (const c of rv.comments) line(`Comment${c.fieldPath ? ` on ${fieldLabel(c.fieldPath)}` : ""}: ${c.body}`, { indent: 10 });
  }
  heading("Cautions");
  line(DEFER_TO_CODE, { bold: true });
  for (const c of SITE_CAUTION_TEXTS) line(`• ${sayIn(c, units)}`);

  // ── Every page: watermark, caution, page n of N, revision id, approval check QR ────────────
  const qr = approved && a.verifyCode ? QRCode.create(verifyUrl(a.verifyCode), { errorCorrectionLevel: "M" }) : null;
  const range = doc.bufferedPageRange();
  for (let i = range.start; i < range.start + range.count; i++) {
    doc.switchToPage(i);
    const keep = doc.page.margins.bottom;
    doc.page.margins.bottom = 0;
    if (!approved) {
      doc.save().rotate(-35, { origin: [doc.page.width / 2, doc.page.height / 2] }).font(F.bold).fontSize(64).fillColor(BAD).fillOpacity(0.12)
        .text("NOT APPROVED", 0, doc.page.height / 2 - 40, { width: doc.page.width, align: "center", lineBreak: false }).restore();
      doc.fillOpacity(1);
    }
    const top = doc.page.height - MARGIN - FOOTER_HEIGHT + 8;
    const textWidth = width - (qr ? 70 : 0);
    doc.moveTo(MARGIN, top - 4).lineTo(doc.page.width - MARGIN, top - 4).lineWidth(0.8).stroke("#b45309");
    doc.font(F.bold).fontSize(7.5).fillColor("#78350f").text(`Caution: ${DEFER_TO_CODE}`, MARGIN, top, { width: textWidth });
    doc.font(F.regular).fontSize(7.5).fillColor(INK)
      .text(`${ctx.projectName} · ${ctx.designName} · revision ${ctx.number} · ${approved ? standing.label : "NOT APPROVED"}`, MARGIN, doc.page.height - MARGIN - 32, { width: textWidth - 70, lineBreak: false })
      .text(`Revision id ${ctx.id}`, MARGIN, doc.page.height - MARGIN - 22, { width: textWidth - 70, lineBreak: false });
    if (qr) doc.text(`Approval check: ${verifyUrl(a!.verifyCode!)}`, MARGIN, doc.page.height - MARGIN - 12, { width: textWidth - 70, lineBreak: false });
    doc.font(F.bold).text(`Page ${i - range.start + 1} of ${range.count}`, MARGIN + textWidth - 70, doc.page.height - MARGIN - 12, { width: 70, align: "right" });
    if (qr) drawQr(doc, qr.modules, doc.page.width - MARGIN - 60, top - 2, 60);
    doc.page.margins.bottom = keep;
  }
  doc.end();
  await done;
  return Buffer.concat(chunks);
}

/** The QR code as vector squares (crisp at any print size). */
function drawQr(doc: PDFKit.PDFDocument, modules: { size: number; get: (r: number, c: number) => number | boolean }, x: number, y: number, size: number): void {
  const cell = size / modules.size;
  doc.save().fillColor("black");
  for (let r = 0; r < modules.size; r++) for (let c = 0; c < modules.size; c++) if (modules.get(r, c)) doc.rect(x + c * cell, y + r * cell, cell, cell);
  doc.fill().restore();
}
