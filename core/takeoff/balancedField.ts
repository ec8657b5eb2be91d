/**
 * Engine failure on the takeoff run: continued takeoff, accelerate-stop and the balanced V1.
 *
 * For a decision speed V1 (groundspeed inside; Torenbeek (1982) §5.4 and 14 CFR 25.109/25.113, 14 CFR 25.107, 25.109):
 *   VEF: the engine-failure speed from which the engine-out acceleration reaches V1 in the
 *        recognition time (t_OEI(V1) − t_OEI(VEF) = t_rec);
 *   go:   s_AEO(VEF) + [s_OEI(VR) − s_OEI(VEF)] + engine-out rotation + engine-out airborne distance;
 *   activation: from V1 the stopping means (brakes, throttles, spoilers) take t_act to be in place
 *        (the profile's demonstrated time, default 1 s; AC 25-7, from memory); meanwhile the aircraft
 *        keeps the acceleration a it had at V1 (thrust not yet at idle, no braking), covering
 *        V1·t_act + ½·a·t_act² and reaching V_b = V1 + a·t_act, the highest speed of the stop;
 *   stop (25.109(a)(1)): s_AEO(VEF) + [s_OEI(V1) − s_OEI(VEF)] + activation (engine-out acceleration) +
 *        braking from V_b with idle thrust on the operating engines (failed engine zero) + 2 s × V1;
 *   stop (25.109(a)(2)): s_AEO(V1) + activation (all-engines acceleration) + braking from V_b with all
 *        engines idle + 2 s × V1;
 *   accelerate-stop = the greater of the two stops.
 * Each s(·) is the cumulative distance of a ground run as a function of speed (quadrature.ts), shared
 * by every candidate V1. go(V1) falls and stop(V1) rises, so the balanced V1 (go = stop) is the root of
 * a smooth monotone function, found by Brent's method. V1 is bounded below by the speed reached when
 * the engine fails at VMCG (VEF ≥ VMCG, 25.107(a)) and above by VR (25.107(e)) and, when the profile
 * gives a brake energy limit, by the V1 whose stop begins at the speed where ½·m·V_b² equals it (all
 * the kinetic energy to the brakes: conservative; VMBE). When a bound binds, the field length is the
 * greater of go and stop there (unbalanced).
 *
 * Validity: engine-out acceleration above MIN_ACCELERATION_MPS2 from VEF to VLOF; stop tables to VR.
 */
import { brentRoot } from '../numeric/index.js';
import { distanceAt, speedAtTime, timeAt, type SpeedTable } from './quadrature.js';
import { STOP_ALLOWANCE_S } from './regulations.js';
import type { V1Basis } from './types.js';

/** Tolerance (m/s) and iteration cap of the balanced-V1 solve. */
export const V1_TOL_MPS = 1e-7;
export const V1_MAX_ITERATIONS = 100;

export interface FailureModel {
  readonly aeo: SpeedTable;
  readonly oei: SpeedTable;
  readonly stopOei: SpeedTable;
  readonly stopAeo: SpeedTable;
  readonly recognition_s: number;
  /** Groundspeed at VR, m/s. */
  readonly vrG: number;
  /** Lowest engine-failure groundspeed (VMCG), m/s. */
  readonly vefMinG: number;
  /** Engine-out rotation plus airborne distance (independent of V1), m. */
  readonly goTail_m: number;
  /** Activation time from V1 to the full stopping configuration, s. */
  readonly activation_s: number;
  /** Accelerations at a groundspeed, engine out and all engines, m/s². */
  readonly accelOei: (vg: number) => number;
  readonly accelAeo: (vg: number) => number;
  /** Highest brake-application groundspeed the brakes absorb (from the energy limit), m/s. */
  readonly brakeSpeedLimit?: number;
}

export interface FailurePoint {
  readonly vefG: number;
  readonly v1G: number;
  readonly go_m: number;
  /** Engine-out ground run from brake release to VR, m. */
  readonly goGround_m: number;
  readonly stopEngineOut_m: number;
  readonly stopAllEngines_m: number;
  readonly stop_m: number;
  /** Highest groundspeed of the stop (brake application after the activation time), m/s. */
  readonly brakeSpeed: number;
}

/** Brake-application speed after the activation time from V1 at acceleration a. */
function activation(v1G: number, a: number, t: number): { readonly v: number; readonly d: number } {
  const acc = a > 0 ? a : 0;
  return { v: v1G + acc * t, d: v1G * t + 0.5 * acc * t * t };
}

/** Engine-failure groundspeed matching a V1 groundspeed. */
export function vefForV1(m: FailureModel, v1G: number): number {
  const t = timeAt(m.oei, v1G) - m.recognition_s;
  if (t <= 0) return 0;
  return speedAtTime(m.oei, t) ?? v1G;
}

/** Go and stop distances for a V1 groundspeed (0 < V1 ≤ VR). */
export function failurePoint(m: FailureModel, v1G: number): FailurePoint {
  const vef = vefForV1(m, v1G);
  const sEf = distanceAt(m.aeo, vef);
  const sOefBase = distanceAt(m.oei, vef);
  const goGround = sEf + distanceAt(m.oei, m.vrG) - sOefBase;
  const go = goGround + m.goTail_m;
  const allowance = STOP_ALLOWANCE_S * v1G;
  const actOei = activation(v1G, m.accelOei(v1G), m.activation_s);
  const actAeo = activation(v1G, m.accelAeo(v1G), m.activation_s);
  const stopOei = sEf + distanceAt(m.oei, v1G) - sOefBase + actOei.d + distanceAt(m.stopOei, actOei.v) + allowance;
  const stopAeo = distanceAt(m.aeo, v1G) + actAeo.d + distanceAt(m.stopAeo, actAeo.v) + allowance;
  return {
    vefG: vef, v1G, go_m: go, goGround_m: goGround,
    stopEngineOut_m: stopOei, stopAllEngines_m: stopAeo, stop_m: Math.max(stopOei, stopAeo),
    brakeSpeed: Math.max(actOei.v, actAeo.v),
  };
}

export type V1Window =
  | { readonly ok: true; readonly lo: number; readonly hi: number; readonly hiBasis: 'vr' | 'vmbe' }
  | { readonly ok: false; readonly cause: 'vr'; readonly v1Min: number | undefined }
  | { readonly ok: false; readonly cause: 'vmbe'; readonly v1Min: number; readonly vmbe: number };

/** Least V1 groundspeed: the speed reached a recognition time after an engine failure at VMCG. */
export function v1Minimum(oei: SpeedTable, vefMinG: number, recognition_s: number): number | undefined {
  return speedAtTime(oei, timeAt(oei, vefMinG) + recognition_s);
}

/**
 * V1 groundspeed whose stop begins at the brake speed limit (all-engines acceleration during the
 * activation time; fixed-point iteration, the acceleration varies slowly with speed).
 */
export function v1ForBrakeSpeed(m: FailureModel, vLimit: number): number {
  let v1 = vLimit;
  for (let i = 0; i < 30; i++) {
    const a = Math.max(m.accelAeo(v1), m.accelOei(v1), 0);
    const next = vLimit - a * m.activation_s;
    if (Math.abs(next - v1) < 1e-9) return next;
    v1 = next;
  }
  return v1;
}

/** Allowed V1 groundspeeds: [V1 reached after failure at VMCG, min(VR, VMBE)]. */
export function v1Window(m: FailureModel): V1Window {
  const v1Min = v1Minimum(m.oei, m.vefMinG, m.recognition_s);
  if (v1Min === undefined || v1Min > m.vrG) return { ok: false, cause: 'vr', v1Min };
  let hi = m.vrG;
  let hiBasis: 'vr' | 'vmbe' = 'vr';
  if (m.brakeSpeedLimit !== undefined) {
    const vmbe = v1ForBrakeSpeed(m, m.brakeSpeedLimit);
    if (vmbe < v1Min) return { ok: false, cause: 'vmbe', v1Min, vmbe };
    if (vmbe < hi) { hi = vmbe; hiBasis = 'vmbe'; }
  }
  return { ok: true, lo: v1Min, hi, hiBasis };
}

export interface Balanced {
  readonly point: FailurePoint;
  readonly basis: V1Basis;
  /** max(go, stop) at the chosen V1, m. */
  readonly field_m: number;
  readonly iterations: number;
}

/** Balanced V1 inside [lo, hi], or the limiting bound (hiBasis names what fixed hi). */
export function balance(m: FailureModel, lo: number, hi: number, hiBasis: 'vr' | 'vmbe' = 'vr'): Balanced {
  const pLo = failurePoint(m, lo);
  const fLo = pLo.go_m - pLo.stop_m;
  if (fLo <= 0) return { point: pLo, basis: 'vmcg', field_m: Math.max(pLo.go_m, pLo.stop_m), iterations: 0 };
  const pHi = failurePoint(m, hi);
  const fHi = pHi.go_m - pHi.stop_m;
  if (fHi >= 0) return { point: pHi, basis: hiBasis, field_m: Math.max(pHi.go_m, pHi.stop_m), iterations: 0 };
  const r = brentRoot({
    name: 'balanced V1', f: (v) => { const p = failurePoint(m, v); return p.go_m - p.stop_m; },
    lo, hi, fLo, fHi, xTol: V1_TOL_MPS, maxIterations: V1_MAX_ITERATIONS,
  });
  const p = failurePoint(m, r.x);
  return { point: p, basis: 'balanced', field_m: Math.max(p.go_m, p.stop_m), iterations: r.iterations };
}
