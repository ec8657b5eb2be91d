/**
 * Climb checks after takeoff and the climb-limited mass.
 *
 * Steady climb (Anderson, *Aircraft Performance and Design*, §5.3): sin γ = (T − D)/W with
 * D = ½ρV²·S·(C_D0 + K·C_L²), C_L = C_Lmax·(VS1/V)² (1 g), out of ground effect.
 * - Second segment (climbAtV2): at V2, takeoff flaps, gear up (drag.ts), critical engine inoperative
 *   (thrust of the others, engine-out ΔC_D0) for multi-engine aircraft (14 CFR 25.121(b); commuter
 *   23.2120(b)(3)); single-engine aircraft all engines with the gear down unless the profile gives a
 *   gear-up C_D0 (fixed gear is common on light singles).
 * - First segment (firstSegmentAt): at VLOF, gear down, engine out, without ground effect
 *   (14 CFR 25.121(a); commuter 23.2120), a pass/fail check; the distance to the screen height is the
 *   energy-method air segment (energyAirborne.ts).
 * Minima by certification basis: regulations.ts.
 *
 * The climb-limited mass is the greatest mass ≥ OEW meeting every applicable minimum, the root of
 * min(γ₂ − γ₂,min, γ₁ − γ₁,min) over mass by Brent's method (both gradients fall with mass). Runway
 * length cannot cure a climb limit.
 *
 * Validity: V2 below M 0.4; gradients as sines (equal to tangents within 0.1 % below 5 %).
 */
import { brentRoot } from '../numeric/index.js';
import { withMass, type TakeoffSetup } from './model.js';
import { climbMinimum, firstSegmentMinimum } from './regulations.js';

export { GEAR_DRAG_K, GEAR_UP_CD0_FLOOR, gearDragIncrement, gearUpCd0, type GearDragInput } from './drag.js';

/** Tolerance (kg) and iteration cap of the climb-limited mass solve. */
export const CLIMB_MASS_TOL_KG = 0.01;
export const CLIMB_MASS_MAX_ITERATIONS = 100;

export interface ClimbPoint {
  readonly gradient: number;
  /** Zero-lift drag used. */
  readonly cd0: number;
  /** Whether the derived gear-up floor bound. */
  readonly floorBound: boolean;
  /** Thrust of the operating engines, N. */
  readonly thrust_N: number;
}

function steadyGradient(s: TakeoffSetup, v: number, cd0: number, operating: number): ClimbPoint & { floorBound: false } {
  const kv = v / s.vs1;
  const cl = s.clMax / (kv * kv);
  const q = 0.5 * s.air.density_kgm3 * v * v;
  const drag = q * s.wingArea_m2 * (cd0 + s.k * cl * cl);
  const thrust = operating * s.engine.thrust(v);
  return { gradient: (thrust - drag) / s.weight_N, cd0, floorBound: false, thrust_N: thrust };
}

/** Second-segment climb gradient at V2 (engine-out and gear up when multi-engine). */
export function climbAtV2(s: TakeoffSetup): ClimbPoint {
  const a = s.aircraft;
  const multi = s.engineCount > 1;
  const gearUp = multi || a.cd0TakeoffGearUp !== undefined;
  const cd0 = (gearUp ? s.cd0GearUp : a.cd0Takeoff) + (multi ? a.engineOutDrag : 0);
  const p = steadyGradient(s, s.v2, cd0, multi ? s.engineCount - 1 : s.engineCount);
  return { ...p, floorBound: gearUp && s.cd0GearUpSource === 'derived' && s.cd0GearUpFloor };
}

/** First-segment gradient at VLOF, gear down, engine out (multi-engine only). */
export function firstSegmentAt(s: TakeoffSetup): ClimbPoint {
  const a = s.aircraft;
  return steadyGradient(s, s.vlof, a.cd0Takeoff + a.engineOutDrag, s.engineCount - 1);
}

export interface ClimbChecks {
  readonly second: ClimbPoint;
  readonly secondMinimum: number;
  readonly secondSource: string;
  readonly first?: ClimbPoint;
  readonly firstMinimum?: number;
  readonly firstSource?: string;
  /** Least margin over the applicable minima (negative: climb-limited). */
  readonly margin: number;
}

/** Every applicable climb check of a set-up. */
export function climbChecks(s: TakeoffSetup): ClimbChecks {
  const second = climbAtV2(s);
  const m2 = climbMinimum(s.aircraft.certification, s.engineCount);
  const m1 = firstSegmentMinimum(s.aircraft.certification, s.engineCount);
  let margin = second.gradient - m2.minimum;
  if (m1 === undefined) return { second, secondMinimum: m2.minimum, secondSource: m2.source, margin };
  const first = firstSegmentAt(s);
  margin = Math.min(margin, first.gradient - m1.minimum);
  return {
    second, secondMinimum: m2.minimum, secondSource: m2.source,
    first, firstMinimum: m1.minimum, firstSource: m1.source, margin,
  };
}

/** Least climb margin at a mass. */
export function climbMargin(s: TakeoffSetup, mass_kg: number): number {
  return climbChecks(withMass(s, mass_kg)).margin;
}

/**
 * Greatest mass in [OEW, s.mass_kg] meeting every climb minimum; undefined when even OEW fails.
 * Call only when the margin at s.mass_kg is negative.
 */
export function climbLimitedMass(s: TakeoffSetup): number | undefined {
  const lo = s.aircraft.oew_kg;
  const f = (m: number): number => climbMargin(s, m);
  const fLo = f(lo);
  if (fLo < 0) return undefined;
  const fHi = f(s.mass_kg);
  if (fHi >= 0) return s.mass_kg;
  return brentRoot({
    name: 'climb-limited mass', f, lo, hi: s.mass_kg, fLo, fHi,
    xTol: CLIMB_MASS_TOL_KG, maxIterations: CLIMB_MASS_MAX_ITERATIONS,
  }).x;
}
