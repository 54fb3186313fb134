"use client";

import { createColumnHelper } from "@tanstack/react-table";
import Link from "next/link";
import { DataTable, type ServerPage } from "@/components/design/data-table";
import type { EngineerQueueRow } from "@/db/queries/engineer-queue";
import { formatFootingSize, type UnitSystem } from "@/components/format/quantity";

const STATE = {
  waiting: { label: "Waiting for you", tone: "bg-amber-100 text-amber-900" },
  on_hold: { label: "On hold", tone: "bg-red-100 text-red-900" },
  decided: { label: "Decided", tone: "bg-slate-200 text-slate-800" },
} as const;

const day = (iso: string) => new Date(iso).toLocaleDateString("en-US", { year: "numeric", month: "short", day: "numeric" });

const col = createColumnHelper<EngineerQueueRow>();
// Few, wide columns so a phone shows what matters (which revision, for whom, its state) without scrolling sideways.
const columnsFor = (units: UnitSystem) => [
  col.accessor("designName", {
    header: "Revision",
    cell: (c) => {
      const r = c.row.original;
      return (
        <span className="block min-w-40">
          <Link href={`/reviews/${r.revisionId}`} className="font-medium text-accent-800 hover:underline">{r.designName}, revision {r.number}</Link>
          <span className="block text-xs text-slate-600">{r.projectName} ({r.projectState})</span>
          <span className="block text-xs text-slate-500">for {r.contractor}</span>
        </span>
      );
    },
  }),
  col.accessor("state", {
    header: "State",
    cell: (c) => {
      const r = c.row.original;
      const decided = r.decision === "approve" ? "approved" : r.decision === "request_changes" ? "changes requested" : null;
      return <span className="block"><span className={`whitespace-nowrap rounded px-2 py-0.5 text-xs font-medium ${STATE[r.state].tone}`}>{STATE[r.state].label}</span>{decided ? <span className="block text-xs text-slate-500">{decided}</span> : null}</span>;
    },
  }),
  col.display({
    id: "footing",
    header: "Footing and failing checks",
    cell: (c) => {
      const r = c.row.original;
      return (
        <span className="block min-w-36">
          {r.diameterIn === null || r.depthIn === null ? <span className="text-slate-500">No footing result</span> : <span className="tabular-nums">{r.posts ?? "?"} holes, {formatFootingSize(r.diameterIn, r.depthIn, units)}</span>}
          <span className={`block text-xs ${r.failing.length ? "text-red-800" : "text-slate-500"}`}>{r.failing.length ? `Fails: ${r.failing.join("; ")}` : "All checks pass"}</span>
        </span>
      );
    },
  }),
  col.accessor("submittedAt", {
    header: "Submitted",
    cell: (c) => {
      const r = c.row.original;
      return <span className="block whitespace-nowrap text-slate-600"><time dateTime={r.submittedAt}>{day(r.submittedAt)}</time>{r.decidedAt ? <span className="block text-xs">decided <time dateTime={r.decidedAt}>{day(r.decidedAt)}</time></span> : null}</span>;
    },
  }),
];

export function QueueTable({ page, units = "imperial" }: { page: ServerPage<EngineerQueueRow>; units?: UnitSystem }) {
  return <DataTable page={page} columns={columnsFor(units)} caption="Review queue" filterLabel="Filter by project, design or contractor" emptyText="Nothing has been submitted to you yet." />;
}
