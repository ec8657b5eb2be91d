/** First-start seeding (issue 7): the demo is seeded once; a second start changes nothing. */
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import type Database from 'better-sqlite3';
import { openDatabase } from '../../db/client.js';
import { createAircraft, deleteAircraft, listAircraft } from '../../db/repos/aircraft.js';
import { deleteSite, listSites } from '../../db/repos/sites.js';
import { deleteStudy, listStudies, loadStudyInput } from '../../db/repos/studies.js';
import { seedDemoIfEmpty } from '../../db/seed.js';
import { demoAircraft, demoDocument } from './fixtures/demo.js';

let dir: string;
beforeEach(() => {
  dir = mkdtempSync(join(tmpdir(), 'runwright-seed-'));
});
afterEach(() => rmSync(dir, { recursive: true, force: true }));

/** Every row of every table, as text: a second start must leave this identical. */
function dump(sqlite: Database.Database): string {
  const tables = (sqlite.prepare(`SELECT name FROM sqlite_master WHERE type = 'table' ORDER BY name`).all() as { name: string }[]).map((r) => r.name);
  return tables.map((t) => `${t}: ${JSON.stringify(sqlite.prepare(`SELECT * FROM "${t}" ORDER BY rowid`).all())}`).join('\n');
}

/** One application start: open the file (migrations), seed if empty, close. */
function start(file: string) {
  const { db, sqlite } = openDatabase(file);
  try {
    const outcome = seedDemoIfEmpty(db, demoDocument());
    return { outcome, dump: dump(sqlite) };
  } finally {
    sqlite.close();
  }
}

describe('seedDemoIfEmpty', () => {
  it('seeds the demo on the first start and changes nothing on the second', () => {
    const file = join(dir, 'rw.sqlite');
    const first = start(file);
    expect(first.outcome.seeded).toBe(true);
    const second = start(file);
    expect(second.outcome).toEqual({ seeded: false, reason: 'already-seeded' });
    expect(second.dump).toBe(first.dump);

    const { db, sqlite } = openDatabase(file);
    expect(listAircraft(db)).toHaveLength(8);
    expect(listSites(db)).toHaveLength(1);
    expect(listStudies(db)).toHaveLength(1);
    expect(loadStudyInput(db, listStudies(db)[0]!.id)).toEqual(demoDocument());
    sqlite.close();
  });

  it('does not seed again after the user deleted the demo', () => {
    const { db, sqlite } = openDatabase(':memory:');
    seedDemoIfEmpty(db, demoDocument());
    for (const s of listStudies(db)) deleteStudy(db, s.id);
    for (const s of listSites(db)) deleteSite(db, s.id);
    for (const a of listAircraft(db)) deleteAircraft(db, a.id);
    expect(seedDemoIfEmpty(db, demoDocument())).toEqual({ seeded: false, reason: 'already-seeded' });
    expect(listAircraft(db)).toEqual([]);
    sqlite.close();
  });

  it('leaves a database that already holds data alone', () => {
    const { db, sqlite } = openDatabase(':memory:');
    createAircraft(db, demoAircraft('kestrel-ut1'));
    expect(seedDemoIfEmpty(db, demoDocument())).toEqual({ seeded: false, reason: 'not-empty' });
    expect(listAircraft(db).map((a) => a.id)).toEqual(['kestrel-ut1']);
    expect(listStudies(db)).toEqual([]);
    sqlite.close();
  });
});
