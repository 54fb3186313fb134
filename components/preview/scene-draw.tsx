"use client";
import { useFrame, useThree } from "@react-three/fiber";
import { useEffect, useLayoutEffect, useRef, type RefObject } from "react";
import type { PreviewGeometry } from "@/engine/geometry/preview";
import type { SceneLabel } from "./scene-annotations";
import { placeLabelElements, type LabelElements, type LabelSizes } from "./scene-labels";

/**
 * The scene's draw, in a useFrame of priority 1 (which hands R3F's own render to it): the labels
 * are placed from the camera the frame is drawn from, then the frame is drawn. With the canvas's
 * frameloop "demand", a frame runs only when asked — a new drawing, a camera move, a resize — never
 * on a re-render of the page with the same drawing. The labels are read from a ref at each frame;
 * new label text alone is placed by the page without a frame (scene.tsx).
 *
 * Nothing is drawn until every shader program is compiled, so the first frame is complete and
 * nothing compiles after it. Mounted after the scene's parts and lights (its layout effect then
 * runs once they are all in the scene).
 */
export function SceneDraw({ drawing, labels, elements, sizes, onReady, onContextLost }: {
  drawing: PreviewGeometry;
  labels: RefObject<SceneLabel[]>;
  elements: LabelElements;
  sizes: LabelSizes;
  onReady: () => void;
  onContextLost: () => void;
}) {
  const gl = useThree((s) => s.gl);
  const scene = useThree((s) => s.scene);
  const camera = useThree((s) => s.camera);
  const width = useThree((s) => s.size.width);
  const height = useThree((s) => s.size.height);
  const invalidate = useThree((s) => s.invalidate);
  const ready = useRef(false);
  const shown = useRef(false);

  useLayoutEffect(() => {
    let live = true;
    const go = () => {
      if (!live) return;
      ready.current = true;
      invalidate();
    };
    // Where the browser compiles in parallel, wait for every program without blocking the page.
    // Elsewhere (software renderers) the compile starts now, in the GPU process, and the first
    // frame follows on the next animation frame (what compileAsync would do there, less its
    // console warning about the missing extension).
    if (gl.extensions.has("KHR_parallel_shader_compile")) gl.compileAsync(scene, camera).then(go, go);
    else {
      gl.compile(scene, camera);
      go();
    }
    return () => {
      live = false;
    };
  }, [gl, scene, camera, invalidate]);

  // A new drawing (its parts swapped in just before), and a resize, which clears the canvas.
  useLayoutEffect(() => invalidate(), [drawing, width, height, invalidate]);

  // Removed before R3F gives the context back on unmount (that loss is not the browser's).
  useEffect(() => {
    const canvas = gl.domElement;
    canvas.addEventListener("webglcontextlost", onContextLost);
    return () => canvas.removeEventListener("webglcontextlost", onContextLost);
  }, [gl, onContextLost]);

  useFrame((state) => {
    if (!ready.current) return;
    state.camera.updateMatrixWorld();
    placeLabelElements(labels.current, elements.current, sizes, state.camera, state.size);
    state.gl.render(state.scene, state.camera);
    if (!shown.current) {
      shown.current = true;
      onReady();
    }
  }, 1);
  return null;
}
