"use client";

import { useActionState } from "react";
import type { ActionState } from "@/components/ui/action-state";
import { tickChecklistAction } from "../actions";

export interface ChecklistItemView {
  key: string;
  label: string;
  ticked: boolean;
  /** "Ticked by … on …", already worded in the organisation's time zone. */
  byline: string | null;
}

/**
 * The crew's checklist: each tick is saved for this revision (who and when), so it survives a reload
 * and the engineer sees it. Printed as boxes to tick by hand. Only the crew (installers, engineers)
 * can change it; others see the saved ticks.
 */
export function Checklist({ revisionId, items, canTick }: { revisionId: string; items: ChecklistItemView[]; canTick: boolean }) {
  return (
    <ul className="space-y-2">
      {items.map((item) => <ChecklistRow key={item.key} revisionId={revisionId} item={item} canTick={canTick} />)}
    </ul>
  );
}

function ChecklistRow({ revisionId, item, canTick }: { revisionId: string; item: ChecklistItemView; canTick: boolean }) {
  const [state, action, pending] = useActionState<ActionState, FormData>(tickChecklistAction, {});
  // Shown as the crew asked while the save is on its way; the saved tick otherwise.
  return (
    <li>
      <form action={action} className="flex items-start gap-3">
        <input type="hidden" name="revisionId" value={revisionId} />
        <input type="hidden" name="itemKey" value={item.key} />
        <input type="hidden" name="ticked" value={String(!item.ticked)} />
        <button
          type="submit"
          role="checkbox"
          aria-checked={item.ticked}
          aria-label={item.label}
          disabled={!canTick || pending}
          className="mt-0.5 flex h-6 w-6 shrink-0 items-center justify-center rounded border-2 border-slate-600 bg-white text-base font-bold text-accent-800 disabled:cursor-not-allowed aria-checked:bg-accent-50"
        >
          {item.ticked ? "✓" : ""}
        </button>
        <div className="text-base">
          <span>{item.label}</span>
          {item.byline ? <span className="block text-xs text-slate-600">{item.byline}</span> : null}
          {pending ? <span className="block text-xs text-slate-600" aria-live="polite">Saving…</span> : null}
          {state.ok === undefined && state.message ? <span className="block text-sm text-red-700" role="alert">{state.message}</span> : null}
        </div>
      </form>
    </li>
  );
}
