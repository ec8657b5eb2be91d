/**
 * Rotation and airborne distance from lift-off to the screen height.
 *
 * Rotation (rotation-time model; Anderson, *Aircraft Performance and Design*, Ex. 6.6, N = 3 s for
 * transports, ≈1 s small aircraft; Raymer §17.8; Anderson §6.7): the speed rises from VR to VLOF during the
 * profile's rotation time t_R, covering t_R·(V_R + V_LOF)/2 of ground (groundspeeds). When the equation
 * of motion needs longer than t_R to gain VLOF − VR, its own distance ∫V dV/a is used instead: the
 * longer of the two.
 *
 * Transition and climb (Raymer, *Aircraft Design: A Conceptual Approach*, §17.8.3):
 * the aircraft flies a circular arc at the mean speed V_TR = (V_LOF + V2)/2 (Raymer's 1.15·VS
 * for 1.1 and 1.2) with load factor n = 1.2, radius R = V_TR²/(g·(n − 1)); climb angle
 * sin γ = (T − D)/W at V_TR with the 1-g lift coefficient C_L = C_Lmax/(V_TR/VS)², drag out of ground
 * effect, takeoff configuration (gear down); h_TR = R·(1 − cos γ). If h_TR ≥ h_screen:
 * s = √(R² − (R − h)²); otherwise s = R·sin γ + (h − h_TR)/tan γ. The air distance is flown in
 * t = s/V_TR, so the ground distance is s·(1 − V_w/V_TR) with V_w the headwind.
 *
 * Validity: sin γ > 0 (otherwise the result reports that the aircraft cannot climb); screen heights
 * 10.7–15.2 m; headwind below V_TR.
 */
import { G0 } from '../units.js';

/** Load factor in the transition arc (Raymer). */
export const TRANSITION_LOAD_FACTOR = 1.2;

export interface RotationInput {
  /** Groundspeeds at VR and VLOF, m/s. */
  readonly vrG_mps: number;
  readonly vlofG_mps: number;
  readonly rotationTime_s: number;
  /** Equation-of-motion distance from VR to VLOF, m. */
  readonly physics_m: number;
}

/** Rotation distance, m: the longer of the rotation-time distance and the equation-of-motion distance. */
export function rotationDistance(i: RotationInput): number {
  const kinematic = (i.rotationTime_s * (i.vrG_mps + i.vlofG_mps)) / 2;
  return Math.max(kinematic, i.physics_m);
}

export interface AirborneInput {
  readonly weight_N: number;
  /** Total thrust of the operating engines at V_TR, N. */
  readonly thrust_N: number;
  readonly density_kgm3: number;
  readonly wingArea_m2: number;
  /** Zero-lift drag in the transition (takeoff configuration plus any engine-out increment). */
  readonly cd0: number;
  /** Induced-drag factor K. */
  readonly k: number;
  readonly clMax: number;
  /** True airspeeds, m/s. */
  readonly vs1_mps: number;
  readonly vlof_mps: number;
  readonly v2_mps: number;
  readonly screen_m: number;
  /** + headwind, m/s. */
  readonly headwind_mps: number;
}

export type AirborneResult =
  | {
    readonly ok: true;
    /** Horizontal ground distance from lift-off to the screen height, m. */
    readonly distance_m: number;
    /** Same in the air-mass frame, m. */
    readonly airDistance_m: number;
    readonly radius_m: number;
    /** sin γ of the climb. */
    readonly gradient: number;
    /** Height gained at the end of the arc, m. */
    readonly transitionHeight_m: number;
    readonly speed_mps: number;
  }
  | { readonly ok: false; readonly gradient: number };

/** Raymer transition arc and climb to the screen height. */
export function airborneDistance(i: AirborneInput): AirborneResult {
  const v = 0.5 * (i.vlof_mps + i.v2_mps);
  const kv = v / i.vs1_mps;
  const cl = i.clMax / (kv * kv);
  const q = 0.5 * i.density_kgm3 * v * v;
  const drag = q * i.wingArea_m2 * (i.cd0 + i.k * cl * cl);
  const sinG = (i.thrust_N - drag) / i.weight_N;
  if (!(sinG > 0)) return { ok: false, gradient: Number.isFinite(sinG) ? sinG : 0 };
  const s = Math.min(sinG, 0.5);
  const gamma = Math.asin(s);
  const r = (v * v) / (G0 * (TRANSITION_LOAD_FACTOR - 1));
  const hTr = r * (1 - Math.cos(gamma));
  const h = i.screen_m;
  const air = hTr >= h
    ? Math.sqrt(r * r - (r - h) * (r - h))
    : r * s + (h - hTr) / Math.tan(gamma);
  const ground = air * (1 - i.headwind_mps / v);
  return { ok: true, distance_m: ground, airDistance_m: air, radius_m: r, gradient: sinG, transitionHeight_m: hTr, speed_mps: v };
}
