/**
 * Draws a chart model into the PDF as vector graphics. The layout (scales, ticks, path data, rules)
 * comes from templates/charts/layout.ts, the same layout the web page's SVG uses; this module only
 * turns it into pdfkit drawing calls, so the page and the appendix show the same chart.
 */
import type { ChartModel, UnitSystem } from '../../core/index.js';
import { layoutChart, type Box, type LaidOutChart } from '../../templates/charts/layout.js';
import { FONT } from './fonts.js';
import { drawText, pdfText, textWidth } from './text.js';

type Doc = PDFKit.PDFDocument;

const AXIS = '#8a96a3';
const GRID = '#e3e8ee';
const INK = '#1a1a1a';
const MUTED = '#4a5561';

/** Chart box for a given width (points); category charts get room for slanted labels. */
export function chartBox(model: ChartModel, width: number): Box {
  return model.categories
    ? { width, height: 290, left: 58, right: 14, top: 26, bottom: 92 }
    : { width, height: 230, left: 58, right: 14, top: 26, bottom: 40 };
}

/** Dash pattern (pdfkit accepts an array at run time; its type declaration only a number). */
function setDash(doc: Doc, pattern: readonly number[] | undefined): void {
  if (pattern) (doc.dash as unknown as (p: readonly number[], o: object) => Doc).call(doc, pattern, {});
  else doc.undash();
}

function dashOf(dash: string): number[] | undefined {
  const parts = dash.split(/[\s,]+/).filter(Boolean).map(Number).filter((n) => Number.isFinite(n) && n > 0);
  return parts.length > 0 ? parts : undefined;
}

/** Text with its baseline at (x, y), anchored at start, middle or end. Never wraps or breaks pages. */
function label(doc: Doc, text: string, x: number, y: number, anchor: 'start' | 'middle' | 'end' = 'start'): void {
  const s = pdfText(text);
  const w = textWidth(doc, s);
  const left = anchor === 'start' ? x : anchor === 'middle' ? x - w / 2 : x - w;
  drawText(doc, s, left, y, { lineBreak: false, baseline: 'alphabetic' });
}

interface LegendItem { readonly name: string; readonly colour: string; readonly dash?: number[]; readonly width: number; readonly bar: boolean }

function legendItems(c: LaidOutChart): LegendItem[] {
  const items: LegendItem[] = c.series.map((s) => {
    const d = dashOf(s.dash);
    return { name: s.name, colour: s.colour, width: s.emphasis ? 2.2 : 1.2, bar: s.bars.length > 0, ...(d ? { dash: d } : {}) };
  });
  for (const r of c.rules) items.push({ name: r.label, colour: '#444444', dash: [3, 2], width: 0.8, bar: false });
  return items;
}

/** Height the legend takes at a width (points), so the caller can keep chart and legend together. */
export function legendHeight(doc: Doc, model: ChartModel, units: UnitSystem, width: number): number {
  return drawLegend(doc, legendItems(layoutChart(model, units, chartBox(model, width))), 0, 0, width, false);
}

function drawLegend(doc: Doc, items: readonly LegendItem[], x: number, y: number, width: number, draw: boolean): number {
  doc.font(FONT.regular).fontSize(7);
  const lineH = 11;
  let cx = x;
  let cy = y;
  for (const it of items) {
    const name = pdfText(it.name);
    const w = 20 + textWidth(doc, name) + 12;
    if (cx > x && cx + w > x + width) {
      cx = x;
      cy += lineH;
    }
    if (draw) {
      doc.save();
      if (it.bar) {
        doc.rect(cx + 2, cy + 2, 12, 6).fill(it.colour);
      } else {
        doc.lineWidth(it.width).strokeColor(it.colour);
        setDash(doc, it.dash);
        doc.moveTo(cx, cy + 5).lineTo(cx + 16, cy + 5).stroke();
      }
      doc.restore();
      doc.fillColor(INK);
      label(doc, it.name, cx + 20, cy + 7.5);
    }
    cx += w;
  }
  return cy - y + lineH;
}

/**
 * Draws `model` with its top-left corner at (x, y), `width` points wide, then its legend.
 * Returns the height used (chart and legend).
 */
export function drawChart(doc: Doc, model: ChartModel, units: UnitSystem, x: number, y: number, width: number): number {
  const box = chartBox(model, width);
  const c = layoutChart(model, units, box);
  const { plot } = c;
  const keepY = doc.y;
  doc.save();
  doc.translate(x, y);

  // Title
  doc.font(FONT.bold).fontSize(8.5).fillColor(INK);
  label(doc, c.title, box.width / 2, 14, 'middle');

  // Plot frame and grid
  doc.rect(plot.x0, plot.y1, plot.x1 - plot.x0, plot.y0 - plot.y1).fillAndStroke('#ffffff', AXIS);
  doc.lineWidth(0.4).strokeColor(GRID);
  for (const t of c.yTicks) doc.moveTo(plot.x0, t.pos).lineTo(plot.x1, t.pos).stroke();
  doc.lineWidth(0.6).strokeColor(AXIS);
  doc.rect(plot.x0, plot.y1, plot.x1 - plot.x0, plot.y0 - plot.y1).stroke();

  // Ticks
  doc.font(FONT.regular).fontSize(7).fillColor(MUTED);
  for (const t of c.yTicks) label(doc, t.label, plot.x0 - 4, t.pos + 2.5, 'end');
  for (const t of c.xTicks) {
    doc.lineWidth(0.6).strokeColor(AXIS).moveTo(t.pos, plot.y0).lineTo(t.pos, plot.y0 + 3).stroke();
    if (c.categorical) {
      doc.save();
      doc.rotate(-35, { origin: [t.pos, plot.y0 + 8] });
      label(doc, t.label, t.pos, plot.y0 + 10, 'end');
      doc.restore();
    } else {
      label(doc, t.label, t.pos, plot.y0 + 12, 'middle');
    }
  }

  // Axis labels
  doc.font(FONT.regular).fontSize(7.5).fillColor(INK);
  label(doc, c.xLabel, (plot.x0 + plot.x1) / 2, box.height - 6, 'middle');
  const midY = (plot.y0 + plot.y1) / 2;
  doc.save();
  doc.rotate(-90, { origin: [12, midY] });
  label(doc, c.yLabel, 12, midY + 3, 'middle');
  doc.restore();

  // Series, clipped to the plot area
  doc.save();
  doc.rect(plot.x0, plot.y1, plot.x1 - plot.x0, plot.y0 - plot.y1).clip();
  for (const s of c.series) {
    for (const b of s.bars) doc.rect(b.x, b.y, b.width, b.height).fill(s.colour);
    if (s.path) {
      doc.save();
      doc.lineWidth(s.emphasis ? 2.2 : 1.2).strokeColor(s.colour).lineJoin('round');
      const d = dashOf(s.dash);
      setDash(doc, d);
      doc.path(s.path).stroke();
      doc.restore();
    }
    for (const m of s.markers) doc.circle(m.x, m.y, s.emphasis ? 2.2 : 1.6).fill(s.colour);
  }
  doc.restore();

  // Rules (design temperature, existing runway, ...)
  for (const r of c.rules) {
    doc.save();
    doc.lineWidth(0.8).strokeColor('#444444');
    setDash(doc, [3, 2]);
    doc.moveTo(r.x1, r.y1).lineTo(r.x2, r.y2).stroke();
    doc.restore();
    doc.font(FONT.regular).fontSize(6.5);
    const lw = textWidth(doc, pdfText(r.label));
    const lx = r.anchor === 'end' ? r.lx - lw : r.lx;
    doc.save();
    doc.fillOpacity(0.85).rect(lx - 1.5, r.ly - 6.5, lw + 3, 8.5).fill('#ffffff');
    doc.restore();
    doc.fillColor('#333333');
    label(doc, r.label, r.lx, r.ly, r.anchor);
  }
  doc.restore();

  const legendH = drawLegend(doc, legendItems(c), x + plot.x0, y + box.height + 2, plot.x1 - plot.x0, true);
  doc.fillColor(INK);
  doc.y = keepY;
  return box.height + 2 + legendH;
}
