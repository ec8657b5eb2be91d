/**
 * Shared harness of the bounded fuzz runs (test/fuzz): the app over a real SQLite FILE in a temporary
 * folder, seeded with the invented demo and its saved results (as on a first start), a browser-like
 * client holding the CSRF cookie, a content snapshot of the database, and the output checks.
 *
 * What every fuzzed request must satisfy:
 * - status < 500 (and never 403: the harness sends the CSRF token, so a 403 means the harness broke);
 * - no `NaN`, `Infinity`, `undefined` or `[object Object]` in the body. Rejected input is echoed back
 *   (form values, CSV cells, JSON values) and the generators deliberately type those words, so each
 *   value the request carried (raw, trimmed, split into words; raw, HTML- and JSON-escaped) is cut
 *   out of the body before the check: a leak is such a word the request did not bring;
 * - a rejected request (4xx) leaves the database with the same content: every row of every table
 *   (sqlite_master, migrations bookkeeping and sequence counters included) and `PRAGMA user_version`.
 *   A content dump is used rather than the file bytes, which WAL checkpoints change without any write;
 * - an accepted form (303) leads to a page that is itself clean.
 *
 * Seeds and run counts: `FUZZ_SEED` and `FUZZ_RUNS` override them locally; under CI (`CI=true`) the
 * fixed seed and the default counts are used. fast-check prints the seed and the counterexample path
 * of a failure, so `FUZZ_SEED=<seed>` replays it.
 */
import { createHash } from 'node:crypto';
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import type Database from 'better-sqlite3';
import fc from 'fast-check';
import type { Hono } from 'hono';
import { expect } from 'vitest';
import { openDatabase, type Db } from '../../db/index.js';
import { createApp } from '../../server/app.js';
import { inlineJobs } from '../../server/jobs/index.js';
import { seedDemoWithResults } from '../../server/seed.js';
import type { AppEnv } from '../../server/web/env.js';
import { Client, FIXED_TIME, demoInput, formFields, type Res } from '../server/web/helpers.js';

export { formFields, type Res };

// ------------------------------------------------------------------------------------------ settings

export const DEFAULT_SEED = 20261202;
const CI = process.env.CI === 'true' || process.env.CI === '1';

/** The seed of every property: fixed in CI, `FUZZ_SEED` locally. */
export const FUZZ_SEED = CI || process.env.FUZZ_SEED === undefined ? DEFAULT_SEED : Number(process.env.FUZZ_SEED);

/** fast-check parameters for one input class: `runs` cases (or `FUZZ_RUNS` locally). */
export function fuzzParams(runs: number): { seed: number; numRuns: number } {
  const override = CI || process.env.FUZZ_RUNS === undefined ? undefined : Number(process.env.FUZZ_RUNS);
  return { seed: FUZZ_SEED, numRuns: override !== undefined && Number.isFinite(override) && override > 0 ? override : runs };
}

/** Per-test timeout of a fuzz test, ms (shrinking a failure takes extra requests). */
export const FUZZ_TIMEOUT_MS = 120_000;

// ---------------------------------------------------------------------------------------- the app

export interface FuzzApp {
  readonly app: Hono<AppEnv>;
  readonly db: Db;
  readonly sqlite: Database.Database;
  readonly file: string;
  readonly studyId: number;
  readonly siteId: number;
  readonly client: Client;
  /** Values of accepted requests: saved user text that later pages may show (see `checkedRequest`). */
  readonly saved: Set<string>;
  close(): void;
}

/** The app over a fresh demo database file in a temporary folder; `close()` removes the folder. */
export async function fuzzApp(): Promise<FuzzApp> {
  const dir = mkdtempSync(join(tmpdir(), 'rw-fuzz-'));
  const file = join(dir, 'runwright.sqlite');
  const { db, sqlite } = openDatabase(file);
  const seeded = seedDemoWithResults(db, demoInput(), FIXED_TIME);
  if (!seeded.seeded) throw new Error('expected to seed the demo');
  const app = createApp({ db, clock: () => FIXED_TIME, jobs: inlineJobs() });
  const client = new Client(app);
  await client.get('/');
  return {
    app, db, sqlite, file, studyId: seeded.studyId, siteId: seeded.siteId, client, saved: new Set(),
    close: () => {
      sqlite.close();
      rmSync(dir, { recursive: true, force: true });
    },
  };
}

// ------------------------------------------------------------------------------------ the snapshot

/**
 * Canonical content of the database: per table (every table in sqlite_master) the SHA-256 of its
 * rows in rowid order, plus the schema text and `PRAGMA user_version`. Equal snapshots mean nothing
 * was saved; a difference names the table.
 */
export function dbSnapshot(sqlite: Database.Database): Record<string, string> {
  const out: Record<string, string> = {};
  const schema = sqlite.prepare(`SELECT type, name, tbl_name, sql FROM sqlite_master ORDER BY type, name`).all() as { type: string; name: string }[];
  out['(schema)'] = sha(JSON.stringify(schema));
  out['(user_version)'] = String(sqlite.pragma('user_version', { simple: true }));
  for (const t of schema.filter((r) => r.type === 'table').map((r) => r.name)) {
    const h = createHash('sha256');
    for (const row of sqlite.prepare(`SELECT * FROM "${t.replace(/"/g, '""')}" ORDER BY rowid`).iterate()) {
      h.update(JSON.stringify(row, (_k, v: unknown) => (typeof v === 'bigint' ? `${v}n` : Buffer.isBuffer(v) ? `hex:${v.toString('hex')}` : v)));
      h.update('\n');
    }
    out[t] = h.digest('hex');
  }
  return out;
}

function sha(s: string): string {
  return createHash('sha256').update(s).digest('hex');
}

// ------------------------------------------------------------------------------------- the checks

const LEAK = /\b(NaN|Infinity|undefined)\b|\[object Object\]/;

const htmlEscape = (s: string) => s.replace(/&/g, '&amp;').replace(/</g, '&lt;').replace(/>/g, '&gt;').replace(/"/g, '&quot;').replace(/'/g, '&#39;');
const jsonEscape = (s: string) => JSON.stringify(s).slice(1, -1);

/** The pieces of user input a response may echo: each value, trimmed, and its words and lines. */
export function echoesOf(values: Iterable<string>): string[] {
  const out = new Set<string>();
  for (const v of values) {
    if (v === '') continue;
    out.add(v);
    out.add(v.trim());
    for (const line of v.split(/\r?\n/)) out.add(line.trim());
    for (const w of v.split(/[\s,;"]+/)) if (w !== '') out.add(w);
  }
  out.delete('');
  return [...out].sort((a, b) => b.length - a.length);
}

/** `text` with every echoed value (raw, HTML-escaped, JSON-escaped) cut out. */
export function withoutEchoes(text: string, echoed: readonly string[]): string {
  let t = text;
  for (const e of echoed) {
    if (!LEAK.test(e) && !/NaN|Infinity|undefined|object/.test(e)) continue;
    for (const form of new Set([e, htmlEscape(e), jsonEscape(e), htmlEscape(jsonEscape(e))])) t = t.split(form).join(' ');
  }
  return t;
}

/** Fails when `text` shows NaN, Infinity, undefined or [object Object] that the input did not bring. */
export function assertClean(text: string, echoed: readonly string[], where: string): void {
  const t = withoutEchoes(text, echoed);
  const m = LEAK.exec(t);
  if (m) {
    const at = Math.max(0, m.index - 200);
    expect.fail(`${short(where)}: "${m[0]}" in the output: …${t.slice(at, m.index + 200)}…`);
  }
}

/** A request description cut to a readable length for failure messages. */
export function short(where: string, max = 1500): string {
  return where.length <= max ? where : `${where.slice(0, max)}… (${where.length} characters)`;
}

export function assertStatus(res: Res, where: string): void {
  if (res.status >= 500 || res.status === 403) {
    expect.fail(`${short(where)}: status ${res.status}: ${res.text.slice(0, 600)}`);
  }
}

/** Counts of outcomes per class, so that a run that only ever rejects (or only accepts) is noticed. */
export class Tally {
  readonly counts = new Map<string, number>();
  add(status: number): void {
    const k = status >= 200 && status < 400 ? 'accepted' : 'rejected';
    this.counts.set(k, (this.counts.get(k) ?? 0) + 1);
    this.counts.set(String(status), (this.counts.get(String(status)) ?? 0) + 1);
  }
  get accepted(): number { return this.counts.get('accepted') ?? 0; }
  get rejected(): number { return this.counts.get('rejected') ?? 0; }
  toString(): string {
    return [...this.counts].map(([k, v]) => `${k}: ${v}`).join(', ');
  }
  /** Both outcomes occurred: the generators reach the accepting and the refusing paths. */
  expectMix(label: string): void {
    expect(this.accepted, `${label}: no case was accepted (${this.toString()})`).toBeGreaterThan(0);
    expect(this.rejected, `${label}: no case was rejected (${this.toString()})`).toBeGreaterThan(0);
  }
}

/**
 * Sends one fuzzed request with the checks: status, clean body, database unchanged when rejected;
 * an accepted form's redirect target is fetched and checked too. The values of an accepted request
 * may have been saved (a scenario named "undefined" is the user's own text), so they join `h.saved`,
 * which later checks also allow.
 */
export async function checkedRequest(h: FuzzApp, send: () => Promise<Res>, echoedNow: readonly string[], where: string, tally?: Tally): Promise<Res> {
  const before = dbSnapshot(h.sqlite);
  const res = await send();
  tally?.add(res.status);
  if (res.status < 400) for (const e of echoedNow) if (/NaN|Infinity|undefined|object/.test(e)) h.saved.add(e);
  const echoed = h.saved.size === 0 ? echoedNow : [...new Set([...echoedNow, ...h.saved])].sort((a, b) => b.length - a.length);
  assertStatus(res, where);
  assertClean(res.text, echoed, where);
  if (res.status >= 400) {
    expect(dbSnapshot(h.sqlite), `${short(where)}: rejected with ${res.status} but the database changed`).toEqual(before);
  }
  if (res.status === 303) {
    const loc = res.headers.get('location') ?? '';
    if (loc.startsWith('/')) {
      const next = await h.client.get(loc);
      assertStatus(next, `${where} → GET ${loc}`);
      assertClean(next.text, echoed, `${where} → GET ${loc}`);
    }
  }
  return res;
}

/** Posts a form (urlencoded, CSRF token added), optionally as htmx. */
export function postForm(h: FuzzApp, path: string, fields: Record<string, string>, htmx = false): Promise<Res> {
  return h.client.post(path, fields, { htmx });
}

/** Posts a multipart form with one file given as bytes (so that BOMs and invalid UTF-8 reach the server). */
export function upload(h: FuzzApp, path: string, fields: Record<string, string>, file: { name: string; bytes: Uint8Array; type?: string }): Promise<Res> {
  const fd = new FormData();
  fd.set('_csrf', h.client.csrf);
  for (const [k, v] of Object.entries(fields)) fd.set(k, v);
  fd.set('file', new File([file.bytes], file.name, { type: file.type ?? 'text/csv' }));
  return h.client.request(path, { method: 'POST', body: fd });
}

/** Sends a JSON body as given text (so that 1e999 and other raw tokens reach the parser). */
export function sendJson(h: FuzzApp, method: string, path: string, text: string | undefined): Promise<Res> {
  return h.client.request(path, {
    method,
    headers: { accept: 'application/json', ...(text === undefined ? {} : { 'content-type': 'application/json' }) },
    ...(text === undefined ? {} : { body: text }),
  });
}

// ----------------------------------------------------------------------------------- generators

/** Text a user might type into a number field: edge spellings, non-numbers, huge and tiny values. */
export const numberText: fc.Arbitrary<string> = fc.oneof(
  { weight: 4, arbitrary: fc.constantFrom(
    '', ' ', '  \t', '1e309', '-1e309', '1e-400', '-0', '0', 'NaN', 'Infinity', '-Infinity', 'undefined', 'null', 'true',
    '[object Object]', '0x10', '1,000', '1,0', '1.2.3', '+', '-', '.', 'e5', '1e', '٣', '１２', '−5', '5 m', '5kg', '12,345.6',
    '9'.repeat(40), '9'.repeat(400), '-' + '9'.repeat(30), '0.' + '0'.repeat(30) + '1', '1e21', '-1e21', '²', '½', '1_000',
  ) },
  { weight: 3, arbitrary: fc.integer({ min: -2_000_000, max: 2_000_000 }).map(String) },
  { weight: 3, arbitrary: fc.double({ noNaN: false }).map(String) },
  { weight: 2, arbitrary: fc.double({ min: -100, max: 100, noNaN: true }).map((x) => x.toFixed(3)) },
  { weight: 1, arbitrary: fc.string({ maxLength: 12 }) },
);

/** Text fields: printable and control characters, other scripts, over-long values. */
export const textValue: fc.Arbitrary<string> = fc.oneof(
  { weight: 3, arbitrary: fc.string({ maxLength: 40 }) },
  { weight: 2, arbitrary: fc.string({ unit: 'grapheme', maxLength: 40 }) },
  { weight: 1, arbitrary: fc.string({ unit: 'binary', maxLength: 20 }) },
  { weight: 1, arbitrary: fc.constantFrom('', ' ', '\u0000', 'a\r\nb', '<script>x</script>', '"\'&', 'Łódź ώ 東京', '=1+1', 'x'.repeat(121), 'x'.repeat(301), 'NaN', 'undefined') },
  { weight: 1, arbitrary: fc.nat({ max: 5000 }).map((n) => 'y'.repeat(n)) },
);

/** `arb` once in `n` cases, else null. */
export function rarely<T>(arb: fc.Arbitrary<T>, n: number): fc.Arbitrary<T | null> {
  return fc.oneof({ weight: n - 1, arbitrary: fc.constant(null) }, { weight: 1, arbitrary: arb });
}

/** Any value of a form field: number-like or text-like. */
export const fieldValue: fc.Arbitrary<string> = fc.oneof(numberText, textValue);

/**
 * A mutation of a valid form: up to `max` fields replaced with random values, some removed, perhaps an
 * extra field. `keep` names fields never touched (e.g. the id of an edited record).
 */
export function mutatedForm(base: Record<string, string>, opts: { keep?: readonly string[]; max?: number } = {}): fc.Arbitrary<Record<string, string>> {
  const names = Object.keys(base).filter((k) => !(opts.keep ?? []).includes(k) && k !== '_csrf');
  const edit = fc.record({
    field: fc.constantFrom(...names),
    op: fc.constantFrom('set', 'set', 'set', 'set', 'drop'),
    value: fieldValue,
  });
  return fc.tuple(fc.array(edit, { minLength: 0, maxLength: opts.max ?? 4 }), rarely(fc.tuple(fc.string({ maxLength: 10 }), fieldValue), 10)).map(([edits, extra]) => {
    const out: Record<string, string> = { ...base };
    for (const e of edits) {
      if (e.op === 'drop') delete out[e.field];
      else out[e.field] = e.value;
    }
    if (extra && extra[0] !== '_csrf') out[extra[0]] = extra[1];
    return out;
  });
}

// ------------------------------------------------------------------------------ JSON mutations

type Json = null | boolean | number | string | Json[] | { [k: string]: Json };
type Path = (string | number)[];

/** Every path to a leaf or a container of a JSON document (root excluded). */
export function jsonPaths(doc: unknown, prefix: Path = [], out: Path[] = []): Path[] {
  if (Array.isArray(doc)) doc.forEach((v, i) => { out.push([...prefix, i]); jsonPaths(v, [...prefix, i], out); });
  else if (doc !== null && typeof doc === 'object') for (const [k, v] of Object.entries(doc)) { out.push([...prefix, k]); jsonPaths(v, [...prefix, k], out); }
  return out;
}

function valueAt(doc: unknown, path: Path): unknown {
  let t = doc;
  for (const k of path) t = (t as Record<string | number, unknown>)[k];
  return t;
}

const PLACEHOLDER = '\u0001FUZZ\u0001';

/** Raw JSON tokens for a replaced value: any JSON value, or number spellings JSON.parse turns into ±Infinity or −0. */
export const jsonToken: fc.Arbitrary<string> = fc.oneof(
  { weight: 3, arbitrary: fc.jsonValue({ maxDepth: 2 }).map((v) => JSON.stringify(v)) },
  { weight: 2, arbitrary: fc.constantFrom('1e999', '-1e999', '-0', '1e-400', '123456789012345678901234567890', '0.1e1', '1E+2', '""', '" "', '"NaN"', '"Infinity"', '"1e309"', '"12"', 'null', '[]', '{}', 'true', '-1', '0', '1e21', '"undefined"') },
  { weight: 2, arbitrary: fc.double({ noNaN: true, noDefaultInfinity: true }).map((x) => JSON.stringify(x)) },
  { weight: 1, arbitrary: textValue.map((s) => JSON.stringify(s)) },
);

/** A JSON document with one member replaced by `token` (raw JSON text) or removed; returns the text. */
export function mutateJson(doc: unknown, path: Path, token: string | undefined): string {
  const copy = structuredClone(doc) as Json;
  let t: Json = copy;
  for (const k of path.slice(0, -1)) t = (t as Record<string | number, Json>)[k]!;
  const last = path[path.length - 1]!;
  if (token === undefined) {
    if (Array.isArray(t)) t.splice(last as number, 1);
    else delete (t as Record<string, Json>)[last as string];
    return JSON.stringify(copy);
  }
  (t as Record<string | number, Json>)[last] = PLACEHOLDER;
  return JSON.stringify(copy).replace(JSON.stringify(PLACEHOLDER), () => token);
}

/**
 * One member mutation: the index of a member (modulo the member count) and a raw token, null to
 * remove it, or '~' to nudge a number by a few per cent (mostly still valid, so that accepted
 * documents are reached too).
 */
export interface JsonEdit { readonly i: number; readonly token: string | null }

/** 1–3 member mutations (kept small, so that a counterexample prints short). Apply with `applyJsonEdits`. */
export const jsonEdits: fc.Arbitrary<JsonEdit[]> = fc.array(
  fc.record({ i: fc.nat(), token: fc.option(fc.oneof({ weight: 3, arbitrary: jsonToken }, { weight: 2, arbitrary: fc.constantFrom('~', '~~') }), { freq: 8 }) }),
  { minLength: 1, maxLength: 3 },
);

/** A valid document with the edits applied, as JSON text, with the tokens sent and a description. */
export function applyJsonEdits(doc: unknown, edits: readonly JsonEdit[]): { text: string; tokens: string[]; described: string } {
  let text = JSON.stringify(doc);
  const tokens: string[] = [];
  const said: string[] = [];
  for (const e of edits) {
    let current: unknown;
    try { current = JSON.parse(text); } catch { break; }
    const ps = jsonPaths(current);
    if (ps.length === 0) break;
    let p = ps[e.i % ps.length]!;
    let token = e.token ?? undefined;
    if (token === '~' || token === '~~') {
      // Nudge the nearest number at or after the chosen member: ×1.03 or ×0.97.
      const k = ps.findIndex((q, j) => j >= e.i % ps.length && typeof valueAt(current, q) === 'number');
      if (k < 0) continue;
      p = ps[k]!;
      token = JSON.stringify((valueAt(current, p) as number) * (token === '~' ? 1.03 : 0.97));
    }
    text = mutateJson(current, p, token);
    const at = p.map((k) => (typeof k === 'number' ? `[${k}]` : `.${k}`)).join('');
    said.push(token === undefined ? `remove $${at}` : `$${at} = ${token}`);
    if (token !== undefined) tokens.push(token);
  }
  return { text, tokens, described: said.join('; ') };
}

/** Echo tokens of a JSON request: the raw tokens and the string values they hold. */
export function jsonEchoes(tokens: readonly string[]): string[] {
  const vals: string[] = [];
  const walk = (v: unknown): void => {
    if (typeof v === 'string') vals.push(v);
    else if (Array.isArray(v)) v.forEach(walk);
    else if (v !== null && typeof v === 'object') { for (const [k, x] of Object.entries(v)) { vals.push(k); walk(x); } }
  };
  for (const t of tokens) {
    vals.push(t);
    try { walk(JSON.parse(t)); } catch { /* raw token */ }
  }
  return echoesOf(vals);
}

/** Walks a value and returns the path of the first number that is not finite (NaN, ±Infinity). */
export function nonFinitePath(v: unknown, path = '$'): string | undefined {
  if (typeof v === 'number') return Number.isFinite(v) ? undefined : `${path} = ${v}`;
  if (Array.isArray(v)) {
    for (let i = 0; i < v.length; i++) { const p = nonFinitePath(v[i], `${path}[${i}]`); if (p) return p; }
    return undefined;
  }
  if (v !== null && typeof v === 'object') {
    for (const [k, x] of Object.entries(v)) { const p = nonFinitePath(x, `${path}.${k}`); if (p) return p; }
  }
  return undefined;
}

// ----------------------------------------------------------------------------------- CSV mutations

/** Splits simple CSV text (as the exports write it) into rows of cells; quotes are kept off. */
export function csvGrid(text: string): string[][] {
  const rows: string[][] = [];
  let row: string[] = [];
  let cell = '';
  let q = false;
  for (let i = 0; i < text.length; i++) {
    const ch = text[i]!;
    if (q) {
      if (ch === '"' && text[i + 1] === '"') { cell += '"'; i++; }
      else if (ch === '"') q = false;
      else cell += ch;
    } else if (ch === '"') q = true;
    else if (ch === ',') { row.push(cell); cell = ''; }
    else if (ch === '\n' || ch === '\r') {
      if (ch === '\r' && text[i + 1] === '\n') i++;
      row.push(cell); rows.push(row); row = []; cell = '';
    } else cell += ch;
  }
  if (cell !== '' || row.length > 0) { row.push(cell); rows.push(row); }
  return rows;
}

const quoteCell = (c: string) => (/[",\r\n]/.test(c) || c !== c.trim() ? `"${c.replace(/"/g, '""')}"` : c);

export interface CsvCase { readonly bytes: Uint8Array; readonly text: string; readonly cells: string[] }

/**
 * Mutations of a valid CSV: random cells, dropped, duplicated or swapped columns, dropped or
 * duplicated rows, a broken quote, a BOM, CRLF line ends, a missing final newline, an extra field.
 */
export function mutatedCsv(text: string, opts: { cell?: fc.Arbitrary<string> } = {}): fc.Arbitrary<CsvCase> {
  const grid = csvGrid(text);
  const cell = opts.cell ?? fieldValue;
  const op = fc.oneof(
    { weight: 6, arbitrary: fc.record({ k: fc.constant('cell' as const), r: fc.nat(), c: fc.nat(), v: cell }) },
    { weight: 1, arbitrary: fc.record({ k: fc.constant('dropCol' as const), c: fc.nat() }) },
    { weight: 1, arbitrary: fc.record({ k: fc.constant('dupCol' as const), c: fc.nat() }) },
    { weight: 1, arbitrary: fc.record({ k: fc.constant('swapCols' as const), a: fc.nat(), b: fc.nat() }) },
    { weight: 1, arbitrary: fc.record({ k: fc.constant('dropRow' as const), r: fc.nat() }) },
    { weight: 1, arbitrary: fc.record({ k: fc.constant('dupRow' as const), r: fc.nat() }) },
    { weight: 1, arbitrary: fc.record({ k: fc.constant('extraCell' as const), r: fc.nat(), v: cell }) },
    { weight: 1, arbitrary: fc.record({ k: fc.constant('header' as const), c: fc.nat(), v: fc.oneof(textValue, fc.constantFrom(...(grid[0] ?? ['x']))) }) },
  );
  const framing = fc.record({
    bom: fc.boolean(), crlf: fc.boolean(), finalNewline: fc.boolean(),
    breakQuote: rarely(fc.nat(), 8), blankLines: fc.boolean(), truncate: rarely(fc.nat(), 10),
  });
  return fc.tuple(fc.array(op, { maxLength: 4 }), framing).map(([ops, f]) => {
    let g = grid.map((r) => [...r]);
    const cells: string[] = [];
    for (const o of ops) {
      if (g.length === 0) break;
      const width = Math.max(1, ...g.map((r) => r.length));
      if (o.k === 'cell') { const r = g[o.r % g.length]!; if (r.length > 0) r[o.c % r.length] = o.v; cells.push(o.v); }
      else if (o.k === 'dropCol') g = g.map((r) => r.filter((_, i) => i !== o.c % width));
      else if (o.k === 'dupCol') g = g.map((r) => { const i = o.c % width; return i < r.length ? [...r.slice(0, i + 1), r[i]!, ...r.slice(i + 1)] : r; });
      else if (o.k === 'swapCols') g = g.map((r) => { const a = o.a % width; const b = o.b % width; const x = [...r]; if (a < x.length && b < x.length) [x[a], x[b]] = [x[b]!, x[a]!]; return x; });
      else if (o.k === 'dropRow') g.splice(o.r % g.length, 1);
      else if (o.k === 'dupRow') { const i = o.r % g.length; g.splice(i, 0, [...g[i]!]); }
      else if (o.k === 'extraCell') { g[o.r % g.length]!.push(o.v); cells.push(o.v); }
      else if (o.k === 'header') { const h = g[0]!; if (h.length > 0) h[o.c % h.length] = o.v; cells.push(o.v); }
    }
    const eol = f.crlf ? '\r\n' : '\n';
    let lines = g.map((r) => r.map(quoteCell).join(','));
    if (f.blankLines && lines.length > 1) lines = [lines[0]!, '', ...lines.slice(1)];
    let out = lines.join(eol) + (f.finalNewline ? eol : '');
    if (f.breakQuote !== null && out.length > 0) { const i = f.breakQuote % out.length; out = `${out.slice(0, i)}"${out.slice(i)}`; }
    if (f.truncate !== null && out.length > 0) out = out.slice(0, f.truncate % out.length);
    const text2 = (f.bom ? '\uFEFF' : '') + out;
    return csvCase(new TextEncoder().encode(text2), text2, cells);
  });
}

/** Invalid UTF-8 or binary bytes in place of a text file. */
export const binaryFile: fc.Arbitrary<CsvCase> = fc.uint8Array({ minLength: 1, maxLength: 200 }).map((b) => csvCase(b, Buffer.from(b).toString('latin1'), []));

/** A file case that prints as its text (fast-check's counterexample line stays readable). */
function csvCase(bytes: Uint8Array, text: string, cells: string[]): CsvCase {
  return { bytes, text, cells, [fc.toStringMethod]: () => `file ${JSON.stringify(text.length > 4000 ? `${text.slice(0, 4000)}…` : text)}` } as CsvCase;
}
