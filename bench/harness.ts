/**
 * Benchmark harness. Each `bench/*.bench.ts` module default-exports a `BenchModule`; `npm run bench`
 * discovers them, runs each within its own time bound, prints a table, and with `--json` prints one
 * JSON object `{ key: value, ... }` whose keys the issues name. Never part of `npm test`.
 */
export interface BenchFigure {
  /** JSON key named by an issue, e.g. "takeoff_analyses_per_s". */
  readonly key: string;
  readonly label: string;
  readonly value: number;
  readonly unit: string;
  /** Target as text, e.g. "≥ 20000"; the table shows whether it is met. */
  readonly target?: { readonly op: '>=' | '<='; readonly value: number };
}

export interface BenchModule {
  readonly name: string;
  run(): Promise<readonly BenchFigure[]> | readonly BenchFigure[];
}

/** Calls `fn` repeatedly for about `ms` milliseconds (after a short warm-up); returns calls per second. */
export function ratePerSecond(fn: () => unknown, ms = 1000): number {
  const warmEnd = performance.now() + Math.min(200, ms / 4);
  while (performance.now() < warmEnd) fn();
  let n = 0;
  const start = performance.now();
  let now = start;
  while (now - start < ms) {
    for (let i = 0; i < 10; i++) fn();
    n += 10;
    now = performance.now();
  }
  return (n * 1000) / (now - start);
}

/** Median wall time (ms) of `runs` calls of `fn`, after one warm-up call. */
export async function medianMs(fn: () => unknown | Promise<unknown>, runs = 7): Promise<number> {
  await fn();
  const times: number[] = [];
  for (let i = 0; i < runs; i++) {
    const t = performance.now();
    await fn();
    times.push(performance.now() - t);
  }
  times.sort((a, b) => a - b);
  return times[Math.floor(times.length / 2)]!;
}

/** Percentile (0–100) of a list of numbers. */
export function percentile(values: readonly number[], p: number): number {
  const s = [...values].sort((a, b) => a - b);
  const i = Math.min(s.length - 1, Math.max(0, Math.ceil((p / 100) * s.length) - 1));
  return s[i]!;
}
