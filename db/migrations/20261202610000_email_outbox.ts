import type { Knex } from "knex";

/**
 * E-mail waiting to go out. A use case writes its row in the same transaction as the state change,
 * so a mail server that is down never turns a committed change into an error, and no change goes
 * unannounced: the app delivers the row right after commit and a periodic sweep retries it
 * (app/_lib/outbox.ts). next_attempt_at is both the retry backoff and a short lease, so the sweep
 * and the delivery right after commit never send one row twice at once.
 */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable("email_outbox", (t) => {
    t.uuid("id").primary().defaultTo(knex.raw("gen_random_uuid()"));
    t.uuid("organisation_id").nullable().references("organisations.id").onDelete("CASCADE");
    t.text("to").notNullable();
    t.text("subject").notNullable();
    t.text("text").notNullable();
    t.text("html").nullable();
    t.timestamp("created_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.integer("attempts").notNullable().defaultTo(0);
    t.text("last_error").nullable();
    t.timestamp("next_attempt_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.timestamp("sent_at", { useTz: true }).nullable();
    t.timestamp("failed_at", { useTz: true }).nullable();
    // Every foreign key has an index, so deleting an organisation scans nothing.
    t.index(["organisation_id"]);
  });
  // The sweep reads only rows still to send, oldest due first.
  await knex.raw(`CREATE INDEX email_outbox_pending_idx ON email_outbox (next_attempt_at) WHERE sent_at IS NULL AND failed_at IS NULL`);
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable("email_outbox");
}
