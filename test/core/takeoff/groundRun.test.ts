import { describe, expect, it } from 'vitest';
import { G0 } from '../../../core/units.js';
import { runTable, stopTable, takeoffSetup, rollAcceleration, type TakeoffSetup } from '../../../core/takeoff/model.js';
import {
  buildSpeedTable, distanceAt, speedAtTime, timeAt, type SpeedTable,
} from '../../../core/takeoff/quadrature.js';
import { rotationDistance } from '../../../core/takeoff/airborne.js';
import type { TakeoffInput } from '../../../core/takeoff/types.js';
import { expectClose } from '../../helpers/close.js';
import { HAND } from './fixtures.js';

function table(b: ReturnType<typeof buildSpeedTable>): SpeedTable {
  if (!b.ok) throw new Error(`table build failed at ${b.speed_mps} m/s`);
  return b.table;
}

/** Set-up of the hand-check jet with its thrust replaced by a constant (per engine). */
function constantThrust(over: Partial<TakeoffInput>, thrustPerEngine_N: number): TakeoffSetup {
  const s = takeoffSetup({
    aircraft: HAND, mass_kg: HAND.mtow_kg, pressureAltitude_m: 0, temperature_c: 15, slope: 0, headwind_mps: 0,
    surface: 'dry', ...over,
  });
  return { ...s, engine: { ...s.engine, thrust: () => thrustPerEngine_N, kinks_mps: [] } };
}

/** Closed-form constants of Raymer/Gudmundsson (Raymer §17.8; Anderson §6.7): a = g·(K_T + K_A·V²). */
function kConstants(s: TakeoffSetup, thrustTotal_N: number): { kt: number; ka: number } {
  const a = s.aircraft;
  const cl = a.clGround;
  const kt = thrustTotal_N / s.weight_N - s.muRolling * s.cosSlope - s.sinSlope;
  const ka = (s.air.density_kgm3 / (2 * (s.weight_N / s.wingArea_m2)))
    * (s.muRolling * cl - a.cd0Takeoff - s.phi * s.k * cl * cl);
  return { kt, ka };
}

describe('Ground run against the exact closed form, constant thrust and quadratic aerodynamics (Raymer §17.8 / Gudmundsson ch. 17 / Anderson Ex. 6.6; Raymer §17.8; Anderson §6.7 ln form)', () => {
  it('calm, level: s = ln[(K_T + K_A·V²)/K_T]/(2g·K_A) within 0.1 % (achieved ≪ 0.001 %)', () => {
    const s = constantThrust({}, 30000);
    const { kt, ka } = kConstants(s, 60000);
    const t = table(runTable(s, 2, 0));
    for (const v of [0.3 * s.vrG, 0.77 * s.vrG, s.vrG, s.vlofG]) {
      const exact = Math.log((kt + ka * v * v) / kt) / (2 * G0 * ka);
      expectClose(distanceAt(t, v), exact, { rel: 1e-3 }, `distance to ${v.toFixed(2)} m/s`);
      expectClose(distanceAt(t, v), exact, { rel: 1e-8 }, `distance to ${v.toFixed(2)} m/s (tight)`);
      // Time: ∫dV/(g(K_T − |K_A|V²)) = artanh(V·√(|K_A|/K_T))/(g·√(K_T·|K_A|)).
      const c = Math.sqrt(-ka / kt);
      const exactT = Math.atanh(v * c) / (G0 * Math.sqrt(-kt * ka));
      expectClose(timeAt(t, v), exactT, { rel: 1e-8 }, 'time');
    }
  });

  it('uphill 2 % and downhill 3 %: K_T includes −μ·cosθ − sinθ', () => {
    for (const slope of [0.02, -0.03]) {
      const s = constantThrust({ slope }, 30000);
      const { kt, ka } = kConstants(s, 60000);
      const t = table(runTable(s, 2, 0));
      const exact = Math.log((kt + ka * s.vrG * s.vrG) / kt) / (2 * G0 * ka);
      expectClose(distanceAt(t, s.vrG), exact, { rel: 1e-8 }, `slope ${slope}`);
    }
  });

  it('headwind 10 m/s: s = ∫(V_a − V_w)dV_a/a over airspeed (derived closed form)', () => {
    const w = 10;
    const s = constantThrust({ headwind_mps: w }, 30000);
    const { kt, ka } = kConstants(s, 60000);
    const c = Math.sqrt(-ka / kt);
    const F = (va: number): number => Math.log(kt + ka * va * va) / (2 * G0 * ka) - (w * Math.atanh(va * c)) / (G0 * Math.sqrt(-kt * ka));
    const t = table(runTable(s, 2, 0));
    const exact = F(s.vr) - F(w);
    expectClose(distanceAt(t, s.vrG), exact, { rel: 1e-8 });
  });

  it('the acceleration function is the equation of motion term by term (derived)', () => {
    const s = constantThrust({ slope: 0.01 }, 25000);
    const a = rollAcceleration(s, 2, 0);
    const { kt, ka } = kConstants(s, 50000);
    for (const v of [0, 20, 55]) expectClose(a(v), G0 * (kt + ka * v * v), { rel: 1e-12 });
  });
});

describe('Cumulative tables (quadrature over speed): inversion, square-root mapping, failures', () => {
  it('speedAtTime inverts timeAt to 1e-9 m/s', () => {
    const s = takeoffSetup({ aircraft: HAND, mass_kg: 22000, pressureAltitude_m: 500, temperature_c: 25, slope: 0, headwind_mps: -4, surface: 'dry' });
    const t = table(runTable(s, 2, 0));
    for (const v of [0.5, 3.99, 4, 4.01, 20, 50, s.vlofG - 1e-6]) {
      expectClose(speedAtTime(t, timeAt(t, v))!, v, { abs: 1e-9 }, `v = ${v}`);
    }
    expect(speedAtTime(t, t.tCum[t.count]! + 1)).toBeUndefined();
    expect(speedAtTime(t, 0)).toBe(0);
  });

  it('a √V singularity at the start (turbofan lapse at zero airspeed) is integrated to 1e-9 (derived: ∫(1 + √V)dV)', () => {
    // a(V) = 1/(1 + √V) → t(V) = V + (2/3)V^1.5 exactly.
    const b = buildSpeedTable({ accel: (v) => 1 / (1 + Math.sqrt(v)), vEnd: 60, breakpoints: [], zeroAirspeedAt: 0, intervals: 4, minAccel: 0 });
    const t = table(b);
    // Whole intervals carry the Gauss rule's accuracy; inside an interval the interpolant's (≈1e-7).
    for (const v of [0.01, 1, 15, 30, 60]) expectClose(timeAt(t, v), v + (2 / 3) * v ** 1.5, { rel: 1e-9 }, `t(${v})`);
    expectClose(timeAt(t, 17.3), 17.3 + (2 / 3) * 17.3 ** 1.5, { rel: 1e-6 }, 't(17.3)');
  });

  it('a √|V − V0| point inside the range (tailwind) is split and mapped on both sides (derived)', () => {
    const v0 = 5;
    const g = (v: number): number => 1 + Math.sqrt(Math.abs(v - v0));
    const exact = (v: number): number => (v <= v0
      ? v + (2 / 3) * (v0 ** 1.5 - (v0 - v) ** 1.5)
      : v0 + (2 / 3) * v0 ** 1.5 + (v - v0) + (2 / 3) * (v - v0) ** 1.5);
    const t = table(buildSpeedTable({ accel: (v) => 1 / g(v), vEnd: 40, breakpoints: [], zeroAirspeedAt: v0, intervals: 5, minAccel: 0 }));
    for (const v of [1, 4.9, 5, 5.1, 40]) expectClose(timeAt(t, v), exact(v), { rel: 1e-9 }, `t(${v})`);
    expectClose(timeAt(t, 23), exact(23), { rel: 1e-6 }, 't(23)');
  });

  it('kinks listed as breakpoints are integrated exactly (derived: piecewise-linear acceleration)', () => {
    const accel = (v: number): number => (v < 12 ? 2 : 2 - 0.02 * (v - 12));
    const exact = (v: number): number => (v <= 12 ? v / 2 : 6 + Math.log(2 / accel(v)) / 0.02);
    const t = table(buildSpeedTable({ accel, vEnd: 50, breakpoints: [12], intervals: 4, minAccel: 0.01 }));
    expectClose(timeAt(t, 50), exact(50), { rel: 1e-10 });
    expectClose(timeAt(t, 30), exact(30), { rel: 1e-6 });
  });

  it('reports the speed where the acceleration falls below the minimum instead of integrating through it', () => {
    const b = buildSpeedTable({ accel: (v) => 1 - v / 30, vEnd: 40, breakpoints: [], intervals: 4, minAccel: 0.02 });
    expect(b.ok).toBe(false);
    if (!b.ok) {
      expect(b.speed_mps).toBeGreaterThan(29);
      expect(Number.isFinite(b.accel_mps2)).toBe(true);
    }
  });

  it('stop tables: the stopping distance from V of a pure-friction stop is V²/(2μg) (derived)', () => {
    const s = takeoffSetup({ aircraft: { ...HAND, clGround: 0 }, mass_kg: 20000, pressureAltitude_m: 0, temperature_c: 15, slope: 0, headwind_mps: 0, surface: 'dry' });
    const noAir = { ...s, air: { ...s.air, density_kgm3: 0 }, engine: { ...s.engine, idleThrust_N: 0 } };
    const t = table(stopTable(noAir, 2, 0));
    expectClose(distanceAt(t, 40), (40 * 40) / (2 * 0.4 * G0), { rel: 1e-10 });
  });
});

describe('Rotation-time model (Anderson APD Ex. 6.6: N = 3 s; Raymer §17.8; Anderson §6.7)', () => {
  it('is t_R × mean groundspeed, or the equation-of-motion distance when that is longer', () => {
    expectClose(rotationDistance({ vrG_mps: 70, vlofG_mps: 74, rotationTime_s: 3, physics_m: 100 }), 216, { abs: 1e-12 });
    expect(rotationDistance({ vrG_mps: 70, vlofG_mps: 74, rotationTime_s: 3, physics_m: 300 })).toBe(300);
  });
});
