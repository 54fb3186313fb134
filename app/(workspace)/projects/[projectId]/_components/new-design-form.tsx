"use client";

import { useKeptForm } from "@/components/ui/use-kept-form";
import { Field, FormStatus, SubmitButton } from "@/components/ui/form";
import { createDesignAction } from "../actions";

export function NewDesignForm({ projectId, hasCard }: { projectId: string; hasCard: boolean }) {
  const { state, formProps } = useKeptForm(createDesignAction);
  return (
    <form {...formProps} className="flex flex-wrap items-end gap-3 rounded-lg border border-dashed border-slate-300 bg-white p-3">
      <input type="hidden" name="projectId" value={projectId} />
      <div className="min-w-56 flex-1">
        <Field label="New design name" name="name" required placeholder="e.g. 12-module array on two posts" defaultValue={state.values?.name} error={state.fieldErrors?.name}
          hint={hasCard ? "Starts from the project's criteria card and a 12-module layout you then edit." : "No criteria card on this project: starts from the demo defaults; check every site value."} />
      </div>
      <div className="pb-5"><SubmitButton pendingText="Creating…">Create design</SubmitButton></div>
      <FormStatus state={state} />
    </form>
  );
}
