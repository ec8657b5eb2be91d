/**
 * Takeoff performance engine: all-engines takeoff, engine failure (continued takeoff, accelerate-stop,
 * balanced V1), climb gradient at V2, the governing distance by certification basis, the pieces of
 * the declared distances, and empirical cross-checks.
 *
 * Sources (see the modules): Raymer, *Aircraft Design: A Conceptual Approach*, §17.8 (ground roll,
 * transition, climb); Anderson, *Aircraft Performance and Design*, §6.7 (ground roll, average-force
 * estimate at 0.7·VLOF, rotation time); 14 CFR 25.107, 25.109, 25.111, 25.113, 25.121(b) and 23.59 /
 * 23.2115 (speeds, accelerate-stop, 115 % rule, screen heights, climb minima); Torenbeek (1982) eq.
 * 5-91 and Roskam, *Airplane Design* Part I (empirical, indicative). Formulas: docs/methods/takeoff.md.
 *
 * Governing distance: transport and commuter — the greatest of 1.15 × all-engines distance to 35 ft,
 * the engine-out distance to 35 ft and the accelerate-stop distance at the chosen V1 (single-engine:
 * 1.15 × all-engines); normal category — the all-engines distance to 50 ft × lightAircraftFactor
 * (default 1.25, LIGHT_TAKEOFF_FACTOR_DEFAULT)
 * (engine-failure figures shown as information for twins).
 *
 * Validity: see model.ts (input ranges); dry-runway certification rules applied on every surface
 * (the surface changes friction only). Infeasible physics is a result with a reason, never NaN.
 */
import { notice, qty, type Notice } from '../notices.js';
import { LIGHT_TAKEOFF_FACTOR_DEFAULT } from '../operatingRules.js';
import { buildSpeedTable, distanceAt, type SpeedTable } from './quadrature.js';
import {
  MIN_ACCELERATION_MPS2, RUN_INTERVALS, rollAcceleration, runTable, stopTable, takeoffSetup, withVrAtLeast,
  type TakeoffSetup,
} from './model.js';
import { airborneDistance, rotationDistance } from './airborne.js';
import { energyAirborne, MAX_ENGINE_OUT_AIR_M, type EnergyAirInput, type EnergyAirResult } from './energyAirborne.js';
import { balance, failurePoint, v1Minimum, v1Window, type FailureModel } from './balancedField.js';
import { climbChecks, climbLimitedMass } from './climb.js';
import {
  ALL_ENGINES_FACTOR, takeoffDistance25113, takeoffRun25113,
} from './regulations.js';
import {
  nm2ToPsf, roskamTop23, roskamTop25, torenbeekBfl, torenbeekGammaMin,
  torenbeekMeanThrustPropeller, torenbeekMeanThrustTurbofan,
} from './empirical.js';
import { InputDomainError } from '../errors.js';
import { inRange } from '../validate.js';
import { HP, LB } from '../units.js';
import { isWet } from '../surface.js';
import type {
  AllEnginesResult, ClimbResult, DeclaredPieces, EmpiricalResult, EngineOutResult, GoverningCase,
  InfeasibleReason, TakeoffInput, TakeoffResult, TakeoffSpeeds, TakeoffTraceEntry,
} from './types.js';

export type * from './types.js';
export { takeoffSetup, rollAcceleration, stopDeceleration, TAKEOFF_INPUT_RANGES, MIN_ACCELERATION_MPS2 } from './model.js';
export type { TakeoffSetup } from './model.js';
export { climbCapNotices, climbCappedTakeoff, climbLimitedPeak, PEAK_SCAN_SPAN_C, PEAK_SCAN_STEP_C, type CappedTakeoff } from './climbCap.js';
export { airborneDistance, rotationDistance, TRANSITION_LOAD_FACTOR } from './airborne.js';
export { gearDragIncrement, gearUpCd0, climbAtV2, firstSegmentAt, climbChecks } from './climb.js';
export { energyAirborne, MAX_ENGINE_OUT_AIR_M, GEAR_SELECT_DELAY_S, AIR_STEPS } from './energyAirborne.js';
export {
  ALL_ENGINES_FACTOR, STOP_ALLOWANCE_S, TAKEOFF_GOVERNING_LABELS, climbMinimum, firstSegmentMinimum, v2StallFloor,
  screenHeight, takeoffDistance25113, takeoffRun25113,
} from './regulations.js';
export {
  roskamTop23, roskamTop25, torenbeekBfl, torenbeekMeanThrustPropeller, torenbeekMeanThrustTurbofan,
} from './empirical.js';

/** Method version stamp carried by every result. */
export const TAKEOFF_METHOD_VERSION = 'takeoff-2';
/** Largest all-engines air distance to the screen accepted, m (project convention, as the engine-out guard). */
export const MAX_ALL_ENGINES_AIR_M = 1500;
/** Average-force estimate differing from the integration by more than this (%) is flagged. */
export const AVERAGE_FORCE_WARN_PCT = 15;

type Failure =
  | {
    readonly ok: true;
    readonly model: FailureModel;
    readonly rotation_m: number;
    readonly airborne: Extract<EnergyAirResult, { ok: true }> & { readonly floored: boolean };
    readonly lo: number;
    readonly hi: number;
    readonly hiBasis: 'vr' | 'vmbe';
  }
  | { readonly ok: false; readonly reason: InfeasibleReason; readonly message: Notice }
  /** The VMCG-based V1 minimum lies above VR: re-run with VR raised to it (25.107(e)(1)(i)). */
  | { readonly ok: false; readonly raiseVr_mps: number };

const sp = (v: number) => qty.speed(v);
/** An excess-thrust ratio as a percentage with two decimals (a plain figure, the same in every unit system). */
const pct = (x: number): string => `${(x * 100).toFixed(2)} %`;

const NO_LIFTOFF: Notice = notice('takeoff.noLiftoffShort')`The aircraft cannot reach lift-off speed.`;

/** Highest groundspeed searched for a VMCG-based V1 beyond lift-off speed, as a multiple of VLOF. */
const V1_SEARCH_VLOF_MULTIPLE = 1.6;

/** Least V1 groundspeed from VMCG, searching past VLOF when needed; undefined when unreachable. */
function v1MinBeyond(s: TakeoffSetup, oei: SpeedTable, vefMinG: number): number | undefined {
  const rec = s.aircraft.recognitionTime_s;
  const inTable = v1Minimum(oei, vefMinG, rec);
  if (inTable !== undefined) return inTable;
  const ext = buildSpeedTable({
    accel: rollAcceleration(s, s.engineCount - 1, s.aircraft.engineOutDrag),
    vEnd: V1_SEARCH_VLOF_MULTIPLE * s.vlofG,
    breakpoints: [],
    zeroAirspeedAt: -s.wind_mps >= 0 ? -s.wind_mps : undefined,
    intervals: RUN_INTERVALS,
    minAccel: MIN_ACCELERATION_MPS2,
  });
  return ext.ok ? v1Minimum(ext.table, vefMinG, rec) : undefined;
}

/** Input of the engine-out energy-method air segment for a set-up (also used by the bench). */
export function engineOutAirInput(s: TakeoffSetup, steps?: number): EnergyAirInput {
  const a = s.aircraft;
  const operating = s.engineCount - 1;
  return {
    weight_N: s.weight_N, density_kgm3: s.air.density_kgm3, wingArea_m2: s.wingArea_m2, k: s.k,
    wingHeight_m: a.wingHeight_m, wingspan_m: a.wingspan_m,
    cd0GearDown: a.cd0Takeoff + a.engineOutDrag, cd0GearUp: s.cd0GearUp + a.engineOutDrag,
    retractionTime_s: s.retraction_s, thrust: (v) => operating * s.engine.thrust(v),
    vlof_mps: s.vlof, v2_mps: s.v2, screen_m: s.screen_m, headwind_mps: s.wind_mps,
    ...(steps === undefined ? {} : { steps }),
  };
}

/** Builds the engine-failure model (multi-engine) over the shared all-engines table. */
function buildFailure(s: TakeoffSetup, aeo: SpeedTable, aeoAir: ReturnType<typeof airborneDistance>, allowRaise: boolean): Failure {
  const a = s.aircraft;
  const n = s.engineCount;
  const oeiB = runTable(s, n - 1, a.engineOutDrag);
  if (!oeiB.ok) {
    return {
      ok: false, reason: 'cannot-continue-engine-out',
      message: notice('takeoff.engineOutNoLiftoff')`With one engine failed the aircraft cannot accelerate to lift-off speed: resistance exceeds thrust near ${sp(oeiB.speed_mps)} groundspeed.`,
    };
  }
  const oei = oeiB.table;
  const vefMinG = Math.max(0, (s.vmcg ?? 0) - s.wind_mps);
  const v1Min = v1MinBeyond(s, oei, vefMinG);
  if (v1Min === undefined) {
    return {
      ok: false, reason: 'v1-window-empty',
      message: notice('takeoff.noV1BelowSearchLimit')`No decision speed is possible: after an engine failure at VMCG (${sp(s.vmcg ?? 0)}) the aircraft does not reach a decision speed below ${V1_SEARCH_VLOF_MULTIPLE} × VLOF.`,
    };
  }
  if (v1Min > s.vrG) {
    if (allowRaise) return { ok: false, raiseVr_mps: v1Min + s.wind_mps };
    return {
      ok: false, reason: 'v1-window-empty',
      message: notice('takeoff.noV1AboveRaisedVr')`No decision speed is possible: the least V1 after an engine failure at VMCG (${sp(v1Min + s.wind_mps)}) stays above VR (${sp(s.vr)}) even with VR raised.`,
    };
  }
  const energyAir = energyAirborne(engineOutAirInput(s));
  if (!energyAir.ok) {
    const air = energyAir;
    return {
      ok: false, reason: 'cannot-climb-engine-out',
      message: air.cause === 'no-excess-thrust'
        ? notice('takeoff.engineOutNoV2')`With one engine failed the aircraft cannot reach V2 (${sp(s.v2)}) by the screen height: thrust no longer exceeds drag at ${qty.shortLength(air.height_m, 1)} above the runway (excess thrust ratio ${pct(air.excess)}).`
        : notice('takeoff.engineOutAirTooLong')`With one engine failed the air distance from lift-off to the screen height would exceed ${qty.length(MAX_ENGINE_OUT_AIR_M)} (least excess thrust ratio ${pct(air.excess)}): the aircraft is at its climb limit here.`,
    };
  }
  // The energy method has no pull-up arc; fewer engines cannot reach the screen height sooner, so the
  // engine-out air distance is never taken below the all-engines transition arc (traced when it binds).
  const floored = aeoAir.ok && aeoAir.distance_m > energyAir.distance_m;
  const air = { ...energyAir, distance_m: floored && aeoAir.ok ? aeoAir.distance_m : energyAir.distance_m, floored };
  const stopOeiB = stopTable(s, n - 1, a.engineOutDrag);
  const stopAeoB = stopTable(s, n, 0);
  if (!stopOeiB.ok || !stopAeoB.ok) {
    const bad = !stopOeiB.ok ? stopOeiB : stopAeoB.ok ? undefined : stopAeoB;
    return {
      ok: false, reason: 'cannot-stop',
      message: notice('takeoff.cannotStop')`Braking cannot stop the aircraft: idle thrust and the downhill slope exceed braking and drag near ${sp(bad?.speed_mps ?? 0)} groundspeed.`,
    };
  }
  const rotation = rotationDistance({
    vrG_mps: s.vrG, vlofG_mps: s.vlofG, rotationTime_s: a.rotationTime_s,
    physics_m: distanceAt(oei, s.vlofG) - distanceAt(oei, s.vrG),
  });
  const model: FailureModel = {
    aeo, oei, stopOei: stopOeiB.table, stopAeo: stopAeoB.table,
    recognition_s: a.recognitionTime_s, vrG: s.vrG,
    vefMinG,
    goTail_m: rotation + air.distance_m,
    activation_s: s.activation_s,
    accelOei: rollAcceleration(s, n - 1, a.engineOutDrag),
    accelAeo: rollAcceleration(s, n, 0),
    ...(a.maxBrakeEnergy_J === undefined ? {} : { brakeSpeedLimit: Math.sqrt((2 * a.maxBrakeEnergy_J) / s.mass_kg) }),
  };
  const w = v1Window(model);
  if (!w.ok) {
    if (w.cause === 'vmbe') {
      return {
        ok: false, reason: 'brake-energy-limit',
        message: notice('takeoff.brakeEnergyLimit')`The brakes cannot absorb a rejected takeoff: the energy limit (${(a.maxBrakeEnergy_J! / 1e6).toFixed(1)} MJ) allows V1 up to ${sp(w.vmbe + s.wind_mps)}, below the least V1 after an engine failure at VMCG (${sp(w.v1Min + s.wind_mps)}).`,
      };
    }
    return {
      ok: false, reason: 'v1-window-empty',
      message: notice('takeoff.noV1AboveVr')`No decision speed is possible: the least V1 after an engine failure at VMCG exceeds VR (${sp(s.vr)}).`,
    };
  }
  return { ok: true, model, rotation_m: rotation, airborne: air, lo: w.lo, hi: w.hi, hiBasis: w.hiBasis };
}

/** Full takeoff analysis for one aircraft, mass and site condition. */
/** All-engines air segment: the transition arc and climb to the screen height (Raymer). */
function allEnginesAir(s: TakeoffSetup): ReturnType<typeof airborneDistance> {
  const a = s.aircraft;
  return airborneDistance({
    weight_N: s.weight_N, thrust_N: a.engineCount * s.engine.thrust(0.5 * (s.vlof + s.v2)),
    density_kgm3: s.air.density_kgm3, wingArea_m2: s.wingArea_m2, cd0: a.cd0Takeoff, k: s.k,
    clMax: s.clMax, vs1_mps: s.vs1, vlof_mps: s.vlof, v2_mps: s.v2, screen_m: s.screen_m,
    headwind_mps: s.wind_mps,
  });
}

export function analyseTakeoff(input: TakeoffInput): TakeoffResult {
  const s0 = takeoffSetup(input);
  const first = analyseSetup(s0, input, true);
  if ('raiseVr_mps' in first) {
    const second = analyseSetup(withVrAtLeast(s0, first.raiseVr_mps * (1 + 1e-9)), input, false);
    if ('raiseVr_mps' in second) throw new Error('unreachable: VR raised twice');
    return second;
  }
  return first;
}

function climbResultOf(s: TakeoffSetup): ClimbResult {
  const c = climbChecks(s);
  const n = s.engineCount;
  const multi = n > 1;
  const secondLimited = c.second.gradient < c.secondMinimum;
  const firstLimited = c.first !== undefined && c.firstMinimum !== undefined && c.first.gradient < c.firstMinimum;
  const limited = c.margin < 0;
  const maxMass = limited ? climbLimitedMass(s) : undefined;
  const gearUp = multi || s.aircraft.cd0TakeoffGearUp !== undefined;
  const secondLabel = multi ? 'engine-out climb at V2, gear up (second segment)' : 'all-engines climb at V2';
  const firstLabel = 'engine-out climb at lift-off, gear down (first segment)';
  return {
    case: multi ? 'engine-out' : 'all-engines',
    gradient: c.second.gradient, minimum: c.secondMinimum, minimumSource: c.secondSource,
    cd0GearUp: c.second.cd0 - (multi ? s.aircraft.engineOutDrag : 0),
    cd0GearUpSource: gearUp ? s.cd0GearUpSource : 'gear down (fixed gear)',
    ...(c.first === undefined ? {} : {
      firstSegment: { gradient: c.first.gradient, minimum: c.firstMinimum!, minimumSource: c.firstSource!, limited: firstLimited },
    }),
    limited,
    ...(limited ? {
      limitingSegment: secondLimited ? 'second' as const : 'first' as const,
      limitingLabel: secondLimited ? secondLabel : firstLabel,
    } : {}),
    ...(maxMass === undefined ? {} : { maxMass_kg: maxMass }),
  };
}

function analyseSetup(s: TakeoffSetup, input: TakeoffInput, allowRaise: boolean): TakeoffResult | { readonly raiseVr_mps: number } {
  const a = s.aircraft;
  const n = s.engineCount;
  const basis = a.certification;
  const trace: TakeoffTraceEntry[] = [];
  const warnings: Notice[] = [];
  const t = (label: string, value: number, unit: string): void => { trace.push({ label, value, unit }); };

  t('Air density', s.air.density_kgm3, 'kg/m³');
  t('Density ratio σ', s.air.sigma, '');
  t('Density altitude', s.air.densityAltitude_m, 'm');
  t('ISA deviation', s.air.isaDeviation_k, 'K');
  t('Weight', s.weight_N, 'N');
  t('Static thrust per engine', s.engine.staticThrust_N, 'N');
  t('Thrust or power lapse (ratio to sea-level rating)', s.engine.lapse, '');
  if (s.engine.shaftPower_W !== undefined) t('Shaft power per engine', s.engine.shaftPower_W, 'W');
  t('Static thrust-to-weight ratio', (n * s.engine.staticThrust_N) / s.weight_N, '');
  t('Induced-drag factor K', s.k, '');
  t('Ground-effect factor φ', s.phi, '');
  t('Rolling friction', s.muRolling, '');
  t('Braking friction', s.muBraking, '');
  t('Screen height', s.screen_m, 'm');
  t('Takeoff CD0, gear down', a.cd0Takeoff, '');
  t(`Takeoff CD0, gear up (${s.cd0GearUpSource === 'profile' ? 'profile' : 'derived: gear increment, Anderson §6.7'})`, s.cd0GearUp, '');
  if (s.retraction_s !== undefined) t(`Gear retraction time${a.gearRetractionTime_s === undefined ? ' (default, from memory)' : ''}`, s.retraction_s, 's');
  if (n > 1) t(`Stop activation time after V1${a.stopActivationTime_s === undefined ? ' (default, from memory)' : ''}`, s.activation_s, 's');

  if (basis !== 'normal' && isWet(input.surface)) {
    warnings.push(notice('takeoff.wetRulesNotModelled')`Wet runway: friction is reduced, but the wet-runway rules of 14 CFR 25.109/25.113 (15-ft screen, reverse-thrust credit) are not modelled.`);
  }
  warnings.push(...s.speedsRaised);
  const easFactor = Math.sqrt(s.air.sigma);
  const baseSpeeds: TakeoffSpeeds = {
    vs1_mps: s.vs1, vr_mps: s.vr, vlof_mps: s.vlof, v2_mps: s.v2, v1_mps: undefined, vef_mps: undefined,
    vmcg_mps: s.vmcg, v1Basis: 'none', easFactor,
    ...(s.vmca === undefined ? {} : { vmca_mps: s.vmca, vmcaSource: s.vmcaSource }),
    raised: s.speedsRaised,
  };
  t('VS1 (true airspeed)', s.vs1, 'm/s');
  t('VR (true airspeed)', s.vr, 'm/s');
  t('VLOF (true airspeed)', s.vlof, 'm/s');
  t('V2 (true airspeed)', s.v2, 'm/s');
  if (s.vmca !== undefined) t(`VMCA (true airspeed; ${s.vmcaSource})`, s.vmca, 'm/s');

  // Climb checks (needed by every outcome that gets that far).
  const climb = climbResultOf(s);
  t('Climb gradient at V2 (second segment)', climb.gradient, '');
  if (climb.firstSegment) t('Climb gradient at VLOF, gear down (first segment)', climb.firstSegment.gradient, '');
  if (s.cd0GearUpSource === 'derived' && s.cd0GearUpFloor && n > 1) {
    warnings.push(notice('takeoff.gearUpDragFloor')`The derived gear-up drag fell below 40 % of the takeoff zero-lift drag; that floor was used.`);
  }
  if (climb.limited) {
    const seg = climb.limitingSegment === 'first' ? climb.firstSegment! : { gradient: climb.gradient, minimum: climb.minimum };
    warnings.push(
      climb.maxMass_kg !== undefined
        ? notice('takeoff.climbLimited')`Climb-limited: the ${climb.limitingLabel ?? 'climb'} gradient (${pct(seg.gradient)}) is below the minimum (${(seg.minimum * 100).toFixed(1)} %); the greatest mass that meets every climb minimum is ${qty.mass(Math.floor(climb.maxMass_kg))}. A longer runway cannot cure this.`
        : notice('takeoff.climbLimitedAtOew')`Climb-limited: the ${climb.limitingLabel ?? 'climb'} gradient (${pct(seg.gradient)}) is below the minimum (${(seg.minimum * 100).toFixed(1)} %) even at the operating empty mass. A longer runway cannot cure this.`,
    );
  }

  let allEngines: AllEnginesResult | undefined;
  const infeasible = (reason: InfeasibleReason, message: Notice): TakeoffResult => ({
    feasible: false, reason, message, methodVersion: TAKEOFF_METHOD_VERSION, certification: basis,
    screenHeight_m: s.screen_m, speeds: baseSpeeds, climb, allEngines, warnings, trace,
  });

  if (a.tyreSpeedLimit_mps !== undefined && s.vlofG > a.tyreSpeedLimit_mps) {
    return infeasible('tyre-speed-limit',
      notice('takeoff.tyreSpeedLimit')`The lift-off groundspeed (${sp(s.vlofG)}) exceeds the tyre speed rating (${sp(a.tyreSpeedLimit_mps)}) at this mass and site.`);
  }

  // All engines.
  const aeoB = runTable(s, n, 0);
  if (!aeoB.ok) {
    return infeasible('cannot-reach-liftoff',
      notice('takeoff.noLiftoff')`The aircraft cannot reach lift-off speed: resistance exceeds thrust near ${sp(aeoB.speed_mps)} groundspeed (lift-off needs ${sp(s.vlofG)}).`);
  }
  const aeo = aeoB.table;
  const sVr = distanceAt(aeo, s.vrG);
  const sVlof = distanceAt(aeo, s.vlofG);
  const rot = rotationDistance({ vrG_mps: s.vrG, vlofG_mps: s.vlofG, rotationTime_s: a.rotationTime_s, physics_m: sVlof - sVr });
  const air = allEnginesAir(s);
  if (!air.ok) {
    return infeasible('cannot-climb',
      notice('takeoff.noClimbAllEngines')`With all engines the aircraft cannot climb after lift-off (gradient ${pct(air.gradient)}).`);
  }
  if (air.airDistance_m > MAX_ALL_ENGINES_AIR_M) {
    return infeasible('cannot-climb',
      notice('takeoff.allEnginesAirTooLong')`With all engines the air distance from lift-off to the screen height would be ${qty.length(air.airDistance_m)}, beyond the ${qty.length(MAX_ALL_ENGINES_AIR_M)} guard (transition gradient ${pct(air.gradient)}): the aircraft is at its climb limit here.`);
  }
  const liftoff = sVr + rot;
  const toScreen = liftoff + air.distance_m;
  const midpoint = liftoff + air.distance_m / 2;
  // Light aircraft: the profile's factor, else the planning default (core/operatingRules.ts).
  const lightFactor = a.lightAircraftFactor ?? LIGHT_TAKEOFF_FACTOR_DEFAULT;
  const factored = basis === 'normal' ? toScreen * lightFactor : ALL_ENGINES_FACTOR * toScreen;
  const vAvg = 0.7 * s.vlofG;
  const aAvg = Math.max(rollAcceleration(s, n, 0)(vAvg), MIN_ACCELERATION_MPS2);
  const avgForce = (s.vlofG * s.vlofG) / (2 * aAvg);
  const avgDiff = ((avgForce - sVlof) / sVlof) * 100;
  if (Math.abs(avgDiff) > AVERAGE_FORCE_WARN_PCT) {
    warnings.push(notice('takeoff.averageForceDiffers')`The average-force estimate differs from the integrated ground run by ${avgDiff.toFixed(1)} %.`);
  }
  allEngines = {
    groundRun_m: sVr, rotation_m: rot, liftoff_m: liftoff, airborne_m: air.distance_m, toScreen_m: toScreen,
    midpoint_m: midpoint, factored_m: factored, groundRunToVlof_m: sVlof, averageForce_m: avgForce,
    averageForceDiff_pct: avgDiff, transitionGradient: air.gradient,
  };
  t('All engines: ground run to VR', sVr, 'm');
  t('All engines: rotation', rot, 'm');
  t('All engines: airborne to screen', air.distance_m, 'm');
  t('All engines: transition radius', air.radius_m, 'm');
  t('All engines: transition gradient', air.gradient, '');
  t('All engines: to screen', toScreen, 'm');
  t('All engines: equation-of-motion distance to VLOF', sVlof, 'm');
  t('All engines: average-force estimate to VLOF', avgForce, 'm');
  t('All engines: time to VLOF', aeo.tCum[aeo.count]!, 's');
  if (basis === 'normal') t(`Light-aircraft takeoff factor (${a.lightAircraftFactor !== undefined ? 'profile' : 'planning default'})`, lightFactor, '');

  // Engine failure.
  let engineOut: EngineOutResult | undefined;
  let speeds = baseSpeeds;
  if (n > 1) {
    const fm = buildFailure(s, aeo, air, allowRaise);
    if (!fm.ok && 'raiseVr_mps' in fm) return fm;
    if (!fm.ok) {
      if (basis !== 'normal') return infeasible(fm.reason, fm.message);
      warnings.push(notice('takeoff.engineOutUnavailable')`Engine-failure analysis not available: ${fm.message}`);
    } else {
      const b = balance(fm.model, fm.lo, fm.hi, fm.hiBasis);
      const p = b.point;
      const eoLiftoff = p.goGround_m + fm.rotation_m;
      const brakeEnergy = 0.5 * s.mass_kg * p.brakeSpeed * p.brakeSpeed;
      engineOut = {
        continued_m: p.go_m, liftoff_m: eoLiftoff, midpoint_m: eoLiftoff + fm.airborne.distance_m / 2,
        groundRun_m: p.goGround_m, accelerateStop_m: p.stop_m, accelerateStopEngineOut_m: p.stopEngineOut_m,
        accelerateStopAllEngines_m: p.stopAllEngines_m, balancedField_m: b.field_m, v1Limited: b.basis,
        v1Min_mps: fm.lo + s.wind_mps, v1Max_mps: fm.hi + s.wind_mps,
        airborne_m: fm.airborne.distance_m, airborneMinExcess: fm.airborne.minExcess,
        brakeSpeed_mps: p.brakeSpeed, brakeEnergy_J: brakeEnergy, activation_s: s.activation_s,
      };
      speeds = { ...baseSpeeds, v1_mps: p.v1G + s.wind_mps, vef_mps: p.vefG + s.wind_mps, v1Basis: b.basis };
      if (b.basis === 'vmcg') warnings.push(notice('takeoff.v1AtVmcg')`V1 is held at its VMCG-based minimum; the field length is unbalanced (accelerate-stop exceeds the continued takeoff).`);
      if (b.basis === 'vr') warnings.push(notice('takeoff.v1AtVr')`V1 is held at VR; the field length is unbalanced (the continued takeoff exceeds accelerate-stop).`);
      if (b.basis === 'vmbe') warnings.push(notice('takeoff.v1AtVmbe')`V1 is held at the brake-energy limit (VMBE); the field length is unbalanced (the continued takeoff exceeds accelerate-stop).`);
      t('Engine out: V1 window low (true airspeed)', fm.lo + s.wind_mps, 'm/s');
      t('Engine out: V1 window high (true airspeed)', fm.hi + s.wind_mps, 'm/s');
      if (fm.airborne.floored) t('Engine out: air distance held at the all-engines transition arc (energy method shorter)', fm.airborne.distance_m, 'm');
      t('Engine out: VEF (true airspeed)', p.vefG + s.wind_mps, 'm/s');
      t('Engine out: V1 (true airspeed)', p.v1G + s.wind_mps, 'm/s');
      t('Engine out: ground run to VR', p.goGround_m, 'm');
      t('Engine out: rotation', fm.rotation_m, 'm');
      t('Engine out: airborne to screen (energy method)', fm.airborne.distance_m, 'm');
      t('Engine out: time from lift-off to screen', fm.airborne.time_s, 's');
      t('Engine out: least excess thrust ratio in the air', fm.airborne.minExcess, '');
      t('Engine out: continued to screen', p.go_m, 'm');
      t('Accelerate-stop, engine out', p.stopEngineOut_m, 'm');
      t('Accelerate-stop, all engines', p.stopAllEngines_m, 'm');
      t('Rejected takeoff: brake-application groundspeed', p.brakeSpeed, 'm/s');
      t('Rejected takeoff: kinetic energy at brake application', brakeEnergy, 'J');
      t('Balanced-V1 iterations', b.iterations, '');
    }
  }

  // Governing distance and declared-distance pieces.
  let required: number;
  let governing: GoverningCase;
  let declared: DeclaredPieces;
  if (basis === 'normal') {
    required = factored;
    governing = 'all-engines';
    declared = { takeoffRun_m: midpoint * lightFactor, takeoffDistance_m: factored, accelerateStop_m: engineOut?.accelerateStop_m };
  } else if (engineOut) {
    const cands: [GoverningCase, number][] = [
      ['all-engines-factored', factored], ['engine-out', engineOut.continued_m], ['accelerate-stop', engineOut.accelerateStop_m],
    ];
    let best = cands[0]!;
    for (const c of cands) if (c[1] > best[1]) best = c;
    governing = best[0] !== 'all-engines-factored' && engineOut.v1Limited === 'balanced' ? 'balanced-field' : best[0];
    required = best[1];
    declared = {
      takeoffDistance_m: takeoffDistance25113({ engineOut_m: engineOut.continued_m, allEngines_m: toScreen }),
      takeoffRun_m: takeoffRun25113({ engineOutMid_m: engineOut.midpoint_m, allEnginesMid_m: midpoint }),
      accelerateStop_m: engineOut.accelerateStop_m,
    };
  } else {
    required = factored;
    governing = 'all-engines-factored';
    declared = { takeoffDistance_m: factored, takeoffRun_m: ALL_ENGINES_FACTOR * midpoint, accelerateStop_m: undefined };
  }
  t('Required takeoff length', required, 'm');

  const empirical = empiricalChecks(s, climb.gradient);
  if (empirical.torenbeek_m !== undefined) t('Torenbeek BFL (indicative)', empirical.torenbeek_m, 'm');
  if (empirical.roskam_m !== undefined) t(`Roskam ${empirical.roskamMethod} (indicative)`, empirical.roskam_m, 'm');

  return {
    feasible: true, methodVersion: TAKEOFF_METHOD_VERSION, certification: basis, screenHeight_m: s.screen_m,
    required_m: required, governing, speeds, allEngines, engineOut, declared, climb, empirical, warnings, trace,
  };
}

function empiricalChecks(s: TakeoffSetup, gamma2: number): EmpiricalResult {
  const a = s.aircraft;
  const n = s.engineCount;
  const ws = s.weight_N / s.wingArea_m2;
  const staticTotal = n * s.engine.staticThrust_N;
  const prop = a.engineType !== 'turbofan';
  const powerTotal = n * (s.engine.shaftPower_W ?? 0);
  let torenbeek: number | undefined;
  if (n > 1) {
    const mean = prop
      ? torenbeekMeanThrustPropeller({ power_W: powerTotal, sigma: s.air.sigma, engineCount: n, diameter_m: a.propDiameter_m ?? 2 })
      : torenbeekMeanThrustTurbofan({ staticThrust_N: staticTotal, bypassRatio: a.bypassRatio ?? 0 });
    torenbeek = torenbeekBfl({
      wingLoading_Nm2: ws, density_kgm3: s.air.density_kgm3, sigma: s.air.sigma, clMaxTakeoff: s.clMax,
      meanThrust_N: mean, weight_N: s.weight_N, deltaGamma2: gamma2 - torenbeekGammaMin(n),
    });
  }
  let roskam: number | undefined;
  let method: 'TOP25' | 'TOP23';
  let parameter: number;
  if (a.certification === 'normal' && prop && powerTotal > 0) {
    const r = roskamTop23({
      wingLoading_lbft2: nm2ToPsf(ws), powerLoading_lbhp: (s.mass_kg / LB) / (powerTotal / HP),
      sigma: s.air.sigma, clMaxTakeoff: s.clMax,
    });
    roskam = r.toObstacle_m;
    method = 'TOP23';
    parameter = r.top23;
  } else {
    // Propellers: thrust at 0.7·VLOF stands in for the static thrust (this project's adaptation).
    const thrust = prop ? n * s.engine.thrust(0.7 * s.vlof) : staticTotal;
    const r = roskamTop25({ wingLoading_Nm2: ws, sigma: s.air.sigma, clMaxTakeoff: s.clMax, thrustToWeight: thrust / s.weight_N });
    roskam = r.fieldLength_m;
    method = 'TOP25';
    parameter = r.top25;
  }
  return { torenbeek_m: torenbeek, roskam_m: roskam, roskamMethod: method, roskamParameter: parameter, label: 'indicative' };
}

export interface EngineFailureAtInput extends TakeoffInput {
  /** Decision speed V1, true airspeed, m/s (inside the V1 window). */
  readonly v1_mps: number;
}

export type EngineFailureAtResult =
  | {
    readonly feasible: true;
    readonly v1_mps: number;
    readonly vef_mps: number;
    readonly continued_m: number;
    readonly accelerateStop_m: number;
    readonly accelerateStopEngineOut_m: number;
    readonly accelerateStopAllEngines_m: number;
    readonly v1Min_mps: number;
    readonly v1Max_mps: number;
  }
  | { readonly feasible: false; readonly reason: InfeasibleReason; readonly message: Notice };

/**
 * Continued and accelerate-stop distances at a chosen V1 (multi-engine aircraft). V1 outside the
 * window [VMCG-based minimum, min(VR, VMBE)] is an InputDomainError (VR raised per 25.107(e)(1)(i)
 * when the minimum exceeds the scheduled VR).
 */
export function engineFailureAt(input: EngineFailureAtInput): EngineFailureAtResult {
  let s = takeoffSetup(input);
  if (s.engineCount < 2) {
    throw new InputDomainError('aircraft.engineCount', s.engineCount, 'at least 2 for an engine-failure analysis');
  }
  let aeoB = runTable(s, s.engineCount, 0);
  if (!aeoB.ok) return { feasible: false, reason: 'cannot-reach-liftoff', message: NO_LIFTOFF };
  const aeoAir = allEnginesAir(s);
  let fm = buildFailure(s, aeoB.table, aeoAir, true);
  if (!fm.ok && 'raiseVr_mps' in fm) {
    s = withVrAtLeast(s, fm.raiseVr_mps * (1 + 1e-9));
    aeoB = runTable(s, s.engineCount, 0);
    if (!aeoB.ok) return { feasible: false, reason: 'cannot-reach-liftoff', message: NO_LIFTOFF };
    fm = buildFailure(s, aeoB.table, allEnginesAir(s), false);
  }
  if (!fm.ok) {
    if ('raiseVr_mps' in fm) throw new Error('unreachable: VR raised twice');
    return { feasible: false, reason: fm.reason, message: fm.message };
  }
  const lo = fm.lo + s.wind_mps;
  const hi = fm.hi + s.wind_mps;
  const v1 = inRange('v1_mps', input.v1_mps, { min: lo, max: hi, unit: 'm/s' });
  const p = failurePoint(fm.model, v1 - s.wind_mps);
  return {
    feasible: true, v1_mps: v1, vef_mps: p.vefG + s.wind_mps, continued_m: p.go_m, accelerateStop_m: p.stop_m,
    accelerateStopEngineOut_m: p.stopEngineOut_m, accelerateStopAllEngines_m: p.stopAllEngines_m,
    v1Min_mps: lo, v1Max_mps: hi,
  };
}
