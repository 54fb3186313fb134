import type { Knex } from "knex";

/**
 * Uploads on a project: site photos, soil or geotechnical reports, drawings. The bytes live in the
 * private object store under a key the app makes (never the uploader's file name); this table keeps
 * the sniffed type, size, the name as uploaded (for display and download only) and, for photos,
 * the key of a small thumbnail.
 */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable("project_files", (t) => {
    t.uuid("id").primary().defaultTo(knex.raw("gen_random_uuid()"));
    t.uuid("project_id").notNullable().references("projects.id").onDelete("CASCADE");
    t.uuid("organisation_id").notNullable().references("organisations.id").onDelete("CASCADE");
    // photo | document: decided from the sniffed content type, not from the name.
    t.text("kind").notNullable();
    t.text("original_name").notNullable();
    t.text("content_type").notNullable();
    t.integer("size_bytes").notNullable();
    t.text("object_key").notNullable().unique();
    t.text("thumbnail_key");
    t.text("description").notNullable().defaultTo("");
    t.uuid("uploaded_by").references("users.id");
    t.timestamp("created_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.index(["project_id", "created_at"]);
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTableIfExists("project_files");
}
