/**
 * WinAnsi text for the standard PDF fonts (server/pdf/text.ts): substitutions for symbols the fonts
 * cannot draw, and a check that every string of the demo appendix is covered (nothing prints as "?").
 * Character set: Windows-1252 as pdfkit's AFM fonts encode it (common practice).
 */
import { describe, expect, it } from 'vitest';
import { appendixModel, pdfText, uncovered } from '../../../server/pdf/index.js';
import { climbLimitedDoc, clock, demoDoc, studyOf } from './helpers.js';

function strings(v: unknown, out: string[] = []): string[] {
  if (typeof v === 'string') out.push(v);
  else if (Array.isArray(v)) v.forEach((x) => strings(x, out));
  else if (v && typeof v === 'object') Object.values(v).forEach((x) => strings(x, out));
  return out;
}

describe('pdfText', () => {
  it('writes out symbols outside WinAnsi', () => {
    expect(pdfText('σ ≥ 0.024, √x − 1, ρ·V², Δγ2')).toBe('sigma >= 0.024, sqrtx - 1, rho·V², delta gamma2');
    expect(pdfText('μ′ ≤ 0.5 → ok')).toBe("µ' <= 0.5 -> ok");
    expect(pdfText('T\u0304/W')).toBe('T_mean/W');
  });

  it('keeps the WinAnsi characters the appendix uses', () => {
    const keep = '35.0 °C — 1,400 m (4,593 ft) × ½ · m² µ – “a” ‘b’ … •';
    expect(pdfText(keep)).toBe(keep);
    expect(uncovered(keep)).toEqual([]);
  });

  it('marks a character it does not know with "?" and reports it', () => {
    expect(pdfText('a ✈ b')).toBe('a ? b');
    expect(uncovered('a ✈ b ✈')).toEqual(['✈']);
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
