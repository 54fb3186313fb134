/**
 * `npm run bench:db`: the database cost of every list route and page as the data grows.
 *
 * Makes a throwaway cluster (own folder and port, removed afterwards), migrates and seeds it like
 * `npm test`, builds the app (PIERWISE_DIST_DIR, default .next-bench) and serves it, then grows the
 * data to each scale in turn (tests/bench/grow.ts: ×1 → ×100 → ×1000, additive, so the rows are
 * generated once) and at each scale prints, per route: p50/p95 database time per request
 * (pg_stat_statements over the app's role, planning included), p50/p95 HTTP time, statements per
 * request, and from one auto_explain (ANALYZE, BUFFERS) request the shared buffers touched and every
 * sequential scan of a table over 10,000 rows. Autovacuum is held off (a running worker stopped)
 * while a scale is timed (tests/bench/settle.ts).
 *
 *   npm run bench:db                      ×1, ×100, ×1000, 10 timed requests per route after 8 warm-ups
 *   npm run bench:db -- --scales=1,100    a subset (also --sizes=, or PIERWISE_BENCH_SCALES=1,100)
 *   npm run bench:db -- --requests=30
 *   npm run bench:db -- --warmup=2        untimed requests per route before the timed ones (default 8)
 *   npm run bench:db -- --json=out.json   also write the numbers as JSON
 *   npm run bench:db -- --routes=queue,criteria   only the routes whose name contains one of these
 *   npm run bench:db -- --statements      also print, per route, each statement's planning, run and JIT time
 *   npm run bench:db -- --keep            leave the grown cluster (stopped) in .test-data/bench-<pid>/pg,
 *                                         to try statements against it with EXPLAIN afterwards
 *
 * Not a test: nothing here asserts a time. The targets are in db/README.md.
 */
import { spawn, type ChildProcess } from "node:child_process";
import crypto from "node:crypto";
import fs from "node:fs";
import path from "node:path";
import { fileURLToPath } from "node:url";
import knex from "knex";
import pg from "pg";
import knexConfig from "../../knexfile";
import { appEnvironment } from "../../db/lib/app-env";
import { buildApp, buildIsStale } from "../../db/lib/build";
import { freePort } from "../../db/lib/ports";
import { ensureCluster, findServerBinaries, psql, startServer, stopServer, type Cluster } from "../../db/lib/postgres";
import { ensureDatabaseRoles } from "../../db/lib/database-roles";
import { startStandIns, type StandIns } from "../../db/lib/stand-ins";
import { waitForHttp } from "../support/runner";
import { BIG_DESIGN_ID_SQL, DEMO_ORG_ID, DEMO_PROJECT_ID, grow, prepare, tableCounts } from "./grow";
import { resumeAutovacuum, settleAutovacuum } from "./settle";
import { explainRoute, percentile, setAutoExplain, signIn, tableSizes, timeRoute, type PlanSummary, type Route, type Timing } from "./measure";

const root = fileURLToPath(new URL("../..", import.meta.url));
const workDir = path.join(root, ".test-data", `bench-${process.pid}`);
const arg = (name: string) => process.argv.find((a) => a.startsWith(`--${name}=`))?.split("=")[1];
const scales = (arg("scales") ?? arg("sizes") ?? process.env.PIERWISE_BENCH_SCALES ?? "1,100,1000").split(",").map(Number).filter((n) => n > 0).sort((a, b) => a - b);
const requests = Number(arg("requests") ?? 10);
// Untimed requests per route first. A page reads over several pooled connections at once (the
// design page up to eight), and each connection plans its first statement on a table with cold
// catalog caches (≈ 1 ms against ≈ 0.2 ms warm, more after the grow step rebuilt the indexes):
// eight warm-ups let every connection meet the route's statements, so what is timed is steady use.
const warmups = Number(arg("warmup") ?? 8);
const jsonOut = arg("json");
const routeFilter = arg("routes")?.split(",").filter(Boolean);
const keep = process.argv.includes("--keep");
const statementDetail = process.argv.includes("--statements");
const APP_ROLE = "pierwise_bench";
const PASSWORD = "pierwise-demo";

let cluster: Cluster | undefined;
let standIns: StandIns | undefined;
let server: ChildProcess | undefined;

const personas: Record<string, string> = {
  admin: "admin@demo.pierwise.test",
  designer: "designer@demo.pierwise.test",
  engineer: "engineer@demo.pierwise.test",
  installer: "installer@demo.pierwise.test",
  outside: "engineer@outside.pierwise.test",
};

/** Every list route and page, as the demo organisation's people use them. */
function routes(bigDesignId: string, auditLastPage: number, projectsMidPage: number): Route[] {
  const design = `/projects/${DEMO_PROJECT_ID}/designs/${bigDesignId}`;
  return [
    { name: "page /projects", persona: "designer", path: "/projects" },
    { name: "page /projects?q=meadow", persona: "designer", path: "/projects?q=meadow" },
    { name: "page /projects?sort=designCount", persona: "designer", path: "/projects?sort=designCount&dir=desc" },
    { name: `page /projects?page=${projectsMidPage}`, persona: "designer", path: `/projects?page=${projectsMidPage}` },
    { name: "page /projects/:id (designs, files)", persona: "designer", path: `/projects/${DEMO_PROJECT_ID}` },
    { name: "page design (revisions)", persona: "designer", path: design },
    { name: "page design ?r_sort=depthIn", persona: "designer", path: `${design}?r_sort=depthIn&r_dir=desc` },
    { name: "page /reviews (engineer)", persona: "engineer", path: "/reviews" },
    { name: "page /reviews (designer)", persona: "designer", path: "/reviews" },
    { name: "page /queue (engineer)", persona: "engineer", path: "/queue" },
    { name: "page /queue?state=waiting (engineer)", persona: "engineer", path: "/queue?state=waiting" },
    { name: "page /queue (outside engineer)", persona: "outside", path: "/queue" },
    { name: "page /field", persona: "installer", path: "/field" },
    { name: "page /admin/audit", persona: "admin", path: "/admin/audit" },
    // Keyset paging asks for the oldest page by name; offset paging (before issue 19) by number.
    { name: "page /admin/audit last page", persona: "admin", path: `/admin/audit?oldest=1&page=${auditLastPage}` },
    { name: "page /admin/members", persona: "admin", path: "/admin/members" },
    { name: "page /criteria", persona: "designer", path: "/criteria" },
    { name: "GET /api/projects", persona: "designer", path: "/api/projects" },
    { name: "GET /api/projects?q=meadow", persona: "designer", path: "/api/projects?q=meadow" },
    { name: "GET /api/projects?q=juniper county", persona: "designer", path: "/api/projects?q=generated%20county%207" },
    { name: "GET /api/projects?sort=designCount", persona: "designer", path: "/api/projects?sort=designCount&dir=desc" },
    { name: "GET /api/projects?sort=jurisdiction", persona: "designer", path: "/api/projects?sort=jurisdiction" },
    { name: `GET /api/projects?page=${projectsMidPage}`, persona: "designer", path: `/api/projects?page=${projectsMidPage}` },
    { name: "GET /api/projects/:id/designs", persona: "designer", path: `/api/projects/${DEMO_PROJECT_ID}/designs` },
    { name: "GET /api/projects/:id/files", persona: "designer", path: `/api/projects/${DEMO_PROJECT_ID}/files` },
    { name: "GET /api/designs/:id", persona: "designer", path: `/api/designs/${bigDesignId}` },
    { name: "GET /api/designs/:id?sort=depthIn", persona: "designer", path: `/api/designs/${bigDesignId}?sort=depthIn&dir=desc` },
    { name: "GET /api/designs/:id?page=20", persona: "designer", path: `/api/designs/${bigDesignId}?page=20` },
  ];
}

interface ScaleResult {
  scale: number;
  counts: Record<string, number>;
  databaseMb: number;
  revisionsMb: number;
  routes: { route: Route; timing: Timing; plans: PlanSummary }[];
}

const f = (n: number) => (Number.isNaN(n) ? "–" : n < 10 ? n.toFixed(2) : n.toFixed(1));

function printScale(r: ScaleResult): void {
  console.log(`\n## ×${r.scale}: ${Object.entries(r.counts).filter(([t]) => ["projects", "designs", "revisions", "reviews", "audit_events"].includes(t)).map(([t, n]) => `${n.toLocaleString("en-US")} ${t}`).join(", ")}; database ${r.databaseMb} MB (revisions with TOAST and indexes ${r.revisionsMb} MB)`);
  console.log("| route | DB ms p50 | DB ms p95 | HTTP ms p50 | HTTP ms p95 | statements | buffers | seq scans of tables > 10,000 rows |");
  console.log("|---|---:|---:|---:|---:|---:|---:|---|");
  for (const { route, timing, plans } of r.routes) {
    const status = timing.status === 200 ? "" : ` (HTTP ${timing.status})`;
    console.log(`| ${route.name}${status} | ${f(percentile(timing.dbMs, 50))} | ${f(percentile(timing.dbMs, 95))} | ${f(percentile(timing.httpMs, 50))} | ${f(percentile(timing.httpMs, 95))} | ${percentile(timing.statements, 50)} | ${plans.sharedBuffers} | ${plans.bigSeqScans.join(", ") || "none"} |`);
  }
  const slow = [...r.routes].sort((a, b) => percentile(b.timing.dbMs, 50) - percentile(a.timing.dbMs, 50)).slice(0, 3);
  for (const s of slow) console.log(`  slowest statement of ${s.route.name}: ${s.plans.slowest}`);
  if (!statementDetail) return;
  // Where each route's database time went, per statement, averaged over its timed requests.
  for (const { route, timing } of r.routes) {
    const n = timing.dbMs.length || 1;
    console.log(`  ${route.name}, per request:`);
    for (const s of (timing.byStatement ?? []).slice(0, 6)) {
      console.log(`    plan ${f(s.planMs / n)} + run ${f(s.execMs / n)} ms${s.jitMs ? ` (JIT ${f(s.jitMs / n)})` : ""} × ${(s.calls / n).toFixed(1)}: ${s.query.slice(0, 120)}`);
    }
  }
}

function printGrowth(results: ScaleResult[]): void {
  if (results.length < 2) return;
  const [a, b] = results.slice(-2);
  console.log(`\n## Growth ×${a.scale} → ×${b.scale} (DB p50 ratio; target ≤ 1.5)`);
  for (let i = 0; i < b.routes.length; i++) {
    const before = percentile(a.routes[i].timing.dbMs, 50);
    const after = percentile(b.routes[i].timing.dbMs, 50);
    console.log(`  ${b.routes[i].route.name}: ${f(before)} → ${f(after)} ms (${(after / before).toFixed(2)}×)`);
  }
}

async function main(): Promise<void> {
  const startedAt = Date.now();
  const elapsed = () => `${((Date.now() - startedAt) / 1000).toFixed(0)} s`;
  fs.mkdirSync(workDir, { recursive: true });
  const { binDir, version } = findServerBinaries({ installIfMissing: true });
  cluster = { binDir, version, dataDir: path.join(workDir, "pg"), port: await freePort() };
  ensureCluster(cluster, { throwaway: true });
  startServer(cluster, { throwaway: true });
  // pg_stat_statements and auto_explain must be preloaded; plans go to a JSON log we can parse.
  // (The libraries' own settings are known only once they are loaded, hence two rounds.)
  for (const setting of ["shared_preload_libraries = pg_stat_statements, auto_explain", "logging_collector = on", "log_destination = 'jsonlog'", "log_filename = 'bench.log'",
    // Fewer checkpoints while gigabytes of generated rows go in.
    "max_wal_size = '8GB'", "checkpoint_timeout = '30min'"]) {
    psql(cluster, `ALTER SYSTEM SET ${setting}`);
  }
  stopServer(cluster);
  startServer(cluster, { throwaway: true });
  for (const setting of [
    "pg_stat_statements.track_planning = on", "auto_explain.log_min_duration = -1", "auto_explain.log_analyze = on",
    "auto_explain.log_buffers = on", "auto_explain.log_format = 'json'", "auto_explain.log_nested_statements = on",
  ]) psql(cluster, `ALTER SYSTEM SET ${setting}`);
  psql(cluster, "SELECT pg_reload_conf()");
  const roles = ensureDatabaseRoles(cluster, {
    appRole: APP_ROLE, appPassword: crypto.randomBytes(12).toString("hex"), ownerPassword: crypto.randomBytes(12).toString("hex"), database: "pierwise_bench",
  });
  const databaseUrl = roles.appUrl;
  psql(cluster, "CREATE EXTENSION pg_stat_statements", "pierwise_bench");
  const logFile = path.join(cluster.dataDir, "log", "bench.json");

  const migrator = knex({ ...knexConfig, connection: roles.ownerUrl });
  await migrator.migrate.latest();
  await migrator.seed.run();
  await migrator.destroy();

  const superuser = async () => {
    const client = new pg.Client({ host: cluster!.dataDir, port: cluster!.port, user: "postgres", database: "pierwise_bench" });
    await client.connect();
    return client;
  };
  const admin = await superuser();
  // A second connection shares the generation (a bulk load: triggers off, indexes rebuilt after; grow.ts).
  const loader = await superuser();
  await prepare(admin);
  const bigDesignId = (await admin.query(`SELECT ${BIG_DESIGN_ID_SQL} AS id`)).rows[0].id as string;
  console.log(`bench:db: cluster, migrations and seed ready (${elapsed()})`);

  const distDir = process.env.PIERWISE_DIST_DIR ?? ".next-bench";
  const ports = { smtp: await freePort(), mailWeb: await freePort(), s3: await freePort(), app: await freePort() };
  standIns = await startStandIns({ smtpPort: ports.smtp, mailWebPort: ports.mailWeb, s3Port: ports.s3, s3Directory: path.join(workDir, "files"), bucket: "pierwise-bench" });
  const env: NodeJS.ProcessEnv = {
    ...process.env,
    ...appEnvironment({ databaseUrl, sessionSecret: crypto.randomBytes(32).toString("hex"), appPort: ports.app, smtpPort: ports.smtp, mailWebPort: ports.mailWeb, s3Port: ports.s3, bucket: "pierwise-bench" }),
    NODE_ENV: "production", PIERWISE_DIST_DIR: distDir,
  };
  if (buildIsStale(root, distDir)) buildApp(root, env);
  server = spawn(path.join(root, "node_modules/.bin/next"), ["start", "-H", "127.0.0.1", "-p", String(ports.app)], { cwd: root, env, stdio: ["ignore", "ignore", "inherit"] });
  const baseUrl = `http://127.0.0.1:${ports.app}`;
  await waitForHttp(`${baseUrl}/api/health`, 120_000);
  const cookies: Record<string, string> = {};
  for (const [persona, email] of Object.entries(personas)) cookies[persona] = await signIn(baseUrl, email, PASSWORD);
  console.log(`bench:db: app built and serving (${elapsed()})`);

  const results: ScaleResult[] = [];
  let units = 0;
  for (const scale of scales) {
    await grow(admin, units, scale, { bulk: { extra: [loader] } });
    units = scale;
    const counts = await tableCounts(admin);
    console.log(`bench:db: grown to ×${scale} (${elapsed()})`);
    const sizes = (await admin.query("SELECT pg_database_size(current_database()) / 1048576 AS db, pg_total_relation_size('revisions') / 1048576 AS rev")).rows[0];
    const auditEvents = Number((await admin.query("SELECT count(*) AS n FROM audit_events WHERE organisation_id = $1", [DEMO_ORG_ID])).rows[0].n);
    const demoProjects = Number((await admin.query("SELECT count(*) AS n FROM projects WHERE organisation_id = $1", [DEMO_ORG_ID])).rows[0].n);
    const list = routes(bigDesignId, Math.max(1, Math.ceil(auditEvents / 25)), Math.max(1, Math.ceil(demoProjects / 20 / 2)))
      .filter((r) => !routeFilter || routeFilter.some((part) => r.name.includes(part)));
    const tableRows = await tableSizes(admin);
    const settled = await settleAutovacuum(admin);
    if (settled.stopped.length) console.log(`bench:db: stopped autovacuum (${settled.stopped.join("; ")}) in ${(settled.waitedMs / 1000).toFixed(1)} s; off while timing`);
    const measured: ScaleResult["routes"] = [];
    for (const route of list) {
      const timing = await timeRoute({ baseUrl, route, cookies, admin, appRole: APP_ROLE, warmup: warmups, count: requests });
      measured.push({ route, timing, plans: { statements: 0, sharedBuffers: 0, bigSeqScans: [], slowest: "" } });
    }
    await setAutoExplain(admin, true);
    for (const m of measured) m.plans = await explainRoute({ baseUrl, route: m.route, cookies, admin, appRole: APP_ROLE, logFile, tableRows });
    await setAutoExplain(admin, false);
    await resumeAutovacuum(admin);
    const result: ScaleResult = { scale, counts, databaseMb: Number(sizes.db), revisionsMb: Number(sizes.rev), routes: measured };
    results.push(result);
    printScale(result);
    console.log(`bench:db: ×${scale} measured (${elapsed()})`);
  }
  printGrowth(results);
  if (jsonOut) fs.writeFileSync(jsonOut, JSON.stringify(results, null, 2));
  await admin.end();
  await loader.end();
  console.log(`\nbench:db: done in ${elapsed()}`);
}

async function cleanUp(): Promise<void> {
  server?.kill("SIGTERM");
  await standIns?.stop();
  try {
    if (cluster) stopServer(cluster, keep ? "fast" : "immediate");
  } catch (error) {
    console.error(String(error));
  }
  if (keep && cluster) console.log(`bench:db: cluster kept (stopped) in ${cluster.dataDir}, port ${cluster.port}`);
  else fs.rmSync(workDir, { recursive: true, force: true });
}

process.on("SIGINT", () => void cleanUp().then(() => process.exit(130)));

main()
  .then(async () => {
    await cleanUp();
    process.exit(0);
  })
  .catch(async (error) => {
    console.error("bench:db failed:", error);
    await cleanUp();
    process.exit(1);
  });
