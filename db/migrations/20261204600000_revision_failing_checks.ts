import type { Knex } from "knex";

/**
 * `revisions.footing_failing_checks`: the titles of the footing checks that fail (a JSON array of
 * strings, `[]` when all pass), a stored generated column like `footing_depth_in` (20261202500000).
 * The engineer's queue shows them for each row of its page; reading them from `result` meant
 * detoasting and decompressing each row's whole result (≈ 34 kB as text) on every view.
 *
 * Generated, not kept by a trigger: nobody can write it (so there is nothing to forge, and
 * DEVELOPERS.md "Columns a trigger keeps" does not apply), and adding it rewrites the table without
 * firing a trigger, so approved revisions (pinned against UPDATE) get it too. `jsonb_path_query_array`
 * is immutable, as a generated column needs; the path keeps the checks' order and matches
 * `pass: false` exactly as the queue's earlier `(c->>'pass')::boolean IS FALSE` did for the
 * engine's boolean `pass`. A result without footing checks gives `[]`.
 */
export async function up(knex: Knex): Promise<void> {
  await knex.raw(`ALTER TABLE revisions ADD COLUMN footing_failing_checks jsonb
    GENERATED ALWAYS AS (jsonb_path_query_array(result, '$.footing.checks[*] \\? (@.pass == false).title')) STORED`);
}

export async function down(knex: Knex): Promise<void> {
  await knex.raw("ALTER TABLE revisions DROP COLUMN IF EXISTS footing_failing_checks");
}
