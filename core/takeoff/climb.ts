/**
 * Climb gradient at V2 and the climb-limited mass.
 *
 * Steady climb (Anderson, *Aircraft Performance and Design*, §5.3): sin γ = (T − D)/W with
 * D = ½ρV2²·S·(C_D0 + K·C_L²), C_L = C_Lmax/(V2/VS1)² (1 g), out of ground effect.
 * Multi-engine aircraft: critical engine inoperative (thrust of the others, engine-out ΔC_D0), gear up,
 * takeoff flaps (14 CFR 25.121(b) configuration). Gear-up drag: C_D0,takeoff less the landing-gear
 * increment ΔC_D0 = (W/S)·K_uc·m^(−0.215), K_uc = 4.5·10⁻⁵ (W/S in N/m², m in kg; Anderson §6.7,
 * domain reference §7.2), never below 40 % of the takeoff C_D0 (this project's guard against an increment larger than the
 * profile's drag allows; a warning says when that floor binds).
 * Single-engine aircraft: all engines, gear down (fixed gear is common on light singles).
 *
 * The climb-limited mass is the greatest mass ≥ OEW whose gradient meets the minimum, found by
 * Brent's method (gradient falls with mass). Runway length cannot cure a climb limit.
 *
 * Validity: V2 below M 0.4; gradients as sines (equal to tangents within 0.1 % below 5 %).
 */
import { G0 } from '../units.js';
import { brentRoot } from './roots.js';
import { withMass, type TakeoffSetup } from './model.js';

/** Anderson's landing-gear drag constant, moderate flap deflection. */
export const GEAR_DRAG_K = 4.5e-5;
/** Gear-up C_D0 is never taken below this fraction of the takeoff C_D0. */
export const GEAR_UP_CD0_FLOOR = 0.4;
/** Tolerance (kg) and iteration cap of the climb-limited mass solve. */
export const CLIMB_MASS_TOL_KG = 0.01;
export const CLIMB_MASS_MAX_ITERATIONS = 100;

export interface GearDragInput {
  readonly mass_kg: number;
  readonly wingArea_m2: number;
}

/** Landing-gear zero-lift drag increment (Anderson §6.7). */
export function gearDragIncrement(i: GearDragInput): number {
  const ws = (i.mass_kg * G0) / i.wingArea_m2;
  return ws * GEAR_DRAG_K * Math.pow(i.mass_kg, -0.215);
}

export interface ClimbPoint {
  readonly gradient: number;
  /** Zero-lift drag used. */
  readonly cd0: number;
  /** Whether the gear-up floor bound. */
  readonly floorBound: boolean;
  /** Thrust of the operating engines at V2, N. */
  readonly thrust_N: number;
}

/** Climb gradient at V2 for a set-up (engine-out when multi-engine). */
export function climbAtV2(s: TakeoffSetup): ClimbPoint {
  const a = s.aircraft;
  const multi = s.engineCount > 1;
  let cd0 = a.cd0Takeoff;
  let floorBound = false;
  if (multi) {
    const raw = a.cd0Takeoff - gearDragIncrement({ mass_kg: s.mass_kg, wingArea_m2: a.wingArea_m2 });
    const floor = GEAR_UP_CD0_FLOOR * a.cd0Takeoff;
    floorBound = raw < floor;
    cd0 = (floorBound ? floor : raw) + a.engineOutDrag;
  }
  const operating = multi ? s.engineCount - 1 : s.engineCount;
  const kv = s.v2 / s.vs1;
  const cl = s.clMax / (kv * kv);
  const q = 0.5 * s.air.density_kgm3 * s.v2 * s.v2;
  const drag = q * s.wingArea_m2 * (cd0 + s.k * cl * cl);
  const thrust = operating * s.engine.thrust(s.v2);
  return { gradient: (thrust - drag) / s.weight_N, cd0, floorBound, thrust_N: thrust };
}

/**
 * Greatest mass in [OEW, s.mass_kg] whose V2 gradient meets `minimum`; undefined when even OEW fails.
 * Call only when the gradient at s.mass_kg is below the minimum.
 */
export function climbLimitedMass(s: TakeoffSetup, minimum: number): number | undefined {
  const lo = s.aircraft.oew_kg;
  const f = (m: number): number => climbAtV2(withMass(s, m)).gradient - minimum;
  const fLo = f(lo);
  if (fLo < 0) return undefined;
  const fHi = f(s.mass_kg);
  if (fHi >= 0) return s.mass_kg;
  return brentRoot({
    name: 'climb-limited mass', f, lo, hi: s.mass_kg, fLo, fHi,
    xTol: CLIMB_MASS_TOL_KG, maxIterations: CLIMB_MASS_MAX_ITERATIONS,
  }).x;
}
