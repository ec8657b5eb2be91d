/**
 * Bounded fuzz run of the HTML forms (issue 12, "Tests"): the aircraft form (new and edit), the site
 * form with its monthly climate, the runway form with its pasted centreline profile, the study form and
 * the scenario form with its fleet rows. Each case is a valid form as the edit page serves it, with a
 * few fields replaced by random text (number spellings such as '', '1e309', '-0', 'NaN', huge,
 * negative, other scripts, control characters) or removed. Checks: harness.ts.
 */
import fc from 'fast-check';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createAircraft, getAircraft } from '../../db/repos/aircraft.js';
import {
  FUZZ_TIMEOUT_MS, Tally, checkedRequest, dbSnapshot, echoesOf, fieldValue, formFields, fuzzApp, fuzzParams, mutatedForm, numberText, postForm,
  textValue, type FuzzApp,
} from './harness.js';

let h: FuzzApp;
const EDIT_TARGET = 'fuzz-edit-target';

beforeAll(async () => {
  h = await fuzzApp();
  const base = getAircraft(h.db, 'plover-ct19')!;
  createAircraft(h.db, { ...base, id: EDIT_TARGET, name: 'Fuzz edit target' });
});
afterAll(() => h?.close());
const dbSnapshotOf = () => dbSnapshot(h.sqlite);

async function baseForm(path: string): Promise<Record<string, string>> {
  const r = await h.client.get(path);
  expect(r.status, path).toBe(200);
  return formFields(r.text);
}

const units = fc.option(fc.constantFrom('si', 'us'), { freq: 3 });
const withUnits = (f: Record<string, string>, u: string | null) => (u === null ? f : { ...f, _units: u });

describe('fuzz: aircraft form', () => {
  it('POST /aircraft and POST /aircraft/:id: no 5xx, no leaked NaN/Infinity/undefined, nothing saved when refused', async () => {
    const bases = await Promise.all(['albatross-nb180', 'curlew-rt70', 'heron-st1', 'kestrel-ut1'].map((id) => baseForm(`/aircraft/${id}/edit`)));
    const tally = new Tally();
    let n = 0;
    const arb = fc.integer({ min: 0, max: bases.length - 1 }).chain((i) => fc.record({
      mode: fc.constantFrom('new', 'new', 'edit'),
      form: mutatedForm(bases[i]!, { max: 5 }),
      editForm: mutatedForm({ ...bases[i]!, id: EDIT_TARGET }, { keep: ['id'], max: 5 }),
      units,
      htmx: fc.boolean(),
    }));
    await fc.assert(fc.asyncProperty(arb, async (c) => {
      n++;
      if (c.mode === 'new') {
        const form = withUnits({ ...c.form }, c.units);
        // A fresh id unless the mutation replaced it, so that valid cases are saved.
        if (form.id !== undefined && bases.some((b) => b.id === form.id)) form.id = `fuzz-${n}`;
        await checkedRequest(h, () => postForm(h, '/aircraft', form, c.htmx), echoesOf(Object.values(form)), `POST /aircraft ${JSON.stringify(form)}`, tally);
      } else {
        if (!getAircraft(h.db, EDIT_TARGET)) createAircraft(h.db, { ...getAircraft(h.db, 'plover-ct19')!, id: EDIT_TARGET });
        const form = withUnits(c.editForm, c.units);
        await checkedRequest(h, () => postForm(h, `/aircraft/${EDIT_TARGET}`, form, c.htmx), echoesOf(Object.values(form)), `POST /aircraft/${EDIT_TARGET} ${JSON.stringify(form)}`, tally);
      }
    }), fuzzParams(250));
    console.info(`aircraft form: ${tally}`);
    tally.expectMix('aircraft form');
  }, FUZZ_TIMEOUT_MS);
});

/** Profile text: the valid lines with random lines inserted, replaced or removed, various separators. */
function profileText(base: string): fc.Arbitrary<string> {
  const lines = base.split('\n');
  const line = fc.oneof(
    fc.constantFrom(...lines),
    fc.tuple(numberText, fc.constantFrom(' ', ',', ';', '\t', '  ', ', '), numberText).map(([a, s, b]) => `${a}${s}${b}`),
    fc.tuple(fc.integer({ min: -100, max: 7000 }), fc.double({ min: -500, max: 5000, noNaN: true })).map(([a, b]) => `${a} ${b}`),
    textValue,
    fc.constantFrom('# comment', '', '0 1346 7', '1e309 1346', '2600 NaN'),
  );
  return fc.oneof(
    { weight: 4, arbitrary: fc.tuple(fc.nat({ max: lines.length }), fc.nat({ max: 2 }), fc.array(line, { maxLength: 3 }), fc.constantFrom('\n', '\r\n')).map(([at, del, ins, eol]) => [...lines.slice(0, at), ...ins, ...lines.slice(at + del)].join(eol)) },
    { weight: 1, arbitrary: fc.array(line, { maxLength: 12 }).map((ls) => ls.join('\n')) },
  );
}

describe('fuzz: site form and runway profile text', () => {
  it('POST /sites, /sites/:id, /sites/:id/runways and /sites/:id/runways/0: no 5xx, no leaks, nothing saved when refused', async () => {
    const site = await baseForm(`/sites/${h.siteId}/edit`);
    const runway = await baseForm(`/sites/${h.siteId}/runways/0/edit`);
    const tally = new Tally();
    const arb = fc.oneof(
      fc.record({ kind: fc.constant('site-new' as const), form: mutatedForm(site, { max: 6 }), units }),
      fc.record({ kind: fc.constant('site-edit' as const), form: mutatedForm(site, { max: 6 }), units }),
      fc.record({ kind: fc.constant('runway-edit' as const), form: mutatedForm(runway, { max: 4 }), profile: fc.option(profileText(runway.profile!), { freq: 2 }), units }),
      fc.record({ kind: fc.constant('runway-new' as const), form: mutatedForm(runway, { max: 4 }), profile: fc.option(profileText(runway.profile!), { freq: 2 }), units }),
    );
    // Runways are added to a site of their own, so that the demo site's runway list stays short.
    const spare = await postForm(h, '/sites', { ...site, name: 'Fuzz spare site' });
    const spareId = /\/sites\/(\d+)/.exec(spare.headers.get('location') ?? '')?.[1];
    expect(spareId).toBeDefined();
    await fc.assert(fc.asyncProperty(arb, fc.boolean(), async (c, htmx) => {
      const form = withUnits('profile' in c && c.profile !== null ? { ...c.form, profile: c.profile } : { ...c.form }, c.units);
      const path = c.kind === 'site-new' ? '/sites' : c.kind === 'site-edit' ? `/sites/${h.siteId}` : c.kind === 'runway-edit' ? `/sites/${h.siteId}/runways/0` : `/sites/${spareId}/runways`;
      await checkedRequest(h, () => postForm(h, path, form, htmx), echoesOf(Object.values(form)), `POST ${path} ${JSON.stringify(form)}`, tally);
    }), fuzzParams(300));
    console.info(`site and runway forms: ${tally}`);
    tally.expectMix('site and runway forms');
  }, FUZZ_TIMEOUT_MS);
});

describe('fuzz: study form, scenario and fleet rows', () => {
  it('POST /studies, /studies/:id, /studies/:id/scenarios and /studies/:id/scenarios/:sid: no 5xx, no leaks, nothing saved when refused', async () => {
    const study = await baseForm(`/studies/${h.studyId}/edit`);
    const scenarioId = (h.sqlite.prepare('SELECT id FROM scenarios WHERE study_id = ? ORDER BY position').all(h.studyId) as { id: number }[])[0]!.id;
    const scenario = await baseForm(`/studies/${h.studyId}/scenarios/${scenarioId}`);
    const aircraftIds = (h.sqlite.prepare('SELECT id FROM aircraft').all() as { id: string }[]).map((r) => r.id);
    const rowValue = fc.oneof(fieldValue, fc.constantFrom(...aircraftIds));
    const tally = new Tally();
    let runs = 0;
    const arb = fc.oneof(
      fc.record({ kind: fc.constant('study-new' as const), form: mutatedForm(study, { max: 5 }) }),
      fc.record({ kind: fc.constant('study-edit' as const), form: mutatedForm(study, { max: 5 }) }),
      { weight: 3, arbitrary: fc.record({
        kind: fc.constant('scenario' as const),
        form: mutatedForm(scenario, { max: 3 }),
        rows: fc.array(fc.tuple(fc.nat({ max: 8 }), fc.constantFrom('aircraft', 'ops', 'stage', 'payload'), rowValue), { maxLength: 4 }),
      }) },
      fc.record({ kind: fc.constant('scenario-new' as const), form: fc.record({ name: fc.oneof(textValue, fc.constant('')) }) }),
    );
    await fc.assert(fc.asyncProperty(arb, units, fc.boolean(), async (c, u, htmx) => {
      const form: Record<string, string> = withUnits({ ...c.form }, u);
      if (c.kind === 'scenario') for (const [i, f, v] of c.rows) form[`r${i}_${f}`] = v;
      const path = c.kind === 'study-new' ? '/studies' : c.kind === 'study-edit' ? `/studies/${h.studyId}`
        : c.kind === 'scenario' ? `/studies/${h.studyId}/scenarios/${scenarioId}` : `/studies/${h.studyId}/scenarios`;
      const res = await checkedRequest(h, () => postForm(h, path, form, htmx), echoesOf(Object.values(form)), `POST ${path} ${JSON.stringify(form)}`, tally);
      // Now and then compute the study after an accepted change and check the results page.
      if (res.status === 303 && (c.kind === 'scenario' || c.kind === 'study-edit') && runs < 4) {
        runs++;
        await checkedRequest(h, () => postForm(h, `/studies/${h.studyId}/run`, {}), echoesOf(Object.values(form)), `run after POST ${path} ${JSON.stringify(form)}`);
        for (const p of [`/studies/${h.studyId}/results.csv`, `/studies/${h.studyId}/results.json`]) {
          await checkedRequest(h, () => h.client.get(p), echoesOf(Object.values(form)), `GET ${p} after POST ${path} ${JSON.stringify(form)}`);
        }
      }
    }), fuzzParams(250));
    console.info(`study and scenario forms: ${tally}, study runs: ${runs}`);
    tally.expectMix('study and scenario forms');
  }, FUZZ_TIMEOUT_MS);
});

describe('fuzz: what-if panels (GET forms)', () => {
  it('GET /aircraft/:id/whatif and /studies/:id/whatif with random conditions: no 5xx, no leaks, nothing written', async () => {
    const tally = new Tally();
    const valid = (arb: fc.Arbitrary<string>) => fc.oneof({ weight: 6, arbitrary: arb }, { weight: 1, arbitrary: numberText });
    const cond = fc.record({
      temperature: valid(fc.double({ min: -60, max: 60, noNaN: true }).map((x) => x.toFixed(1))),
      elevation: valid(fc.integer({ min: -610, max: 5000 }).map(String)),
      slope: valid(fc.double({ min: -3, max: 3, noNaN: true }).map((x) => x.toFixed(2))),
      wind: valid(fc.double({ min: -15, max: 30, noNaN: true }).map((x) => x.toFixed(1))),
      surface: fc.oneof({ weight: 6, arbitrary: fc.constantFrom('dry', 'wet', 'grass') }, { weight: 1, arbitrary: textValue }),
    });
    const aircraft = fc.oneof({ weight: 6, arbitrary: fc.constantFrom('plover-ct19', 'albatross-nb180', 'kestrel-ut1', 'swift-bj8') }, { weight: 1, arbitrary: textValue });
    // Mass as a fraction of the way from the empty to the take-off mass of the aircraft, or random text.
    const mass = fc.oneof({ weight: 6, arbitrary: fc.double({ min: -0.1, max: 1.1, noNaN: true }) }, { weight: 1, arbitrary: numberText });
    const profile = (id: string) => getAircraft(h.db, id);
    await fc.assert(fc.asyncProperty(fc.boolean(), aircraft, cond, mass, units, fc.boolean(), async (study, id, c, m, u, htmx) => {
      const a = profile(id) ?? profile('plover-ct19')!;
      const q: Record<string, string> = { ...c, mass: typeof m === 'number' ? (a.oew_kg + m * (a.mtow_kg - a.oew_kg)).toFixed(0) : m };
      const path = study ? `/studies/${h.studyId}/whatif` : `/aircraft/${encodeURIComponent(id)}/whatif`;
      if (study) q.aircraft = id;
      const query = new URLSearchParams(withUnits(q, u)).toString();
      await checkedRequest(h, async () => {
        const before = JSON.stringify(dbSnapshotOf());
        const res = await h.client.get(`${path}?${query}`, { htmx });
        expect(JSON.stringify(dbSnapshotOf()), `GET ${path}?${query} wrote to the database`).toBe(before);
        return res;
      }, echoesOf([...Object.values(q), id]), `GET ${path}?${query}`, tally);
    }), fuzzParams(120));
    console.info(`what-if: ${tally}`);
    tally.expectMix('what-if');
  }, FUZZ_TIMEOUT_MS);
});

describe('fuzz: redirect targets (back, next)', () => {
  it('POST /preferences/units back=… and GET /login?next=…: no 5xx; any Location is a path on this server', async () => {
    const tally = new Tally();
    const target = fc.oneof(
      textValue,
      fc.tuple(fc.constantFrom('/', '//', '/\\', '\\', 'http://', 'javascript:', '/%09/', '/%0d%0a', '/\t/', '/\r\n', '/\u0000', ' /', '%2F%2F', '/%2e%2e/'),
        fc.constantFrom('', 'evil.example', 'studies', 'aircraft?x=1', '@evil.example', '..//evil.example')).map(([a, b]) => a + b),
    );
    await fc.assert(fc.asyncProperty(target, fc.boolean(), async (t, login) => {
      const send = login ? () => h.client.get(`/login?next=${encodeURIComponent(t)}`) : () => postForm(h, '/preferences/units', { units: 'si', back: t });
      const res = await checkedRequest(h, send, echoesOf([t]), login ? `GET /login?next=${JSON.stringify(t)}` : `POST /preferences/units back=${JSON.stringify(t)}`, tally);
      const loc = res.headers.get('location');
      if (loc !== null) {
        expect(loc, `Location for ${JSON.stringify(t)}`).toMatch(/^\/(?![\/\\])/);
        expect(loc, `Location for ${JSON.stringify(t)}`).not.toMatch(/[\u0000-\u001f\u007f\\]/);
      }
      for (const m of res.text.matchAll(/name="next" value="([^"]*)"/g)) {
        const next = m[1]!.replace(/&amp;/g, '&');
        expect(next, `sign-in form next for ${JSON.stringify(t)}`).toMatch(/^\/(?![\/\\])/);
        expect(next, `sign-in form next for ${JSON.stringify(t)}`).not.toMatch(/[\u0000-\u001f\u007f\\]/);
      }
    }), fuzzParams(150));
    console.info(`redirect targets: ${tally}`);
  }, FUZZ_TIMEOUT_MS);
});
