/**
 * Every foreign key is served by an index whose leading columns are the key's columns, so a
 * delete or cascade on the referenced table (a user, a design, a revision) looks rows up instead
 * of scanning the referencing table. Read from the catalog, so a table added later by any
 * migration is checked too; the failure names each missing index and the statement that adds it.
 */
import { afterAll, describe, expect, it } from "vitest";
import type { Knex } from "knex";
import { db } from "@/db/client";
import { ownerDb } from "../support/owner-db";

interface ForeignKey {
  constraint: string;
  table: string;
  columns: string[];
  covered: boolean;
}

/** A full (not partial) index whose first n key columns are exactly the key's n columns. indkey is 0-based. */
const COVERED = `EXISTS (
  SELECT 1 FROM pg_index i
  WHERE i.indrelid = c.conrelid AND i.indpred IS NULL
    AND (i.indkey::int2[])[0:cardinality(c.conkey) - 1] @> c.conkey
    AND (i.indkey::int2[])[0:cardinality(c.conkey) - 1] <@ c.conkey)`;

async function foreignKeys(conn: Knex | Knex.Transaction, table?: string): Promise<ForeignKey[]> {
  const { rows } = await conn.raw(`
    SELECT c.conname AS constraint, c.conrelid::regclass::text AS table,
           array(SELECT a.attname::text FROM unnest(c.conkey) WITH ORDINALITY k(attnum, n)
                 JOIN pg_attribute a ON a.attrelid = c.conrelid AND a.attnum = k.attnum ORDER BY k.n) AS columns,
           ${COVERED} AS covered
    FROM pg_constraint c
    WHERE c.contype = 'f' AND c.connamespace = 'public'::regnamespace ${table ? "AND c.conrelid = ?::regclass" : ""}
    ORDER BY 2, 1`, table ? [table] : []);
  return rows as ForeignKey[];
}

describe("foreign keys (catalog)", () => {
  it("every foreign key has an index led by its columns", async () => {
    const keys = await foreignKeys(db);
    // The schema has foreign keys at all (a catalog query that found none would pass vacuously).
    expect(keys.length).toBeGreaterThan(30);
    const missing = keys
      .filter((k) => !k.covered)
      .map((k) => `${k.table}.${k.columns.join(",")} (${k.constraint}): CREATE INDEX ${k.table}_${k.columns.join("_")}_idx ON ${k.table} (${k.columns.join(", ")})`);
    expect(missing, `foreign keys without an index:\n${missing.join("\n")}`).toEqual([]);
  });

  it("tells a foreign key with an index from one without, and a partial or later-column index does not count", async () => {
    // A probe table needs the schema owner: the app role cannot create tables.
    const trx = await ownerDb.transaction();
    try {
      await trx.raw("CREATE TABLE fk_probe (id serial PRIMARY KEY, note text, user_id uuid REFERENCES users(id))");
      expect((await foreignKeys(trx, "fk_probe"))[0].covered).toBe(false);
      await trx.raw("CREATE INDEX fk_probe_partial ON fk_probe (user_id) WHERE note IS NULL");
      await trx.raw("CREATE INDEX fk_probe_second ON fk_probe (note, user_id)");
      expect((await foreignKeys(trx, "fk_probe"))[0].covered).toBe(false);
      await trx.raw("CREATE INDEX fk_probe_user ON fk_probe (user_id, note)");
      expect((await foreignKeys(trx, "fk_probe"))[0].covered).toBe(true);
    } finally {
      await trx.rollback();
    }
  });
});

afterAll(() => ownerDb.destroy());
