/**
 * The side elevation in the report, drawn to a stated scale from the same geometry as the 2D
 * elevation on screen (components/preview/elevation-mapping.ts): grade, the panel at its tilt, the
 * governing post and its footing, with clearance, embedment, hole diameter, post height and tilt
 * dimensioned. Units in: feet (engine) → points at 72 pt per inch of paper.
 */
import type PDFKit from "pdfkit";
import type { DesignResult } from "@/engine";
import { sideElevation, type Pt } from "@/components/preview/elevation-mapping";
import type { UnitSystem } from "@/components/format/quantity";
import { formatQuantity } from "@/components/format/quantity";
import { tapeLength } from "@/components/format/tape";

/** Architect's scales, feet of the real thing per inch of paper. */
const SCALES_FT_PER_IN = [1, 2, 3, 4, 5, 6, 8, 10, 12, 16, 20, 24, 32, 40];

export function drawElevation(doc: PDFKit.PDFDocument, r: DesignResult, box: { x: number; y: number; width: number; height: number }, font: { regular: string; bold: string }, units: UnitSystem = "imperial"): void {
  const ftIn = (inches: number) => tapeLength(inches, units);
  const e = sideElevation(r.geometryPreview);
  const [vx, vy, vw, vh] = e.viewBox;
  const ftPerIn = SCALES_FT_PER_IN.find((s) => (vw / s) * 72 <= box.width && (vh / s) * 72 <= box.height - 24) ?? SCALES_FT_PER_IN.at(-1)!;
  const k = 72 / ftPerIn; // points per foot
  const ox = box.x + (box.width - vw * k) / 2;
  const oy = box.y;
  const P = (p: Pt): [number, number] => [ox + (p[0] - vx) * k, oy + (p[1] - vy) * k];

  doc.save();
  // Ground in front (solid) and behind (dashed), soil hatched lightly below the near edge.
  const [g0, g1] = [P(e.groundNear[0]), P(e.groundNear[1])];
  doc.polygon(g0, g1, [g1[0], oy + vh * k], [g0[0], oy + vh * k]).fillOpacity(0.25).fill("#a8a29e").fillOpacity(1);
  doc.moveTo(...P(e.groundFar[0])).lineTo(...P(e.groundFar[1])).dash(4, { space: 3 }).lineWidth(0.8).stroke("#57534e").undash();
  doc.moveTo(...g0).lineTo(...g1).lineWidth(1.6).stroke("#44403c");
  // Footing and post.
  const rect = (r0: { x: number; y: number; width: number; height: number }) => {
    const [x, y] = P([r0.x, r0.y]);
    return [x, y, r0.width * k, r0.height * k] as const;
  };
  doc.rect(...rect(e.footing)).fillAndStroke("#d6d3d1", "#57534e");
  doc.rect(...rect(e.post)).fill("#475569");
  // Panels at their tilt, and the beam.
  for (const [a, b] of e.panels) doc.moveTo(...P(a)).lineTo(...P(b)).lineWidth(3).stroke("#1e3a8a");
  doc.circle(...P(e.beam), 2.5).fill("#0f172a");

  doc.lineWidth(0.7).font(font.regular).fontSize(7.5).fillColor("#0f172a");
  const dim = (from: [number, number], to: [number, number], label: string, colour: string, side: "left" | "right" | "below") => {
    doc.moveTo(...from).lineTo(...to).stroke(colour);
    const tick = (p: [number, number]) => (side === "below" ? doc.moveTo(p[0], p[1] - 3).lineTo(p[0], p[1] + 3) : doc.moveTo(p[0] - 3, p[1]).lineTo(p[0] + 3, p[1])).stroke(colour);
    tick(from);
    tick(to);
    const mx = (from[0] + to[0]) / 2, my = (from[1] + to[1]) / 2;
    doc.fillColor(colour);
    if (side === "left") doc.text(label, mx - 164, my - 4, { width: 160, align: "right" });
    else if (side === "right") doc.text(label, mx + 4, my - 4, { width: 160 });
    else doc.text(label, mx - 80, my + 4, { width: 160, align: "center" });
    doc.fillColor("#0f172a");
  };
  dim(P(e.clearance.from), P(e.clearance.to), `Lowest-edge clearance ${ftIn(r.geometry.minClearanceIn)}`, "#b45309", "left");
  dim(P(e.embedment.from), P(e.embedment.to), `Embedment ${ftIn(r.footing.depthIn)}`, "#7c2d12", "left");
  const fb = rect(e.footing);
  dim([fb[0], fb[1] + fb[3] + 6], [fb[0] + fb[2], fb[1] + fb[3] + 6], `Hole ${ftIn(r.footing.diameterIn)} diameter`, "#57534e", "below");
  const pr = rect(e.post);
  const post = r.field.posts.find((p) => p.id === r.geometryPreview.dimensions.embedment.postId) ?? r.field.posts[0];
  if (post) dim([pr[0] + pr[2] + 6, pr[1]], [pr[0] + pr[2] + 6, fb[1]], `Post ${ftIn(post.heightAboveGradeIn)} above grade`, "#334155", "right");
  // Tilt: the angle between the panel and the horizontal, at the panel's low edge.
  const first = e.panels[0];
  if (first) {
    const lo = P(first[0]);
    doc.moveTo(...lo).lineTo(lo[0] + 40, lo[1]).dash(2, { space: 2 }).stroke("#1e3a8a").undash();
    doc.fillColor("#1e3a8a").text(`Tilt ${Number(r.geometry.tiltDeg.toFixed(1))}°`, lo[0] + 8, lo[1] + 3, { width: 80 });
  }
  doc.fillColor("#44403c").text("Grade", g1[0] - 60, g1[1] - 12, { width: 56, align: "right" });
  doc.text("Front (low edge)", g0[0] + 4, oy + vh * k - 12, { width: 100 });

  // Scale bar: 5 ft (or 10 ft at small scales).
  const barFt = ftPerIn >= 10 ? 10 : 5;
  const bx = box.x, by = Math.min(oy + vh * k + 16, box.y + box.height - 10);
  doc.rect(bx, by, barFt * k, 3).fill("#0f172a");
  doc.fillColor("#0f172a").font(font.bold).text(units === "imperial" ? `Scale 1 in = ${ftPerIn} ft   (bar ${barFt} ft)` : `Scale 1:${ftPerIn * 12}   (bar ${formatQuantity(barFt, "ft", units)})`, bx + barFt * k + 8, by - 4, { width: 260 });
  doc.restore();
  doc.font(font.regular).fillColor("black");
}
