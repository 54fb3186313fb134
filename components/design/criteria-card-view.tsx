import type { CriteriaCard } from "@/db/queries/criteria-cards";

const ROWS: { key: keyof CriteriaCard["values"]; label: string; show: (v: CriteriaCard["values"]) => string }[] = [
  { key: "buildingCode", label: "Building code", show: (v) => v.buildingCode },
  { key: "asceEdition", label: "ASCE 7 edition", show: (v) => `ASCE ${v.asceEdition}` },
  { key: "riskCategory", label: "Risk category", show: (v) => v.riskCategory },
  { key: "windSpeedMph", label: "Design wind speed", show: (v) => `${v.windSpeedMph} mph` },
  { key: "exposure", label: "Exposure", show: (v) => v.exposure },
  { key: "groundSnowPsf", label: "Ground snow load", show: (v) => `${v.groundSnowPsf} psf` },
  { key: "frostDepthIn", label: "Frost depth", show: (v) => `${v.frostDepthIn} in` },
  { key: "soilClass", label: "Presumed soil class", show: (v) => `Class ${v.soilClass} (IBC Table 1806.2)` },
];

/** A criteria card's values, each with its source and the date it was checked. */
export function CriteriaCardView({ card, compact = false }: { card: CriteriaCard; compact?: boolean }) {
  return (
    <dl className={`grid gap-x-6 gap-y-2 ${compact ? "text-xs" : "text-sm"} sm:grid-cols-2`}>
      {ROWS.map((r) => {
        const source = card.sources[r.key];
        return (
          <div key={r.key} className="border-b border-slate-100 pb-1">
            <dt className="text-slate-500">{r.label}</dt>
            <dd className="font-medium text-slate-900">{r.show(card.values)}</dd>
            <dd className="text-xs text-slate-500">{source ? `${source.source} · checked ${source.checkedOn}` : <span className="text-amber-800">Source not recorded</span>}</dd>
          </div>
        );
      })}
    </dl>
  );
}
