"use client";
import { useThree } from "@react-three/fiber";
import { useLayoutEffect, useMemo, useRef } from "react";
import { Matrix4, Quaternion, Vector3, type InstancedMesh } from "three";
import type { PreviewGeometry } from "@/engine/geometry/preview";
import { beamSegment, footingUprights, groundMesh, moduleInstances, panelQuaternion, postUprights, railSegments, type Segment } from "./scene-mapping";
import { DRAW } from "./scene-style";
import { SceneLine } from "./scene-line";
import { LINE_MATERIALS, MATERIALS, UNIT_BOX, UNIT_CYLINDER } from "./shared-resources";

/** Grade: the engine's sloped ground patch, part-transparent so the footings below it show. */
export function Ground({ g }: { g: PreviewGeometry }) {
  const mesh = useMemo(() => groundMesh(g), [g]);
  return (
    <group>
      <mesh material={MATERIALS.ground} renderOrder={2}>
        <bufferGeometry key={mesh.positions.join(",")}>
          <bufferAttribute attach="attributes-position" args={[mesh.positions, 3]} />
          <bufferAttribute attach="index" args={[new Uint16Array(mesh.indices), 1]} />
        </bufferGeometry>
      </mesh>
      <SceneLine points={mesh.outline} material={LINE_MATERIALS.groundEdge} />
    </group>
  );
}

export function Footings({ g }: { g: PreviewGeometry }) {
  const ups = useMemo(() => footingUprights(g), [g]);
  return ups.map((u) => (
    <mesh key={u.id} geometry={UNIT_CYLINDER} material={MATERIALS.footing} position={u.position} scale={[u.radiusFt * 2, u.heightFt, u.radiusFt * 2]} />
  ));
}

export function Posts({ g }: { g: PreviewGeometry }) {
  const ups = useMemo(() => postUprights(g), [g]);
  return ups.map((u) => (
    <mesh key={u.id} geometry={UNIT_CYLINDER} material={MATERIALS.post} position={u.position} scale={[u.radiusFt * 2, u.heightFt, u.radiusFt * 2]} />
  ));
}

function Member({ s, sectionFt, material }: { s: Segment; sectionFt: number; material: typeof MATERIALS.beam }) {
  return <mesh geometry={UNIT_BOX} material={material} position={s.position} quaternion={s.quaternion} scale={[sectionFt, s.lengthFt, sectionFt]} />;
}

export function Racking({ g }: { g: PreviewGeometry }) {
  const beam = useMemo(() => beamSegment(g), [g]);
  const rails = useMemo(() => railSegments(g), [g]);
  return (
    <group>
      <Member s={beam} sectionFt={DRAW.beamSectionFt} material={MATERIALS.beam} />
      {rails.map((r, i) => <Member key={i} s={r} sectionFt={DRAW.railSectionFt} material={MATERIALS.rail} />)}
    </group>
  );
}

/**
 * The modules as two instanced meshes: a light frame at the module's full size and a dark cell just
 * inside it, so rows and columns read at any distance. Matrices are rewritten when the geometry
 * changes (not every frame).
 */
export function Modules({ g }: { g: PreviewGeometry }) {
  const frames = useRef<InstancedMesh>(null);
  const cells = useRef<InstancedMesh>(null);
  const invalidate = useThree((s) => s.invalidate);
  const instances = useMemo(() => moduleInstances(g), [g]);
  const turn = useMemo(() => new Quaternion(...panelQuaternion(g)), [g]);
  const count = instances.length;

  useLayoutEffect(() => {
    const m = new Matrix4(), p = new Vector3(), s = new Vector3();
    const inset = DRAW.railSectionFt; // a frame about as wide as a rail is drawn
    instances.forEach((inst, i) => {
      p.set(...inst.position);
      frames.current?.setMatrixAt(i, m.compose(p, turn, s.set(...inst.scale)));
      s.set(Math.max(inst.scale[0] - inset, inst.scale[0] * 0.9), inst.scale[1] * 1.2, Math.max(inst.scale[2] - inset, inst.scale[2] * 0.9));
      cells.current?.setMatrixAt(i, m.compose(p, turn, s));
    });
    for (const mesh of [frames.current, cells.current]) {
      if (!mesh) continue;
      mesh.instanceMatrix.needsUpdate = true;
      mesh.computeBoundingSphere();
    }
    invalidate();
  }, [instances, turn, invalidate]);

  return (
    <group>
      <instancedMesh key={`f${count}`} ref={frames} args={[UNIT_BOX, MATERIALS.moduleFrame, count]} />
      <instancedMesh key={`c${count}`} ref={cells} args={[UNIT_BOX, MATERIALS.moduleCell, count]} />
    </group>
  );
}
