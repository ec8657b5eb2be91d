/**
 * Study appendix PDF benchmark, on the invented demo study (examples/demo-study.json).
 *
 * - pdf_ms: median wall time of `renderAppendixPdf` for the demo study, from its computed result to the
 *   finished PDF bytes (report model, chart models, layout, pdfkit, compression, attachment). The study
 *   run itself is measured by the study benchmark. Target ≤ 500 ms.
 * - pdf_bytes: size of that PDF. Target ≤ 2 MB (2,000,000 bytes).
 */
import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import type { BenchModule } from './harness.js';
import { medianMs } from './harness.js';
import { renderAppendixPdf } from '../server/pdf/index.js';
import { parseStudyDocument, studyOutput } from '../server/studies/index.js';

const mod: BenchModule = {
  name: 'pdf',
  async run() {
    const doc = JSON.parse(readFileSync(fileURLToPath(new URL('../examples/demo-study.json', import.meta.url)), 'utf8'));
    const parsed = parseStudyDocument(doc);
    if (!parsed.ok) throw new Error('demo study invalid');
    const input = parsed.input;
    const output = studyOutput(input);
    const clock = () => new Date('2026-12-02T00:00:00Z');
    let bytes = 0;
    const ms = await medianMs(async () => {
      const pdf = await renderAppendixPdf({ input, output, clock, version: 'bench' });
      bytes = pdf.length;
    }, 9);
    return [
      { key: 'pdf_ms', label: 'Demo study appendix PDF, result to bytes (median of 9)', value: ms, unit: 'ms', target: { op: '<=', value: 500 } },
      { key: 'pdf_bytes', label: 'Demo study appendix PDF size', value: bytes, unit: 'B', target: { op: '<=', value: 2_000_000 } },
    ];
  },
};

export default mod;
