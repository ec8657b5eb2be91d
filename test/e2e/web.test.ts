/**
 * End to end in headless Chromium (Debian's /usr/bin/chromium, driven by playwright-core; no browser
 * is downloaded): the real server in-process on 127.0.0.1, port 0, over a temporary database file
 * seeded with the invented demo, long computations in a worker thread.
 *
 * Flow: create an aircraft through the form; build a study with two scenarios; see the critical
 * aircraft and the recommended length; change the temperature in the what-if panel and see the number
 * change; import a bad CSV and see the error; download the results CSV. Screenshots go to
 * screenshots/ (git-ignored).
 */
import { serve, type ServerType } from '@hono/node-server';
import { mkdirSync, mkdtempSync, readFileSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import type { AddressInfo } from 'node:net';
import { chromium, type BrowserContext, type Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { openDatabase, seedDemoIfEmpty, type DatabaseHandle } from '../../db/index.js';
import { createApp } from '../../server/app.js';
import { workerJobs, type JobRunner } from '../../server/jobs/index.js';
import { AIRCRAFT_FORM_FIELDS } from '../../templates/aircraft/fields.js';
import { aircraftFormValues } from '../../templates/aircraft/pages.js';
import { demoInput } from '../server/web/helpers.js';

const SHOTS = new URL('../../screenshots', import.meta.url).pathname;

let dir: string;
let handle: DatabaseHandle;
let jobs: JobRunner;
let server: ServerType;
let base: string;
let context: BrowserContext;
let page: Page;

beforeAll(async () => {
  dir = mkdtempSync(join(tmpdir(), 'runwright-e2e-'));
  mkdirSync(SHOTS, { recursive: true });
  const dbFile = join(dir, 'e2e.sqlite');
  handle = openDatabase(dbFile);
  seedDemoIfEmpty(handle.db, demoInput());
  jobs = workerJobs({ size: 1 });
  const app = createApp({ db: handle.db, clock: () => new Date(), jobs });
  server = await new Promise<ServerType>((resolve) => {
    const s = serve({ fetch: app.fetch, port: 0, hostname: '127.0.0.1' }, () => resolve(s));
  });
  base = `http://127.0.0.1:${(server.address() as AddressInfo).port}`;
  context = await chromium.launchPersistentContext(join(dir, 'profile'), {
    executablePath: '/usr/bin/chromium',
    headless: true,
    acceptDownloads: true,
    viewport: { width: 1280, height: 900 },
    args: ['--headless', '--no-sandbox', '--disable-gpu', '--disable-quic', '--no-first-run', '--disable-background-networking', '--disable-component-update', '--disable-sync'],
  });
  page = context.pages()[0] ?? (await context.newPage());
  page.setDefaultTimeout(15_000);
  page.on('console', (m) => { if (m.type() === 'error') consoleErrors.push(`${m.text()} [${page.url()} ${JSON.stringify(m.location())}]`); });
  page.on('pageerror', (e) => consoleErrors.push(e.message));
});

/** Errors the browser reported (script errors, content-security-policy refusals, failed loads). */
const consoleErrors: string[] = [];

afterAll(async () => {
  await context?.close();
  await new Promise<void>((resolve) => (server ? server.close(() => resolve()) : resolve()));
  await jobs?.close();
  handle?.sqlite.close();
  rmSync(dir, { recursive: true, force: true });
});

const shot = (name: string) => page.screenshot({ path: join(SHOTS, `${name}.png`), fullPage: true });

/** Text of the first element matching `selector` (polled by expect.poll). */
const textOf = (selector: string) => async () => (await page.locator(selector).first().textContent()) ?? '';
const valueOf = (selector: string) => async () => page.locator(selector).first().inputValue();
const visible = (selector: string) => async () => page.locator(selector).first().isVisible();
const POLL = { timeout: 15_000, interval: 100 };

describe('the planner in a browser', () => {
  it('creates an aircraft through the grouped form', async () => {
    const template = demoInput().aircraft.find((a) => a.id === 'heron-st1')!;
    await page.goto(`${base}/aircraft/new`);
    await page.fill('#f-id', 'heron-st2');
    await page.fill('#f-name', 'Heron ST-2 (invented)');
    await page.selectOption('#f-certification', template.certification);
    await page.selectOption('#f-engineType', template.engineType);
    await page.selectOption('#f-gear', template.gear);
    // Every number as the form shows it for this profile (display units: kN, kW, kt, ...).
    const values = aircraftFormValues({ ...template, id: 'heron-st2', name: 'Heron ST-2 (invented)' }, 'si');
    for (const f of AIRCRAFT_FORM_FIELDS) {
      const v = values[f.name];
      if (v) await page.fill(`[id="f-${f.name.replace(/\./g, '-')}"]`, v);
    }
    await shot('01-aircraft-form');
    await page.click('button:has-text("Save aircraft")');
    await page.waitForURL(/\/aircraft\/heron-st2\?saved=1$/);
    await expect.poll(textOf('h1'), POLL).toContain('Heron ST-2');
    await expect.poll(textOf('.notice-ok'), POLL).toContain('Saved');
    await shot('02-aircraft-saved');
  });

  it('shows field errors in place (422 swapped by htmx) and keeps the typed value', async () => {
    await page.goto(`${base}/aircraft/heron-st2/edit`);
    await page.fill('#f-mtow_kg', 'heavy');
    await page.click('button:has-text("Save aircraft")');
    await expect.poll(textOf('.error-summary'), POLL).toContain('"heavy" is not a number');
    await expect.poll(valueOf('#f-mtow_kg'), POLL).toBe('heavy');
    await shot('03-aircraft-422');
  });

  it('builds a study with two scenarios and sees the critical aircraft and the recommended length', async () => {
    await page.goto(`${base}/studies/new`);
    await page.fill('#f-name', 'Browser study');
    await page.selectOption('#f-siteId', { index: 1 });
    await page.click('button:has-text("Save study")');
    await page.waitForURL(/\/studies\/\d+\?notice=created$/);
    const studyUrl = page.url().replace(/\?.*$/, '');

    const addScenario = async (name: string, rows: [string, string, string, string][]) => {
      await page.goto(studyUrl);
      await page.fill('#f-new-scenario', name);
      await page.click('button:has-text("Add scenario")');
      await page.waitForURL(/\/scenarios\/\d+$/);
      for (const [i, [aircraft, ops, stage, payload]] of rows.entries()) {
        await page.selectOption(`#f-r${i}_aircraft`, aircraft);
        await page.fill(`#f-r${i}_ops`, ops);
        await page.fill(`#f-r${i}_stage`, stage);
        await page.fill(`#f-r${i}_payload`, payload);
      }
      await page.click('button:has-text("Save scenario")');
      await page.waitForURL(/\/studies\/\d+\?notice=saved$/);
    };
    await addScenario('Today', [['kestrel-ut1', '2400', '150', '200'], ['heron-st2', '1200', '500', '1000'], ['curlew-rt70', '1600', '600', '5000']]);
    await addScenario('With jets', [['curlew-rt70', '2000', '700', '5000'], ['tern-rj90', '900', '900', '7000']]);
    await shot('04-study-overview');

    await page.click('a:has-text("Results")');
    // The page computes on load (worker thread) and swaps in the results.
    await expect.poll(visible('[data-testid="recommended-1"]'), { ...POLL, timeout: 30_000 }).toBe(true);
    await expect.poll(textOf('[data-testid="critical-0"]'), POLL).toBe('Curlew RT-70');
    await expect.poll(textOf('[data-testid="critical-1"]'), POLL).toBe('Tern RJ-90');
    expect(await textOf('[data-testid="recommended-1"]')()).toMatch(/^[\d,]+ m \([\d,]+ ft\)$/);
    expect(page.url()).toMatch(/\/results$/);
    await shot('05-results');
    await page.locator('table.existing').first().screenshot({ path: join(SHOTS, '05b-existing-runways.png') });
    await page.locator('.charts').screenshot({ path: join(SHOTS, '05c-charts.png') });
  });

  it('opens the components of a row on demand', async () => {
    await page.locator('table.results a:has-text("Components")').first().click();
    await expect.poll(textOf('.components'), POLL).toContain('Design mass from the route');
  });

  it('changes the temperature in the what-if panel and sees the requirement change', async () => {
    const result = page.locator('[data-testid="whatif-required"]');
    await result.scrollIntoViewIfNeeded();
    await page.selectOption('#f-wi-aircraft', 'tern-rj90');
    await expect.poll(valueOf('#wi-prev'), POLL).toBe('tern-rj90');
    await page.fill('#f-wi-mass', '34000');
    await page.fill('#f-wi-temperature', '10');
    // Wait until the panel shows the answer for 10 °C (the request is debounced), then change it.
    await expect.poll(async () => page.url() && (await valueOf('#f-wi-temperature')()), POLL).toBe('10');
    await expect.poll(textOf('.whatif-result'), POLL).toMatch(/against the design conditions/);
    await page.waitForLoadState('networkidle');
    const before = await result.textContent();
    await page.fill('#f-wi-temperature', '35');
    await expect.poll(async () => (await result.textContent()) !== before, POLL).toBe(true);
    const after = await result.textContent();
    const n = (s: string | null) => Number(/^([\d,]+) m/.exec(s ?? '')?.[1]?.replace(/,/g, ''));
    expect(n(after)).toBeGreaterThan(n(before));
    await page.locator('section.whatif').screenshot({ path: join(SHOTS, '06-whatif.png') });
    // A bad value shows its error beside the field.
    await page.fill('#f-wi-temperature', 'hot');
    await expect.poll(textOf('#e-wi-temperature'), POLL).toContain('"hot" is not a number');
  });

  it('downloads the results CSV', async () => {
    const [download] = await Promise.all([page.waitForEvent('download'), page.click('nav.downloads a:has-text("CSV")')]);
    const path = await download.path();
    const text = readFileSync(path, 'utf8');
    expect(text.split('\n')[0]).toMatch(/^# Runway lengths from Runwright are preliminary/);
    expect(text).toContain('scenario,aircraft_id,aircraft');
    expect(text).toContain('Tern RJ-90');
  });

  it('imports a bad CSV and sees the error with its line and column', async () => {
    await page.goto(`${base}/aircraft`);
    // The catalogue as exported, with one value made impossible (MTOW 12 kg) on the second line.
    const exported = await (await page.request.get(`${base}/aircraft/export.csv`)).text();
    const [header, first] = exported.split('\n');
    const cells = first!.split(',');
    cells[0] = 'bad-one';
    cells[header!.split(',').indexOf('mtow_kg')] = '12';
    const csv = `${header}\n${cells.join(',')}\n`;
    await page.setInputFiles('#f-import-file', { name: 'bad.csv', mimeType: 'text/csv', buffer: Buffer.from(csv) });
    await page.click('button:has-text("Import")');
    await expect.poll(textOf('.error-summary'), POLL).toContain('nothing was imported');
    await expect.poll(textOf('.error-summary'), POLL).toContain('line 2, column "mtow_kg": 12 is out of range');
    await shot('07-import-error');
  });

  it('keyboard: the first Tab reaches the skip link, which leads to the main region', async () => {
    await page.goto(`${base}/sites`);
    await page.keyboard.press('Tab');
    expect(await page.evaluate(() => (globalThis as unknown as { document: { activeElement: { textContent: string } | null } }).document.activeElement?.textContent)).toBe('Skip to content');
  });

  it('works without JavaScript: htmx blocked, the same forms post and the what-if GET returns the page', async () => {
    const plain = await context.newPage();
    await plain.route('**/static/htmx.min.js', (r) => r.abort());
    await plain.goto(`${base}/aircraft/tern-rj90`);
    await plain.fill('#f-wi-temperature', '30');
    await plain.click('#whatif-panel button[type="submit"]');
    await plain.waitForURL(/\/aircraft\/tern-rj90\/whatif\?.*temperature=30/);
    expect(await plain.locator('[data-testid="whatif-required"]').textContent()).toMatch(/[\d,]+ m/);
    await plain.goto(`${base}/aircraft/tern-rj90/edit`);
    await plain.fill('#f-wingspan_m', '2');
    await plain.click('button:has-text("Save aircraft")');
    await plain.waitForLoadState();
    expect(await plain.locator('.error-summary').textContent()).toContain('2 is out of range; allowed 5 to 85 m');
    await plain.close();
  });

  it('the browser reported no script or content-security-policy errors', () => {
    expect(consoleErrors.filter((e) => !/status of 4\d\d/.test(e))).toEqual([]);
  });

  it('site page: climate chart, design temperature and runway profile', async () => {
    await page.goto(`${base}/sites/1`);
    await expect.poll(visible('#chart-climate'), POLL).toBe(true);
    await expect.poll(textOf('.design-temp'), POLL).toContain('Design temperature');
    await shot('08-site');
  });
});
