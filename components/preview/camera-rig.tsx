"use client";
import { useFrame, useThree } from "@react-three/fiber";
import { useEffect, useRef } from "react";
import { PerspectiveCamera, Vector3 } from "three";
import type { OrbitControls as OrbitControlsImpl } from "three/examples/jsm/controls/OrbitControls.js";
import { cameraForView, type Bounds, type ViewName } from "./camera-framing";

/**
 * Moves the camera to a named view, framed on the scene's bounds. The move is eased over a few
 * frames in useFrame (mutating the camera and controls, no React state), and re-frames on its own
 * only when the scene's size changes a lot (so a user's orbit survives small edits).
 */
export function CameraRig({ bounds, view }: { bounds: Bounds; view: { name: ViewName; seq: number } }) {
  const camera = useThree((s) => s.camera) as PerspectiveCamera;
  const controls = useThree((s) => s.controls) as OrbitControlsImpl | null;
  const size = useThree((s) => s.size);
  const invalidate = useThree((s) => s.invalidate);
  const goal = useRef<{ position: Vector3; target: Vector3 } | null>(null);
  const framedRadius = useRef<number | null>(null);
  const lastSeq = useRef<number | null>(null);

  useEffect(() => {
    const resized = framedRadius.current === null || Math.abs(bounds.radiusFt - framedRadius.current) > framedRadius.current * 0.2;
    const asked = lastSeq.current !== view.seq;
    if (!resized && !asked) return;
    const first = framedRadius.current === null;
    framedRadius.current = bounds.radiusFt;
    lastSeq.current = view.seq;
    const fit = cameraForView(view.name, bounds, camera.fov, size.width / Math.max(size.height, 1));
    camera.near = Math.max(0.05, fit.distanceFt / 200);
    camera.far = fit.distanceFt * 10;
    camera.updateProjectionMatrix();
    goal.current = { position: new Vector3(...fit.position), target: new Vector3(...fit.target) };
    if (first || !controls) {
      camera.position.copy(goal.current.position);
      camera.lookAt(goal.current.target);
      controls?.target.copy(goal.current.target);
      controls?.update();
      goal.current = controls ? null : goal.current;
    }
    invalidate();
  }, [bounds, view, camera, controls, size.width, size.height, invalidate]);

  useFrame(() => {
    const g = goal.current;
    if (!g || !controls) return;
    camera.position.lerp(g.position, 0.25);
    controls.target.lerp(g.target, 0.25);
    if (camera.position.distanceTo(g.position) < framedRadius.current! * 1e-3) {
      camera.position.copy(g.position);
      controls.target.copy(g.target);
      goal.current = null;
    }
    controls.update();
    invalidate();
  });
  return null;
}
