/**
 * Aircraft catalogue repository: plain functions over a drizzle database (or transaction).
 *
 * Profiles are validated with core's `validateAircraft` before they are written (InputDomainError
 * names field, value and range). Multi-row writes run in one synchronous transaction. Deleting an
 * aircraft that a fleet row uses is refused with `AircraftInUseError`, which names the scenarios.
 * Renaming an aircraft (updating with a new id) carries the new id into fleet rows (ON UPDATE CASCADE);
 * saved results keep the input they were computed from and never change.
 */
import { asc, eq, getTableColumns, inArray, or, sql, type SQL } from 'drizzle-orm';
import type { SQLiteColumn } from 'drizzle-orm/sqlite-core';
import { validateAircraft, type AircraftProfile, type CruiseData, type ReferenceLengths, type ReferenceTable } from '../../core/index.js';
import { AircraftInUseError, DuplicateIdError, NotFoundError, type ScenarioUse } from '../errors.js';
import { aircraft, fleetRows, scenarios, studies } from '../schema.js';
import { transaction } from '../transaction.js';
import type { Db } from '../types.js';

type AircraftRow = typeof aircraft.$inferSelect;
type AircraftInsert = typeof aircraft.$inferInsert;

/** Converts a profile to its table row (cruise and reference fields flattened, the table as JSON). */
export function aircraftToRow(a: AircraftProfile): AircraftInsert {
  const c = a.cruise;
  const r = a.reference;
  return {
    id: a.id,
    name: a.name,
    group: a.group ?? null,
    certification: a.certification,
    engineType: a.engineType,
    engineCount: a.engineCount,
    gear: a.gear,
    mtow_kg: a.mtow_kg,
    mlw_kg: a.mlw_kg,
    oew_kg: a.oew_kg,
    maxPayload_kg: a.maxPayload_kg,
    maxFuel_kg: a.maxFuel_kg,
    wingArea_m2: a.wingArea_m2,
    wingspan_m: a.wingspan_m,
    wingHeight_m: a.wingHeight_m,
    tailHeight_m: a.tailHeight_m,
    mainGearSpan_m: a.mainGearSpan_m,
    clMaxTakeoff: a.clMaxTakeoff,
    clMaxLanding: a.clMaxLanding,
    clGround: a.clGround,
    cd0Takeoff: a.cd0Takeoff,
    cd0Landing: a.cd0Landing,
    oswald: a.oswald,
    engineOutDrag: a.engineOutDrag,
    staticThrust_N: a.staticThrust_N ?? null,
    bypassRatio: a.bypassRatio ?? null,
    flatRatingTemp_c: a.flatRatingTemp_c ?? null,
    thrustLapse: a.thrustLapse ?? null,
    shaftPower_W: a.shaftPower_W ?? null,
    propDiameter_m: a.propDiameter_m ?? null,
    propEfficiency: a.propEfficiency ?? null,
    idleThrustFraction: a.idleThrustFraction,
    rollingFriction: a.rollingFriction,
    brakingFrictionDry: a.brakingFrictionDry,
    brakingFrictionWet: a.brakingFrictionWet,
    vrFactor: a.vrFactor,
    vlofFactor: a.vlofFactor,
    v2Factor: a.v2Factor,
    vrefFactor: a.vrefFactor,
    vmcg_mps: a.vmcg_mps ?? null,
    rotationTime_s: a.rotationTime_s,
    recognitionTime_s: a.recognitionTime_s,
    freeRollTime_s: a.freeRollTime_s,
    tailUpSpeed_mps: a.tailUpSpeed_mps ?? null,
    threePointCl: a.threePointCl ?? null,
    lightAircraftFactor: a.lightAircraftFactor ?? null,
    cd0TakeoffGearUp: a.cd0TakeoffGearUp ?? null,
    gearRetractionTime_s: a.gearRetractionTime_s ?? null,
    vmca_mps: a.vmca_mps ?? null,
    vmuFactor: a.vmuFactor ?? null,
    flatRatingDeltaIsa_k: a.flatRatingDeltaIsa_k ?? null,
    flatRatingCornerLapse_kPerKm: a.flatRatingCornerLapse_kPerKm ?? null,
    propFigureOfMerit: a.propFigureOfMerit ?? null,
    maxBrakeEnergy_J: a.maxBrakeEnergy_J ?? null,
    tyreSpeedLimit_mps: a.tyreSpeedLimit_mps ?? null,
    stopActivationTime_s: a.stopActivationTime_s ?? null,
    touchdownFactor: a.touchdownFactor ?? null,
    cruiseSpeed_mps: c?.speed_mps ?? null,
    cruiseAltitude_m: c?.altitude_m ?? null,
    cruiseLiftToDrag: c?.liftToDrag ?? null,
    cruiseHoldLiftToDrag: c?.holdLiftToDrag ?? null,
    cruiseTsfc_perh: c?.tsfc_perh ?? null,
    cruiseBsfc_kgPerKwh: c?.bsfc_kgPerKwh ?? null,
    cruisePropEfficiency: c?.cruisePropEfficiency ?? null,
    cruiseTaxiFuel_kg: c?.taxiFuel_kg ?? null,
    cruiseContingencyFraction: c?.contingencyFraction ?? null,
    cruiseHoldFuelFlow_kgph: c?.holdFuelFlow_kgph ?? null,
    cruiseClimbDescentFraction: c?.climbDescentFraction ?? null,
    referenceTakeoff_m: r?.takeoff_m ?? null,
    referenceLanding_m: r?.landing_m ?? null,
    referenceTableJson: r?.table === undefined ? null : JSON.stringify(r.table),
  };
}

/** `{ [key]: v }` when v is not null, else `{}`: optional fields are absent, never null. */
function opt<K extends string, V>(key: K, v: V | null): { [P in K]?: V } {
  return (v === null ? {} : { [key]: v }) as { [P in K]?: V };
}

function need(v: number | null, column: string, id: string): number {
  if (v === null) throw new Error(`internal: aircraft ${id} has no ${column} although it has cruise data`);
  return v;
}

/** Converts a table row back to a profile. Keys come in one fixed order, optional ones only when set. */
export function rowToAircraft(r: AircraftRow): AircraftProfile {
  let cruise: CruiseData | undefined;
  if (r.cruiseSpeed_mps !== null) {
    cruise = {
      speed_mps: r.cruiseSpeed_mps,
      altitude_m: need(r.cruiseAltitude_m, 'cruise_altitude_m', r.id),
      liftToDrag: need(r.cruiseLiftToDrag, 'cruise_lift_to_drag', r.id),
      holdLiftToDrag: need(r.cruiseHoldLiftToDrag, 'cruise_hold_lift_to_drag', r.id),
      ...opt('tsfc_perh', r.cruiseTsfc_perh),
      ...opt('bsfc_kgPerKwh', r.cruiseBsfc_kgPerKwh),
      ...opt('cruisePropEfficiency', r.cruisePropEfficiency),
      taxiFuel_kg: need(r.cruiseTaxiFuel_kg, 'cruise_taxi_fuel_kg', r.id),
      contingencyFraction: need(r.cruiseContingencyFraction, 'cruise_contingency_fraction', r.id),
      ...opt('holdFuelFlow_kgph', r.cruiseHoldFuelFlow_kgph),
      ...opt('climbDescentFraction', r.cruiseClimbDescentFraction),
    };
  }
  let reference: ReferenceLengths | undefined;
  if (r.referenceTakeoff_m !== null || r.referenceLanding_m !== null || r.referenceTableJson !== null) {
    reference = {
      ...opt('takeoff_m', r.referenceTakeoff_m),
      ...opt('landing_m', r.referenceLanding_m),
      ...opt('table', r.referenceTableJson === null ? null : (JSON.parse(r.referenceTableJson) as ReferenceTable)),
    };
  }
  return {
    id: r.id,
    name: r.name,
    ...opt('group', r.group),
    certification: r.certification,
    engineType: r.engineType,
    engineCount: r.engineCount,
    gear: r.gear,
    mtow_kg: r.mtow_kg,
    mlw_kg: r.mlw_kg,
    oew_kg: r.oew_kg,
    maxPayload_kg: r.maxPayload_kg,
    maxFuel_kg: r.maxFuel_kg,
    wingArea_m2: r.wingArea_m2,
    wingspan_m: r.wingspan_m,
    wingHeight_m: r.wingHeight_m,
    tailHeight_m: r.tailHeight_m,
    mainGearSpan_m: r.mainGearSpan_m,
    clMaxTakeoff: r.clMaxTakeoff,
    clMaxLanding: r.clMaxLanding,
    clGround: r.clGround,
    cd0Takeoff: r.cd0Takeoff,
    cd0Landing: r.cd0Landing,
    oswald: r.oswald,
    engineOutDrag: r.engineOutDrag,
    ...opt('staticThrust_N', r.staticThrust_N),
    ...opt('bypassRatio', r.bypassRatio),
    ...opt('flatRatingTemp_c', r.flatRatingTemp_c),
    ...opt('thrustLapse', r.thrustLapse),
    ...opt('shaftPower_W', r.shaftPower_W),
    ...opt('propDiameter_m', r.propDiameter_m),
    ...opt('propEfficiency', r.propEfficiency),
    idleThrustFraction: r.idleThrustFraction,
    rollingFriction: r.rollingFriction,
    brakingFrictionDry: r.brakingFrictionDry,
    brakingFrictionWet: r.brakingFrictionWet,
    vrFactor: r.vrFactor,
    vlofFactor: r.vlofFactor,
    v2Factor: r.v2Factor,
    vrefFactor: r.vrefFactor,
    ...opt('vmcg_mps', r.vmcg_mps),
    rotationTime_s: r.rotationTime_s,
    recognitionTime_s: r.recognitionTime_s,
    freeRollTime_s: r.freeRollTime_s,
    ...opt('tailUpSpeed_mps', r.tailUpSpeed_mps),
    ...opt('threePointCl', r.threePointCl),
    ...opt('lightAircraftFactor', r.lightAircraftFactor),
    ...opt('cd0TakeoffGearUp', r.cd0TakeoffGearUp),
    ...opt('gearRetractionTime_s', r.gearRetractionTime_s),
    ...opt('vmca_mps', r.vmca_mps),
    ...opt('vmuFactor', r.vmuFactor),
    ...opt('flatRatingDeltaIsa_k', r.flatRatingDeltaIsa_k),
    ...opt('flatRatingCornerLapse_kPerKm', r.flatRatingCornerLapse_kPerKm),
    ...opt('propFigureOfMerit', r.propFigureOfMerit),
    ...opt('maxBrakeEnergy_J', r.maxBrakeEnergy_J),
    ...opt('tyreSpeedLimit_mps', r.tyreSpeedLimit_mps),
    ...opt('stopActivationTime_s', r.stopActivationTime_s),
    ...opt('touchdownFactor', r.touchdownFactor),
    ...(cruise === undefined ? {} : { cruise }),
    ...(reference === undefined ? {} : { reference }),
  };
}

/** Every aircraft, ordered by name then id. */
export function listAircraft(db: Db): AircraftProfile[] {
  return db.select().from(aircraft).orderBy(asc(aircraft.name), asc(aircraft.id)).all().map(rowToAircraft);
}

/** The aircraft with this id, or undefined. */
export function getAircraft(db: Db, id: string): AircraftProfile | undefined {
  const row = db.select().from(aircraft).where(eq(aircraft.id, id)).get();
  return row === undefined ? undefined : rowToAircraft(row);
}

/** Ids of the given list that exist in the catalogue. */
export function existingAircraftIds(db: Db, ids: readonly string[]): Set<string> {
  const out = new Set<string>();
  const unique = [...new Set(ids)];
  for (let i = 0; i < unique.length; i += 500) {
    const chunk = unique.slice(i, i + 500);
    for (const r of db.select({ id: aircraft.id }).from(aircraft).where(inArray(aircraft.id, chunk)).all()) out.add(r.id);
  }
  return out;
}

/** Validates and inserts a new aircraft; throws DuplicateIdError when the id exists. */
export function createAircraft(db: Db, profile: AircraftProfile): AircraftProfile {
  return createAircraftMany(db, [profile])[0]!;
}

/** Every column of the aircraft table bound to a named placeholder of the same name. */
const INSERT_PLACEHOLDERS = Object.fromEntries(
  Object.keys(getTableColumns(aircraft)).map((k) => [k, sql.placeholder(k)]),
) as unknown as AircraftInsert;

/**
 * Validates and inserts several aircraft in one transaction: all of them, or none (the first invalid
 * profile or existing id throws and nothing is written).
 */
export function createAircraftMany(db: Db, profiles: readonly AircraftProfile[]): AircraftProfile[] {
  profiles.forEach((p, i) => validateAircraft(p, profiles.length === 1 ? 'aircraft' : `aircraft[${i}]`));
  const seen = new Set<string>();
  for (const p of profiles) {
    if (seen.has(p.id)) throw new DuplicateIdError('aircraft', p.id);
    seen.add(p.id);
  }
  return transaction(db, (tx) => {
    const existing = existingAircraftIds(tx, profiles.map((p) => p.id));
    const clash = profiles.find((p) => existing.has(p.id));
    if (clash) throw new DuplicateIdError('aircraft', clash.id);
    if (profiles.length === 1) tx.insert(aircraft).values(aircraftToRow(profiles[0]!)).run();
    else if (profiles.length > 1) {
      // One prepared statement for the batch: building the SQL once per row dominates large imports.
      const insert = tx.insert(aircraft).values(INSERT_PLACEHOLDERS).prepare();
      for (const p of profiles) insert.run(aircraftToRow(p));
    }
    return profiles.map((p) => rowToAircraft(aircraftToRow(p) as AircraftRow));
  });
}

/**
 * Replaces the aircraft `id` with `profile` (validated). When `profile.id` differs, the aircraft is
 * renamed and fleet rows follow; throws NotFoundError or DuplicateIdError.
 */
export function updateAircraft(db: Db, id: string, profile: AircraftProfile): AircraftProfile {
  validateAircraft(profile);
  return transaction(db, (tx) => {
    if (!tx.select({ id: aircraft.id }).from(aircraft).where(eq(aircraft.id, id)).get()) throw new NotFoundError('aircraft', id);
    if (profile.id !== id && tx.select({ id: aircraft.id }).from(aircraft).where(eq(aircraft.id, profile.id)).get()) {
      throw new DuplicateIdError('aircraft', profile.id);
    }
    tx.update(aircraft).set(aircraftToRow(profile)).where(eq(aircraft.id, id)).run();
    return getAircraft(tx, profile.id)!;
  });
}

/** Copies aircraft `sourceId` under a new id (and name, by default "<name> (copy)"). */
export function duplicateAircraft(db: Db, sourceId: string, copy: { readonly id: string; readonly name?: string }): AircraftProfile {
  return transaction(db, (tx) => {
    const src = getAircraft(tx, sourceId);
    if (!src) throw new NotFoundError('aircraft', sourceId);
    const name = copy.name ?? `${src.name} (copy)`;
    return createAircraft(tx, { ...src, id: copy.id, name: name.length > 120 ? name.slice(0, 120) : name });
  });
}

/** Scenarios whose fleet uses aircraft `id`, ordered by study then scenario. */
export function aircraftUses(db: Db, id: string): ScenarioUse[] {
  return db
    .selectDistinct({ studyId: studies.id, studyName: studies.name, scenarioId: scenarios.id, scenarioName: scenarios.name, position: scenarios.position })
    .from(fleetRows)
    .innerJoin(scenarios, eq(fleetRows.scenarioId, scenarios.id))
    .innerJoin(studies, eq(scenarios.studyId, studies.id))
    .where(eq(fleetRows.aircraftId, id))
    .orderBy(asc(studies.name), asc(studies.id), asc(scenarios.position))
    .all()
    .map(({ studyId, studyName, scenarioId, scenarioName }) => ({ studyId, studyName, scenarioId, scenarioName }));
}

/**
 * Deletes aircraft `id`. Refused with AircraftInUseError (naming the scenarios) while a fleet row uses
 * it; NotFoundError when it does not exist.
 */
export function deleteAircraft(db: Db, id: string): void {
  transaction(db, (tx) => {
    if (!tx.select({ id: aircraft.id }).from(aircraft).where(eq(aircraft.id, id)).get()) throw new NotFoundError('aircraft', id);
    const uses = aircraftUses(tx, id);
    if (uses.length > 0) throw new AircraftInUseError(id, uses);
    tx.delete(aircraft).where(eq(aircraft.id, id)).run();
  });
}

/** Number of aircraft in the catalogue. */
export function countAircraft(db: Db): number {
  return db.select({ n: sql<number>`count(*)` }).from(aircraft).get()!.n;
}

// ---------------------------------------------------------------------------- paging and search

/** Longest catalogue search term, characters (a longer one is cut). */
export const AIRCRAFT_SEARCH_MAX = 100;

/** A LIKE pattern matching `term` anywhere, with `%`, `_` and the escape character taken literally. */
export function likeContains(term: string): string {
  return `%${term.replace(/[\\%_]/g, (ch) => `\\${ch}`)}%`;
}

/** Rows whose id, name, group, certification or engine type contains the term (ASCII case-insensitive). */
function matching(term: string | undefined): SQL | undefined {
  const t = (term ?? '').trim().slice(0, AIRCRAFT_SEARCH_MAX);
  if (t === '') return undefined;
  const p = likeContains(t);
  const like = (col: SQLiteColumn) => sql`${col} LIKE ${p} ESCAPE '\\'`;
  return or(like(aircraft.id), like(aircraft.name), like(aircraft.group), like(aircraft.certification), like(aircraft.engineType));
}

export interface AircraftPageQuery {
  /** Substring of the id, name, group, certification or engine type; blank for every aircraft. */
  readonly search?: string;
  /** Rows per page (at least 1). */
  readonly limit: number;
  /** Rows skipped, in name-then-id order (0 or more). */
  readonly offset: number;
}

/** Number of aircraft matching the search (every aircraft for a blank one). */
export function countAircraftMatching(db: Db, search: string | undefined): number {
  return db.select({ n: sql<number>`count(*)` }).from(aircraft).where(matching(search)).get()!.n;
}

/**
 * One page of the catalogue in name-then-id order: the list pages and the API read a bounded slice
 * (index `aircraft_name_order`) instead of the whole table.
 */
export function pageAircraft(db: Db, q: AircraftPageQuery): AircraftProfile[] {
  return db.select().from(aircraft).where(matching(q.search)).orderBy(asc(aircraft.name), asc(aircraft.id))
    .limit(Math.max(1, Math.floor(q.limit))).offset(Math.max(0, Math.floor(q.offset))).all().map(rowToAircraft);
}

/** Ids and names of at most `limit` aircraft matching the search, in name order (pickers). */
export function aircraftChoices(db: Db, search: string | undefined, limit: number): { id: string; name: string }[] {
  return db.select({ id: aircraft.id, name: aircraft.name }).from(aircraft).where(matching(search))
    .orderBy(asc(aircraft.name), asc(aircraft.id)).limit(Math.max(1, Math.floor(limit))).all();
}

/** Names of the given aircraft ids that exist (fleet rows name their aircraft without loading the catalogue). */
export function aircraftNames(db: Db, ids: readonly string[]): Map<string, string> {
  const out = new Map<string, string>();
  const unique = [...new Set(ids)];
  for (let i = 0; i < unique.length; i += 500) {
    const chunk = unique.slice(i, i + 500);
    for (const r of db.select({ id: aircraft.id, name: aircraft.name }).from(aircraft).where(inArray(aircraft.id, chunk)).all()) out.set(r.id, r.name);
  }
  return out;
}

/** The profiles of the given ids that exist (a form checks its rows without loading the catalogue). */
export function aircraftByIds(db: Db, ids: readonly string[]): Map<string, AircraftProfile> {
  const out = new Map<string, AircraftProfile>();
  const unique = [...new Set(ids)];
  for (let i = 0; i < unique.length; i += 500) {
    const chunk = unique.slice(i, i + 500);
    for (const r of db.select().from(aircraft).where(inArray(aircraft.id, chunk)).all()) out.set(r.id, rowToAircraft(r));
  }
  return out;
}

// ------------------------------------------------------------------------------------- bulk import

/** One column of the aircraft table: the row key, its SQL name, and whether it holds text. */
export interface AircraftColumn { readonly key: keyof AircraftInsert; readonly name: string; readonly text: boolean }

/** Every column of the aircraft table, in one fixed order (the order of the packed rows below). */
export const AIRCRAFT_COLUMNS: readonly AircraftColumn[] = Object.entries(getTableColumns(aircraft)).map(([key, c]) => ({
  key: key as keyof AircraftInsert, name: c.name, text: c.dataType === 'string',
}));
const TEXT_COLUMNS = AIRCRAFT_COLUMNS.filter((c) => c.text);
const NUMBER_COLUMNS = AIRCRAFT_COLUMNS.filter((c) => !c.text);

/**
 * Aircraft table rows packed for a worker thread to hand to the main thread cheaply: the numbers in
 * one Float64Array (NaN for a missing value: a validated value is always finite) and the text cells
 * in one string joined by NUL (which no imported text can hold), with a null mask. Copying this
 * across threads costs milliseconds where an array of row objects costs hundreds (structured clone
 * builds every object on the receiving thread, blocking its event loop); the typed arrays are
 * transferred, not copied.
 */
export interface PackedAircraft {
  readonly count: number;
  readonly numbers: Float64Array;
  readonly texts: string;
  readonly textNull: Uint8Array;
  /** The ids alone, joined by NUL (the commit checks them before it reads the rows). */
  readonly ids: string;
}

/** Packs profiles (already validated) as table rows. */
export function packAircraft(profiles: readonly AircraftProfile[]): PackedAircraft {
  const n = profiles.length;
  const numbers = new Float64Array(n * NUMBER_COLUMNS.length);
  const textNull = new Uint8Array(n * TEXT_COLUMNS.length);
  const texts: string[] = [];
  profiles.forEach((p, i) => {
    const row = aircraftToRow(p) as Record<string, unknown>;
    NUMBER_COLUMNS.forEach((c, k) => {
      const v = row[c.key];
      numbers[i * NUMBER_COLUMNS.length + k] = v === null || v === undefined ? Number.NaN : (v as number);
    });
    TEXT_COLUMNS.forEach((c, k) => {
      const v = row[c.key];
      if (v === null || v === undefined) textNull[i * TEXT_COLUMNS.length + k] = 1;
      texts.push(v === null || v === undefined ? '' : String(v));
    });
  });
  return { count: n, numbers, texts: texts.join('\u0000'), textNull, ids: profiles.map((p) => p.id).join('\u0000') };
}

/** Reads packed rows back in order, one parameter array per row (in AIRCRAFT_COLUMNS order). */
class PackedReader {
  private row = 0;
  private at = 0;
  constructor(private readonly p: PackedAircraft) {}
  get done(): boolean { return this.row >= this.p.count; }
  next(): (string | number | null)[] {
    const i = this.row++;
    const texts: (string | null)[] = [];
    for (let k = 0; k < TEXT_COLUMNS.length; k++) {
      let end = this.p.texts.indexOf('\u0000', this.at);
      if (end < 0) end = this.p.texts.length;
      const cell = this.p.texts.slice(this.at, end);
      this.at = end + 1;
      texts.push(this.p.textNull[i * TEXT_COLUMNS.length + k] === 1 ? null : cell);
    }
    let t = 0;
    let m = 0;
    return AIRCRAFT_COLUMNS.map((c) => {
      if (c.text) return texts[t++]!;
      const v = this.p.numbers[i * NUMBER_COLUMNS.length + m++]!;
      return Number.isNaN(v) ? null : v;
    });
  }
}

/** The ids of packed rows, in order. */
export function packedIds(p: PackedAircraft): string[] {
  return p.count === 0 ? [] : p.ids.split('\u0000');
}

/** Thrown by a bulk import that would overwrite aircraft without being asked to; names the rows. */
export class ExistingAircraftError extends Error {
  override readonly name = 'ExistingAircraftError';
  constructor(
    /** Indices, in the import, of the rows whose id is already in the catalogue (ascending). */
    readonly rows: readonly number[],
    readonly ids: readonly string[],
  ) {
    super(`${ids.length} aircraft already in the catalogue: ${ids.slice(0, 5).map((id) => `"${id}"`).join(', ')}${ids.length > 5 ? ', …' : ''}`);
  }
}

/** Rows per step of a bulk import (each step takes about 1 ms; see `bulkImportAircraft`). */
export const BULK_STEP_ROWS = 100;

const q = (name: string) => `"${name}"`;
const COLUMN_LIST = AIRCRAFT_COLUMNS.map((c) => q(c.name)).join(', ');
const VALUES = AIRCRAFT_COLUMNS.map(() => '?').join(', ');
const INSERT_SQL = `INSERT INTO aircraft (${COLUMN_LIST}) VALUES (${VALUES})`;
/**
 * Replacing keeps the aircraft's reference table when the import has none (a CSV never carries one);
 * an update in place, so fleet rows that use the aircraft stay valid.
 */
const UPSERT_SQL = `${INSERT_SQL} ON CONFLICT(id) DO UPDATE SET ${AIRCRAFT_COLUMNS.filter((c) => c.key !== 'id')
  .map((c) => (c.key === 'referenceTableJson' ? `${q(c.name)} = coalesce(excluded.${q(c.name)}, aircraft.${q(c.name)})` : `${q(c.name)} = excluded.${q(c.name)}`))
  .join(', ')}`;

/**
 * The steps of a bulk import of packed, validated rows on connection `sqlite`, which the caller has
 * put in a write transaction (and rolls back on a throw): checks which ids exist (refusing with
 * ExistingAircraftError unless `replace`), then inserts, or replaces in place. The generator yields
 * every BULK_STEP_ROWS rows, so a caller may let the event loop run between steps; the caller that
 * does so must keep every other write of the process out until it commits (db/bulk.ts).
 */
export function* bulkImportAircraft(
  sqlite: import('better-sqlite3').Database,
  rows: PackedAircraft,
  options: { readonly replace: boolean },
): Generator<void, { created: string[]; replaced: string[] }> {
  const ids = packedIds(rows);
  const existing = new Set<string>();
  for (let i = 0; i < ids.length; i += 500) {
    const chunk = ids.slice(i, i + 500);
    const found = sqlite.prepare(`SELECT id FROM aircraft WHERE id IN (${chunk.map(() => '?').join(', ')})`).pluck().all(...chunk) as string[];
    for (const id of found) existing.add(id);
    yield;
  }
  if (existing.size > 0 && !options.replace) {
    const at = ids.flatMap((id, i) => (existing.has(id) ? [i] : []));
    throw new ExistingAircraftError(at, at.map((i) => ids[i]!));
  }
  const stmt = sqlite.prepare(options.replace ? UPSERT_SQL : INSERT_SQL);
  const reader = new PackedReader(rows);
  while (!reader.done) {
    for (let k = 0; k < BULK_STEP_ROWS && !reader.done; k++) stmt.run(reader.next());
    yield;
  }
  return { created: ids.filter((id) => !existing.has(id)), replaced: ids.filter((id) => existing.has(id)) };
}

/** Runs every step of a generator at once (the synchronous driver). */
export function runSteps<T>(steps: Generator<void, T>): T {
  for (;;) {
    const r = steps.next();
    if (r.done) return r.value;
  }
}
