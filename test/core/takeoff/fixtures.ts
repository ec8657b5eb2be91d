/**
 * Shared fixtures of the takeoff tests: the demo fleet (invented aircraft) and an invented hand-check
 * twin jet with round numbers (AR = 8, 16h/b = 1, so φ = 0.5 and K = 1/(π·8·0.8)).
 */
import fc from 'fast-check';
import type { AircraftProfile } from '../../../core/aircraft.js';
import type { TakeoffFeasible, TakeoffInput, TakeoffResult } from '../../../core/takeoff/types.js';
import demoStudy from '../../../examples/demo-study.json' with { type: 'json' };

const demoFleet = demoStudy.aircraft;

export const fleet = demoFleet as unknown as AircraftProfile[];

export const byId = (id: string): AircraftProfile => {
  const a = fleet.find((x) => x.id === id);
  if (!a) throw new Error(`demo aircraft ${id} missing`);
  return a;
};

export const HAND: AircraftProfile = {
  id: 'hand-jet', name: 'Hand-check jet', certification: 'transport', engineType: 'turbofan', engineCount: 2, gear: 'tricycle',
  mtow_kg: 24000, mlw_kg: 20000, oew_kg: 12000, maxPayload_kg: 5000, maxFuel_kg: 6000,
  wingArea_m2: 50, wingspan_m: 20, wingHeight_m: 1.25, tailHeight_m: 6, mainGearSpan_m: 4,
  clMaxTakeoff: 2.0, clMaxLanding: 2.5, clGround: 0.3, cd0Takeoff: 0.04, cd0Landing: 0.07, oswald: 0.8, engineOutDrag: 0.005,
  staticThrust_N: 36000, bypassRatio: 5, flatRatingTemp_c: 30, idleThrustFraction: 0.05,
  rollingFriction: 0.02, brakingFrictionDry: 0.4, brakingFrictionWet: 0.2,
  vrFactor: 1.1, vlofFactor: 1.15, v2Factor: 1.2, vrefFactor: 1.23, vmcg_mps: 40,
  rotationTime_s: 3, recognitionTime_s: 1, freeRollTime_s: 2,
};

/** Takeoff input at sea level ISA, MTOW, calm, level, dry; fields overridable. */
export const at = (a: AircraftProfile, over: Partial<TakeoffInput> = {}): TakeoffInput => ({
  aircraft: a, mass_kg: a.mtow_kg, pressureAltitude_m: 0, temperature_c: 15, slope: 0, headwind_mps: 0,
  surface: 'dry', ...over,
});

export function feasible(r: TakeoffResult): TakeoffFeasible {
  if (!r.feasible) throw new Error(`expected a feasible takeoff, got ${r.reason}: ${r.message}`);
  return r;
}

/** Every number reachable in a value, with its path. */
export function numbers(v: unknown, path = '$', out: [string, number][] = []): [string, number][] {
  if (typeof v === 'number') out.push([path, v]);
  else if (Array.isArray(v)) v.forEach((x, i) => numbers(x, `${path}[${i}]`, out));
  else if (v !== null && typeof v === 'object') for (const [k, x] of Object.entries(v)) numbers(x, `${path}.${k}`, out);
  return out;
}

/**
 * Random valid profiles for property tests: a demo aircraft scaled in thrust or power, wing area,
 * zero-lift drag and CLmax within the given factor ranges.
 */
export function scaledProfile(r: { power: [number, number]; cd0: [number, number] }): fc.Arbitrary<AircraftProfile> {
  return fc.record({
    base: fc.constantFrom(...fleet),
    power: fc.double({ min: r.power[0], max: r.power[1], noNaN: true }),
    wing: fc.double({ min: 0.93, max: 1.1, noNaN: true }),
    cd0: fc.double({ min: r.cd0[0], max: r.cd0[1], noNaN: true }),
    cl: fc.double({ min: 0.95, max: 1.05, noNaN: true }),
  }).map(({ base, power, wing, cd0, cl }) => ({
    ...base,
    id: `${base.id}-scaled`,
    staticThrust_N: base.staticThrust_N === undefined ? undefined : base.staticThrust_N * power,
    shaftPower_W: base.shaftPower_W === undefined ? undefined : base.shaftPower_W * power,
    wingArea_m2: base.wingArea_m2 * wing,
    cd0Takeoff: base.cd0Takeoff * cd0,
    clMaxTakeoff: base.clMaxTakeoff * cl,
    clMaxLanding: base.clMaxLanding * cl,
  }));
}
