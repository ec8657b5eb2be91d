/**
 * Site routes: the twelve monthly values and the design temperature by both hottest-month criteria
 * (ICAO Annex 14 Vol. I 2.4.1: mean daily maximum of the month with the highest monthly mean; and the
 * month with the highest mean daily maximum — both reported, ICAO Annex 14 Vol I §2.4.1–2.4.2 as cited in
 * core/climate/design.ts), runways with profile and declared distances, the station-file import
 * (run through the worker pool here), and the 422s. Expected values are derived from the invented
 * inputs; °F → °C by (F − 32)·5/9 (core/units.ts).
 */
import { afterAll, describe, expect, it } from 'vitest';
import { getSite } from '../../../db/index.js';
import { workerJobs } from '../../../server/jobs/index.js';
import { expectClose } from '../../helpers/close.js';
import { browser, makeApp } from './helpers.js';

/** Invented monthly values: July has the highest mean (28.0 °C), August the highest mean maximum (35 °C). */
function months(): Record<string, string> {
  const max = [14, 16, 20, 24, 28, 32, 34, 35, 30, 25, 19, 15];
  const min = [1, 2, 5, 9, 13, 18, 22, 18, 15, 10, 5, 2];
  const out: Record<string, string> = {};
  for (let m = 1; m <= 12; m++) { out[`m${m}_max`] = String(max[m - 1]); out[`m${m}_min`] = String(min[m - 1]); }
  return out;
}

const jobs = workerJobs({ size: 1 });
afterAll(() => jobs.close());

describe('sites: climate and design temperature', () => {
  it('saves twelve months (303) and shows the design temperature by both criteria, flagging that they differ', async () => {
    const { app, db } = makeApp();
    const c = await browser(app);
    const r = await c.post('/sites', { name: 'Invented Field', elevation: '250', climateSource: 'Invented normals', climateYears: '30', ...months() });
    expect(r.status).toBe(303);
    const id = Number(/\/sites\/(\d+)/.exec(r.headers.get('location')!)![1]);
    expect(getSite(db, id)!.climate!.monthly).toHaveLength(12);
    const page = (await c.get(`/sites/${id}`)).text;
    // Hottest month by mean temperature: July, mean (34 + 22)/2 = 28 °C; ART = its mean daily max 34 °C (derived).
    expect(page).toMatch(/Design temperature: <strong>34\.0 °C<\/strong>/);
    expect(page).toMatch(/July \(mean 28\.0 °C\)/);
    // Highest mean daily maximum: August, 35 °C (derived).
    expect(page).toMatch(/August<\/td><td class="num">35\.0 °C/);
    expect(page).toContain('The two criteria pick different months');
    expect(page).toContain('id="chart-climate"');
    expect(page).toContain('Monthly temperatures at Invented Field');
  });

  it('monthly values typed in °F are converted at the edge', async () => {
    const { app, db } = makeApp();
    const c = await browser(app);
    await c.post('/preferences/units', { units: 'us', back: '/sites' });
    const f: Record<string, string> = {};
    for (let m = 1; m <= 12; m++) { f[`m${m}_max`] = '95'; f[`m${m}_min`] = '59'; }
    const r = await c.post('/sites', { name: 'Hot plain', elevation: '1000', climateSource: 'invented', ...f });
    expect(r.status).toBe(303);
    const id = Number(/\/sites\/(\d+)/.exec(r.headers.get('location')!)![1]);
    const s = getSite(db, id)!;
    expectClose(s.climate!.monthly[0]!.meanMax_c, 35, { abs: 1e-9 }, '95 °F (derived)');
    expectClose(s.elevation_m, 304.8, { abs: 1e-9 }, '1000 ft (derived, exact factor)');
  });

  it('an incomplete table answers 422 naming the month, with the raw values kept', async () => {
    const { app } = makeApp();
    const c = await browser(app);
    const m = months();
    delete m.m3_max;
    const r = await c.post('/sites', { name: 'Gap', elevation: 'high', climateSource: 'x', ...m, m5_min: '-' });
    expect(r.status).toBe(422);
    expect(r.text).toContain('March mean daily maximum</a>: missing');
    expect(r.text).toContain('&quot;high&quot; is not a number; allowed -400 to 4500 m');
    expect(r.text).toContain('value="high"');
  });
});

describe('sites: runways', () => {
  it('adds a runway with its profile and declared distances, and shows gradient, stopway and clearway', async () => {
    const { app, db, siteId } = makeApp();
    const c = await browser(app);
    const r = await c.post(`/sites/${siteId}/runways`, {
      name: '18/36', pavement: 'paved', profile: '0, 1340\n1000 1345\n2000\t1344',
      d0_designator: '18', d0_tora: '2000', d0_toda: '2200', d0_asda: '2100', d0_lda: '1900',
      d1_designator: '36', d1_tora: '2000', d1_toda: '2000', d1_asda: '2000', d1_lda: '2000',
    });
    expect(r.status).toBe(303);
    const site = getSite(db, siteId)!;
    const rw = site.runways.at(-1)!;
    expect(rw.profile).toEqual([{ chainage_m: 0, elevation_m: 1340 }, { chainage_m: 1000, elevation_m: 1345 }, { chainage_m: 2000, elevation_m: 1344 }]);
    const page = (await c.get(`/sites/${siteId}`)).text;
    // Effective gradient (1345 − 1340)/2000 = 0.25 % (derived); clearway 200 m, stopway 100 m (derived).
    expect(page).toContain('Effective gradient: +0.25 %');
    expect(page).toMatch(/<th scope="row">18<\/th><td class="num">2,000 m<\/td><td class="num">2,200 m<\/td><td class="num">2,100 m<\/td><td class="num">1,900 m<\/td><td class="num">100 m<\/td><td class="num">200 m<\/td>/);
    expect(page).toContain(`id="chart-profile-${site.runways.length - 1}"`);
  });

  it('refuses a profile that goes backwards and declared distances against the rules (422)', async () => {
    const { app, siteId } = makeApp();
    const c = await browser(app);
    const r = await c.post(`/sites/${siteId}/runways`, {
      name: 'X', pavement: 'paved', profile: '0 100\n500 101\n400 102',
      d0_designator: '09', d0_tora: '2000', d0_toda: '1900', d0_asda: '2000', d0_lda: '2000',
    });
    expect(r.status).toBe(422);
    expect(r.text).toMatch(/Centreline profile<\/a>:/);
    const bad = await c.post(`/sites/${siteId}/runways`, { name: 'X', pavement: 'paved', profile: 'zero 100\n500 101', d0_designator: '99' });
    expect(bad.status).toBe(422);
    expect(bad.text).toContain('line 1: chainage &quot;zero&quot; is not a number');
    expect(bad.text).toContain('value="99"');
  });

  it('deletes a runway after confirmation; a site a study uses cannot be deleted', async () => {
    const { app, db, siteId } = makeApp();
    const c = await browser(app);
    const n = getSite(db, siteId)!.runways.length;
    expect((await c.get(`/sites/${siteId}/runways/1/delete`)).text).toContain('Yes, delete runway');
    expect((await c.post(`/sites/${siteId}/runways/1/delete`, { confirm: 'yes' })).status).toBe(303);
    expect(getSite(db, siteId)!.runways).toHaveLength(n - 1);
    expect((await c.get(`/sites/${siteId}/delete`)).text).toContain('cannot be deleted');
    expect((await c.post(`/sites/${siteId}/delete`, { confirm: 'yes' })).status).toBe(409);
  });
});

describe('sites: station-file import (worker thread)', () => {
  const header = '"STATION","DATE","NAME","MLY-TAVG-NORMAL","MLY-TMAX-NORMAL","MLY-TMIN-NORMAL"';
  const rows = (n: number) => Array.from({ length: n }, (_, i) => `"XX000099999","${String(i + 1).padStart(2, '0')}","INVENTED FIELD","77","95","59"`);

  it('imports monthly normals (°F) into the site: 95 °F → 35 °C (derived)', async () => {
    const { app, db, siteId } = makeApp({ jobs });
    const c = await browser(app);
    const r = await c.upload(`/sites/${siteId}/climate/import`, { format: 'monthly-normals' }, { name: 'normals.csv', text: [header, ...rows(12)].join('\n') + '\n' });
    expect(r.status).toBe(303);
    expect(r.headers.get('location')).toBe(`/sites/${siteId}?notice=climate`);
    expectClose(getSite(db, siteId)!.climate!.monthly[6]!.meanMax_c, 35, { abs: 1e-9 }, 'July');
  });

  it('a file with a missing month is rejected with the reason; the climate is unchanged', async () => {
    const { app, db, siteId } = makeApp({ jobs });
    const c = await browser(app);
    const before = getSite(db, siteId)!.climate;
    const r = await c.upload(`/sites/${siteId}/climate/import`, { format: 'monthly-normals' }, { name: 'normals.csv', text: [header, ...rows(11)].join('\n') + '\n' });
    expect(r.status).toBe(422);
    expect(r.text).toContain('no usable values for December');
    expect(getSite(db, siteId)!.climate).toEqual(before);
  });
});
