/**
 * The aircraft form's fields, in sections, built from core's field table (AIRCRAFT_FIELDS,
 * CRUISE_FIELDS) so that labels, units and ranges live in one place. Shared by the form template and
 * the server's form reader. Names are the profile's property paths (`cruise.speed_mps`).
 */
import { AIRCRAFT_FIELDS, CRUISE_FIELDS, type FieldGroup, type FieldSpec } from '../../core/index.js';

export interface AircraftFormField extends FieldSpec {
  /** Form field name: the property path. */
  readonly name: string;
  /** Section of the form. */
  readonly section: FormSection;
}

export type FormSection =
  | 'identity' | 'weights' | 'geometry' | 'aerodynamics' | 'propulsion' | 'ground' | 'speeds' | 'route' | 'reference';

export const FORM_SECTIONS: readonly { readonly id: FormSection; readonly legend: string; readonly note?: string }[] = [
  { id: 'identity', legend: 'Type and identity' },
  { id: 'weights', legend: 'Weights' },
  { id: 'geometry', legend: 'Geometry' },
  { id: 'aerodynamics', legend: 'Aerodynamics' },
  { id: 'propulsion', legend: 'Propulsion', note: 'Turbofans need static thrust and bypass ratio; propeller aircraft need shaft power, propeller diameter and efficiency.' },
  { id: 'ground', legend: 'Ground run, braking and timing' },
  { id: 'speeds', legend: 'Speed schedule', note: 'Speed factors are multiples of the stall speed in the matching configuration. Tailwheel aircraft also need the tail-up speed and three-point lift coefficient.' },
  { id: 'route', legend: 'Route data (cruise and fuel)', note: 'Optional as a whole: leave every field blank for an aircraft without route data. Jets need TSFC; propeller aircraft need BSFC and cruise propeller efficiency.' },
  { id: 'reference', legend: 'Reference lengths', note: 'Optional: lengths from your own manufacturer data at MTOW (takeoff) or MLW (landing), sea level, ISA. A reference table is kept when present but is edited through a JSON import.' },
];

function sectionOf(g: FieldGroup): FormSection {
  switch (g) {
    case 'times': return 'ground';
    case 'tailwheel': return 'speeds';
    default: return g;
  }
}

const REFERENCE_FIELDS: readonly AircraftFormField[] = [
  { key: 'takeoff_m', name: 'reference.takeoff_m', label: 'Planning takeoff field length (the aeroplane reference field length)', group: 'reference', section: 'reference', kind: 'length', unit: 'm', min: 100, max: 5000, when: 'optional', doc: 'From the planning document: at MTOW, sea level, ISA, zero wind and slope. When given, it is the aeroplane reference field length everywhere (classification, plausibility bound); the physics model is shown beside it.' },
  { key: 'landing_m', name: 'reference.landing_m', label: 'Reference landing field length', group: 'reference', section: 'reference', kind: 'length', unit: 'm', min: 100, max: 5000, when: 'optional', doc: 'At MLW, sea level, ISA, as published (already factored).' },
];

export const AIRCRAFT_FORM_FIELDS: readonly AircraftFormField[] = [
  ...AIRCRAFT_FIELDS.map((f) => ({ ...f, name: f.key, section: sectionOf(f.group) })),
  ...CRUISE_FIELDS.map((f) => ({ ...f, name: `cruise.${f.key}`, section: 'route' as const })),
  ...REFERENCE_FIELDS,
];

/** Text and choice fields of the identity section. */
export const AIRCRAFT_TEXT_FIELDS = {
  id: 'Identifier',
  name: 'Name',
  group: 'Operations group',
  certification: 'Certification basis',
  engineType: 'Engine type',
  gear: 'Landing gear',
  thrustLapse: 'Thrust lapse model',
} as const;

/** Every field's label by name (error summaries). */
export const AIRCRAFT_LABELS: Readonly<Record<string, string>> = {
  ...AIRCRAFT_TEXT_FIELDS,
  ...Object.fromEntries(AIRCRAFT_FORM_FIELDS.map((f) => [f.name, f.label])),
};
