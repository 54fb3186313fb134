"use client";

import { useActionState, useState } from "react";
import { Field, FormStatus, SubmitButton, type ActionState } from "@/components/ui/form";
import { LICENSING_STATES } from "@/app/_lib/schemas/licence";
import { engineerSignUpAction } from "../actions";

/** Sign-up for an engineer arriving from an engagement e-mail: as themselves or as their firm, with their licence. */
export function EngineerSignUpForm({ token, email }: { token: string; email: string }) {
  const [state, action] = useActionState<ActionState, FormData>(engineerSignUpAction, {});
  const v = state.values;
  const e = state.fieldErrors;
  const [kind, setKind] = useState(v?.kind ?? "individual");
  return (
    <form action={action} className="space-y-4" noValidate>
      <input type="hidden" name="token" value={token} />
      <p className="text-sm">Your account will be <strong>{email}</strong>, the address this engagement was sent to.</p>
      <fieldset className="space-y-1">
        <legend className="text-sm font-medium">Sign up as</legend>
        <label className="flex items-center gap-2 text-sm"><input type="radio" name="kind" value="individual" checked={kind === "individual"} onChange={() => setKind("individual")} /> Myself, an independent engineer</label>
        <label className="flex items-center gap-2 text-sm"><input type="radio" name="kind" value="firm" checked={kind === "firm"} onChange={() => setKind("firm")} /> My engineering firm (I can invite colleagues; each adds their own licence)</label>
      </fieldset>
      {kind === "firm" ? <Field label="Firm name" name="firmName" autoComplete="organization" required defaultValue={v?.firmName} error={e?.firmName} /> : null}
      <Field label="Your name" name="name" autoComplete="name" required defaultValue={v?.name} error={e?.name} hint="As it should appear on your approvals, e.g. with P.E." />
      <Field label="Password" name="password" type="password" autoComplete="new-password" required hint="At least 10 characters." error={e?.password} />
      <fieldset className="space-y-3 rounded-md border border-slate-200 p-3">
        <legend className="px-1 text-sm font-medium">Your engineer&apos;s licence</legend>
        <div className="space-y-1">
          <label htmlFor="field-state" className="block text-sm font-medium">Licensing state</label>
          <select id="field-state" name="state" defaultValue={v?.state ?? ""} aria-invalid={e?.state ? true : undefined} className="block w-full rounded-md border border-slate-300 bg-white px-3 py-2 text-sm">
            <option value="">Choose…</option>
            {LICENSING_STATES.map((s) => <option key={s} value={s}>{s}</option>)}
          </select>
          {e?.state ? <p className="text-sm text-red-700">{e.state.join(" ")}</p> : null}
        </div>
        <Field label="Licence number" name="licenceNumber" required defaultValue={v?.licenceNumber} error={e?.licenceNumber} />
        <Field label="Expires on" name="expiresOn" type="date" required defaultValue={v?.expiresOn} error={e?.expiresOn} />
      </fieldset>
      <FormStatus state={state} />
      <SubmitButton pendingText="Creating…">Create account</SubmitButton>
    </form>
  );
}
