/**
 * The editor in a WebGL browser for bench:web: its load (3D first draw, main-thread blocking,
 * shader programs, all JS including the scene), then typing in the wind speed (one keystroke
 * flips 125 ↔ 175 mph by replacing the middle digit, so every keystroke changes the footing checks;
 * neither is the demo design's saved 115 mph).
 */
import type { Browser, BrowserContext, Page } from "playwright-core";
import { gzipKb } from "./web-bundles";
import { EDITOR_PROBE, type ProbeState } from "./web-editor-probe";
import { median } from "./web-http";

export interface EditorFigures {
  jsWith3dKb: number;
  firstDrawMs: number | null;
  syncGlMs: number;
  sceneChunkAtMs: number | null;
  htmlAtMs: number | null;
  loadBlockingMs: number;
  loadLongestTaskMs: number;
  programsAtFirstDraw: number;
  programsAfterFirstDraw: number;
  offscreenPrograms: number;
  keystrokes: number;
  keyToResultMs: number;
  keyToResultPaintMs: number;
  keyToNextPaintMs: number;
  typingLongTasksOver50: number;
  typingLongestTaskMs: number;
  drawCallsPerKeystroke: number;
  programsWhileTyping: number;
  missedResults: number;
}

const state = (page: Page) => page.evaluate(() => (window as unknown as { __bench: ProbeState }).__bench);

export async function measureEditor(context: BrowserContext, url: string, keystrokes: number): Promise<EditorFigures> {
  await context.addInitScript({ content: EDITOR_PROBE });
  const page = await context.newPage();
  const scripts = new Map<string, Promise<number>>();
  page.on("response", (r) => {
    if (r.request().resourceType() === "script" && !scripts.has(r.url())) scripts.set(r.url(), r.body().then(gzipKb, () => 0));
  });
  await page.goto(url, { waitUntil: "load" });
  await page.waitForFunction(() => (window as unknown as { __bench: ProbeState }).__bench.firstDraw !== null, null, { timeout: 30_000 }).catch(() => undefined);
  // Let the load settle (fonts, labels, late shader compiles) before reading the load figures.
  await page.waitForTimeout(3000);
  const loaded = await state(page);
  const loadEnd = await page.evaluate(() => performance.now());
  // When the page's HTML had arrived, and when the largest script (the 3D scene's chunk) had.
  const [htmlAtMs, sceneChunkAtMs] = await page.evaluate(() => {
    const nav = performance.getEntriesByType("navigation")[0] as PerformanceNavigationTiming | undefined;
    const scripts = (performance.getEntriesByType("resource") as PerformanceResourceTiming[]).filter((e) => /\.js(\?|$)/.test(e.name));
    const largest = scripts.sort((a, b) => b.decodedBodySize - a.decodedBodySize)[0];
    return [nav ? nav.responseEnd : null, largest ? largest.responseEnd : null];
  });
  const loadTasks = loaded.longTasks.filter((t) => t.start < loadEnd);
  const firstDraw = loaded.firstDraw;
  const jsWith3dKb = (await Promise.all(scripts.values())).reduce((a, b) => a + b, 0);

  const wind = page.getByLabel("Basic wind speed");
  await wind.fill("125");
  await page.waitForTimeout(1500);
  const typingStart = await page.evaluate(() => performance.now());
  const keysBefore = (await state(page)).keys.length;
  for (let i = 0; i < keystrokes; i++) {
    await wind.evaluate((el: HTMLInputElement) => {
      el.focus();
      el.setSelectionRange(1, 2);
    });
    await page.keyboard.press(i % 2 === 0 ? "7" : "2");
    await page
      .waitForFunction(() => { const k = (window as unknown as { __bench: ProbeState }).__bench.keys.at(-1); return !!k && k.paintAt !== null; }, null, { timeout: 5000 })
      .catch(() => undefined);
    await page.waitForTimeout(400);
  }
  const typingEnd = await page.evaluate(() => performance.now());
  const typed = await state(page);
  const keys = typed.keys.slice(keysBefore);
  const done = keys.filter((k) => k.resultAt !== null && k.paintAt !== null);
  const inTyping = <T extends { start: number }>(xs: T[]) => xs.filter((x) => x.start >= typingStart && x.start <= typingEnd);
  const interactions = new Map<number, number>();
  for (const e of inTyping(typed.events)) interactions.set(e.id, Math.max(interactions.get(e.id) ?? 0, e.duration));
  const typingTasks = inTyping(typed.longTasks);
  const draws = typed.draws.filter((t) => t >= typingStart && t <= typingEnd).length;
  await page.close();

  return {
    jsWith3dKb,
    firstDrawMs: firstDraw,
    syncGlMs: loaded.syncGlMs,
    sceneChunkAtMs,
    htmlAtMs,
    loadBlockingMs: loadTasks.reduce((a, t) => a + Math.max(0, t.duration - 50), 0),
    loadLongestTaskMs: Math.max(0, ...loadTasks.map((t) => t.duration)),
    programsAtFirstDraw: firstDraw === null ? 0 : loaded.programs.filter((t) => t <= firstDraw).length,
    programsAfterFirstDraw: firstDraw === null ? 0 : typed.programs.filter((t) => t > firstDraw).length,
    offscreenPrograms: typed.offscreenPrograms,
    keystrokes: keys.length,
    keyToResultMs: median(done.map((k) => k.resultAt! - k.t)),
    keyToResultPaintMs: median(done.map((k) => k.paintAt! - k.t)),
    keyToNextPaintMs: median([...interactions.values()]),
    typingLongTasksOver50: typingTasks.length,
    typingLongestTaskMs: Math.max(0, ...typingTasks.map((t) => t.duration)),
    drawCallsPerKeystroke: keys.length ? draws / keys.length : 0,
    programsWhileTyping: typed.programs.filter((t) => t >= typingStart && t <= typingEnd).length,
    missedResults: keys.length - done.length,
  };
}

export type { Browser };
