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
 * (engine-failure figures shown as information for twins).
 *
 * Validity: see model.ts (input ranges); dry-runway certification rules applied on every surface
 * (the surface changes friction only). Infeasible physics is a result with a reason, never NaN.
 */
import { distanceAt, type SpeedTable } from './quadrature.js';
import {
  MIN_ACCELERATION_MPS2, rollAcceleration, runTable, stopTable, takeoffSetup, type TakeoffSetup,
} from './model.js';
import { airborneDistance, rotationDistance, type AirborneResult } from './airborne.js';
import { balance, failurePoint, v1Window, type FailureModel } from './balancedField.js';
import { climbAtV2, climbLimitedMass } from './climb.js';
import {
  ALL_ENGINES_FACTOR, climbMinimum, takeoffDistance25113, takeoffRun25113,
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
export { airborneDistance, rotationDistance, TRANSITION_LOAD_FACTOR } from './airborne.js';
export { gearDragIncrement, climbAtV2 } from './climb.js';
export {
  ALL_ENGINES_FACTOR, STOP_ALLOWANCE_S, TAKEOFF_GOVERNING_LABELS, climbMinimum, screenHeight, takeoffDistance25113, takeoffRun25113,
} from './regulations.js';
export {
  roskamTop23, roskamTop25, torenbeekBfl, torenbeekMeanThrustPropeller, torenbeekMeanThrustTurbofan,
} from './empirical.js';

/** Method version stamp carried by every result. */
export const TAKEOFF_METHOD_VERSION = 'takeoff-1';
/** Average-force estimate differing from the integration by more than this (%) is flagged. */
export const AVERAGE_FORCE_WARN_PCT = 15;

type Failure =
  | {
    readonly ok: true;
    readonly model: FailureModel;
    readonly rotation_m: number;
    readonly airborne: Extract<AirborneResult, { ok: true }>;
    readonly lo: number;
    readonly hi: number;
  }
  | { readonly ok: false; readonly reason: InfeasibleReason; readonly message: string };

const f1 = (x: number): string => x.toFixed(1);

/** Builds the engine-failure model (multi-engine) over the shared all-engines table. */
function buildFailure(s: TakeoffSetup, aeo: SpeedTable): Failure {
  const a = s.aircraft;
  const n = s.engineCount;
  const oeiB = runTable(s, n - 1, a.engineOutDrag);
  if (!oeiB.ok) {
    return {
      ok: false, reason: 'cannot-continue-engine-out',
      message: `With one engine failed the aircraft cannot accelerate to lift-off speed: resistance exceeds thrust near ${f1(oeiB.speed_mps)} m/s groundspeed.`,
    };
  }
  const oei = oeiB.table;
  const air = airborneDistance({
    weight_N: s.weight_N, thrust_N: (n - 1) * s.engine.thrust(0.5 * (s.vlof + s.v2)),
    density_kgm3: s.air.density_kgm3, wingArea_m2: s.wingArea_m2, cd0: a.cd0Takeoff + a.engineOutDrag,
    k: s.k, clMax: s.clMax, vs1_mps: s.vs1, vlof_mps: s.vlof, v2_mps: s.v2, screen_m: s.screen_m,
    headwind_mps: s.wind_mps,
  });
  if (!air.ok) {
    return {
      ok: false, reason: 'cannot-climb-engine-out',
      message: `With one engine failed the aircraft cannot climb after lift-off (gradient ${(air.gradient * 100).toFixed(2)} %).`,
    };
  }
  const stopOeiB = stopTable(s, n - 1, a.engineOutDrag);
  const stopAeoB = stopTable(s, n, 0);
  if (!stopOeiB.ok || !stopAeoB.ok) {
    const bad = !stopOeiB.ok ? stopOeiB : stopAeoB.ok ? undefined : stopAeoB;
    return {
      ok: false, reason: 'cannot-stop',
      message: `Braking cannot stop the aircraft: idle thrust and the downhill slope exceed braking and drag near ${f1(bad?.speed_mps ?? 0)} m/s groundspeed.`,
    };
  }
  const rotation = rotationDistance({
    vrG_mps: s.vrG, vlofG_mps: s.vlofG, rotationTime_s: a.rotationTime_s,
    physics_m: distanceAt(oei, s.vlofG) - distanceAt(oei, s.vrG),
  });
  const model: FailureModel = {
    aeo, oei, stopOei: stopOeiB.table, stopAeo: stopAeoB.table,
    recognition_s: a.recognitionTime_s, vrG: s.vrG,
    vefMinG: Math.max(0, (s.vmcg ?? 0) - s.wind_mps),
    goTail_m: rotation + air.distance_m,
  };
  const w = v1Window(model);
  if (!w.ok) {
    const v1Min = w.v1Min === undefined ? 'beyond lift-off speed' : `${f1(w.v1Min + s.wind_mps)} m/s`;
    return {
      ok: false, reason: 'v1-window-empty',
      message: `No decision speed is possible: after an engine failure at VMCG (${f1(s.vmcg ?? 0)} m/s) the speed at the end of recognition (${v1Min}) exceeds VR (${f1(s.vr)} m/s).`,
    };
  }
  return { ok: true, model, rotation_m: rotation, airborne: air, lo: w.lo, hi: w.hi };
}

/** Full takeoff analysis for one aircraft, mass and site condition. */
export function analyseTakeoff(input: TakeoffInput): TakeoffResult {
  const s = takeoffSetup(input);
  const a = s.aircraft;
  const n = s.engineCount;
  const basis = a.certification;
  const trace: TakeoffTraceEntry[] = [];
  const warnings: string[] = [];
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

  if (basis !== 'normal' && isWet(input.surface)) {
    warnings.push('Wet runway: friction is reduced, but the wet-runway rules of 14 CFR 25.109/25.113 (15-ft screen, reverse-thrust credit) are not modelled.');
  }
  const easFactor = Math.sqrt(s.air.sigma);
  const baseSpeeds: TakeoffSpeeds = {
    vs1_mps: s.vs1, vr_mps: s.vr, vlof_mps: s.vlof, v2_mps: s.v2, v1_mps: undefined, vef_mps: undefined,
    vmcg_mps: s.vmcg, v1Basis: 'none', easFactor,
  };
  t('VS1 (true airspeed)', s.vs1, 'm/s');
  t('VR (true airspeed)', s.vr, 'm/s');
  t('VLOF (true airspeed)', s.vlof, 'm/s');
  t('V2 (true airspeed)', s.v2, 'm/s');

  // Climb check at V2 (needed by every outcome that gets that far).
  const cp = climbAtV2(s);
  const cmin = climbMinimum(basis, n);
  const climbLimited = cp.gradient < cmin.minimum;
  const maxMass = climbLimited ? climbLimitedMass(s, cmin.minimum) : undefined;
  const climb: ClimbResult = {
    case: n > 1 ? 'engine-out' : 'all-engines',
    gradient: cp.gradient, minimum: cmin.minimum, minimumSource: cmin.source, limited: climbLimited,
    maxMass_kg: maxMass,
  };
  t('Climb gradient at V2', cp.gradient, '');
  t('Zero-lift drag in the V2 climb', cp.cd0, '');
  if (cp.floorBound) warnings.push('The gear-up drag estimate fell below 40 % of the takeoff zero-lift drag; that floor was used.');
  if (climbLimited) {
    warnings.push(
      maxMass !== undefined
        ? `Climb-limited: the ${climb.case} gradient at V2 (${(cp.gradient * 100).toFixed(2)} %) is below the minimum (${(cmin.minimum * 100).toFixed(1)} %); the greatest mass that meets it is ${maxMass.toFixed(0)} kg. A longer runway cannot cure this.`
        : `Climb-limited: the ${climb.case} gradient at V2 (${(cp.gradient * 100).toFixed(2)} %) is below the minimum (${(cmin.minimum * 100).toFixed(1)} %) even at the operating empty mass. A longer runway cannot cure this.`,
    );
  }

  let allEngines: AllEnginesResult | undefined;
  const infeasible = (reason: InfeasibleReason, message: string): TakeoffResult => ({
    feasible: false, reason, message, methodVersion: TAKEOFF_METHOD_VERSION, certification: basis,
    screenHeight_m: s.screen_m, speeds: baseSpeeds, climb, allEngines, warnings, trace,
  });

  // All engines.
  const aeoB = runTable(s, n, 0);
  if (!aeoB.ok) {
    return infeasible('cannot-reach-liftoff',
      `The aircraft cannot reach lift-off speed: resistance exceeds thrust near ${f1(aeoB.speed_mps)} m/s groundspeed (lift-off needs ${f1(s.vlofG)} m/s).`);
  }
  const aeo = aeoB.table;
  const sVr = distanceAt(aeo, s.vrG);
  const sVlof = distanceAt(aeo, s.vlofG);
  const rot = rotationDistance({ vrG_mps: s.vrG, vlofG_mps: s.vlofG, rotationTime_s: a.rotationTime_s, physics_m: sVlof - sVr });
  const air = airborneDistance({
    weight_N: s.weight_N, thrust_N: n * s.engine.thrust(0.5 * (s.vlof + s.v2)),
    density_kgm3: s.air.density_kgm3, wingArea_m2: s.wingArea_m2, cd0: a.cd0Takeoff, k: s.k,
    clMax: s.clMax, vs1_mps: s.vs1, vlof_mps: s.vlof, v2_mps: s.v2, screen_m: s.screen_m,
    headwind_mps: s.wind_mps,
  });
  if (!air.ok) {
    return infeasible('cannot-climb',
      `With all engines the aircraft cannot climb after lift-off (gradient ${(air.gradient * 100).toFixed(2)} %).`);
  }
  const liftoff = sVr + rot;
  const toScreen = liftoff + air.distance_m;
  const midpoint = liftoff + air.distance_m / 2;
  const lightFactor = a.lightAircraftFactor ?? 1;
  const factored = basis === 'normal' ? toScreen * lightFactor : ALL_ENGINES_FACTOR * toScreen;
  const vAvg = 0.7 * s.vlofG;
  const aAvg = Math.max(rollAcceleration(s, n, 0)(vAvg), MIN_ACCELERATION_MPS2);
  const avgForce = (s.vlofG * s.vlofG) / (2 * aAvg);
  const avgDiff = ((avgForce - sVlof) / sVlof) * 100;
  if (Math.abs(avgDiff) > AVERAGE_FORCE_WARN_PCT) {
    warnings.push(`The average-force estimate differs from the integrated ground run by ${avgDiff.toFixed(1)} %.`);
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

  // Engine failure.
  let engineOut: EngineOutResult | undefined;
  let speeds = baseSpeeds;
  if (n > 1) {
    const fm = buildFailure(s, aeo);
    if (!fm.ok) {
      if (basis !== 'normal') return infeasible(fm.reason, fm.message);
      warnings.push(`Engine-failure analysis not available: ${fm.message}`);
    } else {
      const b = balance(fm.model, fm.lo, fm.hi);
      const p = b.point;
      const eoLiftoff = p.goGround_m + fm.rotation_m;
      engineOut = {
        continued_m: p.go_m, liftoff_m: eoLiftoff, midpoint_m: eoLiftoff + fm.airborne.distance_m / 2,
        groundRun_m: p.goGround_m, accelerateStop_m: p.stop_m, accelerateStopEngineOut_m: p.stopEngineOut_m,
        accelerateStopAllEngines_m: p.stopAllEngines_m, balancedField_m: b.field_m, v1Limited: b.basis,
        v1Min_mps: fm.lo + s.wind_mps, v1Max_mps: fm.hi + s.wind_mps,
      };
      speeds = {
        vs1_mps: s.vs1, vr_mps: s.vr, vlof_mps: s.vlof, v2_mps: s.v2, v1_mps: p.v1G + s.wind_mps,
        vef_mps: p.vefG + s.wind_mps, vmcg_mps: s.vmcg, v1Basis: b.basis, easFactor,
      };
      if (b.basis === 'vmcg') warnings.push('V1 is held at its VMCG-based minimum; the field length is unbalanced (accelerate-stop exceeds the continued takeoff).');
      if (b.basis === 'vr') warnings.push('V1 is held at VR; the field length is unbalanced (the continued takeoff exceeds accelerate-stop).');
      t('Engine out: V1 window low (true airspeed)', fm.lo + s.wind_mps, 'm/s');
      t('Engine out: V1 window high (true airspeed)', fm.hi + s.wind_mps, 'm/s');
      t('Engine out: VEF (true airspeed)', p.vefG + s.wind_mps, 'm/s');
      t('Engine out: V1 (true airspeed)', p.v1G + s.wind_mps, 'm/s');
      t('Engine out: ground run to VR', p.goGround_m, 'm');
      t('Engine out: rotation', fm.rotation_m, 'm');
      t('Engine out: airborne to screen', fm.airborne.distance_m, 'm');
      t('Engine out: transition gradient', fm.airborne.gradient, '');
      t('Engine out: continued to screen', p.go_m, 'm');
      t('Accelerate-stop, engine out', p.stopEngineOut_m, 'm');
      t('Accelerate-stop, all engines', p.stopAllEngines_m, 'm');
      t('Balanced-V1 iterations', b.iterations, '');
      if (s.vmcg !== undefined && s.vr < 1.05 * s.vmcg) {
        warnings.push('VR is below 1.05 × VMCG; the profile speeds may not satisfy 14 CFR 25.107(e).');
      }
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

  const empirical = empiricalChecks(s, cp.gradient);
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
  | { readonly feasible: false; readonly reason: InfeasibleReason; readonly message: string };

/**
 * Continued and accelerate-stop distances at a chosen V1 (multi-engine aircraft). V1 outside the
 * window [VMCG-based minimum, VR] is an InputDomainError.
 */
export function engineFailureAt(input: EngineFailureAtInput): EngineFailureAtResult {
  const s = takeoffSetup(input);
  if (s.engineCount < 2) {
    throw new InputDomainError('aircraft.engineCount', s.engineCount, 'at least 2 for an engine-failure analysis');
  }
  const aeoB = runTable(s, s.engineCount, 0);
  if (!aeoB.ok) return { feasible: false, reason: 'cannot-reach-liftoff', message: 'The aircraft cannot reach lift-off speed.' };
  const fm = buildFailure(s, aeoB.table);
  if (!fm.ok) return { feasible: false, reason: fm.reason, message: fm.message };
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
