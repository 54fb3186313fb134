import type { Knex } from "knex";

/**
 * user_sessions: one row per sign-in. The session cookie carries the row's id, and every request
 * checks the row is still open, so signing out (here or everywhere), a password reset and
 * deactivation end a session at once instead of when its cookie expires.
 */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable("user_sessions", (t) => {
    t.uuid("id").primary().defaultTo(knex.raw("gen_random_uuid()"));
    t.uuid("user_id").notNullable().references("users.id").onDelete("CASCADE");
    t.uuid("organisation_id").notNullable().references("organisations.id").onDelete("CASCADE");
    t.timestamp("created_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.timestamp("last_seen_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.timestamp("expires_at", { useTz: true }).notNullable();
    t.timestamp("ended_at", { useTz: true });
    // Shown on the account page so a person can recognise their own devices.
    t.text("ip");
    t.text("user_agent");
    t.index(["user_id"], "user_sessions_user_id_idx");
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable("user_sessions");
}
