import type { DesignInput, DesignResult } from "@/engine";
import { fieldLabel, FIELD_META } from "./fields";
import { formatPipeSize, type UnitKind, type UnitSystem } from "@/components/format/quantity";
import { checkTitleIn, warningIn } from "@/components/format/quantity-text";

/**
 * What changed between two revisions, in inputs and in results, as rows a person reads:
 * "Footing depth 5.50 → 6.00 ft". Pure: the diff page and the tests share it.
 */
export type DiffValue = number | string | boolean | null;

export interface DiffRow {
  path: string;
  label: string;
  unit?: UnitKind;
  /** A utilisation (demand ÷ capacity): shown with two decimals, over 1.0 marked as failing. */
  ratio?: boolean;
  /** A count of premix bags of this mass (lb): shown as a count naming the bag's mass. */
  bagLb?: number;
  from: DiffValue;
  to: DiffValue;
}

/** Leaf values of an object by dotted path; lists become "12, 18, 24". */
export function flatten(value: unknown, prefix = ""): Record<string, DiffValue> {
  const out: Record<string, DiffValue> = {};
  if (Array.isArray(value)) out[prefix] = value.join(", ");
  else if (value && typeof value === "object") {
    for (const [k, v] of Object.entries(value)) Object.assign(out, flatten(v, prefix ? `${prefix}.${k}` : k));
  } else if (prefix) out[prefix] = (value ?? null) as DiffValue;
  return out;
}

const same = (a: DiffValue, b: DiffValue) => (typeof a === "number" && typeof b === "number" ? Math.abs(a - b) < 1e-9 : a === b);

export function inputChanges(from: DesignInput, to: DesignInput): DiffRow[] {
  const a = flatten(from);
  const b = flatten(to);
  const order = Object.keys(FIELD_META);
  const paths = [...new Set([...Object.keys(a), ...Object.keys(b)])].sort((x, y) => rank(order, x) - rank(order, y));
  return paths
    .filter((p) => !same(a[p] ?? null, b[p] ?? null))
    .map((p) => ({ path: p, label: fieldLabel(p), unit: FIELD_META[p]?.unit, from: a[p] ?? null, to: b[p] ?? null }));
}

function rank(order: string[], path: string): number {
  const i = order.indexOf(path);
  return i === -1 ? order.length : i;
}

/**
 * The largest wind uplift on any post (0.6W, before the array's dead load counts against it): what
 * the editor's loads table and the uplift check's demand show. Not the net uplift
 * (`governingLoads.uplift`, the 0.6D + 0.6W result), which is smaller by 0.6 × the dead load.
 */
export function largestWindUpliftLb(r: DesignResult): number {
  return Math.max(0, ...r.postLoads.flatMap((p) => p.combinations.map((c) => c.windUpliftLb)));
}

/** The result figures a designer, engineer or crew lead compares between revisions (words in the reader's units). */
export function resultFigures(r: DesignResult, units: UnitSystem = "imperial"): DiffRow[] {
  const row = (path: string, label: string, value: DiffValue, unit?: UnitKind): DiffRow => ({ path, label, unit, from: value, to: value });
  const rows: DiffRow[] = [
    row("footing.depthIn", "Footing depth", r.footing.depthIn, "in"),
    row("footing.diameterIn", "Hole diameter", r.footing.diameterIn, "in"),
    row("footing.controllingCheck", "Check that sets the depth", ((c) => (c ? checkTitleIn(c, units) : r.footing.controllingCheck))(r.footing.checks.find((c) => c.id === r.footing.controllingCheck))),
    row("footing.pass", "All footing checks pass", r.footing.pass),
    ...r.footing.checks.map((c) => ({ ...row(`footing.checks.${c.id}.ratio`, `Utilisation: ${checkTitleIn(c, units)}`, round(c.ratio, 2)), ratio: true })),
    row("governingLoads.shear", "Governing shear at grade", r.governingLoads.shear.valueLb ?? null, "lb"),
    row("governingLoads.moment", "Governing moment at grade", r.governingLoads.moment.valueLbFt ?? null, "lbFt"),
    row("loads.windUplift", "Largest wind uplift on a post (0.6W, before dead load)", r.postLoads.length ? largestWindUpliftLb(r) : null, "lb"),
    row("governingLoads.uplift", "Largest net uplift on a post (after the array's dead load)", r.governingLoads.uplift?.valueLb ?? null, "lb"),
    row("wind.velocity.qzWithKdPsf", "Velocity pressure qh", r.wind.velocity.qzWithKdPsf, "psf"),
    row("geometry.postTopFt", "Post top above grade", r.geometry.postTopFt, "ft"),
    row("geometry.highestEdgeFt", "Highest panel edge", r.geometry.highestEdgeFt, "ft"),
    row("concrete.perHole.volumeFt3", "Concrete per hole", r.concrete.perHole.volumeFt3, "ft3"),
    row("concrete.job.orderYd3", "Concrete to order", r.concrete.job.orderYd3, "yd3"),
    { ...row("concrete.job.bags80Lb", "Premix bags for the job", r.concrete.job.bags80Lb), bagLb: 80 },
    row("footing.suggestedPipeSize", "Smallest pipe that carries the moment", r.footing.suggestedPipeSize ? formatPipeSize(r.footing.suggestedPipeSize, units) : null),
    // The warnings' words, never their codes (CHECK_OVER_CAPACITY_BEARING is for the engine).
    row("warnings", "Warnings", r.warnings.map((w) => warningIn(w, units)).sort().join(" ") || "none"),
    row("engineVersion", "Engine version", r.engineVersion),
  ];
  return rows;
}

function round(x: number, d: number): number {
  return Number.isFinite(x) ? Math.round(x * 10 ** d) / 10 ** d : x;
}

export function resultChanges(from: DesignResult, to: DesignResult, units: UnitSystem = "imperial"): { changed: DiffRow[]; unchanged: DiffRow[] } {
  const a = resultFigures(from, units);
  const b = new Map(resultFigures(to, units).map((r) => [r.path, r]));
  const rows = a.map((r) => ({ ...r, to: b.get(r.path)?.to ?? null }));
  for (const [path, r] of b) if (!a.some((x) => x.path === path)) rows.push({ ...r, from: null });
  return { changed: rows.filter((r) => !same(r.from, r.to)), unchanged: rows.filter((r) => same(r.from, r.to)) };
}
