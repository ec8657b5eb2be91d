/**
 * Display formatting and rounding, done once for pages, CSV and the report. Values arrive in SI;
 * the unit system is the study's or the user's choice. Nothing non-finite is ever printed: a missing
 * or non-finite value shows as an em dash.
 */
import { displayInputValue, displayLimit, noticeText, unitOf, type DisplayKind, type Notice, type QuantityFormat, type UnitSystem } from '../core/index.js';

// The display table and conversions live in core/units.ts; this module only formats.

/**
 * en-US number formats by decimal places, built once: identical output to
 * `toLocaleString('en-US', { minimumFractionDigits: d, maximumFractionDigits: d })`, which builds a
 * new formatter on every call (the appendix PDF formats thousands of values).
 */
const NUMBER_FORMATS = new Map<number, Intl.NumberFormat>();
function numberFormat(d: number): Intl.NumberFormat {
  let f = NUMBER_FORMATS.get(d);
  if (f === undefined) {
    f = new Intl.NumberFormat('en-US', { minimumFractionDigits: d, maximumFractionDigits: d });
    NUMBER_FORMATS.set(d, f);
  }
  return f;
}

/** Display number (no unit) with the kind's rounding; "—" for missing or non-finite values. */
export function fmtNumber(si: number | undefined | null, kind: DisplayKind, system: UnitSystem, digits?: number): string {
  if (si === undefined || si === null || !Number.isFinite(si)) return '—';
  const u = unitOf(kind, system);
  const d = digits ?? u.digits;
  const v = u.from(si);
  return numberFormat(d).format(v);
}

/** Display number with its unit symbol. */
export function fmt(si: number | undefined | null, kind: DisplayKind, system: UnitSystem, digits?: number): string {
  const n = fmtNumber(si, kind, system, digits);
  const sym = unitOf(kind, system).symbol;
  return n === '—' || !sym ? n : `${n} ${sym}`;
}

/** A runway length in the chosen system with the other in parentheses, e.g. "2,450 m (8,038 ft)". */
export function fmtLengthBoth(si: number | undefined | null, system: UnitSystem): string {
  const other: UnitSystem = system === 'si' ? 'us' : 'si';
  const a = fmt(si, 'length', system);
  return a === '—' ? a : `${a} (${fmt(si, 'length', other)})`;
}

/** Percentage with one decimal, from a ratio. */
export function fmtPct(ratio: number | undefined | null, digits = 1): string {
  if (ratio === undefined || ratio === null || !Number.isFinite(ratio)) return '—';
  return `${(ratio * 100).toFixed(digits)} %`;
}

/** Value for a prefilled form input in the display unit (core/units.ts, nine significant digits). */
export const fmtInput = displayInputValue;

/** A limit of a range in the display unit (core/units.ts). */
export const fmtLimit = displayLimit;

/** Unit symbol of a kind in a system ('' for ratios and counts). */
export function unitSymbol(kind: DisplayKind, system: UnitSystem): string {
  return unitOf(kind, system).symbol;
}

/** A label with its unit in parentheses, e.g. "Elevation (ft)"; the label alone when unitless. */
export function withUnit(label: string, kind: DisplayKind, system: UnitSystem): string {
  const s = unitSymbol(kind, system);
  return s ? `${label} (${s})` : label;
}

/** Signed ratio as a percentage with two decimals, e.g. "+0.29 %". */
export function fmtSlope(ratio: number | undefined | null): string {
  if (ratio === undefined || ratio === null || !Number.isFinite(ratio)) return '—';
  const v = ratio * 100;
  return `${v > 0 ? '+' : v < 0 ? '−' : ''}${Math.abs(v).toFixed(2)} %`;
}

export const UNIT_SYSTEM_LABELS: Readonly<Record<UnitSystem, string>> = {
  si: 'SI (m, kg, °C)',
  us: 'US customary (ft, lb, °F)',
};

/** Deviation from the standard temperature, e.g. "ISA +28.7 K" or "ISA +51.7 °F" (a difference: no offset). */
export function fmtIsaDeviation(dev_c: number, system: UnitSystem): string {
  if (!Number.isFinite(dev_c)) return '—';
  return `ISA ${dev_c >= 0 ? '+' : '−'}${fmt(Math.abs(dev_c), 'temperatureDelta', system)}`;
}

/** Quantities of a notice in the reader's units, with the kind's rounding (or the notice's digits). */
export function noticeFormat(system: UnitSystem): QuantityFormat {
  return (q) => fmt(q.si, q.kind, system, q.digits);
}

/** A notice (core/notices.ts) as a sentence in the reader's units; plain text passes through. */
export function say(n: Notice | string, system: UnitSystem): string {
  return typeof n === 'string' ? n : noticeText(n, noticeFormat(system));
}
