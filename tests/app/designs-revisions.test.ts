/**
 * Designs and revisions through the API: a new design starts from the criteria card; every save is
 * a new immutable revision; a stale base is refused with 409; bad input is a 422 naming the field;
 * other organisations get 404 and installers 403 on writes. Also the diff between revisions.
 */
import { afterAll, describe, expect, it } from "vitest";
import { POST as calc } from "@/app/api/calc/route";
import { GET as getDesign } from "@/app/api/designs/[designId]/route";
import { POST as saveRevision } from "@/app/api/designs/[designId]/revisions/route";
import { GET as listDesigns, POST as createDesign } from "@/app/api/projects/[projectId]/designs/route";
import { GET as getRevision } from "@/app/api/revisions/[revisionId]/route";
import { inputChanges, resultChanges } from "@/components/design/revision-diff";
import { db } from "@/db/client";
import { createDesignWithRevision } from "@/db/queries/designs";
import { contentHash, listRevisions } from "@/db/queries/revisions";
import { DEMO_ORG_ID } from "@/db/seeds/01_demo_accounts";
import { DEMO_PROJECT_ID, OTHER_PROJECT_ID } from "@/db/seeds/02_demo_projects";
import { defaultDesignInput, ENGINE_VERSION, sizeDesign, type DesignInput, type DesignResult } from "@/engine";
import { actAs, jsonRequest, params } from "../support/next-context";

const DESIGNER = "designer@demo.pierwise.test";
const createdDesigns: string[] = [];
afterAll(async () => {
  await db("designs").whereIn("id", createdDesigns).delete();
});

async function newDesign(name = "Test design") {
  await actAs(DESIGNER);
  const response = await createDesign(jsonRequest("POST", "/", { name }), params({ projectId: DEMO_PROJECT_ID }));
  const json = await response.json();
  expect(response.status, JSON.stringify(json)).toBe(201);
  createdDesigns.push(json.design.id);
  return { designId: json.design.id as string, revisionId: json.revisionId as string };
}

const save = (designId: string, body: unknown) => saveRevision(jsonRequest("POST", "/", body), params({ designId }));
const readRevision = async (revisionId: string) => (await (await getRevision(jsonRequest("GET", "/"), params({ revisionId }))).json()).revision as { id: string; number: number; input: DesignInput; result: DesignResult; contentHash: string; engineVersion: string; note: string; status: string; createdAt: string };
const withWind = (input: DesignInput, windSpeedMph: number): DesignInput => ({ ...input, site: { ...input.site, windSpeedMph } });

describe("POST /api/projects/:id/designs", () => {
  it("starts from the project's criteria card and stores the engine's result as revision 1", async () => {
    const { designId, revisionId } = await newDesign();
    const rev = await readRevision(revisionId);
    expect(rev.number).toBe(1);
    // The demo card (db/seeds/02_demo_projects.ts, invented county): 115 mph, 30 psf ground snow, 36 in frost, soil class 4.
    expect(rev.input.site).toMatchObject({ windSpeedMph: 115, groundSnowPsf: 30, frostDepthIn: 36, soil: { method: "class", soilClass: 4 } });
    expect(rev.result.footing.depthIn).toBe(sizeDesign(rev.input).footing.depthIn);
    expect(rev.engineVersion).toBe(ENGINE_VERSION);
    expect(rev.contentHash).toBe(contentHash(rev.input, rev.result, rev.engineVersion));
    const list = await (await listDesigns(jsonRequest("GET", "/?q=Test%20design"), params({ projectId: DEMO_PROJECT_ID }))).json();
    expect(list.rows.find((r: { id: string }) => r.id === designId)).toMatchObject({ latestNumber: 1, status: "draft" });
  });

  it("names bad fields of a given input under `input.` (422)", async () => {
    await actAs(DESIGNER);
    // 85–200 mph is the product's allowed range for basic wind speed (engine/schema.ts).
    const bad = { name: "Bad", input: { ...defaultDesignInput, site: { ...defaultDesignInput.site, windSpeedMph: 300 } } };
    const response = await createDesign(jsonRequest("POST", "/", bad), params({ projectId: DEMO_PROJECT_ID }));
    expect(response.status).toBe(422);
    expect((await response.json()).errors).toEqual([{ path: "input.site.windSpeedMph", message: "Wind speed must be between 85 and 200 mph" }]);
  });

  it("hides other organisations' projects (404) and refuses installers (403)", async () => {
    await actAs(DESIGNER);
    expect((await createDesign(jsonRequest("POST", "/", { name: "x" }), params({ projectId: OTHER_PROJECT_ID }))).status).toBe(404);
    expect((await listDesigns(jsonRequest("GET", "/"), params({ projectId: OTHER_PROJECT_ID }))).status).toBe(404);
    await actAs("installer@demo.pierwise.test");
    expect((await createDesign(jsonRequest("POST", "/", { name: "x" }), params({ projectId: DEMO_PROJECT_ID }))).status).toBe(403);
  });

  it("leaves no design behind when its first revision cannot be written (one transaction)", async () => {
    const input = (await readRevision((await newDesign("Probe")).revisionId)).input;
    const before = await db("designs").count<{ count: string }[]>({ count: "*" });
    await expect(createDesignWithRevision({
      projectId: DEMO_PROJECT_ID, organisationId: DEMO_ORG_ID, name: "Half-written", input, result: sizeDesign(input),
      engineVersion: ENGINE_VERSION, note: "", authorId: "00000000-0000-4000-8000-00000000dead", // no such user: the revision insert fails
    })).rejects.toThrow();
    const after = await db("designs").count<{ count: string }[]>({ count: "*" });
    expect(after[0].count).toBe(before[0].count);
    expect(await db("designs").where({ name: "Half-written" }).first()).toBeUndefined();
  });
});

describe("POST /api/designs/:id/revisions", () => {
  it("saves a new revision from the latest and leaves the earlier one exactly as it was", async () => {
    const { designId, revisionId } = await newDesign();
    const first = await readRevision(revisionId);
    const statements: string[] = [];
    const spy = (q: { sql: string }) => statements.push(q.sql.toLowerCase());
    db.on("query", spy);
    const response = await save(designId, { baseRevisionId: revisionId, input: withWind(first.input, 130), note: "County says 130 mph on the ridge" });
    db.off("query", spy);
    expect(response.status).toBe(201);
    const second = (await response.json()).revision;
    expect(second).toMatchObject({ number: 2, note: "County says 130 mph on the ridge", status: "draft" });
    expect(second.input.site.windSpeedMph).toBe(130);
    // More wind never gives a shallower footing (engine property tests, tests/engine/properties.test.ts).
    expect(second.result.footing.depthIn).toBeGreaterThanOrEqual(first.result.footing.depthIn);
    expect(await readRevision(revisionId)).toEqual(first);
    // Saving only ever inserts revisions: no UPDATE or DELETE reaches the revisions table from the app.
    expect(statements.filter((s) => /^(update|delete from) "revisions"/.test(s))).toEqual([]);
    expect(statements.some((s) => s.startsWith('insert into "revisions"'))).toBe(true);
  });

  it("refuses a stale base with 409 naming the latest revision; nothing is written", async () => {
    const { designId, revisionId } = await newDesign();
    const input = (await readRevision(revisionId)).input;
    const ok = await save(designId, { baseRevisionId: revisionId, input: withWind(input, 120) });
    const latestId = (await ok.json()).revision.id;
    const stale = await save(designId, { baseRevisionId: revisionId, input: withWind(input, 140) });
    expect(stale.status).toBe(409);
    const body = await stale.json();
    expect(body).toMatchObject({ latestRevisionId: latestId, latestNumber: 2 });
    expect(body.errors[0].message).toMatch(/revision 2 since you opened it\. Reload/);
    expect((await listRevisions(designId)).total).toBe(2);
  });

  it("lets exactly one of two simultaneous saves from the same base win", async () => {
    const { designId, revisionId } = await newDesign();
    const input = (await readRevision(revisionId)).input;
    const [a, b] = await Promise.all([save(designId, { baseRevisionId: revisionId, input: withWind(input, 121) }), save(designId, { baseRevisionId: revisionId, input: withWind(input, 122) })]);
    expect([a.status, b.status].sort()).toEqual([201, 409]);
    expect((await listRevisions(designId)).total).toBe(2);
  });

  it("answers 422 with field paths for bad input and a missing base", async () => {
    const { designId, revisionId } = await newDesign();
    const input = (await readRevision(revisionId)).input;
    const response = await save(designId, { input: { ...input, array: { ...input.array, tiltDeg: 75, rows: 2.5 } } });
    expect(response.status).toBe(422);
    const paths = (await response.json()).errors.map((e: { path: string }) => e.path);
    // Tilt 0–60° and whole rows 1–8 are the product's ranges (engine/schema.ts).
    expect(paths).toEqual(expect.arrayContaining(["baseRevisionId", "input.array.tiltDeg", "input.array.rows"]));
    const notJson = await save(designId, "{oops");
    expect(notJson.status).toBe(422);
  });

  it("hides other organisations' designs and revisions (404); installers read but cannot save (403)", async () => {
    const { designId, revisionId } = await newDesign();
    const input = (await readRevision(revisionId)).input;
    await actAs("designer@other.pierwise.test");
    expect((await getDesign(jsonRequest("GET", "/"), params({ designId }))).status).toBe(404);
    expect((await getRevision(jsonRequest("GET", "/"), params({ revisionId }))).status).toBe(404);
    expect((await save(designId, { baseRevisionId: revisionId, input })).status).toBe(404);
    await actAs("installer@demo.pierwise.test");
    const read = await getDesign(jsonRequest("GET", "/"), params({ designId }));
    expect(read.status).toBe(200);
    expect((await read.json()).latestRevision.id).toBe(revisionId);
    expect((await save(designId, { baseRevisionId: revisionId, input })).status).toBe(403);
    await actAs(null);
    expect((await save(designId, { baseRevisionId: revisionId, input })).status).toBe(401);
  });
});

describe("POST /api/calc", () => {
  it("answers the engine's result for a valid input and 422 naming fields otherwise", async () => {
    await actAs("installer@demo.pierwise.test");
    const ok = await calc(jsonRequest("POST", "/api/calc", defaultDesignInput), {});
    expect(ok.status).toBe(200);
    expect((await ok.json()).result.footing.depthIn).toBe(sizeDesign(defaultDesignInput).footing.depthIn);
    const bad = await calc(jsonRequest("POST", "/api/calc", { ...defaultDesignInput, posts: { ...defaultDesignInput.posts, pipeSize: "7" } }), {});
    expect(bad.status).toBe(422);
    expect((await bad.json()).errors[0]).toMatchObject({ path: "posts.pipeSize", message: expect.stringMatching(/Pipe size must be one of/) });
    await actAs(null);
    expect((await calc(jsonRequest("POST", "/api/calc", defaultDesignInput), {})).status).toBe(401);
  });
});

describe("the demo history and the diff", () => {
  it("the 12-module two-post demo design has three revisions whose diff names the edits", async () => {
    const design = await db("designs").where({ project_id: DEMO_PROJECT_ID, name: "12-module array on two posts" }).first("id");
    const revs = await db("revisions").where({ design_id: design.id }).orderBy("number").select("input", "result", "number", "note");
    expect(revs.map((r) => r.number)).toEqual([1, 2, 3]);
    expect(revs[0].input.posts.count).toBe(2);
    expect(revs[0].input.array.rows * revs[0].input.array.columns).toBe(12);
    const edits12 = inputChanges(revs[0].input, revs[1].input);
    expect(edits12.map((c) => [c.label, c.from, c.to])).toEqual([["Tilt", 30, 25], ["Lowest edge clearance", 24, 30]]);
    const edits23 = inputChanges(revs[1].input, revs[2].input);
    expect(edits23).toEqual([{ path: "posts.holeDiameterIn", label: "Hole diameter", unit: "in", from: 30, to: 36 }]);
    const results = resultChanges(revs[1].result, revs[2].result);
    const diameter = results.changed.find((r) => r.path === "footing.diameterIn");
    expect(diameter).toMatchObject({ from: 30, to: 36 });
    // The depth in inches, as every screen shows it (components/format: formatFootingSize).
    const depth = [...results.changed, ...results.unchanged].find((r) => r.path === "footing.depthIn")!;
    expect(depth).toMatchObject({ from: revs[1].result.footing.depthIn, to: revs[2].result.footing.depthIn });
  });

  it("the diff of a revision with itself is empty", async () => {
    const rev = await db("revisions").first("input", "result");
    expect(inputChanges(rev.input, rev.input)).toEqual([]);
    expect(resultChanges(rev.result, rev.result).changed).toEqual([]);
  });
});
