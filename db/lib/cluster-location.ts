import crypto from "node:crypto";
import fs from "node:fs";
import path from "node:path";
import { StartupError } from "./fail";
import { EXTERNAL_ROOT, UNFINISHED_SUFFIX } from "./postgres";

/**
 * Where `npm start` keeps its PostgreSQL cluster.
 *
 * PostgreSQL refuses to run as root, so as root the server runs as the `postgres` user, which
 * cannot enter a private checkout (root's home, any `mktemp -d` folder). So:
 * - a cluster already in `.data/pg` stays there and is used as it is (never moved);
 * - as root, a new cluster goes to `/var/lib/pierwise/<checkout name>-<random>/pg`, owned by
 *   postgres, and that place is recorded in `.data/pg-location` (start-up prints it);
 * - as any other user, a new cluster goes to `.data/pg`, owned by that user.
 */
export interface ClusterLocation {
  dataDir: string;
  /** "checkout": .data/pg; "recorded": the folder named in .data/pg-location. */
  kind: "checkout" | "recorded";
}

interface Record {
  dataDir: string;
  /** Set once initdb succeeded there: from then on a missing folder is lost data, never re-made. */
  createdAt: string | null;
}

export const LOCATION_FILE = "pg-location";

function readRecord(file: string): Record {
  try {
    const record = JSON.parse(fs.readFileSync(file, "utf8")) as Partial<Record>;
    if (typeof record.dataDir !== "string" || !path.isAbsolute(record.dataDir)) throw new Error("no absolute dataDir");
    return { dataDir: record.dataDir, createdAt: typeof record.createdAt === "string" ? record.createdAt : null };
  } catch (error) {
    throw new StartupError(
      `${file} does not name a database folder (${error instanceof Error ? error.message : String(error)}): ` +
        `put back the file from your backup, or write {"dataDir": "/path/of/the/cluster", "createdAt": "…"} into it; nothing was changed.`,
    );
  }
}

function writeRecord(file: string, record: Record): void {
  fs.writeFileSync(file, `${JSON.stringify(record, null, 2)}\n`);
}

function isEmptyFolder(dir: string): boolean {
  return fs.statSync(dir).isDirectory() && fs.readdirSync(dir).length === 0;
}

/**
 * Decides (and for a new cluster as root, records) where the cluster lives. `externalRoot` is only
 * a parameter so tests can point it at a temporary folder.
 */
export function resolveClusterLocation(dataDir: string, options: { asRoot: boolean; externalRoot?: string }): ClusterLocation {
  const inCheckout = path.join(dataDir, "pg");
  const recordFile = path.join(dataDir, LOCATION_FILE);

  if (fs.existsSync(recordFile)) {
    const record = readRecord(recordFile);
    if (record.createdAt && !fs.existsSync(path.join(record.dataDir, "PG_VERSION"))) {
      throw new StartupError(
        `the database recorded in ${recordFile} (${record.dataDir}, made ${record.createdAt}) is missing: ` +
          `restore that folder from your backup; to start over with an empty database instead, move ${recordFile} aside. Nothing was re-created.`,
      );
    }
    return { dataDir: record.dataDir, kind: "recorded" };
  }

  // A cluster (or anything else) already in .data/pg is used, or refused, in place: never moved.
  if (fs.existsSync(inCheckout) && !(options.asRoot && isEmptyFolder(inCheckout))) return { dataDir: inCheckout, kind: "checkout" };
  if (!options.asRoot) return { dataDir: inCheckout, kind: "checkout" };

  // As root, an empty .data/pg is what an earlier failed first start left: it never held data.
  if (fs.existsSync(inCheckout)) {
    console.log(`pierwise: removing the empty ${inCheckout} left by an earlier failed start.`);
    fs.rmdirSync(inCheckout);
  }
  if (fs.existsSync(`${inCheckout}${UNFINISHED_SUFFIX}`)) {
    console.log(`pierwise: removing ${inCheckout}${UNFINISHED_SUFFIX}, left by an initdb that did not finish (it never held data).`);
    fs.rmSync(`${inCheckout}${UNFINISHED_SUFFIX}`, { recursive: true, force: true });
  }
  const root = options.externalRoot ?? EXTERNAL_ROOT;
  const name = path.basename(path.dirname(dataDir)).replace(/[^\w.-]+/g, "-").slice(0, 40) || "pierwise";
  const home = path.join(root, `${name}-${crypto.randomBytes(4).toString("hex")}`);
  // The postgres user needs to pass through these two folders to reach its own cluster folder.
  fs.mkdirSync(home, { recursive: true, mode: 0o755 });
  fs.chmodSync(root, 0o755);
  fs.chmodSync(home, 0o755);
  const location = path.join(home, "pg");
  writeRecord(recordFile, { dataDir: location, createdAt: null });
  return { dataDir: location, kind: "recorded" };
}

/** Notes in .data/pg-location that the recorded cluster now exists, so it is never silently re-made. */
export function markClusterCreated(dataDir: string, location: ClusterLocation): void {
  if (location.kind !== "recorded") return;
  const recordFile = path.join(dataDir, LOCATION_FILE);
  const record = readRecord(recordFile);
  if (!record.createdAt) writeRecord(recordFile, { ...record, createdAt: new Date().toISOString() });
}
