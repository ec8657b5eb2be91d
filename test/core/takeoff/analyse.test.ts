import { siText } from '../../../core/notices.js';
import { describe, expect, it } from 'vitest';
import { InputDomainError } from '../../../core/errors.js';
import { analyseTakeoff, engineFailureAt } from '../../../core/takeoff/index.js';
import { G0 } from '../../../core/units.js';
import { expectClose } from '../../helpers/close.js';
import { at, byId, feasible, fleet, HAND, numbers } from './fixtures.js';

describe('analyseTakeoff on the invented demo fleet (structure and internal consistency; common practice)', () => {
  it('every demo aircraft at sea level ISA, MTOW: feasible, finite, components add up', () => {
    for (const a of fleet) {
      const r = feasible(analyseTakeoff(at(a)));
      for (const [path, v] of numbers(r)) expect(Number.isFinite(v), `${a.id} ${path}`).toBe(true);
      const e = r.allEngines;
      expectClose(e.liftoff_m, e.groundRun_m + e.rotation_m, { rel: 1e-12 }, a.id);
      expectClose(e.toScreen_m, e.liftoff_m + e.airborne_m, { rel: 1e-12 }, a.id);
      expectClose(e.midpoint_m, e.liftoff_m + e.airborne_m / 2, { rel: 1e-12 }, a.id);
      expect(e.groundRun_m).toBeGreaterThan(0);
      expect(r.required_m).toBeGreaterThanOrEqual(e.toScreen_m);
      expect(r.speeds.vr_mps).toBeLessThan(r.speeds.vlof_mps);
      expect(r.methodVersion).toBe('takeoff-2');
      expect(r.empirical.label).toBe('indicative');
      expect(r.trace.length).toBeGreaterThan(20);
    }
  });

  it('transport twin (swift-bj8): balanced V1, required = max(1.15·AEO, continued, accelerate-stop) per 25.113/25.109', () => {
    const r = feasible(analyseTakeoff(at(byId('swift-bj8'))));
    const eo = r.engineOut!;
    expect(eo.v1Limited).toBe('balanced');
    expect(r.speeds.v1Basis).toBe('balanced');
    expectClose(eo.continued_m, eo.accelerateStop_m, { rel: 1e-6 }, 'balanced: go = stop');
    expect(r.speeds.v1_mps!).toBeGreaterThanOrEqual(eo.v1Min_mps);
    expect(r.speeds.v1_mps!).toBeLessThanOrEqual(r.speeds.vr_mps);
    expect(r.speeds.vef_mps!).toBeGreaterThanOrEqual(r.speeds.vmcg_mps!);
    expect(r.speeds.vef_mps!).toBeLessThan(r.speeds.v1_mps!);
    const expected = Math.max(1.15 * r.allEngines.toScreen_m, eo.continued_m, eo.accelerateStop_m);
    expectClose(r.required_m, expected, { rel: 1e-12 });
    expect(['balanced-field', 'all-engines-factored']).toContain(r.governing);
    expectClose(r.allEngines.factored_m, 1.15 * r.allEngines.toScreen_m, { rel: 1e-12 });
    // Declared pieces (25.113): TOD = max(OEI, 1.15·AEO); TOR with clearway uses the midpoints.
    expectClose(r.declared.takeoffDistance_m, Math.max(eo.continued_m, 1.15 * r.allEngines.toScreen_m), { rel: 1e-12 });
    expectClose(r.declared.takeoffRun_m, Math.max(eo.midpoint_m, 1.15 * r.allEngines.midpoint_m), { rel: 1e-12 });
    expect(r.declared.accelerateStop_m).toBe(eo.accelerateStop_m);
    expect(eo.accelerateStop_m).toBe(Math.max(eo.accelerateStopEngineOut_m, eo.accelerateStopAllEngines_m));
    expect(r.climb.case).toBe('engine-out');
    expect(r.climb.minimum).toBe(0.024);
    expect(r.climb.limited).toBe(false);
    // A jet's ground run is well described by the average-force estimate (Anderson §6.7).
    expect(Math.abs(r.allEngines.averageForceDiff_pct)).toBeLessThan(5);
  });

  it('V1 at the balanced solution reproduces the go and stop distances through engineFailureAt', () => {
    const input = at(byId('albatross-nb180'), { pressureAltitude_m: 300, temperature_c: 25 });
    const r = feasible(analyseTakeoff(input));
    const p = engineFailureAt({ ...input, v1_mps: r.speeds.v1_mps! });
    if (!p.feasible) throw new Error(siText(p.message));
    expectClose(p.continued_m, r.engineOut!.continued_m, { rel: 1e-12 });
    expectClose(p.accelerateStop_m, r.engineOut!.accelerateStop_m, { rel: 1e-12 });
    expectClose(p.vef_mps, r.speeds.vef_mps!, { rel: 1e-12 });
  });

  it('normal-category twin (pipit-lt2): all-engines distance to 50 ft governs; engine-failure figures are information', () => {
    const r = feasible(analyseTakeoff(at(byId('pipit-lt2'), { mass_kg: 1700 })));
    expect(r.governing).toBe('all-engines');
    expectClose(r.screenHeight_m, 15.24, { abs: 1e-12 });
    // No profile factor: the light-aircraft planning default × 1.25 (core/operatingRules.ts).
    expectClose(r.required_m, r.allEngines.toScreen_m * 1.25, { rel: 1e-12 });
    expect(r.engineOut).toBeDefined();
    expect(r.declared.accelerateStop_m).toBe(r.engineOut!.accelerateStop_m);
  });

  it('light single (kestrel-ut1, tailwheel): no engine-failure block, distance × light-aircraft factor', () => {
    const a = { ...byId('kestrel-ut1'), lightAircraftFactor: 1.25 };
    const r = feasible(analyseTakeoff(at(a)));
    expect(r.engineOut).toBeUndefined();
    expect(r.speeds.v1Basis).toBe('none');
    expect(r.speeds.v1_mps).toBeUndefined();
    expect(r.climb.case).toBe('all-engines');
    expectClose(r.required_m, 1.25 * r.allEngines.toScreen_m, { rel: 1e-12 });
    expect(r.declared.accelerateStop_m).toBeUndefined();
    expect(r.empirical.roskamMethod).toBe('TOP23');
    expect(r.empirical.torenbeek_m).toBeUndefined();
  });

  it('tailwheel three-point phase: a higher three-point CL (more induced drag) lengthens the ground run', () => {
    const k = byId('kestrel-ut1');
    const lo = feasible(analyseTakeoff(at({ ...k, threePointCl: 0.6 })));
    const hi = feasible(analyseTakeoff(at({ ...k, threePointCl: 1.4 })));
    expect(hi.allEngines.groundRun_m).toBeGreaterThan(lo.allEngines.groundRun_m);
  });

  it('commuter twin (plover-ct19): 35-ft screen and 115 % rule (14 CFR 23.59)', () => {
    const r = feasible(analyseTakeoff(at(byId('plover-ct19'))));
    expectClose(r.screenHeight_m, 10.668, { abs: 1e-12 });
    expectClose(r.allEngines.factored_m, 1.15 * r.allEngines.toScreen_m, { rel: 1e-12 });
    expect(r.required_m).toBeGreaterThanOrEqual(r.allEngines.factored_m);
  });

  it('V1 held at VR reports the unbalanced field length and says which limit binds', () => {
    // A larger engine-out drag weakens the continued takeoff until go exceeds stop even at VR.
    const r = feasible(analyseTakeoff(at({ ...HAND, engineOutDrag: 0.015 })));
    expect(r.engineOut!.v1Limited).toBe('vr');
    expectClose(r.speeds.v1_mps!, r.speeds.vr_mps, { rel: 1e-12 });
    expect(r.engineOut!.continued_m).toBeGreaterThan(r.engineOut!.accelerateStop_m);
    expect(r.engineOut!.balancedField_m).toBe(r.engineOut!.continued_m);
    expect(r.governing).toBe('engine-out');
    expect(r.warnings.map(siText).join(' ')).toMatch(/held at VR/);
  });

  it('V1 held at its VMCG-based minimum when stopping is the harder case', () => {
    const r = feasible(analyseTakeoff(at({ ...HAND, vmcg_mps: 64, brakingFrictionDry: 0.15, brakingFrictionWet: 0.15 })));
    expect(r.engineOut!.v1Limited).toBe('vmcg');
    expectClose(r.speeds.v1_mps!, r.engineOut!.v1Min_mps, { rel: 1e-12 });
    expect(r.engineOut!.accelerateStop_m).toBeGreaterThan(r.engineOut!.continued_m);
    expect(r.governing).toBe('accelerate-stop');
  });

  it('climb-limited: the greatest mass meeting 25.121(b) is found, and there the gradient equals the minimum', () => {
    const input = at(byId('tern-rj90'), { pressureAltitude_m: 1000, temperature_c: 35 });
    const r = analyseTakeoff(input);
    expect(r.climb.limited).toBe(true);
    const m = r.climb.maxMass_kg!;
    expect(m).toBeLessThan(input.mass_kg);
    expect(r.warnings.map(siText).join(' ')).toMatch(/cannot cure/);
    const atLimit = analyseTakeoff({ ...input, mass_kg: m });
    // At the limit the tighter of the two segment margins is zero (25.121(b) 2.4 %, 25.121(a) > 0).
    const margin = Math.min(atLimit.climb.gradient - 0.024, atLimit.climb.firstSegment!.gradient - 0);
    expectClose(margin, 0, { abs: 1e-6 });
    expect(feasible(analyseTakeoff({ ...input, mass_kg: m - 1 })).climb.limited).toBe(false);
  });

  it('the V2 climb gradient is (T − D)/W with the engine-out drag and gear up (Anderson §5.3; derived)', () => {
    // CD0 0.05 keeps the gear-up estimate above its 40 % floor.
    const r = feasible(analyseTakeoff(at({ ...HAND, cd0Takeoff: 0.05 })));
    const rho = 1.225;
    const v2 = r.speeds.v2_mps;
    const w = HAND.mtow_kg * G0;
    const cl = 2.0 / 1.44;
    const k = 1 / (Math.PI * 8 * 0.8);
    const gear = (w / 50) * 4.5e-5 * Math.pow(HAND.mtow_kg, -0.215);
    const drag = 0.5 * rho * v2 * v2 * 50 * (0.05 - gear + 0.005 + k * cl * cl);
    const m = v2 / 340.294;
    const kk = 1 + 0.2 * m * m;
    expect(kk).toBeLessThan(303.15 / 288.15); // below the flat-rating corner: no temperature term
    const thrust = 36000 * kk ** 3.5 * (1 - 0.49 * Math.sqrt(m));
    expectClose(r.climb.gradient, (thrust - drag) / w, { rel: 1e-4 });
    expect(r.warnings.map(siText).join(' ')).not.toMatch(/floor/);
    // With CD0 0.04 the gear increment (0.0241) would leave less than 40 %: the floor binds and is reported.
    expect(feasible(analyseTakeoff(at(HAND))).warnings.map(siText).join(' ')).toMatch(/floor/);
  });

  it('wet runway: longer accelerate-stop, and a warning that the wet-runway rules are not modelled', () => {
    const dry = feasible(analyseTakeoff(at(byId('tern-rj90'))));
    const wet = feasible(analyseTakeoff(at(byId('tern-rj90'), { surface: 'wet' })));
    expect(wet.required_m).toBeGreaterThan(dry.required_m);
    expect(wet.warnings.map(siText).join(' ')).toMatch(/Wet runway/);
  });
});

describe('Infeasible cases are results with a reason (design brief, "What it must refuse")', () => {
  const checkClean = (r: ReturnType<typeof analyseTakeoff>): void => {
    for (const [path, v] of numbers(r)) expect(Number.isFinite(v), path).toBe(true);
    expect(r.feasible).toBe(false);
    if (!r.feasible) expect(siText(r.message).length).toBeGreaterThan(20);
  };

  it('thrust too low: cannot reach lift-off speed', () => {
    const r = analyseTakeoff(at({ ...HAND, staticThrust_N: 2000 }));
    checkClean(r);
    if (!r.feasible) expect(r.reason).toBe('cannot-reach-liftoff');
  });

  it('all engines, thrust below the airborne drag: cannot climb', () => {
    // Very little ground effect drag on the runway (low wing), but the full induced drag in the air.
    const r = analyseTakeoff(at({ ...HAND, wingHeight_m: 0.3, staticThrust_N: 9500 }));
    checkClean(r);
    if (!r.feasible) {
      expect(r.reason).toBe('cannot-climb');
      expect(r.allEngines).toBeUndefined();
    }
  });

  it('engine-out acceleration below resistance: the continued takeoff is impossible', () => {
    const r = analyseTakeoff(at({ ...HAND, engineOutDrag: 0.05, staticThrust_N: 16000 }));
    checkClean(r);
    if (!r.feasible) {
      expect(r.reason).toBe('cannot-continue-engine-out');
      expect(r.allEngines).toBeDefined();
    }
  });

  it('engine-out climb impossible at hot and high: reason plus the climb-limited mass', () => {
    const r = analyseTakeoff(at(byId('tern-rj90'), { pressureAltitude_m: 1600, temperature_c: 38 }));
    checkClean(r);
    if (!r.feasible) {
      expect(r.reason).toBe('cannot-climb-engine-out');
      expect(r.climb.limited).toBe(true);
      expect(r.climb.maxMass_kg!).toBeLessThan(byId('tern-rj90').mtow_kg);
    }
  });

  it('VMCG so high that V1 after recognition exceeds the scheduled VR: VR is raised to V1 (25.107(e)(1)(i)), never dropped', () => {
    // VMCA given low so that only the V1 rule raises VR.
    const r = feasible(analyseTakeoff(at({ ...HAND, vmcg_mps: 68, vmca_mps: 50 })));
    for (const [path, v] of numbers(r)) expect(Number.isFinite(v), path).toBe(true);
    expect(r.speeds.raised.map(siText).join(' ')).toMatch(/VR ≥ V1/);
    expectClose(r.speeds.v1_mps!, r.speeds.vr_mps, { rel: 1e-6 });
    expectClose(r.speeds.v1_mps!, r.engineOut!.v1Min_mps, { rel: 1e-6 });
    expect(r.speeds.vr_mps).toBeGreaterThan(HAND.vrFactor * r.speeds.vs1_mps);
    expect(r.speeds.vlof_mps).toBeGreaterThan(r.speeds.vr_mps);
  });

  it('braking cannot overcome idle thrust on a steep downhill with poor friction: cannot stop', () => {
    const r = analyseTakeoff(at({ ...HAND, brakingFrictionWet: 0.05, idleThrustFraction: 0.15 }, { slope: -0.03, surface: 'wet' }));
    checkClean(r);
    if (!r.feasible) expect(r.reason).toBe('cannot-stop');
  });

  it('a normal-category twin whose engine-out analysis fails stays feasible, with a warning', () => {
    const r = feasible(analyseTakeoff(at({ ...byId('pipit-lt2'), vmcg_mps: 40 })));
    expect(r.engineOut).toBeUndefined();
    expect(r.warnings.map(siText).join(' ')).toMatch(/Engine-failure analysis not available/);
  });
});

describe('Input validation: InputDomainError naming field, value and range', () => {
  const field = (fn: () => unknown): string => {
    try { fn(); } catch (e) {
      if (e instanceof InputDomainError) return e.field;
      throw e;
    }
    throw new Error('expected an InputDomainError');
  };
  it('ranges of the takeoff input', () => {
    const a = byId('tern-rj90');
    expect(field(() => analyseTakeoff(at(a, { slope: 0.05 })))).toBe('slope');
    expect(field(() => analyseTakeoff(at(a, { mass_kg: a.mtow_kg + 1 })))).toBe('mass_kg');
    expect(field(() => analyseTakeoff(at(a, { mass_kg: Number.NaN })))).toBe('mass_kg');
    expect(field(() => analyseTakeoff(at(a, { pressureAltitude_m: 6000 })))).toBe('pressureAltitude_m');
    expect(field(() => analyseTakeoff(at(a, { temperature_c: 70 })))).toBe('temperature_c');
    expect(field(() => analyseTakeoff(at(a, { headwind_mps: -20 })))).toBe('headwind_mps');
    expect(field(() => analyseTakeoff(at(a, { thrustScale: 0 })))).toBe('thrustScale');
    expect(field(() => analyseTakeoff(at(a, { clMaxScale: 2 })))).toBe('clMaxScale');
    expect(field(() => analyseTakeoff(at(a, { surface: 'ice' as never })))).toBe('surface');
  });
  it('headwind above half the stall speed is refused', () => {
    const k = byId('kestrel-ut1');
    expect(field(() => analyseTakeoff(at(k, { headwind_mps: 20 })))).toBe('headwind_mps');
  });
  it('the profile is validated (validateAircraft)', () => {
    expect(field(() => analyseTakeoff(at({ ...HAND, oswald: 2 })))).toBe('aircraft.oswald');
  });
  it('a tailwheel aircraft whose tail-up speed is at or above VLOF is refused', () => {
    const k = byId('kestrel-ut1');
    expect(field(() => analyseTakeoff(at({ ...k, tailUpSpeed_mps: 40 })))).toBe('aircraft.tailUpSpeed_mps');
    // VLOF falls with mass: a tail-up speed fine at MTOW can be refused at a light mass.
    const vlofEasLight = feasible(analyseTakeoff(at(k, { mass_kg: k.oew_kg }))).speeds.vlof_mps;
    expect(field(() => analyseTakeoff(at({ ...k, tailUpSpeed_mps: vlofEasLight }, { mass_kg: k.oew_kg })))).toBe('aircraft.tailUpSpeed_mps');
  });
  it('engineFailureAt: V1 outside the window and single-engine aircraft are refused', () => {
    const a = byId('tern-rj90');
    expect(field(() => engineFailureAt({ ...at(a), v1_mps: 20 }))).toBe('v1_mps');
    expect(field(() => engineFailureAt({ ...at(byId('heron-st1')), v1_mps: 40 }))).toBe('aircraft.engineCount');
  });
});
