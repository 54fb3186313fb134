import { defaultDesignInput } from "../engine/default-design";
import type { DesignInputDraft } from "../engine/schema";
import type { CriteriaCardValues } from "./queries/criteria-cards";

/**
 * A new design's starting input: the engine's demo defaults with the site criteria replaced by the
 * project's criteria card, so a contractor enters a county's criteria once. Pure (client-safe).
 */
export function applyCriteriaCard<T extends DesignInputDraft>(input: T, card: CriteriaCardValues | null | undefined): T {
  if (!card) return input;
  return {
    ...input,
    site: {
      ...input.site,
      edition: card.asceEdition,
      riskCategory: card.riskCategory,
      windSpeedMph: card.windSpeedMph,
      exposure: card.exposure,
      groundSnowPsf: card.groundSnowPsf,
      frostDepthIn: card.frostDepthIn,
      soil: { method: "class", soilClass: card.soilClass },
    },
  };
}

export function startingInput(card: CriteriaCardValues | null | undefined, projectName?: string): DesignInputDraft {
  const base = structuredClone(defaultDesignInput) as unknown as DesignInputDraft;
  return applyCriteriaCard({ ...base, projectName: projectName?.slice(0, 120) ?? base.projectName }, card);
}
