/** Sites repository (issue 7): climate, runways, profile points and declared distances. */
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import type { SiteInput } from '../../core/study/types.js';
import { openDatabase, type DatabaseHandle } from '../../db/client.js';
import { NotFoundError, SiteInUseError } from '../../db/errors.js';
import { createSite, deleteSite, getSite, listSites, setSiteClimate, siteInput, updateSite } from '../../db/repos/sites.js';
import { seedDemoIfEmpty } from '../../db/seed.js';
import { demoDocument } from './fixtures/demo.js';

let h: DatabaseHandle;
beforeEach(() => {
  h = openDatabase(':memory:');
});
afterEach(() => h.sqlite.close());

const rows = (table: string) => (h.sqlite.prepare(`SELECT count(*) AS n FROM ${table}`).get() as { n: number }).n;

describe('sites repository', () => {
  it('stores the demo site whole and reads it back unchanged (lists in order)', () => {
    const site = demoDocument().site;
    const id = createSite(h.db, site);
    expect(siteInput(getSite(h.db, id)!)).toEqual(site);
    expect(rows('site_climate_months')).toBe(12);
    expect(rows('runway_profile_points')).toBe(7 + 3);
    expect(rows('runway_directions')).toBe(4);
    expect(listSites(h.db)).toEqual([{ id, name: site.name, elevation_m: 1346, runwayCount: 2, hasClimate: true }]);
  });

  it('keeps optional values: a design temperature and no climate', () => {
    const site: SiteInput = { name: 'Strip (invented)', elevation_m: 250, designTemperature_c: 31, runways: [] };
    const id = createSite(h.db, site);
    expect(siteInput(getSite(h.db, id)!)).toEqual(site);
  });

  it('update replaces climate and runways; the old child rows are gone', () => {
    const id = createSite(h.db, demoDocument().site);
    const next: SiteInput = { ...demoDocument().site, runways: [demoDocument().site.runways[1]!] };
    updateSite(h.db, id, next);
    expect(siteInput(getSite(h.db, id)!)).toEqual(next);
    expect(rows('runways')).toBe(1);
    expect(rows('runway_profile_points')).toBe(3);
    expect(() => updateSite(h.db, 999, next)).toThrow(NotFoundError);
  });

  it('sets and removes the climate', () => {
    const id = createSite(h.db, demoDocument().site);
    setSiteClimate(h.db, id, undefined);
    expect(getSite(h.db, id)!.climate).toBeUndefined();
    expect(rows('site_climate_months')).toBe(0);
    setSiteClimate(h.db, id, demoDocument().site.climate);
    expect(getSite(h.db, id)!.climate).toEqual(demoDocument().site.climate);
  });

  it('refuses to delete a site a study uses, naming the study; deletes an unused one with its children', () => {
    const seeded = seedDemoIfEmpty(h.db, demoDocument());
    if (!seeded.seeded) throw new Error('expected seeding');
    expect(() => deleteSite(h.db, seeded.siteId)).toThrow(SiteInUseError);
    expect(() => deleteSite(h.db, seeded.siteId)).toThrow(/Sable Mesa Regional: runway length study/);
    const other = createSite(h.db, demoDocument().site);
    deleteSite(h.db, other);
    expect(getSite(h.db, other)).toBeUndefined();
    expect(rows('runways')).toBe(2); // the seeded site's runways only
  });
});
