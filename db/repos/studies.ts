/**
 * Studies repository: a study (name, site, options), its scenarios and their fleet rows, and the
 * saved results.
 *
 * `loadStudyInput` assembles the core `StudyInput`: the study's site, the aircraft its fleet rows use
 * (in order of first use: scenario order, then row order), the scenarios and the options. Only the
 * aircraft a study uses are part of its input, so editing an unrelated catalogue entry does not mark
 * the study as changed.
 *
 * A saved result keeps the exact input (JSON), the caller's digest of it, the result snapshot (JSON),
 * the method version and the creation time. It is never updated: editing the catalogue or the study
 * later leaves it as it was, and `inputsChangedSinceSave` compares the caller's digest of the current
 * input with the saved one.
 */
import { and, asc, desc, eq, inArray, sql } from 'drizzle-orm';
import type {
  AircraftProfile,
  FleetRowInput,
  ReservePolicyName,
  ScenarioInput,
  StudyInput,
  StudyMethod,
  StudyOptions,
  Surface,
} from '../../core/index.js';
import { DEFAULT_OPERATING_RULES } from '../../core/index.js';
import { DuplicateIdError, NotFoundError } from '../errors.js';
import { aircraft, fleetRows, savedResults, scenarios, sites, studies } from '../schema.js';
import { transaction } from '../transaction.js';
import type { Db } from '../types.js';
import { existingAircraftIds, rowToAircraft } from './aircraft.js';
import { getSite, siteInput } from './sites.js';

export interface ScenarioRecord extends ScenarioInput {
  readonly id: number;
  readonly fleet: readonly FleetRowInput[];
}

export interface StudyRecord {
  readonly id: number;
  readonly name: string;
  readonly siteId: number;
  readonly options: StudyOptions;
  readonly scenarios: readonly ScenarioRecord[];
}

/** What `createStudy` takes: the study's own fields and its scenarios (ids are assigned). */
export interface NewStudy {
  readonly name: string;
  readonly siteId: number;
  readonly options: StudyOptions;
  readonly scenarios: readonly ScenarioInput[];
}

export interface StudySummary {
  readonly id: number;
  readonly name: string;
  readonly siteId: number;
  readonly siteName: string;
  readonly scenarioCount: number;
  /** Creation time of the latest saved result (ISO 8601), when there is one. */
  readonly lastSavedAt?: string;
}

type StudyRow = typeof studies.$inferSelect;

function optionsToColumns(o: StudyOptions) {
  return {
    regularUseThreshold_annualOps: o.regularUseThreshold,
    roundingIncrement_m: o.roundingIncrement_m,
    surface: o.surface,
    method: o.method,
    units: o.units,
    reservePolicy: o.reserves.policy,
    reserveAlternate_km: o.reserves.alternate_km ?? null,
    reserveHolding_min: o.reserves.holding_min ?? null,
    reserveContingencyFraction: o.reserves.contingencyFraction ?? null,
    passengerMass_kg: o.passengerMass_kg,
    landingTemperature: o.landingTemperature,
    landingMass: o.landingMass,
    // Stored filled in, as the study file's schema fills it: equal studies give equal files and digests.
    operatingRules: o.operatingRules ?? DEFAULT_OPERATING_RULES,
    referenceOverrideReason: o.referenceOverrideReason ?? null,
  };
}

function columnsToOptions(r: StudyRow): StudyOptions {
  return {
    regularUseThreshold: r.regularUseThreshold_annualOps,
    roundingIncrement_m: r.roundingIncrement_m,
    surface: r.surface as Surface,
    method: r.method as StudyMethod,
    units: r.units,
    reserves: {
      policy: r.reservePolicy as ReservePolicyName,
      ...(r.reserveAlternate_km === null ? {} : { alternate_km: r.reserveAlternate_km }),
      ...(r.reserveHolding_min === null ? {} : { holding_min: r.reserveHolding_min }),
      ...(r.reserveContingencyFraction === null ? {} : { contingencyFraction: r.reserveContingencyFraction }),
    },
    passengerMass_kg: r.passengerMass_kg,
    landingTemperature: r.landingTemperature,
    landingMass: r.landingMass,
    operatingRules: r.operatingRules ?? DEFAULT_OPERATING_RULES,
    ...(r.referenceOverrideReason === null ? {} : { referenceOverrideReason: r.referenceOverrideReason }),
  };
}

function requireSite(tx: Db, siteId: number): void {
  if (!tx.select({ id: sites.id }).from(sites).where(eq(sites.id, siteId)).get()) throw new NotFoundError('site', siteId);
}

function requireStudy(tx: Db, studyId: number): void {
  if (!tx.select({ id: studies.id }).from(studies).where(eq(studies.id, studyId)).get()) throw new NotFoundError('study', studyId);
}

/** Throws NotFoundError naming the first aircraft id of `fleet` that is not in the catalogue. */
function requireAircraft(tx: Db, fleet: readonly FleetRowInput[]): void {
  const found = existingAircraftIds(tx, fleet.map((r) => r.aircraft));
  const missing = fleet.find((r) => !found.has(r.aircraft));
  if (missing) throw new NotFoundError('aircraft', missing.aircraft);
}

function writeFleet(tx: Db, scenarioId: number, fleet: readonly FleetRowInput[]): void {
  tx.delete(fleetRows).where(eq(fleetRows.scenarioId, scenarioId)).run();
  if (fleet.length === 0) return;
  requireAircraft(tx, fleet);
  tx.insert(fleetRows)
    .values(
      fleet.map((r, position) => ({
        scenarioId,
        position,
        aircraftId: r.aircraft,
        annualOperations: r.annualOperations,
        stageLength_km: r.stageLength_km,
        payload_kg: r.payload_kg,
      })),
    )
    .run();
}

function nextScenarioPosition(tx: Db, studyId: number): number {
  const r = tx.select({ p: sql<number | null>`max(${scenarios.position})` }).from(scenarios).where(eq(scenarios.studyId, studyId)).get();
  return r?.p === null || r?.p === undefined ? 0 : r.p + 1;
}

function insertScenario(tx: Db, studyId: number, position: number, s: ScenarioInput): number {
  const { id } = tx.insert(scenarios).values({ studyId, position, name: s.name }).returning({ id: scenarios.id }).get();
  writeFleet(tx, id, s.fleet);
  return id;
}

/**
 * Inserts a study with its scenarios and fleet rows in one transaction; returns its id. `id` may be
 * given (workspace import keeps ids). NotFoundError when the site or a fleet aircraft does not exist.
 */
export function createStudy(db: Db, study: NewStudy, id?: number): number {
  return transaction(db, (tx) => {
    if (id !== undefined && tx.select({ id: studies.id }).from(studies).where(eq(studies.id, id)).get()) throw new DuplicateIdError('study', id);
    requireSite(tx, study.siteId);
    const row = tx
      .insert(studies)
      .values({ ...(id === undefined ? {} : { id }), name: study.name, siteId: study.siteId, ...optionsToColumns(study.options) })
      .returning({ id: studies.id })
      .get();
    study.scenarios.forEach((s, i) => insertScenario(tx, row.id, i, s));
    return row.id;
  });
}

/** Changes the study's name, site and/or options. */
export function updateStudy(
  db: Db,
  id: number,
  patch: { readonly name?: string; readonly siteId?: number; readonly options?: StudyOptions },
): void {
  transaction(db, (tx) => {
    requireStudy(tx, id);
    if (patch.siteId !== undefined) requireSite(tx, patch.siteId);
    const set = {
      ...(patch.name === undefined ? {} : { name: patch.name }),
      ...(patch.siteId === undefined ? {} : { siteId: patch.siteId }),
      ...(patch.options === undefined ? {} : optionsToColumns(patch.options)),
    };
    if (Object.keys(set).length > 0) tx.update(studies).set(set).where(eq(studies.id, id)).run();
  });
}

/** Deletes a study with its scenarios, fleet rows and saved results. */
export function deleteStudy(db: Db, id: number): void {
  transaction(db, (tx) => {
    requireStudy(tx, id);
    tx.delete(studies).where(eq(studies.id, id)).run();
  });
}

/** Appends a scenario (with its fleet rows) to study `studyId`; returns the scenario id. */
export function addScenario(db: Db, studyId: number, scenario: ScenarioInput): number {
  return transaction(db, (tx) => {
    requireStudy(tx, studyId);
    return insertScenario(tx, studyId, nextScenarioPosition(tx, studyId), scenario);
  });
}

/** Renames a scenario and/or replaces its fleet rows. */
export function updateScenario(db: Db, scenarioId: number, patch: { readonly name?: string; readonly fleet?: readonly FleetRowInput[] }): void {
  transaction(db, (tx) => {
    if (!tx.select({ id: scenarios.id }).from(scenarios).where(eq(scenarios.id, scenarioId)).get()) throw new NotFoundError('scenario', scenarioId);
    if (patch.name !== undefined) tx.update(scenarios).set({ name: patch.name }).where(eq(scenarios.id, scenarioId)).run();
    if (patch.fleet !== undefined) writeFleet(tx, scenarioId, patch.fleet);
  });
}

/** Replaces the fleet rows of a scenario (all or nothing). */
export function setScenarioFleet(db: Db, scenarioId: number, fleet: readonly FleetRowInput[]): void {
  updateScenario(db, scenarioId, { fleet });
}

/** Deletes a scenario and its fleet rows. */
export function deleteScenario(db: Db, scenarioId: number): void {
  transaction(db, (tx) => {
    const res = tx.delete(scenarios).where(eq(scenarios.id, scenarioId)).run();
    if (res.changes === 0) throw new NotFoundError('scenario', scenarioId);
  });
}

/** The scenario with its fleet rows and the id of its study, or undefined. */
export function getScenario(db: Db, scenarioId: number): (ScenarioRecord & { readonly studyId: number }) | undefined {
  const s = db.select().from(scenarios).where(eq(scenarios.id, scenarioId)).get();
  if (!s) return undefined;
  const rows = db.select().from(fleetRows).where(eq(fleetRows.scenarioId, scenarioId)).orderBy(asc(fleetRows.position)).all();
  return { id: s.id, studyId: s.studyId, name: s.name, fleet: rows.map(rowToFleet) };
}

function rowToFleet(r: typeof fleetRows.$inferSelect): FleetRowInput {
  return { aircraft: r.aircraftId, annualOperations: r.annualOperations, stageLength_km: r.stageLength_km, payload_kg: r.payload_kg };
}

/** Study `id` with its options and scenarios (fleet rows in order), or undefined. */
export function getStudy(db: Db, id: number): StudyRecord | undefined {
  const s = db.select().from(studies).where(eq(studies.id, id)).get();
  if (!s) return undefined;
  const scens = db.select().from(scenarios).where(eq(scenarios.studyId, id)).orderBy(asc(scenarios.position)).all();
  const ids = scens.map((x) => x.id);
  const rows = ids.length === 0 ? [] : db.select().from(fleetRows).where(inArray(fleetRows.scenarioId, ids)).orderBy(asc(fleetRows.scenarioId), asc(fleetRows.position)).all();
  return {
    id: s.id,
    name: s.name,
    siteId: s.siteId,
    options: columnsToOptions(s),
    scenarios: scens.map((x) => ({ id: x.id, name: x.name, fleet: rows.filter((r) => r.scenarioId === x.id).map(rowToFleet) })),
  };
}

/** Studies ordered by name then id, with site name, scenario count and the latest save time. */
export function listStudies(db: Db): StudySummary[] {
  return db
    .select({
      id: studies.id,
      name: studies.name,
      siteId: studies.siteId,
      siteName: sites.name,
      scenarioCount: sql<number>`(select count(*) from "scenarios" where "scenarios"."study_id" = "studies"."id")`,
      lastSavedAt: sql<string | null>`(select max("saved_results"."created_at") from "saved_results" where "saved_results"."study_id" = "studies"."id")`,
    })
    .from(studies)
    .innerJoin(sites, eq(studies.siteId, sites.id))
    .orderBy(asc(studies.name), asc(studies.id))
    .all()
    .map(({ lastSavedAt, ...s }) => ({ ...s, ...(lastSavedAt === null ? {} : { lastSavedAt }) }));
}

/** Ids of every study, ascending. */
export function listStudyIds(db: Db): number[] {
  return db.select({ id: studies.id }).from(studies).orderBy(asc(studies.id)).all().map((r) => r.id);
}

/**
 * The core `StudyInput` of study `id`, read in one consistent snapshot. Throws NotFoundError when the
 * study does not exist.
 */
export function loadStudyInput(db: Db, studyId: number): StudyInput {
  return transaction(
    db,
    (tx) => {
      const study = getStudy(tx, studyId);
      if (!study) throw new NotFoundError('study', studyId);
      const site = getSite(tx, study.siteId);
      if (!site) throw new NotFoundError('site', study.siteId);
      const order: string[] = [];
      const seen = new Set<string>();
      for (const s of study.scenarios) for (const r of s.fleet) if (!seen.has(r.aircraft)) { seen.add(r.aircraft); order.push(r.aircraft); }
      const byId = new Map<string, AircraftProfile>();
      for (let i = 0; i < order.length; i += 500) {
        for (const row of tx.select().from(aircraft).where(inArray(aircraft.id, order.slice(i, i + 500))).all()) byId.set(row.id, rowToAircraft(row));
      }
      return {
        name: study.name,
        site: siteInput(site),
        aircraft: order.map((id) => byId.get(id)!),
        scenarios: study.scenarios.map((s) => ({ name: s.name, fleet: s.fleet })),
        options: study.options,
      };
    },
    'deferred',
  );
}

/** A saved result as stored (JSON parsed back). */
export interface SavedResult {
  readonly id: number;
  readonly studyId: number;
  /** The study input the result was computed from, exactly as saved. */
  readonly input: unknown;
  readonly inputDigest: string;
  readonly result: unknown;
  readonly methodVersion: string;
  /** ISO 8601, UTC. */
  readonly createdAt: string;
}

export type SavedResultSummary = Omit<SavedResult, 'input' | 'result'>;

export interface SaveStudyResultInput {
  readonly studyId: number;
  readonly input: StudyInput | unknown;
  /** Digest of `input`, computed by the caller (the same function it uses for `inputsChangedSinceSave`). */
  readonly inputDigest: string;
  /** The result snapshot: any JSON value. */
  readonly result: unknown;
  readonly methodVersion: string;
  /** From the injected clock. */
  readonly createdAt: Date | string;
}

function toJson(label: string, v: unknown): string {
  const s = JSON.stringify(v);
  if (s === undefined) throw new TypeError(`${label} is not a JSON value`);
  return s;
}

function isoTime(t: Date | string): string {
  const d = typeof t === 'string' ? new Date(t) : t;
  if (Number.isNaN(d.getTime())) throw new TypeError(`createdAt: ${JSON.stringify(String(t))} is not a valid time`);
  return d.toISOString();
}

/** Stores a result snapshot for study `studyId`; returns the stored record. */
export function saveStudyResult(db: Db, r: SaveStudyResultInput): SavedResult {
  const inputJson = toJson('input', r.input);
  const resultJson = toJson('result', r.result);
  const createdAt = isoTime(r.createdAt);
  return transaction(db, (tx) => {
    requireStudy(tx, r.studyId);
    const { id } = tx
      .insert(savedResults)
      .values({ studyId: r.studyId, inputJson, inputDigest: r.inputDigest, resultJson, methodVersion: r.methodVersion, createdAt })
      .returning({ id: savedResults.id })
      .get();
    return { id, studyId: r.studyId, input: JSON.parse(inputJson) as unknown, inputDigest: r.inputDigest, result: JSON.parse(resultJson) as unknown, methodVersion: r.methodVersion, createdAt };
  });
}

function rowToSaved(r: typeof savedResults.$inferSelect): SavedResult {
  return {
    id: r.id,
    studyId: r.studyId,
    input: JSON.parse(r.inputJson) as unknown,
    inputDigest: r.inputDigest,
    result: JSON.parse(r.resultJson) as unknown,
    methodVersion: r.methodVersion,
    createdAt: r.createdAt,
  };
}

const summaryColumns = {
  id: savedResults.id,
  studyId: savedResults.studyId,
  inputDigest: savedResults.inputDigest,
  methodVersion: savedResults.methodVersion,
  createdAt: savedResults.createdAt,
};

/** The most recent saved result of a study (latest `createdAt`, then highest id), or undefined. */
export function latestStudyResult(db: Db, studyId: number): SavedResult | undefined {
  const r = db.select().from(savedResults).where(eq(savedResults.studyId, studyId)).orderBy(desc(savedResults.createdAt), desc(savedResults.id)).limit(1).get();
  return r === undefined ? undefined : rowToSaved(r);
}

/** One saved result by id (of study `studyId`), or undefined. */
export function getStudyResult(db: Db, studyId: number, resultId: number): SavedResult | undefined {
  const r = db.select().from(savedResults).where(and(eq(savedResults.id, resultId), eq(savedResults.studyId, studyId))).get();
  return r === undefined ? undefined : rowToSaved(r);
}

/** Saved results of a study, newest first, without their JSON bodies. */
export function listStudyResults(db: Db, studyId: number): SavedResultSummary[] {
  return db.select(summaryColumns).from(savedResults).where(eq(savedResults.studyId, studyId)).orderBy(desc(savedResults.createdAt), desc(savedResults.id)).all();
}

/** Every saved result of a study, oldest first (for export). */
export function allStudyResults(db: Db, studyId: number): SavedResult[] {
  return db.select().from(savedResults).where(eq(savedResults.studyId, studyId)).orderBy(asc(savedResults.createdAt), asc(savedResults.id)).all().map(rowToSaved);
}

export type InputsStatus =
  | { readonly state: 'never-saved' }
  | { readonly state: 'unchanged'; readonly saved: SavedResultSummary }
  | { readonly state: 'changed'; readonly saved: SavedResultSummary; readonly methodChanged?: true };

/**
 * Whether the study's current input differs from the input of its latest saved result: the caller
 * passes the digest of the current input (e.g. of `loadStudyInput`), computed the same way as the
 * digest it saved.
 */
export function inputsChangedSinceSave(db: Db, studyId: number, currentDigest: string): InputsStatus {
  const saved = db.select(summaryColumns).from(savedResults).where(eq(savedResults.studyId, studyId)).orderBy(desc(savedResults.createdAt), desc(savedResults.id)).limit(1).get();
  if (!saved) return { state: 'never-saved' };
  return { state: saved.inputDigest === currentDigest ? 'unchanged' : 'changed', saved };
}
