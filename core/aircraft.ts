/**
 * Aircraft performance profile: the data the takeoff, landing, route and classification models read.
 *
 * Every numeric field is SI and listed in `AIRCRAFT_FIELDS` with its meaning, unit and valid range;
 * the same table drives validation, form sections, CSV columns and the docs. Ranges are physical
 * plausibility bounds for fixed-wing aircraft from light singles to large transports (common practice,
 * chosen for this project), not certification limits.
 *
 * Cross-field rules (validateAircraft): OEW < MLW ≤ MTOW; OEW + max payload ≤ MTOW;
 * VLOF > VR ≥ 1.0 VS1 (14 CFR 25.107 / 23.51 require VR above stall); V2 ≥ 1.1·VS (25.107(b) floor
 * with margin; default 1.2); tail-up speed below VLOF for tailwheel aircraft; engine data matching the
 * engine type; minimum control speed given for multi-engine aircraft.
 */
import type { QuantityKind } from './units.js';
import { InputDomainError } from './errors.js';
import {
  REFERENCE_LENGTH_RANGE, REFERENCE_TABLE_ELEVATION_RANGE, REFERENCE_TABLE_LENGTH_RANGE, REFERENCE_TABLE_MASS_RANGE,
  REFERENCE_TABLE_TEMPERATURE_RANGE, IDENTIFIER_PATTERN, IDENTIFIER_RULE, type FieldRange,
} from './fields.js';
import { check, inRange } from './validate.js';

export type EngineType = 'turbofan' | 'turboprop' | 'piston';
export type CertificationBasis = 'transport' | 'commuter' | 'normal';
export type GearLayout = 'tricycle' | 'tailwheel';
export type ThrustLapseModel = 'mattingly' | 'bartel-young';

export const ENGINE_TYPES: readonly EngineType[] = ['turbofan', 'turboprop', 'piston'];
export const CERTIFICATION_BASES: readonly CertificationBasis[] = ['transport', 'commuter', 'normal'];
export const GEAR_LAYOUTS: readonly GearLayout[] = ['tricycle', 'tailwheel'];
export const THRUST_LAPSE_MODELS: readonly ThrustLapseModel[] = ['mattingly', 'bartel-young'];

/** Cruise and fuel data for the design-weight-from-route model (Breguet). */
export interface CruiseData {
  /** True airspeed in cruise, m/s. */
  readonly speed_mps: number;
  /** Cruise altitude, m (geopotential, informative). */
  readonly altitude_m: number;
  /** Lift-to-drag ratio in cruise. */
  readonly liftToDrag: number;
  /** Lift-to-drag ratio in holding. */
  readonly holdLiftToDrag: number;
  /** Jet thrust-specific fuel consumption in cruise, 1/h (kg fuel per kg·f thrust per hour). Jets only. */
  readonly tsfc_perh?: number;
  /** Propeller brake-specific fuel consumption, kg/kWh. Propeller aircraft only. */
  readonly bsfc_kgPerKwh?: number;
  /** Propeller efficiency in cruise. Propeller aircraft only. */
  readonly cruisePropEfficiency?: number;
  /** Taxi-out fuel burnt before brake release, kg. */
  readonly taxiFuel_kg: number;
  /** Contingency fuel as a fraction of trip fuel (0.05 = 5 %). */
  readonly contingencyFraction: number;
  /** Fuel flow in holding, kg/h (default: from the hold lift-to-drag ratio). */
  readonly holdFuelFlow_kgph?: number;
  /** Fuel for climb and descent beyond the cruise estimate, as a fraction of the takeoff mass. */
  readonly climbDescentFraction?: number;
}

/** A small table of reference takeoff lengths by mass × elevation × temperature. */
export interface ReferenceTable {
  readonly mass_kg: readonly number[];
  readonly elevation_m: readonly number[];
  readonly temperature_c: readonly number[];
  /** length_m[i][j][k] for mass_kg[i], elevation_m[j], temperature_c[k], in metres. */
  readonly length_m: readonly (readonly (readonly number[])[])[];
}

/** Manufacturer-style reference lengths, when the user holds them. */
export interface ReferenceLengths {
  /** Takeoff field length at MTOW, sea level, ISA, zero wind and slope, m. */
  readonly takeoff_m?: number;
  /** Landing field length at MLW, sea level, ISA, zero wind and slope, m (already factored as published). */
  readonly landing_m?: number;
  readonly table?: ReferenceTable;
}

export interface AircraftProfile {
  readonly id: string;
  readonly name: string;
  /** Group of similar aircraft whose operations are counted together (defaults to the id). */
  readonly group?: string;
  readonly certification: CertificationBasis;
  readonly engineType: EngineType;
  readonly engineCount: number;
  readonly gear: GearLayout;

  readonly mtow_kg: number;
  readonly mlw_kg: number;
  readonly oew_kg: number;
  readonly maxPayload_kg: number;
  readonly maxFuel_kg: number;

  readonly wingArea_m2: number;
  readonly wingspan_m: number;
  readonly wingHeight_m: number;
  readonly tailHeight_m: number;
  readonly mainGearSpan_m: number;

  readonly clMaxTakeoff: number;
  readonly clMaxLanding: number;
  readonly clGround: number;
  readonly cd0Takeoff: number;
  readonly cd0Landing: number;
  readonly oswald: number;
  readonly engineOutDrag: number;

  /** Turbofan: static sea-level ISA thrust per engine, N. */
  readonly staticThrust_N?: number;
  /** Turbofan: bypass ratio. */
  readonly bypassRatio?: number;
  /** Turbofan and turboprop: flat-rating temperature at sea level, °C (thrust/power held up to it). */
  readonly flatRatingTemp_c?: number;
  readonly thrustLapse?: ThrustLapseModel;
  /** Propeller: shaft power per engine at sea level ISA, W. */
  readonly shaftPower_W?: number;
  /** Propeller diameter, m. */
  readonly propDiameter_m?: number;
  /** Propeller efficiency during the takeoff (η_p). */
  readonly propEfficiency?: number;
  /** Idle thrust per engine as a fraction of static thrust (stop phases). */
  readonly idleThrustFraction: number;

  /** Rolling friction on a dry paved runway (brakes off). */
  readonly rollingFriction: number;
  /** Braking friction, dry paved runway (whole aircraft, effective). */
  readonly brakingFrictionDry: number;
  /** Braking friction, wet paved runway. */
  readonly brakingFrictionWet: number;

  /** VR / VS1 (takeoff configuration stall speed). */
  readonly vrFactor: number;
  /** VLOF / VS1. */
  readonly vlofFactor: number;
  /** V2 / VS1 (speed at the screen height). */
  readonly v2Factor: number;
  /** VREF / VSR0 (landing configuration), 1.23 by 14 CFR 25.125. */
  readonly vrefFactor: number;
  /** Minimum control speed on the ground, m/s (multi-engine). */
  readonly vmcg_mps?: number;

  /** Rotation time from VR to VLOF, s. */
  readonly rotationTime_s: number;
  /** Engine-failure recognition time from VEF to the first stopping action, s. */
  readonly recognitionTime_s: number;
  /** Free-roll time after touchdown before full braking, s. */
  readonly freeRollTime_s: number;

  /** Tailwheel: tail-up speed, m/s (below VLOF). */
  readonly tailUpSpeed_mps?: number;
  /** Tailwheel: lift coefficient in the three-point attitude. */
  readonly threePointCl?: number;

  /** Light aircraft: factor applied to the unfactored landing and takeoff distances (1.0–2.0); default takeoff 1.25, landing 1/0.7 (core/operatingRules.ts). */
  readonly lightAircraftFactor?: number;
  /** Zero-lift drag, takeoff flaps, gear up (default: cd0Takeoff less the statistical gear increment). */
  readonly cd0TakeoffGearUp?: number;
  /** Time from lift-off to gear fully up, s. */
  readonly gearRetractionTime_s?: number;
  /** VMCA, minimum control speed in the air (CAS), m/s. */
  readonly vmca_mps?: number;
  /** VMU / VS1 (minimum unstick speed factor). */
  readonly vmuFactor?: number;
  /** Thrust or power held to ISA + this deviation at every pressure altitude, K. */
  readonly flatRatingDeltaIsa_k?: number;
  /** Fall of the flat-rating corner temperature with pressure altitude (corner form), K per km. */
  readonly flatRatingCornerLapse_kPerKm?: number;
  /** Static figure of merit of the propeller (ideal static power / shaft power). */
  readonly propFigureOfMerit?: number;
  /** Greatest energy the brakes may absorb in a rejected takeoff, J. */
  readonly maxBrakeEnergy_J?: number;
  /** Tyre speed rating (groundspeed), m/s. */
  readonly tyreSpeedLimit_mps?: number;
  /** Time from V1 to the full stopping configuration (throttles, brakes, spoilers), s. */
  readonly stopActivationTime_s?: number;
  /** Touchdown speed as a fraction of VREF. */
  readonly touchdownFactor?: number;

  readonly cruise?: CruiseData;
  readonly reference?: ReferenceLengths;
}

export type { QuantityKind } from './units.js';

export type FieldGroup =
  | 'identity' | 'weights' | 'geometry' | 'aerodynamics' | 'propulsion' | 'ground' | 'speeds'
  | 'times' | 'tailwheel' | 'route' | 'reference';

export interface FieldSpec {
  /** Property name (for cruise and reference fields, the name inside that object). */
  readonly key: string;
  readonly label: string;
  readonly group: FieldGroup;
  readonly kind: QuantityKind;
  /** SI unit symbol. */
  readonly unit: string;
  readonly min: number;
  readonly max: number;
  /** When the field is required: always, or only for some engine types / gear. */
  readonly when: 'always' | 'turbofan' | 'propeller' | 'multiEngine' | 'tailwheel' | 'optional';
  readonly doc: string;
}

const f = (
  key: string, label: string, group: FieldGroup, kind: QuantityKind, unit: string,
  min: number, max: number, when: FieldSpec['when'], doc: string,
): FieldSpec => ({ key, label, group, kind, unit, min, max, when, doc });

/** Numeric fields of the profile with unit and valid range (SI). */
export const AIRCRAFT_FIELDS: readonly FieldSpec[] = [
  f('engineCount', 'Engines', 'identity', 'count', '', 1, 4, 'always', 'Number of engines.'),
  f('mtow_kg', 'Maximum takeoff mass (MTOW)', 'weights', 'mass', 'kg', 300, 600000, 'always', 'Maximum certificated takeoff mass.'),
  f('mlw_kg', 'Maximum landing mass (MLW)', 'weights', 'mass', 'kg', 300, 600000, 'always', 'Maximum certificated landing mass.'),
  f('oew_kg', 'Operating empty mass (OEW)', 'weights', 'mass', 'kg', 200, 400000, 'always', 'Operating empty mass including crew and unusable fuel.'),
  f('maxPayload_kg', 'Maximum payload', 'weights', 'mass', 'kg', 0, 150000, 'always', 'Structural maximum payload.'),
  f('maxFuel_kg', 'Maximum fuel', 'weights', 'mass', 'kg', 20, 250000, 'always', 'Usable fuel capacity.'),
  f('wingArea_m2', 'Wing area', 'geometry', 'area', 'm²', 5, 900, 'always', 'Reference wing area S.'),
  f('wingspan_m', 'Wingspan', 'geometry', 'shortLength', 'm', 5, 85, 'always', 'Wingspan b (sets the code letter and design group).'),
  f('wingHeight_m', 'Wing height above runway', 'geometry', 'shortLength', 'm', 0.3, 10, 'always', 'Height h of the wing above the runway, for ground effect.'),
  f('tailHeight_m', 'Tail height', 'geometry', 'shortLength', 'm', 1, 25, 'always', 'Tail height (sets the design group).'),
  f('mainGearSpan_m', 'Main gear span', 'geometry', 'shortLength', 'm', 1, 20, 'always', 'Outer main gear wheel span.'),
  f('clMaxTakeoff', 'CLmax, takeoff', 'aerodynamics', 'ratio', '', 1.0, 3.5, 'always', 'Maximum lift coefficient, takeoff configuration (defines VS1).'),
  f('clMaxLanding', 'CLmax, landing', 'aerodynamics', 'ratio', '', 1.0, 4.0, 'always', 'Maximum lift coefficient, landing configuration (defines VSR0).'),
  f('clGround', 'CL in ground run', 'aerodynamics', 'ratio', '', 0, 1.5, 'always', 'Lift coefficient during the ground run (three-wheel attitude).'),
  f('cd0Takeoff', 'CD0, takeoff', 'aerodynamics', 'ratio', '', 0.01, 0.2, 'always', 'Zero-lift drag, takeoff flaps, gear down.'),
  f('cd0Landing', 'CD0, landing', 'aerodynamics', 'ratio', '', 0.01, 0.3, 'always', 'Zero-lift drag, landing flaps, gear down.'),
  f('oswald', 'Oswald factor', 'aerodynamics', 'ratio', '', 0.5, 1.0, 'always', 'Span efficiency e; K = 1/(π·AR·e).'),
  f('engineOutDrag', 'Engine-out drag increment', 'aerodynamics', 'ratio', '', 0, 0.05, 'always', 'ΔCD0 for a windmilling/feathered engine and control deflection.'),
  f('staticThrust_N', 'Static thrust per engine', 'propulsion', 'force', 'N', 2000, 600000, 'turbofan', 'Sea-level ISA static thrust per engine.'),
  f('bypassRatio', 'Bypass ratio', 'propulsion', 'ratio', '', 0, 15, 'turbofan', 'Bypass ratio λ.'),
  f('flatRatingTemp_c', 'Flat-rating temperature', 'propulsion', 'temperature', '°C', 0, 55, 'optional', 'Sea-level temperature up to which rated thrust or power is held.'),
  f('shaftPower_W', 'Shaft power per engine', 'propulsion', 'power', 'W', 40000, 10000000, 'propeller', 'Sea-level ISA takeoff shaft power per engine.'),
  f('propDiameter_m', 'Propeller diameter', 'propulsion', 'shortLength', 'm', 1.2, 6.5, 'propeller', 'Propeller diameter D.'),
  f('propEfficiency', 'Propeller efficiency', 'propulsion', 'ratio', '', 0.4, 0.9, 'propeller', 'η_p during the takeoff.'),
  f('idleThrustFraction', 'Idle thrust fraction', 'propulsion', 'ratio', '', 0, 0.15, 'always', 'Idle thrust per engine as a fraction of static thrust.'),
  f('rollingFriction', 'Rolling friction', 'ground', 'ratio', '', 0.01, 0.1, 'always', 'μ rolling on dry pavement (brakes off).'),
  f('brakingFrictionDry', 'Braking friction, dry', 'ground', 'ratio', '', 0.15, 0.7, 'always', 'Effective μ braking on dry pavement.'),
  f('brakingFrictionWet', 'Braking friction, wet', 'ground', 'ratio', '', 0.05, 0.5, 'always', 'Effective μ braking on wet pavement.'),
  f('vrFactor', 'VR / VS1', 'speeds', 'ratio', '', 1.0, 1.4, 'always', 'Rotation speed as a multiple of the takeoff stall speed.'),
  f('vlofFactor', 'VLOF / VS1', 'speeds', 'ratio', '', 1.02, 1.5, 'always', 'Lift-off speed as a multiple of the takeoff stall speed.'),
  f('v2Factor', 'V2 / VS1', 'speeds', 'ratio', '', 1.1, 1.6, 'always', 'Speed at the screen height as a multiple of the takeoff stall speed.'),
  f('vrefFactor', 'VREF / VSR0', 'speeds', 'ratio', '', 1.15, 1.5, 'always', 'Approach speed as a multiple of the landing stall speed (1.23 by 14 CFR 25.125).'),
  f('vmcg_mps', 'Minimum control speed, ground', 'speeds', 'speed', 'm/s', 10, 90, 'multiEngine', 'VMCG: lowest V1 for an engine failure.'),
  f('rotationTime_s', 'Rotation time', 'times', 'time', 's', 0.5, 5, 'always', 'Time from VR to VLOF.'),
  f('recognitionTime_s', 'Recognition time', 'times', 'time', 's', 0.5, 3, 'always', 'Time from engine failure to the first stopping action.'),
  f('freeRollTime_s', 'Free-roll time', 'times', 'time', 's', 0.5, 5, 'always', 'Time from touchdown to full braking.'),
  f('tailUpSpeed_mps', 'Tail-up speed', 'tailwheel', 'speed', 'm/s', 5, 60, 'tailwheel', 'Speed at which the tail is raised.'),
  f('threePointCl', 'Three-point lift coefficient', 'tailwheel', 'ratio', '', 0.3, 2.0, 'tailwheel', 'CL in the three-point attitude.'),
  f('lightAircraftFactor', 'Light-aircraft distance factor', 'ground', 'ratio', '', 1.0, 2.0, 'optional', 'Factor on the unfactored takeoff and landing distances of normal-category aircraft; empty: takeoff × 1.25, landing ÷ 0.70 (planning default).'),
  f('cd0TakeoffGearUp', 'CD0, takeoff, gear up', 'aerodynamics', 'ratio', '', 0.01, 0.2, 'optional', 'Zero-lift drag, takeoff flaps, gear up (default: CD0 takeoff less the statistical gear increment).'),
  f('gearRetractionTime_s', 'Gear retraction time', 'times', 'time', 's', 2, 15, 'optional', 'Time from lift-off to gear fully up.'),
  f('vmca_mps', 'Minimum control speed, air', 'speeds', 'speed', 'm/s', 10, 90, 'optional', 'VMCA (CAS); bounds VR and V2 by 14 CFR 25.107.'),
  f('vmuFactor', 'VMU / VS1', 'speeds', 'ratio', '', 1.0, 1.3, 'optional', 'Minimum unstick speed as a multiple of the takeoff stall speed.'),
  f('flatRatingDeltaIsa_k', 'Flat rating, ISA deviation', 'propulsion', 'temperatureDelta', 'K', 0, 40, 'optional', 'Rated thrust or power held to ISA + this deviation at every pressure altitude.'),
  f('flatRatingCornerLapse_kPerKm', 'Flat-rating corner lapse (K/km)', 'propulsion', 'ratio', 'K/km', 0, 10, 'optional', 'Fall of the corner temperature (from the flat-rating temperature at sea level) per km of pressure altitude.'),
  f('propFigureOfMerit', 'Propeller figure of merit', 'propulsion', 'ratio', '', 0.3, 0.85, 'optional', 'Static figure of merit: ideal static power over shaft power.'),
  f('maxBrakeEnergy_J', 'Brake energy limit', 'ground', 'energy', 'J', 100000, 500000000, 'optional', 'Greatest energy all brakes may absorb in a rejected takeoff.'),
  f('tyreSpeedLimit_mps', 'Tyre speed limit', 'ground', 'speed', 'm/s', 30, 130, 'optional', 'Tyre speed rating, as groundspeed.'),
  f('stopActivationTime_s', 'Stop activation time', 'times', 'time', 's', 0, 4, 'optional', 'Time from V1 to full stopping configuration (throttles, brakes, spoilers), before the 2 s allowance.'),
  f('touchdownFactor', 'VTD / VREF', 'speeds', 'ratio', '', 0.85, 1.0, 'optional', 'Touchdown speed as a fraction of VREF.'),
];

export const CRUISE_FIELDS: readonly FieldSpec[] = [
  f('speed_mps', 'Cruise speed (TAS)', 'route', 'speed', 'm/s', 30, 300, 'always', 'True airspeed in cruise.'),
  f('altitude_m', 'Cruise altitude', 'route', 'altitude', 'm', 0, 13000, 'always', 'Typical cruise altitude.'),
  f('liftToDrag', 'L/D in cruise', 'route', 'ratio', '', 5, 25, 'always', 'Lift-to-drag ratio in cruise.'),
  f('holdLiftToDrag', 'L/D in holding', 'route', 'ratio', '', 5, 25, 'always', 'Lift-to-drag ratio in holding.'),
  f('tsfc_perh', 'TSFC', 'route', 'tsfc', '1/h', 0.3, 1.2, 'turbofan', 'Thrust-specific fuel consumption in cruise.'),
  f('bsfc_kgPerKwh', 'BSFC', 'route', 'bsfc', 'kg/kWh', 0.15, 0.45, 'propeller', 'Brake-specific fuel consumption.'),
  f('cruisePropEfficiency', 'Propeller efficiency, cruise', 'route', 'ratio', '', 0.5, 0.92, 'propeller', 'η_p in cruise.'),
  f('taxiFuel_kg', 'Taxi fuel', 'route', 'mass', 'kg', 0, 2000, 'always', 'Fuel burnt before brake release.'),
  f('contingencyFraction', 'Contingency fuel', 'route', 'ratio', '', 0, 0.2, 'always', 'Contingency as a fraction of trip fuel.'),
  f('holdFuelFlow_kgph', 'Holding fuel flow', 'route', 'massFlow', 'kg/h', 20, 20000, 'optional', 'Fuel flow in holding (default: from the hold lift-to-drag ratio).'),
  f('climbDescentFraction', 'Climb and descent allowance', 'route', 'ratio', '', 0, 0.05, 'optional', 'Fuel for climb and descent beyond the cruise estimate, as a fraction of the takeoff mass.'),
];

const HAS_PROP = (t: EngineType): boolean => t !== 'turbofan';

function required(spec: FieldSpec, a: AircraftProfile): boolean {
  switch (spec.when) {
    case 'always': return true;
    case 'turbofan': return a.engineType === 'turbofan';
    case 'propeller': return HAS_PROP(a.engineType);
    case 'multiEngine': return a.engineCount > 1;
    case 'tailwheel': return a.gear === 'tailwheel';
    case 'optional': return false;
  }
}

function cruiseRequired(spec: FieldSpec, a: AircraftProfile): boolean {
  if (spec.when === 'optional') return false;
  if (spec.when === 'turbofan') return a.engineType === 'turbofan';
  if (spec.when === 'propeller') return HAS_PROP(a.engineType);
  return true;
}

function checkEnum<T extends string>(field: string, v: unknown, allowed: readonly T[]): void {
  if (typeof v !== 'string' || !(allowed as readonly string[]).includes(v)) {
    throw new InputDomainError(field, v, `one of ${allowed.join(', ')}`);
  }
}

declare const VALIDATED: unique symbol;

/**
 * A profile that has passed validateAircraft. Core's models and solvers take it without checking it
 * again: a study validates each profile once, not at every analysis of every bisection step.
 */
export type ValidAircraft = AircraftProfile & { readonly [VALIDATED]: true };

/**
 * Profiles that have passed, by identity. Profiles are values (every member is readonly): one that
 * changes is a new object and is checked again.
 */
const PASSED = new WeakSet<AircraftProfile>();

/**
 * Validates a profile (ranges and cross-field rules); returns it unchanged, typed as validated, or
 * throws InputDomainError naming the field (prefixed by `path`), the value and the allowed range. A
 * profile object that has already passed is returned at once.
 */
export function validateAircraft(a: AircraftProfile, path = 'aircraft'): ValidAircraft {
  if (PASSED.has(a)) return a as ValidAircraft;
  const rec = a as unknown as Record<string, unknown>;
  check(typeof a.id === 'string' && IDENTIFIER_PATTERN.test(a.id), `${path}.id`, a.id, `an identifier: ${IDENTIFIER_RULE}`);
  check(typeof a.name === 'string' && a.name.trim().length > 0 && a.name.length <= 120, `${path}.name`, a.name, 'a non-empty name of at most 120 characters');
  checkEnum(`${path}.certification`, a.certification, CERTIFICATION_BASES);
  checkEnum(`${path}.engineType`, a.engineType, ENGINE_TYPES);
  checkEnum(`${path}.gear`, a.gear, GEAR_LAYOUTS);
  if (a.thrustLapse !== undefined) checkEnum(`${path}.thrustLapse`, a.thrustLapse, THRUST_LAPSE_MODELS);
  for (const spec of AIRCRAFT_FIELDS) {
    const v = rec[spec.key];
    if (v === undefined && !required(spec, a)) continue;
    inRange(`${path}.${spec.key}`, v, { min: spec.min, max: spec.max, unit: spec.unit });
  }
  check(Number.isInteger(a.engineCount), `${path}.engineCount`, a.engineCount, 'a whole number from 1 to 4');
  check(a.oew_kg < a.mlw_kg, `${path}.oew_kg`, a.oew_kg, `less than the maximum landing mass (${a.mlw_kg} kg)`);
  check(a.mlw_kg <= a.mtow_kg, `${path}.mlw_kg`, a.mlw_kg, `at most the maximum takeoff mass (${a.mtow_kg} kg)`);
  check(a.oew_kg + a.maxPayload_kg <= a.mtow_kg, `${path}.maxPayload_kg`, a.maxPayload_kg, `at most MTOW − OEW (${a.mtow_kg - a.oew_kg} kg)`);
  check(a.vlofFactor > a.vrFactor, `${path}.vlofFactor`, a.vlofFactor, `greater than VR / VS1 (${a.vrFactor})`);
  check(a.v2Factor >= a.vlofFactor, `${path}.v2Factor`, a.v2Factor, `at least VLOF / VS1 (${a.vlofFactor})`);
  if (a.cd0TakeoffGearUp !== undefined) {
    check(a.cd0TakeoffGearUp < a.cd0Takeoff, `${path}.cd0TakeoffGearUp`, a.cd0TakeoffGearUp, `less than CD0 takeoff with the gear down (${a.cd0Takeoff})`);
  }
  check(a.clMaxLanding >= a.clMaxTakeoff, `${path}.clMaxLanding`, a.clMaxLanding, `at least CLmax takeoff (${a.clMaxTakeoff})`);
  check(a.clGround < a.clMaxTakeoff, `${path}.clGround`, a.clGround, `less than CLmax takeoff (${a.clMaxTakeoff})`);
  check(a.brakingFrictionWet <= a.brakingFrictionDry, `${path}.brakingFrictionWet`, a.brakingFrictionWet, `at most the dry braking friction (${a.brakingFrictionDry})`);
  if (a.gear === 'tailwheel') {
    check(a.threePointCl! < a.clMaxTakeoff, `${path}.threePointCl`, a.threePointCl, `less than CLmax takeoff (${a.clMaxTakeoff})`);
  }
  if (a.cruise !== undefined) {
    const c = a.cruise as unknown as Record<string, unknown>;
    for (const spec of CRUISE_FIELDS) {
      const v = c[spec.key];
      if (v === undefined && !cruiseRequired(spec, a)) continue;
      inRange(`${path}.cruise.${spec.key}`, v, { min: spec.min, max: spec.max, unit: spec.unit });
    }
  }
  if (a.reference !== undefined) validateReference(a.reference, `${path}.reference`);
  PASSED.add(a);
  return a as ValidAircraft;
}

function validateReference(r: ReferenceLengths, path: string): void {
  if (r.takeoff_m !== undefined) inRange(`${path}.takeoff_m`, r.takeoff_m, REFERENCE_LENGTH_RANGE);
  if (r.landing_m !== undefined) inRange(`${path}.landing_m`, r.landing_m, REFERENCE_LENGTH_RANGE);
  const t = r.table;
  if (t === undefined) return;
  const axes: [keyof ReferenceTable, readonly number[], FieldRange][] = [
    ['mass_kg', t.mass_kg, REFERENCE_TABLE_MASS_RANGE],
    ['elevation_m', t.elevation_m, REFERENCE_TABLE_ELEVATION_RANGE],
    ['temperature_c', t.temperature_c, REFERENCE_TABLE_TEMPERATURE_RANGE],
  ];
  for (const [name, axis, range] of axes) {
    check(Array.isArray(axis) && axis.length >= 1 && axis.length <= 20, `${path}.table.${name}`, axis, 'a list of 1 to 20 values');
    axis.forEach((v, i) => inRange(`${path}.table.${name}[${i}]`, v, range));
    for (let i = 1; i < axis.length; i++) {
      check(axis[i]! > axis[i - 1]!, `${path}.table.${name}[${i}]`, axis[i], `greater than the previous value (${axis[i - 1]}); axes ascend`);
    }
  }
  check(t.length_m.length === t.mass_kg.length, `${path}.table.length_m`, t.length_m.length, `${t.mass_kg.length} rows (one per mass)`);
  t.length_m.forEach((plane, i) => {
    check(plane.length === t.elevation_m.length, `${path}.table.length_m[${i}]`, plane.length, `${t.elevation_m.length} rows (one per elevation)`);
    plane.forEach((row, j) => {
      check(row.length === t.temperature_c.length, `${path}.table.length_m[${i}][${j}]`, row.length, `${t.temperature_c.length} values (one per temperature)`);
      row.forEach((v, k) => inRange(`${path}.table.length_m[${i}][${j}][${k}]`, v, REFERENCE_TABLE_LENGTH_RANGE));
    });
  });
}

/** Stall speed (m/s) at mass `mass_kg`, density `rho`, wing area and a maximum lift coefficient. */
export function stallSpeed(mass_kg: number, rho: number, wingArea_m2: number, clMax: number, g = 9.80665): number {
  return Math.sqrt((2 * mass_kg * g) / (rho * wingArea_m2 * clMax));
}
