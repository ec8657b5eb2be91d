/**
 * Planning data first (study method 'planning', the default): per aircraft, the planning chart where
 * the design condition lies inside it; outside it, the physics model calibrated to the planning chart
 * (every node) or to the planning takeoff length (one point, thrust alone); the uncalibrated model only
 * for an aircraft without planning figures, and then flagged. Every row says which source gave its
 * number. Check values are derived: charts drawn here by the project's own model at known parameters
 * (core/chartFit.ts), the chart's multilinear interpolation (core/reference.ts) and the single-factor
 * calibration (core/calibrate.ts). Demo data invented (examples/demo-study.json).
 */
import { describe, expect, it } from 'vitest';
import type { AircraftProfile, ReferenceTable } from '../../../core/aircraft.js';
import { calibrateTakeoff } from '../../../core/calibrate.js';
import { profileWithParameters } from '../../../core/chartFit.js';
import { siText } from '../../../core/notices.js';
import { interpolateReferenceTable } from '../../../core/reference.js';
import { STUDY_OPTION_FIELDS } from '../../../core/studyFields.js';
import { runStudy, siteConditions } from '../../../core/study/run.js';
import type { RowResult, StudyInput } from '../../../core/study/types.js';
import { analyseTakeoff } from '../../../core/takeoff/index.js';
import { parseStudyDocument } from '../../../server/studies/document.js';
import demoStudy from '../../../examples/demo-study.json' with { type: 'json' };
import { expectClose } from '../../helpers/close.js';

type Doc = { options: Record<string, unknown>; aircraft: Record<string, unknown>[] };

function study(edit: (d: Doc) => void = () => {}): StudyInput {
  const doc = structuredClone(demoStudy) as unknown as Doc;
  doc.options.method = 'planning';
  edit(doc);
  const p = parseStudyDocument(doc);
  if (!p.ok) throw new Error(p.problems.map((x) => `${x.path}: ${x.message}`).join('; '));
  return p.input;
}

const rowsOf = (input: StudyInput, id: string): RowResult[] =>
  runStudy(input).scenarios.flatMap((s) => s.rows).filter((r) => r.aircraft === id && r.status === 'ok');

/** A takeoff chart drawn by the model at thrust 1.05 (so every node is feasible). */
function chart(a: AircraftProfile, axes: { mass_kg: number[]; elevation_m: number[]; temperature_c: number[] }): ReferenceTable {
  const truth = { thrustScale: 1.05 };
  const prof = profileWithParameters(a, truth);
  return {
    ...axes,
    length_m: axes.mass_kg.map((m) => axes.elevation_m.map((h) => axes.temperature_c.map((t) => {
      const r = analyseTakeoff({ aircraft: prof, mass_kg: m, pressureAltitude_m: h, temperature_c: t, slope: 0, headwind_mps: 0, surface: 'dry', thrustScale: truth.thrustScale });
      if (!r.feasible) throw new Error(`chart node infeasible: ${m} kg ${h} m ${t} °C`);
      return Math.round(r.required_m);
    }))),
  };
}

describe('planning data first is the default method', () => {
  it('a study file that names no method gets it', () => {
    expect(STUDY_OPTION_FIELDS.find((f) => f.path === 'method')!.default).toBe('planning');
    const doc = structuredClone(demoStudy) as unknown as Doc;
    delete doc.options.method;
    const p = parseStudyDocument(doc);
    expect(p.ok && p.input.options.method).toBe('planning');
  });
});

describe('per aircraft, the source of the takeoff number', () => {
  const input = study();
  const site = siteConditions(input);

  it('no planning figures: the uncalibrated model, flagged on the row, with the physics length', () => {
    const id = 'kestrel-ut1';
    const physics = runStudy(study((d) => { d.options.method = 'physics'; })).scenarios[0]!.rows.find((r) => r.aircraft === id)!;
    for (const r of rowsOf(input, id)) {
      expect(r.takeoff!.source).toMatch(/uncalibrated: no planning figures/);
      expect(r.warnings.map((w) => w.code)).toContain('study.noPlanningData');
      expect(r.requiredTakeoff_m).toBe(physics.requiredTakeoff_m);
    }
  });

  it('a planning takeoff length only: the model calibrated to it (thrust alone, the single-factor factor within 0.2 %)', () => {
    const a = input.aircraft.find((x) => x.id === 'albatross-nb180')!;
    const single = calibrateTakeoff({ aircraft: a });
    expect(single.status).toBe('ok');
    for (const r of rowsOf(input, a.id)) {
      expect(r.takeoff!.source).toMatch(/calibrated to the planning takeoff length \(thrust × \d\.\d{3}\)/);
      if (single.status === 'ok') expectClose(r.takeoff!.calibrationFactor!, single.factor, { rel: 0.002 }, 'thrust factor');
      expect(r.warnings.map((w) => w.code)).not.toContain('study.noPlanningData');
    }
    expect(site.designTemperature_c).toBeGreaterThan(15);
  });

  it('inside a planning chart: the chart gives the number (multilinear interpolation, then the ICAO gradient step)', () => {
    const base = input.aircraft.find((x) => x.id === 'albatross-nb180')!;
    const table = chart(base, { mass_kg: [55000, 62000, 70000], elevation_m: [0, 1000, 1500], temperature_c: [15, 30, 38] });
    const withChart = study((d) => {
      const a = d.aircraft.find((x) => x.id === base.id)! as { reference: Record<string, unknown> };
      a.reference = { ...a.reference, table };
    });
    const rows = rowsOf(withChart, base.id);
    expect(rows.length).toBeGreaterThan(0);
    for (const r of rows) {
      expect(r.takeoff!.source).toBe('planning chart (multilinear interpolation) + ICAO gradient step');
      expect(r.takeoff!.governing).toBe('planning chart');
      const look = interpolateReferenceTable({ table, mass_kg: r.takeoffMass_kg!, elevation_m: site.elevation_m, temperature_c: site.designTemperature_c });
      expect(look.status).toBe('ok');
      if (look.status !== 'ok') continue;
      // The chart is at zero slope; the gradient step adds its share for the design slope (ICAO).
      expect(r.requiredTakeoff_m!).toBeGreaterThanOrEqual(look.length_m - 1e-9);
      expect(r.takeoff!.chart_m).toBe(r.requiredTakeoff_m);
      expectClose(r.requiredTakeoff_m!, look.length_m, { rel: 0.05 }, 'chart plus the gradient step');
    }
  });

  it('outside the chart: never extrapolated; the model calibrated to every chart node gives the number, and the row says so', () => {
    const base = input.aircraft.find((x) => x.id === 'albatross-nb180')!;
    // A chart at sea level and 500 m only: the site (above 1,000 m) lies outside it.
    const table = chart(base, { mass_kg: [55000, 62000, 70000], elevation_m: [0, 500], temperature_c: [15, 30, 38] });
    const withChart = study((d) => {
      const a = d.aircraft.find((x) => x.id === base.id)! as { reference: Record<string, unknown> };
      a.reference = { ...a.reference, table };
    });
    expect(site.elevation_m).toBeGreaterThan(500);
    for (const r of rowsOf(withChart, base.id)) {
      expect(r.takeoff!.source).toMatch(/calibrated to 18 planning-chart points/);
      const w = r.warnings.find((x) => x.code === 'study.outsidePlanningChart');
      expect(w, 'the row says the chart was not extrapolated').toBeDefined();
      expect(siText(w!)).toMatch(/not extrapolated/);
      expect(r.takeoff!.chart_m).toBeUndefined();
      // The chart was drawn at thrust 1.05: the fit finds it.
      expectClose(r.takeoff!.calibrationFactor!, 1.05, { abs: 0.01 }, 'fitted thrust scale');
    }
  });
});

describe('the spread between methods, shown and explained', () => {
  const input = study();
  const rows = runStudy(input).scenarios.flatMap((s) => s.rows).filter((r) => r.status === 'ok');
  const METHODS = ['chart', 'calibrated-model', 'model', 'reference-icao', 'reference-authority', 'torenbeek', 'roskam'];

  it('every row lists every method; a missing figure says why; exactly one figure governs and it is the requirement', () => {
    for (const r of rows) {
      const s = r.takeoff!.spread!;
      expect(s.map((f) => f.method)).toEqual(METHODS);
      for (const f of s) if (f.length_m === undefined) expect(f.note, `${r.aircraft} ${f.method}`).toBeDefined();
      const g = s.filter((f) => f.governs);
      expect(g, r.aircraft).toHaveLength(1);
      // The governing figure is the takeoff requirement (before a climb-limited peak adjustment).
      if (r.takeoff!.peakTemperature_c === undefined) expectClose(g[0]!.length_m!, r.requiredTakeoff_m!, { rel: 1e-9 }, `${r.aircraft} governing figure`);
    }
  });

  it('a figure far from the requirement gets a reason: the uncalibrated model against the planning data, ICAO beyond its 35 % limit', () => {
    const tern = rows.find((r) => r.aircraft === 'tern-rj90')!;
    const s = tern.takeoff!.spread!;
    const model = s.find((f) => f.method === 'model')!;
    const cal = s.find((f) => f.method === 'calibrated-model')!;
    expect(cal.governs).toBe(true);
    expect(Math.abs(model.length_m! / cal.length_m! - 1)).toBeGreaterThan(0.1);
    expect(model.note!.code).toBe('spread.uncalibrated');
    const icao = s.find((f) => f.method === 'reference-icao')!;
    expect(icao.note!.code).toMatch(/^spread\.(beyond35|referenceAtMtow)$/);
    expect(s.find((f) => f.method === 'chart')!.note!.code).toBe('spread.noChart');
  });
});

describe('a high, hot site (regression: fast-check counterexample, seed 847883296)', () => {
  for (const method of ['planning', 'reference-authority'] as const) {
    it(`${method}: the authority adjustments take an ICAO-corrected length beyond 6,000 m; every figure finite`, () => {
      const input = study((d) => {
        d.options.method = method;
        const site = (d as unknown as { site: Record<string, unknown> }).site;
        site.elevation_m = 3035;
        site.designTemperature_c = 47.95;
      });
      const r = runStudy(input);
      const figures = r.scenarios.flatMap((s) => s.rows).flatMap((row) => row.takeoff?.spread ?? []);
      const authority = figures.filter((f) => f.method === 'reference-authority' && f.length_m !== undefined);
      expect(authority.length).toBeGreaterThan(0);
      for (const f of figures) if (f.length_m !== undefined) expect(Number.isFinite(f.length_m)).toBe(true);
      expect(authority.some((f) => f.length_m! > 6000)).toBe(true);
    });
  }
});
