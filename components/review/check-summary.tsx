import { formatCount, formatFootingSize, type UnitSystem } from "@/components/format/quantity";
import { checkTitleIn } from "@/components/format/quantity-text";
import { RatioText } from "@/components/format/ratio-text";
import type { CheckOutcome, CheckOverride } from "./check-outcome";

/**
 * The footing, the governing check and every failing check with its ratio, in one box, at the top
 * of every screen that leads to concrete: submit, review, decision, field spec. When the engineer
 * approved failing checks, their reasons are shown in full beside them, never in fine print.
 */
export function CheckSummary({ outcome, overrides = [], lead, units = "imperial" }: { outcome: CheckOutcome; overrides?: CheckOverride[]; lead?: string; units?: UnitSystem }) {
  const failing = outcome.failing.length > 0;
  return (
    <section aria-label="Footing and checks" className={`rounded-lg border-2 p-4 ${failing ? "border-red-600 bg-red-50 text-red-950" : "border-emerald-600 bg-emerald-50 text-emerald-950"}`}>
      <p className="text-base font-semibold">
        Footing {formatFootingSize(outcome.diameterIn, outcome.depthIn, units)}, {formatCount(outcome.posts)} posts
        {outcome.governing ? <> · governing check: {checkTitleIn(outcome.governing, units)}, ratio <RatioText ratio={outcome.governing.ratio} /></> : null}
      </p>
      {failing ? (
        <>
          <p className="mt-1 text-lg font-bold">
            {overrides.length ? "Approved although checks fail: " : ""}{outcome.failing.length === 1 ? "1 check fails" : `${outcome.failing.length} checks fail`}
          </p>
          <ul className="mt-1 list-disc space-y-1 pl-5 text-base">
            {outcome.failing.map((f) => {
              const o = overrides.find((x) => x.checkId === f.checkId);
              return (
                <li key={f.checkId}>
                  <strong>{checkTitleIn(f, units)}</strong>: ratio <RatioText ratio={f.ratio} />
                  {o ? <p className="mt-1 rounded border border-red-300 bg-white p-2 text-sm text-slate-900"><strong>Engineer&apos;s reason for accepting it:</strong> {o.reason}</p> : null}
                </li>
              );
            })}
          </ul>
        </>
      ) : <p className="mt-1 text-sm">Every check passes (ratio 1.00 or less).</p>}
      {lead ? <p className="mt-2 text-sm">{lead}</p> : null}
    </section>
  );
}
