"use client";

import { useFormStatus } from "react-dom";

/** Form primitives: a labelled field with its error beside it, and a submit button that shows pending. */
export type { ActionState } from "./action-state";
import type { ActionState } from "./action-state";

export function Field({
  label,
  name,
  error,
  hint,
  unit,
  ...input
}: React.InputHTMLAttributes<HTMLInputElement> & { label: string; name: string; error?: string[]; hint?: string; unit?: string }) {
  const id = input.id ?? `field-${name}`;
  const described = [error?.length ? `${id}-error` : null, hint ? `${id}-hint` : null].filter(Boolean).join(" ") || undefined;
  return (
    <div className="space-y-1">
      <label htmlFor={id} className="block text-sm font-medium text-slate-800">
        {label}
        {unit ? <span className="ml-1 font-normal text-slate-500">({unit})</span> : null}
      </label>
      <input
        id={id}
        name={name}
        aria-invalid={error?.length ? true : undefined}
        aria-describedby={described}
        className="block w-full rounded-md border border-slate-300 bg-white px-3 py-2 text-sm shadow-sm outline-none focus:border-accent-600 focus:ring-2 focus:ring-accent-100 aria-[invalid]:border-red-600"
        {...input}
      />
      {hint ? <p id={`${id}-hint`} className="text-xs text-slate-500">{hint}</p> : null}
      {error?.length ? (
        <p id={`${id}-error`} className="text-sm text-red-700">
          {error.join(" ")}
        </p>
      ) : null}
    </div>
  );
}

export function SubmitButton({ children, pendingText }: { children: React.ReactNode; pendingText?: string }) {
  const { pending } = useFormStatus();
  return (
    <button
      type="submit"
      disabled={pending}
      className="inline-flex items-center justify-center rounded-md bg-accent-700 px-4 py-2 text-sm font-medium text-white hover:bg-accent-800 disabled:opacity-60"
    >
      {pending ? (pendingText ?? "Working…") : children}
    </button>
  );
}

export function FormStatus({ state }: { state: ActionState }) {
  return (
    <p aria-live="polite" className={`text-sm ${state.ok ? "text-accent-800" : "text-red-700"}`}>
      {state.message ?? ""}
    </p>
  );
}
