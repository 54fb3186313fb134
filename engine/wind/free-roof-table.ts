/**
 * Net pressure coefficients CN for an open monoslope free roof, ASCE 7-16 Fig. 27.3-4
 * (same figure as 7-10 Fig. 27.4-4). Values are [CNW, CNL] (windward half, leeward half).
 * "+" acts toward the top surface. [std, table values from transcriptions: confirm against the
 * printed figure]. The 0° row applies to both wind directions.
 */
export type LoadCaseCoefficients = { A: readonly [number, number]; B: readonly [number, number] };
export type FlowRow = { clear: LoadCaseCoefficients; obstructed: LoadCaseCoefficients };

/** Tilt angles of the tabulated rows (degrees). */
export const FREE_ROOF_TILTS_DEG = [7.5, 15, 22.5, 30, 37.5, 45] as const;

/** Row used below 7.5° (the figure's 0° row), both wind directions. */
export const FREE_ROOF_ZERO_ROW: FlowRow = {
  clear: { A: [1.2, 0.3], B: [-1.1, -0.1] },
  obstructed: { A: [-0.5, -1.2], B: [-1.1, -0.6] },
};

/** γ = 0°: wind from behind the high edge (lifts the array). Index matches FREE_ROOF_TILTS_DEG. */
export const FREE_ROOF_GAMMA_0: readonly FlowRow[] = [
  { clear: { A: [-0.6, -1.0], B: [-1.4, 0.0] }, obstructed: { A: [-1.0, -1.5], B: [-1.7, -0.8] } },
  { clear: { A: [-0.9, -1.3], B: [-1.9, 0.0] }, obstructed: { A: [-1.1, -1.5], B: [-2.1, -0.6] } },
  { clear: { A: [-1.5, -1.6], B: [-2.4, -0.3] }, obstructed: { A: [-1.5, -1.7], B: [-2.3, -0.9] } },
  { clear: { A: [-1.8, -1.8], B: [-2.5, -0.5] }, obstructed: { A: [-1.5, -1.8], B: [-2.3, -1.1] } },
  { clear: { A: [-1.8, -1.8], B: [-2.4, -0.6] }, obstructed: { A: [-1.5, -1.8], B: [-2.2, -1.1] } },
  { clear: { A: [-1.6, -1.8], B: [-2.3, -0.7] }, obstructed: { A: [-1.3, -1.8], B: [-1.9, -1.2] } },
];

/** γ = 180°: wind onto the face, from the low edge (presses the array down). */
export const FREE_ROOF_GAMMA_180: readonly FlowRow[] = [
  { clear: { A: [0.9, 1.5], B: [1.6, 0.3] }, obstructed: { A: [-0.2, -1.2], B: [0.8, -0.3] } },
  { clear: { A: [1.3, 1.6], B: [1.8, 0.6] }, obstructed: { A: [0.4, -1.1], B: [1.2, -0.3] } },
  { clear: { A: [1.7, 1.8], B: [2.2, 0.7] }, obstructed: { A: [0.5, -1.0], B: [1.3, 0.0] } },
  { clear: { A: [2.1, 2.1], B: [2.6, 1.0] }, obstructed: { A: [0.6, -1.0], B: [1.6, 0.1] } },
  { clear: { A: [2.1, 2.2], B: [2.7, 1.1] }, obstructed: { A: [0.7, -0.9], B: [1.9, 0.3] } },
  { clear: { A: [2.2, 2.5], B: [2.6, 1.4] }, obstructed: { A: [0.8, -0.9], B: [2.1, 0.4] } },
];
