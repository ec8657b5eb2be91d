/** Helpers for the import tests: the database as text, to prove a rejected import wrote nothing. */
import type Database from 'better-sqlite3';
import { expect } from 'vitest';
import { ImportError } from '../../../server/io/errors.js';

/** Every row of every table (sequence counters included), as text. */
export function dump(sqlite: Database.Database): string {
  const tables = (sqlite.prepare(`SELECT name FROM sqlite_master WHERE type = 'table' ORDER BY name`).all() as { name: string }[]).map((r) => r.name);
  return tables.map((t) => `${t}: ${JSON.stringify(sqlite.prepare(`SELECT * FROM "${t}" ORDER BY rowid`).all())}`).join('\n');
}

/** Runs `fn`, expects an ImportError, and returns it. */
export function importError(fn: () => unknown): ImportError {
  try {
    fn();
  } catch (e) {
    if (e instanceof ImportError) return e;
    throw e;
  }
  expect.fail('expected the import to be rejected');
}

/** 1-based number of the first line of `text` containing `needle`. */
export function lineOf(text: string, needle: string): number {
  const i = text.indexOf(needle);
  if (i < 0) throw new Error(`"${needle}" not in text`);
  return text.slice(0, i).split('\n').length;
}
