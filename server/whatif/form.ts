/** What-if panel form: conditions typed in the user's units → SI what-if conditions. */
import { SURFACES, TAKEOFF_INPUT_RANGES, unitOf, type AircraftProfile, type DisplayKind, type UnitSystem, type WhatIfConditions } from '../../core/index.js';
import { readChoice, readNumber, type FieldErrors, type FormValues } from '../common/formFields.js';
import type { FormResult } from '../common/formFields.js';

export type { WhatIfConditions } from '../../core/index.js';

const R = TAKEOFF_INPUT_RANGES;

/** Reads the panel's fields; mass must lie between the aircraft's OEW and MTOW. */
export function readWhatIfForm(values: FormValues, system: UnitSystem, aircraft: AircraftProfile): FormResult<WhatIfConditions> {
  const errors: FieldErrors = {};
  const temperature_c = readNumber(values, { name: 'temperature', kind: 'temperature', min: R.temperature_c.min, max: R.temperature_c.max, required: true }, system, errors);
  const elevation_m = readNumber(values, { name: 'elevation', kind: 'altitude', min: R.pressureAltitude_m.min, max: R.pressureAltitude_m.max, required: true }, system, errors);
  const mass_kg = readNumber(values, { name: 'mass', kind: 'mass', min: aircraft.oew_kg, max: aircraft.mtow_kg, required: true }, system, errors);
  const slope = readNumber(values, { name: 'slope', kind: 'slopePct', min: R.slope.min, max: R.slope.max, required: true }, system, errors);
  const headwind_mps = readNumber(values, { name: 'wind', kind: 'speed', min: R.headwind_mps.min, max: R.headwind_mps.max, required: true }, system, errors);
  const surface = readChoice(values, 'surface', SURFACES, errors, 'dry');
  if (Object.keys(errors).length > 0 || temperature_c === undefined || elevation_m === undefined || mass_kg === undefined || slope === undefined || headwind_mps === undefined || surface === undefined) {
    return { ok: false, errors };
  }
  return { ok: true, value: { temperature_c, elevation_m, mass_kg, slope, headwind_mps, surface } };
}

/** A value in the display unit rounded to `digits` decimals, without thousands separators. */
function rounded(si: number, kind: DisplayKind, system: UnitSystem, digits: number): string {
  const v = Number(unitOf(kind, system).from(si).toFixed(digits));
  return String(Object.is(v, -0) ? 0 : v);
}

/**
 * The panel's fields filled with conditions (display strings in the user's units), rounded as a
 * planner would type them: temperature 0.1, elevation and mass 1, slope 0.01 %, wind 1 kt.
 */
export function whatIfValues(c: WhatIfConditions, system: UnitSystem, aircraftId?: string): Record<string, string> {
  return {
    ...(aircraftId === undefined ? {} : { aircraft: aircraftId }),
    temperature: rounded(c.temperature_c, 'temperature', system, 1),
    elevation: rounded(c.elevation_m, 'altitude', system, 0),
    mass: rounded(c.mass_kg, 'mass', system, 0),
    slope: rounded(c.slope, 'slopePct', system, 2),
    wind: rounded(c.headwind_mps, 'speed', system, 0),
    surface: c.surface,
  };
}

/**
 * The conditions the panel starts from: `c` as its rounded fields read back, so that the reference
 * figure and the first figure shown are computed from exactly what the fields say.
 */
export function startingConditions(c: WhatIfConditions, system: UnitSystem, aircraft: AircraftProfile): { values: Record<string, string>; conditions: WhatIfConditions } {
  const values = whatIfValues(c, system);
  const read = readWhatIfForm(values, system, aircraft);
  return { values, conditions: read.ok ? read.value : c };
}

/** Whether the request carries what-if fields (a submitted panel). */
export function hasWhatIfFields(values: FormValues): boolean {
  return ['temperature', 'elevation', 'mass', 'slope', 'wind'].some((k) => values[k] !== undefined);
}
