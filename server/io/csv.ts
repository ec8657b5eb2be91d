/**
 * CSV export and import of the aircraft catalogue and of a scenario's fleet rows.
 *
 * Columns are the profile's own field names, which carry their SI unit as a suffix (`mtow_kg`,
 * `wingArea_m2`, `staticThrust_N`, `cruise.speed_mps`); a name without a suffix is a ratio, a count or
 * text. The column list is built from AIRCRAFT_FIELDS and CRUISE_FIELDS (core/aircraft.ts), so the CSV,
 * the forms and the validation share one table. Documented in docs/storage.md.
 *
 * Import is all-or-nothing: the bytes must be UTF-8; the header must hold only known columns, each
 * once, and every always-required column; every row is validated with the same zod schema as the JSON
 * file; ids must be unique in the file. Any problem rejects the file (ImportError, listing line, column
 * and reason) before anything is written; otherwise everything is written in one transaction.
 * `parseAircraftCsv` does the checking without a database (a worker thread runs it); the commit is
 * shared with the JSON import (server/aircraft/catalogue.ts).
 * A blank cell is "missing", never zero. The reference table (a 3-D grid) is not carried by the CSV.
 */
import { parse } from 'csv-parse/sync';
import { stringify } from 'csv-stringify/sync';
import type { z } from 'zod';
import { AIRCRAFT_FIELDS, CRUISE_FIELDS, type AircraftProfile, type FleetRowInput } from '../../core/index.js';
import { existingAircraftIds, listAircraft } from '../../db/repos/aircraft.js';
import { getScenario, setScenarioFleet } from '../../db/repos/studies.js';
import { NotFoundError } from '../../db/errors.js';
import { transaction } from '../../db/transaction.js';
import type { Db } from '../../db/types.js';
import { commitCatalogue, packValidated, type ParsedCatalogue } from '../aircraft/index.js';
import { aircraftSchema } from '../aircraft/index.js';
import { fleetRowSchema } from '../studies/index.js';
import { ImportError, MAX_PROBLEMS, type ImportProblem } from './errors.js';
import { PLAIN_NUMBER, csvSafeRecords, restoreCsvCell } from './csvSafe.js';
import { decodeUtf8 } from './text.js';

type CellKind = 'text' | 'number';

/** One documented CSV column. */
export interface CsvColumn {
  /** Header text; also the dotted path of the value in the profile. */
  readonly header: string;
  readonly kind: CellKind;
  /** SI unit ('' for ratios, counts and text). */
  readonly unit: string;
  /** The column must be present in the header (its value may still be blank when optional). */
  readonly requiredColumn: boolean;
  readonly doc: string;
}

const textCol = (header: string, requiredColumn: boolean, doc: string): CsvColumn => ({ header, kind: 'text', unit: '', requiredColumn, doc });

/** Aircraft catalogue columns, in export order. */
export const AIRCRAFT_CSV_COLUMNS: readonly CsvColumn[] = [
  textCol('id', true, 'Identifier, unique in the catalogue (letters, digits, dot, dash, underscore).'),
  textCol('name', true, 'Display name.'),
  textCol('group', false, 'Group of similar aircraft counted together (optional).'),
  textCol('certification', true, 'transport, commuter or normal.'),
  textCol('engineType', true, 'turbofan, turboprop or piston.'),
  textCol('gear', true, 'tricycle or tailwheel.'),
  textCol('thrustLapse', false, 'mattingly or bartel-young (turbofan, optional).'),
  ...AIRCRAFT_FIELDS.map((f): CsvColumn => ({ header: f.key, kind: 'number', unit: f.unit, requiredColumn: f.when === 'always', doc: `${f.label}. ${f.doc} Range ${f.min} to ${f.max}${f.unit ? ' ' + f.unit : ''}; ${whenText(f.when)}.` })),
  ...CRUISE_FIELDS.map((f): CsvColumn => ({ header: `cruise.${f.key}`, kind: 'number', unit: f.unit, requiredColumn: false, doc: `${f.label}. ${f.doc} Range ${f.min} to ${f.max}${f.unit ? ' ' + f.unit : ''}; ${f.when === 'always' ? 'required when any cruise value is given' : whenText(f.when)}.` })),
  { header: 'reference.takeoff_m', kind: 'number', unit: 'm', requiredColumn: false, doc: 'Reference takeoff field length at MTOW, sea level, ISA (optional). Range 100 to 5000 m.' },
  { header: 'reference.landing_m', kind: 'number', unit: 'm', requiredColumn: false, doc: 'Reference landing field length at MLW, sea level, ISA (optional). Range 100 to 5000 m.' },
];

function whenText(when: string): string {
  switch (when) {
    case 'always': return 'required';
    case 'turbofan': return 'required for turbofans';
    case 'propeller': return 'required for turboprops and pistons';
    case 'multiEngine': return 'required for multi-engine aircraft';
    case 'tailwheel': return 'required for tailwheel aircraft';
    default: return 'optional';
  }
}

/** Fleet-row columns, in export order. */
export const FLEET_CSV_COLUMNS: readonly CsvColumn[] = [
  textCol('aircraft', true, 'Aircraft id in the catalogue.'),
  { header: 'annualOperations', kind: 'number', unit: 'operations/year', requiredColumn: true, doc: 'Annual operations (takeoffs and landings each count one); whole number 0 to 1,000,000.' },
  { header: 'stageLength_km', kind: 'number', unit: 'km', requiredColumn: true, doc: 'Longest regular route (design stage length), 1 to 20,000 km.' },
  { header: 'payload_kg', kind: 'number', unit: 'kg', requiredColumn: true, doc: 'Payload on that route, 0 to 150,000 kg.' },
];

// ---------------------------------------------------------------------------------------------- export

function getPath(obj: unknown, header: string): unknown {
  let v: unknown = obj;
  for (const k of header.split('.')) v = v === undefined || v === null ? undefined : (v as Record<string, unknown>)[k];
  return v;
}

function toCsv(columns: readonly CsvColumn[], rows: readonly unknown[]): string {
  const records = rows.map((r) =>
    columns.map((c) => {
      const v = getPath(r, c.header);
      return v === undefined || v === null ? '' : String(v);
    }),
  );
  return stringify(csvSafeRecords([columns.map((c) => c.header), ...records]), { record_delimiter: '\n' });
}

/** Aircraft profiles as catalogue CSV text (header row, then one row per profile, in the given order). */
export function aircraftToCsv(profiles: readonly AircraftProfile[]): string {
  return toCsv(AIRCRAFT_CSV_COLUMNS, profiles);
}

/** The whole catalogue as CSV (header row, then one row per aircraft, ordered by name). */
export function exportAircraftCsv(db: Db): string {
  return aircraftToCsv(listAircraft(db));
}

/** The fleet rows of scenario `scenarioId` as CSV. NotFoundError when the scenario does not exist. */
export function exportFleetCsv(db: Db, scenarioId: number): string {
  const s = getScenario(db, scenarioId);
  if (!s) throw new NotFoundError('scenario', scenarioId);
  return toCsv(FLEET_CSV_COLUMNS, s.fleet);
}

// ---------------------------------------------------------------------------------------------- import

interface CsvRow {
  /** 1-based line where the record starts. */
  readonly line: number;
  readonly cells: readonly string[];
}

interface CsvParseError {
  code?: string;
  lines?: number;
  index?: number;
  message: string;
}

function syntaxReason(e: CsvParseError, headerLength: number | undefined): string {
  switch (e.code) {
    case 'CSV_QUOTE_NOT_CLOSED': return 'a quoted field is never closed (missing closing ")';
    case 'CSV_INVALID_CLOSING_QUOTE': return 'characters follow a closing quote; inside a quoted field write a quote as ""';
    case 'INVALID_OPENING_QUOTE': return 'a quote appears inside an unquoted field; quote the whole field and double the inner quotes';
    case 'CSV_RECORD_INCONSISTENT_FIELDS_LENGTH': {
      const got = /got (\d+)/.exec(e.message)?.[1];
      return `this row has ${got ?? 'a different number of'} fields; the header has ${headerLength ?? 'another number'}`;
    }
    default: return `not valid CSV: ${e.message}`;
  }
}

/** Splits CSV text into records with their starting lines; throws ImportError on bad quoting. */
function readCsv(text: string, what: string): { header: string[]; rows: CsvRow[] } {
  let records: { record: string[]; info: { bytes: number } }[];
  try {
    records = parse(text, { info: true, skip_empty_lines: true, relax_column_count: false }) as unknown as typeof records;
  } catch (e) {
    const err = e as CsvParseError;
    let header: string[] | undefined;
    try {
      header = (parse(text, { to_line: 1 }) as string[][])[0];
    } catch {
      header = undefined;
    }
    const col = err.index !== undefined && header ? header[err.index] : undefined;
    throw new ImportError(what, [{ ...(err.lines === undefined ? {} : { line: err.lines }), ...(col === undefined ? {} : { field: col }), reason: syntaxReason(err, header?.length) }]);
  }
  if (records.length === 0) throw new ImportError(what, [{ reason: 'the file is empty; expected a header row and at least one data row' }]);
  // Each record starts where the previous one ended (`info.bytes`, in UTF-8 bytes), after any blank
  // lines; its line is counted from the bytes (the parser's own line count drifts on CRLF inside quotes).
  const buf = Buffer.from(text, 'utf8');
  const newlines: number[] = [];
  for (let i = buf.indexOf(0x0a); i >= 0; i = buf.indexOf(0x0a, i + 1)) newlines.push(i);
  const lineAt = (offset: number): number => {
    let lo = 0;
    let hi = newlines.length;
    while (lo < hi) {
      const mid = (lo + hi) >> 1;
      if (newlines[mid]! < offset) lo = mid + 1;
      else hi = mid;
    }
    return lo + 1;
  };
  let start = 0;
  const rows = records.map(({ record, info }) => {
    while (start < buf.length && (buf[start] === 0x0a || buf[start] === 0x0d)) start++;
    const row = { line: lineAt(start), cells: record };
    start = info.bytes;
    return row;
  });
  const [head, ...data] = rows;
  return { header: head!.cells.map((h) => h.trim()), rows: data };
}

function checkHeader(header: readonly string[], columns: readonly CsvColumn[], what: string): void {
  const known = new Map(columns.map((c) => [c.header, c]));
  const lower = new Map(columns.map((c) => [c.header.toLowerCase(), c.header]));
  const problems: ImportProblem[] = [];
  const seen = new Set<string>();
  header.forEach((h, i) => {
    if (h === '') problems.push({ line: 1, field: `#${i + 1}`, reason: 'blank column name' });
    else if (seen.has(h)) problems.push({ line: 1, field: h, reason: 'the column appears twice' });
    else if (!known.has(h)) {
      const near = lower.get(h.toLowerCase());
      problems.push({ line: 1, field: h, reason: `unknown column${near ? `; did you mean "${near}"?` : ''} (the columns are listed in docs/storage.md)` });
    }
    seen.add(h);
  });
  for (const c of columns) if (c.requiredColumn && !seen.has(c.header)) problems.push({ line: 1, field: c.header, reason: 'required column is missing from the header' });
  if (problems.length > 0) throw new ImportError(what, problems.slice(0, MAX_PROBLEMS));
}

const NUMBER_RE = PLAIN_NUMBER;

/** Builds the nested object of one row: blank cells are left out; numbers parsed strictly. */
function rowObject(header: readonly string[], columns: ReadonlyMap<string, CsvColumn>, cells: readonly string[]): Record<string, unknown> {
  const out: Record<string, unknown> = {};
  header.forEach((h, i) => {
    const raw = restoreCsvCell((cells[i] ?? '').trim());
    if (raw === '') return;
    const col = columns.get(h)!;
    const value = col.kind === 'number' ? (NUMBER_RE.test(raw) ? Number(raw) : raw) : raw;
    const keys = h.split('.');
    let target = out;
    for (const k of keys.slice(0, -1)) target = (target[k] ??= {}) as Record<string, unknown>;
    target[keys[keys.length - 1]!] = value;
  });
  return out;
}

/** One problem per field (the first issue; later rules on the same field repeat it). */
function issuesToProblems(line: number, error: z.ZodError): ImportProblem[] {
  const seen = new Set<string>();
  const out: ImportProblem[] = [];
  for (const iss of error.issues) {
    const path = iss.path.map(String).join('.');
    if (seen.has(path)) continue;
    seen.add(path);
    out.push({ line, ...(path === '' ? {} : { field: path }), reason: iss.message });
  }
  return out;
}

function parseRows<T>(
  text: string,
  what: string,
  columns: readonly CsvColumn[],
  schema: z.ZodType<T>,
): { rows: { line: number; value: T }[] } {
  const { header, rows } = readCsv(text, what);
  checkHeader(header, columns, what);
  if (rows.length === 0) throw new ImportError(what, [{ line: 2, reason: 'the file has a header but no data rows' }]);
  const byHeader = new Map(columns.map((c) => [c.header, c]));
  const problems: ImportProblem[] = [];
  const out: { line: number; value: T }[] = [];
  for (const row of rows) {
    if (problems.length >= MAX_PROBLEMS) break;
    const r = schema.safeParse(rowObject(header, byHeader, row.cells), { reportInput: true });
    if (r.success) out.push({ line: row.line, value: r.data });
    else problems.push(...issuesToProblems(row.line, r.error));
  }
  if (problems.length > 0) throw new ImportError(what, problems.slice(0, MAX_PROBLEMS));
  return { rows: out };
}

export interface AircraftCsvImportOptions {
  /**
   * What to do with an id already in the catalogue: 'reject' (default) refuses the file; 'replace'
   * overwrites that aircraft (its reference table, which the CSV does not carry, is kept).
   */
  readonly onExisting?: 'reject' | 'replace';
}

export interface AircraftCsvImportResult {
  readonly created: readonly string[];
  readonly replaced: readonly string[];
}

/** Parses and checks an aircraft catalogue CSV (no database). Throws ImportError listing every problem found. */
export function parseAircraftCsv(input: string | Uint8Array): ParsedCatalogue {
  const what = 'aircraft CSV';
  const text = decodeUtf8(input, what);
  const { rows } = parseRows(text, what, AIRCRAFT_CSV_COLUMNS, aircraftSchema);

  const problems: ImportProblem[] = [];
  const firstLine = new Map<string, number>();
  for (const { line, value } of rows) {
    if (problems.length >= MAX_PROBLEMS) break;
    const prev = firstLine.get(value.id);
    if (prev !== undefined) problems.push({ line, field: 'id', reason: `duplicate id "${value.id}" (also on line ${prev})` });
    else firstLine.set(value.id, line);
  }
  if (problems.length > 0) throw new ImportError(what, problems);
  return { what, rows: packValidated(rows.map((r) => r.value)), lines: Int32Array.from(rows, (r) => r.line) };
}

/** Imports an aircraft catalogue CSV (all or nothing). Throws ImportError listing every problem found. */
export function importAircraftCsv(db: Db, input: string | Uint8Array, options: AircraftCsvImportOptions = {}): AircraftCsvImportResult {
  return commitCatalogue(db, parseAircraftCsv(input), { replace: options.onExisting === 'replace' });
}

/**
 * Replaces the fleet rows of scenario `scenarioId` with the rows of a fleet CSV (all or nothing).
 * Every aircraft must be in the catalogue. NotFoundError when the scenario does not exist.
 */
export function importFleetCsv(db: Db, scenarioId: number, input: string | Uint8Array): { readonly rows: number } {
  const what = 'fleet CSV';
  const text = decodeUtf8(input, what);
  const { rows } = parseRows(text, what, FLEET_CSV_COLUMNS, fleetRowSchema as unknown as z.ZodType<FleetRowInput>);
  return transaction(db, (tx) => {
    if (!getScenario(tx, scenarioId)) throw new NotFoundError('scenario', scenarioId);
    const known = existingAircraftIds(tx, rows.map((r) => r.value.aircraft));
    const unknown = rows.filter((r) => !known.has(r.value.aircraft));
    if (unknown.length > 0) {
      throw new ImportError(
        what,
        unknown.slice(0, MAX_PROBLEMS).map((r) => ({ line: r.line, field: 'aircraft', reason: `aircraft "${r.value.aircraft}" is not in the catalogue; add it first` })),
      );
    }
    setScenarioFleet(tx, scenarioId, rows.map((r) => r.value));
    return { rows: rows.length };
  });
}
