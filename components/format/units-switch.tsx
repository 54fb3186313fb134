"use client";

import type { UnitSystem } from "./quantity";
import { rememberUnitSystem } from "./unit-preference";

const NAMES: Record<UnitSystem, string> = { imperial: "US units (ft, in, lb)", metric: "Metric (m, mm, kN)" };

/**
 * The units switch, one radio group (WAI-ARIA APG): one tab stop, the arrow keys move to and choose
 * the other system. With `onChange` the caller re-renders itself (the editor); without it the page
 * is loaded again and the server renders it in the chosen units.
 */
export function UnitsSwitch({ units, onChange }: { units: UnitSystem; onChange?: (u: UnitSystem) => void }) {
  const choose = (u: UnitSystem) => {
    rememberUnitSystem(u);
    if (onChange) onChange(u);
    // A full reload (not the router): the switch also renders where no app router is mounted, and
    // the server page then renders again in the chosen units from the cookie.
    else window.location.reload();
  };
  return (
    <div role="radiogroup" aria-label="Units" className="no-print inline-flex rounded-md border border-slate-300 bg-white p-0.5 text-sm">
      {(["imperial", "metric"] as const).map((u) => (
        <button key={u} type="button" role="radio" aria-checked={units === u} tabIndex={units === u ? 0 : -1} onClick={() => choose(u)}
          onKeyDown={(e) => {
            if (!["ArrowLeft", "ArrowRight", "ArrowUp", "ArrowDown"].includes(e.key)) return;
            e.preventDefault();
            const next = u === "imperial" ? "metric" : "imperial";
            choose(next);
            (e.currentTarget.parentElement?.querySelector(`[data-units="${next}"]`) as HTMLElement | null)?.focus();
          }}
          data-units={u} className={`rounded px-3 py-1 ${units === u ? "bg-accent-700 text-white" : "text-slate-700 hover:bg-slate-100"}`}>
          {NAMES[u]}
        </button>
      ))}
    </div>
  );
}
