/**
 * Multi-point calibration (core/chartFit.ts). Check cases are synthetic planning charts made here by
 * the project's own takeoff model at known parameters (derived: the fit must recover what built the
 * chart), a chart with seeded noise (the residual report must show it), a chart the plausible ranges
 * cannot reach (refused with the reason), and the one-point case against the single-factor
 * calibration (core/calibrate.ts, Brent's root on the same model). Solver: Levenberg–Marquardt
 * (Marquardt, J. SIAM 11 (1963) 431–441) from the ml-levenberg-marquardt package.
 */
import { describe, expect, it } from 'vitest';
import type { AircraftProfile } from '../../core/aircraft.js';
import { calibrateTakeoff } from '../../core/calibrate.js';
import { chooseFitParameters, fitTakeoffChart, profileWithParameters, type ChartPoint, type FitParameterName } from '../../core/chartFit.js';
import { siText } from '../../core/notices.js';
import { analyseTakeoff } from '../../core/takeoff/index.js';
import demoStudy from '../../examples/demo-study.json' with { type: 'json' };
import { expectClose } from '../helpers/close.js';

const fleet = demoStudy.aircraft as unknown as AircraftProfile[];
const byId = (id: string): AircraftProfile => fleet.find((a) => a.id === id)!;

/** A chart drawn by the model itself with the given parameters: mass × pressure altitude × temperature. */
function syntheticChart(a: AircraftProfile, truth: Partial<Record<FitParameterName, number>>, grid: { masses: number[]; altitudes: number[]; temperatures: number[] }): ChartPoint[] {
  const prof = profileWithParameters(a, truth);
  const out: ChartPoint[] = [];
  for (const m of grid.masses) for (const h of grid.altitudes) for (const t of grid.temperatures) {
    const r = analyseTakeoff({
      aircraft: prof, mass_kg: m * a.mtow_kg, pressureAltitude_m: h, temperature_c: t, slope: 0, headwind_mps: 0, surface: 'dry',
      ...(truth.thrustScale === undefined ? {} : { thrustScale: truth.thrustScale }),
      ...(truth.clMaxScale === undefined ? {} : { clMaxScale: truth.clMaxScale }),
    });
    if (r.feasible) out.push({ mass_kg: m * a.mtow_kg, pressureAltitude_m: h, temperature_c: t, length_m: r.required_m });
  }
  return out;
}

const GRID = { masses: [0.8, 0.9, 1.0], altitudes: [0, 1500], temperatures: [0, 15, 30, 40] };
const TRUTH = { thrustScale: 0.92, clMaxScale: 1.05, flatRatingDeltaIsa_k: 10, dragScale: 1.15 };

describe('fit to a synthetic chart made by the model at known parameters (derived)', () => {
  for (const id of ['albatross-nb180', 'tern-rj90']) {
    it(`${id}: recovers thrust, CLmax, flat rating and drag, and reproduces every chart point within 0.5 %`, () => {
      const a = byId(id);
      const chart = syntheticChart(a, TRUTH, GRID);
      expect(chart.length).toBeGreaterThanOrEqual(12);
      const f = fitTakeoffChart({ aircraft: a, points: chart });
      expect(f.status, f.reason ? siText(f.reason) : '').toBe('ok');
      expect(f.parameters.map((p) => p.name)).toEqual(['thrustScale', 'clMaxScale', 'flatRatingDeltaIsa_k', 'dragScale']);
      const got = Object.fromEntries(f.parameters.map((p) => [p.name, p.value]));
      expectClose(got.thrustScale!, TRUTH.thrustScale, { abs: 0.005 }, 'thrust scale');
      expectClose(got.clMaxScale!, TRUTH.clMaxScale, { abs: 0.005 }, 'CLmax scale');
      expectClose(got.flatRatingDeltaIsa_k!, TRUTH.flatRatingDeltaIsa_k, { abs: 0.5 }, 'flat rating ΔT');
      expectClose(got.dragScale!, TRUTH.dragScale, { abs: 0.02 }, 'drag scale');
      for (const p of f.points) {
        expect(Math.abs(p.residual), `${p.mass_kg} kg ${p.pressureAltitude_m} m ${p.temperature_c} °C`).toBeLessThan(0.005);
        expectClose(p.model_m! - p.length_m, p.residual_m!, { abs: 1e-9 }, 'residual in metres');
      }
      expect(f.maxAbs).toBeLessThan(0.005);
    });
  }
});

describe('fit to a noisy chart: the residual report shows the noise', () => {
  it('±1.5 % seeded noise on every point: the fit is accepted, and its residuals carry the noise back', () => {
    const a = byId('albatross-nb180');
    const clean = syntheticChart(a, TRUTH, GRID);
    // Seeded noise (a linear congruential generator, Numerical Recipes §7.1 constants): reproducible.
    let s = 12345;
    const rand = (): number => ((s = (Math.imul(s, 1664525) + 1013904223) >>> 0) / 2 ** 32);
    const noise = clean.map(() => (rand() - 0.5) * 0.03);
    const noisy = clean.map((p, i) => ({ ...p, length_m: p.length_m * (1 + noise[i]!) }));
    const f = fitTakeoffChart({ aircraft: a, points: noisy });
    expect(f.status, f.reason ? siText(f.reason) : '').toBe('ok');
    const rmsNoise = Math.sqrt(noise.reduce((t, n) => t + n * n, 0) / noise.length);
    // Least squares absorbs part of the noise into the parameters; what is left is of its size.
    expect(f.rms).toBeGreaterThan(0.3 * rmsNoise);
    expect(f.rms).toBeLessThan(rmsNoise * 1.05);
    // Each point's residual is about minus its noise (the model sits near the clean chart).
    const corr = f.points.reduce((t, p, i) => t + p.residual * -noise[i]!, 0)
      / Math.sqrt(f.points.reduce((t, p) => t + p.residual ** 2, 0) * noise.reduce((t, n) => t + n * n, 0));
    expect(corr).toBeGreaterThan(0.7);
  });

  it('a tolerance tighter than the noise refuses the fit and names the worst point', () => {
    const a = byId('albatross-nb180');
    const chart = syntheticChart(a, TRUTH, GRID).map((p, i) => ({ ...p, length_m: p.length_m * (i === 3 ? 1.04 : 1) }));
    const f = fitTakeoffChart({ aircraft: a, points: chart, tolerance: 0.01 });
    expect(f.status).toBe('refused');
    expect(f.reason!.code).toBe('chartFit.residualAboveTolerance');
    expect(siText(f.reason!)).toMatch(/more than the 1\.0 % tolerance/);
    expect(f.points).toHaveLength(chart.length);
  });
});

describe('refusals and choices', () => {
  it('a chart 60 % longer than the model can be tuned to is refused: a parameter would leave its plausible range', () => {
    const a = byId('albatross-nb180');
    const chart = syntheticChart(a, {}, GRID).map((p) => ({ ...p, length_m: p.length_m * 1.6 }));
    const f = fitTakeoffChart({ aircraft: a, points: chart });
    expect(f.status).toBe('refused');
    expect(f.reason!.code).toBe('chartFit.parameterAtBound');
    expect(siText(f.reason!)).toMatch(/plausible range/);
  });

  it('parameters follow the points: one point → thrust only; a mass spread adds CLmax; a temperature spread adds the flat rating (turbines); six points add drag', () => {
    const a = byId('albatross-nb180');
    const p = (m: number, t: number): ChartPoint => ({ mass_kg: m * a.mtow_kg, pressureAltitude_m: 0, temperature_c: t, length_m: 2000 });
    expect(chooseFitParameters(a, [p(1, 15)])).toEqual(['thrustScale']);
    expect(chooseFitParameters(a, [p(1, 15), p(0.85, 15)])).toEqual(['thrustScale', 'clMaxScale']);
    expect(chooseFitParameters(a, [p(1, 15), p(0.85, 15), p(1, 35)])).toEqual(['thrustScale', 'clMaxScale', 'flatRatingDeltaIsa_k']);
    expect(chooseFitParameters(a, [p(1, 15), p(0.85, 15), p(1, 35), p(0.9, 30), p(0.95, 20), p(0.8, 0)])).toEqual(['thrustScale', 'clMaxScale', 'flatRatingDeltaIsa_k', 'dragScale']);
    const piston = fleet.find((x) => x.engineType === 'piston')!;
    expect(chooseFitParameters(piston, [p(1, 15), p(1, 35)])).toEqual(['thrustScale']);
  });

  it('the one-point case is the single-factor thrust calibration (same factor within 0.2 %)', () => {
    const a = byId('albatross-nb180');
    const ref = a.reference!.takeoff_m!;
    const one = fitTakeoffChart({ aircraft: a, points: [{ mass_kg: a.mtow_kg, pressureAltitude_m: 0, temperature_c: 15, length_m: ref }] });
    const single = calibrateTakeoff({ aircraft: a, reference_m: ref });
    expect(single.status).toBe('ok');
    expect(one.status, one.reason ? siText(one.reason) : '').toBe('ok');
    if (single.status !== 'ok') return;
    expect(one.parameters.map((p) => p.name)).toEqual(['thrustScale']);
    expectClose(one.parameters[0]!.value, single.factor, { rel: 0.002 }, 'thrust factor');
    expect(Math.abs(one.points[0]!.residual)).toBeLessThan(0.001);
  });

  it('bad input is refused with the field, the value and the allowed range', () => {
    const a = byId('albatross-nb180');
    expect(() => fitTakeoffChart({ aircraft: a, points: [] })).toThrow(/points: .*1 to 400 chart points/);
    expect(() => fitTakeoffChart({ aircraft: a, points: [{ mass_kg: 1, pressureAltitude_m: 0, temperature_c: 15, length_m: 2000 }] })).toThrow(/points\[0\]\.mass_kg/);
    expect(() => fitTakeoffChart({ aircraft: a, points: [{ mass_kg: a.mtow_kg, pressureAltitude_m: 0, temperature_c: 15, length_m: 2000 }], parameters: ['thrustScale', 'dragScale'] }))
      .toThrow(/parameters: .*no more than the points/);
  });
});
