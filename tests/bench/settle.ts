import type pg from "pg";

/**
 * Turns autovacuum off while routes are timed, stopping a worker that is already running;
 * `resumeAutovacuum` turns it on again before the next scale grows the data. Growing leaves work
 * that the grow step's own VACUUM (ANALYZE) skips: at ×1000 a worker spends about five minutes on
 * the revisions' TOAST table (10 GB), and on this 2-core machine that worker beside the timed
 * requests doubled some routes' times (page /projects 1.08 → 2.15 ms with the same buffers). The
 * tables are analysed and their visibility maps set by then, so the planner sees what it would in
 * steady use; what is timed is each request's own cost. The cluster is a throwaway one.
 */
export async function settleAutovacuum(admin: pg.Client, options: { maxWaitMs?: number; pollMs?: number } = {}): Promise<{ waitedMs: number; stopped: string[] }> {
  const maxWaitMs = options.maxWaitMs ?? 60_000;
  const pollMs = options.pollMs ?? 500;
  const started = Date.now();
  await admin.query("ALTER SYSTEM SET autovacuum = off");
  await admin.query("SELECT pg_reload_conf()");
  const stopped = new Set<string>();
  for (;;) {
    const { rows } = await admin.query<{ query: string }>(
      "SELECT query, pg_cancel_backend(pid) FROM pg_stat_activity WHERE backend_type = 'autovacuum worker'",
    );
    for (const r of rows) stopped.add(r.query.replace(/^autovacuum:\s*/, ""));
    if (!rows.length || Date.now() - started > maxWaitMs) break;
    await new Promise((resolve) => setTimeout(resolve, pollMs));
  }
  return { waitedMs: Date.now() - started, stopped: [...stopped] };
}

/** Autovacuum back on (after the timing, and before the next scale grows the data). */
export async function resumeAutovacuum(admin: pg.Client): Promise<void> {
  await admin.query("ALTER SYSTEM RESET autovacuum");
  await admin.query("SELECT pg_reload_conf()");
}
