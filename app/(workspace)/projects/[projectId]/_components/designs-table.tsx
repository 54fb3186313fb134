"use client";

import { createColumnHelper } from "@tanstack/react-table";
import Link from "next/link";
import { DataTable, type ServerPage } from "@/components/design/data-table";
import { StatusBadge } from "@/components/review/status-badge";
import type { DesignRow } from "@/db/queries/designs";
import { shortDateTime } from "@/components/ui/dates";
import { formatFootingSize, type UnitSystem } from "@/components/format/quantity";

const col = createColumnHelper<DesignRow>();

export function DesignsTable({ page, projectId, timeZone, units = "imperial" }: { page: ServerPage<DesignRow>; projectId: string; timeZone?: string; units?: UnitSystem }) {
  const columns = [
    col.accessor("name", { header: "Design", cell: (c) => <Link href={`/projects/${projectId}/designs/${c.row.original.id}`} className="font-medium text-accent-800 hover:underline">{c.getValue()}</Link> }),
    col.accessor("status", { header: "Status", cell: (c) => <StatusBadge status={c.getValue()} /> }),
    col.accessor("latestNumber", { header: "Revision", cell: (c) => (c.getValue() ? <span className="tabular-nums">Rev {c.getValue()}</span> : "—") }),
    col.accessor("approvedNumber", {
      header: "Approved",
      enableSorting: false,
      cell: (c) => {
        const r = c.row.original;
        if (!r.approvedRevisionId) return <span className="text-slate-600">None yet</span>;
        return <span className="flex flex-wrap items-center gap-1 whitespace-nowrap"><Link href={`/reviews/${r.approvedRevisionId}`} className="tabular-nums text-accent-800 hover:underline">Rev {r.approvedNumber}</Link> <StatusBadge status={r.approvedState === "superseded" ? "superseded" : "approved"} onHold={r.approvedState === "on_hold"} /></span>;
      },
    }),
    col.accessor("depthIn", {
      header: "Footing",
      cell: (c) => {
        const r = c.row.original;
        if (r.depthIn === null) return "—";
        return <span className="whitespace-nowrap tabular-nums">{formatFootingSize(r.diameterIn ?? 0, r.depthIn, units)} {r.pass ? <span className="text-slate-500">(passes)</span> : <span className="font-medium text-red-700">(fails a check)</span>}</span>;
      },
    }),
    col.accessor("updatedAt", { header: "Last saved", cell: (c) => <time dateTime={c.getValue()} className="whitespace-nowrap text-slate-600">{shortDateTime(c.getValue(), timeZone)}</time> }),
  ];
  return <DataTable page={page} columns={columns} caption="Designs" prefix="d_" filterLabel="Filter designs by name or status" emptyText="No designs yet." />;
}
