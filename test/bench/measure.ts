// Shared timing for benchmarks: warm-up, seeded repetitions, min and mean ± sd, and ratios.

export interface Timing {
  readonly label: string;
  readonly minMs: number;
  readonly meanMs: number;
  readonly sdMs: number;
  readonly runs: number;
}

/** Times `work` after `warmup` untimed calls; returns min and mean ± sd over `runs` calls. */
export function time(label: string, work: () => unknown, runs = 10, warmup = 2): Timing {
  for (let i = 0; i < warmup; i++) work();
  const samples: number[] = [];
  for (let i = 0; i < runs; i++) {
    const t0 = performance.now();
    work();
    samples.push(performance.now() - t0);
  }
  const meanMs = samples.reduce((a, b) => a + b, 0) / runs;
  const sdMs = Math.sqrt(samples.reduce((a, b) => a + (b - meanMs) ** 2, 0) / Math.max(1, runs - 1));
  return { label, minMs: Math.min(...samples), meanMs, sdMs, runs };
}

/** Async variant of `time` for work that awaits (file reading, child processes). */
export async function timeAsync(label: string, work: () => Promise<unknown>, runs = 3, warmup = 1): Promise<Timing> {
  for (let i = 0; i < warmup; i++) await work();
  const samples: number[] = [];
  for (let i = 0; i < runs; i++) {
    const t0 = performance.now();
    await work();
    samples.push(performance.now() - t0);
  }
  const meanMs = samples.reduce((a, b) => a + b, 0) / runs;
  const sdMs = Math.sqrt(samples.reduce((a, b) => a + (b - meanMs) ** 2, 0) / Math.max(1, runs - 1));
  return { label, minMs: Math.min(...samples), meanMs, sdMs, runs };
}

/** One line per timing; with a reference, the ratio reference/ours of the minimum times. */
export function report(ours: Timing, reference?: Timing, target?: string): void {
  const line = (t: Timing) => `${t.label.padEnd(48)} min ${t.minMs.toFixed(1).padStart(9)} ms   mean ${t.meanMs.toFixed(1)} ± ${t.sdMs.toFixed(1)} ms (n=${t.runs})`;
  console.log(line(ours) + (target ? `   target ${target}` : ''));
  if (reference) {
    console.log(line(reference));
    console.log(`${''.padEnd(48)} ratio reference/ours: ${(reference.minMs / ours.minMs).toFixed(1)}x`);
  }
}
