import fs from "node:fs";
import type pg from "pg";

/**
 * Times requests against a running production build and reads what each cost in the database:
 * pg_stat_statements (reset before each request, summed over the app's role after it) for
 * database time, and auto_explain (switched on for one extra request per route) for the plans.
 */

export interface Route {
  name: string;
  persona: string;
  path: string;
}

/** One statement's share of a route's timed requests (summed over them), for `--statements`. */
export interface StatementShare {
  query: string;
  calls: number;
  planMs: number;
  execMs: number;
  /** Time spent compiling the statement (JIT), included in execMs. */
  jitMs: number;
}

export interface Timing {
  /** Per statement text, summed over the timed requests (read with each request's database time). */
  byStatement?: StatementShare[];
  dbMs: number[];
  httpMs: number[];
  statements: number[];
  status: number;
}

export interface PlanSummary {
  statements: number;
  sharedBuffers: number;
  /** "table (rows)" for every sequential scan of a table holding more than 10,000 rows. */
  bigSeqScans: string[];
  /** The slowest statement's text (first 160 characters) and its time. */
  slowest: string;
}

export function percentile(values: number[], p: number): number {
  if (values.length === 0) return NaN;
  const sorted = [...values].sort((a, b) => a - b);
  return sorted[Math.min(sorted.length - 1, Math.ceil((p / 100) * sorted.length) - 1)];
}

export async function signIn(baseUrl: string, email: string, password: string): Promise<string> {
  const response = await fetch(`${baseUrl}/api/session`, {
    method: "POST", headers: { "content-type": "application/json", origin: baseUrl }, body: JSON.stringify({ email, password }),
  });
  if (!response.ok) throw new Error(`sign-in as ${email} answered ${response.status}: ${await response.text()}`);
  const cookie = response.headers.getSetCookie().map((c) => c.split(";")[0]).join("; ");
  if (!cookie) throw new Error(`sign-in as ${email} set no cookie`);
  return cookie;
}

async function request(baseUrl: string, route: Route, cookies: Record<string, string>): Promise<{ status: number; ms: number }> {
  const started = performance.now();
  const response = await fetch(`${baseUrl}${route.path}`, { headers: { cookie: cookies[route.persona] }, redirect: "manual" });
  await response.arrayBuffer();
  return { status: response.status, ms: performance.now() - started };
}

async function appStatements(admin: pg.Client, appRole: string): Promise<{ ms: number; calls: number; rows: StatementShare[] }> {
  const { rows } = await admin.query(
    `SELECT query, calls, total_plan_time AS plan, total_exec_time AS exec,
            jit_generation_time + jit_inlining_time + jit_optimization_time + jit_emission_time AS jit
     FROM pg_stat_statements WHERE userid = (SELECT oid FROM pg_roles WHERE rolname = $1)`,
    [appRole],
  );
  const shares = rows.map((r) => ({ query: String(r.query), calls: Number(r.calls), planMs: Number(r.plan), execMs: Number(r.exec), jitMs: Number(r.jit) }));
  return { ms: shares.reduce((t, r) => t + r.planMs + r.execMs, 0), calls: shares.reduce((t, r) => t + r.calls, 0), rows: shares };
}

function addShares(into: Map<string, StatementShare>, rows: StatementShare[]): void {
  for (const r of rows) {
    const key = r.query.replace(/\s+/g, " ").trim();
    const had = into.get(key) ?? { query: key, calls: 0, planMs: 0, execMs: 0, jitMs: 0 };
    into.set(key, { query: key, calls: had.calls + r.calls, planMs: had.planMs + r.planMs, execMs: had.execMs + r.execMs, jitMs: had.jitMs + r.jitMs });
  }
}

/** `warmup` untimed requests, then `count` timed ones, each with its own database-time reading. */
export async function timeRoute(a: { baseUrl: string; route: Route; cookies: Record<string, string>; admin: pg.Client; appRole: string; warmup: number; count: number }): Promise<Timing> {
  const timing: Timing = { dbMs: [], httpMs: [], statements: [], status: 0 };
  const shares = new Map<string, StatementShare>();
  for (let i = 0; i < a.warmup; i++) timing.status = (await request(a.baseUrl, a.route, a.cookies)).status;
  for (let i = 0; i < a.count; i++) {
    await a.admin.query("SELECT pg_stat_statements_reset()");
    const { status, ms } = await request(a.baseUrl, a.route, a.cookies);
    const db = await appStatements(a.admin, a.appRole);
    timing.status = status;
    timing.httpMs.push(ms);
    timing.dbMs.push(db.ms);
    timing.statements.push(db.calls);
    addShares(shares, db.rows);
  }
  timing.byStatement = [...shares.values()].sort((x, y) => y.planMs + y.execMs - (x.planMs + x.execMs));
  return timing;
}

interface PlanNode {
  "Node Type": string;
  "Relation Name"?: string;
  "Actual Rows"?: number;
  "Shared Hit Blocks"?: number;
  "Shared Read Blocks"?: number;
  Plans?: PlanNode[];
}

function walk(node: PlanNode, visit: (n: PlanNode) => void): void {
  visit(node);
  for (const child of node.Plans ?? []) walk(child, visit);
}

/** One request with auto_explain on; the plans come from the server's JSON log. */
export async function explainRoute(a: { baseUrl: string; route: Route; cookies: Record<string, string>; admin: pg.Client; appRole: string; logFile: string; tableRows: Map<string, number> }): Promise<PlanSummary> {
  const before = fs.existsSync(a.logFile) ? fs.statSync(a.logFile).size : 0;
  await request(a.baseUrl, a.route, a.cookies);
  // The log collector writes asynchronously.
  await new Promise((r) => setTimeout(r, 300));
  const fd = fs.openSync(a.logFile, "r");
  const size = fs.statSync(a.logFile).size;
  const buffer = Buffer.alloc(size - before);
  fs.readSync(fd, buffer, 0, buffer.length, before);
  fs.closeSync(fd);
  const summary: PlanSummary = { statements: 0, sharedBuffers: 0, bigSeqScans: [], slowest: "" };
  let slowestMs = -1;
  for (const line of buffer.toString("utf8").split("\n")) {
    if (!line.trim()) continue;
    let entry: { user?: string; message?: string };
    try {
      entry = JSON.parse(line);
    } catch {
      continue;
    }
    if (entry.user !== a.appRole || !entry.message?.startsWith("duration:")) continue;
    const ms = Number(/duration: ([\d.]+) ms/.exec(entry.message)?.[1] ?? 0);
    const plan = JSON.parse(entry.message.slice(entry.message.indexOf("{"))) as { "Query Text": string; Plan: PlanNode };
    summary.statements += 1;
    summary.sharedBuffers += (plan.Plan["Shared Hit Blocks"] ?? 0) + (plan.Plan["Shared Read Blocks"] ?? 0);
    if (ms > slowestMs) {
      slowestMs = ms;
      summary.slowest = `${ms.toFixed(2)} ms: ${plan["Query Text"].replace(/\s+/g, " ").slice(0, 160)}`;
    }
    walk(plan.Plan, (n) => {
      if (n["Node Type"] !== "Seq Scan" || !n["Relation Name"]) return;
      const rows = a.tableRows.get(n["Relation Name"]) ?? 0;
      const label = `${n["Relation Name"]} (${rows.toLocaleString("en-US")} rows)`;
      if (rows > 10_000 && !summary.bigSeqScans.includes(label)) summary.bigSeqScans.push(label);
    });
  }
  return summary;
}

export async function tableSizes(admin: pg.Client): Promise<Map<string, number>> {
  const { rows } = await admin.query<{ relname: string; n: string }>(
    "SELECT relname, greatest(reltuples, 0)::bigint AS n FROM pg_class WHERE relkind = 'r' AND relnamespace = 'public'::regnamespace",
  );
  return new Map(rows.map((r) => [r.relname, Number(r.n)]));
}

/** Switches auto_explain on or off for every session (a reload; the app's pooled connections pick it up). */
export async function setAutoExplain(admin: pg.Client, on: boolean): Promise<void> {
  await admin.query(`ALTER SYSTEM SET auto_explain.log_min_duration = ${on ? 0 : -1}`);
  await admin.query("SELECT pg_reload_conf()");
  await new Promise((r) => setTimeout(r, 300));
}
