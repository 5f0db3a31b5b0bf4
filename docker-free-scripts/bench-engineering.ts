// Times analyzeContinuousBeam on the largest girder the checks accept (20 spans, 200 stations a
// span) so a slowdown shows before a form feels it. Prints figures only; it never fails on speed.
// Run: npx tsx docker-free-scripts/bench-engineering.ts [runs]
import { analyzeContinuousBeam, planDeckPlacement } from '../shared/engineering';

const TARGET_MS = 5;
const runs = Math.max(10, Number(process.argv[2] ?? 200) || 200);
const warmUp = 50;

// Unequal spans and a partly placed deck, so the patch-load path is timed too.
const spansFt = Array.from({ length: 20 }, (_, i) => 90 + ((i * 37) % 80));
const lengthFt = spansFt.reduce((a, b) => a + b, 0);
const input = {
  spansFt,
  uniformLoadKipPerFt: spansFt.map((_, i) => 1 + (i % 3) * 0.25),
  patchLoads: [
    { fromFt: 0.1 * lengthFt, toFt: 0.35 * lengthFt, kipPerFt: 1.2 },
    { fromFt: 0.6 * lengthFt, toFt: 0.62 * lengthFt, kipPerFt: 3 },
  ],
  stationsPerSpan: 200,
};

function percentile(sorted: number[], p: number): number {
  const i = Math.min(sorted.length - 1, Math.max(0, Math.ceil((p / 100) * sorted.length) - 1));
  return sorted[i]!;
}

function time(label: string, fn: () => unknown, count: number): void {
  for (let i = 0; i < warmUp; i++) fn();
  const samples: number[] = [];
  for (let i = 0; i < count; i++) {
    const t0 = performance.now();
    fn();
    samples.push(performance.now() - t0);
  }
  samples.sort((a, b) => a - b);
  const median = percentile(samples, 50);
  console.log(
    `${label}: median ${median.toFixed(3)} ms, p95 ${percentile(samples, 95).toFixed(3)} ms, ` +
      `min ${samples[0]!.toFixed(3)} ms, max ${samples[samples.length - 1]!.toFixed(3)} ms over ${count} runs`,
  );
}

const sample = analyzeContinuousBeam(input);
console.log(
  `analyzeContinuousBeam: ${spansFt.length} spans, ${lengthFt} ft, ${input.stationsPerSpan} stations a span ` +
    `(${sample.stations.length} rows), ${sample.inflectionPointsFt.length} inflection points`,
);
time('analyzeContinuousBeam', () => analyzeContinuousBeam(input), runs);
console.log(`target: median at or under ${TARGET_MS} ms (a figure to watch, not a test)`);

// The placement plan runs its stage check search; worth a figure beside the analysis.
const plan = { spansFt, deckWidthFt: 42, slabThicknessIn: 8.5, placementRateCyPerHr: 60 };
time('planDeckPlacement (20 spans, stage check included)', () => planDeckPlacement(plan), Math.min(runs, 30));
