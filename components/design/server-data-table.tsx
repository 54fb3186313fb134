import { createTable } from "@tanstack/react-table";
import { DataTableView, serverTableOptions, type DataTableProps, type TableChange } from "./data-table-view";

/**
 * The same server-paged table drawn on the server only: sorting and paging are links, the filter
 * a GET form, so it works without JavaScript and adds no script to the page. For a table below
 * the fold of a heavy page (the editor's revisions): the browser's DataTable replaces it when the
 * reader first reaches for it (see revisions-table-lazy.tsx). The table is built as the library's
 * useReactTable builds it, without the hook (no state to keep on the server).
 */
export function ServerDataTable<T>({ page, columns, caption, prefix = "", filterLabel = "Filter", emptyText = "Nothing here yet.", pathname, search }: DataTableProps<T> & {
  pathname: string;
  search: Record<string, string | string[] | undefined>;
}) {
  const params: [string, string][] = Object.entries(search).flatMap(([k, v]) => (v === undefined ? [] : (Array.isArray(v) ? v : [v]).map((x) => [k, x] as [string, string])));
  const hrefFor = (changes: TableChange) => {
    const next = new URLSearchParams(params);
    for (const [k, v] of Object.entries(changes)) {
      if (v === undefined || v === "") next.delete(prefix + k);
      else next.set(prefix + k, String(v));
    }
    return `${pathname}?${next.toString()}`;
  };
  const options = serverTableOptions(page, columns, () => undefined);
  const table = createTable({ state: {}, onStateChange: () => undefined, renderFallbackValue: null, ...options });
  table.setOptions((prev) => ({ ...prev, state: { ...table.initialState, ...options.state } }));
  return <DataTableView table={table} page={page} text={{ caption, prefix, filterLabel, emptyText }} controls={{ kind: "link", hrefFor, pathname, params }} />;
}
