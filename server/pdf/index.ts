/**
 * The study appendix PDF: the renderer, the program version it prints, and the adapters the command
 * line and the web route call. See docs/report.md.
 */
import { readFileSync } from 'node:fs';
import type { StudyInput, UnitSystem } from '../../core/index.js';
import type { StudyOutput } from '../studies/index.js';
import { renderAppendixPdf } from './render.js';

export { renderAppendixPdf, appendixModel, issueDate, studyFileText, ATTACHMENT_NAME, LISTING_DIGITS } from './render.js';
export { cellText } from '../../templates/reportCells.js';
export type { AppendixPdfArgs } from './render.js';
export { pdfText, uncovered } from './text.js';

let version: string | undefined;

/** Runwright version from package.json (read once). */
export function runwrightVersion(): string {
  if (version === undefined) {
    const pkg = JSON.parse(readFileSync(new URL('../../package.json', import.meta.url), 'utf8')) as { version?: unknown };
    version = typeof pkg.version === 'string' ? pkg.version : '0.0.0';
  }
  return version;
}

/** Adapter for the command line (`CliIo.renderPdf`): today's date from `clock`, the package version. */
export function studyPdf(out: StudyOutput, units: UnitSystem, input: StudyInput, clock: () => Date = () => new Date()): Promise<Uint8Array> {
  return renderAppendixPdf({ input, output: out, units, clock, version: runwrightVersion() });
}

/** File name for a downloaded appendix, e.g. "sable-mesa-regional-appendix-2026-12-02.pdf". */
export function appendixFileName(studyName: string, date: Date): string {
  const slug = studyName.toLowerCase().normalize('NFKD').replace(/[^a-z0-9]+/g, '-').replace(/^-+|-+$/g, '').slice(0, 60) || 'study';
  return `${slug}-appendix-${date.toISOString().slice(0, 10)}.pdf`;
}
