/**
 * Issue 19, eighth pass: the reviews page's lists are one prepared statement with a generic plan
 * (planned once per pooled connection, not per request), whose text does not change with the
 * person, so one plan serves every engineer; the limits are written in (a bound LIMIT is taken
 * for a tenth of the rows by a generic plan). The generic plan
 * knows no engineer, so the planner is told that an engineer or a submitter belongs to one
 * organisation (dependency statistics, 20261206000000); without them it took the organisation and
 * the engineer for independent, expected 9 open reviews, and sorted the engineer's whole backlog
 * instead of reading its first page in order (db/README.md, eighth pass).
 */
import { describe, expect, it, vi } from "vitest";
import { db } from "@/db/client";
import { DEMO_ORG_ID } from "@/db/seeds/01_demo_accounts";
import { reviewLists, submittedBy, waitingFor } from "@/db/queries/review-queue";
import { DESIGNER, ENGINEER, freshInReview, userId } from "../support/review-fixtures";

const prepared = vi.hoisted(() => ({ calls: [] as { sql: string; bindings: readonly unknown[]; options?: { plan?: string } }[] }));

vi.mock("@/db/prepared", async (importOriginal) => {
  const actual = await importOriginal<typeof import("@/db/prepared")>();
  return {
    ...actual,
    preparedRows: (sql: string, bindings: readonly unknown[], options?: { plan?: "generic" | "auto" }) => {
      prepared.calls.push({ sql, bindings, options });
      return actual.preparedRows(sql, bindings, options);
    },
  };
});

describe("the reviews page's lists, prepared", () => {
  it("run as one generic-plan statement whose text is the same for every engineer, with the limits written in", async () => {
    for (let i = 0; i < 3; i++) await freshInReview();
    const engineer = await userId(ENGINEER);
    const other = await userId(DESIGNER);
    prepared.calls.length = 0;
    const lists = await reviewLists(DEMO_ORG_ID, engineer, { engineer: true, designer: false }, 2, 3, 1000);
    await reviewLists(DEMO_ORG_ID, other, { engineer: true, designer: false }, 2, 3, 1000);
    await reviewLists(DEMO_ORG_ID, engineer, { engineer: true, designer: false }, 5, 7, 10);
    expect(prepared.calls).toHaveLength(3);
    const [first, second, third] = prepared.calls;
    // A generic plan (no `plan: "auto"`), one text for every person: the ids are bindings.
    expect(first.options?.plan ?? "generic").toBe("generic");
    expect(second.sql).toBe(first.sql);
    expect(first.bindings).toContain(engineer);
    expect(second.bindings).toContain(other);
    // The limits and the count's cap are in the text: a generic plan takes a bound LIMIT for a
    // tenth of the rows, and at thousands of reviews it then sorted them all.
    expect(first.sql).toMatch(/limit 2\b/);
    expect(first.sql).toMatch(/limit 3\b/);
    expect(first.sql).toMatch(/limit 1001\b/);
    expect(third.sql).toMatch(/limit 5\b/);
    expect(third.sql).toMatch(/limit 11\b/);
    expect(first.bindings).not.toContain(2);
    expect(first.bindings).not.toContain(1001);
    // The rows are those of the single-list read (which is planned for its values).
    expect(lists.waiting?.map((r) => r.revisionId)).toEqual((await waitingFor(DEMO_ORG_ID, engineer, 2)).map((r) => r.revisionId));
  });

  it("keeps a designer's list the same through the prepared statement", async () => {
    await freshInReview();
    const designer = await userId(DESIGNER);
    const lists = await reviewLists(DEMO_ORG_ID, designer, { engineer: false, designer: true }, 4, 3);
    expect(lists.mine?.length).toBeGreaterThan(0);
    expect(lists.mine?.map((r) => r.revisionId)).toEqual((await submittedBy(DEMO_ORG_ID, designer, 4)).map((r) => r.revisionId));
  });
});

describe("planner statistics on reviews (catalog)", () => {
  it("say that the organisation follows from the engineer and from the submitter", async () => {
    const { rows } = await db.raw(`
      SELECT s.stxname AS name, s.stxkind::text[] AS kinds,
             array(SELECT a.attname::text FROM unnest(s.stxkeys) k JOIN pg_attribute a ON a.attrelid = s.stxrelid AND a.attnum = k ORDER BY 1) AS columns
      FROM pg_statistic_ext s WHERE s.stxrelid = 'reviews'::regclass ORDER BY 1`);
    const byColumns = new Map((rows as { name: string; kinds: string[]; columns: string[] }[]).map((r) => [r.columns.join(","), r.kinds]));
    expect(byColumns.get("engineer_id,organisation_id")).toContain("f");
    expect(byColumns.get("organisation_id,submitted_by")).toContain("f");
  });
});
