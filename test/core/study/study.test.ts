/**
 * Study engine: regular use, critical aircraft, rounding, operations served, exclusions, determinism.
 * Rules under test: regular use = 500 annual operations (FAA AC 150/5000-17, "Critical Aircraft and
 * Regular Use Determination", 2017, §1); the critical aircraft is the regular-use aircraft with the
 * greatest requirement (same AC); rounding up to a planning increment is common practice.
 */
import { siText } from '../../../core/notices.js';
import { describe, expect, it } from 'vitest';
import { runStudy, InputDomainError, type RowResult, type StudyInput } from '../../../core/index.js';
import { criticalRow, operationsServed, roundUpToIncrement } from '../../../core/study/run.js';
import demo from '../../../examples/demo-study.json' with { type: 'json' };
import minimal from '../../../examples/minimal-study.json' with { type: 'json' };
import { parseStudyDocument } from '../../../server/studies/document.js';

function input(doc: unknown): StudyInput {
  const p = parseStudyDocument(doc);
  if (!p.ok) throw new Error(JSON.stringify(p.problems));
  return p.input;
}

// Deep copies typed loosely: tests reshape the invented documents freely.
const clone = (x: unknown): any => JSON.parse(JSON.stringify(x));

describe('roundUpToIncrement (named planning step; common practice)', () => {
  it('rounds up to the next multiple and keeps exact multiples', () => {
    expect(roundUpToIncrement(2431, 50)).toBe(2450);
    expect(roundUpToIncrement(2450, 50)).toBe(2450);
    expect(roundUpToIncrement(2450.0000001, 50)).toBe(2450); // float noise below 1e-6 m does not add an increment
    expect(roundUpToIncrement(2450.01, 50)).toBe(2500);
    expect(roundUpToIncrement(0, 50)).toBe(0);
  });
  it('works with 100 ft (30.48 m)', () => {
    // 2000 m = 6561.7 ft → 6600 ft = 2011.68 m
    expect(roundUpToIncrement(2000, 30.48)).toBeCloseTo(6600 * 0.3048, 9);
  });
  it('refuses non-finite or out-of-range input', () => {
    expect(() => roundUpToIncrement(Number.NaN, 50)).toThrow(InputDomainError);
    expect(() => roundUpToIncrement(1000, 0)).toThrow(InputDomainError);
  });
});

function row(p: Partial<RowResult> & { aircraft: string; required_m: number; annualOperations: number }): RowResult {
  return {
    aircraftName: p.aircraft, group: p.aircraft, groupOperations: p.annualOperations, regularUse: p.annualOperations >= 500,
    status: 'ok', takeoffMass_kg: 1000, requiredTakeoff_m: p.required_m, requiredLanding_m: 0, governing: 'takeoff',
    route: { status: 'ok', stageLength_km: 100, payload_kg: 0, payloadLeftBehind_kg: 0, takeoffMass_kg: 1000, arrivalMass_kg: 900, tripFuel_kg: 50, reserveFuel_kg: 50 },
    classification: { aerodromeCode: '3C', approachCategory: 'C', designGroup: 'III', runwayDesignCode: 'C-III', arfl_m: 1500, vref_mps: 65 },
    existing: [], warnings: [], ...p,
  } as RowResult;
}

describe('criticalRow (AC 150/5000-17 critical aircraft)', () => {
  it('takes the regular-use row with the greatest requirement, ignoring non-regular rows', () => {
    const rows = [row({ aircraft: 'a', required_m: 1800, annualOperations: 600 }), row({ aircraft: 'b', required_m: 2400, annualOperations: 499 }), row({ aircraft: 'c', required_m: 2000, annualOperations: 500 })];
    expect(criticalRow(rows)?.aircraft).toBe('c');
  });
  it('breaks ties by operations, then by id', () => {
    const rows = [row({ aircraft: 'a', required_m: 2000, annualOperations: 600 }), row({ aircraft: 'b', required_m: 2000, annualOperations: 900 })];
    expect(criticalRow(rows)?.aircraft).toBe('b');
    const same = [row({ aircraft: 'z', required_m: 2000, annualOperations: 600 }), row({ aircraft: 'y', required_m: 2000, annualOperations: 600 })];
    expect(criticalRow(same)?.aircraft).toBe('y');
  });
  it('skips rows that cannot operate', () => {
    const rows = [row({ aircraft: 'a', required_m: 3000, annualOperations: 900, status: 'cannot-operate' }), row({ aircraft: 'b', required_m: 1000, annualOperations: 900 })];
    expect(criticalRow(rows)?.aircraft).toBe('b');
  });
});

describe('operationsServed', () => {
  it('is a non-decreasing share reaching the served fraction at the longest requirement', () => {
    const rows = [row({ aircraft: 'a', required_m: 1000, annualOperations: 300 }), row({ aircraft: 'b', required_m: 1500, annualOperations: 700 }), row({ aircraft: 'c', required_m: 0, annualOperations: 1000, status: 'cannot-operate' })];
    const curve = operationsServed(rows, 50);
    for (let i = 1; i < curve.length; i++) expect(curve[i]!.share).toBeGreaterThanOrEqual(curve[i - 1]!.share);
    expect(curve.find((p) => p.length_m === 1000)!.share).toBeCloseTo(0.15, 12); // 300 of 2000
    expect(curve.find((p) => p.length_m === 1450)!.share).toBeCloseTo(0.15, 12);
    expect(curve[curve.length - 1]!.share).toBeCloseTo(0.5, 12); // the aircraft that cannot operate is never served
  });
});

describe('runStudy on the invented demo study', () => {
  const result = runStudy(input(demo));
  it('derives the design temperature from the monthly climate by the Annex 14 criterion', () => {
    // Demo climate: July mean (35.0 + 21.4)/2 = 28.2 °C is the hottest mean; its mean maximum 35.0 °C.
    // August has the higher mean maximum (35.4 °C), so the two criteria differ and it is flagged.
    expect(result.site.designTemperature_c).toBe(35);
    expect(result.site.climate?.hottestMonth).toBe(7);
    expect(result.site.climate?.maxMeanMaxMonth).toBe(8);
    expect(result.site.climate?.monthsDiffer).toBe(true);
    expect(result.site.densityAltitude_m).toBeGreaterThan(result.site.elevation_m);
  });
  it('names a critical aircraft and a rounded recommendation per scenario', () => {
    for (const s of result.scenarios) {
      expect(s.criticalAircraft).not.toBeNull();
      const crit = s.rows.find((r) => r.aircraft === s.criticalAircraft)!;
      expect(crit.regularUse).toBe(true);
      expect(s.recommendedLength_m! % 50).toBe(0);
      expect(s.recommendedLength_m!).toBeGreaterThanOrEqual(crit.required_m!);
      expect(s.recommendedLength_m! - crit.required_m!).toBeLessThan(50);
      for (const r of s.rows) if (r.regularUse && r.status === 'ok') expect(r.required_m).toBeLessThanOrEqual(crit.required_m!);
    }
  });
  it('takes the required length as the greater of takeoff and landing and names the side', () => {
    for (const s of result.scenarios) {
      for (const r of s.rows.filter((x) => x.status === 'ok')) {
        expect(r.required_m).toBe(Math.max(r.requiredTakeoff_m!, r.requiredLanding_m!));
        expect(r.governing).toBe(r.requiredTakeoff_m! >= r.requiredLanding_m! ? 'takeoff' : 'landing');
      }
    }
  });
  it('treats 499 operations as occasional and 500 as regular use', () => {
    const doc = clone(demo);
    doc.scenarios = [{ name: 'edge', fleet: [
      { aircraft: 'curlew-rt70', annualOperations: 499, stageLength_km: 600, payload_kg: 5000 },
      { aircraft: 'heron-st1', annualOperations: 500, stageLength_km: 500, payload_kg: 1000 },
    ] }];
    const r = runStudy(input(doc));
    const rows = r.scenarios[0]!.rows;
    expect(rows[0]!.regularUse).toBe(false);
    expect(rows[1]!.regularUse).toBe(true);
    expect(r.scenarios[0]!.criticalAircraft).toBe('heron-st1');
    expect(r.scenarios[0]!.warnings.map(siText).join(' ')).toMatch(/below the regular-use threshold/);
  });
  it('counts operations of a group of similar aircraft together', () => {
    const doc = clone(demo);
    const tern = doc.aircraft.find((a: { id: string }) => a.id === 'tern-rj90')!;
    doc.aircraft.push({ ...tern, id: 'tern-rj90b', name: 'Tern RJ-90B' });
    doc.scenarios = [{ name: 'group', fleet: [
      { aircraft: 'tern-rj90', annualOperations: 300, stageLength_km: 900, payload_kg: 7000 },
      { aircraft: 'tern-rj90b', annualOperations: 250, stageLength_km: 900, payload_kg: 7000 },
    ] }];
    const rows = runStudy(input(doc)).scenarios[0]!.rows;
    expect(rows.every((x) => x.groupOperations === 550 && x.regularUse)).toBe(true);
  });
  it('reports an aircraft that cannot operate and excludes it with the reason', () => {
    const doc = clone(demo);
    // An invented weak-engined variant: half the thrust cannot reach lift-off at the hot, high site.
    const tern = doc.aircraft.find((a: { id: string }) => a.id === 'tern-rj90')!;
    doc.aircraft.push({ ...tern, id: 'weak-jet', name: 'Weak Jet', group: 'weak', staticThrust_N: 14000 });
    doc.scenarios = [{ name: 'weak', fleet: [
      { aircraft: 'weak-jet', annualOperations: 5000, stageLength_km: 300, payload_kg: 5000 },
      { aircraft: 'heron-st1', annualOperations: 800, stageLength_km: 500, payload_kg: 1000 },
    ] }];
    const s = runStudy(input(doc)).scenarios[0]!;
    expect(s.rows[0]!.status).toBe('cannot-operate');
    expect(siText(s.rows[0]!.reason!)).toMatch(/^Cannot operate here: at [\d,]+ kg the gradient of the engine-out climb .* no mass down to the operating empty mass/);
    expect(s.excluded.map((e) => e.aircraft)).toEqual(['weak-jet']);
    expect(s.criticalAircraft).toBe('heron-st1');
  });
  it('sizes a climb-limited row at the climb-limited mass and says a runway cannot cure it', () => {
    // Invented hot, high case: the twin jet at 1600 m, 38 °C on a long route is limited by the
    // engine-out V2 climb gradient (14 CFR 25.121(b) 2.4 % minimum for twins, from memory).
    const doc = clone(minimal);
    doc.aircraft = clone(demo).aircraft.filter((a: { id: string }) => a.id === 'tern-rj90');
    doc.site.elevation_m = 1600;
    doc.site.designTemperature_c = 38;
    doc.scenarios = [{ name: 'Hot', fleet: [{ aircraft: 'tern-rj90', annualOperations: 900, stageLength_km: 2500, payload_kg: 9000 }] }];
    const r = runStudy(input(doc)).scenarios[0]!.rows[0]!;
    expect(r.status).toBe('ok');
    expect(r.takeoffMass_kg).toBeLessThan(r.route.takeoffMass_kg);
    expect(r.climbOffload_kg).toBeCloseTo(r.route.takeoffMass_kg - r.takeoffMass_kg, 9);
    expect(r.warnings.map(siText).join(' ')).toMatch(/Climb-limited at [\d,]+ kg: .* a longer runway cannot cure this/);
    expect(r.takeoff!.climbLimited).toBe(false); // at the offloaded mass the gradient is met
  });
  it('classifies on the dry-runway reference field length whatever the design surface (Annex 14 ARFL definition)', () => {
    const wet = clone(demo);
    wet.options.surface = 'wet';
    const dryRows = result.scenarios[1]!.rows;
    const wetRows = runStudy(input(wet)).scenarios[1]!.rows;
    for (let i = 0; i < dryRows.length; i++) expect(wetRows[i]!.classification).toEqual(dryRows[i]!.classification);
  });
  it('reports a route beyond reach', () => {
    const doc = clone(minimal);
    doc.scenarios[0]!.fleet[0]!.stageLength_km = 9000;
    const s = runStudy(input(doc)).scenarios[0]!;
    expect(s.rows[0]!.status).toBe('cannot-operate');
    expect(siText(s.rows[0]!.reason!)).toMatch(/design stage/);
    expect(s.criticalAircraft).toBeNull();
    expect(s.recommendedLength_m).toBeNull();
  });
  it('is deterministic and finite throughout', () => {
    const again = runStudy(input(demo));
    expect(JSON.stringify(again)).toBe(JSON.stringify(result));
    const text = JSON.stringify(result, (_k, v) => {
      if (typeof v === 'number' && !Number.isFinite(v)) throw new Error(`non-finite ${v}`);
      return v as unknown;
    });
    expect(text.length).toBeGreaterThan(1000);
  });
  it('uses 100 ft as the default increment for a study in US units', () => {
    const doc = clone(minimal) as Record<string, unknown> & { options: Record<string, unknown> };
    doc.options = { ...doc.options, units: 'us' };
    delete doc.options.roundingIncrement_m;
    const s = runStudy(input(doc)).scenarios[0]!;
    const ft = s.recommendedLength_m! / 0.3048;
    expect(Math.abs(ft - Math.round(ft / 100) * 100)).toBeLessThan(1e-6);
  });
});
