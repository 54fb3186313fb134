/**
 * Post positions along the beam and each post's tributary width.
 *
 * Posts stand in one line under a single beam at mid-slope of the array (plan offset y = 0).
 * Spacing given, or computed as width / count so every post carries an equal share with end
 * overhangs of half a spacing. Tributary width: end post = overhang + spacing/2, interior
 * post = spacing. The loads posts carry come from the continuous beam (`continuous-beam.ts`);
 * the tributary width is kept to report each post's reaction factor against it.
 *
 * @example postLayout({ widthFt: 20, count: 2 }) // xFt [-5, 5], tributaryWidthFt [10, 10]
 */
import { EngineInputError, requireRange } from "../errors";

export interface PostLayout {
  spacingFt: number;
  overhangFt: number;
  xFt: number[];
  tributaryWidthFt: number[];
}

export function postLayout(a: { widthFt: number; count: number; spacingFt?: number }): PostLayout {
  requireRange("posts.count", a.count, 2, 20, "Number of posts", "");
  if (!Number.isInteger(a.count)) throw new EngineInputError("posts.count", "Number of posts must be a whole number between 2 and 20");
  const spacingFt = a.spacingFt ?? a.widthFt / a.count;
  requireRange("posts.spacingFt", spacingFt, 1, 40, "Post spacing", "ft");
  const overhangFt = (a.widthFt - (a.count - 1) * spacingFt) / 2;
  if (overhangFt < 0) {
    const max = a.widthFt / (a.count - 1);
    throw new EngineInputError("posts.spacingFt", `Post spacing must be at most ${max.toFixed(2)} ft so the posts fit under the ${a.widthFt.toFixed(2)} ft wide array`);
  }
  const xFt: number[] = [];
  const tributaryWidthFt: number[] = [];
  for (let i = 0; i < a.count; i++) {
    xFt.push(-((a.count - 1) * spacingFt) / 2 + i * spacingFt);
    const end = i === 0 || i === a.count - 1;
    tributaryWidthFt.push(end ? overhangFt + spacingFt / 2 : spacingFt);
  }
  return { spacingFt, overhangFt, xFt, tributaryWidthFt };
}
