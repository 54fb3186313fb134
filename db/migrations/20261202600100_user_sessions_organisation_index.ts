import type { Knex } from "knex";

/** An index behind user_sessions.organisation_id, like every foreign key (deleting an organisation, per-organisation session ends). */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.alterTable("user_sessions", (t) => {
    t.index(["organisation_id"], "user_sessions_organisation_id_idx");
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.alterTable("user_sessions", (t) => {
    t.dropIndex(["organisation_id"], "user_sessions_organisation_id_idx");
  });
}
