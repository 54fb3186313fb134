"use client";
import { Canvas } from "@react-three/fiber";
import { memo, useEffect, useMemo, useRef, useState } from "react";
import type { PreviewGeometry } from "@/engine/geometry/preview";
import { CameraRig } from "./camera-rig";
import { sceneBounds, type Bounds, type ViewName } from "./camera-framing";
import type { PreviewFigures } from "./preview-labels";
import { sceneLabels } from "./scene-annotations";
import { SceneDraw } from "./scene-draw";
import { LabelLayer } from "./scene-labels";
import { buildParts } from "./scene-parts";
import { COLOURS } from "./scene-style";
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

const DPR: [number, number] = [1, 2];
const GL = { antialias: true, alpha: false, powerPreference: "high-performance" } as const;
// Without a GPU every pixel and every sample is the CPU's work: one pixel per CSS pixel, no multisampling.
const SOFTWARE_DPR = 1;
const SOFTWARE_GL = { ...GL, antialias: false };
const CAMERA = { fov: 35, near: 0.1, far: 1000 };
// The canvas follows its box's size only: nothing here needs its place on the page (pointer
// events use offsets within the canvas), so scrolling the page measures and draws nothing.
const RESIZE = { scroll: false, debounce: { scroll: 0, resize: 0 } };

/**
 * One design's parts (scene-parts.ts: instanced unit shapes with shared materials), mounted as a
 * primitive. A new design swaps in new parts — the same shapes and materials, new small buffers —
 * and frees the old parts' buffers; the shared shapes and materials are never disposed.
 */
function DesignParts({ geometry, bounds }: { geometry: PreviewGeometry; bounds: Bounds }) {
  const parts = useMemo(() => buildParts(geometry, bounds), [geometry, bounds]);
  useEffect(() => () => parts.dispose(), [parts]);
  return <primitive object={parts.group} dispose={null} />;
}

/**
 * The 3D canvas: a React Three Fiber canvas that draws on demand only (a changed design, a camera
 * move, a resize), never on a re-render of the page with the same design. The parts share their
 * shapes and materials, so a new design rewrites a few buffers but compiles no shader program;
 * nothing is drawn until every program is compiled (scene-draw.tsx), so the first frame is
 * complete and nothing compiles after it.
 */
export const Scene = memo(function Scene({ geometry, figures, view, readOnly, label, onContextLost }: SceneProps) {
  const bounds = useMemo(() => sceneBounds(geometry), [geometry]);
  const labels = useMemo(() => sceneLabels(geometry, figures, bounds.radiusFt, geometry.wind ? windSceneLabel(geometry.wind) : null), [geometry, figures, bounds.radiusFt]);
  const [ready, setReady] = useState(false);
  const [software] = useState(softwareRendering);
  const onReady = useMemo(() => () => setReady(true), []);
  const labelElements = useRef(new Map<string, HTMLElement>());
  // The latest callback, read when the context is lost (the listener stays the same).
  const latestLost = useRef(onContextLost);
  latestLost.current = onContextLost;
  const lost = useMemo(() => () => latestLost.current(), []);
  const c = bounds.centre, r = bounds.radiusFt;

  return (
    <div className="relative h-full">
      <Canvas
        frameloop="demand"
        resize={RESIZE}
        dpr={software ? SOFTWARE_DPR : DPR}
        gl={software ? SOFTWARE_GL : GL}
        camera={CAMERA}
        aria-label={label}
        role="img"
        onCreated={({ gl }) => {
          // Each check is a round trip to the GPU process that waits for the compile; three.js
          // advises turning it off in production (a failed program still draws nothing).
          gl.debug.checkShaderErrors = process.env.NODE_ENV !== "production";
        }}
      >
        <color attach="background" args={[COLOURS.background]} />
        <hemisphereLight args={[0xffffff, 0x6b705c, 1.4]} />
        <directionalLight position={[c[0] + r, c[1] + 2 * r, c[2] + 1.5 * r]} intensity={1.8} />
        <DesignParts geometry={geometry} bounds={bounds} />
        <CameraRig bounds={bounds} view={view} enableZoom={!readOnly} />
        <SceneDraw labels={labels} elements={labelElements} onReady={onReady} onContextLost={lost} />
      </Canvas>
      <LabelLayer labels={labels} elements={labelElements} />
      {ready ? null : (
        <div role="status" className="pointer-events-none absolute inset-0 flex items-center justify-center bg-slate-50 text-sm text-slate-500">
          Loading the 3D scene…
        </div>
      )}
    </div>
  );
});
