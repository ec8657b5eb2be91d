/**
 * Issue 12, finding 3 at the edges: a requirement beyond the plausibility bound (core/plausibility.ts;
 * bound = max(2.5 × ARFL, 5 500 m), project convention and common practice) reaches the user as a
 * reason — in the JSON (null, not 0), the CSV, the what-if and the results page — never as a length.
 * The case: the invented single-engine commuter at 3 500 m / 45 °C (test/core/study/impractical.fixture.ts).
 */
import { parse } from 'csv-parse/sync';
import { describe, expect, it } from 'vitest';
import type { AircraftProfile } from '../../core/index.js';
import { runCli, type CliIo } from '../../server/cli.js';
import { resultsCsv } from '../../server/studies/resultsCsv.js';
import { parseStudyDocument, studyOutput, type StudyOutput } from '../../server/studies/document.js';
import { whatIf } from '../../core/index.js';
import { siText } from '../../core/notices.js';
import { WhatIfResult } from '../../templates/whatif/panel.js';
import { impracticalDoc, SINGLE_COMMUTER_ID, SINGLE_COMMUTER_MASS_KG } from '../core/study/impractical.fixture.js';
import { browser, makeApp } from './web/helpers.js';

const REASON = /This aircraft cannot practically operate here: the takeoff needs 6,\d{3} m at 3,500 m \/ 45.0 °C and 7,294 kg, more than the plausibility bound of 5,500 m \(absolute cap, the length class of the longest paved runways\)/;

function output(): StudyOutput {
  const p = parseStudyDocument(impracticalDoc(45));
  if (!p.ok) throw new Error(JSON.stringify(p.problems));
  return studyOutput(p.input);
}

describe('study outputs of a row beyond the plausibility bound', () => {
  it('the CLI JSON gives null requirements and the reason, and another aircraft as critical', async () => {
    const text = JSON.stringify(impracticalDoc(45));
    let stdout = '';
    const io: CliIo = { readFile: () => text, writeFile: () => {}, stdout: (t) => { stdout += String(t); }, stderr: () => {} };
    expect(await runCli(['study.json', '--format', 'json'], io)).toBe(0);
    const json = JSON.parse(stdout);
    const row = json.scenarios[0].rows.find((r: { aircraft: string }) => r.aircraft === SINGLE_COMMUTER_ID);
    expect(row.status).toBe('cannot-operate');
    expect(row.required_m).toBeNull();
    expect(row.requiredTakeoff_m).toBeNull();
    expect(row.requiredLanding_m).toBeNull();
    expect(row.reason.code).toBe('plausibility.impractical');
    expect(row.reason.message).toMatch(REASON);
    expect(json.scenarios[0].criticalAircraft).toBe('heron-st1');
    // The light single, with the planning factors (takeoff × 1.25, landing ÷ 0.70), sets a modest length.
    expect(json.scenarios[0].recommendedLength_m).toBeLessThan(1500);
  });

  it('the results CSV carries the reason in its own column and no length for the row', () => {
    const rows = parse(resultsCsv(output(), 'si'), { comment: '#', columns: true }) as Record<string, string>[];
    const row = rows.find((r) => r.aircraft_id === SINGLE_COMMUTER_ID)!;
    expect(row.status).toBe('cannot-operate');
    expect(row.reason).toMatch(REASON);
    expect(row.required_takeoff_m).toBe('');
    expect(row.required_m).toBe('');
    expect(row.takeoff_physics_m).toBe('');
    expect(row.critical).toBe('no');
    expect(rows.find((r) => r.critical === 'yes')!.aircraft_id).toBe('heron-st1');
  });

  it('the results page shows the reason in the row instead of a length', async () => {
    const { app } = makeApp();
    const c = await browser(app);
    const created = await c.json('POST', '/api/studies', JSON.stringify(impracticalDoc(45)));
    expect(created.status).toBe(201);
    const { id } = JSON.parse(created.text) as { id: number };
    expect((await c.post(`/studies/${id}/run`, {})).status).toBe(303);
    const page = (await c.get(`/studies/${id}/results`)).text;
    const cell = /<td colspan="5" class="cannot">([^<]*)<\/td>/.exec(page);
    expect(cell).not.toBeNull();
    expect(cell![1]!.replace(/&#39;/g, "'")).toMatch(REASON);
    expect(page).not.toMatch(/6,\d{3} m \(/);
    expect(page).toContain('is left out of the critical-aircraft selection');
  });
});

describe('what-if beyond the plausibility bound', () => {
  const aircraft = impracticalDoc(45).aircraft.find((a: AircraftProfile) => a.id === SINGLE_COMMUTER_ID) as AircraftProfile;
  const at = (temperature_c: number) => whatIf({ aircraft, elevation_m: 3500, temperature_c, mass_kg: SINGLE_COMMUTER_MASS_KG, slope: 0, headwind_mps: 0, surface: 'dry' });

  it('says "cannot practically operate here" with the reason at 45 °C and at 40 °C, and gives no length', async () => {
    for (const t of [45, 40]) {
      const o = at(t);
      expect(o.required_m, `${t} °C`).toBeUndefined();
      expect(o.takeoff.ok).toBe(false);
      expect(o.takeoff.impractical).toBe(true);
      expect(siText(o.impractical!)).toMatch(new RegExp(`cannot practically operate here: the takeoff needs [\\d,]+ m at 3,500 m / ${t}.0 °C`));
    }
    const html = String(await WhatIfResult({ outcome: at(45), errors: {} }).toString());
    expect(html).toContain('data-testid="whatif-required">cannot practically operate here</strong>');
    expect(html).toContain('data-testid="whatif-impractical">This aircraft cannot practically operate here: the takeoff needs 6,356 m');
    expect(html).toContain('Beyond the plausibility bound (5,500 m): cannot practically operate here.');
  });
});
