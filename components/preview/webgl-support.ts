/**
 * Up-front WebGL check, so browsers with WebGL switched off get the 2D elevation straight away
 * instead of waiting for the 3D canvas to fail. The answer is kept for the life of the page: every
 * preview on the page (and every remount) reuses it, so the probe asks the browser for one WebGL
 * context at most once. The probe context is released at once: browsers allow only a few live
 * contexts per page.
 */
let known: boolean | undefined;
let software = false;
/** Renderer names of the common CPU rasterisers (Chromium's, Mesa's, Windows'). */
const SOFTWARE_RENDERERS = /swiftshader|llvmpipe|softpipe|software|basic render/i;

/** Set on the probe's own canvas, so the probe can be told apart from the scene's canvas. */
export const PROBE_CANVAS_ATTRIBUTE = "data-webgl-probe";

export function webglAvailable(): boolean {
  if (typeof document === "undefined") return false;
  known ??= probe();
  return known;
}

/**
 * True when WebGL is drawn by a software renderer (no usable GPU): the browser refuses a context
 * that asks to fail on a major performance caveat, or (where software rendering was allowed
 * outright) names a software renderer. The scene draws such frames without multisampling and at
 * one pixel per CSS pixel, so each frame costs the CPU a fraction as much.
 */
export function softwareRendering(): boolean {
  return webglAvailable() && software;
}

function probe(): boolean {
  try {
    const canvas = document.createElement("canvas");
    canvas.setAttribute(PROBE_CANVAS_ATTRIBUTE, "");
    // One canvas: a fast context first; only when that is refused (nothing is made), any context.
    const context = (attributes: WebGLContextAttributes) =>
      (canvas.getContext("webgl2", attributes) ?? canvas.getContext("webgl", attributes)) as WebGLRenderingContext | null;
    let gl = context({ failIfMajorPerformanceCaveat: true });
    if (!gl) {
      gl = context({});
      software = gl !== null;
    }
    if (!gl) return false;
    const info = gl.getExtension("WEBGL_debug_renderer_info");
    if (info && SOFTWARE_RENDERERS.test(String(gl.getParameter(info.UNMASKED_RENDERER_WEBGL)))) software = true;
    gl.getExtension("WEBGL_lose_context")?.loseContext();
    return true;
  } catch {
    return false;
  }
}
