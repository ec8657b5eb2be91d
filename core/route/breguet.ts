/**
 * Breguet range and endurance, and their inverses (the weight ratio for a distance or a time).
 *
 * Source: the Breguet range equation in its usual textbook forms, as collected in
 * Aeronautical Engineer's Data Book ch. 9 (*Aeronautical Engineer's Data Book*, ch. 9, for the jet form):
 *   jet range           R = (V / c_T) · (L/D) · ln(W_i / W_f)      c_T = TSFC in 1/s
 *   propeller range     R = (η_p / c_P) · (L/D) · ln(W_i / W_f)    c_P = BSFC · g in 1/m, BSFC in kg/(W·s)
 *   jet endurance       E = (1 / c_T) · (L/D) · ln(W_i / W_f)
 *   propeller endurance E = (η_p / (c_P · V)) · (L/D) · ln(W_i / W_f)   at a constant true airspeed V
 * The propeller endurance form follows from the same assumptions as the range form: the fuel flow is
 * BSFC · P with shaft power P = D · V / η_p and D = W / (L/D), flown at a constant speed V; it is the
 * propeller range divided by V. Which holding speed to use is the caller's choice (the route model
 * holds at the cruise true airspeed; see docs/methods/route.md, "Holding").
 *
 * Validity: steady cruise or hold at constant speed, L/D and specific consumption (the "cruise-climb"
 * idealisation); climb, descent, winds and the change of L/D with weight are ignored. Ranges of the
 * inputs are the physical bounds named below (SI).
 */
import { G0 } from '../units.js';
import { inRange } from '../validate.js';

/** Seconds per hour, for TSFC given per hour. */
export const BREGUET_SECONDS_PER_HOUR = 3600;
/** Joules per kilowatt-hour, for BSFC given in kg/kWh. */
export const BREGUET_JOULES_PER_KWH = 3.6e6;

const SPEED = { min: 0, minInclusive: false, max: 400, unit: 'm/s' } as const;
const LIFT_TO_DRAG = { min: 0, minInclusive: false, max: 40, unit: '' } as const;
const CT = { min: 0, minInclusive: false, max: 0.01, unit: '1/s' } as const;
const CP = { min: 0, minInclusive: false, max: 1e-4, unit: '1/m' } as const;
const ETA = { min: 0, minInclusive: false, max: 1, unit: '' } as const;
const WEIGHT_RATIO = { min: 1, max: 100, unit: '' } as const;
const RANGE = { min: 0, max: 4e7, unit: 'm' } as const;
const ENDURANCE = { min: 0, max: 1e6, unit: 's' } as const;

/** Jet TSFC c_T in 1/s from a TSFC per hour (kg fuel per kg·f thrust per hour, i.e. 1/h). */
export function breguetCtFromTsfcPerHour(tsfc_perh: number): number {
  inRange('tsfc_perh', tsfc_perh, { min: 0, minInclusive: false, max: 36, unit: '1/h' });
  return tsfc_perh / BREGUET_SECONDS_PER_HOUR;
}

/** Propeller c_P = BSFC · g in 1/m from a BSFC in kg/kWh (BSFC in kg/(W·s) = kg/kWh ÷ 3.6e6). */
export function breguetCpFromBsfc(bsfc_kgPerKwh: number): number {
  inRange('bsfc_kgPerKwh', bsfc_kgPerKwh, { min: 0, minInclusive: false, max: 360, unit: 'kg/kWh' });
  return (bsfc_kgPerKwh / BREGUET_JOULES_PER_KWH) * G0;
}

export interface BreguetJetInput {
  /** True airspeed, m/s. */
  readonly speed_mps: number;
  readonly liftToDrag: number;
  /** Thrust-specific fuel consumption, 1/s. */
  readonly ct_perS: number;
}

export interface BreguetPropInput {
  /** Propeller efficiency η_p (0–1]. */
  readonly propEfficiency: number;
  readonly liftToDrag: number;
  /** c_P = BSFC · g, 1/m. */
  readonly cp_perM: number;
}

function jet(i: BreguetJetInput): void {
  inRange('speed_mps', i.speed_mps, SPEED);
  inRange('liftToDrag', i.liftToDrag, LIFT_TO_DRAG);
  inRange('ct_perS', i.ct_perS, CT);
}

function prop(i: BreguetPropInput): void {
  inRange('propEfficiency', i.propEfficiency, ETA);
  inRange('liftToDrag', i.liftToDrag, LIFT_TO_DRAG);
  inRange('cp_perM', i.cp_perM, CP);
}

/** Jet range, m: R = (V/c_T)(L/D) ln(W_i/W_f). `weightRatio` = W_i/W_f ≥ 1. */
export function breguetJetRange(i: BreguetJetInput & { readonly weightRatio: number }): number {
  jet(i);
  const r = inRange('weightRatio', i.weightRatio, WEIGHT_RATIO);
  return (i.speed_mps / i.ct_perS) * i.liftToDrag * Math.log(r);
}

/** Jet weight ratio W_i/W_f needed for a distance `range_m` (m): exp(R·c_T / (V·L/D)). */
export function breguetJetWeightRatio(i: BreguetJetInput & { readonly range_m: number }): number {
  jet(i);
  const R = inRange('range_m', i.range_m, RANGE);
  return Math.exp((R * i.ct_perS) / (i.speed_mps * i.liftToDrag));
}

/** Propeller range, m: R = (η/c_P)(L/D) ln(W_i/W_f). */
export function breguetPropRange(i: BreguetPropInput & { readonly weightRatio: number }): number {
  prop(i);
  const r = inRange('weightRatio', i.weightRatio, WEIGHT_RATIO);
  return (i.propEfficiency / i.cp_perM) * i.liftToDrag * Math.log(r);
}

/** Propeller weight ratio W_i/W_f for a distance `range_m` (m): exp(R·c_P / (η·L/D)). */
export function breguetPropWeightRatio(i: BreguetPropInput & { readonly range_m: number }): number {
  prop(i);
  const R = inRange('range_m', i.range_m, RANGE);
  return Math.exp((R * i.cp_perM) / (i.propEfficiency * i.liftToDrag));
}

/** Jet endurance, s: E = (1/c_T)(L/D) ln(W_i/W_f). */
export function breguetJetEndurance(
  i: { readonly liftToDrag: number; readonly ct_perS: number; readonly weightRatio: number },
): number {
  inRange('liftToDrag', i.liftToDrag, LIFT_TO_DRAG);
  inRange('ct_perS', i.ct_perS, CT);
  const r = inRange('weightRatio', i.weightRatio, WEIGHT_RATIO);
  return (i.liftToDrag / i.ct_perS) * Math.log(r);
}

/** Jet weight ratio for an endurance `endurance_s` (s): exp(E·c_T / (L/D)). */
export function breguetJetEnduranceWeightRatio(
  i: { readonly liftToDrag: number; readonly ct_perS: number; readonly endurance_s: number },
): number {
  inRange('liftToDrag', i.liftToDrag, LIFT_TO_DRAG);
  inRange('ct_perS', i.ct_perS, CT);
  const E = inRange('endurance_s', i.endurance_s, ENDURANCE);
  return Math.exp((E * i.ct_perS) / i.liftToDrag);
}

/**
 * Propeller endurance at a constant true airspeed `speed_mps`, s: E = (η/(c_P·V))(L/D) ln(W_i/W_f).
 * ASSUMPTION: constant speed, L/D and η during the hold (see the file header).
 */
export function breguetPropEndurance(
  i: BreguetPropInput & { readonly speed_mps: number; readonly weightRatio: number },
): number {
  prop(i);
  inRange('speed_mps', i.speed_mps, SPEED);
  const r = inRange('weightRatio', i.weightRatio, WEIGHT_RATIO);
  return (i.propEfficiency / (i.cp_perM * i.speed_mps)) * i.liftToDrag * Math.log(r);
}

/** Propeller weight ratio for an endurance `endurance_s` (s) at constant speed: exp(E·c_P·V / (η·L/D)). */
export function breguetPropEnduranceWeightRatio(
  i: BreguetPropInput & { readonly speed_mps: number; readonly endurance_s: number },
): number {
  prop(i);
  inRange('speed_mps', i.speed_mps, SPEED);
  const E = inRange('endurance_s', i.endurance_s, ENDURANCE);
  return Math.exp((E * i.cp_perM * i.speed_mps) / (i.propEfficiency * i.liftToDrag));
}
