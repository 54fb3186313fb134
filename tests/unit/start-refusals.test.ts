import { spawn } from "node:child_process";
import fs from "node:fs";
import net from "node:net";
import os from "node:os";
import path from "node:path";
import { afterEach, describe, expect, it } from "vitest";
import { StartupError } from "@/db/lib/fail";
import { assertPortFree } from "@/db/lib/ports";
import { ensureCluster } from "@/db/lib/postgres";
import { acquireStartLock, releaseStartLock } from "@/db/lib/run-state";

const made: string[] = [];
function tempDir(): string {
  const dir = fs.mkdtempSync(path.join(os.tmpdir(), "pierwise-start-"));
  made.push(dir);
  return dir;
}
afterEach(() => {
  for (const dir of made.splice(0)) fs.rmSync(dir, { recursive: true, force: true });
});

describe("start script refusals", () => {
  it("names the busy port and the variable that moves it", async () => {
    const blocker = net.createServer();
    await new Promise<void>((resolve) => blocker.listen(0, "127.0.0.1", resolve));
    const port = (blocker.address() as net.AddressInfo).port;
    try {
      await expect(assertPortFree(port, "the web app", "PORT")).rejects.toThrow(
        new RegExp(`port ${port} \\(the web app\\) is already in use.*PORT=<port>`),
      );
    } finally {
      blocker.close();
    }
  });

  it("refuses a cluster made by another PostgreSQL version and leaves it untouched", () => {
    const dataDir = tempDir();
    fs.writeFileSync(path.join(dataDir, "PG_VERSION"), "13\n");
    fs.writeFileSync(path.join(dataDir, "keep-me"), "user data");
    const cluster = { binDir: "/nonexistent", dataDir, port: 1, version: "15" };
    expect(() => ensureCluster(cluster, { throwaway: false })).toThrow(StartupError);
    expect(() => ensureCluster(cluster, { throwaway: false })).toThrow(/made by PostgreSQL 13 but this machine has 15/);
    expect(fs.readFileSync(path.join(dataDir, "keep-me"), "utf8")).toBe("user data");
    expect(fs.readFileSync(path.join(dataDir, "PG_VERSION"), "utf8")).toBe("13\n");
  });

  it("refuses a non-empty data folder that is not a cluster instead of initialising over it", () => {
    const dataDir = tempDir();
    fs.writeFileSync(path.join(dataDir, "notes.txt"), "something else");
    const cluster = { binDir: "/nonexistent", dataDir, port: 1, version: "15" };
    expect(() => ensureCluster(cluster, { throwaway: false })).toThrow(/holds no PostgreSQL cluster/);
    expect(fs.readdirSync(dataDir)).toEqual(["notes.txt"]);
  });

  it("refuses to start twice while the first run's process is alive", () => {
    const dataDir = tempDir();
    // A live process whose command line says "start", standing in for a running `npm start`.
    const child = spawn(process.execPath, ["-e", "setTimeout(()=>{}, 10000)", "start"]);
    try {
      fs.writeFileSync(path.join(dataDir, "start.lock"), String(child.pid));
      expect(() => acquireStartLock(dataDir)).toThrow(/already running \(pid \d+\)/);
      expect(fs.readFileSync(path.join(dataDir, "start.lock"), "utf8")).toBe(String(child.pid));
    } finally {
      child.kill();
    }
  });

  it("clears a stale lock left by a killed run and takes it over", () => {
    const dataDir = tempDir();
    fs.writeFileSync(path.join(dataDir, "start.lock"), "999999");
    acquireStartLock(dataDir);
    expect(fs.readFileSync(path.join(dataDir, "start.lock"), "utf8")).toBe(String(process.pid));
    releaseStartLock(dataDir);
    expect(fs.existsSync(path.join(dataDir, "start.lock"))).toBe(false);
  });
});
