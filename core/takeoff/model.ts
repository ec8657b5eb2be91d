/**
 * Takeoff set-up and ground forces: input validation, air, speeds, aerodynamic coefficients and the
 * acceleration along the runway for each ground configuration.
 *
 * Equation of motion on the ground (Raymer, *Aircraft Design: A Conceptual Approach*, §17.8;
 * Gudmundsson, *General Aviation Aircraft Design*, ch. 17, eqs 17.4–17.5; Raymer §17.8; Anderson §6.7):
 *   m·dV/dt = T − D − μ·(W·cosθ − L) − W·sinθ        (θ = runway slope angle, + uphill)
 *   L = ½ρV_a²·S·C_L,   D = ½ρV_a|V_a|·S·(C_D0 + ΔC_D0 + φ·K·C_L²),   K = 1/(π·AR·e)
 *   φ = (16h/b)²/(1 + (16h/b)²) (ground effect; Anderson, *Aircraft Performance and Design*, Ex. 6.6)
 * V is the groundspeed, V_a = V + V_w the airspeed (V_w + headwind). The wheel load W·cosθ − L is
 * never taken below zero. Tailwheel aircraft run in the three-point attitude (threePointCl) until the
 * tail-up airspeed, then at clGround. Stop phases: braking friction on the wheel load, idle thrust on
 * the operating engines, none on the failed one; transport-category aircraft dump lift
 * (C_L = min(clGround, 0.1), ΔC_D0 = +0.02; Torenbeek (1982) §5.4 and 14 CFR 25.109/25.113, ΔC_D0 from memory).
 *
 * Speeds (14 CFR 25.107; speedSchedule): VS1 = √(2W/(ρ·S·CLmax)) (true airspeed at the site density);
 * VR = max(vrFactor·VS1, 1.05·VMCA, V1) — V1 enters when the VMCG-based V1 minimum exceeds the
 * scheduled VR, and the engine then re-runs with VR raised; VLOF = VR + (vlofFactor − vrFactor)·VS1,
 * at least 1.10·VMU; V2 = max(VR + (v2Factor − vrFactor)·VS1 (VR plus the scheduled speed gain to the
 * screen), the 25.107(b) stall floor, 1.10·VMCA, VLOF). VMCA is the profile's, or taken equal to VMCG
 * when only VMCG is given (a derived default, marked in the trace). Profile speeds VMCG, VMCA and
 * tail-up speed are equivalent airspeeds, converted with √σ.
 *
 * Validity: pressure altitude −400…4 500 m, |slope| ≤ 3 %, tailwind ≤ 15 m/s, headwind ≤ 25 m/s and
 * below half the stall speed, masses OEW…MTOW.
 */
import { notice, type Notice } from '../notices.js';
import { airAt } from '../atmosphere.js';
import { stallSpeed, validateAircraft, type AircraftProfile, type ValidAircraft } from '../aircraft.js';
import { check, inRange } from '../validate.js';
import { InputDomainError } from '../errors.js';
import { RUNWAY_SLOPE_RANGE } from '../fields.js';
import { friction, SURFACES } from '../surface.js';
import { engineModel, type PropulsionAir, type EngineModel } from '../propulsion.js';
import { G0 } from '../units.js';
import type { TakeoffInput } from './types.js';
import { buildSpeedTable, type TableBuild } from './quadrature.js';
import {
  screenHeight, v2StallFloor, V2_OVER_VMCA, VLOF_OVER_VMU, VR_OVER_VMCA,
} from './regulations.js';
import { gearUpCd0 } from './drag.js';

/** Lift coefficient with lift dumpers deployed (Anderson Ex. 6.7 uses 0.1). */
export const LIFT_DUMP_CL = 0.1;
/** Drag increment of deployed lift dumpers (from memory). */
export const LIFT_DUMP_DCD0 = 0.02;
/** Highest headwind as a fraction of VS1 (beyond it a run from rest is not a meaningful model). */
export const MAX_HEADWIND_FRACTION_OF_VS1 = 0.5;
/** Smallest acceleration (m/s²) accepted in a ground run: below it the run would be tens of km. */
export const MIN_ACCELERATION_MPS2 = 0.02;
/** Target number of quadrature intervals: accelerating runs and stop runs. */
export const RUN_INTERVALS = 6;
export const STOP_INTERVALS = 4;
/** Default time from V1 to the full stopping configuration, s (AC 25-7 demonstrated times; from memory). */
export const DEFAULT_STOP_ACTIVATION_S = 1;
/** Default gear retraction time, s: transport 8, others 6 (from memory). */
export const DEFAULT_GEAR_RETRACTION_TRANSPORT_S = 8;
export const DEFAULT_GEAR_RETRACTION_OTHER_S = 6;

/** Takeoff speeds of one mass and site and the rules that raised them. */
export interface SpeedSchedule {
  readonly vr: number;
  readonly vlof: number;
  readonly v2: number;
  /** Plain words for each rule of 25.107 that raised a scheduled speed. */
  readonly raised: readonly Notice[];
}

/**
 * Speed schedule (true airspeeds) per 14 CFR 25.107 (see the module comment). `vrAtLeast` raises VR to a
 * V1 that the VMCG-based minimum forces above the scheduled VR (25.107(e)(1)(i): VR ≥ V1).
 */
export function speedSchedule(
  a: AircraftProfile, vs1: number, vmca: number | undefined, vrAtLeast?: number,
): SpeedSchedule {
  const raised: Notice[] = [];
  const vrSched = a.vrFactor * vs1;
  let vr = vrSched;
  if (vmca !== undefined && VR_OVER_VMCA * vmca > vr) {
    vr = VR_OVER_VMCA * vmca;
    raised.push(notice('takeoff.vrRaisedVmca')`VR raised to 1.05 × VMCA (14 CFR 25.107(e)(1)(ii)).`);
  }
  if (vrAtLeast !== undefined && vrAtLeast > vr) {
    vr = vrAtLeast;
    raised.push(notice('takeoff.vrRaisedV1')`VR raised to the least V1 that an engine failure at VMCG allows (14 CFR 25.107(e)(1)(i): VR ≥ V1).`);
  }
  const lift = vr - vrSched;
  let vlof = a.vlofFactor * vs1 + lift;
  if (a.vmuFactor !== undefined && vlof < VLOF_OVER_VMU * a.vmuFactor * vs1) {
    vlof = VLOF_OVER_VMU * a.vmuFactor * vs1;
    raised.push(notice('takeoff.vlofRaisedVmu')`VLOF raised to 1.10 × VMU (14 CFR 25.107(e)(1)(iv), from memory).`);
  }
  let v2 = a.v2Factor * vs1 + lift;
  const floor = v2StallFloor(a.certification, a.engineCount);
  if (floor !== undefined && v2 < floor * vs1) {
    v2 = floor * vs1;
    raised.push(notice('takeoff.v2RaisedStall')`V2 raised to ${floor.toFixed(2)} × VS1 (14 CFR 25.107(b), from memory).`);
  }
  if (vmca !== undefined && v2 < V2_OVER_VMCA * vmca) {
    v2 = V2_OVER_VMCA * vmca;
    raised.push(notice('takeoff.v2RaisedVmca')`V2 raised to 1.10 × VMCA (14 CFR 25.107(b)(3), (c)).`);
  }
  if (v2 < vlof) v2 = vlof;
  return { vr, vlof, v2, raised };
}

export const TAKEOFF_INPUT_RANGES = {
  pressureAltitude_m: { min: -400, max: 4500, unit: 'm' },
  temperature_c: { min: -60, max: 60, unit: '°C' },
  slope: RUNWAY_SLOPE_RANGE,
  headwind_mps: { min: -15, max: 25, unit: 'm/s' },
  thrustScale: { min: 0.3, max: 2, unit: '' },
  clMaxScale: { min: 0.7, max: 1.3, unit: '' },
} as const;

export interface TakeoffSetup {
  readonly aircraft: ValidAircraft;
  readonly mass_kg: number;
  readonly weight_N: number;
  readonly air: PropulsionAir & { readonly densityAltitude_m: number; readonly isaDeviation_k: number };
  readonly sinSlope: number;
  readonly cosSlope: number;
  /** + headwind, m/s. */
  readonly wind_mps: number;
  readonly muRolling: number;
  readonly muBraking: number;
  readonly wingArea_m2: number;
  /** Induced-drag factor K = 1/(π·AR·e). */
  readonly k: number;
  /** Ground-effect factor φ on induced drag. */
  readonly phi: number;
  /** CLmax takeoff × clMaxScale. */
  readonly clMax: number;
  readonly engine: EngineModel;
  readonly engineCount: number;
  /** True airspeeds, m/s. */
  readonly vs1: number;
  readonly vr: number;
  readonly vlof: number;
  readonly v2: number;
  /** Groundspeeds at VR and VLOF, m/s. */
  readonly vrG: number;
  readonly vlofG: number;
  readonly vmcg?: number;
  /** Minimum control speed in the air, true airspeed, m/s. */
  readonly vmca?: number;
  /** Where VMCA came from. */
  readonly vmcaSource?: 'profile' | 'equal to VMCG (derived default)';
  /** Rules of 25.107 that raised the scheduled speeds. */
  readonly speedsRaised: readonly Notice[];
  /** Takeoff C_D0, gear up, and its source. */
  readonly cd0GearUp: number;
  readonly cd0GearUpSource: 'profile' | 'derived';
  /** Whether the derived gear-up C_D0 hit its floor. */
  readonly cd0GearUpFloor: boolean;
  /** Gear retraction time, s (undefined: fixed gear). */
  readonly retraction_s: number | undefined;
  /** Time from V1 to the full stopping configuration, s. */
  readonly activation_s: number;
  readonly tailUp?: number;
  readonly screen_m: number;
  readonly liftDump: boolean;
  readonly thrustScale: number;
}

/** Validates the input (InputDomainError naming the field) and prepares the set-up. */
export function takeoffSetup(input: TakeoffInput): TakeoffSetup {
  check(typeof input === 'object' && input !== null, 'input', input, 'a takeoff input object');
  const a = validateAircraft(input.aircraft, 'aircraft');
  const mass = inRange('mass_kg', input.mass_kg, { min: a.oew_kg, max: a.mtow_kg, unit: 'kg' });
  const pa = inRange('pressureAltitude_m', input.pressureAltitude_m, TAKEOFF_INPUT_RANGES.pressureAltitude_m);
  const tc = inRange('temperature_c', input.temperature_c, TAKEOFF_INPUT_RANGES.temperature_c);
  const slope = inRange('slope', input.slope, TAKEOFF_INPUT_RANGES.slope);
  const wind = inRange('headwind_mps', input.headwind_mps, TAKEOFF_INPUT_RANGES.headwind_mps);
  if (!(SURFACES as readonly unknown[]).includes(input.surface)) {
    throw new InputDomainError('surface', input.surface, `one of ${SURFACES.join(', ')}`);
  }
  const thrustScale = inRange('thrustScale', input.thrustScale ?? 1, TAKEOFF_INPUT_RANGES.thrustScale);
  const clMaxScale = inRange('clMaxScale', input.clMaxScale ?? 1, TAKEOFF_INPUT_RANGES.clMaxScale);

  const air = airAt(pa, tc);
  const rho = air.density_kgm3;
  const sqrtSigma = Math.sqrt(air.sigma);
  const weight = mass * G0;
  const clMax = a.clMaxTakeoff * clMaxScale;
  const vs1 = stallSpeed(mass, rho, a.wingArea_m2, clMax, G0);
  const maxWind = MAX_HEADWIND_FRACTION_OF_VS1 * vs1;
  if (wind > maxWind) {
    throw new InputDomainError('headwind_mps', wind, `at most half the takeoff stall speed here (${maxWind.toFixed(1)} m/s)`);
  }
  const vmcg = a.engineCount > 1 && a.vmcg_mps !== undefined ? a.vmcg_mps / sqrtSigma : undefined;
  const vmca = a.engineCount > 1
    ? (a.vmca_mps !== undefined ? a.vmca_mps / sqrtSigma : vmcg)
    : undefined;
  const sp = speedSchedule(a, vs1, vmca);
  const { vr, vlof, v2 } = sp;
  const gu = gearUpCd0(a, mass);
  const retractable = a.engineCount > 1 || a.cd0TakeoffGearUp !== undefined || a.gearRetractionTime_s !== undefined;
  let tailUp: number | undefined;
  if (a.gear === 'tailwheel') {
    tailUp = (a.tailUpSpeed_mps ?? 0) / sqrtSigma;
    const vlofEas = vlof * sqrtSigma;
    check(tailUp < vlof, 'aircraft.tailUpSpeed_mps', a.tailUpSpeed_mps,
      `below the lift-off speed at this mass (${vlofEas.toFixed(1)} m/s equivalent airspeed)`);
  }
  const theta = Math.atan(slope);
  const fr = friction(a, input.surface);
  const ar = (a.wingspan_m * a.wingspan_m) / a.wingArea_m2;
  const hb = (16 * a.wingHeight_m) / a.wingspan_m;
  return {
    aircraft: a,
    mass_kg: mass,
    weight_N: weight,
    air,
    sinSlope: Math.sin(theta),
    cosSlope: Math.cos(theta),
    wind_mps: wind,
    muRolling: fr.rolling,
    muBraking: fr.braking,
    wingArea_m2: a.wingArea_m2,
    k: 1 / (Math.PI * ar * a.oswald),
    phi: (hb * hb) / (1 + hb * hb),
    clMax,
    engine: engineModel({ aircraft: a, air, thrustScale }),
    engineCount: a.engineCount,
    vs1, vr, vlof, v2,
    vrG: vr - wind,
    vlofG: vlof - wind,
    vmcg,
    vmca,
    ...(vmca === undefined ? {} : { vmcaSource: a.vmca_mps !== undefined ? 'profile' as const : 'equal to VMCG (derived default)' as const }),
    speedsRaised: sp.raised,
    cd0GearUp: gu.cd0, cd0GearUpSource: gu.source, cd0GearUpFloor: gu.floorBound,
    retraction_s: retractable
      ? a.gearRetractionTime_s ?? (a.certification === 'transport' ? DEFAULT_GEAR_RETRACTION_TRANSPORT_S : DEFAULT_GEAR_RETRACTION_OTHER_S)
      : undefined,
    activation_s: a.stopActivationTime_s ?? DEFAULT_STOP_ACTIVATION_S,
    tailUp,
    screen_m: screenHeight(a.certification),
    liftDump: a.certification === 'transport',
    thrustScale,
  };
}

/** Same set-up at another mass (speeds rescaled; used by the climb-limited mass solve). */
export function withMass(s: TakeoffSetup, mass_kg: number): TakeoffSetup {
  const vs1 = stallSpeed(mass_kg, s.air.density_kgm3, s.wingArea_m2, s.clMax, G0);
  const a = s.aircraft;
  const sp = speedSchedule(a, vs1, s.vmca);
  const gu = gearUpCd0(a, mass_kg);
  return {
    ...s, mass_kg, weight_N: mass_kg * G0, vs1,
    vr: sp.vr, vlof: sp.vlof, v2: sp.v2, speedsRaised: sp.raised,
    vrG: sp.vr - s.wind_mps, vlofG: sp.vlof - s.wind_mps,
    cd0GearUp: gu.cd0, cd0GearUpSource: gu.source, cd0GearUpFloor: gu.floorBound,
  };
}

/** Same set-up with VR raised to at least `vr` (true airspeed); speeds above it follow. */
export function withVrAtLeast(s: TakeoffSetup, vr: number): TakeoffSetup {
  const sp = speedSchedule(s.aircraft, s.vs1, s.vmca, vr);
  return {
    ...s, vr: sp.vr, vlof: sp.vlof, v2: sp.v2, speedsRaised: sp.raised,
    vrG: sp.vr - s.wind_mps, vlofG: sp.vlof - s.wind_mps,
  };
}

/** Groundspeed breakpoints of the accelerating runs (thrust kinks, tail-up). */
function runBreakpoints(s: TakeoffSetup): number[] {
  const out = s.engine.kinks_mps.map((v) => v - s.wind_mps);
  if (s.tailUp !== undefined) out.push(s.tailUp - s.wind_mps);
  return out;
}

/**
 * Acceleration (m/s²) along the runway as a function of groundspeed, with `operating` engines at
 * takeoff thrust and `extraCd0` added to the takeoff zero-lift drag (engine-out drag).
 */
export function rollAcceleration(s: TakeoffSetup, operating: number, extraCd0: number): (vg: number) => number {
  const a = s.aircraft;
  const halfRhoS = 0.5 * s.air.density_kgm3 * s.wingArea_m2;
  const w = s.weight_N;
  const m = s.mass_kg;
  const wc = w * s.cosSlope;
  const ws = w * s.sinSlope;
  const mu = s.muRolling;
  const clG = a.clGround;
  const cdG = a.cd0Takeoff + extraCd0 + s.phi * s.k * clG * clG;
  const tail = s.tailUp ?? -Infinity;
  const cl3 = a.threePointCl ?? clG;
  const cd3 = a.cd0Takeoff + extraCd0 + s.phi * s.k * cl3 * cl3;
  const wind = s.wind_mps;
  const thrust = s.engine.thrust;
  return (vg: number): number => {
    const va = vg + wind;
    const q = halfRhoS * va * va;
    const threePoint = va < tail;
    const cl = threePoint ? cl3 : clG;
    const cd = threePoint ? cd3 : cdG;
    let wheel = wc - q * cl;
    if (wheel < 0) wheel = 0;
    const drag = (va >= 0 ? q : -q) * cd;
    return (operating * thrust(va) - drag - mu * wheel - ws) / m;
  };
}

/**
 * Deceleration (m/s², positive) while braking, with `idleEngines` at idle thrust and `extraCd0` added
 * (engine-out drag); lift dumping for transport-category aircraft.
 */
export function stopDeceleration(s: TakeoffSetup, idleEngines: number, extraCd0: number): (vg: number) => number {
  const a = s.aircraft;
  const halfRhoS = 0.5 * s.air.density_kgm3 * s.wingArea_m2;
  const wc = s.weight_N * s.cosSlope;
  const ws = s.weight_N * s.sinSlope;
  const m = s.mass_kg;
  const mu = s.muBraking;
  const cl = s.liftDump ? Math.min(a.clGround, LIFT_DUMP_CL) : a.clGround;
  const cd = a.cd0Takeoff + extraCd0 + (s.liftDump ? LIFT_DUMP_DCD0 : 0) + s.phi * s.k * cl * cl;
  const idle = idleEngines * s.engine.idleThrust_N;
  const wind = s.wind_mps;
  return (vg: number): number => {
    const va = vg + wind;
    const q = halfRhoS * va * va;
    let wheel = wc - q * cl;
    if (wheel < 0) wheel = 0;
    const drag = (va >= 0 ? q : -q) * cd;
    return (mu * wheel + drag - idle + ws) / m;
  };
}

/** Cumulative table of an accelerating run from rest to VLOF. */
export function runTable(s: TakeoffSetup, operating: number, extraCd0: number): TableBuild {
  return buildSpeedTable({
    accel: rollAcceleration(s, operating, extraCd0),
    vEnd: s.vlofG,
    breakpoints: [...runBreakpoints(s), s.vrG],
    zeroAirspeedAt: -s.wind_mps >= 0 ? -s.wind_mps : undefined,
    intervals: RUN_INTERVALS,
    minAccel: MIN_ACCELERATION_MPS2,
  });
}

/**
 * Highest groundspeed a stop can begin from: VR plus the speed gained during the activation time at
 * the all-engines acceleration at VR, with a 10 % margin.
 */
export function stopTableEnd(s: TakeoffSetup): number {
  const aVr = rollAcceleration(s, s.engineCount, 0)(s.vrG);
  return s.vrG + 1.1 * Math.max(aVr, 0) * s.activation_s + 0.5;
}

/** Cumulative table of a braking run to rest from any groundspeed up to stopTableEnd. */
export function stopTable(s: TakeoffSetup, idleEngines: number, extraCd0: number): TableBuild {
  return buildSpeedTable({
    accel: stopDeceleration(s, idleEngines, extraCd0),
    vEnd: stopTableEnd(s),
    breakpoints: [],
    zeroAirspeedAt: -s.wind_mps >= 0 ? -s.wind_mps : undefined,
    intervals: STOP_INTERVALS,
    minAccel: MIN_ACCELERATION_MPS2,
  });
}
