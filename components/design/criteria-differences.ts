import { applyCriteriaCard } from "@/db/design-defaults";
import type { CriteriaCardValues } from "@/db/queries/criteria-cards";
import type { DesignInputDraft } from "@/engine";
import { flatten, type DiffValue } from "./revision-diff";

/**
 * The inputs a revision sets differently from its project's criteria card, with the card's value:
 * { "site.windSpeedMph": 125 } when the design uses 140 mph. The card is mapped onto inputs the same
 * way a new design starts from it (applyCriteriaCard), so the two never disagree. Pure.
 */
export function criteriaDifferences(input: unknown, card: Record<string, unknown> | null | undefined): Record<string, DiffValue> {
  if (!card || !input || typeof input !== "object") return {};
  const own = flatten(input);
  const fromCard = flatten(applyCriteriaCard(input as DesignInputDraft, card as unknown as CriteriaCardValues));
  const out: Record<string, DiffValue> = {};
  for (const [path, cardValue] of Object.entries(fromCard)) {
    if (!path.startsWith("site.") || cardValue === undefined || cardValue === null) continue;
    if ((own[path] ?? null) !== cardValue) out[path] = cardValue;
  }
  return out;
}
