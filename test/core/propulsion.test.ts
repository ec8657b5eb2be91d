import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import type { AircraftProfile } from '../../core/aircraft.js';
import { airAt, isa } from '../../core/atmosphere.js';
import { InputDomainError } from '../../core/errors.js';
import {
  bartelYoungLapse, engineModel, flatRating, flatRatingCornerTemp_c, gaggFerrarPowerRatio, mattinglyCornerMach,
  mattinglyLapse, PROP_FM_PISTON, PROP_FM_TURBOPROP, propBlendEndSpeed, propEffectiveEfficiency, propellerThrust,
  propStaticThrust, thrustPerEngine, throttleRatio, throttleRatioAt, turbopropPowerRatio,
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

describe('Mattingly, Aircraft Engine Design (2002), high-bypass lapse — Mattingly, Heiser and Pratt, Aircraft Engine Design (2002) / check case 28 (C2, derived)', () => {
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

describe('Bartel & Young (2008), takeoff thrust lapse — Bartel and Young, J. Aircraft (2008) / check case 29 (C2, derived)', () => {
  it.each([
    [0, 1.0], [0.1, 0.9031], [0.2, 0.8192], [0.25, 0.7822],
  ])('λ = 5, M %s → %s', (mach, expected) => {
    expectClose(bartelYoungLapse({ mach, bypassRatio: 5 }), expected, { abs: 6e-5 });
  });
});

describe('Gagg–Ferrar piston power lapse — Gudmundsson ch. 14–15; Gagg and Ferrar / check case 30 (C2, derived)', () => {
  it('σ = 0.9075 → 0.8952 (check case 30); σ = 0.8216 → 0.7981 (§8.3)', () => {
    expectClose(gaggFerrarPowerRatio(0.9075), 0.8952, { abs: 6e-5 });
    // §8.3 gives this one from the rounded form 1.132σ − 0.132 (0.79805); σ − (1 − σ)/7.55 gives 0.79797.
    expectClose(gaggFerrarPowerRatio(0.8216), 0.7981, { abs: 1.5e-4 });
    expectClose(gaggFerrarPowerRatio(1), 1, { abs: 1e-12 });
  });
});

describe('Propeller static thrust, momentum theory — Gudmundsson ch. 14–15; Gagg and Ferrar / check case 31 (C2, derived)', () => {
  it('P 1 MW, D 3.6 m, ρ 1.225: ideal (FM = 1) 29 216 N (check case 31)', () => {
    expectClose(propStaticThrust({ power_W: 1e6, diameter_m: 3.6, density_kgm3: 1.225 }), 29216, { abs: 1 });
    expectClose(propStaticThrust({ power_W: 1e6, diameter_m: 3.6, density_kgm3: 1.225, figureOfMerit: 1 }), 29216, { abs: 1 });
  });
  it('with a figure of merit T_s = (FM·P)^(2/3)·(2ρA)^(1/3): Gudmundsson k_p 0.85 ⇔ FM = 0.85^1.5 → 24.8 kN (§8.3; k_p from memory)', () => {
    expectClose(propStaticThrust({ power_W: 1e6, diameter_m: 3.6, density_kgm3: 1.225, figureOfMerit: Math.pow(0.85, 1.5) }), 24834, { abs: 2 });
    // Momentum theory with FM: ideal induced power T^(3/2)/√(2ρA) equals FM·P (derived).
    const t = propStaticThrust({ power_W: 1e6, diameter_m: 3.6, density_kgm3: 1.225, figureOfMerit: 0.7 });
    const area = (Math.PI * 3.6 * 3.6) / 4;
    expectClose(Math.pow(t, 1.5) / Math.sqrt(2 * 1.225 * area), 0.7e6, { rel: 1e-12 });
  });
  it('§8.3 example, η 0.8, T_s 24.8 kN: branches meet at V* ≈ 32 m/s; η·P/V governs from V_b = 2·V* (blend, derived)', () => {
    const ts = propStaticThrust({ power_W: 1e6, diameter_m: 3.6, density_kgm3: 1.225, figureOfMerit: Math.pow(0.85, 1.5) });
    const base = { power_W: 1e6, efficiency: 0.8, staticThrust_N: ts };
    expectClose(propBlendEndSpeed(base) / 2, 32, { abs: 0.5 }, 'V*');
    expect(propellerThrust({ ...base, airspeed_mps: 0 })).toBe(ts);
    // The min() blend gave 20.0 kN at 40 m/s (§8.3); the smooth blend gives less there: low-speed loss.
    const t40 = propellerThrust({ ...base, airspeed_mps: 40 });
    expect(t40).toBeLessThan(20000);
    expect(t40).toBeGreaterThan(0.75 * 20000);
    expectClose(propellerThrust({ ...base, airspeed_mps: 80 }), 10000, { rel: 1e-12 });
    expectClose(propellerThrust({ ...base, airspeed_mps: -80 }), 10000, { rel: 1e-12 });
  });
});

describe('Propeller thrust blend: continuity, monotonicity, T(0) from the figure of merit (derived)', () => {
  const arb = fc.record({
    power_W: fc.double({ min: 5e4, max: 3e6, noNaN: true }),
    diameter_m: fc.double({ min: 1.2, max: 6.5, noNaN: true }),
    density_kgm3: fc.double({ min: 0.7, max: 1.4, noNaN: true }),
    efficiency: fc.double({ min: 0.4, max: 0.9, noNaN: true }),
    figureOfMerit: fc.double({ min: 0.3, max: 0.85, noNaN: true }),
  });
  it('T(V) is strictly decreasing from T_s, continuous with a continuous slope at V_b, and η·P/V beyond', () => {
    fc.assert(fc.property(arb, (p) => {
      const ts = propStaticThrust(p);
      const base = { power_W: p.power_W, efficiency: p.efficiency, staticThrust_N: ts };
      const T = (v: number): number => propellerThrust({ ...base, airspeed_mps: v });
      const vb = propBlendEndSpeed(base);
      expect(T(0)).toBe(ts);
      let prev = T(0);
      for (let k = 1; k <= 400; k++) {
        const t = T((k / 200) * vb);
        expect(Number.isFinite(t)).toBe(true);
        expect(t).toBeLessThan(prev);
        prev = t;
      }
      const h = vb * 1e-6;
      expectClose(T(vb - h), T(vb + h), { rel: 1e-5 }, 'value at V_b');
      const slopeLeft = (T(vb - h) - T(vb - 2 * h)) / h;
      const slopeRight = (T(vb + 2 * h) - T(vb + h)) / h;
      expectClose(slopeLeft, slopeRight, { rel: 1e-3 }, 'slope at V_b');
      expectClose(T(1.5 * vb), (p.efficiency * p.power_W) / (1.5 * vb), { rel: 1e-12 });
      // Slope at rest: −T_s/(3V*), the ideal actuator disk at constant power (derived).
      const vStar = vb / 2;
      expectClose((T(vStar * 1e-5) - ts) / (vStar * 1e-5), -ts / (3 * vStar), { rel: 1e-3 }, 'slope at rest');
    }), { numRuns: 200 });
  });
  it('effective efficiency T·V/P rises from 0 at rest to η at V_b and never exceeds η', () => {
    const base = { power_W: 2e5, efficiency: 0.78, staticThrust_N: propStaticThrust({ power_W: 2e5, diameter_m: 2, density_kgm3: 1.225, figureOfMerit: 0.6 }) };
    const vb = propBlendEndSpeed(base);
    expect(propEffectiveEfficiency({ ...base, airspeed_mps: 0 })).toBe(0);
    let prev = 0;
    for (let k = 1; k <= 100; k++) {
      const e = propEffectiveEfficiency({ ...base, airspeed_mps: (k / 100) * vb });
      expect(e).toBeGreaterThan(prev);
      expect(e).toBeLessThanOrEqual(0.78 + 1e-12);
      prev = e;
    }
    expectClose(prev, 0.78, { rel: 1e-12 });
    expectClose(propEffectiveEfficiency({ ...base, airspeed_mps: vb / 2 }), 0.729 * 0.78, { abs: 1e-3 }, 'at V*');
  });
  it('engineModel: T(0) is the FM static thrust; defaults FM 0.55 piston / 0.70 turboprop (from memory), profile value used when given', () => {
    expect(PROP_FM_PISTON).toBe(0.55);
    expect(PROP_FM_TURBOPROP).toBe(0.7);
    const air = airAt(0, 15);
    for (const a0 of fleet.filter((x) => x.engineType !== 'turbofan')) {
      // The defaults: a profile without its own figure of merit.
      const { propFigureOfMerit: _own, ...a } = a0;
      const e = engineModel({ aircraft: a, air });
      const fm = a.engineType === 'piston' ? 0.55 : 0.7;
      const area = (Math.PI * a.propDiameter_m! ** 2) / 4;
      const expected = Math.pow(fm * e.shaftPower_W!, 2 / 3) * Math.cbrt(2 * air.density_kgm3 * area);
      expectClose(e.thrust(0), expected, { rel: 1e-12 }, a.id);
      expect(e.figureOfMeritDefault).toBe(true);
      expect(e.model).toContain('from memory');
      const custom = engineModel({ aircraft: { ...a, propFigureOfMerit: 0.4 }, air });
      expectClose(custom.thrust(0), Math.pow(0.4 / fm, 2 / 3) * expected, { rel: 1e-12 });
      expect(custom.figureOfMeritDefault).toBe(false);
    }
  });
  it('the demo 1.1 t single: static thrust ≈ 3.08 kN (its profile FM 0.50, 130 kW), and below the static value already at 15 m/s', () => {
    // T0 = FM^(2/3) (2 ρ A P²)^(1/3) = 0.5^(2/3) × (2 × 1.225 × π 0.95² × 130 000²)^(1/3) = 3 085 N (hand value).
    // Before: k_p 0.85 gave 4.27 kN held flat to 19 m/s (min() blend).
    const e = engineModel({ aircraft: byId('kestrel-ut1'), air: airAt(0, 15) });
    expect(e.figureOfMeritDefault).toBe(false);
    expectClose(e.staticThrust_N, 3085, { abs: 5 });
    expect(e.thrust(15)).toBeLessThan(0.95 * e.staticThrust_N);
    expect(e.thrust(15)).toBeLessThan((0.6 * e.shaftPower_W!) / 15);
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
  it('propeller engines: static thrust at rest, η·P/V beyond the blend, lower power at altitude', () => {
    for (const a of fleet.filter((x) => x.engineType !== 'turbofan')) {
      const sl = engineModel({ aircraft: a, air: airAt(0, 15) });
      const high = engineModel({ aircraft: a, air: airAt(2000, 15) });
      expect(sl.thrust(0)).toBe(sl.staticThrust_N);
      expect(sl.kinks_mps.length).toBe(1);
      const vb = sl.kinks_mps[0]!;
      expectClose(sl.thrust(vb + 1), (a.propEfficiency! * sl.shaftPower_W!) / (vb + 1), { rel: 1e-12 });
      expect(sl.thrust(vb / 2)).toBeLessThan((a.propEfficiency! * sl.shaftPower_W!) / (vb / 2));
      expect(high.shaftPower_W!).toBeLessThan(sl.shaftPower_W!);
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

describe('Turbofan flat-rating corner follows the rating (issue 13 item 4; Mattingly §8.1 TR, derived)', () => {
  const base = byId('tern-rj90');
  const strip = { ...base, flatRatingTemp_c: undefined, flatRatingDeltaIsa_k: undefined, flatRatingCornerLapse_kPerKm: undefined };
  const tSls = base.staticThrust_N!;
  it('resolution: ΔT from flatRatingDeltaIsa_k, else flatRatingTemp_c − 15, else 0 (ISA)', () => {
    expect(flatRating({ flatRatingDeltaIsa_k: 12, flatRatingTemp_c: 30 })).toMatchObject({ form: 'isa-delta', deltaIsa_k: 12, source: 'flatRatingDeltaIsa_k' });
    expect(flatRating({ flatRatingTemp_c: 30 })).toMatchObject({ form: 'isa-delta', deltaIsa_k: 15, seaLevelCorner_c: 30, source: 'flatRatingTemp_c' });
    expect(flatRating({})).toMatchObject({ form: 'isa-delta', deltaIsa_k: 0, source: 'default' });
    expect(flatRating({ flatRatingTemp_c: 30, flatRatingCornerLapse_kPerKm: 2 })).toMatchObject({ form: 'corner-lapse', seaLevelCorner_c: 30 });
    expect(flatRating({ flatRatingDeltaIsa_k: 10, flatRatingCornerLapse_kPerKm: 2 })).toMatchObject({ seaLevelCorner_c: 25 });
  });
  it('corner moves with altitude: ISA + 15 → 30 / 23.5 / 17 / 10.5 °C at 0 / 1000 / 2000 / 3000 m (ISA lapse 6.5 K/km); corner-lapse 2 K/km → 30 / 28 / 26 / 24 °C', () => {
    const isaForm = flatRating({ flatRatingTemp_c: 30 });
    const lapse = flatRating({ flatRatingTemp_c: 30, flatRatingCornerLapse_kPerKm: 2 });
    const lapse65 = flatRating({ flatRatingTemp_c: 30, flatRatingCornerLapse_kPerKm: 6.5 });
    [[0, 30, 30], [1000, 23.5, 28], [2000, 17, 26], [3000, 10.5, 24]].forEach(([h, ti, tl]) => {
      expectClose(flatRatingCornerTemp_c(isaForm, h!), ti!, { abs: 1e-9 });
      expectClose(flatRatingCornerTemp_c(lapse, h!), tl!, { abs: 1e-9 });
      expectClose(flatRatingCornerTemp_c(lapse65, h!), ti!, { abs: 1e-9 }, 'a 6.5 K/km lapse is the ISA + ΔT form');
    });
    expectClose(throttleRatioAt(isaForm, 0), 1.0521, { abs: 6e-5 }, 'TR at sea level (§8.1)');
  });
  it('§8.1 check values (TR = 1.05) still hold through engineModel at sea level', () => {
    const a = { ...strip, flatRatingDeltaIsa_k: 1.05 * 288.15 - 288.15 };
    for (const lapse of ['mattingly', 'bartel-young'] as const) {
      const p = { ...a, thrustLapse: lapse };
      expectClose(engineModel({ aircraft: p, air: airAt(0, 15) }).staticThrust_N / tSls, 1.0, { abs: 6e-5 });
      expectClose(engineModel({ aircraft: p, air: airAt(0, 35) }).staticThrust_N / tSls, 0.9612, { abs: 6e-5 });
      expectClose(engineModel({ aircraft: p, air: airAt(0, 45) }).staticThrust_N / tSls, 0.8918, { abs: 6e-5 });
    }
    const m = engineModel({ aircraft: { ...a, thrustLapse: 'mattingly' }, air: airAt(0, 15) });
    expectClose(m.thrust(0.2 * airAt(0, 15).speedOfSound_mps) / tSls, 0.8029, { abs: 6e-5 });
  });
  it('at 1,600 m with ISA + 15: static thrust flat up to the corner (4.6 + 15 = 19.6 °C) and falling above; both lapse models', () => {
    for (const lapse of ['mattingly', 'bartel-young'] as const) {
      for (const a of [{ ...strip, flatRatingDeltaIsa_k: 15 }, { ...strip, flatRatingTemp_c: 30 }]) {
        const p = { ...a, thrustLapse: lapse };
        const at = (t: number): number => engineModel({ aircraft: p, air: airAt(1600, t) }).staticThrust_N;
        const delta = airAt(1600, 0).delta;
        for (const t of [-20, 0, 10, 19.5]) expectClose(at(t), tSls * delta, { rel: 1e-12 }, `${lapse} ${t} °C`);
        expect(at(21)).toBeLessThan(at(19.5));
        expect(at(30)).toBeLessThan(at(21));
        // Above the corner α = δ·(1 − 2·(θ − TR)) at rest (Mattingly §8.1, derived).
        const theta = (30 + 273.15) / 288.15;
        const tr = (19.6 + 273.15) / 288.15;
        expectClose(at(30), tSls * delta * (1 - 2 * (theta - tr)), { rel: 1e-9 });
        expect(engineModel({ aircraft: p, air: airAt(1600, 20) }).flatRatingCorner_c).toBeCloseTo(19.6, 9);
      }
    }
  });
  it('corner-lapse form at 1,600 m, 30 °C − 2 K/km = 26.8 °C: flat to 26.8 °C, falling above', () => {
    const p = { ...strip, flatRatingTemp_c: 30, flatRatingCornerLapse_kPerKm: 2 };
    const at = (t: number): number => engineModel({ aircraft: p, air: airAt(1600, t) }).staticThrust_N;
    expectClose(at(26.7), at(0), { rel: 1e-12 });
    expect(at(27)).toBeLessThan(at(26.7));
    const e = engineModel({ aircraft: p, air: airAt(1600, 20) });
    expect(e.model).toContain('2 K/km');
  });
  it('the Mach corner (kink) sits where θ0 reaches the altitude corner', () => {
    const p = { ...strip, flatRatingDeltaIsa_k: 15, thrustLapse: 'mattingly' as const };
    const air = airAt(1600, 5);
    const e = engineModel({ aircraft: p, air });
    const m = e.kinks_mps[0]! / air.speedOfSound_mps;
    expectClose(air.theta * (1 + 0.2 * m * m), (19.6 + 273.15) / 288.15, { rel: 1e-9 });
    expect(e.model).toContain('flatRatingDeltaIsa_k');
  });
});
