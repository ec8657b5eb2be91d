/**
 * The site's part of the study file (docs/study-format.md): site, climate and runway, SI quantities
 * with the unit as a key suffix. Numeric members come from core's field tables (core/studyFields.ts);
 * core's own checks (runway profile, declared distances, climate) run inside the schema, so a site the
 * schema accepts is never refused by the engine.
 */
import { z } from 'zod';
import {
  CLIMATE_FIELDS, DIRECTION_FIELDS, MONTHLY_FIELDS, PROFILE_POINT_FIELDS, SITE_FIELDS,
  analyseRunwayProfile, checkDerivedDesignTemperature, checkProfileSlopes, checkRunwayDeclaredDistances,
  designTemperatureFromMonthly, type MonthlyClimate, type ProfilePoint, type RunwayDirectionInput,
} from '../../core/index.js';
import { coreCheck, fieldMembers, int, text, oneOf } from '../common/schema.js';

export const monthlyClimateSchema = z.strictObject({
  month: int(1, 12, ''),
  ...fieldMembers(MONTHLY_FIELDS),
}) as unknown as z.ZodType<MonthlyClimate>;

/** Core's climate keys ("months[3].mean_c") as the file's ("monthly[3].mean_c"). */
const monthsAsMonthly = (k: (string | number)[]) => (k[0] === 'months' ? ['monthly', ...k.slice(1)] : k);

export const climateSchema = z.strictObject({
  source: text(300),
  ...fieldMembers(CLIMATE_FIELDS),
  monthly: z.array(monthlyClimateSchema).length(12, { error: 'exactly 12 monthly values, one per month' })
    .refine((ms) => new Set(ms.map((m) => m.month)).size === 12, { error: 'each month 1 to 12 exactly once' }),
}).superRefine((c, ctx) => {
  // The engine's design-temperature rules: a mean or a minimum for each month, the mean between the
  // minimum and the maximum, and a hottest month inside the design-temperature range.
  coreCheck(ctx, () => checkDerivedDesignTemperature(c.monthly, designTemperatureFromMonthly({ months: c.monthly }), 'months'), monthsAsMonthly);
});

export const profilePointSchema = z.strictObject(fieldMembers(PROFILE_POINT_FIELDS)) as unknown as z.ZodType<ProfilePoint>;

export const runwayDirectionSchema = z.strictObject({
  designator: z.string().regex(/^(0[1-9]|[12][0-9]|3[0-6])[LCR]?$/, { error: 'a runway designator 01 to 36, optionally L, C or R' }),
  ...fieldMembers(DIRECTION_FIELDS),
}) as unknown as z.ZodType<RunwayDirectionInput>;

/** Core's profile keys ("points[2].chainage_m") as the file's ("profile[2].chainage_m"). */
const pointsAsProfile = (k: (string | number)[]) => (k[0] === 'points' ? ['profile', ...k.slice(1)] : k);

export const runwaySchema = z.strictObject({
  name: text(40),
  pavement: oneOf(['paved', 'grass']),
  profile: z.array(profilePointSchema).min(2, { error: 'at least 2 centreline points' }).max(500),
  directions: z.array(runwayDirectionSchema).min(1).max(2),
}).superRefine((r, ctx) => {
  // The engine's runway rules: chainage increasing, a profile at most 8 km long, average slope and
  // effective gradient inside the models' range (steeper stretches only warn), declared-distance rules.
  coreCheck(ctx, () => checkProfileSlopes(analyseRunwayProfile({ points: r.profile }), 'profile'), pointsAsProfile);
  coreCheck(ctx, () => checkRunwayDeclaredDistances({ directions: r.directions }));
});

export const siteSchema = z.strictObject({
  name: text(120),
  ...fieldMembers(SITE_FIELDS),
  climate: climateSchema.optional(),
  runways: z.array(runwaySchema).min(1, { error: 'at least one runway' }).max(8),
}).refine((s) => (s as { designTemperature_c?: number }).designTemperature_c !== undefined || s.climate !== undefined, {
  error: 'either designTemperature_c or climate is required',
  path: ['designTemperature_c'],
});
