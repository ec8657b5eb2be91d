/**
 * Storage figures (issue 7), on a temporary database file (WAL, synchronous FULL, as in use):
 * - import_1000_aircraft_ms: CSV import of 1,000 generated invented aircraft (decode, parse, validate,
 *   one transaction), median of 7 imports, each into a fresh file; opening and migrating not timed.
 * - study_save_load_ms: save the demo study's input with a result snapshot (about 40 kB of JSON),
 *   then load the latest saved result and the study input back; median of 25.
 * No targets set by an issue yet.
 */
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { openDatabase } from '../db/client.js';
import { latestStudyResult, loadStudyInput, saveStudyResult } from '../db/repos/studies.js';
import { seedDemoIfEmpty } from '../db/seed.js';
import { aircraftToCsv, importAircraftCsv } from '../server/io/csv.js';
import { demoDocument, digestOf, generatedAircraft } from '../test/db/fixtures/demo.js';
import type { BenchModule } from './harness.js';

function median(values: number[]): number {
  const s = [...values].sort((a, b) => a - b);
  return s[Math.floor(s.length / 2)]!;
}

function importFigure(dir: string): number {
  const csv = aircraftToCsv(generatedAircraft(1000, 'bench'));
  const times: number[] = [];
  for (let run = 0; run < 8; run++) {
    const { db, sqlite } = openDatabase(join(dir, `import-${run}.sqlite`));
    const t = performance.now();
    const r = importAircraftCsv(db, csv);
    const ms = performance.now() - t;
    sqlite.close();
    if (r.created.length !== 1000) throw new Error(`imported ${r.created.length} aircraft, expected 1000`);
    if (run > 0) times.push(ms); // the first run warms up
  }
  return median(times);
}

function saveLoadFigure(dir: string): number {
  const { db, sqlite } = openDatabase(join(dir, 'study.sqlite'));
  try {
    const seeded = seedDemoIfEmpty(db, demoDocument());
    if (!seeded.seeded) throw new Error('expected a fresh database');
    const studyId = seeded.studyId;
    const snapshot = {
      scenarios: Array.from({ length: 3 }, (_, s) => ({
        name: `Scenario ${s}`,
        rows: Array.from({ length: 8 }, (_, r) => ({ aircraft: `row-${r}`, takeoff_m: 1800 + r, landing_m: 1500 + r, trace: Array.from({ length: 40 }, (_, k) => ({ label: `step ${k}`, value: k * 1.5, unit: 'm' })) })),
      })),
    };
    const times: number[] = [];
    for (let run = 0; run < 26; run++) {
      const t = performance.now();
      const input = loadStudyInput(db, studyId);
      saveStudyResult(db, { studyId, input, inputDigest: digestOf(input), result: snapshot, methodVersion: 'bench/1', createdAt: new Date(Date.UTC(2026, 0, 1, 0, run)) });
      const back = latestStudyResult(db, studyId);
      loadStudyInput(db, studyId);
      const ms = performance.now() - t;
      if (back === undefined) throw new Error('saved result not found');
      if (run > 0) times.push(ms);
    }
    return median(times);
  } finally {
    sqlite.close();
  }
}

const mod: BenchModule = {
  name: 'storage',
  run() {
    const dir = mkdtempSync(join(tmpdir(), 'runwright-bench-'));
    try {
      return [
        { key: 'import_1000_aircraft_ms', label: 'CSV import of 1,000 aircraft into a file database', value: importFigure(dir), unit: 'ms' },
        { key: 'study_save_load_ms', label: 'Save a study result snapshot and load it back', value: saveLoadFigure(dir), unit: 'ms' },
      ];
    } finally {
      rmSync(dir, { recursive: true, force: true });
    }
  },
};
export default mod;
