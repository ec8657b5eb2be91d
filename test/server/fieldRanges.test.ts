/**
 * One range per field (core/fields.ts): a study file the schema accepts is never refused by the engine,
 * and a value out of range is refused at the edge with its path in the file, its value, the range and
 * the unit. Check cases are the defects found by the robustness review (issue 12, finding 4); the
 * physical limits are stated in core/fields.ts (common practice, chosen for this project).
 */
import { type Notice } from '../../core/index.js';
import { siText } from '../../core/notices.js';
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { InputDomainError, designTemperatureFromMonthly, siteConditions, type StudyInput } from '../../core/index.js';
import { ALTERNATE_DISTANCE_RANGE_KM, MONTHLY_MEAN_MAX_RANGE } from '../../core/fields.js';
import { RESERVE_ALTERNATE_DISTANCE_RANGE, resolveReserves } from '../../core/route/reserves.js';
import { approachCategory } from '../../core/classify.js';
import { parseStudyDocument, studyOutput } from '../../server/studies/document.js';

const minimal = readFileSync(new URL('../../examples/minimal-study.json', import.meta.url), 'utf8');
const demo = JSON.parse(readFileSync(new URL('../../examples/demo-study.json', import.meta.url), 'utf8')) as { aircraft: Record<string, unknown>[] };

// eslint-disable-next-line @typescript-eslint/no-explicit-any
const study = (f: (doc: any) => void): unknown => {
  const doc = JSON.parse(minimal);
  f(doc);
  return doc;
};

/** Parses and, when the schema accepts, runs the study: the engine must not refuse it. */
function endToEnd(doc: unknown): { ok: true; input: StudyInput; out: ReturnType<typeof studyOutput> } | { ok: false; problems: { path: string; message: string }[] } {
  const p = parseStudyDocument(doc);
  if (!p.ok) return { ok: false, problems: p.problems };
  return { ok: true, input: p.input, out: studyOutput(p.input) };
}

const climate = (hot: { meanMax_c: number; mean_c?: number; meanMin_c?: number }) => ({
  source: 'invented normals',
  monthly: Array.from({ length: 12 }, (_, i) => (i === 6 ? { month: 7, ...hot } : { month: i + 1, meanMax_c: 30, mean_c: 22 })),
});

describe('international reserve alternate (0 to 2,000 km in the schema and the engine)', () => {
  it('2,000 km is accepted end to end (the engine used to refuse above 1,500 km)', () => {
    const r = endToEnd(study((d) => { d.options.reserves = { policy: 'international', alternate_km: 2000 }; }));
    expect(r.ok).toBe(true);
    if (r.ok) expect(r.out.scenarios[0]!.rows).toHaveLength(1);
    expect(RESERVE_ALTERNATE_DISTANCE_RANGE.max).toBe(ALTERNATE_DISTANCE_RANGE_KM.max * 1000);
  });

  it('2,000 km runs for every demo aircraft (a route capped at MTOW is held to MTOW, not a rounding error above it)', () => {
    const doc = JSON.parse(readFileSync(new URL('../../examples/demo-study.json', import.meta.url), 'utf8')) as { options: Record<string, unknown> };
    doc.options = { ...doc.options, reserves: { policy: 'international', alternate_km: 2000 } };
    const r = endToEnd(doc);
    expect(r.ok).toBe(true);
    if (r.ok) for (const sc of r.out.scenarios) expect(sc.rows.length).toBeGreaterThan(0);
  });

  it('2,001 km is refused by both, each naming the 2,000 km limit', () => {
    const r = endToEnd(study((d) => { d.options.reserves = { policy: 'international', alternate_km: 2001 }; }));
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.problems[0]).toMatchObject({ path: 'options.reserves.alternate_km', message: '2001 is out of range; allowed 0 to 2000 km' });
    expect(() => resolveReserves({ kind: 'international', alternateDistance_m: 2_001_000 }, 0.05)).toThrow(/≤ 2000000 m/);
  });
});

describe('monthly mean maximum (−60 to 55 °C in the schema and the engine)', () => {
  it('60 °C is refused by the schema with the range (it used to pass the schema and fail in the engine)', () => {
    const r = endToEnd(study((d) => { delete d.site.designTemperature_c; d.site.climate = climate({ meanMax_c: 60, mean_c: 50 }); }));
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.problems[0]).toMatchObject({ path: 'site.climate.monthly[6].meanMax_c', message: '60 is out of range; allowed -60 to 55 °C' });
    expect(() => designTemperatureFromMonthly({ months: [{ month: 7, meanMax_c: 60, mean_c: 50 }] })).toThrow(`≤ ${MONTHLY_MEAN_MAX_RANGE.max} °C`);
  });

  it('55 °C is accepted end to end, the reference methods included', () => {
    for (const method of ['physics', 'reference-icao'] as const) {
      const r = endToEnd(study((d) => {
        delete d.site.designTemperature_c;
        d.site.climate = climate({ meanMax_c: 55, mean_c: 45 });
        d.options.method = method;
        d.aircraft[0].reference = { takeoff_m: 1100, landing_m: 950 };
      }));
      expect(r.ok, method).toBe(true);
    }
  });

  it('a month with neither a mean nor a minimum is refused at the edge with its path', () => {
    const r = endToEnd(study((d) => {
      delete d.site.designTemperature_c;
      d.site.climate = climate({ meanMax_c: 40 });
    }));
    expect(r.ok).toBe(false);
    if (!r.ok) {
      expect(r.problems[0]!.path).toBe('site.climate.monthly[6].meanMin_c');
      expect(r.problems[0]!.message).toMatch(/^missing; expected a value: a monthly mean \(mean_c\) or a mean daily minimum/);
    }
  });

  it('a mean above the mean maximum (station data with different missing days) is computed with a warning', () => {
    const r = endToEnd(study((d) => { delete d.site.designTemperature_c; d.site.climate = climate({ meanMax_c: 30.2, mean_c: 30.4 }); }));
    expect(r.ok).toBe(true);
    if (r.ok) expect(r.out.site.warnings.map(siText).join(' ')).toMatch(/July: mean temperature 30\.4 °C is above the mean daily maximum 30\.2 °C/);
  });
});

describe('runway slope (average ±3 % in the schema and the models; ICAO limits warn)', () => {
  const profile = (...pts: [number, number][]) => pts.map(([chainage_m, elevation_m]) => ({ chainage_m, elevation_m }));

  it('a one-segment 5 % runway is refused at the edge, naming the profile and the 3 % range', () => {
    const doc = study((d) => { d.site.runways[0].profile = profile([0, 250], [1500, 325]); });
    const r = endToEnd(doc);
    expect(r.ok).toBe(false);
    if (!r.ok) {
      expect(r.problems).toHaveLength(1);
      expect(r.problems[0]!.path).toBe('site.runways[0].profile');
      expect(r.problems[0]!.message).toBe('"5.00 % average slope" is not allowed; expected an average slope end to end of 3.00 % or less, the slope range of the takeoff and landing models (ICAO Annex 14 limits runways to 1 to 2 %)');
    }
  });

  it('the engine refuses the same runway with the same path (no internal "slope")', () => {
    const p = parseStudyDocument(study(() => undefined));
    if (!p.ok) throw new Error('minimal study invalid');
    const steep = { ...p.input, site: { ...p.input.site, runways: [{ ...p.input.site.runways[0]!, profile: profile([0, 250], [1500, 325]) }] } };
    let err: unknown;
    try { siteConditions(steep); } catch (e) { err = e; }
    expect(err).toBeInstanceOf(InputDomainError);
    expect((err as InputDomainError).field).toBe('site.runways[0].profile');
  });

  it('a 5 % stretch inside a runway of 0.3 % average slope is accepted with the ICAO warning', () => {
    const r = endToEnd(study((d) => { d.site.runways[0].profile = profile([0, 250], [100, 255], [1500, 255]); }));
    expect(r.ok).toBe(true);
    if (r.ok) expect(r.out.site.runways[0]!.warnings.map(siText).join(' ')).toMatch(/steeper than the ICAO longitudinal maximum of 2\.00 %.*steepest 5\.00 %/);
  });

  it('2.5 % average is computed, with the ICAO effective-gradient warning', () => {
    const r = endToEnd(study((d) => { d.site.runways[0].profile = profile([0, 250], [1500, 287.5]); }));
    expect(r.ok).toBe(true);
    if (r.ok) expect(r.out.site.runways[0]!.warnings.map(siText).join(' ')).toMatch(/Effective gradient 2\.50 % is above the ICAO maximum/);
  });

  it('a chainage that goes back is refused at profile[i].chainage_m (core used to name it points[i])', () => {
    const r = endToEnd(study((d) => { d.site.runways[0].profile = profile([0, 250], [1000, 250], [500, 250]); }));
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.problems[0]!.path).toBe('site.runways[0].profile[2].chainage_m');
  });
});

describe('fleet payload and derived values', () => {
  it('a payload above the aircraft maximum is refused at the edge (the engine used to stop the whole study)', () => {
    const r = endToEnd(study((d) => { d.scenarios[0].fleet[0].payload_kg = 3000; }));
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.problems[0]).toMatchObject({ path: 'scenarios[0].fleet[0].payload_kg' });
  });

  it('one 600,000 kg aircraft no longer rejects the whole study with "vref_mps": it is classified E and its row says why it cannot operate', () => {
    const alb = demo.aircraft.find((a) => a.id === 'albatross-nb180')!;
    const giant = { ...alb, id: 'giant-600', name: 'Giant 600 (invented)', mtow_kg: 600000, mlw_kg: 550000, oew_kg: 300000, maxPayload_kg: 150000, maxFuel_kg: 250000 };
    const r = endToEnd(study((d) => {
      d.aircraft.push(giant);
      d.scenarios[0].fleet.push({ aircraft: 'giant-600', annualOperations: 100, stageLength_km: 1000, payload_kg: 20000 });
    }));
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    const rows = r.out.scenarios[0]!.rows as unknown as { aircraft: string; required_m: number | null; warnings: Notice[]; classification: { approachCategory: string; vref_mps: number } }[];
    const row = rows.find((x) => x.aircraft === 'giant-600')!;
    expect(row.classification.vref_mps).toBeGreaterThan(150);
    expect(row.classification.approachCategory).toBe('E');
    expect(row.warnings.map(siText).join(' ')).toMatch(/cannot reach lift-off speed|cannot climb|Climb-limited/);
    expect(rows.find((x) => x.aircraft === 'plover-ct19')!.required_m).toBeGreaterThan(0);
  });

  it('approach category E is open-ended (AC 150/5300-13: 166 kt or more)', () => {
    expect(approachCategory(199.36)).toBe('E');
    expect(() => approachCategory(0)).toThrow(InputDomainError);
  });
});
