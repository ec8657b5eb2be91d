/**
 * Aircraft form → profile (SI). Numbers are converted from the user's units and range-checked here
 * (messages in those units); the assembled profile is then checked by the same zod schema as study
 * files and the API (cross-field rules from core's validateAircraft), whose messages are restated in
 * the user's units. The reference table, which the form does not carry, is kept from the stored profile.
 */
import {
  CERTIFICATION_BASES, ENGINE_TYPES, GEAR_LAYOUTS, THRUST_LAPSE_MODELS,
  type AircraftProfile, type EngineType, type UnitSystem,
} from '../../core/index.js';
import { AIRCRAFT_FORM_FIELDS, type AircraftFormField } from '../../templates/aircraft/index.js';
import { aircraftSchema } from './schema.js';
import { ident } from '../common/schema.js';
import { localiseMessage, readChoice, readNumber, readText, type FieldErrors, type FormResult, type FormValues } from '../common/formFields.js';


function requiredFor(f: AircraftFormField, ctx: { engineType?: EngineType; gear?: string; engineCount?: number; hasCruise: boolean }): boolean {
  if (f.section === 'route') {
    if (!ctx.hasCruise || f.when === 'optional') return false;
    if (f.when === 'turbofan') return ctx.engineType === 'turbofan';
    if (f.when === 'propeller') return ctx.engineType !== undefined && ctx.engineType !== 'turbofan';
    return true;
  }
  switch (f.when) {
    case 'always': return true;
    case 'turbofan': return ctx.engineType === 'turbofan';
    case 'propeller': return ctx.engineType !== undefined && ctx.engineType !== 'turbofan';
    case 'multiEngine': return (ctx.engineCount ?? 1) > 1;
    case 'tailwheel': return ctx.gear === 'tailwheel';
    case 'optional': return false;
  }
}

function setPath(obj: Record<string, unknown>, name: string, v: unknown): void {
  const keys = name.split('.');
  let t = obj;
  for (const k of keys.slice(0, -1)) t = (t[k] ??= {}) as Record<string, unknown>;
  t[keys[keys.length - 1]!] = v;
}

/** Reads the aircraft form. `stored` (when editing) supplies the reference table the form does not show. */
export function readAircraftForm(values: FormValues, system: UnitSystem, stored?: AircraftProfile): FormResult<AircraftProfile> {
  const errors: FieldErrors = {};
  const obj: Record<string, unknown> = {};
  const idRaw = (values.id ?? '').trim();
  const idCheck = ident.safeParse(idRaw);
  if (idRaw === '') errors.id = 'missing; an identifier is required';
  else if (!idCheck.success) errors.id = idCheck.error.issues[0]?.message ?? 'not a valid identifier';
  else obj.id = idRaw;
  const name = readText(values, 'name', { required: true, max: 120 }, errors);
  if (name !== undefined) obj.name = name;
  const group = readText(values, 'group', { required: false, max: 64 }, errors);
  if (group !== undefined) obj.group = group;
  const certification = readChoice(values, 'certification', CERTIFICATION_BASES, errors);
  const engineType = readChoice(values, 'engineType', ENGINE_TYPES, errors);
  const gear = readChoice(values, 'gear', GEAR_LAYOUTS, errors);
  if (certification) obj.certification = certification;
  if (engineType) obj.engineType = engineType;
  if (gear) obj.gear = gear;
  if ((values.thrustLapse ?? '').trim() !== '') {
    const lapse = readChoice(values, 'thrustLapse', THRUST_LAPSE_MODELS, errors);
    if (lapse) obj.thrustLapse = lapse;
  }
  const countField = AIRCRAFT_FORM_FIELDS.find((f) => f.name === 'engineCount')!;
  const engineCount = readNumber(values, { name: 'engineCount', kind: 'count', min: countField.min, max: countField.max, required: true, integer: true }, system, errors);
  const hasCruise = AIRCRAFT_FORM_FIELDS.some((f) => f.section === 'route' && (values[f.name] ?? '').trim() !== '');
  const ctx = { ...(engineType ? { engineType } : {}), ...(gear ? { gear } : {}), ...(engineCount === undefined ? {} : { engineCount }), hasCruise };
  for (const f of AIRCRAFT_FORM_FIELDS) {
    const v = f.name === 'engineCount'
      ? engineCount
      : readNumber(values, { name: f.name, kind: f.kind, min: f.min, max: f.max, required: requiredFor(f, ctx), integer: false }, system, errors);
    if (v !== undefined) setPath(obj, f.name, v);
  }
  const table = stored?.reference?.table;
  if (table !== undefined) setPath(obj, 'reference.table', table);
  if (Object.keys(errors).length > 0) return { ok: false, errors };

  const parsed = aircraftSchema.safeParse(obj, { reportInput: true });
  if (parsed.success) return { ok: true, value: parsed.data };
  for (const issue of parsed.error.issues) {
    const field = issue.path.map(String).join('.') || 'id';
    if (errors[field] !== undefined) continue;
    let msg = issue.message;
    const typed = (values[field] ?? '').trim();
    const si = (issue as { input?: unknown }).input;
    // Messages start with the SI value checked; show what the user typed instead.
    if (typeof si === 'number' && typed !== '' && msg.startsWith(`${String(si)} `)) msg = `${typed}${msg.slice(String(si).length)}`;
    errors[field] = localiseMessage(msg, system);
  }
  return { ok: false, errors };
}
