"use client";

import { flexRender, getCoreRowModel, useReactTable, type ColumnDef, type PaginationState, type SortingState, type Updater } from "@tanstack/react-table";
import { usePathname, useRouter, useSearchParams } from "next/navigation";
import { useEffect, useState, useTransition } from "react";
import type { ListPage } from "@/db/queries/list-page";

/**
 * A table whose sorting, filtering and paging happen on the server: the state lives in the URL
 * (`?q=&sort=&dir=&page=&pageSize=`, optionally prefixed so two tables can share a page) and each
 * change navigates, so the server query returns only the rows shown.
 *
 * Below 640 px wide the same rows read as cards, one under the other: the first cell as the title,
 * each other cell beside its column name. A phone then shows every column without sideways
 * scrolling (the queue's "Footing and failing checks" was cut off at 390 px), and a "Sort by" list
 * stands in for the header row, which is hidden there. The table keeps its roles (a table shown as
 * blocks loses them in some browsers), so it stays a table to assistive technology.
 */
/** One server-side page of rows, exactly as the list queries return it. */
export type ServerPage<T> = ListPage<T>;

/** A column's name as people read it: its header when that is words (never its internal id). */
const labelOf = (header: unknown): string | undefined => (typeof header === "string" && header.trim() ? header : undefined);

// On a phone, a cell's column name before its value (the header row is visually hidden there);
// values that keep to one line in the table wrap in a card (its value column is narrower).
const LABELLED = "max-sm:flex max-sm:gap-3 max-sm:before:w-28 max-sm:before:shrink-0 max-sm:before:text-xs max-sm:before:font-semibold max-sm:before:leading-5 max-sm:before:text-slate-600 max-sm:before:content-[attr(data-label)]";

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

  const sortable = table.getAllLeafColumns().filter((c) => c.getCanSort() && labelOf(c.columnDef.header)).map((c) => ({ id: c.id, label: labelOf(c.columnDef.header)! }));
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
        <p className="text-xs text-slate-500" aria-live="polite">{page.total === 0 ? "No rows" : `${first}–${last} of ${page.capped ? `${page.total.toLocaleString("en-US")}+` : page.total}`}</p>
      </div>
      {sortable.length > 1 ? (
        <div className="flex items-end gap-2 sm:hidden">
          <label className="flex flex-col gap-1 text-xs font-medium text-slate-600">
            Sort by
            <select value={page.sort} onChange={(e) => navigate({ sort: e.target.value, page: undefined })} className="rounded-md border border-slate-300 bg-white px-2 py-1.5 text-sm text-slate-900">
              {sortable.map((c) => <option key={c.id} value={c.id}>{c.label}</option>)}
            </select>
          </label>
          <button type="button" onClick={() => navigate({ dir: page.dir === "asc" ? "desc" : "asc", page: undefined })} className="rounded-md border border-slate-300 bg-white px-3 py-1.5 text-sm">
            {page.dir === "asc" ? "Ascending ▲" : "Descending ▼"}
          </button>
        </div>
      ) : null}
      <div className="overflow-x-auto rounded-lg border border-slate-200 bg-white">
        <table role="table" className="min-w-full divide-y divide-slate-200 text-sm max-sm:block">
          <caption className="sr-only">{caption}</caption>
          <thead role="rowgroup" className="bg-slate-50 max-sm:hidden">
            {table.getHeaderGroups().map((group) => (
              <tr key={group.id} role="row">
                {group.headers.map((header) => {
                  const sorted = header.column.getIsSorted();
                  const canSort = header.column.getCanSort();
                  return (
                    <th key={header.id} role="columnheader" scope="col" aria-sort={sorted ? (sorted === "asc" ? "ascending" : "descending") : undefined} className="px-3 py-2 text-left text-xs font-semibold whitespace-nowrap text-slate-600">
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
          <tbody role="rowgroup" className="divide-y divide-slate-100 max-sm:block">
            {table.getRowModel().rows.length === 0 ? (
              <tr role="row" className="max-sm:block"><td role="cell" colSpan={columns.length} className="px-3 py-6 text-center text-slate-500 max-sm:block">{page.q ? `Nothing matches “${page.q}”.` : emptyText}</td></tr>
            ) : table.getRowModel().rows.map((row) => (
              <tr key={row.id} role="row" className="hover:bg-slate-50 max-sm:block max-sm:py-2">
                {row.getVisibleCells().map((cell, i) => {
                  const label = i > 0 ? labelOf(cell.column.columnDef.header) : undefined;
                  return (
                    <td key={cell.id} role="cell" data-label={label} className={`px-3 py-2 align-top max-sm:block max-sm:py-0.5 max-sm:empty:hidden max-sm:[&_*]:whitespace-normal ${i === 0 ? "max-sm:pb-1 max-sm:text-base" : ""} ${label ? LABELLED : ""}`}>
                      {flexRender(cell.column.columnDef.cell, cell.getContext())}
                    </td>
                  );
                })}
              </tr>
            ))}
          </tbody>
        </table>
      </div>
      {pageCount > 1 ? (
        <nav aria-label={`${caption} pages`} className="flex items-center justify-end gap-2 text-sm">
          <button type="button" onClick={() => table.previousPage()} disabled={!table.getCanPreviousPage()} className="rounded-md border border-slate-300 bg-white px-3 py-1 disabled:opacity-40">Previous</button>
          <span className="text-slate-600">Page {page.page} of {pageCount}{page.capped ? "+" : ""}</span>
          <button type="button" onClick={() => table.nextPage()} disabled={!table.getCanNextPage()} className="rounded-md border border-slate-300 bg-white px-3 py-1 disabled:opacity-40">Next</button>
        </nav>
      ) : null}
    </div>
  );
}
