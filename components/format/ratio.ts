/**
 * Utilisation ratios (demand ÷ capacity) read the same on every screen: always two decimals
 * ("0.70", never "0.7"), and a ratio over 1.00 always carries the word "over 1.00, fails", so it is
 * never marked by colour alone.
 */
export const RATIO_LIMIT = 1;

/** "0.70"; "over 99" for a ratio with no capacity. */
export function formatRatio(ratio: number): string {
  return Number.isFinite(ratio) ? ratio.toFixed(2) : "over 99";
}

/** True when the ratio fails (over 1.00 as shown: 1.004 reads 1.00 and passes). */
export function ratioFails(ratio: number): boolean {
  return !Number.isFinite(ratio) || Math.round(ratio * 100) / 100 > RATIO_LIMIT;
}

/** The words beside a failing ratio. */
export const RATIO_OVER_WORDS = "over 1.00, fails";

/** "1.03 (over 1.00, fails)" or "0.70": for plain text (PDF, e-mail, tables of strings). */
export function ratioWithVerdict(ratio: number): string {
  return ratioFails(ratio) ? `${formatRatio(ratio)} (${RATIO_OVER_WORDS})` : formatRatio(ratio);
}
