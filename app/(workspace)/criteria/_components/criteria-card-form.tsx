"use client";

import { useKeptForm } from "@/components/ui/use-kept-form";
import { FormStatus, SubmitButton } from "@/components/ui/form";
import type { CriteriaCard } from "@/db/queries/criteria-cards";
import { saveCriteriaCardAction } from "../actions";
import { todayInZone } from "@/components/ui/dates";
import { roundFor, toDisplay, unitLabel, type UnitKind, type UnitSystem } from "@/components/format/quantity";
import { CRITERIA_NUMBER_KINDS, CRITERIA_NUMBER_RANGES } from "./criteria-units";

const ROWS = [
  { key: "buildingCode", label: "Building code in force", unit: "", kind: "text", hint: "e.g. IBC 2021" },
  { key: "asceEdition", label: "ASCE 7 edition", unit: "", kind: "select", options: [["7-16", "ASCE 7-16"], ["7-22", "ASCE 7-22"]] },
  { key: "riskCategory", label: "Risk category", unit: "", kind: "select", options: [["I", "I"], ["II", "II"], ["III", "III"], ["IV", "IV"]] },
  { key: "windSpeedMph", label: "Design wind speed", unit: "mph", kind: "number" },
  { key: "exposure", label: "Exposure category", unit: "", kind: "select", options: [["B", "B"], ["C", "C"], ["D", "D"]] },
  { key: "groundSnowPsf", label: "Ground snow load", unit: "psf", kind: "number" },
  { key: "frostDepthIn", label: "Frost depth", unit: "in", kind: "number" },
  { key: "soilClass", label: "Presumed soil class", unit: "", kind: "select", options: [["1", "1"], ["2", "2"], ["3", "3"], ["4", "4"], ["5", "5"]] },
] as const;

const box = "block w-full rounded-md border border-slate-300 bg-white px-2 py-1.5 text-sm aria-[invalid]:border-red-600";

/** A jurisdiction's criteria: each value with where it comes from and when it was checked. */
/** A stored (customary) value as the reader types it: converted and rounded as every screen shows it. */
function shownValue(stored: unknown, kind: UnitKind, units: UnitSystem): string {
  const n = Number(stored);
  if (stored === undefined || stored === null || stored === "" || !Number.isFinite(n)) return "";
  return String(roundFor(toDisplay(n, kind, units), kind, units));
}

/**
 * The numbers show and are typed in the reader's units (`units`, the `pierwise-units` cookie); the
 * card keeps mph, psf and in. The action converts back (actions.ts); a value left as shown keeps
 * its stored number exactly, so saving an unchanged card in metric does not drift by rounding.
 */
// On a phone the header row is hidden, so the source and date inputs carry their column's name above them.
const PHONE_LABEL = "max-sm:before:block max-sm:before:text-xs max-sm:before:text-slate-600 max-sm:before:content-[attr(data-label)]";

export function CriteriaCardForm({ card, states, timeZone, units = "imperial" }: { card?: CriteriaCard; states: readonly string[]; timeZone?: string; units?: UnitSystem }) {
  const { state, formProps } = useKeptForm(saveCriteriaCardAction);
  const today = todayInZone(timeZone);
  const v = (name: string, fallback: string) => state.values?.[name] ?? fallback;
  const err = (name: string) => state.fieldErrors?.[name]?.join(" ");
  const E = ({ name }: { name: string }) => (err(name) ? <p className="text-xs font-medium text-red-700">{err(name)}</p> : null);
  return (
    <form {...formProps} className="space-y-4 rounded-lg border border-slate-200 bg-white p-4">
      {card ? <input type="hidden" name="cardId" value={card.id} /> : null}
      <input type="hidden" name="units" value={units} />
      <div className="grid gap-3 sm:grid-cols-[1fr_8rem]">
        <div className="space-y-1">
          <label htmlFor="cc-jurisdiction" className="block text-sm font-medium">Jurisdiction</label>
          <input id="cc-jurisdiction" name="jurisdiction" defaultValue={v("jurisdiction", card?.jurisdiction ?? "")} placeholder="e.g. the county or city" aria-invalid={err("jurisdiction") ? true : undefined} className={box} />
          <E name="jurisdiction" />
        </div>
        <div className="space-y-1">
          <label htmlFor="cc-state" className="block text-sm font-medium">State</label>
          <select id="cc-state" name="state" defaultValue={v("state", card?.state ?? "CO")} className={box}>{states.map((s) => <option key={s}>{s}</option>)}</select>
          <E name="state" />
        </div>
      </div>
      {/* Below 640 px each criterion reads as a block (name, value, source, date, each with its name),
          so a phone shows which row an input belongs to without sideways scrolling. */}
      <div className="sm:overflow-x-auto">
        <table className="min-w-full text-sm max-sm:block">
          <thead className="max-sm:sr-only"><tr className="text-left text-xs text-slate-600"><th className="py-1 pr-2">Criterion</th><th className="py-1 pr-2">Value</th><th className="py-1 pr-2">Source</th><th className="py-1">Date checked</th></tr></thead>
          <tbody className="align-top max-sm:block">
            {ROWS.map((r) => {
              const numberKind = r.kind === "number" ? CRITERIA_NUMBER_KINDS[r.key as keyof typeof CRITERIA_NUMBER_KINDS] : undefined;
              const current = card ? (numberKind ? shownValue(card.values[r.key], numberKind, units) : String(card.values[r.key])) : "";
              const unit = numberKind ? unitLabel(numberKind, units) : r.unit;
              const range = numberKind ? CRITERIA_NUMBER_RANGES[r.key as keyof typeof CRITERIA_NUMBER_RANGES] : undefined;
              const hint = range && numberKind ? `${shownValue(range[0], numberKind, units)}–${shownValue(range[1], numberKind, units)}` : "hint" in r ? r.hint : undefined;
              const src = card?.sources[r.key];
              return (
                <tr key={r.key} className="border-t border-slate-100 max-sm:block max-sm:py-2">
                  <th scope="row" className="py-2 pr-2 text-left font-medium whitespace-nowrap max-sm:block max-sm:pb-1"><label htmlFor={`cc-${r.key}`}>{r.label}</label>{unit ? <span className="ml-1 font-normal text-slate-500">({unit})</span> : null}</th>
                  <td className="py-2 pr-2 sm:min-w-28 max-sm:block max-sm:py-1 max-sm:pr-0">
                    {r.kind === "select" ? (
                      <select id={`cc-${r.key}`} name={`values.${r.key}`} defaultValue={v(`values.${r.key}`, current || (r.key === "riskCategory" ? "II" : r.key === "soilClass" ? "4" : r.key === "exposure" ? "C" : "7-16"))} className={box}>
                        {r.options.map(([val, label]) => <option key={val} value={val}>{label}</option>)}
                      </select>
                    ) : (
                      <input id={`cc-${r.key}`} name={`values.${r.key}`} inputMode={r.kind === "number" ? "decimal" : undefined} defaultValue={v(`values.${r.key}`, current)} placeholder={hint} aria-invalid={err(`values.${r.key}`) ? true : undefined} className={box} />
                    )}
                    {numberKind && card ? (
                      <>
                        <input type="hidden" name={`shown.${r.key}`} value={current} />
                        <input type="hidden" name={`stored.${r.key}`} value={String(card.values[r.key])} />
                      </>
                    ) : null}
                    <E name={`values.${r.key}`} />
                  </td>
                  <td data-label="Source" className={`py-2 pr-2 sm:min-w-56 max-sm:block max-sm:py-1 max-sm:pr-0 ${PHONE_LABEL}`}>
                    <input aria-label={`${r.label}: source`} name={`sources.${r.key}.source`} defaultValue={v(`sources.${r.key}.source`, src?.source ?? "")} placeholder="e.g. county design criteria sheet" aria-invalid={err(`sources.${r.key}.source`) ? true : undefined} className={box} />
                    <E name={`sources.${r.key}.source`} />
                  </td>
                  <td data-label="Date checked" className={`py-2 sm:min-w-36 max-sm:block max-sm:py-1 ${PHONE_LABEL}`}>
                    <input aria-label={`${r.label}: date checked`} type="date" name={`sources.${r.key}.checkedOn`} defaultValue={v(`sources.${r.key}.checkedOn`, src?.checkedOn ?? today)} aria-invalid={err(`sources.${r.key}.checkedOn`) ? true : undefined} className={box} />
                    <E name={`sources.${r.key}.checkedOn`} />
                  </td>
                </tr>
              );
            })}
          </tbody>
        </table>
      </div>
      <div className="flex items-center gap-3">
        <SubmitButton pendingText="Saving…">{card ? "Save card" : "Add card"}</SubmitButton>
        <FormStatus state={state} />
      </div>
    </form>
  );
}
