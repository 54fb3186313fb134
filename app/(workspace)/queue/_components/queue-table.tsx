"use client";

import { createColumnHelper } from "@tanstack/react-table";
import Link from "next/link";
import { DataTable, type ServerPage } from "@/components/design/data-table";
import type { EngineerQueueRow } from "@/db/queries/engineer-queue";

const STATE = {
  waiting: { label: "Waiting for you", tone: "bg-amber-100 text-amber-900" },
  on_hold: { label: "On hold", tone: "bg-red-100 text-red-900" },
  decided: { label: "Decided", tone: "bg-slate-200 text-slate-800" },
} as const;

const day = (iso: string) => new Date(iso).toLocaleDateString("en-US", { year: "numeric", month: "short", day: "numeric" });

const col = createColumnHelper<EngineerQueueRow>();
const columns = [
  col.accessor("state", {
    header: "State",
    cell: (c) => {
      const r = c.row.original;
      const decided = r.decision === "approve" ? "approved" : r.decision === "request_changes" ? "changes requested" : null;
      return <span className="whitespace-nowrap"><span className={`rounded px-2 py-0.5 text-xs font-medium ${STATE[r.state].tone}`}>{STATE[r.state].label}</span>{decided ? <span className="block text-xs text-slate-500">{decided}</span> : null}</span>;
    },
  }),
  col.accessor("contractor", { header: "Contractor", cell: (c) => <span className="text-slate-700">{c.getValue()}</span> }),
  col.accessor("projectName", { header: "Project", cell: (c) => <span>{c.getValue()} <span className="text-slate-500">({c.row.original.projectState})</span></span> }),
  col.accessor("designName", {
    header: "Design and revision",
    cell: (c) => <Link href={`/reviews/${c.row.original.revisionId}`} className="font-medium text-accent-800 hover:underline">{c.getValue()}, revision {c.row.original.number}</Link>,
  }),
  col.display({
    id: "footing",
    header: "Footing",
    cell: (c) => {
      const r = c.row.original;
      if (r.diameterIn === null || r.depthIn === null) return <span className="text-slate-500">—</span>;
      return <span className="whitespace-nowrap tabular-nums">{r.posts ?? "?"} × ⌀{r.diameterIn} in, {r.depthIn} in deep</span>;
    },
  }),
  col.accessor("failing", {
    header: "Failing checks",
    enableSorting: false,
    cell: (c) => (c.getValue().length === 0 ? <span className="text-slate-500">None</span> : <span className="text-red-800">{c.getValue().join("; ")}</span>),
  }),
  col.accessor("submittedAt", { header: "Submitted", cell: (c) => <time dateTime={c.getValue()} className="whitespace-nowrap text-slate-600">{day(c.getValue())}</time> }),
  col.accessor("decidedAt", { header: "Decided", cell: (c) => (c.getValue() ? <time dateTime={c.getValue()!} className="whitespace-nowrap text-slate-600">{day(c.getValue()!)}</time> : <span className="text-slate-500">—</span>) }),
];

export function QueueTable({ page }: { page: ServerPage<EngineerQueueRow> }) {
  return <DataTable page={page} columns={columns} caption="Review queue" filterLabel="Filter by project, design or contractor" emptyText="Nothing has been submitted to you yet." />;
}
