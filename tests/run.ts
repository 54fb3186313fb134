/**
 * `npm test`: a throwaway PostgreSQL (own folder under the temp folder and own port, removed
 * afterwards), migrations, the mail and file stand-ins, then the unit and integration suites;
 * then a production build served on a free port for the browser suite. Ends with "N passed, N failed" and a non-zero exit code
 * on any failure.
 */
import { spawn, spawnSync } from "node:child_process";
import crypto from "node:crypto";
import fs from "node:fs";
import os from "node:os";
import path from "node:path";
import { fileURLToPath } from "node:url";
import knex from "knex";
import knexConfig from "../knexfile";
import { appEnvironment } from "../db/lib/app-env";
import { buildApp, buildIsStale } from "../db/lib/build";
import { freePort } from "../db/lib/ports";
import { ensureCluster, findServerBinaries, startServer, stopServer, type Cluster } from "../db/lib/postgres";
import { startStandIns, type StandIns } from "../db/lib/stand-ins";
import { ensureDatabaseRoles } from "../db/lib/database-roles";
import { countResults, ensureChromium, waitForHttp } from "./support/runner";

const root = fileURLToPath(new URL("..", import.meta.url));
const workDir = path.join(root, ".test-data", `run-${process.pid}`);
const reportDir = path.join(workDir, "reports");
// `npm test -- <file or name filter>` runs only matching test files (browser tests only when a filter names them).
const filters = process.argv.slice(2);
// Several developers' runs at once on one checkout each need their own build folder.
const distDir = process.env.PIERWISE_DIST_DIR ?? ".next";

let cluster: Cluster | undefined;
let clusterParent: string | undefined;
let standIns: StandIns | undefined;

/** Runs vitest as a child without blocking: the stand-ins in this process must keep answering. */
function runVitest(projects: string[], env: NodeJS.ProcessEnv, report: string): Promise<number> {
  const args = ["run", "--config", "tests/vitest.config.ts", ...projects.flatMap((p) => ["--project", p]), ...filters,
    ...(filters.length ? ["--passWithNoTests"] : []),
    "--reporter=default", "--reporter=json", `--outputFile.json=${report}`];
  const child = spawn(path.join(root, "node_modules/.bin/vitest"), args, { cwd: root, env, stdio: "inherit" });
  return new Promise((resolve) => child.on("exit", (code) => resolve(code ?? 1)));
}

function typecheckPasses(): boolean {
  const result = spawnSync(path.join(root, "node_modules/.bin/tsc"), ["--noEmit", "-p", "tsconfig.json"], { cwd: root, stdio: "inherit" });
  if (result.status === 0) console.log("typecheck: tsc --noEmit passed");
  else console.log("typecheck: tsc --noEmit FAILED (errors above)");
  return result.status === 0;
}

let failedRuns = 0;
// The type check counts as one test of its own in the closing line.
const typecheck = { passed: 0, failed: 0 };

async function main(): Promise<number> {
  fs.mkdirSync(reportDir, { recursive: true });
  const { binDir, version } = findServerBinaries({ installIfMissing: true });
  // The throwaway cluster lives under the system's temp folder, not in the checkout: as root the
  // server runs as the postgres user, which cannot enter a private checkout (root's home, a
  // `mktemp -d` folder), and a short path keeps the server's socket within its length limit.
  clusterParent = fs.mkdtempSync(path.join(os.tmpdir(), "pierwise-test-"));
  fs.chmodSync(clusterParent, 0o755);
  cluster = { binDir, version, dataDir: path.join(clusterParent, "pg"), port: await freePort() };
  ensureCluster(cluster, { throwaway: true });
  startServer(cluster, { throwaway: true });
  // As in `npm start`: the suites and the app connect as the row-only app role; migrations, seeds
  // and tests that change the schema use the owner role (PIERWISE_OWNER_DATABASE_URL, tests only).
  const roles = ensureDatabaseRoles(cluster, {
    appRole: "pierwise_test", appPassword: crypto.randomBytes(12).toString("hex"), ownerPassword: crypto.randomBytes(12).toString("hex"), database: "pierwise_test",
  });
  const databaseUrl = roles.appUrl;

  const migrator = knex({ ...knexConfig, connection: roles.ownerUrl });
  await migrator.migrate.latest();
  // The demo organisations and people are the cast of the access tests.
  await migrator.seed.run();
  await migrator.destroy();

  const ports = { smtp: await freePort(), mailWeb: await freePort(), s3: await freePort(), app: await freePort() };
  standIns = await startStandIns({
    smtpPort: ports.smtp, mailWebPort: ports.mailWeb, s3Port: ports.s3,
    s3Directory: path.join(workDir, "files"), mailDirectory: path.join(workDir, "mail"), bucket: "pierwise-test",
  });
  const env: NodeJS.ProcessEnv = {
    ...process.env,
    ...appEnvironment({
      databaseUrl, sessionSecret: crypto.randomBytes(32).toString("hex"), appPort: ports.app,
      smtpPort: ports.smtp, mailWebPort: ports.mailWeb, s3Port: ports.s3, bucket: "pierwise-test",
    }),
    PIERWISE_TEST_CLUSTER: JSON.stringify(cluster),
    PIERWISE_OWNER_DATABASE_URL: roles.ownerUrl,
  };

  // Type errors anywhere in the tree fail the run (the build itself skips type-checking).
  if (filters.length === 0) typecheck[typecheckPasses() ? "passed" : "failed"] += 1;
  failedRuns += (await runVitest(["unit", "integration"], { ...env, NODE_ENV: "test" as const }, path.join(reportDir, "main.json"))) === 0 ? 0 : 1;

  const e2eDir = path.join(root, "tests", "e2e");
  const hasBrowserTests = fs.existsSync(e2eDir) && fs.readdirSync(e2eDir).some((f) => f.endsWith(".test.ts"))
    && (filters.length === 0 || filters.some((f) => f.includes("e2e")));
  if (hasBrowserTests) {
    ensureChromium();
    const buildEnv: NodeJS.ProcessEnv = { ...env, NODE_ENV: "production", PIERWISE_DIST_DIR: distDir };
    if (buildIsStale(root, distDir)) buildApp(root, buildEnv);
    const server = spawn(path.join(root, "node_modules/.bin/next"), ["start", "-H", "127.0.0.1", "-p", String(ports.app)], {
      cwd: root, env: buildEnv, stdio: ["ignore", "ignore", "inherit"],
    });
    try {
      await waitForHttp(`http://127.0.0.1:${ports.app}/api/health`, 60_000);
      const status = await runVitest(["e2e"], { ...env, E2E_BASE_URL: `http://127.0.0.1:${ports.app}`, PIERWISE_DIST_DIR: distDir }, path.join(reportDir, "e2e.json"));
      if (status !== 0) failedRuns += 1;
    } finally {
      server.kill("SIGTERM");
    }
  }

  const counted = countResults(reportDir);
  const passed = counted.passed + typecheck.passed;
  const failed = counted.failed + typecheck.failed;
  const broken = failedRuns > 0 && counted.failed === 0 ? 1 : 0; // a suite that crashed before reporting still fails the run
  console.log(`\n${passed} passed, ${failed + broken} failed`);
  return failed + broken > 0 ? 1 : 0;
}

async function cleanUp(): Promise<void> {
  await standIns?.stop();
  try {
    if (cluster) stopServer(cluster, "immediate");
  } catch (error) {
    console.error(String(error));
  }
  fs.rmSync(workDir, { recursive: true, force: true });
  if (clusterParent) fs.rmSync(clusterParent, { recursive: true, force: true });
}

process.on("SIGINT", () => {
  void cleanUp().then(() => process.exit(130));
});

main()
  .then(async (code) => {
    await cleanUp();
    process.exit(code);
  })
  .catch(async (error) => {
    console.error("test run failed to start:", error);
    await cleanUp();
    console.log("\n0 passed, 1 failed");
    process.exit(1);
  });
