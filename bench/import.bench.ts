/**
 * Catalogue import commit (issue 12, finding 2: "a large import's commit stalls the loop"), on a
 * temporary database file (WAL, synchronous FULL, as in use) holding the demo:
 * - import_commit_{5000,20000,max_csv,max_json}_ms: wall time of the commit of that many parsed,
 *   validated aircraft on the bulk connection (db/bulk.ts: one transaction, the event loop free
 *   between steps), checkpoint included; the label gives the longest loop block of each;
 * - import_commit_max_block_ms: the longest the event loop went without a turn during any of those
 *   commits (a 1 ms timer chain measures the gaps), target ≤ 100 ms;
 * - import_commit_sync_max_ms: the same largest catalogue committed in one synchronous transaction on
 *   the main connection (the design the bulk connection replaces): the whole time blocks the loop.
 * Sizes: 5,000, 20,000, and the largest catalogue whose CSV fits the 16 MiB upload limit
 * (server/web/security.ts), about 65,000 of these generated aircraft; also the largest JSON catalogue
 * (export format, two-space indentation) that fits, about 14,700. Parsing (worker-thread time, which
 * never blocks the loop) is reported as import_parse_max_csv_ms.
 */
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { openBulkWriter } from '../db/bulk.js';
import { openDatabase } from '../db/client.js';
import { countAircraft } from '../db/repos/aircraft.js';
import { seedDemoIfEmpty } from '../db/seed.js';
import { commitCatalogue, commitCatalogueBulk, type ParsedCatalogue } from '../server/aircraft/index.js';
import { aircraftToCsv } from '../server/io/csv.js';
import { workerJobs } from '../server/jobs/index.js';
import { DEFAULT_BODY_LIMITS } from '../server/web/security.js';
import { demoDocument, generatedAircraft } from '../test/db/fixtures/demo.js';
import type { BenchFigure, BenchModule } from './harness.js';

/** Multipart framing and form fields around the file, bytes (generous). */
const FORM_OVERHEAD = 4096;

/** The largest n whose text (from `text(n)`) fits in `limit` bytes; text length grows with n. */
function largestFitting(text: (n: number) => number, limit: number): number {
  const per = text(1001) - text(1000);
  let n = Math.floor((limit - text(0)) / per);
  while (text(n) > limit) n -= 10;
  return n;
}

function fresh(dir: string, name: string) {
  const h = openDatabase(join(dir, `${name}.sqlite`));
  seedDemoIfEmpty(h.db, demoDocument());
  return h;
}

/** Runs `fn` while a 1 ms timer chain records the longest gap between turns of the event loop. */
async function withLoopWatch<T>(fn: () => Promise<T>): Promise<{ value: T; ms: number; maxBlockMs: number }> {
  let last = performance.now();
  let max = 0;
  let on = true;
  const tick = () => {
    const now = performance.now();
    max = Math.max(max, now - last);
    last = now;
    if (on) setTimeout(tick, 1);
  };
  setTimeout(tick, 1);
  const t = performance.now();
  const value = await fn();
  const ms = performance.now() - t;
  tick();
  on = false;
  return { value, ms, maxBlockMs: max };
}

async function bulkCommit(dir: string, name: string, parsed: ParsedCatalogue): Promise<{ ms: number; maxBlockMs: number }> {
  const { sqlite, db } = fresh(dir, name);
  const bulk = openBulkWriter(sqlite);
  try {
    const before = countAircraft(db);
    const r = await withLoopWatch(() => commitCatalogueBulk(bulk, parsed));
    if (r.value.created.length !== parsed.rows.count || countAircraft(db) !== before + parsed.rows.count) throw new Error(`bulk commit of ${parsed.rows.count} rows incomplete`);
    return r;
  } finally {
    bulk.close();
    sqlite.close();
  }
}

const mod: BenchModule = {
  name: 'import',
  async run() {
    const dir = mkdtempSync(join(tmpdir(), 'runwright-bench-import-'));
    try {
      const limit = DEFAULT_BODY_LIMITS.maxUploadBytes - FORM_OVERHEAD;
      const csvBytes = (n: number) => Buffer.byteLength(aircraftToCsv(generatedAircraft(n, 'imp')));
      const jsonBytes = (n: number) => Buffer.byteLength(`${JSON.stringify(generatedAircraft(n, 'imp'), null, 2)}\n`);
      const maxCsv = largestFitting(csvBytes, limit);
      const maxJson = largestFitting(jsonBytes, limit);

      const figures: BenchFigure[] = [];
      let maxBlock = 0;
      let parseMs = 0;
      let largest: ParsedCatalogue | undefined;
      // Parsing runs in a worker thread, as in the server: the main thread receives packed rows only.
      const jobs = workerJobs({ size: 1 });
      try {
        for (const [n, format, key] of [[5000, 'csv', '5000'], [20000, 'csv', '20000'], [maxCsv, 'csv', 'max_csv'], [maxJson, 'json', 'max_json']] as const) {
          const list = generatedAircraft(n, 'imp');
          const data = new TextEncoder().encode(format === 'csv' ? aircraftToCsv(list) : `${JSON.stringify(list, null, 2)}\n`);
          const t = performance.now();
          const parsed = await jobs.run('catalogue', { format, data });
          if (key === 'max_csv') { parseMs = performance.now() - t; largest = parsed; }
          const r = await bulkCommit(dir, `bulk-${key}`, parsed);
          maxBlock = Math.max(maxBlock, r.maxBlockMs);
          const size = `${format.toUpperCase()} of ${(data.byteLength / 2 ** 20).toFixed(1)} MiB${key.startsWith('max') ? ', the largest that fits in 16 MiB' : ''}`;
          figures.push({ key: `import_commit_${key}_ms`, label: `Import commit of ${n.toLocaleString('en')} aircraft (${size}); loop blocked at most ${r.maxBlockMs.toFixed(0)} ms`, value: r.ms, unit: 'ms' });
        }
      } finally {
        await jobs.close();
      }
      figures.push({ key: 'import_commit_max_block_ms', label: 'Longest event-loop block during those import commits', value: maxBlock, unit: 'ms', target: { op: '<=', value: 100 } });
      figures.push({ key: 'import_parse_max_csv_ms', label: `Parse and check the largest CSV (${maxCsv.toLocaleString('en')} aircraft; worker-thread time)`, value: parseMs, unit: 'ms' });

      const { db, sqlite } = fresh(dir, 'sync');
      try {
        const t = performance.now();
        commitCatalogue(db, largest!);
        figures.push({ key: 'import_commit_sync_max_ms', label: `The same ${maxCsv.toLocaleString('en')} aircraft in one synchronous transaction (blocks the loop throughout)`, value: performance.now() - t, unit: 'ms' });
      } finally {
        sqlite.close();
      }
      return figures;
    } finally {
      rmSync(dir, { recursive: true, force: true });
    }
  },
};
export default mod;
