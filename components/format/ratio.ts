/**
 * Utilisation ratios (demand ÷ capacity) read the same on every screen: always two decimals
 * ("0.70", never "0.7"), and a ratio over 1.00 always carries the word "over 1.00, fails", so it is
 * never marked by colour alone.
 */
export const RATIO_LIMIT = 1;

/** True when the ratio fails: the engine's own rule (engine/footing/checks.ts, pass when ≤ 1 + 1e-9). */
export function ratioFails(ratio: number): boolean {
  return !(ratio <= RATIO_LIMIT + 1e-9);
}

/**
 * "0.70"; "over 99" for a ratio with no capacity. Two decimals, rounded as usual, except that a
 * failing ratio just over 1 (1.004) reads 1.01, so a check that fails never reads "1.00".
 */
export function formatRatio(ratio: number): string {
  if (!Number.isFinite(ratio)) return "over 99";
  const text = ratio.toFixed(2);
  return text === "1.00" && ratioFails(ratio) ? "1.01" : text;
}

/** The words beside a failing ratio. */
export const RATIO_OVER_WORDS = "over 1.00, fails";

/** "1.03 (over 1.00, fails)" or "0.70": for plain text (PDF, e-mail, tables of strings). */
export function ratioWithVerdict(ratio: number): string {
  return ratioFails(ratio) ? `${formatRatio(ratio)} (${RATIO_OVER_WORDS})` : formatRatio(ratio);
}
