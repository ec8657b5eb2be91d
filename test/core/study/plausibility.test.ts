/**
 * Issue 12, finding 3 ("'ok' to tens of kilometres") and the last point of finding 7 (rows that cannot
 * operate show null, not 0). The plausibility bound (core/plausibility.ts, docs/methods/study.md §2.7):
 * bound = max(2.5 × ARFL, 5 500 m) — 2.5 a project convention, 5 500 m the length class of the longest
 * paved runways (common practice, from memory). The case: an invented single-engine commuter at
 * 3 500 m / 45 °C (test/core/study/impractical.fixture.ts), which the takeoff model sizes beyond the bound on the ground run (about 6.4 km at 45 °C).
 */
import { siText, type Notice } from '../../../core/notices.js';
import { describe, expect, it } from 'vitest';
import { analyseTakeoff, runStudy, STUDY_METHOD_VERSION, type AircraftProfile, type StudyInput } from '../../../core/index.js';
import { PLAUSIBILITY_CAP_M, PLAUSIBILITY_RATIO, aircraftPlausibilityBound, checkPlausibility, plausibilityBound } from '../../../core/plausibility.js';
import { assessExistingRunway, maxTakeoffMassForRunway } from '../../../core/runwayCheck.js';
import { whatIf } from '../../../core/index.js';
import demo from '../../../examples/demo-study.json' with { type: 'json' };
import { impracticalDoc, SINGLE_COMMUTER_ID, SINGLE_COMMUTER_MASS_KG } from './impractical.fixture.js';

/** A runway-check note list as SI text. */
const notesText = (ns?: readonly Notice[]): string => (ns ?? []).map(siText).join(' ');

const inputOf = (t: number): StudyInput => impracticalDoc(t) as StudyInput;
const single = (): AircraftProfile => inputOf(45).aircraft.find((a) => a.id === SINGLE_COMMUTER_ID)!;

describe('plausibilityBound: max(2.5 × ARFL, 5 500 m)', () => {
  it('is the absolute cap for a short-field aircraft and 2.5 × ARFL for a long-field one', () => {
    expect(PLAUSIBILITY_RATIO).toBe(2.5);
    expect(PLAUSIBILITY_CAP_M).toBe(5500);
    expect(plausibilityBound(800)).toMatchObject({ bound_m: 5500, basis: 'absolute-cap' });
    expect(plausibilityBound(undefined)).toMatchObject({ bound_m: 5500, basis: 'absolute-cap' });
    expect(plausibilityBound(3000)).toMatchObject({ bound_m: 7500, basis: 'reference-ratio' });
    // An ARFL beyond the cap is itself implausible and does not raise the bound.
    expect(plausibilityBound(6000)).toMatchObject({ bound_m: 5500, basis: 'absolute-cap' });
    const b = plausibilityBound(1000);
    expect(checkPlausibility([{ what: 'takeoff', value_m: 5500 }], b, { elevation_m: 0, temperature_c: 15 })).toBeUndefined();
    const f = checkPlausibility([{ what: 'takeoff', value_m: 5501 }], b, { elevation_m: 3500, temperature_c: 45, mass_kg: 7294 });
    expect(f?.reason).toMatch(/^This aircraft cannot practically operate here: the takeoff needs 5,501 m at 3,500 m \/ 45.0 °C and 7,294 kg, more than the plausibility bound of 5,500 m \(absolute cap/);
    expect(checkPlausibility([{ what: 'takeoff', value_m: Infinity }], b, { elevation_m: 0, temperature_c: 15 })?.reason).toContain('an unbounded length');
  });
});

describe('study rows beyond the bound (single-engine commuter, 3 500 m)', () => {
  for (const [t, lo, hi] of [[45, 6000, 7000], [40, 5600, 6500]] as const) {
    it(`at ${t} °C the row is a reasoned "cannot practically operate", never ok, and not the critical aircraft`, () => {
      const r = runStudy(inputOf(t));
      expect(r.methodVersion).toBe(STUDY_METHOD_VERSION);
      const s = r.scenarios[0]!;
      const row = s.rows.find((x) => x.aircraft === SINGLE_COMMUTER_ID)!;
      expect(row.status).toBe('cannot-operate');
      expect(row.required_m).toBeNull();
      expect(row.requiredTakeoff_m).toBeNull();
      expect(row.requiredLanding_m).toBeNull();
      expect(row.plausibility).toMatchObject({ what: 'takeoff', bound_m: 5500, basis: 'absolute-cap' });
      expect(row.plausibility!.value_m).toBeGreaterThan(lo);
      expect(row.plausibility!.value_m).toBeLessThan(hi);
      expect(siText(row.reason!)).toMatch(new RegExp(`^This aircraft cannot practically operate here: the takeoff needs [\\d,]+ m at 3,500 m / ${t}.0 °C and 7,294 kg, more than the plausibility bound of 5,500 m \\(absolute cap`));
      // The other aircraft is critical; the commuter is excluded and named in the warnings.
      expect(s.criticalAircraft).toBe('heron-st1');
      // The light single, with the planning factors (takeoff × 1.25, landing ÷ 0.70), sets a modest length.
      expect(s.recommendedLength_m).toBeLessThan(1500);
      expect(s.excluded).toContainEqual({ aircraft: SINGLE_COMMUTER_ID, reason: row.reason });
      expect(s.warnings.map(siText).some((w) => w.includes('Plover CT-19S (regular use) is left out of the critical-aircraft selection') && w.includes('cannot practically operate here'))).toBe(true);
      expect(s.operationsServed.every((p) => p.length_m <= 1500)).toBe(true);
    });
  }

  it('the JSON has null, not 0, with the reason, for every row that cannot operate', () => {
    // 45 °C: the single commuter is beyond the bound; the demo twin commuter is climb-limited and
    // operates at its climb-limited mass. Every row that cannot operate gets null with a reason.
    const doc = impracticalDoc(45);
    doc.aircraft.push(demo.aircraft.find((a) => a.id === 'plover-ct19'));
    doc.scenarios[0].fleet.push({ aircraft: 'plover-ct19', annualOperations: 600, stageLength_km: 450, payload_kg: 1600 });
    const json = JSON.parse(JSON.stringify(runStudy(doc as StudyInput)));
    const rows = json.scenarios[0].rows.filter((x: { status: string }) => x.status !== 'ok');
    expect(rows.map((x: { aircraft: string }) => x.aircraft)).toEqual([SINGLE_COMMUTER_ID]);
    const twin = json.scenarios[0].rows.find((x: { aircraft: string }) => x.aircraft === 'plover-ct19');
    expect(twin.status).toBe('ok');
    expect(twin.climbOffload_kg).toBeGreaterThan(0);
    for (const row of rows) {
      for (const k of ['required_m', 'requiredTakeoff_m', 'requiredLanding_m']) {
        expect(k in row, k).toBe(true);
        expect(row[k], `${row.aircraft} ${k}`).toBeNull();
      }
      expect(row.reason.code).toBe('plausibility.impractical');
    }
  });
});

describe('the same bound guards the sweeps, the what-if and the existing-runway check', () => {
  it('sweep points beyond the bound have no length and are marked impractical; the what-if agrees point by point', () => {
    // Design 30 °C: the row is within the bound (about 4 860 m); the sweep runs 15 … 45 °C.
    const r = runStudy(inputOf(30));
    const row = r.scenarios[0]!.rows.find((x) => x.aircraft === SINGLE_COMMUTER_ID)!;
    expect(row.status).toBe('ok');
    expect(row.required_m!).toBeLessThan(5500);
    const curve = r.sensitivity.find((c) => c.aircraft === SINGLE_COMMUTER_ID)!;
    const bound = aircraftPlausibilityBound(single());
    expect(curve.plausibilityBound_m).toBe(bound.bound_m);
    const impractical = curve.temperature.filter((p) => p.impractical);
    expect(impractical.map((p) => p.temperature_c)).toEqual([35, 37.5, 40, 42.5, 45]);
    for (const p of curve.temperature) {
      if (p.impractical) expect(p.required_m).toBeNull();
      else if (p.required_m !== null) expect(p.required_m).toBeLessThanOrEqual(bound.bound_m);
      // The what-if at the same conditions (the design runway's slope) gives the same verdict.
      const w = whatIf({ aircraft: single(), elevation_m: 3500, temperature_c: p.temperature_c, mass_kg: SINGLE_COMMUTER_MASS_KG, slope: r.site.designSlope, headwind_mps: 0, surface: 'dry' });
      expect(w.plausibilityBound_m).toBe(bound.bound_m);
      expect(Boolean(w.takeoff.impractical), `${p.temperature_c} °C`).toBe(Boolean(p.impractical));
      if (p.impractical) expect(w.required_m).toBeUndefined();
    }
  });

  it('existing runway: no "fits" and no needed length beyond the bound at the design mass, with the reason', () => {
    const a = single();
    const common = {
      aircraft: a, runway: '12/30', slope: 0, pressureAltitude_m: 3500, surface: 'dry' as const,
      direction: { designator: '12', tora_m: 6000, toda_m: 6000, asda_m: 6000, lda_m: 6000 },
    };
    // 45 °C at MTOW: the model's 6.4 km are not reported as a need.
    const far = assessExistingRunway({ ...common, temperature_c: 45, takeoffMass_kg: SINGLE_COMMUTER_MASS_KG });
    expect(far.takeoffOk).toBe(false);
    expect(far.takeoffRunNeeded_m).toBeUndefined();
    expect(far.takeoffDistanceNeeded_m).toBeUndefined();
    expect(notesText(far.note)).toContain('cannot practically operate here: the takeoff needs');
    // 7 175 kg at 45 °C needs about 5 600 m: within a 6 000 m runway but beyond the bound.
    const m = 7175;
    const t = analyseTakeoff({ aircraft: a, mass_kg: m, pressureAltitude_m: 3500, temperature_c: 45, slope: 0, headwind_mps: 0, surface: 'dry' });
    expect(t.feasible && t.required_m > 5500 && t.required_m < 6000).toBe(true);
    const near = assessExistingRunway({ ...common, temperature_c: 45, takeoffMass_kg: m });
    expect(near.takeoffOk).toBe(false);
    expect(near.takeoffDistanceNeeded_m).toBeUndefined();
    expect(notesText(near.note)).toContain('more than the plausibility bound of 5,500 m');
  });

  it('the greatest-mass search treats a mass beyond the bound as refused (limit "plausibility")', () => {
    const mt = maxTakeoffMassForRunway({
      aircraft: single(), pressureAltitude_m: 3500, temperature_c: 45, slope: 0, headwind_mps: 0, surface: 'dry',
      direction: { tora_m: 6000, toda_m: 6000, asda_m: 6000 },
    });
    expect(mt.status).toBe('ok');
    expect(mt.limitedBy).toBe('plausibility');
    expect(mt.needs!.takeoffDistance_m).toBeLessThanOrEqual(5500);
    expect(mt.needs!.takeoffDistance_m).toBeGreaterThan(5000);
    expect(siText(mt.message)).toContain('plausibility bound of 5,500 m');
  });
});
