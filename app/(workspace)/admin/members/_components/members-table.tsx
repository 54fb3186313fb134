"use client";

import {
  createColumnHelper,
  flexRender,
  getCoreRowModel,
  getFilteredRowModel,
  getSortedRowModel,
  useReactTable,
  type ColumnFiltersState,
  type SortingState,
} from "@tanstack/react-table";
import { useState } from "react";
import type { MemberRow } from "@/db/queries/members";
import { ROLE_LABELS, ROLES } from "@/db/roles";
import { MemberStatusButton } from "./member-status-button";
import { RoleEditor } from "./role-editor";

const column = createColumnHelper<MemberRow>();

const columns = [
  column.accessor((m) => `${m.name} ${m.email}`, {
    id: "person",
    header: "Member",
    sortingFn: (a, b) => a.original.name.localeCompare(b.original.name),
    cell: ({ row }) => (
      <div>
        <div className="font-medium">{row.original.name}</div>
        <div className="break-all text-slate-500">{row.original.email}</div>
      </div>
    ),
  }),
  column.accessor((m) => m.roles.map((r) => ROLE_LABELS[r]).join(", "), {
    id: "roles",
    header: "Roles",
    filterFn: (row, _id, role: string) => !role || row.original.roles.includes(role as MemberRow["roles"][number]),
    cell: ({ row, table }) => (
      <RoleEditor member={row.original} isSelf={row.original.userId === (table.options.meta as Meta).currentUserId} />
    ),
  }),
  column.accessor((m) => (m.deactivatedAt ? "deactivated" : "active"), {
    id: "status",
    header: "Status",
    filterFn: "equalsString",
    cell: ({ row }) =>
      row.original.deactivatedAt ? (
        <span className="text-slate-600">Deactivated {row.original.deactivatedAt.slice(0, 10)}</span>
      ) : (
        <span className="text-accent-800">Active</span>
      ),
  }),
  column.accessor("joinedAt", { header: "Joined", cell: ({ getValue }) => <span className="whitespace-nowrap">{getValue().slice(0, 10)}</span> }),
  column.display({
    id: "actions",
    header: () => <span className="sr-only">Actions</span>,
    cell: ({ row }) => <MemberStatusButton member={row.original} />,
  }),
];

interface Meta {
  currentUserId: string;
}

export function MembersTable({ members, currentUserId }: { members: MemberRow[]; currentUserId: string }) {
  const [sorting, setSorting] = useState<SortingState>([{ id: "person", desc: false }]);
  const [columnFilters, setColumnFilters] = useState<ColumnFiltersState>([]);
  const [search, setSearch] = useState("");
  const table = useReactTable({
    data: members,
    columns,
    state: { sorting, columnFilters, globalFilter: search },
    meta: { currentUserId } satisfies Meta,
    getRowId: (m) => m.membershipId,
    onSortingChange: setSorting,
    onColumnFiltersChange: setColumnFilters,
    onGlobalFilterChange: setSearch,
    globalFilterFn: (row, _id, text: string) => `${row.original.name} ${row.original.email}`.toLowerCase().includes(text.toLowerCase()),
    getCoreRowModel: getCoreRowModel(),
    getSortedRowModel: getSortedRowModel(),
    getFilteredRowModel: getFilteredRowModel(),
  });
  const filter = (id: string) => (table.getColumn(id)?.getFilterValue() as string | undefined) ?? "";
  const rows = table.getRowModel().rows;

  return (
    <div className="mt-3">
      <div className="flex flex-wrap gap-3 text-sm">
        <label className="flex flex-col gap-1">
          <span className="font-medium">Search</span>
          <input value={search} onChange={(e) => setSearch(e.target.value)} placeholder="Name or e-mail" className="rounded-md border border-slate-300 px-3 py-2" />
        </label>
        <label className="flex flex-col gap-1">
          <span className="font-medium">Role</span>
          <select value={filter("roles")} onChange={(e) => table.getColumn("roles")?.setFilterValue(e.target.value || undefined)} className="rounded-md border border-slate-300 bg-white px-3 py-2">
            <option value="">Any role</option>
            {ROLES.map((r) => <option key={r} value={r}>{ROLE_LABELS[r]}</option>)}
          </select>
        </label>
        <label className="flex flex-col gap-1">
          <span className="font-medium">Status</span>
          <select value={filter("status")} onChange={(e) => table.getColumn("status")?.setFilterValue(e.target.value || undefined)} className="rounded-md border border-slate-300 bg-white px-3 py-2">
            <option value="">All</option>
            <option value="active">Active</option>
            <option value="deactivated">Deactivated</option>
          </select>
        </label>
      </div>
      {/* Phones get one card per member, so every action stays in reach without sideways scrolling. */}
      <ul className="mt-3 space-y-3 md:hidden" aria-label="Members">
        {rows.map((row) => (
          <li key={row.id} className="space-y-2 rounded-lg border border-slate-200 bg-white p-3 text-sm">
            {row.getVisibleCells().map((cell) => (
              <div key={cell.id}>
                {cell.column.id === "joinedAt" ? <span className="text-slate-500">Joined </span> : null}
                {flexRender(cell.column.columnDef.cell, cell.getContext())}
              </div>
            ))}
          </li>
        ))}
        {rows.length === 0 ? <li className="px-3 py-6 text-center text-slate-500">No members match these filters.</li> : null}
      </ul>
      <div className="relative mt-3 hidden overflow-x-auto rounded-lg border border-slate-200 bg-white md:block">
        <table className="w-full min-w-[40rem] text-left text-sm">
          <thead className="bg-slate-50 text-slate-700">
            {table.getHeaderGroups().map((group) => (
              <tr key={group.id}>
                {group.headers.map((header) => {
                  const sorted = header.column.getIsSorted();
                  return (
                    <th key={header.id} scope="col" className="px-3 py-2 font-medium" aria-sort={sorted ? (sorted === "asc" ? "ascending" : "descending") : undefined}>
                      {header.column.getCanSort() ? (
                        <button type="button" onClick={header.column.getToggleSortingHandler()} className="inline-flex items-center gap-1 hover:text-accent-700">
                          {flexRender(header.column.columnDef.header, header.getContext())}
                          <span aria-hidden="true">{sorted === "asc" ? "▲" : sorted === "desc" ? "▼" : "↕"}</span>
                        </button>
                      ) : (
                        flexRender(header.column.columnDef.header, header.getContext())
                      )}
                    </th>
                  );
                })}
              </tr>
            ))}
          </thead>
          <tbody className="divide-y divide-slate-200">
            {rows.map((row) => (
              <tr key={row.id} className="align-top">
                {row.getVisibleCells().map((cell) => (
                  <td key={cell.id} className="px-3 py-2">{flexRender(cell.column.columnDef.cell, cell.getContext())}</td>
                ))}
              </tr>
            ))}
            {rows.length === 0 ? (
              <tr>
                <td colSpan={columns.length} className="px-3 py-6 text-center text-slate-500">No members match these filters.</td>
              </tr>
            ) : null}
          </tbody>
        </table>
      </div>
    </div>
  );
}
