import fs from "node:fs";
import path from "node:path";
import { StartupError } from "./fail";

/**
 * What a running `npm start` leaves under .data/: its own PID (start.lock) and the web server's
 * PID (children.json). After a kill -9 both are stale; the next start clears them and stops an
 * orphaned web server so its port is free again. PostgreSQL's own postmaster.pid is never touched.
 */
function alive(pid: number): boolean {
  try {
    process.kill(pid, 0);
    return true;
  } catch {
    return false;
  }
}

function commandLine(pid: number): string {
  try {
    return fs.readFileSync(`/proc/${pid}/cmdline`, "utf8").replace(/\0/g, " ");
  } catch {
    return "";
  }
}

export function acquireStartLock(dataDir: string): void {
  const lock = path.join(dataDir, "start.lock");
  if (fs.existsSync(lock)) {
    const pid = Number(fs.readFileSync(lock, "utf8").trim());
    if (pid && pid !== process.pid && alive(pid) && commandLine(pid).includes("start")) {
      throw new StartupError(
        `Pierwise is already running (pid ${pid}): stop it with Ctrl-C in its terminal (or \`kill ${pid}\`) before starting again.`,
      );
    }
    console.log(`pierwise: clearing a stale lock left by a run that did not stop cleanly (pid ${pid || "?"}).`);
  }
  fs.writeFileSync(lock, String(process.pid));
}

export function releaseStartLock(dataDir: string): void {
  const lock = path.join(dataDir, "start.lock");
  if (fs.existsSync(lock) && fs.readFileSync(lock, "utf8").trim() === String(process.pid)) fs.rmSync(lock);
}

export function recordChild(dataDir: string, pid: number | undefined): void {
  if (pid) fs.writeFileSync(path.join(dataDir, "children.json"), JSON.stringify({ web: pid }));
}

/** Stops a web server left running by a start command that was killed. */
export function stopOrphans(dataDir: string): void {
  const file = path.join(dataDir, "children.json");
  if (!fs.existsSync(file)) return;
  const { web } = JSON.parse(fs.readFileSync(file, "utf8")) as { web?: number };
  if (web && alive(web) && commandLine(web).includes("next")) {
    console.log(`pierwise: stopping the web server left by an earlier run (pid ${web}).`);
    try {
      process.kill(web, "SIGTERM");
    } catch {
      /* already gone */
    }
  }
  fs.rmSync(file);
}
