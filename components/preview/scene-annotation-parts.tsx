"use client";
import { Billboard, Line, Text } from "@react-three/drei";
import { useMemo } from "react";
import type { PreviewGeometry } from "@/engine/geometry/preview";
import { clearanceDimension, embedmentDimension, northMarker, windArrow, type DimensionLine } from "./scene-annotations";
import type { Bounds } from "./camera-framing";
import { segment, type Vec3 } from "./scene-mapping";
import { latinOnly, windSceneLabel, type PreviewFigures } from "./preview-labels";
import { COLOURS, FONT_URL } from "./scene-style";
import { MATERIALS, UNIT_CONE, UNIT_CYLINDER } from "./shared-resources";

/**
 * Text that always faces the camera and is drawn over the parts, in the shipped font. `side`
 * puts it left or right of its point on screen (the offset is inside the billboard, so in screen
 * space), or centred on it.
 */
function Label({ at, text, color, sizeFt, side = "right" }: { at: Vec3; text: string; color: string; sizeFt: number; side?: "left" | "center" | "right" }) {
  const gap = side === "center" ? 0 : side === "left" ? -sizeFt * 0.6 : sizeFt * 0.6;
  return (
    <Billboard position={at}>
      <Text
        font={FONT_URL}
        position={[gap, 0, 0]}
        fontSize={sizeFt}
        color={color}
        anchorX={side === "left" ? "right" : side === "right" ? "left" : "center"}
        anchorY="middle"
        outlineWidth={sizeFt * 0.12}
        outlineColor="#ffffff"
        renderOrder={20}
        material-depthTest={false}
        material-depthWrite={false}
        material-transparent
      >
        {latinOnly(text)}
      </Text>
    </Billboard>
  );
}

function Dimension({ d, color, text, sizeFt }: { d: DimensionLine; color: string; text: string; sizeFt: number }) {
  return (
    <group>
      <Line points={[d.from, d.to]} color={color} lineWidth={2} depthTest={false} depthWrite={false} transparent renderOrder={15} />
      {d.ticks.map((t, i) => <Line key={i} points={t} color={color} lineWidth={2} depthTest={false} depthWrite={false} transparent renderOrder={15} />)}
      <Label at={d.labelAt} text={text} color={color} sizeFt={sizeFt} side="left" />
    </group>
  );
}

/** Label size follows the scene's size so labels stay readable on a 3-module or a 200-module array. */
export const labelSizeFor = (bounds: Bounds) => Math.max(0.4, bounds.radiusFt * 0.045);

export function Annotations({ g, figures, bounds }: { g: PreviewGeometry; figures: PreviewFigures; bounds: Bounds }) {
  const size = labelSizeFor(bounds);
  const clearance = useMemo(() => clearanceDimension(g), [g]);
  const embedment = useMemo(() => embedmentDimension(g), [g]);
  const wind = useMemo(() => windArrow(g, bounds.radiusFt * 0.45), [g, bounds.radiusFt]);
  const north = useMemo(() => northMarker(g), [g]);
  const shaft = wind ? segment(wind.tail, wind.head) : null;
  const shaftRadius = size * 0.18;
  const northTip: Vec3 = [north.at[0] + north.north[0] * size * 3, north.at[1] + north.north[1] * size * 3, north.at[2] + north.north[2] * size * 3];
  const northShaft = segment(north.at, northTip);

  return (
    <group>
      <Dimension d={clearance} color={COLOURS.clearance} text={`Clearance ${figures.clearance}`} sizeFt={size} />
      <Dimension d={embedment} color={COLOURS.embedment} text={`Embedment ${figures.embedment}`} sizeFt={size} />
      {wind && shaft ? (
        <group>
          <mesh geometry={UNIT_CYLINDER} material={MATERIALS.wind} position={shaft.position} quaternion={shaft.quaternion} scale={[shaftRadius * 2, shaft.lengthFt * 0.8, shaftRadius * 2]} />
          <mesh
            geometry={UNIT_CONE}
            material={MATERIALS.wind}
            position={[wind.head[0] - wind.direction[0] * shaft.lengthFt * 0.1, wind.head[1] - wind.direction[1] * shaft.lengthFt * 0.1, wind.head[2] - wind.direction[2] * shaft.lengthFt * 0.1]}
            quaternion={shaft.quaternion}
            scale={[shaftRadius * 5, shaft.lengthFt * 0.2, shaftRadius * 5]}
          />
          <Label at={[wind.tail[0], wind.tail[1] + size * 1.2, wind.tail[2]]} text={g.wind ? windSceneLabel(g.wind) : ""} color={COLOURS.wind} sizeFt={size} side="center" />
        </group>
      ) : null}
      <group>
        <mesh geometry={UNIT_CYLINDER} material={MATERIALS.north} position={northShaft.position} quaternion={northShaft.quaternion} scale={[size * 0.15, northShaft.lengthFt * 0.7, size * 0.15]} />
        <mesh
          geometry={UNIT_CONE}
          material={MATERIALS.north}
          position={[northTip[0] - north.north[0] * northShaft.lengthFt * 0.15, northTip[1], northTip[2] - north.north[2] * northShaft.lengthFt * 0.15]}
          quaternion={northShaft.quaternion}
          scale={[size * 0.8, northShaft.lengthFt * 0.3, size * 0.8]}
        />
        <Label at={[northTip[0], northTip[1] + size, northTip[2] - size * 0.6]} text="N" color={COLOURS.north} sizeFt={size * 1.3} side="center" />
        <Label at={[north.at[0], north.at[1] + size * 0.2, north.at[2] + size * 1.5]} text={north.assumption} color={COLOURS.north} sizeFt={size * 0.7} side="center" />
      </group>
    </group>
  );
}
