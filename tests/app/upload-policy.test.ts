/**
 * The one upload policy (finding 1 of the hardening issue): as-built photos, the engineer's signed
 * letter and project files are all sniffed by content against JPEG/PNG/WebP/PDF, with a pixel
 * limit on images; SVG, HTML and unsniffable files are refused with a 422 naming the file; and
 * every download goes out with nosniff and a sandboxing content-security policy, as an attachment
 * unless it is a photo, even for objects stored before the policy existed.
 */
import sharp from "sharp";
import { describe, expect, it } from "vitest";
import { recordAsBuiltAction } from "@/app/(workspace)/field/[revisionId]/actions";
import { decideReviewAction } from "@/app/(workspace)/reviews/[revisionId]/actions";
import { GET as asBuiltPhoto } from "@/app/api/as-built/[entryId]/photos/[index]/route";
import { POST as uploadProjectFile } from "@/app/api/projects/[projectId]/files/route";
import { GET as letter } from "@/app/api/revisions/[revisionId]/letter/route";
import { putObject } from "@/app/_lib/storage";
import { MAX_IMAGE_PIXELS } from "@/app/_lib/uploads";
import { db } from "@/db/client";
import { DEMO_SLOPED_PROJECT_ID } from "@/db/seeds/02_demo_projects";
import { actAs, jsonRequest, outcomeOf, params } from "../support/next-context";
import { DESIGNER, ENGINEER, INSTALLER, freshApproved, freshAsBuilt, freshInReview } from "../support/review-fixtures";

// An SVG whose script would run on our origin if served inline as image/svg+xml (SVG 1.1 §18.2, the 'script' element).
const svgWithScript = new TextEncoder().encode(`<svg xmlns="http://www.w3.org/2000/svg"><script>fetch("/api/session")</script></svg>`);
const html = new TextEncoder().encode("<!doctype html><script>alert(document.cookie)</script>");
const realJpeg = () => sharp({ create: { width: 64, height: 48, channels: 3, background: { r: 90, g: 90, b: 90 } } }).jpeg().toBuffer();

function fieldForm(revisionId: string, photos: File[]): FormData {
  const f = new FormData();
  for (const [k, v] of Object.entries({ revisionId, postId: "P1", measuredDiameterIn: "120", measuredDepthIn: "720", groundFound: "as_expected" })) f.append(k, v);
  for (const p of photos) f.append("photos", p);
  return f;
}

function expectSandboxedDownload(response: Response): void {
  expect(response.headers.get("x-content-type-options")).toBe("nosniff");
  expect(response.headers.get("content-security-policy")).toMatch(/(^|;\s*)sandbox(;|$)/);
}

describe("as-built photos", () => {
  it("refuses an SVG with script (claimed image/svg+xml) and an HTML page named .jpg, naming each file, storing nothing", async () => {
    const d = await freshApproved();
    await actAs(INSTALLER);
    for (const [bytes, name, type] of [[svgWithScript, "hole.svg", "image/svg+xml"], [html, "hole.jpg", "image/jpeg"]] as const) {
      const out = await outcomeOf(() => recordAsBuiltAction({}, fieldForm(d.revisionId, [new File([bytes as BlobPart], name, { type })])));
      expect(out).toMatchObject({ kind: "value", value: { fieldErrors: { photos: [expect.stringContaining(name)] } } });
    }
    expect(await db("as_built_entries").where({ revision_id: d.revisionId })).toEqual([]);
  });

  it("refuses an image over 50 megapixels from its header", async () => {
    const d = await freshApproved();
    await actAs(INSTALLER);
    // 10 000 × 5 001 px = 50.01 MP, just over the limit; one grey channel compresses to a small file.
    const big = await sharp({ create: { width: 10_000, height: 5_001, channels: 3, background: { r: 128, g: 128, b: 128 } } }).png({ compressionLevel: 9 }).toBuffer();
    expect(10_000 * 5_001).toBeGreaterThan(MAX_IMAGE_PIXELS);
    const out = await outcomeOf(() => recordAsBuiltAction({}, fieldForm(d.revisionId, [new File([new Uint8Array(big) as BlobPart], "huge.png", { type: "image/png" })])));
    expect(out).toMatchObject({ kind: "value", value: { fieldErrors: { photos: [expect.stringMatching(/huge\.png is 50 megapixels.*at most 50 megapixels/)] } } });
  });

  it("accepts a real JPEG and serves it back inline as image/jpeg with nosniff and a sandbox policy", async () => {
    const d = await freshApproved();
    await actAs(INSTALLER);
    const jpeg = new Uint8Array(await realJpeg());
    const out = await outcomeOf(() => recordAsBuiltAction({}, fieldForm(d.revisionId, [new File([jpeg as BlobPart], "hole.jpg", { type: "" })])));
    expect(out).toMatchObject({ kind: "value", value: { ok: true } });
    const entry = await db("as_built_entries").where({ revision_id: d.revisionId }).first("id");
    const response = await asBuiltPhoto(jsonRequest("GET", "/"), params({ entryId: entry.id, index: "0" }));
    expect(response.status).toBe(200);
    expect(response.headers.get("content-type")).toBe("image/jpeg");
    expect(response.headers.get("content-disposition")).toMatch(/^inline;/);
    expectSandboxedDownload(response);
  });

  it("serves an SVG stored before the policy as an opaque attachment, never as image/svg+xml", async () => {
    const key = `orgs/legacy/as-built/${crypto.randomUUID()}`;
    await putObject(key, svgWithScript, "image/svg+xml");
    const d = await freshAsBuilt({ photoKeys: [key] });
    await actAs(DESIGNER);
    const response = await asBuiltPhoto(jsonRequest("GET", "/"), params({ entryId: d.entryId, index: "0" }));
    expect(response.headers.get("content-type")).toBe("application/octet-stream");
    expect(response.headers.get("content-disposition")).toMatch(/^attachment;/);
    expectSandboxedDownload(response);
    // Indexes that are not small whole numbers are not found rather than errors.
    for (const index of ["-1", "1e3", "constructor", "0x0"]) {
      expect((await asBuiltPhoto(jsonRequest("GET", "/"), params({ entryId: d.entryId, index }))).status).toBe(404);
    }
  });
});

describe("the engineer's signed letter", () => {
  it("refuses an SVG letter naming it, records no decision and leaves the revision in review", async () => {
    const d = await freshInReview();
    await actAs(ENGINEER);
    const f = new FormData();
    f.append("revisionId", d.revisionId);
    f.append("decision", "approve");
    f.append("letter", new File([svgWithScript as BlobPart], "signed.svg", { type: "image/svg+xml" }));
    const out = await outcomeOf(() => decideReviewAction({}, f));
    expect(out).toMatchObject({ kind: "value", value: { fieldErrors: { letter: [expect.stringContaining("signed.svg")] } } });
    expect((await db("revisions").where({ id: d.revisionId }).first("status")).status).toBe("in_review");
  });

  it("downloads a letter as an attachment with nosniff and a sandbox policy, even one stored as HTML", async () => {
    const key = `orgs/legacy/letter-${crypto.randomUUID()}`;
    await putObject(key, html, "text/html");
    const d = await freshApproved({ letterKey: key });
    await actAs(DESIGNER);
    const response = await letter(jsonRequest("GET", "/"), params({ revisionId: d.revisionId }));
    expect(response.status).toBe(200);
    expect(response.headers.get("content-type")).toBe("application/octet-stream");
    expect(response.headers.get("content-disposition")).toMatch(/^attachment;/);
    expectSandboxedDownload(response);
  });
});

describe("project files", () => {
  it("refuses SVG by content with a message naming the file", async () => {
    await actAs(DESIGNER);
    const form = new FormData();
    form.append("file", new File([svgWithScript as BlobPart], "site-plan.svg", { type: "image/svg+xml" }));
    const response = await uploadProjectFile(new Request("http://127.0.0.1/", { method: "POST", body: form }), params({ projectId: DEMO_SLOPED_PROJECT_ID }));
    expect(response.status).toBe(422);
    expect((await response.json()).errors).toEqual([{ path: "file", message: expect.stringContaining("site-plan.svg") }]);
  });
});
