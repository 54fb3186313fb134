/**
 * What a request says about where it came from and how, read only from what the app can trust:
 * the socket's address (stamped by db/lib/peer-address.cjs) and, from a trusted proxy only, its
 * X-Forwarded-For and X-Forwarded-Proto. No `next/headers` here, so proxy.ts (which sets HSTS
 * from servedOverHttps) and route code share one rule.
 */

/** Set by db/lib/peer-address.cjs from the socket; a client's own copy is overwritten. */
export const PEER_HEADER = "x-pierwise-peer-address";

/** "::ffff:192.0.2.1" and "192.0.2.1" are the same IPv4 address. */
function plain(address: string): string {
  const a = address.trim();
  return a.startsWith("::ffff:") && a.includes(".") ? a.slice(7) : a;
}

/** Addresses of the reverse proxies in front of the app (TRUSTED_PROXIES, comma-separated), if any. */
function trustedProxies(): Set<string> {
  return new Set((process.env.TRUSTED_PROXIES ?? "").split(",").map(plain).filter(Boolean));
}

/**
 * The caller's address: the socket's, unless that socket is a trusted proxy, in which case the
 * last X-Forwarded-For entry that is not itself a trusted proxy (entries further left were
 * written by the client and prove nothing). Without the socket header (a development server
 * started without the preload) every caller is "local": never a value the client chose.
 */
export function clientAddress(h: Headers): string {
  const peer = h.get(PEER_HEADER);
  if (!peer) return "local";
  const trusted = trustedProxies();
  let address = plain(peer);
  if (!trusted.has(address)) return address;
  const chain = (h.get("x-forwarded-for") ?? "").split(",").map(plain).filter(Boolean);
  while (chain.length) {
    address = chain.pop()!;
    if (!trusted.has(address)) return address;
  }
  return address;
}

/**
 * Whether the person reached the app over https: the app's URL setting (APP_URL) says so, or the
 * socket is a trusted proxy that terminated TLS and said so in X-Forwarded-Proto. Only its last
 * entry counts (the one the nearest proxy wrote; anything to the left may come from the client),
 * and from any other caller the header is ignored: a client cannot make the app think it is
 * encrypted, nor talk it out of it when APP_URL is https.
 */
export function servedOverHttps(h: Headers, appUrl = process.env.APP_URL ?? ""): boolean {
  if (appUrl.startsWith("https://")) return true;
  const peer = h.get(PEER_HEADER);
  if (!peer || !trustedProxies().has(plain(peer))) return false;
  const proto = (h.get("x-forwarded-proto") ?? "").split(",").map((p) => p.trim().toLowerCase()).filter(Boolean).at(-1);
  return proto === "https";
}
