/**
 * A migration that fails at start-up is reported with its file name, PostgreSQL's own error line,
 * the database and the fix, and leaves the database as it was (knex runs one start's pending
 * migrations in one transaction). Runs against the suite's throwaway database with migrations of
 * its own, recorded in a table of its own so the real migration history is not touched. Runs as
 * the owner role, as `npm start` migrates.
 */
import fs from "node:fs";
import os from "node:os";
import path from "node:path";
import { afterAll, describe, expect, it } from "vitest";
import { ownerDb as db, ownerUrl } from "../support/owner-db";
import { migrateToLatest } from "@/db/lib/migrate";

const dir = fs.mkdtempSync(path.join(os.tmpdir(), "pierwise-migrations-"));
const table = `migrate_probe_${process.pid}`;
const history = `knex_migrations_probe_${process.pid}`;
afterAll(async () => {
  fs.rmSync(dir, { recursive: true, force: true });
  await db.schema.dropTableIfExists(table);
  await db.schema.dropTableIfExists(history);
  await db.schema.dropTableIfExists(`${history}_lock`);
  await db.destroy();
});

describe("a failing migration at start-up", () => {
  it("names the migration, PostgreSQL's error line and the fix, and leaves the database as it was", async () => {
    fs.writeFileSync(path.join(dir, "20990101000000_make_table.cjs"), `exports.up = (k) => k.schema.createTable("${table}", (t) => t.integer("n"));\nexports.down = () => {};\n`);
    fs.writeFileSync(path.join(dir, "20990101000001_broken.cjs"), `exports.up = (k) => k.raw("ALTER TABLE no_such_table_here ADD COLUMN x integer");\nexports.down = () => {};\n`);
    const overrides = { directory: dir, loadExtensions: [".cjs"], tableName: history };
    const failure = await migrateToLatest(ownerUrl, "/the/cluster/folder", overrides).then(() => null, (e: Error) => e.message);
    expect(failure).toMatch(/^migration 20990101000001_broken\.cjs failed: ERROR: {2}relation "no_such_table_here" does not exist\. /);
    expect(failure).toContain("Folder: /the/cluster/folder, database pierwise_test on 127.0.0.1:");
    expect(failure).toMatch(/Fix: every migration of this start was rolled back/);
    // The first migration of the same start was rolled back with it.
    expect(await db.schema.hasTable(table)).toBe(false);
    expect(Number((await db(history).count({ n: "*" }))[0].n)).toBe(0);
  });

  it("says when another process holds the migration lock, and how to free it if none does", async () => {
    const lockDir = fs.mkdtempSync(path.join(os.tmpdir(), "pierwise-migrations-lock-"));
    const lockHistory = `${history}_l`;
    try {
      fs.writeFileSync(path.join(lockDir, "20990102000000_noop.cjs"), "exports.up = async () => {};\nexports.down = async () => {};\n");
      const overrides = { directory: lockDir, loadExtensions: [".cjs"], tableName: lockHistory };
      // A first run makes the history and lock tables; then a killed run's lock is left taken.
      await db.schema.createTable(lockHistory, (t) => { t.increments("id"); t.string("name"); t.integer("batch"); t.timestamp("migration_time"); });
      await db.schema.createTable(`${lockHistory}_lock`, (t) => { t.increments("index"); t.integer("is_locked"); });
      await db(`${lockHistory}_lock`).insert({ is_locked: 1 });
      const failure = await migrateToLatest(ownerUrl, "/the/cluster/folder", overrides).then(() => null, (e: Error) => e.message);
      expect(failure).toMatch(/is being migrated by another process/);
      expect(failure).toMatch(/migrate:unlock/);
    } finally {
      fs.rmSync(lockDir, { recursive: true, force: true });
      await db.schema.dropTableIfExists(lockHistory);
      await db.schema.dropTableIfExists(`${lockHistory}_lock`);
    }
  });

  it("refuses a database that has migrations this checkout lacks, and says to update the checkout", async () => {
    const empty = fs.mkdtempSync(path.join(os.tmpdir(), "pierwise-migrations-none-"));
    try {
      // The real history (the suite's migrations) against a folder holding none of them.
      const failure = await migrateToLatest(ownerUrl, "/the/cluster/folder", { directory: empty, loadExtensions: [".cjs"] }).then(() => null, (e: Error) => e.message);
      expect(failure).toMatch(/has migrations this checkout does not have \(\d{14}_/);
      expect(failure).toMatch(/Fix: update this checkout \(git pull\)/);
    } finally {
      fs.rmSync(empty, { recursive: true, force: true });
    }
  });
});
