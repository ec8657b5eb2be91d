/**
 * Existing-runway check: what an aircraft needs in declared-distance terms, the greatest takeoff and
 * landing masses the declared distances allow, and the payload and range that costs on a route.
 *
 * 1. Field-length components (Horonjeff, McKelvey, Sproule, Young, *Planning and Design of Airports*,
 *    5th ed., 2010, eqs 2-4 … 2-14, pp. 85-88; 14 CFR 25.113), from the distances of the
 *    takeoff and landing models:
 *      TOD1 = 1.15·D35_AEO     CL1max = ½(TOD1 − 1.15·LOD_AEO)    TOR1 = TOD1 − CL1max
 *      TOD2 = D35_OEI          CL2max = ½(TOD2 − LOD_OEI)         TOR2 = TOD2 − CL2max
 *      DAS  = accelerate-stop distance;  LD = SD / 0.60 (14 CFR 121.195(b))
 *      FL = max(TOD1, TOD2, DAS, LD)   FS = max(TOR1, TOR2, LD)   SW = DAS − FS (≥ 0)
 *      CL = min(FL − DAS, CL1max, CL2max), 0 ≤ CL ≤ 1000 ft
 *    The takeoff needs against the declared distances are TOR = max(TOR1, TOR2) against TORA,
 *    TOD = max(TOD1, TOD2) against TODA and DAS against ASDA (14 CFR 25.113, 25.109); TOR1 and TOR2
 *    equal the 25.113(c) midpoint distances, so the needs agree with the takeoff engine's declared
 *    pieces. Normal-category aircraft use the takeoff engine's own pieces (50-ft screen, light-aircraft
 *    factor, no accelerate-stop requirement). The landing need is the landing model's required runway
 *    (core/landing.ts) against LDA.
 * 2. Greatest takeoff mass for a runway direction: the takeoff engine is run at trial masses and a
 *    mass is "allowed" when the takeoff is feasible and every need fits its declared distance; the
 *    climb limit at V2 (14 CFR 25.121(b)) caps the mass through the takeoff engine's climb-limited
 *    mass (the V2 gradient falls with mass). Bisection on that yes/no predicate between the lower
 *    mass bound and the cap, to TAKEOFF_MASS_TOL_KG (10 kg), at most MASS_MAX_ITERATIONS steps.
 *    Bisection needs no monotone or continuous length: the field length is not strictly monotone in
 *    mass when V1 sits on its VMCG floor (docs/methods/takeoff.md §10), so a root finder on a
 *    residual could stall; the predicate search always ends on an allowed mass with a refused mass at
 *    most 10 kg heavier. Light masses may be refused as well — below some mass the modelled VR falls
 *    under the V1 reached after a failure at VMCG and no decision speed exists ('v1-window-empty') —
 *    so when the lower bound is refused for that reason, a first bisection finds the lightest mass with
 *    a decision speed and the search starts there. Greatest landing mass for an LDA: the same
 *    bisection on the landing model.
 * 3. Route penalty at a limited mass: the greatest payload for the design stage (route payloadForRange)
 *    and the greatest stage for the design payload (route rangeForPayload), Breguet range equation, Aeronautical Engineer's Data Book ch. 9.
 *
 * 4. Plausibility: the aircraft's plausibility bound (core/plausibility.ts) guards every need. A
 *    takeoff whose requirement or physics distances exceed it is refused in the mass searches (limit
 *    'plausibility') and gives no needs and no 'fits' at the design mass, with the reason in the note;
 *    a landing beyond it likewise.
 *
 * Validity: that of the takeoff engine (pressure altitude −400…4 500 m, |slope| ≤ 3 %), the landing
 * model and the route model. Balanced (or limited) V1 as the takeoff engine chooses it: an unbalanced
 * V1 scheduled to use a clearway or stopway of unequal length is not searched (conservative).
 */
import type { AircraftProfile } from './aircraft.js';
import { validateAircraft } from './aircraft.js';
import { analyseTakeoff, ALL_ENGINES_FACTOR } from './takeoff/index.js';
import type { InfeasibleReason, TakeoffFeasible, TakeoffInput, TakeoffResult } from './takeoff/types.js';
import { analyseLanding, type LandingResult, type LandingRule, TRANSPORT_LANDING_FRACTION } from './landing.js';
import type { OperatingRuleSet } from './operatingRules.js';
import { payloadForRange, rangeForPayload } from './route/design.js';
import type { ReservePolicy } from './route/reserves.js';
import { DECLARED_DISTANCE_RANGE } from './runway.js';
import type { Surface } from './surface.js';
import type { RunwayDirectionInput } from './runway.js';
import { bisect } from './numeric/index.js';
import { PASSENGER_MASS_RANGE } from './fields.js';
import { aircraftPlausibilityBound, checkPlausibility, takeoffDistances, withinPlausibility, type PlausibilityBound } from './plausibility.js';
import { FT } from './units.js';
import { standardTemperatureC } from './atmosphere.js';
import { check, finite, inRange } from './validate.js';
import { notice, qty, type Notice } from './notices.js';


/** The check of one runway direction at the design masses, as a study row stores it. */
export interface ExistingRunwayCheck {
  readonly runway: string;
  readonly designator: string;
  /**
   * Needs at the design takeoff mass against the declared distances, m (core/runwayCheck.ts);
   * absent when the takeoff (or the landing) is not possible at all at that mass.
   */
  readonly takeoffRunNeeded_m?: number;
  readonly takeoffDistanceNeeded_m?: number;
  readonly accelerateStopNeeded_m?: number;
  readonly landingNeeded_m?: number;
  readonly tora_m: number;
  readonly toda_m: number;
  readonly asda_m: number;
  readonly lda_m: number;
  readonly takeoffOk: boolean;
  readonly landingOk: boolean;
  /** Greatest takeoff mass the declared distances allow at design conditions, kg. */
  readonly maxTakeoffMass_kg?: number;
  /** What limits it: 'TORA' | 'TODA' | 'ASDA' | 'climb' | 'MTOW' | 'none-feasible' (TakeoffMassLimit in core/runwayCheck.ts). */
  readonly limitedBy: string;
  /** Payload that can fly the design stage at that mass, and the penalty against the design payload. */
  readonly payloadAtMax_kg?: number;
  readonly payloadPenalty_kg?: number;
  readonly passengersPenalty?: number;
  /** Range with the design payload at that mass, and the penalty against the design stage. */
  readonly rangeAtMax_km?: number;
  readonly rangePenalty_km?: number;
  /** Greatest landing mass the LDA allows, kg. */
  readonly maxLandingMass_kg?: number;
  /** What limits or prevents the operation here, sentence by sentence (rendered in the reader's units). */
  readonly note?: readonly Notice[];
}

export const RUNWAY_CHECK_METHOD_VERSION = 'runway-check/1';

/** Greatest clearway counted in the field-length decomposition, m (1000 ft; Horonjeff §2, 14 CFR 25.113). */
export const MAX_CLEARWAY_M = 1000 * FT;
/** Mass tolerance of the greatest-mass searches, kg. */
export const TAKEOFF_MASS_TOL_KG = 10;
export const LANDING_MASS_TOL_KG = 10;
/** Iteration cap of the greatest-mass bisections (a 600 t range to 10 kg needs 16). */
export const MASS_MAX_ITERATIONS = 60;

export interface RunwayCheckTraceEntry {
  readonly label: string;
  readonly value: number;
  readonly unit: string;
}

// ---------------------------------------------------------------------------------------------
// 1. Field-length components

export interface FieldLengthComponentsInput {
  /** All-engines distance from brake release to the screen height (D35_AEO), m. */
  readonly allEnginesToScreen_m: number;
  /** All-engines lift-off distance (LOD_AEO), m. */
  readonly allEnginesLiftoff_m: number;
  /** Engine-out continued takeoff (multi-engine): distance to the screen (D35_OEI) and lift-off (LOD_OEI), m. */
  readonly engineOut?: { readonly toScreen_m: number; readonly liftoff_m: number };
  /** Accelerate-stop distance (DAS), m (multi-engine). */
  readonly accelerateStop_m?: number;
  /** Unfactored landing distance from 50 ft to a stop (SD), m. */
  readonly landingDistance_m?: number;
  /** Clearway cap, m (default 1000 ft = 304.8 m). */
  readonly maxClearway_m?: number;
}

export type FieldLengthGoverning = 'TOD1' | 'TOD2' | 'DAS' | 'LD';

export interface FieldLengthComponents {
  /** All-engines takeoff distance 1.15·D35_AEO, m. */
  readonly tod1_m: number;
  /** Greatest clearway the all-engines case can use, ½(TOD1 − 1.15·LOD_AEO), m. */
  readonly cl1max_m: number;
  /** All-engines takeoff run TOD1 − CL1max, m. */
  readonly tor1_m: number;
  readonly tod2_m?: number;
  readonly cl2max_m?: number;
  readonly tor2_m?: number;
  readonly das_m?: number;
  /** Landing distance required SD / 0.60, m. */
  readonly ld_m?: number;
  /** Field length FL = max(TOD1, TOD2, DAS, LD), m. */
  readonly fieldLength_m: number;
  readonly governing: FieldLengthGoverning;
  /** Full-strength pavement FS = max(TOR1, TOR2, LD), m. */
  readonly fullStrength_m: number;
  /** Stopway SW = DAS − FS, not below 0, m (0 without DAS). */
  readonly stopway_m: number;
  /** Clearway CL = min(FL − DAS, CL1max, CL2max) within 0 … maxClearway, m. */
  readonly clearway_m: number;
  /** Takeoff run needed against TORA: max(TOR1, TOR2), m. */
  readonly takeoffRun_m: number;
  /** Takeoff distance needed against TODA: max(TOD1, TOD2), m. */
  readonly takeoffDistance_m: number;
  /** FL − (FS + SW + CL): length the equations leave unallocated when the clearway cap or the stopway floor binds, m. */
  readonly unallocated_m: number;
  readonly trace: readonly RunwayCheckTraceEntry[];
  readonly warnings: readonly Notice[];
}

const POSITIVE_M = { min: 0, minInclusive: false, unit: 'm' } as const;

/** Horonjeff's field-length decomposition (file header, item 1). */
export function fieldLengthComponents(input: FieldLengthComponentsInput): FieldLengthComponents {
  const d35a = inRange('allEnginesToScreen_m', input.allEnginesToScreen_m, POSITIVE_M);
  const loda = inRange('allEnginesLiftoff_m', input.allEnginesLiftoff_m, POSITIVE_M);
  check(loda <= d35a, 'allEnginesLiftoff_m', loda, `at most the all-engines distance to the screen (${d35a} m)`);
  const clCap = inRange('maxClearway_m', input.maxClearway_m ?? MAX_CLEARWAY_M, { min: 0, unit: 'm' });
  const trace: RunwayCheckTraceEntry[] = [];
  const warnings: Notice[] = [];
  const t = (label: string, value: number): void => { trace.push({ label, value, unit: 'm' }); };

  const tod1 = ALL_ENGINES_FACTOR * d35a;
  const cl1 = 0.5 * (tod1 - ALL_ENGINES_FACTOR * loda);
  const tor1 = tod1 - cl1;
  t('TOD1 = 1.15 · D35 all engines', tod1);
  t('CL1max = ½(TOD1 − 1.15 · LOD all engines)', cl1);
  t('TOR1 = TOD1 − CL1max', tor1);

  let tod2: number | undefined;
  let cl2: number | undefined;
  let tor2: number | undefined;
  if (input.engineOut !== undefined) {
    tod2 = inRange('engineOut.toScreen_m', input.engineOut.toScreen_m, POSITIVE_M);
    const lodo = inRange('engineOut.liftoff_m', input.engineOut.liftoff_m, POSITIVE_M);
    check(lodo <= tod2, 'engineOut.liftoff_m', lodo, `at most the engine-out distance to the screen (${tod2} m)`);
    cl2 = 0.5 * (tod2 - lodo);
    tor2 = tod2 - cl2;
    t('TOD2 = D35 engine out', tod2);
    t('CL2max = ½(TOD2 − LOD engine out)', cl2);
    t('TOR2 = TOD2 − CL2max', tor2);
  }
  const das = input.accelerateStop_m === undefined ? undefined : inRange('accelerateStop_m', input.accelerateStop_m, POSITIVE_M);
  if (das !== undefined) t('DAS (accelerate-stop)', das);
  const ld = input.landingDistance_m === undefined
    ? undefined
    : inRange('landingDistance_m', input.landingDistance_m, POSITIVE_M) / TRANSPORT_LANDING_FRACTION;
  if (ld !== undefined) t('LD = SD / 0.60', ld);

  const cands: [FieldLengthGoverning, number | undefined][] = [['TOD1', tod1], ['TOD2', tod2], ['DAS', das], ['LD', ld]];
  let governing: FieldLengthGoverning = 'TOD1';
  let fl = tod1;
  for (const [k, v] of cands) if (v !== undefined && v > fl) { fl = v; governing = k; }
  const fs = Math.max(tor1, tor2 ?? 0, ld ?? 0);
  const sw = das === undefined ? 0 : Math.max(0, das - fs);
  const clRaw = Math.min(das === undefined ? Infinity : fl - das, cl1, cl2 ?? Infinity);
  const cl = Math.min(clCap, Math.max(0, clRaw));
  const unallocated = fl - (fs + sw + cl);
  t('FL = max(TOD1, TOD2, DAS, LD)', fl);
  t('FS = max(TOR1, TOR2, LD)', fs);
  t('SW = DAS − FS (≥ 0)', sw);
  t('CL = min(FL − DAS, CL1max, CL2max), 0 … 1000 ft', cl);
  if (clRaw > clCap) warnings.push(notice('runwayCheck.clearwayCapped')`The clearway the distances could use (${qty.length(clRaw)}) is capped at ${qty.shortLength(clCap, 1)}.`);
  if (unallocated > 1e-9) {
    warnings.push(notice('runwayCheck.fieldLengthUnallocated')`FS + SW + CL falls ${qty.length(unallocated)} short of the field length FL; that length must be runway (full strength or stopway).`);
  }
  return {
    tod1_m: tod1, cl1max_m: cl1, tor1_m: tor1,
    ...(tod2 !== undefined ? { tod2_m: tod2, cl2max_m: cl2!, tor2_m: tor2! } : {}),
    ...(das !== undefined ? { das_m: das } : {}),
    ...(ld !== undefined ? { ld_m: ld } : {}),
    fieldLength_m: fl, governing, fullStrength_m: fs, stopway_m: sw, clearway_m: cl,
    takeoffRun_m: Math.max(tor1, tor2 ?? 0), takeoffDistance_m: Math.max(tod1, tod2 ?? 0),
    unallocated_m: Math.max(0, unallocated), trace, warnings,
  };
}

// ---------------------------------------------------------------------------------------------
// Takeoff needs in declared-distance terms

export interface DeclaredNeeds {
  /** Against TORA, m. */
  readonly takeoffRun_m: number;
  /** Against TODA, m. */
  readonly takeoffDistance_m: number;
  /** Against ASDA, m (multi-engine transport and commuter). */
  readonly accelerateStop_m?: number;
  /** 'field-components': Horonjeff decomposition; 'takeoff-declared': the takeoff engine's pieces (normal category). */
  readonly basis: 'field-components' | 'takeoff-declared';
  readonly components?: FieldLengthComponents;
}

/** Needs of a feasible takeoff against TORA, TODA and ASDA. */
export function declaredNeeds(r: TakeoffFeasible): DeclaredNeeds {
  if (r.certification === 'normal') {
    return { takeoffRun_m: r.declared.takeoffRun_m, takeoffDistance_m: r.declared.takeoffDistance_m, basis: 'takeoff-declared' };
  }
  const eo = r.engineOut;
  const c = fieldLengthComponents({
    allEnginesToScreen_m: r.allEngines.toScreen_m,
    allEnginesLiftoff_m: r.allEngines.liftoff_m,
    ...(eo ? { engineOut: { toScreen_m: eo.continued_m, liftoff_m: eo.liftoff_m }, accelerateStop_m: eo.accelerateStop_m } : {}),
  });
  return {
    takeoffRun_m: c.takeoffRun_m, takeoffDistance_m: c.takeoffDistance_m,
    ...(c.das_m !== undefined ? { accelerateStop_m: c.das_m } : {}),
    basis: 'field-components', components: c,
  };
}

/** Whether a feasible takeoff's requirement, physics distances and declared-distance needs are all within the bound. */
function allWithin(r: TakeoffFeasible, needs: DeclaredNeeds, bound: PlausibilityBound): boolean {
  const lengths = [
    ...takeoffDistances(r).map((x) => x.value_m),
    needs.takeoffRun_m, needs.takeoffDistance_m, ...(needs.accelerateStop_m === undefined ? [] : [needs.accelerateStop_m]),
  ];
  return lengths.every((x) => withinPlausibility(x, bound));
}

export interface DeclaredTakeoffDistances {
  readonly tora_m: number;
  readonly toda_m: number;
  readonly asda_m: number;
}

export type DistanceLimit = 'TORA' | 'TODA' | 'ASDA';

/** Declared distances a set of needs exceeds, the worst (largest excess) first. */
export function exceededDistances(n: DeclaredNeeds, d: DeclaredTakeoffDistances): DistanceLimit[] {
  const over: [DistanceLimit, number][] = [
    ['TORA', n.takeoffRun_m - d.tora_m],
    ['TODA', n.takeoffDistance_m - d.toda_m],
    ['ASDA', n.accelerateStop_m === undefined ? -Infinity : n.accelerateStop_m - d.asda_m],
  ];
  return over.filter(([, x]) => x > 0).sort((a, b) => b[1] - a[1]).map(([k]) => k);
}

// ---------------------------------------------------------------------------------------------
// 2. Greatest takeoff mass

export type TakeoffMassLimit = DistanceLimit | 'climb' | 'MTOW' | 'plausibility' | 'none-feasible';

export interface MaxTakeoffMassInput {
  readonly aircraft: AircraftProfile;
  /** Pressure altitude, m (−400 … 4 500). */
  readonly pressureAltitude_m: number;
  /** Outside air temperature, °C. */
  readonly temperature_c: number;
  /** Average slope in the takeoff direction, ratio (+ uphill), |slope| ≤ 0.03. */
  readonly slope: number;
  /** + headwind, − tailwind, m/s. */
  readonly headwind_mps: number;
  readonly surface: Surface;
  /** Declared distances of the takeoff direction, m (0 < d ≤ 6 000). */
  readonly direction: DeclaredTakeoffDistances;
  /** Calibration factors passed to the takeoff engine. */
  readonly thrustScale?: number;
  readonly clMaxScale?: number;
  /** Lightest mass searched, kg (default OEW; OEW … MTOW). */
  readonly minMass_kg?: number;
  /** The aircraft's plausibility bound (default: computed from the aircraft, core/plausibility.ts). */
  readonly plausibility?: PlausibilityBound;
}

export interface MaxTakeoffMassResult {
  readonly methodVersion: string;
  readonly status: 'ok' | 'none-feasible';
  /** Greatest allowed takeoff mass, kg (status ok). */
  readonly maxTakeoffMass_kg?: number;
  readonly limitedBy: TakeoffMassLimit;
  /** Plain-words explanation (rendered in the reader's units). */
  readonly message: Notice;
  /** Greatest mass meeting the V2 climb minimum (MTOW when the climb does not limit), kg; absent when even OEW fails. */
  readonly climbLimitMass_kg?: number;
  /** Needs at the greatest allowed mass. */
  readonly needs?: DeclaredNeeds;
  /** The refused mass closest above (at most TAKEOFF_MASS_TOL_KG heavier), kg, when a distance binds. */
  readonly refusedMass_kg?: number;
  /** Needs at that refused mass (absent when the takeoff is infeasible there). */
  readonly refusedNeeds?: DeclaredNeeds;
  /** Why the takeoff is infeasible at the refused mass, when it is. */
  readonly refusedReason?: InfeasibleReason;
  readonly iterations: number;
  readonly trace: readonly RunwayCheckTraceEntry[];
  readonly warnings: readonly Notice[];
}

interface Trial {
  readonly mass_kg: number;
  readonly result: TakeoffResult;
  readonly needs?: DeclaredNeeds;
  readonly exceeded: readonly DistanceLimit[];
  /** The takeoff's distances exceed the plausibility bound (refused whatever the declared distances). */
  readonly implausible: boolean;
  readonly allowed: boolean;
}

/** Refused for want of a decision speed (a light-mass artefact of the model, see maxTakeoffMassForRunway). */
const tooLight = (t: Trial): boolean => !t.result.feasible && t.result.reason === 'v1-window-empty';

/** What refuses a trial: the worst exceeded distance, the plausibility bound, or the infeasibility. */
function trialLimit(t: Trial): TakeoffMassLimit {
  if (!t.result.feasible) return infeasibleLimit(t.result.reason);
  return t.exceeded[0] ?? 'plausibility';
}

function infeasibleLimit(reason: InfeasibleReason): TakeoffMassLimit {
  if (reason === 'cannot-climb' || reason === 'cannot-climb-engine-out') return 'climb';
  if (reason === 'cannot-stop') return 'ASDA';
  return 'TODA';
}

/**
 * Greatest takeoff mass (lower bound … MTOW) the declared distances allow at the given conditions,
 * honouring the V2 climb limit; reports what binds. Bisection on the allowed/refused predicate.
 */
export function maxTakeoffMassForRunway(input: MaxTakeoffMassInput): MaxTakeoffMassResult {
  const a = validateAircraft(input.aircraft);
  check(typeof input.direction === 'object' && input.direction !== null, 'direction', input.direction, 'declared distances { tora_m, toda_m, asda_m }');
  const d: DeclaredTakeoffDistances = {
    tora_m: inRange('direction.tora_m', input.direction.tora_m, DECLARED_DISTANCE_RANGE),
    toda_m: inRange('direction.toda_m', input.direction.toda_m, DECLARED_DISTANCE_RANGE),
    asda_m: inRange('direction.asda_m', input.direction.asda_m, DECLARED_DISTANCE_RANGE),
  };
  const lower = inRange('minMass_kg', input.minMass_kg ?? a.oew_kg, { min: a.oew_kg, max: a.mtow_kg, unit: 'kg' });
  const bound = input.plausibility ?? aircraftPlausibilityBound(a);
  const base: Omit<TakeoffInput, 'mass_kg'> = {
    aircraft: a, pressureAltitude_m: input.pressureAltitude_m, temperature_c: input.temperature_c, slope: input.slope,
    headwind_mps: input.headwind_mps, surface: input.surface,
    ...(input.thrustScale !== undefined ? { thrustScale: input.thrustScale } : {}),
    ...(input.clMaxScale !== undefined ? { clMaxScale: input.clMaxScale } : {}),
  };
  const trace: RunwayCheckTraceEntry[] = [];
  const warnings: Notice[] = [];
  const kg = qty.mass;
  let evaluations = 0;
  const trial = (m: number): Trial => {
    evaluations++;
    const r = analyseTakeoff({ ...base, mass_kg: m });
    if (!r.feasible) return { mass_kg: m, result: r, exceeded: [], implausible: false, allowed: false };
    const needs = declaredNeeds(r);
    const exceeded = exceededDistances(needs, d);
    const implausible = !allWithin(r, needs, bound);
    return { mass_kg: m, result: r, needs, exceeded, implausible, allowed: exceeded.length === 0 && !implausible };
  };
  const done = (o: Omit<MaxTakeoffMassResult, 'methodVersion' | 'iterations' | 'trace' | 'warnings'>, iterations: number): MaxTakeoffMassResult => {
    if (o.maxTakeoffMass_kg !== undefined) trace.push({ label: 'Greatest allowed takeoff mass', value: finite('maxTakeoffMass_kg', o.maxTakeoffMass_kg), unit: 'kg' });
    trace.push({ label: 'Takeoff analyses run', value: evaluations, unit: '' });
    return { methodVersion: RUNWAY_CHECK_METHOD_VERSION, ...o, iterations, trace, warnings };
  };

  // Climb cap from the analysis at MTOW.
  const top = trial(a.mtow_kg);
  const climb = top.result.climb;
  const climbCap = climb.limited ? climb.maxMass_kg : a.mtow_kg;
  trace.push({ label: 'Lightest mass searched', value: lower, unit: 'kg' });
  if (climbCap !== undefined) trace.push({ label: 'Climb-limited mass (V2 gradient at its minimum)', value: climbCap, unit: 'kg' });
  if (climbCap === undefined || climbCap < lower) {
    return done({
      status: 'none-feasible', limitedBy: 'climb',
      message: climbCap === undefined
        ? notice('runwayCheck.climbLimitedAtOew')`The ${climb.case} climb gradient at V2 is below the minimum (${(climb.minimum * 100).toFixed(1)} %) even at the operating empty mass; no takeoff mass is allowed. A longer runway cannot cure this.`
        : notice('runwayCheck.climbLimitedAtLightest')`The ${climb.case} climb gradient at V2 is below the minimum (${(climb.minimum * 100).toFixed(1)} %) even at the lightest mass searched (${kg(lower)}); no takeoff mass is allowed. A longer runway cannot cure this.`,
      ...(climbCap !== undefined ? { climbLimitMass_kg: climbCap } : {}),
    }, 0);
  }
  const hiTrial = climbCap === a.mtow_kg ? top : trial(climbCap);
  if (hiTrial.allowed) {
    const by: TakeoffMassLimit = climbCap < a.mtow_kg ? 'climb' : 'MTOW';
    return done({
      status: 'ok', maxTakeoffMass_kg: climbCap, limitedBy: by, climbLimitMass_kg: climbCap, needs: hiTrial.needs!,
      message: by === 'MTOW'
        ? notice('runwayCheck.mtowAllowed')`The declared distances allow the maximum takeoff mass.`
        : notice('runwayCheck.climbLimitsMass')`The V2 climb gradient limits the takeoff mass to ${kg(climbCap)}; the declared distances would allow more.`,
    }, 0);
  }
  // Light masses can be refused too: below some mass the modelled VR falls under the V1 reached
  // after an engine failure at VMCG, and the takeoff engine finds no decision speed
  // ('v1-window-empty'; in service VR would be raised). That refusal is monotone in mass, so the
  // lightest mass with a decision speed is found first by its own bisection.
  let hi = hiTrial;
  let lo = lower === climbCap ? hiTrial : trial(lower);
  let lightSteps = 0;
  if (tooLight(lo) && !tooLight(hi)) {
    const light = bisect({
      name: 'lightest mass with a decision speed', lo, hi, at: (t) => t.mass_kg, trial, holds: tooLight,
      tol: TAKEOFF_MASS_TOL_KG, maxIterations: MASS_MAX_ITERATIONS,
    });
    lightSteps = light.iterations;
    const b0 = light.hi;
    lo = b0;
    trace.push({ label: 'Lightest mass with a decision speed (V1 window not empty)', value: b0.mass_kg, unit: 'kg' });
    warnings.push(notice('runwayCheck.noDecisionSpeedBelow')`Below about ${qty.mass(b0.mass_kg)} the model finds no decision speed (VR below the V1 reached after a failure at VMCG); the search starts there.`);
  }
  if (!lo.allowed) {
    const light = lo;
    const lim = trialLimit(light);
    return done({
      status: 'none-feasible', limitedBy: 'none-feasible', climbLimitMass_kg: climbCap,
      ...(light.needs ? { refusedNeeds: light.needs } : {}),
      ...(!light.result.feasible ? { refusedReason: light.result.reason } : {}),
      refusedMass_kg: light.mass_kg,
      message: notice('runwayCheck.noMassFits')`No mass from ${kg(light.mass_kg)} to ${kg(climbCap)} fits the declared distances${light.implausible ? ' and the plausibility bound' : ''}. ${light.result.feasible
        ? [
          ...(light.exceeded.length ? [notice('runwayCheck.lightestExceeds')`At ${kg(light.mass_kg)} the takeoff still exceeds ${light.exceeded.join(', ')}.`] : []),
          ...(light.implausible ? [notice('runwayCheck.lightestImplausible')`At ${kg(light.mass_kg)} the takeoff is beyond the plausibility bound of ${bound.label}.`] : []),
        ]
        : notice('runwayCheck.lightestInfeasible')`At ${kg(light.mass_kg)}: ${light.result.message} (binding: ${lim}).`}`,
    }, lightSteps);
  }
  // Bisection: lo allowed, hi refused.
  const found = bisect({
    name: 'greatest takeoff mass', lo, hi, at: (t) => t.mass_kg, trial, holds: (t) => t.allowed,
    tol: TAKEOFF_MASS_TOL_KG, maxIterations: MASS_MAX_ITERATIONS,
  });
  lo = found.lo;
  hi = found.hi;
  const it = lightSteps + found.iterations;
  const by: TakeoffMassLimit = trialLimit(hi);
  if (!hi.result.feasible) warnings.push(notice('runwayCheck.infeasibleAboveLimit')`Just above the greatest allowed mass the takeoff is infeasible: ${hi.result.message}`);
  if (hi.result.feasible && hi.result.engineOut?.v1Limited === 'vmcg') {
    warnings.push(notice('runwayCheck.v1AtVmcgNearLimit')`V1 is held at its VMCG-based minimum near the limiting mass; the field length there is not strictly monotone in mass (the result is a mass where the distances stop fitting, within ${qty.mass(TAKEOFF_MASS_TOL_KG)}).`);
  }
  const names: Record<DistanceLimit | 'climb' | 'plausibility', string | Notice> = {
    TORA: 'takeoff run available (TORA)', TODA: 'takeoff distance available (TODA)', ASDA: 'accelerate-stop distance available (ASDA)', climb: 'climb after lift-off',
    plausibility: notice('runwayCheck.plausibilityBoundName')`plausibility bound of ${bound.label}`,
  };
  trace.push({ label: 'Bisection steps', value: it, unit: '' });
  return done({
    status: 'ok', maxTakeoffMass_kg: lo.mass_kg, limitedBy: by, climbLimitMass_kg: climbCap, needs: lo.needs!,
    refusedMass_kg: hi.mass_kg,
    ...(hi.needs ? { refusedNeeds: hi.needs } : {}),
    ...(!hi.result.feasible ? { refusedReason: hi.result.reason } : {}),
    message: notice('runwayCheck.takeoffMassLimited')`The ${names[by as DistanceLimit | 'climb' | 'plausibility']} limits the takeoff mass to ${kg(lo.mass_kg)} (MTOW ${kg(a.mtow_kg)}).`,
  }, it);
}

// ---------------------------------------------------------------------------------------------
// Greatest landing mass

export type LandingMassLimit = 'LDA' | 'MLW' | 'plausibility' | 'none-feasible';

export interface MaxLandingMassInput {
  readonly aircraft: AircraftProfile;
  readonly pressureAltitude_m: number;
  /** Outside air temperature, °C; undefined → ISA at the pressure altitude (certified basis). */
  readonly temperature_c?: number;
  /** Slope in the landing direction, ratio (+ uphill); default 0. */
  readonly slope?: number;
  /** + headwind, m/s; default 0. */
  readonly headwind_mps?: number;
  readonly surface: Surface;
  /** Landing distance available, m (0 < LDA ≤ 6 000). */
  readonly lda_m: number;
  readonly rule?: LandingRule;
  /** Operating rule set for the landing factor (default 'us-121'). */
  readonly ruleSet?: OperatingRuleSet;
  /** Lightest mass searched, kg (default OEW; OEW … MLW). */
  readonly minMass_kg?: number;
  /** The aircraft's plausibility bound (default: computed from the aircraft, core/plausibility.ts). */
  readonly plausibility?: PlausibilityBound;
}

export interface MaxLandingMassResult {
  readonly methodVersion: string;
  readonly status: 'ok' | 'none-feasible';
  readonly maxLandingMass_kg?: number;
  readonly limitedBy: LandingMassLimit;
  /** Plain-words explanation (rendered in the reader's units). */
  readonly message: Notice;
  /** Required landing runway at the greatest allowed mass, m. */
  readonly requiredAtMax_m?: number;
  /** The refused mass closest above (≤ LANDING_MASS_TOL_KG heavier), kg, when the LDA binds. */
  readonly refusedMass_kg?: number;
  readonly refusedRequired_m?: number;
  readonly iterations: number;
  readonly trace: readonly RunwayCheckTraceEntry[];
  readonly warnings: readonly Notice[];
}

/** Greatest landing mass (lower bound … MLW) whose required landing runway fits the LDA. */
export function maxLandingMassForLda(input: MaxLandingMassInput): MaxLandingMassResult {
  const a = validateAircraft(input.aircraft);
  const lda = inRange('lda_m', input.lda_m, DECLARED_DISTANCE_RANGE);
  const lower = inRange('minMass_kg', input.minMass_kg ?? a.oew_kg, { min: a.oew_kg, max: a.mlw_kg, unit: 'kg' });
  // The LDA is at most 6 000 m; the bound only binds when it is below the LDA.
  const bound = input.plausibility ?? aircraftPlausibilityBound(a);
  const limit = Math.min(lda, bound.bound_m);
  const trace: RunwayCheckTraceEntry[] = [];
  const warnings: Notice[] = [];
  const kg = qty.mass;
  let evaluations = 0;
  const trial = (m: number): { mass_kg: number; r: LandingResult; allowed: boolean } => {
    evaluations++;
    const r = analyseLanding({
      aircraft: a, mass_kg: m, pressureAltitude_m: input.pressureAltitude_m,
      ...(input.temperature_c !== undefined ? { temperature_c: input.temperature_c } : {}),
      slope: input.slope ?? 0, headwind_mps: input.headwind_mps ?? 0, surface: input.surface,
      ...(input.rule !== undefined ? { rule: input.rule } : {}),
      ...(input.ruleSet !== undefined ? { ruleSet: input.ruleSet } : {}),
    });
    return { mass_kg: m, r, allowed: r.status === 'ok' && r.required_m <= limit };
  };
  const req = (t: { r: LandingResult }): number | undefined => (t.r.status === 'ok' ? t.r.required_m : undefined);
  const done = (o: Omit<MaxLandingMassResult, 'methodVersion' | 'iterations' | 'trace' | 'warnings'>, iterations: number): MaxLandingMassResult => {
    trace.push({ label: 'LDA', value: lda, unit: 'm' });
    if (o.maxLandingMass_kg !== undefined) trace.push({ label: 'Greatest allowed landing mass', value: o.maxLandingMass_kg, unit: 'kg' });
    trace.push({ label: 'Landing analyses run', value: evaluations, unit: '' });
    return { methodVersion: RUNWAY_CHECK_METHOD_VERSION, ...o, iterations, trace, warnings };
  };
  const landingLimitName = limit < lda
    ? notice('runwayCheck.landingPlausibilityName')`plausibility bound of ${bound.label}`
    : notice('runwayCheck.ldaName')`LDA (${qty.length(lda)})`;
  const top = trial(a.mlw_kg);
  if (top.allowed) {
    return done({
      status: 'ok', maxLandingMass_kg: a.mlw_kg, limitedBy: 'MLW', requiredAtMax_m: req(top)!,
      message: notice('runwayCheck.mlwAllowed')`The LDA allows the maximum landing mass.`,
    }, 0);
  }
  const bottom = lower === a.mlw_kg ? top : trial(lower);
  if (!bottom.allowed) {
    const r = bottom.r;
    return done({
      status: 'none-feasible', limitedBy: 'none-feasible', refusedMass_kg: lower,
      ...(r.status === 'ok' ? { refusedRequired_m: r.required_m } : {}),
      message: r.status === 'ok'
        ? notice('runwayCheck.landingTooLongAtLightest')`Even at ${kg(lower)} the landing needs ${qty.length(r.required_m)}, more than the ${landingLimitName}.`
        : notice('runwayCheck.landingInfeasibleAtLightest')`Even at ${kg(lower)} the landing is not possible here: ${r.reason}`,
    }, 0);
  }
  const { lo, hi, iterations: it } = bisect({
    name: 'greatest landing mass', lo: bottom, hi: top, at: (t) => t.mass_kg, trial, holds: (t) => t.allowed,
    tol: LANDING_MASS_TOL_KG, maxIterations: MASS_MAX_ITERATIONS,
  });
  trace.push({ label: 'Bisection steps', value: it, unit: '' });
  const hiReq = req(hi);
  return done({
    status: 'ok', maxLandingMass_kg: lo.mass_kg, limitedBy: limit < lda ? 'plausibility' : 'LDA', requiredAtMax_m: req(lo)!,
    refusedMass_kg: hi.mass_kg, ...(hiReq !== undefined ? { refusedRequired_m: hiReq } : {}),
    message: notice('runwayCheck.landingMassLimited')`The ${landingLimitName} limits the landing mass to ${kg(lo.mass_kg)} (MLW ${kg(a.mlw_kg)}).`,
  }, it);
}

// ---------------------------------------------------------------------------------------------
// 3. Route penalty at a limited takeoff mass

export interface RoutePenaltyInput {
  readonly aircraft: AircraftProfile;
  /** Takeoff mass available (e.g. the runway-limited mass), kg: above 0 and at most MTOW. */
  readonly takeoffMass_kg: number;
  /** Design stage length, m (1 000 … 20 000 000). */
  readonly stageLength_m: number;
  /** Design payload, kg (0 … maximum payload). */
  readonly payload_kg: number;
  readonly reserves: ReservePolicy;
  /** Mass per passenger with baggage, kg (50 … 200), to state the penalty in passengers. */
  readonly passengerMass_kg?: number;
}

export interface RoutePenaltyResult {
  readonly methodVersion: string;
  /** 'beyond-reach': the design stage cannot be flown at this mass even with zero payload. */
  readonly status: 'ok' | 'beyond-reach';
  /** Payload the route model carries over the design stage at MTOW (the design payload unless the route itself limits it), kg. */
  readonly payloadAtMtow_kg: number;
  /** Greatest payload over the design stage at the given mass, kg (0 when beyond reach). */
  readonly payloadAtMass_kg: number;
  /** payloadAtMtow − payloadAtMass, not below 0, kg: what the takeoff-mass limit costs. */
  readonly payloadPenalty_kg: number;
  /** payloadPenalty / passengerMass (not rounded; a view rounds up to whole passengers). */
  readonly passengersPenalty?: number;
  /** Greatest stage with the design payload at the given mass, m (0 when it cannot fly). */
  readonly rangeAtMass_m: number;
  /** Design stage − rangeAtMass, not below 0, m. */
  readonly rangePenalty_m: number;
  /** Why the penalty is counted as it is (route limits, stage beyond reach), when it needs saying. */
  readonly note?: readonly Notice[];
  readonly trace: readonly RunwayCheckTraceEntry[];
  readonly warnings: readonly Notice[];
}

/** Payload and range lost on a route when the takeoff mass is limited (route payloadForRange / rangeForPayload). */
export function routePenalty(input: RoutePenaltyInput): RoutePenaltyResult {
  const a = input.aircraft;
  const pax = input.passengerMass_kg === undefined ? undefined : inRange('passengerMass_kg', input.passengerMass_kg, PASSENGER_MASS_RANGE);
  const atMtow = payloadForRange({ aircraft: a, takeoffMass_kg: a.mtow_kg, stageLength_m: input.stageLength_m, reserves: input.reserves });
  const atMass = payloadForRange({ aircraft: a, takeoffMass_kg: input.takeoffMass_kg, stageLength_m: input.stageLength_m, reserves: input.reserves });
  const range = rangeForPayload({ aircraft: a, takeoffMass_kg: input.takeoffMass_kg, payload_kg: input.payload_kg, reserves: input.reserves });
  const P = input.payload_kg;
  const pMtow = Math.min(P, atMtow.status === 'ok' ? atMtow.payload_kg : 0);
  const pMass = Math.min(P, atMass.status === 'ok' ? atMass.payload_kg : 0);
  const penalty = Math.max(0, pMtow - pMass);
  const rangeAt = range.status === 'ok' ? range.range_m : 0;
  const rangePen = Math.max(0, input.stageLength_m - rangeAt);
  const notes: Notice[] = [];
  const tom = qty.mass(input.takeoffMass_kg);
  if (atMtow.status !== 'ok') notes.push(notice('runwayCheck.stageBeyondReachAtMtow')`The design stage ${qty.distance(input.stageLength_m)} is beyond the aircraft's reach even at MTOW with zero payload.`);
  else if (pMtow < P) notes.push(notice('runwayCheck.routeLimitsPayloadAtMtow')`At MTOW the route itself limits the payload to ${qty.mass(pMtow)} (${atMtow.limitedBy}); the penalty is counted from there.`);
  if (atMass.status !== 'ok' && atMtow.status === 'ok') notes.push(notice('runwayCheck.stageBeyondReachAtMass')`At ${tom} the design stage is beyond reach even with zero payload.`);
  if (range.status !== 'ok') notes.push(notice('runwayCheck.payloadOverNoStage')`At ${tom} the design payload cannot be carried over any stage (reserves included).`);
  const trace: RunwayCheckTraceEntry[] = [
    { label: 'Takeoff mass available', value: input.takeoffMass_kg, unit: 'kg' },
    { label: 'Payload over the design stage at MTOW', value: pMtow, unit: 'kg' },
    { label: 'Payload over the design stage at the available mass', value: pMass, unit: 'kg' },
    { label: 'Payload penalty', value: penalty, unit: 'kg' },
    { label: 'Range with the design payload at the available mass', value: rangeAt, unit: 'm' },
    { label: 'Range penalty against the design stage', value: rangePen, unit: 'm' },
  ];
  return {
    methodVersion: RUNWAY_CHECK_METHOD_VERSION,
    status: atMass.status === 'ok' ? 'ok' : 'beyond-reach',
    payloadAtMtow_kg: finite('payloadAtMtow_kg', pMtow),
    payloadAtMass_kg: finite('payloadAtMass_kg', pMass),
    payloadPenalty_kg: finite('payloadPenalty_kg', penalty),
    ...(pax !== undefined ? { passengersPenalty: penalty / pax } : {}),
    rangeAtMass_m: finite('rangeAtMass_m', rangeAt),
    rangePenalty_m: finite('rangePenalty_m', rangePen),
    ...(notes.length ? { note: notes } : {}),
    trace,
    warnings: [...atMass.warnings],
  };
}

// ---------------------------------------------------------------------------------------------
// 4. Assessment of one aircraft on one runway direction

export interface AssessExistingRunwayInput {
  readonly aircraft: AircraftProfile;
  /** Runway name, e.g. "12/30". */
  readonly runway: string;
  /** Declared distances of the direction, with its average slope (+ uphill, ratio) when known. */
  readonly direction: RunwayDirectionInput & { readonly slope?: number };
  /** Average slope of this direction, ratio (+ uphill); overrides direction.slope; one of the two is required. */
  readonly slope?: number;
  readonly pressureAltitude_m: number;
  /** Design temperature, °C. */
  readonly temperature_c: number;
  /** + headwind, m/s (default 0). */
  readonly headwind_mps?: number;
  readonly surface: Surface;
  /** Design takeoff mass, kg (OEW … MTOW). */
  readonly takeoffMass_kg: number;
  /** Landing mass, kg (default MLW; OEW … MTOW, above MLW is an overweight landing). */
  readonly landingMass_kg?: number;
  /** Landing temperature, °C (undefined: ISA at the field, the certified basis). */
  readonly landingTemperature_c?: number;
  readonly landingRule?: LandingRule;
  /** Operating rule set for the landing factor (default 'us-121'). */
  readonly landingRuleSet?: OperatingRuleSet;
  /** Design route for the payload and range penalties: stage length, m, payload, kg, and reserves (all three, or none). */
  readonly stageLength_m?: number;
  readonly payload_kg?: number;
  readonly reserves?: ReservePolicy;
  /** Mass per passenger with baggage, kg (50 … 200). */
  readonly passengerMass_kg?: number;
  readonly thrustScale?: number;
  readonly clMaxScale?: number;
  /**
   * Greatest masses already solved for this aircraft, direction and conditions (they do not depend on
   * the route or the design mass); a study passes them for its second and later rows to save solves.
   */
  readonly solved?: { readonly takeoffMass: MaxTakeoffMassResult; readonly landingMass: MaxLandingMassResult };
  /** The aircraft's plausibility bound (default: computed from the aircraft, core/plausibility.ts). */
  readonly plausibility?: PlausibilityBound;
}

export interface ExistingRunwayAssessment extends ExistingRunwayCheck {
  readonly methodVersion: string;
  /** Needs at the design takeoff mass (absent when the takeoff is infeasible there). */
  readonly needs?: DeclaredNeeds;
  readonly takeoffMass: MaxTakeoffMassResult;
  readonly landingMass: MaxLandingMassResult;
  readonly penalty?: RoutePenaltyResult;
  readonly trace: readonly RunwayCheckTraceEntry[];
  readonly warnings: readonly Notice[];
}

/** One aircraft row on one runway direction: needs vs declared distances, limited masses and penalties. */
export function assessExistingRunway(input: AssessExistingRunwayInput): ExistingRunwayAssessment {
  const a = validateAircraft(input.aircraft);
  const dir = input.direction;
  check(typeof input.runway === 'string' && input.runway.length > 0, 'runway', input.runway, 'a runway name');
  const tora = inRange('direction.tora_m', dir.tora_m, DECLARED_DISTANCE_RANGE);
  const toda = inRange('direction.toda_m', dir.toda_m, DECLARED_DISTANCE_RANGE);
  const asda = inRange('direction.asda_m', dir.asda_m, DECLARED_DISTANCE_RANGE);
  const lda = inRange('direction.lda_m', dir.lda_m, DECLARED_DISTANCE_RANGE);
  const tow = inRange('takeoffMass_kg', input.takeoffMass_kg, { min: a.oew_kg, max: a.mtow_kg, unit: 'kg' });
  const lm = inRange('landingMass_kg', input.landingMass_kg ?? a.mlw_kg, { min: a.oew_kg, max: a.mtow_kg, unit: 'kg' });
  const slope = inRange(input.slope !== undefined ? 'slope' : 'direction.slope', input.slope ?? dir.slope, { min: -0.03, max: 0.03, unit: '' });
  const pax = input.passengerMass_kg === undefined ? undefined : inRange('passengerMass_kg', input.passengerMass_kg, PASSENGER_MASS_RANGE);
  const routeParts = [input.stageLength_m, input.payload_kg, input.reserves].filter((x) => x !== undefined).length;
  check(routeParts === 0 || routeParts === 3, 'stageLength_m', input.stageLength_m, 'stage length, payload and reserves given together (or none of them)');
  const route = routeParts === 3
    ? { stageLength_m: input.stageLength_m!, payload_kg: input.payload_kg!, reserves: input.reserves! }
    : undefined;
  const wind = input.headwind_mps ?? 0;
  const scales = {
    ...(input.thrustScale !== undefined ? { thrustScale: input.thrustScale } : {}),
    ...(input.clMaxScale !== undefined ? { clMaxScale: input.clMaxScale } : {}),
  };
  const cond = {
    aircraft: a, pressureAltitude_m: input.pressureAltitude_m, temperature_c: input.temperature_c, slope,
    headwind_mps: wind, surface: input.surface, ...scales,
  };
  const warnings: Notice[] = [];
  const notes: Notice[] = [];
  const trace: RunwayCheckTraceEntry[] = [{ label: 'Design takeoff mass', value: tow, unit: 'kg' }];
  const bound = input.plausibility ?? aircraftPlausibilityBound(a);

  // Needs at the design takeoff mass; none beyond the plausibility bound (that is not a length).
  const r = analyseTakeoff({ ...cond, mass_kg: tow });
  const rawNeeds = r.feasible ? declaredNeeds(r) : undefined;
  const implausible = r.feasible && rawNeeds !== undefined && !allWithin(r, rawNeeds, bound);
  const needs = implausible ? undefined : rawNeeds;
  const exceeded = needs ? exceededDistances(needs, { tora_m: tora, toda_m: toda, asda_m: asda }) : [];
  const climbLimited = r.climb.limited;
  const takeoffOk = r.feasible && !implausible && exceeded.length === 0 && !climbLimited;
  if (!r.feasible) notes.push(notice('runwayCheck.designTakeoffInfeasible')`At the design takeoff mass the takeoff is not possible here: ${r.message}`);
  else if (implausible) {
    const f = checkPlausibility([...takeoffDistances(r), { what: 'takeoff run', value_m: rawNeeds!.takeoffRun_m }], bound,
      { elevation_m: input.pressureAltitude_m, temperature_c: input.temperature_c, mass_kg: tow });
    notes.push(notice('runwayCheck.designTakeoffImplausible')`At the design takeoff mass: ${f?.notice ?? notice('runwayCheck.beyondBound')`the takeoff is beyond the plausibility bound of ${bound.label}.`}`);
  } else if (exceeded.length) notes.push(notice('runwayCheck.designTakeoffExceeds')`At the design takeoff mass the takeoff exceeds ${exceeded.join(', ')}.`);
  if (climbLimited) notes.push(notice('runwayCheck.designClimbBelowMinimum')`At the design takeoff mass the V2 climb gradient is below its minimum.`);
  if (needs) {
    trace.push({ label: 'Takeoff run needed', value: needs.takeoffRun_m, unit: 'm' });
    trace.push({ label: 'Takeoff distance needed', value: needs.takeoffDistance_m, unit: 'm' });
    if (needs.accelerateStop_m !== undefined) trace.push({ label: 'Accelerate-stop distance needed', value: needs.accelerateStop_m, unit: 'm' });
  }

  // Landing at the landing mass.
  const landingIn = {
    aircraft: a, pressureAltitude_m: input.pressureAltitude_m,
    ...(input.landingTemperature_c !== undefined ? { temperature_c: input.landingTemperature_c } : {}),
    slope, headwind_mps: wind, surface: input.surface,
    ...(input.landingRule !== undefined ? { rule: input.landingRule } : {}),
    ...(input.landingRuleSet !== undefined ? { ruleSet: input.landingRuleSet } : {}),
  };
  const land = analyseLanding({ ...landingIn, mass_kg: lm });
  const landingBeyond = land.status === 'ok' && !withinPlausibility(land.required_m, bound);
  const landingNeeded = land.status === 'ok' && !landingBeyond ? land.required_m : undefined;
  const landingOk = landingNeeded !== undefined && landingNeeded <= lda;
  if (land.status !== 'ok') notes.push(notice('runwayCheck.landingInfeasible')`Landing at ${qty.mass(lm)} is not possible here: ${land.reason}`);
  else if (landingBeyond) {
    const f = checkPlausibility([{ what: 'landing', value_m: land.required_m }], bound, {
      elevation_m: input.pressureAltitude_m, temperature_c: input.landingTemperature_c ?? standardTemperatureC(input.pressureAltitude_m), mass_kg: lm,
    });
    notes.push(f!.notice);
  }
  if (landingNeeded !== undefined) trace.push({ label: 'Landing runway needed', value: landingNeeded, unit: 'm' });

  // Greatest masses.
  const mt = input.solved?.takeoffMass ?? maxTakeoffMassForRunway({ ...cond, direction: { tora_m: tora, toda_m: toda, asda_m: asda }, plausibility: bound });
  const ml = input.solved?.landingMass ?? maxLandingMassForLda({ ...landingIn, lda_m: lda, plausibility: bound });
  warnings.push(...mt.warnings, ...ml.warnings);
  if (mt.status !== 'ok') notes.push(mt.message);
  if (ml.status !== 'ok') notes.push(ml.message);

  // Route penalty.
  let penalty: RoutePenaltyResult | undefined;
  if (route !== undefined) {
    if (mt.status === 'ok') {
      penalty = routePenalty({
        aircraft: a, takeoffMass_kg: mt.maxTakeoffMass_kg!, stageLength_m: route.stageLength_m, payload_kg: route.payload_kg,
        reserves: route.reserves, ...(pax !== undefined ? { passengerMass_kg: pax } : {}),
      });
      if (penalty.note) notes.push(...penalty.note);
      trace.push(...penalty.trace);
    } else {
      notes.push(notice('runwayCheck.routeNotFlyable')`No takeoff mass is allowed on this runway direction: the route cannot be flown from it.`);
    }
  }

  const check_: ExistingRunwayCheck = {
    runway: input.runway,
    designator: dir.designator,
    ...(needs ? { takeoffRunNeeded_m: needs.takeoffRun_m, takeoffDistanceNeeded_m: needs.takeoffDistance_m } : {}),
    ...(needs?.accelerateStop_m !== undefined ? { accelerateStopNeeded_m: needs.accelerateStop_m } : {}),
    ...(landingNeeded !== undefined ? { landingNeeded_m: landingNeeded } : {}),
    tora_m: tora, toda_m: toda, asda_m: asda, lda_m: lda,
    takeoffOk, landingOk,
    ...(mt.maxTakeoffMass_kg !== undefined ? { maxTakeoffMass_kg: mt.maxTakeoffMass_kg } : {}),
    limitedBy: mt.limitedBy,
    ...(penalty ? {
      payloadAtMax_kg: penalty.payloadAtMass_kg,
      payloadPenalty_kg: penalty.payloadPenalty_kg,
      ...(penalty.passengersPenalty !== undefined ? { passengersPenalty: penalty.passengersPenalty } : {}),
      rangeAtMax_km: penalty.rangeAtMass_m / 1000,
      rangePenalty_km: penalty.rangePenalty_m / 1000,
    } : {}),
    ...(ml.maxLandingMass_kg !== undefined ? { maxLandingMass_kg: ml.maxLandingMass_kg } : {}),
    ...(notes.length ? { note: notes } : {}),
  };
  return {
    ...check_,
    methodVersion: RUNWAY_CHECK_METHOD_VERSION,
    ...(needs ? { needs } : {}),
    takeoffMass: mt,
    landingMass: ml,
    ...(penalty ? { penalty } : {}),
    trace,
    warnings,
  };
}

/** The plain ExistingRunwayCheck of an assessment (without the nested results and trace), for storage. */
export function existingRunwayCheckOf(a: ExistingRunwayAssessment): ExistingRunwayCheck {
  const { methodVersion: _v, needs: _n, takeoffMass: _t, landingMass: _l, penalty: _p, trace: _tr, warnings: _w, ...check } = a;
  return check;
}
