"use client";

import { flexRender, getCoreRowModel, useReactTable, type ColumnDef, type PaginationState, type SortingState, type Updater } from "@tanstack/react-table";
import { usePathname, useRouter, useSearchParams } from "next/navigation";
import { useEffect, useState, useTransition } from "react";
import type { ListPage } from "@/db/queries/list-page";

/**
 * A table whose sorting, filtering and paging happen on the server: the state lives in the URL
 * (`?q=&sort=&dir=&page=&pageSize=`, optionally prefixed so two tables can share a page) and each
 * change navigates, so the server query returns only the rows shown.
 */
/** One server-side page of rows, exactly as the list queries return it. */
export type ServerPage<T> = ListPage<T>;

export function DataTable<T>({ page, columns, caption, prefix = "", filterLabel = "Filter", emptyText = "Nothing here yet." }: {
  page: ServerPage<T>;
  // eslint-disable-next-line @typescript-eslint/no-explicit-any
  columns: ColumnDef<T, any>[];
  caption: string;
  prefix?: string;
  filterLabel?: string;
  emptyText?: string;
}) {
  const router = useRouter();
  const pathname = usePathname();
  const search = useSearchParams();
  const [pending, startTransition] = useTransition();
  const [filter, setFilter] = useState(page.q);
  const pageCount = Math.max(1, Math.ceil(page.total / page.pageSize));

  const navigate = (changes: Record<string, string | number | undefined>) => {
    const next = new URLSearchParams(search.toString());
    for (const [k, v] of Object.entries(changes)) {
      if (v === undefined || v === "") next.delete(prefix + k);
      else next.set(prefix + k, String(v));
    }
    startTransition(() => router.replace(`${pathname}?${next.toString()}`, { scroll: false }));
  };

  // Filter as the user types, after a pause, back on page 1.
  useEffect(() => {
    if (filter === page.q) return;
    const t = setTimeout(() => navigate({ q: filter, page: undefined }), 350);
    return () => clearTimeout(t);
    // eslint-disable-next-line react-hooks/exhaustive-deps
  }, [filter]);

  const sorting: SortingState = [{ id: page.sort, desc: page.dir === "desc" }];
  const pagination: PaginationState = { pageIndex: page.page - 1, pageSize: page.pageSize };
  const table = useReactTable({
    data: page.rows,
    columns,
    getCoreRowModel: getCoreRowModel(),
    manualSorting: true,
    manualPagination: true,
    manualFiltering: true,
    enableSortingRemoval: false,
    pageCount,
    state: { sorting, pagination },
    onSortingChange: (updater: Updater<SortingState>) => {
      const next = typeof updater === "function" ? updater(sorting) : updater;
      if (next[0]) navigate({ sort: next[0].id, dir: next[0].desc ? "desc" : "asc", page: undefined });
    },
    onPaginationChange: (updater: Updater<PaginationState>) => {
      const next = typeof updater === "function" ? updater(pagination) : updater;
      navigate({ page: next.pageIndex + 1, pageSize: next.pageSize === 20 ? undefined : next.pageSize });
    },
  });

  const first = page.total === 0 ? 0 : (page.page - 1) * page.pageSize + 1;
  const last = Math.min(page.total, page.page * page.pageSize);
  const id = `${prefix || "t"}-filter`;
  return (
    <div className={`space-y-2 ${pending ? "opacity-70" : ""}`} aria-busy={pending}>
      <div className="flex flex-wrap items-end justify-between gap-2">
        <div className="w-full max-w-xs">
          <label htmlFor={id} className="block text-xs font-medium text-slate-600">{filterLabel}</label>
          <input id={id} type="search" value={filter} onChange={(e) => setFilter(e.target.value)} className="mt-1 block w-full rounded-md border border-slate-300 bg-white px-3 py-1.5 text-sm shadow-sm focus:border-accent-600 focus:ring-2 focus:ring-accent-100 focus:outline-none" />
        </div>
        <p className="text-xs text-slate-500" aria-live="polite">{page.total === 0 ? "No rows" : `${first}–${last} of ${page.total}`}</p>
      </div>
      <div className="overflow-x-auto rounded-lg border border-slate-200 bg-white">
        <table className="min-w-full divide-y divide-slate-200 text-sm">
          <caption className="sr-only">{caption}</caption>
          <thead className="bg-slate-50">
            {table.getHeaderGroups().map((group) => (
              <tr key={group.id}>
                {group.headers.map((header) => {
                  const sorted = header.column.getIsSorted();
                  const canSort = header.column.getCanSort();
                  return (
                    <th key={header.id} scope="col" aria-sort={sorted ? (sorted === "asc" ? "ascending" : "descending") : undefined} className="px-3 py-2 text-left text-xs font-semibold whitespace-nowrap text-slate-600">
                      {canSort ? (
                        <button type="button" onClick={header.column.getToggleSortingHandler()} className="inline-flex items-center gap-1 hover:text-accent-700">
                          {flexRender(header.column.columnDef.header, header.getContext())}
                          <span aria-hidden className="text-slate-400">{sorted === "asc" ? "▲" : sorted === "desc" ? "▼" : "↕"}</span>
                        </button>
                      ) : flexRender(header.column.columnDef.header, header.getContext())}
                    </th>
                  );
                })}
              </tr>
            ))}
          </thead>
          <tbody className="divide-y divide-slate-100">
            {table.getRowModel().rows.length === 0 ? (
              <tr><td colSpan={columns.length} className="px-3 py-6 text-center text-slate-500">{page.q ? `Nothing matches “${page.q}”.` : emptyText}</td></tr>
            ) : table.getRowModel().rows.map((row) => (
              <tr key={row.id} className="hover:bg-slate-50">
                {row.getVisibleCells().map((cell) => (
                  <td key={cell.id} className="px-3 py-2 align-top">{flexRender(cell.column.columnDef.cell, cell.getContext())}</td>
                ))}
              </tr>
            ))}
          </tbody>
        </table>
      </div>
      {pageCount > 1 ? (
        <nav aria-label={`${caption} pages`} className="flex items-center justify-end gap-2 text-sm">
          <button type="button" onClick={() => table.previousPage()} disabled={!table.getCanPreviousPage()} className="rounded-md border border-slate-300 bg-white px-3 py-1 disabled:opacity-40">Previous</button>
          <span className="text-slate-600">Page {page.page} of {pageCount}</span>
          <button type="button" onClick={() => table.nextPage()} disabled={!table.getCanNextPage()} className="rounded-md border border-slate-300 bg-white px-3 py-1 disabled:opacity-40">Next</button>
        </nav>
      ) : null}
    </div>
  );
}
