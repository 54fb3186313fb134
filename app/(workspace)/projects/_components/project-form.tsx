"use client";

import { useKeptForm } from "@/components/ui/use-kept-form";
import { Field, FormStatus, SubmitButton, type ActionState } from "@/components/ui/form";

/** New or edit project. Keeps what was typed when the server refuses it. */
export function ProjectForm({ action, project, cards, states, submitLabel }: {
  action: (prev: ActionState, form: FormData) => Promise<ActionState>;
  project?: { id: string; name: string; address: string; state: string; latitude: number | null; longitude: number | null; notes: string; criteriaCardId: string | null };
  cards: { id: string; jurisdiction: string; state: string }[];
  states: readonly string[];
  submitLabel: string;
}) {
  const { state, formProps } = useKeptForm(action);
  const v = (k: string, fallback: string | number | null | undefined) => state.values?.[k] ?? (fallback === null || fallback === undefined ? "" : String(fallback));
  const err = (k: string) => state.fieldErrors?.[k];
  return (
    <form {...formProps} className="grid max-w-2xl gap-4 rounded-lg border border-slate-200 bg-white p-4 sm:grid-cols-2">
      {project ? <input type="hidden" name="projectId" value={project.id} /> : null}
      <div className="sm:col-span-2"><Field label="Project name" name="name" required defaultValue={v("name", project?.name)} error={err("name")} hint="The customer or site, as your crew knows it." /></div>
      <div className="sm:col-span-2"><Field label="Site address" name="address" defaultValue={v("address", project?.address)} error={err("address")} /></div>
      <div className="space-y-1">
        <label htmlFor="field-state" className="block text-sm font-medium text-slate-800">State</label>
        <select id="field-state" name="state" defaultValue={v("state", project?.state ?? "CO")} aria-invalid={err("state") ? true : undefined} className="block w-full rounded-md border border-slate-300 bg-white px-3 py-2 text-sm">
          {states.map((s) => <option key={s}>{s}</option>)}
        </select>
        {err("state") ? <p className="text-sm text-red-700">{err("state")!.join(" ")}</p> : null}
      </div>
      <div className="space-y-1">
        <label htmlFor="field-criteriaCardId" className="block text-sm font-medium text-slate-800">Design criteria card</label>
        <select id="field-criteriaCardId" name="criteriaCardId" defaultValue={v("criteriaCardId", project?.criteriaCardId)} aria-describedby="card-hint" className="block w-full rounded-md border border-slate-300 bg-white px-3 py-2 text-sm">
          <option value="">None yet</option>
          {cards.map((c) => <option key={c.id} value={c.id}>{c.jurisdiction}, {c.state}</option>)}
        </select>
        <p id="card-hint" className="text-xs text-slate-500">The jurisdiction&apos;s wind, snow, frost and soil criteria; new designs start from it.</p>
        {err("criteriaCardId") ? <p className="text-sm text-red-700">{err("criteriaCardId")!.join(" ")}</p> : null}
      </div>
      <Field label="Latitude" name="latitude" inputMode="decimal" unit="degrees" defaultValue={v("latitude", project?.latitude)} error={err("latitude")} hint="Optional, e.g. 39.55" />
      <Field label="Longitude" name="longitude" inputMode="decimal" unit="degrees" defaultValue={v("longitude", project?.longitude)} error={err("longitude")} hint="Optional, west is negative, e.g. -105.2" />
      <div className="space-y-1 sm:col-span-2">
        <label htmlFor="field-notes" className="block text-sm font-medium text-slate-800">Notes</label>
        <textarea id="field-notes" name="notes" rows={3} defaultValue={v("notes", project?.notes)} className="block w-full rounded-md border border-slate-300 bg-white px-3 py-2 text-sm" />
        {err("notes") ? <p className="text-sm text-red-700">{err("notes")!.join(" ")}</p> : null}
      </div>
      <div className="flex items-center gap-3 sm:col-span-2">
        <SubmitButton pendingText="Saving…">{submitLabel}</SubmitButton>
        <FormStatus state={state} />
      </div>
    </form>
  );
}
