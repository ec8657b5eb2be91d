/**
 * Catalogue import and export, JSON side (the CSV side lives in server/io/csv.ts), and the commit both
 * share. A JSON catalogue is a list of aircraft profiles, or an object `{ "aircraft": [...] }` (so a
 * study file's aircraft can be taken as they are); each profile is checked with the same schema as
 * study files. All or nothing: any problem rejects the file with line, column and JSON path, and
 * nothing is written.
 *
 * An import is two steps. Parsing (`parseAircraftJson`, `parseAircraftCsv`) is CPU work on plain data
 * (decoding, parsing, zod and core checks, duplicate ids): it runs in a worker thread and hands back
 * validated rows, packed so that the hand-over costs the main thread nothing (db/repos/aircraft.ts,
 * PackedAircraft). Committing (`commitCatalogue`, or `commitCatalogueBulk` on the server's bulk
 * connection) writes them in one transaction, refusing ids already in the catalogue unless asked to
 * replace them. Worker threads never open the database (docs/storage.md).
 */
import { z } from 'zod';
import { validateAircraft, type AircraftProfile } from '../../core/index.js';
import type { BulkWriter } from '../../db/bulk.js';
import { connectionOf } from '../../db/client.js';
import { bulkImportAircraft, ExistingAircraftError, listAircraft, packAircraft, runSteps, type PackedAircraft } from '../../db/repos/aircraft.js';
import { transaction } from '../../db/transaction.js';
import type { Db } from '../../db/types.js';
import { ImportError, MAX_PROBLEMS, type ImportProblem } from '../io/errors.js';
import { decodeUtf8, locateArrayItemKeys, locateJsonPath, parseJsonText } from '../io/text.js';
import { aircraftSchema } from './schema.js';
import { formatPath } from '../common/schema.js';

export interface CatalogueImportResult {
  readonly created: readonly string[];
  readonly replaced: readonly string[];
}

/** The catalogue as a JSON document (two-space indentation, final newline). */
export function exportAircraftJson(db: Db): string {
  return `${JSON.stringify(listAircraft(db), null, 2)}\n`;
}

/**
 * A parsed, validated catalogue file: plain data a worker thread hands to the main thread (typed arrays
 * transferred), with what the commit needs to word a refusal (where each row's id is in the file).
 */
export interface ParsedCatalogue {
  readonly what: 'aircraft CSV' | 'aircraft JSON';
  readonly rows: PackedAircraft;
  /** Line of each row's id in the file. */
  readonly lines: Int32Array;
  /** Column (character) of each row's id in a JSON file. */
  readonly columns?: Int32Array;
  /** JSON: the path of the list in the document ([] or ["aircraft"]). */
  readonly jsonPrefix?: readonly string[];
}

/** Typed-array buffers of a parsed catalogue, to transfer rather than copy across threads. */
export function catalogueTransferList(p: ParsedCatalogue): ArrayBuffer[] {
  return [p.rows.numbers.buffer, p.rows.textNull.buffer, p.lines.buffer, ...(p.columns ? [p.columns.buffer] : [])] as ArrayBuffer[];
}

/** Checks validated profiles with core's rules (as every write does) and packs them. */
export function packValidated(profiles: readonly AircraftProfile[]): PackedAircraft {
  profiles.forEach((p, i) => validateAircraft(p, profiles.length === 1 ? 'aircraft' : `aircraft[${i}]`));
  return packAircraft(profiles);
}

/** Parses and checks a JSON list of aircraft profiles (no database). Throws ImportError. */
export function parseAircraftJson(input: string | Uint8Array): ParsedCatalogue {
  const what = 'aircraft JSON';
  const text = decodeUtf8(input, what);
  const doc = parseJsonText(text, what);
  const prefix: string[] = Array.isArray(doc) ? [] : ['aircraft'];
  const list = Array.isArray(doc) ? doc : typeof doc === 'object' && doc !== null ? (doc as { aircraft?: unknown }).aircraft : undefined;
  if (!Array.isArray(list)) throw new ImportError(what, [{ line: 1, column: 1, reason: 'expected a list of aircraft profiles, or an object with an "aircraft" list' }]);
  if (list.length === 0) throw new ImportError(what, [{ line: 1, column: 1, reason: 'the list of aircraft is empty' }]);
  const r = z.array(aircraftSchema).safeParse(list, { reportInput: true });
  const place = (path: readonly PropertyKey[]): { line: number; column: number } => {
    const { line, char } = locateJsonPath(text, [...prefix, ...path]);
    return { line, column: char };
  };
  if (!r.success) {
    const problems: ImportProblem[] = r.error.issues.slice(0, MAX_PROBLEMS).map((i) => ({ ...place(i.path), field: formatPath([...prefix, ...i.path]), reason: i.message }));
    throw new ImportError(what, problems);
  }
  const profiles = r.data;
  const seen = new Map<string, number>();
  const dup: ImportProblem[] = [];
  profiles.forEach((p, i) => {
    if (dup.length >= MAX_PROBLEMS) return;
    const prev = seen.get(p.id);
    if (prev !== undefined) dup.push({ ...place([i, 'id']), field: formatPath([...prefix, i, 'id']), reason: `duplicate id "${p.id}" (also at index ${prev})` });
    else seen.set(p.id, i);
  });
  if (dup.length > 0) throw new ImportError(what, dup);
  const rows = packValidated(profiles);
  const places = locateArrayItemKeys(text, prefix, 'id');
  return {
    what,
    rows,
    lines: Int32Array.from(profiles, (_, i) => places[i]?.line ?? 1),
    columns: Int32Array.from(profiles, (_, i) => places[i]?.char ?? 1),
    jsonPrefix: prefix,
  };
}

/** The refusal of an import whose rows name aircraft already in the catalogue (the first 50). */
function existingProblem(p: ParsedCatalogue, e: ExistingAircraftError): ImportError {
  const problems = e.rows.slice(0, MAX_PROBLEMS).map((i, k): ImportProblem => {
    const id = e.ids[k]!;
    return p.jsonPrefix === undefined
      ? { line: p.lines[i]!, field: 'id', reason: `aircraft "${id}" is already in the catalogue; remove the row, or import with "replace existing aircraft"` }
      : { line: p.lines[i]!, column: p.columns?.[i] ?? 1, field: formatPath([...p.jsonPrefix, i, 'id']), reason: `aircraft "${id}" is already in the catalogue; remove it from the file, or import with "replace"` };
  });
  return new ImportError(p.what, problems);
}

/**
 * Writes a parsed catalogue in one synchronous transaction (a savepoint inside the caller's): ids
 * already in the catalogue are refused unless `replace`, which overwrites them in place (a replaced
 * aircraft keeps its reference table when the file has none). For the command line, tests and small
 * imports; the server commits with `commitCatalogueBulk`.
 */
export function commitCatalogue(db: Db, parsed: ParsedCatalogue, options: { readonly replace?: boolean } = {}): CatalogueImportResult {
  try {
    return transaction(db, (tx) => runSteps(bulkImportAircraft(connectionOf(tx), parsed.rows, { replace: options.replace === true })));
  } catch (e) {
    if (e instanceof ExistingAircraftError) throw existingProblem(parsed, e);
    throw e;
  }
}

/**
 * The same commit on the server's bulk connection: one transaction, with the event loop free between
 * steps, while the process's other writes wait in the write gate (db/bulk.ts).
 */
export async function commitCatalogueBulk(bulk: BulkWriter, parsed: ParsedCatalogue, options: { readonly replace?: boolean } = {}): Promise<CatalogueImportResult> {
  try {
    return await bulk.run((sqlite) => bulkImportAircraft(sqlite, parsed.rows, { replace: options.replace === true }));
  } catch (e) {
    if (e instanceof ExistingAircraftError) throw existingProblem(parsed, e);
    throw e;
  }
}

/** Imports a JSON list of aircraft profiles; `replace` overwrites ids already in the catalogue. */
export function importAircraftJson(db: Db, input: string | Uint8Array, options: { readonly replace?: boolean } = {}): CatalogueImportResult {
  return commitCatalogue(db, parseAircraftJson(input), options);
}
