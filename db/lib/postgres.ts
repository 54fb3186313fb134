import { spawnSync } from "node:child_process";
import crypto from "node:crypto";
import fs from "node:fs";
import os from "node:os";
import path from "node:path";
import { StartupError } from "./fail";

/**
 * A PostgreSQL cluster from Debian's packages, kept in a folder of the project and listening only
 * on 127.0.0.1. PostgreSQL refuses to run as root, so as root every server command runs as the
 * `postgres` user; as any other user it runs as that user.
 */
export interface Cluster {
  binDir: string;
  dataDir: string;
  port: number;
  /** Major version of the server binaries, e.g. "15". */
  version: string;
}

const PG_ROOT = "/usr/lib/postgresql";
const isRoot = () => process.getuid?.() === 0;

/** Finds the newest installed server; as root, installs Debian's `postgresql` package if none is. */
export function findServerBinaries(options: { installIfMissing: boolean }): { binDir: string; version: string } {
  const found = listVersions();
  if (found.length > 0) return found[0];
  if (!options.installIfMissing || !isRoot()) {
    throw new StartupError(
      "PostgreSQL server is not installed: run `sudo apt-get install -y postgresql` and try again.",
    );
  }
  console.log("pierwise: installing Debian's postgresql package (one time)…");
  const env = { ...process.env, DEBIAN_FRONTEND: "noninteractive" };
  const update = spawnSync("apt-get", ["update", "-qq"], { stdio: "inherit", env });
  const install = spawnSync("apt-get", ["install", "-y", "-qq", "postgresql"], { stdio: "inherit", env });
  if (update.status !== 0 || install.status !== 0 || listVersions().length === 0) {
    throw new StartupError("could not install PostgreSQL: run `apt-get install -y postgresql` by hand and read its error.");
  }
  return listVersions()[0];
}

function listVersions(): { binDir: string; version: string }[] {
  if (!fs.existsSync(PG_ROOT)) return [];
  return fs
    .readdirSync(PG_ROOT)
    .filter((v) => fs.existsSync(path.join(PG_ROOT, v, "bin", "postgres")))
    .sort((a, b) => Number(b) - Number(a))
    .map((version) => ({ version, binDir: path.join(PG_ROOT, version, "bin") }));
}

/** A server program that exited with an error: its own stderr and stdout, kept apart. */
export class PgCommandError extends StartupError {
  constructor(readonly program: string, readonly stderr: string, readonly stdout: string) {
    super(`${program} failed: ${errorLine(stderr, stdout) || "no output"}`);
    this.name = "PgCommandError";
  }
}

/**
 * PostgreSQL's own error line out of a program's output: the first stderr line that says what went
 * wrong (initdb prints its chatter on stdout and the reason on stderr), else the last stderr line,
 * else the last stdout line.
 */
export function errorLine(stderr: string, stdout = ""): string {
  const lines = (text: string) => text.split("\n").map((l) => l.trim()).filter(Boolean);
  const err = lines(stderr);
  const telling = err.find((l) => /\b(error|fatal|panic)\b|could not|permission denied|no space|not permitted|cannot/i.test(l));
  return telling ?? err.at(-1) ?? lines(stdout).at(-1) ?? "";
}

/** Runs a server program as the right user, from `/` so that user can read the working directory. */
export function runPg(cluster: Pick<Cluster, "binDir">, program: string, args: string[], quiet = true): string {
  const exe = path.join(cluster.binDir, program);
  const [cmd, cmdArgs] = isRoot() ? ["runuser", ["-u", "postgres", "--", exe, ...args]] : [exe, args];
  const result = spawnSync(cmd, cmdArgs, { cwd: "/", encoding: "utf8", stdio: quiet ? "pipe" : "inherit" });
  if (result.error) throw new PgCommandError(program, String(result.error.message), "");
  if (result.status !== 0) throw new PgCommandError(program, result.stderr ?? "", result.stdout ?? "");
  return result.stdout ?? "";
}

/** One short line: what failed with PostgreSQL's own words, the folder concerned, and the fix. */
export function startupFailure(what: string, cause: string, folder: string, fix: string): StartupError {
  return new StartupError(`${what}: ${cause.replace(/\.$/, "")}. Folder: ${folder}. Fix: ${fix}`);
}

/** The fix for an initdb or pg_ctl refusal, from PostgreSQL's own words. */
function fixFor(cause: string, folder: string): string {
  if (/permission denied|not permitted|could not access|could not change permissions/i.test(cause)) {
    return isRoot()
      ? `PostgreSQL runs as the postgres user, which must be able to enter ${path.dirname(folder)} and every folder above it ` +
          `(try \`runuser -u postgres -- ls ${shellQuote(path.dirname(folder))}\`); let it in, or move the folder somewhere it can enter.`
      : `make ${path.dirname(folder)} writable by ${os.userInfo().username}, then start again.`;
  }
  if (/no space left/i.test(cause)) return `free some space on the disk that holds ${folder}, then start again.`;
  if (/locale|encoding/i.test(cause)) return "install the C.UTF-8 locale (Debian's `locales` package), then start again.";
  return "fix the cause above, then start again; nothing already saved was changed.";
}

function shellQuote(text: string): string {
  return /^[\w@%+=:,./-]+$/.test(text) ? text : `'${text.replace(/'/g, "'\\''")}'`;
}

/**
 * Creates the cluster when it does not exist yet; never touches an existing one. initdb writes into
 * a sibling folder `<dataDir>.initdb-unfinished` that is renamed into place only when initdb
 * succeeded, so a failed or interrupted first start leaves no half-made cluster behind: the next
 * start removes that unfinished folder (it never held data) and an empty `dataDir`, and tries again.
 */
export function ensureCluster(cluster: Cluster, options: { throwaway: boolean }): "created" | "existing" {
  const versionFile = path.join(cluster.dataDir, "PG_VERSION");
  if (fs.existsSync(versionFile)) {
    const made = fs.readFileSync(versionFile, "utf8").trim();
    if (made !== cluster.version) {
      throw new StartupError(
        `the database in ${cluster.dataDir} was made by PostgreSQL ${made} but this machine has ${cluster.version}: ` +
          `install postgresql-${made} (apt-get install -y postgresql-${made}) or upgrade the cluster with pg_upgrade; the data was left untouched.`,
      );
    }
    return "existing";
  }
  if (fs.existsSync(cluster.dataDir) && fs.readdirSync(cluster.dataDir).length > 0) {
    throw new StartupError(
      `${cluster.dataDir} exists but holds no PostgreSQL cluster (no PG_VERSION): move it aside and start again; it was left untouched.`,
    );
  }
  const unfinished = `${cluster.dataDir}${UNFINISHED_SUFFIX}`;
  if (fs.existsSync(unfinished)) {
    console.log(`pierwise: removing ${unfinished}, left by a first start whose initdb did not finish (it never held data).`);
    fs.rmSync(unfinished, { recursive: true, force: true });
  }
  try {
    fs.mkdirSync(path.dirname(cluster.dataDir), { recursive: true });
    fs.mkdirSync(unfinished, { mode: 0o700 });
    if (isRoot()) fs.chownSync(unfinished, postgresUser().uid, postgresUser().gid);
    fs.chmodSync(unfinished, 0o700);
  } catch (error) {
    const cause = error instanceof Error ? error.message : String(error);
    throw startupFailure("could not create the database folder", cause, cluster.dataDir, fixFor(cause, cluster.dataDir));
  }
  try {
    runPg(cluster, "initdb", [
      "-D", unfinished, "-U", "postgres", "--auth-local=trust", "--auth-host=scram-sha-256",
      "-E", "UTF8", "--locale=C.UTF-8", ...(options.throwaway ? ["--no-sync"] : []),
    ]);
  } catch (error) {
    fs.rmSync(unfinished, { recursive: true, force: true });
    if (!(error instanceof PgCommandError)) throw error;
    const cause = errorLine(error.stderr, error.stdout);
    throw startupFailure("initdb failed", cause, cluster.dataDir, fixFor(cause, cluster.dataDir));
  }
  // An empty folder left by an earlier failed start is replaced by the finished cluster.
  if (fs.existsSync(cluster.dataDir)) fs.rmdirSync(cluster.dataDir);
  fs.renameSync(unfinished, cluster.dataDir);
  return "created";
}

/** Suffix of the folder initdb fills before it is renamed into place. */
export const UNFINISHED_SUFFIX = ".initdb-unfinished";

/** Where `npm start` as root keeps clusters it makes: a folder the postgres user owns, outside any checkout. */
export const EXTERNAL_ROOT = "/var/lib/pierwise";

function postgresUser(): { uid: number; gid: number } {
  const line = fs.readFileSync("/etc/passwd", "utf8").split("\n").find((l) => l.startsWith("postgres:"));
  if (!line) throw new StartupError("the postgres user does not exist: reinstall Debian's postgresql package (apt-get install --reinstall postgresql-common).");
  const [, , uid, gid] = line.split(":");
  return { uid: Number(uid), gid: Number(gid) };
}

/**
 * The folder of the server's Unix socket. Socket paths are limited to 107 bytes, so a cluster deep
 * in a long path gets its socket in a short private folder under the temp folder instead; the name
 * is derived from the data folder so a later run finds the socket of a server still running.
 */
export function socketDir(cluster: Pick<Cluster, "dataDir" | "port">): string {
  if (Buffer.byteLength(path.join(cluster.dataDir, `.s.PGSQL.${cluster.port}`)) <= 100) return cluster.dataDir;
  const hash = crypto.createHash("sha256").update(cluster.dataDir).digest("hex").slice(0, 12);
  return path.join(os.tmpdir(), `pierwise-pg-${hash}`);
}

function ensureSocketDir(cluster: Cluster): string {
  const dir = socketDir(cluster);
  if (dir === cluster.dataDir) return dir;
  fs.mkdirSync(dir, { recursive: true, mode: 0o700 });
  if (isRoot()) fs.chownSync(dir, postgresUser().uid, postgresUser().gid);
  return dir;
}

export function isRunning(cluster: Cluster): boolean {
  const exe = path.join(cluster.binDir, "pg_ctl");
  const args = ["status", "-D", cluster.dataDir];
  const [cmd, cmdArgs] = isRoot() ? ["runuser", ["-u", "postgres", "--", exe, ...args]] : [exe, args];
  return spawnSync(cmd, cmdArgs, { cwd: "/", stdio: "pipe" }).status === 0;
}

/** Starts the server. A postmaster.pid left by a killed server is PostgreSQL's to judge, not ours to delete. */
export function startServer(cluster: Cluster, options: { throwaway: boolean }): void {
  // pg_ctl hands -o to a shell: the socket folder is quoted so a path with spaces stays one word.
  const settings = [
    "-c listen_addresses=127.0.0.1",
    `-p ${cluster.port}`,
    `-k ${shellQuote(ensureSocketDir(cluster))}`,
    ...(options.throwaway ? ["-c fsync=off", "-c synchronous_commit=off", "-c full_page_writes=off"] : []),
  ].join(" ");
  const logFile = path.join(cluster.dataDir, "server.log");
  try {
    runPg(cluster, "pg_ctl", ["-D", cluster.dataDir, "-l", logFile, "-w", "-t", "60", "-o", settings, "start"]);
  } catch (error) {
    if (!(error instanceof PgCommandError)) throw error;
    const log = tail(logFile);
    if (/lock file .* already exists/i.test(log)) {
      throw new StartupError(
        `PostgreSQL found a lock file in ${cluster.dataDir} held by a running process: stop that server ` +
          `(runuser -u postgres -- ${cluster.binDir}/pg_ctl -D ${shellQuote(cluster.dataDir)} stop) and start again.`,
      );
    }
    if (/could not bind|Address already in use/i.test(log)) {
      throw new StartupError(`port ${cluster.port} for PostgreSQL is already in use: stop what uses it or set PIERWISE_PG_PORT.`);
    }
    // The server's own reason is in its log (FATAL/PANIC); pg_ctl's stderr only says it did not start.
    const logged = log.split("\n").reverse().find((l) => /\b(FATAL|PANIC|ERROR):/.test(l));
    const cause = logged ? logged.slice(logged.search(/\b(FATAL|PANIC|ERROR):/)) : errorLine(error.stderr, error.stdout);
    throw startupFailure("PostgreSQL did not start (pg_ctl)", cause, cluster.dataDir, `${fixFor(cause, cluster.dataDir)} The server log is ${logFile}.`);
  }
}

export function stopServer(cluster: Cluster, mode: "fast" | "immediate" = "fast"): void {
  if (!isRunning(cluster)) return;
  runPg(cluster, "pg_ctl", ["-D", cluster.dataDir, "-m", mode, "-w", "stop"]);
}

/** SQL as the superuser over the cluster's own socket (trust), e.g. to create the app role. */
export function psql(cluster: Cluster, sql: string, database = "postgres"): string {
  return runPg(cluster, "psql", ["-h", socketDir(cluster), "-p", String(cluster.port), "-U", "postgres", "-d", database, "-tAq", "-v", "ON_ERROR_STOP=1", "-c", sql]).trim();
}

function tail(file: string): string {
  try {
    return fs.readFileSync(file, "utf8").trim().split("\n").slice(-20).join("\n");
  } catch {
    return "";
  }
}
