/** Timing helpers for the bench: warm-up, then N timed runs, summarised by median and p95. */
export type Timing = { runs: number; medianMs: number; p95Ms: number; minMs: number };

function quantile(sortedMs: number[], q: number): number {
  const index = Math.min(sortedMs.length - 1, Math.max(0, Math.ceil(q * sortedMs.length) - 1));
  return sortedMs[index]!;
}

export function summarise(samplesMs: number[]): Timing {
  const sorted = [...samplesMs].sort((a, b) => a - b);
  const lower = sorted[Math.floor((sorted.length - 1) / 2)]!;
  const upper = sorted[Math.ceil((sorted.length - 1) / 2)]!;
  return { runs: sorted.length, medianMs: (lower + upper) / 2, p95Ms: quantile(sorted, 0.95), minMs: sorted[0]! };
}

export async function timeRuns(run: () => unknown, options: { warmup: number; runs: number }): Promise<Timing> {
  for (let i = 0; i < options.warmup; i += 1) await run();
  const samples: number[] = [];
  for (let i = 0; i < options.runs; i += 1) {
    const start = performance.now();
    await run();
    samples.push(performance.now() - start);
  }
  return summarise(samples);
}

/** Two tasks timed in alternation, so drift on a shared machine hits both alike. */
export async function timeAlternating(a: () => unknown, b: () => unknown, options: { warmup: number; runs: number }): Promise<[Timing, Timing]> {
  for (let i = 0; i < options.warmup; i += 1) {
    await a();
    await b();
  }
  const samplesA: number[] = [];
  const samplesB: number[] = [];
  for (let i = 0; i < options.runs; i += 1) {
    let start = performance.now();
    await a();
    samplesA.push(performance.now() - start);
    start = performance.now();
    await b();
    samplesB.push(performance.now() - start);
  }
  return [summarise(samplesA), summarise(samplesB)];
}
