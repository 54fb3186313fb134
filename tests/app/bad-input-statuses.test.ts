/**
 * Findings 9–11 of the hardening issue: bad input is a 4xx naming the field, never a 500; a
 * service that is down or frozen is a 503 after a bounded wait. Each request below answered 500
 * (or hung) before.
 */
import { NextRequest } from "next/server";
import { describe, expect, it } from "vitest";
import { GET as listProjects, POST as createProject } from "@/app/api/projects/route";
import { PATCH as patchProject, GET as getProject } from "@/app/api/projects/[projectId]/route";
import { GET as asBuiltPhoto } from "@/app/api/as-built/[entryId]/photos/[index]/route";
import { apiErrorResponse } from "@/app/_lib/api";
import { ServiceUnavailableError, withDeadline } from "@/app/_lib/request-guards";
import { DEMO_PROJECT_ID } from "@/db/seeds/02_demo_projects";
import { proxy } from "@/proxy";
import { actAs, jsonRequest, params } from "../support/next-context";

const DESIGNER = "designer@demo.pierwise.test";
const DASHES = "-".repeat(36);

describe("bad input is a 4xx naming the field", () => {
  it("sort keys that every object inherits fall back to the default sort", async () => {
    await actAs(DESIGNER);
    for (const sort of ["__proto__", "constructor", "toString", "hasOwnProperty"]) {
      const response = await listProjects(jsonRequest("GET", `/api/projects?sort=${sort}`), {});
      expect(response.status, sort).toBe(200);
    }
  });

  it("a NUL character in a text field or the filter is a 422 naming it", async () => {
    await actAs(DESIGNER);
    const created = await createProject(jsonRequest("POST", "/api/projects", { name: "Site\u0000A", state: "CO" }), {});
    expect(created.status).toBe(422);
    expect((await created.json()).errors).toEqual([{ path: "name", message: expect.stringMatching(/control characters/) }]);
    const filtered = await listProjects(jsonRequest("GET", "/api/projects?q=a%00b"), {});
    expect(filtered.status).toBe(422);
    expect((await filtered.json()).errors[0].path).toBe("q");
  });

  it("an unknown PATCH key is named", async () => {
    await actAs(DESIGNER);
    const response = await patchProject(jsonRequest("PATCH", "/", { notes: "ok", ownerId: "x" }), params({ projectId: DEMO_PROJECT_ID }));
    expect(response.status).toBe(422);
    expect((await response.json()).errors).toEqual([{ path: "ownerId", message: expect.stringMatching(/ownerId is not a field/) }]);
  });

  it("36 dashes as an id is not found", async () => {
    await actAs(DESIGNER);
    expect((await getProject(jsonRequest("GET", "/"), params({ projectId: DASHES }))).status).toBe(404);
    expect((await asBuiltPhoto(jsonRequest("GET", "/"), params({ entryId: DASHES, index: "0" }))).status).toBe(404);
  });

  it("a broken percent-escape in a path is a 400", async () => {
    const response = await proxy(new NextRequest("http://127.0.0.1/api/projects/%E0%A4%A"));
    expect(response.status).toBe(400);
    expect((await response.json()).errors[0].message).toMatch(/%-escape/);
  });
});

describe("a service that is down answers 503", () => {
  it("a database that refuses connections is a 503 with a clear message, not a 500", async () => {
    const refused = Object.assign(new Error("connect ECONNREFUSED 127.0.0.1:1"), { code: "ECONNREFUSED" });
    const response = apiErrorResponse(refused);
    expect(response.status).toBe(503);
    expect((await response.json()).errors[0].message).toMatch(/not answering right now; nothing was changed/);
  });

  it("a frozen file store or mail server gives up after the deadline with a 503", async () => {
    const frozen = withDeadline("The file store", () => new Promise<never>(() => undefined));
    await expect(frozen).rejects.toBeInstanceOf(ServiceUnavailableError);
    expect(apiErrorResponse(await frozen.catch((e) => e)).status).toBe(503);
  }, 20_000);
});
