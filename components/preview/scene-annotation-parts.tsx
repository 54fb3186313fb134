"use client";
import { useMemo } from "react";
import type { PreviewGeometry } from "@/engine/geometry/preview";
import { arrowParts, clearanceDimension, embedmentDimension, markerSizeFor, northMarker, northTip, windArrow, type DimensionLine } from "./scene-annotations";
import type { Bounds } from "./camera-framing";
import type { Vec3 } from "./scene-mapping";
import { SceneLine } from "./scene-line";
import { LINE_MATERIALS, MATERIALS, UNIT_CONE, UNIT_CYLINDER } from "./shared-resources";

/** The dimension lines and arrows; their labels are page text over the canvas (scene-labels.tsx). */
function Dimension({ d, kind }: { d: DimensionLine; kind: "clearance" | "embedment" }) {
  const material = LINE_MATERIALS[kind];
  return (
    <group>
      <SceneLine points={[d.from, d.to]} material={material} renderOrder={15} />
      {d.ticks.map((t, i) => <SceneLine key={i} points={t} material={material} renderOrder={15} />)}
    </group>
  );
}

function Arrow({ tail, head, radiusFt, material }: { tail: Vec3; head: Vec3; radiusFt: number; material: typeof MATERIALS.wind }) {
  const { shaft, cone } = useMemo(() => arrowParts(tail, head), [tail, head]);
  return (
    <group>
      <mesh geometry={UNIT_CYLINDER} material={material} position={shaft.position} quaternion={shaft.quaternion} scale={[radiusFt * 2, shaft.lengthFt, radiusFt * 2]} />
      <mesh geometry={UNIT_CONE} material={material} position={cone.position} quaternion={cone.quaternion} scale={[radiusFt * 5, cone.lengthFt, radiusFt * 5]} />
    </group>
  );
}

export function Annotations({ g, bounds }: { g: PreviewGeometry; bounds: Bounds }) {
  const size = markerSizeFor(bounds.radiusFt);
  const clearance = useMemo(() => clearanceDimension(g), [g]);
  const embedment = useMemo(() => embedmentDimension(g), [g]);
  const wind = useMemo(() => windArrow(g, bounds.radiusFt * 0.45), [g, bounds.radiusFt]);
  const north = useMemo(() => northMarker(g), [g]);
  const tip = useMemo(() => northTip(g, bounds.radiusFt), [g, bounds.radiusFt]);

  return (
    <group>
      <Dimension d={clearance} kind="clearance" />
      <Dimension d={embedment} kind="embedment" />
      {wind ? <Arrow tail={wind.tail} head={wind.head} radiusFt={size * 0.18} material={MATERIALS.wind} /> : null}
      <Arrow tail={north.at} head={tip} radiusFt={size * 0.08} material={MATERIALS.north} />
    </group>
  );
}
