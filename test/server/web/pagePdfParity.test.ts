/**
 * Issue 14 regression: the results page and the PDF appendix show the same labels and numbers for
 * every row of the demo. Both render `componentSections` (core/report/model.ts) through one cell
 * formatter (templates/reportCells.ts); this test reads the page's components fragment of every row
 * and the appendix model's components table, and compares them line by line, in SI and US units.
 */
import { describe, expect, it } from 'vitest';
import { buildAppendixModel, componentSections, type Row } from '../../../core/index.js';
import { latestStudyResult } from '../../../db/index.js';
import type { StudyOutput } from '../../../server/studies/document.js';
import { cellText } from '../../../templates/reportCells.js';
import { browser, demoInput, makeApp } from './helpers.js';

const esc = (s: string): string => s.replace(/&/g, '&amp;').replace(/</g, '&lt;').replace(/>/g, '&gt;').replace(/"/g, '&quot;').replace(/'/g, '&#39;');

describe('page and appendix: the same components for every demo row', () => {
  it('every line of every row appears on the page with the appendix\'s label and number (SI and US)', async () => {
    const { app, db, studyId } = makeApp();
    const c = await browser(app);
    await c.post(`/studies/${studyId}/run`, {});
    const out = latestStudyResult(db, studyId)!.result as StudyOutput;
    const model = buildAppendixModel({ input: demoInput(), result: out, charts: [], inputDigest: out.inputDigest, date: '2026-12-03', version: 'test' });
    let lines = 0;
    for (const [si, s] of out.scenarios.entries()) {
      // The appendix's components table of this scenario holds the same labels in the same order.
      const section = model.sections.find((x) => x.id === `results-${si + 1}`)!;
      const tableRows = section.blocks.flatMap((b) => (b.type === 'table' && b.caption.startsWith('Components') ? b.rows : [])) as Row[];
      const pdfLabels = tableRows.flatMap((r) => ('cells' in r && 'text' in r.cells[0]! ? [r.cells[0].text] : []));
      for (const [ri, row] of s.rows.entries()) {
        for (const units of ['si', 'us'] as const) {
          const frag = await c.get(`/studies/${studyId}/results/rows/${si}/${ri}?units=${units}`, { htmx: true });
          expect(frag.status).toBe(200);
          for (const sec of componentSections([row])) {
            expect(frag.text).toContain(`<caption>${esc(sec.title)}</caption>`);
            for (const l of sec.lines) {
              if (l.cells[0] === undefined) continue;
              expect(pdfLabels, `${row.aircraft}: ${l.label} in the appendix`).toContain(l.label);
              expect(frag.text, `${row.aircraft} ${units}: ${l.label}`).toContain(esc(l.label));
              expect(frag.text, `${row.aircraft} ${units}: ${l.label} value`).toContain(esc(cellText(l.cells[0], undefined, units)));
              lines++;
            }
          }
        }
      }
    }
    expect(lines).toBeGreaterThan(300);
  });
});
