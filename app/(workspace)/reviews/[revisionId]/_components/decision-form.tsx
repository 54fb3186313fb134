"use client";

import { useActionState, useEffect, useState } from "react";
import { ratioText, type CheckLine } from "@/components/review/check-outcome";
import { FormStatus, SubmitButton } from "@/components/ui/form";
import type { ActionState } from "@/components/ui/action-state";
import { decideReviewAction } from "../actions";

interface DecisionProps {
  revisionId: string;
  inputs: { path: string; label: string }[];
  /** Checks this revision fails: approving needs a reason for each. */
  failing: CheckLine[];
  licenceNote: string;
  licenceProblem: string | null;
  open: boolean;
}

/**
 * Approve or request changes. Each comment may be pinned to an input; requesting changes needs
 * at least one comment. Approving is a signature: the engineer's password, and a reason for each
 * failing check. A signed letter may go with an approval.
 */
export function DecisionPanel(props: DecisionProps) {
  const [state, action] = useActionState<ActionState, FormData>(decideReviewAction, {});
  // Stays mounted once the decision is made (the page then no longer offers the form) to keep the confirmation in view.
  if (!props.open) return state.ok ? <p role="status" className="no-print rounded-lg border-2 border-accent-600 bg-accent-50 p-4 text-sm font-medium">{state.message}</p> : null;
  return (
    <section aria-labelledby="decide-h" className="no-print rounded-lg border-2 border-accent-600 bg-white p-4">
      <h2 id="decide-h" className="text-base font-semibold">Your decision</h2>
      {props.licenceProblem ? <p role="alert" className="mt-2 rounded bg-red-50 p-2 text-sm text-red-800">{props.licenceProblem}</p> : null}
      <div className="mt-3"><DecisionForm {...props} state={state} action={action} /></div>
    </section>
  );
}

function DecisionForm({ revisionId, inputs, failing, licenceNote, state, action }: DecisionProps & { state: ActionState; action: (form: FormData) => void }) {
  const [count, setCount] = useState(1);
  const sent = state.values?.decision === "approve" ? "approve" : "request-changes";
  const [decision, setDecision] = useState(sent);
  // React resets the form after each action (radios back to their default): follow what was sent.
  useEffect(() => setDecision(sent), [state, sent]);
  const rows = Math.max(count, ...Object.keys(state.values ?? {}).map((k) => Number(k.match(/^comment\.(\d+)\./)?.[1] ?? -1) + 1));
  const err = (name: string) => state.fieldErrors?.[name];
  const approving = decision === "approve";
  return (
    <form action={action} className="space-y-4">
      <input type="hidden" name="revisionId" value={revisionId} />
      <fieldset className="space-y-2">
        <legend className="text-sm font-medium">Decision</legend>
        <label className="flex items-center gap-2 text-sm">
          <input type="radio" name="decision" value="request-changes" defaultChecked={sent !== "approve"} onChange={() => setDecision("request-changes")} /> Request changes
        </label>
        <label className="flex items-center gap-2 text-sm">
          <input type="radio" name="decision" value="approve" defaultChecked={sent === "approve"} onChange={() => setDecision("approve")} /> Approve for construction
        </label>
        {err("decision") ? <p className="text-sm text-red-700">{err("decision")!.join(" ")}</p> : null}
      </fieldset>
      {failing.length ? (
        <fieldset className="space-y-3 rounded-md border-2 border-red-600 bg-red-50 p-3" disabled={!approving}>
          <legend className="px-1 text-sm font-semibold text-red-900">{failing.length === 1 ? "1 check fails" : `${failing.length} checks fail`}: to approve, give your reason for each</legend>
          {!approving ? <p className="text-xs text-red-900">Choose “Approve for construction” to accept these failures with a reason each; the reasons go on the field spec and the report.</p> : null}
          {failing.map((f, i) => (
            <div key={f.checkId} className="space-y-1">
              <input type="hidden" name={`override.${i}.checkId`} value={f.checkId} />
              <label htmlFor={`override-${i}`} className="block text-sm font-medium text-red-950">{f.title}: ratio {ratioText(f.ratio)}</label>
              <textarea id={`override-${i}`} name={`override.${i}.reason`} rows={2} defaultValue={state.values?.[`override.${i}.reason`] ?? ""}
                placeholder="Why this is acceptable (10 to 2,000 characters)" aria-invalid={err(`overrides.${i}.reason`) ? true : undefined}
                className="block w-full rounded-md border border-slate-300 bg-white px-2 py-1 text-sm aria-[invalid]:border-red-600" />
              {err(`overrides.${i}.reason`) ? <p className="text-sm text-red-700">{err(`overrides.${i}.reason`)!.join(" ")}</p> : null}
            </div>
          ))}
          {err("overrides") ? <p className="text-sm text-red-700">{err("overrides")!.join(" ")}</p> : null}
        </fieldset>
      ) : null}
      <fieldset className="space-y-3">
        <legend className="text-sm font-medium">Comments (pin each to an input, or leave it general)</legend>
        {Array.from({ length: rows }, (_, i) => (
          <div key={i} className="space-y-1 rounded-md border border-slate-200 p-2">
            <label htmlFor={`comment-${i}-field`} className="block text-xs text-slate-600">Comment {i + 1} is about</label>
            <select id={`comment-${i}-field`} name={`comment.${i}.fieldPath`} defaultValue={state.values?.[`comment.${i}.fieldPath`] ?? ""}
              className="block w-full rounded-md border border-slate-300 bg-white px-2 py-1 text-sm">
              <option value="">The design in general</option>
              {inputs.map((f) => <option key={f.path} value={f.path}>{f.label}</option>)}
            </select>
            <label htmlFor={`comment-${i}-body`} className="sr-only">Comment {i + 1}</label>
            <textarea id={`comment-${i}-body`} name={`comment.${i}.body`} rows={2} defaultValue={state.values?.[`comment.${i}.body`] ?? ""}
              placeholder="What should change, and why"
              aria-invalid={err(`comments.${i}.fieldPath`) || err(`comments.${i}.body`) ? true : undefined}
              className="block w-full rounded-md border border-slate-300 px-2 py-1 text-sm aria-[invalid]:border-red-600" />
            {err(`comments.${i}.fieldPath`) || err(`comments.${i}.body`) ? <p className="text-sm text-red-700">{[...(err(`comments.${i}.fieldPath`) ?? []), ...(err(`comments.${i}.body`) ?? [])].join(" ")}</p> : null}
          </div>
        ))}
        {err("comments") ? <p className="text-sm text-red-700">{err("comments")!.join(" ")}</p> : null}
        <button type="button" onClick={() => setCount(rows + 1)} className="rounded-md border border-slate-300 px-3 py-1 text-sm hover:bg-slate-50">Add another comment</button>
      </fieldset>
      <div className="space-y-1">
        <label htmlFor="letter" className="block text-sm font-medium">Signed letter (optional, with an approval; PDF or image up to 10 MB)</label>
        <input id="letter" name="letter" type="file" accept="application/pdf,image/jpeg,image/png,image/webp" className="block text-sm" aria-describedby={err("letter") ? "letter-error" : undefined} />
        {err("letter") ? <p id="letter-error" className="text-sm text-red-700">{err("letter")!.join(" ")}</p> : null}
      </div>
      {approving ? (
        <div className="space-y-1">
          <label htmlFor="password" className="block text-sm font-medium">Your password, to sign the approval</label>
          <input id="password" name="password" type="password" autoComplete="current-password" required aria-invalid={err("password") ? true : undefined}
            aria-describedby={err("password") ? "password-error" : undefined}
            className="block w-full rounded-md border border-slate-300 px-2 py-1 text-sm aria-[invalid]:border-red-600" />
          {err("password") ? <p id="password-error" className="text-sm text-red-700">{err("password")!.join(" ")}</p> : null}
        </div>
      ) : null}
      <p className="text-xs text-slate-600">{licenceNote}</p>
      <div className="flex flex-wrap items-center gap-3">
        <SubmitButton pendingText="Recording…">{approving ? "Sign and approve" : "Record decision"}</SubmitButton>
        <FormStatus state={state} />
      </div>
    </form>
  );
}
