/**
 * Study forms → SI: the study (name, site, options) and a scenario (name and fleet rows). Numbers are
 * converted from the user's units; the options are then checked by the study file's zod schema.
 */
import {
  DEFAULT_OPERATING_RULES, FLEET_FIELDS, OPERATING_RULE_SETS, RESERVE_POLICIES, STUDY_METHODS, SURFACES, fieldInputText, inputField, optionFieldByForm,
  displayInputValue as fmtInput, type FleetRowInput, type StudyOptions, type UnitSystem,
} from '../../core/index.js';
import { optionsSchema } from './schema.js';
import { ident } from '../common/schema.js';
import type { FormResult } from '../common/formFields.js';
import {
  localiseMessage, readChoice, readNumber, readSpecField, readText, type FieldErrors, type FormValues,
} from '../common/formFields.js';

export interface StudyFields {
  readonly name: string;
  readonly siteId: number;
  readonly options: StudyOptions;
}

const METHODS = STUDY_METHODS;
const POLICIES = RESERVE_POLICIES;

/** An option's range from its row in STUDY_OPTION_FIELDS, scaled to the form's unit (km → m, fraction → %). */
function limits(form: string, scale = 1): { min: number; max: number } {
  const r = optionFieldByForm(form).range!;
  return { min: r.min * scale, max: r.max * scale };
}

export function readStudyForm(values: FormValues, system: UnitSystem, siteIds: readonly number[]): FormResult<StudyFields> {
  const errors: FieldErrors = {};
  const name = readText(values, 'name', { required: true, max: 200 }, errors);
  const siteRaw = (values.siteId ?? '').trim();
  const siteId = /^\d+$/.test(siteRaw) && siteIds.includes(Number(siteRaw)) ? Number(siteRaw) : undefined;
  if (siteId === undefined) errors.siteId = siteIds.length === 0 ? 'create a site first' : 'choose one of the sites';
  const units = readChoice(values, 'units', ['si', 'us'] as const, errors, system);
  const regularUseThreshold = readNumber(values, { name: 'regularUseThreshold', kind: 'count', ...limits('regularUseThreshold'), required: true, integer: true }, system, errors);
  const roundingIncrement_m = readNumber(values, { name: 'roundingIncrement', kind: 'length', ...limits('roundingIncrement'), required: true }, system, errors);
  const surface = readChoice(values, 'surface', SURFACES, errors, 'dry');
  const method = readChoice(values, 'method', METHODS, errors, 'planning');
  const policy = readChoice(values, 'reservePolicy', POLICIES, errors, 'cruise-45min');
  const alternate_m = readNumber(values, { name: 'alternate', kind: 'distance', ...limits('alternate', 1000), required: policy === 'custom' }, system, errors);
  const holding_min = readNumber(values, { name: 'holding', kind: 'count', ...limits('holding'), required: policy === 'custom' }, system, errors);
  const contingencyPct = readNumber(values, { name: 'contingency', kind: 'count', ...limits('contingency', 100), required: false }, system, errors);
  const passengerMass_kg = readNumber(values, { name: 'passengerMass', kind: 'mass', ...limits('passengerMass'), required: true }, system, errors);
  const landingTemperature = readChoice(values, 'landingTemperature', ['isa', 'design'] as const, errors, 'isa');
  const landingMass = readChoice(values, 'landingMass', ['mlw', 'route'] as const, errors, 'mlw');
  const operatingRules = readChoice(values, 'operatingRules', OPERATING_RULE_SETS, errors, DEFAULT_OPERATING_RULES);
  const referenceOverrideReason = readText(values, 'referenceOverrideReason', { required: false, max: 500 }, errors);
  if (Object.keys(errors).length > 0 || name === undefined || siteId === undefined) return { ok: false, errors };
  const options = {
    regularUseThreshold,
    roundingIncrement_m,
    surface,
    method,
    units,
    reserves: {
      policy,
      ...(alternate_m === undefined ? {} : { alternate_km: alternate_m / 1000 }),
      ...(holding_min === undefined ? {} : { holding_min }),
      ...(contingencyPct === undefined ? {} : { contingencyFraction: contingencyPct / 100 }),
    },
    passengerMass_kg,
    landingTemperature,
    landingMass,
    operatingRules,
    ...(referenceOverrideReason === undefined ? {} : { referenceOverrideReason }),
  };
  const r = optionsSchema.safeParse(options, { reportInput: true });
  if (!r.success) {
    for (const i of r.error.issues) errors[String(i.path[i.path.length - 1] ?? 'name')] ??= localiseMessage(i.message, system);
    return { ok: false, errors };
  }
  return { ok: true, value: { name, siteId, options: { ...r.data, roundingIncrement_m: r.data.roundingIncrement_m ?? roundingIncrement_m! } as StudyOptions } };
}

/** Display strings of a study's fields. */
export function studyFormValues(s: { name: string; siteId: number; options: StudyOptions }, system: UnitSystem): Record<string, string> {
  const o = s.options;
  return {
    name: s.name,
    siteId: String(s.siteId),
    units: o.units,
    regularUseThreshold: String(o.regularUseThreshold),
    roundingIncrement: fmtInput(o.roundingIncrement_m, 'length', system),
    surface: o.surface,
    method: o.method,
    reservePolicy: o.reserves.policy,
    alternate: o.reserves.alternate_km === undefined ? '' : fmtInput(o.reserves.alternate_km * 1000, 'distance', system),
    holding: o.reserves.holding_min === undefined ? '' : String(o.reserves.holding_min),
    contingency: o.reserves.contingencyFraction === undefined ? '' : String(Number((o.reserves.contingencyFraction * 100).toPrecision(9))),
    passengerMass: fmtInput(o.passengerMass_kg, 'mass', system),
    landingTemperature: o.landingTemperature,
    landingMass: o.landingMass,
    operatingRules: o.operatingRules ?? DEFAULT_OPERATING_RULES,
    referenceOverrideReason: o.referenceOverrideReason ?? '',
  };
}

/** Defaults of a new study in the user's units (50 m or 100 ft planning increment). */
export function newStudyValues(system: UnitSystem, siteId?: number): Record<string, string> {
  return {
    units: system,
    ...(siteId === undefined ? {} : { siteId: String(siteId) }),
    regularUseThreshold: '500',
    roundingIncrement: system === 'us' ? '100' : '50',
    surface: 'dry',
    method: 'planning',
    reservePolicy: 'cruise-45min',
    passengerMass: fmtInput(95, 'mass', system),
    landingTemperature: 'isa',
    landingMass: 'mlw',
    operatingRules: DEFAULT_OPERATING_RULES,
  };
}

/** Form field of fleet row i: 'aircraft' or the `form` of a row of FLEET_FIELDS. */
export const rowField = (i: number, f: string): string => `r${i}_${f}`;

const FLEET = {
  ops: inputField(FLEET_FIELDS, 'annualOperations'), stage: inputField(FLEET_FIELDS, 'stageLength_km'), payload: inputField(FLEET_FIELDS, 'payload_kg'),
};

/**
 * Reads a scenario form: its name and up to `rows` fleet rows; a row left entirely blank is skipped.
 * Aircraft must be in `aircraftIds`; payload at most that aircraft's maximum payload.
 */
export function readScenarioForm(
  values: FormValues, system: UnitSystem, rows: number, catalogue: ReadonlyMap<string, { maxPayload_kg: number }>,
): FormResult<{ name: string; fleet: FleetRowInput[] }> {
  const errors: FieldErrors = {};
  const name = readText(values, 'name', { required: true, max: 120 }, errors);
  const fleet: FleetRowInput[] = [];
  for (let i = 0; i < rows; i++) {
    const fields = ['aircraft', ...FLEET_FIELDS.map((f) => f.form)].map((f) => (values[rowField(i, f)] ?? '').trim());
    if (fields.every((v) => v === '')) continue;
    const aircraft = fields[0]!;
    if (aircraft === '') errors[rowField(i, 'aircraft')] = 'choose an aircraft';
    else if (!ident.safeParse(aircraft).success || !catalogue.has(aircraft)) errors[rowField(i, 'aircraft')] = `"${aircraft}" is not in the catalogue`;
    const ops = readSpecField(values, FLEET.ops, system, errors, { name: rowField(i, FLEET.ops.form) });
    const stage_km = readSpecField(values, FLEET.stage, system, errors, { name: rowField(i, FLEET.stage.form) });
    const maxPayload = catalogue.get(aircraft)?.maxPayload_kg;
    const payload = readSpecField(values, FLEET.payload, system, errors, { name: rowField(i, FLEET.payload.form), ...(maxPayload === undefined ? {} : { max: maxPayload }) });
    if (ops !== undefined && stage_km !== undefined && payload !== undefined && errors[rowField(i, 'aircraft')] === undefined) {
      fleet.push({ aircraft, annualOperations: ops, stageLength_km: stage_km, payload_kg: payload });
    }
  }
  if (fleet.length > 200) errors.name = 'at most 200 fleet rows per scenario';
  if (Object.keys(errors).length > 0 || name === undefined) return { ok: false, errors };
  return { ok: true, value: { name, fleet } };
}

/** Display strings of a scenario's fields. */
export function scenarioFormValues(s: { name: string; fleet: readonly FleetRowInput[] }, system: UnitSystem): Record<string, string> {
  const out: Record<string, string> = { name: s.name };
  s.fleet.forEach((r, i) => {
    out[rowField(i, 'aircraft')] = r.aircraft;
    for (const f of FLEET_FIELDS) out[rowField(i, f.form)] = fieldInputText(f, r[f.key as keyof FleetRowInput] as number, system);
  });
  return out;
}
