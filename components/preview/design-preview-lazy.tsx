"use client";
import dynamic from "next/dynamic";
import type { CSSProperties } from "react";
import type { DesignPreviewProps } from "./design-preview";
import { webglAvailable } from "./webgl-support";

/**
 * Keeps three.js and the scene out of the host page's first load. Where WebGL is there, the
 * preview shell and the scene chunk are both requested as soon as the host page's scripts run,
 * while the page is still hydrating, rather than after hydration mounts the preview (and the
 * scene only after the shell arrives); without WebGL the scene is never fetched.
 */
const loadScene = () => import("./scene");
const loadShell = () => import("./design-preview");
if (typeof window !== "undefined" && webglAvailable()) {
  void loadShell();
  void loadScene();
}

const DesignPreviewChunk = dynamic<DesignPreviewProps>(() => {
  if (webglAvailable()) void loadScene();
  return loadShell();
}, {
  ssr: false,
  // As tall as the preview will be (toolbar, canvas, caption), so the page does not jump.
  loading: () => (
    <div role="status" className="flex h-[var(--pw-preview-h,560px)] items-center justify-center rounded-lg border border-slate-200 bg-slate-50 text-sm text-slate-500">
      Loading the 3D preview…
    </div>
  ),
});

/** The 3D preview, loaded on demand in the browser only. Props as `DesignPreview`. */
export function DesignPreviewLazy(props: DesignPreviewProps) {
  const style = { "--pw-preview-h": `${(props.height ?? 440) + 120}px` } as CSSProperties;
  return (
    <div style={style}>
      <DesignPreviewChunk {...props} />
    </div>
  );
}
