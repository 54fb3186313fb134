import type { HoldRecord } from "@/db/queries/holds";
import { ClearHoldForm, type ClearHoldAction } from "./clear-hold-form";
import { dateTimeInWords } from "@/components/ui/dates";
import { composedIn } from "@/components/format/quantity-text";
import type { UnitSystem } from "@/components/format/quantity";

/**
 * A design on hold, shown at the top of every screen of that design until an engineer clears it.
 * Engineers get the clear form beside each hold: the page passes `clearAction` only to them.
 * The reason is the app's own sentence (app/_lib/review/as-built.ts), so it follows the unit setting.
 */
export function HoldBanner({ holds, clearAction, timeZone, units = "imperial" }: { holds: HoldRecord[]; clearAction?: ClearHoldAction; timeZone?: string; units?: UnitSystem }) {
  if (holds.length === 0) return null;
  return (
    <section role="alert" aria-label="Design on hold" className="rounded-lg border-2 border-red-600 bg-red-50 p-4 text-red-950">
      <h2 className="text-lg font-bold">ON HOLD: do not pour concrete or set posts</h2>
      <p className="text-sm">An as-built hole does not match the approved spec. An engineer must review and clear the hold before work goes on.</p>
      <ul className="mt-2 space-y-3">
        {holds.map((h) => (
          <li key={h.id} className="text-sm">
            <p className="font-semibold">{composedIn(h.reason, units)}</p>
            <p className="text-xs">Raised by {h.raisedByName} on {dateTimeInWords(h.raisedAt, timeZone)}</p>
            {clearAction ? <ClearHoldForm holdId={h.id} clearAction={clearAction} /> : null}
          </li>
        ))}
      </ul>
    </section>
  );
}
