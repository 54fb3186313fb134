"use client";
import type { ComponentType, CSSProperties } from "react";
import type { DesignPreviewProps } from "./design-preview";
import { loadable } from "./loadable";
import { preloadScene } from "./scene-loader";
import { useLoadable } from "./use-loadable";

/**
 * Keeps React Three Fiber, three.js and the scene out of the host page's first load. Where WebGL
 * is there, the preview shell and the scene chunk are both requested as soon as this module is
 * evaluated: the page's client modules are evaluated before it hydrates, so both load while the
 * page's own scripts start. Without WebGL the scene is never fetched.
 */
const previewShell = loadable<{ default: ComponentType<DesignPreviewProps> }>(() => import("./design-preview"));
if (typeof window !== "undefined") {
  previewShell.load().catch(() => undefined);
  preloadScene();
}

/** The 3D preview, loaded on demand in the browser only. Props as `DesignPreview`. */
export function DesignPreviewLazy(props: DesignPreviewProps) {
  const shell = useLoadable(previewShell);
  const style = { "--pw-preview-h": `${(props.height ?? 440) + 120}px` } as CSSProperties;
  const Shell = shell?.default;
  return (
    <div style={style}>
      {Shell ? (
        <Shell {...props} />
      ) : (
        // As tall as the preview will be (toolbar, canvas, caption), so the page does not jump.
        <div role="status" className="flex h-[var(--pw-preview-h,560px)] items-center justify-center rounded-lg border border-slate-200 bg-slate-50 text-sm text-slate-500">
          Loading the 3D preview…
        </div>
      )}
    </div>
  );
}
