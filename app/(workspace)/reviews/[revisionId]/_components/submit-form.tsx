"use client";

import { useActionState } from "react";
import { FormStatus, SubmitButton } from "@/components/ui/form";
import type { ActionState } from "@/components/ui/action-state";
import { submitForReviewAction } from "../actions";

export interface EngineerChoice {
  userId: string;
  name: string;
  /** e.g. "CO licence PE-1234, valid to 2030-12-31", or why they cannot decide this review. */
  note: string;
  eligible: boolean;
}

/** The designer chooses a reviewing engineer and submits this revision. */
export function SubmitForm({ revisionId, engineers }: { revisionId: string; engineers: EngineerChoice[] }) {
  const [state, action] = useActionState<ActionState, FormData>(submitForReviewAction, {});
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
          {engineers.map((e) => <option key={e.userId} value={e.userId}>{e.name} — {e.note}</option>)}
        </select>
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
