/**
 * Text that carries its numbers as quantities (value + unit kind), not as pre-formatted imperial
 * words, so each screen, the report and the field spec word them in the reader's unit system
 * (components/format). The engine stays in US customary units; `imperialText` gives the plain
 * customary sentence for the CLI, the API's `message` fields and results saved before this.
 *
 * @example says`Hole at least ${qty(4, "in")} larger than the post` // ["Hole at least ", { value: 4, unit: "in" }, " larger than the post"]
 */

/** Every unit kind an engine sentence may carry (customary; the formatter converts). */
export type QuantityUnit = "in" | "ft" | "lb" | "lbFt" | "kipFt" | "psf" | "psfPerFt" | "pcf" | "psi" | "ksi" | "mph" | "lbMass" | "ft3" | "yd3" | "degF";

export interface Quantity {
  value: number;
  unit: QuantityUnit;
  /** Decimals to show in customary units when the value is not a whole number (default 1). */
  decimals?: number;
}

/** A standard pipe named by its trade size ("3-1/2"): a name, not a length, so metric words it by its DN. */
export interface PipeName {
  pipe: string;
}

export type TextPart = string | Quantity | PipeName;
/** A sentence as parts: words and quantities in reading order. */
export type QuantityText = TextPart[];

export function qty(value: number, unit: QuantityUnit, decimals?: number): Quantity {
  return decimals === undefined ? { value, unit } : { value, unit, decimals };
}

export function pipeName(size: string): PipeName {
  return { pipe: size };
}

export function isPipeName(part: unknown): part is PipeName {
  return typeof part === "object" && part !== null && typeof (part as PipeName).pipe === "string";
}

/** "12 in, 16 in, 24 in": each value its own quantity, so every one is converted. */
export function qtyList(values: readonly number[], unit: QuantityUnit): QuantityText {
  return values.flatMap((v, i) => (i === 0 ? [qty(v, unit)] : [", ", qty(v, unit)]));
}

export function isQuantity(part: unknown): part is Quantity {
  return typeof part === "object" && part !== null && typeof (part as Quantity).value === "number" && typeof (part as Quantity).unit === "string";
}

/** Tagged template: strings and plain numbers stay words, quantities stay quantities, nested texts are spliced in. */
export function says(strings: TemplateStringsArray, ...values: (TextPart | number | QuantityText)[]): QuantityText {
  // Plain loops (no callback, no spread): a sentence is built per design on the sizing path.
  const out: QuantityText = [];
  for (let i = 0; i < strings.length; i++) {
    const s = strings[i];
    if (s) out.push(s);
    if (i < values.length) {
      const v = values[i];
      if (Array.isArray(v)) for (let j = 0; j < v.length; j++) out.push(v[j]);
      else out.push(typeof v === "number" ? String(v) : v);
    }
  }
  return out;
}

/** The customary words of each unit kind, as the engine has always written them. */
export const IMPERIAL_WORDS: Record<QuantityUnit, string> = {
  in: "in", ft: "ft", lb: "lb", lbFt: "lb-ft", kipFt: "kip-ft", psf: "psf", psfPerFt: "psf per ft", pcf: "pcf",
  psi: "psi", ksi: "ksi", mph: "mph", lbMass: "lb", ft3: "ft³", yd3: "yd³", degF: "°F",
};

/** 2000 → "2,000"; 0.75 → "0.75"; 1.25 with 1 decimal → "1.3" (no toLocaleString: runs per design). */
function customaryNumber(q: Quantity): string {
  const rounded = Number.isInteger(q.value) ? q.value : Number(q.value.toFixed(q.decimals ?? 1));
  const abs = Math.abs(rounded);
  const sign = rounded < 0 ? "−" : "";
  // Under 1,000 there is nothing to group: the usual case, and the only one per design (no split, no regex).
  if (abs < 1000) return sign + String(abs);
  const [whole, frac] = String(abs).split(".");
  return `${sign}${groupThousands(whole)}${frac ? `.${frac}` : ""}`;
}

/**
 * The whole part of `String(n)` grouped: "1234567" → "1,234,567", "-4000" → "-4,000" (a number
 * written otherwise, "1e+21" or "Infinity", comes back as it is). A loop, not a regular expression
 * with look-ahead: this runs per design.
 */
export function groupThousands(digits: string): string {
  const start = digits.charCodeAt(0) === 45 ? 1 : 0; // "-"
  const n = digits.length - start;
  if (n <= 3) return digits;
  for (let i = start; i < digits.length; i++) {
    const c = digits.charCodeAt(i);
    if (c < 48 || c > 57) return digits;
  }
  const head = start + ((n - 1) % 3) + 1;
  let out = digits.slice(0, head);
  for (let i = head; i < digits.length; i += 3) out += "," + digits.slice(i, i + 3);
  return out;
}

/** The sentence in US customary words: "Hole at least 4 in larger than the post". */
export function imperialText(text: QuantityText): string {
  let out = "";
  for (let i = 0; i < text.length; i++) {
    const p = text[i];
    out += typeof p === "string" ? p : isPipeName(p) ? imperialPipe(p.pipe) : `${customaryNumber(p)} ${IMPERIAL_WORDS[p.unit]}`;
  }
  return out;
}

/** "3-1/2" → "3 1/2 in standard pipe" (ASME B36.10 nominal size, as the trade says it). */
export function imperialPipe(size: string): string {
  return `${size.replace("-", " ")} in standard pipe`;
}

// Unit words longest first, so "psf per ft" is not read as "psf" and "lb-ft" not as "lb".
const UNIT_BY_WORD = new Map<string, QuantityUnit>(
  (Object.entries(IMPERIAL_WORDS) as [QuantityUnit, string][])
    .filter(([unit]) => unit !== "lbMass") // "lb" reads as a force; a mass in a stored sentence is not expected
    .map(([unit, word]) => [word, unit]),
);
const UNIT_WORDS = [...UNIT_BY_WORD.keys()].sort((a, b) => b.length - a.length).map((w) => w.replace(/[.*+?^${}()|[\]\\-]/g, "\\$&"));
// A pipe's trade name, or a customary number (as `customaryNumber` writes it) then a space and a unit word.
// Not a digit inside a word or an id ("P2"), and not a unit word that runs on into a longer word ("inch").
const STORED_QUANTITY = new RegExp(
  `(\\d+(?: 1/2)?) in standard pipe|(?<![\\w.,/−-])(−?\\d{1,3}(?:,\\d{3})+|−?\\d+)(?:\\.(\\d+))? (${UNIT_WORDS.join("|")})(?![\\w-])`,
  "g",
);

/**
 * The inverse of `imperialText` for a sentence the app composed and saved as customary words (a
 * hold's reason, a new design's starting note): its numbers with units back as quantities, so a
 * screen words it in the reader's units. Only for text the app wrote: a person's own words are
 * shown as typed. `quantitiesIn(imperialText(t))` words the same as `t` (tests/engine/quantity-text).
 * @example quantitiesIn("Hole P2 is 40 in deep") // ["Hole P2 is ", { value: 40, unit: "in" }, " deep"]
 */
export function quantitiesIn(stored: string): QuantityText {
  const out: QuantityText = [];
  let last = 0;
  for (const m of stored.matchAll(STORED_QUANTITY)) {
    if (m.index > last) out.push(stored.slice(last, m.index));
    if (m[1] !== undefined) out.push(pipeName(m[1].replace(" ", "-")));
    else {
      const value = Number(`${m[2].replace(/,/g, "").replace("−", "-")}${m[3] === undefined ? "" : `.${m[3]}`}`);
      out.push(m[3] === undefined ? qty(value, UNIT_BY_WORD.get(m[4])!) : qty(value, UNIT_BY_WORD.get(m[4])!, m[3].length));
    }
    last = m.index + m[0].length;
  }
  if (last < stored.length) out.push(stored.slice(last));
  return out;
}
