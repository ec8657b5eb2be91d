/**
 * A stored study's state for the pages and the API: its current input (validated as a study file),
 * the digest of that input, whether the latest saved result matches it, and the computation itself
 * (run in the job pool, saved with its input and digest; concurrent requests for the same input share
 * one computation). Saved results never change, so their parsed form and chart models are cached by
 * saved-result id.
 */
import { setImmediate as nextTurn } from 'node:timers/promises';
import { sql } from 'drizzle-orm';
import type { ChartModel, StudyInput } from '../../core/index.js';
import { STUDY_METHOD_VERSION, studyCharts } from '../../core/index.js';
import { NotFoundError } from '../../db/errors.js';
import {
  getStudy, getStudyResult, inputsChangedSinceSave, loadStudyInput, saveStudyResult, type InputsStatus, type SavedResultSummary,
} from '../../db/repos/studies.js';
import type { Db } from '../../db/types.js';
import type { JobRunner } from '../jobs/index.js';
import { inputDigest, parseStudyDocument, type StudyOutput } from './document.js';
import { Lru } from '../web/lru.js';

export interface StudyState {
  readonly studyId: number;
  /** The stored input as loaded (may not be computable yet). */
  readonly input: StudyInput;
  /** Validated input (defaults resolved), when the study can be computed. */
  readonly ready?: StudyInput;
  /** Why it cannot be computed, in words. */
  readonly problems: readonly string[];
  readonly digest?: string;
  readonly status: InputsStatus;
}

export interface LoadedResult {
  readonly saved: SavedResultSummary;
  readonly output: StudyOutput;
  readonly input: StudyInput;
  readonly charts: readonly ChartModel[];
  /** The snapshot is what was saved (savedResultIntact); a damaged one is never served as current. */
  readonly intact: boolean;
}

const GENERATION_SQL = 'select total_changes() as t, (select data_version from pragma_data_version) as v';

function friendly(path: string, message: string, input: StudyInput): string {
  let p = path;
  p = p.replace(/^scenarios\[(\d+)\]/, (_m, i: string) => `scenario "${input.scenarios[Number(i)]?.name ?? i}"`);
  p = p.replace(/^site\.runways$/, 'site runways');
  p = p.replace(/^aircraft$/, 'aircraft (fleet rows)');
  if (p === 'scenarios') p = 'scenarios';
  return `${p}: ${message}`;
}

/**
 * A saved result computed by another version of the methods is out of date even when the input is
 * the same: its numbers (and the series the views draw) may differ from what the engine gives now,
 * so it is recomputed, never shown as current.
 */
function currentMethod(status: InputsStatus): InputsStatus {
  if (status.state === 'unchanged' && status.saved.methodVersion !== STUDY_METHOD_VERSION) return { state: 'changed', saved: status.saved, methodChanged: true };
  return status;
}

/**
 * Whether a saved snapshot is what was saved: the result carries the digest and method version of
 * its row, and the stored input has that digest. The JSON is read back without a cast being trusted.
 */
function savedResultIntact(full: { input: unknown; result: unknown; inputDigest: string; methodVersion: string }, saved: SavedResultSummary): boolean {
  const r = full.result as Partial<StudyOutput> | null;
  if (r === null || typeof r !== 'object' || !Array.isArray(r.scenarios) || !Array.isArray(r.sensitivity)) return false;
  if (r.inputDigest !== saved.inputDigest || r.methodVersion !== saved.methodVersion) return false;
  try {
    return inputDigest(full.input as StudyInput) === saved.inputDigest;
  } catch {
    return false;
  }
}

export class StudyService {
  private readonly results = new Lru<number, LoadedResult>(32);
  private readonly running = new Map<string, Promise<SavedResultSummary>>();
  private readonly states = new Lru<number, { readonly generation: string; readonly state: StudyState }>(64);
  /** The generation query, prepared once on the raw connection when there is one. */
  private readonly generationStatement: { get(): unknown } | undefined;

  constructor(
    private readonly db: Db,
    private readonly jobs: JobRunner,
    private readonly clock: () => Date,
  ) {
    const client = (db as unknown as { $client?: { prepare?: (sql: string) => { get(): unknown } } }).$client;
    this.generationStatement = typeof client?.prepare === 'function' ? client.prepare(GENERATION_SQL) : undefined;
  }

  /**
   * A value that changes whenever the database changes: rows changed through this connection
   * (total_changes) and commits by other connections (data_version). States are cached against it,
   * so a page view costs one small query while nothing is written.
   */
  generation(): string {
    const g = (this.generationStatement?.get() ?? this.db.get(sql.raw(GENERATION_SQL))) as { t: number; v: number };
    return `${g.t}:${g.v}`;
  }

  /** Whether study `studyId` exists, from the cached state when the database has not changed. */
  exists(studyId: number): boolean {
    const hit = this.states.get(studyId);
    if (hit && hit.generation === this.generation()) return true;
    return getStudy(this.db, studyId) !== undefined;
  }

  /** Current state of study `studyId` (cached until the database changes); NotFoundError when it does not exist. */
  state(studyId: number): StudyState {
    const generation = this.generation();
    const hit = this.states.get(studyId);
    if (hit && hit.generation === generation) return hit.state;
    const state = this.computeState(studyId);
    this.states.set(studyId, { generation, state });
    return state;
  }

  private computeState(studyId: number): StudyState {
    const input = loadStudyInput(this.db, studyId);
    const parsed = parseStudyDocument({ format: 'runwright-study', version: 1, ...input });
    if (!parsed.ok) {
      return {
        studyId,
        input,
        problems: parsed.problems.map((p) => friendly(p.path, p.message, input)),
        status: inputsChangedSinceSave(this.db, studyId, '-'),
      };
    }
    // parseStudyDocument has run core's own study and site checks already (server/studies/document.ts).
    const digest = inputDigest(parsed.input);
    return { studyId, input, ready: parsed.input, problems: [], digest, status: currentMethod(inputsChangedSinceSave(this.db, studyId, digest)) };
  }

  /** The saved result with its parsed output and charts (cached; saved results never change). A result of an older method version is never current (see currentMethod). */
  load(studyId: number, saved: SavedResultSummary): LoadedResult {
    const hit = this.results.get(saved.id);
    if (hit) return hit;
    const full = getStudyResult(this.db, studyId, saved.id);
    if (!full) throw new NotFoundError('saved result', saved.id);
    const output = full.result as StudyOutput;
    const input = full.input as StudyInput;
    const loaded: LoadedResult = { saved, output, input, charts: studyCharts(output), intact: savedResultIntact(full, saved) };
    this.results.set(saved.id, loaded);
    return loaded;
  }

  /** The latest saved result, if any, and whether it matches the current input. */
  latest(state: StudyState): { loaded: LoadedResult; current: boolean } | undefined {
    if (state.status.state === 'never-saved') return undefined;
    const loaded = this.load(state.studyId, state.status.saved);
    // A damaged snapshot (its digest or method version not those it was saved with) is never current.
    return { loaded, current: state.status.state === 'unchanged' && loaded.intact };
  }

  /**
   * Computes the study's current input in the job pool and saves the result; returns the saved
   * summary. Throws when the study cannot be computed (the caller checks `state.problems` first).
   */
  async compute(state: StudyState): Promise<SavedResultSummary> {
    if (!state.ready || !state.digest) throw new Error(`study ${state.studyId} cannot be computed: ${state.problems.join('; ')}`);
    if (state.status.state === 'unchanged') return state.status.saved;
    const key = `${state.studyId}:${state.digest}`;
    const running = this.running.get(key);
    if (running) return running;
    const input = state.ready;
    const digest = state.digest;
    const job = (async () => {
      const output = await this.jobs.run('study', input);
      // A large result arrives as one structured clone; saving it (stringify, insert, read back) is a
      // second long step: give the loop a turn between them so other requests are not held behind both.
      await nextTurn();
      if (!getStudy(this.db, state.studyId)) throw new NotFoundError('study', state.studyId);
      const saved = saveStudyResult(this.db, {
        studyId: state.studyId, input, inputDigest: digest, result: output, methodVersion: output.methodVersion, createdAt: this.clock(),
      });
      const { input: _i, result: _r, ...summary } = saved;
      // The first view reads the snapshot back from the database with its check (load); give the loop
      // a turn before that long step too.
      await nextTurn();
      return summary;
    })();
    this.running.set(key, job);
    try {
      return await job;
    } finally {
      this.running.delete(key);
    }
  }
}
