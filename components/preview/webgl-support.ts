/**
 * Up-front WebGL check, so browsers with WebGL switched off get the 2D elevation straight away
 * instead of waiting for the 3D canvas to fail. The probe context is released at once: browsers
 * allow only a few live contexts per page.
 */
let answer: boolean | undefined;

export function webglAvailable(): boolean {
  if (typeof document === "undefined") return false;
  // Asked by the preview's loader and again by the preview: one probe per page is enough.
  answer ??= probe();
  return answer;
}

function probe(): boolean {
  try {
    const canvas = document.createElement("canvas");
    const gl = (canvas.getContext("webgl2") ?? canvas.getContext("webgl")) as WebGLRenderingContext | null;
    if (!gl) return false;
    gl.getExtension("WEBGL_lose_context")?.loseContext();
    return true;
  } catch {
    return false;
  }
}
