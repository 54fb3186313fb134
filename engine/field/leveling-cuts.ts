/**
 * Laser cut list: how much to cut off each post's bottom so all post tops sit level.
 *
 * Method [common practice]: with every post stood in its hole, read the distance from each post's
 * top down to the laser line. A post whose reading exceeds the reference post's stands that much
 * higher: cut the difference off its bottom. A post whose reading is smaller stands low: add that
 * much gravel under it (or cut nothing and shim). Readings in inches.
 *
 * @example levelingCuts({ referenceReadingIn: 10, readingsIn: [10, 11.5, 9.25] })
 *   // { cutsIn: [0, 1.5, 0], gravelIn: [0, 0, 0.75], … }
 */
import { EngineInputError, requireRange } from "../errors";
import { imperialText, qty, says, type QuantityText } from "../quantity-text";

export interface LevelingCuts {
  referenceReadingIn: number;
  cutsIn: number[];
  gravelIn: number[];
  posts: { index: number; readingIn: number; cutIn: number; gravelIn: number; instruction: string; instructionText: QuantityText }[];
}

/** What the crew does to one post, its lengths as quantities (three decimals of an inch as read). */
export function cutText(cutIn: number, gravelIn: number): QuantityText {
  if (cutIn > 0) return says`Cut ${qty(cutIn, "in", 3)} off the bottom`;
  if (gravelIn > 0) return says`Post is ${qty(gravelIn, "in", 3)} short: add ${qty(gravelIn, "in", 3)} of compacted gravel under it`;
  return ["No cut"];
}

export function levelingCuts(a: { referenceReadingIn: number; readingsIn: number[] }): LevelingCuts {
  requireRange("referenceReadingIn", a.referenceReadingIn, 0, 240, "Reference post reading", "in");
  if (!Array.isArray(a.readingsIn) || a.readingsIn.length < 1 || a.readingsIn.length > 200) {
    throw new EngineInputError("readingsIn", "Readings must list between 1 and 200 posts");
  }
  a.readingsIn.forEach((r, i) => requireRange(`readingsIn.${i}`, r, 0, 240, `Reading for post ${i + 1}`, "in"));
  const round = (x: number) => Math.round(x * 1000) / 1000;
  const posts = a.readingsIn.map((readingIn, index) => {
    const diff = round(readingIn - a.referenceReadingIn);
    const cutIn = Math.max(0, diff);
    const gravelIn = Math.max(0, -diff);
    const instructionText = cutText(cutIn, gravelIn);
    return { index, readingIn, cutIn, gravelIn, instruction: imperialText(instructionText), instructionText };
  });
  return { referenceReadingIn: a.referenceReadingIn, cutsIn: posts.map((p) => p.cutIn), gravelIn: posts.map((p) => p.gravelIn), posts };
}
