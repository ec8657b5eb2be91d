/**
 * JSON catalogue import through the parse/commit split (issue 12): a refusal names the line, column
 * and path of each id already in the catalogue (found in one pass over the file), replacing keeps an
 * aircraft's reference table when the file has none, and a refused import changes nothing.
 */
import { describe, expect, it } from 'vitest';
import { openDatabase } from '../../../db/client.js';
import { getAircraft, updateAircraft } from '../../../db/repos/aircraft.js';
import { seedDemoIfEmpty } from '../../../db/seed.js';
import { importAircraftJson, parseAircraftJson } from '../../../server/aircraft/catalogue.js';
import { generatedAircraft, demoDocument } from '../../db/fixtures/demo.js';
import { dump, importError, lineOf } from './helpers.js';

describe('aircraft JSON import', () => {
  it('refuses ids already in the catalogue with the line, column and path of each, and writes nothing', () => {
    const { db, sqlite } = openDatabase(':memory:');
    seedDemoIfEmpty(db, demoDocument());
    const existing = demoDocument().aircraft[1]!;
    const list = [...generatedAircraft(3, 'j'), existing];
    const text = `{ "aircraft": ${JSON.stringify(list, null, 2)} }\n`;
    const before = dump(sqlite);
    const e = importError(() => importAircraftJson(db, text));
    const line = lineOf(text, `"id": "${existing.id}"`);
    const column = text.split('\n')[line - 1]!.indexOf(`"${existing.id}"`) + 1;
    expect(e.problems).toEqual([{ line, column, field: 'aircraft[3].id', reason: `aircraft "${existing.id}" is already in the catalogue; remove it from the file, or import with "replace"` }]);
    expect(dump(sqlite)).toBe(before);
    sqlite.close();
  });

  it('places every row for the messages in one pass, whatever the layout', () => {
    const list = generatedAircraft(3, 'k');
    const parsed = parseAircraftJson(JSON.stringify(list));
    expect(Array.from(parsed.lines)).toEqual([1, 1, 1]);
    const text = JSON.stringify(list);
    expect(Array.from(parsed.columns!)).toEqual(list.map((a) => text.indexOf(`"${a.id}"`) + 1));
  });

  it('replace overwrites in place and keeps the reference table the file does not carry', () => {
    const { db, sqlite } = openDatabase(':memory:');
    const [a] = generatedAircraft(1, 'r');
    importAircraftJson(db, JSON.stringify([a]));
    const table = { mass_kg: [5000, 6000], elevation_m: [0], temperature_c: [15], length_m: [[[900]], [[1000]]] };
    updateAircraft(db, a!.id, { ...a!, reference: { table } });
    const r = importAircraftJson(db, JSON.stringify([{ ...a, name: 'Renamed jet' }, ...generatedAircraft(1, 'n')]), { replace: true });
    expect(r).toEqual({ created: ['n-00000'], replaced: [a!.id] });
    expect(getAircraft(db, a!.id)).toMatchObject({ name: 'Renamed jet', reference: { table } });
    sqlite.close();
  });
});
