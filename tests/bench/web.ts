/**
 * `npm run bench:web`: builds the app (into .next-bench, with the benchmark-only empty route),
 * serves it against a throwaway PostgreSQL seeded with the demo data and the mail/file stand-ins,
 * and prints, in one run: first-load JS per main route (gzip -9 kB and × the sign-in page), the
 * editor's keystroke → result and → paint medians, 3D first draw, main-thread blocking during the
 * editor's load, shader programs, and POST /api/calc against an empty handler (req/s, p50, p99),
 * the two load runs interleaved. A benchmark, not a test: it asserts nothing; targets are printed
 * beside the figures. The machine is shared, so run it when it is quiet and repeat when noisy.
 *
 * Options (environment): BENCH_KEYSTROKES (default 16), BENCH_HTTP_SECONDS (per round, default 3),
 * BENCH_ROUNDS (default 3), BENCH_EDITOR_RUNS (default 2), PIERWISE_BENCH_DIST_DIR (default .next-bench),
 * BENCH_SKIP_BUILD=1 (serve the build already in that folder, e.g. a copy of an earlier build to compare),
 * BENCH_ONLY=editor or http (only the editor figures, or only the handlers), BENCH_PROFILE=1 (add a CPU profile of one more editor
 * load and typing: what runs on the main thread, by script and by function),
 * BENCH_BEFORE_DIST_DIR=.next-old (a copy of an earlier bench build: served beside this one on the
 * same database, every figure measured for both, runs interleaved, so a before/after comparison
 * shares the machine's conditions).
 */
import { spawn, type ChildProcess } from "node:child_process";
import crypto from "node:crypto";
import fs from "node:fs";
import os from "node:os";
import path from "node:path";
import { fileURLToPath } from "node:url";
import knex from "knex";
import { chromium, type Browser, type BrowserContext } from "playwright-core";
import knexConfig from "../../knexfile";
import { appEnvironment } from "../../db/lib/app-env";
import { buildApp, buildIsStale } from "../../db/lib/build";
import { freePort } from "../../db/lib/ports";
import { ensureCluster, findServerBinaries, startServer, type Cluster } from "../../db/lib/postgres";
import { ensureDatabaseRoles } from "../../db/lib/database-roles";
import { startStandIns, type StandIns } from "../../db/lib/stand-ins";
import { DEMO_PROJECT_ID } from "../../db/seeds/02_demo_projects";
import { defaultDesignInput } from "../../engine";
import { CHROMIUM_ARGS } from "../support/browser";
import { ensureChromium, waitForHttp } from "../support/runner";
import { runBench, stopBench } from "./bench-run";
import { routeWeights } from "./web-bundles";
import { measureEditor, type EditorFigures } from "./web-editor";
import { load, median, percentile, type LoadResult } from "./web-http";
import { profileEditor, profileLines } from "./web-profile";

const root = fileURLToPath(new URL("../..", import.meta.url));
const workDir = path.join(root, ".test-data", `bench-web-${process.pid}`);
const distDir = process.env.PIERWISE_BENCH_DIST_DIR ?? ".next-bench";
const KEYSTROKES = Number(process.env.BENCH_KEYSTROKES ?? 16);
const HTTP_SECONDS = Number(process.env.BENCH_HTTP_SECONDS ?? 3);
const ROUNDS = Number(process.env.BENCH_ROUNDS ?? 3);
const EDITOR_RUNS = Number(process.env.BENCH_EDITOR_RUNS ?? 2);
const ONLY_EDITOR = process.env.BENCH_ONLY === "editor";
const ONLY_HTTP = process.env.BENCH_ONLY === "http";
const PROFILE = process.env.BENCH_PROFILE === "1";
const DESIGNER = "designer@demo.pierwise.test";
const ADMIN = "admin@demo.pierwise.test";

let cluster: Cluster | undefined;
let standIns: StandIns | undefined;
const servers: ChildProcess[] = [];
const BEFORE_DIST_DIR = process.env.BENCH_BEFORE_DIST_DIR;
const browsers: Browser[] = [];

async function signIn(base: string, email: string): Promise<string> {
  const response = await fetch(`${base}/api/session`, { method: "POST", headers: { "content-type": "application/json" }, body: JSON.stringify({ email, password: "pierwise-demo" }) });
  if (!response.ok) throw new Error(`sign-in as ${email}: ${response.status}`);
  return (response.headers.get("set-cookie") ?? "").split(";")[0];
}

async function contextFor(browser: Browser, base: string, as: string | null): Promise<BrowserContext> {
  const context = await browser.newContext({ viewport: { width: 1280, height: 900 }, baseURL: base });
  if (as) {
    const r = await context.request.post("/api/session", { data: { email: as, password: "pierwise-demo" } });
    if (!r.ok()) throw new Error(`sign-in as ${as}: ${r.status()}`);
  }
  return context;
}

const f = (n: number | null, d = 0) => (n === null || !Number.isFinite(n) ? "—" : n.toFixed(d));
const pad = (s: string, n: number) => s.padEnd(n);
const lpad = (s: string, n: number) => s.padStart(n);

async function main(): Promise<void> {
  fs.mkdirSync(workDir, { recursive: true });
  const { binDir, version } = findServerBinaries({ installIfMissing: true });
  cluster = { binDir, version, dataDir: path.join(workDir, "pg"), port: await freePort() };
  ensureCluster(cluster, { throwaway: true });
  startServer(cluster, { throwaway: true });
  const roles = ensureDatabaseRoles(cluster, {
    appRole: "pierwise_bench", appPassword: crypto.randomBytes(12).toString("hex"), ownerPassword: crypto.randomBytes(12).toString("hex"), database: "pierwise_bench",
  });
  const databaseUrl = roles.appUrl;
  const migrator = knex({ ...knexConfig, connection: roles.ownerUrl });
  await migrator.migrate.latest();
  await migrator.seed.run();
  await migrator.destroy();

  const ports = { smtp: await freePort(), mailWeb: await freePort(), s3: await freePort(), app: await freePort(), before: await freePort() };
  standIns = await startStandIns({ smtpPort: ports.smtp, mailWebPort: ports.mailWeb, s3Port: ports.s3, s3Directory: path.join(workDir, "files"), bucket: "pierwise-bench" });
  const env: NodeJS.ProcessEnv = {
    ...process.env,
    ...appEnvironment({ databaseUrl, sessionSecret: crypto.randomBytes(32).toString("hex"), appPort: ports.app, smtpPort: ports.smtp, mailWebPort: ports.mailWeb, s3Port: ports.s3, bucket: "pierwise-bench" }),
    NODE_ENV: "production",
    PIERWISE_DIST_DIR: distDir,
    PIERWISE_BENCH_BUILD: "1",
  };
  if (process.env.BENCH_SKIP_BUILD !== "1" && buildIsStale(root, distDir)) buildApp(root, env);
  const serve = (dir: string, port: number) => {
    // BENCH_SERVER_PROFILE=folder: a V8 CPU profile of each server (Next.js's own profiler), written when it stops.
    const prof = process.env.BENCH_SERVER_PROFILE ? { NEXT_CPU_PROF: "1", NEXT_CPU_PROF_DIR: path.join(process.env.BENCH_SERVER_PROFILE, path.basename(dir)) } : {};
    servers.push(spawn(path.join(root, "node_modules/.bin/next"), ["start", "-H", "127.0.0.1", "-p", String(port)], { cwd: root, env: { ...env, ...prof, PIERWISE_DIST_DIR: dir }, stdio: ["ignore", "ignore", "inherit"] }));
    return `http://127.0.0.1:${port}`;
  };
  const base = serve(distDir, ports.app);
  const builds = BEFORE_DIST_DIR ? [{ label: "before", base: serve(BEFORE_DIST_DIR, ports.before) }, { label: "after", base }] : [{ label: "", base }];
  for (const b of builds) await waitForHttp(`${b.base}/api/health`, 60_000);

  const cookie = await signIn(base, DESIGNER);
  const designs = (await (await fetch(`${base}/api/projects/${DEMO_PROJECT_ID}/designs`, { headers: { cookie } })).json()) as { rows: { id: string; name: string }[] };
  const design = designs.rows.find((d) => d.name === "12-module array on two posts") ?? designs.rows[0];
  const editorPath = `/projects/${DEMO_PROJECT_ID}/designs/${design.id}`;
  const routes = [
    { name: "sign-in", path: "/login", as: null },
    { name: "landing", path: "/", as: null },
    { name: "projects", path: "/projects", as: DESIGNER },
    { name: "project", path: `/projects/${DEMO_PROJECT_ID}`, as: DESIGNER },
    { name: "editor (no 3D)", path: editorPath, as: DESIGNER },
    { name: "revision diff", path: `${editorPath}/diff`, as: DESIGNER },
    { name: "criteria cards", path: "/criteria", as: DESIGNER },
    { name: "reviews", path: "/reviews", as: DESIGNER },
    { name: "field specs", path: "/field", as: DESIGNER },
    { name: "account", path: "/account", as: DESIGNER },
    { name: "members", path: "/admin/members", as: ADMIN },
  ];

  ensureChromium();
  const noGl = await chromium.launch({ executablePath: "/usr/bin/chromium", headless: true, args: [...CHROMIUM_ARGS.filter((a) => !a.includes("swiftshader")), "--disable-webgl", "--disable-3d-apis"] });
  const gl = await chromium.launch({ executablePath: "/usr/bin/chromium", headless: true, args: CHROMIUM_ARGS });
  browsers.push(noGl, gl);

  // Warm the server (first render of each route compiles nothing in production, but fills caches).
  for (const b of builds) for (const r of routes) await fetch(b.base + r.path, { headers: r.as ? { cookie: r.as === DESIGNER ? cookie : await signIn(base, ADMIN) } : {} });
  const weightsBy = new Map<string, Awaited<ReturnType<typeof routeWeights>>>();
  for (const b of builds) weightsBy.set(b.label, ONLY_EDITOR || ONLY_HTTP ? [] : await routeWeights(noGl, routes, (br, as) => contextFor(br, b.base, as)));
  const weights = weightsBy.get(builds.at(-1)!.label)!;

  const editorRuns: (EditorFigures & { build: string })[] = [];
  const loads: LoadResult[] = [];
  const body = JSON.stringify(defaultDesignInput);
  const handlers = [
    { label: "empty handler", path: "/api/bench/empty" },
    { label: "/api/calc", path: "/api/calc" },
    { label: "/api/calc?sections=footing", path: "/api/calc?sections=footing" },
  ];
  const targets = builds.flatMap((b) => handlers.map((h) => ({ label: `${b.label ? `${b.label}: ` : ""}${h.label}`, url: b.base + h.path })));
  if (!ONLY_EDITOR) for (const t of targets) await load({ ...t, body, cookie, seconds: 1, connections: 8 }); // warm-up
  // Interleaved: editor run (each build), then a round of each handler, repeated.
  for (let round = 0; round < Math.max(ROUNDS, EDITOR_RUNS); round++) {
    if (round < EDITOR_RUNS && !ONLY_HTTP) for (const b of builds) {
      const context = await contextFor(gl, b.base, DESIGNER);
      editorRuns.push({ ...(await measureEditor(context, b.base + editorPath, KEYSTROKES)), build: b.label });
      await context.close();
    }
    if (round < ROUNDS && !ONLY_EDITOR) for (const t of targets) loads.push(await load({ ...t, body, cookie, seconds: HTTP_SECONDS, connections: 8 }));
  }

  const profile = PROFILE ? await (async () => {
    const context = await contextFor(gl, base, DESIGNER);
    const summaries = await profileEditor(context, base + editorPath, 6);
    await context.close();
    return summaries;
  })() : [];

  // ---- report ----
  const lines: string[] = [];
  const out = (s = "") => lines.push(s);
  const signInKb = weights[0]?.gzipKb ?? NaN;
  out(`bench:web — ${new Date().toISOString()} · ${os.cpus().length} cores · load average at end ${os.loadavg().map((l) => l.toFixed(2)).join(" ")}`);
  out();
  out("First-load JS (gzip -9, every script fetched until network idle; WebGL off, so no 3D scene)");
  if (BEFORE_DIST_DIR) {
    const before = weightsBy.get("before")!;
    const beforeSignIn = before[0]?.gzipKb ?? NaN;
    out(`  ${pad("route", 18)}${lpad("kB before", 11)}${lpad("× sign-in", 11)}${lpad("kB after", 10)}${lpad("× sign-in", 11)}`);
    weights.forEach((w, i) => out(`  ${pad(w.name, 18)}${lpad(f(before[i].gzipKb, 1), 11)}${lpad(f(before[i].gzipKb / beforeSignIn, 2), 11)}${lpad(f(w.gzipKb, 1), 10)}${lpad(f(w.gzipKb / signInKb, 2), 11)}`));
  } else {
    out(`  ${pad("route", 18)}${lpad("kB", 8)}${lpad("× sign-in", 11)}${lpad("scripts", 9)}`);
    for (const w of weights) out(`  ${pad(w.name, 18)}${lpad(f(w.gzipKb, 1), 8)}${lpad(f(w.gzipKb / signInKb, 2), 11)}${lpad(String(w.scripts), 9)}`);
  }
  out(`  targets: editor ≤ 240 kB; every other page ≤ 1.25 × sign-in (${f(signInKb * 1.25, 1)} kB)`);
  out();
  out(`Editor (WebGL on, software rendering; ${KEYSTROKES} keystrokes per run, each flipping 125 ↔ 175 mph)`);
  const row = (label: string, get: (e: EditorFigures) => number | null, d: number, target: string) =>
    out(`  ${pad(label, 44)}${editorRuns.map((e) => lpad(f(get(e), d), 10)).join("")}   ${target}`);
  out(`  ${pad("", 44)}${editorRuns.map((e, i) => lpad(e.build ? `${e.build} ${Math.floor(i / builds.length) + 1}` : `run ${i + 1}`, 10)).join("")}`);
  row("JS including the 3D scene, kB gzip", (e) => e.jsWith3dKb, 1, "");
  row("3D first draw after navigation, ms (page canvas)", (e) => e.firstDrawMs, 0, "target ≤ 1500");
  row("  of which: HTML received, ms", (e) => e.htmlAtMs, 0, "");
  row("  largest script (the scene) received, ms", (e) => e.sceneChunkAtMs, 0, "");
  row("  WebGL calls waiting on the GPU before it, ms", (e) => e.syncGlMs, 0, "(compile, link, uniforms)");
  row("main-thread blocking during load, ms", (e) => e.loadBlockingMs, 0, "(sum of long-task time over 50 ms)");
  row("longest task during load, ms", (e) => e.loadLongestTaskMs, 0, "");
  row("shader programs by first draw", (e) => e.programsAtFirstDraw, 0, "");
  row("shader programs after first draw", (e) => e.programsAfterFirstDraw, 0, "target 0");
  row("programs on the text library's own canvas", (e) => e.offscreenPrograms, 0, "(glyph outlines; not the scene)");
  row("keystroke → result on the page, median ms", (e) => e.keyToResultMs, 1, "target ≤ 50");
  row("keystroke → result painted, median ms", (e) => e.keyToResultPaintMs, 1, "target ≤ 50");
  row("keystroke → next paint (event timing), ms", (e) => e.keyToNextPaintMs, 0, "target ≤ 50 (8 ms steps)");
  row("long tasks while typing (> 50 ms)", (e) => e.typingLongTasksOver50, 0, "target 0");
  row("longest task while typing, ms", (e) => e.typingLongestTaskMs, 0, "");
  row("draw calls per keystroke", (e) => e.drawCallsPerKeystroke, 1, "");
  row("shader programs while typing", (e) => e.programsWhileTyping, 0, "target 0");
  row("keystrokes without a result change", (e) => e.missedResults, 0, "");
  out();
  out(`POST handlers (8 keep-alive connections, ${ROUNDS} interleaved rounds of ${HTTP_SECONDS} s, signed in)`);
  out(`  ${pad("handler", 38)}${lpad("req/s", 8)}${lpad("× empty", 9)}${lpad("p50 ms", 9)}${lpad("p99 ms", 9)}${lpad("reply kB", 10)}${lpad("errors", 8)}`);
  const rateOf = (label: string) => {
    const xs = loads.filter((l) => l.label === label);
    return xs.reduce((a, l) => a + l.requests, 0) / xs.reduce((a, l) => a + l.seconds, 0);
  };
  // BENCH_ROUNDS=0 measures no handler: nothing to print but the heading's note.
  for (const t of ONLY_EDITOR || ROUNDS < 1 ? [] : targets) {
    // Against the empty handler of the same build.
    const emptyRate = rateOf(t.label.replace(/[^:]*$/, (m) => (t.label.includes(":") ? " empty handler" : "empty handler")));
    const xs = loads.filter((l) => l.label === t.label);
    const rate = xs.reduce((a, l) => a + l.requests, 0) / xs.reduce((a, l) => a + l.seconds, 0);
    const lat = xs.flatMap((l) => l.latenciesMs);
    const perRound = xs.map((l) => f(l.requests / l.seconds, 0)).join("/");
    out(`  ${pad(t.label, 38)}${lpad(f(rate, 0), 8)}${lpad(f(rate / emptyRate, 2), 9)}${lpad(f(median(lat), 1), 9)}${lpad(f(percentile(lat, 99), 1), 9)}${lpad(f(xs[0].replyBytes / 1024, 1), 10)}${lpad(String(xs.reduce((a, l) => a + l.errors, 0)), 8)}   rounds ${perRound}`);
  }
  out("  target: /api/calc ≥ 0.6 × the empty handler's req/s");
  if (profile.length) {
    out();
    for (const l of profileLines(profile)) out(l);
  }
  console.log("\n" + lines.join("\n"));
}

async function cleanUp(): Promise<void> {
  for (const b of browsers) await b.close().catch(() => undefined);
  await stopBench({ servers, standIns, cluster, workDir });
}

runBench("bench:web", main, cleanUp);
