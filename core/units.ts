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
