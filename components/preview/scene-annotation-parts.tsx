"use client";
import { Billboard, Text } from "@react-three/drei";
import { useFrame } from "@react-three/fiber";
import { useMemo, useRef, useState } from "react";
import { Vector3, type Group, type PerspectiveCamera } from "three";
import { configureTextBuilder } from "troika-three-text";
import type { PreviewGeometry } from "@/engine/geometry/preview";
import { arrowParts, clearanceDimension, embedmentDimension, northMarker, windArrow, type DimensionLine } from "./scene-annotations";
import type { Bounds } from "./camera-framing";
import type { Vec3 } from "./scene-mapping";
import { latinOnly, windSceneLabel, type PreviewFigures } from "./preview-labels";
import { COLOURS, FONT_URL } from "./scene-style";
import { SceneLine } from "./scene-line";
import { LINE_MATERIALS, MATERIALS, UNIT_CONE, UNIT_CYLINDER } from "./shared-resources";

// Lay out label text on the main thread: the worker the text builder would start is made from a
// blob: URL and loads code into itself, which the content-security policy (proxy.ts) refuses.
// The scene has a handful of short labels, so the main thread does not notice the work.
configureTextBuilder({ useWorker: false });

type Side = "left" | "center" | "right";

/**
 * Text that always faces the camera, drawn over the parts in the shipped font at a fixed size on
 * screen (`px`), whatever the array's size or the zoom: the billboard is rescaled each frame from
 * its distance to the camera. `side` puts the text left or right of its point, centred on it, or
 * ("auto") on whichever side faces the middle of the view, so labels at the edge of a narrow phone
 * view do not run off the canvas.
 */
function Label({ at, text, color, px = 13, side = "auto" }: { at: Vec3; text: string; color: string; px?: number; side?: Side | "auto" }) {
  const [autoSide, setAutoSide] = useState<Side>("right");
  const group = useRef<Group>(null);
  const probe = useMemo(() => new Vector3(), []);
  useFrame(({ camera, size }) => {
    const g = group.current;
    if (!g) return;
    const fovRad = ((camera as PerspectiveCamera).fov * Math.PI) / 180;
    const worldPerPx = (2 * camera.position.distanceTo(probe.set(...at)) * Math.tan(fovRad / 2)) / Math.max(size.height, 1);
    g.scale.setScalar(worldPerPx * px);
    if (side !== "auto") return;
    const want = probe.project(camera).x < 0 ? "right" : "left";
    if (want !== autoSide) setAutoSide(want);
  });
  const shown = side === "auto" ? autoSide : side;
  const gap = shown === "center" ? 0 : shown === "left" ? -0.6 : 0.6;
  return (
    <Billboard position={at} ref={group}>
      <Text
        font={FONT_URL}
        position={[gap, 0, 0]}
        fontSize={1}
        color={color}
        anchorX={shown === "left" ? "right" : shown === "right" ? "left" : "center"}
        anchorY="middle"
        outlineWidth={0.12}
        outlineColor="#ffffff"
        renderOrder={20}
        material={MATERIALS.label}
      >
        {latinOnly(text)}
      </Text>
    </Billboard>
  );
}

function Dimension({ d, kind, text }: { d: DimensionLine; kind: "clearance" | "embedment"; text: string }) {
  const material = LINE_MATERIALS[kind];
  return (
    <group>
      <SceneLine points={[d.from, d.to]} material={material} renderOrder={15} />
      {d.ticks.map((t, i) => <SceneLine key={i} points={t} material={material} renderOrder={15} />)}
      <Label at={d.labelAt} text={text} color={COLOURS[kind]} />
    </group>
  );
}

/** Arrow and marker sizes follow the scene's size, so they read on a 3-module or a 300-module array. */
const markerSizeFor = (bounds: Bounds) => Math.max(0.4, bounds.radiusFt * 0.045);

function Arrow({ tail, head, radiusFt, material }: { tail: Vec3; head: Vec3; radiusFt: number; material: typeof MATERIALS.wind }) {
  const { shaft, cone } = useMemo(() => arrowParts(tail, head), [tail, head]);
  return (
    <group>
      <mesh geometry={UNIT_CYLINDER} material={material} position={shaft.position} quaternion={shaft.quaternion} scale={[radiusFt * 2, shaft.lengthFt, radiusFt * 2]} />
      <mesh geometry={UNIT_CONE} material={material} position={cone.position} quaternion={cone.quaternion} scale={[radiusFt * 5, cone.lengthFt, radiusFt * 5]} />
    </group>
  );
}

export function Annotations({ g, figures, bounds }: { g: PreviewGeometry; figures: PreviewFigures; bounds: Bounds }) {
  const size = markerSizeFor(bounds);
  const clearance = useMemo(() => clearanceDimension(g), [g]);
  const embedment = useMemo(() => embedmentDimension(g), [g]);
  const wind = useMemo(() => windArrow(g, bounds.radiusFt * 0.45), [g, bounds.radiusFt]);
  const north = useMemo(() => northMarker(g), [g]);
  const northTip = useMemo<Vec3>(() => [north.at[0] + north.north[0] * size * 3, north.at[1], north.at[2] + north.north[2] * size * 3], [north, size]);

  return (
    <group>
      <Dimension d={clearance} kind="clearance" text={`Clearance ${figures.clearance}`} />
      <Dimension d={embedment} kind="embedment" text={`Embedment ${figures.embedment}`} />
      {wind ? (
        <group>
          <Arrow tail={wind.tail} head={wind.head} radiusFt={size * 0.18} material={MATERIALS.wind} />
          <Label at={[wind.tail[0], wind.tail[1] + size * 3, wind.tail[2]]} text={g.wind ? windSceneLabel(g.wind) : ""} color={COLOURS.wind} />
        </group>
      ) : null}
      <Arrow tail={north.at} head={northTip} radiusFt={size * 0.08} material={MATERIALS.north} />
      <Label at={[northTip[0], northTip[1] + size, northTip[2]]} text="N" color={COLOURS.north} px={16} side="center" />
    </group>
  );
}
