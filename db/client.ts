/**
 * Database client factory: opens (or creates) the SQLite file, sets the connection pragmas and applies
 * the committed migrations in drizzle/. No module-level singleton: every caller owns its handle and
 * closes it with `sqlite.close()`.
 *
 * Pragmas: WAL journal (readers never block the writer), synchronous = FULL (a committed transaction
 * survives a power cut, not only a process crash), foreign keys on, busy timeout 5000 ms (a writer
 * waits for another process's lock instead of failing with SQLITE_BUSY).
 *
 * Nothing here opens the database file except SQLite itself. POSIX advisory locks belong to the
 * process, and closing any descriptor of the file releases all of them: a plain `fs` open and close of
 * the file (to sniff its header, say) while a connection is open in the process lets another process
 * delete the live -wal and -shm (docs/storage.md, "One owner of the database file"). SQLite's own
 * connections are safe: it keeps such descriptors open until the process's last connection closes.
 */
import Database from 'better-sqlite3';
import { drizzle, type BetterSQLite3Database } from 'drizzle-orm/better-sqlite3';
import { readMigrationFiles } from 'drizzle-orm/migrator';
import { mkdirSync, statSync } from 'node:fs';
import { dirname, isAbsolute, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';
import * as schema from './schema.js';

export type Schema = typeof schema;
export type DrizzleDb = BetterSQLite3Database<Schema>;

export interface DatabaseHandle {
  /** The raw better-sqlite3 connection (pragmas, integrity checks, `close()`). */
  readonly sqlite: Database.Database;
  /** The drizzle database over it; pass this to the repositories. */
  readonly db: DrizzleDb;
}

/** Folder holding the generated migrations; resolves from db/ in the source tree and from dist/db. */
export const MIGRATIONS_FOLDER = fileURLToPath(new URL('../drizzle', import.meta.url));

/** Default database file, relative to the working directory. */
export const DEFAULT_DATABASE_FILE = 'data/runwright.sqlite';
/** Environment variable that overrides the database file path. */
export const DATABASE_FILE_ENV = 'RUNWRIGHT_DB_FILE';

/** Busy timeout, ms: how long a writer waits for another connection's lock. */
export const BUSY_TIMEOUT_MS = 5000;

/** Thrown when the configured database path cannot be used; the message says why and what to do. */
export class DatabaseFileError extends Error {
  override readonly name = 'DatabaseFileError';
  constructor(
    readonly path: string,
    readonly reason: string,
  ) {
    super(`database file ${JSON.stringify(path)}: ${reason}`);
  }
}

/**
 * Checks that `file` can hold a Runwright database: a path, not a directory, whose folder exists or
 * can be created. Returns the absolute path. It never opens the file (see the note at the top):
 * `openDatabase` refuses an existing file that is not an SQLite database, through SQLite, before it
 * writes anything.
 */
export function validateDatabaseFile(file: string, cwd = process.cwd()): string {
  if (file === ':memory:') return file;
  if (file.trim() === '' || file.includes('\u0000')) throw new DatabaseFileError(file, 'expected a file path');
  const abs = isAbsolute(file) ? file : resolve(cwd, file);
  let exists = false;
  try {
    const st = statSync(abs);
    if (st.isDirectory()) throw new DatabaseFileError(file, 'is a directory; expected a file path such as data/runwright.sqlite');
    exists = true;
  } catch (e) {
    if (e instanceof DatabaseFileError) throw e;
    if ((e as NodeJS.ErrnoException).code !== 'ENOENT') throw new DatabaseFileError(file, `cannot be read (${(e as Error).message})`);
  }
  if (!exists) {
    const parent = dirname(abs);
    try {
      mkdirSync(parent, { recursive: true });
    } catch (e) {
      throw new DatabaseFileError(file, `its folder ${parent} cannot be created (${(e as Error).message})`);
    }
  }
  return abs;
}

/**
 * The database file named by the environment (`RUNWRIGHT_DB_FILE`), or data/runwright.sqlite;
 * validated (see `validateDatabaseFile`; `openDatabase` then refuses a file that is not SQLite).
 */
export function databaseFileFromEnv(env: NodeJS.ProcessEnv = process.env, cwd = process.cwd()): string {
  const raw = env[DATABASE_FILE_ENV];
  if (raw !== undefined && raw.trim() === '') {
    throw new DatabaseFileError(raw, `${DATABASE_FILE_ENV} is set but blank; unset it or give a file path`);
  }
  return validateDatabaseFile(raw ?? DEFAULT_DATABASE_FILE, cwd);
}

/**
 * Opens `file` (or an in-memory database for ':memory:'), sets the pragmas and applies pending
 * migrations. The caller closes `sqlite` when done.
 */
export function openDatabase(file: string, options: { readonly migrationsFolder?: string } = {}): DatabaseHandle {
  const path = validateDatabaseFile(file);
  const sqlite = new Database(path);
  try {
    sqlite.pragma(`busy_timeout = ${BUSY_TIMEOUT_MS}`);
    // Reads the header (nothing is written yet): a file that is not an SQLite database is refused
    // here with SQLITE_NOTADB and left exactly as it was.
    try {
      sqlite.pragma('schema_version');
    } catch (e) {
      if ((e as { code?: string }).code === 'SQLITE_NOTADB') throw new DatabaseFileError(file, 'exists but is not an SQLite database; refusing to touch it');
      throw e;
    }
    if (path !== ':memory:') sqlite.pragma('journal_mode = WAL');
    sqlite.pragma('synchronous = FULL');
    sqlite.pragma('foreign_keys = ON');
    applyMigrations(sqlite, options.migrationsFolder ?? MIGRATIONS_FOLDER);
  } catch (e) {
    sqlite.close();
    throw e;
  }
  return { sqlite, db: drizzle({ client: sqlite, schema }) };
}

const MIGRATIONS_TABLE = '__drizzle_migrations';

/**
 * Applies the migrations newer than the last one recorded, with drizzle's bookkeeping table.
 *
 * Unlike drizzle's own migrator, this reads the last applied migration inside a BEGIN IMMEDIATE
 * transaction, so two processes starting on the same fresh file do not both try to create the tables:
 * the second waits for the first (busy timeout), then finds nothing left to apply.
 */
export function applyMigrations(sqlite: Database.Database, migrationsFolder: string): number {
  const migrations = readMigrationFiles({ migrationsFolder });
  sqlite.exec('BEGIN IMMEDIATE');
  try {
    sqlite.exec(`CREATE TABLE IF NOT EXISTS "${MIGRATIONS_TABLE}" (id SERIAL PRIMARY KEY, hash text NOT NULL, created_at numeric)`);
    const last = sqlite
      .prepare(`SELECT created_at FROM "${MIGRATIONS_TABLE}" ORDER BY created_at DESC LIMIT 1`)
      .get() as { created_at: number | string } | undefined;
    const insert = sqlite.prepare(`INSERT INTO "${MIGRATIONS_TABLE}" ("hash", "created_at") VALUES (?, ?)`);
    let applied = 0;
    for (const m of migrations) {
      if (last !== undefined && Number(last.created_at) >= m.folderMillis) continue;
      for (const stmt of m.sql) if (stmt.trim() !== '') sqlite.exec(stmt);
      insert.run(m.hash, m.folderMillis);
      applied++;
    }
    sqlite.exec('COMMIT');
    return applied;
  } catch (e) {
    if (sqlite.inTransaction) sqlite.exec('ROLLBACK');
    throw e;
  }
}

/**
 * The better-sqlite3 connection under a drizzle database or transaction (for prepared statements on
 * hot paths; statements run in the caller's open transaction, if any).
 */
export function connectionOf(db: object): Database.Database {
  const c = (db as { readonly $client?: unknown }).$client ?? (db as { readonly session?: { readonly client?: unknown } }).session?.client;
  if (!(c instanceof Database)) throw new Error('internal: expected a drizzle database over better-sqlite3');
  return c;
}
