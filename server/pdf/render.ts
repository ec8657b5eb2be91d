/**
 * The study appendix as a PDF (pdfkit, embedded fonts from fonts.ts, vector charts).
 *
 * `renderAppendixPdf({ input, output, clock, version })` builds the report model
 * (core/report/model.ts) and draws it: a title page with the cautions, the findings and the contents;
 * then the sections, each table repeating its header when it runs onto a new page; charts drawn from
 * the same chart models as the web pages; a running header, page numbers ("Page n of N"), PDF
 * bookmarks and internal links from the contents. The exact input is attached to the PDF
 * ("study-input.json") beside the printed SHA-256 digest, so the appendix can be regenerated.
 *
 * Determinism: the document dates come from the injected clock, the PDF file ID is derived by pdfkit
 * from the document information (which holds those dates), and the embedded font subsets are named and
 * built deterministically by pdfkit (the subset tag comes from the font's order in the document, the
 * glyphs from the text), so the same study and date give the same bytes.
 */
import PDFDocument from 'pdfkit';
import type { StudyInput, UnitSystem } from '../../core/index.js';
import { studyCharts } from '../../core/index.js';
import {
  buildAppendixModel, type AppendixModel, type Block, type Cell, type Column, type ReportSection, type Row,
} from '../../core/index.js';
import { UNIT_SYSTEM_LABELS, say } from '../../templates/format.js';
import { cellText, kindSymbol } from '../../templates/reportCells.js';
import { canonicalJson, inputDigest, type StudyOutput } from '../studies/index.js';
import { drawChart, chartBox, legendHeight } from './chart.js';
import { FONT, registerFonts } from './fonts.js';
import { drawText, pdfText, textHeight, textWidth } from './text.js';

type Doc = PDFKit.PDFDocument;

export interface AppendixPdfArgs {
  readonly input: StudyInput;
  /** Result of `studyOutput(input)` (the result with the input digest). */
  readonly output: StudyOutput;
  /** Issue date of the appendix. */
  readonly clock: () => Date;
  /** Runwright version printed in the title block. */
  readonly version: string;
  /** Unit system for display; defaults to the study's. */
  readonly units?: UnitSystem;
}

export { LISTING_DIGITS } from '../../templates/reportCells.js';

/** Name of the attached input file. */
export const ATTACHMENT_NAME = 'study-input.json';

// Page geometry (points; A4 portrait).
const PAGE_W = 595.28;
const PAGE_H = 841.89;
const MARGIN = { top: 62, bottom: 58, left: 50, right: 50 } as const;
const CONTENT_W = PAGE_W - MARGIN.left - MARGIN.right;
const MAX_Y = PAGE_H - MARGIN.bottom;

const INK = '#1a1a1a';
const MUTED = '#4a5561';
const RULE = '#9aa5b1';
const HEAD_FILL = '#e6ebf0';
const GROUP_FILL = '#f3f5f7';
const CAUTION_FILL = '#fff4e0';
const CAUTION_LINE = '#b86e00';

/** Issue date as YYYY-MM-DD (UTC). */
export function issueDate(d: Date): string {
  return d.toISOString().slice(0, 10);
}

/** The study file that regenerates the appendix: the input with the file header, keys in canonical order. */
export function studyFileText(input: StudyInput): string {
  const doc = { format: 'runwright-study', version: 1, ...JSON.parse(canonicalJson(input)) as object };
  return JSON.stringify(JSON.parse(canonicalJson(doc)), null, 2) + '\n';
}

/** The report model of an appendix (also used by tests and pages that show the same numbers). */
export function appendixModel(args: AppendixPdfArgs): AppendixModel {
  const units = args.units ?? args.input.options.units;
  const result = units === args.output.options.units ? args.output : { ...args.output, options: { ...args.output.options, units } };
  return buildAppendixModel({
    input: args.input,
    result,
    charts: studyCharts(args.output),
    inputDigest: args.output.inputDigest,
    date: issueDate(args.clock()),
    version: args.version,
    regenerateCommand: `npm run study -- ${ATTACHMENT_NAME} --format pdf --units ${units} --out appendix.pdf`,
  });
}

// ---------------------------------------------------------------------------------------------
// Formatting of model cells (templates/format.ts does the rounding)
// ---------------------------------------------------------------------------------------------

function headerText(col: Column, units: UnitSystem): string {
  if (!col.kind) return col.title;
  const sym = kindSymbol(col.kind, units);
  return sym ? `${col.title} (${sym})` : col.title;
}

const isBold = (cell: Cell): boolean => ('bold' in cell && cell.bold === true);

// ---------------------------------------------------------------------------------------------
// Writer: flow layout over pages
// ---------------------------------------------------------------------------------------------

interface TocEntry { readonly section: ReportSection; page: number }

class Writer {
  readonly toc: TocEntry[] = [];
  private outlineTop: PDFKit.PDFOutline | undefined;

  constructor(readonly doc: Doc, readonly model: AppendixModel) {}

  get units(): UnitSystem { return this.model.units; }

  /** Zero-based index of the current page. */
  pageIndex(): number {
    const r = this.doc.bufferedPageRange();
    return r.start + r.count - 1;
  }

  newPage(): void {
    this.doc.addPage();
    this.doc.x = MARGIN.left;
    this.doc.y = MARGIN.top;
  }

  /** Starts a new page unless `h` points still fit on this one. */
  ensure(h: number): void {
    if (this.doc.y + h > MAX_Y) this.newPage();
  }

  text(s: string, x: number, y: number, opts: PDFKit.Mixins.TextOptions = {}): void {
    drawText(this.doc, pdfText(s), x, y, opts);
  }

  /** Height of `s` wrapped to `width`; a text that fits on one line skips pdfkit's line wrapper. */
  height(s: string, width: number, opts: PDFKit.Mixins.TextOptions = {}): number {
    const p = pdfText(s);
    if (!p.includes('\n') && this.widthOf(p) <= width) return this.doc.currentLineHeight(true) + (opts.lineGap ?? 0);
    return textHeight(this.doc, p, width, opts);
  }

  private readonly widths = new Map<string, number>();

  /** Width of an already sanitised (`pdfText`) one-line text in the current font and size (memoised: tables repeat values). */
  widthOf(p: string): number {
    const d = this.doc as unknown as { _font?: { name?: string }; _fontSize?: number };
    const key = `${d._font?.name ?? ''}|${d._fontSize ?? 0}|${p}`;
    let w = this.widths.get(key);
    if (w === undefined) {
      w = textWidth(this.doc, p);
      this.widths.set(key, w);
    }
    return w;
  }

  /** Draws `s` in a box of `width` at (x, y); one line without the wrapper when it fits. */
  boxText(s: string, x: number, y: number, width: number, align: 'left' | 'right' = 'left'): void {
    const p = pdfText(s);
    const w = p.includes('\n') ? Infinity : this.widthOf(p);
    if (w <= width) drawText(this.doc, p, align === 'right' ? x + width - w : x, y, { lineBreak: false });
    else drawText(this.doc, p, x, y, { width, align });
  }

  // --- sections -------------------------------------------------------------------------

  section(s: ReportSection): void {
    const doc = this.doc;
    if (s.newPage && doc.y > MARGIN.top + 1) this.newPage();
    const size = s.level === 1 ? 14 : 11;
    doc.font(FONT.bold).fontSize(size);
    const title = `${s.number}  ${s.title}`;
    const h = this.height(title, CONTENT_W);
    // Keep a heading with at least a few lines of what follows.
    this.ensure(h + (s.level === 1 ? 14 : 8) + 70);
    if (doc.y > MARGIN.top + 1) doc.y += s.level === 1 ? 10 : 6;
    doc.addNamedDestination(s.id, 'XYZ', 0, doc.y - 4, null);
    const outline = doc.outline as unknown as PDFKit.PDFOutline;
    if (s.level === 1) this.outlineTop = outline.addItem(pdfText(title), { fit: true } as never);
    else (this.outlineTop ?? outline).addItem(pdfText(title), { fit: true } as never);
    this.toc.push({ section: s, page: this.pageIndex() + 1 });
    doc.fillColor(INK);
    this.text(title, MARGIN.left, doc.y, { width: CONTENT_W });
    if (s.level === 1) {
      doc.lineWidth(0.8).strokeColor(RULE).moveTo(MARGIN.left, doc.y + 2).lineTo(MARGIN.left + CONTENT_W, doc.y + 2).stroke();
      doc.y += 8;
    } else {
      doc.y += 4;
    }
    for (const b of s.blocks) this.block(b);
  }

  block(b: Block): void {
    switch (b.type) {
      case 'paragraph': return this.paragraph(say(b.text, this.units), b.style ?? 'normal');
      case 'subheading': return this.subheading(b.text);
      case 'facts': return this.facts(b.items);
      case 'table': return this.table(b.caption, b.columns, b.rows, b.note);
      case 'formulas': return this.formulas(b.lines);
      case 'list': return this.list(b.items.map((i) => say(i, this.units)), b.ordered ?? false);
      case 'chart': return this.chart(b.chart);
    }
  }

  paragraph(text: string, style: 'normal' | 'note' | 'caution' | 'strong'): void {
    const doc = this.doc;
    if (style === 'caution') return this.cautionBox(null, text);
    const font = style === 'note' ? FONT.italic : style === 'strong' ? FONT.bold : FONT.regular;
    const size = style === 'note' ? 7.8 : 9;
    doc.font(font).fontSize(size).fillColor(style === 'note' ? MUTED : INK);
    const h = this.height(text, CONTENT_W, { lineGap: 1.5 });
    this.ensure(Math.min(h, 3 * size * 1.4));
    this.text(text, MARGIN.left, doc.y, { width: CONTENT_W, lineGap: 1.5 });
    doc.fillColor(INK);
    doc.y += style === 'note' ? 4 : 5;
  }

  subheading(text: string): void {
    const doc = this.doc;
    doc.font(FONT.bold).fontSize(9.5);
    this.ensure(14 + 50);
    doc.y += 4;
    doc.fillColor(INK);
    this.text(text, MARGIN.left, doc.y, { width: CONTENT_W });
    doc.y += 3;
  }

  cautionBox(title: string | null, text: string): void {
    const doc = this.doc;
    const pad = 8;
    const w = CONTENT_W - 2 * pad;
    doc.font(FONT.bold).fontSize(9.5);
    const th = title ? this.height(title, w) + 3 : 0;
    doc.font(FONT.regular).fontSize(9);
    const bh = this.height(text, w, { lineGap: 1.5 });
    const h = th + bh + 2 * pad;
    this.ensure(h + 6);
    const y = doc.y;
    doc.save();
    doc.rect(MARGIN.left, y, CONTENT_W, h).fill(CAUTION_FILL);
    doc.rect(MARGIN.left, y, 3, h).fill(CAUTION_LINE);
    doc.restore();
    doc.fillColor(INK);
    if (title) {
      doc.font(FONT.bold).fontSize(9.5);
      this.text(title, MARGIN.left + pad, y + pad, { width: w });
    }
    doc.font(FONT.regular).fontSize(9);
    this.text(text, MARGIN.left + pad, y + pad + th, { width: w, lineGap: 1.5 });
    doc.y = y + h + 8;
  }

  facts(items: readonly { label: string; value: Cell }[]): void {
    const doc = this.doc;
    const lw = CONTENT_W * 0.42;
    const vw = CONTENT_W - lw - 8;
    for (const it of items) {
      const value = cellText(it.value, undefined, this.units);
      const v = it.value;
      const mono = 'text' in v && v.mono === true;
      const valueFont = (): void => {
        if (mono) doc.font(FONT.mono).fontSize(7.2);
        else doc.font(isBold(v) || ('kind' in v && v.kind === 'lengthBoth') ? FONT.bold : FONT.regular).fontSize(9);
      };
      doc.font(FONT.regular).fontSize(8.5);
      const lh = this.height(it.label, lw);
      valueFont();
      const vh = this.height(value, vw);
      const h = Math.max(lh, vh) + 3;
      this.ensure(h);
      const y = doc.y;
      doc.font(FONT.regular).fontSize(8.5).fillColor(MUTED);
      this.boxText(it.label, MARGIN.left, y + 0.5, lw);
      valueFont();
      doc.fillColor(INK);
      this.boxText(value, MARGIN.left + lw + 8, y + (mono ? 1.2 : 0), vw);
      doc.y = y + h;
    }
    doc.y += 5;
  }

  list(items: readonly string[], ordered: boolean): void {
    const doc = this.doc;
    doc.font(FONT.regular).fontSize(8.8).fillColor(INK);
    const indent = 14;
    items.forEach((item, i) => {
      const h = this.height(item, CONTENT_W - indent, { lineGap: 1.2 });
      this.ensure(Math.min(h, 24) + 2);
      const y = doc.y;
      this.text(ordered ? `${i + 1}.` : '\u2022', MARGIN.left + 2, y, { lineBreak: false });
      this.text(item, MARGIN.left + indent, y, { width: CONTENT_W - indent, lineGap: 1.2 });
      doc.y += 2.5;
    });
    doc.y += 3;
  }

  formulas(lines: readonly string[]): void {
    const doc = this.doc;
    const pad = 5;
    const w = CONTENT_W - 2 * pad - 10;
    doc.font(FONT.mono).fontSize(7.8);
    const hs = lines.map((l) => this.height(l, w, { lineGap: 1 }));
    const h = hs.reduce((a, b) => a + b + 2, 0) + 2 * pad - 2;
    this.ensure(h + 4);
    const y = doc.y;
    doc.save();
    doc.rect(MARGIN.left + 10, y, CONTENT_W - 10, h).fill('#f4f6f8');
    doc.restore();
    doc.fillColor(INK).font(FONT.mono).fontSize(7.8);
    let cy = y + pad;
    lines.forEach((l, i) => {
      this.text(l, MARGIN.left + 10 + pad, cy, { width: w, lineGap: 1 });
      cy += hs[i]! + 2;
    });
    doc.y = y + h + 5;
  }

  chart(model: Parameters<typeof drawChart>[1]): void {
    const doc = this.doc;
    const h = chartBox(model, CONTENT_W).height + 2 + legendHeight(doc, model, this.units, CONTENT_W - 72) + 10;
    this.ensure(h);
    const used = drawChart(doc, model, this.units, MARGIN.left, doc.y, CONTENT_W);
    doc.y += used + 12;
  }

  // --- tables ---------------------------------------------------------------------------

  table(caption: string, columns: readonly Column[], rows: readonly Row[], note?: string): void {
    const doc = this.doc;
    const units = this.units;
    const pad = 2.6;
    const size = 7.4;
    const total = columns.reduce((a, c) => a + (c.width ?? 1), 0);
    const widths = columns.map((c) => (CONTENT_W * (c.width ?? 1)) / total);
    const xs = widths.map((_, i) => MARGIN.left + widths.slice(0, i).reduce((a, b) => a + b, 0));
    const align = (i: number): 'left' | 'right' => columns[i]!.align ?? (columns[i]!.kind ? 'right' : 'left');
    const heads = columns.map((c) => headerText(c, units));
    doc.font(FONT.bold).fontSize(size);
    const headH = Math.max(...heads.map((h, i) => this.height(h, widths[i]! - 2 * pad))) + 2 * pad;

    const texts = rows.map((r) => ('cells' in r ? r.cells.map((c, i) => cellText(c, columns[i], units)) : null));
    const rowH = rows.map((r, k) => {
      if ('group' in r) {
        doc.font(FONT.bold).fontSize(size);
        return this.height(r.group, CONTENT_W - 2 * pad) + 2 * pad;
      }
      if ('note' in r) {
        doc.font(FONT.italic).fontSize(size - 0.4);
        return this.height(say(r.note, this.units), CONTENT_W - 2 * pad - NOTE_INDENT) + 2 * pad;
      }
      return Math.max(...texts[k]!.map((t, i) => {
        doc.font(isBold(r.cells[i]!) ? FONT.bold : FONT.regular).fontSize(size);
        return this.height(t, widths[i]! - 2 * pad);
      })) + 2 * pad;
    });

    const drawCaption = (continued: boolean): void => {
      doc.font(FONT.bold).fontSize(8.2).fillColor(INK);
      const c = continued ? `${caption} (continued)` : caption;
      this.text(c, MARGIN.left, doc.y, { width: CONTENT_W });
      doc.y += 2;
    };
    const drawHeader = (): void => {
      const y = doc.y;
      doc.save();
      doc.rect(MARGIN.left, y, CONTENT_W, headH).fill(HEAD_FILL);
      doc.restore();
      doc.font(FONT.bold).fontSize(size).fillColor(INK);
      heads.forEach((h, i) => this.boxText(h, xs[i]! + pad, y + pad, widths[i]! - 2 * pad, align(i)));
      doc.lineWidth(0.6).strokeColor(RULE).moveTo(MARGIN.left, y + headH).lineTo(MARGIN.left + CONTENT_W, y + headH).stroke();
      doc.y = y + headH;
    };

    // Caption, header and the first row (and a group row with its first row) stay together.
    doc.font(FONT.bold).fontSize(8.2);
    const capH = this.height(caption, CONTENT_W) + 2;
    // A group row stays with the row after it; a data row with the note rows that follow it.
    const keepH = (k: number): number => {
      const r = rows[k];
      if (!r) return 0;
      if ('group' in r) return rowH[k]! + keepH(k + 1);
      let h = rowH[k]!;
      for (let j = k + 1; j < rows.length && 'note' in rows[j]!; j++) h += rowH[j]!;
      return h;
    };
    const firstH = keepH(0);
    // A short table is kept whole on one page rather than leaving a few rows to run over.
    const totalH = capH + headH + rowH.reduce((a, b) => a + b, 0);
    if (totalH <= (MAX_Y - MARGIN.top) * KEEP_WHOLE_FRACTION) this.ensure(totalH);
    this.ensure(capH + headH + firstH);
    drawCaption(false);
    drawHeader();

    rows.forEach((r, k) => {
      const h = rowH[k]!;
      const keep = 'note' in r ? h : keepH(k);
      if (doc.y + keep > MAX_Y) {
        this.newPage();
        drawCaption(true);
        drawHeader();
      }
      const y = doc.y;
      if ('group' in r) {
        doc.save();
        doc.rect(MARGIN.left, y, CONTENT_W, h).fill(GROUP_FILL);
        doc.restore();
        doc.font(FONT.bold).fontSize(size).fillColor(INK);
        this.boxText(r.group, MARGIN.left + pad, y + pad, CONTENT_W - 2 * pad);
      } else if ('note' in r) {
        doc.font(FONT.italic).fontSize(size - 0.4).fillColor(MUTED);
        this.text(say(r.note, this.units), MARGIN.left + pad + NOTE_INDENT, y + pad, { width: CONTENT_W - 2 * pad - NOTE_INDENT });
        doc.fillColor(INK);
      } else {
        r.cells.forEach((c, i) => {
          if (i >= columns.length) return;
          doc.font(isBold(c) ? FONT.bold : FONT.regular).fontSize(size).fillColor(INK);
          this.boxText(texts[k]![i]!, xs[i]! + pad, y + pad, widths[i]! - 2 * pad, align(i));
        });
      }
      const next = rows[k + 1];
      if (!(next && 'note' in next)) doc.lineWidth(0.3).strokeColor('#d5dbe1').moveTo(MARGIN.left, y + h).lineTo(MARGIN.left + CONTENT_W, y + h).stroke();
      doc.y = y + h;
    });
    doc.y += 3;
    if (note) {
      doc.font(FONT.italic).fontSize(7).fillColor(MUTED);
      this.ensure(10);
      this.text(note, MARGIN.left, doc.y, { width: CONTENT_W });
      doc.fillColor(INK);
    }
    doc.y += 8;
  }

  // --- title page, contents, running header and footer ----------------------------------

  titlePage(): void {
    const doc = this.doc;
    const m = this.model;
    const t = m.title;
    doc.y = MARGIN.top - 10;
    doc.font(FONT.bold).fontSize(8).fillColor(MUTED);
    this.text('RUNWAY LENGTH STUDY  |  APPENDIX', MARGIN.left, doc.y, { characterSpacing: 1.2 });
    doc.y += 6;
    doc.font(FONT.bold).fontSize(19).fillColor(INK);
    this.text(t.study, MARGIN.left, doc.y, { width: CONTENT_W });
    doc.y += 2;
    doc.font(FONT.regular).fontSize(12).fillColor(INK);
    this.text(t.site, MARGIN.left, doc.y, { width: CONTENT_W });
    doc.y += 10;
    this.facts([
      { label: 'Date of issue', value: { text: t.date } },
      { label: 'Runwright version', value: { text: t.version } },
      { label: 'Method version', value: { text: t.methodVersion } },
      { label: 'Units', value: { text: `${UNIT_SYSTEM_LABELS[t.units]}; recommended lengths also in ${t.units === 'si' ? 'feet' : 'metres'}` } },
      { label: 'SHA-256 of the canonical input', value: { text: t.inputDigest, mono: true } },
    ]);
    this.cautionBox(m.caution.title, m.caution.text);

    doc.font(FONT.bold).fontSize(10).fillColor(INK);
    this.text('Findings', MARGIN.left, doc.y);
    doc.y += 3;
    const shown = m.recommendations.slice(0, 8);
    this.table('Recommended runway length per scenario', [
      { title: 'Scenario', width: 1.6 }, { title: 'Critical aircraft', width: 1.4 }, { title: 'Governing', width: 0.8 }, { title: 'Recommended length', kind: 'lengthBoth', width: 1.4 },
    ], shown.map((r) => ({ cells: [{ text: r.scenario }, { text: r.criticalAircraftName ?? 'none', bold: true }, { text: r.governing ?? '—' }, { si: r.recommendedLength_m, kind: 'lengthBoth' }] })),
    m.recommendations.length > shown.length ? `First ${shown.length} of ${m.recommendations.length} scenarios; all are in Section 6.` : undefined);
  }

  /** Lines the contents need, and the y where they start on the title page. */
  contentsLayout(startY: number, entries: number): { extraPages: number } {
    const firstCapacity = Math.max(0, Math.floor((MAX_Y - startY - 22) / TOC_LINE));
    const perPage = Math.floor((MAX_Y - MARGIN.top - 22) / TOC_LINE);
    return { extraPages: entries <= firstCapacity ? 0 : Math.ceil((entries - firstCapacity) / perPage) };
  }

  drawContents(startY: number): void {
    const doc = this.doc;
    let page = 0;
    doc.switchToPage(0);
    doc.y = startY;
    const heading = (): void => {
      doc.font(FONT.bold).fontSize(10).fillColor(INK);
      this.text(page === 0 ? 'Contents' : 'Contents (continued)', MARGIN.left, doc.y);
      doc.y += 6;
    };
    heading();
    for (const e of this.toc) {
      if (doc.y + TOC_LINE > MAX_Y) {
        page += 1;
        doc.switchToPage(page);
        doc.y = MARGIN.top;
        heading();
      }
      const s = e.section;
      const indent = s.level === 1 ? 0 : 18;
      doc.font(s.level === 1 ? FONT.bold : FONT.regular).fontSize(s.level === 1 ? 9 : 8.6).fillColor(INK);
      const title = pdfText(`${s.number}  ${s.title}`);
      const num = String(e.page);
      const x = MARGIN.left + indent;
      const numW = textWidth(doc, num);
      const maxTitle = CONTENT_W - indent - numW - 30;
      let shown = title;
      if (textWidth(doc, shown) > maxTitle) {
        // Cut by characters (not UTF-16 units), so a CJK or astral character is never split.
        const chars = [...shown];
        while (chars.length > 4 && textWidth(doc, `${chars.join('')}...`) > maxTitle) chars.pop();
        shown = `${chars.join('')}...`;
      }
      const tw = textWidth(doc, shown);
      const y = doc.y;
      drawText(doc, shown, x, y, { lineBreak: false, goTo: s.id });
      drawText(doc, num, MARGIN.left + CONTENT_W - numW, y, { lineBreak: false, goTo: s.id });
      doc.font(FONT.regular).fillColor(RULE);
      const dotsW = MARGIN.left + CONTENT_W - numW - 4 - (x + tw + 4);
      const dot = textWidth(doc, '. ');
      if (dotsW > dot) drawText(doc, '. '.repeat(Math.floor(dotsW / dot)), x + tw + 4, y, { lineBreak: false });
      doc.fillColor(INK);
      doc.y = y + TOC_LINE;
    }
  }

  runningHeadAndFoot(): void {
    const doc = this.doc;
    const t = this.model.title;
    const range = doc.bufferedPageRange();
    const total = range.count;
    for (let i = range.start; i < range.start + total; i++) {
      doc.switchToPage(i);
      const keepBottom = doc.page.margins.bottom;
      doc.page.margins.bottom = 0;
      if (i > 0) {
        doc.font(FONT.regular).fontSize(7.5).fillColor(MUTED);
        const right = pdfText(t.site);
        const rw = Math.min(textWidth(doc, right), CONTENT_W * 0.4);
        const left = pdfText(`Runway length study appendix: ${t.study}`);
        drawText(doc, left, MARGIN.left, 32, { width: CONTENT_W - rw - 12, lineBreak: false, ellipsis: true, height: 10 });
        drawText(doc, right, MARGIN.left + CONTENT_W - rw, 32, { width: rw, lineBreak: false, ellipsis: true, height: 10, align: 'right' });
        doc.lineWidth(0.5).strokeColor(RULE).moveTo(MARGIN.left, 44).lineTo(MARGIN.left + CONTENT_W, 44).stroke();
      }
      const fy = PAGE_H - 42;
      doc.lineWidth(0.5).strokeColor(RULE).moveTo(MARGIN.left, fy - 4).lineTo(MARGIN.left + CONTENT_W, fy - 4).stroke();
      doc.font(FONT.bold).fontSize(7.5).fillColor(INK);
      const pageText = `Page ${i + 1} of ${total}`;
      const pw = textWidth(doc, pageText);
      drawText(doc, pageText, MARGIN.left + CONTENT_W - pw, fy, { lineBreak: false });
      doc.font(FONT.regular).fontSize(7).fillColor(MUTED);
      drawText(doc, pdfText('Preliminary planning estimate; not for flight planning or dispatch.'), MARGIN.left, fy, { lineBreak: false });
      drawText(doc, pdfText(`Issued ${t.date}  |  Runwright ${t.version}  |  methods ${t.methodVersion}  |  input SHA-256 ${t.inputDigest.slice(0, 16)}...`), MARGIN.left, fy + 10, { lineBreak: false });
      doc.page.margins.bottom = keepBottom;
    }
    doc.fillColor(INK);
  }
}

const TOC_LINE = 13.5;

/** Tables up to this fraction of a page are never split. */
const KEEP_WHOLE_FRACTION = 0.4;

/** Indent of note rows under the row they explain, points. */
const NOTE_INDENT = 12;

/** Renders the appendix of a study; the same input, output, version and clock give the same bytes. */
export function renderAppendixPdf(args: AppendixPdfArgs): Promise<Buffer> {
  // The appendix prints the digest and attaches the input: both must be those of the result shown.
  const digest = inputDigest(args.input);
  if (digest !== args.output.inputDigest) {
    return Promise.reject(new Error(`appendix: the result was computed from another input (result ${args.output.inputDigest}, input ${digest})`));
  }
  const model = appendixModel(args);
  const when = args.clock();
  const doc = new PDFDocument({
    size: 'A4',
    margins: { ...MARGIN },
    bufferPages: true,
    autoFirstPage: true,
    compress: true,
    pdfVersion: '1.7',
    lang: 'en',
    displayTitle: true,
    info: {
      Title: pdfText(`${model.title.study}: appendix`),
      Author: 'Runwright',
      Subject: pdfText(`Runway length requirements for ${model.title.site}`),
      Keywords: `runway length; planning; input sha256 ${model.title.inputDigest}`,
      Creator: `Runwright ${args.version}`,
      Producer: 'Runwright (pdfkit)',
      CreationDate: when,
      ModDate: when,
    },
  });
  registerFonts(doc);
  const chunks: Buffer[] = [];
  const done = new Promise<Buffer>((resolve, reject) => {
    doc.on('data', (c: Buffer) => chunks.push(c));
    doc.on('end', () => resolve(Buffer.concat(chunks)));
    doc.on('error', reject);
  });

  const w = new Writer(doc, model);
  w.titlePage();
  const contentsY = doc.y + 6;
  const entries = model.sections.filter((s) => s.level === 1 || !s.id.startsWith('method-'));
  const { extraPages } = w.contentsLayout(contentsY, entries.length);
  for (let i = 0; i < extraPages; i++) w.newPage();
  w.newPage();
  for (const s of model.sections) w.section(s);

  // Contents (sections of the method are in the bookmarks, not the contents, to keep it short).
  const all = w.toc.splice(0);
  w.toc.push(...all.filter((e) => e.section.level === 1 || !e.section.id.startsWith('method-')));
  w.drawContents(contentsY);
  w.runningHeadAndFoot();

  doc.file(Buffer.from(studyFileText(args.input), 'utf8'), {
    name: ATTACHMENT_NAME,
    type: 'application/json',
    description: `Study input (SHA-256 of the canonical input ${model.title.inputDigest})`,
    creationDate: when,
    modifiedDate: when,
  } as never);
  doc.end();
  return done;
}
