import crypto from "node:crypto";
import { db } from "./client";

interface PgConnection {
  query(config: { name?: string; text: string; values?: unknown[] }): Promise<{ rows: Record<string, unknown>[] }>;
}

/**
 * A statement run as a named prepared statement with a generic plan: planned once per pooled
 * connection, then only executed. For the few large statements whose planning costs more than
 * their execution (the engineer's queue: ≈ 1.2 ms to plan, 0.7 ms to run at the largest benchmark
 * size; db/README.md, fifth pass). PostgreSQL's own choice keeps re-planning them (it rates the
 * generic plan dearer, not knowing the engineer or the page), so the generic plan is asked for by
 * `plan_cache_mode`, set for this statement alone and reset before the connection goes back to the
 * pool: every other statement (knex's, unnamed) is still planned for its values.
 *
 * Only for statements whose plan does not hinge on a value (no pattern search, no skewed filter):
 * the text, with `?` bindings, must stay the same from call to call, so numbers that change per
 * request (a page, a limit) are bindings too. The name is a hash of the text.
 */
export async function preparedRows<T = Record<string, unknown>>(sql: string, bindings: readonly unknown[], options: { plan?: "generic" | "auto" } = {}): Promise<T[]> {
  const native = db.raw(sql, bindings as never[]).toSQL().toNative();
  const name = `pw_${crypto.createHash("sha256").update(native.sql).digest("hex").slice(0, 24)}`;
  const connection = (await db.client.acquireConnection()) as PgConnection;
  const run = async () => (await connection.query({ name, text: native.sql, values: native.bindings as unknown[] })).rows as T[];
  try {
    // "auto": PostgreSQL's own choice, which turns to the generic plan after five runs when it
    // costs no more (key lookups, such as the sign-in check): no SET and RESET round trips.
    if (options.plan === "auto") return await run();
    await connection.query({ text: "SET plan_cache_mode = force_generic_plan" });
    try {
      return await run();
    } finally {
      await connection.query({ text: "RESET plan_cache_mode" });
    }
  } finally {
    await db.client.releaseConnection(connection);
  }
}
