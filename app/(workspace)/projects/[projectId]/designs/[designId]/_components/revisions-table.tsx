"use client";

import { DataTable, type ServerPage } from "@/components/design/data-table";
import type { RevisionRow } from "@/db/queries/revisions";
import { REVISIONS_TABLE, revisionColumns, type RevisionColumnsProps } from "./revision-columns";

export function RevisionsTable({ page, ...props }: { page: ServerPage<RevisionRow> } & RevisionColumnsProps) {
  return <DataTable page={page} columns={revisionColumns(props)} {...REVISIONS_TABLE} />;
}
