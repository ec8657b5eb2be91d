/**
 * Display conversion and rounding, done once for pages, CSV and the report. Values arrive in SI;
 * the unit system is the study's or the user's choice. Nothing non-finite is ever printed: a missing
 * or non-finite value shows as an em dash.
 */
import { FT, HP, KT, LB, LBF, NM, cToF, type QuantityKind, type UnitSystem } from '../core/index.js';

/**
 * Display kinds: core's quantity kinds plus slopes shown in percent and temperature differences (no
 * offset: 1 K = 1.8 °F).
 * Route distances are SI metres on the way in (a `_km` value is multiplied by 1000 first).
 */
export type DisplayKind = QuantityKind | 'slopePct' | 'temperatureDelta';

export interface UnitDef {
  readonly symbol: string;
  /** SI value → display value. */
  readonly from: (si: number) => number;
  /** Display value → SI value. */
  readonly to: (shown: number) => number;
  /** Decimal places shown. */
  readonly digits: number;
}

const lin = (symbol: string, factor: number, digits: number): UnitDef => ({
  symbol,
  from: (v) => v / factor,
  to: (v) => v * factor,
  digits,
});

const UNITS: Record<UnitSystem, Record<DisplayKind, UnitDef>> = {
  si: {
    length: lin('m', 1, 0),
    shortLength: lin('m', 1, 2),
    altitude: lin('m', 1, 0),
    mass: lin('kg', 1, 0),
    area: lin('m²', 1, 1),
    force: lin('kN', 1000, 1),
    power: lin('kW', 1000, 0),
    speed: lin('kt', KT, 0),
    temperature: { symbol: '°C', from: (c) => c, to: (c) => c, digits: 1 },
    time: lin('s', 1, 1),
    ratio: lin('', 1, 3),
    count: lin('', 1, 0),
    tsfc: lin('1/h', 1, 3),
    bsfc: lin('kg/kWh', 1, 3),
    distance: lin('km', 1000, 0),
    slopePct: lin('%', 0.01, 2),
    temperatureDelta: lin('K', 1, 1),
    energy: lin('MJ', 1e6, 1),
    massFlow: lin('kg/h', 1, 0),
  },
  us: {
    length: lin('ft', FT, 0),
    shortLength: lin('ft', FT, 1),
    altitude: lin('ft', FT, 0),
    mass: lin('lb', LB, 0),
    area: lin('ft²', FT * FT, 0),
    force: lin('lbf', LBF, 0),
    power: lin('hp', HP, 0),
    speed: lin('kt', KT, 0),
    temperature: { symbol: '°F', from: (c) => cToF(c), to: (f) => ((f - 32) * 5) / 9, digits: 1 },
    time: lin('s', 1, 1),
    ratio: lin('', 1, 3),
    count: lin('', 1, 0),
    tsfc: lin('1/h', 1, 3),
    bsfc: lin('lb/(hp·h)', LB / (HP / 1000), 3),
    distance: lin('NM', NM, 0),
    slopePct: lin('%', 0.01, 2),
    temperatureDelta: lin('°F', 1 / 1.8, 1),
    // 1 ft·lbf = 0.3048 m × 4.4482216152605 N (exact definitions).
    energy: lin('million ft·lbf', 1e6 * FT * LBF, 1),
    massFlow: lin('lb/h', LB, 0),
  },
};

export function unitOf(kind: DisplayKind, system: UnitSystem): UnitDef {
  return UNITS[system][kind];
}

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

/**
 * Value for a prefilled form input in the display unit: not rounded to the display digits (nine
 * significant digits), so that saving a form unchanged gives back the stored SI value to within
 * 1e-9 relative. Blank for a missing value.
 */
export function fmtInput(si: number | undefined | null, kind: DisplayKind, system: UnitSystem): string {
  if (si === undefined || si === null || !Number.isFinite(si)) return '';
  const v = unitOf(kind, system).from(si);
  return String(Number(v.toPrecision(9)));
}

/** A limit of a range in the display unit, rounded to one digit more than the kind shows. */
export function fmtLimit(si: number, kind: DisplayKind, system: UnitSystem): string {
  const u = unitOf(kind, system);
  const v = u.from(si);
  const d = Math.min(6, u.digits + 1);
  return String(Number(v.toFixed(d)));
}

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
