/**
 * The 3D scene's code (three.js), loaded once per page and shared by every preview on it, and
 * only where WebGL is there (a browser that gets the 2D elevation never downloads it). Started as
 * early as the page allows: on the design editor by instrumentation-client.ts before the page
 * hydrates, elsewhere when a preview's host module runs. The scene's chunk shares no module with
 * the page (its labels are plain text, its figures come in as props), so loading it from the
 * instrumentation hook duplicates nothing. No React here: the hook imports this module.
 */
import type { ComponentType } from "react";
import type { SceneProps } from "./scene";
import { loadable } from "./loadable";
import { webglAvailable } from "./webgl-support";

export const previewScene = loadable<{ Scene: ComponentType<SceneProps> }>(() => import("./scene"));

/** Starts the scene's download where WebGL is there; a second call does nothing. */
export function preloadScene(): void {
  if (typeof window !== "undefined" && webglAvailable()) previewScene.load().catch(() => undefined);
}
