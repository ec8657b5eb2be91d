/**
 * Responsiveness benchmark (issue 12, finding 2: "the server freezes"): the longest the real server's
 * event loop goes without a turn while page views, a large appendix PDF and a large catalogue import
 * run together.
 *
 * The server is its own process (`node --import tsx server/main.ts`) on a temporary database file and
 * a random loopback port, so what is measured is the server, not this process. It records its own
 * event-loop delay (perf_hooks.monitorEventLoopDelay, 10 ms resolution) and `GET /health/loop?reset=1`
 * reads the longest block since the previous read (server/web/loop.ts). Phases, each read separately:
 * - pages: page views alone (autocannon, 4 connections paced to 40 requests/s in all: home, the
 *   catalogue page, the big study's overview, an aircraft, /health), the baseline;
 * - pdf: the same page views while the appendix of a large valid study renders (20 scenarios × 50
 *   fleet rows built from examples/demo-study.json, 50 aircraft, created with POST /api/studies and
 *   computed with POST /api/studies/:id/run);
 * - import: the page views while a 10,000-aircraft CSV is imported through the catalogue form
 *   (multipart, CSRF cookie and token, as a browser sends it);
 * - mixed: page views, a second PDF (the other unit system, so not from the cache) and a second
 *   10,000-aircraft import at the same time.
 * event_loop_max_block_ms is the largest of the four (target ≤ 100 ms); the per-phase figures say
 * which part blocks. Loopback only; every phase is bounded in time, and the server is stopped (SIGTERM,
 * then SIGKILL) whatever happens.
 */
import autocannon from 'autocannon';
import { spawn, type ChildProcess } from 'node:child_process';
import { mkdtempSync, readFileSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import type { AircraftProfile } from '../core/index.js';
import { aircraftToCsv } from '../server/io/csv.js';
import type { LoopDelay } from '../server/web/loop.js';
import type { BenchFigure, BenchModule } from './harness.js';

const ROOT = fileURLToPath(new URL('..', import.meta.url));
const DEMO = join(ROOT, 'examples/demo-study.json');
const SCENARIOS = 20;
const ROWS = 50;
const IMPORT_ROWS = 10_000;
/** No phase may take longer than this (the whole bench stays within a few minutes). */
const PHASE_LIMIT_MS = 180_000;
const TARGET_MS = 100;
/**
 * Page views: 4 connections paced to 40 requests per second in all (a few dozen planners clicking
 * around), so that the figure is the loop's blocking, not the queue of a saturating load generator.
 */
const VIEW_CONNECTIONS = 4;
const VIEW_RATE = 40;

interface FleetRow { aircraft: string; annualOperations: number; stageLength_km: number; payload_kg: number }
interface DemoDoc { name: string; aircraft: AircraftProfile[]; scenarios: { name: string; fleet: FleetRow[] }[]; [k: string]: unknown }

/** A large valid study from the demo: 50 aircraft (demo types under new ids), 20 scenarios × 50 rows. */
export function bigStudy(): DemoDoc {
  const demo = JSON.parse(readFileSync(DEMO, 'utf8')) as DemoDoc;
  const rowOf = new Map<string, FleetRow>();
  for (const s of demo.scenarios) for (const r of s.fleet) if (!rowOf.has(r.aircraft)) rowOf.set(r.aircraft, r);
  const types = demo.aircraft.filter((a) => rowOf.has(a.id));
  const aircraft = Array.from({ length: ROWS }, (_, k) => {
    const b = types[k % types.length]!;
    return { ...b, id: `${b.id}-v${k}`, name: `${b.name} V${k}` };
  });
  const scenarios = Array.from({ length: SCENARIOS }, (_, s) => ({
    name: `Scenario ${s + 1}`,
    fleet: aircraft.map((a, k) => {
      const t = rowOf.get(types[k % types.length]!.id)!;
      return { aircraft: a.id, annualOperations: t.annualOperations + 10 * s + k, stageLength_km: t.stageLength_km, payload_kg: t.payload_kg };
    }),
  }));
  return { ...demo, name: `Responsiveness study ${SCENARIOS}×${ROWS}`, aircraft, scenarios };
}

/** `n` aircraft for an import, from the demo's business jet, ids `${prefix}-00000`, ... */
function importAircraft(n: number, prefix: string): AircraftProfile[] {
  const demo = JSON.parse(readFileSync(DEMO, 'utf8')) as DemoDoc;
  const base = demo.aircraft.find((a) => a.engineType === 'turbofan') ?? demo.aircraft[0]!;
  return Array.from({ length: n }, (_, i) => ({ ...base, id: `${prefix}-${String(i).padStart(5, '0')}`, name: `${prefix} jet ${i}`, mtow_kg: base.mtow_kg + (i % 100) }));
}

function withTimeout<T>(p: Promise<T>, ms: number, what: string): Promise<T> {
  let timer: NodeJS.Timeout | undefined;
  return Promise.race([
    p.finally(() => clearTimeout(timer)),
    new Promise<T>((_, reject) => { timer = setTimeout(() => reject(new Error(`${what} took longer than ${ms / 1000} s`)), ms); }),
  ]);
}

interface Server { readonly base: string; readonly child: ChildProcess }

async function startServer(dbFile: string): Promise<Server> {
  const { RUNWRIGHT_ACCESS_TOKEN: _token, ...env } = process.env;
  const child = spawn(process.execPath, ['--import', 'tsx', 'server/main.ts'], {
    cwd: ROOT,
    env: { ...env, PORT: '0', HOST: '127.0.0.1', RUNWRIGHT_DB_FILE: dbFile },
    stdio: ['ignore', 'pipe', 'pipe'],
  });
  let log = '';
  const base = await withTimeout(new Promise<string>((resolve, reject) => {
    const onData = (d: Buffer) => {
      log += d.toString();
      const m = /listening on (http:\/\/127\.0\.0\.1:\d+)/.exec(log);
      if (m) resolve(m[1]!);
    };
    child.stdout!.on('data', onData);
    child.stderr!.on('data', (d: Buffer) => { log += d.toString(); });
    child.on('exit', (code) => reject(new Error(`the server exited (${code}) before listening:\n${log}`)));
  }), 60_000, 'starting the server');
  return { base, child };
}

async function stopServer(s: Server | undefined): Promise<void> {
  if (!s || s.child.exitCode !== null) return;
  const exited = new Promise<void>((resolve) => s.child.once('exit', () => resolve()));
  s.child.kill('SIGTERM');
  const hard = setTimeout(() => s.child.kill('SIGKILL'), 6000);
  await exited;
  clearTimeout(hard);
}

const mod: BenchModule = {
  name: 'eventloop',
  async run() {
    const dir = mkdtempSync(join(tmpdir(), 'runwright-loop-bench-'));
    let server: Server | undefined;
    try {
      server = await startServer(join(dir, 'bench.sqlite'));
      const { base } = server;
      const first = await fetch(`${base}/`);
      const token = /rw_csrf=([^;]+)/.exec(first.headers.get('set-cookie') ?? '')?.[1];
      if (!token) throw new Error('no CSRF cookie');
      const cookie = `rw_csrf=${token}`;
      const loop = async (): Promise<LoopDelay> => (await (await fetch(`${base}/health/loop?reset=1`)).json()) as LoopDelay;

      // The large study: created and computed through the API (computing runs in the job pool).
      const doc = bigStudy();
      const created = await fetch(`${base}/api/studies`, { method: 'POST', headers: { 'content-type': 'application/json' }, body: JSON.stringify(doc) });
      if (created.status !== 201) throw new Error(`creating the study answered ${created.status}: ${await created.text()}`);
      const { id } = (await created.json()) as { id: number };
      await loop();
      let t = performance.now();
      const ran = await withTimeout(fetch(`${base}/api/studies/${id}/run`, { method: 'POST', headers: { 'content-type': 'application/json' }, body: '{}' }), PHASE_LIMIT_MS, 'computing the study');
      if (ran.status !== 200) throw new Error(`computing the study answered ${ran.status}: ${(await ran.text()).slice(0, 300)}`);
      const resultBytes = (await ran.arrayBuffer()).byteLength;
      const computeMs = performance.now() - t;
      const compute = await loop();

      const headers = { cookie };
      const requests = [
        { method: 'GET' as const, path: '/', headers },
        { method: 'GET' as const, path: '/aircraft', headers },
        { method: 'GET' as const, path: `/studies/${id}`, headers },
        { method: 'GET' as const, path: `/aircraft/${encodeURIComponent(doc.aircraft[0]!.id)}`, headers },
        { method: 'GET' as const, path: '/health', headers },
      ];
      /** Page views until `until` settles (at least `minS` seconds), then the loop figures of the phase. */
      const phase = async (until: Promise<unknown>, minS: number) => {
        await loop();
        let done = false;
        const work = until.finally(() => { done = true; });
        const views: Awaited<ReturnType<typeof autocannon>>[] = [];
        const started = performance.now();
        while (!done || performance.now() - started < minS * 1000) {
          if (performance.now() - started > PHASE_LIMIT_MS) throw new Error('a phase ran past its time limit');
          views.push(await autocannon({ url: base, connections: VIEW_CONNECTIONS, overallRate: VIEW_RATE, duration: 1, requests }));
        }
        await work;
        const errors = views.reduce((n, v) => n + v.errors + v.non2xx, 0);
        if (errors > 0) throw new Error(`page views: ${errors} errors or non-2xx answers`);
        const n = views.reduce((s, v) => s + v.requests.total, 0);
        const p99 = Math.max(...views.map((v) => v.latency.p99));
        return { loop: await loop(), views: n, p99, seconds: (performance.now() - started) / 1000 };
      };

      const pdf = async (units: 'si' | 'us') => {
        const t0 = performance.now();
        const r = await fetch(`${base}/studies/${id}/appendix.pdf?units=${units}`, { headers });
        const bytes = (await r.arrayBuffer()).byteLength;
        if (r.status !== 200) throw new Error(`the appendix answered ${r.status}`);
        return { bytes, ms: performance.now() - t0 };
      };
      const importCsv = async (prefix: string) => {
        const csv = aircraftToCsv(importAircraft(IMPORT_ROWS, prefix));
        const fd = new FormData();
        fd.set('_csrf', token);
        fd.set('format', 'csv');
        fd.set('file', new File([csv], `${prefix}.csv`, { type: 'text/csv' }));
        const t0 = performance.now();
        const r = await fetch(`${base}/aircraft/import`, { method: 'POST', headers, body: fd, redirect: 'manual' });
        await r.arrayBuffer();
        if (r.status !== 303) throw new Error(`the import answered ${r.status}`);
        return { bytes: Buffer.byteLength(csv), ms: performance.now() - t0 };
      };

      const pages = await phase(Promise.resolve(), 3);
      let pdfInfo = { bytes: 0, ms: 0 };
      const pdfPhase = await phase(pdf('si').then((x) => { pdfInfo = x; }), 2);
      let importInfo = { bytes: 0, ms: 0 };
      const importPhase = await phase(importCsv('loopa').then((x) => { importInfo = x; }), 2);
      t = performance.now();
      const mixed = await phase(Promise.all([pdf('us'), importCsv('loopb')]), 2);
      const mixedMs = performance.now() - t;

      const worst = Math.max(pages.loop.max_ms, pdfPhase.loop.max_ms, importPhase.loop.max_ms, mixed.loop.max_ms);
      const kib = (b: number) => `${Math.round(b / 1024).toLocaleString('en-US')} KiB`;
      const block = (key: string, label: string, value: number): BenchFigure => ({ key, label, value, unit: 'ms', target: { op: '<=', value: TARGET_MS } });
      return [
        block('event_loop_max_block_ms', `Server event loop, longest block over all phases (page views + ${SCENARIOS}×${ROWS} PDF + ${IMPORT_ROWS.toLocaleString('en-US')}-aircraft import)`, worst),
        block('event_loop_block_pages_ms', `…page views alone (${pages.views} views in ${pages.seconds.toFixed(1)} s, p99 ${pages.p99} ms)`, pages.loop.max_ms),
        block('event_loop_block_pdf_ms', `…while the appendix renders (${kib(pdfInfo.bytes)} PDF in ${(pdfInfo.ms / 1000).toFixed(1)} s; ${pdfPhase.views} views, p99 ${pdfPhase.p99} ms)`, pdfPhase.loop.max_ms),
        block('event_loop_block_import_ms', `…while ${IMPORT_ROWS.toLocaleString('en-US')} aircraft import (${kib(importInfo.bytes)} CSV in ${(importInfo.ms / 1000).toFixed(1)} s; ${importPhase.views} views, p99 ${importPhase.p99} ms)`, importPhase.loop.max_ms),
        block('event_loop_block_mixed_ms', `…PDF (other units) + import + page views together (${(mixedMs / 1000).toFixed(1)} s; ${mixed.views} views, p99 ${mixed.p99} ms)`, mixed.loop.max_ms),
        { key: 'event_loop_block_compute_ms', label: `…while the ${SCENARIOS}×${ROWS} study computes and its result (${kib(resultBytes)} JSON) is sent (${(computeMs / 1000).toFixed(1)} s)`, value: compute.max_ms, unit: 'ms' },
      ];
    } finally {
      await stopServer(server);
      rmSync(dir, { recursive: true, force: true });
    }
  },
};

export default mod;
