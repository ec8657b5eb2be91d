/**
 * Takeoff model revision: speeds per 14 CFR 25.107, the engine-out air segment by the energy method,
 * gear-up and gear-down drag, climb minima by certification basis, the accelerate-stop activation
 * time, and the brake-energy and tyre-speed checks. Each block names its source; a value from memory
 * says so. Demo aircraft are invented (examples/demo-study.json).
 */
import { siText } from '../../../core/notices.js';
import { describe, expect, it } from 'vitest';
import { analyseTakeoff, energyAirborne, engineOutAirInput, MAX_ENGINE_OUT_AIR_M, takeoffSetup } from '../../../core/takeoff/index.js';
import { validateAircraft } from '../../../core/aircraft.js';
import { InputDomainError } from '../../../core/errors.js';
import { G0 } from '../../../core/units.js';
import { expectClose } from '../../helpers/close.js';
import { at, byId, feasible, HAND, numbers } from './fixtures.js';

describe('25.107 speeds: light masses are sized, never dropped (item 1)', () => {
  it('the 78 t-class narrowbody at 50.5 t, sea level ISA, is sized with V1 at its VMCG-based minimum', () => {
    const r = feasible(analyseTakeoff(at(byId('albatross-nb180'), { mass_kg: 50500 })));
    expect(r.required_m).toBeGreaterThan(0);
    expect(r.speeds.v1_mps!).toBeLessThanOrEqual(r.speeds.vr_mps + 1e-9);
    // VR ≥ 1.05 VMCA (25.107(e)(1)(ii)); VMCA defaults to VMCG (marked as derived).
    expect(r.speeds.vmcaSource).toMatch(/derived/);
    expect(r.speeds.vr_mps).toBeGreaterThanOrEqual(1.05 * r.speeds.vmca_mps! - 1e-9);
    expect(r.speeds.v2_mps).toBeGreaterThanOrEqual(1.1 * r.speeds.vmca_mps! - 1e-9);
  });

  it('the commuter at 6.1 t, sea level ISA, is sized (was "cannot operate": V1 window empty)', () => {
    const r = feasible(analyseTakeoff(at(byId('plover-ct19'), { mass_kg: 6100 })));
    expect(r.required_m).toBeGreaterThan(0);
    expect(r.engineOut).toBeDefined();
  });

  it('V2 floor of 25.107(b): a profile V2/VS1 of 1.10 is raised to 1.13 VS1 for a twin (from memory), with a warning', () => {
    const r = feasible(analyseTakeoff(at({ ...HAND, vlofFactor: 1.1, vrFactor: 1.05, v2Factor: 1.1 })));
    expectClose(r.speeds.v2_mps / r.speeds.vs1_mps, 1.13, { rel: 1e-9 });
    expect(r.warnings.map(siText).join(' ')).toMatch(/V2 raised to 1\.13/);
  });

  it('VLOF ≥ 1.10 VMU (25.107(e)(1)(iv), from memory) when the profile gives VMU/VS1', () => {
    const r = feasible(analyseTakeoff(at({ ...HAND, vmuFactor: 1.1 })));
    expectClose(r.speeds.vlof_mps / r.speeds.vs1_mps, 1.21, { rel: 1e-9 });
    expect(r.speeds.v2_mps).toBeGreaterThanOrEqual(r.speeds.vlof_mps);
  });

  it('a profile VMCA is used as given (equivalent airspeed, converted with √σ)', () => {
    const s = takeoffSetup(at({ ...HAND, vmca_mps: 45 }, { pressureAltitude_m: 1500, temperature_c: 20 }));
    expectClose(s.vmca!, 45 / Math.sqrt(s.air.sigma), { rel: 1e-12 });
    expect(s.vmcaSource).toBe('profile');
  });
});

describe('engine-out air segment by the energy method (item 2; Anderson §5.11, 14 CFR 25.111(c)(2))', () => {
  const base = {
    weight_N: 200000, density_kgm3: 1.225, wingArea_m2: 50, k: 1 / (Math.PI * 8 * 0.8),
    wingHeight_m: 1000, wingspan_m: 20, cd0GearDown: 0.05, cd0GearUp: 0.05, retractionTime_s: undefined,
    vlof_mps: 70, v2_mps: 70, screen_m: 10.668, headwind_mps: 0,
  };
  it('constant excess thrust, no ground effect, no speed change: x = h / ((T − D)/W) exactly (derived)', () => {
    const q = 0.5 * 1.225 * 70 * 70;
    const cl = 200000 / (q * 50);
    const drag = q * 50 * (0.05 + base.k * cl * cl);
    const thrust = drag + 0.04 * 200000;
    const r = energyAirborne({ ...base, thrust: () => thrust });
    if (!r.ok) throw new Error('expected ok');
    expectClose(r.airDistance_m, 10.668 / 0.04, { rel: 1e-5 }); // φ = 1 − 1.6·10⁻⁶ at 1 km
  });

  it('the speed gain VLOF → V2 costs (V2² − VLOF²)/(2g) of energy height (derived)', () => {
    const v0 = 68; const v2 = 72;
    const thrust = 0.05 * 200000 + 1e9; // effectively constant excess: use a huge thrust and scale
    const r = energyAirborne({ ...base, vlof_mps: v0, v2_mps: v2, thrust: () => thrust });
    const r0 = energyAirborne({ ...base, vlof_mps: v0, v2_mps: v0, thrust: () => thrust });
    if (!r.ok || !r0.ok) throw new Error('expected ok');
    // Excess ≈ T/W dominates, so the distance ratio is the energy-height ratio.
    const ratio = (10.668 + (v2 * v2 - v0 * v0) / (2 * G0)) / 10.668;
    expectClose(r.airDistance_m / r0.airDistance_m, ratio, { rel: 1e-3 });
  });

  it('ground effect shortens it and gear retraction shortens it (derived: less drag)', () => {
    const thrust = (): number => 26000;
    const noGe = energyAirborne({ ...base, thrust });
    const ge = energyAirborne({ ...base, wingHeight_m: 1.5, thrust });
    const gear = energyAirborne({ ...base, cd0GearDown: 0.07, cd0GearUp: 0.05, retractionTime_s: 2, thrust });
    const down = energyAirborne({ ...base, cd0GearDown: 0.07, cd0GearUp: 0.07, retractionTime_s: undefined, thrust });
    if (!noGe.ok || !ge.ok || !gear.ok || !down.ok) throw new Error('expected ok');
    expect(ge.airDistance_m).toBeLessThan(noGe.airDistance_m);
    expect(gear.airDistance_m).toBeLessThan(down.airDistance_m);
  });

  it('a runaway is a reasoned result: no excess thrust, or beyond the air-distance guard', () => {
    const none = energyAirborne({ ...base, thrust: () => 1000 });
    expect(none.ok).toBe(false);
    if (!none.ok) expect(none.cause).toBe('no-excess-thrust');
    const q = 0.5 * 1.225 * 70 * 70;
    const cl = 200000 / (q * 50);
    const drag = q * 50 * (0.05 + base.k * cl * cl);
    const tiny = energyAirborne({ ...base, thrust: () => drag + 0.001 * 200000 });
    expect(tiny.ok).toBe(false);
    if (!tiny.ok) {
      expect(tiny.cause).toBe('air-distance-guard');
      expect(tiny.airDistance_m).toBeGreaterThan(MAX_ENGINE_OUT_AIR_M);
    }
  });

  it('the regional jet at MTOW and the commuter at 1,346 m / 45 °C never report a kilometres-long "feasible" air segment', () => {
    // Before: 28.9 km (regional jet) and 11.7 km "feasible" (commuter); now bounded or a reason.
    for (const [id, pa, tc] of [['tern-rj90', 0, 15], ['tern-rj90', 1346, 35.4], ['plover-ct19', 1346, 45]] as const) {
      const r = analyseTakeoff(at(byId(id), { pressureAltitude_m: pa, temperature_c: tc }));
      if (r.feasible) {
        expect(r.engineOut!.airborne_m, id).toBeLessThanOrEqual(MAX_ENGINE_OUT_AIR_M);
      } else {
        expect(siText(r.message).length, id).toBeGreaterThan(20);
      }
      for (const [path, v] of numbers(r)) expect(Number.isFinite(v), `${id} ${path}`).toBe(true);
    }
    const hot = analyseTakeoff(at(byId('plover-ct19'), { pressureAltitude_m: 1346, temperature_c: 45 }));
    expect(hot.feasible).toBe(false);
  });

  it('the production integration (12 RK4 steps) agrees with 4,000 steps within 0.1 % on the demo twins', () => {
    for (const id of ['plover-ct19', 'curlew-rt70', 'swift-bj8', 'tern-rj90', 'albatross-nb180']) {
      const s = takeoffSetup(at(byId(id), { mass_kg: 0.9 * byId(id).mtow_kg }));
      const p = energyAirborne(engineOutAirInput(s));
      const f = energyAirborne({ ...engineOutAirInput(s, 4000), maxAir_m: Infinity });
      if (!p.ok || !f.ok) throw new Error(`${id}: expected ok`);
      expectClose(p.airDistance_m, f.airDistance_m, { rel: 1e-3 }, id);
    }
  });
});

describe('gear-up and gear-down takeoff drag (item 3)', () => {
  it('the profile gear-up CD0 is used in the second segment; gear-down in the first segment and on the ground', () => {
    const a = { ...HAND, cd0TakeoffGearUp: 0.03 };
    const r = feasible(analyseTakeoff(at(a)));
    expect(r.climb.cd0GearUpSource).toBe('profile');
    expectClose(r.climb.cd0GearUp, 0.03, { rel: 1e-12 });
    const cleaner = feasible(analyseTakeoff(at({ ...HAND, cd0TakeoffGearUp: 0.025 })));
    expect(cleaner.climb.gradient).toBeGreaterThan(r.climb.gradient);
    // First segment is gear down: unchanged by the gear-up value.
    expectClose(cleaner.climb.firstSegment!.gradient, r.climb.firstSegment!.gradient, { rel: 1e-12 });
    expect(r.climb.firstSegment!.gradient).toBeLessThan(r.climb.gradient);
  });

  it('a gear-up CD0 not below the gear-down CD0 is refused, naming the field', () => {
    expect(() => validateAircraft({ ...HAND, cd0TakeoffGearUp: 0.04 })).toThrow(InputDomainError);
    expect(() => validateAircraft({ ...HAND, cd0TakeoffGearUp: 0.04 })).toThrow(/cd0TakeoffGearUp/);
  });
});

describe('climb minima and the climb-limited mass over both segments (items 6, 7)', () => {
  it('commuter: 2.0 % gear up (23.2120(b)(3), from memory) and a measurably positive first segment', () => {
    const r = feasible(analyseTakeoff(at(byId('plover-ct19'))));
    expect(r.climb.minimum).toBe(0.02);
    expect(r.climb.firstSegment!.minimum).toBe(0);
  });

  it('a first-segment failure with the second segment passing is solved for a mass like the second-segment case', () => {
    // Large gear-down drag, clean gear-up: the first segment limits.
    const a = { ...HAND, cd0Takeoff: 0.09, cd0TakeoffGearUp: 0.02 };
    const input = at(a);
    const r = analyseTakeoff(input);
    expect(r.climb.limited).toBe(true);
    expect(r.climb.limitingSegment).toBe('first');
    expect(r.climb.gradient).toBeGreaterThan(r.climb.minimum);
    const m = r.climb.maxMass_kg!;
    expect(m).toBeLessThan(input.mass_kg);
    const atLimit = analyseTakeoff({ ...input, mass_kg: m });
    expectClose(atLimit.climb.firstSegment!.gradient, 0, { abs: 1e-6 });
  });
});

describe('accelerate-stop activation time and brake/tyre checks (items 9, 11)', () => {
  it('a longer activation time lengthens both stops; braking starts from the highest speed reached (AC 25-7, from memory)', () => {
    const short = feasible(analyseTakeoff(at({ ...HAND, stopActivationTime_s: 0 }, { mass_kg: 18000 })));
    const long = feasible(analyseTakeoff(at({ ...HAND, stopActivationTime_s: 2 }, { mass_kg: 18000 })));
    expect(long.engineOut!.accelerateStopAllEngines_m).toBeGreaterThan(short.engineOut!.accelerateStopAllEngines_m);
    expect(long.engineOut!.brakeSpeed_mps).toBeGreaterThan(long.speeds.v1_mps! - 1e-9);
    expectClose(short.engineOut!.brakeSpeed_mps, short.speeds.v1_mps!, { rel: 1e-9 });
    expect(long.engineOut!.activation_s).toBe(2);
  });

  it('brake energy: V1 capped at VMBE, and a reasoned refusal when VMBE is below the least V1', () => {
    const free = feasible(analyseTakeoff(at(HAND)));
    const e = free.engineOut!.brakeEnergy_J;
    const capped = feasible(analyseTakeoff(at({ ...HAND, maxBrakeEnergy_J: 0.8 * e })));
    expect(capped.engineOut!.brakeEnergy_J).toBeLessThanOrEqual(0.8 * e * (1 + 1e-6));
    const refused = analyseTakeoff(at({ ...HAND, maxBrakeEnergy_J: 0.2 * e }));
    expect(refused.feasible).toBe(false);
    if (!refused.feasible) {
      expect(refused.reason).toBe('brake-energy-limit');
      expect(siText(refused.message)).toMatch(/brakes cannot absorb/);
    }
  });

  it('tyre speed: a lift-off groundspeed above the rating is a reasoned refusal', () => {
    const r0 = feasible(analyseTakeoff(at(HAND)));
    const r = analyseTakeoff(at({ ...HAND, tyreSpeedLimit_mps: r0.speeds.vlof_mps - 1 }));
    expect(r.feasible).toBe(false);
    if (!r.feasible) expect(r.reason).toBe('tyre-speed-limit');
    expect(feasible(analyseTakeoff(at({ ...HAND, tyreSpeedLimit_mps: r0.speeds.vlof_mps + 1 }))).required_m).toBeGreaterThan(0);
  });
});
