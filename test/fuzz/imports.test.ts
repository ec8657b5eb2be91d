/**
 * Bounded fuzz run of the file imports (issue 12, "Tests"): the aircraft catalogue CSV, a scenario's
 * fleet CSV and the three climate station file formats, each uploaded through its form. Each file is
 * a valid export (or an invented station file) mutated: random cells, dropped, duplicated or swapped
 * columns, dropped or duplicated rows, a broken quote, a BOM, CRLF line ends, truncation, or random
 * bytes. An import is all or nothing, so a refused file must leave the database content unchanged.
 * Checks: harness.ts.
 */
import fc from 'fast-check';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import {
  FUZZ_TIMEOUT_MS, Tally, binaryFile, checkedRequest, echoesOf, fuzzApp, fuzzParams, mutatedCsv, numberText, textValue, upload,
  type CsvCase, type FuzzApp,
} from './harness.js';

let h: FuzzApp;
beforeAll(async () => { h = await fuzzApp(); });
afterAll(() => h?.close());

const fileCase = (text: string): fc.Arbitrary<CsvCase> => fc.oneof({ weight: 12, arbitrary: mutatedCsv(text) }, { weight: 1, arbitrary: binaryFile });
const fileName = fc.oneof({ weight: 5, arbitrary: fc.constant('import.csv') }, fc.constantFrom('x.json', 'a b.CSV', '', '..\\..\\etc', 'NaN.csv'), textValue);

describe('fuzz: aircraft catalogue CSV import', () => {
  it('POST /aircraft/import with mutated catalogue CSV: no 5xx, no leaks, nothing saved when refused', async () => {
    const exported = (await h.client.get('/aircraft/export.csv')).text;
    // The header and three aircraft (a piston single, a turboprop, a jet): small files, every column kind.
    const lines = exported.split('\n');
    const base = [lines[0], ...lines.filter((l) => /^(kestrel-ut1|curlew-rt70|swift-bj8),/.test(l))].join('\n') + '\n';
    expect(base.split('\n').length).toBe(5);
    const tally = new Tally();
    const form = fc.record({
      replace: fc.oneof({ weight: 4, arbitrary: fc.constant('yes') }, fc.constantFrom('', 'no', 'YES'), textValue),
      format: fc.oneof({ weight: 4, arbitrary: fc.constant('csv') }, fc.constantFrom('', 'json', 'xml'), textValue),
    });
    await fc.assert(fc.asyncProperty(fileCase(base), form, fileName, async (file, fields, name) => {
      await checkedRequest(h, () => upload(h, '/aircraft/import', fields, { name, bytes: file.bytes }), echoesOf([...file.cells, ...Object.values(fields), name, file.text]),
        `POST /aircraft/import ${JSON.stringify(fields)} ${JSON.stringify(file.text.slice(0, 3000))}`, tally);
    }), fuzzParams(250));
    console.info(`aircraft CSV import: ${tally}`);
    tally.expectMix('aircraft CSV import');
  }, FUZZ_TIMEOUT_MS);
});

describe('fuzz: fleet CSV import', () => {
  it('POST /studies/:id/scenarios/:sid/fleet/import with mutated fleet CSV: no 5xx, no leaks, nothing saved when refused', async () => {
    const sid = (h.sqlite.prepare('SELECT id FROM scenarios WHERE study_id = ? ORDER BY position').all(h.studyId) as { id: number }[])[1]!.id;
    const path = `/studies/${h.studyId}/scenarios/${sid}`;
    const base = (await h.client.get(`${path}/fleet.csv`)).text;
    const ids = (h.sqlite.prepare('SELECT id FROM aircraft').all() as { id: string }[]).map((r) => r.id);
    const tally = new Tally();
    const cell = fc.oneof(numberText, textValue, fc.constantFrom(...ids));
    const file = fc.oneof({ weight: 12, arbitrary: mutatedCsv(base, { cell }) }, { weight: 1, arbitrary: binaryFile });
    await fc.assert(fc.asyncProperty(file, fileName, async (f, name) => {
      await checkedRequest(h, () => upload(h, `${path}/fleet/import`, {}, { name, bytes: f.bytes }), echoesOf([...f.cells, name, f.text]),
        `POST ${path}/fleet/import ${JSON.stringify(f.text.slice(0, 3000))}`, tally);
    }), fuzzParams(250));
    console.info(`fleet CSV import: ${tally}`);
    tally.expectMix('fleet CSV import');
  }, FUZZ_TIMEOUT_MS);
});

// Invented station files (the layouts core/climate/readers.ts documents).
const STATION = 'XX000099999';
const TMAX_F = [59, 62.6, 68, 75.2, 84.2, 91.4, 95, 95.9, 87.8, 77, 66.2, 59.9];
const NORMALS = ['"STATION","DATE","NAME","MLY-TAVG-NORMAL","MLY-TMAX-NORMAL","MLY-TMIN-NORMAL"',
  ...TMAX_F.map((t, i) => `"${STATION}","${String(i + 1).padStart(2, '0')}","INVENTED FIELD","${(t - 18).toFixed(1)}","${t}","${(t - 36).toFixed(1)}"`)].join('\n') + '\n';

function days(year: number, each: (date: Date, m: number) => string[]): string[] {
  const out: string[] = [];
  for (let m = 1; m <= 12; m++) {
    const n = new Date(Date.UTC(year, m, 0)).getUTCDate();
    for (let d = 1; d <= n; d++) out.push(...each(new Date(Date.UTC(year, m - 1, d)), m));
  }
  return out;
}
const ymd = (d: Date) => d.toISOString().slice(0, 10);
/** One invented year of GHCN-Daily rows (tenths of °C). */
const GHCN = days(2024, (d, m) => [`${STATION},${ymd(d).replace(/-/g, '')},TMAX,${200 + 10 * m},,,S,`, `${STATION},${ymd(d).replace(/-/g, '')},TMIN,${100 + 10 * m},,,S,`]).join('\n') + '\n';
/** One invented year of a per-station daily file with a header (°C). */
const DAILY = ['STATION,DATE,TMAX,TMIN', ...days(2024, (d, m) => [`${STATION},${ymd(d)},${20 + m},${10 + m}`])].join('\n') + '\n';

describe('fuzz: climate station file import', () => {
  it('POST /sites/:id/climate/import with mutated station files: no 5xx, no leaks, nothing saved when refused', async () => {
    const tally = new Tally();
    const kinds = [
      { format: 'monthly-normals', text: NORMALS },
      { format: 'ghcn-daily', text: GHCN },
      { format: 'station-daily', text: DAILY },
    ] as const;
    const year = fc.oneof({ weight: 4, arbitrary: fc.constant('') }, fc.constantFrom('2024', '2023', '2025', '0000', '9999', '24'), numberText);
    const arb = fc.nat({ max: kinds.length - 1 }).chain((k) => fc.record({
      k: fc.constant(k),
      file: fc.oneof({ weight: 12, arbitrary: mutatedCsv(kinds[k]!.text) }, { weight: 1, arbitrary: binaryFile }),
      format: fc.oneof({ weight: 8, arbitrary: fc.constant(kinds[k]!.format as string) }, fc.constantFrom('ghcn-daily', 'station-daily', 'monthly-normals', ''), textValue),
      unit: fc.oneof({ weight: 4, arbitrary: fc.constant('c') }, fc.constantFrom('f', 'tenths-c', ''), textValue),
      fromYear: year,
      toYear: year,
    }));
    await fc.assert(fc.asyncProperty(arb, fileName, async (c, name) => {
      const fields = { format: c.format, unit: c.unit, fromYear: c.fromYear, toYear: c.toYear };
      await checkedRequest(h, () => upload(h, `/sites/${h.siteId}/climate/import`, fields, { name, bytes: c.file.bytes }),
        echoesOf([...c.file.cells, ...Object.values(fields), name, name.slice(0, 100)]),
        `POST /sites/${h.siteId}/climate/import ${JSON.stringify(fields)} ${kinds[c.k]!.format} file ${JSON.stringify(c.file.text.slice(0, 2000))}`, tally);
    }), fuzzParams(200));
    console.info(`climate import: ${tally}`);
    tally.expectMix('climate import');
  }, FUZZ_TIMEOUT_MS);
});
