import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  H_BOTTOM, H_TOP, P0, P11, R_AIR, RHO0, T0, T11,
  airAt, densityAltitude, densityAltitudeFromDensity, geometricFromGeopotential, geopotentialFromGeometric, isa,
  pressureAltitude, standardTemperatureC,
} from '../../core/atmosphere.js';
import { InputDomainError } from '../../core/errors.js';
import { ftToM } from '../../core/units.js';
import { expectClose } from '../helpers/close.js';

const REL_TABLE = 5e-4; // ±0.05 % (check case 1)

describe('USSA 1976 constants (U.S. Standard Atmosphere 1976 (= ICAO Doc 7488), constants: crnslab constants page, scipp.ucsc USSA 1976 page)', () => {
  it('R = R*/M0 = 287.0531 J/(kg·K), ρ0 = 1.2250 kg/m³, T11 = 216.65 K', () => {
    expectClose(R_AIR, 287.0531, { abs: 1e-4 });
    expectClose(RHO0, 1.225, { rel: 1e-5 });
    expectClose(T11, 216.65, { abs: 1e-9 });
    expect(T0).toBe(288.15);
    expect(P0).toBe(101325);
  });
});

// Check case 1. Rows [D] from the USSA 1976 formulas, confirmed [C] by the Engineering ToolBox ISA
// table and Mechanical Engineers' Handbook Vol. 4, Table 6 (U.S. Standard Atmosphere 1976 tables).
const TABLE_5_3: readonly (readonly [number, number, number, number, number])[] = [
  // H (m), T (K), p (Pa), ρ (kg/m³), σ
  [0, 288.15, 101325.0, 1.225, 1.0],
  [500, 284.9, 95460.8, 1.16727, 0.95287],
  [1000, 281.65, 89874.6, 1.11164, 0.90746],
  [1500, 278.4, 84556.0, 1.05807, 0.86373],
  [2000, 275.15, 79495.2, 1.00649, 0.82162],
  [3000, 268.65, 70108.5, 0.90912, 0.74214],
  [4000, 262.15, 61640.2, 0.81913, 0.66868],
];

describe('ISA table, check case 1 (U.S. Standard Atmosphere 1976 tables; USSA 1976 formulas [D]; Engineering ToolBox ISA table and Mech. Eng. Handbook Vol 4 Table 6 [C]; ±0.05 %)', () => {
  for (const [h, t, p, rho, sigma] of TABLE_5_3) {
    it(`H = ${h} m: T ${t} K, p ${p} Pa, ρ ${rho} kg/m³, σ ${sigma}`, () => {
      const a = isa(h);
      expectClose(a.temperature_k, t, { rel: REL_TABLE }, 'T');
      expectClose(a.pressure_pa, p, { rel: REL_TABLE }, 'p');
      expectClose(a.density_kgm3, rho, { rel: REL_TABLE }, 'rho');
      expectClose(a.sigma, sigma, { rel: REL_TABLE }, 'sigma');
      expectClose(a.delta, p / 101325, { rel: REL_TABLE }, 'delta');
      expectClose(a.theta, t / 288.15, { rel: REL_TABLE }, 'theta');
    });
  }
  // The published rows are rounded to 4 digits and partly tabulated at geometric altitude, hence ±0.05 %.
  it('Engineering ToolBox rows as published (bar, σ to 4 digits), ±0.05 %', () => {
    const rows: readonly (readonly [number, number, number])[] = [
      [500, 0.9546, 0.9529], [1000, 0.8988, 0.9075], [1500, 0.8456, 0.8638],
      [2000, 0.795, 0.8217], [3000, 0.7012, 0.7423], [4000, 0.6166, 0.6689],
    ];
    for (const [h, bar, sigma] of rows) {
      expectClose(isa(h).pressure_pa / 1e5, bar, { rel: REL_TABLE }, `p ${h} m`);
      expectClose(isa(h).sigma, sigma, { rel: REL_TABLE }, `sigma ${h} m`);
    }
  });
  it('speed of sound at sea level √(1.4·R·T0) = 340.294 m/s (derived)', () => {
    expectClose(isa(0).speedOfSound_mps, 340.294, { abs: 1e-3 });
  });
  it('feet rows [D]: 5000 ft 5.09 °C / 843.07 hPa / σ 0.8617; 10 000 ft −4.81 °C / 696.82 hPa / σ 0.7385', () => {
    const a = isa(ftToM(5000));
    expectClose(a.temperature_k - 273.15, 5.09, { abs: 0.005 });
    expectClose(a.pressure_pa / 100, 843.07, { abs: 0.01 });
    expectClose(a.sigma, 0.8617, { abs: 1e-4 });
    const b = isa(ftToM(10000));
    expectClose(b.temperature_k - 273.15, -4.81, { abs: 0.005 });
    expectClose(b.pressure_pa / 100, 696.82, { abs: 0.01 });
    expectClose(b.sigma, 0.7385, { abs: 1e-4 });
  });
});

describe('off-standard day, check case 2 (U.S. Standard Atmosphere 1976 (pressure and density altitude) [D])', () => {
  it('1000 m, ISA+20 (OAT 28.5 °C): ρ 1.03794, σ 0.84730, density altitude 1692.9 m (5554 ft)', () => {
    const a = airAt(1000, 28.5);
    expectClose(a.density_kgm3, 1.03794, { rel: 5e-5 }, 'rho');
    expectClose(a.sigma, 0.8473, { rel: 5e-5 }, 'sigma');
    expectClose(a.densityAltitude_m, 1692.9, { abs: 0.1 }, 'density altitude');
    expectClose(a.densityAltitude_m / 0.3048, 5554, { abs: 0.5 }, 'density altitude ft');
    expectClose(a.isaDeviation_k, 20, { abs: 1e-9 });
    // Pressure follows ISA at the pressure altitude.
    expectClose(a.pressure_pa, isa(1000).pressure_pa, { rel: 1e-12 });
    expect(densityAltitude(1000, 28.5)).toBe(a.densityAltitude_m);
  });
  it('5000 ft, OAT 30 °C: ρ 0.96883 kg/m³, density altitude 7801 ft (U.S. Standard Atmosphere 1976 (pressure and density altitude) [D])', () => {
    const a = airAt(ftToM(5000), 30);
    expectClose(a.density_kgm3, 0.96883, { rel: 5e-5 });
    expectClose(a.densityAltitude_m / 0.3048, 7801, { abs: 1 });
  });
  it('on a standard day the density altitude equals the pressure altitude (derived)', () => {
    for (const h of [0, 750, 2500, 4000]) {
      const a = airAt(h, standardTemperatureC(h));
      expectClose(a.densityAltitude_m, h, { abs: 1e-6 }, `H ${h}`);
      expectClose(a.isaDeviation_k, 0, { abs: 1e-9 });
    }
  });
  it('density altitude rises with temperature (property)', () => {
    fc.assert(
      fc.property(fc.double({ min: 0, max: 4000, noNaN: true }), fc.double({ min: -40, max: 49, noNaN: true }), (h, t) => {
        expect(densityAltitude(h, t + 1)).toBeGreaterThan(densityAltitude(h, t));
      }),
      { numRuns: 100 },
    );
  });
});

describe('pressure altitude, check case 3 (U.S. Standard Atmosphere 1976 (pressure and density altitude) [D])', () => {
  it('p = 90 000 Pa → H_p = 988.5 m (3243 ft)', () => {
    expectClose(pressureAltitude(90000), 988.5, { abs: 0.05 });
    expectClose(pressureAltitude(90000) / 0.3048, 3243, { abs: 0.5 });
  });
  it('inverts the ISA pressure in both layers (round trip, derived)', () => {
    fc.assert(
      fc.property(fc.double({ min: H_BOTTOM, max: H_TOP, noNaN: true }), (h) => {
        expectClose(pressureAltitude(isa(h).pressure_pa), h, { abs: 1e-6 }, `H ${h}`);
      }),
      { numRuns: 150 },
    );
  });
  it('density altitude from the ISA density is the altitude itself in both layers (round trip, derived)', () => {
    for (const h of [-610, 0, 3000, 11000, 15000, 20000]) {
      expectClose(densityAltitudeFromDensity(isa(h).density_kgm3), h, { abs: 1e-6 }, `H ${h}`);
    }
  });
});

describe('geometric and geopotential altitude (USSA 1976, r0 = 6 356 766 m; U.S. Standard Atmosphere 1976 tables [D])', () => {
  it('geometric 1000 m ↔ geopotential 999.843 m; p 89 876.3 Pa, ρ 1.11166 kg/m³ there', () => {
    const h = geopotentialFromGeometric(1000);
    expectClose(h, 999.843, { abs: 5e-4 });
    expectClose(geometricFromGeopotential(h), 1000, { abs: 1e-9 });
    expectClose(isa(h).pressure_pa, 89876.3, { abs: 0.05 });
    expectClose(isa(h).density_kgm3, 1.11166, { abs: 5e-6 });
  });
  it('Mech. Eng. Handbook Vol 4 Table 6 at geometric 2000 m: 275.15 K, 0.7950 bar, 1.0066 kg/m³', () => {
    const a = isa(geopotentialFromGeometric(2000));
    expectClose(a.temperature_k, 275.15, { abs: 0.01 });
    expectClose(a.pressure_pa / 1e5, 0.795, { abs: 1e-4 });
    expectClose(a.density_kgm3, 1.0066, { abs: 1e-4 });
  });
  it('the two are equal at sea level and geopotential is lower above it', () => {
    expect(geopotentialFromGeometric(0)).toBe(0);
    expect(geopotentialFromGeometric(5000)).toBeLessThan(5000);
  });
});

describe('isothermal layer above 11 km (USSA 1976; p at 11 km 22 632 Pa, U.S. Standard Atmosphere 1976 (= ICAO Doc 7488), constants)', () => {
  it('p(11 000 m) = 22 632 Pa, T = 216.65 K', () => {
    expectClose(isa(11000).pressure_pa, 22632, { abs: 0.5 });
    expectClose(P11, 22632, { abs: 0.5 });
    expectClose(isa(11000).temperature_k, 216.65, { abs: 1e-9 });
  });
  it('temperature is constant and pressure falls exponentially: p(H) = p11·exp(−g0(H−11 000)/(R·T11)) (derived)', () => {
    const a = isa(15000);
    expectClose(a.temperature_k, 216.65, { abs: 1e-9 });
    expectClose(a.pressure_pa, 22632.06 * Math.exp((-9.80665 * 4000) / (287.0531 * 216.65)), { rel: 1e-5 });
    // Derived 12 044.6 Pa; the USSA 1976 table value at 15 km geopotential agrees (from memory).
    expectClose(a.pressure_pa, 12044.6, { rel: 5e-4 });
  });
  it('pressure and temperature are continuous across the tropopause', () => {
    const below = isa(11000 - 1e-6);
    const above = isa(11000 + 1e-6);
    expectClose(above.pressure_pa, below.pressure_pa, { rel: 1e-9 });
    expectClose(above.temperature_k, below.temperature_k, { abs: 1e-6 });
  });
});

describe('validity range −610 m to 20 000 m and bad values (house rule: InputDomainError)', () => {
  it('accepts the edges', () => {
    expect(Number.isFinite(isa(-610).pressure_pa)).toBe(true);
    expect(Number.isFinite(isa(20000).pressure_pa)).toBe(true);
    expectClose(isa(-610).temperature_k, 288.15 + 0.0065 * 610, { abs: 1e-9 });
  });
  it('rejects just beyond the edges, naming field, value and range', () => {
    expect(() => isa(-610.001)).toThrow(InputDomainError);
    expect(() => isa(20000.001)).toThrow(InputDomainError);
    try {
      isa(25000);
      expect.unreachable();
    } catch (e) {
      expect(e).toBeInstanceOf(InputDomainError);
      const err = e as InputDomainError;
      expect(err.field).toBe('altitude_m');
      expect(err.value).toBe(25000);
      expect(err.message).toContain('20000 m');
    }
  });
  it('rejects NaN, ±Infinity and undefined everywhere', () => {
    const bad: unknown[] = [Number.NaN, Number.POSITIVE_INFINITY, Number.NEGATIVE_INFINITY, undefined];
    for (const v of bad) {
      expect(() => isa(v as number)).toThrow(InputDomainError);
      expect(() => airAt(1000, v as number)).toThrow(InputDomainError);
      expect(() => airAt(v as number, 15)).toThrow(InputDomainError);
      expect(() => pressureAltitude(v as number)).toThrow(InputDomainError);
      expect(() => standardTemperatureC(v as number)).toThrow(InputDomainError);
      expect(() => geopotentialFromGeometric(v as number)).toThrow(InputDomainError);
    }
  });
  it('rejects an outside-air temperature beyond −60..60 °C and a pressure outside the layers', () => {
    expect(() => airAt(0, 61)).toThrow(InputDomainError);
    expect(() => airAt(0, -61)).toThrow(InputDomainError);
    expect(() => pressureAltitude(120000)).toThrow(InputDomainError);
    expect(() => pressureAltitude(1000)).toThrow(InputDomainError);
  });
});

describe('standardTemperatureC (USSA 1976: T = 15 °C − 6.5 °C/km · H)', () => {
  it('15 °C at sea level, 8.5 °C at 1000 m, −56.5 °C at and above 11 km', () => {
    expectClose(standardTemperatureC(0), 15, { abs: 1e-12 });
    expectClose(standardTemperatureC(1000), 8.5, { abs: 1e-9 });
    expectClose(standardTemperatureC(11000), -56.5, { abs: 1e-9 });
    expectClose(standardTemperatureC(18000), -56.5, { abs: 1e-9 });
  });
  it('1000 ft: 13.02 °C (U.S. Standard Atmosphere 1976 tables feet rows [D])', () => {
    expectClose(standardTemperatureC(ftToM(1000)), 13.02, { abs: 0.005 });
  });
});
