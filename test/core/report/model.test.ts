/**
 * Appendix report model (core/report/model.ts): built from the invented demo study. Values stay SI and
 * unrounded (checked against the result they come from, derived); every input value is listed; the
 * structure is the one the appendix promises.
 */
import { siText } from '../../../core/notices.js';
import { describe, expect, it } from 'vitest';
import demo from '../../../examples/demo-study.json' with { type: 'json' };
import { runStudy, type StudyInput } from '../../../core/index.js';
import { studyCharts } from '../../../core/report/charts.js';
import { buildAppendixModel, climbLimitedRow, type AppendixModel, type Block, type Cell, type Row } from '../../../core/report/model.js';
import { parseStudyDocument } from '../../../server/studies/document.js';

function inputOf(doc: unknown): StudyInput {
  const p = parseStudyDocument(doc);
  if (!p.ok) throw new Error(JSON.stringify(p.problems));
  return p.input;
}

const input = inputOf(demo);
const result = runStudy(input);
const model: AppendixModel = buildAppendixModel({
  input, result, charts: studyCharts(result), inputDigest: 'f'.repeat(64), date: '2026-12-02', version: '0.1.0-test',
});

const blocksOf = (id: string): readonly Block[] => model.sections.find((s) => s.id === id)?.blocks ?? [];
const tables = (blocks: readonly Block[]) => blocks.filter((b): b is Extract<Block, { type: 'table' }> => b.type === 'table');
const cells = (rows: readonly Row[]): Cell[] => rows.flatMap((r) => ('cells' in r ? [...r.cells] : []));

describe('appendix model of the demo study', () => {
  it('numbers ten top-level sections 1-10, with the scenarios as subsections of results and existing runway', () => {
    const top = model.sections.filter((s) => s.level === 1);
    expect(top.map((s) => s.number)).toEqual(['1', '2', '3', '4', '5', '6', '7', '8', '9', '10']);
    const results = model.sections.filter((s) => s.id.startsWith('results-'));
    expect(results.map((s) => s.number)).toEqual(result.scenarios.map((_, i) => `5.${i + 1}`));
    expect(model.sections.filter((s) => s.id.startsWith('existing-')).length).toBe(result.scenarios.length);
    expect(new Set(model.sections.map((s) => s.id)).size).toBe(model.sections.length);
  });

  it('carries each recommendation unrounded, in SI, as the result gives it', () => {
    expect(model.recommendations.map((r) => [r.scenario, r.criticalAircraftName, r.recommendedLength_m, r.required_m]))
      .toEqual(result.scenarios.map((s) => [s.name, s.criticalAircraftName, s.recommendedLength_m, s.criticalRequired_m]));
    for (const [i, s] of result.scenarios.entries()) {
      const facts = blocksOf(`results-${i + 1}`).find((b) => b.type === 'facts');
      const rec = facts?.type === 'facts' ? facts.items.find((f) => f.label === 'Recommended runway length') : undefined;
      expect(rec?.value).toEqual({ si: s.recommendedLength_m, kind: 'lengthBoth' });
    }
  });

  it('gives a components column per aircraft whose required length is the row requirement', () => {
    const s = result.scenarios[0]!;
    const comp = tables(blocksOf('results-1')).find((t) => t.caption.startsWith('Components'))!;
    expect(comp.columns.slice(1).map((c) => c.title)).toEqual(s.rows.map((r) => r.aircraftName));
    const req = comp.rows.find((r) => 'cells' in r && 'text' in r.cells[0]! && r.cells[0].text === 'Required length');
    expect(req && 'cells' in req ? req.cells.slice(1) : []).toEqual(s.rows.map((r) => ({ si: r.required_m, kind: 'length' })));
  });

  it('lists every numeric input value (listing cells carry the exact SI value)', () => {
    const listed = new Set<number>();
    for (const b of blocksOf('inputs')) {
      const cs = b.type === 'table' ? cells(b.rows) : b.type === 'facts' ? b.items.map((f) => f.value) : [];
      for (const c of cs) {
        if ('si' in c && typeof c.si === 'number') listed.add(c.si);
        if ('text' in c && /^-?\d+(\.\d+)?$/.test(c.text)) listed.add(Number(c.text));
      }
    }
    const missing: string[] = [];
    const walk = (v: unknown, path: string): void => {
      if (typeof v === 'number') { if (!listed.has(v)) missing.push(`${path} = ${v}`); }
      else if (Array.isArray(v)) v.forEach((x, i) => walk(x, `${path}[${i}]`));
      else if (v && typeof v === 'object') for (const [k, x] of Object.entries(v)) walk(x, `${path}.${k}`);
    };
    walk(input, 'input');
    expect(missing).toEqual([]);
  });

  it('places every chart model in the charts section, in order', () => {
    const charts = blocksOf('charts').filter((b) => b.type === 'chart').map((b) => (b.type === 'chart' ? b.chart.id : ''));
    expect(charts).toEqual(studyCharts(result).map((c) => c.id));
    expect(charts.length).toBeGreaterThanOrEqual(4);
  });
});

describe('appendix model of a study with a climb-limited aircraft', () => {
  it('puts a climb-limited caution at the head of the warnings; in the demo study only rows sized below their route mass are climb-limited', () => {
    // At the demo's hot, high site the commuter and the jets are climb-limited (takeoff model revision).
    for (const r of result.scenarios.flatMap((s) => s.rows).filter(climbLimitedRow)) {
      expect(r.status === 'ok' && r.takeoffMass_kg < r.route.takeoffMass_kg, r.aircraft).toBe(true);
    }
    const doc = structuredClone(demo) as any;
    doc.site.elevation_m = 1600;
    doc.site.designTemperature_c = 38;
    delete doc.site.climate;
    doc.scenarios = [{ name: 'Hot', fleet: [{ aircraft: 'tern-rj90', annualOperations: 900, stageLength_km: 3000, payload_kg: 7000 }] }];
    const i2 = inputOf(doc);
    const r2 = runStudy(i2);
    const row = r2.scenarios[0]!.rows[0]!;
    // Precondition: the study sized the jet below its route mass because of the climb minimum.
    expect(row.takeoffMass_kg).toBeLessThan(row.route.takeoffMass_kg - 100);
    expect(row.warnings.map(siText).some((w) => /climb-limited/i.test(w))).toBe(true);
    expect(climbLimitedRow(row)).toBe(true);
    expect(r2.scenarios.flatMap((s) => s.rows).filter(climbLimitedRow)).toHaveLength(1);
    const m2 = buildAppendixModel({ input: i2, result: r2, charts: [], inputDigest: 'a'.repeat(64), date: '2026-12-02', version: 't' });
    const cautions = m2.sections.find((s) => s.id === 'assumptions')!.blocks.filter((b) => b.type === 'paragraph' && b.style === 'caution');
    expect(cautions.map((b) => (b.type === 'paragraph' ? b.text : ''))).toEqual([
      'CLIMB-LIMITED: Tern RJ-90 in "Hot": at the takeoff mass its route needs, a takeoff climb gradient (first segment at lift-off or second segment at V2; the row warnings name which) is below the regulatory minimum, which a longer runway cannot cure; the runway is sized at the greatest mass that meets the minimum (offload in Section 5).',
    ]);
  });
});

describe('appendix: operating rules and the recorded override (issue 13, items 12 and 14)', () => {
  const factsOf = (m: AppendixModel, id: string) =>
    (m.sections.find((s) => s.id === id)?.blocks ?? []).flatMap((b) => (b.type === 'facts' ? b.items : []));
  const text = (c: Cell): string => ('text' in c ? c.text : '');
  it('the method section names the rule set, its source and the light-aircraft factors; the listing names the set', () => {
    const method = factsOf(model, 'method');
    expect(text(method.find((f) => f.label === 'Operating rules (landing factors)')!.value)).toMatch(/^US Part 121 \(scheduled\): .*14 CFR 121\.195/);
    expect(text(method.find((f) => f.label === 'Light-aircraft factors')!.value)).toMatch(/takeoff × 1\.25, landing × 1\.43 .*CAT\.POL\.A\.305.*from memory/);
    expect(text(factsOf(model, 'inputs').find((f) => f.label === 'Operating rules')!.value)).toBe('us-121');
    expect(method.some((f) => f.label.startsWith('Override'))).toBe(false);
  });
  it('an override reason is printed in the method section, in the listing and beside each row it lets govern', () => {
    const doc = structuredClone(demo) as { options: Record<string, unknown>; site: Record<string, unknown> };
    doc.options.method = 'reference-icao';
    doc.options.operatingRules = 'eu-cat';
    doc.options.referenceOverrideReason = 'The operator chart for this aerodrome agrees (test).';
    doc.site.elevation_m = 2200;
    const inp = inputOf(doc);
    const res = runStudy(inp);
    const m = buildAppendixModel({ input: inp, result: res, charts: [], inputDigest: 'e'.repeat(64), date: '2026-12-03', version: '0.1.0-test' });
    expect(text(factsOf(m, 'method').find((f) => f.label === 'Override of the 35 % limit (recorded)')!.value)).toContain('The operator chart for this aerodrome agrees (test).');
    expect(text(factsOf(m, 'inputs').find((f) => f.label === 'Override reason (reference methods)')!.value)).toBe('The operator chart for this aerodrome agrees (test).');
    expect(text(factsOf(m, 'method').find((f) => f.label === 'Operating rules (landing factors)')!.value)).toMatch(/^EU commercial air transport/);
    const warnings = JSON.stringify(m.sections.find((s) => s.id === 'assumptions')!.blocks);
    expect(warnings).toContain('OVERRIDE RECORDED');
  });
});

describe('appendix: the landing mass is stated as the engine used it (issue 14 regression)', () => {
  const assumptionsText = (m: AppendixModel) => JSON.stringify(m.sections.find((s) => s.id === 'assumptions')!.blocks);
  it('default (MLW): the assumptions say maximum landing mass, never "landing at the arrival mass"', () => {
    expect(input.options.landingMass).toBe('mlw');
    expect(assumptionsText(model)).toContain('landing at the maximum landing mass');
    expect(assumptionsText(model)).not.toContain('landing at the arrival mass.');
    expect(text(factsOf(model, 'inputs').find((f) => f.label === 'Landing mass')!.value)).toBe('mlw');
  });
  it('route option: the assumptions say the arrival mass of the route', () => {
    const doc = structuredClone(demo) as { options: Record<string, unknown> };
    doc.options.landingMass = 'route';
    const inp = inputOf(doc);
    const res = runStudy(inp);
    const m = buildAppendixModel({ input: inp, result: res, charts: [], inputDigest: 'd'.repeat(64), date: '2026-12-03', version: '0.1.0-test' });
    expect(assumptionsText(m)).toContain('landing at the arrival mass of that route');
    expect(text(factsOf(m, 'inputs').find((f) => f.label === 'Landing mass')!.value)).toBe('route');
  });
});

function factsOf(m: AppendixModel, id: string) {
  return (m.sections.find((s) => s.id === id)?.blocks ?? []).flatMap((b) => (b.type === 'facts' ? b.items : []));
}
function text(c: Cell): string {
  return 'text' in c ? c.text : '';
}

describe('appendix listing: every study option, from the one option table (issue 14)', () => {
  it('lists one fact per row of STUDY_OPTION_FIELDS, with the value of every option the study sets', async () => {
    const { STUDY_OPTION_FIELDS, optionValue } = await import('../../../core/studyFields.js');
    const doc = structuredClone(demo) as { options: Record<string, unknown> };
    Object.assign(doc.options, {
      method: 'reference-icao', referenceOverrideReason: 'Listed in full for the test.', landingMass: 'route',
      reserves: { policy: 'custom', alternate_km: 250, holding_min: 35, contingencyFraction: 0.04 },
    });
    const inp = inputOf(doc);
    const m = buildAppendixModel({ input: inp, result: runStudy(inp), charts: [], inputDigest: 'c'.repeat(64), date: '2026-12-03', version: '0.1.0-test' });
    const listed = factsOf(m, 'inputs');
    for (const f of STUDY_OPTION_FIELDS) {
      const fact = listed.find((x) => x.label === f.label);
      expect(fact, f.path).toBeDefined();
      const v = optionValue(inp.options, f.path);
      expect(v, `${f.path} set in this study`).toBeDefined();
      if (typeof v === 'number') expect('si' in fact!.value ? fact!.value.si : undefined, f.path).toBe(f.path.endsWith('_km') ? v * 1000 : v);
      else expect(text(fact!.value), f.path).toBe(String(v));
    }
    // Every key of the options object has its row in the table (nothing added without a listing).
    const keys = (o: Record<string, unknown>, pre = ''): string[] => Object.entries(o).flatMap(([k, v]) =>
      v !== null && typeof v === 'object' ? keys(v as Record<string, unknown>, `${pre}${k}.`) : [`${pre}${k}`]);
    for (const k of keys(inp.options as unknown as Record<string, unknown>)) expect(STUDY_OPTION_FIELDS.map((f) => f.path), k).toContain(k);
  });
});

describe('appendix listing: every numeric site, climate, runway and fleet field, from the field tables (issue 14)', () => {
  it('each key of the demo input objects has its row in a table, and the listing carries its label', async () => {
    const { SITE_FIELDS, CLIMATE_FIELDS, MONTHLY_FIELDS, PROFILE_POINT_FIELDS, DIRECTION_FIELDS, FLEET_FIELDS } = await import('../../../core/index.js');
    const numericKeys = (o: object) => Object.entries(o).filter(([, v]) => typeof v === 'number').map(([k]) => k);
    const site = input.site;
    const check = (obj: object, table: readonly { key: string }[], ignore: readonly string[] = []) => {
      for (const k of numericKeys(obj)) if (!ignore.includes(k)) expect(table.map((f) => f.key), k).toContain(k);
    };
    check(site, SITE_FIELDS);
    if (site.climate) { check(site.climate, CLIMATE_FIELDS); for (const m of site.climate.monthly) check(m, MONTHLY_FIELDS, ['month']); }
    for (const r of site.runways) { for (const p of r.profile) check(p, PROFILE_POINT_FIELDS); for (const d of r.directions) check(d, DIRECTION_FIELDS); }
    for (const s of input.scenarios) for (const f of s.fleet) check(f, FLEET_FIELDS);
    const listing = JSON.stringify(model.sections.find((s) => s.id === 'inputs')!.blocks);
    for (const f of [...SITE_FIELDS, ...MONTHLY_FIELDS, ...PROFILE_POINT_FIELDS, ...DIRECTION_FIELDS, ...FLEET_FIELDS]) expect(listing, f.key).toContain(`"${f.label}`);
  });
});
