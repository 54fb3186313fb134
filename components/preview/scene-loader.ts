/**
 * The 3D scene's code (React Three Fiber and three.js), loaded once per page and shared by every
 * preview on it, and only where WebGL is there (a browser that gets the 2D elevation never
 * downloads it). Started as early as the page allows: when the module of the preview's host
 * (design-preview-lazy.tsx, imported by the editor and the review page) is evaluated, which is
 * before the page hydrates.
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
