import type { Knex } from "knex";

/**
 * Statistics for the columns and index expression that 20261204100000 and 20261204100100 added
 * (reviews: design, number, decided-or-not; projects: the card's jurisdiction) now, not at
 * autovacuum's next visit: until then the planner guesses how many reviews are decided and may
 * pass over the queue's index. On a copy grown to ×1000, the engineer's queue read 2,782 buffers
 * right after migrating and 511 once the table was analysed and vacuumed (db/README.md).
 * ANALYZE changes no row; the down migration has nothing to undo.
 */
export async function up(knex: Knex): Promise<void> {
  await knex.raw("ANALYZE reviews");
  await knex.raw("ANALYZE projects");
}

export async function down(): Promise<void> {}
