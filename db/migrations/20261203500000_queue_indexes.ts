import type { Knex } from "knex";

/**
 * An engineer's queue (/queue) reads their reviews from one index alone: every column the queue
 * filters and sorts on before its page is cut (organisation, decision, submission and decision
 * times, revision) is in the index, so the page is chosen by an index-only scan and only the
 * page's rows are joined to revision, design and project (db/queries/engineer-queue.ts; numbers
 * in db/README.md). It leads with engineer_id, so it also serves that foreign key, and replaces
 * the plain index on it. The reviews page lists the organisation's open holds oldest first, and
 * counts them, from a partial index of open holds. The projects list picks a page's ids from an
 * index that holds the organisation, the sort column and the id (index-only, counted in the same
 * pass), for each sort it offers; these replace the earlier ones without the id.
 */
export async function up(knex: Knex): Promise<void> {
  await knex.raw(`CREATE INDEX reviews_engineer_queue_idx ON reviews (engineer_id, submitted_at, id)
    INCLUDE (organisation_id, decision, decided_at, revision_id)`);
  await knex.raw("DROP INDEX IF EXISTS reviews_engineer_id_idx");
  await knex.raw("CREATE INDEX design_holds_org_open_idx ON design_holds (organisation_id, raised_at) WHERE cleared_at IS NULL");
  await knex.raw("CREATE INDEX projects_org_name_id_idx ON projects (organisation_id, name, id)");
  await knex.raw("CREATE INDEX projects_org_state_name_id_idx ON projects (organisation_id, state, name, id)");
  await knex.raw("CREATE INDEX projects_org_design_count_id_idx ON projects (organisation_id, design_count, id)");
  await knex.raw("DROP INDEX IF EXISTS projects_org_state_idx");
  await knex.raw("DROP INDEX IF EXISTS projects_org_design_count_idx");
}

export async function down(knex: Knex): Promise<void> {
  await knex.raw("DROP INDEX IF EXISTS design_holds_org_open_idx");
  await knex.raw("CREATE INDEX IF NOT EXISTS projects_org_state_idx ON projects (organisation_id, state, name)");
  await knex.raw("CREATE INDEX IF NOT EXISTS projects_org_design_count_idx ON projects (organisation_id, design_count)");
  for (const name of ["projects_org_name_id_idx", "projects_org_state_name_id_idx", "projects_org_design_count_id_idx"]) await knex.raw(`DROP INDEX IF EXISTS ${name}`);
  await knex.raw("CREATE INDEX IF NOT EXISTS reviews_engineer_id_idx ON reviews (engineer_id)");
  await knex.raw("DROP INDEX IF EXISTS reviews_engineer_queue_idx");
}
