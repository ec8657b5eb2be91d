/**
 * zod schema of an aircraft profile, built from the field table in core/aircraft.ts so that ranges and
 * units live in one place. Conditional fields (turbofan, propeller, multi-engine, tailwheel) are checked
 * after the shape; cross-field rules come from core's validateAircraft.
 */
import { z } from 'zod';
import {
  AIRCRAFT_FIELDS, CERTIFICATION_BASES, CRUISE_FIELDS, ENGINE_TYPES, GEAR_LAYOUTS, THRUST_LAPSE_MODELS,
  InputDomainError, REFERENCE_LENGTH_RANGE, REFERENCE_TABLE_ELEVATION_RANGE, REFERENCE_TABLE_LENGTH_RANGE,
  REFERENCE_TABLE_MASS_RANGE, REFERENCE_TABLE_TEMPERATURE_RANGE, domainProblemText, validateAircraft,
  type AircraftProfile, type FieldSpec,
} from '../../core/index.js';
import { fieldPath, ident, num, numIn, oneOf, text } from '../common/schema.js';

function shapeOf(fields: readonly FieldSpec[]): Record<string, z.ZodType> {
  const shape: Record<string, z.ZodType> = {};
  for (const f of fields) {
    const n = f.key === 'engineCount' ? num(f.min, f.max, f.unit).refine(Number.isInteger, { error: 'a whole number' }) : num(f.min, f.max, f.unit);
    shape[f.key] = f.when === 'always' ? n : n.optional();
  }
  return shape;
}

const axis = (range: Parameters<typeof numIn>[0]) => z.array(numIn(range)).min(1).max(20);

export const referenceTableSchema = z.strictObject({
  mass_kg: axis(REFERENCE_TABLE_MASS_RANGE),
  elevation_m: axis(REFERENCE_TABLE_ELEVATION_RANGE),
  temperature_c: axis(REFERENCE_TABLE_TEMPERATURE_RANGE),
  length_m: z.array(z.array(z.array(numIn(REFERENCE_TABLE_LENGTH_RANGE)))),
});

export const referenceSchema = z.strictObject({
  takeoff_m: numIn(REFERENCE_LENGTH_RANGE).optional(),
  landing_m: numIn(REFERENCE_LENGTH_RANGE).optional(),
  table: referenceTableSchema.optional(),
});

export const cruiseSchema = z.strictObject(shapeOf(CRUISE_FIELDS));

const baseShape = {
  id: ident,
  name: text(120),
  group: text(64).optional(),
  certification: oneOf(CERTIFICATION_BASES as unknown as readonly [string, ...string[]]),
  engineType: oneOf(ENGINE_TYPES as unknown as readonly [string, ...string[]]),
  gear: oneOf(GEAR_LAYOUTS as unknown as readonly [string, ...string[]]),
  thrustLapse: oneOf(THRUST_LAPSE_MODELS as unknown as readonly [string, ...string[]]).optional(),
  ...shapeOf(AIRCRAFT_FIELDS),
  cruise: cruiseSchema.optional(),
  reference: referenceSchema.optional(),
};

function conditionalRequired(spec: FieldSpec, a: Record<string, unknown>): boolean {
  switch (spec.when) {
    case 'turbofan': return a.engineType === 'turbofan';
    case 'propeller': return a.engineType === 'turboprop' || a.engineType === 'piston';
    case 'multiEngine': return typeof a.engineCount === 'number' && a.engineCount > 1;
    case 'tailwheel': return a.gear === 'tailwheel';
    default: return false;
  }
}

/** The aircraft profile as it appears in study files, workspace files and the JSON API. */
export const aircraftSchema = z.strictObject(baseShape).superRefine((a, ctx) => {
  const rec = a as Record<string, unknown>;
  let missing = false;
  for (const spec of AIRCRAFT_FIELDS) {
    if (rec[spec.key] === undefined && conditionalRequired(spec, rec)) {
      missing = true;
      ctx.addIssue({ code: 'custom', path: [spec.key], input: undefined, message: `missing; required for this aircraft (${spec.when}); allowed ${spec.min} to ${spec.max}${spec.unit ? ' ' + spec.unit : ''}` });
    }
  }
  const cruise = rec.cruise as Record<string, unknown> | undefined;
  if (cruise) {
    for (const spec of CRUISE_FIELDS) {
      if (cruise[spec.key] === undefined && conditionalRequired(spec, rec)) {
        missing = true;
        ctx.addIssue({ code: 'custom', path: ['cruise', spec.key], input: undefined, message: `missing; required for this engine type; allowed ${spec.min} to ${spec.max}${spec.unit ? ' ' + spec.unit : ''}` });
      }
    }
  }
  if (missing) return;
  // Range problems are already reported field by field; the cross-field rules only make sense after them.
  const outOfRange = AIRCRAFT_FIELDS.some((f) => {
    const v = rec[f.key];
    return v !== undefined && (typeof v !== 'number' || !(v >= f.min && v <= f.max));
  });
  if (outOfRange) return;
  try {
    validateAircraft(a as unknown as AircraftProfile, '');
  } catch (e) {
    if (!(e instanceof InputDomainError)) throw e;
    ctx.addIssue({ code: 'custom', path: fieldPath(e.field), input: e.value, message: domainProblemText(e.value, e.allowed, e.range) });
  }
}) as unknown as z.ZodType<AircraftProfile>;
