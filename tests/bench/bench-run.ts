import type { ChildProcess } from "node:child_process";
import fs from "node:fs";
import { stopServer, type Cluster } from "../../db/lib/postgres";
import type { StandIns } from "../../db/lib/stand-ins";

/** What a benchmark that serves the app has started. */
export interface BenchResources {
  servers: ChildProcess[];
  standIns?: StandIns;
  cluster?: Cluster;
  workDir: string;
}

/**
 * Stops the app servers first and lets them exit (a server writing a CPU profile needs a moment),
 * then the stand-ins and the throwaway cluster, and removes the working folder.
 */
export async function stopBench({ servers, standIns, cluster, workDir }: BenchResources): Promise<void> {
  for (const s of servers) s.kill("SIGTERM");
  await Promise.all(servers.map((s) => (s.exitCode !== null ? undefined : new Promise((r) => { s.once("exit", r); setTimeout(r, 10_000); }))));
  await standIns?.stop();
  try {
    if (cluster) stopServer(cluster, "immediate");
  } catch (error) {
    console.error(String(error));
  }
  fs.rmSync(workDir, { recursive: true, force: true });
}

/** Runs a benchmark, cleaning up after it whether it finishes, fails or is interrupted. */
export function runBench(name: string, main: () => Promise<void>, cleanUp: () => Promise<void>): void {
  process.on("SIGINT", () => void cleanUp().then(() => process.exit(130)));
  main()
    .then(cleanUp)
    .catch(async (error) => {
      console.error(`${name} failed:`, error);
      await cleanUp();
      process.exit(1);
    });
}
