/**
 * Ground elevation factor Ke.
 *
 * Source: ASCE 7-16 Table 26.9-1 note: Ke = e^(−0.0000362 zg), zg = ground elevation above sea
 * level in ft; Ke = 1 is permitted in all cases [memory]. Same in 7-22 §26.9.
 *
 * @param groundElevationFt site elevation above sea level (ft), −300 to 15,000; 0 gives Ke = 1
 * @example groundElevationFactor(5000) // 0.8344
 */
import { requireRange } from "../errors";

export function groundElevationFactor(groundElevationFt = 0): number {
  requireRange("site.groundElevationFt", groundElevationFt, -300, 15000, "Ground elevation", "ft");
  return Math.min(1, Math.exp(-0.0000362 * groundElevationFt));
}
