/**
 * Display conversion and rounding, done once for pages, CSV and the report. Values arrive in SI;
 * the unit system is the study's or the user's choice. Nothing non-finite is ever printed: a missing
 * or non-finite value shows as an em dash.
 */
import { FT, HP, KT, LB, LBF, cToF, type QuantityKind, type UnitSystem } from '../core/index.js';

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

const UNITS: Record<UnitSystem, Record<QuantityKind, UnitDef>> = {
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
  },
};

export function unitOf(kind: QuantityKind, system: UnitSystem): UnitDef {
  return UNITS[system][kind];
}

/** Display number (no unit) with the kind's rounding; "—" for missing or non-finite values. */
export function fmtNumber(si: number | undefined | null, kind: QuantityKind, system: UnitSystem, digits?: number): string {
  if (si === undefined || si === null || !Number.isFinite(si)) return '—';
  const u = unitOf(kind, system);
  const d = digits ?? u.digits;
  const v = u.from(si);
  return v.toLocaleString('en-US', { minimumFractionDigits: d, maximumFractionDigits: d });
}

/** Display number with its unit symbol. */
export function fmt(si: number | undefined | null, kind: QuantityKind, system: UnitSystem, digits?: number): string {
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
