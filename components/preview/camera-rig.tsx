"use client";
import { useFrame, useThree } from "@react-three/fiber";
import { useEffect, useLayoutEffect, useMemo, useRef } from "react";
import { Vector3, type PerspectiveCamera } from "three";
import { OrbitControls } from "three/examples/jsm/controls/OrbitControls.js";
import { cameraForView, type Bounds, type ViewName } from "./camera-framing";

/**
 * Orbit, pan and (unless read-only) wheel zoom from three's own controls, and the named views:
 * a view is framed on the scene's bounds and the camera eased there over a few frames in
 * useFrame (mutating the camera and controls, no React state). It re-frames on its own only when
 * the scene's size changes a lot, so a user's orbit survives small edits. Each user move asks for
 * one frame (the canvas draws on demand); an eased move asks for the next frame until it arrives.
 */
export function CameraRig({ bounds, view, enableZoom }: { bounds: Bounds; view: { name: ViewName; seq: number }; enableZoom: boolean }) {
  const camera = useThree((s) => s.camera) as PerspectiveCamera;
  const domElement = useThree((s) => s.gl.domElement);
  const width = useThree((s) => s.size.width);
  const height = useThree((s) => s.size.height);
  const invalidate = useThree((s) => s.invalidate);
  const controls = useMemo(() => new OrbitControls(camera), [camera]);
  const goal = useRef<{ position: Vector3; target: Vector3 } | null>(null);
  const framedRadius = useRef<number | null>(null);
  const lastSeq = useRef<number | null>(null);
  // True while this rig moves the controls itself: its own moves ask for frames on their own terms.
  const easing = useRef(false);

  useEffect(() => {
    controls.enableDamping = false;
    controls.enableZoom = enableZoom;
  }, [controls, enableZoom]);

  // Listeners in an effect (not the constructor), so an effect replay reconnects them.
  useEffect(() => {
    const onChange = () => {
      if (!easing.current) invalidate();
    };
    controls.connect(domElement);
    controls.addEventListener("change", onChange);
    return () => {
      controls.removeEventListener("change", onChange);
      controls.disconnect();
    };
  }, [controls, domElement, invalidate]);
  useEffect(() => () => controls.dispose(), [controls]);

  // Before the first frame (a layout effect), so the first frame is drawn from the framed view.
  useLayoutEffect(() => {
    const resized = framedRadius.current === null || Math.abs(bounds.radiusFt - framedRadius.current) > framedRadius.current * 0.2;
    const asked = lastSeq.current !== view.seq;
    lastSeq.current = view.seq;
    if (!resized && !asked) return;
    const first = framedRadius.current === null;
    framedRadius.current = bounds.radiusFt;
    const fit = cameraForView(view.name, bounds, camera.fov, width / Math.max(height, 1));
    camera.near = Math.max(0.05, fit.distanceFt / 200);
    camera.far = fit.distanceFt * 10;
    camera.updateProjectionMatrix();
    goal.current = { position: new Vector3(...fit.position), target: new Vector3(...fit.target) };
    if (first) {
      camera.position.copy(goal.current.position);
      camera.lookAt(goal.current.target);
      controls.target.copy(goal.current.target);
      easing.current = true;
      controls.update();
      easing.current = false;
      goal.current = null;
    }
    invalidate();
  }, [bounds, view, camera, controls, width, height, invalidate]);

  // Before the draw (priority 0 runs ahead of the scene's draw at priority 1).
  useFrame(() => {
    const g = goal.current;
    if (!g) return;
    camera.position.lerp(g.position, 0.25);
    controls.target.lerp(g.target, 0.25);
    if (camera.position.distanceTo(g.position) < framedRadius.current! * 1e-3) {
      camera.position.copy(g.position);
      controls.target.copy(g.target);
      goal.current = null;
    }
    easing.current = true;
    controls.update();
    easing.current = false;
    // Asked from inside a frame: R3F draws one more after this one.
    if (goal.current) invalidate();
  });
  return null;
}
