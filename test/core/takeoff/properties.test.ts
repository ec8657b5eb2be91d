/**
 * Property tests of the takeoff engine over random valid profiles, derived by scaling the invented
 * demo aircraft (thrust or power, wing area, zero-lift drag, CLmax) and random site conditions.
 * Expected directions are common practice in performance work (ICAO and FAA corrections add length
 * for elevation, temperature, uphill slope and tailwind; headwind shortens).
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { analyseTakeoff, engineFailureAt } from '../../../core/takeoff/index.js';
import type { TakeoffInput, TakeoffResult } from '../../../core/takeoff/types.js';
import { numbers, scaledProfile } from './fixtures.js';

const RUNS = 60;

const arbProfile = scaledProfile({ power: [0.95, 1.25], cd0: [0.9, 1.1] });

interface Case { readonly input: TakeoffInput }

const arbCase: fc.Arbitrary<Case> = fc.record({
  aircraft: arbProfile,
  massF: fc.double({ min: 0.8, max: 0.95, noNaN: true }),
  pa: fc.double({ min: 0, max: 1500, noNaN: true }),
  t: fc.double({ min: -10, max: 35, noNaN: true }),
  slope: fc.double({ min: -0.02, max: 0.02, noNaN: true }),
  wind: fc.double({ min: -8, max: 5, noNaN: true }), // +3 m/s stays below half the lightest stall speed
  surface: fc.constantFrom<'dry' | 'wet' | 'grass-short'>('dry', 'dry', 'wet', 'grass-short'),
}).map(({ aircraft, massF, pa, t, slope, wind, surface }) => ({
  input: {
    aircraft, mass_kg: Math.max(aircraft.oew_kg, massF * aircraft.mtow_kg), pressureAltitude_m: pa, temperature_c: t,
    slope, headwind_mps: wind, surface,
  },
}));

/** Relative slack: the balanced-V1 solve converges to 1e-7 m/s, i.e. ≈1e-8 of the field length. */
const REL = 1e-6;

/** Compares the distances of two results that should be ordered a ≤ b; returns whether both were feasible. */
function ordered(a: TakeoffResult, b: TakeoffResult, what: string, withStop = true): boolean {
  if (!a.feasible || !b.feasible) return false;
  const le = (x: number, y: number, label: string): void => {
    expect(x, `${what}: ${label} ${x} ≤ ${y}`).toBeLessThanOrEqual(y * (1 + REL));
  };
  le(a.allEngines.groundRun_m, b.allEngines.groundRun_m, 'all-engines ground run');
  le(a.allEngines.toScreen_m, b.allEngines.toScreen_m, 'all-engines distance to screen');
  le(a.allEngines.factored_m, b.allEngines.factored_m, 'factored all-engines distance');
  if (!withStop) return true;
  // With V1 held at its VMCG floor the accelerate-stop distance depends on mass and air only weakly and
  // not always monotonically (V1 falls as acceleration falls; braking gains as lift and idle thrust
  // matter less): such pairs are compared on the all-engines distances only.
  if (a.engineOut?.v1Limited === 'vmcg' || b.engineOut?.v1Limited === 'vmcg') return true;
  le(a.required_m, b.required_m, 'required length');
  if (a.engineOut && b.engineOut) le(a.engineOut.balancedField_m, b.engineOut.balancedField_m, 'field length');
  return true;
}

/** Runs a monotonicity property and checks that enough pairs were actually compared. */
function monotone(name: string, change: (c: Case) => [TakeoffInput, TakeoffInput] | undefined, withStop = true): void {
  it(name, () => {
    let compared = 0;
    fc.assert(fc.property(arbCase, (c) => {
      const pair = change(c);
      if (!pair) return;
      if (ordered(analyseTakeoff(pair[0]), analyseTakeoff(pair[1]), name, withStop)) compared++;
    }), { numRuns: RUNS });
    expect(compared).toBeGreaterThan(RUNS / 3);
  });
}

describe('Takeoff distances: monotone properties over random valid profiles (fast-check; common practice)', () => {
  monotone('grow with mass', ({ input }) => [input, { ...input, mass_kg: input.mass_kg * 1.04 }]);
  monotone('grow with pressure altitude', ({ input }) => [input, { ...input, pressureAltitude_m: input.pressureAltitude_m + 300 }]);
  monotone('grow with temperature above the flat rating', ({ input }) => {
    const flat = input.aircraft.flatRatingTemp_c ?? 15;
    const t = Math.min(50, Math.max(input.temperature_c, flat + 0.5));
    return [{ ...input, temperature_c: t }, { ...input, temperature_c: t + 5 }];
  });
  // Uphill, the accelerate-stop distance can shorten (stopping uphill is easier; when braking
  // deceleration is weaker than the takeoff acceleration, the stop gains more than the run loses), so
  // the field length is not monotone in slope: only the all-engines distances are checked here.
  monotone('grow with uphill slope (all-engines distances)', ({ input }) => [input, { ...input, slope: Math.min(0.03, input.slope + 0.008) }], false);
  monotone('grow with tailwind', ({ input }) => [input, { ...input, headwind_mps: input.headwind_mps - 3 }]);
  monotone('shrink with headwind', ({ input }) => [{ ...input, headwind_mps: input.headwind_mps + 3 }, input]);
});

describe('Engine failure: properties over random valid multi-engine profiles (Torenbeek (1982) §5.4 and 14 CFR 25.109/25.113)', () => {
  it('accelerate-stop grows and the continued distance shrinks with V1', () => {
    let compared = 0;
    fc.assert(fc.property(arbCase, fc.double({ min: 0.05, max: 0.95, noNaN: true }), ({ input }, f) => {
      if (input.aircraft.engineCount < 2) return;
      const r = analyseTakeoff(input);
      if (!r.feasible || !r.engineOut) return;
      const lo = r.engineOut.v1Min_mps;
      const hi = r.engineOut.v1Max_mps;
      const v1s = [lo, lo + f * (hi - lo), hi];
      const pts = v1s.map((v1_mps) => engineFailureAt({ ...input, v1_mps }));
      for (let i = 1; i < pts.length; i++) {
        const p = pts[i - 1]!;
        const q = pts[i]!;
        if (!p.feasible || !q.feasible) throw new Error('engine-failure point infeasible inside a feasible window');
        expect(q.accelerateStop_m).toBeGreaterThanOrEqual(p.accelerateStop_m * (1 - REL));
        expect(q.continued_m).toBeLessThanOrEqual(p.continued_m * (1 + REL));
        expect(q.vef_mps).toBeGreaterThan(p.vef_mps);
      }
      compared++;
    }), { numRuns: RUNS });
    expect(compared).toBeGreaterThan(RUNS / 4);
  });

  it('balanced field length ≥ all-engines distance to 35 ft; continued distance ≥ all-engines distance', () => {
    let compared = 0;
    fc.assert(fc.property(arbCase, ({ input }) => {
      const r = analyseTakeoff(input);
      if (!r.feasible || !r.engineOut) return;
      expect(r.engineOut.balancedField_m).toBeGreaterThanOrEqual(r.allEngines.toScreen_m);
      expect(r.engineOut.continued_m).toBeGreaterThanOrEqual(r.allEngines.toScreen_m);
      expect(r.engineOut.liftoff_m).toBeGreaterThanOrEqual(r.allEngines.liftoff_m);
      compared++;
    }), { numRuns: RUNS });
    expect(compared).toBeGreaterThan(RUNS / 4);
  });
});

describe('No NaN or Infinity anywhere (design brief)', () => {
  it('every number in every result is finite, feasible or not, over wide conditions', () => {
    const wide = fc.record({
      aircraft: arbProfile,
      massF: fc.double({ min: 0, max: 1, noNaN: true }),
      pa: fc.double({ min: -400, max: 4500, noNaN: true }),
      t: fc.double({ min: -60, max: 60, noNaN: true }),
      slope: fc.double({ min: -0.03, max: 0.03, noNaN: true }),
      wind: fc.double({ min: -15, max: 10, noNaN: true }),
      thrustScale: fc.double({ min: 0.3, max: 2, noNaN: true }),
    });
    fc.assert(fc.property(wide, ({ aircraft, massF, pa, t, slope, wind, thrustScale }) => {
      const mass = aircraft.oew_kg + massF * (aircraft.mtow_kg - aircraft.oew_kg);
      let r: TakeoffResult;
      try {
        r = analyseTakeoff({ aircraft, mass_kg: mass, pressureAltitude_m: pa, temperature_c: t, slope, headwind_mps: wind, surface: 'dry', thrustScale });
      } catch (e) {
        // Only refusals of the wind or the tail-up speed at this mass are expected here.
        expect((e as { field?: string }).field).toMatch(/headwind_mps|tailUpSpeed_mps/);
        return;
      }
      for (const [path, v] of numbers(r)) expect(Number.isFinite(v), path).toBe(true);
      if (r.feasible) expect(r.required_m).toBeGreaterThan(0);
    }), { numRuns: 150 });
  });
});
