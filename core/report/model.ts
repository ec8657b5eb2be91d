/**
 * Study appendix model: what the appendix of a master plan or facility-requirements report says, built
 * from a study's input and result. Pure: values stay SI with a quantity kind; renderers (the PDF in
 * server/pdf/, the web page) format them through templates/format.ts, so both round identically.
 *
 * Content: title block; purpose and cautions; site and design conditions (with the derivation of the
 * design temperature); fleet scenarios; method (core/report/methods.ts, with a references list);
 * results per scenario with their components; scenario comparison and recommendation; existing-runway
 * assessment; charts (ChartModel, drawn by the renderer); assumptions and warnings; a listing of every
 * input value and the SHA-256 digest of the canonical input, so that the appendix can be regenerated.
 *
 * Nothing is computed here beyond selecting, ordering and labelling values of the result: views never
 * recompute (house style). The digest, the date and the program version come in as inputs (core has no
 * I/O and no clock).
 */
import { AIRCRAFT_FIELDS, CRUISE_FIELDS, type AircraftProfile, type QuantityKind } from '../aircraft.js';
import { CAUTION_TEXT, CAUTION_TITLE } from '../caution.js';
import { SURFACE_LABELS } from '../surface.js';
import { CLIMATE_FIELDS, DIRECTION_FIELDS, FLEET_FIELDS, MONTHLY_FIELDS, PROFILE_POINT_FIELDS, SITE_FIELDS, STUDY_OPTION_FIELDS, optionValue } from '../studyFields.js';
import { DEFAULT_OPERATING_RULES, LIGHT_FACTOR_SOURCE, LIGHT_LANDING_FACTOR_DEFAULT, LIGHT_TAKEOFF_FACTOR_DEFAULT, OPERATING_RULE_SET_INFO } from '../operatingRules.js';
import { monthName } from '../climate/index.js';
import { notice, qty, scoped, type Notice } from '../notices.js';
import type {
  MethodFigure, RowResult, ScenarioResult, StudyInput, StudyResult, TraceItem,
} from '../study/types.js';
import type { ChartModel } from './chart.js';
import { METHOD_ENTRIES, STUDY_METHOD_LABEL, referencesFor } from './methods.js';

// ---------------------------------------------------------------------------------------------
// Model types
// ---------------------------------------------------------------------------------------------

/**
 * How a renderer formats a value: a quantity kind (SI value; 'distance' is a route distance in metres,
 * shown in km or NM), a slope ratio shown in percent ('slopePct'), a share shown as a percentage
 * ('percent'), a runway length in both unit systems ('lengthBoth'), or a number of passengers
 * ('passengers', shown rounded up to whole passengers).
 */
export type ValueKind = QuantityKind | 'slopePct' | 'temperatureDelta' | 'percent' | 'lengthBoth' | 'passengers';

/**
 * One value: text, or an SI number with its kind. `listing` asks for every significant digit (input
 * listing) instead of the kind's display rounding. `unit` (with kind absent) is an SI unit the
 * formatter has no kind for; the renderer prints the SI value with that unit.
 */
export type Cell =
  | { readonly text: string; readonly bold?: boolean; readonly mono?: boolean }
  /** A notice (core/notices.ts), rendered in the reader's units. */
  | { readonly notice: Notice; readonly bold?: boolean }
  | { readonly si: number | null | undefined; readonly kind: ValueKind; readonly listing?: boolean; readonly digits?: number }
  | { readonly si: number; readonly unit: string }
  /** Needed / available pair of the same kind, shown "a / b". */
  | { readonly pair: readonly [number | null | undefined, number | null | undefined]; readonly kind: QuantityKind; readonly bold?: boolean };

export interface Column {
  readonly title: string;
  /** When set, the header shows the unit symbol and cells show bare numbers. */
  readonly kind?: ValueKind;
  readonly align?: 'left' | 'right';
  /** Relative width (default 1). */
  readonly width?: number;
}

/**
 * A table row; `group` rows span every column and introduce the rows below them; `note` rows span
 * every column and explain the row above them.
 */
export type Row =
  | { readonly cells: readonly Cell[] }
  | { readonly group: string }
  | { readonly note: Prose };

export interface Fact {
  readonly label: string;
  readonly value: Cell;
}

/** Running text: plain words, or a notice whose values the renderer formats in the reader's units. */
export type Prose = string | Notice;

export type Block =
  | { readonly type: 'paragraph'; readonly text: Prose; readonly style?: 'normal' | 'note' | 'caution' | 'strong' }
  | { readonly type: 'subheading'; readonly text: string }
  | { readonly type: 'facts'; readonly items: readonly Fact[] }
  | { readonly type: 'table'; readonly caption: string; readonly columns: readonly Column[]; readonly rows: readonly Row[]; readonly note?: string }
  | { readonly type: 'formulas'; readonly lines: readonly string[] }
  | { readonly type: 'list'; readonly items: readonly Prose[]; readonly ordered?: boolean }
  | { readonly type: 'chart'; readonly chart: ChartModel; readonly caption?: string };

export interface ReportSection {
  /** Stable id (anchor). */
  readonly id: string;
  /** "3" or "5.2". */
  readonly number: string;
  readonly title: string;
  readonly level: 1 | 2;
  /** Start this section on a new page. */
  readonly newPage?: boolean;
  readonly blocks: readonly Block[];
}

export interface AppendixTitle {
  readonly heading: string;
  readonly study: string;
  readonly site: string;
  /** Issue date, YYYY-MM-DD (from the injected clock). */
  readonly date: string;
  readonly version: string;
  readonly methodVersion: string;
  readonly units: 'si' | 'us';
  readonly inputDigest: string;
}

/** One scenario's finding, as the appendix states it (tests and pages read the same values). */
export interface AppendixRecommendation {
  readonly scenario: string;
  readonly criticalAircraft: string | null;
  readonly criticalAircraftName: string | null;
  readonly recommendedLength_m: number | null;
  readonly required_m: number | null;
  readonly governing: 'takeoff' | 'landing' | null;
}

export interface AppendixModel {
  readonly title: AppendixTitle;
  readonly caution: { readonly title: string; readonly text: string };
  readonly units: 'si' | 'us';
  readonly recommendations: readonly AppendixRecommendation[];
  readonly sections: readonly ReportSection[];
}

export interface AppendixModelInput {
  readonly input: StudyInput;
  readonly result: StudyResult;
  /** Chart models drawn from the result (core/report/charts.ts), in the order they appear. */
  readonly charts: readonly ChartModel[];
  /** SHA-256 (hex) of the canonical JSON of the input. */
  readonly inputDigest: string;
  /** Issue date, YYYY-MM-DD. */
  readonly date: string;
  /** Runwright version. */
  readonly version: string;
  /** The command that regenerates the appendix from the study file (shown in the listing). */
  readonly regenerateCommand?: string;
}

// ---------------------------------------------------------------------------------------------
// Cell helpers
// ---------------------------------------------------------------------------------------------

const t = (text: string, bold = false): Cell => (bold ? { text, bold } : { text });
const q = (si: number | null | undefined, kind: ValueKind, digits?: number): Cell =>
  digits === undefined ? { si, kind } : { si, kind, digits };
const exact = (si: number | null | undefined, kind: QuantityKind): Cell => ({ si, kind, listing: true });
const row = (...cells: Cell[]): Row => ({ cells });

const yesNo = (b: boolean): string => (b ? 'yes' : 'no');

/** Kind of a trace item from its SI unit; undefined when the formatter has no kind for it. */
export function kindOfUnit(unit: string): QuantityKind | 'percent' | undefined {
  switch (unit) {
    case 'm': return 'length';
    case 'kg': return 'mass';
    case 'm/s': return 'speed';
    case 's': return 'time';
    case 'N': return 'force';
    case 'W': return 'power';
    case '°C': case 'degC': return 'temperature';
    case '': case 'ratio': case '-': return 'ratio';
    case '%': return 'percent';
    case 'm²': case 'm2': return 'area';
    default: return undefined;
  }
}

function traceCell(item: TraceItem): Cell {
  const k = kindOfUnit(item.unit);
  if (k === 'percent') return { si: item.value / 100, kind: 'slopePct' };
  return k ? q(item.value, k) : { si: item.value, unit: item.unit };
}



// ---------------------------------------------------------------------------------------------
// Builder
// ---------------------------------------------------------------------------------------------

export function buildAppendixModel(args: AppendixModelInput): AppendixModel {
  const { input, result } = args;
  const units = result.options.units;
  const sections: ReportSection[] = [];
  let n = 0;
  const top = (id: string, title: string, blocks: Block[], newPage = false): void => {
    n += 1;
    sections.push({ id, number: String(n), title, level: 1, blocks, newPage });
  };
  const sub = (id: string, title: string, blocks: Block[], index: number, newPage = false): void => {
    sections.push({ id, number: `${n}.${index}`, title, level: 2, blocks, newPage });
  };

  const byId = new Map(input.aircraft.map((a) => [a.id, a] as const));

  // 1. Purpose and cautions
  top('purpose', 'Purpose and cautions', purposeBlocks(result));

  // 2. Site and design conditions
  top('site', 'Site and design conditions', siteBlocks(input, result));

  // 3. Fleet scenarios
  top('fleet', 'Fleet scenarios', fleetBlocks(input, result, byId));

  // 4. Method
  const entries = METHOD_ENTRIES;
  top('method', 'Method', methodIntroBlocks(result));
  entries.forEach((e, i) => {
    const blocks: Block[] = [{ type: 'paragraph', text: e.summary }, { type: 'formulas', lines: e.formulas }];
    if (e.symbols) blocks.push({ type: 'paragraph', text: e.symbols, style: 'note' });
    if (e.limits) blocks.push({ type: 'paragraph', text: `Validity and limits: ${e.limits}`, style: 'note' });
    blocks.push({ type: 'paragraph', text: `Sources: ${e.sources.map((s) => `[${s}]`).join(', ')}. Full write-up: docs/methods/${e.doc}.`, style: 'note' });
    sub(`method-${e.id}`, e.title, blocks, i + 1);
  });
  sub('references', 'References', [
    { type: 'list', items: referencesFor(entries).map((r) => `[${r.id}] ${r.text}`) },
  ], entries.length + 1);

  // 5. Results per scenario
  top('results', 'Results per scenario', [
    { type: 'paragraph', text: 'For each scenario: every fleet row with its design takeoff mass, takeoff and landing requirements, the governing case, the required length and the classification; then the components of each requirement. The critical aircraft is the regular-use aircraft with the greatest required length; the recommended length is its requirement rounded up to the planning increment.' },
  ], true);
  result.scenarios.forEach((s, i) => sub(`results-${i + 1}`, `Scenario: ${s.name}`, scenarioBlocks(s, byId), i + 1, i > 0));

  // 6. Comparison and recommendation
  top('comparison', 'Scenario comparison and recommendation', comparisonBlocks(result));

  // 7. Existing runway
  top('existing', 'Existing runway assessment', existingIntroBlocks(result));
  result.scenarios.forEach((s, i) => sub(`existing-${i + 1}`, `Existing runway: ${s.name}`, existingBlocks(s, result), i + 1));

  // 8. Charts
  top('charts', 'Charts', chartBlocks(args.charts), true);

  // 9. Assumptions and warnings
  top('assumptions', 'Assumptions and warnings', assumptionBlocks(result));

  // 10. Input listing
  top('inputs', 'Input listing and digest', listingBlocks(args), true);

  return {
    title: {
      heading: 'Runway length study: appendix',
      study: result.name,
      site: result.site.name,
      date: args.date,
      version: args.version,
      methodVersion: result.methodVersion,
      units,
      inputDigest: args.inputDigest,
    },
    caution: { title: CAUTION_TITLE, text: CAUTION_TEXT },
    units,
    recommendations: result.scenarios.map((s) => ({
      scenario: s.name,
      criticalAircraft: s.criticalAircraft,
      criticalAircraftName: s.criticalAircraftName,
      recommendedLength_m: s.recommendedLength_m,
      required_m: s.criticalRequired_m,
      governing: s.governing,
    })),
    sections,
  };
}

function purposeBlocks(result: StudyResult): Block[] {
  const cautions = result.cautions.length > 0 ? result.cautions : [CAUTION_TEXT];
  return [
    { type: 'paragraph', text: `This appendix documents the runway length requirement study "${result.name}" for ${result.site.name}. It sets out the site and design conditions, the fleet scenarios, the methods and their sources, the results with their components, the assessment of the existing runway, the assumptions and warnings, and every input value, so that a reviewer can check and reproduce each number.` },
    ...cautions.map((c): Block => ({ type: 'paragraph', text: c, style: 'caution' })),
    { type: 'list', items: [
      'The lengths are a preliminary planning estimate for a master plan or facility-requirements study.',
      "Final runway lengths follow the aircraft manufacturer's planning data, the advisory guidance of the aviation authority with jurisdiction, and review by a licensed engineer.",
      'This appendix is not for flight planning or dispatch.',
    ] },
  ];
}

function siteBlocks(input: StudyInput, result: StudyResult): Block[] {
  const s = result.site;
  const blocks: Block[] = [];
  blocks.push({ type: 'facts', items: [
    { label: 'Site', value: t(s.name) },
    { label: 'Aerodrome elevation', value: q(s.elevation_m, 'altitude') },
    { label: 'Pressure altitude used', value: q(s.pressureAltitude_m, 'altitude') },
    { label: 'Design temperature', value: q(s.designTemperature_c, 'temperature') },
    { label: 'Standard (ISA) temperature at the elevation', value: q(s.standardTemperature_c, 'temperature') },
    { label: 'Deviation from ISA', value: q(s.isaDeviation_c, 'temperatureDelta') },
    { label: 'Air density at design conditions', value: { si: s.density_kgm3, unit: 'kg/m³' } },
    { label: 'Density altitude', value: q(s.densityAltitude_m, 'altitude') },
    { label: 'Design runway (gradient used for takeoff)', value: t(s.designRunway) },
    { label: 'Uphill slope applied to the design takeoff', value: q(s.designSlope, 'slopePct') },
  ] });

  blocks.push({ type: 'subheading', text: 'How the design temperature was derived' });
  if (s.designTemperatureSource === 'given' || !s.climate) {
    blocks.push({ type: 'paragraph', text: 'The design temperature was entered with the study; it was not derived from climate data here. The reviewer should check its source.' });
  } else {
    const c = s.climate;
    const years = c.years !== undefined ? `${c.years} years of record` : 'number of years not stated';
    blocks.push({ type: 'facts', items: [
      { label: 'Data source', value: t(c.source) },
      { label: 'Years used', value: t(years) },
      { label: 'Hottest month by mean temperature (Annex 14 criterion)', value: t(monthName(c.hottestMonth)) },
      { label: 'Its mean daily maximum: aerodrome reference temperature', value: q(c.art_c, 'temperature') },
      { label: 'Month with the highest mean daily maximum', value: t(monthName(c.maxMeanMaxMonth)) },
      { label: 'Its mean daily maximum', value: q(c.maxMeanMax_c, 'temperature') },
      { label: 'The two criteria pick', value: t(c.monthsDiffer ? 'different months (see warnings)' : 'the same month') },
      ...(c.olderFormula_c !== undefined ? [{ label: 'Older formula Ta + (Tm - Ta)/3, for comparison', value: q(c.olderFormula_c, 'temperature') }] : []),
    ] });
    blocks.push({ type: 'paragraph', text: 'The design temperature is the aerodrome reference temperature: the monthly mean of the daily maximum temperatures of the hottest month, the hottest month being the one with the highest monthly mean temperature. The month with the highest mean daily maximum is shown beside it because runway-length guidance is also read that way.', style: 'note' });
    const monthly = input.site.climate?.monthly ?? [];
    if (monthly.length > 0) {
      blocks.push({
        type: 'table', caption: 'Monthly climate values used',
        columns: [{ title: 'Month', width: 1.4 }, { title: 'Mean daily max', kind: 'temperature' }, { title: 'Mean daily min', kind: 'temperature' }, { title: 'Mean', kind: 'temperature' }],
        rows: [...monthly].sort((a, b) => a.month - b.month).map((m) => row(
          t(monthName(m.month), m.month === c.hottestMonth),
          q(m.meanMax_c, 'temperature'),
          q(m.meanMin_c, 'temperature'),
          q(m.mean_c ?? (m.meanMin_c !== undefined ? (m.meanMax_c + m.meanMin_c) / 2 : undefined), 'temperature'),
        )),
        note: 'Mean = given mean, else (max + min)/2. The hottest month is in bold.',
      });
    }
  }

  blocks.push({ type: 'subheading', text: 'Runway profile and effective gradient' });
  blocks.push({
    type: 'table', caption: 'Runways',
    columns: [{ title: 'Runway' }, { title: 'Pavement' }, { title: 'Length', kind: 'length' }, { title: 'High point', kind: 'altitude' }, { title: 'Low point', kind: 'altitude' }, { title: 'Difference', kind: 'shortLength' }, { title: 'Effective gradient', kind: 'slopePct' }],
    rows: s.runways.map((r) => row(t(r.name), t(r.pavement), q(r.length_m, 'length'), q(r.highPoint_m, 'altitude'), q(r.lowPoint_m, 'altitude'), q(r.elevationDifference_m, 'shortLength'), q(r.effectiveGradient, 'slopePct'))),
    note: 'Effective gradient = (highest - lowest centreline elevation) / runway length.',
  });
  blocks.push({
    type: 'table', caption: 'Declared distances',
    columns: [{ title: 'Runway' }, { title: 'Direction' }, { title: 'TORA', kind: 'length' }, { title: 'TODA', kind: 'length' }, { title: 'ASDA', kind: 'length' }, { title: 'LDA', kind: 'length' }, { title: 'Stopway', kind: 'length' }, { title: 'Clearway', kind: 'length' }, { title: 'Takeoff slope', kind: 'slopePct' }],
    rows: s.runways.flatMap((r) => r.directions.map((d) => row(t(r.name), t(d.designator), q(d.tora_m, 'length'), q(d.toda_m, 'length'), q(d.asda_m, 'length'), q(d.lda_m, 'length'), q(d.stopway_m, 'length'), q(d.clearway_m, 'length'), q(d.slope, 'slopePct')))),
    note: 'Takeoff slope: average slope in the takeoff direction, positive uphill.',
  });
  return blocks;
}

function fleetBlocks(input: StudyInput, result: StudyResult, byId: ReadonlyMap<string, AircraftProfile>): Block[] {
  const blocks: Block[] = [
    { type: 'paragraph', text: `Regular use: an aircraft group with at least ${result.options.regularUseThreshold} annual operations (takeoffs and landings each count one). Each row gives the longest regular route (design stage length) and the payload flown on it; the design takeoff mass follows from them.` },
  ];
  const used = new Set(input.scenarios.flatMap((s) => s.fleet.map((r) => r.aircraft)));
  blocks.push({
    type: 'table', caption: 'Aircraft in the study',
    columns: [{ title: 'Aircraft', width: 1.8 }, { title: 'Id', width: 1.4 }, { title: 'Basis' }, { title: 'Engines', width: 1.2 }, { title: 'MTOW', kind: 'mass' }, { title: 'MLW', kind: 'mass' }, { title: 'Group', width: 1.2 }],
    rows: input.aircraft.filter((a) => used.has(a.id)).map((a) => row(t(a.name), t(a.id), t(a.certification), t(`${a.engineCount} x ${a.engineType}`), q(a.mtow_kg, 'mass'), q(a.mlw_kg, 'mass'), t(a.group ?? a.id))),
  });
  result.scenarios.forEach((s) => {
    blocks.push({
      type: 'table', caption: `Scenario "${s.name}": ${s.totalOperations.toLocaleString('en-US')} annual operations`,
      columns: [{ title: 'Aircraft', width: 2 }, { title: 'Operations', kind: 'count' }, { title: 'Group operations', kind: 'count' }, { title: 'Regular use' }, { title: 'Stage length', kind: 'distance' }, { title: 'Payload', kind: 'mass' }],
      rows: s.rows.map((r) => row(t(byId.get(r.aircraft)?.name ?? r.aircraftName), q(r.annualOperations, 'count'), q(r.groupOperations, 'count'), t(yesNo(r.regularUse)), q(r.route.stageLength_km * 1000, 'distance'), q(r.route.payload_kg, 'mass'))),
    });
  });
  return blocks;
}

function methodIntroBlocks(result: StudyResult): Block[] {
  const o = result.options;
  const rules = OPERATING_RULE_SET_INFO[o.operatingRules ?? DEFAULT_OPERATING_RULES];
  const alternate = qty.distance((o.reserves.alternate_km ?? (o.reserves.policy === 'custom' ? 0 : 370.4)) * 1000);
  const reserves: Notice = o.reserves.policy === 'custom'
    ? notice('report.reservesCustom')`custom (alternate ${alternate}, ${o.reserves.holding_min ?? 0} min)`
    : o.reserves.policy === 'international' ? notice('report.reservesInternational')`international (10 % trip time, alternate, 30 min hold)`
    : notice('report.reservesDomestic')`cruise plus alternate (${alternate}${o.reserves.alternate_km === undefined ? ', the 200 NM default' : ''}) plus 45 minutes`;
  return [
    { type: 'paragraph', text: `Method version ${result.methodVersion}. Each aircraft is sized at the site's design conditions from first-principles performance models and published correction methods; this section states the models, their formulas and their published sources. The references are listed at the end of the section.` },
    { type: 'facts', items: [
      { label: 'Primary takeoff method', value: t(STUDY_METHOD_LABEL[o.method]) },
      { label: 'Runway surface for the design case', value: t(SURFACE_LABELS[o.surface]) },
      { label: 'Landing temperature', value: t(o.landingTemperature === 'isa' ? 'ISA at the field (certified data basis)' : 'design temperature') },
      { label: 'Operating rules (landing factors)', value: t(`${rules.label}: ${rules.summary} (${rules.source})`) },
      { label: 'Light-aircraft factors', value: t(`takeoff × ${LIGHT_TAKEOFF_FACTOR_DEFAULT}, landing × ${LIGHT_LANDING_FACTOR_DEFAULT.toFixed(2)} unless the profile gives its own: ${LIGHT_FACTOR_SOURCE}`) },
      ...(o.referenceOverrideReason !== undefined ? [{ label: 'Override of the 35 % limit (recorded)', value: t(`corrected reference lengths beyond the 35 % limit of the percentage corrections govern. Reason given: "${o.referenceOverrideReason}"`) }] : []),
      { label: 'Fuel reserves for the design takeoff mass', value: { notice: reserves } },
      { label: 'Regular-use threshold', value: t(`${o.regularUseThreshold.toLocaleString('en-US')} annual operations`) },
      { label: 'Planning increment for the recommended length', value: q(o.roundingIncrement_m, 'length') },
      { label: 'Mass per passenger (payload penalties)', value: q(o.passengerMass_kg, 'mass') },
    ] },
  ];
}

/**
 * Whether a row is climb-limited: its engine-out climb gradient at V2 misses the minimum at the takeoff
 * mass used, or the study had to size it below the mass its route needs (the study sizes a climb-limited
 * aircraft at the greatest mass that meets the climb minimum and reports the offload).
 */
export function climbLimitedRow(r: RowResult): boolean {
  return r.takeoff?.climbLimited === true || r.climbOffload_kg !== undefined;
}

function takeoffCaseText(r: RowResult): string {
  if (r.status !== 'ok') return 'cannot operate';
  const g = r.governing === 'takeoff' && r.takeoff ? `takeoff (${r.takeoff.governing})` : r.governing;
  return climbLimitedRow(r) ? `${g}; climb-limited` : g;
}

function scenarioBlocks(s: ScenarioResult, byId: ReadonlyMap<string, AircraftProfile>): Block[] {
  const blocks: Block[] = [];
  blocks.push({ type: 'facts', items: [
    { label: 'Critical aircraft', value: t(s.criticalAircraftName ?? 'none (no regular-use aircraft can operate)', true) },
    { label: 'Recommended runway length', value: { si: s.recommendedLength_m, kind: 'lengthBoth' } },
    { label: 'Requirement of the critical aircraft (before rounding)', value: q(s.criticalRequired_m, 'length') },
    { label: 'Governing case', value: t(s.governing ?? '—') },
    { label: 'Runway design code', value: t(s.runwayDesignCode ?? '—') },
    { label: 'Annual operations in the scenario', value: q(s.totalOperations, 'count') },
  ] });
  blocks.push({
    type: 'table', caption: `Requirements per aircraft: ${s.name}`,
    columns: [
      { title: 'Aircraft', width: 2 }, { title: 'Regular use', width: 0.8 }, { title: 'Takeoff mass', kind: 'mass', width: 1.1 },
      { title: 'Takeoff', kind: 'length' }, { title: 'Landing', kind: 'length' }, { title: 'Governing case', width: 1.8 },
      { title: 'Required', kind: 'length' }, { title: 'ICAO code', width: 0.8 }, { title: 'RDC', width: 0.7 },
    ],
    rows: s.rows.map((r) => row(
      t(r.aircraftName, r.aircraft === s.criticalAircraft),
      t(yesNo(r.regularUse)),
      q(r.takeoffMass_kg, 'mass'),
      q(r.status === 'ok' ? r.requiredTakeoff_m : null, 'length'),
      q(r.status === 'ok' ? r.requiredLanding_m : null, 'length'),
      t(takeoffCaseText(r)),
      q(r.status === 'ok' ? r.required_m : null, 'length', undefined),
      t(r.classification.aerodromeCode),
      t(r.classification.runwayDesignCode),
    )),
    note: 'The critical aircraft is in bold. RDC: runway design code (approach category and design group).',
  });
  const unable = s.rows.filter((r) => r.status !== 'ok');
  if (unable.length > 0) {
    blocks.push({ type: 'list', items: unable.map((r) => (r.reason ? notice('report.cannotOperate')`${r.aircraftName}: cannot operate here. ${r.reason}` : `${r.aircraftName}: cannot operate here.`)) });
  }
  if (s.excluded.length > 0) {
    const each = s.excluded.map((e) => notice('report.notEligibleAircraft')`${byId.get(e.aircraft)?.name ?? e.aircraft} (${e.reason})`);
    blocks.push({ type: 'paragraph', text: notice('report.notEligible')`Not eligible as critical aircraft: ${each}.`, style: 'note' });
  }

  // Components of each requirement: one column per aircraft, in chunks that fit the page width.
  const perTable = Math.ceil(s.rows.length / Math.max(1, Math.ceil(s.rows.length / COMPONENT_COLUMNS)));
  for (let i = 0; i < s.rows.length; i += perTable) {
    const chunk = s.rows.slice(i, i + perTable);
    const part = s.rows.length > COMPONENT_COLUMNS ? ` (aircraft ${i + 1}-${i + chunk.length} of ${s.rows.length})` : '';
    blocks.push({
      type: 'table', caption: `Components of each requirement: ${s.name}${part}`,
      columns: [{ title: 'Item', width: 2.5 }, ...chunk.map((r): Column => ({ title: r.aircraftName, align: 'right', width: 1 }))],
      rows: componentRows(chunk),
      note: 'Speeds are true airspeeds at the site. Takeoff distances are at the design takeoff mass; landing at the landing mass shown.',
    });
  }
  return blocks;
}

/** Aircraft per components table at most (a larger fleet is split into tables of even size). */
const COMPONENT_COLUMNS = 7;

/** A line of the components table: a label and, per aircraft, a value (undefined = not applicable). */
interface ComponentLine { readonly label: string; readonly value: (r: RowResult) => Cell | undefined; readonly bold?: boolean }

/** One section of a row's components: its lines, each with a cell per row (undefined: not applicable). */
export interface ComponentSection {
  readonly title: string;
  readonly lines: readonly { readonly label: string; readonly bold: boolean; readonly cells: readonly (Cell | undefined)[] }[];
}

/** The components table as rows of the appendix (a column per aircraft). */
function componentRows(rows: readonly RowResult[]): Row[] {
  return componentSections(rows).flatMap((s): Row[] => [
    { group: s.title },
    ...s.lines.map((l) => row(t(l.label, l.bold), ...l.cells.map((c) => c ?? t('—')))),
  ]);
}

/**
 * The components of result rows, section by section: the one list of labels and values that the
 * appendix's components table and the results page's "components" fragment both render, so the two
 * never differ in a label or a number. Lines no row has are left out.
 */
export function componentSections(rows: readonly RowResult[]): ComponentSection[] {
  const out: ComponentSection[] = [];
  const section = (title: string, lines: readonly ComponentLine[]): void => {
    const used = lines.filter((l) => rows.some((r) => l.value(r) !== undefined));
    if (used.length === 0) return;
    out.push({ title, lines: used.map((l) => ({ label: l.label, bold: l.bold ?? false, cells: rows.map((r) => l.value(r)) })) });
  };
  const ok = (r: RowResult): boolean => r.status === 'ok';
  const labels = (get: (r: RowResult) => readonly TraceItem[] | undefined): string[] => {
    const seen: string[] = [];
    for (const r of rows) for (const c of get(r) ?? []) if (!seen.includes(c.label)) seen.push(c.label);
    return seen;
  };
  const trace = (get: (r: RowResult) => readonly TraceItem[] | undefined, label: string) => (r: RowResult): Cell | undefined => {
    const c = get(r)?.find((x) => x.label === label);
    return c ? traceCell(c) : undefined;
  };
  const takeoffTrace = (r: RowResult) => (ok(r) ? r.takeoff?.components : undefined);
  const landingTrace = (r: RowResult) => (ok(r) ? r.landing?.components : undefined);

  section('Design mass from the route', [
    { label: 'Annual operations', value: (r) => q(r.annualOperations, 'count') },
    { label: 'Regular use', value: (r) => t(yesNo(r.regularUse)) },
    { label: 'Design stage length', value: (r) => q(r.route.stageLength_km * 1000, 'distance') },
    { label: 'Payload requested', value: (r) => q(r.route.payload_kg, 'mass') },
    { label: 'Route status', value: (r) => t(r.route.status) },
    { label: 'Payload left behind', value: (r) => (r.route.payloadLeftBehind_kg > 0 ? q(r.route.payloadLeftBehind_kg, 'mass') : undefined) },
    { label: 'Trip fuel', value: (r) => q(r.route.tripFuel_kg, 'mass') },
    { label: 'Reserve fuel', value: (r) => q(r.route.reserveFuel_kg, 'mass') },
    { label: 'Takeoff mass the route needs', value: (r) => q(r.route.takeoffMass_kg, 'mass') },
    { label: 'Offload to meet the climb minimum', value: (r) => (r.climbOffload_kg !== undefined ? q(r.climbOffload_kg, 'mass') : undefined) },
    { label: 'Design takeoff mass (used)', value: (r) => q(r.takeoffMass_kg, 'mass'), bold: true },
    { label: 'Arrival mass', value: (r) => q(r.route.arrivalMass_kg, 'mass') },
    { label: 'Cannot operate here', value: (r) => (ok(r) ? undefined : r.reason ? { notice: r.reason, bold: true } : t('cannot operate', true)) },
  ]);
  section('Takeoff', [
    ...labels(takeoffTrace).map((label): ComponentLine => ({ label, value: trace(takeoffTrace, label) })),
    { label: 'V1', value: (r) => (ok(r) && r.takeoff?.v1_mps !== undefined ? q(r.takeoff.v1_mps, 'speed') : undefined) },
    { label: 'VR', value: (r) => (ok(r) && r.takeoff?.vr_mps !== undefined ? q(r.takeoff.vr_mps, 'speed') : undefined) },
    { label: 'V2', value: (r) => (ok(r) && r.takeoff?.v2_mps !== undefined ? q(r.takeoff.v2_mps, 'speed') : undefined) },
    { label: 'Climb gradient at V2 (engine out for twins)', value: (r) => (ok(r) && r.takeoff?.climbGradient !== undefined ? q(r.takeoff.climbGradient, 'slopePct') : undefined) },
    { label: 'Minimum climb gradient', value: (r) => (ok(r) && r.takeoff?.climbMinimum !== undefined ? q(r.takeoff.climbMinimum, 'slopePct', 1) : undefined) },
    { label: 'Climb-limited', value: (r) => (ok(r) && r.takeoff ? t(climbLimitedRow(r) ? 'CLIMB-LIMITED' : 'no', climbLimitedRow(r)) : undefined) },
    { label: 'Greatest mass meeting the climb minimum', value: (r) => (ok(r) && r.takeoff?.climbLimited && r.takeoff.climbMaxMass_kg !== undefined ? q(r.takeoff.climbMaxMass_kg, 'mass') : undefined) },
    { label: 'Performance model (shown beside)', value: (r) => (ok(r) && r.takeoff && r.takeoff.method !== 'physics' && r.takeoff.physics_m !== undefined ? q(r.takeoff.physics_m, 'length') : undefined) },
    { label: 'Reference length with corrections', value: (r) => (ok(r) && r.takeoff?.reference_m !== undefined ? q(r.takeoff.reference_m, 'length') : undefined) },
    { label: 'Calibration factor', value: (r) => (ok(r) && r.takeoff?.calibrationFactor !== undefined ? q(r.takeoff.calibrationFactor, 'ratio') : undefined) },
    { label: 'Torenbeek balanced field length (indicative)', value: (r) => (ok(r) && r.takeoff?.torenbeek_m !== undefined ? q(r.takeoff.torenbeek_m, 'length') : undefined) },
    { label: 'Roskam takeoff length (indicative)', value: (r) => (ok(r) && r.takeoff?.roskam_m !== undefined ? q(r.takeoff.roskam_m, 'length') : undefined) },
    { label: 'Takeoff governing case', value: (r) => (ok(r) && r.takeoff ? t(r.takeoff.governing) : undefined) },
    { label: 'Takeoff requirement from', value: (r) => (ok(r) && r.takeoff ? t(r.takeoff.source ?? 'physics model') : undefined) },
    { label: 'Takeoff requirement', value: (r) => (ok(r) && r.takeoff ? q(r.takeoff.required_m, 'length') : undefined), bold: true },
  ]);
  section('Landing', [
    { label: 'Landing mass', value: (r) => (ok(r) && r.landing ? q(r.landing.mass_kg, 'mass') : undefined) },
    { label: 'VREF', value: (r) => (ok(r) && r.landing ? q(r.landing.vref_mps, 'speed') : undefined) },
    ...labels(landingTrace).map((label): ComponentLine => ({ label, value: trace(landingTrace, label) })),
    { label: 'Operating rule', value: (r) => (ok(r) && r.landing ? t(r.landing.rule) : undefined) },
    { label: 'Source of the landing factor', value: (r) => (ok(r) && r.landing?.ruleSource ? t(r.landing.ruleSource) : undefined) },
    { label: 'Factor on the landing distance', value: (r) => (ok(r) && r.landing ? q(r.landing.factor, 'ratio') : undefined) },
    { label: 'Roskam landing field length (indicative)', value: (r) => (ok(r) && r.landing?.roskam_m !== undefined ? q(r.landing.roskam_m, 'length') : undefined) },
    { label: 'Landing requirement', value: (r) => (ok(r) && r.landing ? q(r.landing.required_m, 'length') : undefined), bold: true },
  ]);
  // Every method's takeoff figure at the design conditions and mass, with the reason for a gap or a
  // large difference (the row's own method in bold).
  const methodLabels = [...new Set(rows.flatMap((r) => (ok(r) ? r.takeoff?.spread ?? [] : []).map((f) => f.label)))];
  const figure = (r: RowResult, label: string): MethodFigure | undefined => (ok(r) ? r.takeoff?.spread?.find((f) => f.label === label) : undefined);
  section('Takeoff by method at design conditions', [
    ...methodLabels.map((label): ComponentLine => ({
      label,
      value: (r) => {
        const f = figure(r, label);
        if (!f) return undefined;
        if (f.length_m === undefined) return f.note ? { notice: f.note } : t('—');
        if (f.note) return { notice: notice('report.methodFigure')`${qty.length(f.length_m)} (${f.note})`, bold: f.governs };
        // The figure that gave the row's number, in bold (a quantity cell has no weight of its own).
        return f.governs ? { notice: notice('report.methodFigureGoverns')`${qty.length(f.length_m)}`, bold: true } : q(f.length_m, 'length');
      },
    })),
    {
      label: 'Spread of the figures (largest − smallest)',
      value: (r) => {
        const ls = (ok(r) ? r.takeoff?.spread ?? [] : []).flatMap((f) => (f.length_m === undefined ? [] : [f.length_m]));
        return ls.length < 2 ? undefined : q(Math.max(...ls) - Math.min(...ls), 'length');
      },
    },
  ]);
  section('Requirement and classification', [
    { label: 'Governing', value: (r) => (ok(r) ? t(r.governing) : undefined) },
    { label: 'Required length', value: (r) => (ok(r) ? q(r.required_m, 'length') : undefined), bold: true },
    { label: 'ICAO aerodrome reference code', value: (r) => t(r.classification.aerodromeCode) },
    { label: 'Aeroplane reference field length', value: (r) => q(r.classification.arfl_m, 'length') },
    { label: 'Aeroplane reference field length from', value: (r) => t(r.classification.arfl_m === undefined ? 'none: the physics model finds no takeoff at MTOW, sea level, ISA' : r.classification.arflSource) },
    { label: 'Approach category (VREF at MLW)', value: (r) => t(r.classification.approachCategory) },
    { label: 'Design group', value: (r) => t(r.classification.designGroup) },
  ]);
  return out;
}

function comparisonBlocks(result: StudyResult): Block[] {
  const blocks: Block[] = [
    {
      type: 'table', caption: 'Scenarios side by side',
      columns: [{ title: 'Scenario', width: 1.6 }, { title: 'Critical aircraft', width: 1.6 }, { title: 'Recommended length', kind: 'lengthBoth', width: 1.6, align: 'right' }, { title: 'Governing' }, { title: 'RDC', width: 0.7 }, { title: 'Regular-use aircraft', kind: 'count' }],
      rows: result.comparison.map((c) => row(t(c.scenario), t(c.criticalAircraftName ?? 'none', true), { si: c.recommendedLength_m, kind: 'lengthBoth' }, t(c.governing ?? '—'), t(c.runwayDesignCode ?? '—'), q(c.regularUseAircraft, 'count'))),
    },
    { type: 'subheading', text: 'Recommendation' },
  ];
  for (const s of result.scenarios) {
    if (s.recommendedLength_m === null || s.criticalAircraftName === null) {
      blocks.push({ type: 'paragraph', text: `${s.name}: no regular-use aircraft can operate at this site; no length is recommended.` });
    } else {
      blocks.push({ type: 'facts', items: [
        { label: s.name, value: t(`critical aircraft ${s.criticalAircraftName}, ${s.governing ?? ''} governs`) },
        { label: 'Recommended length', value: { si: s.recommendedLength_m, kind: 'lengthBoth' } },
      ] });
    }
  }
  blocks.push({ type: 'paragraph', text: 'The recommended length is the requirement of the critical aircraft rounded up to the planning increment. It is a preliminary planning estimate; see Section 1.', style: 'note' });
  return blocks;
}

function existingIntroBlocks(result: StudyResult): Block[] {
  return [
    { type: 'paragraph', text: 'For each aircraft that can operate, the needs at its design takeoff mass are set against the declared distances of each runway direction at design conditions. Where a distance falls short, the greatest takeoff mass the declared distances allow is found, with the payload that can then fly the design stage and the range with the design payload; the differences are the penalties of operating from the existing runway.' },
    { type: 'paragraph', text: notice('report.passengerMass')`Penalties in passengers use ${qty.mass(result.options.passengerMass_kg)} per passenger with baggage.`, style: 'note' },
  ];
}

function existingBlocks(s: ScenarioResult, result: StudyResult): Block[] {
  const ok = s.rows.filter((r) => r.status === 'ok' && r.existing.length > 0);
  if (ok.length === 0) return [{ type: 'paragraph', text: 'No aircraft in this scenario can operate; nothing to assess.' }];
  const need: Row[] = [];
  const mass: Row[] = [];
  for (const r of ok) {
    const mark = r.aircraft === s.criticalAircraft ? ' (critical)' : r.regularUse ? '' : ' (not regular use)';
    need.push({ group: `${r.aircraftName}${mark}` });
    mass.push({ group: `${r.aircraftName}${mark}` });
    for (const e of r.existing) {
      need.push(row(
        t(`${e.runway} / ${e.designator}`),
        pair(e.takeoffRunNeeded_m, e.tora_m), pair(e.takeoffDistanceNeeded_m, e.toda_m),
        pair(e.accelerateStopNeeded_m, e.asda_m), pair(e.landingNeeded_m, e.lda_m),
        t(e.takeoffOk ? 'yes' : 'NO', !e.takeoffOk), t(e.landingOk ? 'yes' : 'NO', !e.landingOk),
      ));
      mass.push(row(
        t(`${e.runway} / ${e.designator}`),
        q(e.maxTakeoffMass_kg, 'mass'), t(e.limitedBy),
        penalty(e.payloadPenalty_kg, e.takeoffOk, 'mass'),
        penalty(e.passengersPenalty, e.takeoffOk, 'passengers'),
        penalty(e.rangePenalty_km === undefined ? undefined : e.rangePenalty_km * 1000, e.takeoffOk, 'distance'),
        q(e.maxLandingMass_kg, 'mass'),
      ));
      if (e.note) mass.push({ note: notice('report.runwayNotes')`${e.note}` });
    }
  }
  return [
    {
      type: 'table', caption: `Needed / declared distances at the design takeoff mass: ${s.name}`,
      columns: [{ title: 'Runway / direction', width: 1.3 }, { title: 'Takeoff run / TORA', kind: 'length', align: 'right' }, { title: 'Takeoff distance / TODA', kind: 'length', align: 'right' }, { title: 'Accelerate-stop / ASDA', kind: 'length', align: 'right' }, { title: 'Landing / LDA', kind: 'length', align: 'right' }, { title: 'Takeoff fits', width: 0.7 }, { title: 'Landing fits', width: 0.7 }],
      rows: need,
      note: 'Each cell: needed / declared (rounded to display units; the comparison uses unrounded values).',
    },
    {
      type: 'table', caption: `Greatest takeoff mass and penalties: ${s.name}`,
      columns: [{ title: 'Runway / direction', width: 1.3 }, { title: 'Greatest takeoff mass', kind: 'mass' }, { title: 'Limited by', width: 0.8 }, { title: 'Payload penalty', kind: 'mass' }, { title: 'Passengers', kind: 'passengers', width: 0.8 }, { title: 'Range penalty', kind: 'distance', width: 1.1 }, { title: 'Greatest landing mass', kind: 'mass' }],
      rows: mass,
      note: 'Penalties against the design payload and stage length of the fleet row; "none" where the runway allows the design mass.',
    },
  ];
}

const pair = (a: number | undefined, b: number): Cell => ({ pair: [a, b], kind: 'length', bold: a !== undefined && a > b });

/** A penalty: "none" when there is none (or the design mass fits), else the value. */
function penalty(v: number | undefined, fits: boolean, kind: ValueKind): Cell {
  if (v === undefined) return t(fits ? 'none' : '—');
  return v <= 0 ? t('none') : q(v, kind);
}

function chartBlocks(charts: readonly ChartModel[]): Block[] {
  if (charts.length === 0) return [{ type: 'paragraph', text: 'No charts: the study has no results to plot.' }];
  return [
    { type: 'paragraph', text: 'The charts are drawn from the same chart models as the results pages.' },
    ...charts.map((c): Block => ({ type: 'chart', chart: c })),
  ];
}

function assumptionBlocks(result: StudyResult): Block[] {
  const o = result.options;
  const assumptions = [
    `Design conditions: ${result.site.name} at the design temperature; pressure altitude equal to the aerodrome elevation; dry air.`,
    `Runway surface for the design case: ${SURFACE_LABELS[o.surface].toLowerCase()}; zero wind.`,
    `Takeoff uphill slope: the effective gradient of runway ${result.site.designRunway}.`,
    o.landingTemperature === 'isa'
      ? 'Landing at ISA temperature at the field elevation (certified landing data are scheduled for standard temperature).'
      : 'Landing at the design temperature (more demanding than the certified data basis).',
    `Design takeoff mass from the longest regular route and its payload, with fuel reserves carried and not burnt; ${o.landingMass === 'route'
      ? 'landing at the arrival mass of that route (at most the maximum landing mass).'
      : 'landing at the maximum landing mass (conservative; the arrival mass is not credited).'}`,
    'No reverse thrust is credited; no obstacle-limited takeoff path is assessed.',
    `Regular use at ${o.regularUseThreshold.toLocaleString('en-US')} annual operations per aircraft group; the recommended length is rounded up to the planning increment.`,
    'Aircraft performance profiles are planning profiles; where the manufacturer\'s planning data exist, they take precedence.',
  ];
  const warnings: Notice[] = [];
  const seen = new Set<string>();
  const add = (prefix: string, ws: readonly Notice[]): void => {
    for (const w of ws) {
      const key = JSON.stringify(w);
      if (seen.has(key)) continue;
      seen.add(key);
      warnings.push(prefix ? scoped(prefix, w) : w);
    }
  };
  add('', result.warnings);
  add('Site', result.site.warnings);
  for (const r of result.site.runways) add(`Runway ${r.name}`, r.warnings);
  for (const s of result.scenarios) add(s.name, s.warnings);
  // Aircraft warnings: one line per aircraft and warning, naming the scenarios where it arose.
  const byAircraft = new Map<string, { name: string; warning: Notice; scenarios: string[] }>();
  const climb: string[] = [];
  for (const s of result.scenarios) {
    for (const r of s.rows) {
      if (climbLimitedRow(r)) {
        climb.push(r.takeoff?.climbLimited
          ? `CLIMB-LIMITED: ${r.aircraftName} in "${s.name}": a takeoff climb gradient (first or second segment; the row warnings name which) is below the regulatory minimum at the takeoff mass used, which a longer runway cannot cure.`
          : `CLIMB-LIMITED: ${r.aircraftName} in "${s.name}": at the takeoff mass its route needs, a takeoff climb gradient (first segment at lift-off or second segment at V2; the row warnings name which) is below the regulatory minimum, which a longer runway cannot cure; the runway is sized at the greatest mass that meets the minimum (offload in Section 5).`);
      }
      for (const w of r.warnings) {
        const key = `${r.aircraftName}\u0000${JSON.stringify(w)}`;
        const entry = byAircraft.get(key);
        if (entry) { if (!entry.scenarios.includes(s.name)) entry.scenarios.push(s.name); }
        else byAircraft.set(key, { name: r.aircraftName, warning: w, scenarios: [s.name] });
      }
    }
  }
  for (const e of byAircraft.values()) {
    const where = e.scenarios.length === result.scenarios.length && result.scenarios.length > 1 ? 'all scenarios' : e.scenarios.join('; ');
    warnings.push(scoped(`${e.name} (${where})`, e.warning));
  }
  return [
    { type: 'subheading', text: 'Assumptions' },
    { type: 'list', items: assumptions },
    { type: 'subheading', text: 'Warnings raised by the computation' },
    ...climb.map((c): Block => ({ type: 'paragraph', text: c, style: 'caution' })),
    warnings.length > 0 ? { type: 'list', items: warnings } : { type: 'paragraph', text: 'None.' },
  ];
}

/** Reference-table values listed at most (the attached file has them all). */
const REFERENCE_TABLE_ROWS = 240;

/** Aircraft per listing table (columns). */
const LISTING_AIRCRAFT_PER_TABLE = 4;

function listingBlocks(args: AppendixModelInput): Block[] {
  const { input } = args;
  const site = input.site;
  const blocks: Block[] = [
    { type: 'paragraph', text: 'Every input value of the study, in the study\'s units, to six significant digits. The exact input, in SI units as stored, is attached to this PDF as the file "study-input.json" (open the attachments panel of the PDF reader, or run pdfdetach). The digest below is the SHA-256 of the canonical JSON of that input (keys sorted, no spaces); running the study file again prints the same digest. Run the command shown on that file to regenerate this appendix with the same numbers.' },
    { type: 'facts', items: [
      { label: 'SHA-256 of the canonical input', value: { text: args.inputDigest, mono: true } },
      { label: 'Regenerate with', value: t(args.regenerateCommand ?? 'npm run study -- study-input.json --format pdf --out appendix.pdf') },
      { label: 'Runwright version', value: t(args.version) },
      { label: 'Method version', value: t(args.result.methodVersion) },
    ] },
    { type: 'subheading', text: 'Study and site' },
    { type: 'facts', items: [
      { label: 'Study name', value: t(input.name) },
      { label: 'Site name', value: t(site.name) },
      // Every numeric site field from its table (core/studyFields.ts); an absent optional one says so.
      ...SITE_FIELDS.map((f) => {
        const v = (site as unknown as Record<string, number | undefined>)[f.key];
        return { label: f.label, value: v !== undefined ? exact(v, f.kind) : t(f.key === 'designTemperature_c' ? 'not given: derived from the climate data' : 'not given') };
      }),
      ...(site.climate ? [
        { label: 'Climate source', value: t(site.climate.source) },
        ...CLIMATE_FIELDS.map((f) => {
          const v = (site.climate as unknown as Record<string, number | undefined>)[f.key];
          return { label: f.label, value: t(v !== undefined ? String(v) : 'not stated') };
        }),
      ] : []),
    ] },
  ];
  if (site.climate) {
    blocks.push({
      type: 'table', caption: 'Climate: monthly values',
      columns: [{ title: 'Month' }, ...MONTHLY_FIELDS.map((f): Column => ({ title: f.label, kind: f.kind }))],
      rows: [...site.climate.monthly].sort((a, b) => a.month - b.month)
        .map((m) => row(t(String(m.month)), ...MONTHLY_FIELDS.map((f) => exact((m as unknown as Record<string, number | undefined>)[f.key], f.kind)))),
    });
  }
  for (const r of site.runways) {
    blocks.push({
      type: 'table', caption: `Runway ${r.name} (${r.pavement}): centreline profile`,
      columns: [{ title: 'Point' }, ...PROFILE_POINT_FIELDS.map((f): Column => ({ title: f.label, kind: f.kind }))],
      rows: r.profile.map((p, i) => row(t(String(i + 1)), ...PROFILE_POINT_FIELDS.map((f) => exact((p as unknown as Record<string, number>)[f.key], f.kind)))),
    });
    blocks.push({
      type: 'table', caption: `Runway ${r.name}: declared distances`,
      columns: [{ title: 'Direction' }, ...DIRECTION_FIELDS.map((f): Column => ({ title: f.label, kind: f.kind }))],
      rows: r.directions.map((d) => row(t(d.designator), ...DIRECTION_FIELDS.map((f) => exact((d as unknown as Record<string, number>)[f.key], f.kind)))),
    });
  }
  blocks.push({ type: 'subheading', text: 'Aircraft profiles' });
  for (let i = 0; i < input.aircraft.length; i += LISTING_AIRCRAFT_PER_TABLE) {
    blocks.push(aircraftListing(input.aircraft.slice(i, i + LISTING_AIRCRAFT_PER_TABLE)));
  }
  for (const a of input.aircraft) {
    const tb = a.reference?.table;
    if (!tb) continue;
    const rows: Row[] = [];
    tb.mass_kg.forEach((m, i) => tb.elevation_m.forEach((e, j) => tb.temperature_c.forEach((c, k) => {
      rows.push(row(exact(m, 'mass'), exact(e, 'altitude'), exact(c, 'temperature'), exact(tb.length_m[i]?.[j]?.[k], 'length')));
    })));
    const shown = rows.slice(0, REFERENCE_TABLE_ROWS);
    blocks.push({
      type: 'table', caption: `Reference takeoff lengths: ${a.name}`,
      columns: [{ title: 'Mass', kind: 'mass' }, { title: 'Elevation', kind: 'altitude' }, { title: 'Temperature', kind: 'temperature' }, { title: 'Takeoff length', kind: 'length' }],
      rows: shown,
      ...(rows.length > shown.length ? { note: `First ${shown.length} of ${rows.length} values; all are in the attached study file.` } : {}),
    });
  }
  blocks.push({ type: 'subheading', text: 'Fleet rows' });
  blocks.push({
    type: 'table', caption: 'Scenarios and fleet rows',
    // Columns from FLEET_FIELDS; values the file holds in km are listed as stored.
    columns: [{ title: 'Scenario', width: 1.5 }, { title: 'Aircraft id', width: 1.3 },
      ...FLEET_FIELDS.map((f): Column => (f.key.endsWith('_km') ? { title: `${f.label} (km)`, align: 'right' } : { title: f.label, kind: f.kind }))],
    rows: input.scenarios.flatMap((s) => s.fleet.map((fr) => row(t(s.name), t(fr.aircraft), ...FLEET_FIELDS.map((f) => {
      const v = (fr as unknown as Record<string, number>)[f.key]!;
      return f.key.endsWith('_km') ? t(exactNumber(v)) : exact(v, f.kind);
    })))),
    note: 'Stage lengths are listed in km, as stored in the study file.',
  });
  blocks.push({ type: 'subheading', text: 'Options' });
  blocks.push({ type: 'facts', items: optionListing(input.options) });
  return blocks;
}

/**
 * Every study option, one fact per row of STUDY_OPTION_FIELDS (core/studyFields.ts): a new option is
 * listed without touching this function. An option left out of the file says so.
 */
export function optionListing(options: StudyInput['options']): { label: string; value: Cell }[] {
  return STUDY_OPTION_FIELDS.map((f) => {
    const v = optionValue(options, f.path);
    if (v === undefined) return { label: f.label, value: t(f.path === 'roundingIncrement_m' ? 'default for the units' : 'not given') };
    if (typeof v === 'number' && f.kind !== 'choice' && f.kind !== 'text') {
      // Values the file holds in km are shown as distances (km or NM).
      return { label: f.label, value: f.path.endsWith('_km') ? exact(v * 1000, 'distance') : exact(v, f.kind === 'slopePct' ? 'ratio' : f.kind) };
    }
    return { label: f.label, value: t(String(v)) };
  });
}

/** A number with all its significant digits (up to 12), no grouping. */
export function exactNumber(v: number): string {
  if (!Number.isFinite(v)) return '—';
  return String(Number(v.toPrecision(12)));
}

function aircraftListing(aircraft: readonly AircraftProfile[]): Block {
  const rows: Row[] = [];
  const textRow = (label: string, get: (a: AircraftProfile) => string): void => {
    rows.push(row(t(label), ...aircraft.map((a) => t(get(a)))));
  };
  textRow('Id', (a) => a.id);
  textRow('Group', (a) => a.group ?? a.id);
  textRow('Certification basis', (a) => a.certification);
  textRow('Engine type', (a) => a.engineType);
  textRow('Gear', (a) => a.gear);
  textRow('Thrust lapse model', (a) => a.thrustLapse ?? (a.engineType === 'turbofan' ? 'mattingly' : '—'));
  for (const f of AIRCRAFT_FIELDS) {
    const vals = aircraft.map((a) => (a as unknown as Record<string, unknown>)[f.key]);
    if (vals.every((v) => v === undefined)) continue;
    rows.push(row(t(f.label), ...vals.map((v) => (typeof v === 'number' ? exact(v, f.kind) : t('—')))));
  }
  if (aircraft.some((a) => a.cruise)) {
    rows.push({ group: 'Cruise and fuel' });
    for (const f of CRUISE_FIELDS) {
      const vals = aircraft.map((a) => (a.cruise as unknown as Record<string, unknown> | undefined)?.[f.key]);
      if (vals.every((v) => v === undefined)) continue;
      rows.push(row(t(f.label), ...vals.map((v) => (typeof v === 'number' ? exact(v, f.kind) : t('—')))));
    }
  }
  if (aircraft.some((a) => a.reference)) {
    rows.push({ group: 'Reference lengths' });
    rows.push(row(t('Takeoff, MTOW, sea level, ISA'), ...aircraft.map((a) => (a.reference?.takeoff_m !== undefined ? exact(a.reference.takeoff_m, 'length') : t('—')))));
    rows.push(row(t('Landing, MLW, sea level'), ...aircraft.map((a) => (a.reference?.landing_m !== undefined ? exact(a.reference.landing_m, 'length') : t('—')))));
    if (aircraft.some((a) => a.reference?.table)) {
      rows.push(row(t('Reference table (mass x elevation x temperature)'), ...aircraft.map((a) => {
        const tb = a.reference?.table;
        return t(tb ? `${tb.mass_kg.length} x ${tb.elevation_m.length} x ${tb.temperature_c.length} values (listed below)` : '—');
      })));
    }
  }
  return {
    type: 'table',
    caption: `Aircraft profiles: ${aircraft.map((a) => a.name).join(', ')}`,
    columns: [{ title: 'Field', width: 2.2 }, ...aircraft.map((a): Column => ({ title: a.name, align: 'right', width: 1.2 }))],
    rows,
    note: 'Each value in the unit shown in its row, to six significant digits.',
  };
}
