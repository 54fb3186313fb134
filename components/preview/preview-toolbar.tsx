"use client";
import type { ViewName } from "./camera-framing";

const VIEWS: [ViewName, string][] = [["front", "Front"], ["side", "Side"], ["top", "Top"], ["home", "Reset"]];
const BUTTON = "rounded-md border px-2.5 py-1 text-sm";

/** View buttons (3D only) and, for an adjustable rack, one button per tilt setting. */
export function PreviewToolbar({ views, onView, settings, designTiltDeg, shownTiltDeg, onTilt }: {
  views: boolean;
  onView: (view: ViewName) => void;
  settings: number[] | null;
  designTiltDeg: number;
  shownTiltDeg: number;
  onTilt: (tiltDeg: number) => void;
}) {
  if (!views && !settings) return null;
  return (
    <div className="flex flex-wrap items-center gap-x-4 gap-y-2 border-b border-slate-200 px-3 py-2">
      {views ? (
        <div role="group" aria-label="Camera view" className="flex flex-wrap gap-1">
          {VIEWS.map(([name, text]) => (
            <button key={name} type="button" className={`${BUTTON} border-slate-300 hover:bg-slate-50`} onClick={() => onView(name)}>
              {text}
            </button>
          ))}
        </div>
      ) : null}
      {settings ? (
        <div role="group" aria-label="Tilt setting" className="flex flex-wrap items-center gap-1">
          <span className="mr-1 text-sm text-slate-600">Tilt setting</span>
          {settings.map((t) => (
            <button
              key={t}
              type="button"
              aria-pressed={t === shownTiltDeg}
              className={`${BUTTON} ${t === shownTiltDeg ? "border-slate-800 bg-slate-800 text-white" : "border-slate-300 hover:bg-slate-50"}`}
              onClick={() => onTilt(t)}
              title={t === designTiltDeg ? "The design's tilt" : undefined}
            >
              {t}°{t === designTiltDeg ? " (design)" : ""}
            </button>
          ))}
        </div>
      ) : null}
    </div>
  );
}
