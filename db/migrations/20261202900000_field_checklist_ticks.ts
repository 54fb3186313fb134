import type { Knex } from "knex";

/**
 * The crew's field checklist, ticked per approved revision: one row per item, with who ticked it and
 * when, so a tick survives a reload and the engineer can see what the crew confirmed.
 */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable("field_checklist_ticks", (t) => {
    t.uuid("revision_id").notNullable().references("revisions.id").onDelete("CASCADE");
    t.uuid("organisation_id").notNullable().references("organisations.id").onDelete("CASCADE");
    t.text("item_key").notNullable();
    t.boolean("ticked").notNullable();
    t.uuid("ticked_by").notNullable().references("users.id");
    t.timestamp("ticked_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.primary(["revision_id", "item_key"]);
    // Every foreign key has an index, so deleting a user or an organisation scans nothing.
    t.index(["organisation_id"]);
    t.index(["ticked_by"]);
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable("field_checklist_ticks");
}
