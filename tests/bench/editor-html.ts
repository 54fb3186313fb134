/**
 * `npm run bench:editor-html`: how soon the design editor's HTML answers, signed in as the demo
 * designer — time to the response head, to the first body bytes, to the end of `<head>` (the
 * script tags that let the browser fetch the editor's and the 3D scene's chunks) and to the
 * complete HTML, p50/p95 over sequential requests after a warm-up — and how many SQL statements one
 * editor request runs (pg_stat_statements on a throwaway PostgreSQL with the demo data).
 * A benchmark, not a test: it asserts nothing. The machine is shared: the load average is printed
 * with each figure.
 *
 * Options (environment): EDITOR_HTML_BUILDS="after=.next-r3fsrv,before=.next-old" (label=dist dir,
 * each a build under the repository root; several are served side by side on the same database and
 * their requests interleaved; default PIERWISE_DIST_DIR or .next), EDITOR_HTML_REQUESTS (default 50),
 * EDITOR_HTML_WARMUP (default 10), EDITOR_HTML_PATH_SUFFIX (e.g. "?revision=<id>", default none),
 * EDITOR_HTML_BROWSER_LOADS (default 6: editor loads per build in headless Chromium with WebGL, as
 * bench:web loads it, reporting where the time to the HTML goes by the navigation's own timing —
 * before the request left the browser, waiting for the answer, receiving it — and when the 3D
 * scene's chunk was requested and received; 0 to skip), EDITOR_HTML_SETTLE_MS (default 0: open a
 * blank page and wait this long before each timed navigation).
 * Build first (`PIERWISE_DIST_DIR=… npx next build`); this script does not build.
 */
import { spawn, type ChildProcess } from "node:child_process";
import crypto from "node:crypto";
import fs from "node:fs";
import http from "node:http";
import os from "node:os";
import path from "node:path";
import { fileURLToPath } from "node:url";
import knex from "knex";
import { chromium } from "playwright-core";
import knexConfig from "../../knexfile";
import { appEnvironment } from "../../db/lib/app-env";
import { freePort } from "../../db/lib/ports";
import { ensureCluster, findServerBinaries, psql, startServer, type Cluster } from "../../db/lib/postgres";
import { ensureDatabaseRoles } from "../../db/lib/database-roles";
import { startStandIns, type StandIns } from "../../db/lib/stand-ins";
import { DEMO_PROJECT_ID } from "../../db/seeds/02_demo_projects";
import { CHROMIUM_ARGS } from "../support/browser";
import { ensureChromium, waitForHttp } from "../support/runner";
import { runBench, stopBench } from "./bench-run";
import { percentile } from "./web-http";

const root = fileURLToPath(new URL("../..", import.meta.url));
const workDir = path.join(root, ".test-data", `bench-editor-html-${process.pid}`);
const REQUESTS = Number(process.env.EDITOR_HTML_REQUESTS ?? 50);
const WARMUP = Number(process.env.EDITOR_HTML_WARMUP ?? 10);
const DATABASE = "pierwise_bench";
const builds = (process.env.EDITOR_HTML_BUILDS ?? `after=${process.env.PIERWISE_DIST_DIR ?? ".next"}`).split(",").map((pair) => {
  const [label, dir] = pair.includes("=") ? pair.split("=") : [pair, pair];
  return { label, dir };
});

let cluster: Cluster | undefined;
let standIns: StandIns | undefined;
const servers: ChildProcess[] = [];

interface Timing {
  headMs: number; // status line and headers received
  firstByteMs: number; // first body bytes
  headEndMs: number; // `</head>` received (the chunks' script tags)
  completeMs: number; // whole HTML
  status: number;
  bytes: number;
  chunks: [ms: number, bytes: number][];
  html: string;
}

/** One GET, timed from the request's start with a fresh connection (as a navigation would open). */
function timedGet(url: string, cookie: string): Promise<Timing> {
  return new Promise((resolve, reject) => {
    const t0 = performance.now();
    const target = new URL(url);
    const req = http.get({ host: target.hostname, port: target.port, path: target.pathname + target.search, agent: false, headers: { cookie, accept: "text/html" } }, (res) => {
      const headMs = performance.now() - t0;
      let firstByteMs = NaN;
      let headEndMs = NaN;
      let text = "";
      const chunks: [number, number][] = [];
      res.setEncoding("utf8");
      res.on("data", (chunk: string) => {
        const now = performance.now() - t0;
        chunks.push([now, Buffer.byteLength(chunk)]);
        if (Number.isNaN(firstByteMs)) firstByteMs = now;
        text += chunk;
        if (Number.isNaN(headEndMs) && text.includes("</head>")) headEndMs = now;
      });
      res.on("end", () => resolve({ headMs, firstByteMs, headEndMs, completeMs: performance.now() - t0, status: res.statusCode ?? 0, bytes: Buffer.byteLength(text), chunks, html: text }));
      res.on("error", reject);
    });
    req.on("error", reject);
  });
}

async function signIn(base: string, email: string): Promise<string> {
  const response = await fetch(`${base}/api/session`, { method: "POST", headers: { "content-type": "application/json" }, body: JSON.stringify({ email, password: "pierwise-demo" }) });
  if (!response.ok) throw new Error(`sign-in as ${email}: ${response.status}`);
  return (response.headers.get("set-cookie") ?? "").split(";")[0];
}

const load = () => os.loadavg().map((l) => l.toFixed(2)).join(" ");
const f = (n: number, d = 0) => (Number.isFinite(n) ? n.toFixed(d) : "—");

/** SQL statements run since the last reset (the app's role only; this script's own queries excluded). */
function statementsSinceReset(): { calls: number; byQuery: { calls: number; query: string }[] } {
  const rows = psql(cluster!, `SELECT s.calls || E'\\t' || regexp_replace(left(s.query, 140), '\\s+', ' ', 'g') FROM pg_stat_statements s JOIN pg_roles r ON r.oid = s.userid WHERE r.rolname = 'pierwise_bench' ORDER BY s.calls DESC`, DATABASE);
  const byQuery = rows ? rows.split("\n").map((line) => ({ calls: Number(line.split("\t")[0]), query: line.split("\t").slice(1).join("\t") })) : [];
  return { calls: byQuery.reduce((a, q) => a + q.calls, 0), byQuery };
}

async function main(): Promise<void> {
  fs.mkdirSync(workDir, { recursive: true });
  const { binDir, version } = findServerBinaries({ installIfMissing: true });
  cluster = { binDir, version, dataDir: path.join(workDir, "pg"), port: await freePort() };
  ensureCluster(cluster, { throwaway: true });
  // Statement counts: pg_stat_statements must be preloaded (a throwaway cluster, so its own config).
  fs.appendFileSync(path.join(cluster.dataDir, "postgresql.conf"), "\nshared_preload_libraries = 'pg_stat_statements'\npg_stat_statements.track = 'all'\n");
  startServer(cluster, { throwaway: true });
  const roles = ensureDatabaseRoles(cluster, {
    appRole: "pierwise_bench", appPassword: crypto.randomBytes(12).toString("hex"), ownerPassword: crypto.randomBytes(12).toString("hex"), database: DATABASE,
  });
  const migrator = knex({ ...knexConfig, connection: roles.ownerUrl });
  await migrator.migrate.latest();
  await migrator.seed.run();
  await migrator.destroy();
  psql(cluster, "CREATE EXTENSION IF NOT EXISTS pg_stat_statements", DATABASE);

  const ports = { smtp: await freePort(), mailWeb: await freePort(), s3: await freePort() };
  standIns = await startStandIns({ smtpPort: ports.smtp, mailWebPort: ports.mailWeb, s3Port: ports.s3, s3Directory: path.join(workDir, "files"), bucket: "pierwise-bench" });
  const served: { label: string; base: string }[] = [];
  for (const b of builds) {
    const port = await freePort();
    const env = {
      ...process.env,
      ...appEnvironment({ databaseUrl: roles.appUrl, sessionSecret: "x".repeat(64), appPort: port, smtpPort: ports.smtp, mailWebPort: ports.mailWeb, s3Port: ports.s3, bucket: "pierwise-bench" }),
      NODE_ENV: "production" as const,
      PIERWISE_DIST_DIR: b.dir,
    };
    servers.push(spawn(path.join(root, "node_modules/.bin/next"), ["start", "-H", "127.0.0.1", "-p", String(port)], { cwd: root, env, stdio: ["ignore", "ignore", "inherit"] }));
    served.push({ label: b.label, base: `http://127.0.0.1:${port}` });
  }
  for (const s of served) await waitForHttp(`${s.base}/api/health`, 60_000);

  const cookie = await signIn(served[0].base, "designer@demo.pierwise.test");
  const designs = (await (await fetch(`${served[0].base}/api/projects/${DEMO_PROJECT_ID}/designs`, { headers: { cookie } })).json()) as { rows: { id: string; name: string }[] };
  const design = designs.rows.find((d) => d.name === "12-module array on two posts") ?? designs.rows[0];
  const editorPath = `/projects/${DEMO_PROJECT_ID}/designs/${design.id}${process.env.EDITOR_HTML_PATH_SUFFIX ?? ""}`;

  // Statements per request, one build at a time (pg_stat_statements counts every statement of the app's role).
  const statements = new Map<string, { perRequest: number; byQuery: { calls: number; query: string }[] }>();
  for (const s of served) {
    for (let i = 0; i < 3; i++) await timedGet(s.base + editorPath, cookie);
    psql(cluster, "SELECT pg_stat_statements_reset()", DATABASE);
    const n = 10;
    for (let i = 0; i < n; i++) await timedGet(s.base + editorPath, cookie);
    const counted = statementsSinceReset();
    statements.set(s.label, { perRequest: counted.calls / n, byQuery: counted.byQuery.map((q) => ({ calls: q.calls / n, query: q.query })) });
  }

  for (let i = 0; i < WARMUP; i++) for (const s of served) await timedGet(s.base + editorPath, cookie);
  const loadBefore = load();
  const timings = new Map<string, Timing[]>(served.map((s) => [s.label, []]));
  // Interleaved, sequential: one request to each build in turn, the order alternating.
  for (let i = 0; i < REQUESTS; i++) {
    const order = i % 2 === 0 ? served : [...served].reverse();
    for (const s of order) timings.get(s.label)!.push(await timedGet(s.base + editorPath, cookie));
  }
  const loadAfter = load();

  // In the browser, as bench:web loads the editor: a fresh signed-in context per load, interleaved.
  const BROWSER_LOADS = Number(process.env.EDITOR_HTML_BROWSER_LOADS ?? 6);
  const SETTLE_MS = Number(process.env.EDITOR_HTML_SETTLE_MS ?? 0);
  type Nav = { requestStart: number; responseStart: number; responseEnd: number; sceneRequested: number; sceneReceived: number; firstScriptRequested: number };
  const navs = new Map<string, Nav[]>(served.map((s) => [s.label, []]));
  let browserLoad = "";
  if (BROWSER_LOADS > 0) {
    ensureChromium();
    const browser = await chromium.launch({ executablePath: "/usr/bin/chromium", headless: true, args: CHROMIUM_ARGS });
    const loadBefore = load();
    for (let i = 0; i < BROWSER_LOADS; i++) {
      for (const s of i % 2 === 0 ? served : [...served].reverse()) {
        const context = await browser.newContext({ viewport: { width: 1280, height: 900 }, baseURL: s.base });
        await context.request.post("/api/session", { data: { email: "designer@demo.pierwise.test", password: "pierwise-demo" } });
        const page = await context.newPage();
        // EDITOR_HTML_SETTLE_MS: open a blank page and wait this long first, so the new tab's own
        // start-up work (the browser's, on the same cores) is over before the navigation is timed.
        if (SETTLE_MS > 0) {
          await page.goto("about:blank");
          await page.waitForTimeout(SETTLE_MS);
        }
        await page.goto(s.base + editorPath, { waitUntil: "load" });
        await page.waitForTimeout(1500);
        navs.get(s.label)!.push(await page.evaluate(() => {
          const nav = performance.getEntriesByType("navigation")[0] as PerformanceNavigationTiming;
          const scripts = (performance.getEntriesByType("resource") as PerformanceResourceTiming[]).filter((e) => /\.js(\?|$)/.test(e.name));
          const scene = [...scripts].sort((a, b) => b.decodedBodySize - a.decodedBodySize)[0];
          return {
            requestStart: nav.requestStart, responseStart: nav.responseStart, responseEnd: nav.responseEnd,
            sceneRequested: scene?.startTime ?? NaN, sceneReceived: scene?.responseEnd ?? NaN, firstScriptRequested: Math.min(...scripts.map((e) => e.startTime)),
          };
        }));
        await context.close();
      }
    }
    browserLoad = `${loadBefore} → ${load()}`;
    await browser.close();
  }

  const lines: string[] = [];
  const out = (line = "") => lines.push(line);
  out(`bench:editor-html — ${new Date().toISOString()} · ${os.cpus().length} cores · load average ${loadBefore} → ${loadAfter}`);
  out(`GET ${editorPath.replace(design.id, "<design>")} as the demo designer, ${REQUESTS} sequential requests per build, interleaved, after ${WARMUP} warm-up`);
  out();
  out(`  ${"build".padEnd(10)}${"status".padStart(7)}${"head p50/p95".padStart(16)}${"1st byte p50/p95".padStart(19)}${"</head> p50/p95".padStart(18)}${"complete p50/p95".padStart(19)}${"kB".padStart(7)}${"SQL/req".padStart(9)}`);
  for (const s of served) {
    const t = timings.get(s.label)!;
    const pp = (get: (x: Timing) => number) => `${f(percentile(t.map(get), 50), 1)}/${f(percentile(t.map(get), 95), 1)}`;
    const statuses = [...new Set(t.map((x) => x.status))].join(",");
    out(`  ${s.label.padEnd(10)}${statuses.padStart(7)}${pp((x) => x.headMs).padStart(16)}${pp((x) => x.firstByteMs).padStart(19)}${pp((x) => x.headEndMs).padStart(18)}${pp((x) => x.completeMs).padStart(19)}${f(t[0].bytes / 1024, 1).padStart(7)}${f(statements.get(s.label)!.perRequest, 1).padStart(9)}`);
  }
  for (const s of served) {
    out();
    out(`  statements per editor request, ${s.label}:`);
    for (const q of statements.get(s.label)!.byQuery) out(`    ${f(q.calls, 1).padStart(5)}  ${q.query}`);
  }
  if (BROWSER_LOADS > 0) {
    out();
    out(`In Chromium (WebGL by software), ${BROWSER_LOADS} loads per build, interleaved${SETTLE_MS ? `, each after a blank page and ${SETTLE_MS} ms` : ""}, load average ${browserLoad}; ms after navigation start, median (min–max):`);
    const cols: [string, (n: Nav) => number][] = [
      ["request sent", (n) => n.requestStart], ["answer starts", (n) => n.responseStart], ["HTML received", (n) => n.responseEnd],
      ["server's part", (n) => n.responseStart - n.requestStart], ["first script requested", (n) => n.firstScriptRequested],
      ["scene chunk requested", (n) => n.sceneRequested], ["scene chunk received", (n) => n.sceneReceived],
    ];
    for (const s of served) {
      const xs = navs.get(s.label)!;
      out(`  ${s.label}:`);
      for (const [name, get] of cols) {
        const v = xs.map(get);
        out(`    ${name.padEnd(24)}${f(percentile(v, 50)).padStart(6)} (${f(Math.min(...v))}–${f(Math.max(...v))})   ${v.map((x) => f(x)).join(" ")}`);
      }
    }
  }
  // EDITOR_HTML_DUMP=folder: each build's last HTML, and when its parts arrived (ms: bytes).
  if (process.env.EDITOR_HTML_DUMP) {
    fs.mkdirSync(process.env.EDITOR_HTML_DUMP, { recursive: true });
    for (const s of served) {
      const last = timings.get(s.label)!.at(-1)!;
      fs.writeFileSync(path.join(process.env.EDITOR_HTML_DUMP, `${s.label}.html`), last.html);
      out(`  ${s.label}, last request's parts (ms: bytes): ${last.chunks.map(([ms, b]) => `${ms.toFixed(1)}: ${b}`).join(", ")}`);
    }
  }
  console.log("\n" + lines.join("\n"));
}

async function cleanUp(): Promise<void> {
  await stopBench({ servers, standIns, cluster, workDir });
}

runBench("bench:editor-html", main, cleanUp);
