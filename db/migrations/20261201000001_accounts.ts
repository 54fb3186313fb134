import type { Knex } from "knex";
import { ROLES } from "../roles";

export async function up(knex: Knex): Promise<void> {
  await knex.raw('CREATE EXTENSION IF NOT EXISTS "pgcrypto"');
  await knex.raw(`CREATE TYPE member_role AS ENUM (${ROLES.map((r) => `'${r}'`).join(", ")})`);

  // A solar contractor's company: owns projects, designs and members.
  await knex.schema.createTable("organisations", (t) => {
    t.uuid("id").primary().defaultTo(knex.raw("gen_random_uuid()"));
    t.text("name").notNullable();
    t.timestamp("created_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
  });

  // A person who can sign in. E-mail is unique across the whole product (lower-cased on write).
  await knex.schema.createTable("users", (t) => {
    t.uuid("id").primary().defaultTo(knex.raw("gen_random_uuid()"));
    t.text("email").notNullable().unique();
    t.text("name").notNullable();
    t.text("password_hash").notNullable();
    t.timestamp("created_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
  });

  // Membership of one organisation; deactivated members keep their rows so past work stays attributed.
  await knex.schema.createTable("memberships", (t) => {
    t.uuid("id").primary().defaultTo(knex.raw("gen_random_uuid()"));
    t.uuid("organisation_id").notNullable().references("organisations.id").onDelete("CASCADE");
    t.uuid("user_id").notNullable().references("users.id").onDelete("CASCADE");
    t.specificType("roles", "member_role[]").notNullable();
    t.timestamp("deactivated_at", { useTz: true });
    t.timestamp("created_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.unique(["organisation_id", "user_id"]);
  });
  await knex.raw("ALTER TABLE memberships ADD CONSTRAINT memberships_roles_not_empty CHECK (cardinality(roles) > 0)");

  // A reviewing engineer's licence: one row per licensing state.
  await knex.schema.createTable("engineer_licences", (t) => {
    t.uuid("id").primary().defaultTo(knex.raw("gen_random_uuid()"));
    t.uuid("user_id").notNullable().references("users.id").onDelete("CASCADE");
    t.text("licence_number").notNullable();
    t.string("state", 2).notNullable();
    t.date("expires_on").notNullable();
    t.unique(["user_id", "state"]);
  });

  // Invitations by e-mail; the token is stored hashed and can be used once.
  await knex.schema.createTable("invitations", (t) => {
    t.uuid("id").primary().defaultTo(knex.raw("gen_random_uuid()"));
    t.uuid("organisation_id").notNullable().references("organisations.id").onDelete("CASCADE");
    t.text("email").notNullable();
    t.specificType("roles", "member_role[]").notNullable();
    t.text("token_hash").notNullable().unique();
    t.uuid("invited_by").notNullable().references("users.id");
    t.timestamp("expires_at", { useTz: true }).notNullable();
    t.timestamp("accepted_at", { useTz: true });
    t.timestamp("created_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
  });

  // Password reset links: single use, expiring, token stored hashed.
  await knex.schema.createTable("password_resets", (t) => {
    t.uuid("id").primary().defaultTo(knex.raw("gen_random_uuid()"));
    t.uuid("user_id").notNullable().references("users.id").onDelete("CASCADE");
    t.text("token_hash").notNullable().unique();
    t.timestamp("expires_at", { useTz: true }).notNullable();
    t.timestamp("used_at", { useTz: true });
    t.timestamp("created_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
  });

  // Failed sign-ins, by account e-mail and by address, so throttling holds across restarts and servers.
  await knex.schema.createTable("sign_in_failures", (t) => {
    t.bigIncrements("id");
    t.text("email").notNullable();
    t.text("ip").notNullable();
    t.timestamp("at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.index(["email", "at"]);
    t.index(["ip", "at"]);
  });

  // Who did what, when, from where.
  await knex.schema.createTable("audit_events", (t) => {
    t.bigIncrements("id");
    t.uuid("organisation_id").references("organisations.id").onDelete("CASCADE");
    t.uuid("actor_user_id").references("users.id");
    t.text("action").notNullable();
    t.text("subject").nullable();
    t.jsonb("detail").notNullable().defaultTo("{}");
    t.text("ip").nullable();
    t.timestamp("at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.index(["organisation_id", "at"]);
  });
}

export async function down(knex: Knex): Promise<void> {
  for (const table of ["audit_events", "sign_in_failures", "password_resets", "invitations", "engineer_licences", "memberships", "users", "organisations"]) {
    await knex.schema.dropTableIfExists(table);
  }
  await knex.raw("DROP TYPE IF EXISTS member_role");
}
