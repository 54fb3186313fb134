/**
 * The list-index migrations (20261202500000, 20261203500000 with the queue and project-page
 * indexes, 20261204100000 with each review's design and number, 20261204100100 with each
 * project's card jurisdiction, 20261205100000 with each review's project) and the triggers that
 * keep their columns unforgeable (20261204400000), and the kept counts that came after them
 * (20261205500000 per organisation, 20261206100000 per design), run forward on a database that already holds data,
 * without losing a row: a copy of a grown database (every other migration, the demo seed and three
 * generated units of tests/bench/grow.ts) is migrated to the latest schema, then every table is
 * counted again and the new columns are checked against what they are derived from.
 */
import { execFileSync } from "node:child_process";
import { readdirSync } from "node:fs";
import crypto from "node:crypto";
import path from "node:path";
import { afterAll, describe, expect, it } from "vitest";
import pg from "pg";
import { psql, type Cluster } from "@/db/lib/postgres";
import { grow, prepare, tableCounts } from "../bench/grow";

const MINE = /^20261202500000_|^2026120350\d{4}_|^2026120410\d{4}_/;
const MIGRATIONS = readdirSync(path.resolve(import.meta.dirname, "../../db/migrations")).filter((f) => f.endsWith(".ts")).sort();
/**
 * Held back from the "existing database": these migrations, and any landed after the last of them
 * (a later migration may build on their columns, as 20261204400000 does on design_count).
 */
const LAST_MINE = MIGRATIONS.filter((f) => MINE.test(f)).at(-1) ?? "";
const HELD_BACK = MIGRATIONS.filter((f) => MINE.test(f) || f > LAST_MINE);
const HELD_BACK_PATTERN = `^(${HELD_BACK.map((f) => f.replace(/[.*+?^${}()|[\]\\]/g, "\\$&")).join("|")})$`;
const cluster = JSON.parse(process.env.PIERWISE_TEST_CLUSTER ?? "null") as Cluster | null;
const appUrl = new URL(process.env.DATABASE_URL ?? "postgres://x@127.0.0.1/x");
const suffix = crypto.randomBytes(4).toString("hex");
const source = `grown_${suffix}`;
const copy = `grown_copy_${suffix}`;
const urlOf = (database: string) => Object.assign(new URL(appUrl.href), { pathname: `/${database}` }).href;
const root = path.resolve(import.meta.dirname, "../..");

/** Migrations load .ts files, which vitest's loader cannot: run them through tsx in a child. */
function migrate(database: string, ...args: string[]): string {
  return execFileSync(path.join(root, "node_modules/.bin/tsx"), ["tests/bench/migrate.ts", urlOf(database), ...args], { cwd: root, encoding: "utf8" });
}

async function pending(database: string): Promise<string[]> {
  const client = new pg.Client({ connectionString: urlOf(database) });
  await client.connect();
  try {
    const done = new Set((await client.query("SELECT name FROM knex_migrations")).rows.map((r) => r.name as string));
    return readdirSync(path.join(root, "db/migrations")).filter((f) => f.endsWith(".ts") && !done.has(f));
  } finally {
    await client.end();
  }
}

afterAll(async () => {
  if (cluster) for (const name of [copy, source]) psql(cluster, `DROP DATABASE IF EXISTS ${name} WITH (FORCE)`);
});

describe("migrating a grown database", () => {
  it("adds the list indexes and columns without losing or changing a row", { timeout: 240_000 }, async () => {
    expect(cluster, "npm test passes its cluster in PIERWISE_TEST_CLUSTER").toBeTruthy();
    psql(cluster!, `CREATE DATABASE ${source} OWNER ${decodeURIComponent(appUrl.username)}`);

    // Every migration but the held-back ones, then the demo seed and generated rows.
    migrate(source, "except", HELD_BACK_PATTERN, "seed");
    expect((await pending(source)).filter((f) => MINE.test(f)).length).toBeGreaterThan(0);
    const client = new pg.Client({ connectionString: urlOf(source) });
    await client.connect();
    await prepare(client);
    await grow(client, 0, 3);
    const counts = await tableCounts(client);
    await client.end();
    expect(counts.revisions).toBeGreaterThan(1_900);

    psql(cluster!, `CREATE DATABASE ${copy} TEMPLATE ${source} OWNER ${decodeURIComponent(appUrl.username)}`);
    migrate(copy, "latest");
    expect(await pending(copy)).toEqual([]);
    const check = new pg.Client({ connectionString: urlOf(copy) });
    await check.connect();
    try {
      // Every table keeps every row; only the migration log grows, by the held-back migrations.
      const migrated = await tableCounts(check);
      expect({ ...migrated, knex_migrations: 0 }).toEqual({ ...counts, knex_migrations: 0 });
      expect(migrated.knex_migrations).toBe(counts.knex_migrations + HELD_BACK.length);
      const one = async (sql: string) => Number((await check.query(sql)).rows[0].n);
      // Columns derived from the result JSON agree with it on every row.
      expect(await one(`SELECT count(*) AS n FROM revisions WHERE footing_depth_in IS DISTINCT FROM (result->'footing'->>'depthIn')::float
        OR footing_diameter_in IS DISTINCT FROM (result->'footing'->>'diameterIn')::float OR footing_pass IS DISTINCT FROM (result->'footing'->>'pass')::boolean
        OR field_post_count IS DISTINCT FROM jsonb_array_length(result->'field'->'posts')`)).toBe(0);
      expect(await one("SELECT count(*) AS n FROM revisions WHERE footing_depth_in IS NULL")).toBe(0);
      // Design counts and each design's newest approved revision, backfilled.
      expect(await one("SELECT count(*) AS n FROM projects p WHERE design_count <> (SELECT count(*) FROM designs d WHERE d.project_id = p.id)")).toBe(0);
      expect(await one(`SELECT count(*) AS n FROM designs d WHERE approved_revision_id IS DISTINCT FROM
        (SELECT r.id FROM revisions r WHERE r.design_id = d.id AND r.status = 'approved' ORDER BY r.number DESC LIMIT 1)`)).toBe(0);
      expect(await one("SELECT count(*) AS n FROM designs WHERE approved_revision_id IS NOT NULL")).toBeGreaterThan(60);
      // The kept columns cannot be written past their triggers (here the database's owner writes).
      await check.query("UPDATE projects SET design_count = design_count + 7");
      await check.query("UPDATE designs SET approved_revision_id = NULL, approved_at = now() - interval '9 years'");
      expect(await one("SELECT count(*) AS n FROM projects p WHERE design_count <> (SELECT count(*) FROM designs d WHERE d.project_id = p.id)")).toBe(0);
      expect(await one(`SELECT count(*) AS n FROM designs d WHERE approved_revision_id IS DISTINCT FROM
        (SELECT r.id FROM revisions r WHERE r.design_id = d.id AND r.status = 'approved' ORDER BY r.number DESC LIMIT 1)`)).toBe(0);
      expect(await one("SELECT count(*) AS n FROM designs WHERE approved_at < now() - interval '8 years'")).toBe(0);
      // Each project carries its card's jurisdiction.
      expect(await one(`SELECT count(*) AS n FROM projects p LEFT JOIN criteria_cards c ON c.id = p.criteria_card_id
        WHERE p.criteria_jurisdiction IS DISTINCT FROM c.jurisdiction`)).toBe(0);
      expect(await one("SELECT count(*) AS n FROM projects WHERE criteria_jurisdiction IS NOT NULL")).toBeGreaterThan(60);
      // Each review carries its revision's design and number, approval records included.
      expect(await one(`SELECT count(*) AS n FROM reviews v JOIN revisions r ON r.id = v.revision_id
        WHERE v.design_id IS DISTINCT FROM r.design_id OR v.revision_number IS DISTINCT FROM r.number`)).toBe(0);
      expect(await one("SELECT count(*) AS n FROM reviews WHERE decision = 'approve'")).toBeGreaterThan(60);
      // And its design's project (20261205100000), written past by the owner and worked out again.
      const wrongProject = `SELECT count(*) AS n FROM reviews v JOIN designs d ON d.id = v.design_id WHERE v.project_id IS DISTINCT FROM d.project_id`;
      expect(await one(wrongProject)).toBe(0);
      // (Approval records are pinned against any UPDATE, so the others.)
      expect((await check.query("UPDATE reviews SET project_id = (SELECT id FROM projects ORDER BY id LIMIT 1) WHERE decision IS DISTINCT FROM 'approve'")).rowCount).toBeGreaterThan(60);
      expect(await one(wrongProject)).toBe(0);
      await expect(check.query("UPDATE reviews SET engineer_name = 'edited' WHERE decision = 'approve'")).rejects.toThrow(/approval record/);
      // Each organisation's project count (20261205500000), backfilled, and worked out again when written.
      const wrongCount = "SELECT count(*) AS n FROM organisations o WHERE project_count <> (SELECT count(*) FROM projects p WHERE p.organisation_id = o.id)";
      expect(await one(wrongCount)).toBe(0);
      expect(await one("SELECT count(*) AS n FROM organisations WHERE project_count > 0")).toBeGreaterThan(1);
      await check.query("UPDATE organisations SET project_count = project_count + 3");
      expect(await one(wrongCount)).toBe(0);
      // Each design's revision count (20261206100000), backfilled exactly, and worked out again when written.
      const wrongRevisionCount = "SELECT count(*) AS n FROM designs d WHERE revision_count <> (SELECT count(*) FROM revisions r WHERE r.design_id = d.id)";
      expect(await one(wrongRevisionCount)).toBe(0);
      expect(await one("SELECT sum(revision_count) AS n FROM designs")).toBe(counts.revisions);
      expect(await one("SELECT count(*) AS n FROM designs WHERE revision_count >= 10")).toBeGreaterThan(60);
      await check.query("UPDATE designs SET revision_count = revision_count + 2");
      expect(await one(wrongRevisionCount)).toBe(0);
      // Each project's search text (20261205500100), generated from its name, address and state.
      expect(await one("SELECT count(*) AS n FROM projects WHERE search_text IS DISTINCT FROM lower(name || ' ' || address || ' ' || state)")).toBe(0);
      // The approval pin still holds on the migrated rows.
      await expect(check.query("UPDATE revisions SET note = 'edited' WHERE status = 'approved'")).rejects.toThrow(/approved and pinned/);
    } finally {
      await check.end();
    }
  });
});
