/**
 * Regulatory rules of the takeoff requirement by certification basis.
 *
 * - Screen height: 35 ft (10.668 m) for transport category (14 CFR 25.113) and commuter category
 *   (14 CFR 23.59 legacy commuter; 23.2115(c)); 50 ft (15.24 m) for normal category (23.2115(b)).
 * - Takeoff distance, dry runway (14 CFR 25.113(a)): TOD = max(D35_OEI, 1.15·D35_AEO).
 *   Takeoff run with clearway (25.113(c)): TOR = max(Dmid_OEI, 1.15·Dmid_AEO), Dmid = distance to the
 *   point midway between VLOF and the 35-ft point (domain reference §4.2). Commuter: same 115 % rule
 *   (§23.59).
 * - Accelerate-stop (14 CFR 25.109(a)): a distance equivalent to 2 s at V1 is added.
 * - Engine-out climb gradient at V2 (14 CFR 25.121(b), second segment): 2.4 % / 2.7 % / 3.0 % for
 *   2 / 3 / 4 engines (from memory). Commuter and normal-category multi-engine aircraft: a positive
 *   gradient (common practice for planning; no regulatory minimum is modelled). Single-engine aircraft:
 *   a positive all-engines gradient (common practice).
 *
 * Validity: dry-runway rules; the wet-runway 15-ft screen of 25.113(b) is not modelled.
 */
import type { GoverningCase } from './types.js';
import type { CertificationBasis } from '../aircraft.js';
import { FT } from '../units.js';

/** All-engines factor of 25.113(a)(2) and 23.59. */
export const ALL_ENGINES_FACTOR = 1.15;
/** 25.109(a): distance equivalent to this many seconds at V1. */
export const STOP_ALLOWANCE_S = 2;
export const SCREEN_TRANSPORT_M = 35 * FT;
export const SCREEN_NORMAL_M = 50 * FT;

/** Screen height for a certification basis, m. */
export function screenHeight(basis: CertificationBasis): number {
  return basis === 'normal' ? SCREEN_NORMAL_M : SCREEN_TRANSPORT_M;
}

export interface Tod25113Input {
  /** Engine-out distance to 35 ft, m. */
  readonly engineOut_m: number;
  /** All-engines distance to 35 ft, m. */
  readonly allEngines_m: number;
}

/** 25.113(a) dry takeoff distance: max(D35_OEI, 1.15·D35_AEO), m. */
export function takeoffDistance25113(i: Tod25113Input): number {
  return Math.max(i.engineOut_m, ALL_ENGINES_FACTOR * i.allEngines_m);
}

export interface Tor25113Input {
  /** Engine-out distance to the midpoint between lift-off and 35 ft, m. */
  readonly engineOutMid_m: number;
  /** All-engines distance to that midpoint, m. */
  readonly allEnginesMid_m: number;
}

/** 25.113(c) dry takeoff run with clearway: max(Dmid_OEI, 1.15·Dmid_AEO), m. */
export function takeoffRun25113(i: Tor25113Input): number {
  return Math.max(i.engineOutMid_m, ALL_ENGINES_FACTOR * i.allEnginesMid_m);
}

export interface ClimbMinimum {
  readonly minimum: number;
  readonly source: string;
}

/** Minimum climb gradient at V2 for a certification basis and engine count. */
export function climbMinimum(basis: CertificationBasis, engineCount: number): ClimbMinimum {
  if (engineCount <= 1) return { minimum: 0, source: 'positive all-engines gradient (common practice)' };
  if (basis === 'transport') {
    const m = engineCount === 2 ? 0.024 : engineCount === 3 ? 0.027 : 0.03;
    return { minimum: m, source: `14 CFR 25.121(b), ${engineCount} engines (from memory)` };
  }
  return { minimum: 0, source: 'positive engine-out gradient (common practice)' };
}

/** Plain words for each governing case, used by pages, the appendix and the what-if panel. */
export const TAKEOFF_GOVERNING_LABELS: Readonly<Record<GoverningCase, string>> = {
  'all-engines-factored': '115 % of the all-engines distance',
  'all-engines': 'all-engines distance',
  'balanced-field': 'balanced field length',
  'engine-out': 'engine-out continued takeoff',
  'accelerate-stop': 'accelerate-stop distance',
};
