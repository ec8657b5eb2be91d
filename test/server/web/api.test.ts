/**
 * JSON API (/api/): the catalogue, studies from study files (validated by the same schema), results,
 * and one-off computations. Problems come back as 422 with path, field, value and message.
 */
import { describe, expect, it } from 'vitest';
import { getAircraft, listStudies } from '../../../db/index.js';
import { Client, DEMO_TEXT, makeApp } from './helpers.js';

describe('JSON API', () => {
  it('lists and reads aircraft; refuses an invalid profile with its problems (422)', async () => {
    const { app } = makeApp();
    const c = new Client(app);
    const list = JSON.parse((await c.json('GET', '/api/aircraft')).text) as { id: string }[];
    expect(list.map((a) => a.id)).toContain('tern-rj90');
    const one = JSON.parse((await c.json('GET', '/api/aircraft/tern-rj90')).text);
    const bad = await c.json('POST', '/api/aircraft', { ...one, id: 'tern-x', mtow_kg: 12 });
    expect(bad.status).toBe(422);
    const body = JSON.parse(bad.text) as { problems: { path: string; value: unknown; message: string }[] };
    expect(body.problems[0]).toMatchObject({ path: 'mtow_kg', value: 12 });
    expect(body.problems[0]!.message).toMatch(/out of range; allowed 300 to 600000 kg/);
  });

  it('creates, replaces and deletes an aircraft; a used one is a 409', async () => {
    const { app, db } = makeApp();
    const c = new Client(app);
    const one = JSON.parse((await c.json('GET', '/api/aircraft/tern-rj90')).text);
    const created = await c.json('POST', '/api/aircraft', { ...one, id: 'tern-x', name: 'Tern X' });
    expect(created.status).toBe(201);
    expect(created.headers.get('location')).toBe('/api/aircraft/tern-x');
    expect((await c.json('POST', '/api/aircraft', { ...one, id: 'tern-x' })).status).toBe(409);
    expect((await c.json('PUT', '/api/aircraft/tern-x', { ...one, id: 'tern-x', name: 'Tern X2' })).status).toBe(200);
    expect(getAircraft(db, 'tern-x')!.name).toBe('Tern X2');
    expect((await c.json('DELETE', '/api/aircraft/tern-x')).status).toBe(204);
    expect((await c.json('DELETE', '/api/aircraft/tern-rj90')).status).toBe(409);
    expect((await c.json('POST', '/api/aircraft', '{"id": ')).status).toBe(400);
  });

  it('creates a study from a study file, runs it and returns the results', async () => {
    const { app, db } = makeApp({ seed: false });
    const c = new Client(app);
    const created = await c.json('POST', '/api/studies', DEMO_TEXT);
    expect(created.status).toBe(201);
    const { id } = JSON.parse(created.text) as { id: number };
    expect(listStudies(db).map((s) => s.id)).toContain(id);
    const before = await c.json('GET', `/api/studies/${id}/results`);
    expect(before.status).toBe(409);
    expect(JSON.parse(before.text).state).toBe('never-saved');
    const run = await c.json('POST', `/api/studies/${id}/run`);
    expect(run.status).toBe(200);
    const out = JSON.parse(run.text) as { inputDigest: string; scenarios: { recommendedLength_m: number | null }[] };
    expect(out.inputDigest).toMatch(/^[0-9a-f]{64}$/);
    const after = JSON.parse((await c.json('GET', `/api/studies/${id}/results`)).text) as typeof out;
    expect(after.scenarios.map((s) => s.recommendedLength_m)).toEqual(out.scenarios.map((s) => s.recommendedLength_m));
    // Warnings are notices with their sentence: code, message (no unrendered object), text and args.
    for (const body of [run.text, JSON.stringify(after)]) {
      const warnings = (JSON.parse(body) as { scenarios: { rows: { warnings: Record<string, unknown>[] }[] }[] })
        .scenarios.flatMap((s) => s.rows.flatMap((r) => r.warnings));
      expect(warnings.length).toBeGreaterThan(0);
      for (const w of warnings) {
        expect(w.code).toMatch(/^[a-z][A-Za-z]*\.[a-z][A-Za-z0-9]*$/);
        expect(typeof w.message).toBe('string');
        expect(w.message).not.toMatch(/\[object Object\]|NaN|Infinity/);
      }
    }
    // The study reads back as a study file that validates and gives the same digest.
    const doc = JSON.parse((await c.json('GET', `/api/studies/${id}`)).text);
    expect(doc.format).toBe('runwright-study');
    const oneOff = JSON.parse((await c.json('POST', '/api/compute/study', doc)).text) as typeof out;
    expect(oneOff.inputDigest).toBe(out.inputDigest);
    // Posting the same file again reuses the identical aircraft.
    const again = JSON.parse((await c.json('POST', '/api/studies', DEMO_TEXT)).text) as { createdAircraft: string[] };
    expect(again.createdAircraft).toEqual([]);
  });

  it('refuses an invalid study file with every problem listed', async () => {
    const { app } = makeApp({ seed: false });
    const c = new Client(app);
    const doc = JSON.parse(DEMO_TEXT);
    doc.site.elevation_m = 9000;
    doc.scenarios[0].fleet[0].aircraft = 'nobody';
    const r = await c.json('POST', '/api/compute/study', doc);
    expect(r.status).toBe(422);
    const paths = (JSON.parse(r.text) as { problems: { path: string }[] }).problems.map((p) => p.path);
    expect(paths).toContain('site.elevation_m');
    expect(paths).toContain('scenarios[0].fleet[0].aircraft');
  });

  it('computes a one-off requirement for a catalogue aircraft or a posted profile', async () => {
    const { app } = makeApp();
    const c = new Client(app);
    const cool = JSON.parse((await c.json('POST', '/api/compute/requirement', { aircraft: 'tern-rj90', conditions: { elevation_m: 0, temperature_c: 15, mass_kg: 36000 } })).text);
    const hot = JSON.parse((await c.json('POST', '/api/compute/requirement', { aircraft: 'tern-rj90', conditions: { elevation_m: 0, temperature_c: 40, mass_kg: 36000 } })).text);
    expect(cool.takeoff.ok).toBe(true);
    // Property (design brief): warmer air, longer takeoff.
    expect(hot.takeoff.required_m).toBeGreaterThan(cool.takeoff.required_m);
    const bad = await c.json('POST', '/api/compute/requirement', { aircraft: 'tern-rj90', conditions: { elevation_m: 0, temperature_c: 99 } });
    expect(bad.status).toBe(422);
    expect((await c.json('POST', '/api/compute/requirement', { aircraft: 'nobody', conditions: { elevation_m: 0, temperature_c: 15 } })).status).toBe(404);
  });
});
