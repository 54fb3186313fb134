import { imperialText, isQuantity, type QuantityText, type QuantityUnit } from "@/engine/quantity-text";
import { CHECK_TITLE_TEXTS } from "@/engine/footing/checks";
import { formatQuantity, type UnitKind, type UnitSystem } from "./quantity";

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
  return text.map((p) => (typeof p === "string" ? p : isQuantity(p) ? formatQuantity(p.value, KIND[p.unit] ?? "none", system) : String(p))).join("");
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
