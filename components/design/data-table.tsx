"use client";

import { useReactTable } from "@tanstack/react-table";
import { usePathname, useRouter, useSearchParams } from "next/navigation";
import { useEffect, useState, useTransition } from "react";
import { DataTableView, serverTableOptions, type DataTableProps, type TableChange } from "./data-table-view";

/**
 * A table whose sorting, filtering and paging happen on the server: the state lives in the URL
 * (`?q=&sort=&dir=&page=&pageSize=`, optionally prefixed so two tables can share a page) and each
 * change navigates, so the server query returns only the rows shown. Built with the table
 * library (manual sorting, paging and filtering); drawn by data-table-view.tsx, which a page can
 * also render on the server alone (server-data-table.tsx) where the table is below the fold.
 */
export type { ServerPage } from "./data-table-view";

export function DataTable<T>({ page, columns, caption, prefix = "", filterLabel = "Filter", emptyText = "Nothing here yet." }: DataTableProps<T>) {
  const router = useRouter();
  const pathname = usePathname();
  const search = useSearchParams();
  const [pending, startTransition] = useTransition();
  const [filter, setFilter] = useState(page.q);

  const navigate = (changes: TableChange) => {
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

  const table = useReactTable(serverTableOptions(page, columns, navigate));
  return <DataTableView table={table} page={page} text={{ caption, prefix, filterLabel, emptyText }} controls={{ kind: "navigate", navigate, filter, setFilter, pending }} />;
}
