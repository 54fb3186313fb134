/**
 * What a reviewer reads, as plain tables: shared by the review page and the PDF report so both say
 * the same thing in the same words. Numbers are rounded for reading; units are in the headings.
 */
import type { DesignResult } from "@/engine";
import type { RevisionContext } from "@/db/queries/reviews";
import type { Table } from "@/components/review/plain-table";
import { formatBags, formatFootingSize, formatPipeSize, formatQuantity, unitLabel, type UnitKind, type UnitSystem } from "@/components/format/quantity";
import { checkSourceIn, checkTitleIn, storedIn } from "@/components/format/quantity-text";
import { ratioWithVerdict } from "@/components/format/ratio";
import { CHECK_UNIT_KINDS } from "@/engine/footing/checks";
import { largestWindUpliftLb } from "@/components/design/revision-diff";
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
  windSpeedMph: "Basic wind speed",
  exposure: "Exposure category",
  groundSnowPsf: "Ground snow load",
  frostDepthIn: "Frost depth",
  soilClass: "Presumptive soil class (IBC Table 1806.2)",
};
/** The criteria card's numbers with their units (the card stores them in the engine's units). */
export const CRITERIA_UNITS: Record<string, UnitKind> = { windSpeedMph: "mph", groundSnowPsf: "psf", frostDepthIn: "in" };

/** A criteria card value as read: "140 mph" / "62.6 m/s"; words stay as they are. */
export function criterionValue(key: string, value: unknown, units: UnitSystem = "imperial"): string {
  const kind = CRITERIA_UNITS[key];
  return kind && typeof value === "number" ? formatQuantity(value, kind, units, { decimals: 2 }) : String(value);
}

export function criteriaTable(ctx: RevisionContext, units: UnitSystem = "imperial"): Table {
  if (!ctx.criteria) return { title: "Design criteria card", columns: ["Criterion", "Value", "Source", "Checked on"], rows: [], note: "No criteria card is applied to this project: the inputs below were entered by the designer." };
  const rows = Object.entries(ctx.criteria.values).map(([key, value]) => {
    const src = (ctx.criteria!.sources[key] ?? {}) as { source?: string; checkedOn?: string };
    return [CRITERIA_LABELS[key] ?? key, criterionValue(key, value, units), userText(src.source ?? "no source given"), src.checkedOn ?? "—"];
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

/** A number in a table cell, in the reader's units, without the unit word (the heading carries it). */
function cell(v: number | null | undefined, kind: UnitKind, units: UnitSystem, decimals?: number): string {
  const text = formatQuantity(v, kind, units, decimals === undefined ? {} : { decimals });
  const label = unitLabel(kind, units);
  return label && text.endsWith(` ${label}`) ? text.slice(0, -label.length - 1) : text;
}
const head = (name: string, kind: UnitKind, units: UnitSystem) => `${name} (${unitLabel(kind, units)})`;

export function methodLines(r: DesignResult, units: UnitSystem = "imperial"): string[] {
  const lines = [`${r.references.asce}; ${r.references.ibc}; ${r.references.aisc}`, r.wind.method, r.methodNote, ...r.references.sections.map((s) => storedIn(s, units)), `Engine version ${r.engineVersion}`];
  return [...new Set(lines)];
}

export function windTable(r: DesignResult, units: UnitSystem = "imperial"): Table {
  const v = r.wind.velocity;
  return {
    title: "Wind cases",
    note: `ASCE ${r.wind.edition}, mean roof height ${formatQuantity(r.wind.heightFt, "ft", units)}, Kz ${fmt(v.kz, 3)}, Kzt ${fmt(v.kzt, 3)}, Ke ${fmt(v.ke, 3)}, Kd ${fmt(v.kd, 2)}, qz ${formatQuantity(v.qzPsf, "psf", units, { decimals: 2 })}, G ${fmt(r.wind.gustFactor, 2)}`,
    columns: ["Case", "CN windward", "CN leeward", head("Windward", "psf", units), head("Leeward", "psf", units), head("Normal force", "lb", units), head("Horizontal", "lb", units), head("Downward", "lb", units)],
    rows: r.wind.cases.map((c) => [c.label, fmt(c.cnWindward, 2), fmt(c.cnLeeward, 2), cell(c.windwardPressurePsf, "psf", units, 2), cell(c.leewardPressurePsf, "psf", units, 2), cell(c.normalForceLb, "lb", units), cell(c.horizontalLb, "lb", units), cell(c.downwardLb, "lb", units)]),
  };
}

export function loadsTable(r: DesignResult, units: UnitSystem = "imperial"): Table {
  return {
    title: `Loads per post at grade (ASD combinations, tilt ${fmt(r.geometry.tiltDeg)}°)`,
    columns: ["Post", "Combination", head("Shear", "lb", units), head("Moment", "lbFt", units), head("Downward, net of dead load", "lb", units), head("Wind uplift (0.6W, before dead load)", "lb", units)],
    // Beam reaction factors (continuous-beam share ÷ tributary share), when the result has them.
    note: r.geometry.postLoadSharing ? `${r.geometry.postLoadSharing} Factors: ${r.geometry.posts.map((p) => `${p.id} ${fmt(p.reactionFactor, 3)}`).join(", ")}.` : undefined,
    rows: r.postLoads.flatMap((p) => p.combinations.map((c) => [p.postId, c.combination, cell(c.shearLb, "lb", units), cell(c.momentAtGradeLbFt, "lbFt", units), cell(c.downwardLb, "lb", units), cell(c.windUpliftLb, "lb", units)])),
  };
}


export function governingLines(r: DesignResult, units: UnitSystem = "imperial"): string[] {
  const g = r.governingLoads;
  const lb = (v: number) => formatQuantity(v, "lb", units);
  return [
    `Largest shear ${lb(g.shear.valueLb ?? 0)} (post ${g.shear.postId}, ${g.shear.combination})`,
    `Largest moment ${formatQuantity(g.moment.valueLbFt, "lbFt", units)} (post ${g.moment.postId}, ${g.moment.combination})`,
    `Largest wind uplift (0.6W, before dead load) ${lb(largestWindUpliftLb(r))}`,
    g.uplift ? `Largest net uplift (after the array's dead load) ${lb(g.uplift.valueLb ?? 0)} (post ${g.uplift.postId}, ${g.uplift.combination})` : "No net uplift on any post",
    `Largest downward ${lb(g.downward.valueLb ?? 0)} (post ${g.downward.postId}, ${g.downward.combination})`,
  ];
}

const CONTROLLED_BY: Record<string, string> = { lateral: "lateral embedment", uplift: "uplift", frost: "frost and minimum depth" };

export function checksTable(r: DesignResult, units: UnitSystem = "imperial"): Table {
  return {
    title: `Footing checks: ${formatFootingSize(r.footing.diameterIn, r.footing.depthIn, units)}, ${formatPipeSize(r.footing.post.size, units)} post (depth set by ${CONTROLLED_BY[r.footing.controllingCheck] ?? r.footing.controllingCheck})`,
    columns: ["Check", "Demand", "Capacity", "Unit", "Ratio", "Result", "Source"],
    rows: r.footing.checks.map((c) => {
      const kind: UnitKind = (CHECK_UNIT_KINDS[c.unit] as UnitKind | undefined) ?? "none";
      return [checkTitleIn(c, units), cell(c.demand, kind, units, 2), cell(c.capacity, kind, units, 2), kind === "none" ? c.unit : unitLabel(kind, units), ratioWithVerdict(c.ratio), c.pass ? "passes" : "FAILS", userText(checkSourceIn(c, units))];
    }),
  };
}

export function concreteLines(r: DesignResult, units: UnitSystem = "imperial"): string[] {
  const j = r.concrete.job;
  const s = r.concrete.specification;
  const len = (v: number) => formatQuantity(v, "in", units, { decimals: 2 });
  return [
    `Per hole: ${formatQuantity(r.concrete.perHole.volumeFt3, "ft3", units)}${units === "imperial" ? ` (${formatQuantity(r.concrete.perHole.volumeYd3, "yd3", units)})` : ""}, about ${formatQuantity(r.concrete.perHole.weightLb, "lbMass", units, { decimals: 0, metricDecimals: 0 })}`,
    `Job: ${j.holes} holes, ${formatQuantity(j.totalYd3, "yd3", units)}; with ${fmt(j.wasteAllowancePct, 0)}% waste ${formatQuantity(j.withWasteYd3, "yd3", units)}`,
    `Order ${formatQuantity(j.orderYd3, "yd3", units)} ready-mix, or ${formatBags(j.bags80Lb, 80, units)} / ${formatBags(j.bags60Lb, 60, units)} / ${formatBags(j.bags40Lb, 40, units)} of premix`,
    // The mix (results saved before it was added have none).
    ...(s ? [`Mix: f'c ${formatQuantity(s.compressiveStrengthPsi, "psi", units)} at 28 days, aggregate ${len(s.maxAggregateIn)} maximum, slump ${len(s.slumpIn)} (not below ${formatQuantity(s.codeMinimumPsi, "psi", units)}, ${storedIn(s.codeMinimumSource, units)})`, ...s.coldWeather.map((c) => storedIn(c, units))] : []),
  ];
}
