/**
 * Where a design stands against its own checks, in one place: the footing, the check that
 * governs (highest ratio) and every check that fails. The submit panel, the review page, the
 * decision form, the field spec, the report and the public verify page all read this, so a
 * failing check cannot be missed on one of them. Client-safe (no database import).
 */
import type { DesignResult } from "@/engine";
import type { UnitSystem } from "@/components/format/quantity";
import { checkTitleIn } from "@/components/format/quantity-text";

export interface CheckLine {
  checkId: string;
  title: string;
  ratio: number;
  pass: boolean;
}

/** A failing check the engineer approved anyway, with the reason, as stored with the approval. */
export interface CheckOverride {
  checkId: string;
  title: string;
  ratio: number;
  reason: string;
}

export interface CheckOutcome {
  diameterIn: number;
  depthIn: number;
  posts: number;
  governing: CheckLine | null;
  failing: CheckLine[];
}

const line = (c: DesignResult["footing"]["checks"][number]): CheckLine => ({ checkId: c.id, title: c.title, ratio: c.ratio, pass: c.pass });

export function checkOutcome(r: DesignResult): CheckOutcome {
  const checks = r.footing.checks;
  const governing = checks.reduce<DesignResult["footing"]["checks"][number] | null>((top, c) => (top === null || c.ratio > top.ratio ? c : top), null);
  return {
    diameterIn: r.footing.diameterIn,
    depthIn: r.footing.depthIn,
    posts: r.field.posts.length,
    governing: governing ? line(governing) : null,
    failing: checks.filter((c) => !c.pass).map(line),
  };
}

/** A ratio as engineers read it: 1.03 (two decimals; "over 99" for a ratio with no capacity): the one ratio formatter. */
export { formatRatio as ratioText } from "@/components/format/ratio";

/** The outcome with every check title in the reader's units ("Hole at least 102 mm larger than the post"). */
export function outcomeIn(outcome: CheckOutcome, units: UnitSystem): CheckOutcome {
  const local = (l: CheckLine): CheckLine => ({ ...l, title: checkTitleIn(l, units) });
  return { ...outcome, governing: outcome.governing ? local(outcome.governing) : null, failing: outcome.failing.map(local) };
}

/** Overrides as stored with an approval, their titles in the reader's units. */
export function overridesIn(overrides: CheckOverride[], units: UnitSystem): CheckOverride[] {
  return overrides.map((o) => ({ ...o, title: checkTitleIn(o, units) }));
}
