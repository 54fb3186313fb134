/**
 * Topographic factor Kzt.
 *
 * Source: ASCE 7-16 §26.8.2, Eq. 26.8-1: Kzt = (1 + K1 K2 K3)², with K1, K2, K3 read from
 * Fig. 26.8-1 for the hill, ridge or escarpment and the site's position on it [memory].
 * Flat ground: Kzt = 1. The engine takes K1, K2, K3 as inputs (the user reads the figure) or a
 * Kzt the engineer has worked out.
 */
import { requireRange } from "../errors";

/** Input for Kzt: flat ground, a given Kzt, or the three multipliers of Fig. 26.8-1. */
export type Topography =
  | { method: "flat" }
  | { method: "kzt"; kzt: number }
  | { method: "hill"; k1: number; k2: number; k3: number };

/**
 * Kzt for the topography given.
 * @example topographicFactor({ method: "hill", k1: 0.3, k2: 0.5, k3: 0.4 }) // 1.1236
 */
export function topographicFactor(topography: Topography | undefined): number {
  if (!topography || topography.method === "flat") return 1;
  if (topography.method === "kzt") {
    requireRange("site.topography.kzt", topography.kzt, 1, 3, "Topographic factor Kzt", "");
    return topography.kzt;
  }
  requireRange("site.topography.k1", topography.k1, 0, 1.5, "Topographic multiplier K1", "");
  requireRange("site.topography.k2", topography.k2, 0, 1, "Topographic multiplier K2", "");
  requireRange("site.topography.k3", topography.k3, 0, 1, "Topographic multiplier K3", "");
  const k = 1 + topography.k1 * topography.k2 * topography.k3;
  return k * k;
}
