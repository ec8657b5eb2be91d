/**
 * The long-running tasks, as plain functions of plain data (they run inline or in a worker thread):
 * computing a study, reading a climate station file, and importing a catalogue file into a database
 * file (on a connection of its own: WAL lets the server's connection read meanwhile). Errors are
 * carried across the thread boundary as plain objects and rebuilt with their type (ImportError,
 * InputDomainError, DuplicateIdError).
 */
import { InputDomainError, type StudyInput } from '../../core/index.js';
import { openDatabase } from '../../db/client.js';
import { DuplicateIdError } from '../../db/errors.js';
import { importAircraftJson, type CatalogueImportResult } from '../catalogue.js';
import { importAircraftCsv } from '../io/csv.js';
import { readClimateFile, type ClimateFileInput, type ClimateFileResult } from '../io/climate.js';
import { ImportError, type ImportProblem } from '../io/errors.js';
import { studyOutput, type StudyOutput } from '../study.js';

export interface CatalogueImportTask {
  /** Database file to import into (never ':memory:': another thread cannot see that database). */
  readonly dbFile: string;
  readonly format: 'csv' | 'json';
  readonly data: Uint8Array;
  readonly replace: boolean;
}

export interface Tasks {
  study: { input: StudyInput; output: StudyOutput };
  climate: { input: ClimateFileInput; output: ClimateFileResult };
  catalogue: { input: CatalogueImportTask; output: CatalogueImportResult };
}

/** Imports a catalogue file into the database file, on a connection opened for the purpose. */
export function importCatalogueFile(t: CatalogueImportTask): CatalogueImportResult {
  if (t.dbFile === ':memory:') throw new Error('a catalogue import in a worker needs a database file');
  const { db, sqlite } = openDatabase(t.dbFile);
  try {
    return t.format === 'json'
      ? importAircraftJson(db, t.data, { replace: t.replace })
      : importAircraftCsv(db, t.data, { onExisting: t.replace ? 'replace' : 'reject' });
  } finally {
    sqlite.close();
  }
}
export type TaskName = keyof Tasks;

export function runTask<K extends TaskName>(name: K, input: Tasks[K]['input']): Tasks[K]['output'] {
  switch (name) {
    case 'study': return studyOutput(input as StudyInput) as Tasks[K]['output'];
    case 'climate': return readClimateFile(input as ClimateFileInput) as Tasks[K]['output'];
    case 'catalogue': return importCatalogueFile(input as CatalogueImportTask) as Tasks[K]['output'];
    default: throw new Error(`unknown task ${String(name)}`);
  }
}

export type SerialError =
  | { readonly kind: 'import'; readonly what: string; readonly problems: readonly ImportProblem[] }
  | { readonly kind: 'domain'; readonly field: string; readonly value: unknown; readonly allowed: string }
  | { readonly kind: 'duplicate'; readonly what: 'aircraft' | 'site' | 'study'; readonly id: string | number }
  | { readonly kind: 'other'; readonly name: string; readonly message: string };

export function serialiseError(e: unknown): SerialError {
  if (e instanceof ImportError) return { kind: 'import', what: e.what, problems: e.problems };
  if (e instanceof InputDomainError) return { kind: 'domain', field: e.field, value: e.value, allowed: e.allowed };
  if (e instanceof DuplicateIdError) return { kind: 'duplicate', what: e.kind, id: e.id };
  const err = e instanceof Error ? e : new Error(String(e));
  return { kind: 'other', name: err.name, message: err.message };
}

export function rebuildError(s: SerialError): Error {
  if (s.kind === 'import') return new ImportError(s.what, s.problems);
  if (s.kind === 'domain') return new InputDomainError(s.field, s.value, s.allowed);
  if (s.kind === 'duplicate') return new DuplicateIdError(s.what, s.id);
  const e = new Error(s.message);
  e.name = s.name;
  return e;
}
