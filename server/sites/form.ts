/**
 * Site forms → SI: the site's own fields with its twelve monthly climate values, and one runway with
 * its centreline profile (pasted as "chainage elevation" lines) and declared distances. Values are
 * converted from the user's units; the same zod pieces as the study file then check them, and core's
 * runway checks (profile order, declared-distance rules) add their findings as field errors.
 */
import { z } from 'zod';
import {
  CLIMATE_FIELDS, DIRECTION_FIELDS, DESIGN_TEMPERATURE_RANGE, MONTHLY_FIELDS, RUNWAY_CHAINAGE_RANGE, RUNWAY_POINT_ELEVATION_RANGE,
  SITE_ELEVATION_RANGE, SITE_FIELDS, inputField, InputDomainError, analyseRunwayProfile, checkRunwayDeclaredDistances,
  type MonthlyClimate, type ProfilePoint, type RunwayDirectionInput, type RunwayInput, type SiteClimate, type UnitSystem,
  unitOf,
} from '../../core/index.js';
import { climateSchema, runwaySchema } from './schema.js';
import { numIn, text } from '../common/schema.js';
import type { FormResult } from '../common/formFields.js';
import { localiseMessage, parseTyped, rangeText, readChoice, readSpecField, readText, type FieldErrors, type FormValues } from '../common/formFields.js';

export interface SiteFields {
  readonly name: string;
  readonly elevation_m: number;
  readonly designTemperature_c?: number;
  readonly climate?: SiteClimate;
}

export const MONTH_KEYS = Array.from({ length: 12 }, (_, i) => i + 1);
/** Form field of a monthly value: `which` is the `form` of its row of MONTHLY_FIELDS. */
export const monthField = (m: number, which: 'max' | 'min' | 'mean'): string => `m${m}_${which}`;

const SITE = { elevation: inputField(SITE_FIELDS, 'elevation_m'), designTemperature: inputField(SITE_FIELDS, 'designTemperature_c') };
const YEARS = inputField(CLIMATE_FIELDS, 'years');
const MONTH = { max: inputField(MONTHLY_FIELDS, 'meanMax_c'), min: inputField(MONTHLY_FIELDS, 'meanMin_c'), mean: inputField(MONTHLY_FIELDS, 'mean_c') };

/** The site's own fields (the relaxed form: a site may be saved before its runways and climate). */
export const siteFieldsSchema = z.strictObject({
  name: text(120),
  elevation_m: numIn(SITE_ELEVATION_RANGE),
  designTemperature_c: numIn(DESIGN_TEMPERATURE_RANGE).optional(),
  climate: climateSchema.optional(),
});

const within = (r: { readonly min: number; readonly max: number }) => ({ min: r.min, max: r.max });

export function readSiteForm(values: FormValues, system: UnitSystem): FormResult<SiteFields> {
  const errors: FieldErrors = {};
  const name = readText(values, 'name', { required: true, max: 120 }, errors);
  const elevation_m = readSpecField(values, SITE.elevation, system, errors);
  const designTemperature_c = readSpecField(values, SITE.designTemperature, system, errors);
  const anyClimate = MONTH_KEYS.some((m) => (['max', 'min', 'mean'] as const).some((w) => (values[monthField(m, w)] ?? '').trim() !== ''))
    || (values.climateSource ?? '').trim() !== '';
  let climate: SiteClimate | undefined;
  if (anyClimate) {
    const source = readText(values, 'climateSource', { required: true, max: 300 }, errors);
    const years = readSpecField(values, YEARS, system, errors);
    const monthly: MonthlyClimate[] = [];
    for (const m of MONTH_KEYS) {
      const [max, min, mean] = (['max', 'min', 'mean'] as const).map((w) => readSpecField(values, MONTH[w], system, errors, { name: monthField(m, w) }));
      if (max !== undefined && min !== undefined && min > max) errors[monthField(m, 'min')] = 'the mean daily minimum is above the mean daily maximum';
      if (max !== undefined && min === undefined && mean === undefined && errors[monthField(m, 'min')] === undefined && errors[monthField(m, 'mean')] === undefined) {
        errors[monthField(m, 'min')] = 'missing; give the mean daily minimum or the mean: months are ranked by their mean temperature';
      }
      if (max !== undefined) monthly.push({ month: m, meanMax_c: max, ...(min === undefined ? {} : { meanMin_c: min }), ...(mean === undefined ? {} : { mean_c: mean }) });
    }
    if (source !== undefined) climate = { source, ...(years === undefined ? {} : { years }), monthly };
  }
  if (Object.keys(errors).length > 0 || name === undefined || elevation_m === undefined) return { ok: false, errors };
  const obj = { name, elevation_m, ...(designTemperature_c === undefined ? {} : { designTemperature_c }), ...(climate ? { climate } : {}) };
  const r = siteFieldsSchema.safeParse(obj, { reportInput: true });
  if (!r.success) {
    for (const i of r.error.issues) {
      const [head, a, b, c] = i.path;
      const field = head === 'climate' && a === 'monthly' && typeof b === 'number' ? monthField(b + 1, c === 'meanMin_c' ? 'min' : c === 'mean_c' ? 'mean' : 'max')
        : SITE_FIELDS.find((x) => x.key === head)?.form ?? (head === 'climate' ? (a === 'years' ? YEARS.form : 'climateSource') : String(head ?? 'name'));
      errors[field] ??= localiseMessage(i.message, system);
    }
    return { ok: false, errors };
  }
  return { ok: true, value: r.data as SiteFields };
}

/** Reads "chainage elevation" lines (comma, semicolon, tab or spaces between) in the user's units. */
export function readProfileText(raw: string, system: UnitSystem, errors: FieldErrors): ProfilePoint[] {
  const len = unitOf('length', system);
  const alt = unitOf('altitude', system);
  const points: ProfilePoint[] = [];
  const problems: string[] = [];
  raw.split(/\r?\n/).forEach((line, i) => {
    const t = line.trim();
    if (t === '' || t.startsWith('#')) return;
    const parts = t.split(/[\s,;]+/).filter(Boolean);
    if (parts.length !== 2) { problems.push(`line ${i + 1}: expected two numbers, chainage and elevation ("${t}")`); return; }
    const c = parseTyped(parts[0]!);
    const e = parseTyped(parts[1]!);
    if (c === undefined) { problems.push(`line ${i + 1}: chainage "${parts[0]}" is not a number`); return; }
    if (e === undefined) { problems.push(`line ${i + 1}: elevation "${parts[1]}" is not a number`); return; }
    const cm = len.to(c);
    const em = alt.to(e);
    if (!Number.isFinite(cm) || cm < RUNWAY_CHAINAGE_RANGE.min || cm > RUNWAY_CHAINAGE_RANGE.max) { problems.push(`line ${i + 1}: chainage ${parts[0]} is out of range; ${rangeText({ kind: 'length', ...within(RUNWAY_CHAINAGE_RANGE) }, system)}`); return; }
    if (!Number.isFinite(em) || em < RUNWAY_POINT_ELEVATION_RANGE.min || em > RUNWAY_POINT_ELEVATION_RANGE.max) { problems.push(`line ${i + 1}: elevation ${parts[1]} is out of range; ${rangeText({ kind: 'altitude', ...within(RUNWAY_POINT_ELEVATION_RANGE) }, system)}`); return; }
    points.push({ chainage_m: cm, elevation_m: em });
  });
  if (problems.length > 0) errors.profile = problems.slice(0, 10).join('; ');
  else if (points.length < 2) errors.profile = 'at least two points: the two runway ends';
  else if (points.length > 500) errors.profile = `at most 500 points (${points.length} given)`;
  return points;
}

/** Form field of direction i: 'designator' or the `form` of a row of DIRECTION_FIELDS. */
export const directionField = (i: number, f: string): string => `d${i}_${f}`;

export function readRunwayForm(values: FormValues, system: UnitSystem): FormResult<RunwayInput> {
  const errors: FieldErrors = {};
  const name = readText(values, 'name', { required: true, max: 40 }, errors);
  const pavement = readChoice(values, 'pavement', ['paved', 'grass'] as const, errors, 'paved');
  const profile = readProfileText(values.profile ?? '', system, errors);
  const directions: RunwayDirectionInput[] = [];
  for (const i of [0, 1]) {
    const designator = (values[directionField(i, 'designator')] ?? '').trim().toUpperCase();
    const given = designator !== '' || DIRECTION_FIELDS.some((f) => (values[directionField(i, f.form)] ?? '').trim() !== '');
    if (!given && i === 1) continue;
    if (designator === '') errors[directionField(i, 'designator')] = 'missing; a runway designator 01 to 36, optionally L, C or R';
    const d: Record<string, number> = {};
    for (const f of DIRECTION_FIELDS) {
      const v = readSpecField(values, f, system, errors, { name: directionField(i, f.form) });
      if (v !== undefined) d[f.key] = v;
    }
    if (designator !== '' && Object.keys(d).length === 4) directions.push({ designator, ...(d as { tora_m: number; toda_m: number; asda_m: number; lda_m: number }) });
  }
  if (Object.keys(errors).length > 0 || name === undefined || pavement === undefined) return { ok: false, errors };
  const runway: RunwayInput = { name, pavement, profile, directions };
  const r = runwaySchema.safeParse(runway, { reportInput: true });
  if (!r.success) {
    for (const i of r.error.issues) {
      const [head, idx, f] = i.path;
      const spec = DIRECTION_FIELDS.find((x) => x.key === f);
      const field = head === 'directions' && typeof idx === 'number' ? directionField(idx, spec?.form ?? 'designator') : String(head ?? 'name');
      errors[field] ??= localiseMessage(i.message, system);
    }
    return { ok: false, errors };
  }
  // Core's checks: profile order and plausibility; declared-distance rules (TODA ≥ TORA, LDA ≤ ASDA, ...).
  try {
    analyseRunwayProfile({ points: profile });
  } catch (e) {
    if (!(e instanceof InputDomainError)) throw e;
    errors.profile = localiseMessage(`${e.message}`, system);
  }
  try {
    checkRunwayDeclaredDistances({ directions });
  } catch (e) {
    if (!(e instanceof InputDomainError)) throw e;
    const m = /^directions\[(\d)\]\.(\w+?)(_m)?$/.exec(e.field);
    const field = m ? directionField(Number(m[1]), m[2]!) : directionField(0, 'designator');
    const typed = (values[field] ?? '').trim() || String(e.value);
    errors[field] = localiseMessage(`${typed} is not allowed; expected ${e.allowed}`, system);
  }
  if (Object.keys(errors).length > 0) return { ok: false, errors };
  return { ok: true, value: r.data as RunwayInput };
}
