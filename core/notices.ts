/**
 * Structured warnings ("notices"): what core has to tell the planner about a result, as a stable code
 * plus SI values, so that every view (page, CSV, JSON, appendix) renders the same sentence in its
 * reader's units.
 *
 * A notice is written once, where it arises, as a tagged template:
 *
 *     notice('landing.overweight')`Landing mass ${mass(m)} exceeds MLW (${mass(mlw)}): overweight landing.`
 *
 * Its code names the sentence (one emission site per code: test/core/notices.test.ts checks it); the
 * literal parts are the sentence's words, the arguments its values. A quantity argument carries its
 * display kind and its SI value; the view formats it in the reader's unit system (core/units.ts table).
 * Nothing is rounded here: the view's formatter applies the kind's rounding (or the digits given).
 * Convention of the project (no external source): codes are "area.what", lower camel case after the dot.
 */
import { unitOf, type DisplayKind, type UnitSystem } from './units.js';

/** A value in a notice: SI, with the display kind that chooses its unit and rounding. */
export interface NoticeQuantity {
  readonly kind: DisplayKind;
  readonly si: number;
  /** Decimal places in the display unit, when the kind's default is not the right one. */
  readonly digits?: number;
}

/**
 * An argument of a notice: a quantity, a plain number (a count or a ratio shown as it is), a word, a
 * nested notice, or a list of notices (full sentences joined by a space, fragments by "; ").
 */
export type NoticeArg = NoticeQuantity | string | number | Notice | readonly Notice[];

export interface Notice {
  readonly code: string;
  /** The sentence's literal parts; `text.length === args.length + 1`. */
  readonly text: readonly string[];
  readonly args: readonly NoticeArg[];
}

/** A notice with the given code, written as a tagged template. */
export function notice(code: string): (strings: TemplateStringsArray, ...args: readonly NoticeArg[]) => Notice {
  return (strings, ...args) => ({ code, text: [...strings], args });
}

const quantity = (kind: DisplayKind) => (si: number, digits?: number): NoticeQuantity =>
  (digits === undefined ? { kind, si } : { kind, si, digits });

/** Quantity arguments by kind (SI in: metres, kilograms, m/s, °C, K, a ratio for slopes). */
export const qty = {
  length: quantity('length'),
  shortLength: quantity('shortLength'),
  altitude: quantity('altitude'),
  mass: quantity('mass'),
  speed: quantity('speed'),
  temperature: quantity('temperature'),
  temperatureDelta: quantity('temperatureDelta'),
  slopePct: quantity('slopePct'),
  distance: quantity('distance'),
} as const;

/** The same notice with a subject in front ("Runway 09: …"), keeping its code and values. */
export function scoped(subject: string, n: Notice): Notice {
  return { code: n.code, text: [`${subject}: ${n.text[0]}`, ...n.text.slice(1)], args: n.args };
}

/** Formats a quantity in the reader's units, with its symbol. */
export type QuantityFormat = (q: NoticeQuantity) => string;

function isNoticeList(a: NoticeArg): a is readonly Notice[] {
  return Array.isArray(a);
}

function isQuantity(a: NoticeArg): a is NoticeQuantity {
  return typeof a === 'object' && 'kind' in a;
}

/** Items of a list argument: full sentences follow each other with a space, fragments with "; ". */
function joinSentences(items: readonly string[]): string {
  return items.reduce((out, s, i) => (i === 0 ? s : `${out}${/[.!?]$/.test(out) ? ' ' : '; '}${s}`), '');
}

/** One notice as a sentence, its quantities formatted by `format`. */
export function noticeText(n: Notice, format: QuantityFormat): string {
  let out = n.text[0] ?? '';
  n.args.forEach((a, i) => {
    const s = typeof a === 'string' ? a
      : typeof a === 'number' ? (Number.isFinite(a) ? String(a) : '—')
      : isNoticeList(a) ? joinSentences(a.map((x) => noticeText(x, format)))
      : isQuantity(a) ? format(a)
      : noticeText(a, format);
    out += s + (n.text[i + 1] ?? '');
  });
  return out;
}

/** Every code in a list of notices, nested ones included (for tests and the JSON export). */
export function noticeCodes(ns: readonly Notice[]): string[] {
  return ns.flatMap((n) => [n.code, ...noticeCodes(n.args.flatMap((a) => (isNoticeList(a) ? a : typeof a === 'object' && 'code' in a ? [a] : [])))]);
}

/**
 * A plain rendering in a unit system (the kind's display unit and rounding, en-US digit grouping): for
 * core's own messages and tests (SI) and for files such as the CSV. Pages and the appendix group
 * digits (templates/format.ts).
 */
const GROUPED = new Map<number, Intl.NumberFormat>();
function grouped(d: number): Intl.NumberFormat {
  let f = GROUPED.get(d);
  if (f === undefined) GROUPED.set(d, (f = new Intl.NumberFormat('en-US', { minimumFractionDigits: d, maximumFractionDigits: d })));
  return f;
}

export function plainFormat(system: UnitSystem): QuantityFormat {
  return (q) => {
    const u = unitOf(q.kind, system);
    const v = u.from(q.si);
    if (!Number.isFinite(v)) return '—';
    const s = grouped(q.digits ?? u.digits).format(v);
    return u.symbol ? `${s} ${u.symbol}` : s;
  };
}

export const siFormat: QuantityFormat = plainFormat('si');

/** A notice as SI text (core messages and tests). */
export const siText = (n: Notice): string => noticeText(n, siFormat);

/** The notices without repeats (same code and values), first occurrence kept. */
export function uniqueNotices(list: readonly Notice[]): Notice[] {
  const seen = new Set<string>();
  return list.filter((n) => {
    const key = JSON.stringify(n);
    if (seen.has(key)) return false;
    seen.add(key);
    return true;
  });
}

function isNotice(v: unknown): v is Notice {
  return typeof v === 'object' && v !== null && typeof (v as Notice).code === 'string'
    && Array.isArray((v as Notice).text) && Array.isArray((v as Notice).args);
}

/**
 * JSON text of a value for files readers open (the CLI's JSON, results.json, the API): every notice in
 * it, nested ones included, gains its sentence in the given units as `message`, beside its code and SI
 * parts. The notices are given their message for the time of the (synchronous) stringify and restored
 * after it, which is about twice as fast on a large result as a replacer function called for every key.
 */
export function noticeJson(value: unknown, system: UnitSystem, space?: number): string {
  const format = plainFormat(system);
  const decorated: Notice[] = [];
  const visit = (v: unknown): void => {
    if (typeof v !== 'object' || v === null) return;
    if (Array.isArray(v)) {
      for (const x of v) visit(x);
      return;
    }
    if (isNotice(v) && !Object.prototype.hasOwnProperty.call(v, 'message')) {
      (v as { message?: string }).message = noticeText(v, format);
      decorated.push(v);
    }
    for (const k in v) visit((v as Record<string, unknown>)[k]);
  };
  visit(value);
  try {
    return JSON.stringify(value, null, space);
  } finally {
    for (const n of decorated) delete (n as { message?: string }).message;
  }
}
