/**
 * Fonts of the appendix PDF. The PDF embeds (subsets of) TrueType fonts installed by `npm ci`, so
 * names in any of the scripts a study may use print as written:
 *
 * - Arimo (regular, bold, italic; package @expo-google-fonts/arimo, SIL Open Font License 1.1): the
 *   text face for Latin (with Latin Extended-A and -B), Greek and Cyrillic. Its advance widths match
 *   the Helvetica/Arial metrics the layout was drawn for.
 * - DejaVu Sans Mono (package dejavu-fonts-ttf, Bitstream Vera licence; DejaVu changes public domain):
 *   the monospaced face (formulas, the input digest).
 * - DejaVu Sans (same package): fallback for symbols the faces lack (∝, ∈, ✓, arrows, ...).
 * - Noto Sans SC (package @expo-google-fonts/noto-sans-sc, OFL 1.1): CJK Unified Ideographs (and
 *   Extension A), kana, CJK punctuation and full-width forms.
 * - Noto Sans KR (package @expo-google-fonts/noto-sans-kr, OFL 1.1): Hangul.
 *
 * Each face has a chain of fonts; a character is drawn in the first font of the chain that has a glyph
 * for it (text.ts splits a string into runs by font). A character no font has is replaced by U+FFFD
 * (see `pdfText`). Fonts are read and parsed once per thread (the main thread or a worker) and shared by
 * every document that thread renders; paths are resolved from this module, so they work in a worker too.
 * See docs/report.md ("Fonts").
 */
import { readFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import * as fontkit from 'fontkit';

type Doc = PDFKit.PDFDocument;

/** The faces the appendix uses. */
export type Face = 'regular' | 'bold' | 'italic' | 'mono';

/** Font files, by the name each is registered under in a document. */
const FILES = {
  'rw-sans': '@expo-google-fonts/arimo/400Regular/Arimo_400Regular.ttf',
  'rw-sans-bold': '@expo-google-fonts/arimo/700Bold/Arimo_700Bold.ttf',
  'rw-sans-italic': '@expo-google-fonts/arimo/400Regular_Italic/Arimo_400Regular_Italic.ttf',
  'rw-mono': 'dejavu-fonts-ttf/ttf/DejaVuSansMono.ttf',
  'rw-sym': 'dejavu-fonts-ttf/ttf/DejaVuSans.ttf',
  'rw-sym-bold': 'dejavu-fonts-ttf/ttf/DejaVuSans-Bold.ttf',
  'rw-sym-italic': 'dejavu-fonts-ttf/ttf/DejaVuSans-Oblique.ttf',
  'rw-cjk': '@expo-google-fonts/noto-sans-sc/400Regular/NotoSansSC_400Regular.ttf',
  'rw-cjk-bold': '@expo-google-fonts/noto-sans-sc/700Bold/NotoSansSC_700Bold.ttf',
  'rw-hangul': '@expo-google-fonts/noto-sans-kr/400Regular/NotoSansKR_400Regular.ttf',
  'rw-hangul-bold': '@expo-google-fonts/noto-sans-kr/700Bold/NotoSansKR_700Bold.ttf',
} as const;

export type FontName = keyof typeof FILES;

/** Names to pass to `doc.font(...)` for each face (the first font of its chain). */
export const FONT = {
  regular: 'rw-sans',
  bold: 'rw-sans-bold',
  italic: 'rw-sans-italic',
  mono: 'rw-mono',
} as const satisfies Record<Face, FontName>;

const REGULAR_FALLBACK: readonly FontName[] = ['rw-sym', 'rw-cjk', 'rw-hangul'];

/**
 * Font chain of each face. Every chain ends with the regular fallbacks, so all faces cover the same
 * characters (a bold face borrows a regular glyph rather than dropping it).
 */
const CHAINS: Readonly<Record<Face, readonly FontName[]>> = {
  regular: ['rw-sans', ...REGULAR_FALLBACK],
  bold: ['rw-sans-bold', 'rw-sym-bold', 'rw-cjk-bold', 'rw-hangul-bold', 'rw-sans', ...REGULAR_FALLBACK],
  italic: ['rw-sans-italic', 'rw-sym-italic', 'rw-sans', ...REGULAR_FALLBACK],
  mono: ['rw-mono', 'rw-sym', 'rw-sans', 'rw-cjk', 'rw-hangul'],
};

/** The chain of a face. */
export function chainOf(face: Face): readonly FontName[] {
  return CHAINS[face];
}

const require = createRequire(import.meta.url);

interface Loaded {
  readonly font: fontkit.Font;
  /** Coverage memo: code point → has a glyph. */
  readonly has: Map<number, boolean>;
}

const loaded = new Map<FontName, Loaded>();

/** Absolute path of a font file (resolved through node_modules from this module). */
export function fontPath(name: FontName): string {
  return require.resolve(FILES[name]);
}

function load(name: FontName): Loaded {
  let l = loaded.get(name);
  if (!l) {
    const f = fontkit.create(readFileSync(fontPath(name)));
    if (!('layout' in f)) throw new Error(`font ${FILES[name]} is a collection, not a single font`);
    l = { font: f, has: new Map() };
    loaded.set(name, l);
  }
  return l;
}

/** Whether font `name` has a glyph for code point `cp` (memoised per thread). */
export function hasGlyph(name: FontName, cp: number): boolean {
  const l = load(name);
  let h = l.has.get(cp);
  if (h === undefined) {
    h = l.font.hasGlyphForCodePoint(cp);
    l.has.set(cp, h);
  }
  return h;
}

/** Ascender and descender of a font, in thousandths of the font size (as pdfkit measures them). */
export function lineMetrics(name: FontName): { ascender: number; descender: number } {
  const f = load(name).font;
  return { ascender: (f.ascent * 1000) / f.unitsPerEm, descender: (f.descent * 1000) / f.unitsPerEm };
}

/** The first font of `face`'s chain that draws `cp`, or undefined when none does. */
export function fontFor(face: Face, cp: number): FontName | undefined {
  for (const n of CHAINS[face]) if (hasGlyph(n, cp)) return n;
  return undefined;
}

/** Whether any of the appendix fonts draws `cp` (all chains cover the same set). */
export function drawable(cp: number): boolean {
  return fontFor('regular', cp) !== undefined;
}

const registered = new WeakMap<Doc, Set<FontName>>();

/** Registers font `name` with `doc` if it is not yet (pdfkit embeds a font only once a page draws with it). */
export function useFont(doc: Doc, name: FontName): void {
  let set = registered.get(doc);
  if (!set) {
    set = new Set();
    registered.set(doc, set);
  }
  if (set.has(name)) return;
  // pdfkit accepts a parsed fontkit font as the source: it is parsed once per thread and shared.
  doc.registerFont(name, load(name).font as never);
  set.add(name);
}

/**
 * Registers the four faces with `doc` and selects the regular one. Fallback fonts are registered when
 * a text first needs them (text.ts), so a study in Latin script never reads the CJK fonts.
 */
export function registerFonts(doc: Doc): void {
  for (const face of ['regular', 'bold', 'italic', 'mono'] as const) useFont(doc, FONT[face]);
  doc.font(FONT.regular);
}

/** Face of the font currently selected in `doc` (registered name → face; anything else is regular). */
export function currentFace(doc: Doc): Face {
  const src = (doc as unknown as { _font?: { font?: unknown } })._font?.font;
  for (const face of ['bold', 'italic', 'mono', 'regular'] as const) {
    const l = loaded.get(FONT[face]);
    if (l && l.font === src) return face;
  }
  return 'regular';
}

/** Package, version, licence and licence file of each font package (docs/report.md lists them; a test checks the files). */
export function fontPackages(): { name: string; version: string; license: string; licenseFile: string }[] {
  const pkgs = ['@expo-google-fonts/arimo', 'dejavu-fonts-ttf', '@expo-google-fonts/noto-sans-sc', '@expo-google-fonts/noto-sans-kr'];
  return pkgs.map((p) => {
    const dir = require.resolve(`${p}/package.json`).replace(/package\.json$/, '');
    const pj = JSON.parse(readFileSync(`${dir}package.json`, 'utf8')) as { version: string; license: string };
    const licenseFile = p === 'dejavu-fonts-ttf' ? `${dir}LICENSE` : `${dir}LICENSE_FONT`;
    return { name: p, version: pj.version, license: pj.license, licenseFile };
  });
}
