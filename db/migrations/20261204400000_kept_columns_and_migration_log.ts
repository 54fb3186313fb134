import type { Knex } from "knex";

/**
 * Two things the app's role could still write although it has no business to:
 *
 * 1. **Columns the triggers keep** (`projects.design_count`, `designs.approved_revision_id` and
 *    `approved_at`): an `UPDATE projects SET design_count = 0` or an insert of a design that names
 *    an approved revision would put a lie in the lists and the field page. Each kept column now has
 *    a BEFORE INSERT OR UPDATE row trigger on its own table that works it out again from its source
 *    whenever a write would change it (or on insert), whoever writes: the app's role, the owner, or
 *    the trigger that keeps it. A write that leaves it alone costs nothing. This holds for every
 *    role and needs no column-level grants, so a table's later columns stay writable as before.
 *    A new kept column gets the same: see DEVELOPERS.md ("Columns a trigger keeps");
 *    tests/db/app-role.test.ts finds every column a trigger function writes and fails when one has
 *    no such trigger.
 *
 * 2. **The migration log** (`knex_migrations`, `knex_migrations_lock`): made by knex as the owner,
 *    so default privileges gave the app role row access to it; a forged row would make a migration
 *    look applied, a taken lock would stop every later start. Every role but the tables' owner loses
 *    every privilege on them (the app never reads them). db/lib/database-roles.ts does the same at
 *    each start, after it grants row access on all tables.
 */
// knexfile.ts's tableName, knex's lock table beside it, and their id sequences.
const MIGRATION_LOG = ["knex_migrations", "knex_migrations_lock", "knex_migrations_id_seq", "knex_migrations_lock_index_seq"];

export async function up(knex: Knex): Promise<void> {
  await knex.raw(`
    CREATE FUNCTION keep_project_design_count() RETURNS trigger LANGUAGE plpgsql
    SET search_path = pg_catalog, public, pg_temp AS $$
    BEGIN
      IF TG_OP = 'INSERT' OR NEW.design_count IS DISTINCT FROM OLD.design_count THEN
        NEW.design_count := (SELECT count(*) FROM public.designs d WHERE d.project_id = NEW.id);
      END IF;
      RETURN NEW;
    END $$`);
  await knex.raw(`CREATE TRIGGER projects_keep_design_count BEFORE INSERT OR UPDATE ON projects
    FOR EACH ROW EXECUTE FUNCTION keep_project_design_count()`);

  // The newest approved revision by number (what note_design_approval keeps); its time is kept as
  // stored while the revision stays the same, else the approval's decision time (now() inside the
  // approving transaction, where the review's decided_at is now() too).
  await knex.raw(`
    CREATE FUNCTION keep_design_approval() RETURNS trigger LANGUAGE plpgsql
    SET search_path = pg_catalog, public, pg_temp AS $$
    DECLARE newest uuid;
    BEGIN
      IF TG_OP = 'UPDATE' AND NEW.approved_revision_id IS NOT DISTINCT FROM OLD.approved_revision_id
         AND NEW.approved_at IS NOT DISTINCT FROM OLD.approved_at THEN
        RETURN NEW;
      END IF;
      newest := (SELECT r.id FROM public.revisions r WHERE r.design_id = NEW.id AND r.status = 'approved' ORDER BY r.number DESC LIMIT 1);
      IF TG_OP = 'UPDATE' AND newest IS NOT DISTINCT FROM OLD.approved_revision_id THEN
        NEW.approved_revision_id := OLD.approved_revision_id;
        NEW.approved_at := OLD.approved_at;
      ELSE
        NEW.approved_revision_id := newest;
        NEW.approved_at := CASE WHEN newest IS NULL THEN NULL ELSE coalesce(
          (SELECT max(v.decided_at) FROM public.reviews v WHERE v.revision_id = newest AND v.decision = 'approve'), now()) END;
      END IF;
      RETURN NEW;
    END $$`);
  await knex.raw(`CREATE TRIGGER designs_keep_approval BEFORE INSERT OR UPDATE ON designs
    FOR EACH ROW EXECUTE FUNCTION keep_design_approval()`);

  await knex.raw(
    `DO $$
    DECLARE t regclass; g oid;
    BEGIN
      FOREACH t IN ARRAY ARRAY[${MIGRATION_LOG.map((name) => `to_regclass('public.${name}')`).join(", ")}] LOOP
        CONTINUE WHEN t IS NULL;
        FOR g IN SELECT DISTINCT a.grantee FROM pg_class c, aclexplode(c.relacl) a WHERE c.oid = t AND a.grantee <> c.relowner LOOP
          IF g = 0 THEN
            EXECUTE format('REVOKE ALL ON %s FROM PUBLIC', t);
          ELSE
            EXECUTE format('REVOKE ALL ON %s FROM %I', t, pg_get_userbyid(g));
          END IF;
        END LOOP;
      END LOOP;
    END $$`,
  );
}

export async function down(knex: Knex): Promise<void> {
  // The migration log stays closed to the app: db/lib/database-roles.ts closes it at every start anyway.
  await knex.raw("DROP TRIGGER IF EXISTS designs_keep_approval ON designs");
  await knex.raw("DROP FUNCTION IF EXISTS keep_design_approval()");
  await knex.raw("DROP TRIGGER IF EXISTS projects_keep_design_count ON projects");
  await knex.raw("DROP FUNCTION IF EXISTS keep_project_design_count()");
}
