/**
 * Large catalogues stay bounded (issue 12, finding 2): the catalogue page shows 50 aircraft a page with
 * page links and a server-side search (LIKE with %, _ and \ taken literally), a bad `page` gets a
 * message (never a 500), the JSON API pages with limit/offset, and a scenario's fleet rows offer a
 * text field with a bounded list of suggestions instead of the whole catalogue in every row.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createAircraftMany, pageAircraft, likeContains, countAircraftMatching } from '../../../db/repos/aircraft.js';
import { createSite } from '../../../db/repos/sites.js';
import { addScenario, createStudy } from '../../../db/repos/studies.js';
import { choosePage } from '../../../server/web/paging.js';
import { browser, demoInput, makeApp, type TestApp } from './helpers.js';

const EXTRA = 1200;
let t: TestApp;
let demoCount = 0;
/** Every id in name-then-id order (SQLite's binary collation: plain code-unit comparison). */
let ALL: string[] = [];

beforeAll(() => {
  t = makeApp();
  const base = demoInput().aircraft;
  demoCount = base.length;
  const many = Array.from({ length: EXTRA }, (_, i) => {
    const b = base[i % base.length]!;
    return { ...b, id: `bulk-${String(i).padStart(4, '0')}`, name: `Bulk ${String(i).padStart(4, '0')}` };
  });
  // Names that a LIKE pattern would misread unless %, _ and \ are escaped.
  const b = base[0]!;
  many.push({ ...b, id: 'pct-one', name: 'Ratio 50% wide' });
  many.push({ ...b, id: 'under-one', name: 'Snake_case body' });
  many.push({ ...b, id: 'slash-one', name: 'Back\\slash <b>bold</b>' });
  many.push({ ...b, id: 'plain-one', name: 'Snakeycase body 50x wide' });
  createAircraftMany(t.db, many);
  const cmp = (a: string, b: string) => (a < b ? -1 : a > b ? 1 : 0);
  ALL = [...base, ...many].sort((a, b) => cmp(a.name, b.name) || cmp(a.id, b.id)).map((a) => a.id);
});
afterAll(() => t.sqlite.close());

const rowsOf = (html: string): string[] => [...html.matchAll(/<span class="muted id">([^<]+)<\/span>/g)].map((m) => m[1]!);

describe('catalogue page: paging', () => {
  it('shows the first 50 aircraft in name order with the total and page links that work without JavaScript', async () => {
    const c = await browser(t.app);
    const total = EXTRA + 4 + demoCount;
    const r = await c.get('/aircraft');
    expect(r.status).toBe(200);
    const ids = rowsOf(r.text);
    expect(ids).toEqual(ALL.slice(0, 50));
    expect(r.text).toContain(`${total.toLocaleString('en-US')} aircraft; 1–50 shown`);
    const pages = Math.ceil(total / 50);
    expect(r.text).toContain(`Page 1 of ${pages}`);
    expect(r.text).toContain('href="/aircraft?page=2"');
    expect(r.text).toContain(`href="/aircraft?page=${pages}"`);
    // htmx enhances the same links: they swap the list region and push the URL.
    expect(r.text).toMatch(/<a href="\/aircraft\?page=2" hx-get="\/aircraft\?page=2" hx-target="#aircraft-results"/);
  });

  it('page 2 follows page 1 exactly; the last page holds the remainder', async () => {
    const c = await browser(t.app);
    const two = rowsOf((await c.get('/aircraft?page=2')).text);
    expect(two).toEqual(ALL.slice(50, 100));
    const pages = Math.ceil(ALL.length / 50);
    const last = rowsOf((await c.get(`/aircraft?page=${pages}`)).text);
    expect(last).toEqual(ALL.slice((pages - 1) * 50));
    expect(last.length).toBe(ALL.length - (pages - 1) * 50);
    expect(pageAircraft(t.db, { limit: 10_000, offset: 0 }).map((a) => a.id)).toEqual(ALL);
  });

  it('answers an htmx request aimed at the list with the list region only', async () => {
    const c = await browser(t.app);
    const r = await c.get('/aircraft?page=3', { htmx: true, headers: { 'hx-target': 'aircraft-results' } });
    expect(r.status).toBe(200);
    expect(r.text.startsWith('<div id="aircraft-results"')).toBe(true);
    expect(r.text).not.toContain('<html');
    expect(r.text).not.toContain('Import and export');
    expect(rowsOf(r.text)).toEqual(ALL.slice(100, 150));
  });

  it.each(['abc', '0', '-1', '1.5', '1e3', '99999999999999999999', ' '])('page=%j: a clear message or page 1, never a 500', async (raw) => {
    const c = await browser(t.app);
    const r = await c.get(`/aircraft?page=${encodeURIComponent(raw)}`);
    expect(r.status).toBeLessThan(500);
    expect(rowsOf(r.text)).toEqual(ALL.slice(0, 50));
    if (raw.trim() !== '') {
      expect(r.status).toBe(400);
      expect(r.text).toMatch(/is not a page number: use a whole number from 1 to \d+\. Showing page 1\./);
    }
  });

  it('a page past the end shows the last page with a note', async () => {
    const c = await browser(t.app);
    const r = await c.get('/aircraft?page=5000');
    expect(r.status).toBe(200);
    const pages = Math.ceil((EXTRA + 4 + demoCount) / 50);
    expect(r.text).toContain(`page 5000 is past the end: use a whole number from 1 to ${pages}. Showing page ${pages}.`);
    expect(r.text).toContain(`Page ${pages} of ${pages}`);
  });

  it('choosePage: blank is 1, beyond the end clamps, junk is flagged', () => {
    expect(choosePage(undefined, 0)).toMatchObject({ page: 1, pages: 1, offset: 0, invalid: false });
    expect(choosePage('3', 120, 50)).toMatchObject({ page: 3, pages: 3, offset: 100, invalid: false });
    expect(choosePage('4', 120, 50)).toMatchObject({ page: 3, offset: 100, invalid: false });
    expect(choosePage('x', 120, 50)).toMatchObject({ page: 1, invalid: true });
  });
});

describe('catalogue page: search', () => {
  it('finds aircraft by part of the id or name, case-insensitively, and pages the matches', async () => {
    const c = await browser(t.app);
    const r = await c.get('/aircraft?q=BULK%20011');
    expect(rowsOf(r.text)).toEqual(Array.from({ length: 10 }, (_, i) => `bulk-011${i}`));
    expect(r.text).toContain(`10 of ${(EXTRA + 4 + demoCount).toLocaleString('en-US')} aircraft match “BULK 011”`);
    expect(r.text).toContain('value="BULK 011"');
    const many = await c.get('/aircraft?q=bulk&page=2');
    expect(rowsOf(many.text)[0]).toBe('bulk-0050');
    expect(many.text).toContain('href="/aircraft?q=bulk&amp;page=3"');
    expect((await c.get('/aircraft?q=no-such-thing')).text).toContain('No aircraft match “no-such-thing”');
  });

  it('finds aircraft by certification or engine type', async () => {
    const kind = demoInput().aircraft[0]!.engineType;
    expect(countAircraftMatching(t.db, kind)).toBeGreaterThan(EXTRA / demoInput().aircraft.length);
  });

  it('takes %, _ and \\ literally (escaped LIKE), and escapes the term in the page', async () => {
    expect(likeContains('50%_x\\')).toBe('%50\\%\\_x\\\\%');
    const c = await browser(t.app);
    expect(rowsOf((await c.get(`/aircraft?q=${encodeURIComponent('50%')}`)).text)).toEqual(['pct-one']);
    expect(rowsOf((await c.get(`/aircraft?q=${encodeURIComponent('e_c')}`)).text)).toEqual(['under-one']);
    expect(rowsOf((await c.get(`/aircraft?q=${encodeURIComponent('%')}`)).text)).toEqual(['pct-one']);
    expect(rowsOf((await c.get(`/aircraft?q=${encodeURIComponent('k\\s')}`)).text)).toEqual(['slash-one']);
    const evil = await c.get(`/aircraft?q=${encodeURIComponent('<script>alert(1)</script>')}`);
    expect(evil.status).toBe(200);
    expect(evil.text).not.toContain('<script>alert(1)</script>');
    expect(evil.text).toContain('&lt;script&gt;alert(1)&lt;/script&gt;');
    expect((await c.get('/aircraft?q=%3Cb%3E')).text).not.toContain('<b>bold</b>');
  });
});

describe('JSON API: GET /api/aircraft pages', () => {
  it('gives 100 profiles by default with the total and a Link to the next page', async () => {
    const c = await browser(t.app);
    const r = await c.json('GET', '/api/aircraft');
    expect(r.status).toBe(200);
    const list = JSON.parse(r.text) as { id: string }[];
    expect(list).toHaveLength(100);
    expect(r.headers.get('x-total-count')).toBe(String(EXTRA + 4 + demoCount));
    expect(r.headers.get('link')).toBe('</api/aircraft?limit=100&offset=100>; rel="next"');
  });

  it('honours limit, offset and q; the last page has no next link', async () => {
    const c = await browser(t.app);
    const r = await c.json('GET', '/api/aircraft?limit=5&offset=10&q=bulk');
    expect((JSON.parse(r.text) as { id: string }[]).map((a) => a.id)).toEqual(['bulk-0010', 'bulk-0011', 'bulk-0012', 'bulk-0013', 'bulk-0014']);
    expect(r.headers.get('x-total-count')).toBe(String(EXTRA));
    const end = await c.json('GET', `/api/aircraft?limit=1000&offset=${EXTRA - 3}&q=bulk`);
    expect(JSON.parse(end.text)).toHaveLength(3);
    expect(end.headers.get('link')).toBeNull();
  });

  it.each(['limit=0', 'limit=1001', 'limit=ten', 'offset=-1', 'offset=1.5'])('%s: 400 naming the parameter and its range', async (q) => {
    const c = await browser(t.app);
    const r = await c.json('GET', `/api/aircraft?${q}`);
    expect(r.status).toBe(400);
    const body = JSON.parse(r.text) as { message: string };
    expect(body.message).toMatch(new RegExp(`^${q.split('=')[0]}: ".*" is not allowed; use a whole number from [01] to `));
  });
});

describe('fleet rows with a large catalogue', () => {
  it('offer a text field with a bounded list of suggestions, not the whole catalogue in every row', async () => {
    const c = await browser(t.app);
    const sid = addScenario(t.db, t.studyId, { name: 'Big catalogue', fleet: [] });
    const path = `/studies/${t.studyId}/scenarios/${sid}`;
    const r = await c.get(path);
    expect(r.status).toBe(200);
    expect(r.text).not.toContain('<select id="f-r0_aircraft"');
    expect(r.text).toMatch(/<input id="f-r0_aircraft" name="r0_aircraft" type="text" list="aircraft-choices"/);
    const options = r.text.match(/<option value=/g)?.length ?? 0;
    expect(options).toBeLessThanOrEqual(100 + 20); // the suggestions plus the page's few other selects
    expect(r.text.length).toBeLessThan(150_000);
    // Typing an id (no JavaScript needed) saves the row; an unknown id is refused by name.
    const ok = await c.post(path, { name: 'Big catalogue', rows: '1', r0_aircraft: 'bulk-0777', r0_ops: '1000', r0_stage: '500', r0_payload: '100' });
    expect(ok.status).toBe(303);
    const again = await c.get(path);
    expect(again.text).toContain('value="bulk-0777"');
    expect(again.text).toContain('<span class="muted small aircraft-name">Bulk 0777</span>');
    const bad = await c.post(path, { name: 'Big catalogue', rows: '1', r0_aircraft: 'bulk-9999', r0_ops: '1000', r0_stage: '500', r0_payload: '100' });
    expect(bad.status).toBe(422);
    expect(bad.text).toContain('&quot;bulk-9999&quot; is not in the catalogue');
  });

  it('the study overview shows the first 10 rows of a long fleet and links to the rest', async () => {
    const c = await browser(t.app);
    const fleet = Array.from({ length: 15 }, (_, i) => ({ aircraft: `bulk-${String(i).padStart(4, '0')}`, annualOperations: 100 + i, stageLength_km: 500, payload_kg: 100 }));
    const sid = addScenario(t.db, t.studyId, { name: 'Long fleet', fleet });
    const r = await c.get(`/studies/${t.studyId}`);
    expect(r.status).toBe(200);
    const section = r.text.slice(r.text.indexOf(`id="scenario-${sid}"`));
    const shown = section.slice(0, section.indexOf('</table>'));
    expect(shown).toContain('Bulk 0009');
    expect(shown).not.toContain('Bulk 0010');
    expect(shown).toContain(`… and 5 more rows (15 in all, ${fleet.reduce((n, x) => n + x.annualOperations, 0).toLocaleString('en-US')} annual operations)`);
    expect(shown).toContain(`href="/studies/${t.studyId}/scenarios/${sid}">see every row`);
  });

  it('the suggestions follow what is typed (htmx fragment of the datalist)', async () => {
    const c = await browser(t.app);
    const r = await c.get('/aircraft/_choices?r3_aircraft=bulk%20012', { htmx: true });
    expect(r.status).toBe(200);
    expect(r.text.startsWith('<datalist id="aircraft-choices">')).toBe(true);
    expect([...r.text.matchAll(/<option value="([^"]+)"/g)].map((m) => m[1])).toEqual(Array.from({ length: 10 }, (_, i) => `bulk-012${i}`));
    const all = await c.get('/aircraft/_choices?q=', { htmx: true });
    expect(all.text.match(/<option /g)).toHaveLength(100);
  });
});

describe('studies and sites lists page too', () => {
  it('show 50 a page with page links; a bad page gets a message', async () => {
    const u = makeApp();
    try {
      const demo = demoInput();
      for (let i = 0; i < 60; i++) createSite(u.db, { ...demo.site, name: `Site ${String(i).padStart(2, '0')}` });
      for (let i = 0; i < 60; i++) createStudy(u.db, { name: `Study ${String(i).padStart(2, '0')}`, siteId: u.siteId, options: demo.options, scenarios: [] });
      const c = await browser(u.app);
      for (const [path, what] of [['/studies', 'studies'], ['/sites', 'sites']] as const) {
        const one = await c.get(path);
        expect(one.status).toBe(200);
        expect(one.text).toContain(`61 ${what}; 1–50 shown`);
        expect(one.text).toContain(`href="${path}?page=2"`);
        const two = await c.get(`${path}?page=2`);
        expect(two.text).toContain(`61 ${what}; 51–61 shown`);
        expect(two.text).toContain('Page 2 of 2');
        const bad = await c.get(`${path}?page=zz`);
        expect(bad.status).toBe(400);
        expect(bad.text).toContain('page &quot;zz&quot; is not a page number: use a whole number from 1 to 2. Showing page 1.');
      }
    } finally {
      u.sqlite.close();
    }
  });
});
