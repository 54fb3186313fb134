"use client";
import { Canvas, useThree } from "@react-three/fiber";
import { memo, useLayoutEffect, useMemo, useRef, useState } from "react";
import type { PreviewGeometry } from "@/engine/geometry/preview";
import { sceneBounds, type ViewName } from "./camera-framing";
import { CameraRig } from "./camera-rig";
import { windSceneLabel, type PreviewFigures } from "./preview-labels";
import { Annotations } from "./scene-annotation-parts";
import { sceneLabels } from "./scene-annotations";
import { SceneControls } from "./scene-controls";
import { LabelLayer, LabelTracker } from "./scene-labels";
import { COLOURS } from "./scene-style";
import { softwareRendering } from "./webgl-support";
import { Footings, Ground, Modules, Posts, Racking } from "./scene-structure";

export interface SceneProps {
  geometry: PreviewGeometry;
  figures: PreviewFigures;
  view: { name: ViewName; seq: number };
  readOnly: boolean;
  label: string;
  onContextLost: () => void;
}

const DPR: [number, number] = [1, 2];
const GL = { antialias: true };
// Without a GPU every pixel and every sample is the CPU's work: one pixel per CSS pixel, no multisampling.
const SOFTWARE_DPR = 1;
const SOFTWARE_GL = { antialias: false };

/**
 * Compiles every shader program the scene needs without blocking the page (the renderer polls the
 * driver's parallel compile), then lets the canvas draw its first frame. Mounted after the parts,
 * so its layout effect runs once they are all in the scene. (The labels are page text over the
 * canvas: nothing waits for a font.)
 */
function CompileThenDraw({ onReady }: { onReady: () => void }) {
  const gl = useThree((s) => s.gl);
  const scene = useThree((s) => s.scene);
  const camera = useThree((s) => s.camera);
  useLayoutEffect(() => {
    let live = true;
    gl.compileAsync(scene, camera).then(
      () => live && onReady(),
      () => live && onReady(),
    );
    return () => {
      live = false;
    };
  }, [gl, scene, camera, onReady]);
  return null;
}

/** Draws the first frame once `frameloop` leaves "never" (and once more on the next frame, in case the switch lands after this effect). */
function FirstFrame() {
  const invalidate = useThree((s) => s.invalidate);
  useLayoutEffect(() => {
    invalidate();
    const next = requestAnimationFrame(() => invalidate());
    return () => cancelAnimationFrame(next);
  }, [invalidate]);
  return null;
}

/**
 * The 3D canvas. Renders on demand only (a changed geometry, a camera move), never on a re-render
 * of the page with the same geometry: the parts keep their meshes and shared materials, so a new
 * design rewrites transforms and buffers but compiles no shader program. Nothing is drawn until
 * every program is compiled, so the first frame is complete and nothing compiles after it.
 */
export const Scene = memo(function Scene({ geometry, figures, view, readOnly, label, onContextLost }: SceneProps) {
  const bounds = useMemo(() => sceneBounds(geometry), [geometry]);
  const [ready, setReady] = useState(false);
  const [software] = useState(softwareRendering);
  const onReady = useMemo(() => () => setReady(true), []);
  const r = bounds.radiusFt;
  const c = bounds.centre;
  const labels = useMemo(() => sceneLabels(geometry, figures, bounds.radiusFt, geometry.wind ? windSceneLabel(geometry.wind) : null), [geometry, figures, bounds.radiusFt]);
  const labelElements = useRef(new Map<string, HTMLElement>());
  const [camera] = useState(() => ({ fov: 35, position: [c[0] + r, c[1] + r, c[2] + 2 * r] as [number, number, number] }));
  return (
    <div className="relative h-full">
      <Canvas
        frameloop={ready ? "demand" : "never"}
        dpr={software ? SOFTWARE_DPR : DPR}
        camera={camera}
        gl={software ? SOFTWARE_GL : GL}
        aria-label={label}
        role="img"
        onCreated={({ gl }) => {
          gl.domElement.addEventListener("webglcontextlost", onContextLost, { once: true });
          // Each check is a round trip to the GPU process that waits for the compile; three.js
          // advises turning it off in production (a failed program still draws nothing).
          gl.debug.checkShaderErrors = process.env.NODE_ENV !== "production";
        }}
      >
        <color attach="background" args={[COLOURS.background]} />
        <hemisphereLight args={["#ffffff", "#6b705c", 1.4]} />
        <directionalLight position={[c[0] + r, c[1] + 2 * r, c[2] + 1.5 * r]} intensity={1.8} />
        <Footings g={geometry} />
        <Posts g={geometry} />
        <Racking g={geometry} />
        <Modules g={geometry} />
        <Ground g={geometry} />
        <Annotations g={geometry} bounds={bounds} />
        <SceneControls enableZoom={!readOnly} />
        <CameraRig bounds={bounds} view={view} />
        <LabelTracker labels={labels} elements={labelElements} />
        {ready ? <FirstFrame /> : <CompileThenDraw onReady={onReady} />}
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
