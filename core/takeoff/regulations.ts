/**
 * Regulatory rules of the takeoff requirement by certification basis.
 *
 * - Screen height: 35 ft (10.668 m) for transport category (14 CFR 25.113) and commuter category
 *   (14 CFR 23.59 legacy commuter; 23.2115(c)); 50 ft (15.24 m) for normal category (23.2115(b)).
 * - Takeoff distance, dry runway (14 CFR 25.113(a)): TOD = max(D35_OEI, 1.15·D35_AEO).
 *   Takeoff run with clearway (25.113(c)): TOR = max(Dmid_OEI, 1.15·Dmid_AEO), Dmid = distance to the
 *   point midway between VLOF and the 35-ft point (14 CFR 25.113). Commuter: same 115 % rule
 *   (§23.59).
 * - Accelerate-stop (14 CFR 25.109(a)): a distance equivalent to 2 s at V1 is added.
 * - Climb minima by certification basis: second segment (climbMinimum) and first segment
 *   (firstSegmentMinimum); speed floors of 25.107 (v2StallFloor, VR_OVER_VMCA, V2_OVER_VMCA,
 *   VLOF_OVER_VMU). Sources beside each function.
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

/**
 * Minimum climb gradient of the second segment (gear up, takeoff flaps, at V2; engine out for
 * multi-engine aircraft) by certification basis and engine count:
 * transport 2.4 / 2.7 / 3.0 % for 2 / 3 / 4 engines (14 CFR 25.121(b), from memory); commuter 2.0 %
 * at 400 ft gear up, approximated at V2 in the takeoff configuration (14 CFR 23.2120(b)(3); legacy
 * 23.67(c)(2), from memory); other normal-category multi-engine aircraft a positive gradient (project
 * convention, no regulatory minimum modelled); single-engine aircraft a positive all-engines
 * gradient (common practice).
 */
export function climbMinimum(basis: CertificationBasis, engineCount: number): ClimbMinimum {
  if (engineCount <= 1) return { minimum: 0, source: 'positive all-engines gradient (common practice)' };
  if (basis === 'transport') {
    const m = engineCount === 2 ? 0.024 : engineCount === 3 ? 0.027 : 0.03;
    return { minimum: m, source: `14 CFR 25.121(b), ${engineCount} engines (from memory)` };
  }
  if (basis === 'commuter') {
    return { minimum: 0.02, source: '14 CFR 23.2120(b)(3), commuter, gear up (legacy 23.67(c)(2); from memory)' };
  }
  return { minimum: 0, source: 'positive engine-out gradient at V2 (project convention for normal-category twins)' };
}

/**
 * Minimum gradient of the first segment (gear down, takeoff flaps, at VLOF, engine out, without
 * ground effect), or undefined where none is modelled: transport positive / 0.3 % / 0.5 % for
 * 2 / 3 / 4 engines (14 CFR 25.121(a), from memory); commuter measurably positive gear down
 * (14 CFR 23.2120, from memory). A pass/fail check; the distance uses the energy-method air segment.
 */
export function firstSegmentMinimum(basis: CertificationBasis, engineCount: number): ClimbMinimum | undefined {
  if (engineCount <= 1 || basis === 'normal') return undefined;
  if (basis === 'transport') {
    const m = engineCount === 2 ? 0 : engineCount === 3 ? 0.003 : 0.005;
    return { minimum: m, source: `14 CFR 25.121(a), ${engineCount} engines, gear down at VLOF (from memory)` };
  }
  return { minimum: 0, source: '14 CFR 23.2120, commuter, measurably positive gear down (from memory)' };
}

/**
 * Least V2 as a multiple of the 1-g stall speed (14 CFR 25.107(b), from memory): 1.08 VSR for
 * aircraft with more than three engines, 1.13 VSR otherwise (the without-provisions case); undefined
 * outside transport category.
 */
export function v2StallFloor(basis: CertificationBasis, engineCount: number): number | undefined {
  if (basis !== 'transport') return undefined;
  return engineCount > 3 ? 1.08 : 1.13;
}

/** VR ≥ 1.05 VMCA (25.107(e)(1)(ii)); V2 ≥ 1.10 VMCA (25.107(b)(3), (c)); VLOF ≥ 1.10 VMU (25.107(e)(1)(iv)). */
export const VR_OVER_VMCA = 1.05;
export const V2_OVER_VMCA = 1.1;
export const VLOF_OVER_VMU = 1.1;

/** Plain words for each governing case, used by pages, the appendix and the what-if panel. */
export const TAKEOFF_GOVERNING_LABELS: Readonly<Record<GoverningCase, string>> = {
  'all-engines-factored': '115 % of the all-engines distance',
  'all-engines': 'all-engines distance × light-aircraft factor',
  'balanced-field': 'balanced field length',
  'engine-out': 'engine-out continued takeoff',
  'accelerate-stop': 'accelerate-stop distance',
};
