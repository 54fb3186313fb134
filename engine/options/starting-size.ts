/**
 * A new design's starting size: the smallest standard pipe that passes every check with the hole
 * "size it for me" picks (the smallest candidate auger within the deepest reasonable hole, bearing
 * passing, engine/options/auto-diameter.ts). A design made from a criteria card then opens green
 * instead of failing post bending at a windier site. The hole is written in as a number (the auger
 * the crew brings), not left on "auto", so the revision records one size.
 *
 * When no pipe and candidate hole pass at this post count, the input keeps the pipe that comes
 * closest, and `advice` says in words what to change: more posts (the fewest that pass, when some
 * count up to the schema's 20 does), larger augers, soil report values or a lower array.
 *
 * Pure; a few dozen engine runs at most (6 pipes × the candidate holes, and post counts only when
 * nothing passes).
 *
 * @example startingSize(parseDesignInput({ ...defaultDesignInput, site: { ...defaultDesignInput.site, windSpeedMph: 125 } })).changes
 *   // ["4 in standard pipe: the smallest that carries the post bending (3 1/2 in fails)", …]
 */
import { PIPE_SIZES, type PipeSize } from "../footing/pipe";
import type { DesignInput } from "../schema";
import { sizeParsedDesign } from "../size-design";
import type { DesignResult } from "../types";
import { imperialText, pipeName, qty, qtyList, says, type QuantityText } from "../quantity-text";

export interface StartingSize {
  input: DesignInput;
  result: DesignResult;
  /** Every footing check passes. */
  pass: boolean;
  /** What was changed from the input given, in words; empty when it already passed unchanged. */
  changes: string[];
  /** When nothing passes: what to change, in words (empty when `pass`). */
  advice: string[];
  /** `changes` and `advice` with their numbers as quantities, so a screen words them in the reader's units. */
  changesText: QuantityText[];
  adviceText: QuantityText[];
}

const MAX_POSTS = 20; // posts.count's upper bound in engine/schema.ts
const noReasonableHole = (r: DesignResult) => r.warnings.some((w) => w.code === "AUTO_DIAMETER_NO_REASONABLE_DEPTH");
const passes = (r: DesignResult) => r.footing.pass && !noReasonableHole(r);

function withSize(input: DesignInput, pipeSize: PipeSize, holeDiameterIn: number | "auto", count = input.posts.count): DesignInput {
  return { ...input, posts: { ...input.posts, count, pipeSize, holeDiameterIn } };
}

/** A trial size the engine refuses (say, a given post spacing that no longer fits the count) passes nothing. */
function trySize(input: DesignInput): DesignResult | null {
  try {
    return sizeParsedDesign(input);
  } catch {
    return null;
  }
}

/** The smallest pipe that passes with an automatically sized hole at this post count, or null. */
function smallestPassing(input: DesignInput, count: number): { pipe: PipeSize; result: DesignResult } | null {
  for (const pipe of PIPE_SIZES) {
    const result = trySize(withSize(input, pipe, "auto", count));
    if (result && passes(result)) return { pipe, result };
  }
  return null;
}

export function startingSize(input: DesignInput): StartingSize {
  const s = startingSizeText(input);
  return { ...s, changes: s.changesText.map(imperialText), advice: s.adviceText.map(imperialText) };
}

function startingSizeText(input: DesignInput): Omit<StartingSize, "changes" | "advice"> {
  const given = sizeParsedDesign(input);
  // A given depth is a hole already dug: sizing it is the engineer's call, not a default's.
  if (input.posts.fixedDepthIn !== undefined) return { input, result: given, pass: given.footing.pass, changesText: [], adviceText: given.footing.pass ? [] : [["The given footing depth fails a check: clear it to size the depth."]] };

  const found = smallestPassing(input, input.posts.count);
  if (found) {
    const sized = withSize(input, found.pipe, found.result.footing.diameterIn);
    const result = sizeParsedDesign(sized);
    return { input: sized, result, pass: result.footing.pass, changesText: describeChanges(input, sized, found.pipe, result.footing.pass), adviceText: [] };
  }

  // Nothing passes at this count: keep the pipe that carries the bending (or the largest) and the
  // hole that comes closest, and say what would pass.
  const bendingPipe = PIPE_SIZES.find((p) => sizeParsedDesign(withSize(input, p, "auto")).footing.checks.find((c) => c.id === "postBending")?.pass) ?? null;
  const pipe = bendingPipe ?? PIPE_SIZES[PIPE_SIZES.length - 1];
  const closest = sizeParsedDesign(withSize(input, pipe, "auto"));
  const kept = withSize(input, pipe, closest.footing.diameterIn);
  const result = sizeParsedDesign(kept);
  const changes = describeChanges(input, kept, pipe, false, bendingPipe !== null);
  if (result.footing.pass) {
    // Every check passes, only deeper than the hole the designer called reasonable: say so, no advice needed.
    const hole = changes.findIndex((c) => imperialText(c).includes(" in holes"));
    const deep = says`${qty(kept.posts.holeDiameterIn as number, "in")} holes ${qty(result.footing.depthIn, "in")} deep: every check passes, deeper than the ${qty(input.posts.maxAutoDepthIn, "in")} set as the deepest reasonable hole (more posts or larger augers make it shallower)`;
    if (hole === -1) changes.push(deep);
    else changes[hole] = deep;
    return { input: kept, result, pass: true, changesText: changes, adviceText: [] };
  }
  return { input: kept, result, pass: false, changesText: changes, adviceText: adviceFor(input, result, bendingPipe) };
}

function describeChanges(from: DesignInput, to: DesignInput, pipe: PipeSize, pass: boolean, carriesBending = true): QuantityText[] {
  const out: QuantityText[] = [];
  if (to.posts.pipeSize !== from.posts.pipeSize) {
    const smaller = PIPE_SIZES[PIPE_SIZES.indexOf(pipe) - 1];
    out.push(pass
      ? says`${pipeName(pipe)}: the smallest that passes${smaller ? says` (${pipeName(smaller)} does not)` : ""}`
      : carriesBending ? says`${pipeName(pipe)}: the smallest that carries the post bending` : says`${pipeName(pipe)}: the largest standard pipe (none carries the post bending)`);
  }
  if (to.posts.holeDiameterIn !== from.posts.holeDiameterIn) {
    const hole = qty(to.posts.holeDiameterIn as number, "in");
    const candidates = qtyList(from.posts.autoDiametersIn, "in");
    out.push(pass
      ? says`${hole} holes: the smallest of the candidate augers (${candidates}) that passes within ${qty(from.posts.maxAutoDepthIn, "in")} deep`
      : says`${hole} holes: the candidate auger (${candidates}) that comes closest to passing`);
  }
  return out;
}

function adviceFor(input: DesignInput, result: DesignResult, bendingPipe: PipeSize | null): QuantityText[] {
  const out: QuantityText[] = [];
  const bending = result.footing.checks.find((c) => c.id === "postBending");
  if (!bendingPipe && bending) {
    out.push(says`No standard pipe up to the ${pipeName(PIPE_SIZES[PIPE_SIZES.length - 1])} carries the ${qty(Math.round(bending.demand * 10) / 10, "kipFt")} bending at grade with ${input.posts.count} posts: add posts, lower the lowest edge clearance or the tilt, or have the engineer specify a heavier post.`);
  }
  if (noReasonableHole(result) || result.footing.checks.some((c) => c.id === "bearing" && !c.pass)) {
    out.push(says`No candidate auger (${qtyList(input.posts.autoDiametersIn, "in")}) passes bearing within ${qty(input.posts.maxAutoDepthIn, "in")} deep: add larger augers to the candidate hole sizes, allow a deeper hole, give soil report values, or add posts.`);
  }
  for (let count = input.posts.count + 1; count <= MAX_POSTS; count++) {
    const found = smallestPassing(input, count);
    if (found) {
      out.push(says`With ${count} posts it passes: ${pipeName(found.pipe)} in ${qty(found.result.footing.diameterIn, "in")} holes ${qty(found.result.footing.depthIn, "in")} deep. Change the number of posts to ${count}.`);
      break;
    }
    if (count === MAX_POSTS) out.push([`Even ${MAX_POSTS} posts do not pass: split the array into smaller racks or have the engineer size it.`]);
  }
  if (out.length === 0) out.push([`Check the failing checks: ${result.footing.checks.filter((c) => !c.pass).map((c) => c.title).join(", ")}.`]);
  return out;
}
