"use client";

import type { ColumnDef } from "@tanstack/react-table";
import { usePathname, useRouter, useSearchParams } from "next/navigation";
import { useEffect, useState, useTransition, type ReactNode } from "react";
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
 *
 * Columns are written with the table library's column helper (its few lines copied in
 * column-helper.ts, with the library's types), but the table itself is drawn here: with sorting,
 * filtering and paging all on the server, the library's table engine had nothing left to do, and
 * it was 13 kB (gzip) of every list page's and the design editor's first load. Sorting follows
 * the library's rules: a click on the sorted column flips it; on another column, text sorts A→Z
 * first and anything else largest first.
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

  const pageIndex = page.page - 1;
  const defs = columns.map((def) => resolveColumn(def));
  const sortBy = (c: ResolvedColumn<T>) => {
    const next = c.id === page.sort ? (page.dir === "desc" ? "asc" : "desc") : typeof (page.rows[0] === undefined ? undefined : c.value(page.rows[0], 0)) === "string" ? "asc" : "desc";
    navigate({ sort: c.id, dir: next, page: undefined });
  };
  const toPage = (index: number) => navigate({ page: index + 1, pageSize: page.pageSize === 20 ? undefined : page.pageSize });

  const sortable = defs.filter((c) => c.canSort && c.label).map((c) => ({ id: c.id, label: c.label! }));
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
            <tr role="row">
              {defs.map((c) => {
                const sorted = c.id === page.sort ? (page.dir === "desc" ? "desc" : "asc") : false;
                return (
                  <th key={c.id} role="columnheader" scope="col" aria-sort={sorted ? (sorted === "asc" ? "ascending" : "descending") : undefined} className="px-3 py-2 text-left text-xs font-semibold whitespace-nowrap text-slate-600">
                    {c.canSort ? (
                      <button type="button" onClick={() => sortBy(c)} className="inline-flex items-center gap-1 hover:text-accent-700">
                        {c.header}
                        <span aria-hidden className="text-slate-400">{sorted === "asc" ? "▲" : sorted === "desc" ? "▼" : "↕"}</span>
                      </button>
                    ) : c.header}
                  </th>
                );
              })}
            </tr>
          </thead>
          <tbody role="rowgroup" className="divide-y divide-slate-100 max-sm:block">
            {page.rows.length === 0 ? (
              <tr role="row" className="max-sm:block"><td role="cell" colSpan={columns.length} className="px-3 py-6 text-center text-slate-500 max-sm:block">{page.q ? `Nothing matches “${page.q}”.` : emptyText}</td></tr>
            ) : page.rows.map((row, index) => (
              <tr key={index} role="row" className="hover:bg-slate-50 max-sm:block max-sm:py-2">
                {defs.map((c, i) => {
                  const label = i > 0 ? c.label : undefined;
                  return (
                    <td key={c.id} role="cell" data-label={label} className={`px-3 py-2 align-top max-sm:block max-sm:py-0.5 max-sm:empty:hidden max-sm:[&_*]:whitespace-normal ${i === 0 ? "max-sm:pb-1 max-sm:text-base" : ""} ${label ? LABELLED : ""}`}>
                      {c.cell(row, index)}
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
          <button type="button" onClick={() => toPage(pageIndex - 1)} disabled={pageIndex <= 0} className="rounded-md border border-slate-300 bg-white px-3 py-1 disabled:opacity-40">Previous</button>
          <span className="text-slate-600">Page {page.page} of {pageCount}</span>
          <button type="button" onClick={() => toPage(pageIndex + 1)} disabled={pageIndex >= pageCount - 1} className="rounded-md border border-slate-300 bg-white px-3 py-1 disabled:opacity-40">Next</button>
        </nav>
      ) : null}
    </div>
  );
}

interface ResolvedColumn<T> {
  id: string;
  header: ReactNode;
  /** The header's words, when it is words (the phone's "Sort by" list and card labels). */
  label: string | undefined;
  canSort: boolean;
  value: (row: T, index: number) => unknown;
  cell: (row: T, index: number) => ReactNode;
}

/**
 * A column as the library's helper writes it (`accessorKey` or `accessorFn`, `header`, `cell`,
 * `enableSorting`, `id`), resolved the way the library does: the id is the given id, else the key
 * (dots as underscores), else the header's text; a key with dots reads nested fields; a column
 * without a `cell` shows its value as text; only columns with a value can sort.
 */
function resolveColumn<T>(def: ColumnDef<T, unknown>): ResolvedColumn<T> {
  const d = def as { id?: string; accessorKey?: string; accessorFn?: (row: T, index: number) => unknown; header?: unknown; cell?: unknown; enableSorting?: boolean };
  const key = d.accessorKey;
  const value = d.accessorFn
    ? (row: T, index: number) => d.accessorFn!(row, index)
    : key !== undefined
      ? (row: T) => (key.includes(".") ? key.split(".").reduce<unknown>((o, k) => (o as Record<string, unknown> | undefined)?.[k], row) : (row as Record<string, unknown>)[key])
      : () => undefined;
  const id = d.id ?? (key !== undefined ? key.replaceAll(".", "_") : undefined) ?? (typeof d.header === "string" ? d.header : "");
  const render = (content: unknown, context: unknown): ReactNode => (typeof content === "function" ? (content as (c: unknown) => ReactNode)(context) : (content as ReactNode));
  const column = { id };
  return {
    id,
    header: render(d.header ?? null, { column, header: { id, column } }),
    label: labelOf(d.header),
    canSort: (d.enableSorting ?? true) && (d.accessorFn !== undefined || key !== undefined),
    value,
    cell: (row, index) => {
      const context = { getValue: () => value(row, index), renderValue: () => value(row, index) ?? null, row: { original: row, index, id: String(index) }, column };
      if (d.cell !== undefined) return render(d.cell, context);
      const v = value(row, index);
      return v == null ? null : String(v);
    },
  };
}
