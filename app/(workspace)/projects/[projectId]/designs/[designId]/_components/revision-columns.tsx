import { createColumnHelper } from "@tanstack/react-table";
import Link from "next/link";
import { StatusBadge } from "@/components/review/status-badge";
import type { RevisionRow } from "@/db/queries/revisions";
import { shortDateTime } from "@/components/ui/dates";
import { formatFootingSize, type UnitSystem } from "@/components/format/quantity";

const col = createColumnHelper<RevisionRow>();

export interface RevisionColumnsProps {
  basePath: string;
  latestId: string;
  viewingId: string;
  timeZone?: string;
  units?: UnitSystem;
}

/** The revisions table's columns: shared by the table drawn on the server and the one in the browser. */
export function revisionColumns({ basePath, latestId, viewingId, timeZone, units = "imperial" }: RevisionColumnsProps) {
  return [
    col.accessor("number", {
      header: "Revision",
      cell: (c) => {
        const r = c.row.original;
        const href = r.id === latestId ? basePath : `${basePath}?revision=${r.id}`;
        return <Link href={href} className="font-medium text-accent-800 hover:underline" aria-current={r.id === viewingId ? "page" : undefined}>Rev {r.number}{r.id === latestId ? " (latest)" : ""}{r.id === viewingId ? " · viewing" : ""}</Link>;
      },
    }),
    col.accessor("status", { header: "Status", cell: (c) => <StatusBadge status={c.getValue()} /> }),
    col.accessor("note", { header: "Note", enableSorting: false, cell: (c) => <span className="block max-w-xs text-slate-700">{c.getValue() || "—"}</span> }),
    col.accessor("depthIn", { header: "Footing", cell: (c) => { const r = c.row.original; return r.depthIn === null ? "—" : <span className="whitespace-nowrap tabular-nums">{formatFootingSize(r.diameterIn ?? 0, r.depthIn, units)}{r.pass ? "" : <span className="font-medium text-red-700"> fails</span>}</span>; } }),
    col.accessor("authorName", { header: "By", cell: (c) => c.getValue() ?? "—" }),
    col.accessor("createdAt", { header: "Saved", cell: (c) => <time dateTime={c.getValue()} className="whitespace-nowrap text-slate-600">{shortDateTime(c.getValue(), timeZone)}</time> }),
    col.display({
      id: "compare",
      header: "Compare",
      cell: (c) => (c.row.original.id === latestId ? null : <Link href={`${basePath}/diff?from=${c.row.original.id}&to=${latestId}`} className="whitespace-nowrap text-accent-800 hover:underline">with latest</Link>),
    }),
  ];
}

export const REVISIONS_TABLE = { caption: "Revisions", prefix: "r_", filterLabel: "Filter revisions by note, author or status" };
