import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  FT, HP, INHG, KT, LB, NM, STATUTE_MILE,
  cToF, cToK, dCtoDF, dFtoDC, fToC, feet, fpmToMps, ftToM, hpToW, inHgToPa, kToC, kgToLb, kmhToMps, ktToMps,
  lbToKg, lbfToN, mToFt, mToMi, mToNm, metres, miToM, mpsToFpm, mpsToKmh, mpsToKt, nToLbf, nmToM, paToInHg,
  wToHp, type Feet, type Metres,
} from '../../core/units.js';
import { expectClose } from '../helpers/close.js';

const REL = 1e-12;

describe('exact definitions (exact conversion definitions (1959 international foot and pound; 1 NM = 1852 m), check case 4)', () => {
  it('1 kt = 1852/3600 m/s = 0.5144444 m/s (NM = 1852 m, exact)', () => {
    expect(ktToMps(1)).toBe(1852 / 3600);
    expectClose(ktToMps(1), 0.5144444, { abs: 5e-8 }, 'kt');
    expect(KT).toBe(1852 / 3600);
  });
  it('1 ft = 0.3048 m (international foot, exact)', () => {
    expect(ftToM(1)).toBe(0.3048);
    expect(FT).toBe(0.3048);
  });
  it('1 lbf = 0.45359237 kg × 9.80665 m/s² = 4.4482216152605 N (exact)', () => {
    expectClose(lbfToN(1), 4.4482216152605, { rel: 1e-15 }, 'lbf');
    expect(LB).toBe(0.45359237);
  });
  it('1 NM = 1852 m; 1 statute mile = 1609.344 m; 1 lb = 0.45359237 kg (exact)', () => {
    expect(nmToM(1)).toBe(1852);
    expect(NM).toBe(1852);
    expect(miToM(1)).toBe(1609.344);
    expect(STATUTE_MILE).toBe(1609.344);
    expect(lbToKg(1)).toBe(0.45359237);
  });
  it('1 km/h = 1/3.6 m/s; 1 ft/min = 0.00508 m/s (derived from the foot)', () => {
    expectClose(kmhToMps(36), 10, { rel: REL });
    expectClose(fpmToMps(1), 0.00508, { rel: REL });
    expectClose(fpmToMps(1000), 5.08, { rel: REL });
  });
  it('1 hp (550 ft·lbf/s) = 745.69987 W (derived, exact conversion definitions (1959 international foot and pound; 1 NM = 1852 m) [D])', () => {
    expectClose(hpToW(1), 745.69987, { abs: 5e-6 });
    expectClose(HP, 550 * 0.3048 * 4.4482216152605, { rel: REL });
  });
  it('1 inHg = 3386.389 Pa (conventional value, from memory)', () => {
    expect(inHgToPa(1)).toBe(3386.389);
    expect(INHG).toBe(3386.389);
    // 29.92 inHg is the standard altimeter setting, close to 101 325 Pa (common practice).
    expectClose(inHgToPa(29.92), 101325, { rel: 2e-4 });
  });
  it('temperature scales: 0 °C = 32 °F = 273.15 K; 100 °C = 212 °F; −40 °C = −40 °F (exact)', () => {
    expect(cToF(0)).toBe(32);
    expect(cToF(100)).toBe(212);
    expect(cToF(-40)).toBe(-40);
    expect(fToC(212)).toBe(100);
    expect(cToK(0)).toBe(273.15);
    expect(kToC(288.15)).toBeCloseTo(15, 12);
  });
  it('temperature differences carry no offset: 1 °C = 1.8 °F (exact)', () => {
    expect(dCtoDF(1)).toBe(1.8);
    expect(dCtoDF(20)).toBe(36);
    expect(dFtoDC(9)).toBe(5);
    expect(dCtoDF(0)).toBe(0);
    // A difference differs from a temperature: 10 °C is 50 °F, but 10 °C warmer is 18 °F warmer.
    expect(cToF(10)).toBe(50);
    expect(dCtoDF(10)).toBe(18);
  });
});

describe('round trips (derived: each pair is a factor and its inverse)', () => {
  const pairs: readonly [string, (x: number) => number, (x: number) => number][] = [
    ['ft ↔ m', ftToM, mToFt],
    ['NM ↔ m', nmToM, mToNm],
    ['statute mile ↔ m', miToM, mToMi],
    ['kt ↔ m/s', ktToMps, mpsToKt],
    ['km/h ↔ m/s', kmhToMps, mpsToKmh],
    ['lb ↔ kg', lbToKg, kgToLb],
    ['lbf ↔ N', lbfToN, nToLbf],
    ['hp ↔ W', hpToW, wToHp],
    ['inHg ↔ Pa', inHgToPa, paToInHg],
    ['ft/min ↔ m/s', fpmToMps, mpsToFpm],
    ['°C ↔ K', cToK, kToC],
    ['°C ↔ °F', cToF, fToC],
    ['Δ°C ↔ Δ°F', dCtoDF, dFtoDC],
  ];
  for (const [name, to, back] of pairs) {
    it(`${name}: back(to(x)) = x and to(back(x)) = x`, () => {
      fc.assert(
        fc.property(fc.double({ min: -1e6, max: 1e6, noNaN: true }), (x) => {
          expectClose(back(to(x)), x, { rel: REL, abs: 1e-9 }, `${name} ${x}`);
          expectClose(to(back(x)), x, { rel: REL, abs: 1e-9 }, `${name} back ${x}`);
        }),
        { numRuns: 100 },
      );
    });
  }
  it('conversions are linear in the value (no offset except the temperature scales)', () => {
    for (const [name, to] of pairs) {
      if (name === '°C ↔ K' || name === '°C ↔ °F') continue;
      expect(to(0), name).toBe(0);
      expectClose(to(2), 2 * to(1), { rel: REL }, name);
    }
  });
});

describe('unit brands (safe-units style type test: misuse fails to compile under tsc --noEmit)', () => {
  const needsMetres = (x: Metres): number => x;

  it('a Feet value is refused where Metres is required', () => {
    const runway: Feet = feet(7000);
    // @ts-expect-error Feet is not assignable to Metres: convert with ftToM first.
    const wrong = needsMetres(runway);
    // The brand is a compile-time guard only; at run time the bare number passes through.
    expect(wrong).toBe(7000);
    expect(needsMetres(ftToM(runway))).toBeCloseTo(2133.6, 10);
  });

  it('a plain number is refused where Metres is required; the constructor accepts it', () => {
    // @ts-expect-error a bare number carries no unit.
    needsMetres(100);
    expect(needsMetres(metres(100))).toBe(100);
  });

  it('mToFt returns Feet, which cannot be fed back as Metres', () => {
    const f = mToFt(metres(304.8));
    expectClose(f, 1000, { rel: REL });
    // @ts-expect-error the result of mToFt is Feet.
    needsMetres(f);
  });
});
