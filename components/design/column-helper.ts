import type { ColumnHelper } from "@tanstack/react-table";

/**
 * The table library's column helper, written out (it is these few lines): importing it from the
 * library brought the library's whole table engine into the page (13 kB gzip), though the
 * server-paged tables (data-table.tsx) draw themselves. Same types, same column objects.
 */
export function createColumnHelper<T>(): ColumnHelper<T> {
  return {
    accessor: (accessor: unknown, column: object) => (typeof accessor === "function" ? { ...column, accessorFn: accessor } : { ...column, accessorKey: accessor }),
    display: (column: object) => column,
    group: (column: object) => column,
  } as unknown as ColumnHelper<T>;
}
