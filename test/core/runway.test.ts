import { siText } from '../../core/notices.js';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { InputDomainError } from '../../core/errors.js';
import {
  analyseRunwayProfile,
  areReciprocal,
  checkDeclaredDistances,
  checkRunwayDeclaredDistances,
  profileLimits,
  type ProfilePoint,
} from '../../core/runway.js';
import { ftToM, mToFt } from '../../core/units.js';
import { expectClose } from '../helpers/close.js';

function domainError(fn: () => unknown): InputDomainError {
  try {
    fn();
  } catch (e) {
    expect(e).toBeInstanceOf(InputDomainError);
    return e as InputDomainError;
  }
  return expect.fail('expected an InputDomainError');
}

const ft = (chainage: number, elevation: number): ProfilePoint => ({ chainage_m: ftToM(chainage), elevation_m: ftToM(elevation) });

describe('effective gradient and ΔH (Horonjeff p. 81 / ICAO high-minus-low definition, ICAO Annex 14 Vol I §3.1 and FAA AC 150/5325-4B (effective gradient))', () => {
  // Check case 15 profile (invented points): a 7000-ft runway whose high point is 1245 ft and low point 1220 ft.
  const profile = [ft(0, 1220), ft(2000, 1232), ft(4500, 1245), ft(7000, 1240)];
  const r = analyseRunwayProfile({ points: profile, codeNumber: 4, designators: { increasingChainage: '09', decreasingChainage: '27' } });

  it('check case 15: ΔH = 1245 − 1220 = 25 ft; with the 10-ft-per-ft rule 7000 ft becomes 7250 ft (AC 150/5325-4B via secondary summaries [C2])', () => {
    expectClose(mToFt(r.elevationDifference_m), 25, { abs: 1e-9 });
    expectClose(7000 + 10 * mToFt(r.elevationDifference_m), 7250, { abs: 1e-9 });
    expectClose(mToFt(r.highPoint.elevation_m), 1245, { abs: 1e-9 });
    expectClose(mToFt(r.highPoint.chainage_m), 4500, { abs: 1e-9 });
    expectClose(mToFt(r.lowPoint.elevation_m), 1220, { abs: 1e-9 });
    expect(r.lowPoint.chainage_m).toBe(0);
  });

  it('effective gradient = 25 ft / 7000 ft = 0.357 % (derived)', () => {
    expectClose(r.effectiveGradient, 25 / 7000, { rel: 1e-12 });
    expectClose(r.length_m, 2133.6, { abs: 1e-9 });
  });

  it('average slope per take-off direction, + uphill: +20/7000 toward 27 end, −20/7000 the other way (derived)', () => {
    const [inc, dec] = r.takeoffDirections;
    expect(inc.direction).toBe('increasing-chainage');
    expect(inc.designator).toBe('09');
    expectClose(inc.averageSlope, 20 / 7000, { rel: 1e-12 });
    expectClose(mToFt(inc.startElevation_m), 1220, { abs: 1e-9 });
    expect(dec.designator).toBe('27');
    expectClose(dec.averageSlope, -20 / 7000, { rel: 1e-12 });
    expectClose(mToFt(dec.startElevation_m), 1240, { abs: 1e-9 });
  });

  it('steepest local slope: 12 ft over 2000 ft = 0.6 %; segments 12/2000, 13/2500, −5/2500 (derived)', () => {
    expect(r.segments.map((s) => s.slope)).toEqual([12 / 2000, 13 / 2500, -5 / 2500].map((x) => expect.closeTo(x, 12)));
    expectClose(r.steepestSegment.slope, 0.006, { rel: 1e-12 });
    expect(r.steepestSegment.fromChainage_m).toBe(0);
  });

  it('largest deviation from the end-to-end line: at 4500 ft, 1245 − (1220 + 20·4500/7000) = 12.143 ft (derived)', () => {
    expectClose(mToFt(r.maxDeviationFromEndLine_m), 25 - (20 * 4500) / 7000, { abs: 1e-9 });
  });

  it('within ICAO limits for code 4: no warnings; trace carries ΔH and G', () => {
    expect(r.warnings).toEqual([]);
    expect(r.trace.find((t) => t.label.startsWith('elevation difference'))?.value).toBe(r.elevationDifference_m);
    expect(r.trace.find((t) => t.label === 'effective gradient')?.value).toBe(r.effectiveGradient);
  });

  it('check case 16: L = 3000 m, ΔH = 12 m → G = 0.4 % (derived)', () => {
    const p = analyseRunwayProfile({ points: [{ chainage_m: 0, elevation_m: 100 }, { chainage_m: 1800, elevation_m: 106 }, { chainage_m: 3000, elevation_m: 112 }] });
    expectClose(p.elevationDifference_m, 12, { abs: 1e-12 });
    expectClose(p.effectiveGradient, 0.004, { rel: 1e-12 });
    expectClose(p.maxDeviationFromEndLine_m, -1.2, { abs: 1e-9 }); // 106 − (100 + 12·1800/3000), below the line
    expect(p.takeoffDirections[0].designator).toBeUndefined();
  });

  it('a high point in the middle makes G larger than the end-to-end slope (hump profile, derived)', () => {
    const p = analyseRunwayProfile({ points: [{ chainage_m: 0, elevation_m: 50 }, { chainage_m: 1000, elevation_m: 60 }, { chainage_m: 2000, elevation_m: 50 }] });
    expectClose(p.effectiveGradient, 0.005, { rel: 1e-12 });
    expect(p.takeoffDirections[0].averageSlope).toBe(0);
    expect(p.takeoffDirections[1].averageSlope === 0).toBe(true);
  });

  it('properties: G ≥ |end-to-end slope|, G ≤ steepest |local slope|; reversing the profile swaps directions', () => {
    fc.assert(
      fc.property(fc.array(fc.double({ min: -20, max: 20, noNaN: true }), { minLength: 2, maxLength: 12 }), (dz) => {
        const pts = dz.map((d, i) => ({ chainage_m: i * 250, elevation_m: 300 + d }));
        const a = analyseRunwayProfile({ points: pts });
        expect(a.effectiveGradient + 1e-12).toBeGreaterThanOrEqual(Math.abs(a.takeoffDirections[0].averageSlope));
        expect(a.effectiveGradient).toBeLessThanOrEqual(Math.abs(a.steepestSegment.slope) + 1e-12);
        const len = (pts.length - 1) * 250;
        const b = analyseRunwayProfile({ points: [...pts].reverse().map((p) => ({ chainage_m: len - p.chainage_m, elevation_m: p.elevation_m })) });
        expectClose(b.effectiveGradient, a.effectiveGradient, { abs: 1e-12 });
        expectClose(b.takeoffDirections[0].averageSlope, a.takeoffDirections[1].averageSlope, { abs: 1e-12 });
      }),
      { numRuns: 150 },
    );
  });
});

describe('plausibility warnings against ICAO limits (Annex 14 via Horonjeff Table 6-11, ICAO Annex 14 Vol I §3.1 and FAA AC 150/5325-4B (effective gradient))', () => {
  it('limits: effective 1 % code 3-4, 2 % code 1-2; longitudinal 2/2/1.5/1.25 %; 0.8 % end quarters code 4', () => {
    expect([1, 2, 3, 4].map((c) => profileLimits(c as 1 | 2 | 3 | 4).maxEffectiveGradient)).toEqual([0.02, 0.02, 0.01, 0.01]);
    expect([1, 2, 3, 4].map((c) => profileLimits(c as 1 | 2 | 3 | 4).maxLongitudinalSlope)).toEqual([0.02, 0.02, 0.015, 0.0125]);
    expect(profileLimits(4).maxEndQuarterSlope).toBe(0.008);
    expect(profileLimits(3).maxEndQuarterSlope).toBeUndefined();
    expect(profileLimits().maxEffectiveGradient).toBe(0.02);
  });

  // 2000 m runway rising 24 m evenly: G = 1.2 %.
  const steady = [0, 500, 1000, 1500, 2000].map((x) => ({ chainage_m: x, elevation_m: 100 + 0.012 * x }));

  it('G 1.2 %: a warning for code 4, none for code 2 — warnings, not errors', () => {
    const c4 = analyseRunwayProfile({ points: steady, codeNumber: 4 });
    expect(c4.warnings.map(siText).some((w) => w.includes('Effective gradient 1.20 % is above the ICAO maximum of 1.00 % for code 4'))).toBe(true);
    expect(c4.warnings.map(siText).some((w) => w.includes('first or last quarter'))).toBe(true);
    const c2 = analyseRunwayProfile({ points: steady, codeNumber: 2 });
    expect(c2.warnings).toEqual([]);
  });

  it('exactly at the limit gives no warning (1.00 % for code 3)', () => {
    const p = analyseRunwayProfile({ points: [{ chainage_m: 0, elevation_m: 0 }, { chainage_m: 3000, elevation_m: 30 }], codeNumber: 3 });
    expect(p.effectiveGradient).toBeCloseTo(0.01, 15);
    expect(p.warnings).toEqual([]);
  });

  it('a steep local stretch in the middle breaks the longitudinal limit only', () => {
    const p = analyseRunwayProfile({
      points: [
        { chainage_m: 0, elevation_m: 100 },
        { chainage_m: 1200, elevation_m: 100 },
        { chainage_m: 1400, elevation_m: 103 },
        { chainage_m: 1600, elevation_m: 100 },
        { chainage_m: 2800, elevation_m: 100 },
      ],
      codeNumber: 4,
    });
    expectClose(p.steepestSegment.slope, 0.015, { rel: 1e-12 });
    expect(p.warnings).toHaveLength(1);
    expect(siText(p.warnings[0]!)).toContain('steeper than the ICAO longitudinal maximum of 1.25 %');
  });

  it('without a code number the loosest limits apply (2 %)', () => {
    const p = analyseRunwayProfile({ points: [{ chainage_m: 0, elevation_m: 0 }, { chainage_m: 1000, elevation_m: 25 }] });
    expect(p.warnings.map(siText).some((w) => w.includes('above the ICAO maximum of 2.00 % for any code number'))).toBe(true);
    expect(p.limits.codeNumber).toBeUndefined();
  });
});

describe('profile input checks (InputDomainError)', () => {
  const a = { chainage_m: 0, elevation_m: 10 };
  const b = { chainage_m: 1000, elevation_m: 12 };
  it('refuses bad profiles, naming the field', () => {
    expect(domainError(() => analyseRunwayProfile({ points: [a] })).field).toBe('points');
    expect(domainError(() => analyseRunwayProfile({ points: [a, { chainage_m: 0, elevation_m: 12 }] })).field).toBe('points[1].chainage_m');
    expect(domainError(() => analyseRunwayProfile({ points: [b, a] })).field).toBe('points[1].chainage_m');
    expect(domainError(() => analyseRunwayProfile({ points: [a, { chainage_m: 1000, elevation_m: Number.NaN }] })).field).toBe('points[1].elevation_m');
    expect(domainError(() => analyseRunwayProfile({ points: [a, { chainage_m: 1000, elevation_m: 5001 }] })).field).toBe('points[1].elevation_m');
    expect(domainError(() => analyseRunwayProfile({ points: [a, { chainage_m: 9000, elevation_m: 10 }] })).field).toBe('points');
    expect(domainError(() => analyseRunwayProfile({ points: [a, b], codeNumber: 5 as 4 })).field).toBe('codeNumber');
    expect(
      domainError(() => analyseRunwayProfile({ points: [a, b], designators: { increasingChainage: '9', decreasingChainage: '27' } })).field,
    ).toBe('designators.increasingChainage');
  });
  it('accepts the range edges (−610 m and 5000 m elevation; 8000 m length)', () => {
    const p = analyseRunwayProfile({ points: [{ chainage_m: 0, elevation_m: -610 }, { chainage_m: 8000, elevation_m: -600 }] });
    expect(p.length_m).toBe(8000);
    expect(analyseRunwayProfile({ points: [{ chainage_m: 0, elevation_m: 5000 }, { chainage_m: 100, elevation_m: 5000 }] }).effectiveGradient).toBe(0);
  });
});

describe('declared distances (ICAO Annex 14 definitions; clearway ≤ ½ TORA from memory)', () => {
  const ok = { designator: '09', tora_m: 2500, toda_m: 2800, asda_m: 2600, lda_m: 2300 };

  it('derives stopway = ASDA − TORA and clearway = TODA − TORA', () => {
    const r = checkDeclaredDistances(ok);
    expect(r.stopway_m).toBe(100);
    expect(r.clearway_m).toBe(300);
    expect(r.warnings).toEqual([]);
    expect(r.trace.map((t) => t.value)).toEqual([100, 300]);
  });

  it('accepts no stopway or clearway, and the clearway limit itself (50 % of TORA)', () => {
    const r = checkDeclaredDistances({ designator: '36', tora_m: 2000, toda_m: 2000, asda_m: 2000, lda_m: 2000 });
    expect([r.stopway_m, r.clearway_m]).toEqual([0, 0]);
    expect(checkDeclaredDistances({ designator: '18C', tora_m: 2000, toda_m: 3000, asda_m: 2000, lda_m: 1800 }).clearway_m).toBe(1000);
  });

  it('refuses inconsistent or out-of-range distances, naming the field', () => {
    expect(domainError(() => checkDeclaredDistances({ ...ok, toda_m: 2400 })).field).toBe('toda_m');
    expect(domainError(() => checkDeclaredDistances({ ...ok, asda_m: 2400 })).field).toBe('asda_m');
    expect(domainError(() => checkDeclaredDistances({ ...ok, lda_m: 2700 })).field).toBe('lda_m');
    expect(domainError(() => checkDeclaredDistances({ ...ok, toda_m: 3751 })).field).toBe('toda_m');
    expect(domainError(() => checkDeclaredDistances({ ...ok, tora_m: 0 })).field).toBe('tora_m');
    expect(domainError(() => checkDeclaredDistances({ ...ok, asda_m: 6001 })).field).toBe('asda_m');
    expect(domainError(() => checkDeclaredDistances({ ...ok, lda_m: Number.NaN })).field).toBe('lda_m');
    expect(domainError(() => checkDeclaredDistances({ ...ok, designator: '37' })).field).toBe('designator');
    expect(domainError(() => checkDeclaredDistances({ ...ok, designator: '00' })).field).toBe('designator');
    expect(domainError(() => checkDeclaredDistances({ ...ok, designator: '09X' })).field).toBe('designator');
    const e = domainError(() => checkDeclaredDistances({ ...ok, toda_m: 3751 }));
    expect(e.message).toContain('from memory');
  });

  it('LDA longer than TORA (but within ASDA) is a warning, not an error', () => {
    const r = checkDeclaredDistances({ designator: '27', tora_m: 2200, toda_m: 2400, asda_m: 2500, lda_m: 2400 });
    expect(siText(r.warnings[0]!)).toContain('LDA 2,400 m is longer than TORA 2,200 m');
  });

  it('both directions: reciprocal designators pass; others warn; duplicates are refused', () => {
    const pair = checkRunwayDeclaredDistances({ directions: [ok, { ...ok, designator: '27' }] });
    expect(pair.directions.map((d) => d.designator)).toEqual(['09', '27']);
    expect(pair.warnings).toEqual([]);
    expect(checkRunwayDeclaredDistances({ directions: [ok, { ...ok, designator: '28' }] }).warnings.map(siText)[0]).toContain('not the two ends');
    expect(domainError(() => checkRunwayDeclaredDistances({ directions: [ok, ok] })).field).toBe('directions[1].designator');
    expect(domainError(() => checkRunwayDeclaredDistances({ directions: [ok, { ...ok, designator: '27', lda_m: 2700 }] })).field).toBe('directions[1].lda_m');
    expect(domainError(() => checkRunwayDeclaredDistances({ directions: [] })).field).toBe('directions');
    expect(areReciprocal('09L', '27R')).toBe(true);
    expect(areReciprocal('09L', '27L')).toBe(false);
    expect(areReciprocal('18C', '36C')).toBe(true);
    expect(areReciprocal('09', '27R')).toBe(false);
  });
});
