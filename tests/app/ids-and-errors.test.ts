/**
 * The one id check and the one error vocabulary: a path id that is not a uuid (36 dashes fit the
 * old loose pattern) is a 404 from every route, never a query that PostgreSQL answers with a 500;
 * each kind of error maps to one API status and one form state.
 */
import { describe, expect, it } from "vitest";
import { actionState } from "@/app/_lib/action-errors";
import { apiErrorResponse } from "@/app/_lib/api";
import { AccessError, ConflictError, ValidationError } from "@/app/_lib/errors";
import { GET as photo } from "@/app/api/as-built/[entryId]/photos/[index]/route";
import { GET as getDesign } from "@/app/api/designs/[designId]/route";
import { POST as saveRevision } from "@/app/api/designs/[designId]/revisions/route";
import { GET as getProject, PATCH as patchProject } from "@/app/api/projects/[projectId]/route";
import { GET as listDesigns } from "@/app/api/projects/[projectId]/designs/route";
import { GET as listFiles } from "@/app/api/projects/[projectId]/files/route";
import { GET as getFile } from "@/app/api/projects/[projectId]/files/[fileId]/route";
import { GET as letter } from "@/app/api/revisions/[revisionId]/letter/route";
import { GET as report } from "@/app/api/revisions/[revisionId]/report.pdf/route";
import { POST as review } from "@/app/api/revisions/[revisionId]/review/route";
import { GET as getRevision } from "@/app/api/revisions/[revisionId]/route";
import { POST as submit } from "@/app/api/revisions/[revisionId]/submit/route";
import { isUuid } from "@/db/ids";
import { DEMO_PROJECT_ID } from "@/db/seeds/02_demo_projects";
import { z } from "zod";
import { actAs, jsonRequest, outcomeOf, params } from "../support/next-context";

const DASHES = "-".repeat(36);
const NOT_HEX = "zzzzzzzz-zzzz-zzzz-zzzz-zzzzzzzzzzzz";

describe("isUuid", () => {
  it("accepts only the 8-4-4-4-12 hexadecimal form (RFC 9562 §4)", () => {
    expect(isUuid("7d0c2f0e-1b8a-4c2e-9f3a-0a1b2c3d4e5f")).toBe(true);
    for (const bad of [DASHES, NOT_HEX, "", "7d0c2f0e1b8a4c2e9f3a0a1b2c3d4e5f", "7d0c2f0e-1b8a-4c2e-9f3a-0a1b2c3d4e5f ", 42, null]) expect(isUuid(bad)).toBe(false);
  });
});

describe("a malformed id in a path is a 404 from every route", () => {
  const cases: [string, () => Promise<Response>][] = [
    ["GET /api/projects/:id", () => getProject(jsonRequest("GET", "/"), params({ projectId: DASHES }))],
    ["PATCH /api/projects/:id", () => patchProject(jsonRequest("PATCH", "/", { name: "x" }), params({ projectId: DASHES }))],
    ["GET /api/projects/:id/designs", () => listDesigns(jsonRequest("GET", "/"), params({ projectId: DASHES }))],
    ["GET /api/projects/:id/files", () => listFiles(jsonRequest("GET", "/"), params({ projectId: DASHES }))],
    ["GET /api/projects/:id/files/:fileId", () => getFile(jsonRequest("GET", "/"), params({ projectId: DEMO_PROJECT_ID, fileId: DASHES }))],
    ["GET /api/designs/:id", () => getDesign(jsonRequest("GET", "/"), params({ designId: DASHES }))],
    ["POST /api/designs/:id/revisions", () => saveRevision(jsonRequest("POST", "/", {}), params({ designId: DASHES }))],
    ["GET /api/revisions/:id", () => getRevision(jsonRequest("GET", "/"), params({ revisionId: DASHES }))],
    ["POST /api/revisions/:id/submit", () => submit(jsonRequest("POST", "/", {}), params({ revisionId: DASHES }))],
    ["POST /api/revisions/:id/review", () => review(jsonRequest("POST", "/", {}), params({ revisionId: DASHES }))],
    ["GET /api/revisions/:id/letter", () => letter(jsonRequest("GET", "/"), params({ revisionId: DASHES }))],
    ["GET /api/revisions/:id/report.pdf", () => report(jsonRequest("GET", "/"), params({ revisionId: NOT_HEX }))],
    ["GET /api/as-built/:id/photos/0", () => photo(jsonRequest("GET", "/"), params({ entryId: DASHES, index: "0" }))],
  ];
  it.each(cases)("%s", async (_name, call) => {
    await actAs("designer@demo.pierwise.test");
    const response = await call();
    expect(response.status).toBe(404);
  });
});

describe("one mapper to the API, one to the form", () => {
  const table = [
    { error: ValidationError.field("site.windSpeedMph", "Wind speed must be between 85 and 200 mph"), status: 422, field: "site.windSpeedMph" },
    { error: z.object({ name: z.string() }).safeParse({}).error, status: 422, field: "name" },
    { error: new ConflictError("Someone saved since", { latestRevisionId: "x" }), status: 409, field: null },
    { error: new AccessError(403, "You cannot approve a design you authored.", true), status: 403, field: null },
  ];
  it.each(table)("$status", async ({ error, status, field }) => {
    const response = apiErrorResponse(error);
    expect(response.status).toBe(status);
    const json = await response.json();
    const state = actionState(error, { typed: "kept" });
    expect(state.values).toEqual({ typed: "kept" });
    if (field) {
      expect(json.errors[0].path).toBe(field);
      expect(state.fieldErrors?.[field]?.[0]).toBe(json.errors[0].message);
    } else {
      expect(state.message).toBe(json.errors[0].message);
      expect(state.fieldErrors).toBeUndefined();
    }
  });

  it("a 409 keeps its detail beside the message", async () => {
    expect(await apiErrorResponse(new ConflictError("stale", { latestRevisionId: "r2" })).json()).toMatchObject({ latestRevisionId: "r2" });
  });

  it("an unexplained 403 or a 404 from a form is the forbidden or not-found page, not a message", async () => {
    expect(await outcomeOf(async () => actionState(new AccessError(403, "Only designers")))).toEqual({ kind: "status", status: 403 });
    expect(await outcomeOf(async () => actionState(new AccessError(404, "Not found")))).toEqual({ kind: "status", status: 404 });
    expect(await outcomeOf(async () => actionState(new AccessError(401, "Sign in")))).toEqual({ kind: "redirect", location: "/login" });
  });

  it("any other error is a 500 that leaks nothing, and a form re-throws it", async () => {
    const response = apiErrorResponse(new Error("connection string with a secret"));
    expect(response.status).toBe(500);
    expect(JSON.stringify(await response.json())).not.toMatch(/secret/);
    expect(() => actionState(new Error("boom"))).toThrow("boom");
  });

  it("a list index at the end of a path is dropped for the form key; inner ones stay", () => {
    const state = actionState(new ValidationError([{ path: "extraRoles.0", message: "a" }, { path: "comments.2.fieldPath", message: "b" }, { path: "", message: "c" }]));
    expect(Object.keys(state.fieldErrors ?? {})).toEqual(["extraRoles", "comments.2.fieldPath", "form"]);
  });
});
