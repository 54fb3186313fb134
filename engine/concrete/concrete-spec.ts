/**
 * The concrete the footings are poured with, as the field spec and report state it: specified
 * compressive strength at 28 days (default 4,000 psi [common practice for these footings], never
 * below the 2,000 psi IBC §1807.3.3 sets for concrete backfill around embedded posts [memory]),
 * maximum aggregate size and slump as the engineer sets them, and cold-weather guidance when the
 * ground at the site freezes (a frost depth above zero) [common practice].
 *
 * @example concreteSpecification({ strengthPsi: 4000, maxAggregateIn: 0.75, slumpIn: 4, frostDepthIn: 36 }).coldSite // true
 */
import { requireInput } from "../input-ranges";
import { groupThousands, imperialText, qty, says, type QuantityText } from "../quantity-text";

export const CODE_MINIMUM_STRENGTH_PSI = 2000;
export const CODE_MINIMUM_SOURCE = "IBC §1807.3.3 backfill: concrete of at least 2,000 psi";

/** What the crew does when pouring in cold weather [common practice], with its numbers as quantities. */
export const COLD_WEATHER_TEXTS: readonly QuantityText[] = [
  says`Cold weather (air near or below ${qty(40, "degF")}): ask for a non-chloride accelerator in the mix; chloride accelerators corrode the steel post.`,
  "Do not pour onto frozen ground, ice or snow in the hole; thaw and clean the bottom first.",
  "Protect the fresh concrete from freezing (insulating blankets over the holes) until it has gained strength, at least the first 2 days.",
].map((c) => (typeof c === "string" ? [c] : c));

/** The same guidance in US customary words. */
export const COLD_WEATHER_GUIDANCE: string[] = COLD_WEATHER_TEXTS.map(imperialText);

/** The code minimum's source with its strength as a quantity. */
export const CODE_MINIMUM_SOURCE_TEXT: QuantityText = says`IBC §1807.3.3 backfill: concrete of at least ${qty(2000, "psi")}`;

/** The supplier's line with its numbers as quantities. */
export function concreteSummaryText(a: { compressiveStrengthPsi: number; maxAggregateIn: number; slumpIn: number }): QuantityText {
  return says`f'c ${qty(a.compressiveStrengthPsi, "psi")} at 28 days, aggregate ${qty(a.maxAggregateIn, "in", 2)} maximum, slump ${qty(a.slumpIn, "in", 2)}`;
}

export interface ConcreteSpecification {
  compressiveStrengthPsi: number;
  codeMinimumPsi: number;
  codeMinimumSource: string;
  maxAggregateIn: number;
  slumpIn: number;
  /** True when the site's ground freezes (frost depth above zero): cold-weather guidance applies. */
  coldSite: boolean;
  coldWeather: string[];
  /** One line a supplier can read. */
  summary: string;
}

/** 4000 → "4,000" (toLocaleString, and a regular expression per call, are slow on this per-design path). */
function thousands(n: number): string {
  const [whole, frac] = String(n).split(".");
  const grouped = groupThousands(whole);
  return frac ? `${grouped}.${frac}` : grouped;
}

export function concreteSpecification(a: { strengthPsi: number; maxAggregateIn: number; slumpIn: number; frostDepthIn: number }): ConcreteSpecification {
  requireInput("posts.concreteStrengthPsi", a.strengthPsi, "psi");
  const coldSite = a.frostDepthIn > 0;
  return {
    compressiveStrengthPsi: a.strengthPsi,
    codeMinimumPsi: CODE_MINIMUM_STRENGTH_PSI,
    codeMinimumSource: CODE_MINIMUM_SOURCE,
    maxAggregateIn: a.maxAggregateIn,
    slumpIn: a.slumpIn,
    coldSite,
    coldWeather: coldSite ? COLD_WEATHER_GUIDANCE : [],
    summary: `f'c ${thousands(a.strengthPsi)} psi at 28 days, aggregate ${a.maxAggregateIn} in maximum, slump ${a.slumpIn} in`,
  };
}
