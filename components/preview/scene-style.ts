/**
 * Drawing weights and colours for the scene. These are how thick a line is drawn, not sizes of
 * real parts: the engine does not size rails, the beam or the module frame, so the scene gives
 * them a visible thickness and says nothing about their real dimensions.
 */
export const DRAW = {
  moduleThicknessFt: 0.12,
  railSectionFt: 0.14,
  beamSectionFt: 0.3,
  /** Ticks at the ends of a dimension line. */
  tickFt: 0.5,
  /** How far a dimension line stands off the part it measures, so the part does not hide it. */
  dimensionStandOffFt: 0.6,
} as const;

export const COLOURS = {
  background: "#eef2f6",
  ground: "#9fb58a",
  groundEdge: "#5f7350",
  footing: "#b9b4aa",
  post: "#6b7280",
  beam: "#4b5563",
  rail: "#9ca3af",
  module: "#1e3a5f",
  moduleEdge: "#8fb3d9",
  clearance: "#b45309",
  embedment: "#7c2d12",
  wind: "#0f766e",
  north: "#1f2937",
} as const;
