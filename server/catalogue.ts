/**
 * Catalogue JSON import and export (the CSV side lives in server/io/csv.ts). A JSON catalogue is a list
 * of aircraft profiles, or an object `{ "aircraft": [...] }` (so a study file's aircraft can be taken
 * as they are); each profile is checked with the same schema as study files. All or nothing: any
 * problem rejects the file with line, column and JSON path, and nothing is written.
 */
import { z } from 'zod';
import type { AircraftProfile } from '../core/index.js';
import { createAircraftMany, existingAircraftIds, getAircraft, listAircraft, updateAircraft } from '../db/repos/aircraft.js';
import { transaction } from '../db/transaction.js';
import type { Db } from '../db/types.js';
import { ImportError, MAX_PROBLEMS, type ImportProblem } from './io/errors.js';
import { decodeUtf8, locateJsonPath, parseJsonText } from './io/text.js';
import { aircraftSchema } from './schemas/aircraft.js';
import { formatPath } from './schemas/common.js';

export interface CatalogueImportResult {
  readonly created: readonly string[];
  readonly replaced: readonly string[];
}

/** The catalogue as a JSON document (two-space indentation, final newline). */
export function exportAircraftJson(db: Db): string {
  return `${JSON.stringify(listAircraft(db), null, 2)}\n`;
}

/** Imports a JSON list of aircraft profiles; `replace` overwrites ids already in the catalogue. */
export function importAircraftJson(db: Db, input: string | Uint8Array, options: { readonly replace?: boolean } = {}): CatalogueImportResult {
  const what = 'aircraft JSON';
  const text = decodeUtf8(input, what);
  const doc = parseJsonText(text, what);
  const prefix: (string | number)[] = Array.isArray(doc) ? [] : ['aircraft'];
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
    const prev = seen.get(p.id);
    if (prev !== undefined) dup.push({ ...place([i, 'id']), field: formatPath([...prefix, i, 'id']), reason: `duplicate id "${p.id}" (also at index ${prev})` });
    else seen.set(p.id, i);
  });
  if (dup.length > 0) throw new ImportError(what, dup.slice(0, MAX_PROBLEMS));
  return transaction(db, (tx) => {
    const existing = existingAircraftIds(tx, profiles.map((p) => p.id));
    if (existing.size > 0 && !options.replace) {
      throw new ImportError(what, profiles.flatMap((p, i) => (existing.has(p.id)
        ? [{ ...place([i, 'id']), field: formatPath([...prefix, i, 'id']), reason: `aircraft "${p.id}" is already in the catalogue; remove it from the file, or import with "replace"` }]
        : [])).slice(0, MAX_PROBLEMS));
    }
    const fresh = profiles.filter((p) => !existing.has(p.id));
    createAircraftMany(tx, fresh);
    const replaced: string[] = [];
    for (const p of profiles) {
      if (!existing.has(p.id)) continue;
      const table = getAircraft(tx, p.id)?.reference?.table;
      const profile: AircraftProfile = p.reference?.table !== undefined || table === undefined ? p : { ...p, reference: { ...p.reference, table } };
      updateAircraft(tx, p.id, profile);
      replaced.push(p.id);
    }
    return { created: fresh.map((p) => p.id), replaced };
  });
}
