import type { Knex } from "knex";

/**
 * Projects (customer sites), the organisation's design criteria cards, designs and their
 * immutable revisions. A revision is never edited in place: every save inserts a new one.
 */
export async function up(knex: Knex): Promise<void> {
  await knex.raw("CREATE TYPE revision_status AS ENUM ('draft', 'in_review', 'approved', 'changes_requested')");

  // Design criteria for one jurisdiction, entered once per organisation and applied to projects.
  // `values` holds the criteria (editions, wind, exposure, snow, frost, soil); `sources` the source
  // and date checked of each value, keyed the same way.
  await knex.schema.createTable("criteria_cards", (t) => {
    t.uuid("id").primary().defaultTo(knex.raw("gen_random_uuid()"));
    t.uuid("organisation_id").notNullable().references("organisations.id").onDelete("CASCADE");
    t.text("jurisdiction").notNullable();
    t.string("state", 2).notNullable();
    t.jsonb("values").notNullable();
    t.jsonb("sources").notNullable().defaultTo("{}");
    t.uuid("created_by").references("users.id");
    t.timestamp("created_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.timestamp("updated_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.unique(["organisation_id", "jurisdiction"]);
  });

  // A customer site.
  await knex.schema.createTable("projects", (t) => {
    t.uuid("id").primary().defaultTo(knex.raw("gen_random_uuid()"));
    t.uuid("organisation_id").notNullable().references("organisations.id").onDelete("CASCADE");
    t.text("name").notNullable();
    t.text("address").notNullable().defaultTo("");
    t.string("state", 2).notNullable();
    t.double("latitude");
    t.double("longitude");
    t.text("notes").notNullable().defaultTo("");
    t.uuid("criteria_card_id").references("criteria_cards.id").onDelete("SET NULL");
    t.uuid("created_by").references("users.id");
    t.timestamp("created_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.timestamp("updated_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.index(["organisation_id", "name"]);
  });

  // One array on its posts, within a project.
  await knex.schema.createTable("designs", (t) => {
    t.uuid("id").primary().defaultTo(knex.raw("gen_random_uuid()"));
    t.uuid("project_id").notNullable().references("projects.id").onDelete("CASCADE");
    t.uuid("organisation_id").notNullable().references("organisations.id").onDelete("CASCADE");
    t.text("name").notNullable();
    t.uuid("created_by").references("users.id");
    t.timestamp("created_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.index(["project_id"]);
  });

  // Every saved state of a design: validated input, the engine's result and version, author, time,
  // and a content hash. `number` counts 1, 2, 3… within the design.
  await knex.schema.createTable("revisions", (t) => {
    t.uuid("id").primary().defaultTo(knex.raw("gen_random_uuid()"));
    t.uuid("design_id").notNullable().references("designs.id").onDelete("CASCADE");
    t.uuid("organisation_id").notNullable().references("organisations.id").onDelete("CASCADE");
    t.integer("number").notNullable();
    t.jsonb("input").notNullable();
    t.jsonb("result").notNullable();
    t.text("engine_version").notNullable();
    t.text("content_hash").notNullable();
    t.specificType("status", "revision_status").notNullable().defaultTo("draft");
    t.text("note").notNullable().defaultTo("");
    t.uuid("author_id").references("users.id");
    t.timestamp("created_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.unique(["design_id", "number"]);
  });
}

export async function down(knex: Knex): Promise<void> {
  for (const table of ["revisions", "designs", "projects", "criteria_cards"]) await knex.schema.dropTableIfExists(table);
  await knex.raw("DROP TYPE IF EXISTS revision_status");
}
