import { SOIL_CLASSES } from "@/engine";
import { FIELD_META } from "./fields";
import { formatQuantity, type UnitSystem } from "./units";

/**
 * An input value as a person reads it: choices by their meaning ("Presumed class 4 (Sand, …)"),
 * yes/no for switches, "not set" for blanks and numbers with the unit from the one field-label
 * table. Pure: the review page, the revision diff and the tests share it.
 */
const CHOICES: Record<string, Record<string, string>> = {
  "site.edition": { "7-16": "ASCE 7-16", "7-22": "ASCE 7-22" },
  "site.exposure": { B: "B: suburban, wooded", C: "C: open country", D: "D: facing open water" },
  "site.topography.method": { flat: "Flat or gently rolling", kzt: "Kzt given by the engineer", hill: "Hill, ridge or escarpment (K1, K2, K3)" },
  "site.soil.method": { class: "Presumed class (IBC Table 1806.2)", custom: "Soil report values" },
  "array.flow": { clear: "Clear", obstructed: "Obstructed (blocked underneath)" },
  "array.orientation": { portrait: "Portrait", landscape: "Landscape" },
  "posts.bearingPressure": { gross: "Gross pressure", net: "Net pressure (soil removed credited)" },
  "posts.holeDiameterIn": { auto: "Size it for me" },
};
const UNRATED_SOIL: Record<string, string> = { fill: "Fill (needs a soil report)", organic: "Organic soil (needs a soil report)", mud: "Mud (needs a soil report)" };

export function inputValueText(path: string, value: unknown, units: UnitSystem = "imperial"): string {
  if (value === null || value === undefined || value === "") return "not set";
  if (typeof value === "boolean") return value ? "Yes" : "No";
  if (path === "site.soil.soilClass") {
    const c = SOIL_CLASSES[Number(value) as keyof typeof SOIL_CLASSES];
    return c ? `Presumed class ${value} (${c.name})` : (UNRATED_SOIL[String(value)] ?? String(value));
  }
  if (path === "posts.pipeSize") return `${String(value).replace("-", " ")} in standard pipe`;
  const choice = CHOICES[path]?.[String(value)];
  if (choice) return choice;
  const unit = FIELD_META[path]?.unit;
  if (typeof value === "number" && unit) return whole(formatQuantity(value, unit, units, { decimals: asEntered(value, units) }));
  if (typeof value === "string" && unit && /^-?[\d.]+(, -?[\d.]+)*$/.test(value)) {
    // Lists such as candidate hole sizes arrive as "12, 18, 24": each gets the unit.
    return value.split(", ").map((n) => whole(formatQuantity(Number(n), unit, units))).join(", ");
  }
  if (Array.isArray(value)) return value.map((v) => inputValueText(path, v, units)).join(", ");
  return String(value);
}

/** "24.0 in" reads "24 in"; "5.50 ft" keeps its decimals. */
const whole = (text: string) => text.replace(/(\d)\.0+(?!\d)/g, "$1");

/** US units show the value as typed (0.75 in stays 0.75, not 0.8); metric rounds by the unit's rule. */
const asEntered = (value: number, units: UnitSystem) => (units === "imperial" ? Math.min(3, (String(value).split(".")[1] ?? "").length) : undefined);
