import type { CriteriaCard } from "@/db/queries/criteria-cards";
import { formatQuantity, type UnitSystem } from "@/components/format/quantity";

// Sizes through the one formatter, so a card reads in the reader's units like every other screen.
const ROWS: { key: keyof CriteriaCard["values"]; label: string; show: (v: CriteriaCard["values"], units: UnitSystem) => string }[] = [
  { key: "buildingCode", label: "Building code", show: (v) => v.buildingCode },
  { key: "asceEdition", label: "ASCE 7 edition", show: (v) => `ASCE ${v.asceEdition}` },
  { key: "riskCategory", label: "Risk category", show: (v) => v.riskCategory },
  { key: "windSpeedMph", label: "Design wind speed", show: (v, u) => formatQuantity(v.windSpeedMph, "mph", u) },
  { key: "exposure", label: "Exposure", show: (v) => v.exposure },
  { key: "groundSnowPsf", label: "Ground snow load", show: (v, u) => formatQuantity(v.groundSnowPsf, "psf", u) },
  { key: "frostDepthIn", label: "Frost depth", show: (v, u) => formatQuantity(v.frostDepthIn, "in", u) },
  { key: "soilClass", label: "Presumed soil class", show: (v) => `Class ${v.soilClass} (IBC Table 1806.2)` },
];

/** A criteria card's values, each with its source and the date it was checked. */
export function CriteriaCardView({ card, compact = false, units = "imperial" }: { card: CriteriaCard; compact?: boolean; units?: UnitSystem }) {
  return (
    <dl className={`grid gap-x-6 gap-y-2 ${compact ? "text-xs" : "text-sm"} sm:grid-cols-2`}>
      {ROWS.map((r) => {
        const source = card.sources[r.key];
        return (
          <div key={r.key} className="border-b border-slate-100 pb-1">
            <dt className="text-slate-500">{r.label}</dt>
            <dd className="font-medium text-slate-900">{r.show(card.values, units)}</dd>
            <dd className="text-xs text-slate-500">{source ? `${source.source} · checked ${source.checkedOn}` : <span className="text-amber-800">Source not recorded</span>}</dd>
          </div>
        );
      })}
    </dl>
  );
}
