/**
 * `BENCH_PROFILE=1 npm run bench:web`: one more editor load and a few keystrokes under Chromium's
 * sampling CPU profiler, summed by function (self time) and by script, so the report says what
 * work runs on the main thread and not only how long it takes. Production chunks are minified:
 * a function is named by its (short) name, its script and its position in that script.
 */
import type { BrowserContext } from "playwright-core";
import { EDITOR_PROBE } from "./web-editor-probe";

interface ProfileNode { id: number; callFrame: { functionName: string; url: string; lineNumber: number; columnNumber: number } }
interface Profile { nodes: ProfileNode[]; samples: number[]; timeDeltas: number[] }

export interface ProfileSummary { phase: string; totalMs: number; programMs: number; byFunction: [string, number][]; byScript: [string, number][]; timeline?: string[] }

function summarise(phase: string, profile: Profile, top = 18): ProfileSummary {
  const nodes = new Map(profile.nodes.map((n) => [n.id, n]));
  const byFunction = new Map<string, number>();
  const byScript = new Map<string, number>();
  let total = 0;
  let program = 0;
  profile.samples.forEach((id, i) => {
    const ms = (profile.timeDeltas[i] ?? 0) / 1000;
    const frame = nodes.get(id)!.callFrame;
    if (frame.functionName === "(program)") program += ms;
    if (frame.functionName === "(idle)" || frame.functionName === "(program)") return;
    total += ms;
    const script = frame.url ? frame.url.replace(/^.*\/_next\/static\/chunks\//, "").replace(/^https?:\/\/[^/]+/, "") : "(native)";
    const name = `${frame.functionName || "(anonymous)"} ${script}:${frame.lineNumber + 1}:${frame.columnNumber + 1}`;
    byFunction.set(name, (byFunction.get(name) ?? 0) + ms);
    byScript.set(script, (byScript.get(script) ?? 0) + ms);
  });
  const sorted = (m: Map<string, number>) => [...m.entries()].sort((a, b) => b[1] - a[1]).slice(0, top);
  return { phase, totalMs: total, programMs: program, byFunction: sorted(byFunction), byScript: sorted(byScript) };
}

/** Loads the editor with the profiler on (load, until 3 s after the first draw), then types `keystrokes` keys with it on again. */
export async function profileEditor(context: BrowserContext, url: string, keystrokes: number): Promise<ProfileSummary[]> {
  await context.addInitScript({ content: EDITOR_PROBE });
  const page = await context.newPage();
  const cdp = await context.newCDPSession(page);
  // BENCH_TRACE=file.json also writes a Chromium performance trace of the load (open it in the
  // browser's performance panel, or read its main-thread tasks).
  const traceFile = process.env.BENCH_TRACE;
  if (traceFile) await context.browser()!.startTracing(page, { path: traceFile, categories: ["devtools.timeline", "disabled-by-default-devtools.timeline", "v8.execute", "blink.user_timing", "loading", "toplevel", "blink", "gpu", "disabled-by-default-v8.cpu_profiler"] });
  await cdp.send("Profiler.enable");
  await cdp.send("Profiler.setSamplingInterval", { interval: 250 });
  await cdp.send("Profiler.start");
  await page.goto(url, { waitUntil: "load" });
  await page.waitForFunction(() => (window as unknown as { __bench: { firstDraw: number | null } }).__bench.firstDraw !== null, null, { timeout: 30_000 }).catch(() => undefined);
  await page.waitForTimeout(3000);
  const load = (await cdp.send("Profiler.stop")).profile as Profile;
  if (traceFile) await context.browser()!.stopTracing();
  // When each script and font arrived, the long tasks and the first draw, on one clock.
  const timeline = await page.evaluate(() => {
    const b = (window as unknown as { __bench: { firstDraw: number | null; programs: number[]; longTasks: { start: number; duration: number }[] } }).__bench;
    const rows: [number, string][] = [];
    for (const e of performance.getEntriesByType("resource") as PerformanceResourceTiming[]) {
      if (!/\.(js|woff2?|css)(\?|$)/.test(e.name)) continue;
      rows.push([e.startTime, `fetch ${e.name.replace(/^.*\//, "")} until ${e.responseEnd.toFixed(0)} (${(e.encodedBodySize / 1024).toFixed(0)} kB)`]);
    }
    const nav = performance.getEntriesByType("navigation")[0] as PerformanceNavigationTiming | undefined;
    if (nav) rows.push([nav.responseEnd, "HTML received"], [nav.domContentLoadedEventEnd, "DOMContentLoaded done"]);
    for (const t of b.longTasks) rows.push([t.start, `long task ${t.duration.toFixed(0)} ms`]);
    for (const t of b.programs) rows.push([t, "shader program created"]);
    if (b.firstDraw !== null) rows.push([b.firstDraw, "FIRST DRAW"]);
    return rows.sort((a, c) => a[0] - c[0]).map(([t, what]) => `${t.toFixed(0).padStart(6)} ms  ${what}`);
  });

  const wind = page.getByLabel("Basic wind speed");
  await wind.fill("125");
  await page.waitForTimeout(1500);
  if (traceFile) await context.browser()!.startTracing(page, { path: traceFile.replace(/\.json$/, "") + ".typing.json", categories: ["devtools.timeline", "disabled-by-default-devtools.timeline", "v8.execute", "blink.user_timing", "toplevel", "blink", "gpu"] });
  await cdp.send("Profiler.start");
  for (let i = 0; i < keystrokes; i++) {
    await wind.evaluate((el: HTMLInputElement) => {
      el.focus();
      el.setSelectionRange(1, 2);
    });
    await page.keyboard.press(i % 2 === 0 ? "7" : "2");
    await page.waitForTimeout(400);
  }
  const typing = (await cdp.send("Profiler.stop")).profile as Profile;
  if (traceFile) await context.browser()!.stopTracing();
  await page.close();
  return [{ ...summarise("editor load", load), timeline }, summarise(`typing ${keystrokes} keys`, typing)];
}

export function profileLines(summaries: ProfileSummary[]): string[] {
  const lines: string[] = [];
  for (const s of summaries) {
    lines.push(`CPU profile, ${s.phase}: ${s.totalMs.toFixed(0)} ms in scripts, ${s.programMs.toFixed(0)} ms in the browser's own work (layout, paint, GPU waits)`);
    if (s.timeline) lines.push("  timeline (ms after navigation):", ...s.timeline.map((l) => `    ${l}`));
    lines.push("  by script:");
    for (const [name, ms] of s.byScript) lines.push(`    ${ms.toFixed(1).padStart(8)} ms  ${name}`);
    lines.push("  by function (self time):");
    for (const [name, ms] of s.byFunction) lines.push(`    ${ms.toFixed(1).padStart(8)} ms  ${name}`);
  }
  return lines;
}
