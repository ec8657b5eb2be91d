/**
 * Chart models of a study result (SI values; the renderers convert for display):
 * - required length against temperature, per aircraft (the sensitivity sweep), with the design
 *   temperature and the longest existing takeoff run marked;
 * - takeoff and landing requirements of each aircraft of a scenario against the existing runway;
 * - operations served against runway length, one step curve per scenario;
 * - payload-range of each critical aircraft, with the curve the existing runway allows.
 * The web page (SVG) and the PDF draw exactly these models, built from the saved result alone (the
 * payload-range series are computed with the study, core/study/run.ts).
 */
import { isOperating } from '../study/run.js';
import type { PayloadRangeSeries, StudyResult, ScenarioResult } from '../study/types.js';
import type { ChartModel, ChartPoint, ChartSeries } from './chart.js';
import { notice, qty } from '../notices.js';

function longestTakeoffRun(result: StudyResult): { length_m: number; label: string } | undefined {
  let best: { length_m: number; label: string } | undefined;
  for (const r of result.site.runways) {
    for (const d of r.directions) {
      if (!best || d.tora_m > best.length_m) best = { length_m: d.tora_m, label: `Existing TORA, runway ${d.designator}` };
    }
  }
  return best;
}

/** Legend name of a sweep line: says where the line ends and which points are climb-limited. */
function sweepSeriesName(name: string, points: readonly { readonly impractical?: true; readonly climbLimited?: true }[]): string {
  const notes: string[] = [];
  const limited = points.filter((p) => p.climbLimited).length;
  if (limited > 0) notes.push(`at its climb-limited mass at ${limited} of ${points.length} temperatures`);
  if (points.some((p) => p.impractical)) notes.push('line ends where the requirement passes the plausibility bound');
  return notes.length === 0 ? name : `${name} (${notes.join('; ')})`;
}

export function temperatureChart(result: StudyResult): ChartModel {
  const critical = new Set(result.scenarios.map((s) => s.criticalAircraft).filter((x): x is string => x !== null));
  // Points beyond the plausibility bound have no length (core/plausibility.ts): the line stops there
  // and the legend says why.
  const series: ChartSeries[] = result.sensitivity.map((c) => ({
    name: sweepSeriesName(c.aircraftName, c.temperature),
    style: 'line',
    emphasis: critical.has(c.aircraft),
    points: c.temperature.flatMap((p) => (p.required_m === null ? [] : [{ x: p.temperature_c, y: p.required_m }])),
  }));
  const tora = longestTakeoffRun(result);
  return {
    id: 'temperature',
    title: `Required length against temperature at ${result.site.name}`,
    xLabel: 'Air temperature',
    yLabel: 'Required runway length',
    xKind: 'temperature',
    yKind: 'length',
    series,
    rules: [
      { axis: 'x', value: result.site.designTemperature_c, label: 'Design temperature' },
      ...(tora ? [{ axis: 'y' as const, value: tora.length_m, label: tora.label }] : []),
    ],
    yFromZero: true,
  };
}

export function existingRunwayChart(result: StudyResult, scenario: ScenarioResult, index: number): ChartModel {
  const rows = scenario.rows.filter(isOperating);
  const takeoff: ChartPoint[] = rows.map((r, i) => ({ x: i, y: r.requiredTakeoff_m }));
  const landing: ChartPoint[] = rows.map((r, i) => ({ x: i, y: r.requiredLanding_m }));
  const design = result.site.runways[0]!;
  const d0 = design.directions[0]!;
  return {
    id: `existing-${index}`,
    title: `${scenario.name}: requirements against runway ${design.name}`,
    xLabel: 'Aircraft',
    yLabel: 'Length',
    xKind: 'count',
    yKind: 'length',
    categories: rows.map((r) => (r.regularUse ? r.aircraftName : `${r.aircraftName} (not regular)`)),
    series: [
      { name: 'Takeoff requirement', style: 'bar', points: takeoff },
      { name: 'Landing requirement', style: 'bar', points: landing },
    ],
    rules: [
      { axis: 'y', value: d0.tora_m, label: `TORA ${d0.designator}` },
      { axis: 'y', value: d0.lda_m, label: `LDA ${d0.designator}` },
    ],
    yFromZero: true,
  };
}

export function operationsServedChart(result: StudyResult): ChartModel {
  const tora = longestTakeoffRun(result);
  return {
    id: 'operations-served',
    title: 'Share of annual operations served against runway length',
    xLabel: 'Runway length',
    yLabel: 'Operations served',
    xKind: 'length',
    yKind: 'percent',
    series: result.scenarios.map((s) => ({
      name: s.name,
      style: 'step',
      points: s.operationsServed.map((p) => ({ x: p.length_m, y: p.share })),
    })),
    rules: tora ? [{ axis: 'x', value: tora.length_m, label: tora.label }] : [],
    yDomain: [0, 1],
  };
}

/** The payload-range chart of one aircraft, from the series saved with the result (no route model runs here). */
export function payloadRangeChart(pr: PayloadRangeSeries): ChartModel {
  const series: ChartSeries[] = [
    { name: `${pr.aircraftName}: payload-range (MTOW)`, style: 'line', points: pr.points.map((p) => ({ x: p.stageLength_m, y: p.payload_kg })) },
  ];
  if (pr.runwayLimited) {
    series.push({
      name: notice('chart.runwayLimitedMass')`Existing runway: takeoff mass limited to ${qty.mass(Math.floor(pr.runwayLimited.takeoffMass_kg))}`, style: 'line', emphasis: true,
      points: pr.runwayLimited.points.map((p): ChartPoint => ({ x: p.stageLength_m, y: p.payload_kg })),
    });
  }
  return {
    id: `payload-range-${pr.aircraft}`,
    title: `${pr.aircraftName}: payload against range`,
    xLabel: 'Stage length',
    yLabel: 'Payload',
    xKind: 'distance',
    yKind: 'mass',
    series,
    rules: pr.designStage_m === undefined ? [] : [{ axis: 'x', value: pr.designStage_m, label: 'Design stage' }],
    yFromZero: true,
  };
}

/** Every chart of a study, in report order, from the result alone: views never run physics. */
export function studyCharts(result: StudyResult): ChartModel[] {
  const charts: ChartModel[] = [temperatureChart(result)];
  result.scenarios.forEach((s, i) => charts.push(existingRunwayChart(result, s, i)));
  charts.push(operationsServedChart(result));
  for (const pr of result.payloadRange ?? []) charts.push(payloadRangeChart(pr));
  return charts;
}
