/**
 * Runway surfaces and their friction coefficients.
 *
 * Paved surfaces use the aircraft profile's own rolling and braking friction (dry or wet).
 * Unpaved surfaces use fixed textbook values: rolling/braking friction for hard turf 0.05/0.4,
 * firm dirt 0.04/0.3, soft turf 0.07/0.2, wet grass 0.08/0.2 (Raymer, Aircraft Design: A Conceptual
 * Approach, Table 17.1; Gudmundsson, General Aviation Aircraft Design, Table 17-3 — values from memory),
 * short and long dry grass ≈ 0.05 / ≈ 0.10 rolling (from memory).
 */
import type { AircraftProfile } from './aircraft.js';

export type Surface =
  | 'dry' | 'wet' | 'grass-short' | 'grass-long' | 'grass-wet' | 'turf-hard' | 'turf-soft' | 'dirt-firm';

export const SURFACES: readonly Surface[] = [
  'dry', 'wet', 'grass-short', 'grass-long', 'grass-wet', 'turf-hard', 'turf-soft', 'dirt-firm',
];

export const SURFACE_LABELS: Readonly<Record<Surface, string>> = {
  dry: 'Paved, dry',
  wet: 'Paved, wet',
  'grass-short': 'Short dry grass',
  'grass-long': 'Long dry grass',
  'grass-wet': 'Wet grass',
  'turf-hard': 'Hard turf',
  'turf-soft': 'Soft turf',
  'dirt-firm': 'Firm dirt',
};

const UNPAVED: Readonly<Record<Exclude<Surface, 'dry' | 'wet'>, { rolling: number; braking: number }>> = {
  'grass-short': { rolling: 0.05, braking: 0.3 },
  'grass-long': { rolling: 0.1, braking: 0.3 },
  'grass-wet': { rolling: 0.08, braking: 0.2 },
  'turf-hard': { rolling: 0.05, braking: 0.4 },
  'turf-soft': { rolling: 0.07, braking: 0.2 },
  'dirt-firm': { rolling: 0.04, braking: 0.3 },
};

/** Whether a surface counts as wet for the operating rules (wet landing factor, wet braking). */
export const isWet = (s: Surface): boolean => s === 'wet' || s === 'grass-wet';
export const isPaved = (s: Surface): boolean => s === 'dry' || s === 'wet';

/** Rolling (brakes off) and braking friction for an aircraft on a surface. */
export function friction(a: AircraftProfile, s: Surface): { rolling: number; braking: number } {
  if (s === 'dry') return { rolling: a.rollingFriction, braking: a.brakingFrictionDry };
  if (s === 'wet') return { rolling: Math.max(a.rollingFriction, 0.05), braking: a.brakingFrictionWet };
  const u = UNPAVED[s];
  return { rolling: Math.max(a.rollingFriction, u.rolling), braking: Math.min(a.brakingFrictionDry, u.braking) };
}
