/**
 * The server's own event-loop delay, for `GET /health/loop` and the responsiveness benchmark
 * (bench/eventloop.bench.ts): a `perf_hooks.monitorEventLoopDelay` histogram sampled every 10 ms.
 * Its maximum is the longest the loop was blocked since the last reset (plus at most the
 * resolution), i.e. the longest any request waited for a turn of the loop.
 */
import { monitorEventLoopDelay, type IntervalHistogram } from 'node:perf_hooks';

export interface LoopDelay {
  /** Longest delay of the loop since `since`, ms. */
  readonly max_ms: number;
  readonly p99_ms: number;
  readonly mean_ms: number;
  /** Samples in the window. */
  readonly samples: number;
  /** Start of the window (ISO time). */
  readonly since: string;
  /** Sampling interval, ms (delays below it are not seen). */
  readonly resolution_ms: number;
}

export class LoopMonitor {
  private readonly h: IntervalHistogram;
  private since = new Date();

  constructor(private readonly resolutionMs = 10) {
    this.h = monitorEventLoopDelay({ resolution: resolutionMs });
    this.h.enable();
  }

  /** The figures of the current window; `reset` starts a new one after reading. */
  read(reset = false): LoopDelay {
    const ms = (ns: number) => Math.round((Number.isFinite(ns) ? ns : 0) / 1e4) / 100;
    const samples = this.h.count;
    const out: LoopDelay = {
      max_ms: samples > 0 ? ms(this.h.max) : 0,
      p99_ms: samples > 0 ? ms(this.h.percentile(99)) : 0,
      mean_ms: samples > 0 ? ms(this.h.mean) : 0,
      samples,
      since: this.since.toISOString(),
      resolution_ms: this.resolutionMs,
    };
    if (reset) {
      this.h.reset();
      this.since = new Date();
    }
    return out;
  }

  stop(): void {
    this.h.disable();
  }
}
