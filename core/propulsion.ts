/**
 * Propulsion for takeoff performance: thrust per engine as a function of airspeed and ambient air.
 *
 * Turbofan (installed thrust lapse α = T / T_SLS):
 * - Mattingly, Heiser & Pratt, *Aircraft Engine Design* (2nd ed., 2002), high-bypass installed thrust
 *   lapse: θ0 = θ·(1 + 0.2·M²), δ0 = δ·(1 + 0.2·M²)^3.5,
 *   α = δ0·(1 − 0.49·√M) for θ0 ≤ TR, α = δ0·(1 − 0.49·√M − 3·(θ0 − TR)/(1.5 + M)) above
 *   (Mattingly, Heiser and Pratt, Aircraft Engine Design (2002)). Below TR, static thrust depends on pressure alone (flat rating).
 * - Flat-rating corner (the throttle ratio follows the rating, evaluated at the field's pressure
 *   altitude Hp): TR = (T_c(Hp) + 273.15)/288.15 with
 *     ISA + ΔT form (default):  T_c(Hp) = T_ISA(Hp) + ΔT,  ΔT = flatRatingDeltaIsa_k, or when only
 *                               flatRatingTemp_c is given ΔT = flatRatingTemp_c − 15 (ISA at sea level);
 *     corner-lapse form (when flatRatingCornerLapse_kPerKm is given):
 *                               T_c(Hp) = T_c0 − lapse·Hp/1000, T_c0 = flatRatingTemp_c (or 15 + ΔT).
 *   No rating given: ΔT = 0 (thrust flat to ISA). At sea level both forms give
 *   TR = (flatRatingTemp_c + 273.15)/288.15, the §8.1 relation. A corner lapse of 6.5 K/km reproduces
 *   the ISA + ΔT form exactly (the ISA tropospheric lapse).
 * - Bartel & Young (2008), "Simplified thrust and fuel consumption models for modern two-shaft turbofan
 *   engines", J. Aircraft, takeoff form: T/T0 = 1 − 0.377·(1 + λ)/√((1 + 0.82·λ)·G0)·M
 *   + (0.23 + 0.19·√λ)·M², G0 = 0.0606·λ + 0.6337 (Bartel and Young, J. Aircraft (2008)), multiplied here by the
 *   static altitude/temperature model (Mattingly at M = 0, with the same corner) for T0 at the ambient
 *   condition, so both lapse models respect the flat-rating corner.
 *
 * Piston: Gagg–Ferrar normally aspirated power lapse P/P0 = σ − (1 − σ)/7.55 (≈ 1.132·σ − 0.132;
 * Gudmundsson ch. 14–15; Gagg and Ferrar).
 *
 * Turboprop shaft power: P/P0 = min(1, (σ/σ_flat)^0.7), σ_flat = 288.15/(T_c0 + 273.15) the density
 * ratio at sea-level pressure and the sea-level corner temperature: power held at its rating while the
 * air is denser than at the flat-rating point, falling with density below it. The σ^0.7 form is from
 * memory (Gudmundsson ch. 14–15; Gagg and Ferrar gives σ^0.7…σ^0.8).
 *
 * Propeller thrust (momentum theory with a figure of merit, blended to η·P/V):
 * - static thrust T_s = (FM·P)^(2/3)·(2ρA)^(1/3), A = πD²/4 — the actuator disk whose ideal induced
 *   power T^(3/2)/√(2ρA) is FM times the shaft power (ideal FM = 1 gives (2ρA·P²)^(1/3); Gudmundsson's
 *   practical factor k_p equals FM^(2/3)). Default FM 0.55 for pistons (fixed pitch) and 0.70 for
 *   turboprops, from memory (Gudmundsson, *General Aviation Aircraft Design*, ch. 14–15; McCormick,
 *   *Aerodynamics, Aeronautics and Flight Mechanics*), when the profile gives no propFigureOfMerit.
 * - Blend: V* = η·P/T_s (where the two branches meet), V_b = 2·V*. For V ≥ V_b, T = η·P/V; below
 *   it a cubic Hermite from T_s (slope −T_s/(3V*), the ideal actuator disk's slope at rest at constant
 *   power; derived) to η·P/V_b (matching value and slope). In x = V/V* the curve is universal and
 *   strictly decreasing (Fritsch–Carlson: α = 4/3, β = 1); T is continuous with a continuous slope, the
 *   effective efficiency T·V/P rises from 0 at rest (0.73·η at V*, 0.93·η at 1.5·V*) to η at V_b.
 *   V_b = 2·V* is where the ideal actuator disk reaches 91 % ideal efficiency (derived): beyond it the
 *   profile's η is taken to include the remaining induced loss.
 *
 * Idle thrust per engine (stop phases) = idleThrustFraction × static thrust at the ambient condition.
 *
 * Validity: takeoff and initial climb, M ≤ 0.4, pressure altitude −610…5 000 m, −60…+60 °C.
 * Mattingly's high-bypass form is used for every turbofan (low-bypass and afterburning forms are not
 * modelled). Units: SI (N, W, m/s, K, Pa).
 */
import type { AircraftProfile } from './aircraft.js';
import { pressureAltitude, standardTemperatureC, type IsaPoint } from './atmosphere.js';
import { KELVIN_OFFSET } from './units.js';
import { inRange } from './validate.js';

/** Mattingly high-bypass speed coefficient (on √M). */
export const MATTINGLY_SPEED_COEFF = 0.49;
/** Mattingly high-bypass temperature coefficient (on θ0 − TR). */
export const MATTINGLY_TEMP_COEFF = 3;
/** Gagg–Ferrar divisor: P/P0 = σ − (1 − σ)/7.55. */
export const GAGG_FERRAR_DIVISOR = 7.55;
/** Turboprop shaft power exponent on σ (from memory). */
export const TURBOPROP_SIGMA_EXPONENT = 0.7;
/** Version of the thrust models; bump when their numbers change. */
export const PROPULSION_METHOD_VERSION = 'propulsion-2';
/** Default propeller static figure of merit, fixed-pitch piston installations (from memory). */
export const PROP_FM_PISTON = 0.55;
/** Default propeller static figure of merit, turboprops (from memory). */
export const PROP_FM_TURBOPROP = 0.7;
/** End of the propeller blend as a multiple of V* = η·P/T_s (η·P/V governs above; derived, see header). */
export const PROP_BLEND_END = 2;
/** Flat-rating temperature assumed when a profile gives none: ISA sea level, °C (no flat rating). */
export const DEFAULT_FLAT_RATING_C = 15;
const T0_K = 288.15;

/** Ambient air as used by the thrust models (a subset of `airAt`'s result). */
export type PropulsionAir = Pick<IsaPoint, 'temperature_k' | 'pressure_pa' | 'density_kgm3' | 'speedOfSound_mps' | 'sigma' | 'delta' | 'theta'>;

/** Throttle ratio TR = (T_flat + 273.15)/288.15 from a flat-rating (corner) temperature, °C. */
export function throttleRatio(flatRatingTemp_c: number = DEFAULT_FLAT_RATING_C): number {
  return (flatRatingTemp_c + KELVIN_OFFSET) / T0_K;
}

/** How the flat-rating corner moves with pressure altitude. */
export type FlatRatingForm = 'isa-delta' | 'corner-lapse';

/** The flat rating of an engine, resolved from the profile with its defaults. */
export interface FlatRating {
  readonly form: FlatRatingForm;
  /** ISA deviation of the corner (ISA + ΔT form; at sea level for the corner-lapse form), K. */
  readonly deltaIsa_k: number;
  /** Corner temperature at sea level, °C. */
  readonly seaLevelCorner_c: number;
  /** Corner-lapse form: fall of the corner temperature per km of pressure altitude, K/km. */
  readonly cornerLapse_kPerKm?: number;
  /** Which profile field set the rating ('default' when none: flat to ISA). */
  readonly source: 'flatRatingDeltaIsa_k' | 'flatRatingTemp_c' | 'default';
}

export type FlatRatingFields = Pick<AircraftProfile, 'flatRatingTemp_c' | 'flatRatingDeltaIsa_k' | 'flatRatingCornerLapse_kPerKm'>;

/**
 * Resolves the flat rating: ΔT = flatRatingDeltaIsa_k, else flatRatingTemp_c − 15, else 0; the
 * corner-lapse form when flatRatingCornerLapse_kPerKm is given (sea-level corner flatRatingTemp_c,
 * else 15 + ΔT).
 */
export function flatRating(a: FlatRatingFields): FlatRating {
  const source = a.flatRatingDeltaIsa_k !== undefined ? 'flatRatingDeltaIsa_k'
    : a.flatRatingTemp_c !== undefined ? 'flatRatingTemp_c' : 'default';
  const deltaIsa = a.flatRatingDeltaIsa_k ?? (a.flatRatingTemp_c !== undefined ? a.flatRatingTemp_c - DEFAULT_FLAT_RATING_C : 0);
  if (a.flatRatingCornerLapse_kPerKm !== undefined) {
    return {
      form: 'corner-lapse', deltaIsa_k: deltaIsa, cornerLapse_kPerKm: a.flatRatingCornerLapse_kPerKm, source,
      seaLevelCorner_c: a.flatRatingTemp_c ?? DEFAULT_FLAT_RATING_C + deltaIsa,
    };
  }
  return { form: 'isa-delta', deltaIsa_k: deltaIsa, seaLevelCorner_c: DEFAULT_FLAT_RATING_C + deltaIsa, source };
}

/** Corner (flat-rating) outside-air temperature at a pressure altitude, °C. */
export function flatRatingCornerTemp_c(r: FlatRating, pressureAltitude_m: number): number {
  return r.form === 'corner-lapse'
    ? r.seaLevelCorner_c - ((r.cornerLapse_kPerKm ?? 0) * pressureAltitude_m) / 1000
    : standardTemperatureC(pressureAltitude_m) + r.deltaIsa_k;
}

/** Throttle ratio at a pressure altitude: TR = (T_c(Hp) + 273.15)/288.15. */
export function throttleRatioAt(r: FlatRating, pressureAltitude_m: number): number {
  return throttleRatio(flatRatingCornerTemp_c(r, pressureAltitude_m));
}

export interface MattinglyInput {
  /** Flight Mach number (≥ 0). */
  readonly mach: number;
  /** Ambient temperature ratio θ = T/288.15. */
  readonly theta: number;
  /** Ambient pressure ratio δ = p/101 325. */
  readonly delta: number;
  /** Throttle ratio TR (θ0 at which the flat-rated regime ends). */
  readonly throttleRatio: number;
}

/** Mattingly high-bypass installed thrust lapse α = T/T_SLS (never below 0). */
export function mattinglyLapse(i: MattinglyInput): number {
  return mattinglyKernel(i.mach, i.theta, i.delta, i.throttleRatio);
}

/** Hot-path form of `mattinglyLapse` (no input object); same formula. */
function mattinglyKernel(mach: number, theta: number, delta: number, tr: number): number {
  const m = mach < 0 ? -mach : mach;
  const k = 1 + 0.2 * m * m;
  const theta0 = theta * k;
  const delta0 = delta * k * k * k * Math.sqrt(k);
  let f = 1 - MATTINGLY_SPEED_COEFF * Math.sqrt(m);
  if (theta0 > tr) f -= (MATTINGLY_TEMP_COEFF * (theta0 - tr)) / (1.5 + m);
  const a = delta0 * f;
  return a > 0 ? a : 0;
}

/**
 * Mach number at which θ0 = θ·(1 + 0.2M²) reaches TR (the flat-rating corner moves with ram
 * temperature); 0 when the engine is already past its corner at rest.
 */
export function mattinglyCornerMach(theta: number, tr: number): number {
  return theta < tr ? Math.sqrt(5 * (tr / theta - 1)) : 0;
}

export interface BartelYoungInput {
  /** Flight Mach number. */
  readonly mach: number;
  /** Bypass ratio λ. */
  readonly bypassRatio: number;
}

/** Bartel–Young takeoff thrust ratio T/T0 (T0 = static thrust at the same ambient condition). */
export function bartelYoungLapse(i: BartelYoungInput): number {
  const c = bartelYoungCoefficients(i.bypassRatio);
  return bartelYoungKernel(i.mach, c.b1, c.b2);
}

/** Linear and quadratic Mach coefficients of the Bartel–Young form for a bypass ratio λ. */
function bartelYoungCoefficients(l: number): { b1: number; b2: number } {
  const g0 = 0.0606 * l + 0.6337;
  return { b1: (0.377 * (1 + l)) / Math.sqrt((1 + 0.82 * l) * g0), b2: 0.23 + 0.19 * Math.sqrt(l) };
}

function bartelYoungKernel(mach: number, b1: number, b2: number): number {
  const m = mach < 0 ? -mach : mach;
  const r = 1 - b1 * m + b2 * m * m;
  return r > 0 ? r : 0;
}

/** Gagg–Ferrar normally aspirated piston power ratio P/P0 from the density ratio σ (never below 0). */
export function gaggFerrarPowerRatio(sigma: number): number {
  const r = sigma - (1 - sigma) / GAGG_FERRAR_DIVISOR;
  return r > 0 ? r : 0;
}

export interface TurbopropPowerInput {
  /** Ambient density ratio σ. */
  readonly sigma: number;
  /** Sea-level flat-rating (corner) temperature, °C (default 15 °C: no flat rating). */
  readonly flatRatingTemp_c?: number;
}

/** Turboprop shaft power ratio P/P0 = min(1, (σ/σ_flat)^0.7) (from memory). */
export function turbopropPowerRatio(i: TurbopropPowerInput): number {
  const sigmaFlat = T0_K / ((i.flatRatingTemp_c ?? DEFAULT_FLAT_RATING_C) + KELVIN_OFFSET);
  const r = Math.pow(i.sigma / sigmaFlat, TURBOPROP_SIGMA_EXPONENT);
  return r < 1 ? r : 1;
}

export interface PropStaticInput {
  /** Shaft power, W. */
  readonly power_W: number;
  /** Propeller diameter, m. */
  readonly diameter_m: number;
  /** Air density, kg/m³. */
  readonly density_kgm3: number;
  /** Static figure of merit FM (1 = ideal momentum theory). */
  readonly figureOfMerit?: number;
}

/** Static thrust of a propeller from momentum theory with a figure of merit: (FM·P)^(2/3)·(2ρA)^(1/3), N. */
export function propStaticThrust(i: PropStaticInput): number {
  const area = (Math.PI * i.diameter_m * i.diameter_m) / 4;
  const p = (i.figureOfMerit ?? 1) * i.power_W;
  return Math.cbrt(2 * i.density_kgm3 * area * p * p);
}

/** Default static figure of merit of an engine type's propeller (from memory). */
export function defaultFigureOfMerit(engineType: AircraftProfile['engineType']): number {
  return engineType === 'turboprop' ? PROP_FM_TURBOPROP : PROP_FM_PISTON;
}

export interface PropThrustInput {
  readonly power_W: number;
  readonly efficiency: number;
  readonly airspeed_mps: number;
  /** Static thrust, N. */
  readonly staticThrust_N: number;
}

/**
 * Propeller thrust, N: static thrust T_s at rest, η·P/|V| from V_b = 2·V* (V* = η·P/T_s) and a
 * monotone cubic Hermite blend between (see the module header).
 */
export function propellerThrust(i: PropThrustInput): number {
  const etaP = i.efficiency * i.power_W;
  return propKernel(Math.abs(i.airspeed_mps), i.staticThrust_N, etaP > 0 ? i.staticThrust_N / etaP : 0);
}

/** Effective propeller efficiency T·V/P of the blended curve (0 at rest, η from V_b on). */
export function propEffectiveEfficiency(i: PropThrustInput): number {
  return i.power_W > 0 ? (propellerThrust(i) * Math.abs(i.airspeed_mps)) / i.power_W : 0;
}

/** Blend end speed V_b = PROP_BLEND_END·η·P/T_s, m/s (0 when there is no thrust). */
export function propBlendEndSpeed(i: Omit<PropThrustInput, 'airspeed_mps'>): number {
  return i.staticThrust_N > 0 ? (PROP_BLEND_END * i.efficiency * i.power_W) / i.staticThrust_N : 0;
}

const C = PROP_BLEND_END;
// Hermite coefficients in units of T_s: T/T_s = h00 + (V_b·s0/T_s)·h10 + (T_b/T_s)·h01 + (V_b·s1/T_s)·h11
// with V_b·s0 = −(C/3)·T_s, T_b = T_s/C, V_b·s1 = −T_s/C.
const K10 = -C / 3;
const K01 = 1 / C;
const K11 = -1 / C;

/** Hot-path blend; invVStar = 1/V* = T_s/(η·P). */
function propKernel(v: number, tStatic: number, invVStar: number): number {
  if (invVStar <= 0) return 0;
  const x = v * invVStar;
  if (x >= C) return tStatic / x;
  const t = x / C;
  const t2 = t * t;
  const t3 = t2 * t;
  const h00 = 2 * t3 - 3 * t2 + 1;
  const h10 = t3 - 2 * t2 + t;
  const h01 = 3 * t2 - 2 * t3;
  const h11 = t3 - t2;
  return tStatic * (h00 + K10 * h10 + K01 * h01 + K11 * h11);
}

/** Thrust of one engine at the ambient condition it was built for. */
export interface EngineModel {
  readonly engineType: AircraftProfile['engineType'];
  /** Thrust per engine at an airspeed (m/s, sign ignored), N. */
  thrust(airspeed_mps: number): number;
  /** Thrust per engine at zero airspeed, N. */
  readonly staticThrust_N: number;
  /** Idle thrust per engine (idleThrustFraction × static thrust), N. */
  readonly idleThrust_N: number;
  /** Shaft power per engine at this condition, W (propeller engines). */
  readonly shaftPower_W?: number;
  /** Power or static-thrust ratio to the sea-level ISA rating. */
  readonly lapse: number;
  /**
   * Positive airspeeds (m/s) where the integrator should break its intervals: the turbofan flat-rating
   * corner (a kink) and the propeller blend end V_b (a jump in the curve's second derivative).
   */
  readonly kinks_mps: readonly number[];
  /** Short description of the model for the trace. */
  readonly model: string;
  /** Turbofan: flat-rating corner temperature at the field's pressure altitude, °C. */
  readonly flatRatingCorner_c?: number;
  /** Propeller: static figure of merit used, and whether it is the type default. */
  readonly figureOfMerit?: number;
  readonly figureOfMeritDefault?: boolean;
}

export interface EngineModelInput {
  readonly aircraft: AircraftProfile;
  readonly air: PropulsionAir;
  /** Multiplier on thrust (calibration), default 1. */
  readonly thrustScale?: number;
}

/**
 * Builds the thrust model of one engine of `aircraft` in `air`. The profile is assumed valid
 * (validateAircraft); thrustScale is checked here (0.3…2).
 */
export function engineModel(i: EngineModelInput): EngineModel {
  const a = i.aircraft;
  const air = i.air;
  const scale = inRange('thrustScale', i.thrustScale ?? 1, { min: 0.3, max: 2, unit: '' });
  if (a.engineType === 'turbofan') {
    const tSls = (a.staticThrust_N ?? 0) * scale;
    const rating = flatRating(a);
    const cornerC = flatRatingCornerTemp_c(rating, pressureAltitude(air.pressure_pa));
    const tr = throttleRatio(cornerC);
    const sound = air.speedOfSound_mps;
    const theta = air.theta;
    const delta = air.delta;
    const staticLapse = mattinglyLapse({ mach: 0, theta, delta, throttleRatio: tr });
    const staticThrust = tSls * staticLapse;
    const corner = mattinglyCornerMach(theta, tr) * sound;
    const ratingText = flatRatingText(rating, cornerC);
    if (a.thrustLapse === 'bartel-young') {
      const { b1, b2 } = bartelYoungCoefficients(a.bypassRatio ?? 0);
      return {
        engineType: a.engineType,
        thrust: (v) => staticThrust * bartelYoungKernel(v / sound, b1, b2),
        staticThrust_N: staticThrust,
        idleThrust_N: staticThrust * a.idleThrustFraction,
        lapse: staticLapse,
        kinks_mps: [],
        model: `turbofan, Bartel–Young speed lapse × static Mattingly lapse; ${ratingText}`,
        flatRatingCorner_c: cornerC,
      };
    }
    return {
      engineType: a.engineType,
      thrust: (v) => tSls * mattinglyKernel(v / sound, theta, delta, tr),
      staticThrust_N: staticThrust,
      idleThrust_N: staticThrust * a.idleThrustFraction,
      lapse: staticLapse,
      kinks_mps: corner > 0 ? [corner] : [],
      model: `turbofan, Mattingly high-bypass lapse; ${ratingText}`,
      flatRatingCorner_c: cornerC,
    };
  }
  const ratio = a.engineType === 'piston'
    ? gaggFerrarPowerRatio(air.sigma)
    : turbopropPowerRatio({ sigma: air.sigma, flatRatingTemp_c: flatRating(a).seaLevelCorner_c });
  const power = (a.shaftPower_W ?? 0) * ratio * scale;
  const eta = a.propEfficiency ?? 0.7;
  const fmDefault = a.propFigureOfMerit === undefined;
  const fm = a.propFigureOfMerit ?? defaultFigureOfMerit(a.engineType);
  const tStatic = propStaticThrust({ power_W: power, diameter_m: a.propDiameter_m ?? 2, density_kgm3: air.density_kgm3, figureOfMerit: fm });
  const etaP = eta * power;
  const invVStar = etaP > 0 ? tStatic / etaP : 0;
  const vBlend = propBlendEndSpeed({ power_W: power, efficiency: eta, staticThrust_N: tStatic });
  const fmText = `figure of merit ${fm.toFixed(2)}${fmDefault ? ` (${a.engineType} default, from memory)` : ' (profile)'}`;
  return {
    engineType: a.engineType,
    thrust: (v) => propKernel(v < 0 ? -v : v, tStatic, invVStar),
    staticThrust_N: tStatic,
    idleThrust_N: tStatic * a.idleThrustFraction,
    shaftPower_W: power,
    lapse: ratio,
    kinks_mps: vBlend > 0 ? [vBlend] : [],
    model: `${a.engineType === 'piston' ? 'piston, Gagg–Ferrar power lapse' : 'turboprop, σ^0.7 flat-rated power lapse'}; ` +
      `propeller static thrust from momentum theory, ${fmText}, blended smoothly to η·P/V`,
    figureOfMerit: fm,
    figureOfMeritDefault: fmDefault,
  };
}

function flatRatingText(r: FlatRating, cornerC: number): string {
  const from = r.source === 'default' ? 'no rating given: flat to ISA' : `from ${r.source}`;
  return r.form === 'corner-lapse'
    ? `flat to ${cornerC.toFixed(1)} °C here (corner ${r.seaLevelCorner_c.toFixed(1)} °C at sea level less ${r.cornerLapse_kPerKm} K/km; ${from})`
    : `flat to ISA + ${r.deltaIsa_k.toFixed(1)} K = ${cornerC.toFixed(1)} °C here (${from})`;
}

export interface ThrustInput extends EngineModelInput {
  /** True airspeed, m/s. */
  readonly airspeed_mps: number;
}

/** Thrust of one engine at an airspeed in the given air, N (convenience over `engineModel`). */
export function thrustPerEngine(i: ThrustInput): number {
  inRange('airspeed_mps', i.airspeed_mps, { min: -50, max: 200, unit: 'm/s' });
  return engineModel(i).thrust(i.airspeed_mps);
}
