/**
 * The one definition of each study option: its path in the study file, the name of its form field,
 * label, help, kind (display unit, choice or text), range or choices, and default. The study file's
 * zod schema (server/schemas/study.ts), the study form's labels and hints (templates/pages/studies.tsx)
 * and the appendix's input listing (core/report/model.ts) are derived from this table, and a test
 * checks that every option of a study appears in the listing. Ranges come from core/fields.ts; the
 * aircraft's own table is AIRCRAFT_FIELDS (core/aircraft.ts).
 *
 * Adding an option: one row here, its member in `StudyOptions` (core/study/types.ts), its database
 * column (db/schema.ts, `npm run db:generate`) and, when the form needs it, its control.
 */
import {
  ALTERNATE_DISTANCE_RANGE_KM, CONTINGENCY_FRACTION_RANGE, PASSENGER_MASS_RANGE, REGULAR_USE_THRESHOLD_RANGE,
  RESERVE_TIME_RANGE_MIN, ROUNDING_INCREMENT_RANGE, type FieldRange,
} from './fields.js';
import { OPERATING_RULE_SETS } from './operatingRules.js';
import { SURFACES } from './surface.js';
import type { DisplayKind } from './units.js';

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

export const STUDY_METHODS = ['physics', 'reference-icao', 'reference-authority', 'calibrated'] as const;
export const RESERVE_POLICIES = ['cruise-45min', 'international', 'custom'] as const;

export const STUDY_OPTION_FIELDS: readonly OptionFieldSpec[] = [
  { path: 'regularUseThreshold', form: 'regularUseThreshold', label: 'Regular-use threshold', kind: 'count', integer: true, range: REGULAR_USE_THRESHOLD_RANGE, default: 500,
    help: 'Annual operations at or above which an aircraft (group) is in regular use.' },
  { path: 'roundingIncrement_m', form: 'roundingIncrement', label: 'Planning increment', kind: 'length', range: ROUNDING_INCREMENT_RANGE,
    help: 'The recommended length is rounded up to this step (default 50 m, or 100 ft in US units).' },
  { path: 'surface', form: 'surface', label: 'Design surface', kind: 'choice', choices: SURFACES, default: 'dry',
    help: 'Runway surface of the design case.' },
  { path: 'method', form: 'method', label: 'Method', kind: 'choice', choices: STUDY_METHODS, default: 'physics',
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
