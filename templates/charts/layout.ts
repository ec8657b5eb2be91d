/**
 * Chart layout shared by the SVG (web) and PDF renderers: scales, ticks and path data from d3-scale and
 * d3-shape, in display units. Renderers only draw what this returns.
 */
import { scaleLinear } from 'd3-scale';
import { line, curveLinear, curveStepAfter } from 'd3-shape';
import type { ChartModel, UnitSystem } from '../../core/index.js';
import { unitOf } from '../format.js';

export interface Box { readonly width: number; readonly height: number; readonly left: number; readonly right: number; readonly top: number; readonly bottom: number }

export const DEFAULT_BOX: Box = { width: 640, height: 320, left: 64, right: 16, top: 36, bottom: 44 };

export interface LaidOutSeries { readonly name: string; readonly path: string; readonly markers: readonly { x: number; y: number }[]; readonly emphasis: boolean; readonly colour: string; readonly dash: string }
export interface Tick { readonly pos: number; readonly label: string }
export interface LaidOutChart {
  readonly box: Box;
  readonly title: string;
  readonly xLabel: string;
  readonly yLabel: string;
  readonly xTicks: readonly Tick[];
  readonly yTicks: readonly Tick[];
  readonly series: readonly LaidOutSeries[];
  readonly rules: readonly { x1: number; y1: number; x2: number; y2: number; label: string; lx: number; ly: number }[];
  readonly plot: { readonly x0: number; readonly x1: number; readonly y0: number; readonly y1: number };
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

export function layoutChart(model: ChartModel, system: UnitSystem, box: Box = DEFAULT_BOX): LaidOutChart {
  const cx = conv(model.xKind, system);
  const cy = conv(model.yKind, system);
  const xs = model.series.flatMap((s) => s.points.map((p) => cx.f(p.x))).concat(model.rules.filter((r) => r.axis === 'x').map((r) => cx.f(r.value)));
  const ys = model.series.flatMap((s) => s.points.map((p) => cy.f(p.y))).concat(model.rules.filter((r) => r.axis === 'y').map((r) => cy.f(r.value)));
  const xd = model.xDomain ? [cx.f(model.xDomain[0]), cx.f(model.xDomain[1])] as [number, number] : extent(xs, [0, 1]);
  let yd = model.yDomain ? [cy.f(model.yDomain[0]), cy.f(model.yDomain[1])] as [number, number] : extent(ys, [0, 1]);
  if (model.yFromZero) yd = [Math.min(0, yd[0]), yd[1]];
  const x0 = box.left, x1 = box.width - box.right, y0 = box.height - box.bottom, y1 = box.top;
  const x = scaleLinear().domain(xd).range([x0, x1]).nice();
  const y = scaleLinear().domain(yd).range([y0, y1]).nice();
  const xFmt = x.tickFormat(6);
  const yFmt = y.tickFormat(6);
  const series = model.series.map((s, i) => {
    const pts = s.points.filter((p) => Number.isFinite(p.x) && Number.isFinite(p.y)).map((p) => ({ x: x(cx.f(p.x)), y: y(cy.f(p.y)) }));
    const gen = line<{ x: number; y: number }>().x((p) => p.x).y((p) => p.y).curve(s.style === 'step' ? curveStepAfter : curveLinear);
    return {
      name: s.name,
      path: s.style === 'points' || pts.length < 2 ? '' : gen(pts) ?? '',
      markers: s.style === 'line' && pts.length > 24 ? [] : pts,
      emphasis: s.emphasis ?? false,
      colour: PALETTE[i % PALETTE.length]!,
      dash: DASHES[i % DASHES.length]!,
    };
  });
  const rules = model.rules.map((r) =>
    r.axis === 'x'
      ? { x1: x(cx.f(r.value)), y1: y0, x2: x(cx.f(r.value)), y2: y1, label: r.label, lx: x(cx.f(r.value)) + 3, ly: y1 + 10 }
      : { x1: x0, y1: y(cy.f(r.value)), x2: x1, y2: y(cy.f(r.value)), label: r.label, lx: x0 + 4, ly: y(cy.f(r.value)) - 4 },
  );
  const withUnit = (label: string, sym: string) => (sym ? `${label} (${sym})` : label);
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
  };
}
