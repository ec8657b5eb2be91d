/**
 * The study at the edge: validate a study document, run the engine, and attach the SHA-256 digest of
 * the canonical input so a report or a file can be traced back to exactly what produced it.
 */
import { createHash } from 'node:crypto';
import { InputDomainError, domainProblemText, runStudy, siteConditions, validateStudy, type StudyInput, type StudyResult, type ValidStudyInput } from '../../core/index.js';
import { echoValue, fieldPath, formatPath, parseAll, type Problem } from '../common/schema.js';
import { studyCrossProblems, studyFileSchema, studyInputOf } from './schema.js';

export interface StudyOutput extends StudyResult {
  /** SHA-256 (hex) of the canonical JSON of the study input. */
  readonly inputDigest: string;
}

/**
 * Canonical JSON: object keys sorted, no whitespace, numbers as JavaScript prints them, undefined
 * members dropped. Equal inputs give equal text whatever the key order of the file.
 */
export function canonicalJson(value: unknown): string {
  if (value === null || typeof value !== 'object') {
    if (typeof value === 'number' && !Number.isFinite(value)) throw new Error('canonicalJson: non-finite number');
    return JSON.stringify(value) ?? 'null';
  }
  if (Array.isArray(value)) return `[${value.map((v) => (v === undefined ? 'null' : canonicalJson(v))).join(',')}]`;
  const keys = Object.keys(value).filter((k) => (value as Record<string, unknown>)[k] !== undefined).sort();
  return `{${keys.map((k) => `${JSON.stringify(k)}:${canonicalJson((value as Record<string, unknown>)[k])}`).join(',')}}`;
}

export function sha256Hex(text: string): string {
  return createHash('sha256').update(text, 'utf8').digest('hex');
}

/**
 * Digest of a study input (the identity of a study for reports and saved results). The display units
 * (`options.units`) are left out: they change no number, so switching a study between SI and US
 * units keeps its saved result current (every view takes the units from the study or the request).
 */
export function inputDigest(input: StudyInput): string {
  const { units: _display, ...options } = input.options;
  return sha256Hex(canonicalJson({ ...input, options }));
}

export function studyOutput(input: StudyInput): StudyOutput {
  const result = runStudy(input);
  return { ...result, inputDigest: inputDigest(input) };
}

/**
 * A core InputDomainError as one entry of the documented problems list (docs/study-format.md): the
 * path as the user's document names it (`path`, default the error's field: core names study fields
 * by their file path), the last key as the field, the value (summarised when large) and the message.
 */
export function problemFromDomainError(e: InputDomainError, path: string = e.field): Problem {
  const keys = fieldPath(path);
  const field = [...keys].reverse().find((k) => typeof k === 'string');
  return { path: formatPath(keys), field: field === undefined ? '(root)' : String(field), value: echoValue(e.value), message: domainProblemText(e.value, e.allowed, e.range) };
}

/**
 * Validates a parsed JSON study document; returns the core input or every problem found. After the
 * schema, core's own study and site checks run too (they are the schema's rules, restated so core never
 * trusts its caller): whatever the engine would refuse is a problem here, with its path in the file.
 */
export function parseStudyDocument(doc: unknown): { ok: true; input: ValidStudyInput } | { ok: false; problems: Problem[] } {
  const r = parseAll(studyFileSchema, doc);
  if (r.ok) {
    let input: ValidStudyInput;
    try {
      input = validateStudy(studyInputOf(r.value));
      siteConditions(input);
    } catch (e) {
      if (!(e instanceof InputDomainError)) throw e;
      return { ok: false, problems: [problemFromDomainError(e)] };
    }
    return { ok: true, input };
  }
  // zod skips the study-level refinement when fields fail; list cross-reference problems anyway.
  const seen = new Set(r.problems.map((p) => p.path));
  const extra = studyCrossProblems(doc)
    .map((p) => ({ path: formatPath(p.path), field: String([...p.path].reverse().find((k) => typeof k === 'string') ?? '(root)'), value: p.value, message: p.message }))
    .filter((p) => !seen.has(p.path));
  return { ok: false, problems: [...r.problems, ...extra] };
}
