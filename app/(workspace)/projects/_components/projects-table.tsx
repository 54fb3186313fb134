"use client";

import { createColumnHelper } from "@tanstack/react-table";
import Link from "next/link";
import { DataTable, type ServerPage } from "@/components/design/data-table";
import type { ProjectRow } from "@/db/queries/projects";

const col = createColumnHelper<ProjectRow>();
const columns = [
  col.accessor("name", { header: "Project", cell: (c) => <Link href={`/projects/${c.row.original.id}`} className="font-medium text-accent-800 hover:underline">{c.getValue()}</Link> }),
  col.accessor("address", { header: "Address", enableSorting: false, cell: (c) => <span className="text-slate-600">{c.getValue() || "—"}</span> }),
  col.accessor("state", { header: "State" }),
  col.accessor("jurisdiction", { header: "Criteria card", cell: (c) => c.getValue() ?? <span className="text-slate-500">None</span> }),
  col.accessor("designCount", { header: "Designs", cell: (c) => <span className="tabular-nums">{c.getValue()}</span> }),
  col.accessor("updatedAt", { header: "Updated", cell: (c) => <time dateTime={c.getValue()} className="whitespace-nowrap text-slate-600">{new Date(c.getValue()).toLocaleDateString("en-US", { year: "numeric", month: "short", day: "numeric" })}</time> }),
];

// For an outside engineer: whose project each row is.
const contractor = col.accessor("organisationName", { header: "Contractor", enableSorting: false });
const withContractor = [columns[0], contractor, ...columns.slice(1)];

export function ProjectsTable({ page, showContractor = false }: { page: ServerPage<ProjectRow>; showContractor?: boolean }) {
  return <DataTable page={page} columns={showContractor ? withContractor : columns} caption="Projects" filterLabel="Filter by name, address, state or jurisdiction" emptyText="No projects yet. Start one for your next customer site." />;
}
