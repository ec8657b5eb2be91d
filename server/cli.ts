/**
 * Command line: run a study file and write the result.
 *
 *   npm run study -- <study.json> [--format json|csv|pdf] [--out FILE] [--units si|us] [--date YYYY-MM-DD]
 *
 * Exit codes: 0 success; 2 invalid input (usage, unreadable or malformed file, or values out of range —
 * every problem listed by JSON path, field, value and allowed range); 1 internal error.
 * The same input gives the same output bytes.
 */
import { readFileSync, writeFileSync } from 'node:fs';
import { InputDomainError, noticeJson, type UnitSystem } from '../core/index.js';
import { resultsCsv } from './studies/index.js';
import { jsonDepthExcess, jsonDepthMessage } from './io/text.js';
import { formatProblem } from './common/schema.js';
import { parseStudyDocument, problemFromDomainError, studyOutput, type StudyOutput } from './studies/index.js';

export const USAGE = 'usage: npm run study -- <study.json> [--format json|csv|pdf] [--out FILE] [--units si|us] [--date YYYY-MM-DD]';

export interface CliArgs {
  readonly file: string;
  readonly format: 'json' | 'csv' | 'pdf';
  readonly out?: string;
  readonly units?: UnitSystem;
  /** Issue date printed in a PDF (default today); fixing it makes the PDF bytes reproducible. */
  readonly date?: Date;
}

export class UsageError extends Error {}

export function parseArgs(argv: readonly string[]): CliArgs {
  let file: string | undefined;
  let format: CliArgs['format'] = 'json';
  let out: string | undefined;
  let units: UnitSystem | undefined;
  let date: Date | undefined;
  for (let i = 0; i < argv.length; i++) {
    const a = argv[i]!;
    const value = () => {
      const v = argv[++i];
      if (v === undefined) throw new UsageError(`${a} needs a value`);
      return v;
    };
    if (a === '--format') {
      const v = value();
      if (v !== 'json' && v !== 'csv' && v !== 'pdf') throw new UsageError(`--format: "${v}" is not allowed; one of json, csv, pdf`);
      format = v;
    } else if (a === '--out') out = value();
    else if (a === '--units') {
      const v = value();
      if (v !== 'si' && v !== 'us') throw new UsageError(`--units: "${v}" is not allowed; one of si, us`);
      units = v;
    } else if (a === '--date') {
      const v = value();
      const d = /^\d{4}-\d{2}-\d{2}$/.test(v) ? new Date(`${v}T00:00:00Z`) : undefined;
      if (!d || Number.isNaN(d.getTime()) || d.toISOString().slice(0, 10) !== v) throw new UsageError(`--date: "${v}" is not allowed; a calendar date YYYY-MM-DD`);
      date = d;
    } else if (a.startsWith('--')) throw new UsageError(`unknown option ${a}`);
    else if (file === undefined) file = a;
    else throw new UsageError(`unexpected argument ${a}`);
  }
  if (file === undefined) throw new UsageError('a study file is required');
  return { file, format, ...(out === undefined ? {} : { out }), ...(units === undefined ? {} : { units }), ...(date === undefined ? {} : { date }) };
}

export interface CliIo {
  readonly readFile: (path: string) => string;
  readonly writeFile: (path: string, data: string | Uint8Array) => void;
  readonly stdout: (text: string | Uint8Array) => void;
  readonly stderr: (text: string) => void;
  /** PDF renderer (the report module), injected so the CLI stays small. */
  readonly renderPdf?: (out: StudyOutput, units: UnitSystem, input: import('../core/index.js').StudyInput, date?: Date) => Promise<Uint8Array>;
}

/** Runs the CLI; returns the exit code. */
export async function runCli(argv: readonly string[], io: CliIo): Promise<number> {
  let args: CliArgs;
  try {
    args = parseArgs(argv);
  } catch (e) {
    if (e instanceof UsageError) {
      io.stderr(`${e.message}\n${USAGE}\n`);
      return 2;
    }
    throw e;
  }
  let text: string;
  try {
    text = io.readFile(args.file);
  } catch (e) {
    io.stderr(`${args.file}: cannot read the file (${(e as NodeJS.ErrnoException).code ?? String(e)})\n`);
    return 2;
  }
  const deep = jsonDepthExcess(text);
  if (deep) {
    io.stderr(`${args.file}: not accepted: the document is ${jsonDepthMessage(deep)}\n`);
    return 2;
  }
  let doc: unknown;
  try {
    doc = JSON.parse(text);
  } catch (e) {
    io.stderr(`${args.file}: not valid JSON: ${(e as Error).message}\n`);
    return 2;
  }
  const parsed = parseStudyDocument(doc);
  if (!parsed.ok) {
    io.stderr(`${args.file}: ${parsed.problems.length} problem${parsed.problems.length === 1 ? '' : 's'}:\n`);
    for (const p of parsed.problems) io.stderr(`  - ${formatProblem(p)} [field ${p.field}, value ${p.value === undefined || p.value === null ? 'missing' : JSON.stringify(p.value)}]\n`);
    return 2;
  }
  let out: StudyOutput;
  try {
    out = studyOutput(parsed.input);
  } catch (e) {
    if (e instanceof InputDomainError) {
      const p = problemFromDomainError(e);
      io.stderr(`${args.file}: 1 problem:\n  - ${formatProblem(p)} [field ${p.field}, value ${p.value === undefined ? 'missing' : JSON.stringify(p.value)}]\n`);
      return 2;
    }
    throw e;
  }
  const units = args.units ?? parsed.input.options.units;
  let data: string | Uint8Array;
  if (args.format === 'json') data = noticeJson(out, units, 2) + '\n';
  else if (args.format === 'csv') data = resultsCsv(out, units);
  else {
    if (!io.renderPdf) {
      io.stderr('PDF output is not available in this build\n');
      return 1;
    }
    data = await io.renderPdf(out, units, parsed.input, args.date);
  }
  if (args.out) io.writeFile(args.out, data);
  else io.stdout(data);
  return 0;
}

/** The PDF renderer, loaded only when a PDF is asked for (pdfkit is not needed for JSON or CSV). */
async function loadPdfRenderer(out: StudyOutput, units: UnitSystem, input: import('../core/index.js').StudyInput, date?: Date): Promise<Uint8Array> {
  const { studyPdf } = await import('./pdf/index.js');
  return studyPdf(out, units, input, date === undefined ? () => new Date() : () => date);
}

const isMain = process.argv[1] !== undefined && import.meta.url === new URL(`file://${process.argv[1]}`).href;
if (isMain) {
  runCli(process.argv.slice(2), {
    readFile: (p) => readFileSync(p, 'utf8'),
    writeFile: (p, d) => writeFileSync(p, d),
    stdout: (t) => process.stdout.write(t),
    stderr: (t) => process.stderr.write(t),
    renderPdf: loadPdfRenderer,
  }).then(
    (code) => { process.exitCode = code; },
    (e: unknown) => {
      process.stderr.write(`internal error: ${e instanceof Error ? e.stack ?? e.message : String(e)}\n`);
      process.exitCode = 1;
    },
  );
}
