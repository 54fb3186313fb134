import type { Knex } from "knex";

/**
 * Indexes for the engagements foreign keys that no index led yet, so deleting an organisation or a
 * user never scans the table (tests/db/foreign-key-indexes.test.ts).
 */
export async function up(knex: Knex): Promise<void> {
  await knex.raw("CREATE INDEX engagements_organisation_id_idx ON engagements (organisation_id)");
  await knex.raw("CREATE INDEX engagements_invited_by_idx ON engagements (invited_by)");
  await knex.raw("CREATE INDEX engagements_revoked_by_idx ON engagements (revoked_by)");
}

export async function down(knex: Knex): Promise<void> {
  for (const name of ["engagements_revoked_by_idx", "engagements_invited_by_idx", "engagements_organisation_id_idx"]) await knex.raw(`DROP INDEX IF EXISTS ${name}`);
}
