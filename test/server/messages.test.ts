/**
 * The shared message builders say "missing" for a blank choice and "too large (maximum …)" for a value
 * such as 1e309 that no machine number holds, in every path that uses them: the zod pieces (study
 * file, API, imports), the form reader, CSV cells, climate files and core's own range checks
 * (issue 12, finding 7: they used to say "undefined is not allowed" and "Infinity is not a finite number").
 */
import { describe, expect, it } from 'vitest';
import { InputDomainError, readMonthlyNormalsCsv } from '../../core/index.js';
import { inRange } from '../../core/validate.js';
import { readNumber, type FieldErrors } from '../../server/common/formFields.js';
import { aircraftToCsv, parseAircraftCsv } from '../../server/io/csv.js';
import { num, oneOf, parseAll } from '../../server/common/schema.js';
import { demoAircraft } from '../db/fixtures/demo.js';
import { importError } from './io/helpers.js';

const LEAKS = /undefined|Infinity|NaN|\[object/;

describe('zod building blocks', () => {
  it('a blank choice is "missing" with the choices', () => {
    const r = parseAll(oneOf(['transport', 'commuter', 'normal']), undefined);
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.problems[0]!.message).toBe('missing; one of transport, commuter, normal');
  });

  it('±Infinity is "too large" / "too small" with the limit', () => {
    const s = num(0, 2000, 'km');
    const hi = parseAll(s, Number.POSITIVE_INFINITY);
    const lo = parseAll(s, Number.NEGATIVE_INFINITY);
    expect(hi.ok || hi.problems[0]!.message).toBe('too large (maximum 2000 km)');
    expect(lo.ok || lo.problems[0]!.message).toBe('too small (minimum 0 km)');
    // The echoed value is never the text "Infinity" (JSON has no such number).
    if (!hi.ok) expect(hi.problems[0]!.value).toBeNull();
  });

  it('a deep or huge value is summarised, never serialised into the message', () => {
    let deep: unknown = 1;
    for (let i = 0; i < 5000; i++) deep = [deep];
    const r = parseAll(num(0, 1, ''), deep);
    expect(r.ok).toBe(false);
    if (!r.ok) {
      expect(r.problems[0]!.message).toBe('a list of 1 item is not a number; allowed 0 to 1');
      expect(r.problems[0]!.value).toBe('a list of 1 item');
    }
    const long = parseAll(oneOf(['a', 'b']), 'x'.repeat(10_000));
    if (!long.ok) expect(long.problems[0]!.message.length).toBeLessThan(100);
  });
});

describe('core range checks', () => {
  it('say "too large (maximum …)" for Infinity and "missing" for a blank', () => {
    expect(() => inRange('site.designTemperature_c', Number.POSITIVE_INFINITY, { min: -30, max: 55, unit: '°C' }))
      .toThrow('site.designTemperature_c: too large (maximum 55 °C)');
    expect(() => inRange('site.elevation_m', undefined, { min: -400, max: 4500, unit: 'm' }))
      .toThrow(/^site\.elevation_m: missing; expected a finite number/);
    expect(() => inRange('x', Number.NEGATIVE_INFINITY, { min: -400, max: 4500, unit: 'm' })).toThrow(InputDomainError);
  });
});

describe('forms', () => {
  it('a typed 1e309 is "too large" with the maximum in the user unit', () => {
    const errors: FieldErrors = {};
    expect(readNumber({ t: '1e309' }, { name: 't', kind: 'temperature', min: -30, max: 55, required: true }, 'us', errors)).toBeUndefined();
    expect(errors.t).toBe('too large (maximum 131 °F)');
    readNumber({ e: '-1e309' }, { name: 'e', kind: 'altitude', min: -400, max: 4500, required: true }, 'si', errors);
    expect(errors.e).toBe('too small (minimum -400 m)');
  });
});

describe('CSV cells', () => {
  const header = (csv: string) => csv.split('\n')[0]!.split(',');
  const rowWith = (edit: (cells: string[], h: string[]) => void): string => {
    const csv = aircraftToCsv([demoAircraft('kestrel-ut1')]);
    const lines = csv.trimEnd().split('\n');
    const h = header(csv);
    const cells = lines[1]!.split(',');
    edit(cells, h);
    return `${lines[0]}\n${cells.join(',')}\n`;
  };

  it('a blank enum cell is "missing; one of …"', () => {
    const text = rowWith((cells, h) => { cells[h.indexOf('certification')] = ''; });
    const e = importError(() => parseAircraftCsv(text));
    const p = e.problems.find((x) => x.field === 'certification')!;
    expect(p.reason).toBe('missing; one of transport, commuter, normal');
  });

  it('a cell of 1e309 is "too large (maximum …)"', () => {
    const text = rowWith((cells, h) => { cells[h.indexOf('mtow_kg')] = '1e309'; });
    const e = importError(() => parseAircraftCsv(text));
    const p = e.problems.find((x) => x.field === 'mtow_kg')!;
    expect(p.reason).toBe('too large (maximum 600000 kg)');
    for (const q of e.problems) expect(q.reason).not.toMatch(LEAKS);
  });
});

describe('climate files', () => {
  it('a temperature too long for a machine number is "too large", never "Infinity °C"', () => {
    const text = `STATION,DATE,MLY-TMAX-NORMAL,MLY-TMIN-NORMAL\nXX000000001,01,${'9'.repeat(400)},20\n`;
    let msg = '';
    try { readMonthlyNormalsCsv({ text }); } catch (e) { msg = (e as Error).message; }
    expect(msg).toMatch(/too large \(maximum 60 °C\)/);
    expect(msg).not.toMatch(LEAKS);
    expect(msg.length).toBeLessThan(200);
  });
});
