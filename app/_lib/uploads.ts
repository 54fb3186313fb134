import crypto from "node:crypto";

/**
 * Upload rules: the type comes from the file's first bytes (magic numbers), never from its name or
 * the browser's claim; only photos (JPEG, PNG, WebP) and PDFs; at most 15 MB; the storage key is
 * made here from ids, so nothing the uploader typed reaches a path.
 */
export const MAX_UPLOAD_BYTES = 15 * 1024 * 1024;
export const MAX_UPLOAD_LABEL = "15 MB";
export const THUMBNAIL_WIDTH_PX = 320;

export interface SniffedType {
  contentType: "image/jpeg" | "image/png" | "image/webp" | "application/pdf";
  kind: "photo" | "document";
  label: string;
}

const startsWith = (bytes: Uint8Array, sig: number[], at = 0) => sig.every((b, i) => bytes[at + i] === b);

/** The allowed type these bytes are, or null. Signatures: JPEG FF D8 FF; PNG 89 50 4E 47 0D 0A 1A 0A; WebP "RIFF"…"WEBP"; PDF "%PDF-" [common practice: published file-format signatures]. */
export function sniffType(bytes: Uint8Array): SniffedType | null {
  if (startsWith(bytes, [0xff, 0xd8, 0xff])) return { contentType: "image/jpeg", kind: "photo", label: "JPEG photo" };
  if (startsWith(bytes, [0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a])) return { contentType: "image/png", kind: "photo", label: "PNG image" };
  if (startsWith(bytes, [0x52, 0x49, 0x46, 0x46]) && startsWith(bytes, [0x57, 0x45, 0x42, 0x50], 8)) return { contentType: "image/webp", kind: "photo", label: "WebP image" };
  if (startsWith(bytes, [0x25, 0x50, 0x44, 0x46, 0x2d])) return { contentType: "application/pdf", kind: "document", label: "PDF" };
  return null;
}

/** Keys under the organisation and project, from ids only. */
export function objectKeys(organisationId: string, projectId: string, fileId: string = crypto.randomUUID()) {
  const dir = `orgs/${organisationId}/projects/${projectId}/files/${fileId}`;
  return { fileId, original: `${dir}/original`, thumbnail: `${dir}/thumbnail.webp` };
}

/** The uploader's file name for display only: no folders, no control characters, at most 200 characters. */
export function displayName(name: string): string {
  const base = name.split(/[\\/]/).pop() ?? "";
  // eslint-disable-next-line no-control-regex
  const clean = base.replace(/[\u0000-\u001f\u007f]/g, "").trim().slice(0, 200);
  return clean || "upload";
}

/** A small WebP of a photo, turned upright by its EXIF orientation (sharp drops the metadata, GPS included). */
export async function photoThumbnail(bytes: Uint8Array): Promise<Uint8Array> {
  const sharp = (await import("sharp")).default;
  return new Uint8Array(await sharp(bytes, { limitInputPixels: 100_000_000 }).rotate().resize({ width: THUMBNAIL_WIDTH_PX, withoutEnlargement: true }).webp({ quality: 75 }).toBuffer());
}
