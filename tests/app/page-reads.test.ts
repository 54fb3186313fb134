/**
 * The lists that now read only their page (issue 19, second pass) still show the right rows: the
 * field list's keyset pages, the projects list picked by index and counted in the same statement,
 * the reviews page's shortened lists with their totals, and the engineer's queue sorted by a name.
 * Paging is checked by walking every page: nothing repeats, nothing is skipped.
 */
import { describe, expect, it } from "vitest";
import { db } from "@/db/client";
import { DEMO_ORG_ID } from "@/db/seeds/01_demo_accounts";
import { engineerQueue, queueContractors } from "@/db/queries/engineer-queue";
import { countOpenHolds, openHoldsOfOrganisation } from "@/db/queries/holds";
import { listProjects } from "@/db/queries/projects";
import { approvedSpecs, countWaitingFor, fieldCursorText, parseFieldCursor, waitingFor } from "@/db/queries/review-queue";
import { DESIGNER, ENGINEER, freshApproved, freshInReview, userId } from "../support/review-fixtures";

describe("field list pages", () => {
  it("walks every current spec by the older-cursor, newest approval first, without repeats", async () => {
    for (let i = 0; i < 3; i++) await freshApproved();
    const all = await approvedSpecs(DEMO_ORG_ID, { limit: 1000 });
    const current = all.filter((s) => !s.superseded);
    expect(current.length).toBeGreaterThanOrEqual(3);
    const walked: string[] = [];
    let page = await approvedSpecs(DEMO_ORG_ID, { limit: 2 });
    for (;;) {
      walked.push(...page.filter((s) => !s.superseded).map((s) => s.revisionId));
      if (!page.more) break;
      const last = page.at(-1)!;
      // The cursor goes through the URL text and back.
      const older = parseFieldCursor(fieldCursorText({ approvedAt: last.approvedAt!, designId: last.designId }));
      page = await approvedSpecs(DEMO_ORG_ID, { limit: 2, older });
    }
    expect(walked).toEqual(current.map((s) => s.revisionId));
  });

  it("treats a malformed cursor as the first page", () => {
    for (const text of [undefined, "", "x_y", "2026-13-45T00:00:00Z_0f5e1c2a-0000-4000-8000-000000000001", "2026-01-01T00:00:00Z_not-a-uuid"]) {
      expect(parseFieldCursor(text)).toBeUndefined();
    }
    expect(parseFieldCursor("2026-01-01T00:00:00.000Z_0F5E1C2A-0000-4000-8000-000000000001")).toEqual({
      approvedAt: new Date("2026-01-01T00:00:00.000Z"), designId: "0f5e1c2a-0000-4000-8000-000000000001",
    });
  });
});

describe("projects list pages", () => {
  it("pages every sort without repeating or skipping a project, with the total on every page and past the end", async () => {
    const [org] = await db("organisations").insert({ name: "Page Walk Co (test)" }).returning("id");
    const designer = await userId(DESIGNER);
    // Same state everywhere and two equal names: the tie-breaks decide the order.
    const names = ["Delta site", "Alpha site", "Echo site", "Alpha site", "Bravo site", "Foxtrot site", "Charlie site"];
    await db("projects").insert(names.map((name, i) => ({ organisation_id: org.id, name, address: `${i} Walk Road (invented)`, state: "CO", created_by: designer })));
    for (const sort of ["name", "state", "updatedAt", "designCount", "jurisdiction"]) {
      for (const dir of ["asc", "desc"] as const) {
        const seen: string[] = [];
        for (let page = 1; page <= 3; page++) {
          const result = await listProjects(org.id, { sort, dir, page, pageSize: 3 });
          expect(result.total).toBe(7);
          seen.push(...result.rows.map((r) => r.id));
        }
        expect(new Set(seen).size, `${sort} ${dir}`).toBe(7);
      }
    }
    const byName = await listProjects(org.id, { sort: "name", dir: "asc", pageSize: 100 });
    expect(byName.rows.map((r) => r.name)).toEqual([...names].sort());
    const past = await listProjects(org.id, { page: 9, pageSize: 3 });
    expect([past.rows, past.total]).toEqual([[], 7]);
  });

  it("counts what the search matches in the same statement as the page", async () => {
    const [org] = await db("organisations").insert({ name: "Search Count Co (test)" }).returning("id");
    const designer = await userId(DESIGNER);
    await db("projects").insert(Array.from({ length: 5 }, (_, i) => ({ organisation_id: org.id, name: i < 3 ? `Heron site ${i}` : `Plover site ${i}`, address: "", state: "CO", created_by: designer })));
    const found = await listProjects(org.id, { q: "heron", pageSize: 2 });
    expect(found.total).toBe(3);
    expect(found.rows.map((r) => r.name)).toHaveLength(2);
    expect((await listProjects(org.id, { q: "heron", page: 2, pageSize: 2 })).rows).toHaveLength(1);
  });
});

describe("projects list counts that do not grow with the organisation", () => {
  const projectCount = async (id: string) => (await db("organisations").where({ id }).first("project_count")).project_count as number;

  it("counts the organisation's projects from its kept count, right after inserts, deletes and moves", async () => {
    const [a, b] = await db("organisations").insert([{ name: "Kept Count A (test)" }, { name: "Kept Count B (test)" }]).returning("id");
    const designer = await userId(DESIGNER);
    const site = (org: string, i: number) => ({ organisation_id: org, name: `Count site ${i}`, address: "", state: "CO", created_by: designer });
    // One statement inserting into two organisations counts both.
    const ids = (await db("projects").insert([site(a.id, 0), site(a.id, 1), site(a.id, 2), site(b.id, 3)]).returning("id")).map((r) => r.id as string);
    expect([await projectCount(a.id), await projectCount(b.id)]).toEqual([3, 1]);
    expect((await listProjects(a.id, {})).total).toBe(3);
    await db("projects").where({ id: ids[0] }).update({ organisation_id: b.id });
    expect([(await listProjects(a.id, {})).total, (await listProjects(b.id, {})).total]).toEqual([2, 2]);
    await db("projects").whereIn("id", [ids[1], ids[3]]).delete();
    expect([(await listProjects(a.id, {})).total, (await listProjects(b.id, {})).total]).toEqual([1, 1]);
    // An edit that leaves the organisation alone does not recount, and the count stays right.
    await db("projects").where({ id: ids[2] }).update({ name: "Count site renamed" });
    expect(await projectCount(a.id)).toBe(1);
    // Past the end the kept count still answers.
    expect(await listProjects(a.id, { page: 5, pageSize: 1 })).toMatchObject({ rows: [], total: 1 });
    expect((await listProjects(a.id, {})).capped).toBeUndefined();
  });

  it("counts a search's matches only up to the cap (or a page past the current one) and says it is capped", async () => {
    const [org] = await db("organisations").insert({ name: "Capped Search Co (test)" }).returning("id");
    const designer = await userId(DESIGNER);
    await db("projects").insert(Array.from({ length: 7 }, (_, i) => ({ organisation_id: org.id, name: `Wren site ${i}`, address: "", state: "CO", created_by: designer })));
    // Cap 2, pages of 2: page 1 counts up to 4 (one page past it) and more are there.
    const first = await listProjects(org.id, { q: "wren", sort: "name", dir: "asc", pageSize: 2 }, undefined, 2);
    expect(first).toMatchObject({ total: 4, capped: true });
    expect(first.rows.map((r) => r.name)).toEqual(["Wren site 0", "Wren site 1"]);
    // Page 3 counts up to 8: all 7 are counted, exactly.
    const third = await listProjects(org.id, { q: "wren", sort: "name", dir: "asc", page: 3, pageSize: 2 }, undefined, 2);
    expect([third.total, third.capped, third.rows.map((r) => r.name)]).toEqual([7, undefined, ["Wren site 4", "Wren site 5"]]);
    // Past the end: counted on its own to that page's cap.
    expect(await listProjects(org.id, { q: "wren", page: 9, pageSize: 2 }, undefined, 2)).toMatchObject({ rows: [], total: 7 });
    // Under the cap the count is exact and not marked; without a search it is exact whatever the cap.
    expect(await listProjects(org.id, { q: "wren", pageSize: 2 })).toMatchObject({ total: 7 });
    expect((await listProjects(org.id, { q: "wren", pageSize: 2 })).capped).toBeUndefined();
    expect((await listProjects(org.id, { pageSize: 2 }, undefined, 2)).total).toBe(7);
    expect((await listProjects(org.id, { pageSize: 2 }, undefined, 2)).capped).toBeUndefined();
  });
});

describe("reviews page lists", () => {
  it("shows at most a page of waiting reviews and counts them all", async () => {
    await freshInReview();
    await freshInReview();
    const engineer = await userId(ENGINEER);
    const everything = await waitingFor(DEMO_ORG_ID, engineer, 1000);
    expect(await countWaitingFor(DEMO_ORG_ID, engineer)).toBe(everything.length);
    expect(await waitingFor(DEMO_ORG_ID, engineer, 1)).toEqual(everything.slice(0, 1));
  });

  it("lists the oldest open holds and counts every open hold", async () => {
    const holds = await openHoldsOfOrganisation(DEMO_ORG_ID, 1000);
    expect(await countOpenHolds(DEMO_ORG_ID)).toBe(holds.length);
    expect(holds.every((h) => h.clearedAt === null)).toBe(true);
  });
});

describe("engineer's queue", () => {
  it("sorts by project name over the whole queue and pages it with the same total", async () => {
    await freshInReview();
    const me = { userId: await userId(ENGINEER), organisationId: DEMO_ORG_ID };
    const all = await engineerQueue(me, { sort: "projectName", dir: "asc", pageSize: 100 });
    const names = all.rows.map((r) => r.projectName);
    expect(names).toEqual([...names].sort((a, b) => (a < b ? -1 : a > b ? 1 : 0)));
    const first = await engineerQueue(me, { sort: "projectName", dir: "asc", pageSize: 2 });
    const second = await engineerQueue(me, { sort: "projectName", dir: "asc", pageSize: 2, page: 2 });
    expect([...first.rows, ...second.rows].map((r) => r.reviewId)).toEqual(all.rows.slice(0, 4).map((r) => r.reviewId));
    expect(first.total).toBe(all.total);
    expect((await engineerQueue(me, { page: 999 })).total).toBe(all.total);
    expect(await queueContractors(me)).toContainEqual({ id: DEMO_ORG_ID, name: expect.any(String) });
  });
});
