/** Database client: pragmas, committed migrations, start-up validation of the file path (issue 7). */
import { mkdirSync, mkdtempSync, readdirSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import {
  DATABASE_FILE_ENV,
  DatabaseFileError,
  MIGRATIONS_FOLDER,
  applyMigrations,
  databaseFileFromEnv,
  openDatabase,
} from '../../db/client.js';

let dir: string;
beforeEach(() => {
  dir = mkdtempSync(join(tmpdir(), 'runwright-client-'));
});
afterEach(() => rmSync(dir, { recursive: true, force: true }));

const TABLES = [
  'aircraft', 'fleet_rows', 'meta', 'runway_directions', 'runway_profile_points', 'runways',
  'saved_results', 'scenarios', 'site_climate_months', 'sites', 'studies',
];

describe('openDatabase', () => {
  it('applies the committed migrations to an in-memory database, with foreign keys and a busy timeout', () => {
    const { sqlite } = openDatabase(':memory:');
    const names = (sqlite.prepare(`SELECT name FROM sqlite_master WHERE type = 'table' AND name NOT LIKE 'sqlite_%' AND name NOT LIKE '__drizzle%' ORDER BY name`).all() as { name: string }[]).map((r) => r.name);
    expect(names).toEqual(TABLES);
    expect(sqlite.pragma('foreign_keys', { simple: true })).toBe(1);
    expect(sqlite.pragma('busy_timeout', { simple: true })).toBe(5000);
    const journal = readdirSync(MIGRATIONS_FOLDER).filter((f) => f.endsWith('.sql'));
    expect((sqlite.prepare('SELECT count(*) AS n FROM __drizzle_migrations').get() as { n: number }).n).toBe(journal.length);
    sqlite.close();
  });

  it('uses WAL and synchronous FULL on a file, creates the folder, and a second start applies nothing', () => {
    const file = join(dir, 'nested', 'folder', 'rw.sqlite');
    const first = openDatabase(file);
    expect(first.sqlite.pragma('journal_mode', { simple: true })).toBe('wal');
    expect(first.sqlite.pragma('synchronous', { simple: true })).toBe(2); // 2 = FULL
    first.sqlite.close();
    const second = openDatabase(file);
    expect(applyMigrations(second.sqlite, MIGRATIONS_FOLDER)).toBe(0);
    expect((second.sqlite.prepare('SELECT count(*) AS n FROM __drizzle_migrations').get() as { n: number }).n).toBeGreaterThan(0);
    second.sqlite.close();
  });

  it('refuses a path that is a directory or a file that is not SQLite, and leaves that file alone', () => {
    expect(() => openDatabase(dir)).toThrow(DatabaseFileError);
    expect(() => openDatabase(dir)).toThrow(/is a directory/);
    const notes = join(dir, 'notes.txt');
    writeFileSync(notes, 'planning notes, not a database\n');
    expect(() => openDatabase(notes)).toThrow(/not an SQLite database/);
    expect(readdirSync(dir).sort()).toEqual(['notes.txt']);
  });
});

describe('databaseFileFromEnv (start-up validation)', () => {
  it('defaults to data/runwright.sqlite under the working directory', () => {
    expect(databaseFileFromEnv({}, dir)).toBe(join(dir, 'data', 'runwright.sqlite'));
  });

  it(`takes ${DATABASE_FILE_ENV}, relative to the working directory or absolute`, () => {
    expect(databaseFileFromEnv({ [DATABASE_FILE_ENV]: 'x/y.sqlite' }, dir)).toBe(join(dir, 'x', 'y.sqlite'));
    const abs = join(dir, 'abs.sqlite');
    expect(databaseFileFromEnv({ [DATABASE_FILE_ENV]: abs }, '/')).toBe(abs);
  });

  it('rejects a blank value and a directory, naming the variable or the reason', () => {
    expect(() => databaseFileFromEnv({ [DATABASE_FILE_ENV]: '  ' }, dir)).toThrow(new RegExp(`${DATABASE_FILE_ENV} is set but blank`));
    mkdirSync(join(dir, 'd'));
    expect(() => databaseFileFromEnv({ [DATABASE_FILE_ENV]: 'd' }, dir)).toThrow(/is a directory/);
  });
});
