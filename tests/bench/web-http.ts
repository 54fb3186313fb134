/**
 * A small keep-alive HTTP load generator for bench:web (no extra package): a fixed number of
 * connections each send the next request as soon as the last reply has been read.
 */
import http from "node:http";

export interface LoadResult {
  label: string;
  requests: number;
  errors: number;
  seconds: number;
  latenciesMs: number[];
  replyBytes: number;
}

export async function load(options: {
  label: string;
  url: string;
  body: string;
  cookie: string;
  seconds: number;
  connections: number;
}): Promise<LoadResult> {
  const agent = new http.Agent({ keepAlive: true, maxSockets: options.connections });
  const target = new URL(options.url);
  const latenciesMs: number[] = [];
  let errors = 0;
  let replyBytes = 0;
  const started = performance.now();
  const until = started + options.seconds * 1000;

  const once = () =>
    new Promise<void>((resolve) => {
      const t0 = performance.now();
      const req = http.request(
        {
          agent, host: target.hostname, port: target.port, path: target.pathname + target.search, method: "POST",
          headers: { "content-type": "application/json", "content-length": Buffer.byteLength(options.body), cookie: options.cookie },
        },
        (res) => {
          let bytes = 0;
          res.on("data", (chunk: Buffer) => (bytes += chunk.length));
          res.on("end", () => {
            if (res.statusCode !== 200) errors += 1;
            else latenciesMs.push(performance.now() - t0);
            replyBytes = bytes;
            resolve();
          });
        },
      );
      req.on("error", () => {
        errors += 1;
        resolve();
      });
      req.end(options.body);
    });

  const worker = async () => {
    while (performance.now() < until) await once();
  };
  await Promise.all(Array.from({ length: options.connections }, worker));
  const seconds = (performance.now() - started) / 1000;
  agent.destroy();
  return { label: options.label, requests: latenciesMs.length, errors, seconds, latenciesMs, replyBytes };
}

export function percentile(values: number[], p: number): number {
  if (values.length === 0) return NaN;
  const sorted = [...values].sort((a, b) => a - b);
  return sorted[Math.min(sorted.length - 1, Math.floor((p / 100) * sorted.length))];
}

export function median(values: number[]): number {
  return percentile(values, 50);
}
