"use client";

import { useFormContext, useWatch } from "react-hook-form";
import { formatPipeSize, type UnitSystem } from "@/components/format/quantity";
import { PIPE_SIZES } from "@/engine/footing/pipe";
import { CheckField, ListField, NumberField, SelectField } from "./editor-fields";
import { usePinnedUnder } from "./pinned-comments";

/** The three input groups of the editor: Site, Array, Posts and footings. */
function Group({ id, title, lead, children, more }: { id: string; title: string; lead: string; children: React.ReactNode; more?: React.ReactNode }) {
  // An engineer's comment may sit on a field under "More … settings": open them so it is seen.
  const pinnedHere = usePinnedUnder(`${id.replace("group-", "")}.`);
  return (
    <section aria-labelledby={id} className="rounded-lg border border-slate-200 bg-white p-4">
      <h2 id={id} className="text-base font-semibold text-slate-900">{title}</h2>
      <p className="mb-3 text-xs text-slate-500">{lead}</p>
      <div className="grid gap-4 sm:grid-cols-2">{children}</div>
      {more ? (
        <details open={pinnedHere || undefined} className="mt-4 rounded-md border border-slate-100 bg-slate-50 px-3 py-2">
          <summary className="cursor-pointer text-sm font-medium text-slate-700">More {title.toLowerCase()} settings</summary>
          <div className="mt-3 grid gap-4 pb-2 sm:grid-cols-2">{more}</div>
        </details>
      ) : null}
    </section>
  );
}

export function SiteGroup({ units, card }: { units: UnitSystem; card: { label: string; apply: () => void } | null }) {
  const { setValue } = useFormContext();
  const soilMethod = useWatch({ name: "site.soil.method" });
  const topoMethod = useWatch({ name: "site.topography.method" });
  return (
    <Group
      id="group-site"
      title="Site"
      lead="Wind, snow, soil and ground at this site. Values from the criteria card are filled in when the design is created."
      more={
        <>
          <SelectField name="site.riskCategory" options={[["I", "I"], ["II", "II (typical array)"], ["III", "III"], ["IV", "IV"]]} />
          <NumberField name="site.groundElevationFt" units={units} />
          <NumberField name="site.snowExposureCe" units={units} />
          <NumberField name="site.snowThermalCt" units={units} />
          <NumberField name="site.waterTableDepthFt" units={units} optional />
          <SelectField name="site.topography.method" options={[["flat", "Flat or gently rolling"], ["kzt", "Kzt given by the engineer"], ["hill", "Hill, ridge or escarpment (K1, K2, K3)"]]}
            onPick={(m) => setValue("site.topography", m === "flat" ? { method: "flat" } : m === "kzt" ? { method: "kzt", kzt: 1 } : { method: "hill", k1: 0, k2: 0, k3: 0 }, { shouldValidate: true, shouldDirty: true })} />
          {topoMethod === "kzt" ? <NumberField name="site.topography.kzt" units={units} /> : null}
          {topoMethod === "hill" ? (<><NumberField name="site.topography.k1" units={units} /><NumberField name="site.topography.k2" units={units} /><NumberField name="site.topography.k3" units={units} /></>) : null}
        </>
      }
    >
      <div className="flex flex-wrap items-center justify-between gap-2 rounded-md bg-accent-50 px-3 py-2 text-sm sm:col-span-2">
        <span>{card ? <>Criteria card: <strong>{card.label}</strong></> : "No criteria card on this project: check every site value."}</span>
        {card ? <button type="button" onClick={card.apply} className="rounded border border-accent-600 bg-white px-2 py-1 text-xs font-medium text-accent-800 hover:bg-accent-100">Re-apply card values</button> : null}
      </div>
      <SelectField name="site.edition" options={[["7-16", "ASCE 7-16"], ["7-22", "ASCE 7-22"]]} />
      <NumberField name="site.windSpeedMph" units={units} />
      <SelectField name="site.exposure" options={[["B", "B: suburban, wooded"], ["C", "C: open country"], ["D", "D: facing open water"]]} />
      <NumberField name="site.groundSnowPsf" units={units} />
      <SelectField name="site.soil.method" options={[["class", "Presumed class (IBC Table 1806.2)"], ["custom", "Soil report values"]]}
        onPick={(m) => setValue("site.soil", m === "class" ? { method: "class", soilClass: 4 } : { method: "custom", allowableBearingPsf: 2000, lateralBearingPsfPerFt: 150 }, { shouldValidate: true, shouldDirty: true })} />
      {soilMethod === "custom" ? (
        <>
          <NumberField name="site.soil.allowableBearingPsf" units={units} />
          <NumberField name="site.soil.lateralBearingPsfPerFt" units={units} />
        </>
      ) : (
        <SelectField name="site.soil.soilClass" numeric options={[[1, "1: crystalline bedrock"], [2, "2: sedimentary rock"], [3, "3: sandy gravel, gravel"], [4, "4: sand, silty sand, clayey sand"], [5, "5: clay, sandy clay, silt"]]} />
      )}
      <NumberField name="site.frostDepthIn" units={units} />
      <NumberField name="site.slopeAlongPct" units={units} />
      <NumberField name="site.slopeAcrossPct" units={units} />
    </Group>
  );
}

export function ArrayGroup({ units }: { units: UnitSystem }) {
  return (
    <Group
      id="group-array"
      title="Array"
      lead="The modules and how the rack holds them."
      more={
        <>
          <NumberField name="array.gapIn" units={units} />
          <NumberField name="array.rackingDeadPsf" units={units} />
          <NumberField name="array.rackDepthIn" units={units} />
          <ListField name="array.tiltSettingsDeg" units={units} optional />
          <SelectField name="array.flow" options={[["clear", "Clear"], ["obstructed", "Obstructed (blocked underneath)"]]} />
          <CheckField name="array.slipperySurface" />
          <NumberField name="array.azimuthDeg" units={units} />
        </>
      }
    >
      <NumberField name="array.moduleLengthIn" units={units} />
      <NumberField name="array.moduleWidthIn" units={units} />
      <NumberField name="array.moduleWeightLb" units={units} />
      <SelectField name="array.orientation" options={[["portrait", "Portrait"], ["landscape", "Landscape"]]} />
      <NumberField name="array.rows" units={units} />
      <NumberField name="array.columns" units={units} />
      <NumberField name="array.tiltDeg" units={units} />
      <NumberField name="array.lowestEdgeClearanceIn" units={units} />
    </Group>
  );
}

export function PostsGroup({ units }: { units: UnitSystem }) {
  const { setValue, getValues } = useFormContext();
  const hole = useWatch({ name: "posts.holeDiameterIn" });
  const auto = hole === "auto";
  return (
    <Group
      id="group-posts"
      title="Posts and footings"
      lead="Steel pipe posts set in concrete-filled augered holes."
      more={
        <>
          <NumberField name="posts.yieldKsi" units={units} />
          <NumberField name="posts.depthIncrementIn" units={units} />
          <NumberField name="posts.fixedDepthIn" units={units} optional />
          <NumberField name="posts.sideFrictionPsf" units={units} optional />
          <ListField name="posts.sweepDiametersIn" units={units} />
          {auto ? <NumberField name="posts.maxAutoDepthIn" units={units} /> : null}
          <CheckField name="posts.isolatedPoleIncrease" units={units} />
          <CheckField name="posts.subtractPostDisplacement" />
          <SelectField name="posts.bearingPressure" options={[["gross", "Gross pressure (default)"], ["net", "Net pressure: soil removed credited (engineer's option)"]]} />
          <NumberField name="posts.soilUnitWeightPcf" units={units} />
          <NumberField name="posts.concreteStrengthPsi" units={units} />
          <NumberField name="posts.maxAggregateIn" units={units} />
          <NumberField name="posts.slumpIn" units={units} />
        </>
      }
    >
      <NumberField name="posts.count" units={units} />
      <NumberField name="posts.spacingFt" units={units} optional />
      <SelectField name="posts.pipeSize" options={PIPE_SIZES.map((s) => [s, formatPipeSize(s, units)] as const)} />
      <div className="space-y-2">
        {auto ? <ListField name="posts.autoDiametersIn" units={units} /> : <NumberField name="posts.holeDiameterIn" units={units} />}
        <label className="flex items-center gap-2 text-sm">
          <input type="checkbox" checked={auto} className="h-4 w-4 accent-accent-700"
            onChange={(e) => setValue("posts.holeDiameterIn", e.target.checked ? "auto" : (getValues("posts.autoDiametersIn")?.[2] ?? 24), { shouldValidate: true, shouldDirty: true })} />
          Size the hole for me
        </label>
      </div>
      <CheckField name="posts.constrainedAtGrade" />
      <NumberField name="posts.concreteUnitWeightPcf" units={units} />
      <NumberField name="posts.wasteAllowancePct" units={units} />
    </Group>
  );
}
