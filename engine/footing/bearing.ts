/**
 * Bearing pressure under the base of the pier.
 *
 * Pressure = (downward load + concrete + post) / base area, compared with the allowable vertical
 * pressure of IBC Table 1806.2 or the engineer's value. Gross pressure: the weight of soil removed
 * is not credited, and the depth/width increases the code allows are not taken (conservative).
 *
 * @example bearingPressurePsf({ downwardLb: 2000, pierWeightLb: 2278, diameterFt: 2 }) // 1361.7
 */
export function bearingPressurePsf(a: { downwardLb: number; pierWeightLb: number; diameterFt: number }): number {
  const area = (Math.PI * a.diameterFt * a.diameterFt) / 4;
  return (Math.max(0, a.downwardLb) + a.pierWeightLb) / area;
}
