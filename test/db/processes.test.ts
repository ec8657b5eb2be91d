/**
 * Reliability across processes (issue 7): concurrent writers on one file, and a writer killed with
 * SIGKILL in the middle of a large import. Child scripts live in test/db/fixtures/.
 */
import { spawn, type ChildProcessWithoutNullStreams } from 'node:child_process';
import { mkdtempSync, readFileSync, rmSync, statSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { openDatabase } from '../../db/client.js';
import { countAircraft, getAircraft } from '../../db/repos/aircraft.js';
import { seedDemoIfEmpty } from '../../db/seed.js';
import { aircraftToCsv } from '../../server/io/csv.js';
import { demoDocument, generatedAircraft } from './fixtures/demo.js';

const root = resolve(import.meta.dirname, '..', '..');
const fixture = (name: string) => join(root, 'test', 'db', 'fixtures', name);

function child(script: string, args: readonly string[]): ChildProcessWithoutNullStreams {
  return spawn(process.execPath, ['--import', 'tsx', fixture(script), ...args], { cwd: root, stdio: 'pipe' });
}

/** Resolves with the first stdout line matching `re`; rejects if the process exits first. */
function waitForLine(p: ChildProcessWithoutNullStreams, re: RegExp): Promise<string> {
  return new Promise((res, rej) => {
    let out = '';
    let err = '';
    const onData = (d: Buffer) => {
      out += d.toString();
      const line = out.split('\n').find((l) => re.test(l));
      if (line !== undefined) {
        p.stdout.off('data', onData);
        res(line);
      }
    };
    p.stdout.on('data', onData);
    p.stderr.on('data', (d: Buffer) => (err += d.toString()));
    p.once('exit', (code, signal) => rej(new Error(`child exited (${code ?? signal}) before printing ${re}; stdout: ${out} stderr: ${err}`)));
  });
}

function exited(p: ChildProcessWithoutNullStreams): Promise<{ code: number | null; signal: NodeJS.Signals | null }> {
  return new Promise((res) => {
    if (p.exitCode !== null || p.signalCode !== null) res({ code: p.exitCode, signal: p.signalCode });
    else p.once('exit', (code, signal) => res({ code, signal }));
  });
}

let dir: string;
const children: ChildProcessWithoutNullStreams[] = [];
beforeEach(() => {
  dir = mkdtempSync(join(tmpdir(), 'runwright-db-'));
});
afterEach(() => {
  for (const c of children.splice(0)) if (c.exitCode === null && c.signalCode === null) c.kill('SIGKILL');
  rmSync(dir, { recursive: true, force: true });
});

describe('concurrent writers on one file (issue 7: 4 processes × 250 writes)', () => {
  it('keeps all 1,000 rows and no busy error reaches a caller; the fresh file is migrated once', async () => {
    const file = join(dir, 'concurrent.sqlite');
    const writers = [0, 1, 2, 3].map((i) => {
      const p = child('writer.ts', [file, String(i), '250']);
      children.push(p);
      return p;
    });
    // Every writer opens the still-empty file itself, so the migrations race too.
    await Promise.all(writers.map((p) => waitForLine(p, /^ready$/)));
    const summaries = writers.map((p) => waitForLine(p, /^\{/));
    for (const p of writers) p.stdin.write('go\n');
    const results = (await Promise.all(summaries)).map((l) => JSON.parse(l) as { writer: number; ok: number; errorCount: number; errors: string[] });
    const codes = await Promise.all(writers.map(exited));

    for (const r of results) expect(r, `writer ${r.writer}: ${r.errors.join(' | ')}`).toMatchObject({ ok: 250, errorCount: 0 });
    expect(codes.map((c) => c.code)).toEqual([0, 0, 0, 0]);

    const { sqlite, db } = openDatabase(file);
    try {
      expect(countAircraft(db)).toBe(1000);
      for (const w of [0, 1, 2, 3]) {
        const n = sqlite.prepare(`SELECT count(*) AS n FROM aircraft WHERE id LIKE ?`).get(`w${w}-%`) as { n: number };
        expect(n.n, `rows of writer ${w}`).toBe(250);
      }
      // Each committed migration applied exactly once, although four processes raced to apply them.
      const journal = JSON.parse(readFileSync(new URL('../../drizzle/meta/_journal.json', import.meta.url), 'utf8')) as { entries: unknown[] };
      expect(sqlite.prepare('SELECT count(*) AS n FROM __drizzle_migrations').get()).toEqual({ n: journal.entries.length });
      expect(sqlite.pragma('integrity_check', { simple: true })).toBe('ok');
    } finally {
      sqlite.close();
    }
  });
});

describe('writer killed with SIGKILL in the middle of a large import (issue 7)', () => {
  it('opens cleanly, passes the integrity check, and holds none of the import', async () => {
    const file = join(dir, 'crash.sqlite');
    const seeded = openDatabase(file);
    seedDemoIfEmpty(seeded.db, demoDocument());
    seeded.sqlite.close();

    const N = 4000;
    const csvFile = join(dir, 'big.csv');
    writeFileSync(csvFile, aircraftToCsv(generatedAircraft(N, 'big')));
    const walBefore = statSync(`${file}-wal`, { throwIfNoEntry: false })?.size ?? 0;

    // Stall after 3,000 of the 4,000 rows are inserted (still inside the import's transaction).
    const p = child('import-then-stall.ts', [file, csvFile, 'big-02999']);
    children.push(p);
    await waitForLine(p, /^stalled$/);
    const walAtKill = statSync(`${file}-wal`).size;
    p.kill('SIGKILL');
    expect((await exited(p)).signal).toBe('SIGKILL');

    // The import had written well past the page cache, so uncommitted pages sat in the WAL file.
    expect(walAtKill - walBefore, `WAL grew by ${walAtKill - walBefore} bytes`).toBeGreaterThan(500_000);

    const { sqlite, db } = openDatabase(file);
    try {
      expect(sqlite.pragma('integrity_check', { simple: true })).toBe('ok');
      expect(sqlite.pragma('foreign_key_check')).toEqual([]);
      const big = sqlite.prepare(`SELECT count(*) AS n FROM aircraft WHERE id LIKE 'big-%'`).get() as { n: number };
      expect(big.n).toBe(0);
      expect(countAircraft(db)).toBe(8); // the seeded demo catalogue, untouched
      expect(getAircraft(db, 'tern-rj90')?.mtow_kg).toBe(40000);
      // The file is writable again.
      sqlite.prepare(`INSERT INTO meta (key, value) VALUES ('after-crash', 'ok')`).run();
    } finally {
      sqlite.close();
    }
  });
});
