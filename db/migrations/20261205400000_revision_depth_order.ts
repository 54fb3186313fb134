import type { Knex } from "knex";

/**
 * Issue 19: a design's revisions sorted by footing depth read a page, in either direction.
 *
 * The list sorts `footing_depth_in <dir> NULLS LAST, number <dir>` (a revision whose footing could
 * not be sized has no depth and goes last either way; the number breaks ties so a page boundary
 * between equal depths neither repeats nor skips a revision). `(design_id, footing_depth_in)`
 * served only the ascending order: read backwards it gives DESC NULLS FIRST, so the default
 * (deepest first) sorted every revision of the design (bench:db at ×1000, a design with 1,000
 * revisions: 377 buffers, 2.0× the ×100 time). One index per direction, each with the tie-break.
 */
export async function up(knex: Knex): Promise<void> {
  await knex.raw("DROP INDEX IF EXISTS revisions_design_depth_idx");
  await knex.raw("CREATE INDEX revisions_design_depth_asc_idx ON revisions (design_id, footing_depth_in ASC NULLS LAST, number ASC)");
  await knex.raw("CREATE INDEX revisions_design_depth_desc_idx ON revisions (design_id, footing_depth_in DESC NULLS LAST, number DESC)");
}

export async function down(knex: Knex): Promise<void> {
  await knex.raw("DROP INDEX IF EXISTS revisions_design_depth_asc_idx");
  await knex.raw("DROP INDEX IF EXISTS revisions_design_depth_desc_idx");
  await knex.raw("CREATE INDEX revisions_design_depth_idx ON revisions (design_id, footing_depth_in)");
}
