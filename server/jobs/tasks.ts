/**
 * The long-running tasks, as plain functions of plain data (they run inline or in a worker thread):
 * computing a study, reading a climate station file, drawing an appendix PDF (pdfTask.ts), and
 * parsing and checking a catalogue file (the main thread then commits the validated rows: no task
 * ever opens the database; docs/storage.md, "One owner of the database file"). Errors are carried
 * across the thread boundary as plain objects and rebuilt with their type (ImportError, InputDomainError
 * with its range, ConvergenceError, DuplicateIdError); the inline runner passes its errors through the
 * same boundary, so tests see what the workers give.
 */
import { ConvergenceError, InputDomainError, type DomainRange, type StudyInput } from '../../core/index.js';
import { DuplicateIdError } from '../../db/errors.js';
import { catalogueTransferList, parseAircraftJson, type ParsedCatalogue } from '../aircraft/index.js';
import { parseAircraftCsv } from '../io/csv.js';
import { readClimateFile, type ClimateFileInput, type ClimateFileResult } from '../io/climate.js';
import { ImportError, type ImportProblem } from '../io/errors.js';
import { pdfTransferList, renderPdfTask, type PdfTaskInput } from './pdfTask.js';
import { studyOutput, type StudyOutput } from '../studies/index.js';

export interface CatalogueParseTask {
  readonly format: 'csv' | 'json';
  readonly data: Uint8Array;
}

export interface Tasks {
  study: { input: StudyInput; output: StudyOutput };
  climate: { input: ClimateFileInput; output: ClimateFileResult };
  catalogue: { input: CatalogueParseTask; output: ParsedCatalogue };
  pdf: { input: PdfTaskInput; output: Uint8Array };
}

/** Parses and checks a catalogue file: validated rows for the main thread to commit (no database). */
export function parseCatalogueFile(t: CatalogueParseTask): ParsedCatalogue {
  return t.format === 'json' ? parseAircraftJson(t.data) : parseAircraftCsv(t.data);
}

/** Buffers of a task's output to transfer (not copy) back to the main thread. */
export function transferList(name: TaskName, output: unknown): ArrayBuffer[] {
  return name === 'catalogue' ? catalogueTransferList(output as ParsedCatalogue) : name === 'pdf' ? pdfTransferList(output as Uint8Array) : [];
}
export type TaskName = keyof Tasks;

export function runTask<K extends TaskName>(name: K, input: Tasks[K]['input']): Tasks[K]['output'] | Promise<Tasks[K]['output']> {
  switch (name) {
    case 'study': return studyOutput(input as StudyInput) as Tasks[K]['output'];
    case 'climate': return readClimateFile(input as ClimateFileInput) as Tasks[K]['output'];
    case 'catalogue': return parseCatalogueFile(input as CatalogueParseTask) as Tasks[K]['output'];
    case 'pdf': return renderPdfTask(input as PdfTaskInput) as Promise<Tasks[K]['output']>;
    default: throw new Error(`unknown task ${String(name)}`);
  }
}

export type SerialError =
  | { readonly kind: 'import'; readonly what: string; readonly problems: readonly ImportProblem[] }
  | { readonly kind: 'domain'; readonly field: string; readonly value: unknown; readonly allowed: string; readonly range?: DomainRange }
  | { readonly kind: 'convergence'; readonly solver: string; readonly iterations: number; readonly residual: number }
  | { readonly kind: 'duplicate'; readonly what: 'aircraft' | 'site' | 'study'; readonly id: string | number }
  | { readonly kind: 'other'; readonly name: string; readonly message: string; readonly stack?: string };

export function serialiseError(e: unknown): SerialError {
  if (e instanceof ImportError) return { kind: 'import', what: e.what, problems: e.problems };
  if (e instanceof InputDomainError) return { kind: 'domain', field: e.field, value: e.value, allowed: e.allowed, ...(e.range ? { range: e.range } : {}) };
  if (e instanceof ConvergenceError) return { kind: 'convergence', solver: e.solver, iterations: e.iterations, residual: e.residual };
  if (e instanceof DuplicateIdError) return { kind: 'duplicate', what: e.kind, id: e.id };
  const err = e instanceof Error ? e : new Error(String(e));
  return { kind: 'other', name: err.name, message: err.message, ...(err.stack ? { stack: err.stack } : {}) };
}

export function rebuildError(s: SerialError): Error {
  if (s.kind === 'import') return new ImportError(s.what, s.problems);
  if (s.kind === 'domain') return new InputDomainError(s.field, s.value, s.allowed, s.range);
  if (s.kind === 'convergence') return new ConvergenceError(s.solver, s.iterations, s.residual);
  if (s.kind === 'duplicate') return new DuplicateIdError(s.what, s.id);
  const e = new Error(s.message);
  e.name = s.name;
  if (s.stack) e.stack = s.stack;
  return e;
}
