/**
 * `npm run bench` — how long the engine takes, on the 12-module two-post design.
 *
 * Targets (from the issue): ≤ 20 µs median per `sizeDesign` (the whole result, validation
 * included), ≤ 1 ms per full sweep (every tilt setting × every sweep diameter).
 *
 * Method, chosen because the bench machine is small and shared (other processes steal the CPU at
 * random): each case is warmed up first (so the JIT has compiled it), then timed as many short
 * batches (about `BATCH_MS` each, the batch size calibrated once). Per batch we get µs per call.
 * Reported per case:
 *   - median µs of the batches: the typical cost, with interruptions mostly ignored;
 *   - min µs of the batches: the cost when nothing else ran (the most repeatable figure on a
 *     noisy host; compare before/after with this one first);
 *   - ops/s from each.
 * The cases run interleaved round by round (`--rounds`, default 5) so a burst of load from
 * elsewhere lands on every case, not just one; medians are over all batches of all rounds.
 *
 * Flags: --rounds N (default 5), --batch-ms X (default 2), --json (machine-readable only).
 */
import { twoPostDesignInput } from "./default-design";
import { parseDesignInput } from "./parse";
import { sizeDesign, sizeParsedDesign } from "./size-design";

const argv = process.argv.slice(2);
const flag = (name: string, dflt: number) => {
  const i = argv.indexOf(name);
  return i >= 0 ? Number(argv[i + 1]) : dflt;
};
const ROUNDS = flag("--rounds", 5);
const BATCH_MS = flag("--batch-ms", 2);
const BATCHES_PER_ROUND = flag("--batches", 150);
const JSON_ONLY = argv.includes("--json");

// Results go somewhere observable so the optimiser cannot drop the calls.
let sink = 0;
const keep = (r: { footing: { depthIn: number } }) => { sink += r.footing.depthIn; };

const sweepDraft = {
  ...twoPostDesignInput,
  array: { ...twoPostDesignInput.array, tiltSettingsDeg: [10, 15, 20, 25, 30, 35, 40, 45] },
  posts: { ...twoPostDesignInput.posts, sweepDiametersIn: [12, 18, 24, 30, 36] },
};
const parsed = parseDesignInput(twoPostDesignInput);
const sweepParsed = parseDesignInput(sweepDraft);

interface Case { name: string; measures: string; fn: () => void; batch: number; samples: number[] }
const cases: Case[] = [
  { name: "sizeDesign", measures: "sizeDesign(twoPostDesignInput): validation + whole result (TARGET ≤ 20 µs)", fn: () => keep(sizeDesign(twoPostDesignInput)), batch: 0, samples: [] },
  { name: "sizeParsedDesign", measures: "sizeParsedDesign(parsed): whole result, input already validated", fn: () => keep(sizeParsedDesign(parsed)), batch: 0, samples: [] },
  { name: "parseDesignInput", measures: "parseDesignInput(twoPostDesignInput): validation alone", fn: () => { sink += parseDesignInput(twoPostDesignInput).posts.count; }, batch: 0, samples: [] },
  { name: "sweep", measures: "sizeParsedDesign(sweep): 9 tilts (30° + 8 settings) × 5 sweep diameters, whole result (TARGET ≤ 1000 µs)", fn: () => keep(sizeParsedDesign(sweepParsed)), batch: 0, samples: [] },
  { name: "sweepWithValidation", measures: "sizeDesign(sweep draft): the same sweep, validation included", fn: () => keep(sizeDesign(sweepDraft)), batch: 0, samples: [] },
];

const now = () => Number(process.hrtime.bigint()) / 1000; // µs

function timeBatch(fn: () => void, n: number): number {
  const t0 = now();
  for (let i = 0; i < n; i++) fn();
  return (now() - t0) / n;
}

// Warm-up (≈ 300 ms per case) and batch-size calibration.
for (const c of cases) {
  const until = now() + 300_000;
  let calls = 0;
  while (now() < until) { c.fn(); calls++; }
  // Per-call cost for sizing the batches: the best of 20 short batches (one interruption must
  // not shrink every batch to a single call).
  let per = Infinity;
  for (let i = 0; i < 20; i++) per = Math.min(per, timeBatch(c.fn, Math.max(1, Math.round(calls / 600))));
  c.batch = Math.max(1, Math.round((BATCH_MS * 1000) / per));
}

for (let r = 0; r < ROUNDS; r++) {
  for (const c of cases) for (let b = 0; b < BATCHES_PER_ROUND; b++) c.samples.push(timeBatch(c.fn, c.batch));
}

const round = (x: number, d = 2) => Math.round(x * 10 ** d) / 10 ** d;
const summary = cases.map((c) => {
  const s = [...c.samples].sort((a, b) => a - b);
  const median = s[Math.floor(s.length / 2)];
  const min = s[0];
  return {
    name: c.name,
    measures: c.measures,
    medianUs: round(median),
    minOfBatchesUs: round(min),
    p90Us: round(s[Math.floor(s.length * 0.9)]),
    opsPerSecAtMedian: Math.round(1e6 / median),
    opsPerSecAtMin: Math.round(1e6 / min),
    callsPerBatch: c.batch,
    batches: s.length,
  };
});

const report = {
  design: "12 modules, 2 × 6 portrait, 2 posts (Pipe 5 Std, 30 in holes), ASCE 7-16 115 mph C",
  node: process.version,
  method: `warm-up 300 ms/case; ${ROUNDS} interleaved rounds × ${BATCHES_PER_ROUND} batches of ~${BATCH_MS} ms; µs per call`,
  targets: { sizeDesignMedianUs: 20, sweepMedianUs: 1000 },
  results: summary,
  met: {
    sizeDesign: summary[0].medianUs <= 20,
    sweep: summary[3].medianUs <= 1000,
  },
  sink,
};

if (JSON_ONLY) console.log(JSON.stringify(report));
else {
  console.log(`${report.design}; Node ${report.node}`);
  console.log(report.method);
  console.log("case                  median µs   min µs    p90 µs   ops/s@median  ops/s@min");
  for (const s of summary) {
    console.log(
      `${s.name.padEnd(20)} ${String(s.medianUs).padStart(10)} ${String(s.minOfBatchesUs).padStart(8)} ${String(s.p90Us).padStart(9)} ${String(s.opsPerSecAtMedian).padStart(13)} ${String(s.opsPerSecAtMin).padStart(10)}`,
    );
  }
  for (const s of summary) console.log(`  ${s.name}: ${s.measures}`);
  console.log(`targets: sizeDesign median ≤ 20 µs: ${report.met.sizeDesign ? "met" : "NOT met"}; sweep median ≤ 1000 µs: ${report.met.sweep ? "met" : "NOT met"}`);
  console.log(JSON.stringify(report));
}
