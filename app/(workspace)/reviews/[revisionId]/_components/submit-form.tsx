"use client";

import { useActionState } from "react";
import { FormStatus, SubmitButton } from "@/components/ui/form";
import type { ActionState } from "@/components/ui/action-state";
import { ratioText, type CheckOutcome } from "@/components/review/check-outcome";
import { formatFootingSize, type UnitSystem } from "@/components/format/quantity";
import { submitForReviewAction } from "../actions";

export interface EngineerChoice {
  userId: string;
  name: string;
  /** e.g. "CO licence PE-1234, valid to 2030-12-31", or why they cannot decide this review. */
  note: string;
  eligible: boolean;
}

/**
 * The designer chooses a reviewing engineer and submits this revision. Stays mounted after a
 * successful submit (when the page no longer offers the form) so its confirmation stays in view.
 */
export function SubmitPanel({ revisionId, engineers, open, resubmit, outcome, units = "imperial" }: { revisionId: string; engineers: EngineerChoice[]; open: boolean; resubmit: boolean; outcome: CheckOutcome; units?: UnitSystem }) {
  const [state, action] = useActionState<ActionState, FormData>(submitForReviewAction, {});
  if (!open) return state.ok ? <p role="status" className="no-print rounded-lg border-2 border-accent-600 bg-accent-50 p-4 text-sm font-medium">{state.message}</p> : null;
  return (
    <section aria-labelledby="submit-h" className="no-print rounded-lg border-2 border-accent-600 bg-white p-4">
      <h2 id="submit-h" className="text-base font-semibold">{resubmit ? "Resubmit for review" : "Submit for review"}</h2>
      <p className="mt-1 text-sm">Footing {formatFootingSize(outcome.diameterIn, outcome.depthIn, units)}{outcome.governing ? `; governing check ${outcome.governing.title}, ratio ${ratioText(outcome.governing.ratio)}` : ""}.</p>
      {outcome.failing.length ? (
        <div role="note" className="mt-2 rounded-md border-2 border-red-600 bg-red-50 p-2 text-sm text-red-950">
          <p className="font-semibold">This revision fails {outcome.failing.map((f) => `${f.title} (ratio ${ratioText(f.ratio)})`).join(", ")}.</p>
          <p>You can still submit it to ask for the engineer&apos;s judgement: they approve it only with a written reason for each failing check.</p>
        </div>
      ) : null}
      {resubmit ? <p className="mt-1 text-sm text-slate-600">Changes were requested on this revision: save a new revision with the changes and submit that one, or resubmit this one as it is.</p> : null}
      <div className="mt-3"><SubmitForm revisionId={revisionId} engineers={engineers} state={state} action={action} /></div>
    </section>
  );
}

function SubmitForm({ revisionId, engineers, state, action }: { revisionId: string; engineers: EngineerChoice[]; state: ActionState; action: (form: FormData) => void }) {
  const error = state.fieldErrors?.engineerId;
  const firstEligible = engineers.find((e) => e.eligible)?.userId ?? "";
  return (
    <form action={action} className="space-y-3">
      <input type="hidden" name="revisionId" value={revisionId} />
      <div className="space-y-1">
        <label htmlFor="engineerId" className="block text-sm font-medium">Reviewing engineer</label>
        <select id="engineerId" name="engineerId" defaultValue={state.values?.engineerId ?? firstEligible} aria-invalid={error ? true : undefined} aria-describedby={error ? "engineerId-error" : undefined}
          className="block w-full rounded-md border border-slate-300 bg-white px-3 py-2 text-sm aria-[invalid]:border-red-600">
          <option value="">Choose an engineer…</option>
          {engineers.map((e) => <option key={e.userId} value={e.userId}>{e.name}{e.eligible ? "" : " (cannot decide this review)"}</option>)}
        </select>
        <ul className="text-xs text-slate-600">{engineers.map((e) => <li key={e.userId}>{e.name}: {e.note}</li>)}</ul>
        {error ? <p id="engineerId-error" className="text-sm text-red-700">{error.join(" ")}</p> : null}
        {engineers.length === 0 ? <p className="text-sm text-amber-800">Your organisation has no member with the reviewing-engineer role yet; an admin can invite one.</p> : null}
      </div>
      <div className="flex flex-wrap items-center gap-3">
        <SubmitButton pendingText="Submitting…">Submit for review</SubmitButton>
        <FormStatus state={state} />
      </div>
    </form>
  );
}
