/**
 * First-load JS per route for bench:web: every script the browser fetches while a route loads on
 * an empty cache, until the network is idle (link prefetches of other routes refused), summed after gzip -9 (the size on the wire with a
 * well-configured server). Measured in a browser with WebGL off, so the 3D scene never loads: the
 * figure is the page's own weight; the editor's scene is measured on its own in web-editor.ts.
 */
import zlib from "node:zlib";
import type { Browser, BrowserContext } from "playwright-core";

export interface RouteWeight {
  name: string;
  path: string;
  scripts: number;
  gzipKb: number;
}

export const gzipKb = (body: Buffer) => zlib.gzipSync(body, { level: 9 }).length / 1024;

export async function scriptsWhileLoading(context: BrowserContext, url: string): Promise<Map<string, number>> {
  const page = await context.newPage();
  // Link prefetches fetch other routes' chunks at idle, a different set on each run: refused here,
  // so the figure is the route's own first load.
  await page.route("**/*", (route) => (route.request().headers()["next-router-prefetch"] ? route.abort() : route.continue()));
  const sizes = new Map<string, number>();
  const pending: Promise<void>[] = [];
  page.on("response", (response) => {
    if (response.request().resourceType() !== "script" || sizes.has(response.url())) return;
    sizes.set(response.url(), 0);
    pending.push(response.body().then((b) => void sizes.set(response.url(), gzipKb(b)), () => undefined));
  });
  await page.goto(url, { waitUntil: "networkidle" });
  await page.waitForTimeout(500);
  await Promise.all(pending);
  await page.close();
  return sizes;
}

export async function routeWeights(
  browser: Browser,
  routes: { name: string; path: string; as: string | null }[],
  contextFor: (browser: Browser, as: string | null) => Promise<BrowserContext>,
): Promise<RouteWeight[]> {
  const out: RouteWeight[] = [];
  for (const r of routes) {
    // A fresh context per route: nothing cached from the route before.
    const context = await contextFor(browser, r.as);
    const sizes = await scriptsWhileLoading(context, r.path);
    await context.close();
    // BENCH_SCRIPTS=editor (a route's name, or part of it): list that route's scripts, largest first.
    if (process.env.BENCH_SCRIPTS && r.name.includes(process.env.BENCH_SCRIPTS)) {
      for (const [url, kb] of [...sizes].sort((a, b) => b[1] - a[1])) console.log(`  ${r.name}: ${kb.toFixed(1).padStart(6)} kB  ${url.replace(/^.*\/_next\//, "")}`);
    }
    out.push({ name: r.name, path: r.path, scripts: sizes.size, gzipKb: [...sizes.values()].reduce((a, b) => a + b, 0) });
  }
  return out;
}
