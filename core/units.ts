/**
 * Units: light branded SI quantity types and the exact conversion factors.
 *
 * Sources: international foot and pound (1959 agreement): 1 ft = 0.3048 m, 1 lb = 0.45359237 kg;
 * nautical mile 1852 m; standard gravity g0 = 9.80665 m/s² (CGPM 1901); statute mile 1609.344 m;
 * mechanical horsepower 550 ft·lbf/s; inch of mercury at 0 °C 3386.389 Pa (conventional value,
 * from memory). See docs/methods.md, "Units".
 *
 * Storage and the core are SI. Conversion happens once: inbound in form schemas and importers,
 * outbound in templates and the report. Brands make a foot-valued number fail to type-check where a
 * metre is expected; plain numbers are accepted only through the constructors below.
 */

declare const unitBrand: unique symbol;
/** A number carrying its unit in the type system. */
export type Quantity<U extends string> = number & { readonly [unitBrand]: U };

export type Metres = Quantity<'m'>;
export type Feet = Quantity<'ft'>;
export type Kilograms = Quantity<'kg'>;
export type Pounds = Quantity<'lb'>;
export type Newtons = Quantity<'N'>;
export type PoundsForce = Quantity<'lbf'>;
export type Watts = Quantity<'W'>;
export type Horsepower = Quantity<'hp'>;
export type MetresPerSecond = Quantity<'m/s'>;
export type Knots = Quantity<'kt'>;
export type Kelvin = Quantity<'K'>;
export type Celsius = Quantity<'degC'>;
export type Fahrenheit = Quantity<'degF'>;
export type Pascals = Quantity<'Pa'>;

/** Exact factors (SI value of one unit). */
export const FT = 0.3048;
export const NM = 1852;
export const STATUTE_MILE = 1609.344;
export const KT = 1852 / 3600;
export const KMH = 1000 / 3600;
export const LB = 0.45359237;
export const G0 = 9.80665;
export const LBF = LB * G0; // 4.4482216152605 N
export const HP = 550 * FT * LBF; // 745.69987158227 W
export const INHG = 3386.389; // Pa, conventional (from memory)
export const FT_PER_MIN = FT / 60;
export const KELVIN_OFFSET = 273.15;

export const metres = (x: number): Metres => x as Metres;
export const kilograms = (x: number): Kilograms => x as Kilograms;
export const newtons = (x: number): Newtons => x as Newtons;
export const watts = (x: number): Watts => x as Watts;
export const metresPerSecond = (x: number): MetresPerSecond => x as MetresPerSecond;
export const kelvin = (x: number): Kelvin => x as Kelvin;
export const celsius = (x: number): Celsius => x as Celsius;
export const pascals = (x: number): Pascals => x as Pascals;
export const feet = (x: number): Feet => x as Feet;
export const pounds = (x: number): Pounds => x as Pounds;
export const knots = (x: number): Knots => x as Knots;
export const fahrenheit = (x: number): Fahrenheit => x as Fahrenheit;

export const ftToM = (x: Feet | number): Metres => (x * FT) as Metres;
export const mToFt = (x: Metres | number): Feet => (x / FT) as Feet;
export const nmToM = (x: number): Metres => (x * NM) as Metres;
export const mToNm = (x: number): number => x / NM;
export const miToM = (x: number): Metres => (x * STATUTE_MILE) as Metres;
export const mToMi = (x: number): number => x / STATUTE_MILE;
export const ktToMps = (x: Knots | number): MetresPerSecond => (x * KT) as MetresPerSecond;
export const mpsToKt = (x: MetresPerSecond | number): Knots => (x / KT) as Knots;
export const kmhToMps = (x: number): MetresPerSecond => (x * KMH) as MetresPerSecond;
export const mpsToKmh = (x: number): number => x / KMH;
export const lbToKg = (x: Pounds | number): Kilograms => (x * LB) as Kilograms;
export const kgToLb = (x: Kilograms | number): Pounds => (x / LB) as Pounds;
export const lbfToN = (x: PoundsForce | number): Newtons => (x * LBF) as Newtons;
export const nToLbf = (x: Newtons | number): PoundsForce => (x / LBF) as PoundsForce;
export const hpToW = (x: Horsepower | number): Watts => (x * HP) as Watts;
export const wToHp = (x: Watts | number): Horsepower => (x / HP) as Horsepower;
export const inHgToPa = (x: number): Pascals => (x * INHG) as Pascals;
export const paToInHg = (x: number): number => x / INHG;
export const fpmToMps = (x: number): MetresPerSecond => (x * FT_PER_MIN) as MetresPerSecond;
export const mpsToFpm = (x: number): number => x / FT_PER_MIN;

export const cToK = (c: Celsius | number): Kelvin => (c + KELVIN_OFFSET) as Kelvin;
export const kToC = (k: Kelvin | number): Celsius => (k - KELVIN_OFFSET) as Celsius;
export const cToF = (c: Celsius | number): Fahrenheit => (c * 1.8 + 32) as Fahrenheit;
export const fToC = (f: Fahrenheit | number): Celsius => ((f - 32) / 1.8) as Celsius;
/** Temperature differences carry no offset: 1 °C of difference = 1.8 °F of difference. */
export const dCtoDF = (dc: number): number => dc * 1.8;
export const dFtoDC = (df: number): number => df / 1.8;

/** Display unit systems. Storage and core stay SI. */
export type UnitSystem = 'si' | 'us';

// ---------------------------------------------------------------------------------------------
// Display units: the one SI ↔ display table (pages, forms, CSV, the appendix and the JSON API all use it).
// ---------------------------------------------------------------------------------------------

/** What a number is, for choosing its display unit. */
export type QuantityKind =
  | 'length' | 'shortLength' | 'mass' | 'area' | 'force' | 'power' | 'speed' | 'temperature'
  | 'time' | 'ratio' | 'count' | 'tsfc' | 'bsfc' | 'altitude' | 'distance' | 'temperatureDelta'
  | 'energy' | 'massFlow';

/**
 * Display kinds: the quantity kinds plus slopes shown in percent. Temperature differences have no
 * offset (1 K = 1.8 °F). Route distances are SI metres on the way in (a `_km` value is multiplied by
 * 1000 first).
 */
export type DisplayKind = QuantityKind | 'slopePct';

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

const DISPLAY_UNITS: Readonly<Record<UnitSystem, Readonly<Record<DisplayKind, UnitDef>>>> = {
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
    temperature: { symbol: '°F', from: (c) => cToF(c), to: (f) => fToC(f), digits: 1 },
    time: lin('s', 1, 1),
    ratio: lin('', 1, 3),
    count: lin('', 1, 0),
    tsfc: lin('1/h', 1, 3),
    bsfc: lin('lb/(hp·h)', LB / (HP / 1000), 3),
    distance: lin('NM', NM, 0),
    slopePct: lin('%', 0.01, 2),
    temperatureDelta: { symbol: '°F', from: dCtoDF, to: dFtoDC, digits: 1 },
    // 1 ft·lbf = 0.3048 m × 4.4482216152605 N (exact definitions).
    energy: lin('million ft·lbf', 1e6 * FT * LBF, 1),
    massFlow: lin('lb/h', LB, 0),
  },
};

/** The display unit of a kind in a unit system. */
export function unitOf(kind: DisplayKind, system: UnitSystem): UnitDef {
  return DISPLAY_UNITS[system][kind];
}

/** SI value → display value. */
export const toDisplay = (si: number, kind: DisplayKind, system: UnitSystem): number => unitOf(kind, system).from(si);
/** Display value → SI value. */
export const fromDisplay = (shown: number, kind: DisplayKind, system: UnitSystem): number => unitOf(kind, system).to(shown);

/**
 * Text of a prefilled form input in the display unit: nine significant digits (not the display
 * rounding), so that saving a form unchanged gives back the stored SI value to within 1e-9 relative.
 * Blank for a missing or non-finite value.
 */
export function displayInputValue(si: number | undefined | null, kind: DisplayKind, system: UnitSystem): string {
  if (si === undefined || si === null || !Number.isFinite(si)) return '';
  return String(Number(toDisplay(si, kind, system).toPrecision(9)));
}

/** A limit of a range in the display unit, rounded to one digit more than the kind shows. */
export function displayLimit(si: number, kind: DisplayKind, system: UnitSystem): string {
  const u = unitOf(kind, system);
  return String(Number(u.from(si).toFixed(Math.min(6, u.digits + 1))));
}
