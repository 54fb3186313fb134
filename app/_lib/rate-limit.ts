/**
 * A per-key request limit over a fixed window, kept in this server's memory. Enough for a public
 * page on one app server; with several servers each counts its own share.
 */
const windows = new Map<string, { startedAt: number; count: number }>();

export function allowRequest(key: string, limit: number, windowMs: number, now = Date.now()): boolean {
  const w = windows.get(key);
  if (!w || now - w.startedAt >= windowMs) {
    if (windows.size > 10_000) windows.clear(); // a flood of addresses cannot grow this without bound
    windows.set(key, { startedAt: now, count: 1 });
    return true;
  }
  w.count += 1;
  return w.count <= limit;
}
