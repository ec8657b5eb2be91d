import { describe, expect, it } from 'vitest';
import {
  nm2ToPsf, roskamTop23, roskamTop25, torenbeekBfl, torenbeekGammaMin, torenbeekMeanThrustPropeller,
  torenbeekMeanThrustTurbofan,
} from '../../../core/takeoff/empirical.js';
import { FT, HP, LBF } from '../../../core/units.js';
import { expectClose } from '../../helpers/close.js';

describe('Roskam, Airplane Design Part I, TOP23 — check case 26 (C2; derived)', () => {
  it('W/S 17 lb/ft², W/P 12 lb/hp, σ 0.9075, CLmax 1.6 → TOP23 140.50, S_TOG 866.1 ft, S_TO 1437.7 ft', () => {
    const r = roskamTop23({ wingLoading_lbft2: 17, powerLoading_lbhp: 12, sigma: 0.9075, clMaxTakeoff: 1.6 });
    expectClose(r.top23, 140.5, { abs: 0.005 });
    expectClose(r.groundRun_ft, 866.1, { abs: 0.05 });
    expectClose(r.toObstacle_ft, 1437.7, { abs: 0.05 });
    expectClose(r.toObstacle_m, 1437.7 * FT, { abs: 0.02 });
  });
});

describe('Roskam TOP25 (C2 relation; derived example)', () => {
  it('W/S 100 lb/ft², σ 1, CLmax 2.0, T/W 0.3 → TOP25 166.67, S_TOFL 6250 ft', () => {
    const ws = 100 / nm2ToPsf(1);
    const r = roskamTop25({ wingLoading_Nm2: ws, sigma: 1, clMaxTakeoff: 2, thrustToWeight: 0.3 });
    expectClose(r.top25, 166.6667, { abs: 1e-3 });
    expectClose(r.fieldLength_ft, 6250, { abs: 1e-6 });
  });
  it('1 lb/ft² = 47.880 N/m² (exact factors)', () => {
    expectClose(1 / nm2ToPsf(1), 47.88025898, { rel: 1e-9 });
  });
});

describe('Torenbeek (1982) eq. 5-91 BFL (C2; derived example computed independently)', () => {
  it('W/S 5000 N/m², ρ 1.225, σ 1, CLmax 2.2, T̄/W 0.25, Δγ2 0.02 → 1954.3 m', () => {
    const w = 400000;
    const bfl = torenbeekBfl({
      wingLoading_Nm2: 5000, density_kgm3: 1.225, sigma: 1, clMaxTakeoff: 2.2, meanThrust_N: 0.25 * w, weight_N: w, deltaGamma2: 0.02,
    });
    expectClose(bfl!, 1954.28, { abs: 0.05 });
  });
  it('is undefined when T̄/W does not exceed μ′ = 0.01·CLmax + 0.02', () => {
    expect(torenbeekBfl({ wingLoading_Nm2: 5000, density_kgm3: 1.225, sigma: 1, clMaxTakeoff: 2, meanThrust_N: 0.04, weight_N: 1, deltaGamma2: 0 })).toBeUndefined();
  });
  it('mean thrust: turbofan 0.75·T·(5 + λ)/(4 + λ); propeller 5.75·P·(σND²/P)^(1/3) in lb, hp, ft (from memory)', () => {
    expectClose(torenbeekMeanThrustTurbofan({ staticThrust_N: 100000, bypassRatio: 5 }), 75000 * 10 / 9, { rel: 1e-12 });
    const p = 1000 * HP;
    const d = 10 * FT;
    expectClose(torenbeekMeanThrustPropeller({ power_W: p, sigma: 1, engineCount: 2, diameter_m: d }), 5.75 * 1000 * Math.cbrt(0.2) * LBF, { rel: 1e-12 });
  });
  it('γ2,min by engine count (from memory)', () => {
    expect([2, 3, 4].map(torenbeekGammaMin)).toEqual([0.024, 0.027, 0.03]);
  });
});
