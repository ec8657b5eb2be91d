/**
 * zod building blocks shared by the study file, the JSON API, imports and forms.
 * zod is the edge converter: raw values in, SI core input out. A blank is "missing", never zero.
 */
import { z } from 'zod';

/** A finite number in [min, max] (SI unit `unit`), with messages naming the range and unit. */
export function num(min: number, max: number, unit: string) {
  const u = unit ? ` ${unit}` : '';
  const allowed = `allowed ${min} to ${max}${u}`;
  const outOfRange = (iss: { input?: unknown }) => `${String(iss.input)} is out of range; ${allowed}`;
  // zod 4 numbers refuse NaN and ±Infinity; min/max appear in the exported JSON Schema.
  return z
    .number({
      error: (iss) =>
        iss.input === undefined || iss.input === null || iss.input === ''
          ? `missing; ${allowed}`
          : typeof iss.input === 'number'
            ? `${String(iss.input)} is not a finite number; ${allowed}`
            : `${JSON.stringify(iss.input)} is not a number; ${allowed}`,
    })
    .min(min, { error: outOfRange })
    .max(max, { error: outOfRange })
    .meta({ description: `${allowed}` });
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
  .regex(/^[a-z0-9][a-z0-9._-]{0,63}$/i, { error: 'letters, digits, dot, dash or underscore; 1 to 64 characters, starting with a letter or digit' });

export function oneOf<const T extends readonly [string, ...string[]]>(values: T) {
  return z.enum(values, { error: (iss) => `${JSON.stringify(iss.input)} is not allowed; one of ${values.join(', ')}` });
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
      value: (i as { input?: unknown }).input,
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
