/**
 * Statistical takeoff cross-checks (indicative only; Torenbeek (1982) §5.4 and 14 CFR 25.109/25.113, §6.4).
 *
 * Torenbeek, *Synthesis of Subsonic Airplane Design* (1982), ch. 5, eq. 5-91, balanced field length:
 *   BFL = 0.863/(1 + 2.3·Δγ2) · ((W/S)/(ρ·g·C_L2) + h_TO) · (1/(T̄/W − μ') + 2.7) + 655 ft/√σ
 *   Δγ2 = γ2 − γ2,min (γ2,min 0.024/0.027/0.030 for 2/3/4 engines, from memory), C_L2 = 0.694·C_Lmax
 *   (V2 = 1.2·VS), μ' = 0.01·C_Lmax + 0.02, h_TO = 35 ft, mean thrust T̄ = 0.75·T_static·(5 + λ)/(4 + λ)
 *   for turbofans; propellers T̄ = 5.75·P·(σ·N_e·D_p²/P)^(1/3) (lb, hp, ft; from memory).
 * Roskam, *Airplane Design* Part I: TOP25 = (W/S)/(σ·C_Lmax·T/W) [lb/ft²], field length
 *   S_TOFL = 37.5·TOP25 ft; TOP23 = (W/S)·(W/P)/(σ·C_Lmax) [lb²/(ft²·hp)], ground run
 *   S_TOG = 4.9·TOP23 + 0.009·TOP23² ft, to 50 ft S_TO = 1.66·S_TOG.
 *
 * Validity: conventional aircraft inside the statistics the relations were fitted to; outputs are
 * labelled indicative and never govern.
 */
import { FT, HP, LBF } from '../units.js';

/** Torenbeek's last term, 655 ft in metres. */
export const TORENBEEK_CONSTANT_M = 655 * FT;
/** Torenbeek's screen height h_TO, m (35 ft). */
export const TORENBEEK_SCREEN_M = 35 * FT;
/** Torenbeek's γ2,min by engine count (from memory). */
export function torenbeekGammaMin(engineCount: number): number {
  return engineCount <= 2 ? 0.024 : engineCount === 3 ? 0.027 : 0.03;
}

export interface TorenbeekInput {
  /** Wing loading W/S, N/m². */
  readonly wingLoading_Nm2: number;
  readonly density_kgm3: number;
  readonly sigma: number;
  readonly clMaxTakeoff: number;
  /** Mean all-engines thrust over the run T̄, N. */
  readonly meanThrust_N: number;
  readonly weight_N: number;
  /** γ2 − γ2,min. */
  readonly deltaGamma2: number;
}

/** Torenbeek's BFL, m; undefined when T̄/W ≤ μ' (outside the method). */
export function torenbeekBfl(i: TorenbeekInput): number | undefined {
  const cl2 = 0.694 * i.clMaxTakeoff;
  const muP = 0.01 * i.clMaxTakeoff + 0.02;
  const excess = i.meanThrust_N / i.weight_N - muP;
  if (!(excess > 0)) return undefined;
  const g = 9.80665;
  return (0.863 / (1 + 2.3 * i.deltaGamma2))
    * (i.wingLoading_Nm2 / (i.density_kgm3 * g * cl2) + TORENBEEK_SCREEN_M)
    * (1 / excess + 2.7)
    + TORENBEEK_CONSTANT_M / Math.sqrt(i.sigma);
}

/** Torenbeek's mean takeoff thrust of turbofans, N: 0.75·T_static·(5 + λ)/(4 + λ). */
export function torenbeekMeanThrustTurbofan(i: { readonly staticThrust_N: number; readonly bypassRatio: number }): number {
  return (0.75 * i.staticThrust_N * (5 + i.bypassRatio)) / (4 + i.bypassRatio);
}

/** Torenbeek's mean takeoff thrust of propellers, N: 5.75·P·(σ·N·D²/P)^(1/3) in lb, hp, ft (from memory). */
export function torenbeekMeanThrustPropeller(i: {
  /** Total shaft power, W. */ readonly power_W: number;
  readonly sigma: number;
  readonly engineCount: number;
  readonly diameter_m: number;
}): number {
  const php = i.power_W / HP;
  const dft = i.diameter_m / FT;
  return 5.75 * php * Math.cbrt((i.sigma * i.engineCount * dft * dft) / php) * LBF;
}

/** N/m² → lb/ft². */
const PSF = (FT * FT) / LBF;

export interface Top25Input {
  readonly wingLoading_Nm2: number;
  readonly sigma: number;
  readonly clMaxTakeoff: number;
  /** Thrust-to-weight ratio. */
  readonly thrustToWeight: number;
}

/** Roskam TOP25 (lb/ft²) and field length S_TOFL = 37.5·TOP25 (ft and m). */
export function roskamTop25(i: Top25Input): { top25: number; fieldLength_ft: number; fieldLength_m: number } {
  const top25 = (i.wingLoading_Nm2 * PSF) / (i.sigma * i.clMaxTakeoff * i.thrustToWeight);
  const ft = 37.5 * top25;
  return { top25, fieldLength_ft: ft, fieldLength_m: ft * FT };
}

export interface Top23Input {
  /** Wing loading, lb/ft². */
  readonly wingLoading_lbft2: number;
  /** Power loading, lb/hp. */
  readonly powerLoading_lbhp: number;
  readonly sigma: number;
  readonly clMaxTakeoff: number;
}

/** Roskam TOP23 (lb²/(ft²·hp)), ground run and distance to 50 ft (ft and m). */
export function roskamTop23(i: Top23Input): {
  top23: number; groundRun_ft: number; toObstacle_ft: number; toObstacle_m: number;
} {
  const top23 = (i.wingLoading_lbft2 * i.powerLoading_lbhp) / (i.sigma * i.clMaxTakeoff);
  const groundRun = 4.9 * top23 + 0.009 * top23 * top23;
  const toObstacle = 1.66 * groundRun;
  return { top23, groundRun_ft: groundRun, toObstacle_ft: toObstacle, toObstacle_m: toObstacle * FT };
}

/** Wing loading N/m² → lb/ft². */
export const nm2ToPsf = (x: number): number => x * PSF;
