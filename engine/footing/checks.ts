/**
 * The footing checks, each reported as demand, capacity and utilisation ratio, with the post,
 * tilt and load combination that govern.
 */
import { imperialText, qty, says, type Quantity, type QuantityText, type QuantityUnit } from "../quantity-text";

export type CheckId = "lateral" | "uplift" | "frost" | "bearing" | "holeSize" | "postBending";
/** The checks that set the depth. */
export type DepthCheckId = "lateral" | "uplift" | "frost";

export interface Governing {
  postId: string;
  tiltDeg: number;
  combination: string;
  /** Index into the design's wind cases, -1 when the combination has no wind. */
  windCase: number;
}

export interface FootingCheck {
  id: CheckId;
  title: string;
  demand: number;
  capacity: number;
  unit: string;
  /** demand / capacity; ≤ 1 passes. */
  ratio: number;
  pass: boolean;
  governing: Governing | null;
  /** For the checks that set depth: the depth this check alone needs (in, unrounded). */
  requiredDepthIn: number | null;
  source: string;
  /** The source with its numbers as quantities, when it carries any (the net bearing credit). */
  sourceText?: QuantityText;
  /** Extra words for the reviewer, e.g. the load height h used. */
  detail?: string;
  /** The same words with their numbers as quantities. */
  detailText?: QuantityText;
}

/** Each check's title with its numbers as quantities (the screens word them in the reader's units). */
export const CHECK_TITLE_TEXTS: Record<CheckId, QuantityText> = {
  lateral: ["Lateral embedment"],
  uplift: ["Uplift"],
  frost: ["Frost and minimum depth"],
  bearing: ["Bearing under the base"],
  holeSize: says`Hole at least ${qty(4, "in")} larger than the post`,
  postBending: ["Post bending at grade"],
};

export const CHECK_TITLES: Record<CheckId, string> = Object.fromEntries(
  Object.entries(CHECK_TITLE_TEXTS).map(([id, text]) => [id, imperialText(text)]),
) as Record<CheckId, string>;

/** The frost check's source, with the 12 in minimum as a quantity. */
export const FROST_CHECK_SOURCE_TEXT: QuantityText = says`IBC §1809.4 (depth of footings, ${qty(12, "in")} minimum), §1809.5 (frost protection)`;
export const FROST_CHECK_SOURCE = imperialText(FROST_CHECK_SOURCE_TEXT);

/** The structured title of a check id (an unknown id from an older result reads as itself). */
export function checkTitleText(id: string): QuantityText {
  return CHECK_TITLE_TEXTS[id as CheckId] ?? [id];
}

/** The unit words a check's demand and capacity carry, as quantity kinds. */
export const CHECK_UNIT_KINDS: Record<string, QuantityUnit> = { lb: "lb", "lb-ft": "lbFt", "kip-ft": "kipFt", in: "in", ft: "ft", psf: "psf" };

/** A check's demand or capacity as a quantity (two decimals in customary words, as the engine wrote them). */
export function checkQuantity(check: { unit: string }, value: number): Quantity | string {
  const unit = CHECK_UNIT_KINDS[check.unit];
  return unit ? qty(value, unit, 2) : `${value.toFixed(2)} ${check.unit}`;
}

export function makeCheck(
  id: CheckId,
  demand: number,
  capacity: number,
  unit: string,
  source: string,
  governing: Governing | null,
  requiredDepthIn: number | null = null,
): FootingCheck {
  const ratio = capacity > 0 ? demand / capacity : demand > 0 ? Infinity : 0;
  return { id, title: CHECK_TITLES[id], demand, capacity, unit, ratio, pass: ratio <= 1 + 1e-9, governing, requiredDepthIn, source };
}
