/**
 * Site forms → SI: the site's own fields with its twelve monthly climate values, and one runway with
 * its centreline profile (pasted as "chainage elevation" lines) and declared distances. Values are
 * converted from the user's units; the same zod pieces as the study file then check them, and core's
 * runway checks (profile order, declared-distance rules) add their findings as field errors.
 */
import { z } from 'zod';
import {
  CLIMATE_YEARS_RANGE, DECLARED_LENGTH_RANGE, DESIGN_TEMPERATURE_RANGE, MONTHLY_MEAN_MAX_RANGE, MONTHLY_MEAN_MIN_RANGE,
  MONTHLY_MEAN_RANGE, RUNWAY_CHAINAGE_RANGE, RUNWAY_POINT_ELEVATION_RANGE, SITE_ELEVATION_RANGE,
  InputDomainError, analyseRunwayProfile, checkRunwayDeclaredDistances,
  type MonthlyClimate, type ProfilePoint, type RunwayDirectionInput, type RunwayInput, type SiteClimate, type UnitSystem,
  unitOf,
} from '../../core/index.js';
import { climateSchema, runwaySchema } from './schema.js';
import { numIn, text } from '../common/schema.js';
import type { FormResult } from '../common/formFields.js';
import { localiseMessage, parseTyped, rangeText, readChoice, readNumber, readText, type FieldErrors, type FormValues } from '../common/formFields.js';

export interface SiteFields {
  readonly name: string;
  readonly elevation_m: number;
  readonly designTemperature_c?: number;
  readonly climate?: SiteClimate;
}

export const MONTH_KEYS = Array.from({ length: 12 }, (_, i) => i + 1);
export const monthField = (m: number, which: 'max' | 'min' | 'mean'): string => `m${m}_${which}`;

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
  const elevation_m = readNumber(values, { name: 'elevation', kind: 'altitude', ...within(SITE_ELEVATION_RANGE), required: true }, system, errors);
  const designTemperature_c = readNumber(values, { name: 'designTemperature', kind: 'temperature', ...within(DESIGN_TEMPERATURE_RANGE), required: false }, system, errors);
  const anyClimate = MONTH_KEYS.some((m) => (['max', 'min', 'mean'] as const).some((w) => (values[monthField(m, w)] ?? '').trim() !== ''))
    || (values.climateSource ?? '').trim() !== '';
  let climate: SiteClimate | undefined;
  if (anyClimate) {
    const source = readText(values, 'climateSource', { required: true, max: 300 }, errors);
    const years = readNumber(values, { name: 'climateYears', kind: 'count', ...within(CLIMATE_YEARS_RANGE), required: false, integer: true }, system, errors);
    const monthly: MonthlyClimate[] = [];
    for (const m of MONTH_KEYS) {
      const max = readNumber(values, { name: monthField(m, 'max'), kind: 'temperature', ...within(MONTHLY_MEAN_MAX_RANGE), required: true }, system, errors);
      const min = readNumber(values, { name: monthField(m, 'min'), kind: 'temperature', ...within(MONTHLY_MEAN_MIN_RANGE), required: false }, system, errors);
      const mean = readNumber(values, { name: monthField(m, 'mean'), kind: 'temperature', ...within(MONTHLY_MEAN_RANGE), required: false }, system, errors);
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
        : head === 'elevation_m' ? 'elevation' : head === 'designTemperature_c' ? 'designTemperature' : head === 'climate' ? 'climateSource' : String(head ?? 'name');
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

const DIRECTION_FIELDS = ['tora', 'toda', 'asda', 'lda'] as const;
export const directionField = (i: number, f: 'designator' | (typeof DIRECTION_FIELDS)[number]): string => `d${i}_${f}`;

export function readRunwayForm(values: FormValues, system: UnitSystem): FormResult<RunwayInput> {
  const errors: FieldErrors = {};
  const name = readText(values, 'name', { required: true, max: 40 }, errors);
  const pavement = readChoice(values, 'pavement', ['paved', 'grass'] as const, errors, 'paved');
  const profile = readProfileText(values.profile ?? '', system, errors);
  const directions: RunwayDirectionInput[] = [];
  for (const i of [0, 1]) {
    const designator = (values[directionField(i, 'designator')] ?? '').trim().toUpperCase();
    const given = designator !== '' || DIRECTION_FIELDS.some((f) => (values[directionField(i, f)] ?? '').trim() !== '');
    if (!given && i === 1) continue;
    if (designator === '') errors[directionField(i, 'designator')] = 'missing; a runway designator 01 to 36, optionally L, C or R';
    const d: Record<string, number> = {};
    for (const f of DIRECTION_FIELDS) {
      const v = readNumber(values, { name: directionField(i, f), kind: 'length', ...within(DECLARED_LENGTH_RANGE), required: true }, system, errors);
      if (v !== undefined) d[`${f}_m`] = v;
    }
    if (designator !== '' && Object.keys(d).length === 4) directions.push({ designator, ...(d as { tora_m: number; toda_m: number; asda_m: number; lda_m: number }) });
  }
  if (Object.keys(errors).length > 0 || name === undefined || pavement === undefined) return { ok: false, errors };
  const runway: RunwayInput = { name, pavement, profile, directions };
  const r = runwaySchema.safeParse(runway, { reportInput: true });
  if (!r.success) {
    for (const i of r.error.issues) {
      const [head, idx, f] = i.path;
      const field = head === 'directions' && typeof idx === 'number' ? directionField(idx, (String(f ?? 'designator').replace(/_m$/, '') as 'designator')) : String(head ?? 'name');
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
    const field = m ? directionField(Number(m[1]), m[2] as 'designator') : directionField(0, 'designator');
    const typed = (values[field] ?? '').trim() || String(e.value);
    errors[field] = localiseMessage(`${typed} is not allowed; expected ${e.allowed}`, system);
  }
  if (Object.keys(errors).length > 0) return { ok: false, errors };
  return { ok: true, value: r.data as RunwayInput };
}
