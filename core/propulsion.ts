/**
 * Propulsion for takeoff performance: thrust per engine as a function of airspeed and ambient air.
 *
 * Turbofan (installed thrust lapse α = T / T_SLS):
 * - Mattingly, Heiser & Pratt, *Aircraft Engine Design* (2nd ed., 2002), high-bypass installed thrust
 *   lapse: θ0 = θ·(1 + 0.2·M²), δ0 = δ·(1 + 0.2·M²)^3.5,
 *   α = δ0·(1 − 0.49·√M) for θ0 ≤ TR, α = δ0·(1 − 0.49·√M − 3·(θ0 − TR)/(1.5 + M)) above,
 *   with the throttle ratio TR = (T_flat + 273.15)/288.15 from the sea-level flat-rating temperature
 *   (domain reference §8.1). Below TR, static thrust depends on pressure alone (flat rating).
 * - Bartel & Young (2008), "Simplified thrust and fuel consumption models for modern two-shaft turbofan
 *   engines", J. Aircraft, takeoff form: T/T0 = 1 − 0.377·(1 + λ)/√((1 + 0.82·λ)·G0)·M
 *   + (0.23 + 0.19·√λ)·M², G0 = 0.0606·λ + 0.6337 (domain reference §8.2), multiplied here by the
 *   static altitude/temperature model (Mattingly at M = 0) for T0 at the ambient condition.
 *
 * Piston: Gagg–Ferrar normally aspirated power lapse P/P0 = σ − (1 − σ)/7.55 (≈ 1.132·σ − 0.132;
 * domain reference §8.3).
 *
 * Turboprop shaft power: P/P0 = min(1, (σ/σ_flat)^0.7), σ_flat = 288.15/(T_flat + 273.15) the density
 * ratio at sea-level pressure and the flat-rating temperature: power held at its rating while the air
 * is denser than at the flat-rating point, falling with density below it. The σ^0.7 form is from
 * memory (domain reference §8.3 gives σ^0.7…σ^0.8).
 *
 * Propeller thrust: T = min(η_p·P/V, T_static) with the static cap from momentum theory in
 * Gudmundsson's practical form T_static = k_p·P^(2/3)·(2ρA)^(1/3), A = πD²/4, k_p = 0.85 (from memory;
 * spinner blockage neglected). Ideal momentum-theory static thrust is (2ρA·P²)^(1/3) (k_p = 1).
 *
 * Idle thrust per engine (stop phases) = idleThrustFraction × static thrust at the ambient condition.
 *
 * Validity: takeoff and initial climb, M ≤ 0.4, pressure altitude −610…5 000 m, −60…+60 °C.
 * Mattingly's high-bypass form is used for every turbofan (low-bypass and afterburning forms are not
 * modelled). Units: SI (N, W, m/s, K, Pa).
 */
import type { AircraftProfile } from './aircraft.js';
import type { IsaPoint } from './atmosphere.js';
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
/** Gudmundsson static-thrust factor k_p (from memory). */
export const PROP_STATIC_FACTOR = 0.85;
/** Flat-rating temperature assumed when a profile gives none: ISA sea level, °C (no flat rating). */
export const DEFAULT_FLAT_RATING_C = 15;
const T0_K = 288.15;

/** Ambient air as used by the thrust models (a subset of `airAt`'s result). */
export type PropulsionAir = Pick<IsaPoint, 'temperature_k' | 'pressure_pa' | 'density_kgm3' | 'speedOfSound_mps' | 'sigma' | 'delta' | 'theta'>;

/** Throttle ratio TR = (T_flat + 273.15)/288.15 from a sea-level flat-rating temperature, °C. */
export function throttleRatio(flatRatingTemp_c: number = DEFAULT_FLAT_RATING_C): number {
  return (flatRatingTemp_c + KELVIN_OFFSET) / T0_K;
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
  /** Sea-level flat-rating temperature, °C (default 15 °C: no flat rating). */
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
  /** Practical factor k_p (1 = ideal momentum theory). */
  readonly factor?: number;
}

/** Static thrust of a propeller from momentum theory: k_p·(2ρA·P²)^(1/3), N. */
export function propStaticThrust(i: PropStaticInput): number {
  const area = (Math.PI * i.diameter_m * i.diameter_m) / 4;
  return (i.factor ?? PROP_STATIC_FACTOR) * Math.cbrt(2 * i.density_kgm3 * area * i.power_W * i.power_W);
}

export interface PropThrustInput {
  readonly power_W: number;
  readonly efficiency: number;
  readonly airspeed_mps: number;
  /** Static-thrust cap, N. */
  readonly staticThrust_N: number;
}

/** Propeller thrust min(η·P/|V|, T_static), N. */
export function propellerThrust(i: PropThrustInput): number {
  const v = Math.abs(i.airspeed_mps);
  const t = i.efficiency * i.power_W;
  return t >= i.staticThrust_N * v ? i.staticThrust_N : t / v;
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
  /** Positive airspeeds (m/s) at which the thrust curve has a kink (flat-rating corner, static cap). */
  readonly kinks_mps: readonly number[];
  /** Short description of the model for the trace. */
  readonly model: string;
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
    const tr = throttleRatio(a.flatRatingTemp_c);
    const sound = air.speedOfSound_mps;
    const theta = air.theta;
    const delta = air.delta;
    const staticLapse = mattinglyLapse({ mach: 0, theta, delta, throttleRatio: tr });
    const staticThrust = tSls * staticLapse;
    const corner = mattinglyCornerMach(theta, tr) * sound;
    if (a.thrustLapse === 'bartel-young') {
      const { b1, b2 } = bartelYoungCoefficients(a.bypassRatio ?? 0);
      return {
        engineType: a.engineType,
        thrust: (v) => staticThrust * bartelYoungKernel(v / sound, b1, b2),
        staticThrust_N: staticThrust,
        idleThrust_N: staticThrust * a.idleThrustFraction,
        lapse: staticLapse,
        kinks_mps: [],
        model: 'turbofan, Bartel–Young speed lapse × static Mattingly lapse',
      };
    }
    return {
      engineType: a.engineType,
      thrust: (v) => tSls * mattinglyKernel(v / sound, theta, delta, tr),
      staticThrust_N: staticThrust,
      idleThrust_N: staticThrust * a.idleThrustFraction,
      lapse: staticLapse,
      kinks_mps: corner > 0 ? [corner] : [],
      model: 'turbofan, Mattingly high-bypass lapse',
    };
  }
  const ratio = a.engineType === 'piston'
    ? gaggFerrarPowerRatio(air.sigma)
    : turbopropPowerRatio({ sigma: air.sigma, flatRatingTemp_c: a.flatRatingTemp_c });
  const power = (a.shaftPower_W ?? 0) * ratio * scale;
  const eta = a.propEfficiency ?? 0.7;
  const tStatic = propStaticThrust({ power_W: power, diameter_m: a.propDiameter_m ?? 2, density_kgm3: air.density_kgm3 });
  const etaP = eta * power;
  const crossover = tStatic > 0 ? etaP / tStatic : 0;
  return {
    engineType: a.engineType,
    thrust: (v) => {
      const s = v < 0 ? -v : v;
      return etaP >= tStatic * s ? tStatic : etaP / s;
    },
    staticThrust_N: tStatic,
    idleThrust_N: tStatic * a.idleThrustFraction,
    shaftPower_W: power,
    lapse: ratio,
    kinks_mps: crossover > 0 ? [crossover] : [],
    model: a.engineType === 'piston'
      ? 'piston, Gagg–Ferrar power lapse; propeller η·P/V with momentum-theory static cap'
      : 'turboprop, σ^0.7 flat-rated power lapse; propeller η·P/V with momentum-theory static cap',
  };
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
