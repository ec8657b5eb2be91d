/** Helpers shared by the page routes: downloads, not-found pages, the unit system of a submitted form. */
import type { Context } from 'hono';
import type { UnitSystem } from '../../core/index.js';
import { UNITS_FIELD } from '../../templates/components.js';
import { NotFoundPage } from '../../templates/errors.js';
import type { FormValues } from '../common/formFields.js';
import type { AppEnv } from './env.js';
import { page, viewOf } from './page.js';

/** A file download (attachment) with its content type. */
export function download(c: Context, body: string | Uint8Array, type: string, filename: string): Response {
  c.header('Content-Type', type);
  c.header('Content-Disposition', `attachment; filename="${filename.replace(/[^A-Za-z0-9._-]/g, '_')}"`);
  c.header('Cache-Control', 'no-store');
  return c.body(typeof body === 'string' ? body : new Uint8Array(body), 200);
}

export function notFound(c: Context<AppEnv>, what: string, id: string | number): Response {
  return page(c, { title: 'Not found', status: 404 }, () => <NotFoundPage what={what} id={String(id)} />);
}

/** The unit system the form was filled in (its hidden field), else the page's. */
export function formUnits(c: Context<AppEnv>, values: FormValues, fallback?: UnitSystem): UnitSystem {
  const u = values[UNITS_FIELD];
  return u === 'si' || u === 'us' ? u : viewOf(c, fallback).units;
}

/** A positive whole-number route parameter, or undefined. */
export function idParam(raw: string | undefined): number | undefined {
  return raw !== undefined && /^[1-9]\d{0,9}$/.test(raw) ? Number(raw) : undefined;
}
