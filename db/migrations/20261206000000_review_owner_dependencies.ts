import type { Knex } from "knex";

/**
 * Issue 19, eighth pass (numbers in db/README.md).
 *
 * The reviews page's lists run as one prepared statement with a generic plan (db/prepared.ts), so
 * they are planned once per pooled connection instead of on every request (planning the six-table
 * join was ≈ 1.2–2.5 ms of the page's ≈ 5 ms at ×1000). A generic plan cannot see which engineer
 * or submitter it is for, so PostgreSQL estimates `organisation_id = $1 AND engineer_id = $2` as if
 * the two were independent: 1/50 × 1/150 of the table, 9 rows at ×1000. Believing the engineer's
 * open reviews fit in the page, it read them all by bitmap and sorted them (2,100 reviews, 529
 * buffers, growing with the backlog) instead of reading the page in order from the open-queue index.
 *
 * An engineer or a submitter belongs to one organisation, so the organisation follows from either:
 * functional-dependency statistics say so to the planner (they apply to a parameter as well as to
 * a constant). With them the estimate is ≈ 440 rows and the generic plan reads the first page of
 * `reviews_open_queue_idx` in order (28 buffers), as a custom plan does.
 *
 * Statistics change no row; ANALYZE builds them now rather than at autovacuum's next visit.
 */
export async function up(knex: Knex): Promise<void> {
  await knex.raw("CREATE STATISTICS reviews_organisation_engineer_stats (dependencies) ON organisation_id, engineer_id FROM reviews");
  await knex.raw("CREATE STATISTICS reviews_organisation_submitter_stats (dependencies) ON organisation_id, submitted_by FROM reviews");
  await knex.raw("ANALYZE reviews");
}

export async function down(knex: Knex): Promise<void> {
  await knex.raw("DROP STATISTICS IF EXISTS reviews_organisation_engineer_stats");
  await knex.raw("DROP STATISTICS IF EXISTS reviews_organisation_submitter_stats");
}
