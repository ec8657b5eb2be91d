/**
 * zod building blocks shared by the study file, the JSON API, imports and forms.
 * zod is the edge converter: raw values in, SI core input out. A blank is "missing", never zero.
 */
import { z } from 'zod';
import { IDENTIFIER_PATTERN, IDENTIFIER_RULE, InputDomainError, domainProblemText, formatValue, type InputFieldSpec } from '../../core/index.js';

/**
 * A short, safe rendering of a received value for messages: strings cut to 60 characters, lists and
 * objects named by their size (never serialised: a hostile value may be huge or deeply nested).
 */
export function previewValue(v: unknown): string {
  return v === undefined || v === null || v === '' ? 'missing' : formatValue(v);
}

/** The value echoed in a problem: primitives as received (long strings cut), lists and objects summarised. */
export function echoValue(v: unknown): unknown {
  if (typeof v === 'string') return v.length > 200 ? `${v.slice(0, 200)}…` : v;
  if (v !== null && typeof v === 'object') return previewValue(v);
  if (typeof v === 'number' && !Number.isFinite(v)) return null;
  return v;
}

/**
 * The message for a value that should be a finite number in [min, max]: "missing", "too large
 * (maximum …)" for +Infinity (a cell of 1e309), "too small (minimum …)" for −Infinity, or "not a
 * number". `allowed` is the range sentence ("allowed 0 to 2000 km").
 */
export function notANumberMessage(input: unknown, min: number, max: number, unit: string): string {
  const u = unit ? ` ${unit}` : '';
  const allowed = `allowed ${min} to ${max}${u}`;
  if (input === undefined || input === null || input === '') return `missing; ${allowed}`;
  if (input === Number.POSITIVE_INFINITY) return `too large (maximum ${max}${u})`;
  if (input === Number.NEGATIVE_INFINITY) return `too small (minimum ${min}${u})`;
  if (typeof input === 'number') return `not a number; ${allowed}`;
  return `${previewValue(input)} is not a number; ${allowed}`;
}

const EXPECTED: Readonly<Record<string, string>> = {
  object: 'an object', array: 'a list', string: 'text', number: 'a number', boolean: 'true or false', int: 'a whole number',
};

/**
 * zod's own messages in the house wording, for every schema of the process (the pieces below set their
 * own): a member left out is "missing; <what> is required" (never "received undefined"), a wrong type
 * names the value shortly. Other issues keep their schema's message.
 */
z.config({
  customError: (iss) => {
    if (iss.code === 'invalid_type') {
      const what = EXPECTED[iss.expected] ?? String(iss.expected);
      return iss.input === undefined || iss.input === null ? `missing; ${what} is required` : `${previewValue(iss.input)} is not ${what}`;
    }
    if (iss.code === 'invalid_union') return iss.input === undefined || iss.input === null ? 'missing' : `${previewValue(iss.input)} is not one of the accepted forms`;
    if (iss.code === 'unrecognized_keys') return `unknown member${iss.keys.length === 1 ? '' : 's'} ${iss.keys.slice(0, 5).map((k) => JSON.stringify(k.length > 40 ? `${k.slice(0, 40)}…` : k)).join(', ')}${iss.keys.length > 5 ? ` and ${iss.keys.length - 5} more` : ''}`;
    return undefined;
  },
});

/** A finite number in [min, max] (SI unit `unit`), with messages naming the range and unit. */
export function num(min: number, max: number, unit: string) {
  const u = unit ? ` ${unit}` : '';
  const allowed = `allowed ${min} to ${max}${u}`;
  const outOfRange = (iss: { input?: unknown }) => `${String(iss.input)} is out of range; ${allowed}`;
  // zod 4 numbers refuse NaN and ±Infinity; min/max appear in the exported JSON Schema.
  return z
    .number({ error: (iss) => notANumberMessage(iss.input, min, max, unit) })
    .min(min, { error: outOfRange })
    .max(max, { error: outOfRange })
    .meta({ description: `${allowed}` });
}

/** A finite number in a core field range (core/fields.ts): the edge and the engine share the range. */
export function numIn(range: { readonly min: number; readonly max: number; readonly unit: string }) {
  return num(range.min, range.max, range.unit);
}

/** A whole number in [min, max]. */
export function int(min: number, max: number, unit: string) {
  const u = unit ? ` ${unit}` : '';
  return num(min, max, unit).refine(Number.isInteger, { error: (iss) => `${String(iss.input)} is not a whole number; allowed ${min} to ${max}${u}` });
}

export const text = (max: number) =>
  z
    .string({ error: (iss) => (iss.input === undefined ? 'missing; a text is required' : 'must be text') })
    .trim()
    .min(1, { error: 'must not be blank' })
    .max(max, { error: `at most ${max} characters` });

export const ident = z
  .string({ error: (iss) => (iss.input === undefined ? 'missing; an identifier is required' : 'must be text') })
  .regex(IDENTIFIER_PATTERN, { error: IDENTIFIER_RULE });

export function oneOf<const T extends readonly [string, ...string[]]>(values: T) {
  return z.enum(values, {
    error: (iss) => (iss.input === undefined || iss.input === null || iss.input === ''
      ? `missing; one of ${values.join(', ')}`
      : `${previewValue(iss.input)} is not allowed; one of ${values.join(', ')}`),
  });
}

/** Keys of a core field path: "points[2].chainage_m" → ["points", 2, "chainage_m"]. */
export function fieldPath(field: string): (string | number)[] {
  const out: (string | number)[] = [];
  for (const part of field.replace(/^\./, '').split('.')) {
    const m = /^([^[]*)((?:\[\d+\])*)$/.exec(part);
    if (!m) { out.push(part); continue; }
    if (m[1]) out.push(m[1]);
    for (const idx of m[2]!.matchAll(/\[(\d+)\]/g)) out.push(Number(idx[1]));
  }
  return out;
}

/**
 * Runs one of core's own checks inside a zod refinement, so the edge refuses exactly what the engine
 * would: an InputDomainError becomes an issue at its field (keys mapped by `rename`, e.g. core's
 * "points" → the file's "profile"), with the same text the engine gives.
 */
export function coreCheck(
  ctx: z.RefinementCtx, run: () => void, rename: (keys: (string | number)[]) => (string | number)[] = (k) => k,
): boolean {
  // Only once the shape holds: the range problems are already listed field by field.
  if ((ctx as { issues?: readonly unknown[] }).issues?.length) return false;
  try {
    run();
    return true;
  } catch (e) {
    if (!(e instanceof InputDomainError)) throw e;
    ctx.addIssue({ code: 'custom', path: rename(fieldPath(e.field)), input: e.value, message: domainProblemText(e.value, e.allowed, e.range) });
    return false;
  }
}

export interface Problem {
  /** JSON path, e.g. "aircraft[2].mtow_kg". */
  readonly path: string;
  /** Last key of the path: the field. */
  readonly field: string;
  readonly value: unknown;
  readonly message: string;
}

export function formatPath(path: readonly PropertyKey[]): string {
  let out = '';
  for (const k of path) out += typeof k === 'number' ? `[${k}]` : out ? `.${String(k)}` : String(k);
  return out || '(root)';
}

/** Turns zod issues into problems naming path, field, value and the allowed range. */
export function problemsFrom(error: z.ZodError): Problem[] {
  return error.issues.map((i) => {
    const field = [...i.path].reverse().find((k) => typeof k === 'string');
    return {
      path: formatPath(i.path),
      field: field === undefined ? '(root)' : String(field),
      value: echoValue((i as { input?: unknown }).input),
      message: i.message,
    };
  });
}

export function formatProblem(p: Problem): string {
  return `${p.path}: ${p.message}`;
}

/** Parses with every problem reported (input values included), or returns the problems. */
export function parseAll<S extends z.ZodType>(schema: S, data: unknown):
  { ok: true; value: z.output<S> } | { ok: false; problems: Problem[] } {
  const r = schema.safeParse(data, { reportInput: true });
  return r.success ? { ok: true, value: r.data } : { ok: false, problems: problemsFrom(r.error) };
}

export const intIn = (r: { readonly min: number; readonly max: number; readonly unit: string }) => int(r.min, r.max, r.unit);

/** The zod members of a table of numeric input fields (core/studyFields.ts): range, whole number, optional, help. */
export function fieldMembers(table: readonly InputFieldSpec[]): Record<string, z.ZodType> {
  return Object.fromEntries(table.map((f) => {
    const t = (f.integer ? intIn(f.range) : numIn(f.range)).meta({ description: `${f.help} Allowed ${f.range.min} to ${f.range.max}${f.range.unit ? ` ${f.range.unit}` : ''}.` });
    return [f.key, f.optional ? t.optional() : t];
  }));
}
