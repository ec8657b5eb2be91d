/**
 * Multi-point calibration: fits up to four physics parameters of a profile to every point of a takeoff
 * planning chart at once, by bounded least squares (Levenberg–Marquardt; Levenberg, Q. Appl. Math.
 * 2 (1944) 164–168; Marquardt, J. SIAM 11 (1963) 431–441; solver: the ml-levenberg-marquardt package).
 *
 * The residual of point i is r_i = L_model(p; m_i, Hp_i, T_i) / L_chart,i − 1 (relative, so every point
 * weighs the same whatever its length); the fit minimises Σ r_i² with each parameter held inside its
 * plausible range. Parameters (all 1 or the profile's own value at the start):
 *   thrust scale  k_T   multiplies every engine's thrust (or power)             0.70 … 1.30
 *   lift scale    k_L   multiplies the takeoff CLmax (speeds scale as k_L^−½)  0.80 … 1.20
 *   flat rating   ΔT    rated thrust held to ISA + ΔT (turbine engines), K      0 … 30
 *   drag scale    k_D   multiplies CD0 (gear up and down)                       0.70 … 1.50
 * Which are fitted depends on the points (never more parameters than points): k_T always; k_L when
 * the masses differ by 10 % or more; ΔT for a turbine whose points span 10 K or more of temperature;
 * k_D with six points or more. The ranges are this project's plausible bands for tuning a generic
 * model to one type (common practice, no published source).
 *
 * A fit is refused with its reason when any point's residual exceeds the tolerance (default 2 %), or
 * when a parameter ends on a bound of its range (the chart would need a value outside it). One point
 * with the thrust scale alone is the single-factor calibration (core/calibrate.ts) as a special case.
 *
 * Validity: dry, level runway, zero wind (the conditions of a planning chart); points inside the
 * takeoff engine's input ranges. Pure: no clock, no randomness.
 */
import { levenbergMarquardt } from 'ml-levenberg-marquardt';
import { validateAircraft, type AircraftProfile } from './aircraft.js';
import { notice, qty, type Notice } from './notices.js';
import { flatRating } from './propulsion.js';
import { analyseTakeoff } from './takeoff/index.js';
import { check, finite, inRange } from './validate.js';

export const CHART_FIT_METHOD_VERSION = 'chart-fit/1';

export type FitParameterName = 'thrustScale' | 'clMaxScale' | 'flatRatingDeltaIsa_k' | 'dragScale';

/** Plausible range of each fitted parameter (common practice for tuning a generic model; see the header). */
export const FIT_PARAMETER_RANGES: Readonly<Record<FitParameterName, { readonly min: number; readonly max: number; readonly label: string; readonly unit: string }>> = {
  thrustScale: { min: 0.7, max: 1.3, label: 'thrust scale', unit: '' },
  clMaxScale: { min: 0.8, max: 1.2, label: 'takeoff CLmax scale', unit: '' },
  flatRatingDeltaIsa_k: { min: 0, max: 30, label: 'flat rating, ISA +', unit: 'K' },
  dragScale: { min: 0.7, max: 1.5, label: 'CD0 scale', unit: '' },
};

/** Largest point residual a fit may leave, as a fraction of the chart value (default 2 %). */
export const CHART_FIT_TOLERANCE = 0.02;

/** One point of a takeoff planning chart: the field length at a mass, pressure altitude and temperature. */
export interface ChartPoint {
  readonly mass_kg: number;
  readonly pressureAltitude_m: number;
  readonly temperature_c: number;
  /** Takeoff field length from the chart, m. */
  readonly length_m: number;
}

export interface ChartFitInput {
  readonly aircraft: AircraftProfile;
  readonly points: readonly ChartPoint[];
  /** Parameters to fit (default: chosen from the points, see the header). */
  readonly parameters?: readonly FitParameterName[];
  /** Largest point residual accepted, fraction (default CHART_FIT_TOLERANCE). */
  readonly tolerance?: number;
}

export interface FittedParameter {
  readonly name: FitParameterName;
  readonly label: string;
  readonly value: number;
  /** Value at the start of the fit (1, or the profile's own flat rating). */
  readonly initial: number;
  readonly min: number;
  readonly max: number;
  readonly unit: string;
}

export interface FittedPoint extends ChartPoint {
  /** The model's length with the fitted parameters, m (undefined when the model finds no takeoff there). */
  readonly model_m?: number;
  /** model − chart, m. */
  readonly residual_m?: number;
  /** (model − chart) / chart. */
  readonly residual: number;
}

export interface ChartFitResult {
  readonly status: 'ok' | 'refused';
  readonly methodVersion: string;
  readonly aircraftId: string;
  readonly parameters: readonly FittedParameter[];
  readonly points: readonly FittedPoint[];
  /** Root mean square of the relative residuals. */
  readonly rms: number;
  /** Largest |relative residual|. */
  readonly maxAbs: number;
  readonly tolerance: number;
  readonly iterations: number;
  /** Why the fit is refused (status 'refused'). */
  readonly reason?: Notice;
  /** The profile with the fitted drag and flat rating applied (status 'ok'); analyses add `scales`. */
  readonly profile?: AircraftProfile;
  /** Thrust and CLmax scales to pass to the takeoff engine with `profile` (status 'ok'). */
  readonly scales?: { readonly thrustScale?: number; readonly clMaxScale?: number };
}

const TURBINE = new Set(['turbofan', 'turboprop']);

/** The parameters the points can determine (header rules), never more than there are points. */
export function chooseFitParameters(a: AircraftProfile, points: readonly ChartPoint[]): FitParameterName[] {
  const spread = (xs: readonly number[]): number => Math.max(...xs) - Math.min(...xs);
  const out: FitParameterName[] = ['thrustScale'];
  const masses = points.map((p) => p.mass_kg);
  if (spread(masses) >= 0.1 * Math.max(...masses)) out.push('clMaxScale');
  if (TURBINE.has(a.engineType) && spread(points.map((p) => p.temperature_c)) >= 10) out.push('flatRatingDeltaIsa_k');
  if (points.length >= 6) out.push('dragScale');
  return out.slice(0, points.length);
}

/**
 * The profile with the drag and flat-rating parameters applied; thrust and lift scales stay scales
 * (the takeoff engine's thrustScale and clMaxScale inputs), so no field leaves its own range.
 */
export function profileWithParameters(a: AircraftProfile, p: Partial<Record<FitParameterName, number>>): AircraftProfile {
  const d = p.dragScale ?? 1;
  if (d === 1 && p.flatRatingDeltaIsa_k === undefined) return a;
  const out: Record<string, unknown> = { ...a };
  if (d !== 1) {
    out.cd0Takeoff = a.cd0Takeoff * d;
    if (a.cd0TakeoffGearUp !== undefined) out.cd0TakeoffGearUp = a.cd0TakeoffGearUp * d;
  }
  if (p.flatRatingDeltaIsa_k !== undefined) {
    out.flatRatingDeltaIsa_k = p.flatRatingDeltaIsa_k;
    if (a.flatRatingTemp_c !== undefined) out.flatRatingTemp_c = 15 + p.flatRatingDeltaIsa_k;
  }
  return out as unknown as AircraftProfile;
}

/** Model takeoff length at a chart point (dry, level, still air), or undefined when infeasible. */
function modelLength(a: AircraftProfile, p: Partial<Record<FitParameterName, number>>, pt: ChartPoint): number | undefined {
  const r = analyseTakeoff({
    aircraft: a, mass_kg: pt.mass_kg, pressureAltitude_m: pt.pressureAltitude_m, temperature_c: pt.temperature_c, slope: 0, headwind_mps: 0, surface: 'dry',
    ...(p.thrustScale === undefined ? {} : { thrustScale: p.thrustScale }),
    ...(p.clMaxScale === undefined ? {} : { clMaxScale: p.clMaxScale }),
  });
  return r.feasible ? r.required_m : undefined;
}

/** Relative residual used while fitting where the model finds no takeoff: large, finite (the solver cannot take NaN). */
const INFEASIBLE_RESIDUAL = 2;

/** Finite-difference step of each parameter for the solver's Jacobian. */
const STEP: Record<FitParameterName, number> = { thrustScale: 1e-3, clMaxScale: 1e-3, flatRatingDeltaIsa_k: 0.05, dragScale: 1e-3 };

/** Fits the chosen parameters to every chart point (bounded least squares on relative residuals). */
export function fitTakeoffChart(input: ChartFitInput): ChartFitResult {
  const a = validateAircraft(input.aircraft);
  const pts = input.points;
  check(Array.isArray(pts) && pts.length >= 1 && pts.length <= 400, 'points', Array.isArray(pts) ? pts.length : pts, 'a list of 1 to 400 chart points');
  pts.forEach((p, i) => {
    inRange(`points[${i}].mass_kg`, p.mass_kg, { min: a.oew_kg, max: a.mtow_kg, unit: 'kg' });
    inRange(`points[${i}].length_m`, p.length_m, { min: 100, max: 8000, unit: 'm' });
  });
  const tolerance = inRange('tolerance', input.tolerance ?? CHART_FIT_TOLERANCE, { min: 0.001, max: 0.2, unit: '' });
  const names = [...(input.parameters ?? chooseFitParameters(a, pts))];
  check(names.length >= 1 && names.length <= Math.min(4, pts.length), 'parameters', names.join(', '), `1 to ${Math.min(4, pts.length)} parameters (no more than the points)`);
  check(new Set(names).size === names.length, 'parameters', names.join(', '), 'each parameter once');
  const initial = names.map((n) => (n === 'flatRatingDeltaIsa_k' ? Math.min(FIT_PARAMETER_RANGES[n].max, Math.max(FIT_PARAMETER_RANGES[n].min, flatRating(a).deltaIsa_k)) : 1));
  const asRecord = (v: readonly number[]): Partial<Record<FitParameterName, number>> => Object.fromEntries(names.map((n, i) => [n, v[i]!]));

  // The solver fits y = f(x) with x the point index and y = 1 (model / chart at a perfect fit). It
  // wants three data or more: a chart of one or two points is repeated whole, which leaves the
  // minimum where it is (every point counts the same number of times).
  const repeat = Math.ceil(3 / pts.length);
  const xs = Array.from({ length: pts.length * repeat }, (_, j) => j % pts.length);
  const fitted = levenbergMarquardt(
    { x: xs, y: xs.map(() => 1) },
    (params) => {
      const rec = asRecord(params);
      const prof = profileWithParameters(a, rec);
      return (i) => {
        const pt = pts[i]!;
        const m = modelLength(prof, rec, pt);
        return m === undefined ? 1 + INFEASIBLE_RESIDUAL : m / pt.length_m;
      };
    },
    {
      initialValues: initial,
      minValues: names.map((n) => FIT_PARAMETER_RANGES[n].min),
      maxValues: names.map((n) => FIT_PARAMETER_RANGES[n].max),
      gradientDifference: names.map((n) => STEP[n]),
      centralDifference: false,
      damping: 1e-2,
      maxIterations: 60,
      errorTolerance: 1e-12,
    },
  );
  const values = fitted.parameterValues;
  const fit = asRecord(values);
  const profile = profileWithParameters(a, fit);
  const points: FittedPoint[] = pts.map((pt) => {
    const m = modelLength(profile, fit, pt);
    return m === undefined
      ? { ...pt, residual: INFEASIBLE_RESIDUAL }
      : { ...pt, model_m: m, residual_m: m - pt.length_m, residual: finite('residual', (m - pt.length_m) / pt.length_m) };
  });
  const parameters: FittedParameter[] = names.map((n, i) => ({ name: n, label: FIT_PARAMETER_RANGES[n].label, value: values[i]!, initial: initial[i]!, min: FIT_PARAMETER_RANGES[n].min, max: FIT_PARAMETER_RANGES[n].max, unit: FIT_PARAMETER_RANGES[n].unit }));
  const rms = Math.sqrt(points.reduce((s, p) => s + p.residual * p.residual, 0) / points.length);
  const worst = points.reduce((w, p) => (Math.abs(p.residual) > Math.abs(w.residual) ? p : w), points[0]!);
  const maxAbs = Math.abs(worst.residual);
  const common = { methodVersion: CHART_FIT_METHOD_VERSION, aircraftId: a.id, parameters, points, rms, maxAbs, tolerance, iterations: fitted.iterations };
  // Refusals: a parameter on a bound of its range, or a point the fit does not reproduce.
  const onBound = parameters.filter((p) => p.max - p.min > 0 && (Math.abs(p.value - p.min) <= 1e-6 * (p.max - p.min) || Math.abs(p.value - p.max) <= 1e-6 * (p.max - p.min)));
  if (onBound.length > 0) {
    const b = onBound[0]!;
    return {
      ...common, status: 'refused',
      reason: notice('chartFit.parameterAtBound')`The fit needs the ${b.label} at the ${Math.abs(b.value - b.min) < Math.abs(b.value - b.max) ? 'lower' : 'upper'} end of its plausible range (${b.min}–${b.max}${b.unit ? ` ${b.unit}` : ''}): the chart and the profile disagree more than tuning can explain. Check the profile and the chart.`,
    };
  }
  if (maxAbs > tolerance) {
    return {
      ...common, status: 'refused',
      reason: notice('chartFit.residualAboveTolerance')`The fit leaves ${(maxAbs * 100).toFixed(1)} % at the point of ${qty.mass(worst.mass_kg)}, ${qty.altitude(worst.pressureAltitude_m)}, ${qty.temperature(worst.temperature_c)} (chart ${qty.length(worst.length_m)}), more than the ${(tolerance * 100).toFixed(1)} % tolerance: the model cannot follow this chart with ${names.length} parameter${names.length === 1 ? '' : 's'}.`,
    };
  }
  const scales = {
    ...(fit.thrustScale === undefined ? {} : { thrustScale: fit.thrustScale }),
    ...(fit.clMaxScale === undefined ? {} : { clMaxScale: fit.clMaxScale }),
  };
  return { ...common, status: 'ok', profile, scales };
}
