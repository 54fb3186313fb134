"use client";

import { useMemo } from "react";
import { createColumnHelper } from "@tanstack/react-table";
import Link from "next/link";
import { DataTable, type ServerPage } from "@/components/design/data-table";
import type { ProjectRow } from "@/db/queries/projects";
import { shortDate } from "@/components/ui/dates";

const col = createColumnHelper<ProjectRow>();
/** Columns for the organisation's time zone (dates in the table read as the organisation reads them). */
const columnsFor = (timeZone?: string) => [
  col.accessor("name", { header: "Project", cell: (c) => <Link href={`/projects/${c.row.original.id}`} className="font-medium text-accent-800 hover:underline">{c.getValue()}</Link> }),
  col.accessor("address", { header: "Address", enableSorting: false, cell: (c) => <span className="text-slate-600">{c.getValue() || "—"}</span> }),
  col.accessor("state", { header: "State" }),
  col.accessor("jurisdiction", { header: "Criteria card", cell: (c) => c.getValue() ?? <span className="text-slate-500">None</span> }),
  col.accessor("designCount", { header: "Designs", cell: (c) => <span className="tabular-nums">{c.getValue()}</span> }),
  col.accessor("updatedAt", { header: "Updated", cell: (c) => <time dateTime={c.getValue()} className="whitespace-nowrap text-slate-600">{shortDate(c.getValue(), timeZone)}</time> }),
];

// For an outside engineer: whose project each row is.
const contractor = col.accessor("organisationName", { header: "Contractor", enableSorting: false });

export function ProjectsTable({ page, timeZone, showContractor = false }: { page: ServerPage<ProjectRow>; timeZone?: string; showContractor?: boolean }) {
  const columns = useMemo(() => {
    const base = columnsFor(timeZone);
    return showContractor ? [base[0], contractor, ...base.slice(1)] : base;
  }, [timeZone, showContractor]);
  return <DataTable page={page} columns={columns} caption="Projects" filterLabel="Filter by name, address, state or jurisdiction" emptyText="No projects yet. Start one for your next customer site." />;
}
