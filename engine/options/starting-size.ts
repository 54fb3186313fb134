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

export interface StartingSize {
  input: DesignInput;
  result: DesignResult;
  /** Every footing check passes. */
  pass: boolean;
  /** What was changed from the input given, in words; empty when it already passed unchanged. */
  changes: string[];
  /** When nothing passes: what to change, in words (empty when `pass`). */
  advice: string[];
}

const MAX_POSTS = 20; // posts.count's upper bound in engine/schema.ts
const pipeWords = (size: PipeSize) => `${size.replace("-", " ")} in standard pipe`;
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
  const given = sizeParsedDesign(input);
  // A given depth is a hole already dug: sizing it is the engineer's call, not a default's.
  if (input.posts.fixedDepthIn !== undefined) return { input, result: given, pass: given.footing.pass, changes: [], advice: given.footing.pass ? [] : ["The given footing depth fails a check: clear it to size the depth."] };

  const found = smallestPassing(input, input.posts.count);
  if (found) {
    const sized = withSize(input, found.pipe, found.result.footing.diameterIn);
    const result = sizeParsedDesign(sized);
    return { input: sized, result, pass: result.footing.pass, changes: describeChanges(input, sized, found.pipe, result.footing.pass), advice: [] };
  }

  // Nothing passes at this count: keep the pipe that carries the bending (or the largest) and the
  // hole that comes closest, and say what would pass.
  const bendingPipe = PIPE_SIZES.find((p) => sizeParsedDesign(withSize(input, p, "auto")).footing.checks.find((c) => c.id === "postBending")?.pass) ?? null;
  const pipe = bendingPipe ?? PIPE_SIZES[PIPE_SIZES.length - 1];
  const closest = sizeParsedDesign(withSize(input, pipe, "auto"));
  const kept = withSize(input, pipe, closest.footing.diameterIn);
  const result = sizeParsedDesign(kept);
  return { input: kept, result, pass: result.footing.pass, changes: describeChanges(input, kept, pipe, false, bendingPipe !== null), advice: adviceFor(input, result, bendingPipe) };
}

function describeChanges(from: DesignInput, to: DesignInput, pipe: PipeSize, pass: boolean, carriesBending = true): string[] {
  const out: string[] = [];
  if (to.posts.pipeSize !== from.posts.pipeSize) {
    const smaller = PIPE_SIZES[PIPE_SIZES.indexOf(pipe) - 1];
    out.push(pass
      ? `${pipeWords(pipe)}: the smallest that passes${smaller ? ` (${pipeWords(smaller)} does not)` : ""}`
      : carriesBending ? `${pipeWords(pipe)}: the smallest that carries the post bending` : `${pipeWords(pipe)}: the largest standard pipe (none carries the post bending)`);
  }
  if (to.posts.holeDiameterIn !== from.posts.holeDiameterIn) {
    const candidates = `${from.posts.autoDiametersIn.join(", ")} in`;
    out.push(pass
      ? `${to.posts.holeDiameterIn} in holes: the smallest of the candidate augers (${candidates}) that passes within ${from.posts.maxAutoDepthIn} in deep`
      : `${to.posts.holeDiameterIn} in holes: the candidate auger (${candidates}) that comes closest to passing`);
  }
  return out;
}

function adviceFor(input: DesignInput, result: DesignResult, bendingPipe: PipeSize | null): string[] {
  const out: string[] = [];
  const bending = result.footing.checks.find((c) => c.id === "postBending");
  if (!bendingPipe && bending) {
    out.push(`No standard pipe up to 6 in carries the ${bending.demand.toFixed(1)} kip-ft bending at grade with ${input.posts.count} posts: add posts, lower the lowest edge clearance or the tilt, or have the engineer specify a heavier post.`);
  }
  if (noReasonableHole(result) || result.footing.checks.some((c) => c.id === "bearing" && !c.pass)) {
    out.push(`No candidate auger (${input.posts.autoDiametersIn.join(", ")} in) passes bearing within ${input.posts.maxAutoDepthIn} in deep: add larger augers to the candidate hole sizes, allow a deeper hole, give soil report values, or add posts.`);
  }
  for (let count = input.posts.count + 1; count <= MAX_POSTS; count++) {
    const found = smallestPassing(input, count);
    if (found) {
      out.push(`With ${count} posts it passes: ${pipeWords(found.pipe)} in ${found.result.footing.diameterIn} in holes ${found.result.footing.depthIn} in deep. Change the number of posts to ${count}.`);
      break;
    }
    if (count === MAX_POSTS) out.push(`Even ${MAX_POSTS} posts do not pass: split the array into smaller racks or have the engineer size it.`);
  }
  if (out.length === 0) out.push(`Check the failing checks: ${result.footing.checks.filter((c) => !c.pass).map((c) => c.title).join(", ")}.`);
  return out;
}
