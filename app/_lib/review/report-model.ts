/**
 * What a reviewer reads, as plain tables: shared by the review page and the PDF report so both say
 * the same thing in the same words. Numbers are rounded for reading; units are in the headings.
 */
import type { DesignResult } from "@/engine";
import type { RevisionContext } from "@/db/queries/reviews";
import type { Table } from "@/components/review/plain-table";
import { userText } from "./report-text";

export type { Table };

export function fmt(n: number | null | undefined, digits = 1): string {
  if (n === null || n === undefined || !Number.isFinite(n)) return "—";
  return n.toLocaleString("en-US", { maximumFractionDigits: digits, minimumFractionDigits: 0 });
}

const CRITERIA_LABELS: Record<string, string> = {
  buildingCode: "Building code",
  asceEdition: "ASCE 7 edition",
  riskCategory: "Risk category",
  windSpeedMph: "Basic wind speed (mph)",
  exposure: "Exposure category",
  groundSnowPsf: "Ground snow load (psf)",
  frostDepthIn: "Frost depth (in)",
  soilClass: "Presumptive soil class (IBC Table 1806.2)",
};

export function criteriaTable(ctx: RevisionContext): Table {
  if (!ctx.criteria) return { title: "Design criteria card", columns: ["Criterion", "Value", "Source", "Checked on"], rows: [], note: "No criteria card is applied to this project: the inputs below were entered by the designer." };
  const rows = Object.entries(ctx.criteria.values).map(([key, value]) => {
    const src = (ctx.criteria!.sources[key] ?? {}) as { source?: string; checkedOn?: string };
    return [CRITERIA_LABELS[key] ?? key, String(value), userText(src.source ?? "no source given"), src.checkedOn ?? "—"];
  });
  return { title: `Design criteria card: ${ctx.criteria.jurisdiction} (${ctx.criteria.state})`, columns: ["Criterion", "Value", "Source", "Checked on"], rows };
}

/** Every input as path = value, in the order the input holds them. */
export function inputRows(value: unknown, prefix = ""): [string, string][] {
  if (Array.isArray(value)) return [[prefix, value.join(", ")]];
  if (value === null || typeof value !== "object") return [[prefix, String(value)]];
  return Object.entries(value as Record<string, unknown>).flatMap(([k, v]) => inputRows(v, prefix ? `${prefix}.${k}` : k));
}

export function inputsTable(ctx: RevisionContext): Table {
  return { title: "Inputs (every value of this revision)", columns: ["Input", "Value"], rows: inputRows(ctx.input) };
}

export function methodLines(r: DesignResult): string[] {
  const lines = [`${r.references.asce}; ${r.references.ibc}; ${r.references.aisc}`, r.wind.method, r.methodNote, ...r.references.sections, `Engine version ${r.engineVersion}`];
  return [...new Set(lines)];
}

export function windTable(r: DesignResult): Table {
  const v = r.wind.velocity;
  return {
    title: "Wind cases",
    note: `ASCE ${r.wind.edition}, mean roof height ${fmt(r.wind.heightFt, 2)} ft, Kz ${fmt(v.kz, 3)}, Kzt ${fmt(v.kzt, 3)}, Ke ${fmt(v.ke, 3)}, Kd ${fmt(v.kd, 2)}, qz ${fmt(v.qzPsf, 2)} psf, G ${fmt(r.wind.gustFactor, 2)}`,
    columns: ["Case", "CN windward", "CN leeward", "Windward (psf)", "Leeward (psf)", "Normal force (lb)", "Horizontal (lb)", "Downward (lb)"],
    rows: r.wind.cases.map((c) => [c.label, fmt(c.cnWindward, 2), fmt(c.cnLeeward, 2), fmt(c.windwardPressurePsf, 2), fmt(c.leewardPressurePsf, 2), fmt(c.normalForceLb, 0), fmt(c.horizontalLb, 0), fmt(c.downwardLb, 0)]),
  };
}

export function loadsTable(r: DesignResult): Table {
  return {
    title: `Loads per post at grade (ASD combinations, tilt ${fmt(r.geometry.tiltDeg)}°)`,
    columns: ["Post", "Combination", "Shear (lb)", "Moment (lb-ft)", "Downward (lb)", "Wind uplift (lb)"],
    // Beam reaction factors (continuous-beam share ÷ tributary share), when the result has them.
    note: r.geometry.postLoadSharing ? `${r.geometry.postLoadSharing} Factors: ${r.geometry.posts.map((p) => `${p.id} ${fmt(p.reactionFactor, 3)}`).join(", ")}.` : undefined,
    rows: r.postLoads.flatMap((p) => p.combinations.map((c) => [p.postId, c.combination, fmt(c.shearLb, 0), fmt(c.momentAtGradeLbFt, 0), fmt(c.downwardLb, 0), fmt(c.windUpliftLb, 0)])),
  };
}

export function governingLines(r: DesignResult): string[] {
  const g = r.governingLoads;
  return [
    `Largest shear ${fmt(g.shear.valueLb, 0)} lb (post ${g.shear.postId}, ${g.shear.combination})`,
    `Largest moment ${fmt(g.moment.valueLbFt, 0)} lb-ft (post ${g.moment.postId}, ${g.moment.combination})`,
    g.uplift ? `Largest uplift ${fmt(g.uplift.valueLb, 0)} lb (post ${g.uplift.postId}, ${g.uplift.combination})` : "No net uplift on any post",
    `Largest downward ${fmt(g.downward.valueLb, 0)} lb (post ${g.downward.postId}, ${g.downward.combination})`,
  ];
}

export function checksTable(r: DesignResult): Table {
  return {
    title: `Footing checks: ${fmt(r.footing.diameterIn)} in diameter × ${fmt(r.footing.depthIn)} in deep, ${r.footing.post.size} in pipe post (controlled by ${r.footing.controllingCheck})`,
    columns: ["Check", "Demand", "Capacity", "Unit", "Ratio", "Result", "Source"],
    rows: r.footing.checks.map((c) => [c.title, fmt(c.demand, 2), fmt(c.capacity, 2), c.unit, fmt(c.ratio, 2), c.pass ? "passes" : "FAILS", userText(c.source)]),
  };
}

export function concreteLines(r: DesignResult): string[] {
  const j = r.concrete.job;
  return [
    `Per hole: ${fmt(r.concrete.perHole.volumeFt3, 2)} ft³ (${fmt(r.concrete.perHole.volumeYd3, 2)} yd³), about ${fmt(r.concrete.perHole.weightLb, 0)} lb`,
    `Job: ${j.holes} holes, ${fmt(j.totalYd3, 2)} yd³; with ${fmt(j.wasteAllowancePct, 0)}% waste ${fmt(j.withWasteYd3, 2)} yd³`,
    `Order ${fmt(j.orderYd3, 2)} yd³ ready-mix, or ${j.bags80Lb} × 80 lb / ${j.bags60Lb} × 60 lb / ${j.bags40Lb} × 40 lb premix bags`,
    // The mix (results saved before it was added have none).
    ...(r.concrete.specification ? [`Mix: ${r.concrete.specification.summary} (not below ${fmt(r.concrete.specification.codeMinimumPsi, 0)} psi, ${r.concrete.specification.codeMinimumSource})`, ...r.concrete.specification.coldWeather] : []),
  ];
}
