/**
 * The study file (docs/study-format.md): JSON, SI quantities with the unit as a key suffix.
 * Validated here at the edge; every problem is reported with its JSON path, value and allowed range.
 * The JSON Schema in docs/study.schema.json is exported from this schema (scripts/export-schema.ts).
 */
import { z } from 'zod';
import { SURFACES, type StudyInput } from '../../core/index.js';
import { aircraftSchema } from './aircraft.js';
import { ident, int, num, oneOf, text } from './common.js';

export const monthlyClimateSchema = z.strictObject({
  month: int(1, 12, ''),
  meanMax_c: num(-60, 60, '°C'),
  meanMin_c: num(-80, 50, '°C').optional(),
  mean_c: num(-70, 55, '°C').optional(),
});

export const climateSchema = z.strictObject({
  source: text(300),
  years: int(1, 200, 'years').optional(),
  monthly: z.array(monthlyClimateSchema).length(12, { error: 'exactly 12 monthly values, one per month' })
    .refine((ms) => new Set(ms.map((m) => m.month)).size === 12, { error: 'each month 1 to 12 exactly once' }),
});

export const profilePointSchema = z.strictObject({
  chainage_m: num(0, 6000, 'm'),
  elevation_m: num(-400, 4500, 'm'),
});

export const runwayDirectionSchema = z.strictObject({
  designator: z.string().regex(/^(0[1-9]|[12][0-9]|3[0-6])[LCR]?$/, { error: 'a runway designator 01 to 36, optionally L, C or R' }),
  tora_m: num(200, 6000, 'm'),
  toda_m: num(200, 6000, 'm'),
  asda_m: num(200, 6000, 'm'),
  lda_m: num(200, 6000, 'm'),
});

export const runwaySchema = z.strictObject({
  name: text(40),
  pavement: oneOf(['paved', 'grass']),
  profile: z.array(profilePointSchema).min(2, { error: 'at least 2 centreline points' }).max(500),
  directions: z.array(runwayDirectionSchema).min(1).max(2),
});

export const siteSchema = z.strictObject({
  name: text(120),
  elevation_m: num(-400, 4500, 'm'),
  designTemperature_c: num(-30, 55, '°C').optional(),
  climate: climateSchema.optional(),
  runways: z.array(runwaySchema).min(1, { error: 'at least one runway' }).max(8),
}).refine((s) => s.designTemperature_c !== undefined || s.climate !== undefined, {
  error: 'either designTemperature_c or climate is required',
  path: ['designTemperature_c'],
});

export const fleetRowSchema = z.strictObject({
  aircraft: ident,
  annualOperations: int(0, 1000000, 'operations/year'),
  stageLength_km: num(1, 20000, 'km'),
  payload_kg: num(0, 150000, 'kg'),
});

export const scenarioSchema = z.strictObject({
  name: text(120),
  fleet: z.array(fleetRowSchema).min(1, { error: 'at least one fleet row' }).max(200),
});

export const reservesSchema = z.strictObject({
  policy: oneOf(['cruise-45min', 'international', 'custom']),
  alternate_km: num(0, 2000, 'km').optional(),
  holding_min: num(0, 180, 'min').optional(),
  contingencyFraction: num(0, 0.2, '').optional(),
});

export const optionsSchema = z.strictObject({
  regularUseThreshold: int(1, 100000, 'operations/year').default(500),
  /** Default 50 m, or 100 ft (30.48 m) when the study is in US units (resolved in studyInputOf). */
  roundingIncrement_m: num(1, 500, 'm').optional(),
  surface: oneOf(SURFACES as unknown as readonly [string, ...string[]]).default('dry'),
  method: oneOf(['physics', 'reference-icao', 'reference-authority', 'calibrated']).default('physics'),
  units: oneOf(['si', 'us']).default('si'),
  reserves: reservesSchema.default({ policy: 'cruise-45min' }),
  passengerMass_kg: num(50, 200, 'kg').default(95),
  landingTemperature: oneOf(['isa', 'design']).default('isa'),
  landingMass: oneOf(['mlw', 'route']).default('mlw'),
});

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
  if (Array.isArray(doc.aircraft)) {
    doc.aircraft.forEach((a: unknown, i) => {
      const id = (a as { id?: unknown } | null)?.id;
      if (typeof id !== 'string') return;
      if (ids.has(id)) out.push({ path: ['aircraft', i, 'id'], value: id, message: `duplicate aircraft id "${id}" (also aircraft[${ids.get(id)}])` });
      else ids.set(id, i);
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
