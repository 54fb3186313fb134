"use client";
import { memo, useLayoutEffect, useMemo, useRef, useState } from "react";
import type { PreviewGeometry } from "@/engine/geometry/preview";
import { sceneBounds, type ViewName } from "./camera-framing";
import type { PreviewFigures } from "./preview-labels";
import { sceneLabels } from "./scene-annotations";
import { LabelLayer, placeLabelElements, type LabelSizes } from "./scene-labels";
import { SceneView } from "./scene-view";
import { windSceneLabel } from "./wind-label";
import { softwareRendering } from "./webgl-support";

export interface SceneProps {
  geometry: PreviewGeometry;
  figures: PreviewFigures;
  view: { name: ViewName; seq: number };
  readOnly: boolean;
  label: string;
  onContextLost: () => void;
}

/**
 * The 3D canvas (scene-view.ts draws it). Renders on demand only (a changed geometry, a camera
 * move), never on a re-render of the page with the same geometry: the parts share their shapes
 * and materials, so a new design rewrites a few buffers but compiles no shader program. Nothing
 * is drawn until every program is compiled, so the first frame is complete and nothing compiles
 * after it.
 */
export const Scene = memo(function Scene({ geometry, figures, view, readOnly, label, onContextLost }: SceneProps) {
  const bounds = useMemo(() => sceneBounds(geometry), [geometry]);
  const labels = useMemo(() => sceneLabels(geometry, figures, bounds.radiusFt, geometry.wind ? windSceneLabel(geometry.wind) : null), [geometry, figures, bounds.radiusFt]);
  const [ready, setReady] = useState(false);
  const host = useRef<HTMLDivElement>(null);
  const sceneView = useRef<SceneView | null>(null);
  const labelElements = useRef(new Map<string, HTMLElement>());
  // Read by each frame: the labels of the latest render, and the callback of the latest props.
  const latest = useRef({ labels, onContextLost });
  latest.current = { labels, onContextLost };

  useLayoutEffect(() => {
    const sizes: LabelSizes = new Map();
    const v = new SceneView({
      host: host.current!,
      software: softwareRendering(),
      onFrame: (camera, size) => placeLabelElements(latest.current.labels, labelElements.current, sizes, camera, size),
      onReady: () => setReady(true),
      onContextLost: () => latest.current.onContextLost(),
    });
    sceneView.current = v;
    return () => {
      sceneView.current = null;
      v.dispose();
    };
  }, []);
  // In this order after the view is made: the view to frame, then the design (which starts the compile).
  useLayoutEffect(() => sceneView.current?.setView(view), [view]);
  useLayoutEffect(() => sceneView.current?.setZoom(!readOnly), [readOnly]);
  useLayoutEffect(() => sceneView.current?.setGeometry(geometry, bounds), [geometry, bounds]);
  // New label text (a changed unit system) needs a frame to be placed even when nothing else moved.
  useLayoutEffect(() => sceneView.current?.invalidate(), [labels]);

  return (
    <div className="relative h-full">
      <div ref={host} aria-label={label} role="img" className="relative h-full w-full overflow-hidden" />
      <LabelLayer labels={labels} elements={labelElements} />
      {ready ? null : (
        <div role="status" className="pointer-events-none absolute inset-0 flex items-center justify-center bg-slate-50 text-sm text-slate-500">
          Loading the 3D scene…
        </div>
      )}
    </div>
  );
});
