/**
 * Uploads on a project through the S3 stand-in: allow-list by content (magic bytes, not the name),
 * size limit, refusals before anything is stored, thumbnails for photos, downloads only through
 * the access-checked route.
 */
import { ListObjectsV2Command, S3Client } from "@aws-sdk/client-s3";
import sharp from "sharp";
import { describe, expect, it } from "vitest";
import { GET as listFiles, POST as upload } from "@/app/api/projects/[projectId]/files/route";
import { GET as download } from "@/app/api/projects/[projectId]/files/[fileId]/route";
import { env } from "@/app/_lib/env";
import { MAX_UPLOAD_BYTES } from "@/app/_lib/uploads";
import { db } from "@/db/client";
import { DEMO_PROJECT_ID, DEMO_SLOPED_PROJECT_ID } from "@/db/seeds/02_demo_projects";
import { actAs, jsonRequest, params } from "../support/next-context";

const DESIGNER = "designer@demo.pierwise.test";

function uploadRequest(bytes: Uint8Array, name: string, type = "application/octet-stream"): Request {
  const form = new FormData();
  form.append("file", new File([bytes as BlobPart], name, { type }));
  form.append("description", "Test upload");
  return new Request("http://127.0.0.1/api/projects/x/files", { method: "POST", body: form });
}

async function storedKeys(projectId: string): Promise<string[]> {
  const s3 = new S3Client({ endpoint: env.s3.endpoint, region: "us-east-1", forcePathStyle: true, credentials: { accessKeyId: env.s3.accessKeyId, secretAccessKey: env.s3.secretAccessKey } });
  const out = await s3.send(new ListObjectsV2Command({ Bucket: env.s3.bucket, Prefix: "orgs/" }));
  return (out.Contents ?? []).map((o) => o.Key!).filter((k) => k.includes(projectId));
}

const samplePng = () => sharp({ create: { width: 800, height: 600, channels: 3, background: { r: 120, g: 160, b: 90 } } }).png().toBuffer();
// "%PDF-" header: ISO 32000-1:2008 §7.5.2 (file header).
const tinyPdf = new TextEncoder().encode("%PDF-1.4\n1 0 obj<<>>endobj\ntrailer<<>>\n%%EOF\n");

describe("POST /api/projects/:id/files", () => {
  it("stores a photo under an app-made key, makes a thumbnail, and serves both only through the access check", async () => {
    await actAs(DESIGNER);
    const png = new Uint8Array(await samplePng());
    // The browser's claimed type and the name are ignored: the PNG signature decides (PNG spec, ISO/IEC 15948 §5.2).
    const response = await upload(uploadRequest(png, "../../etc/site photo.jpg", "text/plain"), params({ projectId: DEMO_PROJECT_ID }));
    expect(response.status).toBe(201);
    const { file } = await response.json();
    expect(file).toMatchObject({ kind: "photo", contentType: "image/png", originalName: "site photo.jpg", sizeBytes: png.byteLength, hasThumbnail: true });
    expect(file.objectKey).toBeUndefined();
    const row = await db("project_files").where({ id: file.id }).first();
    expect(row.object_key).toBe(`orgs/${row.organisation_id}/projects/${DEMO_PROJECT_ID}/files/${file.id}/original`);

    const original = await download(jsonRequest("GET", "/"), params({ projectId: DEMO_PROJECT_ID, fileId: file.id }));
    expect(original.status).toBe(200);
    expect(original.headers.get("content-type")).toBe("image/png");
    expect(original.headers.get("x-content-type-options")).toBe("nosniff");
    expect(new Uint8Array(await original.arrayBuffer())).toEqual(png);

    const thumb = await download(jsonRequest("GET", "/?variant=thumbnail"), params({ projectId: DEMO_PROJECT_ID, fileId: file.id }));
    expect(thumb.headers.get("content-type")).toBe("image/webp");
    const meta = await sharp(Buffer.from(await thumb.arrayBuffer())).metadata();
    expect(meta.width).toBe(320); // THUMBNAIL_WIDTH_PX, the product's choice (app/_lib/uploads.ts)

    // Engineers and installers of the organisation may read; another organisation may not, even with the right ids.
    await actAs("installer@demo.pierwise.test");
    expect((await download(jsonRequest("GET", "/"), params({ projectId: DEMO_PROJECT_ID, fileId: file.id }))).status).toBe(200);
    await actAs("designer@other.pierwise.test");
    expect((await download(jsonRequest("GET", "/"), params({ projectId: DEMO_PROJECT_ID, fileId: file.id }))).status).toBe(404);
    expect((await listFiles(jsonRequest("GET", "/"), params({ projectId: DEMO_PROJECT_ID }))).status).toBe(404);
    // The right file id under the wrong project is not found either.
    await actAs(DESIGNER);
    expect((await download(jsonRequest("GET", "/"), params({ projectId: DEMO_SLOPED_PROJECT_ID, fileId: file.id }))).status).toBe(404);
    await actAs(null);
    expect((await download(jsonRequest("GET", "/"), params({ projectId: DEMO_PROJECT_ID, fileId: file.id }))).status).toBe(401);
  });

  it("accepts a PDF by its content and lists uploads with server paging", async () => {
    await actAs(DESIGNER);
    const response = await upload(uploadRequest(tinyPdf, "soil report.pdf", "application/pdf"), params({ projectId: DEMO_PROJECT_ID }));
    expect(response.status).toBe(201);
    expect((await response.json()).file).toMatchObject({ kind: "document", contentType: "application/pdf", hasThumbnail: false });
    const list = await (await listFiles(jsonRequest("GET", "/?q=soil%20report&sort=createdAt&pageSize=5"), params({ projectId: DEMO_PROJECT_ID }))).json();
    expect(list.total).toBe(1);
    expect(list.rows[0]).toMatchObject({ originalName: "soil report.pdf", kind: "document" });
    expect(list.rows[0].objectKey).toBeUndefined();
  });

  it("refuses content outside the allow-list whatever its name, and stores nothing", async () => {
    await actAs(DESIGNER);
    const before = await storedKeys(DEMO_SLOPED_PROJECT_ID);
    const html = new TextEncoder().encode("<html><script>alert(1)</script></html>");
    const disguised = await upload(uploadRequest(html, "photo.jpg", "image/jpeg"), params({ projectId: DEMO_SLOPED_PROJECT_ID }));
    expect(disguised.status).toBe(422);
    expect((await disguised.json()).errors).toEqual([{ path: "file", message: expect.stringMatching(/JPEG, PNG or WebP photo or a PDF; .*name does not count/) }]);
    // A GIF (signature "GIF89a", GIF89a specification §17) is an image but not on the list.
    const gif = await upload(uploadRequest(new TextEncoder().encode("GIF89a\x01\x00\x01\x00"), "x.gif"), params({ projectId: DEMO_SLOPED_PROJECT_ID }));
    expect(gif.status).toBe(422);
    // A JPEG signature (SOI FF D8 FF, ITU-T T.81 Annex B) followed by garbage cannot be read into a thumbnail.
    const broken = await upload(uploadRequest(new Uint8Array([0xff, 0xd8, 0xff, 0xe0, 1, 2, 3, 4]), "broken.jpg"), params({ projectId: DEMO_SLOPED_PROJECT_ID }));
    expect(broken.status).toBe(422);
    expect((await broken.json()).errors[0].message).toMatch(/could not be read/);
    const empty = await upload(new Request("http://127.0.0.1/", { method: "POST", body: new FormData() }), params({ projectId: DEMO_SLOPED_PROJECT_ID }));
    expect((await empty.json()).errors[0]).toMatchObject({ path: "file", message: expect.stringMatching(/Choose a file/) });
    expect(await storedKeys(DEMO_SLOPED_PROJECT_ID)).toEqual(before);
    expect(await db("project_files").where({ project_id: DEMO_SLOPED_PROJECT_ID }).count<{ count: string }[]>({ count: "*" })).toEqual([{ count: "0" }]);
  });

  it("refuses a file over 15 MB before storing it", async () => {
    await actAs(DESIGNER);
    const big = new Uint8Array(MAX_UPLOAD_BYTES + 1);
    big.set([0x25, 0x50, 0x44, 0x46, 0x2d]); // a PDF header: only the size is wrong
    const response = await upload(uploadRequest(big, "huge.pdf"), params({ projectId: DEMO_SLOPED_PROJECT_ID }));
    expect(response.status).toBe(422);
    expect((await response.json()).errors).toEqual([{ path: "file", message: "huge.pdf is over 15 MB: each file must be at most 15 MB" }]);
    const declared = new Request("http://127.0.0.1/", { method: "POST", headers: { "content-length": String(40 * 1024 * 1024), "content-type": "multipart/form-data; boundary=x" }, body: "--x--" });
    expect((await upload(declared, params({ projectId: DEMO_SLOPED_PROJECT_ID }))).status).toBe(422);
    expect(await storedKeys(DEMO_SLOPED_PROJECT_ID)).toEqual([]);
  });

  it("refuses uploads from installers and engineers (403) before reading the body", async () => {
    for (const who of ["installer@demo.pierwise.test", "engineer@demo.pierwise.test"]) {
      await actAs(who);
      expect((await upload(uploadRequest(tinyPdf, "x.pdf"), params({ projectId: DEMO_PROJECT_ID }))).status).toBe(403);
    }
  });
});
