"use client";

import { useKeptForm } from "@/components/ui/use-kept-form";
import { Field, FormStatus, SubmitButton, type ActionState } from "@/components/ui/form";
import { useClientValidation } from "@/components/ui/use-client-validation";
import { LICENSING_STATES, licenceInput, licenceSchema } from "@/app/_lib/schemas/licence";
import { saveLicenceAction } from "../actions";

export function LicenceForm() {
    const { clientErrors, onSubmit } = useClientValidation(licenceSchema, licenceInput);
  const { state, formProps } = useKeptForm(saveLicenceAction, { validate: onSubmit });
  const errors = clientErrors ?? state.fieldErrors;
  const v = state.values;
  return (
    <form {...formProps} className="grid gap-4 sm:grid-cols-3" noValidate>
      <div className="space-y-1">
        <label htmlFor="field-state" className="block text-sm font-medium text-slate-800">Licensing state</label>
        <select
          id="field-state"
          name="state"
          defaultValue={v?.state ?? ""}
          aria-invalid={errors?.state ? true : undefined}
          aria-describedby={errors?.state ? "field-state-error" : undefined}
          className="block w-full rounded-md border border-slate-300 bg-white px-3 py-2 text-sm aria-[invalid]:border-red-600"
        >
          <option value="">Choose…</option>
          {LICENSING_STATES.map((s) => <option key={s} value={s}>{s}</option>)}
        </select>
        {errors?.state ? <p id="field-state-error" className="text-sm text-red-700">{errors.state.join(" ")}</p> : null}
      </div>
      <Field label="Licence number" name="licenceNumber" required defaultValue={v?.licenceNumber} error={errors?.licenceNumber} />
      <Field label="Valid through" name="expiresOn" type="date" required defaultValue={v?.expiresOn} hint="The expiry date on the licence." error={errors?.expiresOn} />
      <div className="flex flex-wrap items-center gap-3 sm:col-span-3">
        <SubmitButton pendingText="Saving…">Save licence</SubmitButton>
        <FormStatus state={state} />
      </div>
    </form>
  );
}
