import type { Knex } from "knex";

/**
 * `organisations.project_count`: how many projects the organisation holds, so the projects list's
 * count without a search is one row read, not every index entry of the organisation (2,200 at
 * ×1000 in `npm run bench:db`, growing with the organisation).
 *
 * Kept as DEVELOPERS.md "Columns a trigger keeps" asks: a BEFORE INSERT OR UPDATE row trigger on
 * organisations counts the projects again whenever a write would change the column (or on
 * insert), whoever writes it, so no role can forge it. Projects tell their organisation after each
 * statement that inserts or deletes some (statement triggers with transition tables: a bulk insert
 * of 2,000 projects recounts once per organisation, not 2,000 times), and after a project moves to
 * another organisation (a row trigger, fired only when `organisation_id` changes). The count is an
 * index-only read of `(organisation_id, …)`, paid on project writes, which are rare beside reads.
 *
 * Concurrent inserts into one organisation queue on its row: the second recount runs after the
 * first transaction commits (READ COMMITTED takes a new snapshot for the trigger's count), so
 * neither is lost.
 */
export async function up(knex: Knex): Promise<void> {
  await knex.raw("ALTER TABLE organisations ADD COLUMN project_count integer NOT NULL DEFAULT 0");
  await knex.raw(`UPDATE organisations o SET project_count = c.n
    FROM (SELECT organisation_id, count(*)::int AS n FROM projects GROUP BY organisation_id) c WHERE c.organisation_id = o.id`);

  await knex.raw(`
    CREATE FUNCTION keep_organisation_project_count() RETURNS trigger LANGUAGE plpgsql
    SET search_path = pg_catalog, public, pg_temp AS $$
    BEGIN
      IF TG_OP = 'INSERT' OR NEW.project_count IS DISTINCT FROM OLD.project_count THEN
        NEW.project_count := (SELECT count(*) FROM public.projects p WHERE p.organisation_id = NEW.id);
      END IF;
      RETURN NEW;
    END $$`);
  await knex.raw(`CREATE TRIGGER organisations_keep_project_count BEFORE INSERT OR UPDATE ON organisations
    FOR EACH ROW EXECUTE FUNCTION keep_organisation_project_count()`);

  // Any value other than the stored one makes the BEFORE trigger count again; -1 never is one.
  await knex.raw(`
    CREATE FUNCTION count_organisation_projects() RETURNS trigger LANGUAGE plpgsql
    SET search_path = pg_catalog, public, pg_temp AS $$
    BEGIN
      IF TG_OP = 'INSERT' THEN
        UPDATE public.organisations SET project_count = -1 WHERE id IN (SELECT DISTINCT organisation_id FROM changed_rows);
      ELSIF TG_OP = 'DELETE' THEN
        UPDATE public.organisations SET project_count = -1 WHERE id IN (SELECT DISTINCT organisation_id FROM changed_rows);
      ELSE
        UPDATE public.organisations SET project_count = -1 WHERE id IN (OLD.organisation_id, NEW.organisation_id);
      END IF;
      RETURN NULL;
    END $$`);
  await knex.raw(`CREATE TRIGGER projects_count_inserted AFTER INSERT ON projects
    REFERENCING NEW TABLE AS changed_rows FOR EACH STATEMENT EXECUTE FUNCTION count_organisation_projects()`);
  await knex.raw(`CREATE TRIGGER projects_count_deleted AFTER DELETE ON projects
    REFERENCING OLD TABLE AS changed_rows FOR EACH STATEMENT EXECUTE FUNCTION count_organisation_projects()`);
  await knex.raw(`CREATE TRIGGER projects_count_moved AFTER UPDATE OF organisation_id ON projects
    FOR EACH ROW WHEN (OLD.organisation_id IS DISTINCT FROM NEW.organisation_id) EXECUTE FUNCTION count_organisation_projects()`);
}

export async function down(knex: Knex): Promise<void> {
  for (const name of ["projects_count_inserted", "projects_count_deleted", "projects_count_moved"]) await knex.raw(`DROP TRIGGER IF EXISTS ${name} ON projects`);
  await knex.raw("DROP FUNCTION IF EXISTS count_organisation_projects()");
  await knex.raw("DROP TRIGGER IF EXISTS organisations_keep_project_count ON organisations");
  await knex.raw("DROP FUNCTION IF EXISTS keep_organisation_project_count()");
  await knex.raw("ALTER TABLE organisations DROP COLUMN IF EXISTS project_count");
}
