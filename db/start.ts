/**
 * `npm start`: PostgreSQL under .data/ (kept between runs), migrations, demo data on an empty
 * database, the mail and file stand-ins, a fresh build when sources changed, then `next start`.
 * Ctrl-C stops everything this started. Nothing here ever deletes or re-initialises a cluster
 * (.data/pg, or the folder recorded in .data/pg-location: see lib/cluster-location.ts).
 */
import { spawn, type ChildProcess } from "node:child_process";
import crypto from "node:crypto";
import fs from "node:fs";
import path from "node:path";
import { fileURLToPath } from "node:url";
import knex from "knex";
import knexConfig from "../knexfile";
import { appEnvironment } from "./lib/app-env";
import { buildApp, buildIsStale } from "./lib/build";
import { reportAndExit } from "./lib/fail";
import { acquireStartLock, releaseStartLock, stopOrphans, recordChild } from "./lib/run-state";
import { assertPortFree } from "./lib/ports";
import { markClusterCreated, resolveClusterLocation } from "./lib/cluster-location";
import { migrateToLatest } from "./lib/migrate";
import { ensureCluster, findServerBinaries, isRunning, startServer, stopServer, type Cluster } from "./lib/postgres";
import { startStandIns, type StandIns } from "./lib/stand-ins";
import { ensureDatabaseRoles } from "./lib/database-roles";

const root = fileURLToPath(new URL("..", import.meta.url));
const dataDir = path.join(root, ".data");
const port = (name: string, fallback: number) => Number(process.env[name] ?? fallback);
const ports = {
  app: port("PORT", 3000),
  pg: port("PIERWISE_PG_PORT", 54329),
  smtp: port("PIERWISE_SMTP_PORT", 1025),
  mailWeb: port("PIERWISE_MAIL_WEB_PORT", 1080),
  s3: port("PIERWISE_S3_PORT", 4569),
};

/** A secret made once and kept under .data/, so sessions and the app role survive restarts. */
function keptSecret(name: string): string {
  const file = path.join(dataDir, name);
  if (!fs.existsSync(file)) fs.writeFileSync(file, crypto.randomBytes(32).toString("hex"), { mode: 0o600 });
  return fs.readFileSync(file, "utf8").trim();
}

let cluster: Cluster | undefined;
let standIns: StandIns | undefined;
let server: ChildProcess | undefined;
let stopping = false;
let lockHeld = false;
let startedCluster = false;

async function shutdown(code: number): Promise<void> {
  // A repeated Ctrl-C must not cut the stop short and leave PostgreSQL running and the lock behind.
  // (package.json runs this with `node --import tsx`, not the tsx command: that one relays Ctrl-C to
  // its child and SIGKILLs it when the child is slow to acknowledge, as on a busy machine.)
  if (stopping) return;
  {
    stopping = true;
    console.log("\npierwise: stopping…");
    server?.kill("SIGTERM");
    await standIns?.stop();
    try {
      if (cluster) stopServer(cluster);
    } catch (error) {
      console.error(String(error));
    }
    releaseStartLock(dataDir);
  }
  process.exit(code);
}

async function main(): Promise<void> {
  fs.mkdirSync(dataDir, { recursive: true });
  acquireStartLock(dataDir);
  lockHeld = true;
  stopOrphans(dataDir);
  process.on("SIGINT", () => void shutdown(0));
  process.on("SIGTERM", () => void shutdown(0));

  // Refuse early, before touching the database, when a port we need is taken.
  await assertPortFree(ports.app, "the web app", "PORT");
  await assertPortFree(ports.smtp, "mail stand-in SMTP", "PIERWISE_SMTP_PORT");
  await assertPortFree(ports.mailWeb, "mail viewer", "PIERWISE_MAIL_WEB_PORT");
  await assertPortFree(ports.s3, "file store stand-in", "PIERWISE_S3_PORT");

  const { binDir, version } = findServerBinaries({ installIfMissing: true });
  const location = resolveClusterLocation(dataDir, { asRoot: process.getuid?.() === 0 });
  cluster = { binDir, version, dataDir: location.dataDir, port: ports.pg };
  const made = ensureCluster(cluster, { throwaway: false });
  markClusterCreated(dataDir, location);
  if (made === "created" && location.kind === "recorded") {
    console.log(`pierwise: new PostgreSQL cluster in ${cluster.dataDir} (owned by the postgres user, which cannot enter this checkout); its place is recorded in ${path.join(dataDir, "pg-location")}.`);
  }
  if (isRunning(cluster)) {
    console.log("pierwise: PostgreSQL from an earlier run is still up; using it.");
  } else {
    await assertPortFree(ports.pg, "PostgreSQL", "PIERWISE_PG_PORT");
    startServer(cluster, { throwaway: false });
    startedCluster = true;
  }
  // The app connects as `pierwise` (rows only); migrations and seeds as `pierwise_owner`, which owns
  // the schema. An older .data folder, where `pierwise` owned everything, is handed over here.
  const roles = ensureDatabaseRoles(cluster, {
    appRole: "pierwise", appPassword: keptSecret("db-password"), ownerPassword: keptSecret("db-owner-password"), database: "pierwise",
  });
  const databaseUrl = roles.appUrl;
  process.env.DATABASE_URL = databaseUrl;

  const applied = await migrateToLatest(roles.ownerUrl, cluster.dataDir);
  if (applied) console.log(`pierwise: applied ${applied} migration(s).`);
  const migrator = knex({ ...knexConfig, connection: roles.ownerUrl });
  try {
    const [{ count }] = await migrator("organisations").count<{ count: string }[]>({ count: "*" });
    if (Number(count) === 0) {
      await migrator.seed.run();
      console.log(`pierwise: ${made === "created" ? "new database" : "empty database"}: demo data added.`);
    }
  } finally {
    await migrator.destroy();
  }

  standIns = await startStandIns({
    smtpPort: ports.smtp,
    mailWebPort: ports.mailWeb,
    s3Port: ports.s3,
    s3Directory: path.join(dataDir, "files"),
    mailDirectory: path.join(dataDir, "mail"),
    bucket: "pierwise-uploads",
  });

  const env = {
    ...process.env,
    ...appEnvironment({
      databaseUrl,
      sessionSecret: process.env.SESSION_SECRET ?? keptSecret("session-secret"),
      appPort: ports.app,
      smtpPort: ports.smtp,
      mailWebPort: ports.mailWeb,
      s3Port: ports.s3,
      bucket: "pierwise-uploads",
    }),
    NODE_ENV: "production" as const,
  };
  if (buildIsStale(root)) buildApp(root, env);

  server = spawn(path.join(root, "node_modules/.bin/next"), ["start", "-H", "127.0.0.1", "-p", String(ports.app)], {
    cwd: root,
    env,
    stdio: ["ignore", "inherit", "inherit"],
  });
  recordChild(dataDir, server.pid);
  server.on("exit", (code) => {
    if (!stopping) {
      console.error(`pierwise: the web server stopped (exit ${code}).`);
      void shutdown(code ?? 1);
    }
  });

  console.log(`
Pierwise is running.
  App:          http://127.0.0.1:${ports.app}
  Mail viewer:  http://127.0.0.1:${ports.mailWeb}   (every e-mail the app sends lands here)
  Database:     ${cluster.dataDir} (kept between runs)
  Files, keys:  ${dataDir}
  Demo sign-ins (password pierwise-demo):
    designer@demo.pierwise.test   engineer@demo.pierwise.test
    installer@demo.pierwise.test  admin@demo.pierwise.test
    designer@other.pierwise.test  (a second, unrelated organisation)
    engineer@outside.pierwise.test  (an outside engineering firm engaged on one project)
  Press Ctrl-C to stop everything.
`);
}

main().catch(async (error) => {
  // Undo only what this run started; a lock held by another run stays theirs.
  if (lockHeld) {
    await standIns?.stop();
    server?.kill("SIGTERM");
    try {
      if (cluster && startedCluster) stopServer(cluster);
    } catch {
      /* reported below */
    }
    releaseStartLock(dataDir);
  }
  reportAndExit(error);
});
