import "server-only";
import { getProjectFile, insertProjectFile } from "@/db/queries/project-files";
import type { CurrentUser } from "../auth";
import { assertCanWrite, projectFor } from "../designs";
import { ValidationError } from "../errors";
import { CONTROL_CHARACTERS_MESSAGE, hasControlCharacters } from "../request-guards";
import { deleteObject, putObject } from "../storage";
import { acceptUpload, MAX_UPLOAD_BYTES, MAX_UPLOAD_LABEL, objectKeys, photoThumbnail } from "../uploads";

const refuse = ValidationError.field;

/** What an upload adapter passes: the declared body length (checked before reading) and the form, read on demand. */
export interface UploadRequest {
  declaredBytes: number;
  form: () => Promise<FormData>;
}

/**
 * One file (multipart field `file`, optional `description`) for a project, by designers and admins.
 * Refused with a field error before anything is stored when it is too large or its content is not
 * a JPEG, PNG, WebP or PDF; no bytes are left behind when the record cannot be written.
 */
export async function uploadProjectFile(user: CurrentUser, projectId: string, upload: UploadRequest) {
  const project = await projectFor(user, projectId);
  assertCanWrite(user);
  // Refuse an oversized body from its declared length before reading it (multipart adds a little).
  if (upload.declaredBytes > MAX_UPLOAD_BYTES + 64 * 1024) throw refuse("file", `File must be at most ${MAX_UPLOAD_LABEL}`);
  let form: FormData;
  try {
    form = await upload.form();
  } catch {
    throw refuse("file", "Send the upload as multipart/form-data with the file in the field named file");
  }
  const file = form.get("file");
  if (!(file instanceof File) || file.size === 0) throw refuse("file", "Choose a file to upload (JPEG, PNG, WebP or PDF)");
  const description = String(form.get("description") ?? "").trim();
  if (description.length > 300) throw refuse("description", "Description must be at most 300 characters");
  // A form field is not run through the JSON body's check; NUL cannot be stored (was a 500).
  if (hasControlCharacters(description)) throw refuse("description", CONTROL_CHARACTERS_MESSAGE);

  // The one upload policy (app/_lib/uploads.ts): type by content against the allow-list, size per kind.
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
  const saved = (await getProjectFile(keys.fileId))!;
  return { ...saved, objectKey: undefined, thumbnailKey: undefined, hasThumbnail: Boolean(thumbnail) };
}
