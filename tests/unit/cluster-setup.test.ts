/**
 * Where `npm start` keeps its cluster and how a failed first start reports itself and recovers.
 * These run the machine's real initdb (Debian's PostgreSQL, which `npm test` needs anyway) with
 * --no-sync, except where a stand-in initdb prints a known failure.
 */
import fs from "node:fs";
import os from "node:os";
import path from "node:path";
import { afterEach, describe, expect, it } from "vitest";
import { LOCATION_FILE, markClusterCreated, resolveClusterLocation } from "@/db/lib/cluster-location";
import { StartupError } from "@/db/lib/fail";
import { UNFINISHED_SUFFIX, ensureCluster, errorLine, findServerBinaries, socketDir } from "@/db/lib/postgres";

const isRoot = process.getuid?.() === 0;
const made: string[] = [];
/** A temporary folder; `open` lets the postgres user (as root) pass through it, as /var/lib does. */
function tempDir(mode: "open" | "private" = "open"): string {
  const dir = fs.mkdtempSync(path.join(os.tmpdir(), "pierwise-cluster-"));
  fs.chmodSync(dir, mode === "open" ? 0o755 : 0o700);
  made.push(dir);
  return dir;
}
afterEach(() => {
  for (const dir of made.splice(0)) {
    fs.chmodSync(dir, 0o755);
    fs.rmSync(dir, { recursive: true, force: true });
  }
});

function failureOf(run: () => unknown): string {
  try {
    run();
  } catch (error) {
    expect(error).toBeInstanceOf(StartupError);
    return (error as Error).message;
  }
  throw new Error("expected a StartupError");
}

const server = () => findServerBinaries({ installIfMissing: false });

describe("initdb failures name PostgreSQL's own error, the folder and the fix", () => {
  it("shows initdb's stderr line, not the lines it prints on stdout, and leaves nothing half-made", () => {
    // A stand-in initdb that fails the way a full disk makes it fail: chatter on stdout, reason on stderr.
    const bin = tempDir();
    fs.writeFileSync(
      path.join(bin, "initdb"),
      [
        "#!/bin/sh",
        'echo "The files belonging to this database system will be owned by user \\"postgres\\"."',
        'echo "The default text search configuration will be set to \\"english\\"."',
        'echo "initdb: error: could not create directory \\"$2/base\\": No space left on device" >&2',
        "exit 1",
      ].join("\n"),
      { mode: 0o755 },
    );
    const dataDir = path.join(tempDir(), "pg");
    const message = failureOf(() => ensureCluster({ binDir: bin, dataDir, port: 1, version: "15" }, { throwaway: true }));
    expect(message).toMatch(/^initdb failed: initdb: error: could not create directory ".*\/base": No space left on device\./);
    expect(message).not.toMatch(/text search configuration/);
    expect(message).toContain(`Folder: ${dataDir}.`);
    expect(message).toMatch(/Fix: free some space on the disk that holds/);
    // Nothing is left that would block the next start.
    expect(fs.existsSync(dataDir)).toBe(false);
    expect(fs.existsSync(`${dataDir}${UNFINISHED_SUFFIX}`)).toBe(false);
  });

  it.runIf(isRoot)("as root: the postgres user cannot enter a private folder, and the message says so", () => {
    const { binDir, version } = server();
    const dataDir = path.join(tempDir("private"), "pg");
    const message = failureOf(() => ensureCluster({ binDir, dataDir, port: 1, version }, { throwaway: true }));
    // initdb's own words (PostgreSQL 15: could not access/create/change permissions … Permission denied).
    expect(message).toMatch(/^initdb failed: initdb: error: could not .*Permission denied\./);
    expect(message).toContain(`Folder: ${dataDir}.`);
    expect(message).toMatch(/Fix: PostgreSQL runs as the postgres user, which must be able to enter/);
    expect(fs.existsSync(`${dataDir}${UNFINISHED_SUFFIX}`)).toBe(false);
  });

  it.runIf(!isRoot)("as another user: a folder it cannot write is named with the fix", () => {
    const { binDir, version } = server();
    const parent = tempDir();
    fs.chmodSync(parent, 0o555);
    const dataDir = path.join(parent, "pg");
    const message = failureOf(() => ensureCluster({ binDir, dataDir, port: 1, version }, { throwaway: true }));
    expect(message).toMatch(/^could not create the database folder: EACCES: permission denied/);
    expect(message).toContain(`Folder: ${dataDir}.`);
    expect(message).toContain(`Fix: make ${parent} writable by ${os.userInfo().username}`);
  });

  it("a half-made first start (empty folder, unfinished initdb folder) does not block the next start", () => {
    const { binDir, version } = server();
    const dataDir = path.join(tempDir(), "pg");
    fs.mkdirSync(dataDir);
    fs.mkdirSync(`${dataDir}${UNFINISHED_SUFFIX}/base`, { recursive: true });
    fs.writeFileSync(`${dataDir}${UNFINISHED_SUFFIX}/PG_VERSION`, `${version}\n`);
    expect(ensureCluster({ binDir, dataDir, port: 1, version }, { throwaway: true })).toBe("created");
    expect(fs.readFileSync(path.join(dataDir, "PG_VERSION"), "utf8").trim()).toBe(version);
    expect(fs.existsSync(path.join(dataDir, "global", "pg_control"))).toBe(true);
    expect(fs.existsSync(`${dataDir}${UNFINISHED_SUFFIX}`)).toBe(false);
    // A second start finds the finished cluster and leaves it alone.
    expect(ensureCluster({ binDir, dataDir, port: 1, version }, { throwaway: true })).toBe("existing");
  }, 120_000); // initdb takes seconds on a busy machine

  it("picks the error line out of real PostgreSQL output", () => {
    // initdb 15's output when the postgres user cannot enter the folder above (seen on Debian 12).
    const stdout = 'The files belonging to this database system will be owned by user "postgres".\nThe default text search configuration will be set to "english".\n\nData page checksums are disabled.\n';
    const stderr = 'initdb: error: could not change permissions of directory "/root/p/.data/pg": Permission denied\n';
    expect(errorLine(stderr, stdout)).toBe('initdb: error: could not change permissions of directory "/root/p/.data/pg": Permission denied');
    expect(errorLine("", stdout)).toBe("Data page checksums are disabled.");
  });
});

describe("where npm start keeps the cluster", () => {
  function checkout(): { dataDir: string; external: string } {
    const base = tempDir();
    fs.mkdirSync(path.join(base, "my clone", ".data"), { recursive: true });
    return { dataDir: path.join(base, "my clone", ".data"), external: path.join(base, "var-lib-pierwise") };
  }

  it("as root, a new cluster goes outside the checkout and its place is recorded in .data", () => {
    const { dataDir, external } = checkout();
    const location = resolveClusterLocation(dataDir, { asRoot: true, externalRoot: external });
    expect(location.kind).toBe("recorded");
    expect(path.dirname(path.dirname(location.dataDir))).toBe(external);
    expect(path.basename(path.dirname(location.dataDir))).toMatch(/^my-clone-[0-9a-f]{8}$/);
    const record = JSON.parse(fs.readFileSync(path.join(dataDir, LOCATION_FILE), "utf8"));
    expect(record).toEqual({ dataDir: location.dataDir, createdAt: null });
    // The next start reads the same place.
    expect(resolveClusterLocation(dataDir, { asRoot: true, externalRoot: external })).toEqual(location);
  });

  it("a cluster already in .data/pg stays there and is used as it is", () => {
    const { dataDir, external } = checkout();
    fs.mkdirSync(path.join(dataDir, "pg"));
    fs.writeFileSync(path.join(dataDir, "pg", "PG_VERSION"), "15\n");
    for (const asRoot of [true, false]) {
      expect(resolveClusterLocation(dataDir, { asRoot, externalRoot: external })).toEqual({ dataDir: path.join(dataDir, "pg"), kind: "checkout" });
    }
    expect(fs.existsSync(path.join(dataDir, LOCATION_FILE))).toBe(false);
    expect(fs.existsSync(external)).toBe(false);
    expect(fs.readFileSync(path.join(dataDir, "pg", "PG_VERSION"), "utf8")).toBe("15\n");
  });

  it("as root, an empty .data/pg left by a failed start is cleared instead of blocking", () => {
    const { dataDir, external } = checkout();
    fs.mkdirSync(path.join(dataDir, "pg"));
    const location = resolveClusterLocation(dataDir, { asRoot: true, externalRoot: external });
    expect(location.kind).toBe("recorded");
    expect(fs.existsSync(path.join(dataDir, "pg"))).toBe(false);
  });

  it("as another user, the cluster lives in .data/pg", () => {
    const { dataDir, external } = checkout();
    expect(resolveClusterLocation(dataDir, { asRoot: false, externalRoot: external })).toEqual({ dataDir: path.join(dataDir, "pg"), kind: "checkout" });
  });

  it("a recorded cluster that has gone missing is refused, never made again empty", () => {
    const { dataDir, external } = checkout();
    const location = resolveClusterLocation(dataDir, { asRoot: true, externalRoot: external });
    fs.mkdirSync(location.dataDir, { recursive: true });
    fs.writeFileSync(path.join(location.dataDir, "PG_VERSION"), "15\n");
    markClusterCreated(dataDir, location);
    const record = fs.readFileSync(path.join(dataDir, LOCATION_FILE), "utf8");
    expect(JSON.parse(record).createdAt).toMatch(/^\d{4}-\d\d-\d\dT/);
    fs.rmSync(location.dataDir, { recursive: true });
    const message = failureOf(() => resolveClusterLocation(dataDir, { asRoot: true, externalRoot: external }));
    expect(message).toContain(`(${location.dataDir}, made `);
    expect(message).toMatch(/is missing: restore that folder from your backup/);
    expect(fs.readFileSync(path.join(dataDir, LOCATION_FILE), "utf8")).toBe(record);
    expect(fs.existsSync(location.dataDir)).toBe(false);
  });

  it("keeps the server's socket path within the 107-byte limit for a checkout deep in a long path", () => {
    const short = { dataDir: "/var/lib/pierwise/a-1234/pg", port: 54329 };
    expect(socketDir(short)).toBe(short.dataDir);
    const deep = { dataDir: `/mnt/projects/${"very long folder name ".repeat(5)}/pierwise/.data/pg`, port: 54329 };
    expect(socketDir(deep)).toMatch(new RegExp(`^${os.tmpdir()}/pierwise-pg-[0-9a-f]{12}$`));
    expect(Buffer.byteLength(path.join(socketDir(deep), ".s.PGSQL.54329"))).toBeLessThanOrEqual(107);
    expect(socketDir(deep)).toBe(socketDir({ ...deep }));
  });
});
