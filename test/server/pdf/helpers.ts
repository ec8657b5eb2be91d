/** Shared set-up for the appendix PDF tests: studies, a fixed clock, and the poppler command-line tools. */
import { execFileSync } from 'node:child_process';
import { mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import type { StudyInput, UnitSystem } from '../../../core/index.js';
import { renderAppendixPdf } from '../../../server/pdf/index.js';
import { parseStudyDocument, studyOutput, type StudyOutput } from '../../../server/studies/document.js';

export const root = resolve(import.meta.dirname, '..', '..', '..');
export const demoDoc = (): any => JSON.parse(readFileSync(join(root, 'examples/demo-study.json'), 'utf8'));

/** Issue date used by every test that compares bytes. */
export const ISSUED = new Date('2026-12-02T09:30:00Z');
export const clock = (): Date => ISSUED;

export function studyOf(doc: unknown): { input: StudyInput; output: StudyOutput } {
  const p = parseStudyDocument(doc);
  if (!p.ok) throw new Error(`test study invalid: ${JSON.stringify(p.problems)}`);
  return { input: p.input, output: studyOutput(p.input) };
}

/**
 * The demo site made hot and high (1600 m, 38 °C, profile raised with it) with a scenario whose regional
 * jet flies a 3000 km stage with 7000 kg payload: heavy enough that its engine-out climb gradient at V2
 * falls below the 2.4 % minimum (climb-limited) while it can still take off.
 */
export function climbLimitedDoc(): any {
  const doc = demoDoc();
  const raise = 1600 - doc.site.elevation_m;
  doc.site.elevation_m = 1600;
  doc.site.designTemperature_c = 38;
  delete doc.site.climate;
  for (const r of doc.site.runways) for (const p of r.profile) p.elevation_m += raise;
  doc.name = 'Hot and high check';
  doc.scenarios = [{
    name: 'Hot and high jet',
    fleet: [
      { aircraft: 'tern-rj90', annualOperations: 900, stageLength_km: 3000, payload_kg: 7000 },
      { aircraft: 'curlew-rt70', annualOperations: 1500, stageLength_km: 600, payload_kg: 5000 },
    ],
  }];
  return doc;
}

export const workDir = (): string => mkdtempSync(join(tmpdir(), 'rw-pdf-'));

export async function renderTo(dir: string, name: string, study: { input: StudyInput; output: StudyOutput }, opts: { units?: UnitSystem; clock?: () => Date } = {}): Promise<{ file: string; bytes: Buffer }> {
  const bytes = await renderAppendixPdf({
    input: study.input, output: study.output, clock: opts.clock ?? clock, version: '0.1.0-test',
    ...(opts.units ? { units: opts.units } : {}),
  });
  const file = join(dir, name);
  writeFileSync(file, bytes);
  return { file, bytes };
}

const run = (cmd: string, args: string[]): string => execFileSync(cmd, args, { encoding: 'latin1', maxBuffer: 64 * 1024 * 1024 });

/** Text of each page (pdftotext -layout, split at form feeds). */
export function pagesText(file: string): string[] {
  const pages = run('pdftotext', ['-layout', '-enc', 'UTF-8', file, '-']).split('\f');
  if (pages.at(-1)?.trim() === '') pages.pop();
  return pages.map((p) => Buffer.from(p, 'latin1').toString('utf8'));
}

/** pdfinfo fields. */
export function pdfInfo(file: string): Record<string, string> {
  const out: Record<string, string> = {};
  for (const line of run('pdfinfo', [file]).split('\n')) {
    const i = line.indexOf(':');
    if (i > 0) out[line.slice(0, i).trim()] = line.slice(i + 1).trim();
  }
  return out;
}

export { run as runTool };
