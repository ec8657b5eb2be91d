/**
 * Study engine: a site, a catalogue of aircraft and fleet scenarios in; per scenario the requirement
 * of every fleet row, the critical aircraft and the recommended runway length out.
 *
 * Steps (docs/methods.md, "Study"):
 * 1. Site design conditions: pressure altitude = aerodrome elevation; design temperature given, or the
 *    aerodrome reference temperature (ICAO Annex 14 Vol. I 2.4.1/2.4.2: mean daily maximum of the
 *    hottest month by mean temperature) from the monthly climate; density and density altitude (ISA,
 *    US Standard Atmosphere 1976); runway profiles (effective gradient, direction slopes).
 * 2. Per fleet row: the design takeoff mass from the route (Breguet, reserves), capped by MTOW; the
 *    takeoff requirement at design conditions with the design runway's effective gradient taken uphill
 *    (the conservative direction), calm wind, the study's surface; the landing requirement at the
 *    landing mass (MLW by default) and ISA temperature (certified landing data are for standard day,
 *    14 CFR 25.125) with no slope credit; required length = the greater of the two.
 * 3. Regular use: the aircraft's group reaches the threshold of annual operations (500 by default,
 *    FAA AC 150/5000-17). Critical aircraft: the regular-use row that can operate with the greatest
 *    required length (ties: more operations, then the aircraft id). Recommended length: that
 *    requirement rounded up to the planning increment (roundUpToIncrement).
 *    A row whose requirement (or a physics distance behind it) is beyond the aircraft's plausibility
 *    bound (core/plausibility.ts) cannot practically operate: it has no requirement, is never the
 *    critical aircraft, and is listed under the scenario's exclusions and warnings with the reason.
 * 4. Operations served: for each candidate length, the share of the scenario's annual operations
 *    whose requirement fits. Sensitivity: required length against temperature and elevation; points
 *    beyond the plausibility bound have no length (marked impractical).
 *
 * Pure and deterministic: the same input gives the same result. No rounding other than the named
 * planning-increment step.
 */
import { notice, qty, scoped, uniqueNotices, type Notice } from '../notices.js';
import type { AircraftProfile, ReferenceTable } from '../aircraft.js';
import { fitTakeoffChart, type ChartFitResult, type ChartPoint } from '../chartFit.js';
import { airAt, standardTemperatureC } from '../atmosphere.js';
import { classifyAircraft } from '../classify.js';
import { checkDerivedDesignTemperature, designTemperatureFromMonthly } from '../climate/index.js';
import { CAUTIONS } from '../caution.js';
import { InputDomainError } from '../errors.js';
import {
  ALTERNATE_DISTANCE_RANGE_KM, ANNUAL_OPERATIONS_RANGE, CONTINGENCY_FRACTION_RANGE, DESIGN_TEMPERATURE_RANGE, PASSENGER_MASS_RANGE, REGULAR_USE_THRESHOLD_RANGE, ROUNDING_INCREMENT_RANGE,
  RESERVE_TIME_RANGE_MIN, SITE_ELEVATION_RANGE, STAGE_LENGTH_RANGE_KM,
} from '../fields.js';
import { analyseLanding, landingRuleLabel, referenceLandingSpeed, roskamLandingFieldLength } from '../landing.js';
import { referenceLengthAtSite, referenceTableAtSite } from '../reference.js';
import { requiredLength } from '../requirement.js';
import {
  aeroplaneReferenceFieldLength, checkPlausibility, plausibilityBound, takeoffDistances,
  type CheckedDistance, type PlausibilityBound, type PlausibilityFinding,
} from '../plausibility.js';
import { designTakeoffMass, payloadForRange, payloadRangeDiagram, type ReservePolicy, type RouteResult } from '../route/index.js';
import { analyseRunwayProfile, checkDeclaredDistances, checkProfileSlopes } from '../runway.js';
import { TAKEOFF_GOVERNING_LABELS, analyseTakeoff, PEAK_SCAN_SPAN_C, PEAK_SCAN_STEP_C, climbCapNotices, climbCappedTakeoff, climbLimitedPeak, type CappedTakeoff, type TakeoffResult } from '../takeoff/index.js';
import { check, inRange } from '../validate.js';
import { validateAircraft } from '../aircraft.js';
import { calibrateTakeoff, type TakeoffCalibrationResult } from '../calibrate.js';
import { DEFAULT_OPERATING_RULES } from '../operatingRules.js';
import { assessExistingRunway, existingRunwayCheckOf, type MaxLandingMassResult, type MaxTakeoffMassResult } from '../runwayCheck.js';
import type {
  AircraftClassificationSummary, ExistingRunwayCheck, FleetRowInput, LandingSummary, OperationsServedPoint, PayloadRangeSeries,
  RouteSummary, RowResult, RunwaySummary, ScenarioResult, SensitivityCurve, SiteConditions, StudyInput,
  MethodFigure, StudyMethod, StudyOptions, StudyReserves, StudyResult, TakeoffSummary, TraceItem,
} from './types.js';

/** The project's own words when a profile has no cruise data (route column and row warning). */
const NO_CRUISE_DATA: Notice = notice('study.noCruiseData')`The profile has no cruise data; the takeoff is sized at MTOW.`;

/**
 * Version of the study engine and the models it calls, and of the saved result's shape: it changes
 * whenever a number or the result's structure can change (a saved result of another version is
 * recomputed, never shown as current).
 */
export const STUDY_METHOD_VERSION = 'runwright-methods-7';

/** Temperature sweep around the design temperature, °C. */
export const SENSITIVITY_TEMPERATURE_SPAN_C = PEAK_SCAN_SPAN_C;
export const SENSITIVITY_TEMPERATURE_STEP_C = PEAK_SCAN_STEP_C;
/** Elevation sweep: sea level to the site elevation plus this, m, in this many steps. */
export const SENSITIVITY_ELEVATION_ABOVE_M = 1000;
export const SENSITIVITY_ELEVATION_STEPS = 8;
/** Most points on an operations-served curve. */
export const OPERATIONS_SERVED_MAX_POINTS = 200;

/**
 * Rounds a runway length up to the next multiple of the planning increment (e.g. 2 431 m → 2 450 m
 * with 50 m). A length already on a multiple stays (within 1e-6 m, so float noise does not add an
 * increment).
 */
export function roundUpToIncrement(length_m: number, increment_m: number): number {
  inRange('length_m', length_m, { min: 0, max: 100000, unit: 'm' });
  inRange('increment_m', increment_m, { min: 0.01, max: 1000, unit: 'm' });
  const n = Math.ceil(length_m / increment_m - 1e-6 / increment_m);
  return Math.max(0, n) * increment_m;
}

/**
 * The design temperature of a site, the one rule for the study and the site page: the given value,
 * else the aerodrome reference temperature from the monthly climate (ICAO Annex 14 §2.4.1; the older
 * formula beside it), checked against the design-temperature range. Throws InputDomainError when
 * neither is there or the derived value is out of range.
 */
export function siteDesignTemperature(site: StudyInput['site']): {
  designTemperature_c: number; source: 'given' | 'climate'; climate: SiteConditions['climate']; hottestMonthMean_c?: number; warnings: Notice[];
} {
  const warnings: Notice[] = [];
  let climate: SiteConditions['climate'];
  let hottestMonthMean_c: number | undefined;
  if (site.climate) {
    const d = designTemperatureFromMonthly({ months: site.climate.monthly, includeOlderFormula: true });
    checkDerivedDesignTemperature(site.climate.monthly, d, 'site.climate.monthly');
    climate = {
      source: site.climate.source,
      ...(site.climate.years === undefined ? {} : { years: site.climate.years }),
      hottestMonth: d.hottestMonth,
      art_c: d.art_c,
      maxMeanMaxMonth: d.maxMeanMaxMonth,
      maxMeanMax_c: d.maxMeanMax_c,
      monthsDiffer: d.monthsDiffer,
      ...(d.olderFormula ? { olderFormula_c: d.olderFormula.art_c } : {}),
    };
    hottestMonthMean_c = d.hottestMonthMean_c;
    warnings.push(...d.warnings);
  }
  const extra = hottestMonthMean_c === undefined ? {} : { hottestMonthMean_c };
  if (site.designTemperature_c !== undefined) {
    return { designTemperature_c: inRange('site.designTemperature_c', site.designTemperature_c, DESIGN_TEMPERATURE_RANGE), source: 'given', climate, ...extra, warnings };
  }
  if (climate) return { designTemperature_c: climate.art_c, source: 'climate', climate, ...extra, warnings };
  throw new InputDomainError('site.designTemperature_c', undefined, 'a design temperature or monthly climate data');
}

/** The route model's reserve policy for a study's reserve option. */
export function reservePolicyOf(r: StudyReserves): ReservePolicy {
  const alt = r.alternate_km === undefined ? {} : { alternateDistance_m: r.alternate_km * 1000 };
  switch (r.policy) {
    case 'cruise-45min': return { kind: 'cruise-45min', ...alt };
    case 'international': return { kind: 'international', ...alt, ...(r.holding_min === undefined ? {} : { holdMinutes: r.holding_min }) };
    case 'custom':
      return {
        kind: 'custom',
        alternateDistance_m: (r.alternate_km ?? 0) * 1000,
        holdMinutes: r.holding_min ?? 45,
        ...(r.contingencyFraction === undefined ? {} : { contingencyFraction: r.contingencyFraction }),
      };
  }
}

// ---------------------------------------------------------------------------------------------
// Site

export function siteConditions(input: StudyInput): SiteConditions {
  const site = input.site;
  inRange('site.elevation_m', site.elevation_m, SITE_ELEVATION_RANGE);
  check(site.runways.length > 0, 'site.runways', site.runways.length, 'at least one runway');
  const warnings: Notice[] = [];
  const temperature = siteDesignTemperature(site);
  const { designTemperature_c, source, climate } = temperature;
  warnings.push(...temperature.warnings);
  const air = airAt(site.elevation_m, designTemperature_c);
  const runways: RunwaySummary[] = site.runways.map((r, i) => {
    check(r.directions.length >= 1 && r.directions.length <= 2, `site.runways[${i}].directions`, r.directions.length, '1 or 2 directions');
    const prof = analyseRunwayProfile({ points: r.profile });
    checkProfileSlopes(prof, `site.runways[${i}].profile`);
    const directions = r.directions.map((d, j) => {
      const dd = checkDeclaredDistances(d);
      warnings.push(...dd.warnings.map((w) => scoped(`Runway ${d.designator}`, w)));
      // The first direction takes off towards increasing chainage, the second towards decreasing.
      const slope = prof.takeoffDirections[j === 0 ? 0 : 1].averageSlope;
      return { ...d, stopway_m: dd.stopway_m, clearway_m: dd.clearway_m, slope };
    });
    return {
      name: r.name,
      pavement: r.pavement,
      length_m: prof.length_m,
      effectiveGradient: prof.effectiveGradient,
      elevationDifference_m: prof.elevationDifference_m,
      highPoint_m: prof.highPoint.elevation_m,
      lowPoint_m: prof.lowPoint.elevation_m,
      directions,
      warnings: prof.warnings,
    };
  });
  const design = runways[0]!;
  return {
    name: site.name,
    elevation_m: site.elevation_m,
    pressureAltitude_m: site.elevation_m,
    designTemperature_c,
    designTemperatureSource: source,
    ...(climate ? { climate } : {}),
    standardTemperature_c: standardTemperatureC(site.elevation_m),
    isaDeviation_c: air.isaDeviation_k,
    density_kgm3: air.density_kgm3,
    densityAltitude_m: air.densityAltitude_m,
    runways,
    designRunway: design.name,
    designSlope: design.effectiveGradient,
    warnings,
  };
}

// ---------------------------------------------------------------------------------------------
// Per aircraft, per row

interface Conditions {
  readonly pressureAltitude_m: number;
  readonly temperature_c: number;
  readonly slope: number;
}

/** The takeoff model a row runs (see Evaluator.model). */
interface TakeoffModel {
  readonly profile: AircraftProfile;
  readonly thrustScale: number;
  readonly clMaxScale: number;
  /** Where the model comes from, in words for the row ("physics model calibrated to 12 chart points"). */
  readonly source: string;
  /** The fit behind it (planning data first), for the row's trace and the appendix. */
  readonly fit?: ChartFitResult;
  /** Why the model is not calibrated although the method asks for it. */
  readonly notCalibrated?: Notice;
}

/** Every node of a planning chart as a fit point. */
function chartPoints(t: ReferenceTable): ChartPoint[] {
  const out: ChartPoint[] = [];
  t.mass_kg.forEach((m, i) => t.elevation_m.forEach((h, j) => t.temperature_c.forEach((c, k) => {
    out.push({ mass_kg: m, pressureAltitude_m: h, temperature_c: c, length_m: t.length_m[i]![j]![k]! });
  })));
  return out;
}

function takeoffModelOf(a: AircraftProfile, method: StudyMethod, calibration: () => TakeoffCalibrationResult): TakeoffModel {
  const plain = { profile: a, thrustScale: 1, clMaxScale: 1 };
  if (method === 'calibrated') {
    const c = calibration();
    return c.status === 'ok'
      ? { ...plain, thrustScale: c.factor, source: `physics model, thrust calibrated to the reference length (× ${c.factor.toFixed(3)})` }
      : { ...plain, source: 'physics model (uncalibrated)' };
  }
  if (method !== 'planning') return { ...plain, source: 'physics model' };
  const table = a.reference?.table;
  const ref = a.reference?.takeoff_m;
  if (table === undefined && ref === undefined) {
    return {
      ...plain, source: 'physics model (uncalibrated: no planning figures)',
      notCalibrated: notice('study.noPlanningData')`No planning figures in the profile (no planning takeoff length or chart): the uncalibrated physics model sizes this aircraft. Check it against the manufacturer's planning data.`,
    };
  }
  const points = table !== undefined
    ? chartPoints(table).filter((p) => p.mass_kg >= a.oew_kg && p.mass_kg <= a.mtow_kg)
    : [{ mass_kg: a.mtow_kg, pressureAltitude_m: 0, temperature_c: 15, length_m: ref! }];
  const fit = fitTakeoffChart({ aircraft: a, points });
  if (fit.status !== 'ok') {
    return {
      ...plain, fit, source: 'physics model (uncalibrated: the fit to the planning data was refused)',
      notCalibrated: notice('study.planningFitRefused')`Calibration to the planning data refused: ${fit.reason!} The uncalibrated physics model sizes this aircraft.`,
    };
  }
  const thrust = fit.scales?.thrustScale ?? 1;
  return {
    profile: fit.profile!, thrustScale: thrust, clMaxScale: fit.scales?.clMaxScale ?? 1, fit,
    source: table !== undefined
      ? `physics model calibrated to ${points.length} planning-chart points (largest residual ${(fit.maxAbs * 100).toFixed(2)} %)`
      : `physics model calibrated to the planning takeoff length (thrust × ${thrust.toFixed(3)})`,
  };
}

/** Share by which a method's figure may differ from the row's requirement before the table says why. */
const SPREAD_NOTE_SHARE = 0.1;

/**
 * Every method's takeoff requirement for a row at its design conditions and mass: the planning chart,
 * the model calibrated to the planning data, the uncalibrated model, the reference length with the
 * ICAO and the authority corrections, and the indicative Torenbeek and Roskam estimates. A missing
 * figure says why; a figure more than 10 % from the row's requirement gets its likely reason.
 */
function methodSpread(
  ev: Evaluator, a: AircraftProfile, mass: number, cond: Conditions,
  refSite: Parameters<typeof referenceLengthAtSite>[0]['site'], t: Extract<TakeoffResult, { feasible: true }>,
  required: number, takeoffFrom: MethodFigure['method'] | undefined, climbOffload: number | undefined,
): MethodFigure[] {
  // The study's own analyses (cached): the row's model is the same analysis as the row's takeoff.
  const run = (m: TakeoffModel): number | undefined => {
    const r = ev.takeoff(a, mass, cond, undefined, m);
    return r.feasible ? r.required_m : undefined;
  };
  const out: MethodFigure[] = [];
  const add = (method: MethodFigure['method'], label: string, length_m: number | undefined, note?: Notice): void => {
    out.push({ method, label, ...(length_m === undefined ? {} : { length_m }), ...(note ? { note } : {}), governs: method === takeoffFrom });
  };
  const NO_CHART = notice('spread.noChart')`no planning chart in the profile`;
  // Planning chart.
  if (a.reference?.table === undefined) add('chart', 'Planning chart', undefined, NO_CHART);
  else {
    const c = referenceTableAtSite({ aircraft: a, mass_kg: mass, site: refSite, set: 'icao' });
    if (c.status === 'ok') add('chart', 'Planning chart', c.length_m);
    else add('chart', 'Planning chart', undefined, c.status === 'outside-data'
      ? notice('spread.outsideChart')`outside the chart (${c.field} ${c.value.toFixed(1)} beyond ${c.min}–${c.max}); never extrapolated`
      : NO_CHART);
  }
  // Calibrated model.
  const pm = ev.planningModel(a);
  if (pm.fit?.status === 'ok') add('calibrated-model', 'Model calibrated to the planning data', run(pm));
  else add('calibrated-model', 'Model calibrated to the planning data', undefined, pm.fit !== undefined
    ? notice('spread.fitRefused')`the fit to the planning data was refused (see the row's warnings)`
    : notice('spread.noPlanningData')`no planning figures`);
  // Uncalibrated model.
  add('model', 'Physics model, uncalibrated', run({ profile: a, thrustScale: 1, clMaxScale: 1, source: 'physics model' }));
  // Reference length with percentage corrections.
  for (const set of ['icao', 'authority'] as const) {
    const method = set === 'icao' ? 'reference-icao' : 'reference-authority';
    const label = set === 'icao' ? 'Planning takeoff length + ICAO corrections' : 'Planning takeoff length + authority corrections';
    if (a.reference?.takeoff_m === undefined) { add(method, label, undefined, notice('spread.noReference')`no planning takeoff length`); continue; }
    const r = referenceLengthAtSite({ aircraft: a, operation: 'takeoff', site: refSite, set });
    if (r.status !== 'ok') { add(method, label, undefined, notice('spread.referenceUnavailable')`not available here`); continue; }
    add(method, label, r.length_m, r.specificStudyRequired
      ? notice('spread.beyond35')`corrections beyond the 35 % limit of the percentage method: indicative only`
      : notice('spread.referenceAtMtow')`at MTOW: the percentage method does not credit the lighter design mass`);
  }
  // Indicative empirical estimates.
  // Statistical estimates: indicative (their label says so), never governing, never given a reason.
  const NA = notice('spread.notApplicable')`not applicable to this aircraft`;
  add('torenbeek', 'Torenbeek (indicative)', t.empirical.torenbeek_m, t.empirical.torenbeek_m === undefined ? NA : undefined);
  add('roskam', 'Roskam (indicative)', t.empirical.roskam_m, t.empirical.roskam_m === undefined ? NA : undefined);
  // A figure far from the requirement without a reason yet: say what is known.
  return out.map((f) => {
    if (f.length_m === undefined || f.note !== undefined || f.governs || f.method === 'torenbeek' || f.method === 'roskam'
      || Math.abs(f.length_m - required) <= SPREAD_NOTE_SHARE * required) return f;
    const why = climbOffload !== undefined
      ? notice('spread.climbLimited')`climb-limited: the row is sized at the climb-limited mass`
      : f.method === 'model' && pm.fit?.status === 'ok'
        ? notice('spread.uncalibrated')`the uncalibrated model differs from the planning data by ${((f.length_m / required - 1) * 100).toFixed(0)} %`
        : notice('spread.differs')`${((f.length_m / required - 1) * 100).toFixed(0)} % from the requirement`;
    return { ...f, note: why };
  });
}

/** Scales of a model for the existing-runway check (which takes the profile as given plus scales). */
function modelScales(m: TakeoffModel): { aircraft: AircraftProfile; thrustScale: number; clMaxScale?: number } {
  return { aircraft: m.profile, thrustScale: m.thrustScale, ...(m.clMaxScale === 1 ? {} : { clMaxScale: m.clMaxScale }) };
}

/** Memoised evaluations for one study run (pure: keyed by value). */
class Evaluator {
  private readonly takeoffCache = new Map<string, TakeoffResult>();
  private readonly calibrations = new Map<string, TakeoffCalibrationResult>();
  private readonly models = new Map<string, TakeoffModel>();
  private readonly planningModels = new Map<string, TakeoffModel>();
  /** Greatest takeoff and landing masses per aircraft and runway direction (independent of the row). */
  readonly solvedMasses = new Map<string, { takeoffMass: MaxTakeoffMassResult; landingMass: MaxLandingMassResult }>();
  private readonly arfls = new Map<string, ReturnType<typeof aeroplaneReferenceFieldLength>>();
  constructor(readonly input: StudyInput, readonly site: SiteConditions) {}

  /** Aeroplane reference field length (flight manual, else the model at MTOW, SL, ISA, dry; core/plausibility.ts). */
  arfl(a: AircraftProfile): ReturnType<typeof aeroplaneReferenceFieldLength> {
    let r = this.arfls.get(a.id);
    if (!r) {
      r = aeroplaneReferenceFieldLength(a);
      this.arfls.set(a.id, r);
    }
    return r;
  }

  /** The aircraft's plausibility bound: the same one the what-if and the runway check apply. */
  bound(a: AircraftProfile): PlausibilityBound {
    const r = this.arfl(a);
    return plausibilityBound(r.arfl_m, r.source);
  }

  get options(): StudyOptions {
    return this.input.options;
  }

  calibration(a: AircraftProfile): TakeoffCalibrationResult {
    let c = this.calibrations.get(a.id);
    if (!c) {
      c = calibrateTakeoff({ aircraft: a });
      this.calibrations.set(a.id, c);
    }
    return c;
  }

  /**
   * The takeoff model of an aircraft under the study's method: the profile as given (physics and the
   * reference methods), with the single-factor thrust calibration (calibrated), or, for planning data
   * first, fitted to the profile's planning chart (every node) or to its planning takeoff length (one
   * point, thrust alone; core/chartFit.ts). Says where it comes from.
   */
  model(a: AircraftProfile): TakeoffModel {
    let m = this.models.get(a.id);
    if (!m) {
      m = takeoffModelOf(a, this.options.method, () => this.calibration(a));
      this.models.set(a.id, m);
    }
    return m;
  }

  /** The planning-data model of an aircraft whatever the study's method (for the methods table). */
  planningModel(a: AircraftProfile): TakeoffModel {
    if (this.options.method === 'planning') return this.model(a);
    let m = this.planningModels.get(a.id);
    if (!m) {
      m = takeoffModelOf(a, 'planning', () => this.calibration(a));
      this.planningModels.set(a.id, m);
    }
    return m;
  }

  thrustScale(a: AircraftProfile): number {
    return this.model(a).thrustScale;
  }

  /** A takeoff analysis with the aircraft's model under the study's method, or with the model given (cached). */
  takeoff(a: AircraftProfile, mass_kg: number, c: Conditions, surface = this.options.surface, m = this.model(a)): TakeoffResult {
    const key = `${a.id}|${m.source}|${mass_kg}|${c.pressureAltitude_m}|${c.temperature_c}|${c.slope}|${surface}`;
    let r = this.takeoffCache.get(key);
    if (!r) {
      r = analyseTakeoff({
        aircraft: m.profile, mass_kg, pressureAltitude_m: c.pressureAltitude_m, temperature_c: c.temperature_c,
        slope: c.slope, headwind_mps: 0, surface, thrustScale: m.thrustScale, ...(m.clMaxScale === 1 ? {} : { clMaxScale: m.clMaxScale }),
      });
      this.takeoffCache.set(key, r);
    }
    return r;
  }

  designConditions(): Conditions {
    return { pressureAltitude_m: this.site.pressureAltitude_m, temperature_c: this.site.designTemperature_c, slope: this.site.designSlope };
  }

  landing(a: AircraftProfile, mass_kg: number, pressureAltitude_m: number) {
    return analyseLanding({
      aircraft: a, mass_kg, pressureAltitude_m,
      ...(this.options.landingTemperature === 'design' ? { temperature_c: this.site.designTemperature_c } : {}),
      slope: 0, headwind_mps: 0, surface: this.options.surface,
      ruleSet: this.options.operatingRules ?? DEFAULT_OPERATING_RULES,
    });
  }
}

/** The recorded override that lets a corrected reference length beyond 35 % govern: always on the page and in the report. */
function overrideWarning(what: 'Takeoff' | 'Landing', reference_m: number, model_m: number, reason: string): Notice {
  return notice('study.referenceOverride')`${what}: OVERRIDE RECORDED — the corrected reference length (${qty.length(reference_m)}) governs although the corrections exceed the 35 % limit of the percentage method; the ${what === 'Takeoff' ? 'physics' : 'landing'} model gives ${qty.length(model_m)}. Reason given: "${reason}".`;
}

function takeoffComponents(t: TakeoffResult): TraceItem[] {
  const out: TraceItem[] = [];
  if (t.allEngines) {
    out.push(
      { label: 'All engines: ground run to VR', value: t.allEngines.groundRun_m, unit: 'm' },
      { label: 'All engines: lift-off distance', value: t.allEngines.liftoff_m, unit: 'm' },
      { label: 'All engines: distance to screen height', value: t.allEngines.toScreen_m, unit: 'm' },
      { label: 'All engines: factored distance', value: t.allEngines.factored_m, unit: 'm' },
      { label: 'Average-force estimate of the run to VLOF (cross-check)', value: t.allEngines.averageForce_m, unit: 'm' },
    );
  }
  if (t.feasible && t.engineOut) {
    out.push(
      { label: 'Engine out: continued takeoff to screen height', value: t.engineOut.continued_m, unit: 'm' },
      { label: 'Accelerate-stop distance', value: t.engineOut.accelerateStop_m, unit: 'm' },
      { label: t.engineOut.v1Limited === 'balanced' ? 'Balanced field length' : `Field length (V1 limited by ${t.engineOut.v1Limited.toUpperCase()})`, value: t.engineOut.balancedField_m, unit: 'm' },
    );
  }
  if (t.feasible) {
    out.push(
      { label: 'Takeoff run (declared-distance terms)', value: t.declared.takeoffRun_m, unit: 'm' },
      { label: 'Takeoff distance (declared-distance terms)', value: t.declared.takeoffDistance_m, unit: 'm' },
    );
  }
  return out;
}


function classification(ev: Evaluator, a: AircraftProfile, cache: Map<string, AircraftClassificationSummary>): AircraftClassificationSummary {
  const hit = cache.get(a.id);
  if (hit) return hit;
  // Aeroplane reference field length: the flight-manual value when the profile carries one, else the
  // model at MTOW, sea level, ISA, still air, zero slope, dry paved runway (ICAO Annex 14 definition),
  // whatever the study's design surface.
  const { arfl_m: arfl, source } = ev.arfl(a);
  const vref = referenceLandingSpeed({ aircraft: a });
  const c = classifyAircraft(a, { arfl_m: arfl ?? 9999, vref_mps: vref });
  const out: AircraftClassificationSummary = {
    aerodromeCode: arfl === undefined ? `?${c.codeLetter ?? '?'}` : c.aerodromeCode ?? '—',
    approachCategory: c.approachCategory,
    designGroup: c.designGroup.group ?? '—',
    runwayDesignCode: c.runwayDesignCode ?? '—',
    ...(arfl === undefined ? {} : { arfl_m: arfl }),
    arflSource: source === 'flight-manual' ? 'planning figure' : 'physics model',
    vref_mps: vref,
  };
  cache.set(a.id, out);
  return out;
}

/** The takeoff at the given conditions with the climb cap applied (core/takeoff/climbCap.ts). */
function cappedTakeoff(ev: Evaluator, a: AircraftProfile, mass_kg: number, cond: Conditions): CappedTakeoff {
  return climbCappedTakeoff(a, mass_kg, (m) => ev.takeoff(a, m, cond));
}

function routeSummary(row: FleetRowInput, r: RouteResult | undefined, mass_kg: number): RouteSummary {
  if (!r) {
    return {
      status: 'no-cruise-data', reason: NO_CRUISE_DATA,
      stageLength_km: row.stageLength_km, payload_kg: row.payload_kg, payloadLeftBehind_kg: 0,
      takeoffMass_kg: mass_kg, arrivalMass_kg: 0, tripFuel_kg: 0, reserveFuel_kg: 0,
    };
  }
  return {
    status: r.status,
    ...(r.why ? { reason: r.why } : {}),
    stageLength_km: row.stageLength_km,
    payload_kg: row.payload_kg,
    payloadLeftBehind_kg: r.payloadOffload_kg,
    takeoffMass_kg: r.designTakeoffMass_kg,
    arrivalMass_kg: r.loading.arrivalMass_kg,
    tripFuel_kg: r.loading.tripFuel_kg,
    reserveFuel_kg: r.loading.reserveFuel_kg + r.loading.contingencyFuel_kg,
  };
}

function evaluateRow(
  ev: Evaluator,
  a: AircraftProfile,
  row: FleetRowInput,
  groupOperations: number,
  classes: Map<string, AircraftClassificationSummary>,
  path: string,
): RowResult {
  const opts = ev.options;
  inRange(`${path}.annualOperations`, row.annualOperations, ANNUAL_OPERATIONS_RANGE);
  inRange(`${path}.stageLength_km`, row.stageLength_km, STAGE_LENGTH_RANGE_KM);
  inRange(`${path}.payload_kg`, row.payload_kg, { min: 0, max: a.maxPayload_kg, unit: 'kg' });
  const warnings: Notice[] = [];
  const regularUse = groupOperations >= opts.regularUseThreshold;
  const cls = classification(ev, a, classes);
  const base = {
    aircraft: a.id, aircraftName: a.name, group: a.group ?? a.id, annualOperations: row.annualOperations,
    groupOperations, regularUse, classification: cls,
  };

  // 1. Design takeoff mass from the route.
  let route: RouteResult | undefined;
  let mass = a.mtow_kg;
  if (a.cruise) {
    route = designTakeoffMass({ aircraft: a, stageLength_m: row.stageLength_km * 1000, payload_kg: row.payload_kg, reserves: reservePolicyOf(opts.reserves) });
    warnings.push(...route.warnings);
    if (route.status === 'out-of-range') {
      return cannotOperate(base, route, row, notice('study.stageOutOfReach')`Cannot fly the design stage of ${qty.distance(row.stageLength_km * 1000)} even with no payload: ${route.why ?? 'beyond reach'}`, warnings);
    }
    mass = route.designTakeoffMass_kg;
    if (route.status !== 'ok') warnings.push(notice('study.sizedWithOffload')`The design payload does not fit the design stage (${route.status}): the takeoff is sized at ${qty.mass(mass)} with ${qty.mass(route.payloadOffload_kg)} of payload left behind.`);
  } else {
    warnings.push(NO_CRUISE_DATA);
  }
  const routeSum = routeSummary(row, route, mass);

  // 2. Takeoff at design conditions.
  const cond = ev.designConditions();
  // A climb limit is a finding runway length cannot cure: the aircraft must leave at the climb-limited
  // mass whatever the runway, so the runway is sized at that mass and the offload is reported.
  const capped = cappedTakeoff(ev, a, mass, cond);
  const t0 = capped.first;
  if (capped.belowOew) {
    // Missing the minimum even at the operating empty mass: no mass and no runway cures it.
    warnings.push(...t0.warnings);
    return cannotOperate(base, route, row, climbCapNotices.belowOew(t0, mass, a.oew_kg), warnings, mass, routeSum);
  }
  let climbOffload: number | undefined;
  const t = capped.t;
  if (capped.climbLimited) {
    warnings.push(climbCapNotices.capped(t0, mass, capped.mass_kg));
    climbOffload = mass - capped.mass_kg;
    mass = capped.mass_kg;
    // The climb-limited mass is itself checked: it must meet the minima and be feasible.
    if (t.feasible && t.climb.limited) {
      warnings.push(...t.warnings);
      return cannotOperate(base, route, row, climbCapNotices.atCap(t, mass), warnings, mass, routeSum);
    }
  }
  warnings.push(...t.warnings);
  if (!t.feasible) {
    return cannotOperate(base, route, row, notice('study.takeoffInfeasible')`Takeoff not possible at ${qty.mass(mass)} at design conditions: ${t.message}`, warnings, mass, routeSum);
  }
  let takeoffRequired = t.required_m;
  const summary: {
    -readonly [K in keyof TakeoffSummary]: TakeoffSummary[K];
  } = {
    method: opts.method,
    source: ev.model(a).source,
    required_m: t.required_m,
    governing: TAKEOFF_GOVERNING_LABELS[t.governing],
    components: takeoffComponents(t),
    ...(t.speeds.v1_mps === undefined ? {} : { v1_mps: t.speeds.v1_mps }),
    vr_mps: t.speeds.vr_mps,
    v2_mps: t.speeds.v2_mps,
    climbGradient: t.climb.gradient,
    climbMinimum: t.climb.minimum,
    climbLimited: t.climb.limited,
    ...(t.climb.maxMass_kg === undefined ? {} : { climbMaxMass_kg: t.climb.maxMass_kg }),
    physics_m: t.required_m,
    ...(t.empirical.torenbeek_m === undefined ? {} : { torenbeek_m: t.empirical.torenbeek_m }),
    ...(t.empirical.roskam_m === undefined ? {} : { roskam_m: t.empirical.roskam_m }),
  };
  // Which method of the methods table gives the row's takeoff number (none for the single-factor
  // calibration, which the table does not list): set where each decision below is taken.
  let takeoffFrom: MethodFigure['method'] | undefined = opts.method === 'calibrated' ? undefined
    : ev.model(a).fit?.status === 'ok' ? 'calibrated-model' : 'model';
  const refSite = {
    elevation_m: ev.site.elevation_m, referenceTemperature_c: ev.site.designTemperature_c,
    effectiveGradient: ev.site.designSlope,
    centrelineDifference_m: ev.site.runways[0]!.elevationDifference_m,
    wet: opts.surface === 'wet',
  };
  if (a.reference?.takeoff_m !== undefined) {
    const set = opts.method === 'reference-authority' ? 'authority' : 'icao';
    const ref = referenceLengthAtSite({ aircraft: a, operation: 'takeoff', site: refSite, set });
    if (ref.status === 'ok') {
      summary.reference_m = ref.length_m;
      const referenceMethod = opts.method === 'reference-icao' || opts.method === 'reference-authority';
      const overridden = referenceMethod && ref.specificStudyRequired && opts.referenceOverrideReason !== undefined;
      if (referenceMethod && ref.specificStudyRequired && !overridden) {
        // Beyond the 35 % limit of the percentage corrections (ICAO Doc 9157, Aerodrome Design Manual Part 1, percentage corrections) the corrected
        // length is indicative only and never governs without a recorded override: the physics model sizes the row.
        warnings.push(...ref.warnings);
        warnings.push(notice('study.referenceIndicative')`${ref.label ?? 'Elevation and temperature corrections exceed 35 %: indicative only, a specific study is required.'} The corrected reference length (${qty.length(ref.length_m)}) is shown as indicative only and does not govern; the physics model (${qty.length(t.required_m)}) sizes this aircraft.`);
      } else if (referenceMethod) {
        takeoffFrom = opts.method === 'reference-authority' ? 'reference-authority' : 'reference-icao';
        takeoffRequired = ref.length_m;
        summary.required_m = ref.length_m;
        summary.governing = `reference length + ${set === 'icao' ? 'ICAO' : 'authority'} corrections${overridden ? ' (override beyond the 35 % limit)' : ''}`;
        warnings.push(...ref.warnings);
        if (overridden) warnings.push(overrideWarning('Takeoff', ref.length_m, t.required_m, opts.referenceOverrideReason!));
        warnings.push(notice('study.referenceAtMtow')`Reference-length method: the reference length is at MTOW; the design mass from the route is not credited.`);
      }
    }
  } else if (opts.method === 'reference-icao' || opts.method === 'reference-authority') {
    warnings.push(notice('study.noReferenceLength')`No reference takeoff length in the profile: the physics model is used for this aircraft.`);
  }
  if (opts.method === 'planning') {
    const m = ev.model(a);
    if (m.notCalibrated) warnings.push(m.notCalibrated);
    if (m.fit?.status === 'ok') summary.calibrationFactor = m.thrustScale;
    // Inside the planning chart the chart itself gives the length (multilinear interpolation at the
    // design mass, elevation and temperature; the ICAO gradient step for the slope); outside it, the
    // calibrated model's length stands. The chart is never extrapolated.
    if (a.reference?.table !== undefined && takeoffRequired === t.required_m) {
      const chart = referenceTableAtSite({ aircraft: a, mass_kg: mass, site: refSite, set: 'icao' });
      if (chart.status === 'ok') {
        takeoffRequired = chart.length_m;
        summary.required_m = chart.length_m;
        summary.source = 'planning chart (multilinear interpolation) + ICAO gradient step';
        summary.governing = 'planning chart';
        takeoffFrom = 'chart';
        summary.chart_m = chart.length_m;
      } else if (chart.status === 'outside-data') {
        warnings.push(notice('study.outsidePlanningChart')`The design condition lies outside the planning chart (${chart.field} ${chart.value.toFixed(1)}; the chart covers ${chart.min} to ${chart.max}): the chart is not extrapolated, the calibrated model gives the length.`);
      }
    }
  }
  if (opts.method === 'calibrated') {
    const c = ev.calibration(a);
    if (c.status === 'ok') summary.calibrationFactor = c.factor;
    else warnings.push(notice('study.calibrationNotApplied')`Calibration not applied: ${c.message}; the uncalibrated physics model is used.`);
  }

  // A climb-limited aircraft's requirement can peak below the design temperature (cooler air allows a
  // heavier climb-limited mass). The row is sized on the greatest requirement over the temperatures of
  // the sensitivity grid up to the design temperature, with the climb cap applied at each.
  if (climbOffload !== undefined && takeoffRequired === t.required_m) {
    const uncapped = mass + climbOffload;
    const peak = climbLimitedPeak(a, uncapped, ev.site.designTemperature_c, takeoffRequired, (m, temperature_c) => ev.takeoff(a, m, { ...cond, temperature_c }));
    if (peak) {
      warnings.push(climbCapNotices.peak(peak, ev.site.designTemperature_c, takeoffRequired));
      takeoffRequired = peak.required_m;
      summary.required_m = peak.required_m;
      summary.governing = `${summary.governing}, at its peak below the design temperature (the row's warning gives the temperature)`;
      summary.peakTemperature_c = peak.temperature_c;
    }
  }

  summary.spread = methodSpread(ev, a, mass, cond, refSite, t, takeoffRequired, takeoffFrom, climbOffload);

  // 3. Landing.
  const landingMass = opts.landingMass === 'route' && route ? Math.min(a.mlw_kg, route.loading.arrivalMass_kg) : a.mlw_kg;
  const l = ev.landing(a, landingMass, ev.site.pressureAltitude_m);
  warnings.push(...l.warnings);
  if (l.status !== 'ok') {
    return cannotOperate(base, route, row, notice('study.landingInfeasible')`Landing not possible at ${qty.mass(landingMass)}: ${l.reason}`, warnings, mass, routeSum);
  }
  let landingRequired = l.required_m;
  let landingSummary: LandingSummary = {
    mass_kg: landingMass,
    distance_m: l.distance_m,
    required_m: l.required_m,
    rule: landingRuleLabel(l.requirement),
    ruleSource: l.requirement.source,
    factor: l.requirement.multiplier,
    vref_mps: l.speeds.vref_mps,
    components: [
      { label: 'Approach from 50 ft', value: l.segments.approach_m, unit: 'm' },
      { label: 'Flare', value: l.segments.flare_m, unit: 'm' },
      { label: 'Free roll', value: l.segments.freeRoll_m, unit: 'm' },
      { label: 'Braking', value: l.segments.braking_m, unit: 'm' },
      { label: 'Landing distance (unfactored)', value: l.distance_m, unit: 'm' },
    ],
  };
  if (a.certification === 'transport') {
    landingSummary = { ...landingSummary, roskam_m: roskamLandingFieldLength(l.speeds.vref_mps).fieldLength_m };
  }
  if ((opts.method === 'reference-icao' || opts.method === 'reference-authority') && a.reference?.landing_m !== undefined) {
    const ref = referenceLengthAtSite({ aircraft: a, operation: 'landing', site: refSite, set: opts.method === 'reference-authority' ? 'authority' : 'icao' });
    if (ref.status === 'ok' && ref.specificStudyRequired && opts.referenceOverrideReason !== undefined) {
      landingRequired = ref.length_m;
      landingSummary = { ...landingSummary, required_m: ref.length_m, rule: 'reference length + corrections (override beyond the 35 % limit)' };
      warnings.push(overrideWarning('Landing', ref.length_m, l.required_m, opts.referenceOverrideReason));
    } else if (ref.status === 'ok' && ref.specificStudyRequired) {
      warnings.push(notice('study.landingReferenceIndicative')`Landing: the corrected reference length (${qty.length(ref.length_m)}) is beyond the 35 % limit of the percentage corrections and is indicative only; the landing model (${qty.length(l.required_m)}) governs.`);
    } else if (ref.status === 'ok') {
      landingRequired = ref.length_m;
      landingSummary = { ...landingSummary, required_m: ref.length_m, rule: 'reference length + corrections' };
    }
  }

  // 4. Plausibility: a requirement beyond the aircraft's bound is a reasoned result, not a length.
  const impractical = implausibleRow(ev, a, t, takeoffRequired, mass, landingRequired, landingMass);
  if (impractical) {
    return cannotOperate(base, route, row, impractical.notice, warnings, mass, routeSum, impractical);
  }

  const req = requiredLength({ takeoff_m: takeoffRequired, landing_m: landingRequired });
  const existing: ExistingRunwayCheck[] = [];
  for (const rw of ev.site.runways) {
    for (const d of rw.directions) {
      const solvedKey = `${a.id}|${rw.name}|${d.designator}|${landingMass}`;
      const solved = ev.solvedMasses.get(solvedKey);
      const assessment = assessExistingRunway({
        runway: rw.name,
        direction: d,
        pressureAltitude_m: ev.site.pressureAltitude_m,
        temperature_c: ev.site.designTemperature_c,
        landingTemperature_c: opts.landingTemperature === 'design' ? ev.site.designTemperature_c : undefined,
        landingRuleSet: opts.operatingRules ?? DEFAULT_OPERATING_RULES,
        surface: opts.surface,
        takeoffMass_kg: mass,
        landingMass_kg: landingMass,
        ...modelScales(ev.model(a)),
        // The route penalty needs the route model: only for profiles with cruise data.
        ...(a.cruise ? { stageLength_m: row.stageLength_km * 1000, payload_kg: row.payload_kg, reserves: reservePolicyOf(opts.reserves) } : {}),
        passengerMass_kg: opts.passengerMass_kg,
        plausibility: ev.bound(a),
        ...(solved ? { solved } : {}),
      });
      if (!solved) ev.solvedMasses.set(solvedKey, { takeoffMass: assessment.takeoffMass, landingMass: assessment.landingMass });
      existing.push(existingRunwayCheckOf(assessment));
    }
  }
  return {
    ...base,
    status: 'ok',
    takeoffMass_kg: mass,
    ...(climbOffload === undefined ? {} : { climbOffload_kg: climbOffload }),
    requiredTakeoff_m: takeoffRequired,
    requiredLanding_m: landingRequired,
    required_m: req.length_m,
    governing: req.governing,
    route: routeSum,
    takeoff: summary,
    landing: landingSummary,
    existing,
    warnings: dedupe(warnings),
  };
}

/**
 * The plausibility finding of a row (core/plausibility.ts), or undefined when every length is within
 * the aircraft's bound. Checked: the method's takeoff requirement, the physics distances behind it
 * (named as the physics model's when another method gives the requirement), then the landing.
 */
function implausibleRow(
  ev: Evaluator, a: AircraftProfile, t: TakeoffResult, takeoffRequired: number, takeoffMass_kg: number,
  landingRequired: number, landingMass_kg: number,
): PlausibilityFinding | undefined {
  const bound = ev.bound(a);
  const ctx = { elevation_m: ev.site.elevation_m, temperature_c: ev.site.designTemperature_c };
  const physics = takeoffDistances(t);
  const usesPhysics = t.feasible && takeoffRequired === t.required_m;
  const takeoff: CheckedDistance[] = [
    { what: 'takeoff', value_m: takeoffRequired },
    ...(usesPhysics ? physics.slice(1) : physics.map((d) => ({ what: `physics model's ${d.what}`, value_m: d.value_m }))),
  ];
  return checkPlausibility(takeoff, bound, { ...ctx, mass_kg: takeoffMass_kg })
    ?? checkPlausibility([{ what: 'landing', value_m: landingRequired }], bound, {
      elevation_m: ev.site.elevation_m,
      temperature_c: ev.options.landingTemperature === 'design' ? ev.site.designTemperature_c : standardTemperatureC(ev.site.elevation_m),
      mass_kg: landingMass_kg,
    });
}

function cannotOperate(
  base: Omit<RowResult, 'status' | 'reason' | 'takeoffMass_kg' | 'requiredTakeoff_m' | 'requiredLanding_m' | 'required_m' | 'governing' | 'route' | 'existing' | 'warnings'>,
  route: RouteResult | undefined,
  row: FleetRowInput,
  reason: Notice,
  warnings: Notice[],
  mass = route?.designTakeoffMass_kg ?? 0,
  routeSum = routeSummary(row, route, mass),
  plausibility?: PlausibilityFinding,
): RowResult {
  // No requirement: null (never 0, which would read like one); `reason` says why.
  return {
    ...base,
    status: 'cannot-operate',
    reason,
    takeoffMass_kg: mass,
    requiredTakeoff_m: null,
    requiredLanding_m: null,
    required_m: null,
    governing: 'takeoff',
    ...(plausibility ? { plausibility } : {}),
    route: routeSum,
    existing: [],
    warnings: dedupe([reason, ...warnings]),
  };
}

const dedupe = uniqueNotices;

// ---------------------------------------------------------------------------------------------
// Scenario

/** Share of annual operations whose requirement fits each candidate length. */
/** A row that can operate, with its requirement. */
export type OperatingRow = RowResult & { readonly status: 'ok'; readonly required_m: number; readonly requiredTakeoff_m: number; readonly requiredLanding_m: number };

/** Whether a row can operate (status ok, with a requirement). */
export function isOperating(r: RowResult): r is OperatingRow {
  return r.status === 'ok' && r.required_m !== null && r.requiredTakeoff_m !== null && r.requiredLanding_m !== null;
}

export function operationsServed(rows: readonly RowResult[], increment_m: number): OperationsServedPoint[] {
  const total = rows.reduce((s, r) => s + r.annualOperations, 0);
  const ok = rows.filter(isOperating);
  if (ok.length === 0 || total === 0) return [];
  const lo = Math.max(0, Math.floor(Math.min(...ok.map((r) => r.required_m)) / increment_m) * increment_m - increment_m);
  const hi = roundUpToIncrement(Math.max(...ok.map((r) => r.required_m)), increment_m);
  const step = Math.max(increment_m, Math.ceil((hi - lo) / increment_m / OPERATIONS_SERVED_MAX_POINTS) * increment_m);
  const out: OperationsServedPoint[] = [];
  for (let L = lo; L <= hi + 1e-9; L += step) {
    const served = ok.filter((r) => r.required_m <= L + 1e-9).reduce((s, r) => s + r.annualOperations, 0);
    out.push({ length_m: L, share: served / total });
  }
  if (out[out.length - 1]!.length_m < hi - 1e-9) {
    const served = ok.reduce((s, r) => s + r.annualOperations, 0);
    out.push({ length_m: hi, share: served / total });
  }
  return out;
}

/** The critical aircraft: regular use, able to operate, greatest requirement; ties by operations, then id. */
export function criticalRow(rows: readonly RowResult[]): OperatingRow | undefined {
  const eligible = rows.filter((r): r is OperatingRow => r.regularUse && isOperating(r));
  return [...eligible].sort(
    (x, y) => y.required_m - x.required_m || y.annualOperations - x.annualOperations || (x.aircraft < y.aircraft ? -1 : 1),
  )[0];
}

// ---------------------------------------------------------------------------------------------
// Whole study

export function runStudy(input: StudyInput): StudyResult {
  validateStudy(input);
  const site = siteConditions(input);
  const ev = new Evaluator(input, site);
  const byId = new Map(input.aircraft.map((a) => [a.id, a]));
  const classes = new Map<string, AircraftClassificationSummary>();
  const opts = input.options;

  const scenarios: ScenarioResult[] = input.scenarios.map((sc, i) => {
    const groupOps = new Map<string, number>();
    for (const row of sc.fleet) {
      const a = byId.get(row.aircraft)!;
      const g = a.group ?? a.id;
      groupOps.set(g, (groupOps.get(g) ?? 0) + row.annualOperations);
    }
    const rows = sc.fleet.map((row, j) => {
      const a = byId.get(row.aircraft)!;
      return evaluateRow(ev, a, row, groupOps.get(a.group ?? a.id)!, classes, `scenarios[${i}].fleet[${j}]`);
    });
    const crit = criticalRow(rows);
    const excluded = rows.filter((r) => !isOperating(r)).map((r) => ({ aircraft: r.aircraft, reason: r.reason ?? notice('study.cannotOperate')`cannot operate` }));
    const warnings: Notice[] = [];
    // Rows beyond the plausibility bound are named with their reason: they would otherwise have set
    // the recommendation (or been mistaken for one).
    for (const r of rows) {
      if (!r.plausibility) continue;
      warnings.push(notice('study.leftOutOfSelection')`${r.aircraftName}${r.regularUse ? ' (regular use)' : ''} is left out of the critical-aircraft selection: ${r.reason ?? r.plausibility.notice}`);
    }
    if (!crit) warnings.push(notice('study.noRecommendation')`No aircraft in regular use can operate at this site: no recommendation.`);
    const irregularLonger = crit ? rows.filter(isOperating).filter((r) => !r.regularUse && r.required_m > crit.required_m) : [];
    for (const r of irregularLonger) {
      warnings.push(notice('study.irregularNeedsMore')`${r.aircraftName} needs more (${qty.length(r.required_m)}) but is below the regular-use threshold (${r.groupOperations} of ${opts.regularUseThreshold} operations).`);
    }
    return {
      name: sc.name,
      rows,
      criticalAircraft: crit?.aircraft ?? null,
      criticalAircraftName: crit?.aircraftName ?? null,
      criticalRequired_m: crit?.required_m ?? null,
      recommendedLength_m: crit ? roundUpToIncrement(crit.required_m, opts.roundingIncrement_m) : null,
      governing: crit?.governing ?? null,
      runwayDesignCode: crit?.classification.runwayDesignCode ?? null,
      totalOperations: rows.reduce((s, r) => s + r.annualOperations, 0),
      operationsServed: operationsServed(rows, opts.roundingIncrement_m),
      excluded,
      warnings,
    };
  });

  const sensitivity = sensitivityCurves(ev, input, scenarios);
  const payloadRange = payloadRangeSeries(input, scenarios);
  return {
    methodVersion: STUDY_METHOD_VERSION,
    name: input.name,
    cautions: CAUTIONS,
    options: opts,
    site,
    scenarios,
    comparison: scenarios.map((s) => ({
      scenario: s.name,
      criticalAircraft: s.criticalAircraft,
      criticalAircraftName: s.criticalAircraftName,
      recommendedLength_m: s.recommendedLength_m,
      governing: s.governing,
      runwayDesignCode: s.runwayDesignCode,
      regularUseAircraft: s.rows.filter((r) => r.regularUse).length,
    })),
    sensitivity,
    payloadRange,
    warnings: site.warnings,
  };
}

/** Samples of the runway-limited payload-range curve. */
export const RUNWAY_LIMITED_SAMPLES = 40;

/**
 * Payload-range of each scenario's critical aircraft (with cruise data): the MTOW diagram and, when
 * an existing runway direction limits the takeoff mass below MTOW, the curve at that mass.
 */
function payloadRangeSeries(input: StudyInput, scenarios: readonly ScenarioResult[]): PayloadRangeSeries[] {
  const reserves = reservePolicyOf(input.options.reserves);
  const ids = [...new Set(scenarios.map((s) => s.criticalAircraft).filter((x): x is string => x !== null))];
  const out: PayloadRangeSeries[] = [];
  for (const id of ids) {
    const aircraft = input.aircraft.find((x) => x.id === id);
    if (!aircraft?.cruise) continue;
    const diagram = payloadRangeDiagram({ aircraft, reserves });
    if (diagram.status !== 'ok') continue;
    let limit: number | undefined;
    let stage: number | undefined;
    for (const s of scenarios) {
      for (const r of s.rows) {
        if (r.aircraft !== id) continue;
        stage = Math.max(stage ?? 0, r.route.stageLength_km * 1000);
        for (const e of r.existing) if (e.maxTakeoffMass_kg !== undefined) limit = Math.max(limit ?? 0, e.maxTakeoffMass_kg);
      }
    }
    let runwayLimited: PayloadRangeSeries['runwayLimited'];
    if (limit !== undefined && limit < aircraft.mtow_kg - 1) {
      const points: { stageLength_m: number; payload_kg: number }[] = [];
      for (let k = 0; k <= RUNWAY_LIMITED_SAMPLES; k++) {
        const x = Math.max(1000, (diagram.ferryRange_m * k) / RUNWAY_LIMITED_SAMPLES);
        const p = payloadForRange({ aircraft, takeoffMass_kg: limit, stageLength_m: x, reserves });
        if (p.status !== 'ok') break;
        points.push({ stageLength_m: x, payload_kg: p.payload_kg });
      }
      runwayLimited = { takeoffMass_kg: limit, points };
    }
    out.push({
      aircraft: id, aircraftName: aircraft.name,
      points: diagram.points.map((p) => ({ stageLength_m: p.stageLength_m, payload_kg: p.payload_kg })),
      ...(runwayLimited ? { runwayLimited } : {}),
      ...(stage !== undefined ? { designStage_m: stage } : {}),
    });
  }
  return out;
}

function sensitivityCurves(ev: Evaluator, input: StudyInput, scenarios: readonly ScenarioResult[]): SensitivityCurve[] {
  const massBy = new Map<string, number>();
  for (const s of scenarios) {
    for (const r of s.rows) {
      // Rows beyond the plausibility bound are swept too: the sweep shows where they become practical.
      if (r.status !== 'ok' && !r.plausibility) continue;
      // The mass before any climb cap: each sweep point applies the climb cap of its own conditions.
      const uncapped = r.takeoffMass_kg + (r.status === 'ok' ? r.climbOffload_kg ?? 0 : 0);
      massBy.set(r.aircraft, Math.max(massBy.get(r.aircraft) ?? 0, uncapped));
    }
  }
  const site = ev.site;
  const temps: number[] = [];
  for (let dt = -SENSITIVITY_TEMPERATURE_SPAN_C; dt <= SENSITIVITY_TEMPERATURE_SPAN_C + 1e-9; dt += SENSITIVITY_TEMPERATURE_STEP_C) {
    temps.push(Math.max(-60, Math.min(60, site.designTemperature_c + dt)));
  }
  const topElevation = Math.min(4500, Math.max(site.elevation_m, 0) + SENSITIVITY_ELEVATION_ABOVE_M);
  const elevations = Array.from({ length: SENSITIVITY_ELEVATION_STEPS + 1 }, (_, k) => (topElevation * k) / SENSITIVITY_ELEVATION_STEPS);
  const out: SensitivityCurve[] = [];
  for (const a of input.aircraft) {
    const mass = massBy.get(a.id);
    if (mass === undefined) continue;
    const landingAt = (elev: number) => {
      const l = ev.landing(a, a.mlw_kg, elev);
      return l.status === 'ok' ? l.required_m : null;
    };
    const bound = ev.bound(a);
    // The same bound as the rows: a point beyond it is marked impractical and has no length.
    // The climb cap is re-applied at every point, as for the rows: a point where the design mass misses
    // a climb minimum is computed at that point's climb-limited mass and marked `climbLimited`.
    const req = (elev: number, temp: number, landing: number | null): { required_m: number | null; impractical?: true; climbLimited?: true; mass_kg?: number } => {
      const c = cappedTakeoff(ev, a, mass, { pressureAltitude_m: elev, temperature_c: temp, slope: site.designSlope });
      const capped = c.climbLimited ? { climbLimited: true as const, mass_kg: c.mass_kg } : c.belowOew ? { climbLimited: true as const } : {};
      const t = c.t;
      if (!c.ok || !t.feasible) return { required_m: null, ...capped };
      const ctx = { elevation_m: elev, temperature_c: temp, mass_kg: c.mass_kg };
      if (checkPlausibility(takeoffDistances(t), bound, ctx)) return { required_m: null, impractical: true, ...capped };
      if (landing === null) return { required_m: null, ...capped };
      if (checkPlausibility([{ what: 'landing', value_m: landing }], bound, ctx)) return { required_m: null, impractical: true, ...capped };
      return { required_m: Math.max(t.required_m, landing), ...capped };
    };
    const landingHere = landingAt(site.pressureAltitude_m);
    out.push({
      aircraft: a.id,
      aircraftName: a.name,
      mass_kg: mass,
      plausibilityBound_m: bound.bound_m,
      temperature: temps.map((temperature_c) => ({ temperature_c, ...req(site.pressureAltitude_m, temperature_c, landingHere) })),
      elevation: elevations.map((elevation_m) => {
        // Same deviation from ISA as the design day at the site.
        const temp = Math.max(-60, Math.min(60, standardTemperatureC(elevation_m) + site.isaDeviation_c));
        return { elevation_m, ...req(elevation_m, temp, landingAt(elevation_m)) };
      }),
    });
  }
  return out;
}

declare const VALID_STUDY: unique symbol;

/** A study input that has passed validateStudy (its aircraft are validated profiles too). */
export type ValidStudyInput = StudyInput & { readonly [VALID_STUDY]: true };

/** Study inputs that have passed, by identity (inputs are values: a changed one is a new object). */
const PASSED_STUDIES = new WeakSet<StudyInput>();

/**
 * Study-level checks the file schema also makes; repeated here so core never trusts its caller. An
 * input that has passed is returned at once (the parse at the edge validates it, the run does not
 * again). Linear in the fleet size; messages are built only when a check fails.
 */
export function validateStudy(input: StudyInput): ValidStudyInput {
  if (PASSED_STUDIES.has(input)) return input as ValidStudyInput;
  check(typeof input.name === 'string' && input.name.trim().length > 0, 'name', input.name, 'a non-empty study name');
  check(input.aircraft.length > 0, 'aircraft', input.aircraft.length, 'at least one aircraft');
  check(input.scenarios.length > 0, 'scenarios', input.scenarios.length, 'at least one scenario');
  const byId = new Map<string, AircraftProfile>();
  input.aircraft.forEach((a, i) => {
    validateAircraft(a, `aircraft[${i}]`);
    if (byId.has(a.id)) check(false, `aircraft[${i}].id`, a.id, 'an id not used by another aircraft');
    byId.set(a.id, a);
  });
  input.scenarios.forEach((s, i) => {
    check(s.fleet.length > 0, `scenarios[${i}].fleet`, s.fleet.length, 'at least one fleet row');
    s.fleet.forEach((r, j) => {
      const a = byId.get(r.aircraft);
      if (a === undefined) check(false, `scenarios[${i}].fleet[${j}].aircraft`, r.aircraft, `one of the study's aircraft ids (${[...byId.keys()].join(', ')})`);
      inRange(`scenarios[${i}].fleet[${j}].payload_kg`, r.payload_kg, { min: 0, max: a!.maxPayload_kg, unit: 'kg' });
    });
  });
  const o = input.options;
  inRange('options.regularUseThreshold', o.regularUseThreshold, REGULAR_USE_THRESHOLD_RANGE);
  inRange('options.roundingIncrement_m', o.roundingIncrement_m, ROUNDING_INCREMENT_RANGE);
  inRange('options.passengerMass_kg', o.passengerMass_kg, PASSENGER_MASS_RANGE);
  const r = o.reserves;
  if (r.alternate_km !== undefined) inRange('options.reserves.alternate_km', r.alternate_km, ALTERNATE_DISTANCE_RANGE_KM);
  if (r.holding_min !== undefined) inRange('options.reserves.holding_min', r.holding_min, RESERVE_TIME_RANGE_MIN);
  if (r.contingencyFraction !== undefined) inRange('options.reserves.contingencyFraction', r.contingencyFraction, CONTINGENCY_FRACTION_RANGE);
  PASSED_STUDIES.add(input);
  return input as ValidStudyInput;
}
