"use client";

import { useKeptForm } from "@/components/ui/use-kept-form";
import { FormStatus, SubmitButton } from "@/components/ui/form";
import { formatQuantity, unitLabel, type UnitSystem } from "@/components/format/quantity";
import { recordAsBuiltAction } from "../actions";

const GROUND = [
  ["as_expected", "As expected"],
  ["rock", "Rock"],
  ["water", "Water in the hole"],
  ["fill", "Fill or loose soil"],
  ["caving", "Caving sides"],
] as const;

/** One hole as dug: measured diameter and depth, ground found, photos. */
export function AsBuiltForm({ revisionId, postIds, diameterIn, depthIn, units = "imperial" }: { revisionId: string; postIds: string[]; diameterIn: number; depthIn: number; units?: UnitSystem }) {
  const { state, formProps } = useKeptForm(recordAsBuiltAction, { resetOnSuccess: true });
  const v = state.values ?? {};
  const err = (name: string) => state.fieldErrors?.[name];
  const errorLine = (name: string) => (err(name) ? <p id={`${name}-error`} className="text-sm text-red-700">{err(name)!.join(" ")}</p> : null);
  const input = "block w-full rounded-md border border-slate-300 bg-white px-3 py-3 text-base aria-[invalid]:border-red-600";
  return (
    <form {...formProps} className="space-y-3">
      <input type="hidden" name="revisionId" value={revisionId} />
      {/* Measurements are typed in the reader's units; the action converts millimetres to inches. */}
      <input type="hidden" name="units" value={units} />
      <div>
        <label htmlFor="postId" className="block text-sm font-medium">Hole at post</label>
        <select id="postId" name="postId" defaultValue={v.postId ?? postIds[0]} className={input} aria-invalid={err("postId") ? true : undefined}>
          {postIds.map((id) => <option key={id} value={id}>Post {id}</option>)}
        </select>
        {errorLine("postId")}
      </div>
      <div className="grid grid-cols-2 gap-3">
        <div>
          <label htmlFor="measuredDiameterIn" className="block text-sm font-medium">Measured diameter ({unitLabel("in", units)})</label>
          <input id="measuredDiameterIn" name="measuredDiameterIn" inputMode="decimal" defaultValue={v.measuredDiameterIn ?? ""} placeholder={`spec ${formatQuantity(diameterIn, "in", units).replace(/ \S+$/, "")}`}
            aria-invalid={err("measuredDiameterIn") ? true : undefined} aria-describedby={err("measuredDiameterIn") ? "measuredDiameterIn-error" : undefined} className={input} />
          {errorLine("measuredDiameterIn")}
        </div>
        <div>
          <label htmlFor="measuredDepthIn" className="block text-sm font-medium">Measured depth ({unitLabel("in", units)})</label>
          <input id="measuredDepthIn" name="measuredDepthIn" inputMode="decimal" defaultValue={v.measuredDepthIn ?? ""} placeholder={`spec ${formatQuantity(depthIn, "in", units).replace(/ \S+$/, "")}`}
            aria-invalid={err("measuredDepthIn") ? true : undefined} aria-describedby={err("measuredDepthIn") ? "measuredDepthIn-error" : undefined} className={input} />
          {errorLine("measuredDepthIn")}
        </div>
      </div>
      <div>
        <label htmlFor="groundFound" className="block text-sm font-medium">Ground found</label>
        <select id="groundFound" name="groundFound" defaultValue={v.groundFound ?? "as_expected"} className={input} aria-invalid={err("groundFound") ? true : undefined}>
          {GROUND.map(([value, label]) => <option key={value} value={value}>{label}</option>)}
        </select>
        {errorLine("groundFound")}
      </div>
      <div>
        <label htmlFor="notes" className="block text-sm font-medium">Notes</label>
        <textarea id="notes" name="notes" rows={2} defaultValue={v.notes ?? ""} className={input} />
        {errorLine("notes")}
      </div>
      <div>
        <label htmlFor="photos" className="block text-sm font-medium">Photos of the hole (up to 6)</label>
        <input id="photos" name="photos" type="file" accept="image/jpeg,image/png,image/webp" capture="environment" multiple className="block w-full text-base" />
        {errorLine("photos")}
      </div>
      <p className="text-sm text-slate-600">A hole shallower or narrower than the spec, or rock, water, fill or caving, puts the job on hold until the engineer clears it.</p>
      <div className="flex flex-wrap items-center gap-3">
        <SubmitButton pendingText="Saving…">Record this hole</SubmitButton>
        <FormStatus state={state} />
      </div>
    </form>
  );
}
