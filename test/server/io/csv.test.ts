/**
 * Aircraft catalogue CSV and scenario fleet-row CSV (issue 7): units in the headers, round trips,
 * all-or-nothing import with line, column and reason.
 */
import { readFileSync } from 'node:fs';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { AIRCRAFT_FIELDS, CRUISE_FIELDS, type AircraftProfile } from '../../../core/aircraft.js';
import { openDatabase, type DatabaseHandle } from '../../../db/client.js';
import { createAircraft, getAircraft, listAircraft } from '../../../db/repos/aircraft.js';
import { getScenario, getStudy } from '../../../db/repos/studies.js';
import { seedDemoIfEmpty } from '../../../db/seed.js';
import {
  AIRCRAFT_CSV_COLUMNS,
  FLEET_CSV_COLUMNS,
  aircraftToCsv,
  exportAircraftCsv,
  exportFleetCsv,
  importAircraftCsv,
  importFleetCsv,
} from '../../../server/io/csv.js';
import { demoAircraft, demoDocument } from '../../db/fixtures/demo.js';
import { dump, importError } from './helpers.js';

let src: DatabaseHandle;
let dst: DatabaseHandle;
beforeEach(() => {
  src = openDatabase(':memory:');
  dst = openDatabase(':memory:');
});
afterEach(() => {
  src.sqlite.close();
  dst.sqlite.close();
});

/** Name suffix for each SI unit used by the field table (house style: unit in the name). */
const SUFFIX: Record<string, string> = {
  kg: '_kg', m: '_m', 'm²': '_m2', N: '_N', W: '_W', 'm/s': '_mps', s: '_s', '°C': '_c', '1/h': '_perh', 'kg/kWh': '_kgPerKwh',
  km: '_km', 'operations/year': 'Operations', '': '', K: '_k', 'K/km': '_kPerKm', J: '_J', 'kg/h': '_kgph',
};

describe('CSV columns', () => {
  it('every numeric column carries its unit as the suffix of its header', () => {
    for (const c of [...AIRCRAFT_CSV_COLUMNS, ...FLEET_CSV_COLUMNS]) {
      if (c.kind !== 'number') continue;
      const suffix = SUFFIX[c.unit];
      expect(suffix, `unit ${c.unit} of ${c.header}`).toBeDefined();
      expect(c.header.endsWith(suffix!), `${c.header} should end with ${suffix}`).toBe(true);
    }
  });

  it('docs/storage.md documents every column', () => {
    const doc = readFileSync(new URL('../../../docs/storage.md', import.meta.url), 'utf8');
    for (const c of [...AIRCRAFT_CSV_COLUMNS, ...FLEET_CSV_COLUMNS]) expect(doc, c.header).toContain(`| \`${c.header}\` |`);
  });

  it('covers every field of the profile table (AIRCRAFT_FIELDS, CRUISE_FIELDS)', () => {
    const headers = AIRCRAFT_CSV_COLUMNS.map((c) => c.header);
    for (const f of AIRCRAFT_FIELDS) expect(headers).toContain(f.key);
    for (const f of CRUISE_FIELDS) expect(headers).toContain(`cruise.${f.key}`);
  });
});

describe('aircraft catalogue CSV round trip', () => {
  it('export → import into an empty database → export gives the same text and the same profiles', () => {
    for (const a of demoDocument().aircraft) createAircraft(src.db, a);
    const first = exportAircraftCsv(src.db);
    expect(first.split('\n')[0]).toBe(AIRCRAFT_CSV_COLUMNS.map((c) => c.header).join(','));
    expect(importAircraftCsv(dst.db, first).created).toHaveLength(8);
    expect(exportAircraftCsv(dst.db)).toBe(first);
    expect(listAircraft(dst.db)).toEqual(listAircraft(src.db));
  });

  it('quotes names holding commas, quotes and line breaks, and reads them back', () => {
    const odd: AircraftProfile = { ...demoAircraft('kestrel-ut1'), id: 'odd', name: 'Kestrel "UT-1", long-range\nversion' };
    const text = aircraftToCsv([odd]);
    importAircraftCsv(dst.db, text);
    expect(getAircraft(dst.db, 'odd')).toEqual(odd);
  });

  it('replace mode overwrites existing aircraft and keeps their reference table', () => {
    const withTable: AircraftProfile = {
      ...demoAircraft('tern-rj90'),
      reference: { takeoff_m: 1700, table: { mass_kg: [40000], elevation_m: [0], temperature_c: [15], length_m: [[[1700]]] } },
    };
    createAircraft(dst.db, withTable);
    const edited = aircraftToCsv([{ ...demoAircraft('tern-rj90'), mtow_kg: 41000 }, demoAircraft('kestrel-ut1')]);
    expect(importAircraftCsv(dst.db, edited, { onExisting: 'replace' })).toEqual({ created: ['kestrel-ut1'], replaced: ['tern-rj90'] });
    const after = getAircraft(dst.db, 'tern-rj90')!;
    expect(after.mtow_kg).toBe(41000);
    expect(after.reference).toEqual({ takeoff_m: 1700, landing_m: 1650, table: withTable.reference!.table });
  });
});

describe('malformed aircraft CSV files are rejected with line, column and reason, and nothing is written', () => {
  let good: string;
  let before: string;
  beforeEach(() => {
    good = aircraftToCsv(demoDocument().aircraft);
    createAircraft(dst.db, { ...demoAircraft('kestrel-ut1'), id: 'already-here' });
    before = dump(dst.sqlite);
  });
  afterEach(() => expect(dump(dst.sqlite)).toBe(before));

  const lines = () => good.split('\n');
  const withLine = (n: number, f: (l: string) => string) => lines().map((l, i) => (i === n - 1 ? f(l) : l)).join('\n');

  it('bad quoting: an unclosed quote', () => {
    const bad = withLine(4, (l) => l.replace('Heron ST-1', '"Heron ST-1'));
    const e = importError(() => importAircraftCsv(dst.db, bad));
    expect(e.problems[0]!.line).toBeGreaterThanOrEqual(4);
    expect(e.message).toMatch(/quote/);
  });

  it('bad quoting: a quote inside an unquoted field', () => {
    const bad = withLine(2, (l) => l.replace('Kestrel UT-1', 'Kestrel "UT-1"'));
    const e = importError(() => importAircraftCsv(dst.db, bad));
    expect(e.problems[0]).toMatchObject({ line: 2, field: 'name' });
    expect(e.message).toMatch(/a quote appears inside an unquoted field/);
  });

  it('a row with more fields than the header', () => {
    const e = importError(() => importAircraftCsv(dst.db, withLine(5, (l) => `${l},extra`)));
    expect(e.problems[0]!.line).toBe(5);
    const n = AIRCRAFT_CSV_COLUMNS.length;
    expect(e.message).toContain(`this row has ${n + 1} fields; the header has ${n}`);
  });

  it('unknown columns, a repeated column and a missing required column are named', () => {
    const e1 = importError(() => importAircraftCsv(dst.db, withLine(1, (l) => l.replace('mtow_kg', 'MTOW_KG'))));
    expect(e1.problems).toEqual(
      expect.arrayContaining([
        { line: 1, field: 'MTOW_KG', reason: expect.stringMatching(/unknown column; did you mean "mtow_kg"\?/) },
        { line: 1, field: 'mtow_kg', reason: 'required column is missing from the header' },
      ]),
    );
    const e2 = importError(() => importAircraftCsv(dst.db, withLine(1, (l) => l.replace('oew_kg', 'mlw_kg'))));
    expect(e2.problems[0]).toMatchObject({ line: 1, field: 'mlw_kg', reason: 'the column appears twice' });
  });

  it('a value out of range: line, column, the range and unit', () => {
    const bad = good.replace(',78000,66000,', ',780000,66000,');
    const line = bad.split('\n').findIndex((l) => l.includes(',780000,')) + 1;
    const e = importError(() => importAircraftCsv(dst.db, bad));
    expect(e.problems[0]).toEqual({ line, field: 'mtow_kg', reason: '780000 is out of range; allowed 300 to 600000 kg' });
  });

  it('a cross-field rule (MLW above MTOW) names the column', () => {
    const bad = good.replace(',78000,66000,', ',78000,88000,');
    const e = importError(() => importAircraftCsv(dst.db, bad));
    expect(e.problems[0]).toMatchObject({ field: 'mlw_kg', reason: expect.stringContaining('at most the maximum takeoff mass') });
  });

  it('wrong type: text where a number is expected; an unknown engine type', () => {
    const e = importError(() => importAircraftCsv(dst.db, good.replace(',78000,66000,', ',heavy,66000,')));
    expect(e.problems[0]).toMatchObject({ field: 'mtow_kg', reason: expect.stringContaining('"heavy" is not a number') });
    const e2 = importError(() => importAircraftCsv(dst.db, withLine(2, (l) => l.replace(',piston,', ',rocket,'))));
    expect(e2.problems[0]).toMatchObject({ line: 2, field: 'engineType', reason: expect.stringContaining('"rocket" is not allowed') });
  });

  it('a blank required value is "missing", not zero', () => {
    const e = importError(() => importAircraftCsv(dst.db, withLine(9, (l) => l.replace(',78000,66000,', ',,66000,'))));
    expect(e.problems[0]).toMatchObject({ line: 9, field: 'mtow_kg', reason: expect.stringMatching(/^missing/) });
  });

  it('duplicate ids in the file name both lines; an id already in the catalogue is refused', () => {
    const dup = `${good}${lines()[2]}\n`;
    const e = importError(() => importAircraftCsv(dst.db, dup));
    expect(e.problems[0]).toEqual({ line: 10, field: 'id', reason: expect.stringMatching(/duplicate id "\S+" \(also on line 3\)/) });
    const clash = aircraftToCsv([{ ...demoAircraft('kestrel-ut1'), id: 'already-here' }]);
    expect(importError(() => importAircraftCsv(dst.db, clash)).problems[0]).toMatchObject({ line: 2, field: 'id', reason: expect.stringContaining('already in the catalogue') });
  });

  it('wrong encoding: Latin-1 bytes and UTF-16', () => {
    const latin1 = Buffer.from(good.replace('Heron ST-1', 'Héron ST-1'), 'latin1');
    const e = importError(() => importAircraftCsv(dst.db, latin1));
    expect(e.problems[0]!.line).toBe(good.split('\n').findIndex((l) => l.includes('Heron ST-1')) + 1);
    expect(e.message).toMatch(/not valid UTF-8/);
    expect(importError(() => importAircraftCsv(dst.db, Buffer.from(`\ufeff${good}`, 'utf16le'))).message).toMatch(/UTF-16/);
  });

  it('an empty file and a header without rows', () => {
    expect(importError(() => importAircraftCsv(dst.db, '')).message).toMatch(/the file is empty/);
    expect(importError(() => importAircraftCsv(dst.db, `${lines()[0]}\n`)).message).toMatch(/no data rows/);
  });

  it('line numbers stay right with CRLF, blank lines and a line break inside a quoted name', () => {
    const l = lines();
    // line 1 header, 2 kestrel, 3 pipit, 4–5 blank, 6–7 heron (name over two lines), 8 plover (bad), ...
    const text = [l[0], l[1], l[2], '', '', l[3]!.replace('Heron ST-1', '"Heron\r\nST-1"'), l[4]!.replace(',8600,', ',86,'), ...l.slice(5)].join('\r\n');
    const e = importError(() => importAircraftCsv(dst.db, text));
    expect(e.problems).toEqual([{ line: 8, field: 'mtow_kg', reason: '86 is out of range; allowed 300 to 600000 kg' }]);
  });

  it('one bad row among many rejects the whole file', () => {
    const many = aircraftToCsv(Array.from({ length: 40 }, (_, i) => ({ ...demoAircraft('pipit-lt2'), id: `p${i}`, mtow_kg: i === 37 ? 100 : 2000 })));
    const e = importError(() => importAircraftCsv(dst.db, many));
    expect(e.problems).toEqual([{ line: 39, field: 'mtow_kg', reason: '100 is out of range; allowed 300 to 600000 kg' }]);
  });
});

describe('scenario fleet-row CSV', () => {
  let scenarioId: number;
  beforeEach(() => {
    const r = seedDemoIfEmpty(dst.db, demoDocument());
    if (!r.seeded) throw new Error('expected seeding');
    scenarioId = getStudy(dst.db, r.studyId)!.scenarios[1]!.id;
  });

  it('exports with units in the header and imports back (replacing the rows)', () => {
    const text = exportFleetCsv(dst.db, scenarioId);
    expect(text.split('\n')[0]).toBe('aircraft,annualOperations,stageLength_km,payload_kg');
    const fleet = getScenario(dst.db, scenarioId)!.fleet;
    importFleetCsv(dst.db, scenarioId, 'aircraft,annualOperations,stageLength_km,payload_kg\nkestrel-ut1,10,100,100\n');
    expect(getScenario(dst.db, scenarioId)!.fleet).toEqual([{ aircraft: 'kestrel-ut1', annualOperations: 10, stageLength_km: 100, payload_kg: 100 }]);
    expect(importFleetCsv(dst.db, scenarioId, text)).toEqual({ rows: fleet.length });
    expect(getScenario(dst.db, scenarioId)!.fleet).toEqual(fleet);
    expect(exportFleetCsv(dst.db, scenarioId)).toBe(text);
  });

  it('rejects unknown aircraft, bad numbers and unknown columns with line and column; the rows stay', () => {
    const before = dump(dst.sqlite);
    const head = 'aircraft,annualOperations,stageLength_km,payload_kg';
    const e1 = importError(() => importFleetCsv(dst.db, scenarioId, `${head}\nkestrel-ut1,10,100,100\nghost,5,100,100\n`));
    expect(e1.problems[0]).toEqual({ line: 3, field: 'aircraft', reason: 'aircraft "ghost" is not in the catalogue; add it first' });
    const e2 = importError(() => importFleetCsv(dst.db, scenarioId, `${head}\nkestrel-ut1,10.5,100,100\n`));
    expect(e2.problems[0]).toMatchObject({ line: 2, field: 'annualOperations', reason: expect.stringContaining('not a whole number') });
    const e3 = importError(() => importFleetCsv(dst.db, scenarioId, `${head},seats\nkestrel-ut1,10,100,100,4\n`));
    expect(e3.problems[0]).toMatchObject({ line: 1, field: 'seats', reason: expect.stringContaining('unknown column') });
    const e4 = importError(() => importFleetCsv(dst.db, scenarioId, `${head}\nkestrel-ut1,10,-5,100\n`));
    expect(e4.problems[0]).toMatchObject({ line: 2, field: 'stageLength_km', reason: expect.stringContaining('out of range') });
    expect(dump(dst.sqlite)).toBe(before);
  });
});
