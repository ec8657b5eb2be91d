/**
 * Text for the embedded fonts (server/pdf/text.ts, fonts.ts): what the fonts draw is kept as written,
 * invisible characters are dropped, and anything no font draws becomes a visible U+FFFD that
 * `uncovered` reports; every string of the demo appendix is covered. Coverage of the scripts: the
 * Unicode blocks as published in The Unicode Standard (code charts), assigned code points per the
 * JavaScript engine's Unicode data (\p{Cn} = unassigned).
 */
import { describe, expect, it } from 'vitest';
import { appendixModel, pdfText, uncovered } from '../../../server/pdf/index.js';
import { fontPackages } from '../../../server/pdf/fonts.js';
import { existsSync, readFileSync } from 'node:fs';
import { climbLimitedDoc, clock, demoDoc, studyOf } from './helpers.js';

function strings(v: unknown, out: string[] = []): string[] {
  if (typeof v === 'string') out.push(v);
  else if (Array.isArray(v)) v.forEach((x) => strings(x, out));
  else if (v && typeof v === 'object') Object.values(v).forEach((x) => strings(x, out));
  return out;
}

describe('pdfText', () => {
  it('keeps symbols, Greek and combining marks the embedded fonts draw', () => {
    const keep = 'σ ≥ 0.024, √x − 1, ρ·V², Δγ2, μ′ ≤ 0.5 → ok, T\u0304/W, ∝ ∈ ⋅ ✓ ✗';
    expect(pdfText(keep)).toBe(keep);
    expect(uncovered(keep)).toEqual([]);
  });

  it('keeps the Latin-1 characters the appendix uses', () => {
    const keep = '35.0 °C — 1,400 m (4,593 ft) × ½ · m² µ – “a” ‘b’ … •';
    expect(pdfText(keep)).toBe(keep);
    expect(uncovered(keep)).toEqual([]);
  });

  it('turns tabs into spaces and drops control and invisible format characters', () => {
    expect(pdfText('a\tb\r\nc\u200bd\u0007e\ufeff')).toBe('a b\ncde');
  });

  it('marks a character no font draws with a visible U+FFFD (never "?") and reports it', () => {
    // Devanagari and Ethiopic are outside the embedded fonts.
    expect(pdfText('Pune पुणे')).toBe('Pune \ufffd\ufffd\ufffd\ufffd');
    expect(pdfText('a ሀ b')).toBe('a \ufffd b');
    expect(uncovered('a ሀ b ሀ')).toEqual(['ሀ']);
    expect(pdfText('a ሀ b')).not.toContain('?');
  });
});

/** Assigned code points of a range (inclusive). */
function assigned(from: number, to: number): number[] {
  const out: number[] = [];
  for (let c = from; c <= to; c++) if (!/\p{Cn}/u.test(String.fromCodePoint(c))) out.push(c);
  return out;
}

describe('the embedded fonts cover the scripts a study may be written in', () => {
  // Unicode blocks (The Unicode Standard, code charts). CJK Unified Ideographs up to U+9FEF (Unicode 11):
  // the 16 ideographs U+9FF0–U+9FFF added in Unicode 13 and 14 are not in Noto Sans SC (docs/report.md).
  const blocks: [string, number, number][] = [
    ['Basic Latin', 0x20, 0x7e], ['Latin-1 Supplement', 0xa0, 0xff], ['Latin Extended-A', 0x100, 0x17f],
    ['Latin Extended-B', 0x180, 0x24f], ['Greek and Coptic', 0x370, 0x3ff], ['Cyrillic', 0x400, 0x4ff],
    ['Hiragana', 0x3041, 0x309f], ['Katakana', 0x30a0, 0x30ff], ['CJK Symbols and Punctuation', 0x3000, 0x303f],
    ['CJK Unified Ideographs', 0x4e00, 0x9fef], ['Hangul Syllables', 0xac00, 0xd7a3], ['Hangul Jamo', 0x1100, 0x11ff],
  ];
  for (const [name, from, to] of blocks) {
    it(`${name} (U+${from.toString(16).toUpperCase().padStart(4, '0')}–U+${to.toString(16).toUpperCase()})`, () => {
      const cps = assigned(from, to);
      expect(cps.length).toBeGreaterThan(0);
      const missing = cps.filter((c) => uncovered(String.fromCodePoint(c)).length > 0).map((c) => c.toString(16));
      expect(missing).toEqual([]);
    });
  }

  it('ships the licence of every font package it embeds', () => {
    const pkgs = fontPackages();
    expect(pkgs.map((p) => p.name).sort()).toEqual(['@expo-google-fonts/arimo', '@expo-google-fonts/noto-sans-kr', '@expo-google-fonts/noto-sans-sc', 'dejavu-fonts-ttf']);
    for (const p of pkgs) {
      expect(existsSync(p.licenseFile), p.licenseFile).toBe(true);
      expect(readFileSync(p.licenseFile, 'utf8')).toMatch(p.name === 'dejavu-fonts-ttf' ? /Bitstream Vera/ : /SIL Open Font License, Version 1\.1/);
    }
  });
});

describe('every string of the appendix model can be drawn', () => {
  for (const [name, doc] of [['demo', demoDoc()], ['climb-limited', climbLimitedDoc()]] as const) {
    it(`${name} study, SI and US`, () => {
      const study = studyOf(doc);
      for (const units of ['si', 'us'] as const) {
        const model = appendixModel({ ...study, clock, version: '0.1.0', units });
        const bad = [...new Set(strings(model).flatMap(uncovered))];
        expect(bad).toEqual([]);
      }
    });
  }
});
