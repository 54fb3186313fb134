"use client";
import type { PreviewGeometry } from "@/engine/geometry/preview";
import { sideElevation, type Pt } from "./elevation-mapping";
import { windSceneLabel, type PreviewFigures } from "./preview-labels";
import { COLOURS } from "./scene-style";

const line = (a: Pt, b: Pt) => ({ x1: a[0], y1: a[1], x2: b[0], y2: b[1] });
const THIN = { vectorEffect: "non-scaling-stroke" as const, strokeWidth: 1.5 };

/**
 * The side elevation drawn where WebGL is missing: grade, the panel at its tilt, the governing post
 * and footing, and the same clearance and embedment figures as the 3D scene.
 */
export function ElevationFallback({ geometry, figures, height, reason }: { geometry: PreviewGeometry; figures: PreviewFigures; height: number; reason: string }) {
  const e = sideElevation(geometry);
  const [vx, vy, vw, vh] = e.viewBox;
  const t = e.textSizeFt;
  const groundFill = `${e.groundNear[0][0]},${e.groundNear[0][1]} ${e.groundNear[1][0]},${e.groundNear[1][1]} ${e.groundNear[1][0]},${vy + vh} ${e.groundNear[0][0]},${vy + vh}`;
  const tick = (p: Pt) => line([p[0] - t * 0.4, p[1]], [p[0] + t * 0.4, p[1]]);
  return (
    <div className="flex h-full flex-col" data-testid="preview-fallback" style={{ minHeight: height }}>
      <p className="px-3 pt-2 text-xs text-slate-600">{reason} Showing a side elevation (front of the array on the left).</p>
      <svg
        role="img"
        aria-label={`Side elevation: lowest-edge clearance ${figures.clearance}, embedment ${figures.embedment}`}
        viewBox={`${vx} ${vy} ${vw} ${vh}`}
        preserveAspectRatio="xMidYMid meet"
        className="min-h-0 w-full flex-1"
        style={{ height: height - 40 }}
      >
        <defs>
          <marker id="pw-arrow" viewBox="0 0 10 10" refX="9" refY="5" markerWidth="6" markerHeight="6" orient="auto-start-reverse">
            <path d="M0,0 L10,5 L0,10 z" fill={COLOURS.wind} />
          </marker>
        </defs>
        <polygon points={groundFill} fill={COLOURS.ground} fillOpacity={0.35} />
        <rect {...e.footing} fill={COLOURS.footing} stroke="#57534e" {...THIN} />
        <rect {...e.post} fill={COLOURS.post} />
        <line {...line(...e.groundFar)} stroke={COLOURS.groundEdge} strokeDasharray="6 4" {...THIN} />
        <line {...line(...e.groundNear)} stroke={COLOURS.groundEdge} {...THIN} strokeWidth={2.5} />
        {e.panels.map(([a, b], i) => <line key={i} {...line(a, b)} stroke={COLOURS.module} {...THIN} strokeWidth={5} />)}
        <circle cx={e.beam[0]} cy={e.beam[1]} r={t * 0.25} fill={COLOURS.beam} />

        <g stroke={COLOURS.clearance}>
          <line {...line(e.clearance.from, e.clearance.to)} {...THIN} />
          <line {...tick(e.clearance.from)} {...THIN} />
          <line {...tick(e.clearance.to)} {...THIN} />
        </g>
        <text x={e.clearance.from[0] - t * 0.6} y={(e.clearance.from[1] + e.clearance.to[1]) / 2} fontSize={t} textAnchor="end" fill={COLOURS.clearance}>
          Clearance {figures.clearance}
        </text>

        <g stroke={COLOURS.embedment}>
          <line {...line(e.embedment.from, e.embedment.to)} {...THIN} />
          <line {...tick(e.embedment.from)} {...THIN} />
          <line {...tick(e.embedment.to)} {...THIN} />
        </g>
        <text x={e.embedment.from[0] - t * 0.6} y={(e.embedment.from[1] + e.embedment.to[1]) / 2} fontSize={t} textAnchor="end" fill={COLOURS.embedment}>
          Embedment {figures.embedment}
        </text>

        <text x={e.groundNear[0][0]} y={e.groundNear[0][1] + t * 1.4} fontSize={t * 0.8} fill={COLOURS.groundEdge}>Front (low edge)</text>
        <text x={e.groundNear[1][0]} y={e.groundNear[1][1] + t * 1.4} fontSize={t * 0.8} textAnchor="end" fill={COLOURS.groundEdge}>Back (high edge)</text>
        {e.wind ? (
          <g>
            <line {...line(e.wind.tail, e.wind.head)} stroke={COLOURS.wind} {...THIN} strokeWidth={2.5} markerEnd="url(#pw-arrow)" />
            <text x={e.wind.tail[0]} y={e.wind.tail[1] - t * 0.6} fontSize={t * 0.85} textAnchor="middle" fill={COLOURS.wind}>
              {geometry.wind ? windSceneLabel(geometry.wind) : null}
            </text>
          </g>
        ) : null}
      </svg>
    </div>
  );
}
