import { spawnSync } from "node:child_process";
import fs from "node:fs";
import path from "node:path";
import { StartupError } from "./fail";

const SOURCES = ["app", "engine", "components", "db", "public", "package.json", "next.config.mjs", "tsconfig.json", "knexfile.ts"];

function newestMtime(entry: string): number {
  const stat = fs.statSync(entry, { throwIfNoEntry: false });
  if (!stat) return 0;
  if (!stat.isDirectory()) return stat.mtimeMs;
  let newest = stat.mtimeMs;
  for (const child of fs.readdirSync(entry)) newest = Math.max(newest, newestMtime(path.join(entry, child)));
  return newest;
}

/** True when there is no production build, or a source file is newer than it. */
export function buildIsStale(root: string, distDir = ".next"): boolean {
  const buildId = fs.statSync(path.join(root, distDir, "BUILD_ID"), { throwIfNoEntry: false });
  if (!buildId) return true;
  const newestSource = Math.max(...SOURCES.map((s) => newestMtime(path.join(root, s))));
  return newestSource > buildId.mtimeMs;
}

export function buildApp(root: string, env: NodeJS.ProcessEnv): void {
  console.log("pierwise: building the app (sources changed or no build yet)…");
  const result = spawnSync(path.join(root, "node_modules/.bin/next"), ["build"], { cwd: root, env, stdio: "inherit" });
  if (result.status !== 0) throw new StartupError("`next build` failed: read the errors above, fix them and start again.");
}
