/**
 * Chart models of a site (SI values; renderers convert for display), shared by the site page and any
 * printed output:
 * - the monthly climate: mean daily maximum, mean and mean daily minimum temperature by calendar
 *   month, with the design temperature (aerodrome reference temperature, ICAO Annex 14 Vol. I 2.4.1)
 *   marked;
 * - a runway's centreline profile: elevation against chainage, with the high and low points.
 * Nothing is computed here beyond arranging the given values; the design temperature comes from
 * core/climate (designTemperatureFromMonthly).
 */
import type { ProfilePoint } from '../runway.js';
import type { MonthlyClimate } from '../study/types.js';
import type { ChartModel, ChartSeries } from './chart.js';

export function climateChart(input: {
  readonly siteName: string;
  readonly monthly: readonly MonthlyClimate[];
  /** Design temperature to mark, °C. */
  readonly designTemperature_c?: number;
}): ChartModel {
  const months = [...input.monthly].sort((a, b) => a.month - b.month);
  const series: ChartSeries[] = [
    { name: 'Mean daily maximum', style: 'line', emphasis: true, points: months.map((m) => ({ x: m.month, y: m.meanMax_c })) },
  ];
  const mean = months.filter((m) => m.mean_c !== undefined || m.meanMin_c !== undefined)
    .map((m) => ({ x: m.month, y: m.mean_c ?? (m.meanMax_c + m.meanMin_c!) / 2 }));
  if (mean.length > 0) series.push({ name: 'Mean', style: 'line', points: mean });
  const min = months.filter((m) => m.meanMin_c !== undefined).map((m) => ({ x: m.month, y: m.meanMin_c! }));
  if (min.length > 0) series.push({ name: 'Mean daily minimum', style: 'line', points: min });
  return {
    id: 'climate',
    title: `Monthly temperatures at ${input.siteName}`,
    xLabel: 'Month (1 = January)',
    yLabel: 'Temperature',
    xKind: 'count',
    yKind: 'temperature',
    series,
    rules: input.designTemperature_c === undefined ? [] : [{ axis: 'y', value: input.designTemperature_c, label: 'Design temperature' }],
    xDomain: [1, 12],
  };
}

export function runwayProfileChart(input: { readonly runwayName: string; readonly profile: readonly ProfilePoint[]; readonly index: number }): ChartModel {
  const pts = input.profile.map((p) => ({ x: p.chainage_m, y: p.elevation_m }));
  let hi = pts[0];
  let lo = pts[0];
  for (const p of pts) {
    if (hi === undefined || p.y > hi.y) hi = p;
    if (lo === undefined || p.y < lo.y) lo = p;
  }
  return {
    id: `profile-${input.index}`,
    title: `Centreline profile of runway ${input.runwayName}`,
    xLabel: 'Chainage',
    yLabel: 'Elevation',
    xKind: 'length',
    yKind: 'altitude',
    series: [
      { name: 'Centreline elevation', style: 'line', emphasis: true, points: pts },
      ...(hi && lo ? [{ name: 'High and low points', style: 'points' as const, points: [hi, lo] }] : []),
    ],
    rules: [],
  };
}
