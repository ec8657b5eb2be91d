/**
 * Workspace JSON export and import (issue 7): versioned document, byte-identical round trip through
 * an empty database, all-or-nothing import with line, column and reason for each malformed file.
 */
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import type { AircraftProfile } from '../../../core/aircraft.js';
import { openDatabase, type DatabaseHandle } from '../../../db/client.js';
import { createAircraft } from '../../../db/repos/aircraft.js';
import { createSite } from '../../../db/repos/sites.js';
import { addScenario, createStudy, listStudies, loadStudyInput, saveStudyResult } from '../../../db/repos/studies.js';
import { seedDemoIfEmpty } from '../../../db/seed.js';
import { exportWorkspace, exportWorkspaceJson, importWorkspace } from '../../../server/io/workspace.js';
import { demoAircraft, demoDocument, digestOf } from '../../db/fixtures/demo.js';
import { dump, importError, lineOf } from './helpers.js';

let src: DatabaseHandle;
let dst: DatabaseHandle;
beforeEach(() => {
  src = openDatabase(':memory:');
  dst = openDatabase(':memory:');
});
afterEach(() => {
  src.sqlite.close();
  dst.sqlite.close();
});

const tableAircraft: AircraftProfile = {
  ...demoAircraft('albatross-nb180'),
  id: 'albatross-table',
  name: 'Albatross NB-180 with reference table',
  reference: { landing_m: 1600, table: { mass_kg: [60000, 78000], elevation_m: [0], temperature_c: [15, 40], length_m: [[[1500, 1800]], [[2100, 2550]]] } },
};

/** A workspace with every kind of content: demo, a reference table, a site without climate, an empty scenario, saved results. */
function fill(db: DatabaseHandle['db']): void {
  const seeded = seedDemoIfEmpty(db, demoDocument());
  if (!seeded.seeded) throw new Error('expected seeding');
  createAircraft(db, tableAircraft);
  const strip = createSite(db, { name: 'Tilbury Flats Airstrip (invented) — “quoted” ü', elevation_m: 250, designTemperature_c: 31, runways: [] });
  const second = createStudy(db, { name: 'Strip study', siteId: strip, options: { ...demoDocument().options, reserves: { policy: 'custom', alternate_km: 150, holding_min: 30, contingencyFraction: 0.05 } }, scenarios: [] });
  addScenario(db, second, { name: 'Empty for now', fleet: [] });
  addScenario(db, second, { name: 'Table jet', fleet: [{ aircraft: 'albatross-table', annualOperations: 600, stageLength_km: 1200.5, payload_kg: 12000 }] });
  const input = loadStudyInput(db, seeded.studyId);
  saveStudyResult(db, { studyId: seeded.studyId, input, inputDigest: digestOf(input), result: { recommended_m: 2350, ratio: 0.1 + 0.2, tiny: 1e-7, big: 1e21, nested: [{ a: null, b: 'é' }] }, methodVersion: 'study/1', createdAt: '2026-03-01T09:30:00.000Z' });
  saveStudyResult(db, { studyId: seeded.studyId, input, inputDigest: digestOf(input), result: [1, 2, 3], methodVersion: 'study/1', createdAt: '2026-03-02T09:30:00.000Z' });
}

describe('workspace export', () => {
  it('is a versioned document with every aircraft, site and study', () => {
    fill(src.db);
    const doc = exportWorkspace(src.db);
    expect(doc.format).toBe('runwright-workspace');
    expect(doc.version).toBe(1);
    expect(doc.aircraft).toHaveLength(9);
    expect(doc.sites.map((s) => s.id)).toEqual([1, 2]);
    expect(doc.studies.map((s) => [s.id, s.siteId, s.scenarios.length, s.savedResults.length])).toEqual([[1, 1, 3, 2], [2, 2, 2, 0]]);
  });
});

describe('workspace round trip (export → import into an empty database → export)', () => {
  it('gives the same bytes, and the same study inputs', () => {
    fill(src.db);
    const first = exportWorkspaceJson(src.db);
    expect(importWorkspace(dst.db, first)).toEqual({ aircraft: 9, sites: 2, studies: 2, savedResults: 2 });
    const second = exportWorkspaceJson(dst.db);
    expect(second).toBe(first);
    for (const s of listStudies(src.db)) expect(loadStudyInput(dst.db, s.id)).toEqual(loadStudyInput(src.db, s.id));
  });

  it('also from bytes (UTF-8 with a byte-order mark)', () => {
    fill(src.db);
    const first = exportWorkspaceJson(src.db);
    importWorkspace(dst.db, Buffer.concat([Buffer.from([0xef, 0xbb, 0xbf]), Buffer.from(first, 'utf8')]));
    expect(exportWorkspaceJson(dst.db)).toBe(first);
  });

  it('an empty workspace round-trips too', () => {
    const first = exportWorkspaceJson(src.db);
    importWorkspace(dst.db, first);
    expect(exportWorkspaceJson(dst.db)).toBe(first);
  });
});

describe('workspace import into a database that holds data', () => {
  it('is refused by default, and replaces everything when asked', () => {
    fill(src.db);
    const text = exportWorkspaceJson(src.db);
    createAircraft(dst.db, { ...demoAircraft('kestrel-ut1'), id: 'local-only' });
    const before = dump(dst.sqlite);
    expect(importError(() => importWorkspace(dst.db, text)).message).toMatch(/already holds data/);
    expect(dump(dst.sqlite)).toBe(before);
    importWorkspace(dst.db, text, { mode: 'replace' });
    expect(exportWorkspaceJson(dst.db)).toBe(text);
  });
});

describe('malformed workspace files are rejected with line, column and reason, and nothing is written', () => {
  let text: string;
  let before: string;
  beforeEach(() => {
    fill(src.db);
    text = exportWorkspaceJson(src.db);
    before = dump(dst.sqlite);
  });
  afterEach(() => expect(dump(dst.sqlite)).toBe(before));

  it('truncated JSON: names the last line and says it ends early', () => {
    const cut = text.slice(0, Math.floor(text.length / 2));
    const e = importError(() => importWorkspace(dst.db, cut));
    expect(e.problems[0]!.line).toBe(cut.split('\n').length);
    expect(e.message).toMatch(/not valid JSON: the file ends in the middle/);
  });

  it('a syntax error in the middle: line and column of the bad character', () => {
    const bad = text.replace('"mtow_kg": 78000,', '"mtow_kg": 78000,,');
    const e = importError(() => importWorkspace(dst.db, bad));
    const line = lineOf(bad, '"mtow_kg": 78000,,');
    expect(e.problems[0]).toMatchObject({ line, column: bad.split('\n')[line - 1]!.indexOf(',,') + 2 });
    expect(e.message).toContain('expected a property name');
  });

  it('wrong type: the path, its line and the allowed range', () => {
    const bad = text.replace('"mtow_kg": 78000,', '"mtow_kg": "heavy",');
    const e = importError(() => importWorkspace(dst.db, bad));
    expect(e.problems[0]).toMatchObject({ line: lineOf(bad, '"heavy"'), field: 'aircraft[0].mtow_kg' });
    expect(e.message).toContain('"heavy" is not a number; allowed 300 to 600000 kg');
  });

  it('value out of range', () => {
    const bad = text.replace('"elevation_m": 1346,', '"elevation_m": 9000,');
    const e = importError(() => importWorkspace(dst.db, bad));
    expect(e.problems[0]).toMatchObject({ line: lineOf(bad, '"elevation_m": 9000'), field: 'sites[0].elevation_m' });
    expect(e.message).toContain('9000 is out of range; allowed -400 to 4500 m');
  });

  it('duplicate aircraft ids and duplicate site ids', () => {
    const doc = JSON.parse(text) as { aircraft: { id: string }[]; sites: { id: number }[] };
    doc.aircraft[3]!.id = doc.aircraft[1]!.id;
    doc.sites[1]!.id = doc.sites[0]!.id;
    const e = importError(() => importWorkspace(dst.db, JSON.stringify(doc, null, 2)));
    const fields = e.problems.map((p) => p.field);
    expect(fields).toContain('aircraft[3].id');
    expect(fields).toContain('sites[1].id');
    expect(e.problems.find((p) => p.field === 'aircraft[3].id')!.reason).toMatch(/duplicate id .* \(also aircraft\[1\]\)/);
  });

  it('an unknown key is refused (nothing would be silently dropped)', () => {
    const bad = text.replace('"mtow_kg": 78000,', '"mtow_kg": 78000,\n      "colour": "blue",');
    const e = importError(() => importWorkspace(dst.db, bad));
    expect(e.problems[0]!.field).toBe('aircraft[0]');
    expect(e.message).toContain('colour');
  });

  it('references that do not resolve (a study site, a fleet aircraft)', () => {
    const doc = JSON.parse(text) as { studies: { siteId: number; scenarios: { fleet: { aircraft: string }[] }[] }[] };
    doc.studies[0]!.siteId = 77;
    doc.studies[0]!.scenarios[0]!.fleet[0]!.aircraft = 'ghost';
    const e = importError(() => importWorkspace(dst.db, JSON.stringify(doc)));
    expect(e.problems.map((p) => p.reason)).toEqual(expect.arrayContaining(['site 77 is not in the file\'s sites', 'aircraft "ghost" is not in the file\'s aircraft']));
  });

  it('wrong encoding: a Latin-1 byte, UTF-16, a NUL', () => {
    const bytes = Buffer.from(text.replace('Tilbury Flats', 'Tilbury Fl\u00e4ts'), 'latin1');
    const e = importError(() => importWorkspace(dst.db, bytes));
    expect(e.problems[0]!.line).toBe(lineOf(text, 'Tilbury Flats'));
    expect(e.message).toMatch(/not valid UTF-8 \(byte 0xe4\)/);
    expect(importError(() => importWorkspace(dst.db, Buffer.from(`\ufeff${text}`, 'utf16le'))).message).toMatch(/UTF-16/);
    expect(importError(() => importWorkspace(dst.db, text.replace('"format"', '"form\u0000at"'))).message).toMatch(/NUL/);
  });

  it('not a workspace file, or a newer version', () => {
    expect(importError(() => importWorkspace(dst.db, '[1, 2]')).message).toMatch(/expected a JSON object/);
    expect(importError(() => importWorkspace(dst.db, text.replace('"runwright-workspace"', '"runwright-study"'))).message).toMatch(/"runwright-study" is not a workspace file/);
    expect(importError(() => importWorkspace(dst.db, text.replace('"version": 1', '"version": 2'))).message).toMatch(/version 2 is newer than this program reads \(1\)/);
  });

  it('a saved result without its input', () => {
    const doc = JSON.parse(text) as { studies: { savedResults: Record<string, unknown>[] }[] };
    delete doc.studies[0]!.savedResults[0]!.input;
    const e = importError(() => importWorkspace(dst.db, JSON.stringify(doc)));
    expect(e.problems[0]!.field).toBe('studies[0].savedResults[0].input');
  });
});
