/**
 * Projects API: create, list (server paging, sorting, filtering), read, patch; field errors as
 * `{ errors: [{ path, message }] }` with 422; other organisations get 404, installers 403 on writes.
 */
import { afterAll, describe, expect, it } from "vitest";
import { GET as listProjects, POST as createProject } from "@/app/api/projects/route";
import { GET as getProject, PATCH as patchProject } from "@/app/api/projects/[projectId]/route";
import { db } from "@/db/client";
import { DEMO_CARD_ID, DEMO_PROJECT_ID, OTHER_PROJECT_ID } from "@/db/seeds/02_demo_projects";
import { actAs, jsonRequest, params } from "../support/next-context";

const DESIGNER = "designer@demo.pierwise.test";
const created: string[] = [];
afterAll(async () => {
  await db("projects").whereIn("id", created).delete();
});

async function create(body: unknown) {
  const response = await createProject(jsonRequest("POST", "/api/projects", body), {});
  const json = await response.json();
  if (response.status === 201) created.push(json.project.id);
  return { status: response.status, json };
}

describe("POST /api/projects and GET /api/projects/:id", () => {
  it("creates a project for the designer's organisation with the criteria card applied", async () => {
    await actAs(DESIGNER);
    const { status, json } = await create({ name: "Test site A", address: "1 Example Road", state: "co", latitude: "39.5", criteriaCardId: DEMO_CARD_ID });
    expect(status).toBe(201);
    expect(json.project).toMatchObject({ name: "Test site A", state: "CO", latitude: 39.5, longitude: null, criteriaCardId: DEMO_CARD_ID });
    const read = await getProject(jsonRequest("GET", "/"), params({ projectId: json.project.id }));
    expect(read.status).toBe(200);
    expect((await read.json()).criteriaCard.jurisdiction).toBe("Juniper Flats County (demo)");
  });

  it("answers 422 naming each bad field and the allowed range", async () => {
    await actAs(DESIGNER);
    // Latitude range −90…90° is the definition of latitude [common practice]; state codes are USPS two-letter codes [common practice].
    const { status, json } = await create({ name: "", state: "Colorado", latitude: 123 });
    expect(status).toBe(422);
    const byPath = Object.fromEntries(json.errors.map((e: { path: string; message: string }) => [e.path, e.message]));
    expect(byPath.name).toMatch(/Project name is required/);
    expect(byPath.state).toMatch(/two-letter US state code/);
    expect(byPath.latitude).toMatch(/between -90 and 90 degrees/);
  });

  it("refuses another organisation's criteria card as not found", async () => {
    await actAs("designer@other.pierwise.test");
    const { status } = await create({ name: "Borrowing a card", state: "CO", criteriaCardId: DEMO_CARD_ID });
    expect(status).toBe(404);
  });

  it("refuses installers and engineers (403) and signed-out callers (401)", async () => {
    for (const who of ["installer@demo.pierwise.test", "engineer@demo.pierwise.test"]) {
      await actAs(who);
      expect((await create({ name: "Not mine to make", state: "CO" })).status).toBe(403);
    }
    await actAs(null);
    expect((await create({ name: "Nobody", state: "CO" })).status).toBe(401);
  });
});

describe("GET /api/projects", () => {
  it("pages, sorts and filters on the server", async () => {
    await actAs(DESIGNER);
    for (let i = 0; i < 5; i++) await create({ name: `Paging probe ${String(i).padStart(2, "0")}`, state: "CO" });
    const page1 = await (await listProjects(jsonRequest("GET", "/api/projects?q=paging%20probe&sort=name&dir=asc&pageSize=2&page=1"), {})).json();
    expect(page1.total).toBe(5);
    expect(page1.rows.map((r: { name: string }) => r.name)).toEqual(["Paging probe 00", "Paging probe 01"]);
    const page3 = await (await listProjects(jsonRequest("GET", "/api/projects?q=paging%20probe&sort=name&dir=desc&pageSize=2&page=3"), {})).json();
    expect(page3.rows.map((r: { name: string }) => r.name)).toEqual(["Paging probe 00"]);
  });

  it("lists only the caller's organisation; engineers and installers may read", async () => {
    await actAs("installer@demo.pierwise.test");
    // Filtered to the demo sites (both organisations' names end "(demo)"), so fixtures other test files add cannot push them off the page.
    const list = await (await listProjects(jsonRequest("GET", "/api/projects?pageSize=100&q=(demo)"), {})).json();
    const ids = list.rows.map((r: { id: string }) => r.id);
    expect(ids).toContain(DEMO_PROJECT_ID);
    expect(ids).not.toContain(OTHER_PROJECT_ID);
  });

  it("answers 422 for a page size over 100", async () => {
    await actAs(DESIGNER);
    const response = await listProjects(jsonRequest("GET", "/api/projects?pageSize=5000"), {});
    expect(response.status).toBe(422);
    expect((await response.json()).errors[0].path).toBe("pageSize");
  });

  it("treats LIKE wildcards in the filter literally", async () => {
    await actAs(DESIGNER);
    // "%" matches only a literal percent sign (as a wildcard it would match every project). Other
    // test files share this database and may have saved a name with "%" in it, so each row found
    // must hold one, and the demo projects (none has) must not be found.
    const list = await (await listProjects(jsonRequest("GET", "/api/projects?q=%25&pageSize=100"), {})).json();
    for (const row of list.rows as { name: string; address: string | null; state: string | null; jurisdiction: string | null }[]) {
      expect([row.name, row.address, row.state, row.jurisdiction].join(" ")).toContain("%");
    }
    const demo = (await (await listProjects(jsonRequest("GET", "/api/projects?pageSize=100"), {})).json()).rows as { name: string }[];
    expect(demo.length).toBeGreaterThan(list.rows.length);
    expect(list.total).toBe(list.rows.length);
  });
});

describe("PATCH /api/projects/:id", () => {
  it("changes only the fields sent", async () => {
    await actAs(DESIGNER);
    const { json } = await create({ name: "Patch me", address: "2 Example Road", state: "CO", notes: "keep" });
    const response = await patchProject(jsonRequest("PATCH", "/", { name: "Patched", longitude: -105.5 }), params({ projectId: json.project.id }));
    expect(response.status).toBe(200);
    expect((await response.json()).project).toMatchObject({ name: "Patched", address: "2 Example Road", notes: "keep", longitude: -105.5 });
  });

  it("names unknown fields and bad values (422)", async () => {
    await actAs(DESIGNER);
    const unknown = await patchProject(jsonRequest("PATCH", "/", { organisationId: "x" }), params({ projectId: DEMO_PROJECT_ID }));
    expect(unknown.status).toBe(422);
    expect((await unknown.json()).errors[0].message).toMatch(/Only name, address/);
    const bad = await patchProject(jsonRequest("PATCH", "/", { longitude: 500 }), params({ projectId: DEMO_PROJECT_ID }));
    expect((await bad.json()).errors).toEqual([{ path: "longitude", message: "Longitude must be between -180 and 180 degrees" }]);
  });

  it("hides other organisations' projects (404) and refuses installers (403)", async () => {
    await actAs("designer@other.pierwise.test");
    expect((await patchProject(jsonRequest("PATCH", "/", { name: "Mine now" }), params({ projectId: DEMO_PROJECT_ID }))).status).toBe(404);
    expect((await getProject(jsonRequest("GET", "/"), params({ projectId: DEMO_PROJECT_ID }))).status).toBe(404);
    expect((await getProject(jsonRequest("GET", "/"), params({ projectId: "not-a-uuid" }))).status).toBe(404);
    await actAs("installer@demo.pierwise.test");
    expect((await patchProject(jsonRequest("PATCH", "/", { name: "Crew rename" }), params({ projectId: DEMO_PROJECT_ID }))).status).toBe(403);
    expect((await getProject(jsonRequest("GET", "/"), params({ projectId: DEMO_PROJECT_ID }))).status).toBe(200);
  });
});
