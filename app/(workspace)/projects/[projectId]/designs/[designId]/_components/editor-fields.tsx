"use client";

import { useState } from "react";
import { useController } from "react-hook-form";
import { FIELD_META } from "@/components/design/fields";
import { rangeMessageIn, sayIn } from "@/components/format/quantity-text";
import { fromDisplay, roundFor, toDisplay, unitLabel, type UnitKind, type UnitSystem } from "@/components/format/quantity";
import { PinnedNotes } from "./pinned-comments";

/**
 * Editor inputs bound to react-hook-form by the schema's dotted path. Each shows its label, its
 * unit beside the box, the trade meaning below, and its error beside it. Numbers are shown and
 * typed in the chosen unit system and stored in the engine's units.
 */
const inputClass =
  "block w-full rounded-md border border-slate-300 bg-white px-3 py-2 text-sm shadow-sm outline-none focus:border-accent-600 focus:ring-2 focus:ring-accent-100 aria-[invalid]:border-red-600 aria-[invalid]:bg-red-50 disabled:bg-slate-100 disabled:text-slate-600";

function idFor(name: string) {
  return `in-${name.replace(/\./g, "-")}`;
}

function Shell({ name, label, unit, error, children, help, units, value }: { name: string; label?: string; unit?: string; error?: string; children: React.ReactNode; help?: string; units: UnitSystem; value: unknown }) {
  const meta = FIELD_META[name];
  const id = idFor(name);
  const helpText = help ?? helpIn(name, units);
  return (
    <div className="space-y-1">
      <label htmlFor={id} className="block text-sm font-medium text-slate-800">{label ?? meta?.label ?? name}</label>
      <div className="flex items-stretch">
        {children}
        {unit ? <span className="ml-[-1px] inline-flex min-w-12 items-center justify-center rounded-r-md border border-slate-300 bg-slate-50 px-2 text-xs text-slate-600">{unit}</span> : null}
      </div>
      {error ? <p id={`${id}-error`} className="text-sm font-medium text-red-700">{error}</p> : null}
      {helpText ? <p id={`${id}-help`} className="text-xs text-slate-500">{helpText}</p> : null}
      <PinnedNotes name={name} value={value} />
    </div>
  );
}

/** A field's help in the reader's units (help with quantities is structured in the label table). */
function helpIn(name: string, units: UnitSystem): string | undefined {
  const meta = FIELD_META[name];
  return meta?.helpText ? sayIn(meta.helpText, units) : meta?.help;
}

function described(name: string, error?: string) {
  const id = idFor(name);
  return [error ? `${id}-error` : null, FIELD_META[name]?.help ? `${id}-help` : null].filter(Boolean).join(" ") || undefined;
}

export function NumberField({ name, units, optional = false, label, help }: { name: string; units: UnitSystem; optional?: boolean; label?: string; help?: string }) {
  const { field, fieldState } = useController({ name });
  const kind: UnitKind = FIELD_META[name]?.unit ?? "none";
  const [text, setText] = useState<string | null>(null);
  const value = field.value as unknown;
  // Metric shows the unit's own rounding (1,067 mm, 62.6 m/s), never conversion noise; the
  // stored value changes only when the person types.
  const shown = typeof value === "number" && Number.isFinite(value) ? String(units === "imperial" ? roundFor(value, kind, units, 4) : roundFor(toDisplay(value, kind, units), kind, units)) : "";
  const error = rangeMessageIn(fieldState.error?.message, kind, units);
  const unit = unitLabel(kind, units);
  return (
    <Shell name={name} label={label} help={help} unit={unit || undefined} error={error} value={value} units={units}>
      <input
        id={idFor(name)}
        name={name}
        ref={field.ref}
        inputMode="decimal"
        autoComplete="off"
        value={text ?? shown}
        placeholder={optional ? "blank = not used" : undefined}
        aria-invalid={error ? true : undefined}
        aria-describedby={described(name, error)}
        className={`${inputClass} tabular-nums ${unit ? "rounded-r-none" : ""}`}
        onChange={(e) => {
          const raw = e.target.value;
          setText(raw);
          const t = raw.trim().replace(/,/g, "");
          if (t === "") field.onChange(optional ? undefined : Number.NaN);
          else {
            const n = Number(t);
            field.onChange(Number.isFinite(n) ? fromDisplay(n, kind, units) : Number.NaN);
          }
        }}
        onBlur={() => {
          setText(null);
          field.onBlur();
        }}
      />
    </Shell>
  );
}

/** A list of numbers typed as "12, 18, 24". */
export function ListField({ name, units, optional = false }: { name: string; units: UnitSystem; optional?: boolean }) {
  const { field, fieldState } = useController({ name });
  const kind: UnitKind = FIELD_META[name]?.unit ?? "none";
  const [text, setText] = useState<string | null>(null);
  const list = Array.isArray(field.value) ? (field.value as number[]) : [];
  const shown = list.map((v) => String(units === "imperial" ? roundFor(v, kind, units, 4) : roundFor(toDisplay(v, kind, units), kind, units))).join(", ");
  const error = rangeMessageIn(fieldState.error?.message ?? firstNestedError(fieldState.error), kind, units);
  return (
    <Shell name={name} unit={unitLabel(kind, units) || undefined} error={error} value={field.value} units={units}>
      <input
        id={idFor(name)}
        name={name}
        ref={field.ref}
        inputMode="decimal"
        value={text ?? shown}
        placeholder={optional ? "blank = not used" : "e.g. 12, 18, 24"}
        aria-invalid={error ? true : undefined}
        aria-describedby={described(name, error)}
        className={`${inputClass} rounded-r-none`}
        onChange={(e) => {
          setText(e.target.value);
          const parts = e.target.value.split(/[,;\s]+/).filter(Boolean);
          if (parts.length === 0) field.onChange(optional ? undefined : []);
          else field.onChange(parts.map((p) => (Number.isFinite(Number(p)) ? fromDisplay(Number(p), kind, units) : Number.NaN)));
        }}
        onBlur={() => {
          setText(null);
          field.onBlur();
        }}
      />
    </Shell>
  );
}

function firstNestedError(error: unknown): string | undefined {
  if (!error || typeof error !== "object") return undefined;
  for (const v of Object.values(error as Record<string, unknown>)) {
    if (v && typeof v === "object" && "message" in v && typeof (v as { message: unknown }).message === "string") return (v as { message: string }).message;
  }
  return undefined;
}

export function SelectField({ name, options, numeric = false, onPick }: { name: string; options: readonly (readonly [string | number, string])[]; numeric?: boolean; onPick?: (value: string) => void }) {
  const { field, fieldState } = useController({ name });
  const error = fieldState.error?.message;
  return (
    <Shell name={name} error={error} value={field.value} units="imperial">
      <select
        id={idFor(name)}
        name={name}
        ref={field.ref}
        value={String(field.value ?? "")}
        aria-invalid={error ? true : undefined}
        aria-describedby={described(name, error)}
        className={inputClass}
        onBlur={field.onBlur}
        onChange={(e) => (onPick ? onPick(e.target.value) : field.onChange(numeric ? Number(e.target.value) : e.target.value))}
      >
        {options.map(([value, label]) => <option key={String(value)} value={String(value)}>{label}</option>)}
      </select>
    </Shell>
  );
}

export function CheckField({ name, units = "imperial" }: { name: string; units?: UnitSystem }) {
  const { field, fieldState } = useController({ name });
  const meta = FIELD_META[name];
  const id = idFor(name);
  return (
    <div className="flex items-start gap-2">
      <input id={id} type="checkbox" ref={field.ref} checked={Boolean(field.value)} onChange={(e) => field.onChange(e.target.checked)} onBlur={field.onBlur} aria-describedby={meta?.help ? `${id}-help` : undefined} className="mt-1 h-4 w-4 rounded border-slate-300 accent-accent-700" />
      <div>
        <label htmlFor={id} className="text-sm font-medium text-slate-800">{meta?.label ?? name}</label>
        {meta?.help ? <p id={`${id}-help`} className="text-xs text-slate-500">{helpIn(name, units)}</p> : null}
        {fieldState.error ? <p className="text-sm font-medium text-red-700">{fieldState.error.message}</p> : null}
        <PinnedNotes name={name} value={field.value} />
      </div>
    </div>
  );
}
