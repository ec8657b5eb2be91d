/**
 * Route tests (app.request): one URL gives the whole page or, for htmx, its main region; every view
 * showing a length carries the caution; navigation and status codes.
 */
import { describe, expect, it } from 'vitest';
import { CAUTION_TEXT } from '../../../core/index.js';
import { browser, makeApp } from './helpers.js';

describe('page or fragment (one URL, two shapes)', () => {
  it('a plain request gets the whole page; an htmx request gets only the main region, with its title', async () => {
    const { app } = makeApp();
    const c = await browser(app);
    const full = await c.get('/aircraft');
    expect(full.status).toBe(200);
    expect(full.text.startsWith('<!doctype html>')).toBe(true);
    expect(full.text).toContain('<header class="top">');
    expect(full.headers.get('vary')).toMatch(/HX-Request/i);

    const frag = await c.get('/aircraft', { htmx: true });
    expect(frag.status).toBe(200);
    expect(frag.text).not.toContain('<html');
    expect(frag.text).not.toContain('<header');
    expect(frag.text).toMatch(/^<title>Aircraft · Runwright<\/title><main id="main"/);
    expect(frag.headers.get('vary')).toMatch(/HX-Request/i);
  });

  it('a boosted htmx request gets the whole page', async () => {
    const { app } = makeApp();
    const c = await browser(app);
    const r = await c.get('/sites', { htmx: true, headers: { 'hx-boosted': 'true' } });
    expect(r.text.startsWith('<!doctype html>')).toBe(true);
  });

  it('pages are not cached (they carry the CSRF token)', async () => {
    const { app } = makeApp();
    const c = await browser(app);
    expect((await c.get('/studies')).headers.get('cache-control')).toBe('no-store');
  });

  it('unknown pages and ids answer 404 pages', async () => {
    const { app } = makeApp();
    const c = await browser(app);
    expect((await c.get('/nowhere')).status).toBe(404);
    expect((await c.get('/aircraft/not-there')).status).toBe(404);
    expect((await c.get('/sites/999')).status).toBe(404);
    expect((await c.get('/studies/abc')).status).toBe(404);
  });
});

describe('the caution travels with every view that shows a length', () => {
  it('catalogue, aircraft, site, study and results pages, full and as fragments', async () => {
    const { app, studyId, siteId } = makeApp();
    const c = await browser(app);
    await c.post(`/studies/${studyId}/run`, {});
    for (const path of ['/', '/aircraft', '/aircraft/tern-rj90', '/sites', `/sites/${siteId}`, '/studies', `/studies/${studyId}`, `/studies/${studyId}/results`]) {
      for (const htmx of [false, true]) {
        const r = await c.get(path, { htmx });
        expect(r.status, path).toBe(200);
        expect(r.text, `${path} htmx=${htmx}`).toContain(CAUTION_TEXT.slice(0, 60));
      }
    }
  });
});
