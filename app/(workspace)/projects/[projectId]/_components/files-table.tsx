"use client";

import { createColumnHelper } from "@tanstack/react-table";
import { DataTable, type ServerPage } from "@/components/design/data-table";
import { shortDate } from "@/components/ui/dates";

export interface FileRow {
  id: string;
  kind: "photo" | "document";
  originalName: string;
  contentType: string;
  sizeBytes: number;
  description: string;
  uploadedByName: string | null;
  createdAt: string;
  hasThumbnail: boolean;
}

const col = createColumnHelper<FileRow>();
const size = (n: number) => (n < 1024 * 1024 ? `${Math.max(1, Math.round(n / 1024))} KB` : `${(n / 1024 / 1024).toFixed(1)} MB`);

export function FilesTable({ page, projectId, timeZone }: { page: ServerPage<FileRow>; projectId: string; timeZone?: string }) {
  const href = (id: string, thumb = false) => `/api/projects/${projectId}/files/${id}${thumb ? "?variant=thumbnail" : ""}`;
  const columns = [
    col.accessor("originalName", {
      header: "File",
      cell: (c) => {
        const f = c.row.original;
        return (
          <a href={href(f.id)} className="flex items-center gap-3 font-medium text-accent-800 hover:underline" target={f.kind === "photo" ? "_blank" : undefined} rel="noreferrer">
            {f.hasThumbnail ? (
              // eslint-disable-next-line @next/next/no-img-element
              <img src={href(f.id, true)} alt="" width={64} height={48} loading="lazy" className="h-12 w-16 rounded border border-slate-200 object-cover" />
            ) : (
              <span aria-hidden className="flex h-12 w-16 items-center justify-center rounded border border-slate-200 bg-slate-50 text-xs text-slate-500">PDF</span>
            )}
            <span className="break-all">{c.getValue()}</span>
          </a>
        );
      },
    }),
    col.accessor("kind", { header: "Kind", cell: (c) => (c.getValue() === "photo" ? "Photo" : "Document (PDF)") }),
    col.accessor("description", { header: "Description", enableSorting: false, cell: (c) => c.getValue() || <span className="text-slate-600">—</span> }),
    col.accessor("sizeBytes", { header: "Size", cell: (c) => <span className="tabular-nums whitespace-nowrap">{size(c.getValue())}</span> }),
    col.accessor("createdAt", { header: "Uploaded", cell: (c) => <span className="whitespace-nowrap text-slate-600">{shortDate(c.getValue(), timeZone)}{c.row.original.uploadedByName ? ` · ${c.row.original.uploadedByName}` : ""}</span> }),
  ];
  return <DataTable page={page} columns={columns} caption="Uploads" prefix="f_" filterLabel="Filter uploads" emptyText="No uploads yet: add site photos, the soil report or drawings." />;
}
