/**
 * Input and result types of the takeoff performance engine (core/takeoff/index.ts).
 *
 * All quantities SI: m, kg, m/s, N; slopes and gradients as ratios. Speeds are true airspeeds
 * unless the field says otherwise; `speeds.easFactor` (√σ) converts them to equivalent airspeed,
 * which equals calibrated airspeed at takeoff speeds to well under 1 %.
 */
import type { AircraftProfile, CertificationBasis } from '../aircraft.js';
import type { Notice } from '../notices.js';
import type { Surface } from '../surface.js';

export interface TakeoffInput {
  readonly aircraft: AircraftProfile;
  /** Takeoff mass, kg (OEW … MTOW). */
  readonly mass_kg: number;
  /** Pressure altitude of the runway, m (−400 … 4 500). */
  readonly pressureAltitude_m: number;
  /** Outside air temperature, °C. */
  readonly temperature_c: number;
  /** Runway slope, ratio (+ uphill in the takeoff direction), |slope| ≤ 0.03. */
  readonly slope: number;
  /** Wind along the runway, m/s (+ headwind, − tailwind), −15 … +25 and below half the stall speed. */
  readonly headwind_mps: number;
  readonly surface: Surface;
  /** Multiplier on engine thrust (calibration), default 1 (0.3 … 2). */
  readonly thrustScale?: number;
  /** Multiplier on the takeoff maximum lift coefficient, default 1 (0.7 … 1.3). */
  readonly clMaxScale?: number;
}

/** Which requirement sets the takeoff length. */
export type GoverningCase =
  /** 115 % of the all-engines distance to the screen (25.113(a)(2), 23.59 commuter). */
  | 'all-engines-factored'
  /** Balanced field: continued takeoff and accelerate-stop are equal at the balanced V1. */
  | 'balanced-field'
  /** Continued takeoff after an engine failure at VEF, to the screen height (V1 limited). */
  | 'engine-out'
  /** Accelerate-stop distance (25.109). */
  | 'accelerate-stop'
  /** All-engines distance to 50 ft × light-aircraft factor (normal category). */
  | 'all-engines';

/** What fixed V1: the balance of go and stop, or one of its limits. */
export type V1Basis = 'balanced' | 'vmcg' | 'vr' | 'vmbe';

export type InfeasibleReason =
  | 'cannot-reach-liftoff'
  | 'cannot-climb'
  | 'cannot-continue-engine-out'
  | 'cannot-climb-engine-out'
  | 'cannot-stop'
  | 'v1-window-empty'
  /** The brakes cannot absorb a rejected takeoff from the least V1 (maxBrakeEnergy_J). */
  | 'brake-energy-limit'
  /** Lift-off groundspeed above the tyre speed rating (tyreSpeedLimit_mps). */
  | 'tyre-speed-limit';

export interface TakeoffTraceEntry {
  readonly label: string;
  readonly value: number;
  readonly unit: string;
}

export interface TakeoffSpeeds {
  /** Stall speed, takeoff configuration (1 g, CLmax takeoff), true airspeed, m/s. */
  readonly vs1_mps: number;
  readonly vr_mps: number;
  readonly vlof_mps: number;
  /** Speed at the screen height (V2), m/s. */
  readonly v2_mps: number;
  /** Decision speed (multi-engine), m/s. */
  readonly v1_mps?: number;
  /** Engine-failure speed matching V1 (V1 minus the speed gained during recognition), m/s. */
  readonly vef_mps?: number;
  /** Minimum control speed on the ground as a true airspeed, m/s. */
  readonly vmcg_mps?: number;
  /** Minimum control speed in the air as a true airspeed, m/s, and its source. */
  readonly vmca_mps?: number;
  readonly vmcaSource?: string;
  /** Rules of 14 CFR 25.107 that raised the scheduled VR, VLOF or V2. */
  readonly raised: readonly Notice[];
  /** What fixed V1 ('none' for single-engine aircraft). */
  readonly v1Basis: V1Basis | 'none';
  /** √σ: true airspeed × easFactor = equivalent airspeed. */
  readonly easFactor: number;
}

export interface AllEnginesResult {
  /** Brake release to VR, m (integrated equation of motion). */
  readonly groundRun_m: number;
  /** VR to VLOF (rotation-time model), m. */
  readonly rotation_m: number;
  /** Brake release to lift-off, m. */
  readonly liftoff_m: number;
  /** Lift-off to the screen height (transition arc and climb), horizontal, m. */
  readonly airborne_m: number;
  /** Brake release to the screen height, m. */
  readonly toScreen_m: number;
  /** Brake release to the point midway between lift-off and the screen height, m. */
  readonly midpoint_m: number;
  /** 1.15 × toScreen (transport, commuter) or toScreen × light-aircraft factor (normal), m. */
  readonly factored_m: number;
  /** Equation-of-motion distance from rest to VLOF without the rotation model, m. */
  readonly groundRunToVlof_m: number;
  /** Closed-form average-force estimate of that distance (forces at 0.7 VLOF), m. */
  readonly averageForce_m: number;
  /** (averageForce − groundRunToVlof) / groundRunToVlof × 100. */
  readonly averageForceDiff_pct: number;
  /** Climb angle of the transition (sine of the flight-path angle). */
  readonly transitionGradient: number;
}

export interface EngineOutResult {
  /** Continued takeoff: brake release to the screen height with the engine failed at VEF, m. */
  readonly continued_m: number;
  /** Engine-out lift-off distance, m. */
  readonly liftoff_m: number;
  /** Engine-out distance to the midpoint between lift-off and the screen height, m. */
  readonly midpoint_m: number;
  /** Engine-out ground run from brake release to VR, m. */
  readonly groundRun_m: number;
  /** Accelerate-stop distance: the greater of the engine-out and all-engines cases, m. */
  readonly accelerateStop_m: number;
  /** Engine fails at VEF, first action at V1, braking with idle on the operating engines, + 2 s at V1, m. */
  readonly accelerateStopEngineOut_m: number;
  /** All engines to V1, then stop with all engines idle, + 2 s at V1, m. */
  readonly accelerateStopAllEngines_m: number;
  /**
   * The greater of continued and accelerate-stop at the chosen V1, m: the balanced field length when
   * `v1Limited` is 'balanced', otherwise the unbalanced field length at the limiting V1.
   */
  readonly balancedField_m: number;
  readonly v1Limited: V1Basis;
  /** Allowed V1 range (true airspeed), m/s: from the VMCG-based minimum to VR. */
  readonly v1Min_mps: number;
  readonly v1Max_mps: number;
  /** Engine-out air segment (energy method): lift-off to the screen height, horizontal, m. */
  readonly airborne_m: number;
  /** Least excess-thrust ratio (T − D)/W on the engine-out air segment. */
  readonly airborneMinExcess: number;
  /** Highest groundspeed of the rejected takeoff (brake application), m/s, and the energy at it, J. */
  readonly brakeSpeed_mps: number;
  readonly brakeEnergy_J: number;
  /** Activation time from V1 to the full stopping configuration, s. */
  readonly activation_s: number;
}

/** Pieces for declared distances (14 CFR 25.113; 14 CFR 25.113). */
export interface DeclaredPieces {
  /** Takeoff run with clearway, m. */
  readonly takeoffRun_m: number;
  /** Takeoff distance, m. */
  readonly takeoffDistance_m: number;
  /** Accelerate-stop distance, m (multi-engine). */
  readonly accelerateStop_m?: number;
}

export interface ClimbSegmentCheck {
  /** Steady gradient (sine of the flight-path angle). */
  readonly gradient: number;
  readonly minimum: number;
  /** Where the minimum comes from. */
  readonly minimumSource: string;
  readonly limited: boolean;
}

export interface ClimbResult {
  /** Engine-out (multi-engine) or all-engines (single) climb at V2. */
  readonly case: 'engine-out' | 'all-engines';
  /** Second-segment steady climb gradient at V2, gear up (sine of the flight-path angle). */
  readonly gradient: number;
  /** Required minimum of that gradient. */
  readonly minimum: number;
  /** Where the minimum comes from. */
  readonly minimumSource: string;
  /** Zero-lift drag of the second segment and its source. */
  readonly cd0GearUp: number;
  readonly cd0GearUpSource: 'profile' | 'derived' | 'gear down (fixed gear)';
  /** First segment (14 CFR 25.121(a): gear down at VLOF, engine out), where a minimum applies. */
  readonly firstSegment?: ClimbSegmentCheck;
  /** True when any applicable minimum is missed: a weight limit that runway length cannot cure. */
  readonly limited: boolean;
  /** Which segment limits (when limited); 'first' only when the second segment passes. */
  readonly limitingSegment?: 'first' | 'second';
  /** Plain words of the limiting check, e.g. "second-segment engine-out climb at V2 (gear up)". */
  readonly limitingLabel?: string;
  /** Greatest mass meeting every minimum (when limited and some mass ≥ OEW meets them), kg. */
  readonly maxMass_kg?: number;
}

/** Statistical cross-checks: indicative only. */
export interface EmpiricalResult {
  /** Torenbeek's balanced field length (multi-engine), m. */
  readonly torenbeek_m?: number;
  /** Roskam's takeoff field length (TOP25) or distance to 50 ft (TOP23), m. */
  readonly roskam_m?: number;
  readonly roskamMethod?: 'TOP25' | 'TOP23';
  /** The takeoff parameter itself (lb/ft² for TOP25, lb²/(ft²·hp) for TOP23). */
  readonly roskamParameter?: number;
  readonly label: 'indicative';
}

interface TakeoffCommon {
  /** Version stamp of this method (changes when numbers can change). */
  readonly methodVersion: string;
  readonly certification: CertificationBasis;
  /** Screen height used, m (35 ft transport/commuter, 50 ft normal). */
  readonly screenHeight_m: number;
  readonly speeds: TakeoffSpeeds;
  readonly warnings: readonly Notice[];
  readonly trace: readonly TakeoffTraceEntry[];
}

export interface TakeoffFeasible extends TakeoffCommon {
  readonly feasible: true;
  /** Takeoff length requirement, m. */
  readonly required_m: number;
  readonly governing: GoverningCase;
  readonly allEngines: AllEnginesResult;
  /** Engine-failure analysis (multi-engine aircraft only). */
  readonly engineOut?: EngineOutResult;
  readonly declared: DeclaredPieces;
  readonly climb: ClimbResult;
  readonly empirical: EmpiricalResult;
}

export interface TakeoffInfeasible extends TakeoffCommon {
  readonly feasible: false;
  readonly reason: InfeasibleReason;
  /** Plain-words explanation (a notice: rendered in the reader's units). */
  readonly message: Notice;
  /** Climb check at V2. */
  readonly climb: ClimbResult;
  /** All-engines figures, when the all-engines takeoff itself is possible. */
  readonly allEngines?: AllEnginesResult;
}

export type TakeoffResult = TakeoffFeasible | TakeoffInfeasible;
