/**
 * Scaling bench: a 25-line recipe (8 fermentables, 8 hops, 4 salts,
 * 3 adjuncts/spices, 2 mash steps) scaled from a 10 gal pilot to 10 bbl,
 * timed per call. Target: median under 100 µs.
 * Run: npx tsx scripts/bench-brewing.ts
 */
import { performance } from 'node:perf_hooks';
import { pathToFileURL } from 'node:url';
import { EXAMPLE_IPA, PILOT_SYSTEM, TEN_BBL_BREWHOUSE } from '../shared/brewing/example-recipes';
import { scaleRecipe } from '../shared/brewing/index';

const WARM_UP = 2_000;
const ITERATIONS = 10_000;

/** Median time of one pilot → 10 bbl scale, µs, over {@link ITERATIONS} timed calls after a warm-up. */
export function benchScaling(iterations = ITERATIONS): { medianUs: number; iterations: number } {
  let sink = 0;
  for (let i = 0; i < WARM_UP; i++) sink += scaleRecipe(EXAMPLE_IPA, PILOT_SYSTEM, TEN_BBL_BREWHOUSE).after.ibu;
  const samples = new Float64Array(iterations);
  for (let i = 0; i < iterations; i++) {
    const start = performance.now();
    sink += scaleRecipe(EXAMPLE_IPA, PILOT_SYSTEM, TEN_BBL_BREWHOUSE).after.ibu;
    samples[i] = performance.now() - start;
  }
  // Keep the results observable so the work cannot be optimised away.
  if (!Number.isFinite(sink)) throw new Error('scaling produced a non-finite IBU');
  samples.sort();
  const mid = iterations >> 1;
  const medianMs = iterations % 2 ? samples[mid]! : (samples[mid - 1]! + samples[mid]!) / 2;
  return { medianUs: medianMs * 1000, iterations };
}

if (process.argv[1] && import.meta.url === pathToFileURL(process.argv[1]).href) {
  const { medianUs, iterations } = benchScaling();
  console.log(
    `brewing scaleRecipe pilot → 10 bbl: median ${medianUs.toFixed(1)} µs over ${iterations} iterations (target < 100 µs)`,
  );
}
