import { db } from "../client";
import { listPage, type ListPage, type ListQuery } from "./list-page";
import { isUuid } from "../ids";

/** An upload on a project; the bytes are in the private object store under `objectKey`. */
export interface ProjectFile {
  id: string;
  projectId: string;
  organisationId: string;
  kind: "photo" | "document";
  originalName: string;
  contentType: string;
  sizeBytes: number;
  objectKey: string;
  thumbnailKey: string | null;
  description: string;
  uploadedByName: string | null;
  createdAt: string;
}

const columns = [
  "f.id", "f.project_id as projectId", "f.organisation_id as organisationId", "f.kind", "f.original_name as originalName",
  "f.content_type as contentType", "f.size_bytes as sizeBytes", "f.object_key as objectKey", "f.thumbnail_key as thumbnailKey",
  "f.description", "u.name as uploadedByName", "f.created_at as createdAt",
];

export async function getProjectFile(id: string): Promise<ProjectFile | undefined> {
  if (!isUuid(id)) return undefined;
  return db("project_files as f").leftJoin("users as u", "u.id", "f.uploaded_by").where("f.id", id).first(columns);
}

export const FILE_SORTS = { originalName: "f.original_name", kind: "f.kind", sizeBytes: "f.size_bytes", createdAt: "f.created_at" } as const;

export async function listProjectFiles(projectId: string, query: ListQuery = {}): Promise<ListPage<ProjectFile>> {
  const base = db("project_files as f").leftJoin("users as u", "u.id", "f.uploaded_by").where("f.project_id", projectId);
  const page = await listPage<ProjectFile>(base, query, {
    sortable: FILE_SORTS, defaultSort: "createdAt", defaultDir: "desc",
    search: ["f.original_name", "f.description", "f.kind"],
    select: (qb) => qb.select(columns),
  });
  return { ...page, rows: page.rows.map((r) => ({ ...r, createdAt: new Date(r.createdAt).toISOString() })) };
}

/** Records an upload whose bytes are already stored (the caller stores first, then records). */
export async function insertProjectFile(a: { id: string; projectId: string; organisationId: string; kind: "photo" | "document"; originalName: string; contentType: string; sizeBytes: number; objectKey: string; thumbnailKey: string | null; description: string; uploadedBy: string }): Promise<void> {
  await db("project_files").insert({
    id: a.id, project_id: a.projectId, organisation_id: a.organisationId, kind: a.kind, original_name: a.originalName,
    content_type: a.contentType, size_bytes: a.sizeBytes, object_key: a.objectKey, thumbnail_key: a.thumbnailKey,
    description: a.description, uploaded_by: a.uploadedBy,
  });
}
