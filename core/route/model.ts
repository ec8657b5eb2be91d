/**
 * Route fuel model: trip, contingency, reserve and taxi fuel for a stage length, in closed form, and
 * the closed-form inverses (greatest stage for a mass budget, greatest zero-fuel mass for a stage).
 *
 * Source: Breguet range equation, Aeronautical Engineer's Data Book ch. 9 (design TOW for a stage length; weights multiplicative) built on
 * the Breguet forms of §9.1 (see breguet.ts). With κ = ln(W_i/W_f) per metre of cruise
 * (jet κ = c_T/(V·L/D), propeller κ = c_P/(η·L/D)), x = e^{κ·s} for a stage s, and a climb/descent
 * allowance δ (fuel beyond the cruise estimate, a fraction of the takeoff mass, burnt as if at the
 * start of the trip: W_cruise = (1 − δ)·W_TO), X = x·e^ℓ with ℓ = −ln(1 − δ):
 *   W_ZF = OEW + payload;   W* = W_ZF + H             H = fixed-flow holding fuel (0 unless given, below)
 *   R    = W* · ρ,   ρ = e^{κ·d_alt} · e^{r·t_res}      reserves, computed as if flown, ending at W_ZF
 *   A    = R · C(s)                                     arrival (landing) mass; contingency is carried
 *          C = 1 / (1 − f·(X − 1))   contingency = f × trip fuel (closed form of A = R + f·(W_TO − A))
 *          C = e^{τ·κ·s}             contingency = fuel for τ × trip time at cruise, flown as if before the reserves
 *   W_TO = A · X,   trip = W_TO − A = δ·W_TO (climb/descent) + cruise fuel,   ramp = W_TO + taxi
 *   block fuel = trip + taxi (taxi-in is not modelled)
 * so W_TO = W*·Φ(s) and A = W*·Λ(s), with Φ = ρ·C·X and Λ = ρ·C both non-decreasing in s: every limit
 * (MTOW, fuel capacity, MLW) is a bound on Φ or Λ for W*, and each inverts in closed form.
 *
 * Climb/descent allowance δ: cruise.climbDescentFraction when given; else by engine type, turbofan
 * 1.0 %, turboprop 0.6 %, piston 0.4 % of the takeoff mass (from memory / common practice: the energy
 * to climb to cruise height and speed less the credit of the descent, beyond the cruise fuel over the
 * same ground distance). It applies to every stage, however short (every flight climbs and descends).
 *
 * Reserve time rate r (1/s): at normal cruise r = κ·V; holding, jet r = c_T/(L/D)_hold, propeller
 * r = c_P·V_hold/(η·(L/D)_hold) with V_hold = cruise TAS — ASSUMPTION (conservative: a propeller
 * aircraft holds slower than it cruises and needs less power); same c_T, c_P and η in the hold as in
 * cruise; the 1500 ft holding height of the international policy is informative only. When the
 * profile gives a holding fuel flow (cruise.holdFuelFlow_kgph), reserve time flown in the hold burns
 * that flow, constant: H = flow × t_hold, r = 0 (the hold is flown last, ending at W_ZF, so H adds
 * to W_ZF before the alternate leg). Reserve time at normal cruise keeps r = κ·V.
 *
 * Validity: stage 0–20 000 km in the model (1–20 000 km at the API); trip time = stage / cruise TAS
 * (no wind; the climb/descent allowance adds fuel, not time); see docs/methods/route.md for the limits.
 */
import type { AircraftProfile, CruiseData, EngineType } from '../aircraft.js';
import { validateAircraft } from '../aircraft.js';
import { InputDomainError } from '../errors.js';
import { check } from '../validate.js';
import { breguetCpFromBsfc, breguetCtFromTsfcPerHour } from './breguet.js';
import { resolveReserves, type ResolvedReserves, type ReservePolicy } from './reserves.js';
import { notice, type Notice } from '../notices.js';

/** A limit that caps the payload or the stage: MTOW (or a given takeoff mass), fuel capacity, MLW, structural payload. */
export type RouteLimit = 'mtow' | 'max-fuel' | 'mlw' | 'max-payload';

export const ROUTE_LIMIT_LABELS: Readonly<Record<RouteLimit, string>> = {
  mtow: 'takeoff mass',
  'max-fuel': 'fuel capacity',
  mlw: 'maximum landing mass',
  'max-payload': 'maximum payload',
};

/** Method stamp carried by route results. */
export const ROUTE_METHOD_VERSION = 'route-breguet-2';

/**
 * Default climb/descent allowance by engine type, fraction of the takeoff mass, when the profile gives
 * no cruise.climbDescentFraction (from memory / common practice; see the file header).
 */
export const CLIMB_DESCENT_FRACTION_DEFAULTS: Readonly<Record<EngineType, number>> = {
  turbofan: 0.010,
  turboprop: 0.006,
  piston: 0.004,
};

/** Stage lengths accepted at the API, m (1 km to 20 000 km). */
export const ROUTE_STAGE_LENGTH_RANGE = { min: 1000, max: 20_000_000, unit: 'm' } as const;

/** Slack (kg) when checking a mass against a limit, to absorb floating-point rounding in round trips. */
export const ROUTE_MASS_SLACK_KG = 1e-6;
/** Relative slack on ratios (Φ, Λ) in the inverses: a ratio this close below 1 counts as 1 (stage 0). */
export const ROUTE_RATIO_SLACK = 1e-12;
/** Relative closeness at which two limits on the zero-fuel mass count as met together. */
export const ROUTE_ACTIVE_LIMIT_REL = 1e-9;
/** Smallest admissible 1 − f·(x − 1) (contingency denominator); below it the stage is unreachable. */
export const ROUTE_MIN_CONTINGENCY_DENOMINATOR = 1e-9;

export interface RouteTraceItem {
  readonly key: string;
  readonly label: string;
  readonly value: number;
  /** SI unit symbol, '' for a ratio. */
  readonly unit: string;
}

/** Everything the route formulas need, in SI, derived from the aircraft and the reserve policy. */
export interface RouteFuelModel {
  readonly propulsion: 'jet' | 'propeller';
  readonly speed_mps: number;
  /** ln(W_i/W_f) per metre of cruise, 1/m. */
  readonly kappa_perM: number;
  /** ln(W_i/W_f) per second of reserve time (hold or cruise as the policy says), 1/s. */
  readonly reserveRate_perS: number;
  /** Jet c_T (1/s) or propeller c_P (1/m). */
  readonly specificConsumption: number;
  /** ln ρ of the alternate leg. */
  readonly alternateLn: number;
  /** ln ρ of the reserve time. */
  readonly reserveTimeLn: number;
  /** ln ρ = alternateLn + reserveTimeLn. */
  readonly reserveLn: number;
  /** Climb/descent allowance δ, fraction of the takeoff mass. */
  readonly climbDescentFraction: number;
  /** Where δ comes from: the profile, or the engine-type default (common practice). */
  readonly climbDescentSource: 'profile' | 'default';
  /** ℓ = −ln(1 − δ), added to κ·s in the trip ratio X = e^{κ·s + ℓ}. */
  readonly climbDescentLn: number;
  /** Fixed-flow holding fuel H, kg (0 unless the reserve time is flown in the hold at a given fuel flow). */
  readonly holdFuel_kg: number;
  /** How holding fuel is found: a given fuel flow, the hold L/D, or no hold in the policy. */
  readonly holdSource: 'fuel-flow' | 'lift-to-drag' | 'none';
  /** The profile's holding fuel flow, kg/h, when given. */
  readonly holdFuelFlow_kgph?: number;
  readonly reserves: ResolvedReserves;
  readonly oew_kg: number;
  readonly mtow_kg: number;
  readonly mlw_kg: number;
  readonly maxPayload_kg: number;
  readonly maxFuel_kg: number;
  readonly taxiFuel_kg: number;
  /** Usable fuel at brake release with full tanks, kg (maxFuel − taxi). */
  readonly fuelAtBrakeRelease_kg: number;
  readonly warnings: readonly Notice[];
}

/** Validates the aircraft (it must carry cruise data) and the policy, and builds the fuel model. */
export function buildRouteFuelModel(aircraft: AircraftProfile, reserves: ReservePolicy, path = 'aircraft'): RouteFuelModel {
  check(typeof aircraft === 'object' && aircraft !== null, path, aircraft, 'an aircraft profile');
  if (aircraft.cruise === undefined || aircraft.cruise === null) {
    throw new InputDomainError(`${path}.cruise`, aircraft.cruise, 'cruise data (speed, L/D, fuel consumption, taxi fuel, contingency) for the route model');
  }
  validateAircraft(aircraft, path);
  const c: CruiseData = aircraft.cruise;
  check(c.taxiFuel_kg < aircraft.maxFuel_kg, `${path}.cruise.taxiFuel_kg`, c.taxiFuel_kg, `less than the maximum fuel (${aircraft.maxFuel_kg} kg)`);
  const res = resolveReserves(reserves, c.contingencyFraction);
  const warnings: Notice[] = [];
  const V = c.speed_mps;
  let propulsion: 'jet' | 'propeller';
  let kappa: number;
  let holdRate: number;
  let sc: number;
  if (aircraft.engineType === 'turbofan') {
    propulsion = 'jet';
    sc = breguetCtFromTsfcPerHour(c.tsfc_perh!);
    kappa = sc / (V * c.liftToDrag);
    holdRate = sc / c.holdLiftToDrag;
  } else {
    propulsion = 'propeller';
    sc = breguetCpFromBsfc(c.bsfc_kgPerKwh!);
    const eta = c.cruisePropEfficiency!;
    kappa = sc / (eta * c.liftToDrag);
    // ASSUMPTION: the propeller aircraft holds at its cruise true airspeed (conservative).
    holdRate = (sc * V) / (eta * c.holdLiftToDrag);
    if (res.reserveFlight === 'hold' && res.reserveTime_s > 0 && c.holdFuelFlow_kgph === undefined) {
      warnings.push(notice('route.propHoldAtCruiseSpeed')`Propeller holding fuel assumes holding at the cruise true airspeed (conservative).`);
    }
    if (res.kind === 'international') {
      warnings.push(notice('route.internationalRuleForProp')`The international reserve rule is written for turbine aircraft other than turboprops; applied here as a planning convention.`);
    }
  }
  const holds = res.reserveFlight === 'hold' && res.reserveTime_s > 0;
  const fixedFlow = holds && c.holdFuelFlow_kgph !== undefined;
  const reserveRate = res.reserveFlight === 'cruise' ? kappa * V : fixedFlow ? 0 : holdRate;
  const holdFuel = fixedFlow ? (c.holdFuelFlow_kgph! * res.reserveTime_s) / 3600 : 0;
  const alternateLn = kappa * res.alternateDistance_m;
  const reserveTimeLn = reserveRate * res.reserveTime_s;
  const delta = c.climbDescentFraction ?? CLIMB_DESCENT_FRACTION_DEFAULTS[aircraft.engineType];
  return {
    propulsion,
    speed_mps: V,
    kappa_perM: kappa,
    reserveRate_perS: reserveRate,
    specificConsumption: sc,
    alternateLn,
    reserveTimeLn,
    reserveLn: alternateLn + reserveTimeLn,
    climbDescentFraction: delta,
    climbDescentSource: c.climbDescentFraction === undefined ? 'default' : 'profile',
    climbDescentLn: -Math.log(1 - delta),
    holdFuel_kg: holdFuel,
    holdSource: !holds ? 'none' : fixedFlow ? 'fuel-flow' : 'lift-to-drag',
    ...(c.holdFuelFlow_kgph !== undefined ? { holdFuelFlow_kgph: c.holdFuelFlow_kgph } : {}),
    reserves: res,
    oew_kg: aircraft.oew_kg,
    mtow_kg: aircraft.mtow_kg,
    mlw_kg: aircraft.mlw_kg,
    maxPayload_kg: aircraft.maxPayload_kg,
    maxFuel_kg: aircraft.maxFuel_kg,
    taxiFuel_kg: c.taxiFuel_kg,
    fuelAtBrakeRelease_kg: aircraft.maxFuel_kg - c.taxiFuel_kg,
    warnings,
  };
}

/**
 * Mass ratios for a stage: Φ = W_TO/W*, Λ = arrival/W*, W* = W_ZF + H (= W_ZF unless holding at a given
 * fuel flow); Infinity when the contingency rule cannot close.
 */
export interface RouteFactors {
  /** e^{κ·s}: cruise-entry mass / arrival. */
  readonly cruiseRatio: number;
  /** X = e^{κ·s + ℓ}: W_TO / arrival (cruise and the climb/descent allowance). */
  readonly tripRatio: number;
  /** C: arrival / (W_ZF + reserves). */
  readonly contingencyRatio: number;
  readonly phi: number;
  readonly lambda: number;
  readonly finite: boolean;
}

export function routeFactors(m: RouteFuelModel, stage_m: number): RouteFactors {
  const x = Math.exp(m.kappa_perM * stage_m);
  const X = Math.exp(m.kappa_perM * stage_m + m.climbDescentLn);
  const rho = Math.exp(m.reserveLn);
  const { basis, fraction } = m.reserves.contingency;
  let C: number;
  if (basis === 'trip-time') {
    C = Math.exp(fraction * m.kappa_perM * stage_m);
  } else {
    const den = 1 - fraction * (X - 1);
    C = den < ROUTE_MIN_CONTINGENCY_DENOMINATOR ? Infinity : 1 / den;
  }
  const phi = rho * C * X;
  const lambda = rho * C;
  return { cruiseRatio: x, tripRatio: X, contingencyRatio: C, phi, lambda, finite: Number.isFinite(phi) };
}

/** Masses and fuel of one loading (payload over a stage), kg; times in s. */
export interface RouteLoading {
  readonly stageLength_m: number;
  readonly payload_kg: number;
  readonly zeroFuelMass_kg: number;
  /** Trip fuel, brake release to landing: cruise fuel + climb/descent allowance. */
  readonly tripFuel_kg: number;
  /** Breguet cruise fuel over the whole stage length. */
  readonly cruiseFuel_kg: number;
  /** Climb/descent allowance, δ × takeoff mass. */
  readonly climbDescentFuel_kg: number;
  readonly contingencyFuel_kg: number;
  /** Alternate + final reserve (hold or cruise), carried and normally not burnt. */
  readonly reserveFuel_kg: number;
  readonly alternateFuel_kg: number;
  /** Final reserve (hold or cruise time); at a given holding fuel flow, flow × time. */
  readonly finalReserveFuel_kg: number;
  /** Taxi-out fuel, burnt before brake release (in the ramp mass, not in the takeoff mass). */
  readonly taxiFuel_kg: number;
  /** Block fuel, ramp to landing: taxi + trip (taxi-in not modelled). */
  readonly blockFuel_kg: number;
  /** Fuel on board at brake release: trip + contingency + reserves. */
  readonly takeoffFuel_kg: number;
  /** Fuel loaded at the ramp: takeoff fuel + taxi. */
  readonly rampFuel_kg: number;
  /** Brake-release mass. */
  readonly takeoffMass_kg: number;
  readonly rampMass_kg: number;
  /** Planned landing mass at the destination: zero-fuel mass + contingency + reserves. */
  readonly arrivalMass_kg: number;
  /** Trip time at cruise TAS, s. */
  readonly tripTime_s: number;
}

/** The loading of `zeroFuelMass_kg` over `stage_m`; the caller guarantees finite factors. */
export function routeLoading(m: RouteFuelModel, stage_m: number, zeroFuelMass_kg: number): RouteLoading {
  const f = routeFactors(m, stage_m);
  if (!f.finite) throw new Error('internal: routeLoading called where the contingency rule cannot close');
  const W = zeroFuelMass_kg;
  const Ws = W + m.holdFuel_kg;
  const afterAlternate = Ws * Math.exp(m.reserveTimeLn);
  const R = Ws * Math.exp(m.reserveLn);
  const A = R * f.contingencyRatio;
  const TO = A * f.tripRatio;
  const climbDescent = TO * m.climbDescentFraction;
  return {
    stageLength_m: stage_m,
    payload_kg: W - m.oew_kg,
    zeroFuelMass_kg: W,
    tripFuel_kg: TO - A,
    cruiseFuel_kg: TO - climbDescent - A,
    climbDescentFuel_kg: climbDescent,
    contingencyFuel_kg: A - R,
    reserveFuel_kg: R - W,
    alternateFuel_kg: R - afterAlternate,
    finalReserveFuel_kg: afterAlternate - W,
    taxiFuel_kg: m.taxiFuel_kg,
    blockFuel_kg: TO - A + m.taxiFuel_kg,
    takeoffFuel_kg: TO - W,
    rampFuel_kg: TO - W + m.taxiFuel_kg,
    takeoffMass_kg: TO,
    rampMass_kg: TO + m.taxiFuel_kg,
    arrivalMass_kg: A,
    tripTime_s: stage_m / m.speed_mps,
  };
}

/** Limits a loading breaks (with the mass slack), given a takeoff-mass cap. */
export function routeViolations(m: RouteFuelModel, l: RouteLoading, takeoffMassCap_kg: number): RouteLimit[] {
  const out: RouteLimit[] = [];
  if (l.takeoffMass_kg > takeoffMassCap_kg + ROUTE_MASS_SLACK_KG) out.push('mtow');
  if (l.rampFuel_kg > m.maxFuel_kg + ROUTE_MASS_SLACK_KG) out.push('max-fuel');
  if (l.arrivalMass_kg > m.mlw_kg + ROUTE_MASS_SLACK_KG) out.push('mlw');
  if (l.payload_kg > m.maxPayload_kg + ROUTE_MASS_SLACK_KG) out.push('max-payload');
  return out;
}

/** Greatest stage (m) with Φ(s) ≤ phiMax (Φ per W* = W_ZF + H); null when even s = 0 exceeds it. */
export function routeStageForPhi(m: RouteFuelModel, phiMax: number): number | null {
  const r = phiMax / Math.exp(m.reserveLn);
  if (!(r > 0)) return null;
  const { basis, fraction } = m.reserves.contingency;
  const l = m.climbDescentLn;
  // κ·s = ln X − ℓ (trip-fuel contingency: X = r(1+f)/(1+r·f)); trip-time: (1+τ)·κ·s + ℓ = ln r.
  const ks = basis === 'trip-time'
    ? (Math.log(r) - l) / (1 + fraction)
    : Math.log((r * (1 + fraction)) / (1 + r * fraction)) - l;
  if (ks < -ROUTE_RATIO_SLACK) return null;
  return Math.max(0, ks / m.kappa_perM);
}

/** Greatest stage (m) with Λ(s) ≤ lambdaMax (Λ per W*); Infinity when Λ does not grow with stage; null when s = 0 fails. */
export function routeStageForLambda(m: RouteFuelModel, lambdaMax: number): number | null {
  const q = lambdaMax / Math.exp(m.reserveLn);
  if (q < 1 - ROUTE_RATIO_SLACK) return null;
  const { basis, fraction } = m.reserves.contingency;
  if (fraction === 0) return Infinity;
  // trip-time: C = e^{τ·κ·s} (the allowance adds no time); trip-fuel: C = 1/(1 − f(X − 1)), X = e^{κ·s + ℓ}.
  const ks = basis === 'trip-time'
    ? Math.log(Math.max(q, 1)) / fraction
    : Math.log(1 + (1 - 1 / Math.max(q, 1)) / fraction) - m.climbDescentLn;
  if (ks < -ROUTE_RATIO_SLACK) return null;
  return Math.max(0, ks / m.kappa_perM);
}

/** Greatest stage for a zero-fuel mass under a takeoff-mass cap, fuel capacity and MLW; null if none. */
export function routeReach(
  m: RouteFuelModel, zeroFuelMass_kg: number, takeoffMassCap_kg: number,
): { readonly stage_m: number; readonly limitedBy: RouteLimit } | null {
  const W = zeroFuelMass_kg;
  const Ws = W + m.holdFuel_kg;
  const candidates: [number | null, RouteLimit][] = [
    [routeStageForPhi(m, takeoffMassCap_kg / Ws), 'mtow'],
    // Φ·W* − W_ZF ≤ fuel at brake release.
    [routeStageForPhi(m, (W + m.fuelAtBrakeRelease_kg) / Ws), 'max-fuel'],
    [routeStageForLambda(m, m.mlw_kg / Ws), 'mlw'],
  ];
  let best: { stage_m: number; limitedBy: RouteLimit } | null = null;
  for (const [s, lim] of candidates) {
    if (s === null) return null;
    if (best === null || s < best.stage_m) best = { stage_m: s, limitedBy: lim };
  }
  // The fuel bound is always finite, so best.stage_m is finite here.
  return best;
}

export interface RouteCapacity {
  readonly zeroFuelMass_kg: number;
  /** W_ZF − OEW; negative when the stage cannot be flown. */
  readonly payload_kg: number;
  /** The tightest limit (the first listed on a tie: max-payload, mtow, max-fuel, mlw). */
  readonly limitedBy: RouteLimit;
  /** Every limit met within ROUTE_ACTIVE_LIMIT_REL (e.g. MTOW and fuel capacity both at corner C). */
  readonly activeLimits: readonly RouteLimit[];
}

/**
 * Greatest zero-fuel mass that flies `stage_m` under a takeoff-mass cap, fuel capacity, MLW and the
 * structural payload; the payload (= W_ZF − OEW) is negative when the stage cannot be flown.
 */
export function routeCapacity(
  m: RouteFuelModel, stage_m: number, takeoffMassCap_kg: number,
): RouteCapacity {
  const f = routeFactors(m, stage_m);
  if (!f.finite) return { zeroFuelMass_kg: 0, payload_kg: -m.oew_kg, limitedBy: 'max-fuel', activeLimits: ['max-fuel'] };
  const H = m.holdFuel_kg;
  const F = m.fuelAtBrakeRelease_kg;
  // Fuel: Φ·(W + H) − W ≤ F  →  W ≤ (F − Φ·H)/(Φ − 1); a bound below zero means no loading fits (W = 0).
  const fuelBound = f.phi > 1 ? (F - f.phi * H) / (f.phi - 1) : F >= f.phi * H ? Infinity : 0;
  const candidates: [number, RouteLimit][] = [
    [m.oew_kg + m.maxPayload_kg, 'max-payload'],
    [Math.max(0, takeoffMassCap_kg / f.phi - H), 'mtow'],
    [Math.max(0, fuelBound), 'max-fuel'],
    [Math.max(0, m.mlw_kg / f.lambda - H), 'mlw'],
  ];
  let W = Infinity;
  let lim: RouteLimit = 'max-payload';
  for (const [w, l] of candidates) {
    if (w < W) { W = w; lim = l; }
  }
  const activeLimits = candidates.filter(([w]) => w <= W * (1 + ROUTE_ACTIVE_LIMIT_REL)).map(([, l]) => l);
  return { zeroFuelMass_kg: W, payload_kg: W - m.oew_kg, limitedBy: lim, activeLimits };
}

/** Trace items common to every route result. */
export function routeModelTrace(m: RouteFuelModel): RouteTraceItem[] {
  const t: RouteTraceItem[] = [
    { key: 'speed_mps', label: 'Cruise true airspeed', value: m.speed_mps, unit: 'm/s' },
    m.propulsion === 'jet'
      ? { key: 'ct_perS', label: 'TSFC c_T', value: m.specificConsumption, unit: '1/s' }
      : { key: 'cp_perM', label: 'c_P = BSFC·g', value: m.specificConsumption, unit: '1/m' },
    { key: 'kappa_perM', label: 'ln(Wi/Wf) per metre of cruise', value: m.kappa_perM, unit: '1/m' },
    { key: 'reserveRate_perS', label: `ln(Wi/Wf) per second of reserve time (${m.holdSource === 'fuel-flow' ? 'hold at the given fuel flow: 0, see holding fuel' : m.holdSource === 'lift-to-drag' ? 'hold, from the hold L/D' : m.reserves.reserveFlight})`, value: m.reserveRate_perS, unit: '1/s' },
    { key: 'alternateDistance_m', label: m.reserves.alternateDefaulted ? 'Alternate distance (policy default 200 NM, from memory / common practice)' : 'Alternate distance', value: m.reserves.alternateDistance_m, unit: 'm' },
    { key: 'reserveTime_s', label: 'Reserve time', value: m.reserves.reserveTime_s, unit: 's' },
    { key: 'alternateLn', label: 'ln ratio, alternate leg', value: m.alternateLn, unit: '' },
    { key: 'reserveTimeLn', label: 'ln ratio, reserve time', value: m.reserveTimeLn, unit: '' },
    { key: 'contingencyFraction', label: `Contingency fraction of trip ${m.reserves.contingency.basis === 'trip-time' ? 'time' : 'fuel'}`, value: m.reserves.contingency.fraction, unit: '' },
    { key: 'taxiFuel_kg', label: 'Taxi fuel (in the ramp mass and block fuel, not in the takeoff mass)', value: m.taxiFuel_kg, unit: 'kg' },
    {
      key: 'climbDescentFraction',
      label: m.climbDescentSource === 'profile'
        ? 'Climb/descent allowance, fraction of takeoff mass (profile)'
        : 'Climb/descent allowance, fraction of takeoff mass (engine-type default, from memory / common practice)',
      value: m.climbDescentFraction, unit: '',
    },
  ];
  if (m.holdSource === 'fuel-flow') {
    t.push(
      { key: 'holdFuelFlow_kgph', label: 'Holding fuel flow (profile)', value: m.holdFuelFlow_kgph!, unit: 'kg/h' },
      { key: 'holdFuel_kg', label: 'Holding fuel at that flow', value: m.holdFuel_kg, unit: 'kg' },
    );
  }
  return t;
}
