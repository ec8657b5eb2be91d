import { siText } from '../../core/notices.js';
import { describe, expect, it } from 'vitest';
import {
  INDICATIVE_LABEL, authorityAdjustments, icaoCorrections, icaoSlopeStep,
} from '../../core/corrections.js';
import { InputDomainError } from '../../core/errors.js';
import { ftToM, mToFt } from '../../core/units.js';
import { expectClose } from '../helpers/close.js';

describe('ICAO percentage corrections — check case 5 (Made Easy Ex. 3.2 [C2]; recomputed, derived)', () => {
  // L0 1650 m, E 250 m, ART 32.90 °C, G 0.2 %. Tolerance ±0.005 m (values given to two decimals).
  const r = icaoCorrections({ basicLength_m: 1650, elevation_m: 250, referenceTemperature_c: 32.9, effectiveGradient: 0.002 });
  it('L1 = 1746.25 m, L2 = 2087.21 m, combined 26.50 %, L3 = 2128.95 m (10 %/1 %)', () => {
    expectClose(r.steps[0]!.after_m, 1746.25, { abs: 0.005 }, 'L1');
    expectClose(r.steps[1]!.after_m, 2087.21, { abs: 0.005 }, 'L2');
    expectClose(r.elevationTemperatureFraction!, 0.2650, { abs: 0.00005 }, 'combined');
    expectClose(r.corrected_m, 2128.95, { abs: 0.005 }, 'L3');
    expect(r.specificStudyRequired).toBe(false);
    expect(r.label).toBeUndefined();
  });
  it('legacy 20 %/1 % variant: L3 = 2170.69 m, labelled', () => {
    const l = icaoCorrections({ basicLength_m: 1650, elevation_m: 250, referenceTemperature_c: 32.9, effectiveGradient: 0.002, slopeRule: 'legacy-20' });
    expectClose(l.corrected_m, 2170.69, { abs: 0.005 }, 'L3 legacy');
    expect(l.steps[2]!.label).toMatch(/legacy/);
    expect(l.warnings.map(siText).join(' ')).toMatch(/Legacy 20 %/);
  });
  it('every step is in the trace with before, increment and after', () => {
    expect(r.steps.map((s) => s.kind)).toEqual(['elevation', 'temperature', 'slope']);
    for (const s of r.steps) expectClose(s.after_m, s.before_m + s.increment_m, { abs: 1e-9 });
    expectClose(r.steps[1]!.increment_m, 340.96, { abs: 0.005 }, 'temperature increment');
  });
});

describe('ICAO percentage corrections — check case 7 (BYJU\'S [C2]; derived)', () => {
  it('2500 m, 500 m, ART 21 °C → L2 = 3049.9 m', () => {
    const r = icaoCorrections({ basicLength_m: 2500, elevation_m: 500, referenceTemperature_c: 21, effectiveGradient: 0 });
    expectClose(r.steps[1]!.after_m, 3049.9, { abs: 0.05 });
  });
});

describe('ICAO percentage corrections — Example C (Made Easy Ex. 3.3 data [C2]; derived)', () => {
  it('2100 m, 100 m, ART 24 °C, G 0.6 % → 2149.00, 2356.38, 2497.76 (10 %) / 2639.14 (20 %)', () => {
    const r = icaoCorrections({ basicLength_m: 2100, elevation_m: 100, referenceTemperature_c: 24, effectiveGradient: 0.006 });
    expectClose(r.steps[0]!.after_m, 2149.0, { abs: 0.005 });
    expectClose(r.steps[1]!.after_m, 2356.38, { abs: 0.005 });
    expectClose(r.elevationTemperatureFraction!, 0.1221, { abs: 0.00005 });
    expectClose(r.corrected_m, 2497.76, { abs: 0.005 });
    const l = icaoCorrections({ basicLength_m: 2100, elevation_m: 100, referenceTemperature_c: 24, effectiveGradient: 0.006, slopeRule: 'legacy-20' });
    expectClose(l.corrected_m, 2639.14, { abs: 0.005 });
  });
});

describe('ICAO rule details (ICAO Doc 9157, Aerodrome Design Manual Part 1, percentage corrections)', () => {
  it('35 % check: a high, hot site is flagged "indicative — specific study required"', () => {
    // 2000 m elevation: +46.67 % alone (derived)
    const r = icaoCorrections({ basicLength_m: 2000, elevation_m: 2000, referenceTemperature_c: 30, effectiveGradient: 0 });
    expect(r.specificStudyRequired).toBe(true);
    expect(r.label).toBe(INDICATIVE_LABEL);
    expect(r.warnings.map(siText).join(' ')).toMatch(/specific study/);
  });
  it('flag boundary: exactly 35 % is not flagged, just above is (derived)', () => {
    // Elevation only at sea-level ISA: 1500 m gives 0.07 × 5 = 35 %; temperature at standard (5.25 °C).
    const at = icaoCorrections({ basicLength_m: 1000, elevation_m: 1500, referenceTemperature_c: 5.25, effectiveGradient: 0 });
    expectClose(at.elevationTemperatureFraction!, 0.35, { abs: 1e-12 });
    expect(at.specificStudyRequired).toBe(false);
    const above = icaoCorrections({ basicLength_m: 1000, elevation_m: 1500, referenceTemperature_c: 5.4, effectiveGradient: 0 });
    expect(above.specificStudyRequired).toBe(true);
  });
  it('no negative temperature correction below standard (from memory)', () => {
    const r = icaoCorrections({ basicLength_m: 2000, elevation_m: 0, referenceTemperature_c: 5, effectiveGradient: 0 });
    expect(r.steps[1]!.increment_m).toBe(0);
    expect(r.corrected_m).toBe(2000);
  });
  it('slope threshold: applied from a basic length of 900 m (from memory; configurable)', () => {
    const below = icaoCorrections({ basicLength_m: 899, elevation_m: 0, referenceTemperature_c: 15, effectiveGradient: 0.01 });
    expect(below.steps[2]!.applied).toBe(false);
    const at = icaoCorrections({ basicLength_m: 900, elevation_m: 0, referenceTemperature_c: 15, effectiveGradient: 0.01 });
    expect(at.steps[2]!.applied).toBe(true);
    const custom = icaoCorrections({ basicLength_m: 899, elevation_m: 0, referenceTemperature_c: 15, effectiveGradient: 0.01, slopeThreshold_m: 0 });
    expect(custom.steps[2]!.applied).toBe(true);
  });
  it('landing: elevation only (25.125(a) standard temperature)', () => {
    const r = icaoCorrections({ basicLength_m: 1500, elevation_m: 600, referenceTemperature_c: 40, effectiveGradient: 0.01, operation: 'landing' });
    expect(r.steps.map((s) => s.kind)).toEqual(['elevation']);
    expectClose(r.corrected_m, 1500 * (1 + 0.07 * 2), { abs: 1e-9 });
  });
  it('takeoff needs a reference temperature; ranges are enforced', () => {
    expect(() => icaoCorrections({ basicLength_m: 1500, elevation_m: 100 })).toThrow(InputDomainError);
    expect(() => icaoCorrections({ basicLength_m: 1500, elevation_m: 100, referenceTemperature_c: 20, effectiveGradient: 0.2 })).toThrow(InputDomainError);
    expect(() => icaoCorrections({ basicLength_m: 50, elevation_m: 100, referenceTemperature_c: 20 })).toThrow(InputDomainError);
  });
});

describe('Authority adjustments (AC 150/5325-4B via secondary sources, FAA AC 150/5325-4B)', () => {
  it('check case 15: 7000 ft takeoff, ΔH 25 ft → 7250 ft [C2]', () => {
    const r = authorityAdjustments({ length_m: ftToM(7000), operation: 'takeoff', centrelineDifference_m: ftToM(25) });
    expectClose(mToFt(r.corrected_m), 7250, { abs: 1e-9 });
  });
  it('wet landing, turbojet: 5000 ft → 5750 ft (derived); none for a turboprop; none when dry', () => {
    expectClose(mToFt(authorityAdjustments({ length_m: ftToM(5000), operation: 'landing', wet: true, engineType: 'turbofan' }).corrected_m), 5750, { abs: 1e-9 });
    expect(authorityAdjustments({ length_m: 1500, operation: 'landing', wet: true, engineType: 'turboprop' }).corrected_m).toBe(1500);
    expect(authorityAdjustments({ length_m: 1500, operation: 'landing', wet: false, engineType: 'turbofan' }).corrected_m).toBe(1500);
  });
  it('no gradient adjustment for landing', () => {
    const r = authorityAdjustments({ length_m: 1500, operation: 'landing', centrelineDifference_m: 20, wet: false, engineType: 'turbofan' });
    expect(r.corrected_m).toBe(1500);
  });
});

describe('check case 16: ICAO 10 %/1 % and the 10 m per m rule give the same increment on the same length (derived)', () => {
  it('L = 3000 m, ΔH = 12 m → both +120 m', () => {
    const icao = icaoSlopeStep({ length_m: 3000, basicLength_m: 3000, effectiveGradient: 12 / 3000 });
    const auth = authorityAdjustments({ length_m: 3000, operation: 'takeoff', centrelineDifference_m: 12 });
    expectClose(icao.increment_m, 120, { abs: 1e-9 });
    expectClose(auth.corrected_m - 3000, 120, { abs: 1e-9 });
  });
});
