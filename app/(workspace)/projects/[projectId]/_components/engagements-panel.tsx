"use client";

import { useActionState } from "react";
import { Field, FormStatus, SubmitButton } from "@/components/ui/form";
import { engageEngineerAction, revokeEngagementAction } from "../actions";

export interface EngagementItem {
  id: string;
  email: string;
  engineerName: string | null;
  status: "invited" | "accepted" | "declined" | "revoked";
  /** e.g. "invited 2026-12-02 by Dana Designer". */
  when: string;
}

const STATUS = {
  invited: { label: "Invited", tone: "bg-amber-100 text-amber-900" },
  accepted: { label: "Accepted", tone: "bg-accent-100 text-accent-900" },
  declined: { label: "Declined", tone: "bg-slate-200 text-slate-800" },
  revoked: { label: "Revoked", tone: "bg-slate-200 text-slate-800" },
} as const;

/**
 * Outside reviewing engineers engaged on this project: who, in what state, a revoke button while the
 * engagement is live, and (for designers and admins) the form to engage one more by e-mail.
 */
export function EngagementsPanel({ projectId, items, canManage }: { projectId: string; items: EngagementItem[]; canManage: boolean }) {
  return (
    <section aria-labelledby="engagements-heading" className="mt-8 space-y-3">
      <h2 id="engagements-heading" className="text-lg font-semibold">Outside reviewing engineers</h2>
      <p className="text-sm text-slate-600">An engaged engineer sees this project only (designs, revisions, uploads, reports) and reviews what you submit to them.</p>
      {items.length === 0 ? <p className="text-sm text-slate-600">No outside engineer engaged yet.</p> : (
        <ul className="divide-y divide-slate-100 rounded-lg border border-slate-200 bg-white">
          {items.map((e) => (
            <li key={e.id} className="flex flex-wrap items-center gap-x-4 gap-y-1 px-3 py-2 text-sm">
              <span className="min-w-0 flex-1 break-words"><span className="font-medium">{e.engineerName ?? e.email}</span>{e.engineerName ? <span className="text-slate-500"> · {e.email}</span> : null}<br /><span className="text-xs text-slate-500">{e.when}</span></span>
              <span className={`rounded px-2 py-0.5 text-xs font-medium ${STATUS[e.status].tone}`}>{STATUS[e.status].label}</span>
              {canManage && (e.status === "invited" || e.status === "accepted") ? <RevokeButton projectId={projectId} engagementId={e.id} who={e.engineerName ?? e.email} /> : null}
            </li>
          ))}
        </ul>
      )}
      {canManage ? <EngageForm projectId={projectId} /> : null}
    </section>
  );
}

function RevokeButton({ projectId, engagementId, who }: { projectId: string; engagementId: string; who: string }) {
  const [state, action] = useActionState(revokeEngagementAction, {});
  return (
    <form action={action} className="flex items-center gap-2">
      <input type="hidden" name="projectId" value={projectId} />
      <input type="hidden" name="engagementId" value={engagementId} />
      <button type="submit" aria-label={`Revoke the engagement of ${who}`} className="rounded-md border border-red-300 px-2 py-1 text-xs text-red-800 hover:bg-red-50">Revoke</button>
      {state.message && !state.ok ? <span role="status" className="text-xs text-red-700">{state.message}</span> : null}
    </form>
  );
}

function EngageForm({ projectId }: { projectId: string }) {
  const [state, action] = useActionState(engageEngineerAction, {});
  return (
    <form action={action} className="grid gap-3 rounded-lg border border-dashed border-slate-300 bg-white p-3 sm:grid-cols-[minmax(0,1fr)_minmax(0,1fr)_auto] sm:items-start">
      <input type="hidden" name="projectId" value={projectId} />
      <Field label="Engineer's e-mail" name="email" type="email" required autoComplete="off" defaultValue={state.values?.email} error={state.fieldErrors?.email} hint="They get a link to sign up or sign in, then accept." />
      <Field label="Message (optional)" name="message" defaultValue={state.values?.message} error={state.fieldErrors?.message} />
      <div className="sm:pt-6"><SubmitButton pendingText="Sending…">Engage engineer</SubmitButton></div>
      <div className="sm:col-span-3"><FormStatus state={state} /></div>
    </form>
  );
}
