import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import type { AircraftProfile, ReferenceTable } from '../../core/aircraft.js';
import { InputDomainError } from '../../core/errors.js';
import {
  interpolateReferenceTable, referenceLengthAtSite, referenceTableAtSite, type ReferenceSite,
} from '../../core/reference.js';
import demoStudy from '../../examples/demo-study.json' with { type: 'json' };

const demoFleet = demoStudy.aircraft;
import { expectClose } from '../helpers/close.js';

const fleet = demoFleet as unknown as AircraftProfile[];
const tern = fleet.find((a) => a.id === 'tern-rj90')!;
const kestrel = fleet.find((a) => a.id === 'kestrel-ut1')!;

/** Invented table: lengths from a function that is linear in each axis, plus a mass × elevation term. */
const fn = (m: number, e: number, t: number): number => 1000 + 0.04 * m + 0.3 * e + 12 * t + 0.00001 * m * e;
const MASS = [30000, 35000, 40000];
const ELEV = [0, 1000, 2000];
const TEMP = [15, 30, 45];
const TABLE: ReferenceTable = {
  mass_kg: MASS, elevation_m: ELEV, temperature_c: TEMP,
  length_m: MASS.map((m) => ELEV.map((e) => TEMP.map((t) => fn(m, e, t)))),
};

const site: ReferenceSite = { elevation_m: 250, referenceTemperature_c: 32.9, effectiveGradient: 0.002, centrelineDifference_m: 5 };

describe('reference length corrected by the ICAO set (ICAO Doc 9157, Aerodrome Design Manual Part 1, percentage corrections; derived)', () => {
  it('takeoff 1700 m at E 250 m, ART 32.9 °C, G 0.2 %: 1700 × 1.058333 × 1.19525 × 1.02', () => {
    const r = referenceLengthAtSite({ aircraft: tern, operation: 'takeoff', site, set: 'icao' });
    if (r.status !== 'ok') throw new Error('expected ok');
    expectClose(r.length_m, 1700 * (1 + 0.07 * 250 / 300) * (1 + 0.19525) * 1.02, { rel: 1e-12 });
    expect(r.steps.map((s) => s.kind)).toEqual(['elevation', 'temperature', 'slope']);
  });
  it('landing 1650 m: elevation only', () => {
    const r = referenceLengthAtSite({ aircraft: tern, operation: 'landing', site, set: 'icao' });
    if (r.status !== 'ok') throw new Error('expected ok');
    expectClose(r.length_m, 1650 * (1 + 0.07 * 250 / 300), { rel: 1e-12 });
  });
  it('high site is labelled indicative', () => {
    const r = referenceLengthAtSite({ aircraft: tern, operation: 'takeoff', site: { ...site, elevation_m: 2200 }, set: 'icao' });
    if (r.status !== 'ok') throw new Error('expected ok');
    expect(r.specificStudyRequired).toBe(true);
    expect(r.label).toMatch(/indicative/);
  });
});

describe('reference length corrected by the authority set (AC 150/5325-4B adjustments; derived)', () => {
  it('takeoff: ICAO elevation and temperature, then + 10 m per m instead of the ICAO slope', () => {
    const r = referenceLengthAtSite({ aircraft: tern, operation: 'takeoff', site, set: 'authority' });
    if (r.status !== 'ok') throw new Error('expected ok');
    expectClose(r.length_m, 1700 * (1 + 0.07 * 250 / 300) * (1 + 0.19525) + 50, { rel: 1e-12 });
    expect(r.steps.map((s) => s.kind)).toEqual(['elevation', 'temperature', 'gradient-difference']);
  });
  it('landing on a wet runway, turbojet: elevation then × 1.15', () => {
    const r = referenceLengthAtSite({ aircraft: tern, operation: 'landing', site: { ...site, wet: true }, set: 'authority' });
    if (r.status !== 'ok') throw new Error('expected ok');
    expectClose(r.length_m, 1650 * (1 + 0.07 * 250 / 300) * 1.15, { rel: 1e-12 });
  });
  it('a profile without reference lengths gives no-data, not an error', () => {
    const r = referenceLengthAtSite({ aircraft: kestrel, operation: 'takeoff', site, set: 'icao' });
    expect(r.status).toBe('no-data');
  });
});

describe('table interpolation (multilinear; derived)', () => {
  it('exact at every node', () => {
    for (const m of MASS) for (const e of ELEV) for (const t of TEMP) {
      const r = interpolateReferenceTable({ table: TABLE, mass_kg: m, elevation_m: e, temperature_c: t });
      if (r.status !== 'ok') throw new Error('expected ok');
      expect(r.length_m).toBeCloseTo(fn(m, e, t), 9);
    }
  });
  it('linear between nodes along each axis; reproduces a multilinear function everywhere inside', () => {
    fc.assert(fc.property(
      fc.double({ min: 30000, max: 40000, noNaN: true }), fc.double({ min: 0, max: 2000, noNaN: true }), fc.double({ min: 15, max: 45, noNaN: true }),
      (m, e, t) => {
        const r = interpolateReferenceTable({ table: TABLE, mass_kg: m, elevation_m: e, temperature_c: t });
        return r.status === 'ok' && Math.abs(r.length_m - fn(m, e, t)) < 1e-7 && Math.abs(r.corners.reduce((s, c) => s + c.weight, 0) - 1) < 1e-12;
      },
    ), { numRuns: 150 });
  });
  it('midpoint of a cell is the average of its corners (a non-multilinear table)', () => {
    const t: ReferenceTable = { mass_kg: [1, 2], elevation_m: [0, 10], temperature_c: [0, 20], length_m: [[[100, 300], [200, 900]], [[150, 250], [400, 1000]]] };
    const r = interpolateReferenceTable({ table: t, mass_kg: 1.5, elevation_m: 5, temperature_c: 10 });
    if (r.status !== 'ok') throw new Error('expected ok');
    expectClose(r.length_m, (100 + 300 + 200 + 900 + 150 + 250 + 400 + 1000) / 8, { abs: 1e-12 });
  });
  it('axes of length 1 are handled (the value at that node only)', () => {
    const t: ReferenceTable = { mass_kg: [40000], elevation_m: [0, 1000], temperature_c: [15], length_m: [[[1700], [1900]]] };
    const r = interpolateReferenceTable({ table: t, mass_kg: 40000, elevation_m: 250, temperature_c: 15 });
    if (r.status !== 'ok') throw new Error('expected ok');
    expectClose(r.length_m, 1750, { abs: 1e-12 });
    expect(r.corners.length).toBe(2);
    const off = interpolateReferenceTable({ table: t, mass_kg: 39000, elevation_m: 250, temperature_c: 15 });
    expect(off.status).toBe('outside-data');
  });
  it('outside the table on any axis: a result naming the field, the value and the nearest bound', () => {
    const hot = interpolateReferenceTable({ table: TABLE, mass_kg: 35000, elevation_m: 500, temperature_c: 47 });
    expect(hot).toMatchObject({ status: 'outside-data', field: 'temperature_c', value: 47, min: 15, max: 45, nearest: 45 });
    const light = interpolateReferenceTable({ table: TABLE, mass_kg: 25000, elevation_m: 500, temperature_c: 20 });
    expect(light).toMatchObject({ status: 'outside-data', field: 'mass_kg', nearest: 30000 });
    const high = interpolateReferenceTable({ table: TABLE, mass_kg: 35000, elevation_m: 2000.5, temperature_c: 20 });
    expect(high).toMatchObject({ status: 'outside-data', field: 'elevation_m', nearest: 2000 });
  });
  it('bad table shape or non-finite query throws InputDomainError', () => {
    const bad = { ...TABLE, elevation_m: [0, 2000, 1000] };
    expect(() => interpolateReferenceTable({ table: bad, mass_kg: 35000, elevation_m: 0, temperature_c: 20 })).toThrow(InputDomainError);
    expect(() => interpolateReferenceTable({ table: TABLE, mass_kg: Number.NaN, elevation_m: 0, temperature_c: 20 })).toThrow(InputDomainError);
  });
});

describe('table at the site with the gradient step (derived)', () => {
  const withTable: AircraftProfile = { ...tern, reference: { ...tern.reference, table: TABLE } };
  const s2: ReferenceSite = { elevation_m: 500, referenceTemperature_c: 25, effectiveGradient: 0.004, centrelineDifference_m: 8 };
  it('ICAO slope step on the interpolated length (10 %/1 %)', () => {
    const r = referenceTableAtSite({ aircraft: withTable, mass_kg: 37000, site: s2, set: 'icao' });
    if (r.status !== 'ok') throw new Error('expected ok');
    expectClose(r.interpolated_m, fn(37000, 500, 25), { rel: 1e-12 });
    expectClose(r.length_m, fn(37000, 500, 25) * 1.04, { rel: 1e-12 });
  });
  it('authority set: + 10 m per m of centreline difference', () => {
    const r = referenceTableAtSite({ aircraft: withTable, mass_kg: 37000, site: s2, set: 'authority' });
    if (r.status !== 'ok') throw new Error('expected ok');
    expectClose(r.length_m, fn(37000, 500, 25) + 80, { rel: 1e-12 });
  });
  it('outside the table passes the outside-data result through', () => {
    const r = referenceTableAtSite({ aircraft: withTable, mass_kg: 41000, site: s2, set: 'icao' });
    expect(r.status).toBe('outside-data');
  });
  it('no table gives no-data', () => {
    expect(referenceTableAtSite({ aircraft: tern, mass_kg: 37000, site: s2, set: 'icao' }).status).toBe('no-data');
  });
});
