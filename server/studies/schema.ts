/**
 * The study file (docs/study-format.md): JSON, SI quantities with the unit as a key suffix.
 * Validated here at the edge; every problem is reported with its JSON path, value and allowed range.
 * Ranges come from core/fields.ts and core's own checks (runway profile, declared distances, climate,
 * payload within the aircraft's maximum) run inside the schema, so a file the schema accepts is never
 * refused by the engine.
 * The JSON Schema in docs/study.schema.json is exported from this schema (scripts/export-schema.ts).
 */
import { z } from 'zod';
import {
  FLEET_FIELDS, inputField, STUDY_OPTION_FIELDS, type FleetRowInput, type OptionFieldSpec, type StudyInput, type StudyOptions,
} from '../../core/index.js';
import { aircraftSchema } from '../aircraft/index.js';
import { fieldMembers, ident, intIn, numIn, oneOf, text } from '../common/schema.js';
import { siteSchema } from '../sites/index.js';

export const fleetRowSchema = z.strictObject({
  aircraft: ident,
  ...fieldMembers(FLEET_FIELDS),
}) as unknown as z.ZodType<FleetRowInput>;

export const scenarioSchema = z.strictObject({
  name: text(120),
  fleet: z.array(fleetRowSchema).min(1, { error: 'at least one fleet row' }).max(200),
});

/** The zod type of one study option, from its row in STUDY_OPTION_FIELDS (core/studyFields.ts). */
function optionType(f: OptionFieldSpec): z.ZodType {
  let t: z.ZodType;
  if (f.kind === 'choice') t = oneOf(f.choices as unknown as readonly [string, ...string[]]);
  else if (f.kind === 'text') {
    const { min, max } = f.text!;
    t = text(max).refine((x) => x.length >= min, { error: `at least ${min} characters: say why the corrected length may govern` });
  } else t = f.integer ? intIn(f.range!) : numIn(f.range!);
  t = t.meta({ description: f.help });
  return f.default !== undefined ? t.default(f.default as never) : t.optional();
}

const topOptions = STUDY_OPTION_FIELDS.filter((f) => !f.path.includes('.'));
const reserveOptions = STUDY_OPTION_FIELDS.filter((f) => f.path.startsWith('reserves.'));

/** Reserves: the policy is required inside the object; the object itself defaults to the default policy. */
export const reservesSchema = z.strictObject(Object.fromEntries(reserveOptions.map((f) => {
  const key = f.path.slice('reserves.'.length);
  const t = optionType({ ...f, default: undefined });
  return [key, key === 'policy' ? (t as z.ZodOptional<z.ZodType>).unwrap() : t];
}))) as unknown as z.ZodType<StudyOptions['reserves']>;

const reserveDefault = { policy: reserveOptions.find((f) => f.path === 'reserves.policy')!.default as StudyOptions['reserves']['policy'] };

/**
 * The options, built from STUDY_OPTION_FIELDS: each option's range, choices, default and help come
 * from its row. Default planning increment 50 m, or 100 ft (30.48 m) in US units (resolved in studyInputOf).
 */
export const optionsSchema = z.strictObject({
  ...Object.fromEntries(topOptions.map((f) => [f.path, optionType(f)])),
  reserves: reservesSchema.default(reserveDefault),
}).superRefine((parsed, ctx) => {
  const o = parsed as Partial<StudyOptions>;
  if (o.referenceOverrideReason !== undefined && o.method !== 'reference-icao' && o.method !== 'reference-authority') {
    ctx.addIssue({ code: 'custom', path: ['referenceOverrideReason'], input: o.referenceOverrideReason,
      message: `only with a reference-length method (reference-icao or reference-authority); the method is ${String(o.method)}` });
  }
}) as unknown as z.ZodType<Omit<StudyOptions, 'roundingIncrement_m'> & { roundingIncrement_m?: number }, unknown>;

export const studyFileSchema = z.strictObject({
  format: z.literal('runwright-study', { error: 'must be "runwright-study"' }),
  version: z.literal(1, { error: 'must be 1 (the only version so far)' }),
  name: text(200),
  site: siteSchema,
  aircraft: z.array(aircraftSchema).min(1, { error: 'at least one aircraft' }).max(500),
  scenarios: z.array(scenarioSchema).min(1, { error: 'at least one scenario' }).max(50),
  options: optionsSchema.default(optionsSchema.parse({})),
}).superRefine((s, ctx) => {
  for (const p of studyCrossProblems(s)) ctx.addIssue({ code: 'custom', path: p.path, input: p.value, message: p.message });
});

/**
 * Cross-reference problems (duplicate aircraft ids, fleet rows naming unknown aircraft), read
 * defensively from a raw document so they are listed even when other fields fail validation.
 */
export function studyCrossProblems(raw: unknown): { path: (string | number)[]; value: unknown; message: string }[] {
  const out: { path: (string | number)[]; value: unknown; message: string }[] = [];
  const doc = raw as { aircraft?: unknown; scenarios?: unknown } | null;
  if (!doc || typeof doc !== 'object') return out;
  const ids = new Map<string, number>();
  const maxPayload = new Map<string, unknown>();
  if (Array.isArray(doc.aircraft)) {
    doc.aircraft.forEach((a: unknown, i) => {
      const id = (a as { id?: unknown } | null)?.id;
      if (typeof id !== 'string') return;
      if (ids.has(id)) out.push({ path: ['aircraft', i, 'id'], value: id, message: `duplicate aircraft id "${id}" (also aircraft[${ids.get(id)}])` });
      else {
        ids.set(id, i);
        maxPayload.set(id, (a as { maxPayload_kg?: unknown }).maxPayload_kg);
      }
    });
  }
  if (Array.isArray(doc.scenarios)) {
    doc.scenarios.forEach((sc: unknown, i) => {
      const fleet = (sc as { fleet?: unknown } | null)?.fleet;
      if (!Array.isArray(fleet)) return;
      fleet.forEach((row: unknown, j) => {
        const ref = (row as { aircraft?: unknown } | null)?.aircraft;
        if (typeof ref === 'string' && !ids.has(ref)) {
          out.push({ path: ['scenarios', i, 'fleet', j, 'aircraft'], value: ref, message: `unknown aircraft "${ref}"; one of ${[...ids.keys()].join(', ')}` });
        }
        // The engine's rule: a row's payload is at most its aircraft's maximum payload.
        const payload = (row as { payload_kg?: unknown } | null)?.payload_kg;
        const max = typeof ref === 'string' ? maxPayload.get(ref) : undefined;
        if (typeof payload === 'number' && typeof max === 'number' && payload > max && payload <= inputField(FLEET_FIELDS, 'payload_kg').range.max) {
          out.push({ path: ['scenarios', i, 'fleet', j, 'payload_kg'], value: payload, message: `${payload} is not allowed; expected at most the maximum payload of "${ref}" (${max} kg)` });
        }
      });
    });
  }
  return out;
}

export type StudyFile = z.output<typeof studyFileSchema>;

/** The core input of a validated study file (the file-level `format` and `version` dropped). */
export function studyInputOf(file: StudyFile): StudyInput {
  const { format: _f, version: _v, ...input } = file;
  const increment = input.options.roundingIncrement_m ?? (input.options.units === 'us' ? 30.48 : 50);
  return { ...input, options: { ...input.options, roundingIncrement_m: increment } } as unknown as StudyInput;
}
