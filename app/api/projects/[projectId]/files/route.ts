import { apiRoute } from "@/app/_lib/api";
import { ValidationError } from "@/app/_lib/errors";
import { requireUser } from "@/app/_lib/auth";
import { assertCanWrite, projectFor } from "@/app/_lib/designs";
import { listQueryFrom } from "@/app/_lib/schemas/project";
import { deleteObject, putObject } from "@/app/_lib/storage";
import { acceptUpload, MAX_UPLOAD_BYTES, MAX_UPLOAD_LABEL, objectKeys, photoThumbnail } from "@/app/_lib/uploads";
import { getProjectFile, insertProjectFile, listProjectFiles } from "@/db/queries/project-files";

export const dynamic = "force-dynamic";
type Context = { params: Promise<{ projectId: string }> };

const refuse = ValidationError.field;

/** The project's uploads (`?q=&sort=originalName|kind|sizeBytes|createdAt&dir=&page=&pageSize=`). */
export const GET = apiRoute<Context>(async (request, { params }) => {
  const user = await requireUser();
  const project = await projectFor(user, (await params).projectId, { engaged: true });
  const page = await listProjectFiles(project.id, listQueryFrom(new URL(request.url).searchParams));
  return Response.json({ ...page, rows: page.rows.map(({ objectKey: _o, thumbnailKey, ...r }) => ({ ...r, hasThumbnail: Boolean(thumbnailKey) })) });
});

/**
 * Upload one file as multipart field `file` (optional `description`). Refused with 422 before
 * anything is stored when it is too large or its content is not a JPEG, PNG, WebP or PDF.
 */
export const POST = apiRoute<Context>(async (request, { params }) => {
  const user = await requireUser();
  const project = await projectFor(user, (await params).projectId);
  assertCanWrite(user);
  // Refuse an oversized body from its declared length before reading it (multipart adds a little).
  if (Number(request.headers.get("content-length") ?? 0) > MAX_UPLOAD_BYTES + 64 * 1024) throw refuse("file", `File must be at most ${MAX_UPLOAD_LABEL}`);
  let form: FormData;
  try {
    form = await request.formData();
  } catch {
    throw refuse("file", "Send the upload as multipart/form-data with the file in the field named file");
  }
  const file = form.get("file");
  if (!(file instanceof File) || file.size === 0) throw refuse("file", "Choose a file to upload (JPEG, PNG, WebP or PDF)");
  const description = String(form.get("description") ?? "").trim();
  if (description.length > 300) throw refuse("description", "Description must be at most 300 characters");

  const { bytes, type, name } = await acceptUpload(file, "projectFile", "file");
  let thumbnail: Uint8Array | null = null;
  if (type.kind === "photo") {
    try {
      thumbnail = await photoThumbnail(bytes);
    } catch {
      throw refuse("file", `${name} could not be read as a ${type.label}; it may be damaged. Export it again and upload the copy`);
    }
  }

  const keys = objectKeys(user.organisationId, project.id);
  await putObject(keys.original, bytes, type.contentType);
  try {
    if (thumbnail) await putObject(keys.thumbnail, thumbnail, "image/webp");
    await insertProjectFile({
      id: keys.fileId, projectId: project.id, organisationId: user.organisationId, kind: type.kind, originalName: name,
      contentType: type.contentType, sizeBytes: bytes.byteLength, objectKey: keys.original, thumbnailKey: thumbnail ? keys.thumbnail : null,
      description, uploadedBy: user.userId,
    });
  } catch (error) {
    // No orphaned bytes when the record cannot be written.
    await Promise.allSettled([deleteObject(keys.original), deleteObject(keys.thumbnail)]);
    throw error;
  }
  const saved = await getProjectFile(keys.fileId);
  return Response.json({ file: { ...saved, objectKey: undefined, thumbnailKey: undefined, hasThumbnail: Boolean(thumbnail) } }, { status: 201 });
}, { body: "multipart" });
