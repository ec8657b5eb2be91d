/**
 * Chart layout shared by the SVG (web) and PDF renderers: scales, ticks and path data from d3-scale and
 * d3-shape, in display units. Renderers only draw what this returns.
 */
import { scaleBand, scaleLinear } from 'd3-scale';
import { line, curveLinear, curveStepAfter } from 'd3-shape';
import type { ChartModel, UnitSystem } from '../../core/index.js';
import { unitOf } from '../../core/index.js';
import { say } from '../format.js';

export interface Box { readonly width: number; readonly height: number; readonly left: number; readonly right: number; readonly top: number; readonly bottom: number }

export const DEFAULT_BOX: Box = { width: 640, height: 320, left: 64, right: 16, top: 36, bottom: 44 };

export interface LaidOutBar { readonly x: number; readonly y: number; readonly width: number; readonly height: number }
export interface LaidOutSeries { readonly name: string; readonly path: string; readonly markers: readonly { x: number; y: number }[]; readonly bars: readonly LaidOutBar[]; readonly emphasis: boolean; readonly colour: string; readonly dash: string }
export interface Tick { readonly pos: number; readonly label: string }
export interface LaidOutChart {
  readonly box: Box;
  readonly title: string;
  readonly xLabel: string;
  readonly yLabel: string;
  readonly xTicks: readonly Tick[];
  readonly yTicks: readonly Tick[];
  readonly series: readonly LaidOutSeries[];
  readonly rules: readonly { x1: number; y1: number; x2: number; y2: number; label: string; lx: number; ly: number; anchor: 'start' | 'end' }[];
  readonly plot: { readonly x0: number; readonly x1: number; readonly y0: number; readonly y1: number };
  /** True for category (bar) charts: x tick labels are names, drawn slanted. */
  readonly categorical: boolean;
}

/** Colour-blind-safe palette (Okabe–Ito), with dashes to tell series apart in greyscale print. */
export const PALETTE = ['#0072B2', '#D55E00', '#009E73', '#CC79A7', '#E69F00', '#56B4E9', '#000000', '#F0E442'];
const DASHES = ['', '6 3', '2 3', '8 3 2 3', '', '6 3', '2 3', '8 3 2 3'];

function conv(kind: ChartModel['xKind'], system: UnitSystem): { f: (v: number) => number; sym: string } {
  if (kind === 'percent') return { f: (v) => v * 100, sym: '%' };
  const u = unitOf(kind, system);
  return { f: u.from, sym: u.symbol };
}

function extent(values: number[], fallback: [number, number]): [number, number] {
  const v = values.filter(Number.isFinite);
  if (v.length === 0) return fallback;
  let lo = Math.min(...v);
  let hi = Math.max(...v);
  if (hi - lo < 1e-9) { lo -= 1; hi += 1; }
  return [lo, hi];
}

const withUnit = (label: string, sym: string) => (sym ? `${label} (${sym})` : label);

/** Bar charts need room for slanted category labels under the axis. */
export const CATEGORY_BOX: Box = { ...DEFAULT_BOX, height: 380, bottom: 104 };

export function layoutChart(model: ChartModel, system: UnitSystem, boxIn?: Box): LaidOutChart {
  const box = boxIn ?? (model.categories ? CATEGORY_BOX : DEFAULT_BOX);
  const cx = conv(model.xKind, system);
  const cy = conv(model.yKind, system);
  const xs = model.series.flatMap((s) => s.points.map((p) => cx.f(p.x))).concat(model.rules.filter((r) => r.axis === 'x').map((r) => cx.f(r.value)));
  const ys = model.series.flatMap((s) => s.points.map((p) => cy.f(p.y))).concat(model.rules.filter((r) => r.axis === 'y').map((r) => cy.f(r.value)));
  const xd = model.xDomain ? [cx.f(model.xDomain[0]), cx.f(model.xDomain[1])] as [number, number] : extent(xs, [0, 1]);
  let yd = model.yDomain ? [cy.f(model.yDomain[0]), cy.f(model.yDomain[1])] as [number, number] : extent(ys, [0, 1]);
  if (model.yFromZero) yd = [Math.min(0, yd[0]), yd[1]];
  const x0 = box.left, x1 = box.width - box.right, y0 = box.height - box.bottom, y1 = box.top;
  const y = scaleLinear().domain(yd).range([y0, y1]).nice();
  const yFmt = y.tickFormat(6);
  const gen = (style: string) => line<{ x: number; y: number }>().x((p) => p.x).y((p) => p.y).curve(style === 'step' ? curveStepAfter : curveLinear);
  if (model.categories) {
    // Bar chart: a band per category, one bar per series inside it.
    const band = scaleBand<number>().domain(model.categories.map((_, i) => i)).range([x0, x1]).paddingInner(0.25).paddingOuter(0.1);
    const barSeries = model.series.filter((s) => s.style === 'bar');
    const inner = scaleBand<number>().domain(barSeries.map((_, i) => i)).range([0, band.bandwidth()]).padding(0.08);
    const base = y(Math.max(y.domain()[0]!, 0));
    const series = model.series.map((s, i) => {
      const k = barSeries.indexOf(s);
      const bars = s.style !== 'bar' ? [] : s.points.filter((p) => Number.isFinite(p.y)).map((p) => {
        const top = y(cy.f(p.y));
        return { x: (band(p.x) ?? x0) + (inner(k) ?? 0), y: Math.min(top, base), width: inner.bandwidth(), height: Math.abs(base - top) };
      });
      return { name: say(s.name, system), path: '', markers: [], bars, emphasis: s.emphasis ?? false, colour: PALETTE[i % PALETTE.length]!, dash: '' };
    });
    const rules = model.rules.filter((r) => r.axis === 'y').map((r, k) => ({ x1: x0, y1: y(cy.f(r.value)), x2: x1, y2: y(cy.f(r.value)), label: r.label, lx: k % 2 === 0 ? x0 + 4 : x1 - 4, ly: y(cy.f(r.value)) - 4, anchor: k % 2 === 0 ? 'start' as const : 'end' as const }));
    return {
      box, title: model.title, xLabel: model.xLabel, yLabel: withUnit(model.yLabel, cy.sym),
      xTicks: model.categories.map((c, i) => ({ pos: (band(i) ?? x0) + band.bandwidth() / 2, label: c })),
      yTicks: y.ticks(6).map((t) => ({ pos: y(t), label: yFmt(t) })),
      series, rules, plot: { x0, x1, y0, y1 }, categorical: true,
    };
  }
  const x = scaleLinear().domain(xd).range([x0, x1]).nice();
  const xFmt = x.tickFormat(6);
  const series = model.series.map((s, i) => {
    const pts = s.points.filter((p) => Number.isFinite(p.x) && Number.isFinite(p.y)).map((p) => ({ x: x(cx.f(p.x)), y: y(cy.f(p.y)) }));
    return {
      name: say(s.name, system),
      path: s.style === 'points' || pts.length < 2 ? '' : gen(s.style)(pts) ?? '',
      markers: s.style === 'line' && pts.length > 24 ? [] : pts,
      bars: [],
      emphasis: s.emphasis ?? false,
      colour: PALETTE[i % PALETTE.length]!,
      dash: DASHES[i % DASHES.length]!,
    };
  });
  const rules = model.rules.map((r, k) => {
    if (r.axis === 'x') {
      const px = x(cx.f(r.value));
      const nearRight = px > x1 - (x1 - x0) / 3;
      return { x1: px, y1: y0, x2: px, y2: y1, label: r.label, lx: nearRight ? px - 3 : px + 3, ly: y1 + 10 + 12 * k, anchor: nearRight ? 'end' as const : 'start' as const };
    }
    const py = y(cy.f(r.value));
    return { x1: x0, y1: py, x2: x1, y2: py, label: r.label, lx: k % 2 === 0 ? x0 + 4 : x1 - 4, ly: py - 4, anchor: k % 2 === 0 ? 'start' as const : 'end' as const };
  });
  return {
    box,
    title: model.title,
    xLabel: withUnit(model.xLabel, cx.sym),
    yLabel: withUnit(model.yLabel, cy.sym),
    xTicks: x.ticks(6).map((t) => ({ pos: x(t), label: xFmt(t) })),
    yTicks: y.ticks(6).map((t) => ({ pos: y(t), label: yFmt(t) })),
    series,
    rules,
    plot: { x0, x1, y0, y1 },
    categorical: false,
  };
}
