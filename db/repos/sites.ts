/**
 * Sites repository: a site with its monthly climate, runways, centreline profile points and runway
 * directions (declared distances). A site is read and written whole (`SiteInput` of core), in one
 * transaction; lists keep their order. Deleting a site that a study uses is refused (SiteInUseError).
 *
 * Values are SI and are expected to have been validated at the edge (the features' schema.ts files); the database's
 * own constraints (months 1–12, foreign keys) are the last guard.
 */
import { asc, eq, inArray, sql } from 'drizzle-orm';
import type { MonthlyClimate, RunwayInput, SiteClimate, SiteInput } from '../../core/index.js';
import { DuplicateIdError, NotFoundError, SiteInUseError } from '../errors.js';
import { runwayDirections, runwayProfilePoints, runways, siteClimateMonths, sites, studies } from '../schema.js';
import { transaction } from '../transaction.js';
import type { Db } from '../types.js';

/** A stored site: the core site input plus its database id. */
export interface SiteRecord extends SiteInput {
  readonly id: number;
}

export interface SiteSummary {
  readonly id: number;
  readonly name: string;
  readonly elevation_m: number;
  readonly runwayCount: number;
  readonly hasClimate: boolean;
}

/** Sites ordered by name then id, with runway counts. */
export function listSites(db: Db): SiteSummary[] {
  return db
    .select({
      id: sites.id,
      name: sites.name,
      elevation_m: sites.elevation_m,
      // Written out in full: drizzle leaves columns unqualified in a one-table select.
      runwayCount: sql<number>`(select count(*) from "runways" where "runways"."site_id" = "sites"."id")`,
      climateSource: sites.climateSource,
    })
    .from(sites)
    .orderBy(asc(sites.name), asc(sites.id))
    .all()
    .map(({ climateSource, ...s }) => ({ ...s, hasClimate: climateSource !== null }));
}

/** Ids of every site, ascending. */
export function listSiteIds(db: Db): number[] {
  return db.select({ id: sites.id }).from(sites).orderBy(asc(sites.id)).all().map((r) => r.id);
}

function monthToRow(siteId: number, m: MonthlyClimate): typeof siteClimateMonths.$inferInsert {
  return { siteId, month: m.month, meanMax_c: m.meanMax_c, meanMin_c: m.meanMin_c ?? null, mean_c: m.mean_c ?? null };
}

function writeClimate(tx: Db, siteId: number, climate: SiteClimate | undefined): void {
  tx.delete(siteClimateMonths).where(eq(siteClimateMonths.siteId, siteId)).run();
  tx.update(sites)
    .set({ climateSource: climate?.source ?? null, climateYears: climate?.years ?? null })
    .where(eq(sites.id, siteId))
    .run();
  if (climate && climate.monthly.length > 0) {
    tx.insert(siteClimateMonths).values(climate.monthly.map((m) => monthToRow(siteId, m))).run();
  }
}

function writeRunways(tx: Db, siteId: number, list: readonly RunwayInput[]): void {
  tx.delete(runways).where(eq(runways.siteId, siteId)).run();
  list.forEach((rw, position) => {
    const { id } = tx.insert(runways).values({ siteId, position, name: rw.name, pavement: rw.pavement }).returning({ id: runways.id }).get();
    if (rw.profile.length > 0) {
      tx.insert(runwayProfilePoints)
        .values(rw.profile.map((p, i) => ({ runwayId: id, position: i, chainage_m: p.chainage_m, elevation_m: p.elevation_m })))
        .run();
    }
    if (rw.directions.length > 0) {
      tx.insert(runwayDirections)
        .values(rw.directions.map((d, i) => ({ runwayId: id, position: i, designator: d.designator, tora_m: d.tora_m, toda_m: d.toda_m, asda_m: d.asda_m, lda_m: d.lda_m })))
        .run();
    }
  });
}

/**
 * Inserts a site with its climate and runways in one transaction and returns its id. `id` may be
 * given (workspace import keeps ids); DuplicateIdError when it is taken.
 */
export function createSite(db: Db, site: SiteInput, id?: number): number {
  return transaction(db, (tx) => {
    if (id !== undefined && tx.select({ id: sites.id }).from(sites).where(eq(sites.id, id)).get()) throw new DuplicateIdError('site', id);
    const row = tx
      .insert(sites)
      .values({ ...(id === undefined ? {} : { id }), name: site.name, elevation_m: site.elevation_m, designTemperature_c: site.designTemperature_c ?? null })
      .returning({ id: sites.id })
      .get();
    writeClimate(tx, row.id, site.climate);
    writeRunways(tx, row.id, site.runways);
    return row.id;
  });
}

/** Replaces site `id` whole (name, elevation, design temperature, climate, runways). */
export function updateSite(db: Db, id: number, site: SiteInput): void {
  transaction(db, (tx) => {
    const res = tx
      .update(sites)
      .set({ name: site.name, elevation_m: site.elevation_m, designTemperature_c: site.designTemperature_c ?? null })
      .where(eq(sites.id, id))
      .run();
    if (res.changes === 0) throw new NotFoundError('site', id);
    writeClimate(tx, id, site.climate);
    writeRunways(tx, id, site.runways);
  });
}

/** Sets (or, with undefined, removes) the climate of site `id`. */
export function setSiteClimate(db: Db, id: number, climate: SiteClimate | undefined): void {
  transaction(db, (tx) => {
    if (!tx.select({ id: sites.id }).from(sites).where(eq(sites.id, id)).get()) throw new NotFoundError('site', id);
    writeClimate(tx, id, climate);
  });
}

/** Site `id` assembled as the core type, or undefined. Lists come back in the order they were written. */
export function getSite(db: Db, id: number): SiteRecord | undefined {
  const s = db.select().from(sites).where(eq(sites.id, id)).get();
  if (!s) return undefined;
  const months = db.select().from(siteClimateMonths).where(eq(siteClimateMonths.siteId, id)).orderBy(asc(siteClimateMonths.month)).all();
  const rws = db.select().from(runways).where(eq(runways.siteId, id)).orderBy(asc(runways.position)).all();
  const rwIds = rws.map((r) => r.id);
  const points = rwIds.length === 0 ? [] : db.select().from(runwayProfilePoints).where(inArray(runwayProfilePoints.runwayId, rwIds)).orderBy(asc(runwayProfilePoints.runwayId), asc(runwayProfilePoints.position)).all();
  const dirs = rwIds.length === 0 ? [] : db.select().from(runwayDirections).where(inArray(runwayDirections.runwayId, rwIds)).orderBy(asc(runwayDirections.runwayId), asc(runwayDirections.position)).all();

  const climate: SiteClimate | undefined =
    s.climateSource === null
      ? undefined
      : {
          source: s.climateSource,
          ...(s.climateYears === null ? {} : { years: s.climateYears }),
          monthly: months.map((m) => ({
            month: m.month,
            meanMax_c: m.meanMax_c,
            ...(m.meanMin_c === null ? {} : { meanMin_c: m.meanMin_c }),
            ...(m.mean_c === null ? {} : { mean_c: m.mean_c }),
          })),
        };
  return {
    id: s.id,
    name: s.name,
    elevation_m: s.elevation_m,
    ...(s.designTemperature_c === null ? {} : { designTemperature_c: s.designTemperature_c }),
    ...(climate === undefined ? {} : { climate }),
    runways: rws.map((rw) => ({
      name: rw.name,
      pavement: rw.pavement,
      profile: points.filter((p) => p.runwayId === rw.id).map((p) => ({ chainage_m: p.chainage_m, elevation_m: p.elevation_m })),
      directions: dirs
        .filter((d) => d.runwayId === rw.id)
        .map((d) => ({ designator: d.designator, tora_m: d.tora_m, toda_m: d.toda_m, asda_m: d.asda_m, lda_m: d.lda_m })),
    })),
  };
}

/** The site without its id (the core `SiteInput`). */
export function siteInput(rec: SiteRecord): SiteInput {
  const { id: _id, ...input } = rec;
  return input;
}

/** Deletes site `id` with its climate and runways; refused with SiteInUseError while a study uses it. */
export function deleteSite(db: Db, id: number): void {
  transaction(db, (tx) => {
    if (!tx.select({ id: sites.id }).from(sites).where(eq(sites.id, id)).get()) throw new NotFoundError('site', id);
    const users = tx.select({ id: studies.id, name: studies.name }).from(studies).where(eq(studies.siteId, id)).orderBy(asc(studies.name), asc(studies.id)).all();
    if (users.length > 0) throw new SiteInUseError(id, users);
    tx.delete(sites).where(eq(sites.id, id)).run();
  });
}
