/**
 * The form edge: numbers typed in the user's units to SI, blanks as missing, ranges stated in the
 * user's units. Factors: international foot 0.3048 m, pound 0.45359237 kg, °F = °C·1.8 + 32, knot
 * 1852/3600 m/s (core/units.ts, exact by definition).
 */
import { describe, expect, it } from 'vitest';
import { localiseMessage, parseTyped, readNumber, type FieldErrors } from '../../../server/common/formFields.js';
import { expectClose } from '../../helpers/close.js';

describe('readNumber (form edge)', () => {
  it('converts from the user units to SI (exact factors)', () => {
    const e: FieldErrors = {};
    expectClose(readNumber({ x: '1000' }, { name: 'x', kind: 'length', min: 0, max: 6000, required: true }, 'us', e)!, 304.8, { abs: 1e-12 }, 'ft');
    expectClose(readNumber({ x: '1,000' }, { name: 'x', kind: 'mass', min: 0, max: 1e6, required: true }, 'us', e)!, 453.59237, { abs: 1e-9 }, 'lb');
    expectClose(readNumber({ x: '212' }, { name: 'x', kind: 'temperature', min: -60, max: 200, required: true }, 'us', e)!, 100, { abs: 1e-12 }, '°F');
    expectClose(readNumber({ x: '10' }, { name: 'x', kind: 'speed', min: -20, max: 20, required: true }, 'si', e)!, 10 * 1852 / 3600, { abs: 1e-12 }, 'kt');
    expectClose(readNumber({ x: '0.5' }, { name: 'x', kind: 'slopePct', min: -0.03, max: 0.03, required: true }, 'si', e)!, 0.005, { abs: 1e-15 }, '%');
    expect(e).toEqual({});
  });

  it('a blank is missing, never zero; junk is named; ranges are stated in the user units', () => {
    const e: FieldErrors = {};
    expect(readNumber({ a: '  ' }, { name: 'a', kind: 'length', min: 200, max: 6000, required: true }, 'us', e)).toBeUndefined();
    expect(e.a).toBe('missing; allowed 656.2 to 19685 ft');
    expect(readNumber({ b: '' }, { name: 'b', kind: 'length', min: 200, max: 6000, required: false }, 'si', e)).toBeUndefined();
    expect(e.b).toBeUndefined();
    readNumber({ c: '12,34' }, { name: 'c', kind: 'mass', min: 0, max: 10, required: true }, 'si', e);
    expect(e.c).toBe('"12,34" is not a number; allowed 0 to 10 kg');
    readNumber({ d: '2.5' }, { name: 'd', kind: 'count', min: 0, max: 10, required: true, integer: true }, 'si', e);
    expect(e.d).toMatch(/not a whole number/);
  });

  it('a limit typed back in the other unit is accepted (slack at the boundary)', () => {
    const e: FieldErrors = {};
    // 6000 m = 19685.03937… ft; the user reads "19685" and types a value just under the exact limit.
    expectClose(readNumber({ x: '19685.0393700788' }, { name: 'x', kind: 'length', min: 200, max: 6000, required: true }, 'us', e)!, 6000, { abs: 1e-9 }, 'limit');
    expect(e).toEqual({});
  });

  it('parses plain and grouped numbers only', () => {
    expect(parseTyped('-3.5e2')).toBe(-350);
    expect(parseTyped('12,345.5')).toBe(12345.5);
    expect(parseTyped('−4')).toBe(-4);
    expect(parseTyped('1.2.3')).toBeUndefined();
    expect(parseTyped('0x10')).toBeUndefined();
  });
});

describe('localiseMessage', () => {
  it('restates SI quantities of a schema message in US units', () => {
    expect(localiseMessage('expected less than the maximum landing mass (10000 kg)', 'us')).toBe('expected less than the maximum landing mass (22046.2 lb)');
    expect(localiseMessage('at most ASDA (2600 m)', 'us')).toBe('at most ASDA (8530.2 ft)');
    expect(localiseMessage('at most ASDA (2600 m)', 'si')).toBe('at most ASDA (2600 m)');
  });
});
