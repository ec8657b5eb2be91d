/**
 * Form edge: raw strings in the user's unit system in, SI numbers out, with field errors that name the
 * value and the allowed range in the unit the user typed. A blank field is missing, never zero.
 * The zod schemas (the features' schema.ts files) then check the converted object; their messages, written in SI,
 * are restated in the user's units by `localiseMessage`.
 */
import {
  displayLimit as fmtLimit, siRangeOf, unitOf, type DisplayKind, type InputFieldSpec, type UnitSystem,
} from '../../core/index.js';

/** Form values as submitted: field name → raw text (first value for repeated names). */
export type FormValues = Readonly<Record<string, string>>;
/** Field name → message. */
export type FieldErrors = Record<string, string>;

/** What a form reader gives: the parsed value, or the problems by field name (nothing is saved from a failed form). */
export type FormResult<T> = { readonly ok: true; readonly value: T } | { readonly ok: false; readonly errors: FieldErrors };

/** Reads a parsed form body (hono `parseBody`) into plain strings; files are left out. */
export function formValues(body: Record<string, unknown>): Record<string, string> {
  const out: Record<string, string> = {};
  for (const [k, v] of Object.entries(body)) {
    if (typeof v === 'string') out[k] = v;
    else if (Array.isArray(v) && typeof v[0] === 'string') out[k] = v[0];
  }
  return out;
}

export interface NumberSpec {
  /** Form field name. */
  readonly name: string;
  /** Display kind (sets the unit shown and the conversion). */
  readonly kind: DisplayKind;
  /** Allowed range in SI (metres for 'distance'). */
  readonly min: number;
  readonly max: number;
  readonly required: boolean;
  readonly integer?: boolean;
}

/** Accepts "1234", "1234.5", "-3", "1e3" and thousands separators "12,345.6"; nothing else. */
const PLAIN = /^[+-]?(\d+(\.\d*)?|\.\d+)([eE][+-]?\d+)?$/;
const GROUPED = /^[+-]?\d{1,3}(,\d{3})+(\.\d+)?$/;

/** The number a user typed, or undefined when it is not one. */
export function parseTyped(raw: string): number | undefined {
  const t = raw.trim().replace(/\u2212/g, '-');
  if (PLAIN.test(t)) return Number(t);
  if (GROUPED.test(t)) return Number(t.replace(/,/g, ''));
  return undefined;
}

/** Relative slack on range limits, so that a limit converted to another unit and typed back is accepted. */
const LIMIT_SLACK = 1e-9;

/** The allowed range as text in the user's unit, e.g. "allowed 984.3 to 19,685 ft". */
export function rangeText(spec: Pick<NumberSpec, 'kind' | 'min' | 'max'>, system: UnitSystem): string {
  const u = unitOf(spec.kind, system);
  let lo = fmtLimit(spec.min, spec.kind, system);
  let hi = fmtLimit(spec.max, spec.kind, system);
  if (u.from(spec.min) > u.from(spec.max)) [lo, hi] = [hi, lo];
  return `allowed ${lo} to ${hi}${u.symbol ? ` ${u.symbol}` : ''}`;
}

/** "maximum 19,685 ft" / "minimum −400 m": one limit of the range in the user's unit (limits swap when the unit runs backwards). */
export function limitText(spec: Pick<NumberSpec, 'kind' | 'min' | 'max'>, system: UnitSystem, which: 'min' | 'max'): string {
  const u = unitOf(spec.kind, system);
  const flipped = u.from(spec.min) > u.from(spec.max);
  const si = (which === 'max') !== flipped ? spec.max : spec.min;
  return `${which === 'max' ? 'maximum' : 'minimum'} ${fmtLimit(si, spec.kind, system)}${u.symbol ? ` ${u.symbol}` : ''}`;
}

/**
 * Reads one number field: converts it from the user's unit to SI and checks the range. Returns the SI
 * value, or undefined (blank and optional, or invalid with the message put into `errors`).
 */
export function readNumber(values: FormValues, spec: NumberSpec, system: UnitSystem, errors: FieldErrors): number | undefined {
  const raw = (values[spec.name] ?? '').trim();
  if (raw === '') {
    if (spec.required) errors[spec.name] = `missing; ${rangeText(spec, system)}`;
    return undefined;
  }
  const typed = parseTyped(raw);
  if (typed === Number.POSITIVE_INFINITY || typed === Number.NEGATIVE_INFINITY) {
    // "1e309" is a number too large for the machine: say so, with the limit, never "Infinity".
    errors[spec.name] = `${typed > 0 ? 'too large' : 'too small'} (${limitText(spec, system, typed > 0 ? 'max' : 'min')})`;
    return undefined;
  }
  if (typed === undefined || !Number.isFinite(typed)) {
    errors[spec.name] = `${JSON.stringify(raw.length > 40 ? `${raw.slice(0, 40)}…` : raw)} is not a number; ${rangeText(spec, system)}`;
    return undefined;
  }
  const si = unitOf(spec.kind, system).to(typed);
  const slack = LIMIT_SLACK * Math.max(1, Math.abs(spec.min), Math.abs(spec.max));
  if (si < spec.min - slack || si > spec.max + slack) {
    errors[spec.name] = `${raw} is out of range; ${rangeText(spec, system)}`;
    return undefined;
  }
  const clamped = Math.min(spec.max, Math.max(spec.min, si));
  if (spec.integer && !Number.isInteger(typed)) {
    errors[spec.name] = `${raw} is not a whole number; ${rangeText(spec, system)}`;
    return undefined;
  }
  return spec.integer ? Math.round(clamped) : clamped;
}

/** Reads a text field: trimmed; blank → undefined (with a message when required); length checked. */
export function readText(values: FormValues, name: string, opts: { required: boolean; max: number }, errors: FieldErrors): string | undefined {
  const v = (values[name] ?? '').trim();
  if (v === '') {
    if (opts.required) errors[name] = 'missing; a text is required';
    return undefined;
  }
  if (v.length > opts.max) {
    errors[name] = `at most ${opts.max} characters (${v.length} given)`;
    return undefined;
  }
  return v;
}

/** Reads a choice field: one of `allowed`, or an error. */
export function readChoice<T extends string>(values: FormValues, name: string, allowed: readonly T[], errors: FieldErrors, fallback?: T): T | undefined {
  const v = (values[name] ?? '').trim();
  if (v === '' && fallback !== undefined) return fallback;
  if ((allowed as readonly string[]).includes(v)) return v as T;
  errors[name] = v === '' ? `missing; one of ${allowed.join(', ')}` : `"${v}" is not allowed; one of ${allowed.join(', ')}`;
  return undefined;
}

const SI_UNITS: readonly { re: RegExp; kind: DisplayKind }[] = [
  { re: /(-?\d+(?:\.\d+)?) ?kg\b/g, kind: 'mass' },
  { re: /(-?\d+(?:\.\d+)?) ?m\/s\b/g, kind: 'speed' },
  { re: /(-?\d+(?:\.\d+)?) ?°C/g, kind: 'temperature' },
  { re: /(-?\d+(?:\.\d+)?) ?km\b/g, kind: 'distance' },
  { re: /(-?\d+(?:\.\d+)?) ?m\b(?!²)/g, kind: 'length' },
];

/**
 * Restates SI quantities inside a schema message in the user's units ("less than the maximum landing
 * mass (20000 kg)" → "… (44,092 lb)"). SI messages are returned unchanged.
 */
export function localiseMessage(message: string, system: UnitSystem): string {
  let out = message;
  for (const { re, kind } of SI_UNITS) {
    out = out.replace(re, (_m, n: string) => {
      const si = kind === 'distance' ? Number(n) * 1000 : Number(n);
      const u = unitOf(kind, system);
      if (system === 'si' && kind !== 'speed') return `${n} ${u.symbol}`;
      return `${fmtLimit(si, kind, system)} ${u.symbol}`;
    });
  }
  return out;
}

/**
 * Reads the form field of a row of a field table (core/studyFields.ts): its unit, range, whole-number
 * rule and whether it is required come from the row. `name` overrides the field name (repeated groups
 * such as months, directions and fleet rows prefix it); `max` narrows the range (SI, e.g. the
 * aircraft's maximum payload). Gives the value in the unit the study file holds, or undefined with
 * the error recorded.
 */
export function readSpecField(
  values: FormValues, spec: InputFieldSpec, system: UnitSystem, errors: FieldErrors,
  o: { readonly name?: string; readonly required?: boolean; readonly max?: number } = {},
): number | undefined {
  const r = siRangeOf(spec);
  const si = readNumber(values, {
    name: o.name ?? spec.form, kind: spec.kind, min: r.min, max: o.max === undefined ? r.max : Math.min(r.max, o.max),
    required: o.required ?? !spec.optional, ...(spec.integer ? { integer: true } : {}),
  }, system, errors);
  return si === undefined ? undefined : si * (spec.fileScale ?? 1);
}

