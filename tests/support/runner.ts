import { spawnSync } from "node:child_process";
import fs from "node:fs";
import path from "node:path";

/** Adds up vitest's JSON reports in a folder. */
export function countResults(reportDir: string): { passed: number; failed: number } {
  let passed = 0;
  let failed = 0;
  for (const file of fs.readdirSync(reportDir).filter((f) => f.endsWith(".json"))) {
    const report = JSON.parse(fs.readFileSync(path.join(reportDir, file), "utf8")) as {
      numPassedTests: number;
      numFailedTests: number;
      numFailedTestSuites?: number;
    };
    passed += report.numPassedTests;
    // A file that fails to load has no failed tests but a failed suite: count it.
    failed += report.numFailedTests + (report.numFailedTests === 0 ? (report.numFailedTestSuites ?? 0) : 0);
  }
  return { passed, failed };
}

export const CHROMIUM = "/usr/bin/chromium";

/** Debian's Chromium drives the browser tests; as root on a fresh machine, install it. */
export function ensureChromium(): void {
  if (fs.existsSync(CHROMIUM)) return;
  if (process.getuid?.() !== 0) {
    throw new Error("Chromium is needed for browser tests: run `sudo apt-get install -y chromium` and try again.");
  }
  console.log("tests: installing Debian's chromium package (one time)…");
  const env = { ...process.env, DEBIAN_FRONTEND: "noninteractive" };
  spawnSync("apt-get", ["update", "-qq"], { stdio: "inherit", env });
  const result = spawnSync("apt-get", ["install", "-y", "-qq", "chromium"], { stdio: "inherit", env });
  if (result.status !== 0 || !fs.existsSync(CHROMIUM)) throw new Error("could not install chromium with apt-get.");
}

export async function waitForHttp(url: string, timeoutMs: number): Promise<void> {
  const deadline = Date.now() + timeoutMs;
  while (Date.now() < deadline) {
    try {
      const response = await fetch(url);
      if (response.ok) return;
    } catch {
      /* not up yet */
    }
    await new Promise((r) => setTimeout(r, 250));
  }
  throw new Error(`${url} did not answer within ${timeoutMs} ms`);
}
