/** Aircraft catalogue repository (issue 7): CRUD, duplicate, rename, delete refused while in use. */
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import type { AircraftProfile } from '../../core/aircraft.js';
import { InputDomainError } from '../../core/errors.js';
import { openDatabase, type DatabaseHandle } from '../../db/client.js';
import { AircraftInUseError, DuplicateIdError, NotFoundError } from '../../db/errors.js';
import {
  aircraftUses,
  countAircraft,
  createAircraft,
  deleteAircraft,
  duplicateAircraft,
  getAircraft,
  listAircraft,
  updateAircraft,
} from '../../db/repos/aircraft.js';
import { getStudy } from '../../db/repos/studies.js';
import { seedDemoIfEmpty } from '../../db/seed.js';
import { demoAircraft, demoDocument } from './fixtures/demo.js';

let h: DatabaseHandle;
beforeEach(() => {
  h = openDatabase(':memory:');
});
afterEach(() => h.sqlite.close());

const withTable: AircraftProfile = {
  ...demoAircraft('tern-rj90'),
  id: 'tern-table',
  reference: {
    takeoff_m: 1700,
    table: { mass_kg: [30000, 40000], elevation_m: [0, 1500], temperature_c: [15, 35], length_m: [[[1200, 1350], [1450, 1650]], [[1550, 1750], [1900, 2150]]] },
  },
};

describe('aircraft repository', () => {
  it('stores every demo profile (turbofan, turboprop, piston, tailwheel) and reads it back unchanged', () => {
    for (const a of demoDocument().aircraft) createAircraft(h.db, a);
    for (const a of demoDocument().aircraft) expect(getAircraft(h.db, a.id)).toEqual(a);
    expect(listAircraft(h.db).map((a) => a.name)).toEqual([...demoDocument().aircraft.map((a) => a.name)].sort());
  });

  it('keeps a reference table (JSON column) and optional fields exactly', () => {
    createAircraft(h.db, withTable);
    expect(getAircraft(h.db, 'tern-table')).toEqual(withTable);
  });

  it('validates with the core rules and writes nothing for a bad profile', () => {
    expect(() => createAircraft(h.db, { ...demoAircraft('kestrel-ut1'), mlw_kg: 2000 })).toThrow(InputDomainError);
    expect(() => createAircraft(h.db, { ...demoAircraft('kestrel-ut1'), mtow_kg: 700000 })).toThrow(/mtow_kg/);
    expect(countAircraft(h.db)).toBe(0);
  });

  it('refuses an id that exists', () => {
    createAircraft(h.db, demoAircraft('kestrel-ut1'));
    expect(() => createAircraft(h.db, demoAircraft('kestrel-ut1'))).toThrow(DuplicateIdError);
  });

  it('updates, and renames with fleet rows following', () => {
    const { studyId } = seedDemoIfEmpty(h.db, demoDocument()) as { studyId: number };
    updateAircraft(h.db, 'tern-rj90', { ...demoAircraft('tern-rj90'), id: 'tern-rj95', mtow_kg: 41000 });
    expect(getAircraft(h.db, 'tern-rj90')).toBeUndefined();
    expect(getAircraft(h.db, 'tern-rj95')?.mtow_kg).toBe(41000);
    const fleetIds = getStudy(h.db, studyId)!.scenarios.flatMap((s) => s.fleet.map((r) => r.aircraft));
    expect(fleetIds).toContain('tern-rj95');
    expect(fleetIds).not.toContain('tern-rj90');
    expect(() => updateAircraft(h.db, 'nope', demoAircraft('kestrel-ut1'))).toThrow(NotFoundError);
    expect(() => updateAircraft(h.db, 'tern-rj95', { ...demoAircraft('tern-rj90'), id: 'kestrel-ut1' })).toThrow(DuplicateIdError);
  });

  it('duplicates under a new id with "(copy)" in the name', () => {
    createAircraft(h.db, withTable);
    const copy = duplicateAircraft(h.db, 'tern-table', { id: 'tern-copy' });
    expect(copy).toEqual({ ...withTable, id: 'tern-copy', name: `${withTable.name} (copy)` });
    expect(getAircraft(h.db, 'tern-copy')).toEqual(copy);
    expect(() => duplicateAircraft(h.db, 'missing', { id: 'x' })).toThrow(NotFoundError);
  });

  it('refuses to delete an aircraft used by scenarios, naming them; deletes it once unused', () => {
    seedDemoIfEmpty(h.db, demoDocument());
    let err: unknown;
    try {
      deleteAircraft(h.db, 'tern-rj90');
    } catch (e) {
      err = e;
    }
    expect(err).toBeInstanceOf(AircraftInUseError);
    const e = err as AircraftInUseError;
    expect(e.uses.map((u) => u.scenarioName).sort()).toEqual(['Growth 2036', 'New jet service 2031']);
    expect(e.message).toContain('"Growth 2036"');
    expect(e.message).toContain('"New jet service 2031"');
    expect(getAircraft(h.db, 'tern-rj90')).toBeDefined();

    createAircraft(h.db, { ...demoAircraft('kestrel-ut1'), id: 'unused' });
    expect(aircraftUses(h.db, 'unused')).toEqual([]);
    deleteAircraft(h.db, 'unused');
    expect(getAircraft(h.db, 'unused')).toBeUndefined();
    expect(() => deleteAircraft(h.db, 'unused')).toThrow(NotFoundError);
  });

  it('the database itself also refuses the delete (ON DELETE RESTRICT), past the repository check', () => {
    seedDemoIfEmpty(h.db, demoDocument());
    expect(() => h.sqlite.prepare(`DELETE FROM aircraft WHERE id = 'tern-rj90'`).run()).toThrow(/FOREIGN KEY/);
  });
});
