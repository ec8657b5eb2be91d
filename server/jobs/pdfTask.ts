/**
 * The appendix PDF as a job-pool task: drawing a large study's appendix takes seconds to minutes of
 * synchronous pdfkit work, so the web route runs it in a worker thread (docs/web.md, "Responsiveness").
 *
 * Input and output are plain data (structured-clone-able): the study input and its computed output,
 * the issue time as epoch milliseconds (a fixed date gives the same bytes), the version string and the
 * display units. The result is the PDF as a Uint8Array that owns its whole buffer, so the worker can
 * transfer it to the main thread instead of copying it.
 */
import type { StudyInput, UnitSystem } from '../../core/index.js';
import { renderAppendixPdf } from '../pdf/render.js';
import type { StudyOutput } from '../studies/index.js';

export interface PdfTaskInput {
  readonly input: StudyInput;
  readonly output: StudyOutput;
  /** Issue time of the appendix, epoch milliseconds (printed and stored as the PDF's dates). */
  readonly issuedAt: number;
  readonly version: string;
  readonly units: UnitSystem;
}

/** Draws the appendix; the same task gives the same bytes. */
export async function renderPdfTask(t: PdfTaskInput): Promise<Uint8Array> {
  const when = new Date(t.issuedAt);
  const pdf = await renderAppendixPdf({ input: t.input, output: t.output, clock: () => when, version: t.version, units: t.units });
  // A Buffer may be a view into a shared pool; transferring that would detach unrelated memory.
  if (pdf.byteOffset === 0 && pdf.byteLength === pdf.buffer.byteLength) return new Uint8Array(pdf.buffer, 0, pdf.byteLength);
  return new Uint8Array(pdf);
}

/** The buffer of a rendered PDF, to transfer rather than copy. */
export function pdfTransferList(pdf: Uint8Array): ArrayBuffer[] {
  return pdf.buffer instanceof ArrayBuffer && pdf.byteOffset === 0 && pdf.byteLength === pdf.buffer.byteLength ? [pdf.buffer] : [];
}
