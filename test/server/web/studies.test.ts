/**
 * Study routes: build a study (options, two scenarios with fleet rows), compute it (303 to the
 * results), read the critical aircraft and the recommended length, the components on demand, the
 * downloads, the study what-if, and the "inputs changed" state. The expected figures are the engine's
 * own (core/study/run.ts, tested there); these tests check that the pages carry them faithfully.
 */
import { describe, expect, it } from 'vitest';
import { parse } from 'csv-parse/sync';
import { getStudy, latestStudyResult } from '../../../db/index.js';
import { studyOutput, type StudyOutput } from '../../../server/studies/document.js';
import { fmtLengthBoth } from '../../../templates/format.js';
import { browser, demoInput, makeApp } from './helpers.js';

describe('building and computing a study', () => {
  it('study form → two scenarios → results with the critical aircraft and the recommended length', async () => {
    const { app, db, siteId } = makeApp();
    const c = await browser(app);
    const bad = await c.post('/studies', { name: '', siteId: String(siteId), units: 'si', regularUseThreshold: 'many', roundingIncrement: '50', passengerMass: '95' });
    expect(bad.status).toBe(422);
    expect(bad.text).toContain('Study name</a>: missing');
    expect(bad.text).toContain('value="many"');

    const st = await c.post('/studies', { name: 'Two scenarios', siteId: String(siteId), units: 'si', regularUseThreshold: '500', roundingIncrement: '50', surface: 'dry', method: 'physics', reservePolicy: 'cruise-45min', passengerMass: '95', landingTemperature: 'isa', landingMass: 'mlw' });
    expect(st.status).toBe(303);
    const id = Number(/\/studies\/(\d+)/.exec(st.headers.get('location')!)![1]);

    const a = await c.post(`/studies/${id}/scenarios`, { name: 'Today' });
    expect(a.status).toBe(303);
    const aPath = a.headers.get('location')!;
    expect((await c.post(aPath, { name: 'Today', rows: '3', r0_aircraft: 'pipit-lt2', r0_ops: '1800', r0_stage: '400', r0_payload: '400', r1_aircraft: 'curlew-rt70', r1_ops: '1600', r1_stage: '600', r1_payload: '5000' })).status).toBe(303);
    const b = await c.post(`/studies/${id}/scenarios`, { name: 'Jets' });
    const bPath = b.headers.get('location')!;
    const bad422 = await c.post(bPath, { name: 'Jets', rows: '2', r0_aircraft: 'tern-rj90', r0_ops: 'lots', r0_stage: '900', r0_payload: '7000' });
    expect(bad422.status).toBe(422);
    expect(bad422.text).toContain('Row 1 annual operations</a>: &quot;lots&quot; is not a number');
    expect((await c.post(bPath, { name: 'Jets', rows: '2', r0_aircraft: 'tern-rj90', r0_ops: '800', r0_stage: '900', r0_payload: '7000', r1_aircraft: 'curlew-rt70', r1_ops: '2400', r1_stage: '800', r1_payload: '5500' })).status).toBe(303);
    expect(getStudy(db, id)!.scenarios.map((s) => s.fleet.length)).toEqual([2, 2]);

    // Not computed yet: the results page offers to compute (and computes on load with htmx).
    const stale = await c.get(`/studies/${id}/results`);
    expect(stale.text).toContain('has not been computed yet');
    expect(stale.text).toContain('hx-trigger="load"');
    const run = await c.post(`/studies/${id}/run`, {});
    expect(run.status).toBe(303);
    expect(run.headers.get('location')).toBe(`/studies/${id}/results`);

    const saved = latestStudyResult(db, id)!.result as StudyOutput;
    const page = (await c.get(`/studies/${id}/results`)).text;
    saved.scenarios.forEach((s, i) => {
      expect(page).toContain(`data-testid="critical-${i}">${s.criticalAircraftName}</strong>`);
      expect(page).toContain(`data-testid="recommended-${i}">${fmtLengthBoth(s.recommendedLength_m, 'si')}</strong>`);
    });
    expect(page).toMatch(/<tr class="critical"><th scope="row">Tern RJ-90<span class="badge">critical<\/span>/);
    for (const chart of ['chart-temperature', 'chart-existing-0', 'chart-existing-1', 'chart-operations-served']) expect(page).toContain(`id="${chart}"`);
    expect(page).toContain('/studies/' + id + '/appendix.pdf');
    expect(page).toContain('id="whatif-panel"');

    // The saved result equals a fresh computation of the saved input (same digest, same numbers).
    const record = latestStudyResult(db, id)!;
    const fresh = studyOutput(record.input as Parameters<typeof studyOutput>[0]);
    expect(fresh.inputDigest).toBe(record.inputDigest);
    expect(fresh.scenarios.map((s) => s.recommendedLength_m)).toEqual(saved.scenarios.map((s) => s.recommendedLength_m));
  });

  it('the demo study: downloads, components on demand and the "inputs changed" state', async () => {
    const { app, db, studyId } = makeApp();
    const c = await browser(app);
    await c.post(`/studies/${studyId}/run`, {});
    const saved = latestStudyResult(db, studyId)!;
    const out = saved.result as StudyOutput;
    expect(out.inputDigest).toBe(saved.inputDigest);

    const csv = await c.get(`/studies/${studyId}/results.csv`);
    expect(csv.headers.get('content-disposition')).toMatch(/attachment/);
    const rows = parse(csv.text, { comment: '#', columns: true }) as Record<string, string>[];
    expect(rows.length).toBe(out.scenarios.reduce((n, s) => n + s.rows.length, 0));
    expect(rows.filter((r) => r.critical === 'yes').map((r) => r.recommended_length_m)).toEqual(out.scenarios.filter((s) => s.criticalAircraft).map((s) => String(s.recommendedLength_m)));
    const json = JSON.parse((await c.get(`/studies/${studyId}/results.json`)).text) as StudyOutput;
    expect(json.inputDigest).toBe(saved.inputDigest);

    const frag = await c.get(`/studies/${studyId}/results/rows/0/0`, { htmx: true });
    expect(frag.status).toBe(200);
    expect(frag.text).toMatch(/^<div class="components">/);
    expect(frag.text).toContain('Design mass from the route');
    const full = await c.get(`/studies/${studyId}/results/rows/0/0`);
    expect(full.text).toContain('<!doctype html>');

    // Change an input: the results page says so and offers to recompute.
    const scenario = getStudy(db, studyId)!.scenarios[0]!;
    await c.post(`/studies/${studyId}/scenarios/${scenario.id}`, { name: 'Renamed base', rows: String(scenario.fleet.length), ...Object.fromEntries(scenario.fleet.flatMap((r, i) => [[`r${i}_aircraft`, r.aircraft], [`r${i}_ops`, String(r.annualOperations)], [`r${i}_stage`, String(r.stageLength_km)], [`r${i}_payload`, String(r.payload_kg)]])) });
    const changed = await c.get(`/studies/${studyId}/results`);
    expect(changed.text).toContain('The inputs have changed since the last computation');
    // Issue 14 regression: the downloads never serve the result of other inputs; they send the user
    // to the results page (which recomputes), as the appendix does.
    for (const path of ['results.csv', 'results.json', 'appendix.pdf', 'results/rows/0/0']) {
      const r = await c.get(`/studies/${studyId}/${path}`);
      expect(r.status, path).toBe(303);
      expect(r.headers.get('location'), path).toBe(`/studies/${studyId}/results`);
    }
    await c.post(`/studies/${studyId}/run`, {});
    expect((await c.get(`/studies/${studyId}/results.csv`)).text).toContain('Renamed base');
  });

  it('a study that is not ready lists what is missing instead of computing', async () => {
    const { app, siteId } = makeApp();
    const c = await browser(app);
    const st = await c.post('/studies', { _units: 'us', name: 'Empty', siteId: String(siteId), units: 'us', regularUseThreshold: '500', roundingIncrement: '100', passengerMass: '210' });
    const id = Number(/\/studies\/(\d+)/.exec(st.headers.get('location')!)![1]);
    const r = await c.get(`/studies/${id}/results`);
    expect(r.text).toContain('cannot be computed yet');
    expect(r.text).not.toContain('hx-trigger="load"');
    expect((await c.post(`/studies/${id}/run`, {})).status).toBe(422);
  });
});

describe('study what-if', () => {
  it('starts from the design conditions and follows a change of temperature', async () => {
    const { app, studyId } = makeApp();
    const c = await browser(app);
    await c.post(`/studies/${studyId}/run`, {});
    const page = (await c.get(`/studies/${studyId}`)).text;
    const site = demoInput().site;
    expect(page).toContain(`value="${site.elevation_m}"`);
    const q = (t: string) => `/studies/${studyId}/whatif?units=si&aircraft=tern-rj90&prev=tern-rj90&temperature=${t}&elevation=1346&mass=34000&slope=0&wind=0&surface=dry`;
    const cool = await c.get(q('10'), { htmx: true });
    const hot = await c.get(q('35'), { htmx: true });
    const takeoff = (html: string) => Number(/<th scope="row">Takeoff<\/th><td class="num">([\d,]+) m/.exec(html)![1]!.replace(/,/g, ''));
    // Property (design brief): warmer air, longer takeoff.
    expect(takeoff(hot.text)).toBeGreaterThan(takeoff(cool.text));
    expect(hot.text).toMatch(/against the design conditions/);
  });

  it('choosing another aircraft replaces the mass field with that aircraft’s design mass', async () => {
    const { app, studyId } = makeApp();
    const c = await browser(app);
    const r = await c.get(`/studies/${studyId}/whatif?units=si&aircraft=kestrel-ut1&prev=tern-rj90&temperature=30&elevation=1346&mass=36000&slope=0&wind=0&surface=dry`, { htmx: true });
    expect(r.status).toBe(200);
    expect(r.text).toMatch(/<input id="f-wi-mass" name="mass"[^>]*hx-swap-oob="true"/);
    expect(r.text).toMatch(/<input type="hidden" id="wi-prev" name="prev" value="kestrel-ut1" hx-swap-oob="true"/);
  });
});

describe('operating rules and the recorded override on the study form (issue 13, items 12 and 14)', () => {
  const form = (siteId: number, extra: Record<string, string>) => ({
    name: 'Rules', siteId: String(siteId), units: 'si', regularUseThreshold: '500', roundingIncrement: '50', surface: 'dry',
    method: 'physics', reservePolicy: 'cruise-45min', passengerMass: '95', landingTemperature: 'isa', landingMass: 'mlw', ...extra,
  });

  it('an unknown rule set and an override without a reference method are refused, naming the field; nothing is saved', async () => {
    const { app, sqlite, siteId } = makeApp();
    const c = await browser(app);
    const before = sqlite.prepare('select count(*) n from studies').get() as { n: number };
    const bad = await c.post('/studies', form(siteId, { operatingRules: 'us-999' }));
    expect(bad.status).toBe(422);
    expect(bad.text).toContain('Operating rules</a>: &quot;us-999&quot; is not allowed; one of us-121, us-135-eod, us-91, eu-cat');
    const over = await c.post('/studies', form(siteId, { referenceOverrideReason: 'Operator chart agrees with the corrected length.' }));
    expect(over.status).toBe(422);
    expect(over.text).toContain('Override reason (reference methods)</a>: only with a reference-length method');
    const short = await c.post('/studies', form(siteId, { method: 'reference-icao', referenceOverrideReason: 'because' }));
    expect(short.status).toBe(422);
    expect(short.text).toContain('at least 10 characters');
    expect(sqlite.prepare('select count(*) n from studies').get()).toEqual(before);
  });

  it('the chosen rule set and the override reason are saved, shown on the study page and kept by the edit form', async () => {
    const { app, db, siteId } = makeApp();
    const c = await browser(app);
    const reason = 'Operator chart agrees with the corrected length.';
    const st = await c.post('/studies', form(siteId, { method: 'reference-icao', operatingRules: 'eu-cat', referenceOverrideReason: reason }));
    expect(st.status).toBe(303);
    const id = Number(/\/studies\/(\d+)/.exec(st.headers.get('location')!)![1]);
    expect(getStudy(db, id)!.options).toMatchObject({ operatingRules: 'eu-cat', referenceOverrideReason: reason });
    const page = await c.get(`/studies/${id}`);
    expect(page.text).toContain('Operating rules: EU commercial air transport');
    expect(page.text).toContain('Override recorded');
    expect(page.text).toContain(reason);
    const edit = await c.get(`/studies/${id}/edit`);
    expect(edit.text).toMatch(/<option value="eu-cat" selected/);
    expect(edit.text).toContain(`value="${reason}"`);
  });
});

describe('switching a study between SI and US units keeps its result current (issue 14 regression)', () => {
  it('the digest leaves out the display units; the page, the CSV and the appendix follow the new units without recomputing', async () => {
    const { app, db, studyId } = makeApp();
    const c = await browser(app);
    await c.post(`/studies/${studyId}/run`, {});
    const before = latestStudyResult(db, studyId)!;
    const s = getStudy(db, studyId)!;
    const { inputDigest } = await import('../../../server/studies/document.js');
    const si = demoInput();
    expect(inputDigest({ ...si, options: { ...si.options, units: 'us' } })).toBe(inputDigest(si));
    const { studyFormValues } = await import('../../../server/studies/form.js');
    // The form's numbers are in SI (its `_units`); only the study's display units change.
    const values = { ...studyFormValues({ name: s.name, siteId: s.siteId, options: s.options }, 'si'), _units: 'si', units: 'us' };
    expect((await c.post(`/studies/${studyId}`, values)).status).toBe(303);
    expect(getStudy(db, studyId)!.options.units).toBe('us');
    const page = await c.get(`/studies/${studyId}/results`);
    expect(page.text).not.toContain('The inputs have changed since the last computation');
    expect(page.text).toMatch(/Recommended runway length[^]*? ft/);
    expect(latestStudyResult(db, studyId)!.id).toBe(before.id);
    const csv = await c.get(`/studies/${studyId}/results.csv`);
    expect(csv.status).toBe(200);
    expect(csv.text.split('\n')[1]).toContain('required_ft');
  });
});

describe('a saved result of an older method version is not current (issue 14)', () => {
  it('the results page recomputes it, the downloads wait for the new result, and the charts come from the saved result', async () => {
    const { app, db, sqlite, studyId } = makeApp();
    const c = await browser(app);
    await c.post(`/studies/${studyId}/run`, {});
    const first = latestStudyResult(db, studyId)!;
    // The payload-range series are part of the saved result (views never run the route model).
    expect((first.result as StudyOutput).payloadRange.length).toBeGreaterThan(0);
    sqlite.prepare('update saved_results set method_version = ? where id = ?').run('runwright-methods-0', first.id);
    const page = await c.get(`/studies/${studyId}/results`);
    expect(page.text).toContain('The last computation used an older version of the methods');
    expect((await c.get(`/studies/${studyId}/results.csv`)).status).toBe(303);
    await c.post(`/studies/${studyId}/run`, {});
    expect(latestStudyResult(db, studyId)!.id).not.toBe(first.id);
    expect((await c.get(`/studies/${studyId}/results.csv`)).status).toBe(200);
  });
});

describe('a damaged saved result is never served as current (issue 14)', () => {
  it('a snapshot whose digest no longer matches its row is recomputed instead of shown', async () => {
    const { app, db, sqlite, studyId } = makeApp();
    const c = await browser(app);
    await c.post(`/studies/${studyId}/run`, {});
    const first = latestStudyResult(db, studyId)!;
    const json = sqlite.prepare('select result_json as j from saved_results where id = ?').get(first.id) as { j: string };
    const damaged = JSON.parse(json.j) as Record<string, unknown>;
    damaged.inputDigest = '0'.repeat(64);
    sqlite.prepare('update saved_results set result_json = ? where id = ?').run(JSON.stringify(damaged), first.id);
    const page = await c.get(`/studies/${studyId}/results?auto=no`);
    expect(page.text).toContain('Compute results');
    expect((await c.get(`/studies/${studyId}/results.json`)).status).toBe(303);
  });
});
