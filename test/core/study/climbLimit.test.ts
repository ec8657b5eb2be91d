/**
 * Takeoff model revision, item 7 (climb-limit logic in the study engine). Sources: 14 CFR 25.121 and
 * 23.2120 set the climb minima (Raymer §17.8, Anderson §6.7 and Torenbeek (1982) ch. 5); the study's handling of a climb limit (size at
 * the climb-limited mass, or a reasoned "cannot operate") is project logic, checked here by derived
 * consistency. The aircraft are invented (examples/demo-study.json; the single-engine variant of
 * test/core/study/impractical.fixture.ts).
 */
import { siText } from '../../../core/notices.js';
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { analyseTakeoff, runStudy, type StudyInput } from '../../../core/index.js';
import { impracticalDoc, SINGLE_COMMUTER_ID } from './impractical.fixture.js';

/** The hot and high study with its single-engine commuter given this power on a paved runway. */
function weakSingleDoc(shaftPower_W: number): ReturnType<typeof impracticalDoc> {
  const doc = impracticalDoc(45);
  const single = doc.aircraft.find((a: { id: string }) => a.id === SINGLE_COMMUTER_ID);
  single.shaftPower_W = shaftPower_W;
  single.rollingFriction = 0.02;
  return doc;
}

describe('a climb limit is sized at the climb-limited mass, or a reasoned "cannot operate" (item 7)', () => {
  it('an aircraft that misses the climb minimum even at OEW is "cannot operate here" with the reason, never "ok"', () => {
    const doc = weakSingleDoc(400000);
    const single = doc.aircraft.find((a: { id: string }) => a.id === SINGLE_COMMUTER_ID);
    // Precondition: even at OEW the single engine cannot meet the minimum at 3 500 m / 45 °C.
    const atOew = analyseTakeoff({ aircraft: single, mass_kg: single.oew_kg, pressureAltitude_m: 3500, temperature_c: 45, slope: 0, headwind_mps: 0, surface: 'dry' });
    expect(atOew.feasible && !atOew.climb.limited).toBe(false);
    const r = runStudy(doc as StudyInput);
    const row = r.scenarios[0]!.rows.find((x) => x.aircraft === SINGLE_COMMUTER_ID)!;
    expect(row.status).toBe('cannot-operate');
    expect(row.required_m).toBeNull();
    expect(siText(row.reason!)).toMatch(/cannot (climb|operate)|climb/i);
    expect(r.scenarios[0]!.excluded.some((e) => e.aircraft === SINGLE_COMMUTER_ID && e.reason === row.reason)).toBe(true);
  });

  it('a climb-limited demo twin at 3 500 m / 45 °C is sized at its climb-limited mass, which itself meets every minimum', () => {
    const study = runStudy(twinDocWithDemoCommuter() as StudyInput);
    const twin = study.scenarios[0]!.rows.find((x) => x.aircraft === 'plover-ct19')!;
    expect(twin.status).toBe('ok');
    if (twin.status !== 'ok') return;
    expect(twin.climbOffload_kg!).toBeGreaterThan(0);
    expect(twin.takeoff!.climbLimited).toBe(false);
    expect(twin.takeoff!.climbGradient).toBeGreaterThanOrEqual(twin.takeoff!.climbMinimum! - 1e-9);
    expect(twin.warnings.map(siText).some((w) => /^Climb-limited at [\d,]+ kg: the gradient of the .* is /.test(w))).toBe(true);
  });
});

function twinDocWithDemoCommuter(): unknown {
  const doc = impracticalDoc(45);
  const demo = JSON.parse(readFileSync(new URL('../../../examples/demo-study.json', import.meta.url), 'utf8'));
  doc.aircraft.push(demo.aircraft.find((a: { id: string }) => a.id === 'plover-ct19'));
  doc.scenarios[0].fleet.push({ aircraft: 'plover-ct19', annualOperations: 600, stageLength_km: 450, payload_kg: 1600 });
  return doc;
}

describe('the climb-limited mass is itself checked for feasibility (item 7)', () => {
  it('a climb-limited mass at which the takeoff is still not possible gives "cannot operate" with the takeoff reason', () => {
    const doc = weakSingleDoc(500000);
    const r = runStudy(doc as StudyInput);
    const row = r.scenarios[0]!.rows.find((x) => x.aircraft === SINGLE_COMMUTER_ID)!;
    expect(row.status).toBe('cannot-operate');
    expect(siText(row.reason!).length).toBeGreaterThan(30);
    expect(row.warnings.map(siText).some((w) => w.startsWith('Climb-limited at '))).toBe(true);
  });
});

describe('beyond 35 % the corrected reference length is indicative and never governs (item 14)', () => {
  it('under the reference method at the demo site the physics model sizes each row whose corrections exceed 35 %, and says so', () => {
    // ICAO Doc 9157, Aerodrome Design Manual Part 1, percentage corrections, step 3 (ICAO Doc 9157 Part 1 percentage rule, as restated in its C2
    // sources): when elevation and temperature corrections together exceed 35 % a specific study is
    // required.
    const doc = JSON.parse(readFileSync(new URL('../../../examples/demo-study.json', import.meta.url), 'utf8'));
    doc.options.method = 'reference-icao';
    doc.site.elevation_m = 2200;
    const r = runStudy(doc as StudyInput);
    const rows = r.scenarios.flatMap((s) => s.rows).filter((x) => x.status === 'ok' && x.takeoff?.reference_m !== undefined);
    expect(rows.length).toBeGreaterThan(0);
    for (const row of rows) {
      const w = row.warnings.map(siText).find((x) => x.includes('does not govern'));
      expect(w, row.aircraft).toBeDefined();
      // The physics model sizes it (at the design temperature, or higher where a climb-limited
      // requirement peaks below it); never the corrected reference length.
      expect(row.takeoff!.required_m).toBeGreaterThanOrEqual(row.takeoff!.physics_m!);
      expect(row.takeoff!.required_m).not.toBe(row.takeoff!.reference_m);
      expect(row.takeoff!.governing).not.toMatch(/reference length/);
    }
  });
});

describe('design temperature and the climb cap (item 8)', () => {
  const demoDoc = () => JSON.parse(readFileSync(new URL('../../../examples/demo-study.json', import.meta.url), 'utf8'));

  it('the temperature sweep re-applies the climb cap at every point and marks the climb-limited points', () => {
    // Derived consistency: the climb-limited mass falls as the air warms (less thrust, less lift), so
    // the capped points are the warm end of the sweep, each at a mass below the curve's.
    const r = runStudy(demoDoc() as StudyInput);
    const curve = r.sensitivity.find((c) => c.aircraft === 'albatross-nb180')!;
    const capped = curve.temperature.filter((p) => p.climbLimited);
    expect(capped.length).toBeGreaterThan(0);
    const first = curve.temperature.findIndex((p) => p.climbLimited);
    expect(curve.temperature.slice(first).every((p) => p.climbLimited)).toBe(true);
    let prev = Infinity;
    for (const p of capped) {
      // Before the revision these points had no length (the fixed mass could not climb).
      expect(p.required_m, `${p.temperature_c} °C`).not.toBeNull();
      expect(p.mass_kg!).toBeLessThan(curve.mass_kg);
      expect(p.mass_kg!).toBeLessThanOrEqual(prev);
      prev = p.mass_kg!;
    }
    for (const p of curve.temperature.slice(0, first)) expect(p.mass_kg).toBeUndefined();
  });

  it('a climb-limited row is sized on the greatest requirement over temperatures up to the design temperature, and says so', () => {
    // The demo's normal-category twin (Pipit LT-2) is climb-limited at the design temperature; cooler
    // air allows a heavier climb-limited mass, whose requirement is longer.
    const r = runStudy(demoDoc() as StudyInput);
    const row = r.scenarios[0]!.rows.find((x) => x.aircraft === 'pipit-lt2')!;
    expect(row.status).toBe('ok');
    if (row.status !== 'ok') return;
    expect(row.climbOffload_kg!).toBeGreaterThan(0);
    const peak = row.takeoff!.peakTemperature_c!;
    expect(peak).toBeLessThan(r.site.designTemperature_c);
    expect(row.requiredTakeoff_m).toBeGreaterThan(row.takeoff!.physics_m!);
    expect(row.takeoff!.governing).toMatch(/at its peak below the design temperature/);
    expect(row.warnings.map(siText).some((w) => w.includes('peaks below') && w.includes('sized on the greatest over the temperatures up to'))).toBe(true);
    // The peak is a point of the sensitivity grid (2.5 °C steps below the design temperature).
    const steps = (r.site.designTemperature_c - peak) / 2.5;
    expect(Math.abs(steps - Math.round(steps))).toBeLessThan(1e-9);
  });
});
