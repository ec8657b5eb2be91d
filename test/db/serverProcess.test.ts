/**
 * One owner of the database file in the server process (issue 12, finding 1), against the real server
 * process on a real file: a catalogue import through HTTP, then an outside process that opens, reads
 * and closes the file, then a confirmed write (201), then SIGKILL. The write must be in the file after
 * the kill, and the server must never be left writing into a deleted -wal or -shm (POSIX locks dropped
 * by a close in the server process let the outside process delete them; see docs/storage.md).
 */
import Database from 'better-sqlite3';
import { spawn, spawnSync, type ChildProcessWithoutNullStreams } from 'node:child_process';
import { existsSync, mkdtempSync, readdirSync, readlinkSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { aircraftToCsv } from '../../server/io/csv.js';
import { generatedAircraft } from './fixtures/demo.js';

const root = resolve(import.meta.dirname, '..', '..');
const SQLITE3 = ['/usr/bin/sqlite3', '/usr/local/bin/sqlite3'].find((p) => existsSync(p));

interface Server { readonly proc: ChildProcessWithoutNullStreams; readonly base: string; readonly log: () => string }

function startServer(dbFile: string): Promise<Server> {
  const env: NodeJS.ProcessEnv = { ...process.env, PORT: '0', HOST: '127.0.0.1', RUNWRIGHT_DB_FILE: dbFile };
  delete env.RUNWRIGHT_ACCESS_TOKEN;
  const proc = spawn(process.execPath, ['--import', 'tsx', 'server/main.ts'], { cwd: root, env, stdio: 'pipe' });
  let out = '';
  proc.stderr.on('data', (d: Buffer) => (out += d.toString()));
  return new Promise((res, rej) => {
    proc.stdout.on('data', (d: Buffer) => {
      out += d.toString();
      const m = /listening on (http:\/\/127\.0\.0\.1:\d+)/.exec(out);
      if (m) res({ proc, base: m[1]!, log: () => out });
    });
    proc.once('exit', (code, signal) => rej(new Error(`server exited (${code ?? signal}) before listening: ${out}`)));
  });
}

/** Opens, reads and closes the file from another process, as a `sqlite3 … select` or a backup would. */
function outsideCount(dbFile: string, where = ''): number {
  const q = `select count(*) from aircraft${where}`;
  const r = SQLITE3
    ? spawnSync(SQLITE3, [dbFile, q], { encoding: 'utf8' })
    : spawnSync(process.execPath, ['-e', `const D = require('better-sqlite3'); const d = new D(process.argv[1]); console.log(d.prepare(process.argv[2]).pluck().get()); d.close();`, dbFile, q], { cwd: root, encoding: 'utf8' });
  if (r.status !== 0) throw new Error(`outside reader failed: ${r.stderr}`);
  return Number(r.stdout.trim());
}

/** The server's open files on the database, as /proc/<pid>/fd shows them (Linux only). */
function openDbFiles(pid: number, dbFile: string): string[] {
  return readdirSync(`/proc/${pid}/fd`)
    .map((fd) => { try { return readlinkSync(`/proc/${pid}/fd/${fd}`); } catch { return ''; } })
    .filter((l) => l.startsWith(dbFile));
}

async function importCsv(base: string, csv: string): Promise<Response> {
  const page = await fetch(`${base}/aircraft`);
  const cookie = /rw_csrf=([^;]+)/.exec(page.headers.get('set-cookie') ?? '')?.[1];
  if (!cookie) throw new Error('no CSRF cookie from GET /aircraft');
  const form = new FormData();
  form.set('format', 'csv');
  form.set('file', new Blob([csv], { type: 'text/csv' }), 'catalogue.csv');
  return fetch(`${base}/aircraft/import`, { method: 'POST', body: form, redirect: 'manual', headers: { cookie: `rw_csrf=${cookie}`, 'x-csrf-token': cookie } });
}

function exited(p: ChildProcessWithoutNullStreams): Promise<void> {
  return new Promise((res) => (p.exitCode !== null || p.signalCode !== null ? res() : p.once('exit', () => res())));
}

let dir: string;
let server: Server | undefined;
beforeEach(() => { dir = mkdtempSync(join(tmpdir(), 'runwright-owner-')); });
afterEach(async () => {
  if (server && server.proc.exitCode === null && server.proc.signalCode === null) { server.proc.kill('SIGKILL'); await exited(server.proc); }
  server = undefined;
  rmSync(dir, { recursive: true, force: true });
});

describe('the server process is the one owner of its database file (issue 12, finding 1)', () => {
  it('import, outside reader, confirmed write, kill -9: the write is in the file and integrity_check is ok', async () => {
    const dbFile = join(dir, 'rw.sqlite');
    server = await startServer(dbFile);
    const pid = server.proc.pid!;

    const imported = generatedAircraft(3, 'imp');
    const r1 = await importCsv(server.base, aircraftToCsv(imported));
    expect(r1.status, server.log()).toBe(303);
    expect(r1.headers.get('location')).toBe('/aircraft?imported=3');

    // Another process opens, reads and closes the file.
    expect(outsideCount(dbFile, ` where id like 'imp-%'`)).toBe(3);
    if (process.platform === 'linux') {
      const files = openDbFiles(pid, dbFile);
      expect(files.filter((f) => f.endsWith('(deleted)')), files.join('\n')).toEqual([]);
      expect(files).toContain(`${dbFile}-wal`);
    }

    // A confirmed write through the JSON API.
    const confirmed = generatedAircraft(1, 'api')[0]!;
    const r2 = await fetch(`${server.base}/api/aircraft`, { method: 'POST', headers: { 'content-type': 'application/json' }, body: JSON.stringify(confirmed) });
    expect(r2.status, await r2.clone().text()).toBe(201);
    // Other processes see it at once (not only the server's own connection).
    expect(outsideCount(dbFile, ` where id = '${confirmed.id}'`)).toBe(1);

    // A later import still works (no "disk I/O error").
    const r3 = await importCsv(server.base, aircraftToCsv(generatedAircraft(2, 'later')));
    expect(r3.status, server.log()).toBe(303);
    // A refused import (ids already there) answers 422 and writes nothing.
    const r4 = await importCsv(server.base, aircraftToCsv([...generatedAircraft(2, 'fresh'), ...generatedAircraft(1, 'later')]));
    expect(r4.status).toBe(422);
    expect(await r4.text()).toContain('already in the catalogue');
    expect(outsideCount(dbFile, ` where id like 'fresh-%'`)).toBe(0);

    if (process.platform === 'linux') {
      const files = openDbFiles(pid, dbFile);
      expect(files.filter((f) => f.endsWith('(deleted)')), files.join('\n')).toEqual([]);
    }

    server.proc.kill('SIGKILL');
    await exited(server.proc);

    const after = new Database(dbFile);
    try {
      expect(after.pragma('integrity_check', { simple: true })).toBe('ok');
      expect(after.prepare('select name from aircraft where id = ?').pluck().get(confirmed.id)).toBe(confirmed.name);
      expect(after.prepare(`select count(*) from aircraft where id like 'imp-%' or id like 'later-%'`).pluck().get()).toBe(5);
    } finally {
      after.close();
    }
  });
});
