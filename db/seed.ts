/**
 * First-start seeding: the invented demo (a site, its aircraft, a study with scenarios) is written
 * once, into an empty database, in one transaction. The `meta` row `demo_seeded` records that seeding
 * has been decided, so a second start changes nothing, and neither does a start after the user has
 * deleted the demo. A database that already holds data when first seen is left as it is.
 */
import { eq } from 'drizzle-orm';
import type { AircraftProfile, ScenarioInput, SiteInput, StudyOptions } from '../core/index.js';
import { aircraft, meta, sites, studies } from './schema.js';
import { createAircraftMany } from './repos/aircraft.js';
import { createSite } from './repos/sites.js';
import { createStudy } from './repos/studies.js';
import { transaction } from './transaction.js';
import type { Db } from './types.js';

/** A study document (examples/demo-study.json): extra keys such as `format` are ignored. */
export interface DemoDocument {
  readonly name: string;
  readonly site: SiteInput;
  readonly aircraft: readonly AircraftProfile[];
  readonly scenarios: readonly ScenarioInput[];
  readonly options: StudyOptions;
}

export const DEMO_SEEDED_KEY = 'demo_seeded';

export type SeedOutcome =
  | { readonly seeded: true; readonly siteId: number; readonly studyId: number }
  | { readonly seeded: false; readonly reason: 'already-seeded' | 'not-empty' };

function isEmpty(tx: Db): boolean {
  return (
    tx.select({ id: aircraft.id }).from(aircraft).limit(1).get() === undefined &&
    tx.select({ id: sites.id }).from(sites).limit(1).get() === undefined &&
    tx.select({ id: studies.id }).from(studies).limit(1).get() === undefined
  );
}

/** Seeds `demo` when this database has never been seeded and holds no data; otherwise does nothing. */
export function seedDemoIfEmpty(db: Db, demo: DemoDocument): SeedOutcome {
  return transaction(db, (tx): SeedOutcome => {
    if (tx.select().from(meta).where(eq(meta.key, DEMO_SEEDED_KEY)).get()) return { seeded: false, reason: 'already-seeded' };
    if (!isEmpty(tx)) {
      tx.insert(meta).values({ key: DEMO_SEEDED_KEY, value: 'skipped: database not empty' }).run();
      return { seeded: false, reason: 'not-empty' };
    }
    createAircraftMany(tx, demo.aircraft);
    const siteId = createSite(tx, demo.site);
    const studyId = createStudy(tx, { name: demo.name, siteId, options: demo.options, scenarios: demo.scenarios });
    tx.insert(meta).values({ key: DEMO_SEEDED_KEY, value: `study ${studyId}` }).run();
    return { seeded: true, siteId, studyId };
  });
}
