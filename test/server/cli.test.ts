/** Command line: exit codes, problem listings, formats and byte-identical output for the same input. */
import { spawnSync } from 'node:child_process';
import { mkdtempSync, readFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { describe, expect, it } from 'vitest';
import { runCli, type CliIo } from '../../server/cli.js';

const root = resolve(import.meta.dirname, '..', '..');
const demoText = readFileSync(join(root, 'examples/demo-study.json'), 'utf8');
const minimalText = readFileSync(join(root, 'examples/minimal-study.json'), 'utf8');

function fakeIo(files: Record<string, string>) {
  const out: { stdout: string; stderr: string; written: Record<string, string | Uint8Array> } = { stdout: '', stderr: '', written: {} };
  const io: CliIo = {
    readFile: (p) => {
      const f = files[p];
      if (f === undefined) throw Object.assign(new Error('ENOENT'), { code: 'ENOENT' });
      return f;
    },
    writeFile: (p, d) => { out.written[p] = d; },
    stdout: (t) => { out.stdout += typeof t === 'string' ? t : Buffer.from(t).toString('latin1'); },
    stderr: (t) => { out.stderr += t; },
  };
  return { io, out };
}

const mutate = (f: (doc: any) => void): string => {
  const doc = JSON.parse(minimalText);
  f(doc);
  return JSON.stringify(doc);
};

describe('study CLI', () => {
  it('writes the JSON result with the required keys (exit 0)', async () => {
    const { io, out } = fakeIo({ 'm.json': minimalText });
    expect(await runCli(['m.json'], io)).toBe(0);
    const r = JSON.parse(out.stdout);
    for (const k of ['methodVersion', 'inputDigest', 'cautions', 'site', 'scenarios']) expect(r).toHaveProperty(k);
    expect(r.inputDigest).toMatch(/^[0-9a-f]{64}$/);
    expect(r.site.densityAltitude_m).toBeGreaterThan(0);
    const s = r.scenarios[0];
    for (const k of ['name', 'criticalAircraft', 'recommendedLength_m', 'governing', 'operationsServed', 'rows']) expect(s).toHaveProperty(k);
    for (const k of ['aircraft', 'annualOperations', 'regularUse', 'takeoffMass_kg', 'requiredTakeoff_m', 'requiredLanding_m', 'required_m', 'governing', 'warnings']) expect(s.rows[0]).toHaveProperty(k);
  });

  it('gives the same bytes for the same input, whatever the key order', async () => {
    const a = fakeIo({ 'd.json': demoText });
    const reordered = JSON.stringify(Object.fromEntries(Object.entries(JSON.parse(demoText)).reverse()));
    const b = fakeIo({ 'd.json': reordered });
    expect(await runCli(['d.json', '--format', 'csv'], a.io)).toBe(0);
    expect(await runCli(['d.json', '--format', 'csv'], b.io)).toBe(0);
    expect(a.out.stdout).toBe(b.out.stdout);
    const j1 = fakeIo({ 'd.json': demoText });
    const j2 = fakeIo({ 'd.json': reordered });
    await runCli(['d.json'], j1.io);
    await runCli(['d.json'], j2.io);
    expect(JSON.parse(j1.out.stdout).inputDigest).toBe(JSON.parse(j2.out.stdout).inputDigest);
  });

  it('writes CSV with units in the headers and the caution first', async () => {
    const { io, out } = fakeIo({ 'm.json': minimalText });
    expect(await runCli(['m.json', '--format', 'csv', '--units', 'us', '--out', 'r.csv'], io)).toBe(0);
    const csv = String(out.written['r.csv']);
    expect(csv.split('\n')[0]).toMatch(/^# .*preliminary planning estimates/);
    expect(csv).toContain('required_ft');
    expect(csv).toContain('takeoff_mass_lb');
  });

  it('exits 2 on malformed JSON with the parser message', async () => {
    const { io, out } = fakeIo({ 'bad.json': '{"format": "runwright-study", ' });
    expect(await runCli(['bad.json'], io)).toBe(2);
    expect(out.stderr).toMatch(/bad\.json: not valid JSON/);
  });

  it('exits 2 listing every problem by path, field, value and allowed range', async () => {
    const text = mutate((d) => {
      d.site.elevation_m = 9000;
      d.aircraft[0].mtow_kg = 'heavy';
      d.scenarios[0].fleet[0].aircraft = 'no-such-plane';
    });
    const { io, out } = fakeIo({ 's.json': text });
    expect(await runCli(['s.json'], io)).toBe(2);
    expect(out.stderr).toMatch(/3 problems/);
    expect(out.stderr).toContain('site.elevation_m: 9000 is out of range; allowed -400 to 4500 m [field elevation_m, value 9000]');
    expect(out.stderr).toContain('aircraft[0].mtow_kg: "heavy" is not a number; allowed 300 to 600000 kg');
    expect(out.stderr).toMatch(/scenarios\[0\]\.fleet\[0\]\.aircraft: unknown aircraft "no-such-plane"/);
  });

  it('exits 2 on a missing file and on bad options', async () => {
    const { io, out } = fakeIo({});
    expect(await runCli(['nope.json'], io)).toBe(2);
    expect(out.stderr).toMatch(/cannot read the file \(ENOENT\)/);
    expect(await runCli(['x.json', '--format', 'xml'], io)).toBe(2);
    expect(out.stderr).toMatch(/--format: "xml" is not allowed; one of json, csv, pdf/);
    expect(await runCli([], io)).toBe(2);
    expect(await runCli(['x.json', '--date', '2026-02-30'], io)).toBe(2);
    expect(out.stderr).toMatch(/--date: "2026-02-30" is not allowed; a calendar date YYYY-MM-DD/);
  });

  it('passes the fixed --date to the PDF renderer (reproducible bytes)', async () => {
    const { io, out } = fakeIo({ 'm.json': minimalText });
    const dates: (Date | undefined)[] = [];
    const withPdf: CliIo = { ...io, renderPdf: async (_o, _u, _i, date) => { dates.push(date); return new Uint8Array([37, 80, 68, 70]); } };
    expect(await runCli(['m.json', '--format', 'pdf', '--date', '2026-12-02', '--out', 'a.pdf'], withPdf)).toBe(0);
    expect(dates[0]?.toISOString()).toBe('2026-12-02T00:00:00.000Z');
    expect(out.written['a.pdf']).toEqual(new Uint8Array([37, 80, 68, 70]));
  });

  it('runs as a real process: exit 0 and exit 2 (npm run study)', () => {
    const dir = mkdtempSync(join(tmpdir(), 'rw-cli-'));
    const ok = spawnSync(process.execPath, ['--import', 'tsx', 'server/cli.ts', 'examples/minimal-study.json', '--out', join(dir, 'r.json')], { cwd: root, encoding: 'utf8' });
    expect(ok.status).toBe(0);
    expect(JSON.parse(readFileSync(join(dir, 'r.json'), 'utf8')).scenarios[0].criticalAircraft).toBe('plover-ct19');
    const bad = spawnSync(process.execPath, ['--import', 'tsx', 'server/cli.ts', 'package.json'], { cwd: root, encoding: 'utf8' });
    expect(bad.status).toBe(2);
    expect(bad.stderr).toMatch(/format: must be "runwright-study"/);
  });
});

describe('study CLI: input edges (issue 12)', () => {
  it('a document nested 4,100 levels deep exits 2 with the depth cap named (it used to exit 1)', async () => {
    const { io, out } = fakeIo({ 'deep.json': '['.repeat(4100) + ']'.repeat(4100) });
    expect(await runCli(['deep.json'], io)).toBe(2);
    expect(out.stderr).toMatch(/^deep\.json: not accepted: the document is nested more than 64 levels deep \(line 1, column 65\)/);
    expect(out.stderr.length).toBeLessThan(300);
  });

  it('a 2,000 km international alternate computes (exit 0); 2,001 km exits 2 with the path and range', async () => {
    const ok = fakeIo({ 'a.json': mutate((d) => { d.options.reserves = { policy: 'international', alternate_km: 2000 }; }) });
    expect(await runCli(['a.json'], ok.io)).toBe(0);
    const bad = fakeIo({ 'b.json': mutate((d) => { d.options.reserves = { policy: 'international', alternate_km: 2001 }; }) });
    expect(await runCli(['b.json'], bad.io)).toBe(2);
    expect(bad.out.stderr).toContain('options.reserves.alternate_km: 2001 is out of range; allowed 0 to 2000 km');
  });

  it('a 5 % runway exits 2 naming the profile, not the models\' internal "slope"', async () => {
    const { io, out } = fakeIo({ 's.json': mutate((d) => { d.site.runways[0].profile = [{ chainage_m: 0, elevation_m: 250 }, { chainage_m: 1500, elevation_m: 325 }]; }) });
    expect(await runCli(['s.json'], io)).toBe(2);
    expect(out.stderr).toContain('site.runways[0].profile: "5.00 % average slope" is not allowed');
    expect(out.stderr).not.toMatch(/^\s*- slope:/m);
  });
});
