/**
 * Climate import into a site (issue 7) from the open formats core/climate reads. Files are invented;
 * expected values are derived from them (°F → °C by (F − 32)·5/9, core/units.ts; daily means are
 * arithmetic means of the invented days).
 */
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { openDatabase, type DatabaseHandle } from '../../../db/client.js';
import { createSite, getSite } from '../../../db/repos/sites.js';
import { importClimateIntoSite, readClimateFile } from '../../../server/io/climate.js';
import { expectClose } from '../../helpers/close.js';
import { demoDocument } from '../../db/fixtures/demo.js';
import { dump, importError } from './helpers.js';

const STATION = 'XX000099999';
const NORMALS_HEADER = '"STATION","DATE","NAME","MLY-TAVG-NORMAL","MLY-TMAX-NORMAL","MLY-TMIN-NORMAL"';
const TMAX_F = [59, 62.6, 68, 75.2, 84.2, 91.4, 95, 95.9, 87.8, 77, 66.2, 59.9];
const normals = (months: readonly number[]) =>
  [NORMALS_HEADER, ...months.map((m) => `"${STATION}","${String(m).padStart(2, '0')}","INVENTED FIELD","${TMAX_F[m - 1]! - 18}","${TMAX_F[m - 1]}","${TMAX_F[m - 1]! - 36}"`)].join('\n') + '\n';

/** Two invented years of GHCN-Daily rows: TMAX = 20 + month °C, TMIN = TMAX − 10 °C (tenths in the file). */
function ghcnTwoYears(): string {
  const lines: string[] = [];
  for (const year of [2023, 2024]) {
    for (let m = 1; m <= 12; m++) {
      const days = new Date(Date.UTC(year, m, 0)).getUTCDate();
      for (let d = 1; d <= days; d++) {
        const date = `${year}${String(m).padStart(2, '0')}${String(d).padStart(2, '0')}`;
        lines.push(`${STATION},${date},TMAX,${200 + 10 * m},,,S,`, `${STATION},${date},TMIN,${100 + 10 * m},,,S,`);
      }
    }
  }
  return `${lines.join('\n')}\n`;
}

let h: DatabaseHandle;
let siteId: number;
beforeEach(() => {
  h = openDatabase(':memory:');
  siteId = createSite(h.db, demoDocument().site);
});
afterEach(() => h.sqlite.close());

describe('monthly normals CSV into a site (°F, derived °C)', () => {
  it('replaces the site climate with twelve months converted to °C', () => {
    const r = importClimateIntoSite(h.db, siteId, { format: 'monthly-normals', data: normals([1, 2, 3, 4, 5, 6, 7, 8, 9, 10, 11, 12]), fileName: 'normals.csv' });
    const climate = getSite(h.db, siteId)!.climate!;
    expect(climate).toEqual(r.climate);
    expect(climate.source).toContain(STATION);
    expect(climate.source).toContain('normals.csv');
    expect(climate.monthly.map((m) => m.month)).toEqual([1, 2, 3, 4, 5, 6, 7, 8, 9, 10, 11, 12]);
    expectClose(climate.monthly[6]!.meanMax_c, 35, { abs: 1e-9 }, 'July 95 °F (derived)');
    expectClose(climate.monthly[6]!.mean_c!, 25, { abs: 1e-9 }, 'July 77 °F (derived)');
    expectClose(climate.monthly[6]!.meanMin_c!, 15, { abs: 1e-9 }, 'July 59 °F (derived)');
  });

  it('a file missing a month is refused and the site keeps its climate', () => {
    const before = dump(h.sqlite);
    const e = importError(() => importClimateIntoSite(h.db, siteId, { format: 'monthly-normals', data: normals([1, 2, 3, 4, 5, 6, 7, 8, 9, 10, 11]) }));
    expect(e.message).toMatch(/no usable values for December; a site's climate needs all twelve months/);
    expect(dump(h.sqlite)).toBe(before);
  });

  it('a bad value is refused with its line and column', () => {
    const bad = normals([1, 2, 3, 4, 5, 6, 7, 8, 9, 10, 11, 12]).replace('"95"', '"9x5"');
    const e = importError(() => readClimateFile({ format: 'monthly-normals', data: bad }));
    expect(e.problems[0]).toMatchObject({ line: 8, column: 5, field: 'MLY-TMAX-NORMAL' });
  });
});

describe('GHCN-Daily station file into a site (monthly means of daily values, derived)', () => {
  it('reduces two years of days to twelve months and records the years used', () => {
    const r = importClimateIntoSite(h.db, siteId, { format: 'ghcn-daily', data: ghcnTwoYears() });
    const climate = getSite(h.db, siteId)!.climate!;
    expect(climate).toEqual(r.climate);
    expect(climate.years).toBe(2);
    expect(climate.source).toMatch(/2023–2024, 2 years used/);
    for (const m of climate.monthly) {
      expectClose(m.meanMax_c, 20 + m.month, { abs: 1e-9 }, `month ${m.month} mean max (derived)`);
      expectClose(m.meanMin_c!, 10 + m.month, { abs: 1e-9 }, `month ${m.month} mean min (derived)`);
    }
  });

  it('a malformed row rejects the whole file with its line; nothing is written', () => {
    const before = dump(h.sqlite);
    const lines = ghcnTwoYears().split('\n');
    lines[100] = `${STATION},20230151,TMAX,250,,,S,`;
    const e = importError(() => importClimateIntoSite(h.db, siteId, { format: 'ghcn-daily', data: lines.join('\n') }));
    expect(e.problems[0]!.line).toBe(101);
    expect(dump(h.sqlite)).toBe(before);
  });

  it('a station daily file needs its temperature unit stated; non-UTF-8 bytes are refused', () => {
    expect(importError(() => readClimateFile({ format: 'station-daily', data: 'STATION,DATE,TMAX\n' })).message).toMatch(/state the temperature unit/);
    expect(importError(() => readClimateFile({ format: 'ghcn-daily', data: Buffer.from([0x58, 0x0a, 0xff, 0x0a]) })).problems[0]!.line).toBe(2);
  });
});
