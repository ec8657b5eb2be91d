/**
 * JSON API edges (issue 12, findings 4 and 5): a body nested thousands of levels deep is refused with
 * 422 before validation on every JSON endpoint (it used to overflow the stack in the 422 reply: 500);
 * engine-domain problems of /api/compute/requirement come back under the body's own paths (aircraft
 * fields under `aircraft`); a 2,000 km alternate computes.
 */
import { describe, expect, it } from 'vitest';
import { MAX_JSON_DEPTH, jsonDepthExcess, parseJsonText } from '../../../server/io/text.js';
import { ImportError } from '../../../server/io/errors.js';
import { Client, DEMO_TEXT, makeApp } from './helpers.js';

/** About 8 KB: 4,100 nested arrays. */
const deepArrays = '['.repeat(4100) + ']'.repeat(4100);
/** Deep objects inside an otherwise plausible body. */
const deepObject = `{"name":"x","site":${'{"a":'.repeat(2000)}1${'}'.repeat(2000)}}`;

describe('JSON nesting depth cap', () => {
  it('finds the first opening beyond the cap, ignoring brackets inside strings, without recursion', () => {
    expect(jsonDepthExcess('[[["[[[[[[[[[[[["]]]', 3)).toBeUndefined();
    expect(jsonDepthExcess('{"a":[[[\n[1]]]]}', 4)).toEqual({ offset: 9, line: 2, char: 1 });
    expect(jsonDepthExcess(deepArrays)).toEqual({ offset: MAX_JSON_DEPTH, line: 1, char: MAX_JSON_DEPTH + 1 });
    // A real study file is far below the cap.
    expect(jsonDepthExcess(DEMO_TEXT)).toBeUndefined();
  });

  it('file imports refuse a deep document with line, column and the cap', () => {
    let err: unknown;
    try { parseJsonText(deepArrays, 'aircraft JSON'); } catch (e) { err = e; }
    expect(err).toBeInstanceOf(ImportError);
    expect((err as ImportError).problems[0]).toMatchObject({ line: 1, column: 65 });
    expect((err as ImportError).problems[0]!.reason).toMatch(/nested more than 64 levels deep/);
  });

  it('every JSON endpoint answers 422 with a short message (never 500, never an echo of the value)', async () => {
    const { app } = makeApp();
    const c = new Client(app);
    const endpoints: [string, string][] = [
      ['POST', '/api/aircraft'], ['PUT', '/api/aircraft/tern-rj90'], ['POST', '/api/studies'],
      ['POST', '/api/compute/study'], ['POST', '/api/compute/requirement'],
    ];
    for (const [method, path] of endpoints) {
      for (const body of [deepArrays, deepObject]) {
        const res = await c.json(method, path, body);
        expect(res.status, `${method} ${path}`).toBe(422);
        const out = JSON.parse(res.text) as { error: string; problems: { path: string; message: string }[] };
        expect(out.error).toBe('invalid');
        expect(out.problems[0]!.message).toMatch(/^the body is nested more than 64 levels deep \(line 1, column \d+\)/);
        expect(res.text.length).toBeLessThan(600);
      }
    }
  });
});

describe('/api/compute/requirement problem paths', () => {
  it('an aircraft field refused by the engine is reported under aircraft, not conditions', async () => {
    const { app } = makeApp();
    const c = new Client(app);
    const kestrel = JSON.parse((await c.json('GET', '/api/aircraft/kestrel-ut1')).text) as Record<string, unknown>;
    // Valid by the profile ranges (5 to 60 m/s), but above this light aircraft's lift-off speed: the
    // takeoff model refuses it for the aircraft, whatever the conditions.
    const res = await c.json('POST', '/api/compute/requirement', { aircraft: { ...kestrel, tailUpSpeed_mps: 59 }, conditions: { elevation_m: 0, temperature_c: 15 } });
    expect(res.status).toBe(422);
    const p = (JSON.parse(res.text) as { problems: { path: string; field: string; value: unknown; message: string }[] }).problems[0]!;
    expect(p).toMatchObject({ path: 'aircraft.tailUpSpeed_mps', field: 'tailUpSpeed_mps', value: 59 });
    expect(p.message).toMatch(/^59 is not allowed; expected below the lift-off speed at this mass \(\d+\.\d m\/s equivalent airspeed\)$/);
  });

  it('a condition keeps its conditions path, the models\' names mapped to the body\'s', async () => {
    const { app } = makeApp();
    const c = new Client(app);
    const res = await c.json('POST', '/api/compute/requirement', { aircraft: 'tern-rj90', conditions: { elevation_m: 0, temperature_c: 15, mass_kg: 500000 } });
    expect(res.status).toBe(422);
    const p = (JSON.parse(res.text) as { problems: { path: string; message: string }[] }).problems[0]!;
    expect(p.path).toBe('conditions.mass_kg');
    expect(p.message).toMatch(/^500000 is not allowed; expected ≥ \d+ kg and ≤ 40000 kg$/);
  });
});

describe('/api/compute/study with the widened reserve range', () => {
  it('a 2,000 km international alternate computes (200)', async () => {
    const { app } = makeApp();
    const c = new Client(app);
    const doc = JSON.parse(DEMO_TEXT) as { options: Record<string, unknown> };
    doc.options = { ...doc.options, reserves: { policy: 'international', alternate_km: 2000 } };
    const res = await c.json('POST', '/api/compute/study', doc);
    expect(res.status).toBe(200);
  });
});
