"use client";
import { useThree } from "@react-three/fiber";
import { useEffect, useMemo } from "react";
import { OrbitControls } from "three/examples/jsm/controls/OrbitControls.js";

/**
 * Orbit, pan and (unless read-only) wheel zoom on the canvas, straight from three's own controls:
 * each move asks for one frame (the canvas draws on demand), and the controls are the scene's
 * default controls so the camera rig can move their target.
 */
export function SceneControls({ enableZoom }: { enableZoom: boolean }) {
  const camera = useThree((s) => s.camera);
  const domElement = useThree((s) => s.gl.domElement);
  const set = useThree((s) => s.set);
  const invalidate = useThree((s) => s.invalidate);
  const controls = useMemo(() => new OrbitControls(camera, domElement), [camera, domElement]);

  useEffect(() => {
    controls.enableDamping = false;
    controls.enableZoom = enableZoom;
  }, [controls, enableZoom]);

  useEffect(() => {
    const onChange = () => invalidate();
    controls.addEventListener("change", onChange);
    set({ controls });
    return () => {
      controls.removeEventListener("change", onChange);
      controls.dispose();
      set({ controls: null });
    };
  }, [controls, set, invalidate]);
  return null;
}
