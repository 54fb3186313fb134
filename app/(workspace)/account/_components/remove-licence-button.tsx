"use client";

import { useActionState } from "react";
import { FormStatus, type ActionState } from "@/components/ui/form";
import { removeLicenceAction } from "../actions";

export function RemoveLicenceButton({ state: licensingState }: { state: string }) {
  const [state, action] = useActionState<ActionState, FormData>(removeLicenceAction, {});
  return (
    <form action={action} className="flex items-center gap-2">
      <input type="hidden" name="state" value={licensingState} />
      <button type="submit" className="rounded-md border border-slate-300 px-3 py-1 text-sm hover:bg-slate-50">Remove</button>
      <FormStatus state={state} />
    </form>
  );
}
