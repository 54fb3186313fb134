import type { Knex } from "knex";

/**
 * Sign-up that does not reveal which addresses have accounts (hardening issue, finding 11): the
 * sign-up form answers the same for every address and e-mails it. A new address gets a single-use
 * link that finishes the sign-up; the owner of an existing account is told someone tried.
 *
 * sign_up_requests: one row per sign-up form sent for a new address, until its link is used or it
 * expires. The token is stored hashed; the chosen password only as its argon2id hash, cleared when
 * the link is used. No foreign keys: nothing exists yet for it to point at.
 *
 * email_outbox.kind names what a mail is (invitation, password-reset, sign-up…), kept after the body
 * is scrubbed; scrub_after_delivery marks mails that carry a single-use link: once the row is done
 * (sent, or given up) its links are replaced by a marker, so the table keeps no usable token.
 */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable("sign_up_requests", (t) => {
    t.uuid("id").primary().defaultTo(knex.raw("gen_random_uuid()"));
    t.text("email").notNullable();
    t.text("organisation_name").notNullable();
    t.text("name").notNullable();
    t.text("password_hash").nullable();
    t.specificType("roles", "member_role[]").notNullable();
    t.text("token_hash").notNullable().unique();
    t.timestamp("expires_at", { useTz: true }).notNullable();
    t.timestamp("used_at", { useTz: true }).nullable();
    t.timestamp("created_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    // Counting one address's recent sign-ups (at most a few mails an hour to one inbox).
    t.index(["email", "created_at"]);
  });
  await knex.schema.alterTable("email_outbox", (t) => {
    t.text("kind").nullable();
    t.boolean("scrub_after_delivery").notNullable().defaultTo(false);
  });
  // Counting the mails of one kind to one address in the last hour (sign-up attempts on existing accounts).
  await knex.raw(`CREATE INDEX email_outbox_to_kind_idx ON email_outbox ("to", kind, created_at) WHERE kind IS NOT NULL`);
}

export async function down(knex: Knex): Promise<void> {
  await knex.raw("DROP INDEX IF EXISTS email_outbox_to_kind_idx");
  await knex.schema.alterTable("email_outbox", (t) => {
    t.dropColumn("scrub_after_delivery");
    t.dropColumn("kind");
  });
  await knex.schema.dropTable("sign_up_requests");
}
