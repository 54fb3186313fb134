/**
 * Bearing pressure under the base of the pier.
 *
 * Pressure = (downward load + concrete + post) / base area, compared with the allowable vertical
 * pressure of IBC Table 1806.2 or the engineer's value. Gross pressure: the weight of soil removed
 * is not credited, and the depth/width increases the code allows are not taken (conservative).
 * Net pressure, an engineer's option: the weight of the soil the pier replaced is credited, i.e.
 * the overburden γsoil × depth is taken off the gross pressure [common practice: net allowable
 * bearing; confirm the soil report's value is a net one before choosing it].
 *
 * @example bearingPressurePsf({ downwardLb: 2000, pierWeightLb: 2278, diameterFt: 2 }) // 1361.7
 */
export function bearingPressurePsf(a: { downwardLb: number; pierWeightLb: number; diameterFt: number; overburdenPsf?: number }): number {
  const area = (Math.PI * a.diameterFt * a.diameterFt) / 4;
  const gross = (Math.max(0, a.downwardLb) + a.pierWeightLb) / area;
  return a.overburdenPsf ? Math.max(0, gross - a.overburdenPsf) : gross;
}
