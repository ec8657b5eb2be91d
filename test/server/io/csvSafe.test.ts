/**
 * Formula-safe CSV downloads (issue 12, finding 6): a cell a spreadsheet would read as a formula
 * (leading =, +, -, @, tab or CR; OWASP "CSV Injection") is written with one leading single quote;
 * plain numbers are never touched; the importer strips exactly that quote, so the round trip is exact.
 */
import { parse } from 'csv-parse/sync';
import { stringify } from 'csv-stringify/sync';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import type { AircraftProfile } from '../../../core/aircraft.js';
import { openDatabase, type DatabaseHandle } from '../../../db/client.js';
import { createAircraft, getAircraft } from '../../../db/repos/aircraft.js';
import { csvSafeCell, restoreCsvCell } from '../../../server/io/csvSafe.js';
import { aircraftToCsv, exportAircraftCsv, importAircraftCsv } from '../../../server/io/csv.js';
import { demoAircraft } from '../../db/fixtures/demo.js';

const FORMULAS = ['=HYPERLINK("http://evil.example","x")', "+1+cmd|' /C calc'!A0", '@SUM(1+1)', '-2+3', '-minus name', '\tTab first', '\rCR first'];

describe('csvSafeCell and restoreCsvCell', () => {
  it('prefixes one quote to every cell starting with =, +, -, @, tab or CR', () => {
    for (const f of FORMULAS) expect(csvSafeCell(f), JSON.stringify(f)).toBe(`'${f}`);
  });

  it('leaves plain numbers (negative ones included) and ordinary text alone', () => {
    for (const v of ['-12.5', '-40', '+3', '0', '1e-3', '-1.5E+2', '.5', 'Kestrel UT-1', 'a=b', "it's", '', ' =x']) expect(csvSafeCell(v), v).toBe(v);
  });

  it('a cell that already starts with quotes before such a character gets one more, so the import restores it', () => {
    expect(csvSafeCell("'=x")).toBe("''=x");
    expect(csvSafeCell("'-5")).toBe("''-5");
    expect(csvSafeCell("'plain")).toBe("'plain");
  });

  it('restoreCsvCell inverts csvSafeCell for every kind of cell', () => {
    for (const v of [...FORMULAS, '-12.5', '+3', "'=x", "''@y", "'-5", "'plain", "'", "''", 'ordinary']) {
      expect(restoreCsvCell(csvSafeCell(v)), JSON.stringify(v)).toBe(v);
    }
  });

  it('restoreCsvCell strips only a quote followed by (quotes and) one of those characters', () => {
    expect(restoreCsvCell("'=SUM(1)")).toBe('=SUM(1)');
    expect(restoreCsvCell("'abc")).toBe("'abc");
    expect(restoreCsvCell('-12.5')).toBe('-12.5');
  });
});

describe('catalogue CSV export neutralises formulas and round-trips exactly', () => {
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

  const base = demoAircraft('kestrel-ut1');
  const named = (id: string, name: string, group?: string): AircraftProfile => ({ ...base, id, name, ...(group === undefined ? {} : { group }) });
  const profiles = [
    named('f-hyperlink', '=HYPERLINK(x)', '+1+cmd|x'),
    named('f-minus', '-minus name', '@SUM(1)'),
    named('f-number-name', '-12.5', '-40'),
    named('f-quoted', "'=already quoted"),
  ];

  it('no exported cell starts with a formula character unless it is a plain number; numeric cells are unchanged', () => {
    for (const p of profiles) createAircraft(src.db, p);
    const rows = parse(exportAircraftCsv(src.db), { columns: true }) as Record<string, string>[];
    const byId = new Map(rows.map((r) => [r.id, r]));
    expect(byId.get('f-hyperlink')!.name).toBe("'=HYPERLINK(x)");
    expect(byId.get('f-hyperlink')!.group).toBe("'+1+cmd|x");
    expect(byId.get('f-minus')!.name).toBe("'-minus name");
    expect(byId.get('f-minus')!.group).toBe("'@SUM(1)");
    expect(byId.get('f-number-name')!.name).toBe('-12.5');
    expect(byId.get('f-number-name')!.group).toBe('-40');
    expect(byId.get('f-quoted')!.name).toBe("''=already quoted");
    for (const r of rows) {
      expect(r.mtow_kg).toBe(String(base.mtow_kg));
      expect(r.clMaxTakeoff).toBe(String(base.clMaxTakeoff));
      for (const [k, v] of Object.entries(r)) {
        if (/^[=+\-@\t\r]/.test(v)) expect(v, `${r.id}.${k}`).toMatch(/^[+-]?(\d+(\.\d*)?|\.\d+)([eE][+-]?\d+)?$/);
      }
    }
  });

  it('export → import gives back the very same names, groups and numbers', () => {
    expect(importAircraftCsv(dst.db, aircraftToCsv(profiles)).created).toHaveLength(profiles.length);
    for (const p of profiles) expect(getAircraft(dst.db, p.id)).toEqual(p);
  });

  it('a plain negative number in a numeric column is read as a number (here refused by its range, by value)', () => {
    const rows = parse(aircraftToCsv([base]), { columns: false }) as string[][];
    const col = rows[0]!.indexOf('flatRatingTemp_c');
    rows[1]![col] = '-5';
    const e = (() => {
      try {
        importAircraftCsv(dst.db, stringify(rows));
        return undefined;
      } catch (err) {
        return err as { problems: { field?: string; reason: string }[] };
      }
    })();
    expect(e?.problems.find((p) => p.field === 'flatRatingTemp_c')?.reason).toMatch(/^-5 is out of range/);
  });
});
