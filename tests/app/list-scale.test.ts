/**
 * The list behaviours that keep a large organisation's pages cheap (issue 19) still show the right
 * rows: the field list's current-then-superseded order from designs.approved_revision_id, the
 * design count kept by a trigger, the footing columns written with the revision, project search
 * through the criteria card, the jurisdiction sort from the project's copy of its card's
 * jurisdiction, and the audit log's keyset pages.
 */
import crypto from "node:crypto";
import { describe, expect, it } from "vitest";
import { db } from "@/db/client";
import { DEMO_ORG_ID } from "@/db/seeds/01_demo_accounts";
import { auditCursorText, listAuditEvents, parseAuditCursor } from "@/db/queries/audit";
import { listProjects } from "@/db/queries/projects";
import { listDesigns } from "@/db/queries/designs";
import { listRevisions } from "@/db/queries/revisions";
import { approvedSpecs } from "@/db/queries/review-queue";
import { twoPostDesignInput } from "@/engine";
import { addRevision, DESIGNER, ENGINEER, makeDesign, userId } from "../support/review-fixtures";

async function approve(revisionId: string): Promise<void> {
  const engineer = await userId(ENGINEER);
  await db("revisions").where({ id: revisionId }).update({ status: "in_review" });
  const [review] = await db("reviews").insert({ revision_id: revisionId, organisation_id: DEMO_ORG_ID, engineer_id: engineer, submitted_by: await userId(DESIGNER) }).returning("id");
  await db("reviews").where({ id: review.id }).update({ decision: "approve", decided_by: engineer, decided_at: db.fn.now(), engineer_name: "Eli Engineer, P.E.", licence_number: "PE-000000-DEMO", licence_state: "CO",
    verify_code: `list-test-${review.id}`, facts_snapshot: JSON.stringify({ projectName: "x", projectAddress: "", projectState: "CO", criteria: null }) });
  await db("revisions").where({ id: revisionId }).update({ status: "approved" });
}

describe("field list", () => {
  it("lists the newest approval of a design as current and the older approval as superseded, with the footing from columns", async () => {
    const { designId, revisionId: first } = await makeDesign({ name: "Field order probe" });
    await approve(first);
    expect((await db("designs").where({ id: designId }).first("approved_revision_id")).approved_revision_id).toBe(first);
    const second = await addRevision(designId, { ...twoPostDesignInput, posts: { ...twoPostDesignInput.posts, holeDiameterIn: 36 } });
    await approve(second);
    expect((await db("designs").where({ id: designId }).first("approved_revision_id")).approved_revision_id).toBe(second);

    // All of them on one page: other suites' approvals share the database, and a superseded spec
    // comes only after every current one (the list pages 50 at a time).
    const specs = await approvedSpecs(DEMO_ORG_ID, { limit: 100_000 });
    const mine = specs.filter((s) => s.revisionId === first || s.revisionId === second);
    expect(mine.map((s) => [s.revisionId, s.superseded])).toEqual([[second, false], [first, true]]);
    // Every current spec comes before every superseded one.
    expect(specs.findIndex((s) => s.superseded)).toBeGreaterThanOrEqual(specs.filter((s) => !s.superseded).length);
    const stored = await db("revisions").where({ id: second }).first("result");
    const shown = mine[0];
    expect(shown.depthIn).toBe(stored.result.footing.depthIn);
    expect(shown.diameterIn).toBe(stored.result.footing.diameterIn);
    expect(shown.posts).toBe(stored.result.field.posts.length);
    expect(shown.approvedAt).toBeInstanceOf(Date);
  });

  it("never lists another organisation's approvals", async () => {
    const other = await db("organisations").whereNot({ id: DEMO_ORG_ID }).first("id");
    const specs = await approvedSpecs(other.id);
    const demoRevisions = new Set((await db("revisions").where({ organisation_id: DEMO_ORG_ID, status: "approved" }).select("id")).map((r) => r.id));
    expect(specs.filter((s) => demoRevisions.has(s.revisionId))).toEqual([]);
  });
});

describe("project and revision lists", () => {
  it("keeps each project's design count as designs are added and removed", async () => {
    const { projectId } = await makeDesign({ projectName: "Count probe site" });
    const designer = await userId(DESIGNER);
    const count = async () => (await db("projects").where({ id: projectId }).first("design_count")).design_count;
    expect(await count()).toBe(1);
    const [extra] = await db("designs").insert({ project_id: projectId, organisation_id: DEMO_ORG_ID, name: "Second array", created_by: designer }).returning("id");
    expect(await count()).toBe(2);
    const list = await listProjects(DEMO_ORG_ID, { q: "Count probe site" });
    expect(list.rows.map((r) => [r.name, r.designCount])).toEqual([["Count probe site", 2]]);
    await db("designs").where({ id: extra.id }).delete();
    expect(await count()).toBe(1);
  });

  it("finds projects by the jurisdiction of their criteria card and by words of name and address", async () => {
    const [card] = await db("criteria_cards").insert({ organisation_id: DEMO_ORG_ID, jurisdiction: "Quillback Township (test)", state: "CO", values: JSON.stringify({}), created_by: await userId(DESIGNER) }).returning("id");
    await makeDesign({ projectName: "Plain name site", criteriaCardId: card.id });
    expect((await listProjects(DEMO_ORG_ID, { q: "quillback" })).rows.map((r) => r.name)).toEqual(["Plain name site"]);
    expect((await listProjects(DEMO_ORG_ID, { q: "plain NAME" })).rows.map((r) => r.jurisdiction)).toEqual(["Quillback Township (test)"]);
    expect((await listProjects(DEMO_ORG_ID, { q: "1 Test Lane" })).total).toBeGreaterThan(0);
  });

  it("shows footing depth, diameter and pass from the stored columns, sorted by depth", async () => {
    const { designId, projectId } = await makeDesign();
    await addRevision(designId, { ...twoPostDesignInput, posts: { ...twoPostDesignInput.posts, holeDiameterIn: 36 } });
    const stored = await db("revisions").where({ design_id: designId }).orderBy("number").select("number", "result");
    const page = await listRevisions(designId, { sort: "depthIn", dir: "asc" });
    const expected = [...stored].sort((a, b) => a.result.footing.depthIn - b.result.footing.depthIn);
    expect(page.rows.map((r) => [r.number, r.depthIn, r.diameterIn, r.pass])).toEqual(
      expected.map((r) => [r.number, r.result.footing.depthIn, r.result.footing.diameterIn, r.result.footing.pass]));
    const designs = await listDesigns(projectId);
    expect(designs.rows[0].depthIn).toBe(stored[1].result.footing.depthIn);
  });

  it("pages a design's revisions by footing depth in both directions with equal depths in one order, each direction read from an index", async () => {
    // Two hole diameters give two depths, so most revisions tie on depth: the number decides.
    const { designId } = await makeDesign();
    const wide = { ...twoPostDesignInput, posts: { ...twoPostDesignInput.posts, holeDiameterIn: 36 } };
    for (let i = 0; i < 6; i++) await addRevision(designId, i % 2 ? twoPostDesignInput : wide);
    const stored = await db("revisions").where({ design_id: designId }).select("number", "footing_depth_in as depthIn");
    expect(new Set(stored.map((r) => r.depthIn)).size).toBe(2);
    for (const dir of ["asc", "desc"] as const) {
      const sign = dir === "asc" ? 1 : -1;
      const expected = [...stored].sort((a, b) => sign * (a.depthIn - b.depthIn) || sign * (a.number - b.number)).map((r) => r.number);
      const listed: number[] = [];
      for (let page = 1; page <= 5; page++) listed.push(...(await listRevisions(designId, { sort: "depthIn", dir, page, pageSize: 2 })).rows.map((r) => r.number));
      expect(listed).toEqual(expected);

      // The page's statement, explained with sorting switched off: a Sort node left in the plan
      // would mean no index gives this order (the planner sorts anyway when nothing else can).
      const statements: { sql: string; bindings: unknown[] }[] = [];
      const seen = (q: { sql: string; bindings: unknown[] }) => statements.push(q);
      db.on("query", seen);
      try {
        await listRevisions(designId, { sort: "depthIn", dir });
      } finally {
        db.off("query", seen);
      }
      const pageStatement = statements.find((q) => /order by/i.test(q.sql))!;
      const plan = await db.transaction(async (trx) => {
        await trx.raw("SET LOCAL enable_sort = off");
        await trx.raw("SET LOCAL enable_incremental_sort = off");
        await trx.raw("SET LOCAL enable_seqscan = off");
        const rows = (await trx.raw(`EXPLAIN ${pageStatement.sql.replace(/\$\d+/g, "?")}`, pageStatement.bindings as never[])).rows as { "QUERY PLAN": string }[];
        return rows.map((r) => r["QUERY PLAN"]).join("\n");
      });
      expect(plan).toMatch(/revisions_design_depth_(asc|desc)_idx/);
      expect(plan).not.toMatch(/Sort/);
    }
  });

  it("sorts by the card's jurisdiction (a copy kept on the project) in the card's order, cardless last, through renames, moves and deletions", async () => {
    // A fresh organisation, so other suites' projects do not share the list.
    const [org] = await db("organisations").insert({ name: `Jurisdiction sort test ${crypto.randomUUID().slice(0, 6)} (invented)` }).returning("id");
    const card = async (jurisdiction: string) =>
      (await db("criteria_cards").insert({ organisation_id: org.id, jurisdiction, state: "CO", values: JSON.stringify({}) }).returning("id"))[0].id as string;
    const [alder, birch, cedar] = [await card("Alder County"), await card("Birch Township"), await card("Cedar Valley")];
    const cards = [birch, alder, null, cedar, birch, null, alder, cedar];
    for (const [i, c] of cards.entries()) await db("projects").insert({ organisation_id: org.id, name: `Sort site ${i}`, address: "", state: "CO", criteria_card_id: c });
    // The reference reads each card's jurisdiction itself, not the copy.
    const reference = async (dir: "asc" | "desc") => {
      const rows = await db("projects as p").leftJoin("criteria_cards as c", "c.id", "p.criteria_card_id").where("p.organisation_id", org.id).select("p.id", "c.jurisdiction");
      const byId = (a: string, b: string) => (a < b ? -1 : a > b ? 1 : 0);
      return rows.sort((a, b) => (a.jurisdiction === null) !== (b.jurisdiction === null) ? (a.jurisdiction === null ? 1 : -1)
        : (dir === "asc" ? 1 : -1) * (byId(a.jurisdiction ?? "", b.jurisdiction ?? "") || byId(a.id, b.id))).map((r) => [r.id, r.jurisdiction]);
    };
    const listed = async (dir: "asc" | "desc") => {
      const rows: [string, string | null][] = [];
      for (let page = 1; page <= 10; page++) {
        const got = await listProjects(org.id, { sort: "jurisdiction", dir, page, pageSize: 2 });
        expect(got.total).toBe(cards.length);
        rows.push(...got.rows.map((r) => [r.id, r.jurisdiction] as [string, string | null]));
        if (got.rows.length < 2) break;
      }
      return rows;
    };
    const same = async () => {
      for (const dir of ["asc", "desc"] as const) expect(await listed(dir)).toEqual(await reference(dir));
    };
    await same();
    await db("criteria_cards").where({ id: birch }).update({ jurisdiction: "Aspen Borough" });
    await same();
    const moved = (await db("projects").where({ organisation_id: org.id, criteria_card_id: null }).first("id")).id;
    await db("projects").where({ id: moved }).update({ criteria_card_id: alder });
    await db("criteria_cards").where({ id: cedar }).delete();
    await same();
    // A value written to the copy does not stick: it is the card's.
    await db("projects").where({ id: moved }).update({ criteria_jurisdiction: "Zebra County" });
    expect((await db("projects").where({ id: moved }).first("criteria_jurisdiction")).criteria_jurisdiction).toBe("Alder County");
    await same();
  });

  it("finds projects by a card's jurisdiction and by their own words in one search", async () => {
    const [card] = await db("criteria_cards").insert({ organisation_id: DEMO_ORG_ID, jurisdiction: "Yarrowfield County (test)", state: "CO", values: JSON.stringify({}), created_by: await userId(DESIGNER) }).returning("id");
    await makeDesign({ projectName: "Card-only site", criteriaCardId: card.id });
    await makeDesign({ projectName: "Yarrowfield ranch site" });
    const found = await listProjects(DEMO_ORG_ID, { q: "yarrowfield", sort: "name", dir: "asc" });
    expect([found.rows.map((r) => r.name), found.total]).toEqual([["Card-only site", "Yarrowfield ranch site"], 2]);
    expect((await listProjects(DEMO_ORG_ID, { q: "yarrowfield county" })).rows.map((r) => r.name)).toEqual(["Card-only site"]);
  });
});

describe("audit log keyset pages", () => {
  it("walks older and newer from any page and reaches the oldest page directly", async () => {
    const [org] = await db("organisations").insert({ name: "Keyset Paging Co" }).returning("id");
    // Two events share each second, so the id must break ties in the order.
    await db("audit_events").insert(Array.from({ length: 23 }, (_, i) => ({ organisation_id: org.id, action: "sign-in", subject: `e${i}`, at: new Date(Date.UTC(2026, 0, 1, 0, 0, Math.floor(i / 2), 0)) })));
    const seen: string[] = [];
    let page = await listAuditEvents(org.id, { limit: 5 });
    expect(page.hasNewer).toBe(false);
    seen.push(...page.rows.map((r) => r.subject!));
    while (page.hasOlder) {
      page = await listAuditEvents(org.id, { limit: 5, older: parseAuditCursor(auditCursorText(page.rows.at(-1)!.cursor)) });
      seen.push(...page.rows.map((r) => r.subject!));
    }
    expect(seen).toEqual(Array.from({ length: 23 }, (_, i) => `e${22 - i}`));
    const oldest = await listAuditEvents(org.id, { limit: 5, oldest: true });
    expect(oldest.rows.map((r) => r.subject)).toEqual(["e4", "e3", "e2", "e1", "e0"]);
    expect([oldest.hasOlder, oldest.hasNewer]).toEqual([false, true]);
    const newer = await listAuditEvents(org.id, { limit: 5, newer: oldest.rows[0].cursor });
    expect(newer.rows.map((r) => r.subject)).toEqual(["e9", "e8", "e7", "e6", "e5"]);
    expect(newer.total).toBe(23);
    expect(newer.totalCapped).toBe(false);
  });

  it("ignores a malformed or oversized cursor instead of failing", async () => {
    for (const text of ["", "abc", "1.2.3", "99999999999999999999.1", "1;drop", undefined]) expect(parseAuditCursor(text)).toBeUndefined();
    expect(parseAuditCursor("1733100000000000.42")).toEqual({ atMicros: "1733100000000000", id: "42" });
  });
});
