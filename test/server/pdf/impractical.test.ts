/**
 * Issue 12, finding 3 in the appendix: a row beyond the plausibility bound (core/plausibility.ts) is
 * reported with its reason in the PDF (read back with pdftotext), and the method section states the
 * bound. The case: the invented single-engine commuter at 3 500 m / 45 °C
 * (test/core/study/impractical.fixture.ts).
 */
import { beforeAll, describe, expect, it } from 'vitest';
import { impracticalDoc } from '../../core/study/impractical.fixture.js';
import { pagesText, renderTo, studyOf, workDir } from './helpers.js';

const squash = (s: string): string => s.replace(/\s+/g, ' ');

describe('appendix of a study with an aircraft beyond the plausibility bound', () => {
  let text = '';
  beforeAll(async () => {
    const { file } = await renderTo(workDir(), 'impractical.pdf', studyOf(impracticalDoc(45)));
    text = squash(pagesText(file).join('\n'));
  });

  it('carries the reason for the row, not a length', () => {
    expect(text).toMatch(/Plover CT-19S: cannot operate here\. This aircraft cannot practically operate here: the takeoff needs 6,\d{3} m at 3,500 m \/ 45.0 °C and 7,294 kg, more than the plausibility bound of 5,500 m \(absolute cap, the length class of the longest paved runways\)/);
    expect(text).not.toMatch(/6,3\d\d m \(/);
  });

  it('states the bound in the method section', () => {
    expect(text).toContain('Plausibility bound');
    expect(text).toContain('bound = max(2.5 × ARFL, 5500 m)');
  });
});
