import { imperialText, isPipeName, isQuantity, quantitiesIn, type QuantityText, type QuantityUnit } from "@/engine/quantity-text";
import { CHECK_TITLE_TEXTS } from "@/engine/footing/checks";
import { knownText } from "@/engine/known-texts";
import { formatPipeSize, formatQuantity, unitLabel, type UnitKind, type UnitSystem } from "./quantity";

/** The display kind of each unit an engine sentence carries. */
const KIND: Record<QuantityUnit, UnitKind> = {
  in: "in", ft: "ft", lb: "lb", lbFt: "lbFt", kipFt: "kipFt", psf: "psf", psfPerFt: "psfPerFt", pcf: "pcf",
  psi: "psi", ksi: "ksi", mph: "mph", lbMass: "lbMass", ft3: "ft3", yd3: "yd3", degF: "degF",
};

/**
 * An engine sentence (words + quantities) in the reader's units. In US units it is the engine's own
 * wording; in metric each quantity goes through the one formatter.
 * @example sayIn(["Hole at least ", { value: 4, unit: "in" }, " larger"], "metric") // "Hole at least 102 mm larger"
 */
export function sayIn(text: QuantityText | string | undefined | null, system: UnitSystem): string {
  if (text === undefined || text === null) return "";
  if (typeof text === "string") return text;
  if (system === "imperial") return imperialText(text);
  return text.map((p) => (typeof p === "string" ? p : isPipeName(p) ? formatPipeSize(p.pipe, system) : isQuantity(p) ? formatQuantity(p.value, KIND[p.unit] ?? "none", system) : String(p))).join("");
}

/**
 * A sentence the app composed and saved in customary words (a hold's reason, a new design's starting
 * note) in the reader's units. Never for a person's own words: those are shown as typed.
 */
export function composedIn(stored: string, system: UnitSystem): string {
  return system === "imperial" ? stored : sayIn(quantitiesIn(stored), system);
}

/** A warning in the reader's units: its structured text, or (results saved before it) its message. */
export function warningIn(w: { message: string; text?: QuantityText }, system: UnitSystem): string {
  return w.text ? sayIn(w.text, system) : w.message;
}

/** A check's title in the reader's units ("Hole at least 102 mm larger than the post"). */
export function checkTitleIn(check: { id?: string; checkId?: string; title: string }, system: UnitSystem): string {
  const id = check.id ?? check.checkId ?? "";
  return id in CHECK_TITLE_TEXTS ? sayIn(CHECK_TITLE_TEXTS[id as keyof typeof CHECK_TITLE_TEXTS], system) : check.title;
}

/** A stored engine sentence (caution, section, source, mix line) in the reader's units. */
export function storedIn(stored: string, system: UnitSystem): string {
  return system === "imperial" ? stored : sayIn(knownText(stored), system);
}

/**
 * The schema's range message ("… must be between 24 and 240 in") in the field's own unit system:
 * the field knows its unit kind, so only that unit's range is reworded (metric "between 610 and 6,096 mm").
 */
export function rangeMessageIn(message: string | undefined, kind: UnitKind, units: UnitSystem): string | undefined {
  const imperial = unitLabel(kind, "imperial");
  if (!message || units === "imperial" || !imperial) return message;
  const escaped = imperial.replace(/[.*+?^${}()|[\]\\]/g, "\\$&");
  return message.replace(new RegExp(`(-?[\\d,.]+) and (-?[\\d,.]+) ${escaped}(?![\\w])`), (_, a: string, b: string) =>
    `${formatQuantity(Number(a.replace(/,/g, "")), kind, units)} and ${formatQuantity(Number(b.replace(/,/g, "")), kind, units)}`.replace(` ${unitLabel(kind, units)} and`, " and"));
}


/** A check's source in the reader's units (the net-bearing credit names a unit weight). */
export function checkSourceIn(check: { source: string; sourceText?: QuantityText }, system: UnitSystem): string {
  return check.sourceText ? sayIn(check.sourceText, system) : storedIn(check.source, system);
}
