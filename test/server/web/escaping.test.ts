/**
 * Escaping everywhere: a script tag stored in every text field (aircraft name and group, site name and
 * climate source, runway name, study and scenario names) and typed into number fields comes back
 * escaped on every page that shows it, including the results page and the downloads' HTML neighbours.
 */
import { describe, expect, it } from 'vitest';
import { getAircraft } from '../../../db/index.js';
import { browser, formFields, makeApp } from './helpers.js';

const EVIL = '<script>alert("x")</script>';
const ESCAPED = '&lt;script&gt;alert(&quot;x&quot;)&lt;/script&gt;';

function expectEscaped(html: string, where: string): void {
  expect(html, where).not.toContain('<script>alert');
  expect(html, where).toContain(ESCAPED);
}

describe('stored text is escaped on every page', () => {
  it('aircraft, site, runway, study and scenario text fields', async () => {
    const { app, db } = makeApp();
    const c = await browser(app);

    // Aircraft: name and group.
    const jet = formFields((await c.get('/aircraft/swift-bj8/edit')).text);
    expect((await c.post('/aircraft/swift-bj8', { ...jet, name: EVIL, group: EVIL })).status).toBe(303);
    expect(getAircraft(db, 'swift-bj8')!.name).toBe(EVIL);

    // Site: name and climate source, then a runway.
    const monthly: Record<string, string> = {};
    for (let m = 1; m <= 12; m++) { monthly[`m${m}_max`] = String(20 + m); monthly[`m${m}_min`] = String(5 + m); }
    const site = await c.post('/sites', { name: EVIL, elevation: '100', climateSource: EVIL, ...monthly });
    expect(site.status).toBe(303);
    const siteId = Number(/\/sites\/(\d+)/.exec(site.headers.get('location')!)![1]);
    const rw = await c.post(`/sites/${siteId}/runways`, { name: EVIL, pavement: 'paved', profile: '0 100\n2000 101', d0_designator: '09', d0_tora: '2000', d0_toda: '2000', d0_asda: '2000', d0_lda: '2000' });
    expect(rw.status).toBe(303);

    // Study and scenario names; the fleet uses the renamed jet.
    const st = await c.post('/studies', { name: EVIL, siteId: String(siteId), units: 'si', regularUseThreshold: '500', roundingIncrement: '50', passengerMass: '95' });
    expect(st.status).toBe(303);
    const studyId = Number(/\/studies\/(\d+)/.exec(st.headers.get('location')!)![1]);
    const sc = await c.post(`/studies/${studyId}/scenarios`, { name: EVIL });
    const scenarioPath = sc.headers.get('location')!;
    expect((await c.post(scenarioPath, { name: EVIL, rows: '1', r0_aircraft: 'swift-bj8', r0_ops: '1000', r0_stage: '800', r0_payload: '500' })).status).toBe(303);
    const run = await c.post(`/studies/${studyId}/run`, {});
    expect(run.status).toBe(303);

    for (const path of ['/aircraft', '/aircraft/swift-bj8', '/aircraft/swift-bj8/edit', '/aircraft/swift-bj8/delete', '/sites', `/sites/${siteId}`, `/sites/${siteId}/edit`,
      `/sites/${siteId}/runways/0/edit`, '/studies', `/studies/${studyId}`, `/studies/${studyId}/edit`, scenarioPath, `/studies/${studyId}/results`]) {
      const r = await c.get(path);
      expect(r.status, path).toBe(200);
      expectEscaped(r.text, path);
    }
    // The JSON API returns the text as data, not as HTML.
    const api = await c.json('GET', '/api/aircraft/swift-bj8');
    expect(JSON.parse(api.text).name).toBe(EVIL);
    expect(api.headers.get('content-type')).toMatch(/application\/json/);
  });

  it('raw values typed into number fields are echoed escaped in the 422 page', async () => {
    const { app } = makeApp();
    const c = await browser(app);
    const jet = formFields((await c.get('/aircraft/swift-bj8/edit')).text);
    const r = await c.post('/aircraft/swift-bj8', { ...jet, mtow_kg: EVIL }, { htmx: true });
    expect(r.status).toBe(422);
    expectEscaped(r.text, 'aircraft 422');
    const w = await c.get(`/aircraft/swift-bj8/whatif?temperature=${encodeURIComponent(EVIL)}&elevation=0&mass=8000&slope=0&wind=0&surface=dry`);
    expect(w.status).toBe(422);
    expectEscaped(w.text, 'what-if 422');
  });
});
