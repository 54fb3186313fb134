/**
 * A design's revision list reads about a page whatever the design's history (issue 19): its total
 * without a search is `designs.revision_count`, kept by triggers (migration 20261206100000), and a
 * search's count stops at a cap ("1–20 of 1,000+"), as the projects search does. Checked here: the
 * kept count follows saves, bulk inserts and deletes and cannot be forged; the listing's total is
 * the real count; the default listing's count reads the design row, not the revisions; a capped
 * search says so in the API and on the design page.
 */
import { renderToStaticMarkup } from "react-dom/server";
import { afterAll, describe, expect, it, vi } from "vitest";
import DesignPage from "@/app/(workspace)/projects/[projectId]/designs/[designId]/page";
import { GET as getDesign } from "@/app/api/designs/[designId]/route";
import { db } from "@/db/client";
import { createRevision, listRevisions, REVISION_COUNT_CAP } from "@/db/queries/revisions";
import { DEMO_ORG_ID } from "@/db/seeds/01_demo_accounts";
import { sizeDesign, twoPostDesignInput } from "@/engine";
import { actAs, jsonRequest, outcomeOf, params } from "../support/next-context";
import { ownerDb } from "../support/owner-db";
import { DESIGNER, makeDesign, userId } from "../support/review-fixtures";

// The editor's client hooks need the app router, which a server render has not mounted.
vi.mock("next/navigation", async (original) => ({
  ...(await original<typeof import("next/navigation")>()),
  useRouter: () => ({ push() {}, replace() {}, refresh() {}, prefetch() {}, back() {}, forward() {} }),
  usePathname: () => "/projects",
  useSearchParams: () => new URLSearchParams(),
}));

afterAll(() => ownerDb.destroy());

const kept = async (designId: string) => (await db("designs").where({ id: designId }).first("revision_count")).revision_count as number;
const real = async (designId: string) => Number((await db("revisions").where({ design_id: designId }).count({ n: "*" }))[0].n);

/** A save as the app makes it: the design locked, the base checked, the next number inserted. */
async function save(designId: string, baseRevisionId: string, note: string): Promise<string> {
  const result = sizeDesign({ ...twoPostDesignInput, site: { ...twoPostDesignInput.site, windSpeedMph: 120 } });
  const saved = await createRevision({
    designId, organisationId: DEMO_ORG_ID, baseRevisionId, input: result.input, result, engineVersion: result.engineVersion, note, authorId: await userId(DESIGNER),
  });
  return saved.id;
}

/** `count` copies of the design's revision `from` in one statement, numbered after it, each with note `<prefix> <i>`. */
async function bulkRevisions(from: string, count: number, prefix: string): Promise<void> {
  await db.raw(`INSERT INTO revisions (design_id, organisation_id, number, input, result, engine_version, content_hash, note, author_id)
    SELECT r.design_id, r.organisation_id, r.number + g, r.input, r.result, r.engine_version, r.content_hash, ? || ' ' || g, r.author_id
    FROM revisions r CROSS JOIN generate_series(1, ?::int) g WHERE r.id = ?`, [prefix, count, from]);
}

describe("a design's kept revision count", () => {
  it("follows saves, a bulk insert and deletes, is worked out again when forged, and is the listing's total", async () => {
    const { designId, revisionId } = await makeDesign();
    expect(await kept(designId)).toBe(1);
    const second = await save(designId, revisionId, "Second save");
    const third = await save(designId, second, "Third save");
    expect([await kept(designId), await real(designId)]).toEqual([3, 3]);
    expect((await listRevisions(designId)).total).toBe(3);

    // One statement inserting into two designs counts both.
    const other = await makeDesign();
    await db.raw(`INSERT INTO revisions (design_id, organisation_id, number, input, result, engine_version, content_hash, note, author_id)
      SELECT r.design_id, r.organisation_id, r.number + g, r.input, r.result, r.engine_version, r.content_hash, 'Copied', r.author_id
      FROM revisions r CROSS JOIN generate_series(1, 2) g WHERE r.id IN (?, ?)`, [third, other.revisionId]);
    expect([await kept(designId), await kept(other.designId)]).toEqual([5, 3]);

    // Forged, by the app's role and by the owner (with another column): the real count again.
    await db("designs").where({ id: designId }).update({ revision_count: 9000 });
    expect(await kept(designId)).toBe(5);
    await ownerDb("designs").where({ id: designId }).update({ revision_count: 0, name: "Renamed by owner" });
    expect(await kept(designId)).toBe(5);
    expect((await listRevisions(designId)).total).toBe(await real(designId));

    // Deleting drafts (the app never does; a cascade or the owner might) counts again.
    await db("revisions").where({ design_id: designId }).where("number", ">", 3).delete();
    expect([await kept(designId), (await listRevisions(designId)).total]).toEqual([3, 3]);
    // An edit that leaves the count alone keeps it, and the count stays right.
    await db("designs").where({ id: designId }).update({ name: "Renamed again" });
    expect(await kept(designId)).toBe(3);
    // Past the end the kept count still answers.
    expect(await listRevisions(designId, { page: 9, pageSize: 2 })).toMatchObject({ rows: [], total: 3 });
    expect((await listRevisions(designId)).capped).toBeUndefined();
  });

  it("reads the default listing's total from the design row: the revisions are read only for the page", async () => {
    const { designId, revisionId } = await makeDesign();
    await save(designId, revisionId, "Another save");
    const statements: { sql: string; bindings: unknown[] }[] = [];
    const seen = (q: { sql: string; bindings: unknown[] }) => statements.push({ sql: q.sql, bindings: q.bindings });
    db.on("query", seen);
    let listed;
    try {
      listed = await listRevisions(designId, { pageSize: 1 });
    } finally {
      db.off("query", seen);
    }
    expect([listed.total, listed.rows.length]).toEqual([2, 1]);
    expect(statements).toHaveLength(2);
    // Only the page's statement names the revisions, and it stops at the page.
    const readingRevisions = statements.filter((s) => /"revisions"/.test(s.sql));
    expect(readingRevisions.map((s) => /\blimit\b/i.test(s.sql))).toEqual([true]);
    expect(statements.some((s) => /count\(/i.test(s.sql))).toBe(false);
    // The count's plan reads the designs table alone (one row by its key).
    const count = statements.find((s) => !/"revisions"/.test(s.sql))!;
    const plan = (await db.raw(`EXPLAIN ${count.sql.replace(/\$\d+/g, "?")}`, count.bindings as never[])).rows.map((r: { "QUERY PLAN": string }) => r["QUERY PLAN"]).join("\n");
    expect(plan).toMatch(/on designs/);
    expect(plan).not.toMatch(/revisions/);
  });

  it("counts a search's matches only up to the cap (or a page past the current one) and says it is capped", async () => {
    const { designId, revisionId } = await makeDesign();
    await bulkRevisions(revisionId, 7, "Wren note");
    // Cap 2, pages of 2: page 1 counts up to 4 (one page past it) and more are there.
    const first = await listRevisions(designId, { q: "wren", sort: "number", dir: "asc", pageSize: 2 }, 2);
    expect(first).toMatchObject({ total: 4, capped: true });
    expect(first.rows.map((r) => r.number)).toEqual([2, 3]);
    // Page 3 counts up to 8: all 7 are counted, exactly.
    const third = await listRevisions(designId, { q: "wren", sort: "number", dir: "asc", page: 3, pageSize: 2 }, 2);
    expect([third.total, third.capped, third.rows.map((r) => r.number)]).toEqual([7, undefined, [6, 7]]);
    // Past the end the count is still taken, to that page's cap.
    expect(await listRevisions(designId, { q: "wren", page: 9, pageSize: 2 }, 2)).toMatchObject({ rows: [], total: 7 });
    // Under the cap the count is exact and not marked; without a search it is the kept count whatever the cap.
    const exact = await listRevisions(designId, { q: "wren", pageSize: 2 });
    expect([exact.total, exact.capped]).toEqual([7, undefined]);
    const all = await listRevisions(designId, { pageSize: 2 }, 2);
    expect([all.total, all.capped]).toEqual([8, undefined]);
  });

  it("says 1,000+ past the real cap: `capped` in GET /api/designs/:id and on the design page's table", async () => {
    const { projectId, designId, revisionId } = await makeDesign();
    await bulkRevisions(revisionId, REVISION_COUNT_CAP + 1, "Heron note");
    expect(await kept(designId)).toBe(REVISION_COUNT_CAP + 2);
    await actAs(DESIGNER);
    const searched = await (await getDesign(jsonRequest("GET", "/?q=heron"), params({ designId }))).json();
    expect(searched.revisions).toMatchObject({ total: REVISION_COUNT_CAP, capped: true, page: 1, pageSize: 20, q: "heron" });
    expect(searched.revisions.rows).toHaveLength(20);
    const plain = await (await getDesign(jsonRequest("GET", "/"), params({ designId }))).json();
    expect(Object.keys(plain.revisions).sort()).toEqual(["dir", "page", "pageSize", "q", "rows", "sort", "total"]);
    expect(plain.revisions.total).toBe(REVISION_COUNT_CAP + 2);

    const page = await outcomeOf(() => DesignPage({ params: Promise.resolve({ projectId, designId }), searchParams: Promise.resolve({ r_q: "heron" }) }));
    expect(page.kind).toBe("value");
    const html = renderToStaticMarkup((page as { value: React.ReactElement }).value);
    expect(html).toContain("1–20 of 1,000+");
    expect(html).toContain("Page 1 of 50+");
    const unsearched = await outcomeOf(() => DesignPage({ params: Promise.resolve({ projectId, designId }), searchParams: Promise.resolve({}) }));
    expect(renderToStaticMarkup((unsearched as { value: React.ReactElement }).value)).toContain("1–20 of 1,002");
  });
});
