/**
 * Aircraft catalogue routes: create (303), edit, duplicate, delete with confirmation, 422 with field
 * errors and the raw typed values, US-unit input converted at the edge, CSV/JSON import and export.
 * Conversion factors: international foot 0.3048 m and pound 0.45359237 kg (1959 agreement; core/units.ts).
 */
import { describe, expect, it } from 'vitest';
import { getAircraft } from '../../../db/index.js';
import { expectClose } from '../../helpers/close.js';
import { browser, demoInput, formFields, makeApp } from './helpers.js';

/** The form fields of the demo business jet, as its edit page shows them. */
async function jetForm(c: Awaited<ReturnType<typeof browser>>, units?: 'us') {
  const r = await c.get(`/aircraft/swift-bj8/edit${units ? '?units=us' : ''}`);
  expect(r.status).toBe(200);
  return formFields(r.text);
}

describe('aircraft create, edit, duplicate, delete', () => {
  it('saving an unchanged edit form answers 303 and leaves the profile as it was (SI)', async () => {
    const { app, db } = makeApp();
    const c = await browser(app);
    const before = getAircraft(db, 'swift-bj8')!;
    const fields = await jetForm(c);
    const r = await c.post('/aircraft/swift-bj8', fields);
    expect(r.status).toBe(303);
    expect(r.headers.get('location')).toBe('/aircraft/swift-bj8?saved=1');
    const after = getAircraft(db, 'swift-bj8')!;
    expectClose(after.mtow_kg, before.mtow_kg, { rel: 1e-9 }, 'mtow');
    expectClose(after.staticThrust_N!, before.staticThrust_N!, { rel: 1e-8 }, 'thrust');
    expectClose(after.cruise!.speed_mps, before.cruise!.speed_mps, { rel: 1e-8 }, 'cruise speed');
  });

  it('a form filled in US units is converted at the edge (lb → kg, ft → m)', async () => {
    const { app, db } = makeApp();
    const c = await browser(app);
    const fields = await jetForm(c, 'us');
    expect(fields._units).toBe('us');
    const mtowLb = Math.round(Number(fields.mtow_kg)) + 100;
    const r = await c.post('/aircraft/swift-bj8', { ...fields, mtow_kg: String(mtowLb), wingspan_m: '50' });
    expect(r.status).toBe(303);
    const a = getAircraft(db, 'swift-bj8')!;
    expectClose(a.mtow_kg, mtowLb * 0.45359237, { rel: 1e-12 }, 'mtow from lb (derived: exact factor)');
    expectClose(a.wingspan_m, 50 * 0.3048, { rel: 1e-12 }, 'span from ft (derived: exact factor)');
  });

  it('a new aircraft is created with 303 to its page; a taken id is a field error (422)', async () => {
    const { app, db } = makeApp();
    const c = await browser(app);
    const fields = { ...(await jetForm(c)), id: 'swift-bj9', name: 'Swift BJ-9 (invented)' };
    const r = await c.post('/aircraft', fields);
    expect(r.status).toBe(303);
    expect(r.headers.get('location')).toBe('/aircraft/swift-bj9?saved=1');
    expect(getAircraft(db, 'swift-bj9')?.name).toBe('Swift BJ-9 (invented)');
    const again = await c.post('/aircraft', fields);
    expect(again.status).toBe(422);
    expect(again.text).toContain('is already in the catalogue');
  });

  it('bad numbers answer 422 with the field errors and the raw values typed, in the user units', async () => {
    const { app, db } = makeApp();
    const c = await browser(app);
    const fields = await jetForm(c);
    const r = await c.post('/aircraft/swift-bj8', { ...fields, mtow_kg: 'heavy', wingspan_m: '2', oswald: '' });
    expect(r.status).toBe(422);
    expect(r.text).toContain('value="heavy"');
    expect(r.text).toContain('&quot;heavy&quot; is not a number; allowed 300 to 600000 kg');
    expect(r.text).toContain('2 is out of range; allowed 5 to 85 m');
    expect(r.text).toMatch(/Oswald factor<\/a>: missing/);
    expect(r.text).toContain('aria-invalid="true"');
    expect(getAircraft(db, 'swift-bj8')!.name).toBe(demoInput().aircraft.find((a) => a.id === 'swift-bj8')!.name);
    // The same in US units: the range is stated in pounds.
    const us = await jetForm(c, 'us');
    const r2 = await c.post('/aircraft/swift-bj8', { ...us, mtow_kg: '100' });
    expect(r2.status).toBe(422);
    expect(r2.text).toMatch(/100 is out of range; allowed 661\.4 to 1322773\.6 lb/);
  });

  it('cross-field rules come back as field errors (OEW below MLW)', async () => {
    const { app } = makeApp();
    const c = await browser(app);
    const fields = await jetForm(c);
    const r = await c.post('/aircraft/swift-bj8', { ...fields, oew_kg: String(Number(fields.mlw_kg) + 10) });
    expect(r.status).toBe(422);
    expect(r.text).toMatch(/less than the maximum landing mass/);
  });

  it('an htmx save answers 422 with the main region only and no history entry', async () => {
    const { app } = makeApp();
    const c = await browser(app);
    const fields = await jetForm(c);
    const r = await c.post('/aircraft/swift-bj8', { ...fields, mtow_kg: '' }, { htmx: true });
    expect(r.status).toBe(422);
    expect(r.text).not.toContain('<html');
    expect(r.text).toContain('<main id="main"');
    expect(r.headers.get('hx-push-url')).toBe('false');
  });

  it('duplicate makes a copy under a new id and opens its form', async () => {
    const { app, db } = makeApp();
    const c = await browser(app);
    const r = await c.post('/aircraft/kestrel-ut1/duplicate', {});
    expect(r.status).toBe(303);
    expect(r.headers.get('location')).toBe('/aircraft/kestrel-ut1-copy/edit');
    expect(getAircraft(db, 'kestrel-ut1-copy')?.mtow_kg).toBe(getAircraft(db, 'kestrel-ut1')!.mtow_kg);
  });

  it('delete asks first, deletes on confirmation, and refuses an aircraft a study uses (409)', async () => {
    const { app, db } = makeApp();
    const c = await browser(app);
    await c.post('/aircraft/kestrel-ut1/duplicate', {});
    const ask = await c.get('/aircraft/kestrel-ut1-copy/delete');
    expect(ask.text).toContain('Yes, delete aircraft');
    const noConfirm = await c.post('/aircraft/kestrel-ut1-copy/delete', {});
    expect(noConfirm.status).toBe(303);
    expect(noConfirm.headers.get('location')).toBe('/aircraft/kestrel-ut1-copy/delete');
    expect(getAircraft(db, 'kestrel-ut1-copy')).toBeDefined();
    const yes = await c.post('/aircraft/kestrel-ut1-copy/delete', { confirm: 'yes' });
    expect(yes.status).toBe(303);
    expect(getAircraft(db, 'kestrel-ut1-copy')).toBeUndefined();

    const used = await c.get('/aircraft/kestrel-ut1/delete');
    expect(used.text).toContain('cannot be deleted');
    expect(used.text).not.toContain('Yes, delete aircraft');
    const forced = await c.post('/aircraft/kestrel-ut1/delete', { confirm: 'yes' });
    expect(forced.status).toBe(409);
    expect(getAircraft(db, 'kestrel-ut1')).toBeDefined();
  });
});

describe('catalogue list, import and export', () => {
  it('lists every aircraft with key figures and classification', async () => {
    const { app } = makeApp();
    const c = await browser(app);
    const r = await c.get('/aircraft');
    for (const a of demoInput().aircraft) expect(r.text).toContain(a.name);
    // Classification columns: a code like "4C" and an approach category letter appear.
    expect(r.text).toMatch(/<td>[1-4][A-F]<\/td>/);
  });

  it('exports CSV and JSON as downloads', async () => {
    const { app } = makeApp();
    const c = await browser(app);
    const csv = await c.get('/aircraft/export.csv');
    expect(csv.headers.get('content-type')).toMatch(/text\/csv/);
    expect(csv.headers.get('content-disposition')).toMatch(/attachment; filename="aircraft.csv"/);
    expect(csv.text.split('\n')[0]).toMatch(/^id,name,group,/);
    const json = await c.get('/aircraft/export.json');
    expect(JSON.parse(json.text)).toHaveLength(demoInput().aircraft.length);
  });

  it('a bad CSV is rejected with line and column, nothing imported (422); a good one imports (303)', async () => {
    const { app, db } = makeApp();
    const c = await browser(app);
    const csv = (await c.get('/aircraft/export.csv')).text;
    const lines = csv.trimEnd().split('\n');
    const header = lines[0]!.split(',');
    const row = lines.find((l) => l.startsWith('swift-bj8,'))!;
    const cells = row.split(',');
    cells[0] = 'swift-new';
    const bad = [...cells];
    bad[header.indexOf('mtow_kg')] = '12';
    const badCsv = `${lines[0]}\n${bad.join(',')}\n`;
    const r = await c.upload('/aircraft/import', { format: 'csv' }, { name: 'bad.csv', text: badCsv });
    expect(r.status).toBe(422);
    expect(r.text).toContain('line 2, column &quot;mtow_kg&quot;: 12 is out of range');
    expect(getAircraft(db, 'swift-new')).toBeUndefined();
    const ok = await c.upload('/aircraft/import', { format: 'auto' }, { name: 'good.csv', text: `${lines[0]}\n${cells.join(',')}\n` });
    expect(ok.status).toBe(303);
    expect(ok.headers.get('location')).toBe('/aircraft?imported=1');
    expect(getAircraft(db, 'swift-new')).toBeDefined();
  });

  it('a JSON catalogue with a bad value is rejected with its line and path', async () => {
    const { app, db } = makeApp();
    const c = await browser(app);
    const list = JSON.parse((await c.get('/aircraft/export.json')).text) as Record<string, unknown>[];
    const one = { ...list[0]!, id: 'json-one', mtow_kg: 'heavy' };
    const text = JSON.stringify([one], null, 2);
    const r = await c.upload('/aircraft/import', { format: 'json' }, { name: 'cat.json', text, type: 'application/json' });
    expect(r.status).toBe(422);
    expect(r.text).toMatch(/line \d+, column \d+, at \[0\]\.mtow_kg/);
    expect(getAircraft(db, 'json-one')).toBeUndefined();
  });
});

describe('aircraft what-if panel', () => {
  it('answers the result region for htmx, 422 with out-of-band field errors for bad input', async () => {
    const { app } = makeApp();
    const c = await browser(app);
    const q = (t: string) => `/aircraft/tern-rj90/whatif?units=si&temperature=${t}&elevation=500&mass=32000&slope=0&wind=0&surface=dry`;
    const cool = await c.get(q('15'), { htmx: true });
    const hot = await c.get(q('35'), { htmx: true });
    expect(cool.status).toBe(200);
    expect(cool.text).toMatch(/^<div id="whatif-result"/);
    const takeoff = (html: string) => Number(/<th scope="row">Takeoff<\/th><td class="num">([\d,]+) m/.exec(html)![1]!.replace(/,/g, ''));
    // Property (design brief, "Calculation methods"): the takeoff requirement grows with temperature.
    expect(takeoff(hot.text)).toBeGreaterThan(takeoff(cool.text));
    expect(cool.text).toMatch(/data-testid="whatif-required">[\d,]+ m/);
    const bad = await c.get(q('abc'), { htmx: true });
    expect(bad.status).toBe(422);
    expect(bad.text).toContain('id="e-wi-temperature" hx-swap-oob="true">&quot;abc&quot; is not a number; allowed -60 to 60 °C');
  });

  it('works without JavaScript: the GET form gives the whole page with the values typed', async () => {
    const { app } = makeApp();
    const c = await browser(app);
    const r = await c.get('/aircraft/tern-rj90/whatif?units=us&temperature=80&elevation=1000&mass=70000&slope=0.5&wind=-5&surface=wet');
    expect(r.status).toBe(200);
    expect(r.text).toContain('<!doctype html>');
    expect(r.text).toContain('value="80"');
    expect(r.text).toMatch(/data-testid="whatif-required">[\d,]+ ft/);
  });
});
