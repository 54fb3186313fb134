"use client";
import { extend } from "@react-three/fiber";
import { Component, memo, useEffect, useMemo, type ReactNode, type RefObject } from "react";
import { Color, DirectionalLight, HemisphereLight } from "three";
import type { PreviewGeometry } from "@/engine/geometry/preview";
import { CameraRig } from "./camera-rig";
import type { Bounds, ViewName } from "./camera-framing";
import type { SceneLabel } from "./scene-annotations";
import { SceneDraw } from "./scene-draw";
import type { LabelElements, LabelSizes } from "./scene-labels";
import { buildParts } from "./scene-parts";
import { COLOURS } from "./scene-style";

/**
 * The three.js classes behind the scene's JSX elements (`<color>`, `<hemisphereLight>`,
 * `<directionalLight>`; a design's parts are one `<primitive>`), and all React Three Fiber is told
 * about. `<Canvas>` would register the whole of three instead, which keeps every class of it in
 * the scene's chunk; with only these the bundler leaves out what the scene does not use.
 * tests/unit/scene-elements.test.ts holds this list to the JSX of the files rendered in the
 * scene's root (this file, camera-rig.tsx, scene-draw.tsx).
 */
export const SCENE_ELEMENTS = { Color, DirectionalLight, HemisphereLight };
extend(SCENE_ELEMENTS);

export interface SceneContentProps {
  drawing: PreviewGeometry;
  bounds: Bounds;
  view: { name: ViewName; seq: number };
  enableZoom: boolean;
  /** The labels' latest text and anchors, read at each frame (new text alone draws no frame). */
  labels: RefObject<SceneLabel[]>;
  elements: LabelElements;
  sizes: LabelSizes;
  onReady: () => void;
  onContextLost: () => void;
  /** An error inside the scene's own React root, handed to the page's error boundary. */
  onError: (error: unknown) => void;
}

/**
 * One design's parts (scene-parts.ts: instanced unit shapes with shared materials), mounted as a
 * primitive. A new drawing swaps in new parts — the same shapes and materials, new small buffers —
 * and frees the old parts' buffers; the shared shapes and materials are never disposed.
 */
const DesignParts = memo(function DesignParts({ drawing, bounds }: { drawing: PreviewGeometry; bounds: Bounds }) {
  const parts = useMemo(() => buildParts(drawing, bounds), [drawing, bounds]);
  useEffect(() => () => parts.dispose(), [parts]);
  return <primitive object={parts.group} dispose={null} />;
});

/** Errors in the scene's root are the page's: the preview's error boundary shows the elevation. */
class RelayErrors extends Component<{ onError: (error: unknown) => void; children: ReactNode }, { failed: boolean }> {
  state = { failed: false };
  static getDerivedStateFromError(): { failed: boolean } {
    return { failed: true };
  }
  componentDidCatch(error: unknown): void {
    this.props.onError(error);
  }
  render(): ReactNode {
    return this.state.failed ? null : this.props.children;
  }
}

/**
 * What the scene's React Three Fiber root renders. The page renders it into the root again only
 * when the drawing, the framing or the view changes (scene.tsx), so a new result with the same
 * drawing reconciles nothing here and draws no frame.
 */
export function SceneContent({ drawing, bounds, view, enableZoom, labels, elements, sizes, onReady, onContextLost, onError }: SceneContentProps) {
  const c = bounds.centre, r = bounds.radiusFt;
  return (
    <RelayErrors onError={onError}>
      <color attach="background" args={[COLOURS.background]} />
      <hemisphereLight args={[0xffffff, 0x6b705c, 1.4]} />
      <directionalLight position={[c[0] + r, c[1] + 2 * r, c[2] + 1.5 * r]} intensity={1.8} />
      <DesignParts drawing={drawing} bounds={bounds} />
      <CameraRig bounds={bounds} view={view} enableZoom={enableZoom} />
      <SceneDraw drawing={drawing} labels={labels} elements={elements} sizes={sizes} onReady={onReady} onContextLost={onContextLost} />
    </RelayErrors>
  );
}
