/**
 * `npm run bench`: median µs per `sizeDesign` (with and without schema validation) and per full
 * sweep (every tilt setting × every sweep diameter) on the 12-module two-post design.
 * Targets: ≤ 20 µs per sizing, ≤ 1 ms per sweep.
 */
import { twoPostDesignInput } from "./default-design";
import { parseDesignInput } from "./parse";
import { sizeDesign, sizeParsedDesign } from "./size-design";

function medianMicros(fn: () => void, runs: number, batch: number): number {
  for (let i = 0; i < 200; i++) fn();
  const samples: number[] = [];
  for (let r = 0; r < runs; r++) {
    const t0 = process.hrtime.bigint();
    for (let i = 0; i < batch; i++) fn();
    samples.push(Number(process.hrtime.bigint() - t0) / 1000 / batch);
  }
  samples.sort((a, b) => a - b);
  return samples[Math.floor(samples.length / 2)];
}

const parsed = parseDesignInput(twoPostDesignInput);
const sweepInput = parseDesignInput({
  ...twoPostDesignInput,
  array: { ...twoPostDesignInput.array, tiltSettingsDeg: [10, 15, 20, 25, 30, 35, 40, 45] },
  posts: { ...twoPostDesignInput.posts, sweepDiametersIn: [12, 18, 24, 30, 36] },
});

const results = {
  design: "12 modules, 2 × 6 portrait, 2 posts (Pipe 5 Std, 30 in holes), ASCE 7-16 115 mph C",
  sizeParsedDesignMedianUs: medianMicros(() => sizeParsedDesign(parsed), 200, 50),
  sizeDesignWithValidationMedianUs: medianMicros(() => sizeDesign(twoPostDesignInput), 200, 50),
  fullSweepMedianUs: medianMicros(() => sizeParsedDesign(sweepInput), 100, 20),
  sweep: "9 tilts (30° + 8 settings) × 5 diameters, all checks, in one sizeParsedDesign call",
  targets: { sizingUs: 20, sweepUs: 1000 },
};
console.log(JSON.stringify(results, null, 2));
