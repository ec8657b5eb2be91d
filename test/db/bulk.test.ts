/**
 * The bulk connection and the write gate (issue 12, findings 1 and 2; docs/storage.md, "How imports
 * commit"), on real database files: one transaction with the event loop free between steps, reads
 * that see only committed data, other writes that wait in the gate rather than fail or block, a wait
 * for another process's lock that never blocks the loop, and failed imports that leave the file
 * byte-identical.
 */
import Database from 'better-sqlite3';
import { spawn } from 'node:child_process';
import { mkdtempSync, readdirSync, readFileSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { openBulkWriter } from '../../db/bulk.js';
import { openDatabase } from '../../db/client.js';
import { countAircraft, getAircraft, packAircraft } from '../../db/repos/aircraft.js';
import { seedDemoIfEmpty } from '../../db/seed.js';
import { WriteGate } from '../../db/writeGate.js';
import { createApp } from '../../server/app.js';
import { commitCatalogue, commitCatalogueBulk, parseAircraftJson, type ParsedCatalogue } from '../../server/aircraft/catalogue.js';
import { aircraftToCsv, parseAircraftCsv } from '../../server/io/csv.js';
import { ImportError } from '../../server/io/errors.js';
import { demoDocument, generatedAircraft } from './fixtures/demo.js';

const root = resolve(import.meta.dirname, '..', '..');
let dir: string;
beforeEach(() => { dir = mkdtempSync(join(tmpdir(), 'runwright-bulk-')); });
afterEach(() => { rmSync(dir, { recursive: true, force: true }); });

function seeded(name = 'rw.sqlite') {
  const file = join(dir, name);
  const h = openDatabase(file);
  seedDemoIfEmpty(h.db, demoDocument());
  return { ...h, file };
}

const csvOf = (n: number, prefix = 'imp'): ParsedCatalogue => parseAircraftCsv(aircraftToCsv(generatedAircraft(n, prefix)));

/** Counts turns of the event loop (1 ms timers) until stopped. */
function loopTurns(): { stop: () => number } {
  let n = 0;
  let on = true;
  const tick = () => { n++; if (on) setTimeout(tick, 1); };
  setTimeout(tick, 1);
  return { stop: () => { on = false; return n; } };
}

describe('WriteGate', () => {
  it('an exclusive lease waits for shared ones; new shared leases wait behind it', async () => {
    const gate = new WriteGate();
    const order: string[] = [];
    let endShared!: () => void;
    const a = gate.shared(() => new Promise<void>((r) => { order.push('shared a'); endShared = r; }));
    await Promise.resolve();
    const x = gate.exclusive(() => { order.push('exclusive'); });
    const b = gate.shared(() => { order.push('shared b'); });
    await new Promise((r) => setTimeout(r, 5));
    expect(order).toEqual(['shared a']);
    endShared();
    await Promise.all([a, x, b]);
    expect(order).toEqual(['shared a', 'exclusive', 'shared b']);
    expect(gate.state).toEqual({ shared: 0, exclusive: false, waiting: 0 });
  });

  it('two requests that each hold a shared lease and ask for the exclusive one both finish (no deadlock)', async () => {
    const gate = new WriteGate();
    const order: string[] = [];
    const req = (name: string) => gate.shared(async () => {
      await new Promise((r) => setTimeout(r, 1));
      await gate.exclusive(async () => { order.push(`${name} in`); await new Promise((r) => setTimeout(r, 2)); order.push(`${name} out`); });
      return name;
    });
    expect(await Promise.all([req('a'), req('b')])).toEqual(['a', 'b']);
    expect(order).toHaveLength(4);
    expect(order[0]!.endsWith('in') && order[1]!.endsWith('out') && order[0]!.split(' ')[0] === order[1]!.split(' ')[0]).toBe(true);
    expect(gate.state).toEqual({ shared: 0, exclusive: false, waiting: 0 });
  });
});

describe('BulkWriter on a database file', () => {
  it('commits everything in one transaction while the loop turns; the main connection sees nothing before the commit', async () => {
    const { db, sqlite } = seeded();
    const bulk = openBulkWriter(sqlite);
    try {
      const before = countAircraft(db);
      const parsed = csvOf(4000);
      const seen: number[] = [];
      const probe = setInterval(() => seen.push(countAircraft(db)), 1);
      const turns = loopTurns();
      const r = await commitCatalogueBulk(bulk, parsed);
      clearInterval(probe);
      expect(turns.stop()).toBeGreaterThan(1);
      expect(r.created).toHaveLength(4000);
      expect(seen.length).toBeGreaterThan(0);
      // Every read during the import saw the committed state: before, or after, never part of it.
      expect(seen.every((n) => n === before || n === before + 4000)).toBe(true);
      expect(countAircraft(db)).toBe(before + 4000);
    } finally {
      bulk.close();
      sqlite.close();
    }
  });

  it('a write request during an import waits in the gate and then succeeds; both are kept', async () => {
    const { db, sqlite } = seeded();
    const bulk = openBulkWriter(sqlite);
    try {
      const app = createApp({ db, bulk, clock: () => new Date() });
      const one = generatedAircraft(1, 'api')[0]!;
      const importing = commitCatalogueBulk(bulk, csvOf(3000));
      await new Promise((r) => setImmediate(r));
      expect(bulk.gate.state.exclusive).toBe(true);
      const res = await app.request('/api/aircraft', { method: 'POST', headers: { 'content-type': 'application/json' }, body: JSON.stringify(one) });
      expect(res.status, await res.clone().text()).toBe(201);
      expect((await importing).created).toHaveLength(3000);
      expect(getAircraft(db, one.id)?.name).toBe(one.name);
      expect(sqlite.pragma('busy_timeout', { simple: true })).toBe(5000);
    } finally {
      bulk.close();
      sqlite.close();
    }
  });

  it('waits for another process that holds the write lock without blocking the loop, then commits', async () => {
    const { db, sqlite, file } = seeded();
    const bulk = openBulkWriter(sqlite);
    const holder = spawn(process.execPath, ['-e', `
      const D = require('better-sqlite3'); const d = new D(process.argv[1]);
      d.exec('BEGIN IMMEDIATE'); console.log('locked');
      setTimeout(() => { d.exec('COMMIT'); d.close(); }, 400);`, file], { cwd: root, stdio: 'pipe' });
    try {
      await new Promise<void>((res, rej) => { holder.stdout.on('data', (d: Buffer) => { if (d.toString().includes('locked')) res(); }); holder.once('exit', () => rej(new Error('lock holder exited early'))); });
      const turns = loopTurns();
      const r = await commitCatalogueBulk(bulk, csvOf(50));
      expect(turns.stop()).toBeGreaterThan(20);
      expect(r.created).toHaveLength(50);
      expect(countAircraft(db)).toBeGreaterThanOrEqual(50);
    } finally {
      holder.kill('SIGKILL');
      bulk.close();
      sqlite.close();
    }
  });
});

describe('a failed import leaves the database file byte-identical', () => {
  it('refused ids, a row failing a table rule late in a large import, and a malformed file: sync and bulk', async () => {
    const { db, sqlite, file } = seeded();
    commitCatalogue(db, csvOf(10, 'old'));
    sqlite.close(); // the last connection checkpoints and removes the WAL: the file alone holds the data
    const bytes = readFileSync(file);
    const listing = readdirSync(dir).sort();

    const h = openDatabase(file);
    const bulk = openBulkWriter(h.sqlite);
    // A clash with an aircraft already there, at the end of a large import.
    const clash = parseAircraftCsv(aircraftToCsv([...generatedAircraft(20000, 'new'), ...generatedAircraft(1, 'old')]));
    await expect(commitCatalogueBulk(bulk, clash)).rejects.toThrow(ImportError);
    expect(() => commitCatalogue(h.db, clash)).toThrow(ImportError);
    // A row that breaks a table rule (OEW above MLW) as row 20,000 of 20,000, after the page cache has
    // spilled uncommitted pages into the WAL: rolled back as a whole.
    const list = generatedAircraft(20000, 'late');
    const bad = { ...list[19999]!, oew_kg: list[19999]!.mlw_kg + 1 };
    const late: ParsedCatalogue = { ...csvOf(1), rows: packAircraft([...list.slice(0, 19999), bad]), lines: new Int32Array(20000) };
    await expect(commitCatalogueBulk(bulk, late)).rejects.toThrow(/CHECK constraint/);
    expect(() => commitCatalogue(h.db, late)).toThrow(/CHECK constraint/);
    expect(() => parseAircraftJson('[{"id": "x"')).toThrow(ImportError);
    expect(countAircraft(h.db)).toBe(8 + 10);
    bulk.close();
    h.sqlite.close();

    expect(readdirSync(dir).sort()).toEqual(listing);
    expect(readFileSync(file).equals(bytes)).toBe(true);
    const check = new Database(file, { readonly: true });
    expect(check.pragma('integrity_check', { simple: true })).toBe('ok');
    check.close();
  });
});
