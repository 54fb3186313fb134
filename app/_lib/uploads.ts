import crypto from "node:crypto";
import { ValidationError } from "./errors";

/**
 * The one upload policy for every file a user sends (project files, as-built photos, the engineer's
 * signed letter): the type comes from the file's first bytes (magic numbers), never from its name or
 * the browser's claim; only JPEG, PNG, WebP and PDF; one size limit per kind; images at most
 * MAX_IMAGE_PIXELS; storage keys are made by the app from ids, so nothing the uploader typed reaches
 * a path. SVG, HTML and anything unsniffable are refused with a 422 naming the file, because a
 * browser would run the script inside them on our origin.
 */
export const MAX_UPLOAD_BYTES = 15 * 1024 * 1024;
export const MAX_UPLOAD_LABEL = "15 MB";
export const THUMBNAIL_WIDTH_PX = 320;
/** About 50 megapixels: larger than any phone camera, small enough that decoding cannot exhaust memory [common practice]. */
export const MAX_IMAGE_PIXELS = 50_000_000;

export type AllowedContentType = "image/jpeg" | "image/png" | "image/webp" | "application/pdf";

export interface SniffedType {
  contentType: AllowedContentType;
  kind: "photo" | "document";
  label: string;
}

/** What each kind of upload may be and how large. */
export const UPLOAD_KINDS = {
  projectFile: { maxBytes: MAX_UPLOAD_BYTES, sizeLabel: MAX_UPLOAD_LABEL, allows: ["photo", "document"], what: "a JPEG, PNG or WebP photo or a PDF" },
  asBuiltPhoto: { maxBytes: 10 * 1024 * 1024, sizeLabel: "10 MB", allows: ["photo"], what: "a JPEG, PNG or WebP photo" },
  signedLetter: { maxBytes: 10 * 1024 * 1024, sizeLabel: "10 MB", allows: ["photo", "document"], what: "a PDF or a JPEG, PNG or WebP image" },
} as const satisfies Record<string, { maxBytes: number; sizeLabel: string; allows: readonly SniffedType["kind"][]; what: string }>;
export type UploadKind = keyof typeof UPLOAD_KINDS;

const startsWith = (bytes: Uint8Array, sig: number[], at = 0) => sig.every((b, i) => bytes[at + i] === b);

/** The allowed type these bytes are, or null. Signatures: JPEG FF D8 FF; PNG 89 50 4E 47 0D 0A 1A 0A; WebP "RIFF"…"WEBP"; PDF "%PDF-" [common practice: published file-format signatures]. */
export function sniffType(bytes: Uint8Array): SniffedType | null {
  if (startsWith(bytes, [0xff, 0xd8, 0xff])) return { contentType: "image/jpeg", kind: "photo", label: "JPEG photo" };
  if (startsWith(bytes, [0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a])) return { contentType: "image/png", kind: "photo", label: "PNG image" };
  if (startsWith(bytes, [0x52, 0x49, 0x46, 0x46]) && startsWith(bytes, [0x57, 0x45, 0x42, 0x50], 8)) return { contentType: "image/webp", kind: "photo", label: "WebP image" };
  if (startsWith(bytes, [0x25, 0x50, 0x44, 0x46, 0x2d])) return { contentType: "application/pdf", kind: "document", label: "PDF" };
  return null;
}

const refuse = ValidationError.field;

export interface AcceptedUpload {
  bytes: Uint8Array;
  type: SniffedType;
  name: string;
}

/**
 * Checks one uploaded file against the policy of its kind and returns its bytes and sniffed type;
 * throws a ValidationError on `path` whose message names the file otherwise. Images are measured from
 * their header (sharp reads no pixels for that) so a decompression bomb is refused unread.
 */
export async function acceptUpload(file: File, kind: UploadKind, path: string): Promise<AcceptedUpload> {
  const policy = UPLOAD_KINDS[kind];
  const name = displayName(file.name);
  if (file.size > policy.maxBytes) throw refuse(path, `${name} is over ${policy.sizeLabel}: each file must be at most ${policy.sizeLabel}`);
  const bytes = new Uint8Array(await file.arrayBuffer());
  const type = sniffType(bytes);
  if (!type || !(policy.allows as readonly string[]).includes(type.kind)) {
    throw refuse(path, `${name} must be ${policy.what}; its content is none of those (its name does not count)`);
  }
  if (type.kind === "photo") {
    const pixels = await imagePixels(bytes);
    if (pixels === null) throw refuse(path, `${name} could not be read as a ${type.label}; it may be damaged. Export it again and upload the copy`);
    if (pixels > MAX_IMAGE_PIXELS) throw refuse(path, `${name} is ${(pixels / 1e6).toFixed(0)} megapixels: images must be at most ${MAX_IMAGE_PIXELS / 1e6} megapixels; export a smaller copy`);
  }
  return { bytes, type, name };
}

/** Width × height from the image header, or null when sharp cannot read it. */
async function imagePixels(bytes: Uint8Array): Promise<number | null> {
  const sharp = (await import("sharp")).default;
  try {
    const meta = await sharp(bytes, { limitInputPixels: false }).metadata();
    if (!meta.width || !meta.height) return null;
    return meta.width * meta.height;
  } catch {
    return null;
  }
}

/** Keys under the organisation and project, from ids only. */
export function objectKeys(organisationId: string, projectId: string, fileId: string = crypto.randomUUID()) {
  const dir = `orgs/${organisationId}/projects/${projectId}/files/${fileId}`;
  return { fileId, original: `${dir}/original`, thumbnail: `${dir}/thumbnail.webp` };
}

/** Keys for files that belong to a revision (as-built photos, the signed letter), from ids only. */
export function revisionObjectKey(organisationId: string, revisionId: string, what: "as-built" | "letter"): string {
  return what === "as-built"
    ? `orgs/${organisationId}/revisions/${revisionId}/as-built/${crypto.randomUUID()}`
    : `orgs/${organisationId}/revisions/${revisionId}/letter-${crypto.randomUUID()}`;
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
  return new Uint8Array(await sharp(bytes, { limitInputPixels: MAX_IMAGE_PIXELS }).rotate().resize({ width: THUMBNAIL_WIDTH_PX, withoutEnlargement: true }).webp({ quality: 75 }).toBuffer());
}

/**
 * The one way a stored upload goes back to a browser. The bytes are sniffed again (objects stored
 * before this policy carry whatever type the browser claimed), and anything that is not on the
 * allow-list goes out as an opaque attachment. Every answer carries nosniff and a sandboxing
 * content-security policy, so even a file that slipped through cannot run script on our origin.
 * Photos may show inline; PDFs and everything else download.
 */
export function fileResponse(body: Uint8Array, options: { fileName: string; inlinePhotos?: boolean; cache?: string }): Response {
  const type = sniffType(body);
  const inline = Boolean(options.inlinePhotos) && type?.kind === "photo";
  const asciiName = options.fileName.replace(/[^\x20-\x7e]/g, "_").replace(/["\\;]/g, "_");
  return new Response(body as BodyInit, {
    headers: {
      "content-type": type?.contentType ?? "application/octet-stream",
      "content-length": String(body.byteLength),
      "content-disposition": `${inline ? "inline" : "attachment"}; filename="${asciiName}"; filename*=UTF-8''${encodeURIComponent(options.fileName)}`,
      "x-content-type-options": "nosniff",
      "content-security-policy": "sandbox; default-src 'none'; img-src 'self'; style-src 'unsafe-inline'",
      "cache-control": options.cache ?? "private, max-age=300",
    },
  });
}
