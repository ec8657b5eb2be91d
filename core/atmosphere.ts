/**
 * Standard atmosphere and off-standard (hot-day) air properties.
 *
 * Source: U.S. Standard Atmosphere, 1976 (NOAA/NASA/USAF), identical to ICAO Doc 7488/3 below 32 km:
 * constants g0 = 9.80665 m/s², R* = 8.31432 J/(mol·K), M0 = 0.0289644 kg/mol, T0 = 288.15 K,
 * p0 = 101 325 Pa, lapse rate 6.5 K/km to 11 km geopotential, isothermal 216.65 K from 11 to 20 km.
 * Troposphere: T = T0 − L·H, p = p0·(T/T0)^(g0/(R·L)); isothermal layer: p = p11·exp(−g0·(H−11000)/(R·T11)).
 * Geopotential H = r0·Z/(r0 + Z) with r0 = 6 356 766 m.
 *
 * Validity: geopotential altitude −610 m to 20 000 m (the range covered by both layers used here;
 * runway work stays below 5 000 m). Off-standard days: pressure follows ISA at the pressure altitude,
 * density uses the actual temperature (common practice in performance work).
 */
import { G0, KELVIN_OFFSET } from './units.js';
import { inRange } from './validate.js';

export const R_STAR = 8.31432;
export const M0_AIR = 0.0289644;
/** Specific gas constant of dry air, J/(kg·K): R* ÷ M0 = 287.0531 (USSA 1976). */
export const R_AIR = R_STAR / M0_AIR;
export const T0 = 288.15;
export const P0 = 101325;
export const RHO0 = P0 / (R_AIR * T0);
export const LAPSE = 0.0065;
export const GAMMA_AIR = 1.4;
export const R_EARTH = 6356766;
export const H_TROPOPAUSE = 11000;
export const H_TOP = 20000;
export const H_BOTTOM = -610;
export const T11 = T0 - LAPSE * H_TROPOPAUSE; // 216.65 K
const EXP_TROPO = G0 / (R_AIR * LAPSE); // 5.255876
export const P11 = P0 * Math.pow(T11 / T0, EXP_TROPO); // ≈ 22 632 Pa

const ALT_RANGE = { min: H_BOTTOM, max: H_TOP, unit: 'm' } as const;

/** Geopotential altitude (m) from geometric altitude (m). */
export function geopotentialFromGeometric(z_m: number): number {
  inRange('geometricAltitude_m', z_m, { min: -611, max: 20100, unit: 'm' });
  return (R_EARTH * z_m) / (R_EARTH + z_m);
}

/** Geometric altitude (m) from geopotential altitude (m). */
export function geometricFromGeopotential(h_m: number): number {
  inRange('geopotentialAltitude_m', h_m, ALT_RANGE);
  return (R_EARTH * h_m) / (R_EARTH - h_m);
}

export interface IsaPoint {
  /** Geopotential altitude, m. */
  readonly altitude_m: number;
  /** Temperature, K. */
  readonly temperature_k: number;
  /** Pressure, Pa. */
  readonly pressure_pa: number;
  /** Density, kg/m³. */
  readonly density_kgm3: number;
  /** Speed of sound, m/s. */
  readonly speedOfSound_mps: number;
  /** Density ratio σ = ρ/ρ0. */
  readonly sigma: number;
  /** Pressure ratio δ = p/p0. */
  readonly delta: number;
  /** Temperature ratio θ = T/T0. */
  readonly theta: number;
}

function isaTP(h: number): { t: number; p: number } {
  if (h <= H_TROPOPAUSE) {
    const t = T0 - LAPSE * h;
    return { t, p: P0 * Math.pow(t / T0, EXP_TROPO) };
  }
  return { t: T11, p: P11 * Math.exp((-G0 * (h - H_TROPOPAUSE)) / (R_AIR * T11)) };
}

/** ISA properties at a geopotential altitude (m), −610 to 20 000 m. */
export function isa(altitude_m: number): IsaPoint {
  const h = inRange('altitude_m', altitude_m, ALT_RANGE);
  const { t, p } = isaTP(h);
  return point(h, t, p);
}

function point(h: number, t: number, p: number): IsaPoint {
  const rho = p / (R_AIR * t);
  return {
    altitude_m: h,
    temperature_k: t,
    pressure_pa: p,
    density_kgm3: rho,
    speedOfSound_mps: Math.sqrt(GAMMA_AIR * R_AIR * t),
    sigma: rho / RHO0,
    delta: p / P0,
    theta: t / T0,
  };
}

/** ISA temperature (°C) at an elevation/pressure altitude (m). */
export function standardTemperatureC(altitude_m: number): number {
  return isa(altitude_m).temperature_k - KELVIN_OFFSET;
}

/** Valid outside-air temperature range for this project's studies, °C. */
export const OAT_RANGE = { min: -60, max: 60, unit: '°C' } as const;

/**
 * Air at a pressure altitude with an actual temperature (an off-standard day):
 * pressure from ISA at the pressure altitude, density and speed of sound from the actual temperature.
 */
export function airAt(pressureAltitude_m: number, temperature_c: number): IsaPoint & {
  readonly isaDeviation_k: number;
  readonly densityAltitude_m: number;
} {
  const h = inRange('pressureAltitude_m', pressureAltitude_m, ALT_RANGE);
  const tc = inRange('temperature_c', temperature_c, OAT_RANGE);
  const std = isaTP(h);
  const t = tc + KELVIN_OFFSET;
  const pt = point(h, t, std.p);
  return { ...pt, isaDeviation_k: t - std.t, densityAltitude_m: densityAltitudeFromDensity(pt.density_kgm3) };
}

/** Pressure altitude (m) at which the ISA pressure equals `pressure_pa`. */
export function pressureAltitude(pressure_pa: number): number {
  const p = inRange('pressure_pa', pressure_pa, { min: isaTP(H_TOP).p, max: isaTP(H_BOTTOM).p, unit: 'Pa' });
  if (p >= P11) return (T0 / LAPSE) * (1 - Math.pow(p / P0, 1 / EXP_TROPO));
  return H_TROPOPAUSE - (R_AIR * T11 * Math.log(p / P11)) / G0;
}

/** Density altitude (m): the ISA altitude whose density equals `density_kgm3`. */
export function densityAltitudeFromDensity(density_kgm3: number): number {
  const rhoTop = point(H_TOP, isaTP(H_TOP).t, isaTP(H_TOP).p).density_kgm3;
  // Below −610 m the tropospheric relation is continued (very cold days at low fields).
  const rho = inRange('density_kgm3', density_kgm3, { min: rhoTop, max: 3, unit: 'kg/m³' });
  const rho11 = P11 / (R_AIR * T11);
  if (rho >= rho11) return (T0 / LAPSE) * (1 - Math.pow(rho / RHO0, 1 / (EXP_TROPO - 1)));
  return H_TROPOPAUSE - (R_AIR * T11 * Math.log(rho / rho11)) / G0;
}

/** Density altitude (m) at a pressure altitude (m) and actual temperature (°C). */
export function densityAltitude(pressureAltitude_m: number, temperature_c: number): number {
  return airAt(pressureAltitude_m, temperature_c).densityAltitude_m;
}
