import { describe, expect, it } from 'vitest';
import type { AircraftProfile } from '../../core/aircraft.js';
import {
  aerodromeCodeLetter, aerodromeCodeNumber, airplaneDesignGroup, approachCategory, classifyAircraft, runwayDesignCode,
} from '../../core/classify.js';
import { InputDomainError } from '../../core/errors.js';
import { referenceLandingSpeed } from '../../core/landing.js';
import { ftToM, ktToMps, mpsToKt } from '../../core/units.js';
import demoStudy from '../../examples/demo-study.json' with { type: 'json' };

const demoFleet = demoStudy.aircraft;

const fleet = demoFleet as unknown as AircraftProfile[];
const byId = (id: string): AircraftProfile => fleet.find((a) => a.id === id)!;

describe('ICAO Annex 14 Vol. I Table 1-1, code number — check case 11 (via SKYbrary [C])', () => {
  it.each([[799, 1], [800, 2], [1199, 2], [1200, 3], [1799, 3], [1800, 4]] as const)('ARFL %d m → %d', (arfl, code) => {
    expect(aerodromeCodeNumber(arfl)).toBe(code);
  });
  it('refuses a non-finite length', () => {
    expect(() => aerodromeCodeNumber(Number.NaN)).toThrow(InputDomainError);
  });
});

describe('ICAO code letter by wingspan, current edition — check case 12 [C]', () => {
  it.each([[14.99, 'A'], [15, 'B'], [23.99, 'B'], [24, 'C'], [35.99, 'C'], [36, 'D'], [51.99, 'D'], [52, 'E'], [64.99, 'E'], [65, 'F'], [79.99, 'F']] as const)(
    'span %d m → %s', (span, letter) => {
      expect(aerodromeCodeLetter(span)).toBe(letter);
    },
  );
  it('80 m and more: no code letter (null)', () => {
    expect(aerodromeCodeLetter(80)).toBeNull();
  });
});

describe('Aircraft approach category — check case 13 (Horonjeff Table 6-1 [C]; 166 kt boundary per AC 150/5300-13B, from memory)', () => {
  it.each([[90, 'A'], [91, 'B'], [120, 'B'], [121, 'C'], [140, 'C'], [141, 'D'], [165, 'D'], [166, 'E']] as const)('VREF %d kt → %s', (kt, cat) => {
    expect(approachCategory(ktToMps(kt))).toBe(cat);
  });
  it('just below a boundary stays in the lower category', () => {
    expect(approachCategory(ktToMps(120.999))).toBe('B');
  });
});

describe('Airplane design group — check case 14 (Horonjeff Table 6-2 [C])', () => {
  it('span 118 ft, tail 44 ft → IV (span governs)', () => {
    const r = airplaneDesignGroup({ wingspan_m: ftToM(118), tailHeight_m: ftToM(44) });
    expect(r.group).toBe('IV');
    expect(r.governedBy).toBe('wingspan');
  });
  it('span 117 ft, tail 45 ft → IV (tail governs)', () => {
    const r = airplaneDesignGroup({ wingspan_m: ftToM(117), tailHeight_m: ftToM(45) });
    expect(r.group).toBe('IV');
    expect(r.governedBy).toBe('tail height');
  });
  it('span 78 ft, tail 19 ft → II', () => {
    expect(airplaneDesignGroup({ wingspan_m: ftToM(78), tailHeight_m: ftToM(19) }).group).toBe('II');
  });
  it('beyond group VI → null', () => {
    expect(airplaneDesignGroup({ wingspan_m: ftToM(262), tailHeight_m: ftToM(30) }).group).toBeNull();
  });
});

describe('Runway design code = AAC-ADG (Horonjeff p. 175 [C])', () => {
  it('C-III', () => {
    expect(runwayDesignCode('C', 'III')).toBe('C-III');
    expect(runwayDesignCode('C', null)).toBeNull();
  });
});

describe('classifyAircraft on the invented demo fleet (derived)', () => {
  it('Tern RJ-90: VREF at MLW ≈ 130 kt → C; span 26 m → C; tail 7.5 m (24.6 ft) II, span 85.3 ft III → III', () => {
    const tern = byId('tern-rj90');
    const vref = referenceLandingSpeed({ aircraft: tern });
    // VSR0 = √(2 × 36000 × 9.80665 / (1.225 × 72 × 2.7)) = 54.45 m/s; × 1.23 = 66.98 m/s = 130.2 kt (derived)
    expect(mpsToKt(vref)).toBeCloseTo(130.2, 1);
    const c = classifyAircraft(tern, { arfl_m: 1700, vref_mps: vref });
    expect(c.codeNumber).toBe(3);
    expect(c.codeLetter).toBe('C');
    expect(c.aerodromeCode).toBe('3C');
    expect(c.approachCategory).toBe('C');
    expect(c.designGroup.byTailHeight).toBe('II');
    expect(c.designGroup.bySpan).toBe('III');
    expect(c.runwayDesignCode).toBe('C-III');
    expect(c.warnings).toEqual([]);
  });
  it('Kestrel UT-1: small, slow → 1A, A-I', () => {
    const k = byId('kestrel-ut1');
    const c = classifyAircraft(k, { arfl_m: 400, vref_mps: referenceLandingSpeed({ aircraft: k }) });
    expect(c.aerodromeCode).toBe('1A');
    expect(c.runwayDesignCode).toBe('A-I');
  });
  it('a very large invented span has no code letter and carries a warning', () => {
    const big: AircraftProfile = { ...byId('albatross-nb180'), wingspan_m: 82 };
    const c = classifyAircraft(big, { arfl_m: 3000, vref_mps: ktToMps(150) });
    expect(c.codeLetter).toBeNull();
    expect(c.aerodromeCode).toBeNull();
    expect(c.warnings.length).toBeGreaterThan(0);
  });
});
