import { REVISION_STATUS_LABELS, type RevisionStatus } from "@/db/revision-status";

const TONE: Record<RevisionStatus, string> = {
  draft: "border-slate-300 bg-white text-slate-700",
  in_review: "border-sky-300 bg-sky-50 text-sky-900",
  approved: "border-emerald-300 bg-emerald-50 text-emerald-900",
  changes_requested: "border-amber-300 bg-amber-50 text-amber-900",
};

/** A revision's status, always in words (colour only supports it). */
export function StatusBadge({ status }: { status: RevisionStatus | null }) {
  if (!status) return <span className="text-slate-500">No revision</span>;
  return <span className={`inline-block rounded-full border px-2 py-0.5 text-xs font-medium whitespace-nowrap ${TONE[status]}`}>{REVISION_STATUS_LABELS[status]}</span>;
}
