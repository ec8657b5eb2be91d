/**
 * Studies repository (issue 7): scenarios and fleet rows, `loadStudyInput` assembling the core type,
 * saved results that never change, and the "inputs changed since saved" check.
 */
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { openDatabase, type DatabaseHandle } from '../../db/client.js';
import { NotFoundError } from '../../db/errors.js';
import { createAircraft, getAircraft, updateAircraft } from '../../db/repos/aircraft.js';
import { updateSite, getSite, siteInput } from '../../db/repos/sites.js';
import {
  addScenario,
  createStudy,
  deleteScenario,
  deleteStudy,
  getScenario,
  getStudy,
  inputsChangedSinceSave,
  latestStudyResult,
  listStudies,
  listStudyResults,
  loadStudyInput,
  saveStudyResult,
  setScenarioFleet,
  updateScenario,
  updateStudy,
} from '../../db/repos/studies.js';
import { seedDemoIfEmpty } from '../../db/seed.js';
import { demoAircraft, demoDocument, digestOf } from './fixtures/demo.js';

let h: DatabaseHandle;
let studyId: number;
let siteId: number;
beforeEach(() => {
  h = openDatabase(':memory:');
  const r = seedDemoIfEmpty(h.db, demoDocument());
  if (!r.seeded) throw new Error('expected seeding');
  studyId = r.studyId;
  siteId = r.siteId;
});
afterEach(() => h.sqlite.close());

const rows = (table: string) => (h.sqlite.prepare(`SELECT count(*) AS n FROM ${table}`).get() as { n: number }).n;

describe('loadStudyInput', () => {
  it('assembles exactly the demo StudyInput (aircraft in order of first use)', () => {
    expect(loadStudyInput(h.db, studyId)).toEqual(demoDocument());
  });

  it('includes only the aircraft the fleet rows use', () => {
    createAircraft(h.db, { ...demoAircraft('kestrel-ut1'), id: 'spare' });
    expect(loadStudyInput(h.db, studyId).aircraft.map((a) => a.id)).not.toContain('spare');
  });

  it('throws NotFoundError for an unknown study', () => {
    expect(() => loadStudyInput(h.db, 999)).toThrow(NotFoundError);
  });
});

describe('studies, scenarios and fleet rows', () => {
  it('lists studies with their site and scenario count', () => {
    expect(listStudies(h.db)).toEqual([{ id: studyId, name: demoDocument().name, siteId, siteName: demoDocument().site.name, scenarioCount: 3 }]);
  });

  it('adds, renames, refills and deletes scenarios, keeping their order', () => {
    const id = addScenario(h.db, studyId, { name: 'Extra', fleet: [{ aircraft: 'kestrel-ut1', annualOperations: 10, stageLength_km: 100, payload_kg: 100 }] });
    expect(getStudy(h.db, studyId)!.scenarios.map((s) => s.name)).toEqual(['Base year 2026', 'Growth 2036', 'New jet service 2031', 'Extra']);
    updateScenario(h.db, id, { name: 'Extra (renamed)' });
    setScenarioFleet(h.db, id, [
      { aircraft: 'heron-st1', annualOperations: 20, stageLength_km: 200, payload_kg: 300 },
      { aircraft: 'pipit-lt2', annualOperations: 30, stageLength_km: 250, payload_kg: 350 },
    ]);
    expect(getScenario(h.db, id)).toEqual({
      id, studyId, name: 'Extra (renamed)',
      fleet: [
        { aircraft: 'heron-st1', annualOperations: 20, stageLength_km: 200, payload_kg: 300 },
        { aircraft: 'pipit-lt2', annualOperations: 30, stageLength_km: 250, payload_kg: 350 },
      ],
    });
    deleteScenario(h.db, id);
    expect(getScenario(h.db, id)).toBeUndefined();
    expect(() => deleteScenario(h.db, id)).toThrow(NotFoundError);
  });

  it('refuses a fleet row naming an aircraft not in the catalogue, and keeps the old rows', () => {
    const first = getStudy(h.db, studyId)!.scenarios[0]!;
    expect(() => setScenarioFleet(h.db, first.id, [...first.fleet, { aircraft: 'ghost', annualOperations: 1, stageLength_km: 1, payload_kg: 0 }])).toThrow(/aircraft "ghost" does not exist/);
    expect(getScenario(h.db, first.id)!.fleet).toEqual(first.fleet);
  });

  it('updates options and deletes a study with its scenarios, fleet rows and saved results', () => {
    updateStudy(h.db, studyId, { name: 'Renamed', options: { ...demoDocument().options, surface: 'wet' } });
    expect(getStudy(h.db, studyId)!.options.surface).toBe('wet');
    expect(() => updateStudy(h.db, studyId, { siteId: 999 })).toThrow(NotFoundError);
    saveStudyResult(h.db, { studyId, input: loadStudyInput(h.db, studyId), inputDigest: 'd', result: {}, methodVersion: 'v', createdAt: new Date(0) });
    deleteStudy(h.db, studyId);
    expect(rows('scenarios')).toBe(0);
    expect(rows('fleet_rows')).toBe(0);
    expect(rows('saved_results')).toBe(0);
    expect(rows('aircraft')).toBe(8);
  });

  it('creates a study from parts and refuses an unknown site', () => {
    const id = createStudy(h.db, { name: 'Second', siteId, options: demoDocument().options, scenarios: [] });
    expect(getStudy(h.db, id)!.scenarios).toEqual([]);
    expect(() => createStudy(h.db, { name: 'Bad', siteId: 42, options: demoDocument().options, scenarios: [] })).toThrow(NotFoundError);
  });
});

describe('saved results', () => {
  const result = { scenarios: [{ name: 'Base year 2026', recommended_m: 2350 }], methodVersion: 'study/1' };

  it('keeps inputs, snapshot, method version and time; latest is the newest', () => {
    const input = loadStudyInput(h.db, studyId);
    saveStudyResult(h.db, { studyId, input, inputDigest: digestOf(input), result, methodVersion: 'study/1', createdAt: '2026-03-01T10:00:00Z' });
    const second = saveStudyResult(h.db, { studyId, input, inputDigest: digestOf(input), result: { ...result, note: 2 }, methodVersion: 'study/1', createdAt: new Date('2026-03-02T10:00:00Z') });
    expect(latestStudyResult(h.db, studyId)).toEqual(second);
    expect(second.createdAt).toBe('2026-03-02T10:00:00.000Z');
    expect(listStudyResults(h.db, studyId).map((r) => r.createdAt)).toEqual(['2026-03-02T10:00:00.000Z', '2026-03-01T10:00:00.000Z']);
    expect(latestStudyResult(h.db, 999)).toBeUndefined();
  });

  it('editing an aircraft the study used leaves the saved result unchanged, and the change is detected', () => {
    const input = loadStudyInput(h.db, studyId);
    const saved = saveStudyResult(h.db, { studyId, input, inputDigest: digestOf(input), result, methodVersion: 'study/1', createdAt: new Date('2026-03-01T00:00:00Z') });
    expect(inputsChangedSinceSave(h.db, studyId, digestOf(loadStudyInput(h.db, studyId))).state).toBe('unchanged');

    updateAircraft(h.db, 'curlew-rt70', { ...getAircraft(h.db, 'curlew-rt70')!, mtow_kg: 23500 });

    const latest = latestStudyResult(h.db, studyId)!;
    expect(latest).toEqual(saved);
    const savedCurlew = (latest.input as typeof input).aircraft.find((a) => a.id === 'curlew-rt70');
    expect(savedCurlew?.mtow_kg).toBe(22800);
    const status = inputsChangedSinceSave(h.db, studyId, digestOf(loadStudyInput(h.db, studyId)));
    expect(status.state).toBe('changed');
    if (status.state === 'changed') expect(status.saved.id).toBe(saved.id);

    // Reverting the edit makes the current input equal to the saved one again.
    updateAircraft(h.db, 'curlew-rt70', demoAircraft('curlew-rt70'));
    expect(inputsChangedSinceSave(h.db, studyId, digestOf(loadStudyInput(h.db, studyId))).state).toBe('unchanged');
  });

  it('a site edit also counts as a change; an unrelated catalogue edit does not', () => {
    const input = loadStudyInput(h.db, studyId);
    saveStudyResult(h.db, { studyId, input, inputDigest: digestOf(input), result, methodVersion: 'study/1', createdAt: new Date(0) });
    createAircraft(h.db, { ...demoAircraft('kestrel-ut1'), id: 'unrelated' });
    updateAircraft(h.db, 'unrelated', { ...demoAircraft('kestrel-ut1'), id: 'unrelated', maxFuel_kg: 140 });
    expect(inputsChangedSinceSave(h.db, studyId, digestOf(loadStudyInput(h.db, studyId))).state).toBe('unchanged');
    updateSite(h.db, siteId, { ...siteInput(getSite(h.db, siteId)!), elevation_m: 1350 });
    expect(inputsChangedSinceSave(h.db, studyId, digestOf(loadStudyInput(h.db, studyId))).state).toBe('changed');
  });

  it('reports never-saved before the first save', () => {
    expect(inputsChangedSinceSave(h.db, studyId, 'x')).toEqual({ state: 'never-saved' });
  });

  it('refuses a result that is not JSON and an invalid time', () => {
    expect(() => saveStudyResult(h.db, { studyId, input: {}, inputDigest: 'd', result: undefined, methodVersion: 'v', createdAt: new Date(0) })).toThrow(/not a JSON value/);
    expect(() => saveStudyResult(h.db, { studyId, input: {}, inputDigest: 'd', result: {}, methodVersion: 'v', createdAt: 'yesterday' })).toThrow(/not a valid time/);
    expect(rows('saved_results')).toBe(0);
  });
});
