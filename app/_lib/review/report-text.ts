/**
 * What a person reads in the report: inputs by label with units, grouped as in the editor, and
 * every source worded for people (no "[memory]" or other internal tags, no dotted input paths).
 */
import { DISPLAY_UNITS, formatPipeSize, formatQuantity, type UnitSystem } from "@/components/format/quantity";
import { FIELD_LABELS } from "@/engine/field-labels";
import { fmt, inputRows } from "./report-model";

const RECALLED = "value as recalled; confirm against the printed standard";

/** A source or message as a user reads it: internal tags spelled out in words. */
export function userText(text: string): string {
  return text
    .replace(/\s*\[memory(?::[^\]]*)?\]/gi, ` (${RECALLED})`)
    .replace(/\[common practice\]/gi, "(common practice)")
    .replace(/\(\s*\(/g, "(")
    .replace(/\)\s*\)/g, ")");
}

const GROUPS: { prefix: string; title: string }[] = [
  { prefix: "site.", title: "Site" },
  { prefix: "array.", title: "Array" },
  { prefix: "posts.", title: "Posts and footings" },
];

/** "holeDiameterIn" → "Hole diameter": a readable name for an input the label table does not list yet. */
function humanise(path: string): string {
  const last = path.split(".").pop() ?? path;
  const words = last.replace(/(Mph|Psf|PsfPerFt|Pcf|Ksi|In|Ft|Deg|Pct|Lb)$/, "").replace(/([a-z])([A-Z])/g, "$1 $2").toLowerCase();
  return words.charAt(0).toUpperCase() + words.slice(1);
}

function valueText(value: string, path: string, units: UnitSystem): string {
  const unit = FIELD_LABELS[path]?.unit;
  if (value === "true") return "yes";
  if (value === "false") return "no";
  if (value === "" || value === "undefined" || value === "null") return "not given";
  if (!unit) return path === "posts.pipeSize" ? formatPipeSize(value, units) : value;
  if (units === "metric") return value.split(", ").map((v) => (Number.isFinite(Number(v)) ? formatQuantity(Number(v), unit, units) : v)).join(", ");
  const label = DISPLAY_UNITS[unit].imperial;
  const shown = value.split(", ").map((v) => (Number.isFinite(Number(v)) ? fmt(Number(v), 2) : v)).join(", ");
  return label === "°" || label === "%" ? `${shown}${label}` : `${shown} ${label}`;
}

export interface InputGroup {
  title: string;
  rows: [label: string, value: string][];
}

/** Every input of the revision, by label with its unit, in the editor's groups. */
export function inputGroups(input: unknown, units: UnitSystem = "imperial"): InputGroup[] {
  const rows = inputRows(input).filter(([path]) => path !== "projectName");
  const groups = GROUPS.map((g) => ({ title: g.title, rows: rows.filter(([p]) => p.startsWith(g.prefix)) }));
  const rest = rows.filter(([p]) => !GROUPS.some((g) => p.startsWith(g.prefix)));
  if (rest.length) groups.push({ title: "Other", rows: rest });
  return groups
    .filter((g) => g.rows.length)
    .map((g) => ({ title: g.title, rows: g.rows.map(([path, v]) => [FIELD_LABELS[path]?.label ?? humanise(path), valueText(v, path, units)] as [string, string]) }));
}
