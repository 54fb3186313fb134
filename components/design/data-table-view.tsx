import Link from "next/link";
import { flexRender, getCoreRowModel, type ColumnDef, type PaginationState, type SortingState, type Table, type TableOptions } from "@tanstack/react-table";
import type { ListPage } from "@/db/queries/list-page";

/**
 * The markup of a server-paged table (see data-table.tsx), shared by the table in the browser
 * (DataTable: controls are buttons that navigate) and the table drawn on the server only
 * (ServerDataTable: controls are links and a GET form, so it works without JavaScript and ships
 * no table code). No hooks here, so both can use it.
 *
 * Below 640 px wide the same rows read as cards, one under the other: the first cell as the title,
 * each other cell beside its column name. A phone then shows every column without sideways
 * scrolling (the queue's "Footing and failing checks" was cut off at 390 px), and a "Sort by" list
 * stands in for the header row, which is hidden there. The table keeps its roles (a table shown as
 * blocks loses them in some browsers), so it stays a table to assistive technology.
 */
/** One server-side page of rows, exactly as the list queries return it. */
export type ServerPage<T> = ListPage<T>;

export type TableChange = Record<string, string | number | undefined>;

/** What a page passes to a server-paged table, drawn in the browser (DataTable) or on the server (ServerDataTable). */
export interface DataTableProps<T> {
  page: ServerPage<T>;
  // eslint-disable-next-line @typescript-eslint/no-explicit-any
  columns: ColumnDef<T, any>[];
  caption: string;
  prefix?: string;
  filterLabel?: string;
  emptyText?: string;
}

/** How the controls act: navigate in the browser, or link to the changed URL (no JavaScript). */
export type TableControls =
  | { kind: "navigate"; navigate: (change: TableChange) => void; filter: string; setFilter: (value: string) => void; pending: boolean }
  | { kind: "link"; hrefFor: (change: TableChange) => string; pathname: string; params: [string, string][] };

export interface TableText {
  caption: string;
  prefix: string;
  filterLabel: string;
  emptyText: string;
}

/** The table library's options for a page whose sorting, filtering and paging the server did. */
export function serverTableOptions<T>(
  page: ServerPage<T>,
  // eslint-disable-next-line @typescript-eslint/no-explicit-any
  columns: ColumnDef<T, any>[],
  onChange: (change: TableChange) => void,
): TableOptions<T> {
  const sorting: SortingState = [{ id: page.sort, desc: page.dir === "desc" }];
  const pagination: PaginationState = { pageIndex: page.page - 1, pageSize: page.pageSize };
  return {
    data: page.rows,
    columns,
    getCoreRowModel: getCoreRowModel(),
    manualSorting: true,
    manualPagination: true,
    manualFiltering: true,
    enableSortingRemoval: false,
    pageCount: pageCountOf(page),
    state: { sorting, pagination },
    onSortingChange: (updater) => {
      const next = typeof updater === "function" ? updater(sorting) : updater;
      if (next[0]) onChange({ sort: next[0].id, dir: next[0].desc ? "desc" : "asc", page: undefined });
    },
    onPaginationChange: (updater) => {
      const next = typeof updater === "function" ? updater(pagination) : updater;
      onChange({ page: next.pageIndex + 1, pageSize: next.pageSize === 20 ? undefined : next.pageSize });
    },
  };
}

export const pageCountOf = (page: ServerPage<unknown>) => Math.max(1, Math.ceil(page.total / page.pageSize));

/** A column's name as people read it: its header when that is words (never its internal id). */
const labelOf = (header: unknown): string | undefined => (typeof header === "string" && header.trim() ? header : undefined);

// On a phone, a cell's column name before its value (the header row is visually hidden there);
// values that keep to one line in the table wrap in a card (its value column is narrower).
const LABELLED = "max-sm:flex max-sm:gap-3 max-sm:before:w-28 max-sm:before:shrink-0 max-sm:before:text-xs max-sm:before:font-semibold max-sm:before:leading-5 max-sm:before:text-slate-600 max-sm:before:content-[attr(data-label)]";
const BUTTON = "rounded-md border border-slate-300 bg-white px-3 py-1";

export function DataTableView<T>({ table, page, text, controls }: { table: Table<T>; page: ServerPage<T>; text: TableText; controls: TableControls }) {
  const { caption, prefix, filterLabel, emptyText } = text;
  const pageCount = pageCountOf(page);
  const sortable = table.getAllLeafColumns().filter((c) => c.getCanSort() && labelOf(c.columnDef.header)).map((c) => ({ id: c.id, label: labelOf(c.columnDef.header)! }));
  const first = page.total === 0 ? 0 : (page.page - 1) * page.pageSize + 1;
  const last = Math.min(page.total, page.page * page.pageSize);
  const id = `${prefix || "t"}-filter`;
  const linked = controls.kind === "link";
  // Without JavaScript the filter and the phone's sort list are one GET form (the other tables'
  // parameters ride along as hidden fields); in the browser they navigate as they change.
  const formId = `${prefix || "t"}-form`;
  const hidden = linked ? controls.params.filter(([k]) => ![prefix + "q", prefix + "sort", prefix + "page"].includes(k)) : [];
  const pagerLink = (index: number, label: string, enabled: boolean) =>
    linked && enabled ? <Link href={controls.hrefFor({ page: index + 1 })} scroll={false} className={BUTTON}>{label}</Link> : linked ? <span aria-disabled className={`${BUTTON} opacity-40`}>{label}</span> : null;

  return (
    <div className={`space-y-2 ${!linked && controls.pending ? "opacity-70" : ""}`} aria-busy={!linked && controls.pending}>
      {linked ? (
        <form id={formId} method="get" action={controls.pathname} hidden>
          {hidden.map(([k, v]) => <input key={k} type="hidden" name={k} value={v} />)}
        </form>
      ) : null}
      <div className="flex flex-wrap items-end justify-between gap-2">
        <div className="w-full max-w-xs">
          <label htmlFor={id} className="block text-xs font-medium text-slate-600">{filterLabel}</label>
          <input id={id} type="search" {...(linked ? { name: prefix + "q", form: formId, defaultValue: page.q } : { value: controls.filter, onChange: (e) => controls.setFilter(e.target.value) })} className="mt-1 block w-full rounded-md border border-slate-300 bg-white px-3 py-1.5 text-sm shadow-sm focus:border-accent-600 focus:ring-2 focus:ring-accent-100 focus:outline-none" />
        </div>
        <p className="text-xs text-slate-500" aria-live="polite">{page.total === 0 ? "No rows" : `${first}–${last} of ${page.total.toLocaleString("en-US")}${page.capped ? "+" : ""}`}</p>
      </div>
      {sortable.length > 1 ? (
        <div className="flex items-end gap-2 sm:hidden">
          <label className="flex flex-col gap-1 text-xs font-medium text-slate-600">
            Sort by
            <select {...(linked ? { name: prefix + "sort", form: formId, defaultValue: page.sort } : { value: page.sort, onChange: (e) => controls.navigate({ sort: e.target.value, page: undefined }) })} className="rounded-md border border-slate-300 bg-white px-2 py-1.5 text-sm text-slate-900">
              {sortable.map((c) => <option key={c.id} value={c.id}>{c.label}</option>)}
            </select>
          </label>
          {linked ? (
            <>
              <Link href={controls.hrefFor({ dir: page.dir === "asc" ? "desc" : "asc", page: undefined })} scroll={false} className="rounded-md border border-slate-300 bg-white px-3 py-1.5 text-sm">{page.dir === "asc" ? "Ascending ▲" : "Descending ▼"}</Link>
              <button type="submit" form={formId} className="rounded-md border border-slate-300 bg-white px-3 py-1.5 text-sm">Apply</button>
            </>
          ) : (
            <button type="button" onClick={() => controls.navigate({ dir: page.dir === "asc" ? "desc" : "asc", page: undefined })} className="rounded-md border border-slate-300 bg-white px-3 py-1.5 text-sm">
              {page.dir === "asc" ? "Ascending ▲" : "Descending ▼"}
            </button>
          )}
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
                  const content = (
                    <>
                      {flexRender(header.column.columnDef.header, header.getContext())}
                      <span aria-hidden className="text-slate-400">{sorted === "asc" ? "▲" : sorted === "desc" ? "▼" : "↕"}</span>
                    </>
                  );
                  const sortClass = "inline-flex items-center gap-1 hover:text-accent-700";
                  return (
                    <th key={header.id} role="columnheader" scope="col" aria-sort={sorted ? (sorted === "asc" ? "ascending" : "descending") : undefined} className="px-3 py-2 text-left text-xs font-semibold whitespace-nowrap text-slate-600">
                      {!header.column.getCanSort() ? flexRender(header.column.columnDef.header, header.getContext())
                        : linked ? <Link href={controls.hrefFor({ sort: header.column.id, dir: header.column.getNextSortingOrder() || "asc", page: undefined })} scroll={false} className={sortClass}>{content}</Link>
                        : <button type="button" onClick={header.column.getToggleSortingHandler()} className={sortClass}>{content}</button>}
                    </th>
                  );
                })}
              </tr>
            ))}
          </thead>
          <tbody role="rowgroup" className="divide-y divide-slate-100 max-sm:block">
            {table.getRowModel().rows.length === 0 ? (
              <tr role="row" className="max-sm:block"><td role="cell" colSpan={table.getAllLeafColumns().length} className="px-3 py-6 text-center text-slate-500 max-sm:block">{page.q ? `Nothing matches “${page.q}”.` : emptyText}</td></tr>
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
          {linked ? pagerLink(page.page - 2, "Previous", table.getCanPreviousPage()) : <button type="button" onClick={() => table.previousPage()} disabled={!table.getCanPreviousPage()} className={`${BUTTON} disabled:opacity-40`}>Previous</button>}
          <span className="text-slate-600">Page {page.page} of {pageCount}{page.capped ? "+" : ""}</span>
          {linked ? pagerLink(page.page, "Next", table.getCanNextPage()) : <button type="button" onClick={() => table.nextPage()} disabled={!table.getCanNextPage()} className={`${BUTTON} disabled:opacity-40`}>Next</button>}
        </nav>
      ) : null}
    </div>
  );
}
