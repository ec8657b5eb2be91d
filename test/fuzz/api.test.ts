/**
 * Bounded fuzz run of the JSON API bodies (issue 12, "Tests"): every POST/PUT endpoint of
 * server/api.ts with (a) random JSON values and random text, (b) valid documents with one to
 * three members replaced by a random value (including the raw tokens 1e999, -0 and 1e-400, which
 * JSON.parse turns into ±Infinity, −0 and 0) or removed, and (c) deeply nested JSON. Checks: harness.ts.
 */
import { readFileSync } from 'node:fs';
import fc from 'fast-check';
import { afterAll, beforeAll, describe, it } from 'vitest';
import { createAircraft, getAircraft } from '../../db/repos/aircraft.js';
import {
  FUZZ_TIMEOUT_MS, Tally, applyJsonEdits, checkedRequest, echoesOf, fuzzApp, fuzzParams, jsonEchoes, jsonEdits, sendJson, textValue, type FuzzApp,
} from './harness.js';

let h: FuzzApp;
const PUT_TARGET = 'fuzz-put-target';
const DEMO = JSON.parse(readFileSync(new URL('../../examples/demo-study.json', import.meta.url), 'utf8')) as unknown;
const MINIMAL = JSON.parse(readFileSync(new URL('../../examples/minimal-study.json', import.meta.url), 'utf8')) as unknown;

beforeAll(async () => {
  h = await fuzzApp();
  createAircraft(h.db, { ...getAircraft(h.db, 'plover-ct19')!, id: PUT_TARGET, name: 'Fuzz PUT target' });
});
afterAll(() => h?.close());

function restoreTarget(): void {
  if (!getAircraft(h.db, PUT_TARGET)) createAircraft(h.db, { ...getAircraft(h.db, 'plover-ct19')!, id: PUT_TARGET, name: 'Fuzz PUT target' });
}

interface Endpoint { readonly method: string; readonly path: () => string; readonly base: () => unknown }

/** The endpoints with a request body, each with a valid body to mutate. */
function endpoints(): Endpoint[] {
  const plover = getAircraft(h.db, 'plover-ct19')!;
  let n = 0;
  return [
    { method: 'POST', path: () => '/api/aircraft', base: () => ({ ...plover, id: `fuzz-api-${++n}` }) },
    { method: 'PUT', path: () => `/api/aircraft/${PUT_TARGET}`, base: () => ({ ...plover, id: PUT_TARGET }) },
    { method: 'POST', path: () => '/api/studies', base: () => DEMO },
    { method: 'POST', path: () => '/api/compute/study', base: () => MINIMAL },
    { method: 'POST', path: () => '/api/compute/requirement', base: () => ({ aircraft: 'plover-ct19', conditions: { elevation_m: 1346, temperature_c: 33, mass_kg: 8000, slope: 0.002, headwind_mps: 0, surface: 'dry', landingTemperature: 'design' } }) },
    { method: 'POST', path: () => '/api/compute/requirement', base: () => ({ aircraft: plover, conditions: { elevation_m: 0, temperature_c: 15 } }) },
  ];
}

describe('fuzz: JSON API bodies', () => {
  it('random JSON values and text to every body endpoint: 4xx (never 5xx), no leaks, nothing saved', async () => {
    const eps = endpoints();
    const tally = new Tally();
    const body = fc.oneof(
      { weight: 4, arbitrary: fc.jsonValue().map((v) => JSON.stringify(v)) },
      { weight: 1, arbitrary: textValue },
      { weight: 1, arbitrary: fc.constantFrom('', ' ', '{', '[1,', '{"a":1e999}', 'NaN', '"\\ud800"', '\uFEFF{}', 'null', '{"__proto__":{"x":1}}', '{"constructor":{"prototype":{}}}') },
    );
    await fc.assert(fc.asyncProperty(fc.nat({ max: eps.length - 1 }), body, async (i, text) => {
      const ep = eps[i]!;
      restoreTarget();
      await checkedRequest(h, () => sendJson(h, ep.method, ep.path(), text), jsonEchoes([text]), `${ep.method} ${ep.path()} ${JSON.stringify(text)}`, tally);
    }), fuzzParams(250));
    console.info(`API random bodies: ${tally}`);
  }, FUZZ_TIMEOUT_MS);

  it('valid bodies with members replaced or removed: no 5xx, no leaks, nothing saved when refused', async () => {
    const eps = endpoints();
    const tally = new Tally();
    await fc.assert(fc.asyncProperty(fc.nat({ max: eps.length - 1 }), jsonEdits, async (i, edits) => {
      const ep = eps[i]!;
      restoreTarget();
      // base() gives a new aircraft a fresh id (so that valid cases are saved) unless an edit changes it.
      const { text, tokens, described } = applyJsonEdits(ep.base(), edits);
      await checkedRequest(h, () => sendJson(h, ep.method, ep.path(), text), jsonEchoes(tokens), `${ep.method} ${ep.path()} valid body with ${described}`, tally);
    }), fuzzParams(300));
    console.info(`API mutated bodies: ${tally}`);
    tally.expectMix('API mutated bodies');
  }, FUZZ_TIMEOUT_MS);

  it('deeply nested JSON in every body endpoint: refused with 4xx, never 5xx', async () => {
    const eps = endpoints();
    const tally = new Tally();
    const deep = fc.record({ depth: fc.integer({ min: 1, max: 6000 }), kind: fc.constantFrom('array', 'object', 'member') });
    await fc.assert(fc.asyncProperty(fc.nat({ max: eps.length - 1 }), deep, async (i, d) => {
      const ep = eps[i]!;
      const inner = d.kind === 'array' ? `${'['.repeat(d.depth)}1${']'.repeat(d.depth)}` : `${'{"a":'.repeat(d.depth)}1${'}'.repeat(d.depth)}`;
      const text = d.kind === 'member' ? JSON.stringify({ name: 'x' }).replace('"x"', inner) : inner;
      restoreTarget();
      await checkedRequest(h, () => sendJson(h, ep.method, ep.path(), text), echoesOf([]), `${ep.method} ${ep.path()} nested ${d.kind} × ${d.depth}`, tally);
    }), fuzzParams(30));
    console.info(`API deep bodies: ${tally}`);
  }, FUZZ_TIMEOUT_MS);

  it('POST /api/studies/:id/run with random bodies: no 5xx, no leaks', async () => {
    const tally = new Tally();
    const body = fc.option(fc.oneof(fc.jsonValue({ maxDepth: 2 }).map((v) => JSON.stringify(v)), textValue), { freq: 3 });
    await fc.assert(fc.asyncProperty(body, fc.constantFrom(String(h.studyId), '0', '999', 'x', '-1', '1e3'), async (text, id) => {
      await checkedRequest(h, () => sendJson(h, 'POST', `/api/studies/${id}/run`, text ?? undefined), jsonEchoes(text ? [text] : []), `POST /api/studies/${id}/run ${JSON.stringify(text)}`, tally);
    }), fuzzParams(12));
    console.info(`API run: ${tally}`);
  }, FUZZ_TIMEOUT_MS);
});
