import { siText } from '../../core/notices.js';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import type { AircraftProfile } from '../../core/aircraft.js';
import { standardTemperatureC } from '../../core/atmosphere.js';
import { InputDomainError } from '../../core/errors.js';
import {
  LANDING_SCREEN_HEIGHT_M, analyseLanding, defaultLandingRule, landingBrakingDistance,
  landingRequirement, referenceLandingSpeed, roskamLandingFieldLength, type LandingInput, type LandingOk, type LandingResult,
} from '../../core/landing.js';
import { requiredLength } from '../../core/requirement.js';
import { runStudy } from '../../core/study/run.js';
import type { StudyInput } from '../../core/study/types.js';
import { SURFACES } from '../../core/surface.js';
import demoStudy from '../../examples/demo-study.json' with { type: 'json' };

const demoFleet = demoStudy.aircraft;
import { expectClose } from '../helpers/close.js';

const fleet = demoFleet as unknown as AircraftProfile[];
const byId = (id: string): AircraftProfile => {
  const a = fleet.find((x) => x.id === id);
  if (!a) throw new Error(`demo aircraft ${id} missing`);
  return a;
};

/** Invented test aircraft with round numbers chosen for hand calculation (AR = 8, 16h/b = 1). */
const HAND: AircraftProfile = {
  id: 'hand-jet', name: 'Hand-check jet', certification: 'transport', engineType: 'turbofan', engineCount: 2, gear: 'tricycle',
  mtow_kg: 24000, mlw_kg: 20000, oew_kg: 12000, maxPayload_kg: 5000, maxFuel_kg: 6000,
  wingArea_m2: 50, wingspan_m: 20, wingHeight_m: 1.25, tailHeight_m: 6, mainGearSpan_m: 4,
  clMaxTakeoff: 2.0, clMaxLanding: 2.5, clGround: 0.3, cd0Takeoff: 0.03, cd0Landing: 0.07, oswald: 0.8, engineOutDrag: 0.005,
  staticThrust_N: 30000, bypassRatio: 5, idleThrustFraction: 0.05,
  rollingFriction: 0.02, brakingFrictionDry: 0.4, brakingFrictionWet: 0.2,
  vrFactor: 1.1, vlofFactor: 1.15, v2Factor: 1.2, vrefFactor: 1.23, vmcg_mps: 40,
  rotationTime_s: 3, recognitionTime_s: 1, freeRollTime_s: 2,
};

/** The same aircraft certified as a commuter: it keeps the textbook speed schedule 1.3 : 1.23 : 1.15. */
const TEXTBOOK: AircraftProfile = { ...HAND, certification: 'commuter' };

const base = (a: AircraftProfile, over: Partial<LandingInput> = {}): LandingInput => ({
  aircraft: a, mass_kg: a.mlw_kg, pressureAltitude_m: 0, slope: 0, headwind_mps: 0, surface: 'dry', ...over,
});

function ok(r: LandingResult): LandingOk {
  if (r.status !== 'ok') throw new Error(`expected a landing result, got infeasible: ${r.reason}`);
  return r;
}

describe('Anderson, Aircraft Performance and Design §6.8 — hand-worked landing (derived)', () => {
  // Sea level ISA: ρ = 101325 / (287.0531 × 288.15) = 1.2250 kg/m³; W = 20000 × 9.80665 = 196 133 N.
  // VSR0 = √(2W / (ρ S CLmax)) = √(392 266 / (1.2250 × 50 × 2.5)) = 50.614 m/s
  // VREF = 1.23 × 50.614 = 62.255 m/s; V_f = VREF × 1.23/1.3 = 58.903; V_TD = VREF × 1.15/1.3 = 55.072 m/s
  // Flare: R = V_f² / (0.2 g) = 3469.51 / 1.96133 = 1768.96 m; h_f = R (1 − cos 3°) = 2.4243 m;
  //        s_f = R sin 3° = 92.580 m
  // Approach: s_a = (15.24 − 2.4243) / tan 3° = 244.538 m
  // Free roll: 2 s × 55.072 = 110.143 m
  // Braking (transport → lift dumping, C_L = 0.1): φ = 1/(1+1) = 0.5, K = 1/(π·8·0.8) = 0.049736,
  //   C_D = 0.07 + 0.5 × 0.049736 × 0.01 = 0.0702487; T_idle = 2 × 30 000 × 0.05 = 3000 N
  //   J_T = 0.4 − 3000/196 133 = 0.384704; J_A = ρ S (C_D − 0.4 × 0.1)/(2W) = 4.72315e-6 s²/m²
  //   s_b = 1/(2 g J_A) · ln(1 + J_A V_TD² / J_T) = 394.651 m
  // LD = 244.538 + 92.580 + 110.143 + 394.651 = 841.913 m; required (121.195(b)) = 841.913/0.6 = 1403.19 m
  // Tolerance: relative 1e-5 (the hand values carry six significant figures).
  // The textbook schedule is the one kept for non-transport categories (transports touch down at
  // 0.95 VREF since the landing model revision), so the hand check runs the same aircraft as a commuter
  // with lift dumping on.
  const r = ok(analyseLanding(base(TEXTBOOK, { liftDumping: true })));
  const tol = { rel: 1e-5 };

  it('speeds', () => {
    expectClose(r.speeds.vsr0_mps, 50.6136, tol, 'VSR0');
    expectClose(r.speeds.vref_mps, 62.2548, tol, 'VREF');
    expectClose(r.speeds.flare_mps, 58.9026, tol, 'V_f');
    expectClose(r.speeds.touchdown_mps, 55.0715, tol, 'V_TD');
  });
  it('segments and total', () => {
    expectClose(r.segments.approach_m, 244.538, tol, 'approach');
    expectClose(r.segments.flare_m, 92.5802, tol, 'flare');
    expectClose(r.segments.freeRoll_m, 110.143, tol, 'free roll');
    expectClose(r.segments.braking_m, 394.651, tol, 'braking');
    expectClose(r.distance_m, 841.913, tol, 'LD');
    expectClose(r.braking.jT, 0.384704, tol, 'J_T');
    expectClose(r.braking.jA, 4.72315e-6, tol, 'J_A');
    expect(r.braking.method).toBe('closed-form');
  });
  it('required runway by 121.195(b)', () => {
    expect(r.requirement.rule).toBe('transport');
    expectClose(r.required_m, 1403.19, tol, 'required');
    expect(r.trace.length).toBeGreaterThan(10);
    expect(r.assumptions.join(' ')).toMatch(/Reverse thrust is not credited/);
  });
  it('headwind 10 m/s: air segments scaled by groundspeed/airspeed, braking equals the exact arctan form (derived)', () => {
    // Ground distances: s_a × (62.255 − 10)/62.255 = 205.258 m; s_f × (58.903 − 10)/58.903 = 76.863 m;
    // free roll 2 × 45.072 = 90.143 m. Braking, exact antiderivative with u = V + V_w:
    //   s_b = (1/g) [ ln((J_T + J_A u₂²)/(J_T + J_A u₁²)) / (2 J_A) − V_w (atan(u₂√(J_A/J_T)) − atan(u₁√(J_A/J_T))) / √(J_T J_A) ]
    //   with u₁ = 10, u₂ = 55.072 → 263.6989047331 m (python, and a 200 000-step midpoint sum agrees to 1e-10).
    const w = ok(analyseLanding(base(TEXTBOOK, { headwind_mps: 10, liftDumping: true })));
    expectClose(w.segments.approach_m, 205.258, { rel: 1e-5 }, 'approach');
    expectClose(w.segments.flare_m, 76.8627, { rel: 1e-5 }, 'flare');
    expectClose(w.segments.freeRoll_m, 90.1430, { rel: 1e-5 }, 'free roll');
    expectClose(w.segments.braking_m, 263.6989047331, { rel: 1e-10 }, 'braking');
    expect(w.braking.method).toBe('quadrature');
  });
});

describe('transport landing speeds: touchdown 0.95 VREF, VREF ≥ 1.23 VSR0 (landing model revision)', () => {
  it('a transport touches down at 0.95 VREF (from memory) and flares at the mean of VREF and VTD; the air distance follows', () => {
    const t = ok(analyseLanding(base(HAND)));
    const c = ok(analyseLanding(base(TEXTBOOK, { liftDumping: true })));
    expectClose(t.speeds.vref_mps, c.speeds.vref_mps, { rel: 1e-12 }, 'same VREF');
    expectClose(t.speeds.touchdown_mps / t.speeds.vref_mps, 0.95, { rel: 1e-12 }, 'VTD/VREF');
    expectClose(t.speeds.flare_mps / t.speeds.vref_mps, 0.975, { rel: 1e-12 }, 'flare');
    // Flare radius R = Vf²/(0.2 g) with Vf = 0.975 × 62.2548 = 60.6984 m/s → R = 1878.47 m;
    // s_f = R sin 3° = 98.3115 m; s_a = (15.24 − R(1 − cos 3°)) / tan 3° = 241.674 m (derived from the
    // Anderson §6.8 forms, evaluated in python).
    expectClose(t.segments.flare_m, 98.3115, { rel: 1e-4 }, 'flare distance');
    expectClose(t.segments.approach_m, 241.674, { rel: 1e-4 }, 'approach distance');
    // A faster touchdown: longer free roll and braking than the textbook schedule.
    expect(t.segments.freeRoll_m).toBeGreaterThan(c.segments.freeRoll_m);
    expect(t.segments.braking_m).toBeGreaterThan(c.segments.braking_m);
    expect(t.trace.find((e) => e.key === 'vtd')?.note).toMatch(/from memory/);
  });
  it('a profile touchdownFactor is used as given', () => {
    const t = ok(analyseLanding(base({ ...HAND, touchdownFactor: 0.9 })));
    expectClose(t.speeds.touchdown_mps / t.speeds.vref_mps, 0.9, { rel: 1e-12 });
    expectClose(t.speeds.flare_mps / t.speeds.vref_mps, 0.95, { rel: 1e-12 });
  });
  it('a transport VREF below 1.23 VSR0 is raised to it with a warning (14 CFR 25.125(b)(2)(i)); a commuter keeps its profile value', () => {
    const t = ok(analyseLanding(base({ ...HAND, vrefFactor: 1.18 })));
    expectClose(t.speeds.vref_mps / t.speeds.vsr0_mps, 1.23, { rel: 1e-12 });
    expect(t.warnings.map(siText).join(' ')).toMatch(/VREF raised from 1\.180 VSR0 to 1\.23 VSR0/);
    const c = ok(analyseLanding(base({ ...TEXTBOOK, vrefFactor: 1.18 }, { liftDumping: true })));
    expectClose(c.speeds.vref_mps / c.speeds.vsr0_mps, 1.18, { rel: 1e-12 });
  });
});

describe('Roskam landing field length, S_FL = 0.3 V_A² (ft, kt) — Roskam, Airplane Design Part I, §3.4.4 (from memory)', () => {
  it('130 kt → 0.3 × 130² = 5 070 ft = 1 545.3 m (hand value)', () => {
    const r = roskamLandingFieldLength(130 * 0.514444444);
    expectClose(r.fieldLength_ft, 5070, { rel: 1e-6 });
    expectClose(r.fieldLength_m, 5070 * 0.3048, { rel: 1e-6 });
    expect(() => roskamLandingFieldLength(0)).toThrow(InputDomainError);
  });
  it('the study reports it beside the landing physics for transports only, and it never governs', () => {
    const r = runStudy(demoStudy as unknown as StudyInput);
    const rows = r.scenarios.flatMap((s) => s.rows).filter((x) => x.status === 'ok');
    expect(rows.filter((x) => x.landing?.roskam_m !== undefined).length).toBeGreaterThan(0);
    for (const row of rows) {
      const a = fleet.find((x) => x.id === row.aircraft)!;
      if (a.certification === 'transport') {
        expectClose(row.landing!.roskam_m!, roskamLandingFieldLength(row.landing!.vref_mps).fieldLength_m, { rel: 1e-12 }, row.aircraft);
        expect(row.requiredLanding_m).toBe(row.landing!.required_m);
      } else {
        expect(row.landing!.roskam_m, row.aircraft).toBeUndefined();
      }
    }
  });
});

describe('braking integral: closed form and Gauss–Legendre quadrature (derived)', () => {
  const inp = {
    mass_kg: 20000, density_kgm3: 1.225, wingArea_m2: 50, startAirspeed_mps: 55, headwind_mps: 0,
    brakingFriction: 0.4, liftCoefficient: 0.3, dragCoefficient: 0.07, thrust_N: 3000, slope: 0.01,
  };
  it('agree in still air to 1e-10 relative', () => {
    const a = landingBrakingDistance(inp);
    const b = landingBrakingDistance({ ...inp, method: 'quadrature' });
    if (a.status !== 'ok' || b.status !== 'ok') throw new Error('expected stops');
    expect(a.method).toBe('closed-form');
    expect(b.method).toBe('quadrature');
    expectClose(b.distance_m, a.distance_m, { rel: 1e-10 });
  });
  it('J_A = 0 limit: s = V²/(2 g J_T) (derived)', () => {
    // C_D = μ C_L makes J_A zero: 0.12 = 0.4 × 0.3; J_T = 0.4 − 3000/196133 = 0.3847043
    const r = landingBrakingDistance({ ...inp, dragCoefficient: 0.12, slope: 0 });
    if (r.status !== 'ok') throw new Error('expected a stop');
    expectClose(r.distance_m, (55 * 55) / (2 * 9.80665 * (0.4 - 3000 / (20000 * 9.80665))), { rel: 1e-12 });
  });
  it('tailwind: the drag sign change at zero airspeed is handled and the distance is longer', () => {
    const still = landingBrakingDistance(inp);
    const tail = landingBrakingDistance({ ...inp, headwind_mps: -5 });
    if (still.status !== 'ok' || tail.status !== 'ok') throw new Error('expected stops');
    expect(tail.distance_m).toBeGreaterThan(still.distance_m);
  });
  it('cannot stop: downhill slope with idle thrust beating poor friction is a result with a reason', () => {
    const r = landingBrakingDistance({ ...inp, brakingFriction: 0.05, slope: -0.05, thrust_N: 10000 });
    expect(r.status).toBe('cannot-stop');
    if (r.status === 'cannot-stop') expect(siText(r.reason)).toMatch(/Net deceleration/);
  });
});

describe('14 CFR 121.195(b)-(d) landing factors (check case 19)', () => {
  it('LD 1500 m → 2500 m dry, 2875 m wet for a turbojet [121.195(b),(d)]', () => {
    expectClose(landingRequirement({ distance_m: 1500, rule: 'transport', wet: false, engineType: 'turbofan' }).required_m, 2500, { abs: 1e-9 });
    const wet = landingRequirement({ distance_m: 1500, rule: 'transport', wet: true, engineType: 'turbofan' });
    expectClose(wet.required_m, 2875, { abs: 1e-9 });
    expect(wet.wetIncreaseApplied).toBe(true);
  });
  it('no wet increase for turboprops (121.195(d) is for turbojets)', () => {
    const r = landingRequirement({ distance_m: 1500, dryDistance_m: 1500, rule: 'transport', wet: true, engineType: 'turboprop' });
    expectClose(r.required_m, 2500, { abs: 1e-9 });
    expect(r.wetIncreaseApplied).toBe(false);
  });
  it('turboprop alternate: LD / 0.70 [121.195(c)]', () => {
    expectClose(landingRequirement({ distance_m: 1400, rule: 'turboprop-alternate', wet: false, engineType: 'turboprop' }).required_m, 2000, { abs: 1e-9 });
  });
  it('light rule: distance × factor (no US regulatory factor; default ÷ 0.70, the class B factor of CAT.POL.A.325, from memory)', () => {
    expectClose(landingRequirement({ distance_m: 500, rule: 'light', wet: false, engineType: 'piston' }).required_m, 500 / 0.7, { rel: 1e-12 });
    expectClose(landingRequirement({ distance_m: 500, rule: 'light', wet: false, engineType: 'piston', factor: 1 }).required_m, 500, { abs: 1e-12 });
    expectClose(landingRequirement({ distance_m: 500, rule: 'light', wet: false, engineType: 'piston', factor: 1.43 }).required_m, 715, { abs: 1e-9 });
  });
  it('the rule is applied to the dry distance, and the unfactored wet distance is a floor', () => {
    const r = landingRequirement({ distance_m: 1800, dryDistance_m: 1000, rule: 'transport', wet: true, engineType: 'turboprop' });
    expectClose(r.byRule_m, 1000 / 0.6, { rel: 1e-12 });
    expect(r.required_m).toBe(1800);
    expect(r.governedBy).toBe('surface-distance');
  });
  it('a factor with a non-light rule is refused', () => {
    expect(() => landingRequirement({ distance_m: 1500, rule: 'transport', wet: false, engineType: 'turbofan', factor: 1.2 })).toThrow(InputDomainError);
  });
});

describe('analyseLanding — rules, defaults and options (common practice, 14 CFR 25.125)', () => {
  const tern = byId('tern-rj90');
  it('default rule from the certification basis', () => {
    expect(defaultLandingRule(tern)).toBe('transport');
    expect(defaultLandingRule(byId('plover-ct19'))).toBe('transport');
    expect(defaultLandingRule(byId('kestrel-ut1'))).toBe('light');
  });
  it('wet turbojet: required = 1.15 × dry distance / 0.6', () => {
    const dry = ok(analyseLanding(base(tern)));
    const wet = ok(analyseLanding(base(tern, { surface: 'wet' })));
    expectClose(wet.dryDistance_m, dry.distance_m, { rel: 1e-12 });
    expect(wet.distance_m).toBeGreaterThan(dry.distance_m);
    expectClose(wet.required_m, Math.max((1.15 * dry.distance_m) / 0.6, wet.distance_m), { rel: 1e-12 });
  });
  it('light aircraft: factor from the caller, else the profile, else the planning default ÷ 0.70 (CAT.POL.A.325, from memory)', () => {
    const k = byId('kestrel-ut1');
    const r1 = ok(analyseLanding(base(k)));
    expectClose(r1.required_m, r1.distance_m / 0.7, { rel: 1e-12 });
    const r0 = ok(analyseLanding(base({ ...k, lightAircraftFactor: 1 })));
    expectClose(r0.required_m, r0.distance_m, { rel: 1e-12 });
    const r2 = ok(analyseLanding(base(k, { factor: 1.43 })));
    expectClose(r2.required_m, 1.43 * r2.distance_m, { rel: 1e-12 });
  });
  it('temperature undefined means ISA at the pressure altitude', () => {
    const a = ok(analyseLanding(base(tern, { pressureAltitude_m: 1600 })));
    const b = ok(analyseLanding(base(tern, { pressureAltitude_m: 1600, temperature_c: standardTemperatureC(1600) })));
    expect(a.distance_m).toBe(b.distance_m);
    expectClose(a.conditions.temperature_c, 4.6, { abs: 1e-9 }); // ISA: 15 − 0.0065 × 1600 (derived)
  });
  it('a hot day lengthens the landing and warns that certified data are for standard temperature', () => {
    const isa = ok(analyseLanding(base(tern)));
    const hot = ok(analyseLanding(base(tern, { temperature_c: 35 })));
    expect(hot.distance_m).toBeGreaterThan(isa.distance_m);
    expect(hot.warnings.map(siText).join(' ')).toMatch(/standard temperature/);
  });
  it('uphill in the landing direction shortens, downhill lengthens', () => {
    const flat = ok(analyseLanding(base(tern))).distance_m;
    expect(ok(analyseLanding(base(tern, { slope: 0.01 }))).distance_m).toBeLessThan(flat);
    expect(ok(analyseLanding(base(tern, { slope: -0.01 }))).distance_m).toBeGreaterThan(flat);
  });
  it('1.3 VS basis gives a higher VREF than 1.23 VSR0', () => {
    const a = ok(analyseLanding(base(tern)));
    const b = ok(analyseLanding(base(tern, { vrefBasis: '1.3vs' })));
    expectClose(b.speeds.vref_mps / a.speeds.vref_mps, 1.3 / 1.23, { rel: 1e-12 });
    expect(b.distance_m).toBeGreaterThan(a.distance_m);
  });
  it('without lift dumping the braking run is longer', () => {
    const a = ok(analyseLanding(base(tern)));
    const b = ok(analyseLanding(base(tern, { liftDumping: false })));
    expect(b.segments.braking_m).toBeGreaterThan(a.segments.braking_m);
  });
  it('a steep glide on a fast approach flares from above 50 ft (warning, approach segment zero)', () => {
    const nb = byId('albatross-nb180');
    const r = ok(analyseLanding(base(nb, { pressureAltitude_m: 4500, temperature_c: 40, glideAngle_deg: 6 })));
    expect(r.segments.approach_m).toBe(0);
    expect(r.warnings.map(siText).join(' ')).toMatch(/flare starts above 50 ft/);
    expect(r.segments.flare_m).toBeGreaterThan(0);
    expect(LANDING_SCREEN_HEIGHT_M).toBeCloseTo(15.24, 12);
  });
  it('VREF at MLW, sea level ISA, for the approach category', () => {
    const v = referenceLandingSpeed({ aircraft: tern });
    expectClose(v, ok(analyseLanding(base(tern))).speeds.vref_mps, { rel: 1e-12 });
  });
});

describe('analyseLanding — infeasible results and bad input', () => {
  const k = byId('kestrel-ut1');
  it('headwind at or above the touchdown airspeed is a result with a reason', () => {
    const r = analyseLanding(base(k, { headwind_mps: 40 }));
    expect(r.status).toBe('infeasible');
    if (r.status === 'infeasible') expect(siText(r.reason)).toMatch(/Headwind/);
  });
  it('cannot stop downhill on ice-like friction with high idle thrust', () => {
    const slippery: AircraftProfile = { ...byId('curlew-rt70'), brakingFrictionWet: 0.05, idleThrustFraction: 0.15 };
    const r = analyseLanding(base(slippery, { surface: 'wet', slope: -0.05 }));
    expect(r.status).toBe('infeasible');
    if (r.status === 'infeasible') expect(siText(r.reason)).toMatch(/Net deceleration/);
  });
  it.each([
    ['mass_kg', { mass_kg: Number.NaN }],
    ['mass_kg', { mass_kg: 100 }],
    ['slope', { slope: 0.08 }],
    ['headwind_mps', { headwind_mps: -20 }],
    ['pressureAltitude_m', { pressureAltitude_m: 6000 }],
    ['temperature_c', { temperature_c: 70 }],
    ['glideAngle_deg', { glideAngle_deg: 10 }],
    ['factor', { factor: 3 }],
  ] as const)('%s out of range throws InputDomainError naming the field', (field, over) => {
    try {
      analyseLanding(base(k, over as Partial<LandingInput>));
      expect.fail('no error');
    } catch (e) {
      expect(e).toBeInstanceOf(InputDomainError);
      expect((e as InputDomainError).field).toBe(field);
    }
  });
  it('the turboprop-alternate rule is refused for a turbofan; a factor with the transport rule is refused', () => {
    const tern = byId('tern-rj90');
    expect(() => analyseLanding(base(tern, { rule: 'turboprop-alternate' }))).toThrow(InputDomainError);
    expect(() => analyseLanding(base(tern, { factor: 1.2 }))).toThrow(InputDomainError);
  });
});

describe('requiredLength — the greater side governs (design brief)', () => {
  it('names the governing side', () => {
    expect(requiredLength({ takeoff_m: 2100, landing_m: 1800 })).toEqual({ length_m: 2100, governing: 'takeoff', margin_m: 300 });
    expect(requiredLength({ takeoff_m: 1500, landing_m: 1700 })).toEqual({ length_m: 1700, governing: 'landing', margin_m: -200 });
  });
  it('refuses non-finite input', () => {
    expect(() => requiredLength({ takeoff_m: Number.NaN, landing_m: 1 })).toThrow(InputDomainError);
  });
});

describe('landing properties (fast-check)', () => {
  const aircraftArb = fc.constantFrom(...fleet);
  const runs = { numRuns: 120 };

  it('distance grows with mass', () => {
    fc.assert(fc.property(aircraftArb, fc.double({ min: 0, max: 0.95, noNaN: true }), fc.double({ min: 0, max: 3000, noNaN: true }), (a, f, pa) => {
      const m1 = a.oew_kg + f * (a.mlw_kg - a.oew_kg);
      const m2 = m1 + 0.05 * (a.mlw_kg - a.oew_kg);
      const d1 = ok(analyseLanding(base(a, { mass_kg: m1, pressureAltitude_m: pa }))).distance_m;
      const d2 = ok(analyseLanding(base(a, { mass_kg: m2, pressureAltitude_m: pa }))).distance_m;
      return d2 > d1;
    }), runs);
  });
  it('distance grows with pressure altitude (ISA)', () => {
    fc.assert(fc.property(aircraftArb, fc.double({ min: -400, max: 4000, noNaN: true }), (a, pa) => {
      const d1 = ok(analyseLanding(base(a, { pressureAltitude_m: pa }))).distance_m;
      const d2 = ok(analyseLanding(base(a, { pressureAltitude_m: pa + 400 }))).distance_m;
      return d2 > d1;
    }), runs);
  });
  it('distance grows with tailwind (shrinks with headwind)', () => {
    fc.assert(fc.property(aircraftArb, fc.double({ min: -14, max: 12, noNaN: true }), (a, w) => {
      const d1 = ok(analyseLanding(base(a, { headwind_mps: w + 1 }))).distance_m;
      const d2 = ok(analyseLanding(base(a, { headwind_mps: w }))).distance_m;
      return d2 > d1;
    }), runs);
  });
  it('a wet runway lengthens the distance and never lowers the requirement', () => {
    fc.assert(fc.property(aircraftArb, fc.double({ min: 0, max: 3000, noNaN: true }), fc.double({ min: -0.02, max: 0.02, noNaN: true }), (a, pa, s) => {
      const dry = ok(analyseLanding(base(a, { pressureAltitude_m: pa, slope: s })));
      const wet = ok(analyseLanding(base(a, { pressureAltitude_m: pa, slope: s, surface: 'wet' })));
      return wet.distance_m > dry.distance_m && wet.required_m >= dry.required_m;
    }), runs);
  });
  it('never NaN or Infinity: every result is finite or infeasible with a reason', () => {
    fc.assert(fc.property(
      aircraftArb,
      fc.double({ min: 0, max: 1, noNaN: true }),
      fc.double({ min: -400, max: 4500, noNaN: true }),
      fc.option(fc.double({ min: -60, max: 60, noNaN: true }), { nil: undefined }),
      fc.double({ min: -0.05, max: 0.05, noNaN: true }),
      fc.double({ min: -15, max: 40, noNaN: true }),
      fc.constantFrom(...SURFACES),
      fc.double({ min: 2, max: 6, noNaN: true }),
      (a, f, pa, t, s, w, surf, glide) => {
        const r = analyseLanding({
          aircraft: a, mass_kg: a.oew_kg + f * (a.mtow_kg - a.oew_kg), pressureAltitude_m: pa,
          ...(t !== undefined ? { temperature_c: t } : {}), slope: s, headwind_mps: w, surface: surf, glideAngle_deg: glide,
        });
        if (r.status === 'infeasible') return siText(r.reason).length > 0 && r.trace.every((e) => Number.isFinite(e.value));
        const nums = [r.distance_m, r.required_m, r.dryDistance_m, ...Object.values(r.segments), ...Object.values(r.speeds), ...r.trace.map((e) => e.value)];
        return nums.every((x) => Number.isFinite(x)) && Object.values(r.segments).every((x) => x >= 0) && r.required_m >= r.distance_m;
      },
    ), { numRuns: 200 });
  });
});
