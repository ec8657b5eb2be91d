/**
 * The demo fleet against the ranges of its classes (docs/methods/demo-fleet.md): each invented type's
 * takeoff and landing figures at sea level ISA and at the demo site, beside the range of its class.
 * `node --import tsx scripts/demo-class-table.ts` prints the markdown rows; test/docs/demoFleet.test.ts
 * recomputes them and fails when the document or a profile drifts out of its range.
 */
import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import {
  analyseLanding, analyseTakeoff, climbCappedTakeoff, runStudy, type AircraftProfile, type StudyInput,
} from '../core/index.js';

export type FigureKey = 'takeoff-sl' | 'landing-sl' | 'takeoff-site-ratio' | 'landing-site-ratio' | 'climb-mass-site';

export interface ClassRange {
  readonly id: string;
  readonly cls: string;
  /** Sea-level ISA ranges of the class, m (takeoff and landing as the figure text says). */
  readonly takeoff: readonly [number, number];
  readonly landing: readonly [number, number];
  readonly source: string;
}

/** Class ranges: common practice, from memory (no published source is claimed for them). */
export const CLASS_RANGES: readonly ClassRange[] = [
  { id: 'kestrel-ut1', cls: 'light single piston, 1.1 t', takeoff: [450, 520], landing: [400, 500], source: 'common practice, from memory' },
  { id: 'pipit-lt2', cls: 'light twin piston, 2.0 t', takeoff: [450, 650], landing: [450, 600], source: 'common practice, from memory' },
  { id: 'heron-st1', cls: 'single turboprop utility, 3.9 t', takeoff: [550, 800], landing: [450, 650], source: 'common practice, from memory' },
  { id: 'plover-ct19', cls: '19-seat commuter turboprop, 8.6 t', takeoff: [1100, 1400], landing: [950, 1150], source: 'common practice, from memory' },
  { id: 'curlew-rt70', cls: '70-seat regional turboprop, 22.8 t', takeoff: [1250, 1450], landing: [1000, 1250], source: 'common practice, from memory' },
  { id: 'swift-bj8', cls: 'midsize business jet, 16 t', takeoff: [1000, 1600], landing: [1100, 1500], source: 'common practice, from memory' },
  { id: 'tern-rj90', cls: '90-seat regional jet, 40 t', takeoff: [1700, 2100], landing: [1500, 1750], source: 'common practice, from memory' },
  { id: 'albatross-nb180', cls: '180-seat narrowbody, 78 t', takeoff: [2100, 2500], landing: [1500, 1900], source: 'common practice, from memory' },
];

/**
 * Site ratios, every class: a density altitude near 2,900 m (1,346 m at 35 °C) adds 20 % to 120 % to
 * a sea-level takeoff (common practice, from memory; the ICAO percentage corrections give × 1.69 here,
 * indicative beyond 35 %), and a climb-limited twin keeps 75 % to 100 % of its MTOW (common practice,
 * from memory). A landing at ISA at 1,346 m is 3 % to 15 % longer than at sea level (derived: the
 * density ratio 0.878 raises true airspeeds by 6.7 %, braking distance with its square).
 */
export const SITE_TAKEOFF_RATIO: readonly [number, number] = [1.2, 2.2];
export const SITE_LANDING_RATIO: readonly [number, number] = [1.03, 1.15];
export const CLIMB_MASS_FRACTION: readonly [number, number] = [0.75, 1];

export interface Figure {
  readonly id: string;
  readonly name: string;
  readonly cls: string;
  readonly key: FigureKey;
  readonly figure: string;
  readonly value: number;
  readonly range: readonly [number, number];
  readonly unit: 'm' | 'ratio';
  readonly source: string;
  /** The lengths a ratio is made of, for the reader. */
  readonly detail?: string;
}

const FIGURE_TEXT: Readonly<Record<FigureKey, (light: boolean) => string>> = {
  'takeoff-sl': (light) => (light ? 'takeoff distance to 50 ft, unfactored, sea level ISA, MTOW' : 'takeoff field length, sea level ISA, MTOW'),
  'landing-sl': (light) => (light ? 'landing distance from 50 ft, unfactored, sea level ISA, MLW' : 'landing field length (÷ 0.60), sea level ISA, MLW'),
  'takeoff-site-ratio': () => 'takeoff at the site ÷ sea level (at the climb-limited mass where one binds)',
  'landing-site-ratio': () => 'landing at the site (ISA) ÷ sea level',
  'climb-mass-site': () => 'climb-limited mass at the site ÷ MTOW',
};

export function demoFigures(): Figure[] {
  const doc = JSON.parse(readFileSync(new URL('../examples/demo-study.json', import.meta.url), 'utf8')) as StudyInput;
  const study = runStudy(doc);
  const pa = study.site.elevation_m;
  const temp = study.site.designTemperature_c;
  const out: Figure[] = [];
  for (const c of CLASS_RANGES) {
    const a = doc.aircraft.find((x) => x.id === c.id) as AircraftProfile;
    const light = a.certification === 'normal';
    const run = (p: number, t: number) => (m: number) => analyseTakeoff({ aircraft: a, mass_kg: m, pressureAltitude_m: p, temperature_c: t, slope: 0, headwind_mps: 0, surface: 'dry' });
    const sl = climbCappedTakeoff(a, a.mtow_kg, run(0, 15));
    const site = climbCappedTakeoff(a, a.mtow_kg, run(pa, temp));
    if (!sl.ok || !sl.t.feasible || !site.ok || !site.t.feasible) throw new Error(`${a.id}: takeoff not sized`);
    const land = (p: number) => {
      const l = analyseLanding({ aircraft: a, mass_kg: a.mlw_kg, pressureAltitude_m: p, slope: 0, headwind_mps: 0, surface: 'dry' });
      if (l.status !== 'ok') throw new Error(`${a.id}: ${l.reason}`);
      return light ? l.distance_m : l.required_m;
    };
    const takeoffOf = (t: typeof sl.t) => (t.feasible ? (light ? t.allEngines.toScreen_m : t.required_m) : NaN);
    const push = (key: FigureKey, value: number, range: readonly [number, number], unit: 'm' | 'ratio', source: string, detail?: string): void => {
      out.push({ id: a.id, name: a.name, cls: c.cls, key, figure: FIGURE_TEXT[key](light), value, range, unit, source, ...(detail ? { detail } : {}) });
    };
    const m = (x: number): string => `${Math.round(x).toLocaleString('en-US')} m`;
    push('takeoff-sl', takeoffOf(sl.t), c.takeoff, 'm', c.source);
    push('landing-sl', land(0), c.landing, 'm', c.source);
    push('takeoff-site-ratio', takeoffOf(site.t) / takeoffOf(sl.t), SITE_TAKEOFF_RATIO, 'ratio', 'common practice, from memory',
      `${m(takeoffOf(site.t))} at ${Math.round(site.mass_kg).toLocaleString('en-US')} kg`);
    push('landing-site-ratio', land(pa) / land(0), SITE_LANDING_RATIO, 'ratio', 'derived (density ratio at 1,346 m)', m(land(pa)));
    if (site.climbLimited) {
      push('climb-mass-site', site.mass_kg / a.mtow_kg, CLIMB_MASS_FRACTION, 'ratio', 'common practice, from memory',
        `${Math.round(site.mass_kg).toLocaleString('en-US')} kg`);
    }
  }
  return out;
}

export const fmtValue = (f: Figure): string => (f.unit === 'm'
  ? `${Math.round(f.value).toLocaleString('en-US')} m`
  : `${f.value.toFixed(2)}${f.detail ? ` (${f.detail})` : ''}`);
export const fmtRange = (f: Figure): string => (f.unit === 'm'
  ? `${f.range[0].toLocaleString('en-US')}–${f.range[1].toLocaleString('en-US')} m`
  : `${f.range[0].toFixed(2)}–${f.range[1].toFixed(2)}`);

export function tableRows(figures: readonly Figure[]): string[] {
  return figures.map((f) => `| ${f.name} (\`${f.id}\`), ${f.cls} | ${f.figure} | ${fmtValue(f)} | ${fmtRange(f)} | ${f.source} |`);
}

if (process.argv[1] === fileURLToPath(import.meta.url)) {
  console.log(['| type | figure | value | class range | source |', '|---|---|---|---|---|', ...tableRows(demoFigures())].join('\n'));
}
