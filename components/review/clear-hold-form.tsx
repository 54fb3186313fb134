"use client";

import { useActionState } from "react";
import { FormStatus, SubmitButton } from "@/components/ui/form";
import type { ActionState } from "@/components/ui/action-state";

/** The server action that clears a hold; the route that owns it passes it in (components import nothing from app/). */
export type ClearHoldAction = (prev: ActionState, form: FormData) => Promise<ActionState>;

export function ClearHoldForm({ holdId, clearAction }: { holdId: string; clearAction: ClearHoldAction }) {
  const [state, action] = useActionState<ActionState, FormData>(clearAction, {});
  const error = state.fieldErrors?.note;
  return (
    <form action={action} className="no-print mt-2 space-y-2 rounded-md border border-red-200 bg-white p-3 text-slate-900">
      <input type="hidden" name="holdId" value={holdId} />
      <label htmlFor={`note-${holdId}`} className="block text-sm font-medium">How was it resolved, and what is the crew to do? (engineers only)</label>
      <textarea id={`note-${holdId}`} name="note" rows={2} defaultValue={state.values?.note ?? ""} aria-invalid={error ? true : undefined} aria-describedby={error ? `note-${holdId}-error` : undefined}
        className="block w-full rounded-md border border-slate-300 px-2 py-1 text-sm aria-[invalid]:border-red-600" />
      {error ? <p id={`note-${holdId}-error`} className="text-sm text-red-700">{error.join(" ")}</p> : null}
      <label className="flex items-start gap-2 text-sm">
        <input type="checkbox" name="confirm" value="yes" className="mt-1" aria-invalid={state.fieldErrors?.confirm ? true : undefined} />
        <span>Work may go on as my note says. The designer and the installers who logged holes are e-mailed the note, and it shows on the field spec.</span>
      </label>
      {state.fieldErrors?.confirm ? <p className="text-sm text-red-700">{state.fieldErrors.confirm.join(" ")}</p> : null}
      <div className="flex items-center gap-3">
        <SubmitButton pendingText="Clearing…">Clear hold</SubmitButton>
        <FormStatus state={state} />
      </div>
    </form>
  );
}
