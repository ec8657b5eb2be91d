/**
 * JSON API under /api/: the catalogue, sites, studies, their results, and one-off computations.
 * Request bodies are JSON (application/json) and are checked with the same zod schemas as the study
 * file; problems come back as 422 `{ error: "invalid", problems: [{ path, field, value, message }] }`.
 * Endpoints and examples: docs/web.md ("JSON API").
 */
import { setImmediate as nextTurn } from 'node:timers/promises';
import { Hono, type Context } from 'hono';
import { z } from 'zod';
import { InputDomainError, noticeJson, OPERATING_RULE_SETS, SURFACES, whatIf, TAKEOFF_INPUT_RANGES, type AircraftProfile, type OperatingRuleSet, type StudyInput, type UnitSystem } from '../core/index.js';
import { AircraftInUseError, DuplicateIdError } from '../db/errors.js';
import {
  AIRCRAFT_SEARCH_MAX, countAircraftMatching, createAircraftMany, deleteAircraft, getAircraft, pageAircraft, updateAircraft,
} from '../db/repos/aircraft.js';
import { createSite, getSite, listSites } from '../db/repos/sites.js';
import { createStudy, deleteStudy, getStudy, listStudies } from '../db/repos/studies.js';
import { transaction } from '../db/transaction.js';
import type { Db } from '../db/types.js';
import { jsonDepthExcess, jsonDepthMessage } from './io/text.js';
import type { JobRunner } from './jobs/index.js';
import { aircraftSchema } from './aircraft/index.js';
import { num, oneOf, parseAll, type Problem } from './common/schema.js';
import { canonicalJson, parseStudyDocument, problemFromDomainError } from './studies/index.js';
import { StudyService } from './studies/index.js';
import type { AppEnv } from './web/env.js';
import { API_LIST_DEFAULT, API_LIST_MAX, chooseOffset } from './web/paging.js';
import { idParam } from './web/routeHelpers.js';

export interface ApiRouteDeps {
  readonly db: Db;
  readonly jobs: JobRunner;
  readonly clock: () => Date;
  readonly service?: StudyService;
}

/** A JSON answer whose notices carry their sentence (`message`) beside their code and SI values. */
function jsonWithNotices(c: Context, body: unknown, units: UnitSystem): Response {
  return c.body(noticeJson(body, units), 200, { 'content-type': 'application/json; charset=utf-8' });
}

const invalid = (c: Context, problems: readonly Problem[]) =>
  c.json({ error: 'invalid', problems: problems.map((p) => ({ path: p.path, field: p.field, value: p.value === undefined ? null : p.value, message: p.message })) }, 422);

const notFound = (c: Context, what: string, id: string | number | undefined) =>
  c.json({ error: 'not-found', message: `${what} ${JSON.stringify(id ?? null)} does not exist` }, 404);

async function jsonBody(c: Context): Promise<{ ok: true; value: unknown } | { ok: false; response: Response }> {
  const text = await c.req.text();
  if (text.trim() === '') return { ok: false, response: c.json({ error: 'bad-request', message: 'a JSON request body is required' }, 400) };
  // Depth first: a deeply nested body would overflow the validators and the reply that echoes it.
  const deep = jsonDepthExcess(text);
  if (deep) {
    const message = `the body is ${jsonDepthMessage(deep)}`;
    return { ok: false, response: c.json({ error: 'invalid', message, problems: [{ path: '(root)', field: '(root)', value: null, message }] }, 422) };
  }
  try {
    return { ok: true, value: JSON.parse(text) as unknown };
  } catch (e) {
    return { ok: false, response: c.json({ error: 'bad-json', message: `the body is not valid JSON: ${(e as Error).message}` }, 400) };
  }
}

/**
 * Where a core field of the requirement computation lives in the request body: the aircraft's own
 * fields under `aircraft` (e.g. "aircraft.tailUpSpeed_mps"), the conditions under `conditions` (the
 * models call the elevation the pressure altitude).
 */
export function requirementPath(field: string): string {
  if (field === 'aircraft' || field.startsWith('aircraft.')) return field;
  if (field === 'pressureAltitude_m') return 'conditions.elevation_m';
  return `conditions.${field}`;
}

/** The study of the database as a study file document. */
function studyDocument(input: StudyInput): Record<string, unknown> {
  return { format: 'runwright-study', version: 1, ...input };
}

const requirementSchema = z.strictObject({
  aircraft: z.union([z.string(), aircraftSchema], {
    error: (iss) => (iss.input === undefined || iss.input === null ? 'missing; an aircraft id or an aircraft profile is required' : 'an aircraft id (text) or an aircraft profile (an object) is required'),
  }),
  conditions: z.strictObject({
    elevation_m: num(TAKEOFF_INPUT_RANGES.pressureAltitude_m.min, TAKEOFF_INPUT_RANGES.pressureAltitude_m.max, 'm'),
    temperature_c: num(TAKEOFF_INPUT_RANGES.temperature_c.min, TAKEOFF_INPUT_RANGES.temperature_c.max, '°C'),
    mass_kg: num(200, 600000, 'kg').optional(),
    slope: num(TAKEOFF_INPUT_RANGES.slope.min, TAKEOFF_INPUT_RANGES.slope.max, '').default(0),
    headwind_mps: num(TAKEOFF_INPUT_RANGES.headwind_mps.min, TAKEOFF_INPUT_RANGES.headwind_mps.max, 'm/s').default(0),
    surface: oneOf(SURFACES as unknown as readonly [string, ...string[]]).default('dry'),
    landingTemperature: oneOf(['isa', 'design']).default('isa'),
    operatingRules: oneOf(OPERATING_RULE_SETS as unknown as readonly [string, ...string[]]).default('us-121'),
  }),
});

export function apiRoutes(deps: ApiRouteDeps): Hono<AppEnv> {
  const { db, jobs } = deps;
  const service = deps.service ?? new StudyService(db, jobs, deps.clock);
  const app = new Hono<AppEnv>();

  app.use('*', async (c, next) => {
    await next();
    c.header('Cache-Control', 'no-store');
  });

  app.get('/', (c) => c.json({
    endpoints: [
      'GET /api/aircraft', 'GET /api/aircraft/:id', 'POST /api/aircraft', 'PUT /api/aircraft/:id', 'DELETE /api/aircraft/:id',
      'GET /api/sites', 'GET /api/sites/:id',
      'GET /api/studies', 'POST /api/studies', 'GET /api/studies/:id', 'DELETE /api/studies/:id',
      'GET /api/studies/:id/results', 'POST /api/studies/:id/run',
      'POST /api/compute/study', 'POST /api/compute/requirement',
    ],
    docs: 'docs/web.md',
  }));

  // Aircraft ----------------------------------------------------------------------------------
  // The catalogue pages (it may hold tens of thousands of profiles): `limit` (default 100, at most
  // 1,000), `offset`, `q` (search); the total is in X-Total-Count and the next page in Link.
  app.get('/aircraft', (c) => {
    const paging = chooseOffset({ limit: c.req.query('limit'), offset: c.req.query('offset') }, API_LIST_DEFAULT, API_LIST_MAX);
    if (!paging.ok) return c.json({ error: 'bad-request', message: paging.problems.join('; '), problems: paging.problems }, 400);
    const q = (c.req.query('q') ?? '').trim().slice(0, AIRCRAFT_SEARCH_MAX);
    const { limit, offset } = paging.value;
    const total = countAircraftMatching(db, q);
    const rows = pageAircraft(db, { search: q, limit, offset });
    c.header('X-Total-Count', String(total));
    if (offset + rows.length < total) {
      const next = new URLSearchParams({ ...(q !== '' ? { q } : {}), limit: String(limit), offset: String(offset + limit) });
      c.header('Link', `</api/aircraft?${next.toString()}>; rel="next"`);
    }
    return c.json(rows);
  });
  app.get('/aircraft/:id', (c) => {
    const a = getAircraft(db, c.req.param('id'));
    return a ? c.json(a) : notFound(c, 'aircraft', c.req.param('id'));
  });
  app.post('/aircraft', async (c) => {
    const body = await jsonBody(c);
    if (!body.ok) return body.response;
    const r = parseAll(aircraftSchema, body.value);
    if (!r.ok) return invalid(c, r.problems);
    try {
      const [a] = createAircraftMany(db, [r.value]);
      c.header('Location', `/api/aircraft/${encodeURIComponent(a!.id)}`);
      return c.json(a, 201);
    } catch (e) {
      if (e instanceof DuplicateIdError) return c.json({ error: 'conflict', message: e.message }, 409);
      throw e;
    }
  });
  app.put('/aircraft/:id', async (c) => {
    const id = c.req.param('id');
    if (!getAircraft(db, id)) return notFound(c, 'aircraft', id);
    const body = await jsonBody(c);
    if (!body.ok) return body.response;
    const r = parseAll(aircraftSchema, body.value);
    if (!r.ok) return invalid(c, r.problems);
    try {
      return c.json(updateAircraft(db, id, r.value));
    } catch (e) {
      if (e instanceof DuplicateIdError) return c.json({ error: 'conflict', message: e.message }, 409);
      throw e;
    }
  });
  app.delete('/aircraft/:id', (c) => {
    const id = c.req.param('id');
    if (!getAircraft(db, id)) return notFound(c, 'aircraft', id);
    try {
      deleteAircraft(db, id);
    } catch (e) {
      if (e instanceof AircraftInUseError) return c.json({ error: 'conflict', message: e.message, uses: e.uses }, 409);
      throw e;
    }
    return c.body(null, 204);
  });

  // Sites -------------------------------------------------------------------------------------
  app.get('/sites', (c) => c.json(listSites(db)));
  app.get('/sites/:id', (c) => {
    const id = idParam(c.req.param('id'));
    const s = id === undefined ? undefined : getSite(db, id);
    return s ? c.json(s) : notFound(c, 'site', c.req.param('id'));
  });

  // Studies -----------------------------------------------------------------------------------
  app.get('/studies', (c) => c.json(listStudies(db)));
  app.get('/studies/:id', (c) => {
    const id = idParam(c.req.param('id'));
    if (id === undefined || !getStudy(db, id)) return notFound(c, 'study', c.req.param('id'));
    const state = service.state(id);
    return c.json({ ...studyDocument(state.input) }, 200, state.problems.length > 0 ? { 'X-Study-Problems': String(state.problems.length) } : {});
  });

  /**
   * Creates a study from a study file: its site becomes a new site, its aircraft join the catalogue
   * (an aircraft already there must be identical, else 409), then the study is created.
   */
  app.post('/studies', async (c) => {
    const body = await jsonBody(c);
    if (!body.ok) return body.response;
    const parsed = parseStudyDocument(body.value);
    if (!parsed.ok) return invalid(c, parsed.problems);
    const input = parsed.input;
    const conflicts: string[] = [];
    const fresh: AircraftProfile[] = [];
    for (const a of input.aircraft) {
      const stored = getAircraft(db, a.id);
      if (!stored) fresh.push(a);
      else if (canonicalJson(stored) !== canonicalJson(a)) conflicts.push(a.id);
    }
    if (conflicts.length > 0) {
      return c.json({ error: 'conflict', message: `aircraft ${conflicts.map((x) => `"${x}"`).join(', ')} already in the catalogue with different data; rename them in the file or update the catalogue first`, aircraft: conflicts }, 409);
    }
    const id = transaction(db, (tx) => {
      createAircraftMany(tx, fresh);
      const siteId = createSite(tx, input.site);
      return createStudy(tx, { name: input.name, siteId, options: input.options, scenarios: input.scenarios });
    });
    c.header('Location', `/api/studies/${id}`);
    return c.json({ id, createdAircraft: fresh.map((a) => a.id) }, 201);
  });

  app.delete('/studies/:id', (c) => {
    const id = idParam(c.req.param('id'));
    if (id === undefined || !getStudy(db, id)) return notFound(c, 'study', c.req.param('id'));
    deleteStudy(db, id);
    return c.body(null, 204);
  });

  app.get('/studies/:id/results', (c) => {
    const id = idParam(c.req.param('id'));
    if (id === undefined || !getStudy(db, id)) return notFound(c, 'study', c.req.param('id'));
    const state = service.state(id);
    const latest = state.ready ? service.latest(state) : undefined;
    if (!latest || !latest.current) {
      return c.json({
        error: 'not-computed',
        state: state.status.state,
        message: state.problems.length > 0 ? 'the study cannot be computed yet' : 'no result for the current inputs; POST /api/studies/:id/run',
        problems: state.problems,
      }, 409);
    }
    return jsonWithNotices(c, { savedAt: latest.loaded.saved.createdAt, ...latest.loaded.output }, latest.loaded.output.options.units);
  });

  app.post('/studies/:id/run', async (c) => {
    const id = idParam(c.req.param('id'));
    if (id === undefined || !getStudy(db, id)) return notFound(c, 'study', c.req.param('id'));
    const state = service.state(id);
    if (state.problems.length > 0) return c.json({ error: 'invalid', message: 'the study cannot be computed yet', problems: state.problems }, 422);
    const saved = await service.compute(state);
    const loaded = service.load(id, saved);
    // Reading the snapshot back and writing the answer are two long steps on a large result: a turn between.
    await nextTurn();
    return jsonWithNotices(c, { savedAt: saved.createdAt, ...loaded.output }, loaded.output.options.units);
  });

  // One-off computations ------------------------------------------------------------------------
  app.post('/compute/study', async (c) => {
    const body = await jsonBody(c);
    if (!body.ok) return body.response;
    const parsed = parseStudyDocument(body.value);
    if (!parsed.ok) return invalid(c, parsed.problems);
    try {
      const out = await jobs.run('study', parsed.input);
      return jsonWithNotices(c, out, out.options.units);
    } catch (e) {
      // A rule only the run can check (it depends on the computed masses) is still the user's field.
      if (e instanceof InputDomainError) return invalid(c, [problemFromDomainError(e)]);
      throw e;
    }
  });

  app.post('/compute/requirement', async (c) => {
    const body = await jsonBody(c);
    if (!body.ok) return body.response;
    const r = parseAll(requirementSchema, body.value);
    if (!r.ok) return invalid(c, r.problems);
    const a = typeof r.value.aircraft === 'string' ? getAircraft(db, r.value.aircraft) : (r.value.aircraft as AircraftProfile);
    if (!a) return notFound(c, 'aircraft', r.value.aircraft as string);
    const cond = r.value.conditions;
    try {
      const outcome = whatIf({
        aircraft: a,
        elevation_m: cond.elevation_m,
        temperature_c: cond.temperature_c,
        mass_kg: cond.mass_kg ?? a.mtow_kg,
        slope: cond.slope,
        headwind_mps: cond.headwind_mps,
        surface: cond.surface as (typeof SURFACES)[number],
        landingTemperature: cond.landingTemperature as 'isa' | 'design',
        operatingRules: cond.operatingRules as OperatingRuleSet,
      });
      return jsonWithNotices(c, { aircraft: a.id, conditions: { ...cond, mass_kg: cond.mass_kg ?? a.mtow_kg }, ...outcome }, 'si');
    } catch (e) {
      if (e instanceof InputDomainError) return invalid(c, [problemFromDomainError(e, requirementPath(e.field))]);
      throw e;
    }
  });

  return app;
}
