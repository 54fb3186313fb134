"use client";
import { useCallback, useMemo, useRef, useState } from "react";
import type { DesignInput } from "@/engine/schema";
import type { DesignResult } from "@/engine/types";
import { sizeParsedDesign } from "@/engine/size-design";
import { Caution } from "@/components/ui/caution";
import type { ViewName } from "./camera-framing";
import { ElevationFallback } from "./elevation-fallback";
import { PreviewErrorBoundary } from "./preview-error-boundary";
import { northCaption, previewFigures, type UnitSystem } from "./preview-labels";
import { PreviewToolbar } from "./preview-toolbar";
import { sameDrawing, sameGeometry } from "./same-drawing";
import { previewScene } from "./scene-loader";
import type { SceneProps } from "./scene";
import { useLoadable } from "./use-loadable";
import { webglAvailable } from "./webgl-support";

export interface DesignPreviewProps {
  input: DesignInput;
  result: DesignResult;
  unitSystem: UnitSystem;
  /** For the review page and field spec: no wheel zoom (the page scrolls instead). */
  readOnly?: boolean;
  height?: number;
  /** Hosts that already show the defer-to-code caution right beside the preview may leave it out. */
  showCaution?: boolean;
}

/** The design's geometry at one tilt setting, from the engine (the scene computes nothing itself). */
function geometryAtTilt(input: DesignInput, result: DesignResult, tiltDeg: number | null) {
  if (tiltDeg === null || tiltDeg === result.geometryPreview.panelPlane.tiltDeg) return { geometry: result.geometryPreview, error: null };
  try {
    // Revisions saved before the azimuth input have none; they were drawn facing south (the default).
    const azimuthDeg = input.array.azimuthDeg ?? 180;
    return { geometry: sizeParsedDesign({ ...input, array: { ...input.array, azimuthDeg, tiltDeg } }).geometryPreview, error: null };
  } catch (error) {
    return { geometry: result.geometryPreview, error: `The ${tiltDeg}° setting could not be drawn: ${error instanceof Error ? error.message : String(error)}` };
  }
}

const SCENE_FAILED = "The 3D preview could not start in this browser.";

/**
 * The scene, once its chunk is there. three.js and the scene load in a chunk of their own, only
 * once WebGL is known to be there (scene-loader.ts), so a browser that gets the 2D elevation
 * never downloads them. Inside the preview's error boundary: a chunk that fails to load shows the
 * elevation like a scene that fails to start.
 */
function SceneSlot(props: SceneProps) {
  const scene = useLoadable(previewScene);
  if (!scene) {
    return (
      <div role="status" className="flex h-full items-center justify-center bg-slate-50 text-sm text-slate-500">
        Loading the 3D scene…
      </div>
    );
  }
  return <scene.Scene {...props} />;
}

/**
 * The same object for as long as `same` holds: a new result whose geometry (or drawing) did not
 * change — most keystrokes in the editor — then leaves what depends on it untouched.
 */
function useStable<T>(value: T, same: (a: T, b: T) => boolean): T {
  const last = useRef(value);
  if (last.current !== value && !same(last.current, value)) last.current = value;
  return last.current;
}

/** The 3D preview of the array, grade and footings, with a 2D elevation where WebGL is missing. */
export default function DesignPreview({ input, result, unitSystem, readOnly = false, height = 440, showCaution = true }: DesignPreviewProps) {
  const settings = useMemo(
    () => (input.array.tiltSettingsDeg?.length ? [...new Set([input.array.tiltDeg, ...input.array.tiltSettingsDeg])].sort((a, b) => a - b) : null),
    [input.array.tiltDeg, input.array.tiltSettingsDeg],
  );
  const [chosen, setChosen] = useState<{ designTiltDeg: number; tiltDeg: number } | null>(null);
  // A choice lapses when the design's own tilt is edited or the setting leaves the list, so an edit
  // in the editor always shows at once.
  const tiltDeg = chosen && chosen.designTiltDeg === input.array.tiltDeg && settings?.includes(chosen.tiltDeg) ? chosen.tiltDeg : null;
  const atTilt = useMemo(() => geometryAtTilt(input, result, tiltDeg), [input, result, tiltDeg]);
  // The caption's and the elevation's geometry, and the 3D scene's: the scene keeps its drawing
  // (no re-render, no frame) when only figures it shows as text changed.
  const geometry = useStable(atTilt.geometry, sameGeometry);
  const drawing = useStable(geometry, sameDrawing);
  const error = atTilt.error;
  const figures = useMemo(() => previewFigures(geometry, unitSystem), [geometry, unitSystem]);
  // Why the 3D scene is not shown (null while it is): no WebGL up front, or it failed or was lost later.
  const [noScene, setNoScene] = useState<string | null>(() => (webglAvailable() ? null : "This browser has WebGL turned off, so the 3D preview cannot be drawn."));
  const [view, setView] = useState<{ name: ViewName; seq: number }>({ name: "home", seq: 0 });
  const onContextLost = useCallback(() => setNoScene("The 3D preview lost its graphics context."), []);

  const fallback = (reason: string) => <ElevationFallback geometry={geometry} figures={figures} height={height} reason={reason} />;
  const shownTilt = geometry.panelPlane.tiltDeg;
  const label = `3D preview at ${shownTilt}° tilt: lowest-edge clearance ${figures.clearance}, embedment ${figures.embedment} at post ${figures.embedmentPostId}`;

  return (
    <figure className="overflow-hidden rounded-lg border border-slate-200 bg-white" aria-label="Design preview" data-testid="design-preview">
      <PreviewToolbar
        views={noScene === null}
        onView={(name) => setView((v) => ({ name, seq: v.seq + 1 }))}
        settings={settings}
        designTiltDeg={input.array.tiltDeg}
        shownTiltDeg={shownTilt}
        onTilt={(t) => setChosen({ designTiltDeg: input.array.tiltDeg, tiltDeg: t })}
      />
      <div className="relative" style={{ height }}>
        {noScene === null ? (
          <PreviewErrorBoundary fallback={fallback(SCENE_FAILED)} onError={() => setNoScene(SCENE_FAILED)}>
            <SceneSlot drawing={drawing} figures={figures} view={view} readOnly={readOnly} label={label} onContextLost={onContextLost} />
          </PreviewErrorBoundary>
        ) : (
          fallback(noScene)
        )}
      </div>
      <figcaption className="space-y-1 border-t border-slate-200 px-3 py-2 text-sm text-slate-700">
        {error ? <p role="alert" className="text-red-700">{error}</p> : null}
        <p>
          <span className="font-medium">Tilt</span> {shownTilt}° · <span className="font-medium">Lowest-edge clearance</span> {figures.clearance} ·{" "}
          <span className="font-medium">Embedment</span> {figures.embedment} (post {figures.embedmentPostId})
        </p>
        {figures.wind ? <p><span className="font-medium">Governing wind</span> {figures.wind}</p> : null}
        <p className="text-xs text-slate-500">{northCaption(input.array.azimuthDeg)} Rails, beam and module thickness are drawn, not to scale; posts, footings, clearance and embedment are to scale.</p>
        {showCaution ? <Caution compact /> : null}
      </figcaption>
    </figure>
  );
}
