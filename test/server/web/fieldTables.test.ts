/**
 * The site, runway and scenario forms are built from the field tables (core/studyFields.ts): every
 * row is an input of its form with the row's label, and the server reads it with the row's unit,
 * range and required rule, so a value beyond the row's range is refused with that range in the user's
 * units. Convention of the project (issue 14: one definition per field).
 */
import { describe, expect, it } from 'vitest';
import {
  CLIMATE_FIELDS, DIRECTION_FIELDS, FLEET_FIELDS, MONTHLY_FIELDS, SITE_FIELDS, siRangeOf, unitOf,
  type InputFieldSpec, type UnitSystem,
} from '../../../core/index.js';
import { rangeText, type FormValues } from '../../../server/common/formFields.js';
import { directionField, monthField, readRunwayForm, readSiteForm } from '../../../server/sites/form.js';
import { readScenarioForm, rowField } from '../../../server/studies/form.js';
import { browser, makeApp } from './helpers.js';

function siteValues(): Record<string, string> {
  const out: Record<string, string> = { name: 'Invented Field', elevation: '250', climateSource: 'Invented normals', climateYears: '30' };
  for (let m = 1; m <= 12; m++) { out[monthField(m, 'max')] = '30'; out[monthField(m, 'min')] = '15'; }
  return out;
}

function runwayValues(): Record<string, string> {
  return { name: '12/30', pavement: 'paved', profile: '0 250\n2000 254', d0_designator: '12', d0_tora: '2000', d0_toda: '2000', d0_asda: '2000', d0_lda: '2000' };
}

/** A value just beyond the row's range, typed in the user's units. */
function beyond(spec: InputFieldSpec, system: UnitSystem): string {
  const r = siRangeOf(spec);
  const u = unitOf(spec.kind, system);
  return String(Math.ceil(u.from(r.max + Math.max(1, 0.1 * Math.abs(r.max))) + 1));
}

const expectedRange = (spec: InputFieldSpec, system: UnitSystem): string => rangeText({ kind: spec.kind, ...siRangeOf(spec) }, system);

const errorsOf = (r: { ok: boolean; errors?: Record<string, string> }): Record<string, string> => (r.ok ? {} : r.errors ?? {});

describe('forms read each field with its table row (unit, range, required)', () => {
  for (const system of ['si', 'us'] as const) {
    it(`site, climate and monthly rows (${system})`, () => {
      expect(readSiteForm(siteValues(), system).ok).toBe(true);
      const cases: [InputFieldSpec, string][] = [
        ...SITE_FIELDS.map((f): [InputFieldSpec, string] => [f, f.form]),
        ...CLIMATE_FIELDS.map((f): [InputFieldSpec, string] => [f, f.form]),
        ...MONTHLY_FIELDS.map((f): [InputFieldSpec, string] => [f, monthField(7, f.form as 'max')]),
      ];
      for (const [spec, name] of cases) {
        const errors = errorsOf(readSiteForm({ ...siteValues(), [name]: beyond(spec, system) } as FormValues, system));
        expect(errors[name], `${spec.key} (${name})`).toContain(expectedRange(spec, system));
      }
    });

    it(`declared-distance rows, both directions (${system})`, () => {
      expect(readRunwayForm(runwayValues(), 'si').ok).toBe(true);
      for (const spec of DIRECTION_FIELDS) {
        const name = directionField(0, spec.form);
        const errors = errorsOf(readRunwayForm({ ...runwayValues(), [name]: beyond(spec, system) }, system));
        expect(errors[name], spec.key).toContain(expectedRange(spec, system));
        // A blank required field of the first direction is missing, with the row's range.
        const blank = errorsOf(readRunwayForm({ ...runwayValues(), [name]: '' }, system));
        expect(blank[name], `${spec.key} blank`).toBe(`missing; ${expectedRange(spec, system)}`);
      }
    });

    it(`fleet rows (${system})`, () => {
      const catalogue = new Map([['jet-a', { maxPayload_kg: 1e9 }]]);
      const row: Record<string, string> = { name: 'Base', [rowField(0, 'aircraft')]: 'jet-a', [rowField(0, 'ops')]: '500', [rowField(0, 'stage')]: '500', [rowField(0, 'payload')]: '1000' };
      expect(readScenarioForm(row, system, 1, catalogue).ok).toBe(true);
      for (const spec of FLEET_FIELDS) {
        const name = rowField(0, spec.form);
        const errors = errorsOf(readScenarioForm({ ...row, [name]: beyond(spec, system) }, system, 1, catalogue));
        expect(errors[name], spec.key).toContain(expectedRange(spec, system));
      }
    });
  }

  it('a stage length is read in the user\'s distance unit and held in km, as the study file holds it', () => {
    const r = readScenarioForm({ name: 'Base', r0_aircraft: 'jet-a', r0_ops: '500', r0_stage: '100', r0_payload: '1000' }, 'us', 1, new Map([['jet-a', { maxPayload_kg: 5000 }]]));
    expect(r.ok).toBe(true);
    // 100 NM = 185.2 km (1 NM = 1852 m exactly, core/units.ts).
    if (r.ok) expect(r.value.fleet[0]!.stageLength_km).toBeCloseTo(185.2, 9);
  });
});

describe('forms show each table row as an input with its label', () => {
  it('site form, runway form and scenario form', async () => {
    const { app } = makeApp();
    const c = await browser(app);
    const site = (await c.get('/sites/new')).text;
    for (const f of [...SITE_FIELDS, ...CLIMATE_FIELDS]) {
      expect(site, f.key).toContain(`name="${f.form}"`);
      expect(site, f.key).toContain(f.label);
    }
    for (const f of MONTHLY_FIELDS) {
      expect(site).toContain(`name="${monthField(1, f.form as 'max')}"`);
      expect(site).toContain(`>${f.label}</th>`);
    }
    const runway = (await c.get('/sites/1/runways/new')).text;
    for (const f of DIRECTION_FIELDS) for (const i of [0, 1]) expect(runway).toContain(`name="${directionField(i, f.form)}"`);
    const scenario = (await c.get('/studies/1/scenarios/1')).text;
    for (const f of FLEET_FIELDS) {
      expect(scenario).toContain(`name="${rowField(0, f.form)}"`);
      expect(scenario).toContain(f.label);
    }
  });
});
