/**
 * Every fixed engine sentence that carries a number with a unit, structured. A result stores these
 * sentences as customary strings (`cautions`, `references.sections`, check titles and sources, the
 * mix's cold-weather lines); a screen finds the structured form by that string and words it in the
 * reader's units, which also covers results saved before the structured forms existed.
 */
import { COLD_WEATHER_TEXTS, CODE_MINIMUM_SOURCE_TEXT } from "./concrete/concrete-spec";
import { CHECK_TITLE_TEXTS, FROST_CHECK_SOURCE_TEXT } from "./footing/checks";
import { FOOTING_DEPTH_SECTIONS_TEXT, SITE_CAUTION_TEXTS } from "./notices";
import { imperialText, type QuantityText } from "./quantity-text";

export const KNOWN_TEXTS: readonly QuantityText[] = [
  ...SITE_CAUTION_TEXTS,
  ...COLD_WEATHER_TEXTS,
  CODE_MINIMUM_SOURCE_TEXT,
  ...Object.values(CHECK_TITLE_TEXTS),
  FROST_CHECK_SOURCE_TEXT,
  FOOTING_DEPTH_SECTIONS_TEXT,
];

const BY_IMPERIAL = new Map(KNOWN_TEXTS.map((t) => [imperialText(t), t]));
// Wordings stored by results saved before these sentences were structured.
BY_IMPERIAL.set("Check the concrete mix (≥ 2,500 psi premix is typical; the code minimum for post backfill is 2,000 psi) and let it cure before loading the posts.", SITE_CAUTION_TEXTS[SITE_CAUTION_TEXTS.length - 1]);

/** The structured form of a stored engine sentence, or the sentence itself when it carries no quantity. */
export function knownText(stored: string): QuantityText {
  return BY_IMPERIAL.get(stored) ?? [stored];
}
