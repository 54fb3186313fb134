/**
 * What bench:web plants in the editor page before any of the app's scripts run: counters on the
 * WebGL calls that matter (shader programs made, draw calls), long tasks, event timings, and a
 * watch on the results that stamps when each keystroke's result reaches the page and when the
 * frame after it is painted. Plain JavaScript in a string: it runs in the browser as is.
 */
export const EDITOR_PROBE = String.raw`
(() => {
  const b = (window.__bench = { programs: [], offscreenPrograms: 0, draws: [], firstDraw: null, syncGlMs: 0, longTasks: [], events: [], keys: [] });
  for (const C of [window.WebGLRenderingContext, window.WebGL2RenderingContext]) {
    if (!C) continue;
    const p = C.prototype;
    // Only the page's own canvases count: the text library draws glyph outlines on a detached
    // canvas of its own, which is not the scene's first draw.
    const createProgram = p.createProgram;
    p.createProgram = function () {
      if (this.canvas && this.canvas.isConnected) b.programs.push(performance.now());
      else b.offscreenPrograms += 1;
      return createProgram.apply(this, arguments);
    };
    // Calls that wait for the GPU process (a shader's compile, a program's link) before the first
    // draw: time the page's main thread spends blocked on the renderer while the scene starts.
    for (const name of ["getProgramParameter", "getShaderParameter", "getActiveUniform", "getUniformLocation", "getActiveAttrib", "getAttribLocation", "getParameter", "getExtension", "getSupportedExtensions", "getContextAttributes"]) {
      const f = p[name];
      if (!f) continue;
      p[name] = function () {
        if (b.firstDraw !== null || !(this.canvas && this.canvas.isConnected)) return f.apply(this, arguments);
        const t = performance.now();
        try { return f.apply(this, arguments); } finally { b.syncGlMs += performance.now() - t; }
      };
    }
    for (const name of ["drawElements", "drawArrays", "drawElementsInstanced", "drawArraysInstanced"]) {
      const f = p[name];
      if (!f) continue;
      p[name] = function () {
        if (!(this.canvas && this.canvas.isConnected)) return f.apply(this, arguments);
        const t = performance.now();
        if (b.firstDraw === null) b.firstDraw = t;
        b.draws.push(t);
        return f.apply(this, arguments);
      };
    }
  }
  try {
    new PerformanceObserver((l) => { for (const e of l.getEntries()) b.longTasks.push({ start: e.startTime, duration: e.duration }); })
      .observe({ type: "longtask", buffered: true });
  } catch {}
  try {
    new PerformanceObserver((l) => { for (const e of l.getEntries()) if (e.interactionId) b.events.push({ id: e.interactionId, name: e.name, start: e.startTime, duration: e.duration }); })
      .observe({ type: "event", durationThreshold: 16, buffered: true });
  } catch {}
  // The footing and its checks: what a designer reads after each keystroke.
  const resultText = () => {
    const spec = document.querySelector('[data-testid="footing-spec"]');
    const checks = document.getElementById("res-checks");
    return (spec ? spec.textContent : "") + "|" + (checks && checks.parentElement ? checks.parentElement.textContent : "");
  };
  const onChange = () => {
    const k = b.keys[b.keys.length - 1];
    if (!k || k.resultAt !== null || resultText() === k.before) return;
    k.resultAt = performance.now();
    requestAnimationFrame(() => {
      const ch = new MessageChannel();
      ch.port1.onmessage = () => { k.paintAt = performance.now(); };
      ch.port2.postMessage(0);
    });
  };
  document.addEventListener("keydown", (e) => {
    if (!/^[0-9]$/.test(e.key)) return;
    b.keys.push({ t: e.timeStamp, before: resultText(), resultAt: null, paintAt: null });
  }, true);
  const start = () => new MutationObserver(onChange).observe(document.body, { subtree: true, childList: true, characterData: true });
  if (document.body) start(); else document.addEventListener("DOMContentLoaded", start);
})();
`;

export interface ProbeState {
  programs: number[];
  offscreenPrograms: number;
  draws: number[];
  firstDraw: number | null;
  /** Time in WebGL calls that wait on the GPU process (compile status, uniforms, parameters) before the first draw. */
  syncGlMs: number;
  longTasks: { start: number; duration: number }[];
  events: { id: number; name: string; start: number; duration: number }[];
  keys: { t: number; before: string; resultAt: number | null; paintAt: number | null }[];
}
