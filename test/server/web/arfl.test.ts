/**
 * One meaning for "aeroplane reference field length" (ICAO Annex 14 Vol. I §1.1 definition: the
 * minimum field length for takeoff at MTOW, sea level, standard atmosphere, still air, zero slope, as
 * in the aeroplane's flight manual): the planning figure when the profile gives one, the physics model's
 * otherwise, and every page, the study result and the appendix say which. Values from the invented
 * demo fleet (examples/demo-study.json).
 */
import { describe, expect, it } from 'vitest';
import type { AircraftProfile } from '../../../core/aircraft.js';
import { runStudy } from '../../../core/study/run.js';
import { aircraftFigures } from '../../../server/aircraft/figures.js';
import { parseStudyDocument } from '../../../server/studies/document.js';
import demoStudy from '../../../examples/demo-study.json' with { type: 'json' };
import { browser, makeApp } from './helpers.js';

const fleet = demoStudy.aircraft as unknown as AircraftProfile[];
const withPlanning = fleet.find((a) => a.reference?.takeoff_m !== undefined)!;
const withoutPlanning = fleet.find((a) => a.reference?.takeoff_m === undefined)!;

describe('aeroplane reference field length: planning figure first, and it says which', () => {
  it('catalogue figures: the planning figure when given (with the model beside it), else the model', () => {
    const p = aircraftFigures(withPlanning);
    expect(p.arfl_m).toBe(withPlanning.reference!.takeoff_m);
    expect(p.arflSource).toBe('planning figure');
    expect(p.modelArfl_m).toBeGreaterThan(0);
    expect(p.modelArfl_m).not.toBe(p.arfl_m);
    const m = aircraftFigures(withoutPlanning);
    expect(m.arflSource).toBe('physics model');
    expect(m.arfl_m).toBe(m.modelArfl_m);
  });

  it('the study classification carries the same figure and its source', () => {
    const parsed = parseStudyDocument(structuredClone(demoStudy));
    if (!parsed.ok) throw new Error('demo invalid');
    const rows = runStudy(parsed.input).scenarios.flatMap((s) => s.rows);
    const row = (id: string) => rows.find((r) => r.aircraft === id)!;
    expect(row(withPlanning.id).classification.arfl_m).toBe(withPlanning.reference!.takeoff_m);
    expect(row(withPlanning.id).classification.arflSource).toBe('planning figure');
    expect(row(withoutPlanning.id).classification.arflSource).toBe('physics model');
  });

  it('the aircraft page names the source and shows the model beside a planning figure', async () => {
    const { app } = makeApp();
    const c = await browser(app);
    const page = (await c.get(`/aircraft/${withPlanning.id}`)).text;
    expect(page).toContain('Aeroplane reference field length (MTOW, sea level, ISA)');
    expect(page).toMatch(/, planning figure</);
    expect(page).toContain('Physics model at the same condition');
    const list = (await c.get('/aircraft')).text;
    expect(list).toContain('the profile&#39;s planning figure where it gives one (P), else the physics model&#39;s (M)');
  });
});
