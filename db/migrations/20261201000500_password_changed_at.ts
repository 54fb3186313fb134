import type { Knex } from "knex";

/**
 * users.password_changed_at: when the password was last set through a reset link. Sessions that
 * began before it stop working, so a reset also signs out whoever may have learnt the old password.
 */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.alterTable("users", (t) => {
    t.timestamp("password_changed_at", { useTz: true }).nullable();
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.alterTable("users", (t) => {
    t.dropColumn("password_changed_at");
  });
}
