import type { Knex } from "knex";

/**
 * `designs.revision_count`: how many revisions the design holds, so a design's revision list
 * (the design page's table, `GET /api/designs/:id`) takes its total from one row instead of
 * counting every revision of the design on each view (1,000 for the long-lived design at ×1000 in
 * `npm run bench:db`, growing with the design's history).
 *
 * Kept as DEVELOPERS.md "Columns a trigger keeps" asks, the way `organisations.project_count` is
 * (20261205500000): a BEFORE INSERT OR UPDATE row trigger on designs counts the design's revisions
 * again whenever a write would change the column (or on insert), whoever writes it, so no role can
 * forge it. Revisions tell their design after each statement that inserts or deletes some
 * (statement triggers with transition tables: a bulk insert recounts once per design, not once per
 * row), and after a revision moves to another design (a row trigger, fired only when `design_id`
 * changes; the app never moves one). The count is an index-only read of `(design_id, number)`,
 * paid once per save.
 *
 * Locking: a save (`createRevision`) already holds the design row FOR UPDATE while it inserts,
 * so the trigger's UPDATE of that row waits for nothing new. Submitting for review locks the same
 * row the same way. Writers that insert revisions without that lock (bulk loads, tests) queue on
 * the design row; the second recount runs after the first transaction commits (READ COMMITTED
 * takes a new snapshot for the trigger's count), so neither is lost. The design's other BEFORE
 * trigger (`keep_design_approval`) returns at once when the approval columns are left alone, as
 * they are by this UPDATE; `designs_count_in_project` fires only on `UPDATE OF project_id`.
 *
 * The backfill counts every design's revisions in one grouped pass over the `(design_id, number)`
 * index before the triggers exist (designs are locked by the ALTER TABLE meanwhile).
 */
export async function up(knex: Knex): Promise<void> {
  await knex.raw("ALTER TABLE designs ADD COLUMN revision_count integer NOT NULL DEFAULT 0");
  await knex.raw(`UPDATE designs d SET revision_count = c.n
    FROM (SELECT design_id, count(*)::int AS n FROM revisions GROUP BY design_id) c WHERE c.design_id = d.id`);

  await knex.raw(`
    CREATE FUNCTION keep_design_revision_count() RETURNS trigger LANGUAGE plpgsql
    SET search_path = pg_catalog, public, pg_temp AS $$
    BEGIN
      IF TG_OP = 'INSERT' OR NEW.revision_count IS DISTINCT FROM OLD.revision_count THEN
        NEW.revision_count := (SELECT count(*) FROM public.revisions r WHERE r.design_id = NEW.id);
      END IF;
      RETURN NEW;
    END $$`);
  await knex.raw(`CREATE TRIGGER designs_keep_revision_count BEFORE INSERT OR UPDATE ON designs
    FOR EACH ROW EXECUTE FUNCTION keep_design_revision_count()`);

  // Any value other than the stored one makes the BEFORE trigger count again; -1 never is one.
  await knex.raw(`
    CREATE FUNCTION count_design_revisions() RETURNS trigger LANGUAGE plpgsql
    SET search_path = pg_catalog, public, pg_temp AS $$
    BEGIN
      IF TG_OP = 'INSERT' OR TG_OP = 'DELETE' THEN
        UPDATE public.designs SET revision_count = -1 WHERE id IN (SELECT DISTINCT design_id FROM changed_rows);
      ELSE
        UPDATE public.designs SET revision_count = -1 WHERE id IN (OLD.design_id, NEW.design_id);
      END IF;
      RETURN NULL;
    END $$`);
  await knex.raw(`CREATE TRIGGER revisions_count_inserted AFTER INSERT ON revisions
    REFERENCING NEW TABLE AS changed_rows FOR EACH STATEMENT EXECUTE FUNCTION count_design_revisions()`);
  await knex.raw(`CREATE TRIGGER revisions_count_deleted AFTER DELETE ON revisions
    REFERENCING OLD TABLE AS changed_rows FOR EACH STATEMENT EXECUTE FUNCTION count_design_revisions()`);
  await knex.raw(`CREATE TRIGGER revisions_count_moved AFTER UPDATE OF design_id ON revisions
    FOR EACH ROW WHEN (OLD.design_id IS DISTINCT FROM NEW.design_id) EXECUTE FUNCTION count_design_revisions()`);
}

export async function down(knex: Knex): Promise<void> {
  for (const name of ["revisions_count_inserted", "revisions_count_deleted", "revisions_count_moved"]) await knex.raw(`DROP TRIGGER IF EXISTS ${name} ON revisions`);
  await knex.raw("DROP FUNCTION IF EXISTS count_design_revisions()");
  await knex.raw("DROP TRIGGER IF EXISTS designs_keep_revision_count ON designs");
  await knex.raw("DROP FUNCTION IF EXISTS keep_design_revision_count()");
  await knex.raw("ALTER TABLE designs DROP COLUMN IF EXISTS revision_count");
}
