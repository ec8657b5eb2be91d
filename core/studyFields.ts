/**
 * The one definition of each study option (and, below, of each numeric site, climate, runway and
 * fleet field): its path in the study file, the name of its form field,
 * label, help, kind (display unit, choice or text), range or choices, and default. The study file's
 * zod schema (server/studies/schema.ts), the study form's labels and hints (templates/studies/pages.tsx)
 * and the appendix's input listing (core/report/model.ts) are derived from this table, and a test
 * checks that every option of a study appears in the listing. Ranges come from core/fields.ts; the
 * aircraft's own table is AIRCRAFT_FIELDS (core/aircraft.ts).
 *
 * Adding an option: one row here, its member in `StudyOptions` (core/study/types.ts), its database
 * column (db/schema.ts, `npm run db:generate`) and, when the form needs it, its control.
 */
import {
  ALTERNATE_DISTANCE_RANGE_KM, ANNUAL_OPERATIONS_RANGE, CLIMATE_YEARS_RANGE, CONTINGENCY_FRACTION_RANGE, DECLARED_LENGTH_RANGE,
  DESIGN_TEMPERATURE_RANGE, FLEET_PAYLOAD_RANGE, MONTHLY_MEAN_MAX_RANGE, MONTHLY_MEAN_MIN_RANGE, MONTHLY_MEAN_RANGE,
  PASSENGER_MASS_RANGE, REGULAR_USE_THRESHOLD_RANGE, RESERVE_TIME_RANGE_MIN, ROUNDING_INCREMENT_RANGE, RUNWAY_CHAINAGE_RANGE,
  RUNWAY_POINT_ELEVATION_RANGE, SITE_ELEVATION_RANGE, STAGE_LENGTH_RANGE_KM, type FieldRange,
} from './fields.js';
import { OPERATING_RULE_SETS } from './operatingRules.js';
import { SURFACES } from './surface.js';
import { displayInputValue, type DisplayKind, type QuantityKind, type UnitSystem } from './units.js';

export interface OptionFieldSpec {
  /** Path inside `options` of the study file, e.g. "reserves.alternate_km". */
  readonly path: string;
  /** Name of the study form's field. */
  readonly form: string;
  readonly label: string;
  readonly help: string;
  /** 'choice' and 'text' fields are not numbers. */
  readonly kind: DisplayKind | 'choice' | 'text';
  /** Numeric range in the unit the file holds (km, min, fraction where the path says so). */
  readonly range?: FieldRange;
  /** A whole number. */
  readonly integer?: boolean;
  readonly choices?: readonly string[];
  /** Text length limits. */
  readonly text?: { readonly min: number; readonly max: number };
  /** Default when the file leaves the option out; undefined: optional, no default. */
  readonly default?: number | string;
}

export const STUDY_METHODS = ['physics', 'reference-icao', 'reference-authority', 'calibrated', 'planning'] as const;
export const RESERVE_POLICIES = ['cruise-45min', 'international', 'custom'] as const;

export const STUDY_OPTION_FIELDS: readonly OptionFieldSpec[] = [
  { path: 'regularUseThreshold', form: 'regularUseThreshold', label: 'Regular-use threshold', kind: 'count', integer: true, range: REGULAR_USE_THRESHOLD_RANGE, default: 500,
    help: 'Annual operations at or above which an aircraft (group) is in regular use.' },
  { path: 'roundingIncrement_m', form: 'roundingIncrement', label: 'Planning increment', kind: 'length', range: ROUNDING_INCREMENT_RANGE,
    help: 'The recommended length is rounded up to this step (default 50 m, or 100 ft in US units).' },
  { path: 'surface', form: 'surface', label: 'Design surface', kind: 'choice', choices: SURFACES, default: 'dry',
    help: 'Runway surface of the design case.' },
  { path: 'method', form: 'method', label: 'Method', kind: 'choice', choices: STUDY_METHODS, default: 'planning',
    help: 'Primary takeoff method; the others are shown beside it.' },
  { path: 'units', form: 'units', label: 'Units of the study', kind: 'choice', choices: ['si', 'us'], default: 'si',
    help: 'Study pages, the CSV results and the appendix use these units (display only: no number changes).' },
  { path: 'reserves.policy', form: 'reservePolicy', label: 'Fuel reserves', kind: 'choice', choices: RESERVE_POLICIES, default: 'cruise-45min',
    help: 'Reserve policy for the design takeoff mass.' },
  { path: 'reserves.alternate_km', form: 'alternate', label: 'Alternate distance', kind: 'distance', range: ALTERNATE_DISTANCE_RANGE_KM,
    help: 'Needed for custom reserves; otherwise 200 NM (370.4 km) when blank, 0 for none.' },
  { path: 'reserves.holding_min', form: 'holding', label: 'Holding time', kind: 'count', range: RESERVE_TIME_RANGE_MIN,
    help: 'Custom reserves only, minutes.' },
  { path: 'reserves.contingencyFraction', form: 'contingency', label: 'Contingency fuel', kind: 'ratio', range: CONTINGENCY_FRACTION_RANGE,
    help: "Custom reserves; blank uses each aircraft's own." },
  { path: 'passengerMass_kg', form: 'passengerMass', label: 'Mass per passenger', kind: 'mass', range: PASSENGER_MASS_RANGE, default: 95,
    help: 'With baggage; states payload penalties as passengers.' },
  { path: 'landingTemperature', form: 'landingTemperature', label: 'Landing temperature', kind: 'choice', choices: ['isa', 'design'], default: 'isa',
    help: 'ISA at the field (the certified data basis) or the design temperature.' },
  { path: 'landingMass', form: 'landingMass', label: 'Landing mass', kind: 'choice', choices: ['mlw', 'route'], default: 'mlw',
    help: 'Maximum landing mass (conservative) or the arrival mass of the design route.' },
  { path: 'operatingRules', form: 'operatingRules', label: 'Operating rules', kind: 'choice', choices: OPERATING_RULE_SETS, default: 'us-121',
    help: 'Sets the landing factors (docs/methods.md, Operating rules). Light aircraft use takeoff × 1.25 and landing ÷ 0.70 unless their profile gives a factor.' },
  { path: 'referenceOverrideReason', form: 'referenceOverrideReason', label: 'Override reason (reference methods)', kind: 'text', text: { min: 10, max: 500 },
    help: 'Leave blank (recommended). With a reference-length method, a reason here lets a corrected length beyond the 35 % limit of the percentage corrections govern; the reason is printed beside every row it affects.' },
];

/** The option at `path` of an options object (undefined when absent). */
export function optionValue(options: unknown, path: string): unknown {
  let v: unknown = options;
  for (const k of path.split('.')) v = v !== null && typeof v === 'object' ? (v as Record<string, unknown>)[k] : undefined;
  return v;
}

/** Spec by form field name. */
export function optionFieldByForm(form: string): OptionFieldSpec {
  const f = STUDY_OPTION_FIELDS.find((x) => x.form === form);
  if (!f) throw new Error(`no study option with form field ${form}`);
  return f;
}

// ---------------------------------------------------------------------------------------------
// Site, climate, runway and fleet fields: the numbers a study file holds outside the options.
// ---------------------------------------------------------------------------------------------

/**
 * One numeric field of a site, a monthly climate value, a runway or a fleet row. The study file's
 * schema, the web forms (label, unit, hint, range, required), core validation and the appendix's
 * listing are all read from these rows.
 */
export interface InputFieldSpec {
  /** Member name in its object (study file and core input alike). */
  readonly key: string;
  /**
   * Name of its web-form field; repeated groups prefix it (month m: `m{m}_{form}`, direction i:
   * `d{i}_{form}`, fleet row i: `r{i}_{form}`).
   */
  readonly form: string;
  readonly label: string;
  readonly kind: QuantityKind;
  readonly range: FieldRange;
  readonly integer?: boolean;
  readonly optional?: boolean;
  readonly help: string;
  /**
   * File value per SI unit when the file holds another unit than SI (0.001 for a stage length in km);
   * the range is in the file's unit.
   */
  readonly fileScale?: number;
}

/** Prefilled form text of a field-table value held in the study file's unit (blank when absent). */
export function fieldInputText(f: InputFieldSpec, value: number | undefined, system: UnitSystem): string {
  return value === undefined ? '' : displayInputValue(value / (f.fileScale ?? 1), f.kind, system);
}

/** A field's range in SI (metres where the file holds kilometres). */
export function siRangeOf(f: InputFieldSpec): { readonly min: number; readonly max: number } {
  const k = f.fileScale ?? 1;
  return { min: f.range.min / k, max: f.range.max / k };
}

export const SITE_FIELDS: readonly InputFieldSpec[] = [
  { key: 'elevation_m', form: 'elevation', label: 'Aerodrome elevation', kind: 'altitude', range: SITE_ELEVATION_RANGE,
    help: 'Highest point of the landing area; taken as the design pressure altitude.' },
  { key: 'designTemperature_c', form: 'designTemperature', label: 'Design temperature (given)', kind: 'temperature', range: DESIGN_TEMPERATURE_RANGE, optional: true,
    help: 'When blank, derived from the monthly climate: the mean daily maximum of the hottest month (ICAO Annex 14 §2.4.1).' },
];

export const CLIMATE_FIELDS: readonly InputFieldSpec[] = [
  { key: 'years', form: 'climateYears', label: 'Years of record', kind: 'count', range: CLIMATE_YEARS_RANGE, integer: true, optional: true, help: 'Years of record behind the monthly values.' },
];

export const MONTHLY_FIELDS: readonly InputFieldSpec[] = [
  { key: 'meanMax_c', form: 'max', label: 'Mean daily maximum', kind: 'temperature', range: MONTHLY_MEAN_MAX_RANGE, help: 'Monthly mean of the daily maximum temperature.' },
  { key: 'meanMin_c', form: 'min', label: 'Mean daily minimum', kind: 'temperature', range: MONTHLY_MEAN_MIN_RANGE, optional: true, help: 'Monthly mean of the daily minimum temperature.' },
  { key: 'mean_c', form: 'mean', label: 'Mean', kind: 'temperature', range: MONTHLY_MEAN_RANGE, optional: true, help: 'Monthly mean temperature (ranks the months).' },
];

export const PROFILE_POINT_FIELDS: readonly InputFieldSpec[] = [
  { key: 'chainage_m', form: 'chainage', label: 'Chainage', kind: 'length', range: RUNWAY_CHAINAGE_RANGE, help: 'Distance along the centreline from the first threshold.' },
  { key: 'elevation_m', form: 'elevation', label: 'Elevation', kind: 'altitude', range: RUNWAY_POINT_ELEVATION_RANGE, help: 'Centreline elevation at the chainage.' },
];

export const DIRECTION_FIELDS: readonly InputFieldSpec[] = [
  { key: 'tora_m', form: 'tora', label: 'TORA', kind: 'length', range: DECLARED_LENGTH_RANGE, help: 'Takeoff run available.' },
  { key: 'toda_m', form: 'toda', label: 'TODA', kind: 'length', range: DECLARED_LENGTH_RANGE, help: 'Takeoff distance available (TORA plus clearway).' },
  { key: 'asda_m', form: 'asda', label: 'ASDA', kind: 'length', range: DECLARED_LENGTH_RANGE, help: 'Accelerate-stop distance available (TORA plus stopway).' },
  { key: 'lda_m', form: 'lda', label: 'LDA', kind: 'length', range: DECLARED_LENGTH_RANGE, help: 'Landing distance available.' },
];

export const FLEET_FIELDS: readonly InputFieldSpec[] = [
  { key: 'annualOperations', form: 'ops', label: 'Annual operations', kind: 'count', range: ANNUAL_OPERATIONS_RANGE, integer: true, help: 'Takeoffs and landings a year of this aircraft in the scenario.' },
  { key: 'stageLength_km', form: 'stage', label: 'Stage length', kind: 'distance', range: STAGE_LENGTH_RANGE_KM, fileScale: 0.001,
    help: 'Longest regular stage (great-circle trip distance); the study file holds it in km.' },
  { key: 'payload_kg', form: 'payload', label: 'Payload', kind: 'mass', range: FLEET_PAYLOAD_RANGE, help: "Payload on that stage (at most the aircraft's maximum payload)." },
];

/** A field by key in a table. */
export function inputField(table: readonly InputFieldSpec[], key: string): InputFieldSpec {
  const f = table.find((x) => x.key === key);
  if (!f) throw new Error(`no input field ${key}`);
  return f;
}
