/**
 * Findings 5 and 10 of the hardening issue: writes only from the app's own origin, JSON only,
 * and JSON bodies at most 1 MB (413 before parsing). Requests without Origin or Sec-Fetch-Site
 * (scripts, API clients) keep working. Header names and values: Fetch Standard §3.1 (`Origin`),
 * Fetch Metadata Request Headers (W3C) §2.4 (`Sec-Fetch-Site`).
 */
import { afterAll, describe, expect, it } from "vitest";
import { POST as calc } from "@/app/api/calc/route";
import { POST as createProject } from "@/app/api/projects/route";
import { PATCH as patchProject } from "@/app/api/projects/[projectId]/route";
import { POST as review } from "@/app/api/revisions/[revisionId]/review/route";
import { POST as signIn } from "@/app/api/session/route";
import { env } from "@/app/_lib/env";
import { MAX_JSON_BYTES } from "@/app/_lib/request-guards";
import { db } from "@/db/client";
import { DEMO_PROJECT_ID } from "@/db/seeds/02_demo_projects";
import { actAs, params, resetRequest } from "../support/next-context";
import { DESIGNER, ENGINEER, freshInReview } from "../support/review-fixtures";

const created: string[] = [];
afterAll(async () => {
  await db("projects").whereIn("id", created).delete();
});

function request(method: string, body: string | ReadableStream<Uint8Array> | undefined, headers: Record<string, string>): Request {
  return new Request("http://127.0.0.1/api/x", { method, headers, body, ...(body instanceof ReadableStream ? { duplex: "half" } : {}) } as RequestInit);
}

const project = JSON.stringify({ name: "Guard test site", state: "CO" });
const projectCount = async () => Number((await db("projects").where({ name: "Guard test site" }).count<{ n: string }[]>({ n: "*" }))[0].n);

describe("writes only from the app's own origin", () => {
  it("refuses the finding's text/plain create from a foreign origin, and from another port of this host", async () => {
    await actAs(DESIGNER);
    const before = await projectCount();
    const foreign = await createProject(request("POST", project, { "content-type": "text/plain", origin: "http://evil.example" }), {});
    expect(foreign.status).toBe(403);
    expect((await foreign.json()).errors[0]).toMatchObject({ path: "", message: expect.stringMatching(/another site or port/) });
    const port = new URL(env.appUrl);
    port.port = String(Number(port.port || 80) + 1);
    expect((await createProject(request("POST", project, { "content-type": "application/json", origin: port.origin }), {})).status).toBe(403);
    expect((await createProject(request("POST", project, { "content-type": "application/json", origin: "null" }), {})).status).toBe(403);
    for (const site of ["cross-site", "same-site"]) {
      expect((await createProject(request("POST", project, { "content-type": "application/json", "sec-fetch-site": site }), {})).status).toBe(403);
    }
    expect(await projectCount()).toBe(before);
  });

  it("refuses a foreign patch and a foreign approval", async () => {
    await actAs(DESIGNER);
    const patched = await patchProject(request("PATCH", JSON.stringify({ notes: "x" }), { "content-type": "application/json", origin: "http://evil.example" }), params({ projectId: DEMO_PROJECT_ID }));
    expect(patched.status).toBe(403);
    const d = await freshInReview();
    await actAs(ENGINEER);
    const approved = await review(request("POST", JSON.stringify({ decision: "approve" }), { "content-type": "text/plain", origin: "http://evil.example" }), params({ revisionId: d.revisionId }));
    expect(approved.status).toBe(403);
    expect((await db("revisions").where({ id: d.revisionId }).first("status")).status).toBe("in_review");
  });

  it("refuses sign-in from a foreign origin (login forgery)", async () => {
    resetRequest();
    const response = await signIn(request("POST", JSON.stringify({ email: DESIGNER, password: "pierwise-demo" }), { "content-type": "application/json", origin: "http://evil.example" }), {});
    expect(response.status).toBe(403);
  });

  it("keeps working for the app's own pages and for clients that send neither header", async () => {
    await actAs(DESIGNER);
    const allowed: Record<string, string>[] = [{ origin: new URL(env.appUrl).origin }, { "sec-fetch-site": "same-origin" }, {}];
    for (const headers of allowed) {
      const response = await createProject(request("POST", project, { "content-type": "application/json", ...headers }), {});
      expect(response.status, JSON.stringify(headers)).toBe(201);
      created.push((await response.json()).project.id);
    }
  });
});

describe("JSON only, at most 1 MB", () => {
  it("answers 415 naming the body for a write that is not JSON", async () => {
    await actAs(DESIGNER);
    for (const type of ["text/plain", "application/x-www-form-urlencoded", ""]) {
      const response = await createProject(request("POST", project, type ? { "content-type": type } : {}), {});
      expect(response.status, type).toBe(415);
      expect((await response.json()).errors).toEqual([{ path: "", message: expect.stringMatching(/JSON/) }]);
    }
  });

  it("answers 413 for a body over 1 MB, declared or streamed, before parsing it", async () => {
    await actAs(DESIGNER);
    // The finding's request: a 50 MB body declared up front is refused unread.
    const declared = await calc(request("POST", "{}", { "content-type": "application/json", "content-length": String(50 * 1024 * 1024) }), {});
    expect(declared.status).toBe(413);
    // A body with no declared length is read only up to the limit.
    const chunk = new Uint8Array(64 * 1024).fill(0x20);
    let sent = 0;
    const stream = new ReadableStream<Uint8Array>({
      pull(controller) {
        sent += chunk.byteLength;
        if (sent > 50 * 1024 * 1024) controller.close();
        else controller.enqueue(chunk);
      },
    });
    const streamed = await calc(request("POST", stream, { "content-type": "application/json" }), {});
    expect(streamed.status).toBe(413);
    expect((await streamed.json()).errors[0].message).toMatch(/larger than 1 MB/);
    expect(sent).toBeLessThan(MAX_JSON_BYTES * 2);
  });
});
