/**
 * Where long computations run. `workerJobs` keeps a small pool of worker threads so that a large study
 * or station file never blocks other requests (the event loop stays free); `inlineJobs` runs them on
 * the calling thread (tests, command line). Both give the same results and the same errors.
 */
import { Worker } from 'node:worker_threads';
import { createRequire } from 'node:module';
import { availableParallelism } from 'node:os';
import { dirname, join } from 'node:path';
import { fileURLToPath, pathToFileURL } from 'node:url';
import { rebuildError, runTask, serialiseError, type SerialError, type TaskName, type Tasks } from './tasks.js';

/** What each task is, for messages ("… took longer than 120 s"). */
const TASK_LABEL: Record<TaskName, string> = {
  study: 'computing the study',
  climate: 'reading the station file',
  catalogue: 'checking the catalogue file',
  pdf: 'drawing the appendix PDF',
};

/** A job ran longer than the pool's limit and was stopped (the web app answers 503 with this message). */
export class JobTimeoutError extends Error {
  constructor(readonly task: TaskName, readonly limitMs: number) {
    const seconds = limitMs >= 10_000 ? Math.round(limitMs / 1000) : limitMs / 1000;
    const what = TASK_LABEL[task] ?? task;
    super(`${what.charAt(0).toUpperCase()}${what.slice(1)} took longer than ${seconds} s and was stopped; nothing was changed. Try again later; a smaller study or file finishes sooner.`);
    this.name = 'JobTimeoutError';
  }
}

/** The pool cannot take jobs (closed, or its worker threads cannot start); the web app answers 503. */
export class JobUnavailableError extends Error {
  constructor(reason: string) {
    super(`The server cannot run long computations right now (${reason}); nothing was changed. Try again later.`);
    this.name = 'JobUnavailableError';
  }
}

export interface JobRunner {
  run<K extends TaskName>(task: K, input: Tasks[K]['input']): Promise<Tasks[K]['output']>;
  /** Stops the workers (pending jobs are rejected). */
  close(): Promise<void>;
  /** 'inline' or 'workers' (shown in docs and tests). */
  readonly mode: 'inline' | 'workers';
}

export function inlineJobs(): JobRunner {
  return {
    mode: 'inline',
    // Errors cross the same boundary as a worker's, so a test sees the types the workers give.
    run: async (task, input) => {
      try {
        return await runTask(task, input);
      } catch (e) {
        throw rebuildError(serialiseError(e));
      }
    },
    close: async () => {},
  };
}

interface Pending { resolve: (v: unknown) => void; reject: (e: Error) => void; timer: NodeJS.Timeout }
/** `stopped`: terminated on purpose (a job ran past the limit), so its exit is not a start-up failure. */
interface Slot { worker: Worker; pending: Map<number, Pending>; ready: boolean; stopped: boolean }

export interface WorkerJobsOptions {
  /** Worker threads (default: cores − 1, at least 1, at most 4). */
  readonly size?: number;
  /** A job running longer than this is stopped and rejected, ms (default 120 000). */
  readonly timeoutMs?: number;
}

const require = createRequire(import.meta.url);
const SELF = fileURLToPath(import.meta.url);
const FROM_SOURCE = SELF.endsWith('.ts');
const ENTRY = new URL(FROM_SOURCE ? './worker.ts' : './worker.js', import.meta.url).href;
/** Bootstrap evaluated in each worker: registers the TypeScript loader when running from source. */
const BOOT = `
const { workerData } = require('node:worker_threads');
(async () => {
  if (workerData.tsx) { const { register } = await import(workerData.tsx); register(); }
  await import(workerData.entry);
})().catch((e) => { setImmediate(() => { throw e; }); });
`;

/** The ES-module entry of tsx's register API (its "import" export), as a file URL. */
function tsxApiUrl(): string {
  const root = dirname(require.resolve('tsx/package.json'));
  const pkg = require('tsx/package.json') as { exports: Record<string, { import?: { default?: string } }> };
  const rel = pkg.exports['./esm/api']?.import?.default ?? './dist/esm/api/index.mjs';
  return pathToFileURL(join(root, rel)).href;
}

/** Consecutive worker start-up failures after which the pool stops respawning and refuses jobs. */
const MAX_STARTUP_FAILURES = 3;

export function workerJobs(options: WorkerJobsOptions = {}): JobRunner {
  const size = Math.max(1, Math.min(4, options.size ?? availableParallelism() - 1));
  const timeoutMs = options.timeoutMs ?? 120_000;
  const tsx = FROM_SOURCE ? tsxApiUrl() : undefined;
  let nextId = 1;
  let closed = false;
  let startupFailures = 0;
  let broken: Error | undefined;
  const slots: Slot[] = [];

  const spawn = (): Slot => {
    const worker = new Worker(BOOT, { eval: true, workerData: { entry: ENTRY, tsx } });
    worker.unref();
    const slot: Slot = { worker, pending: new Map(), ready: false, stopped: false };
    worker.on('message', (m: { id?: number; ok?: boolean; output?: unknown; error?: SerialError; ready?: boolean }) => {
      if (m.ready) { slot.ready = true; startupFailures = 0; return; }
      if (m.id === undefined) return;
      const p = slot.pending.get(m.id);
      if (!p) return;
      slot.pending.delete(m.id);
      clearTimeout(p.timer);
      if (m.ok) p.resolve(m.output);
      else p.reject(rebuildError(m.error!));
    });
    const fail = (e: Error) => {
      for (const p of slot.pending.values()) { clearTimeout(p.timer); p.reject(e); }
      slot.pending.clear();
      const i = slots.indexOf(slot);
      if (i < 0 || closed) return;
      slots.splice(i, 1);
      if (!slot.ready && !slot.stopped && ++startupFailures >= MAX_STARTUP_FAILURES) {
        broken = new Error(`worker threads cannot start: ${e.message}`);
        console.error(broken.message);
        return;
      }
      if (!broken) slots.push(spawn());
    };
    worker.on('error', (e) => fail(e));
    worker.on('exit', (code) => { if (!closed) fail(new JobUnavailableError(`a worker thread stopped (exit code ${code})`)); });
    return slot;
  };
  for (let i = 0; i < size; i++) slots.push(spawn());

  return {
    mode: 'workers',
    run(task, input) {
      if (closed) return Promise.reject(new JobUnavailableError('the job pool is closed'));
      if (broken || slots.length === 0) return Promise.reject(new JobUnavailableError(broken?.message ?? 'no worker thread is available'));
      const slot = slots.reduce((a, b) => (b.pending.size < a.pending.size ? b : a));
      const id = nextId++;
      return new Promise((resolve, reject) => {
        const timer = setTimeout(() => {
          slot.pending.delete(id);
          reject(new JobTimeoutError(task, timeoutMs));
          // Replace the worker at once, so that the next job does not land on the one being stopped.
          slot.stopped = true;
          const i = slots.indexOf(slot);
          if (i >= 0 && !closed) slots.splice(i, 1, spawn());
          void slot.worker.terminate();
        }, timeoutMs);
        timer.unref();
        slot.pending.set(id, { resolve: resolve as (v: unknown) => void, reject, timer });
        slot.worker.postMessage({ id, task, input });
      });
    },
    async close() {
      closed = true;
      await Promise.all(slots.map(async (s) => {
        for (const p of s.pending.values()) { clearTimeout(p.timer); p.reject(new Error('the job pool was closed')); }
        s.pending.clear();
        await s.worker.terminate();
      }));
    },
  };
}
