/**
 * A readable text summary of a design result, for the command line and plain-text reports.
 */
import type { DesignResult } from "./types";

const f = (x: number, d = 1) => x.toFixed(d);

export function formatSummary(r: DesignResult): string {
  const g = r.geometry, ft = r.footing, v = r.wind.velocity;
  const lines = [
    `Pierwise engine ${r.engineVersion}${r.projectName ? ` — ${r.projectName}` : ""}`,
    `CAUTION: ${r.caution}`,
    "",
    `Array ${g.moduleCount} modules, ${f(g.widthFt, 2)} ft wide × ${f(g.slopeLengthFt, 2)} ft up the slope at ${g.tiltDeg}°, facing ${r.input.array.azimuthDeg}° from north`,
    `  lowest edge ${f(g.lowestEdgeFt * 12)} in, highest ${f(g.highestEdgeFt * 12)} in, mean height ${f(g.meanHeightFt, 2)} ft, h/L ${f(g.hOverL, 2)}`,
    `  ${g.posts.length} posts at ${f(g.spacingFt, 2)} ft, ${ft.post.size} in std pipe; heights above own grade: ${g.posts.map((p) => `${p.id} ${f(p.heightAboveGradeFt * 12)} in`).join(", ")}`,
    `Wind ${r.references.asce}: Kz ${f(v.kz, 2)} Kzt ${f(v.kzt, 2)} Ke ${f(v.ke, 3)} Kd ${v.kd} → qz ${f(v.qzPsf, 2)} psf (${r.methodNote})`,
    ...r.wind.cases.map((c) => `  ${c.label}: CNW ${f(c.cnWindward, 2)} CNL ${f(c.cnLeeward, 2)} → normal force ${f(c.normalForceLb, 0)} lb`),
    `Snow pf ${f(r.snow.pfPsf, 2)} psf, Cs ${f(r.snow.cs, 3)}, design ${f(r.snow.designPsf, 2)} psf on plan`,
    "",
    `Footing: ${ft.diameterIn} in hole (${ft.diameterMode}) × ${ft.depthIn} in deep (${f(ft.depthFt, 2)} ft, ${ft.depthMode}); controlling check: ${ft.controllingCheck}`,
    ...ft.checks.map((c) => `  ${c.pass ? "ok  " : "FAIL"} ${c.title}: ${f(c.demand, 2)} / ${f(c.capacity, 2)} ${c.unit} = ${f(c.ratio, 2)}${c.governing ? ` [${c.governing.postId}, ${c.governing.combination}]` : ""}`),
    `Concrete per hole ${f(ft.depthIn > 0 ? r.concrete.perHole.volumeFt3 : 0, 2)} ft³ (${f(r.concrete.perHole.volumeYd3, 3)} yd³, ${f(r.concrete.perHole.weightLb, 0)} lb, ${r.concrete.perHole.bags80Lb} × 80 lb bags)`,
    `Job: ${f(r.concrete.job.totalYd3, 2)} yd³ + ${r.concrete.job.wasteAllowancePct}% → order ${r.concrete.job.orderYd3} yd³ or ${r.concrete.job.bags80Lb} × 80 lb bags`,
    "",
    "Diameter sweep: " + r.options.diameterSweep.map((s) => `${s.diameterIn} in → ${s.depthIn} in${s.allChecksPass ? "" : " (fails a check)"}`).join("; "),
    ...(r.options.tiltEnvelope ? [`Tilt envelope: governing tilt ${r.options.tiltEnvelope.governingTiltDeg}° (${r.options.tiltEnvelope.rows.map((t) => `${t.tiltDeg}° → ${t.requiredDepthIn} in`).join(", ")})`] : []),
    "",
    "Warnings:",
    ...(r.warnings.length ? r.warnings.map((w) => `  [${w.code}] ${w.message}`) : ["  none"]),
    "Sections used:",
    ...r.references.sections.map((s) => `  ${s}`),
    "Site cautions:",
    ...r.cautions.map((c) => `  - ${c}`),
  ];
  return lines.join("\n");
}
