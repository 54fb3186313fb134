"use client";

import { createColumnHelper } from "@tanstack/react-table";
import Link from "next/link";
import { DataTable, type ServerPage } from "@/components/design/data-table";
import { StatusBadge } from "@/components/review/status-badge";
import type { DesignRow } from "@/db/queries/designs";
import { shortDateTime } from "@/components/ui/dates";

const col = createColumnHelper<DesignRow>();

export function DesignsTable({ page, projectId, timeZone }: { page: ServerPage<DesignRow>; projectId: string; timeZone?: string }) {
  const columns = [
    col.accessor("name", { header: "Design", cell: (c) => <Link href={`/projects/${projectId}/designs/${c.row.original.id}`} className="font-medium text-accent-800 hover:underline">{c.getValue()}</Link> }),
    col.accessor("status", { header: "Status", cell: (c) => <StatusBadge status={c.getValue()} /> }),
    col.accessor("latestNumber", { header: "Revision", cell: (c) => (c.getValue() ? <span className="tabular-nums">Rev {c.getValue()}</span> : "—") }),
    col.accessor("depthIn", {
      header: "Footing",
      cell: (c) => {
        const r = c.row.original;
        if (r.depthIn === null) return "—";
        return <span className="whitespace-nowrap tabular-nums">{r.diameterIn} in × {(r.depthIn / 12).toFixed(1)} ft {r.pass ? <span className="text-slate-500">(passes)</span> : <span className="font-medium text-red-700">(fails a check)</span>}</span>;
      },
    }),
    col.accessor("updatedAt", { header: "Last saved", cell: (c) => <time dateTime={c.getValue()} className="whitespace-nowrap text-slate-600">{shortDateTime(c.getValue(), timeZone)}</time> }),
  ];
  return <DataTable page={page} columns={columns} caption="Designs" prefix="d_" filterLabel="Filter designs by name or status" emptyText="No designs yet." />;
}
