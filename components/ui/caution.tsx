import { DEFER_TO_CODE } from "@/engine/notices";

/**
 * The defer-to-code statement, shown wherever results, print-outs or field specs appear: Pierwise
 * gives preliminary sizing, never the final word. The wording lives in the engine (one source for
 * pages, the PDF report and the engine's own results); site cautions are `SITE_CAUTIONS` there.
 */
export function Caution({ compact = false, className = "" }: { compact?: boolean; className?: string }) {
  return (
    <aside
      role="note"
      aria-label="Preliminary sizing caution"
      className={`rounded-md border border-amber-300 bg-amber-50 px-3 py-2 text-amber-950 ${compact ? "text-xs" : "text-sm"} ${className}`}
    >
      <strong className="font-semibold">Caution: </strong>
      {DEFER_TO_CODE}
    </aside>
  );
}
