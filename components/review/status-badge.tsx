import { STATUS_LABELS, type DisplayStatus } from "@/db/revision-status";

const TONES: Record<DisplayStatus, string> = {
  draft: "border-slate-300 bg-slate-100 text-slate-800",
  in_review: "border-sky-300 bg-sky-50 text-sky-900",
  approved: "border-emerald-400 bg-emerald-50 text-emerald-900",
  changes_requested: "border-amber-400 bg-amber-50 text-amber-950",
  superseded: "border-slate-400 bg-white text-slate-700 line-through decoration-1",
};

/** The one status badge: the status in words (the colour only supports them), "No revision" for a design without one. */
export function StatusBadge({ status, onHold = false }: { status: DisplayStatus | null; onHold?: boolean }) {
  if (!status) return <span className="text-slate-500">No revision</span>;
  return (
    <span className="inline-flex flex-wrap gap-1">
      <span className={`inline-block whitespace-nowrap rounded border px-2 py-0.5 text-xs font-semibold ${TONES[status]}`}>{STATUS_LABELS[status]}</span>
      {onHold ? <span className="inline-block rounded border border-red-500 bg-red-50 px-2 py-0.5 text-xs font-bold text-red-800">On hold</span> : null}
    </span>
  );
}
