"use client";
import { OrbitControls } from "@react-three/drei";
import { Canvas } from "@react-three/fiber";
import { Suspense, useMemo } from "react";
import type { PreviewGeometry } from "@/engine/geometry/preview";
import { sceneBounds, type ViewName } from "./camera-framing";
import { CameraRig } from "./camera-rig";
import type { PreviewFigures } from "./preview-labels";
import { Annotations } from "./scene-annotation-parts";
import { COLOURS } from "./scene-style";
import { Footings, Ground, Modules, Posts, Racking } from "./scene-structure";

export interface SceneProps {
  geometry: PreviewGeometry;
  figures: PreviewFigures;
  view: { name: ViewName; seq: number };
  readOnly: boolean;
  label: string;
  onContextLost: () => void;
}

/**
 * The 3D canvas. Renders on demand (only when something changed or the camera moves): the page
 * may sit open for a long time and software WebGL is costly.
 */
export function Scene({ geometry, figures, view, readOnly, label, onContextLost }: SceneProps) {
  const bounds = useMemo(() => sceneBounds(geometry), [geometry]);
  const r = bounds.radiusFt;
  const c = bounds.centre;
  return (
    <Canvas
      frameloop="demand"
      dpr={[1, 2]}
      camera={{ fov: 35, position: [c[0] + r, c[1] + r, c[2] + 2 * r] }}
      gl={{ antialias: true }}
      aria-label={label}
      role="img"
      onCreated={({ gl }) => gl.domElement.addEventListener("webglcontextlost", onContextLost, { once: true })}
    >
      <color attach="background" args={[COLOURS.background]} />
      <hemisphereLight args={["#ffffff", "#6b705c", 1.4]} />
      <directionalLight position={[c[0] + r, c[1] + 2 * r, c[2] + 1.5 * r]} intensity={1.8} />
      <Footings g={geometry} />
      <Posts g={geometry} />
      <Racking g={geometry} />
      <Modules g={geometry} />
      <Ground g={geometry} />
      <Suspense fallback={null}>
        <Annotations g={geometry} figures={figures} bounds={bounds} />
      </Suspense>
      <OrbitControls makeDefault enableDamping={false} enableZoom={!readOnly} />
      <CameraRig bounds={bounds} view={view} />
    </Canvas>
  );
}
