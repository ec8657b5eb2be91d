import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import type { AircraftProfile } from '../../core/aircraft.js';
import { airAt, isa } from '../../core/atmosphere.js';
import { InputDomainError } from '../../core/errors.js';
import {
  bartelYoungLapse, engineModel, gaggFerrarPowerRatio, mattinglyCornerMach, mattinglyLapse, propellerThrust,
  propStaticThrust, thrustPerEngine, throttleRatio, turbopropPowerRatio,
} from '../../core/propulsion.js';
import demoStudy from '../../examples/demo-study.json' with { type: 'json' };

const demoFleet = demoStudy.aircraft;
import { expectClose } from '../helpers/close.js';

const fleet = demoFleet as unknown as AircraftProfile[];
const byId = (id: string): AircraftProfile => {
  const a = fleet.find((x) => x.id === id);
  if (!a) throw new Error(`demo aircraft ${id} missing`);
  return a;
};

describe('Mattingly, Aircraft Engine Design (2002), high-bypass lapse — domain reference §8.1 / check case 28 (C2, derived)', () => {
  const TR = 1.05;
  const sl = isa(0);
  it('SL ISA static: α = 1.0000', () => {
    expectClose(mattinglyLapse({ mach: 0, theta: sl.theta, delta: sl.delta, throttleRatio: TR }), 1.0, { abs: 6e-5 });
  });
  it('SL ISA M 0.2: θ0 1.0080, δ0 1.0283, α = 0.8029 (check case 28)', () => {
    expectClose(mattinglyLapse({ mach: 0.2, theta: 1, delta: 1, throttleRatio: TR }), 0.8029, { abs: 6e-5 });
  });
  it('SL ISA+20 static: α = 0.9612 (§8.1 extra check)', () => {
    expectClose(mattinglyLapse({ mach: 0, theta: 308.15 / 288.15, delta: 1, throttleRatio: TR }), 0.9612, { abs: 6e-5 });
  });
  it('SL ISA+30 static: α = 0.8918 (check case 28)', () => {
    expectClose(mattinglyLapse({ mach: 0, theta: 318.15 / 288.15, delta: 1, throttleRatio: TR }), 0.8918, { abs: 6e-5 });
  });
  it('1000 m ISA+23.5 static: θ0 1.0590, δ0 0.8870, α = 0.8710 (check case 28); at M 0.2: 0.6841 (§8.1)', () => {
    const air = airAt(1000, 8.5 + 23.5);
    expectClose(air.theta, 1.059, { abs: 6e-5 }, 'θ');
    expectClose(air.delta, 0.887, { abs: 6e-5 }, 'δ');
    expectClose(mattinglyLapse({ mach: 0, theta: air.theta, delta: air.delta, throttleRatio: TR }), 0.871, { abs: 6e-5 });
    expectClose(mattinglyLapse({ mach: 0.2, theta: air.theta, delta: air.delta, throttleRatio: TR }), 0.6841, { abs: 6e-5 });
  });
  it('throttle ratio from a 30 °C flat rating: TR = 1.0521 (§8.1, derived)', () => {
    expectClose(throttleRatio(30), 1.0521, { abs: 6e-5 });
    expect(throttleRatio()).toBe(1);
  });
  it('the flat-rating corner Mach gives θ0 = TR exactly (derived)', () => {
    const m = mattinglyCornerMach(1.0, 1.05);
    expectClose(1.0 * (1 + 0.2 * m * m), 1.05, { rel: 1e-12 });
    expect(mattinglyCornerMach(1.06, 1.05)).toBe(0);
  });
});

describe('Bartel & Young (2008), takeoff thrust lapse — domain reference §8.2 / check case 29 (C2, derived)', () => {
  it.each([
    [0, 1.0], [0.1, 0.9031], [0.2, 0.8192], [0.25, 0.7822],
  ])('λ = 5, M %s → %s', (mach, expected) => {
    expectClose(bartelYoungLapse({ mach, bypassRatio: 5 }), expected, { abs: 6e-5 });
  });
});

describe('Gagg–Ferrar piston power lapse — domain reference §8.3 / check case 30 (C2, derived)', () => {
  it('σ = 0.9075 → 0.8952 (check case 30); σ = 0.8216 → 0.7981 (§8.3)', () => {
    expectClose(gaggFerrarPowerRatio(0.9075), 0.8952, { abs: 6e-5 });
    // §8.3 gives this one from the rounded form 1.132σ − 0.132 (0.79805); σ − (1 − σ)/7.55 gives 0.79797.
    expectClose(gaggFerrarPowerRatio(0.8216), 0.7981, { abs: 1.5e-4 });
    expectClose(gaggFerrarPowerRatio(1), 1, { abs: 1e-12 });
  });
});

describe('Propeller static thrust, momentum theory — domain reference §8.3 / check case 31 (C2, derived)', () => {
  it('P 1 MW, D 3.6 m, ρ 1.225: ideal 29 216 N; × k_p 0.85 ≈ 24.8 kN (k_p from memory)', () => {
    expectClose(propStaticThrust({ power_W: 1e6, diameter_m: 3.6, density_kgm3: 1.225, factor: 1 }), 29216, { abs: 1 });
    expectClose(propStaticThrust({ power_W: 1e6, diameter_m: 3.6, density_kgm3: 1.225 }), 24800, { abs: 50 });
  });
  it('η 0.8: η·P/V governs above ≈ 32 m/s; V = 40 m/s → 20.0 kN (§8.3 example, derived)', () => {
    const ts = propStaticThrust({ power_W: 1e6, diameter_m: 3.6, density_kgm3: 1.225 });
    expectClose((0.8 * 1e6) / ts, 32, { abs: 0.5 }, 'crossover speed');
    expectClose(propellerThrust({ power_W: 1e6, efficiency: 0.8, airspeed_mps: 40, staticThrust_N: ts }), 20000, { abs: 1 });
    expect(propellerThrust({ power_W: 1e6, efficiency: 0.8, airspeed_mps: 10, staticThrust_N: ts })).toBe(ts);
    expect(propellerThrust({ power_W: 1e6, efficiency: 0.8, airspeed_mps: 0, staticThrust_N: ts })).toBe(ts);
  });
});

describe('Turboprop flat-rated power lapse, σ^0.7 (from memory)', () => {
  it('holds rated power while σ ≥ σ_flat, then falls as (σ/σ_flat)^0.7', () => {
    expect(turbopropPowerRatio({ sigma: 1, flatRatingTemp_c: 35 })).toBe(1);
    const sigmaFlat = 288.15 / 308.15;
    expectClose(turbopropPowerRatio({ sigma: 0.8, flatRatingTemp_c: 35 }), Math.pow(0.8 / sigmaFlat, 0.7), { rel: 1e-12 });
    expectClose(turbopropPowerRatio({ sigma: 0.8 }), Math.pow(0.8, 0.7), { rel: 1e-12 });
  });
});

describe('engineModel over the demo fleet (properties; common practice)', () => {
  const turbofans = fleet.filter((a) => a.engineType === 'turbofan');
  it('below the flat-rating temperature a turbofan’s static thrust does not change with temperature', () => {
    fc.assert(fc.property(
      fc.constantFrom(...turbofans), fc.double({ min: -30, max: 28, noNaN: true }), fc.double({ min: -30, max: 28, noNaN: true }),
      fc.constantFrom<'mattingly' | 'bartel-young'>('mattingly', 'bartel-young'),
      (a0, t1, t2, lapse) => {
        const a = { ...a0, thrustLapse: lapse };
        const flat = a.flatRatingTemp_c ?? 15;
        fc.pre(t1 < flat && t2 < flat);
        const e1 = engineModel({ aircraft: a, air: airAt(0, t1) });
        const e2 = engineModel({ aircraft: a, air: airAt(0, t2) });
        expectClose(e1.staticThrust_N, e2.staticThrust_N, { rel: 1e-12 });
        expectClose(e1.thrust(0), a.staticThrust_N!, { rel: 1e-12 });
      },
    ), { numRuns: 100 });
  });
  it('above the flat rating static thrust falls with temperature; thrust falls with airspeed', () => {
    for (const a of turbofans) {
      const flat = a.flatRatingTemp_c ?? 15;
      const hot = engineModel({ aircraft: a, air: airAt(0, flat + 10) });
      const hotter = engineModel({ aircraft: a, air: airAt(0, flat + 20) });
      expect(hotter.staticThrust_N).toBeLessThan(hot.staticThrust_N);
      expect(hot.thrust(70)).toBeLessThan(hot.thrust(20));
    }
  });
  it('propeller engines: thrust capped at rest, η·P/V at speed, lower power at altitude', () => {
    for (const a of fleet.filter((x) => x.engineType !== 'turbofan')) {
      const sl = engineModel({ aircraft: a, air: airAt(0, 15) });
      const high = engineModel({ aircraft: a, air: airAt(2000, 15) });
      expect(sl.thrust(0)).toBe(sl.staticThrust_N);
      expectClose(sl.thrust(80), (a.propEfficiency! * sl.shaftPower_W!) / 80, { rel: 1e-12 });
      expect(high.shaftPower_W!).toBeLessThan(sl.shaftPower_W!);
      expect(sl.kinks_mps.length).toBe(1);
    }
  });
  it('thrustScale multiplies thrust; thrustPerEngine validates the airspeed', () => {
    const a = byId('tern-rj90');
    const air = airAt(300, 20);
    expectClose(thrustPerEngine({ aircraft: a, air, airspeed_mps: 50, thrustScale: 1.1 }),
      1.1 * thrustPerEngine({ aircraft: a, air, airspeed_mps: 50 }), { rel: 1e-12 });
    expect(() => thrustPerEngine({ aircraft: a, air, airspeed_mps: Number.NaN })).toThrow(InputDomainError);
    expect(() => engineModel({ aircraft: a, air, thrustScale: 5 })).toThrow(InputDomainError);
  });
});
