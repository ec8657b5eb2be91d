/** Synchronous transactions: a throw rolls every row back; an async callback is refused (style.md, Persistence). */
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { openDatabase, type DatabaseHandle } from '../../db/client.js';
import { countAircraft, createAircraft, createAircraftMany, getAircraft } from '../../db/repos/aircraft.js';
import { createSite, listSites } from '../../db/repos/sites.js';
import { DuplicateIdError } from '../../db/errors.js';
import { AsyncTransactionError, transaction } from '../../db/transaction.js';
import { demoAircraft, demoDocument, generatedAircraft } from './fixtures/demo.js';

let h: DatabaseHandle;
beforeEach(() => {
  h = openDatabase(':memory:');
});
afterEach(() => h.sqlite.close());

function counts(): Record<string, number> {
  const out: Record<string, number> = {};
  for (const t of ['aircraft', 'sites', 'runways', 'runway_profile_points', 'runway_directions', 'site_climate_months']) {
    out[t] = (h.sqlite.prepare(`SELECT count(*) AS n FROM ${t}`).get() as { n: number }).n;
  }
  return out;
}

describe('transaction', () => {
  it('rolls back every row of every table when the callback throws', () => {
    createAircraft(h.db, demoAircraft('kestrel-ut1'));
    const before = counts();
    expect(() =>
      transaction(h.db, (tx) => {
        createAircraftMany(tx, generatedAircraft(50));
        createSite(tx, demoDocument().site);
        expect(countAircraft(tx)).toBe(51); // written inside the transaction
        throw new Error('boom');
      }),
    ).toThrow('boom');
    expect(counts()).toEqual(before);
    expect(h.sqlite.inTransaction).toBe(false);
  });

  it('commits when the callback returns, and returns its value', () => {
    const id = transaction(h.db, (tx) => createSite(tx, demoDocument().site));
    expect(listSites(h.db).map((s) => s.id)).toEqual([id]);
  });

  it('nested: a caught inner failure undoes only the inner writes; an uncaught one undoes all', () => {
    transaction(h.db, (tx) => {
      createAircraft(tx, demoAircraft('kestrel-ut1'));
      expect(() => transaction(tx, (inner) => { createAircraft(inner, demoAircraft('pipit-lt2')); throw new Error('inner'); })).toThrow('inner');
    });
    expect(getAircraft(h.db, 'kestrel-ut1')).toBeDefined();
    expect(getAircraft(h.db, 'pipit-lt2')).toBeUndefined();

    expect(() =>
      transaction(h.db, (tx) => {
        createAircraft(tx, demoAircraft('heron-st1'));
        transaction(tx, (inner) => { createAircraft(inner, demoAircraft('plover-ct19')); throw new Error('inner'); });
      }),
    ).toThrow('inner');
    expect(getAircraft(h.db, 'heron-st1')).toBeUndefined();
    expect(getAircraft(h.db, 'plover-ct19')).toBeUndefined();
  });

  it('refuses an async callback and rolls back what it wrote before its first await', async () => {
    let afterAwait: Promise<void> | undefined;
    expect(() =>
      transaction(h.db, (tx) => {
        createAircraft(tx, demoAircraft('kestrel-ut1'));
        afterAwait = (async () => {
          await Promise.resolve();
        })();
        return afterAwait;
      }),
    ).toThrow(AsyncTransactionError);
    await afterAwait;
    expect(getAircraft(h.db, 'kestrel-ut1')).toBeUndefined();
    expect(h.sqlite.inTransaction).toBe(false);
  });

  it('refuses an async callback in a nested transaction too', () => {
    expect(() => transaction(h.db, (tx) => transaction(tx, async () => undefined))).toThrow(AsyncTransactionError);
  });

  it('a multi-row repository write is all or nothing (an existing id at the end writes nothing)', () => {
    createAircraft(h.db, demoAircraft('kestrel-ut1'));
    const batch = [...generatedAircraft(30), demoAircraft('kestrel-ut1')];
    expect(() => createAircraftMany(h.db, batch)).toThrow(DuplicateIdError);
    expect(countAircraft(h.db)).toBe(1);
  });
});
