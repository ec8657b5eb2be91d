/**
 * Whole-workspace export and import: every aircraft, site and study (with scenarios, fleet rows and
 * saved results) in one versioned JSON document.
 *
 * Document (docs/storage.md, "Workspace file"):
 *   { "format": "runwright-workspace", "version": 1,
 *     "aircraft": [AircraftProfile...],
 *     "sites":    [{ "id", ...SiteInput }],
 *     "studies":  [{ "id", "name", "siteId", "options", "scenarios": [{ "name", "fleet": [...] }],
 *                    "savedResults": [{ "createdAt", "methodVersion", "inputDigest", "input", "result" }] }] }
 *
 * Export is deterministic (aircraft by name then id, sites and studies by id, saved results oldest
 * first, keys in a fixed order, two-space indentation, final newline), so export → import into an
 * empty database → export gives the same bytes. Site and study ids are kept on import.
 *
 * Import is all-or-nothing: UTF-8 only; the JSON must parse; the document must match the schema (the
 * same zod schemas as the study file, relaxed to allow work in progress: a site without runways, a
 * scenario without fleet rows); ids must be unique; references must resolve. Every problem is reported
 * with its line, column and JSON path, and nothing is written; otherwise everything is written in one
 * transaction.
 */
import { z } from 'zod';
import type { AircraftProfile, ScenarioInput, SiteInput, StudyOptions } from '../../core/index.js';
import { countAircraft, createAircraftMany, listAircraft } from '../../db/repos/aircraft.js';
import { createSite, getSite, listSiteIds, siteInput } from '../../db/repos/sites.js';
import { allStudyResults, createStudy, getStudy, listStudyIds, saveStudyResult } from '../../db/repos/studies.js';
import { savedResults, scenarios, sites, studies, aircraft as aircraftTable } from '../../db/schema.js';
import { transaction } from '../../db/transaction.js';
import type { Db } from '../../db/types.js';
import { aircraftSchema } from '../aircraft/index.js';
import { formatPath, int, text } from '../common/schema.js';
import { climateSchema, runwaySchema, siteSchema } from '../sites/index.js';
import { fleetRowSchema, optionsSchema, scenarioSchema } from '../studies/index.js';
import { ImportError, MAX_PROBLEMS, type ImportProblem } from './errors.js';
import { decodeUtf8, locateJsonPath, parseJsonText } from './text.js';

export const WORKSPACE_FORMAT = 'runwright-workspace';
export const WORKSPACE_VERSION = 1;

export interface WorkspaceSite extends SiteInput {
  readonly id: number;
}

export interface WorkspaceSavedResult {
  /** ISO 8601, UTC. */
  readonly createdAt: string;
  readonly methodVersion: string;
  readonly inputDigest: string;
  readonly input: unknown;
  readonly result: unknown;
}

export interface WorkspaceStudy {
  readonly id: number;
  readonly name: string;
  readonly siteId: number;
  readonly options: StudyOptions;
  readonly scenarios: readonly ScenarioInput[];
  readonly savedResults: readonly WorkspaceSavedResult[];
}

export interface WorkspaceDocument {
  readonly format: typeof WORKSPACE_FORMAT;
  readonly version: typeof WORKSPACE_VERSION;
  readonly aircraft: readonly AircraftProfile[];
  readonly sites: readonly WorkspaceSite[];
  readonly studies: readonly WorkspaceStudy[];
}

// ---------------------------------------------------------------------------------------------- export

/** The workspace as a document, read in one consistent snapshot. */
export function exportWorkspace(db: Db): WorkspaceDocument {
  return transaction(
    db,
    (tx) => ({
      format: WORKSPACE_FORMAT,
      version: WORKSPACE_VERSION,
      aircraft: listAircraft(tx),
      sites: listSiteIds(tx).map((id) => ({ id, ...siteInput(getSite(tx, id)!) })),
      studies: listStudyIds(tx).map((id): WorkspaceStudy => {
        const s = getStudy(tx, id)!;
        return {
          id: s.id,
          name: s.name,
          siteId: s.siteId,
          options: s.options,
          scenarios: s.scenarios.map((sc) => ({ name: sc.name, fleet: sc.fleet })),
          savedResults: allStudyResults(tx, id).map((r) => ({
            createdAt: r.createdAt,
            methodVersion: r.methodVersion,
            inputDigest: r.inputDigest,
            input: r.input,
            result: r.result,
          })),
        };
      }),
    }),
    'deferred',
  );
}

/** The workspace document as text (two-space indentation, final newline). */
export function exportWorkspaceJson(db: Db): string {
  return `${JSON.stringify(exportWorkspace(db), null, 2)}\n`;
}

// ---------------------------------------------------------------------------------------------- schema

const recordId = int(1, 2_147_483_647, '');

const workspaceSiteSchema = z.strictObject({
  id: recordId,
  ...siteSchema.shape,
  climate: climateSchema.optional(),
  runways: z.array(runwaySchema).max(8),
});

const workspaceScenarioSchema = z.strictObject({
  ...scenarioSchema.shape,
  fleet: z.array(fleetRowSchema).max(200),
});

const savedResultSchema = z.strictObject({
  createdAt: z.iso.datetime({ error: 'an ISO 8601 UTC time such as 2026-03-01T12:00:00.000Z' }),
  methodVersion: text(200),
  inputDigest: text(200),
  input: z.unknown().refine((v) => v !== undefined, { error: 'missing; the saved study input is required' }),
  result: z.unknown().refine((v) => v !== undefined, { error: 'missing; the saved result is required' }),
});

const workspaceStudySchema = z.strictObject({
  id: recordId,
  name: text(200),
  siteId: recordId,
  options: optionsSchema,
  scenarios: z.array(workspaceScenarioSchema).max(50),
  savedResults: z.array(savedResultSchema).max(10_000).default([]),
});

export const workspaceSchema = z
  .strictObject({
    format: z.literal(WORKSPACE_FORMAT, { error: `must be "${WORKSPACE_FORMAT}"` }),
    version: z.literal(WORKSPACE_VERSION, { error: `must be ${WORKSPACE_VERSION}` }),
    aircraft: z.array(aircraftSchema).max(100_000),
    sites: z.array(workspaceSiteSchema).max(100_000),
    studies: z.array(workspaceStudySchema).max(100_000),
  })
  .superRefine((doc, ctx) => {
    const dup = <T>(list: readonly T[], key: (t: T) => string | number, where: string, field: string): Set<string | number> => {
      const first = new Map<string | number, number>();
      list.forEach((item, i) => {
        const k = key(item);
        const prev = first.get(k);
        if (prev !== undefined) ctx.addIssue({ code: 'custom', path: [where, i, field], input: k, message: `duplicate id ${JSON.stringify(k)} (also ${where}[${prev}])` });
        else first.set(k, i);
      });
      return new Set(first.keys());
    };
    const aircraftIds = dup(doc.aircraft, (a) => a.id, 'aircraft', 'id');
    const siteIds = dup(doc.sites, (s) => s.id, 'sites', 'id');
    dup(doc.studies, (s) => s.id, 'studies', 'id');
    doc.studies.forEach((s, i) => {
      if (!siteIds.has(s.siteId)) ctx.addIssue({ code: 'custom', path: ['studies', i, 'siteId'], input: s.siteId, message: `site ${s.siteId} is not in the file's sites` });
      s.scenarios.forEach((sc, j) =>
        sc.fleet.forEach((row, k) => {
          if (!aircraftIds.has(row.aircraft)) {
            ctx.addIssue({ code: 'custom', path: ['studies', i, 'scenarios', j, 'fleet', k, 'aircraft'], input: row.aircraft, message: `aircraft "${row.aircraft}" is not in the file's aircraft` });
          }
        }),
      );
    });
  });

// ---------------------------------------------------------------------------------------------- import

export interface WorkspaceImportOptions {
  /**
   * 'empty' (default): the database must hold no aircraft, site or study.
   * 'replace': everything in the database is deleted first, in the same transaction.
   */
  readonly mode?: 'empty' | 'replace';
}

export interface WorkspaceImportResult {
  readonly aircraft: number;
  readonly sites: number;
  readonly studies: number;
  readonly savedResults: number;
}

function problemAt(text: string, path: readonly PropertyKey[], reason: string): ImportProblem {
  const { line, char } = locateJsonPath(text, path);
  return { line, column: char, field: formatPath(path), reason };
}

/** Validates a workspace file; returns the document or throws ImportError listing the problems. */
export function parseWorkspace(input: string | Uint8Array): WorkspaceDocument {
  const what = 'workspace file';
  const text = decodeUtf8(input, what);
  const value = parseJsonText(text, what);
  // Say "wrong kind of file" or "newer version" once, instead of a list of every field.
  if (typeof value !== 'object' || value === null || Array.isArray(value)) {
    throw new ImportError(what, [problemAt(text, [], 'expected a JSON object (a Runwright workspace file)')]);
  }
  const head = value as { format?: unknown; version?: unknown };
  if (head.format !== WORKSPACE_FORMAT) {
    throw new ImportError(what, [problemAt(text, ['format'], `${JSON.stringify(head.format ?? null)} is not a workspace file; expected format "${WORKSPACE_FORMAT}"`)]);
  }
  if (head.version !== WORKSPACE_VERSION) {
    const newer = typeof head.version === 'number' && head.version > WORKSPACE_VERSION;
    throw new ImportError(what, [
      problemAt(text, ['version'], newer ? `version ${head.version} is newer than this program reads (${WORKSPACE_VERSION}); update Runwright` : `${JSON.stringify(head.version ?? null)} is not a known version; expected ${WORKSPACE_VERSION}`),
    ]);
  }
  const r = workspaceSchema.safeParse(value, { reportInput: true });
  if (!r.success) {
    // One problem per path: a later rule on the same value repeats the first.
    const seen = new Set<string>();
    const issues = r.error.issues.filter((iss) => {
      const k = formatPath(iss.path);
      if (seen.has(k)) return false;
      seen.add(k);
      return true;
    });
    throw new ImportError(what, issues.slice(0, MAX_PROBLEMS).map((iss) => problemAt(text, iss.path, iss.message)));
  }
  return r.data as unknown as WorkspaceDocument;
}

function isEmpty(tx: Db): boolean {
  return (
    countAircraft(tx) === 0 &&
    tx.select({ id: sites.id }).from(sites).limit(1).get() === undefined &&
    tx.select({ id: studies.id }).from(studies).limit(1).get() === undefined
  );
}

function deleteEverything(tx: Db): void {
  tx.delete(savedResults).run();
  tx.delete(scenarios).run();
  tx.delete(studies).run();
  tx.delete(sites).run();
  tx.delete(aircraftTable).run();
}

/** Writes a validated document (one transaction). */
export function writeWorkspace(db: Db, doc: WorkspaceDocument, options: WorkspaceImportOptions = {}): WorkspaceImportResult {
  return transaction(db, (tx) => {
    if (options.mode === 'replace') deleteEverything(tx);
    else if (!isEmpty(tx)) {
      throw new ImportError('workspace file', [{ reason: 'the database already holds data; import a workspace into an empty database, or choose to replace everything' }]);
    }
    createAircraftMany(tx, doc.aircraft);
    for (const s of doc.sites) {
      const { id, ...site } = s;
      createSite(tx, site, id);
    }
    let saved = 0;
    for (const s of doc.studies) {
      createStudy(tx, { name: s.name, siteId: s.siteId, options: s.options, scenarios: s.scenarios }, s.id);
      for (const r of s.savedResults) {
        saveStudyResult(tx, { studyId: s.id, input: r.input, inputDigest: r.inputDigest, result: r.result, methodVersion: r.methodVersion, createdAt: r.createdAt });
        saved++;
      }
    }
    return { aircraft: doc.aircraft.length, sites: doc.sites.length, studies: doc.studies.length, savedResults: saved };
  });
}

/** Validates and imports a workspace file, all or nothing. Throws ImportError listing the problems. */
export function importWorkspace(db: Db, input: string | Uint8Array, options: WorkspaceImportOptions = {}): WorkspaceImportResult {
  return writeWorkspace(db, parseWorkspace(input), options);
}
