import type pg from "pg";

/**
 * Waits until no autovacuum worker runs in the cluster, then turns autovacuum off while routes are
 * timed; `resume` turns it on again. Growing leaves work for autovacuum that the grow step's own
 * VACUUM (ANALYZE) does not do (the TOAST tables it skips: gigabytes at ×1000), and on this 2-core
 * machine a worker on the second core doubled some routes' times in a run (page /projects 1.08 →
 * 2.15 ms with the same buffers). The rows are analysed and vacuumed by then, so the planner sees
 * what it would see in steady use; what is timed is each request's own cost.
 */
export async function settleAutovacuum(admin: pg.Client, options: { maxWaitMs?: number; pollMs?: number } = {}): Promise<{ waitedMs: number; tables: string[] }> {
  const maxWaitMs = options.maxWaitMs ?? 15 * 60_000;
  const pollMs = options.pollMs ?? 2_000;
  const started = Date.now();
  const tables = new Set<string>();
  for (;;) {
    const { rows } = await admin.query<{ query: string }>("SELECT query FROM pg_stat_activity WHERE backend_type = 'autovacuum worker'");
    for (const r of rows) tables.add(r.query.replace(/^autovacuum:\s*/, ""));
    if (!rows.length || Date.now() - started > maxWaitMs) break;
    await new Promise((resolve) => setTimeout(resolve, pollMs));
  }
  await admin.query("ALTER SYSTEM SET autovacuum = off");
  await admin.query("SELECT pg_reload_conf()");
  return { waitedMs: Date.now() - started, tables: [...tables] };
}

/** Autovacuum back on (after the timing, and before the next scale grows the data). */
export async function resumeAutovacuum(admin: pg.Client): Promise<void> {
  await admin.query("ALTER SYSTEM RESET autovacuum");
  await admin.query("SELECT pg_reload_conf()");
}
