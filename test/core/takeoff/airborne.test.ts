import { describe, expect, it } from 'vitest';
import { airborneDistance, TRANSITION_LOAD_FACTOR } from '../../../core/takeoff/airborne.js';
import { gearDragIncrement } from '../../../core/takeoff/climb.js';
import { expectClose } from '../../helpers/close.js';

/** W 100 kN, S 40 m², CLmax 2.0, ρ 1.225 → VS 45.175 m/s; VLOF 1.1 VS, V2 1.2 VS → V_TR = 1.15 VS (Raymer). */
const base = {
  weight_N: 100000, thrust_N: 25000, density_kgm3: 1.225, wingArea_m2: 40, cd0: 0.04, k: 0.045, clMax: 2.0,
  vs1_mps: Math.sqrt((2 * 100000) / (1.225 * 40 * 2)), screen_m: 10.668, headwind_mps: 0,
};
const speeds = { vlof_mps: 1.1 * base.vs1_mps, v2_mps: 1.2 * base.vs1_mps };

describe('Raymer transition and climb to the screen (Aircraft Design §17.8.3; Raymer §17.8.3; derived values)', () => {
  it('R = V_TR²/(0.2·g) with n = 1.2; arc reaches 35 ft: s = √(R² − (R − h)²)', () => {
    const r = airborneDistance({ ...base, ...speeds });
    expect(TRANSITION_LOAD_FACTOR).toBe(1.2);
    if (!r.ok) throw new Error('expected a climb');
    expectClose(r.speed_mps, 51.9517, { abs: 1e-4 });
    expectClose(r.radius_m, 1376.097, { abs: 1e-3 });
    expectClose(r.gradient, 0.155497, { abs: 1e-6 });
    expectClose(r.transitionHeight_m, 16.7384, { abs: 1e-4 });
    expectClose(r.distance_m, 171.016, { abs: 1e-3 });
  });
  it('low thrust: arc ends below 35 ft, then a straight climb: s = R·sinγ + (h − h_TR)/tanγ', () => {
    const r = airborneDistance({ ...base, ...speeds, thrust_N: 12000 });
    if (!r.ok) throw new Error('expected a climb');
    expectClose(r.gradient, 0.0254971, { abs: 1e-6 });
    expectClose(r.transitionHeight_m, 0.447373, { abs: 1e-5 });
    expectClose(r.distance_m, 435.811, { abs: 1e-3 });
  });
  it('5 m/s headwind shortens the ground distance by the factor (1 − V_w/V_TR)', () => {
    const r = airborneDistance({ ...base, ...speeds, headwind_mps: 5 });
    if (!r.ok) throw new Error('expected a climb');
    expectClose(r.distance_m, 154.557, { abs: 1e-3 });
  });
  it('no climb when thrust does not exceed drag: a reason, not NaN', () => {
    const r = airborneDistance({ ...base, ...speeds, thrust_N: 5000 });
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.gradient).toBeLessThan(0);
  });
});

describe('Landing-gear drag increment, Anderson APD §6.7 (Raymer §12.5 and Torenbeek (1982) App. F, landing-gear drag; derived)', () => {
  it('ΔCD0 = (W/S)·4.5e-5·m^−0.215', () => {
    const m = 40000;
    expectClose(gearDragIncrement({ mass_kg: m, wingArea_m2: 72 }), ((m * 9.80665) / 72) * 4.5e-5 * Math.pow(m, -0.215), { rel: 1e-12 });
    expectClose(gearDragIncrement({ mass_kg: m, wingArea_m2: 72 }), 0.02511, { abs: 1e-4 });
  });
});
