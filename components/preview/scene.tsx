"use client";
import { createRoot, type ReconcilerRoot, type RootState, type RootStore } from "@react-three/fiber";
import { memo, useCallback, useInsertionEffect, useLayoutEffect, useMemo, useRef, useState, type ReactNode } from "react";
import type { PreviewGeometry } from "@/engine/geometry/preview";
import { sceneBounds, type ViewName } from "./camera-framing";
import type { PreviewFigures } from "./preview-labels";
import { sceneLabels } from "./scene-annotations";
import { SceneContent } from "./scene-content";
import { LabelLayer, placeLabelElements, type LabelSizes } from "./scene-labels";
import { windSceneLabel } from "./wind-label";
import { softwareRendering } from "./webgl-support";

export interface SceneProps {
  /** The geometry the scene draws: the same object for as long as the drawing is the same (same-drawing.ts). */
  drawing: PreviewGeometry;
  figures: PreviewFigures;
  view: { name: ViewName; seq: number };
  readOnly: boolean;
  label: string;
  onContextLost: () => void;
}

const DPR: [number, number] = [1, 2];
const GL = { antialias: true, alpha: false, powerPreference: "high-performance" } as const;
// Without a GPU every pixel and every sample is the CPU's work: one pixel per CSS pixel, no multisampling.
const SOFTWARE_DPR = 1;
const SOFTWARE_GL = { ...GL, antialias: false };
const CAMERA = { fov: 35, near: 0.1, far: 1000 };

const onCreated = ({ gl }: RootState) => {
  // Each check is a round trip to the GPU process that waits for the compile; three.js advises
  // turning it off in production (a failed program still draws nothing).
  gl.debug.checkShaderErrors = process.env.NODE_ENV !== "production";
};

/**
 * The 3D canvas: a React Three Fiber root of its own (`createRoot` on the canvas, not `<Canvas>`),
 * drawing on demand only (a changed drawing, a camera move, a resize). Only the three.js classes
 * the scene's elements use are registered (scene-content.tsx), so the scene's chunk carries only
 * what it draws with. The root's tree is rendered again only when the drawing, the view or
 * read-only changes: a new result with the same drawing reconciles nothing in the root and draws
 * no frame, and new label text (other figures, another unit system) is placed over the last frame
 * without drawing one. The root follows its box's size only (a ResizeObserver; pointer events use
 * offsets within the canvas), so scrolling the page measures and draws nothing; no pointer events
 * are raycast (the orbit controls listen on the canvas themselves).
 */
export const Scene = memo(function Scene({ drawing, figures, view, readOnly, label, onContextLost }: SceneProps) {
  const bounds = useMemo(() => sceneBounds(drawing), [drawing]);
  const labels = useMemo(() => sceneLabels(drawing, figures, bounds.radiusFt, drawing.wind ? windSceneLabel(drawing.wind) : null), [drawing, figures, bounds.radiusFt]);
  const [ready, setReady] = useState(false);
  // An error from the renderer's start or from inside the root, thrown here for the preview's error boundary.
  const [failure, setFailure] = useState<{ error: unknown } | null>(null);
  if (failure) throw failure.error;

  const container = useRef<HTMLDivElement>(null);
  const canvas = useRef<HTMLCanvasElement>(null);
  const root = useRef<ReconcilerRoot<HTMLCanvasElement> | null>(null);
  const store = useRef<RootStore | null>(null);
  const content = useRef<ReactNode>(null);
  const labelsNow = useRef(labels);
  const labelElements = useRef(new Map<string, HTMLElement>());
  const [sizes] = useState<LabelSizes>(() => new Map());
  const drawn = useRef(false);
  // The latest callback, read when the context is lost (the listener stays the same).
  const latestLost = useRef(onContextLost);
  latestLost.current = onContextLost;
  const lost = useCallback(() => latestLost.current(), []);
  const onReady = useCallback(() => {
    drawn.current = true;
    setReady(true);
  }, []);
  const onError = useCallback((error: unknown) => setFailure({ error }), []);

  /** Renders the latest content into the root once it is configured (before that, configuring renders it). */
  const renderContent = useCallback(() => {
    const r = root.current;
    if (r && content.current && r.ready.status === "fulfilled") store.current = r.render(content.current);
  }, []);

  // The root: made once the box has a size, configured again when the size changes.
  useLayoutEffect(() => {
    const box = container.current!, element = canvas.current!;
    const software = softwareRendering();
    const configure = (width: number, height: number) => {
      if (width <= 0 || height <= 0) return;
      const first = root.current === null;
      root.current ??= createRoot(element);
      root.current
        .configure({ frameloop: "demand", dpr: software ? SOFTWARE_DPR : DPR, gl: software ? SOFTWARE_GL : GL, camera: CAMERA, size: { width, height, top: 0, left: 0 }, onCreated })
        .catch((error: unknown) => setFailure({ error }));
      if (first) renderContent();
    };
    const rect = box.getBoundingClientRect();
    configure(rect.width, rect.height);
    const observer = new ResizeObserver(([entry]) => configure(entry.contentRect.width, entry.contentRect.height));
    observer.observe(box);
    return () => observer.disconnect();
  }, [renderContent]);

  // The root's tree, again only when what it draws changes.
  useLayoutEffect(() => {
    content.current = (
      <SceneContent
        drawing={drawing}
        bounds={bounds}
        view={view}
        enableZoom={!readOnly}
        labels={labelsNow}
        elements={labelElements}
        sizes={sizes}
        onReady={onReady}
        onContextLost={lost}
        onError={onError}
      />
    );
    renderContent();
  }, [drawing, bounds, view, readOnly, sizes, onReady, lost, onError, renderContent]);

  // New label text over the same drawing (another force, another unit system): placed over the
  // frame already drawn, from its camera, without drawing one. A new drawing's frame places them.
  const labelsDrawing = useRef(drawing);
  useLayoutEffect(() => {
    const sameDrawing = labelsDrawing.current === drawing;
    labelsDrawing.current = drawing;
    labelsNow.current = labels;
    const state = store.current?.getState();
    if (!sameDrawing || !drawn.current || !state) return;
    placeLabelElements(labels, labelElements.current, sizes, state.camera, state.size);
  }, [labels, drawing, sizes]);

  // Insertion effects survive a Strict Mode replay: only the preview's removal ends the root
  // (its tree unmounted, then the renderer disposed and its context released).
  useInsertionEffect(() => () => {
    root.current?.unmount();
    root.current = null;
    store.current = null;
  }, []);

  return (
    <div className="relative h-full">
      <div ref={container} className="h-full w-full overflow-hidden" aria-label={label} role="img">
        <canvas ref={canvas} className="block" />
      </div>
      <LabelLayer labels={labels} elements={labelElements} />
      {ready ? null : (
        <div role="status" className="pointer-events-none absolute inset-0 flex items-center justify-center bg-slate-50 text-sm text-slate-500">
          Loading the 3D scene…
        </div>
      )}
    </div>
  );
});
