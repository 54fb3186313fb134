"use client";
import { useThree } from "@react-three/fiber";
import { useEffect, useLayoutEffect, useMemo } from "react";
import { Line2 } from "three/examples/jsm/lines/Line2.js";
import { LineGeometry } from "three/examples/jsm/lines/LineGeometry.js";
import type { LineMaterial } from "three/examples/jsm/lines/LineMaterial.js";
import type { Vec3 } from "./scene-mapping";

/**
 * A screen-width line through `points`, drawn with one of the shared line materials
 * (shared-resources.ts), which are never disposed. A new design swaps in a new vertex buffer and
 * nothing else: the line's shader program stays compiled. (A line that owned its material and
 * disposed it on every change made the renderer compile the program again at each update.)
 */
export function SceneLine({ points, material, renderOrder = 0 }: { points: Vec3[]; material: LineMaterial; renderOrder?: number }) {
  const line = useMemo(() => new Line2(new LineGeometry(), material), [material]);
  const invalidate = useThree((s) => s.invalidate);
  const positions = points.flat();
  const key = positions.join(",");

  useLayoutEffect(() => {
    const geometry = new LineGeometry();
    geometry.setPositions(positions);
    const old = line.geometry;
    line.geometry = geometry;
    old.dispose();
    line.computeLineDistances();
    invalidate();
    // Keyed on the coordinates themselves: a re-render with equal points changes nothing.
    // eslint-disable-next-line react-hooks/exhaustive-deps
  }, [line, key, invalidate]);
  useEffect(() => () => line.geometry.dispose(), [line]);

  return <primitive object={line} renderOrder={renderOrder} />;
}
