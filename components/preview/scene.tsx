"use client";
import { OrbitControls } from "@react-three/drei";
import { Canvas, useThree } from "@react-three/fiber";
import { memo, Suspense, useLayoutEffect, useMemo, useState } from "react";
import type { PreviewGeometry } from "@/engine/geometry/preview";
import { sceneBounds, type ViewName } from "./camera-framing";
import { CameraRig } from "./camera-rig";
import type { PreviewFigures } from "./preview-labels";
import { Annotations } from "./scene-annotation-parts";
import { COLOURS, FONT_URL } from "./scene-style";
import { Footings, Ground, Modules, Posts, Racking } from "./scene-structure";

// The labels' font starts downloading with this chunk, while React is still mounting the canvas
// (the text library's own request then finds it in the browser's cache).
if (typeof window !== "undefined") void fetch(FONT_URL).catch(() => undefined);

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

/**
 * Compiles every shader program the scene needs without blocking the page (the renderer polls the
 * driver's parallel compile), then lets the canvas draw its first frame. Mounted inside the same
 * Suspense boundary as the parts and labels, so it runs once all of them (and the font) are there.
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
 * the labels' font is loaded and every program is compiled, so the first frame is complete.
 */
export const Scene = memo(function Scene({ geometry, figures, view, readOnly, label, onContextLost }: SceneProps) {
  const bounds = useMemo(() => sceneBounds(geometry), [geometry]);
  const [ready, setReady] = useState(false);
  const onReady = useMemo(() => () => setReady(true), []);
  const r = bounds.radiusFt;
  const c = bounds.centre;
  const [camera] = useState(() => ({ fov: 35, position: [c[0] + r, c[1] + r, c[2] + 2 * r] as [number, number, number] }));
  return (
    <div className="relative h-full">
      <Canvas
        frameloop={ready ? "demand" : "never"}
        dpr={DPR}
        camera={camera}
        gl={GL}
        aria-label={label}
        role="img"
        onCreated={({ gl }) => gl.domElement.addEventListener("webglcontextlost", onContextLost, { once: true })}
      >
        <color attach="background" args={[COLOURS.background]} />
        <hemisphereLight args={["#ffffff", "#6b705c", 1.4]} />
        <directionalLight position={[c[0] + r, c[1] + 2 * r, c[2] + 1.5 * r]} intensity={1.8} />
        <Suspense fallback={null}>
          <Footings g={geometry} />
          <Posts g={geometry} />
          <Racking g={geometry} />
          <Modules g={geometry} />
          <Ground g={geometry} />
          <Annotations g={geometry} figures={figures} bounds={bounds} />
          <OrbitControls makeDefault enableDamping={false} enableZoom={!readOnly} />
          <CameraRig bounds={bounds} view={view} />
          {ready ? <FirstFrame /> : <CompileThenDraw onReady={onReady} />}
        </Suspense>
      </Canvas>
      {ready ? null : (
        <div role="status" className="pointer-events-none absolute inset-0 flex items-center justify-center bg-slate-50 text-sm text-slate-500">
          Loading the 3D scene…
        </div>
      )}
    </div>
  );
});
