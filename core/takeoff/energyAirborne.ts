/**
 * Engine-out air segment from lift-off to the screen height by the energy method.
 *
 * Energy height E = h + V²/(2g). In a climb at small angles the horizontal distance flown per unit of
 * energy height is W/(T − D) (specific excess power over speed: dE/dx = (T − D)/W; Anderson,
 * *Aircraft Performance and Design*, §5.11; Raymer, *Aircraft Design*, §17.8.3), so
 *   x_air = ∫₀^H (1 + (1/2g)·d(V²)/dh) / ((T − D)/W) dh.
 * The speed rises from VLOF at lift-off to V2 at the screen height (14 CFR 25.111(c)(2): V2 by 35 ft),
 * with V² linear in height. At each height:
 *   D = ½ρV²·S·(C_D0(t) + φ(h)·K·C_L²),  C_L = W/(½ρV²S)  (1 g),
 *   φ(h) = (16·(h_w + h)/b)² / (1 + (16·(h_w + h)/b)²)  (ground effect fading with height; h_w the
 *   wing height on the ground, b the span; Anderson Ex. 6.6 / McCormick's form),
 *   C_D0(t): gear-down takeoff C_D0 until the gear is selected up (GEAR_SELECT_DELAY_S after lift-off,
 *   common practice: "positive rate, gear up"), then linear to the gear-up C_D0 over the retraction
 *   time; fixed gear keeps the gear-down value.
 * Time follows dt = dx/V. The ODE in h for (x, t) is integrated by the classical fourth-order
 * Runge–Kutta method with `steps` equal height steps; the bench compares it with a fine-step
 * reference (airborne_error_pct). The ground distance is x·(1 − V_w/V̄) with V̄ the mean airspeed
 * (V_w + headwind).
 *
 * Guards (turn a runaway into a reasoned result): the excess-thrust ratio (T − D)/W must stay above
 * zero at every height (otherwise V2 cannot be reached by the screen height), and the air distance
 * may not exceed MAX_ENGINE_OUT_AIR_M (project convention: about three times the longest engine-out
 * air distance of the modelled classes, ~500 m, from memory).
 *
 * Validity: small climb angles (sin γ ≈ tan γ), V² linear in height, thrust a function of airspeed
 * only, no pitch dynamics. Screen heights 10.7–15.2 m.
 */
import { G0 } from '../units.js';

/** Delay from lift-off to gear selection (common practice: gear up on a positive rate of climb), s. */
export const GEAR_SELECT_DELAY_S = 3;
/** Largest engine-out air distance accepted, m (project convention). */
export const MAX_ENGINE_OUT_AIR_M = 1500;
/** Height steps of the production integration. */
export const AIR_STEPS = 12;

export interface EnergyAirInput {
  readonly weight_N: number;
  readonly density_kgm3: number;
  readonly wingArea_m2: number;
  /** Induced-drag factor K out of ground effect. */
  readonly k: number;
  readonly wingHeight_m: number;
  readonly wingspan_m: number;
  /** Takeoff C_D0 with the gear down (incl. engine-out increment). */
  readonly cd0GearDown: number;
  /** Takeoff C_D0 with the gear up (incl. engine-out increment). */
  readonly cd0GearUp: number;
  /** Gear retraction time, s; undefined for fixed gear. */
  readonly retractionTime_s: number | undefined;
  /** Thrust of the operating engines at an airspeed, N. */
  readonly thrust: (airspeed_mps: number) => number;
  /** True airspeeds, m/s. */
  readonly vlof_mps: number;
  readonly v2_mps: number;
  readonly screen_m: number;
  /** + headwind, m/s. */
  readonly headwind_mps: number;
  /** Height steps (default AIR_STEPS). */
  readonly steps?: number;
  /** Air-distance guard, m (default MAX_ENGINE_OUT_AIR_M). */
  readonly maxAir_m?: number;
}

export type EnergyAirResult =
  | {
    readonly ok: true;
    /** Horizontal ground distance from lift-off to the screen height, m. */
    readonly distance_m: number;
    /** Same in the air-mass frame, m. */
    readonly airDistance_m: number;
    readonly time_s: number;
    /** Least excess-thrust ratio (T − D)/W met on the way. */
    readonly minExcess: number;
    /** Mean flight-path gradient H / x_air. */
    readonly meanGradient: number;
    /** Fraction of the gear travel done at the screen height (0 … 1; 0 for fixed gear). */
    readonly gearUpFraction: number;
  }
  | {
    readonly ok: false;
    readonly cause: 'no-excess-thrust' | 'air-distance-guard';
    /** Height where it failed, m. */
    readonly height_m: number;
    /** Excess-thrust ratio there (or the least one met, for the guard). */
    readonly excess: number;
    /** Air distance flown when it stopped, m. */
    readonly airDistance_m: number;
  };

/** Energy-method air segment to the screen height (see the module comment). */
export function energyAirborne(i: EnergyAirInput): EnergyAirResult {
  const h = i.screen_m;
  const n = i.steps ?? AIR_STEPS;
  const guard = i.maxAir_m ?? MAX_ENGINE_OUT_AIR_M;
  const v0sq = i.vlof_mps * i.vlof_mps;
  const dv2dh = (i.v2_mps * i.v2_mps - v0sq) / h;
  const energyPerHeight = 1 + dv2dh / (2 * G0);
  const halfRhoS = 0.5 * i.density_kgm3 * i.wingArea_m2;
  const w = i.weight_N;
  const b16 = 16 / i.wingspan_m;
  const tSel = GEAR_SELECT_DELAY_S;
  const tRet = i.retractionTime_s;
  const dCd0 = i.cd0GearUp - i.cd0GearDown;
  let minExcess = Infinity;
  let failAt = -1;

  const gearFraction = (t: number): number => {
    if (tRet === undefined || t <= tSel) return 0;
    if (tRet <= 0) return 1;
    const f = (t - tSel) / tRet;
    return f >= 1 ? 1 : f;
  };
  // Derivatives of (x, t) with height.
  const deriv = (hh: number, t: number, out: Float64Array): boolean => {
    const vsq = v0sq + dv2dh * hh;
    const v = Math.sqrt(vsq);
    const q = halfRhoS * vsq;
    const cl = w / q;
    const r = b16 * (i.wingHeight_m + hh);
    const phi = (r * r) / (1 + r * r);
    const cd0 = i.cd0GearDown + dCd0 * gearFraction(t);
    const excess = (i.thrust(v) - q * (cd0 + phi * i.k * cl * cl)) / w;
    if (excess < minExcess) minExcess = excess;
    if (!(excess > 0)) { failAt = hh; return false; }
    const dx = energyPerHeight / excess;
    out[0] = dx;
    out[1] = dx / v;
    return true;
  };

  const k1 = new Float64Array(2);
  const k2 = new Float64Array(2);
  const k3 = new Float64Array(2);
  const k4 = new Float64Array(2);
  const dh = h / n;
  let x = 0;
  let t = 0;
  for (let s = 0; s < n; s++) {
    const h0 = s * dh;
    const ok = deriv(h0, t, k1)
      && deriv(h0 + dh / 2, t + (dh / 2) * k1[1]!, k2)
      && deriv(h0 + dh / 2, t + (dh / 2) * k2[1]!, k3)
      && deriv(h0 + dh, t + dh * k3[1]!, k4);
    if (!ok) return { ok: false, cause: 'no-excess-thrust', height_m: failAt, excess: minExcess, airDistance_m: x };
    x += (dh / 6) * (k1[0]! + 2 * k2[0]! + 2 * k3[0]! + k4[0]!);
    t += (dh / 6) * (k1[1]! + 2 * k2[1]! + 2 * k3[1]! + k4[1]!);
    if (x > guard) return { ok: false, cause: 'air-distance-guard', height_m: h0 + dh, excess: minExcess, airDistance_m: x };
  }
  const vMean = x / t;
  const ground = x * (1 - i.headwind_mps / vMean);
  return {
    ok: true, distance_m: ground, airDistance_m: x, time_s: t, minExcess, meanGradient: h / x,
    gearUpFraction: gearFraction(t),
  };
}
