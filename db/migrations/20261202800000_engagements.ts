import type { Knex } from "knex";

/**
 * Engagements: a contractor asks an outside reviewing engineer (someone who is not a member of the
 * contractor's organisation) to review the designs of one project. The engineer signs in to their
 * own organisation (their engineering firm, or just themselves) and, while the engagement is
 * accepted, may read that project and review what is submitted to them; nothing else.
 */
export async function up(knex: Knex): Promise<void> {
  await knex.raw("CREATE TYPE engagement_status AS ENUM ('invited', 'accepted', 'declined', 'revoked')");

  // One invitation of one engineer (by e-mail) to one project. `engineer_user_id` is set once the
  // engineer answers; the token in the e-mailed link is stored hashed. Rows are never deleted, so
  // the history of who was engaged when stays beside the decisions they made.
  await knex.schema.createTable("engagements", (t) => {
    t.uuid("id").primary().defaultTo(knex.raw("gen_random_uuid()"));
    t.uuid("organisation_id").notNullable().references("organisations.id").onDelete("CASCADE");
    t.uuid("project_id").notNullable().references("projects.id").onDelete("CASCADE");
    t.text("email").notNullable();
    t.text("message").notNullable().defaultTo("");
    t.specificType("status", "engagement_status").notNullable().defaultTo("invited");
    t.uuid("engineer_user_id").references("users.id");
    t.text("token_hash").notNullable().unique();
    t.uuid("invited_by").notNullable().references("users.id");
    t.timestamp("invited_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.timestamp("responded_at", { useTz: true });
    t.uuid("revoked_by").references("users.id");
    t.timestamp("revoked_at", { useTz: true });
    t.index(["project_id"]);
    t.index(["email"]);
    t.index(["engineer_user_id", "status"]);
  });
  // One live (invited or accepted) engagement per project and e-mail: inviting again is refused.
  await knex.raw("CREATE UNIQUE INDEX engagements_one_live ON engagements (project_id, email) WHERE status IN ('invited', 'accepted')");
  await knex.raw("ALTER TABLE engagements ADD CONSTRAINT engagements_email_lower CHECK (email = lower(email))");
  await knex.raw(`ALTER TABLE engagements ADD CONSTRAINT engagements_accepted_has_engineer CHECK (
    status <> 'accepted' OR engineer_user_id IS NOT NULL)`);
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTableIfExists("engagements");
  await knex.raw("DROP TYPE IF EXISTS engagement_status");
}
