/**
 * Text in the appendix PDF. Every string the appendix draws passes through `pdfText`, the one place
 * where characters are checked against the embedded fonts (fonts.ts): control and invisible format
 * characters are dropped, tabs become spaces, and a character that no font can draw (an emoji outside
 * DejaVu Sans, a script outside the fonts) becomes U+FFFD REPLACEMENT CHARACTER, drawn as a visible
 * "�" and extracted as such, never as a silent "?" or a blank. docs/report.md ("Fonts") lists the
 * coverage.
 *
 * Drawing and measuring: a string whose characters all exist in the current face's font goes straight
 * to pdfkit (its wrapping, alignment, ellipsis). A string that needs a fallback font (a Chinese study
 * name, a symbol only DejaVu has) is split into runs by font; it is wrapped here, at spaces and between
 * CJK characters, and each line is drawn run by run on one baseline. `textWidth`, `textHeight` and
 * `drawText` use the same runs and line breaks, so what a table measures is what it draws.
 */
import { chainOf, currentFace, drawable, fontFor, FONT, hasGlyph, lineMetrics, useFont, type Face, type FontName } from './fonts.js';

type Doc = PDFKit.PDFDocument;
type TextOptions = PDFKit.Mixins.TextOptions;

/** What a character no embedded font can draw is replaced with. */
export const REPLACEMENT = '\ufffd';

/** Control characters (other than line feed) and invisible format characters: dropped. */
const DROP = /[\u0000-\u0009\u000b-\u001f\u007f-\u009f\u00ad\u200b-\u200f\u202a-\u202e\u2060-\u2064\ufe00-\ufe0f\ufeff]/u;

/** The text ready to draw: tabs as spaces, invisible characters dropped, undrawable ones as U+FFFD. */
export function pdfText(text: string): string {
  let out = '';
  for (const ch of text) {
    if (ch === '\t') out += ' ';
    else if (ch === '\n') out += ch;
    else if (DROP.test(ch)) continue;
    else out += drawable(ch.codePointAt(0)!) ? ch : REPLACEMENT;
  }
  return out;
}

/** Characters of `text` that no embedded font draws (each would print as U+FFFD). */
export function uncovered(text: string): string[] {
  const bad = new Set<string>();
  for (const ch of text) if (ch !== '\t' && ch !== '\n' && !DROP.test(ch) && !drawable(ch.codePointAt(0)!)) bad.add(ch);
  return [...bad];
}

// ---------------------------------------------------------------------------------------------
// Runs by font
// ---------------------------------------------------------------------------------------------

interface Run { readonly font: FontName; readonly text: string }

const MARK = /\p{M}/u;

/** Splits already-sanitised text into runs, each in the first font of `face`'s chain that draws it. */
export function runsOf(face: Face, p: string): Run[] {
  const runs: { font: FontName; text: string }[] = [];
  const primary = chainOf(face)[0]!;
  for (const ch of p) {
    const cp = ch.codePointAt(0)!;
    const last = runs.at(-1);
    // A space or a combining mark stays in the run before it when that font has it.
    let font: FontName;
    if (last && (ch === ' ' || MARK.test(ch)) && hasGlyph(last.font, cp)) font = last.font;
    else font = ch === '\n' ? (last?.font ?? primary) : (fontFor(face, cp) ?? primary);
    if (last && last.font === font) last.text += ch;
    else runs.push({ font, text: ch });
  }
  return runs;
}

/** Whether `p` is drawn by the current face's own font alone (pdfkit lays it out directly). */
function single(doc: Doc, p: string): Face | null {
  const face = currentFace(doc);
  const primary = FONT[face];
  for (const ch of p) {
    if (ch === '\n' || ch === ' ') continue;
    if (!hasGlyph(primary, ch.codePointAt(0)!)) return null;
  }
  return face;
}

function fontSize(doc: Doc): number {
  return (doc as unknown as { _fontSize: number })._fontSize;
}

function widthOfRuns(doc: Doc, face: Face, runs: readonly Run[]): number {
  let w = 0;
  for (const r of runs) {
    useFont(doc, r.font);
    doc.font(r.font);
    w += doc.widthOfString(r.text);
  }
  doc.font(FONT[face]);
  return w;
}

// ---------------------------------------------------------------------------------------------
// Measuring and drawing
// ---------------------------------------------------------------------------------------------

/** Width of one line of sanitised text in the current face and size. */
export function textWidth(doc: Doc, p: string, opts?: TextOptions): number {
  if (single(doc, p)) return doc.widthOfString(p, opts);
  return widthOfRuns(doc, currentFace(doc), runsOf(currentFace(doc), p));
}

/** CJK ideographs, kana, Hangul and full-width forms: a line may break before or after each. */
function isWide(cp: number): boolean {
  return (cp >= 0x1100 && cp <= 0x11ff) || (cp >= 0x2e80 && cp <= 0xa4cf) || (cp >= 0xac00 && cp <= 0xd7af)
    || (cp >= 0xf900 && cp <= 0xfaff) || (cp >= 0xfe30 && cp <= 0xfe4f) || (cp >= 0xff00 && cp <= 0xffef) || cp >= 0x20000;
}

/** Closing punctuation that never starts a line (、。，）」 and the like). */
const NO_BREAK_BEFORE = /[\u3001\u3002\u3009\u300b\u300d\u300f\u3011\u3015\u3017\u3019\u301b\u30fc\uff01\uff09\uff0c\uff0e\uff1a\uff1b\uff1f\uff3d\uff5d!),.:;?\]}]/u;

/** Pieces of a paragraph between break opportunities (a space stays at the end of its piece). */
function pieces(line: string): string[] {
  const out: string[] = [];
  let cur = '';
  let prevWide = false;
  for (const ch of line) {
    const wide = isWide(ch.codePointAt(0)!);
    const breakBefore = cur !== '' && !NO_BREAK_BEFORE.test(ch) && !MARK.test(ch) && (wide || prevWide || cur.endsWith(' ')) && ch !== ' ';
    if (breakBefore) {
      out.push(cur);
      cur = '';
    }
    cur += ch;
    prevWide = wide;
  }
  if (cur !== '') out.push(cur);
  return out;
}

/** Lines of mixed-font text wrapped to `width` (greedy, as pdfkit does; a piece too wide alone is cut). */
function wrapMixed(doc: Doc, face: Face, p: string, width: number): string[] {
  const w = (s: string): number => widthOfRuns(doc, face, runsOf(face, s));
  const lines: string[] = [];
  for (const para of p.split('\n')) {
    let line = '';
    for (let piece of pieces(para)) {
      if (line !== '' && w((line + piece).trimEnd()) <= width) {
        line += piece;
        continue;
      }
      if (line !== '') lines.push(line.trimEnd());
      line = '';
      // A piece wider than the line on its own is cut between characters.
      while (w(piece.trimEnd()) > width && [...piece].length > 1) {
        const chars = [...piece];
        let n = chars.length - 1;
        while (n > 1 && w(chars.slice(0, n).join('')) > width) n--;
        lines.push(chars.slice(0, n).join(''));
        piece = chars.slice(n).join('');
      }
      line = piece;
    }
    lines.push(line.trimEnd());
  }
  return lines;
}

/** Height of sanitised text wrapped to `width` (the same breaks `drawText` uses). */
export function textHeight(doc: Doc, p: string, width: number, opts: TextOptions = {}): number {
  if (single(doc, p)) return doc.heightOfString(p, { width, ...opts });
  const lines = wrapMixed(doc, currentFace(doc), p, width);
  return lines.length * (doc.currentLineHeight(true) + (opts.lineGap ?? 0));
}

/** Cuts one line of mixed text to `width`, ending in "…" when it had to be cut. */
function ellipsize(doc: Doc, face: Face, p: string, width: number): string {
  const w = (s: string): number => widthOfRuns(doc, face, runsOf(face, s));
  if (w(p) <= width) return p;
  const chars = [...p];
  let n = chars.length;
  while (n > 0 && w(`${chars.slice(0, n).join('').trimEnd()}\u2026`) > width) n--;
  return `${chars.slice(0, n).join('').trimEnd()}\u2026`;
}

/**
 * Draws sanitised text at (x, y) as `doc.text` does (options: width, align left/right/center, lineGap,
 * lineBreak, ellipsis, baseline 'alphabetic', goTo/link). Leaves doc.x at x and doc.y below the text.
 */
export function drawText(doc: Doc, p: string, x: number, y: number, opts: TextOptions = {}): void {
  if (single(doc, p)) {
    doc.text(p, x, y, opts);
    return;
  }
  const face = currentFace(doc);
  const width = opts.width;
  const lineGap = opts.lineGap ?? 0;
  let lines: string[];
  if (width === undefined || opts.lineBreak === false) {
    lines = p.split('\n');
    if (opts.ellipsis && width !== undefined) lines = [ellipsize(doc, face, lines[0] ?? '', width)];
  } else {
    lines = wrapMixed(doc, face, p, width);
  }
  const size = fontSize(doc);
  const { ascender } = lineMetrics(FONT[face]);
  const lh = doc.currentLineHeight(true) + lineGap;
  const link = opts.goTo !== undefined ? { goTo: opts.goTo } : opts.link !== undefined ? { link: opts.link } : {};
  let ly = y;
  for (const line of lines) {
    const runs = runsOf(face, line);
    const lw = widthOfRuns(doc, face, runs);
    let lx = x;
    if (width !== undefined && opts.align === 'right') lx = x + width - lw;
    else if (width !== undefined && opts.align === 'center') lx = x + (width - lw) / 2;
    const base = opts.baseline === 'alphabetic' ? ly : ly + (ascender * size) / 1000;
    for (const r of runs) {
      useFont(doc, r.font);
      doc.font(r.font);
      const rw = doc.widthOfString(r.text);
      doc.text(r.text, lx, base, { lineBreak: false, baseline: 'alphabetic', ...link });
      lx += rw;
    }
    doc.font(FONT[face]);
    ly += lh;
  }
  doc.x = x;
  doc.y = ly;
}
