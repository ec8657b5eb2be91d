/**
 * Landing distance from 50 ft to a full stop by segments, and the landing runway required by an
 * operating rule.
 *
 * Source: J. D. Anderson, Aircraft Performance and Design (1999), §6.8 (eqs 6.104–6.121):
 *   approach  s_a = (h_50 − h_f) / tan γ, glide γ = 3°, at V_a
 *   flare     R = V_f² / (g (n − 1)) = V_f² / (0.2 g) for n = 1.2;  h_f = R (1 − cos γ);  s_f = R sin γ
 *   free roll s_fr = N · V_TD
 *   braking   s_b = 1/(2 g J_A) · ln(1 + J_A V_TD² / J_T),
 *             J_T = μ_b cos θ + sin θ − T_idle/W,   J_A = ρ/(2 W/S) · (C_D − μ_b C_L)
 * with the approach speed VREF = profile.vrefFactor × VSR0 (raised to 1.23 VSR0 for transports,
 * 14 CFR 25.125(b)(2)(i)) or, as an option, 1.3 × VS; touchdown at the profile's VTD/VREF, else
 * 0.95 VREF for transports (from memory) with the flare at the mean of VREF and VTD, and the textbook
 * schedule V_a : V_f : V_TD = 1.3 : 1.23 : 1.15 for other categories. θ is the runway slope (+ uphill in the landing direction).
 * Regulatory factors: 14 CFR 121.195(b) (stop within 60 % of the runway → LD / 0.60), (c) (turboprop
 * alternate, 70 %), (d) (turbojet, wet: × 1.15); normal-category aircraft have no regulatory landing
 * factor (a user factor, default 1.0).
 *
 * Model choices (documented in docs/methods/landing-corrections-classification.md):
 * - The glide angle and the flare are flown in the air mass; ground distances of the air segments are
 *   air distances × groundspeed/airspeed. Braking is integrated over groundspeed V with airspeed
 *   V + V_w: by the closed form above in still air, otherwise by composite Gauss–Legendre quadrature
 *   over groundspeed (split where the airspeed changes sign or the wheel load reaches zero).
 * - Lift on the ground: C_L ≈ 0.1 with lift dumping (transport category: spoilers assumed), the
 *   profile's clGround otherwise. C_D = cd0Landing + φ K C_L² with ground effect φ.
 * - Idle thrust held constant: turbofan n × staticThrust × idleFraction; propeller n × idleFraction ×
 *   the momentum-theory ideal static thrust (2 ρ A P²)^(1/3). Reverse thrust is never credited.
 * - Default temperature: ISA at the pressure altitude (certified landing data are for standard
 *   temperature, 14 CFR 25.125(a)); a hot-day temperature is an option.
 *
 * Validity: pressure altitude −400 to 4 500 m, temperature −60 to 60 °C, slope −5 % to +5 %,
 * headwind −15 (tailwind) to 40 m/s, landing mass from OEW to MTOW. Pure: SI only, no rounding.
 */
import { notice, qty, type Notice } from './notices.js';
import { type AircraftProfile, type EngineType, stallSpeed, validateAircraft } from './aircraft.js';
import { airAt, standardTemperatureC } from './atmosphere.js';
import { SURFACES, type Surface, friction, isWet } from './surface.js';
import { FT, G0, KT } from './units.js';
import { check, finite, inRange } from './validate.js';
import { gaussLegendre } from './numeric/index.js';
import {
  DEFAULT_OPERATING_RULES, EU_TURBOPROP_LANDING_FRACTION, EU_WET_FACTOR, LIGHT_FACTOR_SOURCE, LIGHT_LANDING_FACTOR_DEFAULT,
  ON_DEMAND_LANDING_FRACTION, OPERATING_RULE_SETS, OPERATING_RULE_SET_INFO, type OperatingRuleSet, isOperatingRuleSet,
} from './operatingRules.js';

export const LANDING_METHOD_VERSION = 'landing-physics/2';

/** Screen height for landing, m (50 ft: 14 CFR 25.125, 23.2130). */
export const LANDING_SCREEN_HEIGHT_M = 50 * FT;
/** Default approach glide angle, degrees (transports, Anderson §6.8). */
export const DEFAULT_GLIDE_ANGLE_DEG = 3;
/** Load factor in the flare (Anderson §6.8). */
export const FLARE_LOAD_FACTOR = 1.2;
/** Flare (average) speed over approach speed: 1.23 / 1.3 (textbook civil schedule). */
export const FLARE_SPEED_RATIO = 1.23 / 1.3;
/** Touchdown speed over approach speed: 1.15 / 1.3 (textbook civil schedule). */
export const TOUCHDOWN_SPEED_RATIO = 1.15 / 1.3;
/** Transport-category touchdown speed over VREF (flight-test practice; from memory, configurable by the profile's touchdownFactor). */
export const TRANSPORT_TOUCHDOWN_RATIO = 0.95;
/** Least VREF / VSR0 for transports, 14 CFR 25.125(b)(2)(i). */
export const TRANSPORT_VREF_MIN_FACTOR = 1.23;
/** Lift coefficient on the ground with lift dumping (spoilers), common practice. */
export const LIFT_DUMPED_CL = 0.1;
/** 14 CFR 121.195(b): stop within 60 % of the effective runway length. */
export const TRANSPORT_LANDING_FRACTION = 0.6;
/** 14 CFR 121.195(c): turboprop alternate, 70 %. */
export const TURBOPROP_ALTERNATE_FRACTION = 0.7;
/** 14 CFR 121.195(d): turbojet on a wet or slippery runway, 115 % of the dry requirement. */
export const WET_TURBOJET_FACTOR = 1.15;
/** Smallest net deceleration (in g) accepted anywhere in the braking run; below it the aircraft "cannot stop". */
export const LANDING_MIN_NET_DECELERATION_G = 0.01;
/** Tailwind beyond which a warning is given, m/s (10 kt, usual certified limit — from memory). */
export const TAILWIND_WARNING_MPS = 10 * KT;
/** 1.3 × VS basis for VREF (older textbook and FAA approach-category wording). */
export const VREF_TEXTBOOK_FACTOR = 1.3;

export type LandingRule = 'transport' | 'turboprop-alternate' | 'light';
export const LANDING_RULES: readonly LandingRule[] = ['transport', 'turboprop-alternate', 'light'];
/** Plain words for each operating rule (pages, appendix, what-if). */
export const LANDING_RULE_LABELS: Readonly<Record<LandingRule, string>> = {
  transport: 'transport rule (distance / 0.6)',
  'turboprop-alternate': 'turboprop alternate rule (distance / 0.7)',
  light: 'light-aircraft factor',
};
/** Plain words for a landing requirement under its rule set, e.g. "EU commercial air transport: distance ÷ 0.70". */
export function landingRuleLabel(r: Pick<LandingRequirement, 'rule' | 'ruleSet' | 'multiplier' | 'basis'>): string {
  const set = OPERATING_RULE_SET_INFO[r.ruleSet].label;
  if (r.rule === 'light') return `${set}, light-aircraft factor × ${r.multiplier.toFixed(2)}`;
  if (r.multiplier === 1) return `${set}, unfactored`;
  return `${set}, ${r.rule === 'turboprop-alternate' ? 'turboprop alternate, ' : ''}distance × ${r.multiplier.toFixed(2)}`;
}

/** 'profile': VREF = profile.vrefFactor × VSR0 (default); '1.3vs': VREF = 1.3 × VS. */
export type VrefBasis = 'profile' | '1.3vs';

export interface LandingInput {
  readonly aircraft: AircraftProfile;
  /** Landing mass, kg (the caller passes MLW for design studies). */
  readonly mass_kg: number;
  /** Pressure altitude of the runway, m. */
  readonly pressureAltitude_m: number;
  /** Outside air temperature, °C; undefined → ISA at the pressure altitude. */
  readonly temperature_c?: number;
  /** Runway slope in the landing direction, ratio (+ uphill). */
  readonly slope: number;
  /** Wind component along the runway, m/s (+ headwind, − tailwind). */
  readonly headwind_mps: number;
  readonly surface: Surface;
  /** Operating rule; default from the certification basis (transport, commuter → 'transport'; normal → 'light'). */
  readonly rule?: LandingRule;
  /** Operating rule set (default 'us-121'; core/operatingRules.ts). */
  readonly ruleSet?: OperatingRuleSet;
  /** 'light' rule only: factor on the distance (1.0–2.0); default profile.lightAircraftFactor, else ÷ 0.70 (LIGHT_LANDING_FACTOR_DEFAULT). */
  readonly factor?: number;
  readonly vrefBasis?: VrefBasis;
  /** Approach glide angle, degrees (default 3). */
  readonly glideAngle_deg?: number;
  /** Lift dumping on touchdown; default true for transport category, false otherwise. */
  readonly liftDumping?: boolean;
}

/** One intermediate value of the calculation, as shown on the page and in the report. */
export interface LandingTraceEntry {
  readonly key: string;
  readonly label: string;
  readonly value: number;
  readonly unit: string;
  readonly note?: string;
}

export interface LandingSpeeds {
  /** Reference stall speed, landing configuration (TAS at the field density), m/s. */
  readonly vsr0_mps: number;
  /** Approach speed at 50 ft (TAS), m/s. */
  readonly vref_mps: number;
  /** Average flare speed (TAS), m/s. */
  readonly flare_mps: number;
  /** Touchdown airspeed (TAS), m/s. */
  readonly touchdown_mps: number;
  /** Touchdown groundspeed, m/s. */
  readonly touchdownGroundspeed_mps: number;
}

export interface LandingSegments {
  /** Approach from 50 ft to the start of the flare (ground distance), m. */
  readonly approach_m: number;
  readonly flare_m: number;
  readonly freeRoll_m: number;
  readonly braking_m: number;
}

export interface LandingRequirement {
  readonly rule: LandingRule;
  readonly ruleSet: OperatingRuleSet;
  /** Where the multiplier comes from, in words (rule set, regulation, "from memory" where so). */
  readonly source: string;
  /** Which distance the rule multiplies: the dry-runway distance (121.195) or the distance on the surface (light). */
  readonly basis: 'dry-distance' | 'surface-distance';
  readonly basis_m: number;
  /** Total multiplier applied to the basis (e.g. 1/0.6, 1.15/0.6, or the light-aircraft factor). */
  readonly multiplier: number;
  readonly wetIncreaseApplied: boolean;
  /** Length required by the rule, m. */
  readonly byRule_m: number;
  /** Required landing runway: the greater of the rule length and the unfactored distance on the surface, m. */
  readonly required_m: number;
  readonly governedBy: 'rule' | 'surface-distance';
}

export interface LandingConditions {
  readonly mass_kg: number;
  readonly weight_N: number;
  readonly pressureAltitude_m: number;
  readonly temperature_c: number;
  readonly isaDeviation_k: number;
  readonly density_kgm3: number;
  readonly densityAltitude_m: number;
  readonly slope: number;
  readonly headwind_mps: number;
  readonly surface: Surface;
  readonly brakingFriction: number;
  readonly groundLiftCoefficient: number;
  readonly groundDragCoefficient: number;
  /** Total idle thrust during the ground run, N. */
  readonly idleThrust_N: number;
}

interface Common {
  readonly trace: readonly LandingTraceEntry[];
  readonly warnings: readonly Notice[];
  /** Model assumptions stated with every result. */
  readonly assumptions: readonly string[];
  readonly methodVersion: string;
}

export interface LandingOk extends Common {
  readonly status: 'ok';
  /** Unfactored distance from 50 ft to a stop on the given surface, m. */
  readonly distance_m: number;
  readonly segments: LandingSegments;
  /** Unfactored distance on the dry equivalent of the surface (equal to distance_m when not wet), m. */
  readonly dryDistance_m: number;
  readonly required_m: number;
  readonly requirement: LandingRequirement;
  readonly speeds: LandingSpeeds;
  readonly conditions: LandingConditions;
  readonly braking: LandingBrakingOk;
}

export interface LandingInfeasible extends Common {
  readonly status: 'infeasible';
  /** Why, in plain words (rendered in the reader's units). */
  readonly reason: Notice;
  readonly speeds?: LandingSpeeds;
}

export type LandingResult = LandingOk | LandingInfeasible;

// ---------------------------------------------------------------------------------------------
// Braking run

export interface LandingBrakingInput {
  readonly mass_kg: number;
  readonly density_kgm3: number;
  readonly wingArea_m2: number;
  /** Airspeed at the start of braking, m/s. */
  readonly startAirspeed_mps: number;
  /** + headwind, m/s. */
  readonly headwind_mps: number;
  readonly brakingFriction: number;
  readonly liftCoefficient: number;
  readonly dragCoefficient: number;
  /** Forward (idle) thrust, N, constant. */
  readonly thrust_N: number;
  /** Runway slope, ratio (+ uphill). */
  readonly slope: number;
  /** 'auto' (closed form in still air with positive wheel load, quadrature otherwise) or forced 'quadrature'. */
  readonly method?: 'auto' | 'quadrature';
}

export interface LandingBrakingOk {
  readonly status: 'ok';
  /** Braking distance over the ground, m. */
  readonly distance_m: number;
  readonly method: 'closed-form' | 'quadrature';
  /** J_T = μ cos θ + sin θ − T/W (dimensionless). */
  readonly jT: number;
  /** J_A = ρ S (C_D − μ C_L) / (2 W), s²/m². */
  readonly jA: number;
  /** Smallest net deceleration over the run, in g. */
  readonly minNetDeceleration_g: number;
}

export interface LandingBrakingCannotStop {
  readonly status: 'cannot-stop';
  readonly reason: Notice;
  readonly minNetDeceleration_g: number;
  /** Groundspeed where the net deceleration is smallest, m/s. */
  readonly atGroundspeed_mps: number;
}

export type LandingBrakingResult = LandingBrakingOk | LandingBrakingCannotStop;

/** Gauss–Legendre points per panel and panels per smooth piece of the braking integrand. */
const GL_POINTS = 16;
const GL_PANELS = 4;

const GL = gaussLegendre(GL_POINTS);

/**
 * Braking distance from the start airspeed to a stop over the ground (groundspeed V, airspeed V + V_w).
 * Net decelerating force per weight f(V) = μ·max(0, cos θ − c_L u²) + c_D u|u| + sin θ − T/W with
 * u = V + V_w, c_L = ρ S C_L / (2W), c_D = ρ S C_D / (2W); s = (1/g) ∫₀^G V / f(V) dV.
 */
export function landingBrakingDistance(input: LandingBrakingInput): LandingBrakingResult {
  const m = inRange('mass_kg', input.mass_kg, { min: 0, minInclusive: false, unit: 'kg' });
  const rho = inRange('density_kgm3', input.density_kgm3, { min: 0, minInclusive: false, unit: 'kg/m³' });
  const S = inRange('wingArea_m2', input.wingArea_m2, { min: 0, minInclusive: false, unit: 'm²' });
  const v0 = inRange('startAirspeed_mps', input.startAirspeed_mps, { min: 0, minInclusive: false, unit: 'm/s' });
  const vw = inRange('headwind_mps', input.headwind_mps, { min: -50, max: 50, unit: 'm/s' });
  const mu = inRange('brakingFriction', input.brakingFriction, { min: 0, max: 1, unit: '' });
  const cl = inRange('liftCoefficient', input.liftCoefficient, { min: 0, max: 4, unit: '' });
  const cd = inRange('dragCoefficient', input.dragCoefficient, { min: 0, max: 2, unit: '' });
  const thrust = inRange('thrust_N', input.thrust_N, { min: 0, unit: 'N' });
  const slope = inRange('slope', input.slope, { min: -0.2, max: 0.2, unit: '' });
  const G = v0 - vw; // touchdown groundspeed
  check(G > 0, 'headwind_mps', vw, `less than the start airspeed (${v0} m/s)`);

  const W = m * G0;
  const theta = Math.atan(slope);
  const cosT = Math.cos(theta);
  const sinT = Math.sin(theta);
  const tw = thrust / W;
  const cL = (rho * S * cl) / (2 * W);
  const cD = (rho * S * cd) / (2 * W);
  const jT = mu * cosT + sinT - tw;
  const jA = cD - mu * cL;
  const f = (V: number): number => {
    const u = V + vw;
    return mu * Math.max(0, cosT - cL * u * u) + cD * u * Math.abs(u) + sinT - tw;
  };

  // Break points: airspeed zero (tailwind), wheel load zero (lift equals the weight component).
  const breaks = [0, G];
  if (vw < 0 && -vw < G) breaks.push(-vw);
  if (cL > 0) {
    const vStar = Math.sqrt(cosT / cL) - vw;
    if (vStar > 0 && vStar < G) breaks.push(vStar);
  }
  breaks.sort((a, b) => a - b);
  let fMin = Infinity;
  let vAtMin = 0;
  for (const v of breaks) {
    const fv = f(v);
    if (fv < fMin) { fMin = fv; vAtMin = v; }
  }
  if (!(fMin > LANDING_MIN_NET_DECELERATION_G)) {
    return {
      status: 'cannot-stop', minNetDeceleration_g: fMin, atGroundspeed_mps: vAtMin,
      reason: notice('landing.cannotStop')`Net deceleration falls to ${fMin.toFixed(4)} g at ${qty.speed(vAtMin)} groundspeed (minimum ${LANDING_MIN_NET_DECELERATION_G} g): braking friction cannot overcome idle thrust, downhill slope and lift.`,
    };
  }

  const stillAir = vw === 0;
  const wheelLoadPositive = cosT - cL * v0 * v0 >= 0;
  if ((input.method ?? 'auto') === 'auto' && stillAir && wheelLoadPositive) {
    // Closed form (Anderson eq. 6.117 form): s = 1/(2 g J_A) ln(1 + J_A V² / J_T).
    const x = (jA * G * G) / jT;
    const lnRatio = Math.abs(x) < 1e-12 ? 1 - x / 2 : Math.log1p(x) / x; // ln(1+x)/x, → 1 as x → 0
    const s = ((G * G) / (2 * G0 * jT)) * lnRatio;
    return { status: 'ok', distance_m: finite('braking distance', s), method: 'closed-form', jT, jA, minNetDeceleration_g: fMin };
  }

  let integral = 0;
  for (let p = 0; p + 1 < breaks.length; p++) {
    const a = breaks[p]!;
    const b = breaks[p + 1]!;
    if (b <= a) continue;
    const h = (b - a) / GL_PANELS;
    for (let k = 0; k < GL_PANELS; k++) {
      const lo = a + k * h;
      const mid = lo + h / 2;
      for (let i = 0; i < GL_POINTS; i++) {
        const V = mid + (h / 2) * GL.nodes[i]!;
        integral += (h / 2) * GL.weights[i]! * (V / f(V));
      }
    }
  }
  const s = integral / G0;
  return { status: 'ok', distance_m: finite('braking distance', s), method: 'quadrature', jT, jA, minNetDeceleration_g: fMin };
}

// ---------------------------------------------------------------------------------------------
// Speeds, idle thrust

/** Ground-effect factor φ = (16 h/b)² / (1 + (16 h/b)²) (Anderson APD §6.7). */
export function landingGroundEffect(wingHeight_m: number, wingspan_m: number): number {
  const r = (16 * wingHeight_m) / wingspan_m;
  return (r * r) / (1 + r * r);
}

/** Idle thrust of all engines, N (constant during the ground run; see the file header). */
export function landingIdleThrust(aircraft: AircraftProfile, density_kgm3: number): number {
  const a = aircraft;
  if (a.engineType === 'turbofan') return a.engineCount * (a.staticThrust_N ?? 0) * a.idleThrustFraction;
  const P = a.shaftPower_W ?? 0;
  const D = a.propDiameter_m ?? 0;
  const area = (Math.PI * D * D) / 4;
  const staticIdeal = Math.cbrt(2 * density_kgm3 * area * P * P);
  return a.engineCount * staticIdeal * a.idleThrustFraction;
}

/** VREF (m/s) from VSR0 by the chosen basis. */
function vrefFrom(a: AircraftProfile, vsr0: number, basis: VrefBasis): number {
  return (basis === '1.3vs' ? VREF_TEXTBOOK_FACTOR : a.vrefFactor) * vsr0;
}

export interface ReferenceSpeedInput {
  readonly aircraft: AircraftProfile;
  /** Landing mass, kg; default MLW. */
  readonly mass_kg?: number;
  readonly vrefBasis?: VrefBasis;
}

/**
 * VREF at sea level ISA (equal to the calibrated airspeed), m/s — at MLW by default, as used for the
 * aircraft approach category.
 */
export function referenceLandingSpeed(input: ReferenceSpeedInput): number {
  const a = validateAircraft(input.aircraft);
  const m = input.mass_kg === undefined ? a.mlw_kg : inRange('mass_kg', input.mass_kg, { min: a.oew_kg, max: a.mtow_kg, unit: 'kg' });
  const basis = input.vrefBasis ?? 'profile';
  check(basis === 'profile' || basis === '1.3vs', 'vrefBasis', basis, 'one of profile, 1.3vs');
  const rho = airAt(0, standardTemperatureC(0)).density_kgm3;
  return vrefFrom(a, stallSpeed(m, rho, a.wingArea_m2, a.clMaxLanding, G0), basis);
}

// ---------------------------------------------------------------------------------------------
// Landing analysis

const PRESSURE_ALTITUDE_RANGE = { min: -400, max: 4500, unit: 'm' } as const;
const SLOPE_RANGE = { min: -0.05, max: 0.05, unit: '' } as const;
const HEADWIND_RANGE = { min: -15, max: 40, unit: 'm/s' } as const;
const GLIDE_RANGE = { min: 2, max: 6, unit: '°' } as const;
const FACTOR_RANGE = { min: 1, max: 2, unit: '' } as const;

/** Dry equivalent of a surface, for the dry-runway basis of the 121.195 rules. */
function dryEquivalent(s: Surface): Surface {
  if (s === 'wet') return 'dry';
  if (s === 'grass-wet') return 'grass-short';
  return s;
}

export interface LandingRequirementInput {
  /** Unfactored distance from 50 ft on the actual surface, m. */
  readonly distance_m: number;
  /** Unfactored distance on the dry equivalent surface, m (default: distance_m). */
  readonly dryDistance_m?: number;
  readonly rule: LandingRule;
  /** Operating rule set (default 'us-121'; core/operatingRules.ts). */
  readonly ruleSet?: OperatingRuleSet;
  /** Whether the runway is wet or slippery. */
  readonly wet: boolean;
  readonly engineType: EngineType;
  /** 'light' rule: factor on the distance, 1.0–2.0 (default LIGHT_LANDING_FACTOR_DEFAULT, ÷ 0.70). */
  readonly factor?: number;
}

/** Where the rule's multiplier comes from, in words, for the trace, pages and the appendix. */
function ruleSource(set: OperatingRuleSet, rule: LandingRule, fraction: number | undefined, wet: boolean): string {
  const info = OPERATING_RULE_SET_INFO[set];
  if (rule === 'light') return `light-aircraft factor (${LIGHT_FACTOR_SOURCE})${wet ? `; × ${EU_WET_FACTOR} wet (CAT.POL.A.330, from memory)` : ''}`;
  if (fraction === undefined) return `${info.label}: unfactored (${info.source})`;
  return `${info.label}: distance ÷ ${fraction.toFixed(2)}${wet ? ` × ${set === 'eu-cat' ? EU_WET_FACTOR : WET_TURBOJET_FACTOR} wet` : ''} (${info.source})`;
}

/**
 * Landing runway required by an operating rule within a rule set (core/operatingRules.ts).
 * us-121 'transport' (14 CFR 121.195(b), (d)): dry distance ÷ 0.60, × 1.15 on a wet runway for
 * turbojets; 'turboprop-alternate' (121.195(c)): dry distance ÷ 0.70. us-135-eod: dry distance ÷ 0.80,
 * × 1.15 wet for turbojets (135.385(f), (d)). us-91: the distance on the surface, unfactored. eu-cat:
 * jets ÷ 0.60, turboprops ÷ 0.70, × 1.15 wet for all types. 'light': the distance × factor (eu-cat:
 * the dry distance × factor × 1.15 when wet). The result is never less than the unfactored distance
 * on the actual surface.
 */
export function landingRequirement(input: LandingRequirementInput): LandingRequirement {
  const distance = inRange('distance_m', input.distance_m, { min: 0, minInclusive: false, unit: 'm' });
  const dry = input.dryDistance_m === undefined
    ? distance
    : inRange('dryDistance_m', input.dryDistance_m, { min: 0, minInclusive: false, unit: 'm' });
  const rule = input.rule;
  const set = input.ruleSet ?? DEFAULT_OPERATING_RULES;
  check(LANDING_RULES.includes(rule), 'rule', rule, `one of ${LANDING_RULES.join(', ')}`);
  check(isOperatingRuleSet(set), 'ruleSet', set, `one of ${OPERATING_RULE_SETS.join(', ')}`);
  check(rule !== 'turboprop-alternate' || set === 'us-121', 'rule', rule,
    'the turboprop-alternate rule (121.195(c)) only under the us-121 rule set');
  check(typeof input.wet === 'boolean', 'wet', input.wet, 'true or false');
  check(input.factor === undefined || rule === 'light', 'factor', input.factor, 'a factor only with the light-aircraft rule');
  let basis: LandingRequirement['basis'];
  let basisM: number;
  let multiplier: number;
  let wetIncrease = false;
  let fraction: number | undefined;
  if (rule === 'light') {
    multiplier = inRange('factor', input.factor ?? LIGHT_LANDING_FACTOR_DEFAULT, FACTOR_RANGE);
    if (set === 'eu-cat') {
      basis = 'dry-distance';
      basisM = dry;
      if (input.wet) { multiplier *= EU_WET_FACTOR; wetIncrease = true; }
    } else {
      basis = 'surface-distance';
      basisM = distance;
    }
  } else if (set === 'us-91') {
    basis = 'surface-distance';
    basisM = distance;
    multiplier = 1;
  } else {
    basis = 'dry-distance';
    basisM = dry;
    fraction = rule === 'turboprop-alternate' ? TURBOPROP_ALTERNATE_FRACTION
      : set === 'us-135-eod' ? ON_DEMAND_LANDING_FRACTION
        : set === 'eu-cat' && input.engineType !== 'turbofan' ? EU_TURBOPROP_LANDING_FRACTION
          : TRANSPORT_LANDING_FRACTION;
    multiplier = 1 / fraction;
    if (input.wet && (set === 'eu-cat' || (rule === 'transport' && input.engineType === 'turbofan'))) {
      multiplier *= set === 'eu-cat' ? EU_WET_FACTOR : WET_TURBOJET_FACTOR;
      wetIncrease = true;
    }
  }
  const byRule = basisM * multiplier;
  const required = Math.max(byRule, distance);
  return {
    rule, ruleSet: set, basis, basis_m: basisM, multiplier, wetIncreaseApplied: wetIncrease, byRule_m: byRule, required_m: required,
    governedBy: byRule >= distance ? 'rule' : 'surface-distance',
    source: ruleSource(set, rule, fraction, wetIncrease),
  };
}

/** Roskam's landing field length coefficient, ft per kt² (transports; Airplane Design Part I, §3.4.4 from memory). */
export const ROSKAM_LANDING_COEFF_FT_PER_KT2 = 0.3;

/**
 * Roskam's statistical landing field length of a transport, S_FL = 0.3 · V_A² (ft, V_A in kt), with
 * V_A the approach speed. An indicative cross-check beside the landing physics, never a requirement;
 * the fit covers transport jets and turboprops at sea level (it carries the 0.6 factor of the field
 * length already). Here V_A is VREF as a true airspeed at the field, so elevation lengthens it.
 */
export function roskamLandingFieldLength(approach_mps: number): { fieldLength_ft: number; fieldLength_m: number } {
  const v = inRange('approach_mps', approach_mps, { min: 0, minInclusive: false, max: 150, unit: 'm/s' });
  const vKt = v / KT;
  const ft = ROSKAM_LANDING_COEFF_FT_PER_KT2 * vKt * vKt;
  return { fieldLength_ft: ft, fieldLength_m: ft * FT };
}

export function defaultLandingRule(a: AircraftProfile): LandingRule {
  return a.certification === 'normal' ? 'light' : 'transport';
}

interface GroundRun {
  readonly braking: LandingBrakingResult;
  readonly mu: number;
}

/** Analyses a landing: segments, distance, required runway by the operating rule, trace and warnings. */
export function analyseLanding(input: LandingInput): LandingResult {
  const a = validateAircraft(input.aircraft, 'aircraft');
  const mass = inRange('mass_kg', input.mass_kg, { min: a.oew_kg, max: a.mtow_kg, unit: 'kg' });
  const pa = inRange('pressureAltitude_m', input.pressureAltitude_m, PRESSURE_ALTITUDE_RANGE);
  const tIsa = standardTemperatureC(pa);
  const tC = input.temperature_c === undefined ? tIsa : input.temperature_c;
  const slope = inRange('slope', input.slope, SLOPE_RANGE);
  const vw = inRange('headwind_mps', input.headwind_mps, HEADWIND_RANGE);
  check((SURFACES as readonly unknown[]).includes(input.surface), 'surface', input.surface, `one of ${SURFACES.join(', ')}`);
  const surface = input.surface;
  const rule = input.rule ?? defaultLandingRule(a);
  check(LANDING_RULES.includes(rule), 'rule', rule, `one of ${LANDING_RULES.join(', ')}`);
  if (input.ruleSet !== undefined) {
    check(isOperatingRuleSet(input.ruleSet), 'ruleSet', input.ruleSet, `one of ${OPERATING_RULE_SETS.join(', ')}`);
  }
  if (rule === 'turboprop-alternate') {
    check(a.engineType === 'turboprop', 'rule', rule, 'the turboprop-alternate rule (121.195(c)) only for turboprop aircraft');
  }
  if (input.factor !== undefined) {
    check(rule === 'light', 'factor', input.factor, 'a factor only with the light-aircraft rule');
  }
  const lightFactor = rule === 'light'
    ? inRange(input.factor !== undefined ? 'factor' : 'aircraft.lightAircraftFactor', input.factor ?? a.lightAircraftFactor ?? LIGHT_LANDING_FACTOR_DEFAULT, FACTOR_RANGE)
    : 1;
  const vrefBasis = input.vrefBasis ?? 'profile';
  check(vrefBasis === 'profile' || vrefBasis === '1.3vs', 'vrefBasis', vrefBasis, 'one of profile, 1.3vs');
  const glideDeg = inRange('glideAngle_deg', input.glideAngle_deg ?? DEFAULT_GLIDE_ANGLE_DEG, GLIDE_RANGE);
  const liftDumping = input.liftDumping ?? a.certification === 'transport';
  check(typeof liftDumping === 'boolean', 'liftDumping', liftDumping, 'true or false');

  const air = airAt(pa, tC);
  const rho = air.density_kgm3;
  const W = mass * G0;
  const warnings: Notice[] = [];
  const assumptions: string[] = [
    'Reverse thrust is not credited.',
    `Idle thrust held constant during the ground run (${a.engineType === 'turbofan' ? 'static thrust' : 'momentum-theory static thrust'} × idle fraction).`,
    liftDumping
      ? `Lift dumping on touchdown: ground lift coefficient ${Math.min(LIFT_DUMPED_CL, a.clGround)}; spoiler drag not credited.`
      : `No lift dumping: ground lift coefficient ${a.clGround} (profile).`,
    'Glide and flare are flown in the air mass; wind is used as given (no 50 %/150 % factoring).',
  ];
  const trace: LandingTraceEntry[] = [];
  const put = (key: string, label: string, value: number, unit: string, note?: string): void => {
    trace.push({ key, label, value: finite(key, value), unit, ...(note !== undefined ? { note } : {}) });
  };

  put('pressureAltitude', 'Pressure altitude', pa, 'm');
  put('temperature', 'Temperature', tC, '°C', input.temperature_c === undefined ? 'ISA at the pressure altitude' : undefined);
  put('isaDeviation', 'ISA deviation', air.isaDeviation_k, 'K');
  put('density', 'Air density', rho, 'kg/m³');
  put('densityAltitude', 'Density altitude', air.densityAltitude_m, 'm');
  put('mass', 'Landing mass', mass, 'kg');
  if (mass > a.mlw_kg) warnings.push(notice('landing.overweight')`Landing mass ${qty.mass(mass)} exceeds MLW (${qty.mass(a.mlw_kg)}): overweight landing.`);
  if (input.temperature_c !== undefined && Math.abs(air.isaDeviation_k) > 1e-9) {
    warnings.push(notice('landing.nonStandardTemperature')`Certified landing data are scheduled for standard temperature (14 CFR 25.125(a)); the non-standard temperature here is a planning option.`);
  }
  if (-vw > TAILWIND_WARNING_MPS) warnings.push(notice('landing.tailwind')`Tailwind ${qty.speed(-vw, 1)} exceeds 10 kt, beyond the usual certified limit (from memory).`);

  // Speeds.
  const vsr0 = stallSpeed(mass, rho, a.wingArea_m2, a.clMaxLanding, G0);
  const transportCat = a.certification === 'transport';
  let va = vrefFrom(a, vsr0, vrefBasis);
  let vrefNote = vrefBasis === 'profile' ? `${a.vrefFactor} × VSR0` : '1.3 × VS';
  if (transportCat && va < TRANSPORT_VREF_MIN_FACTOR * vsr0) {
    // 14 CFR 25.125(b)(2)(i): VREF not less than 1.23 VSR0.
    warnings.push(notice('landing.vrefRaised')`VREF raised from ${(va / vsr0).toFixed(3)} VSR0 to ${TRANSPORT_VREF_MIN_FACTOR} VSR0, the transport-category minimum (14 CFR 25.125(b)(2)(i)).`);
    va = TRANSPORT_VREF_MIN_FACTOR * vsr0;
    vrefNote = `${TRANSPORT_VREF_MIN_FACTOR} × VSR0 (raised to the 25.125(b) minimum)`;
  }
  // Touchdown speed: the profile's VTD/VREF; else 0.95 VREF for transports (from memory), the textbook
  // 1.15/1.3 for other categories (their own technique). The flare is flown at the mean of VREF and VTD.
  const tdRatio = a.touchdownFactor ?? (transportCat ? TRANSPORT_TOUCHDOWN_RATIO : TOUCHDOWN_SPEED_RATIO);
  const tdNote = a.touchdownFactor !== undefined ? `${a.touchdownFactor} × VREF (profile)` : transportCat ? `${TRANSPORT_TOUCHDOWN_RATIO} × VREF (transport technique, from memory)` : '1.15/1.3 × VREF (textbook schedule)';
  const flareRatio = a.touchdownFactor !== undefined || transportCat ? (1 + tdRatio) / 2 : FLARE_SPEED_RATIO;
  const vf = va * flareRatio;
  const vtd = va * tdRatio;
  const gTd = vtd - vw;
  put('vsr0', 'Stall speed VSR0 (TAS)', vsr0, 'm/s');
  put('vref', 'Approach speed VREF (TAS)', va, 'm/s', vrefNote);
  put('vflare', 'Average flare speed (TAS)', vf, 'm/s', flareRatio === FLARE_SPEED_RATIO ? '1.23/1.3 × VREF' : `${flareRatio.toFixed(3)} × VREF (mean of VREF and VTD)`);
  put('vtd', 'Touchdown speed (TAS)', vtd, 'm/s', tdNote);
  put('headwind', 'Headwind component', vw, 'm/s');
  const speedsBase = { vsr0_mps: vsr0, vref_mps: va, flare_mps: vf, touchdown_mps: vtd };
  if (!(gTd > 0)) {
    return {
      status: 'infeasible', reason: notice('landing.headwindAboveTouchdown')`Headwind ${qty.speed(vw)} is at or above the touchdown airspeed (${qty.speed(vtd)}).`,
      speeds: { ...speedsBase, touchdownGroundspeed_mps: Math.max(0, gTd) },
      trace, warnings, assumptions, methodVersion: LANDING_METHOD_VERSION,
    };
  }
  const speeds: LandingSpeeds = { ...speedsBase, touchdownGroundspeed_mps: gTd };
  put('gtd', 'Touchdown groundspeed', gTd, 'm/s');

  // Air segments (air mass), then ground distances by the groundspeed/airspeed ratio.
  const gamma = (glideDeg * Math.PI) / 180;
  const R = (vf * vf) / (G0 * (FLARE_LOAD_FACTOR - 1));
  const hf = R * (1 - Math.cos(gamma));
  let sAair: number;
  let sFair: number;
  if (hf < LANDING_SCREEN_HEIGHT_M) {
    sFair = R * Math.sin(gamma);
    sAair = (LANDING_SCREEN_HEIGHT_M - hf) / Math.tan(gamma);
  } else {
    sAair = 0;
    sFair = Math.sqrt(R * R - (R - LANDING_SCREEN_HEIGHT_M) ** 2);
    warnings.push(notice('landing.flareAboveScreen')`Flare height ${qty.shortLength(hf, 1)} exceeds the screen height (${qty.shortLength(LANDING_SCREEN_HEIGHT_M, 1)}): the flare starts above 50 ft.`);
  }
  const sA = sAair * ((va - vw) / va);
  const sF = sFair * ((vf - vw) / vf);
  put('flareRadius', 'Flare radius R = Vf²/(0.2 g)', R, 'm');
  put('flareHeight', 'Flare height h_f = R(1 − cos γ)', hf, 'm');
  put('glideAngle', 'Glide angle γ', glideDeg, '°');
  put('approach', 'Approach distance (ground)', sA, 'm');
  put('flare', 'Flare distance (ground)', sF, 'm');

  const sFr = a.freeRollTime_s * gTd;
  put('freeRoll', 'Free roll N·V_TD (ground)', sFr, 'm', `N = ${a.freeRollTime_s} s`);

  // Ground run on the surface and on its dry equivalent.
  const clG = liftDumping ? Math.min(LIFT_DUMPED_CL, a.clGround) : a.clGround;
  const ar = (a.wingspan_m * a.wingspan_m) / a.wingArea_m2;
  const K = 1 / (Math.PI * ar * a.oswald);
  const phi = landingGroundEffect(a.wingHeight_m, a.wingspan_m);
  const cdG = a.cd0Landing + phi * K * clG * clG;
  const tIdle = landingIdleThrust(a, rho);
  put('clGround', 'Ground lift coefficient', clG, '');
  put('cdGround', 'Ground drag coefficient CD0 + φK·CL²', cdG, '');
  put('groundEffect', 'Ground-effect factor φ', phi, '');
  put('idleThrust', 'Idle thrust (all engines)', tIdle, 'N');

  const groundRun = (s: Surface): GroundRun => {
    const mu = friction(a, s).braking;
    return {
      mu,
      braking: landingBrakingDistance({
        mass_kg: mass, density_kgm3: rho, wingArea_m2: a.wingArea_m2, startAirspeed_mps: vtd, headwind_mps: vw,
        brakingFriction: mu, liftCoefficient: clG, dragCoefficient: cdG, thrust_N: tIdle, slope,
      }),
    };
  };
  const onSurface = groundRun(surface);
  put('brakingFriction', 'Braking friction μ_b', onSurface.mu, '', surface);
  const b = onSurface.braking;
  if (b.status !== 'ok') {
    return { status: 'infeasible', reason: b.reason, speeds, trace, warnings, assumptions, methodVersion: LANDING_METHOD_VERSION };
  }
  put('jT', 'J_T = μ cos θ + sin θ − T/W', b.jT, '');
  put('jA', 'J_A = ρS(C_D − μ C_L)/(2W)', b.jA, 's²/m²');
  put('braking', `Braking distance (${b.method})`, b.distance_m, 'm');
  const segments: LandingSegments = { approach_m: sA, flare_m: sF, freeRoll_m: sFr, braking_m: b.distance_m };
  const airborne = sA + sF;
  const distance = airborne + sFr + b.distance_m;
  put('distance', 'Landing distance from 50 ft', distance, 'm');

  let dryDistance = distance;
  const dry = dryEquivalent(surface);
  if (dry !== surface) {
    const d = groundRun(dry).braking;
    if (d.status !== 'ok') {
      // Dry braking is at least as strong as wet braking; reaching here means a defect, not physics.
      throw new Error(`internal: dry-equivalent braking failed on ${dry} although ${surface} stops`);
    }
    dryDistance = airborne + sFr + d.distance_m;
    put('dryDistance', `Landing distance, ${dry} equivalent`, dryDistance, 'm');
  }

  // Required runway by the operating rule.
  const req = landingRequirement({
    distance_m: distance, dryDistance_m: dryDistance, rule, wet: isWet(surface), engineType: a.engineType,
    ...(input.ruleSet !== undefined ? { ruleSet: input.ruleSet } : {}),
    ...(rule === 'light' ? { factor: lightFactor } : {}),
  });
  const { multiplier, required_m: required } = req;
  if (rule === 'light') {
    assumptions.push(a.lightAircraftFactor !== undefined || input.factor !== undefined
      ? `Light-aircraft landing factor ${lightFactor.toFixed(2)} (${input.factor !== undefined ? 'given' : 'profile'}).`
      : `Light-aircraft landing factor ${lightFactor.toFixed(2)}: ${LIGHT_FACTOR_SOURCE}.`);
  }
  assumptions.push(`Landing factor: ${req.source}.`);
  if (req.governedBy === 'surface-distance') {
    warnings.push(notice('landing.surfaceDistanceGoverns')`The unfactored distance on the ${surface} surface (${qty.length(distance)}) exceeds the rule length (${qty.length(req.byRule_m)}) and governs.`);
  }
  put('multiplier', `Rule multiplier (${req.ruleSet}, ${rule})`, multiplier, '', req.source);
  put('required', 'Required landing runway', required, 'm');

  return {
    status: 'ok',
    distance_m: distance,
    segments,
    dryDistance_m: dryDistance,
    required_m: required,
    requirement: req,
    speeds,
    conditions: {
      mass_kg: mass, weight_N: W, pressureAltitude_m: pa, temperature_c: tC, isaDeviation_k: air.isaDeviation_k,
      density_kgm3: rho, densityAltitude_m: air.densityAltitude_m, slope, headwind_mps: vw, surface,
      brakingFriction: onSurface.mu, groundLiftCoefficient: clG, groundDragCoefficient: cdG, idleThrust_N: tIdle,
    },
    braking: b,
    trace, warnings, assumptions, methodVersion: LANDING_METHOD_VERSION,
  };
}
