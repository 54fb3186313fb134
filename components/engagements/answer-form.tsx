"use client";

import { useActionState } from "react";
import { FormStatus, type ActionState } from "@/components/ui/form";

/** The server action that answers an engagement; the route that owns it passes it in (components import nothing from app/). */
export type AnswerEngagementAction = (prev: ActionState, form: FormData) => Promise<ActionState>;

/** Accept and decline buttons for one engagement, used on the e-mailed link's page and in the queue. */
export function AnswerForm({ engagementId, returnTo, project, answerAction }: { engagementId: string; returnTo: string; project: string; answerAction: AnswerEngagementAction }) {
  const [state, action] = useActionState<ActionState, FormData>(answerAction, {});
  if (state.ok) return <p role="status" className="text-sm font-medium">{state.message}</p>;
  return (
    <form action={action} className="flex flex-wrap items-center gap-2">
      <input type="hidden" name="engagementId" value={engagementId} />
      <input type="hidden" name="returnTo" value={returnTo} />
      <button type="submit" name="answer" value="accept" aria-label={`Accept the engagement on ${project}`} className="rounded-md bg-accent-700 px-3 py-1.5 text-sm font-medium text-white hover:bg-accent-800">Accept</button>
      <button type="submit" name="answer" value="decline" aria-label={`Decline the engagement on ${project}`} className="rounded-md border border-slate-300 bg-white px-3 py-1.5 text-sm hover:bg-slate-50">Decline</button>
      <FormStatus state={state} />
    </form>
  );
}
