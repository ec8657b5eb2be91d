/**
 * Study input and result types (SI). A study is a site, a catalogue of aircraft, fleet scenarios and
 * options; the result gives, per scenario, each row's requirement, the critical aircraft and the
 * recommended runway length. See docs/study-format.md for the file form of the input.
 */
import type { AircraftProfile } from '../aircraft.js';
import type { Surface } from '../surface.js';
import type { ProfilePoint } from '../runway.js';
import type { PlausibilityFinding } from '../plausibility.js';
import type { OperatingRuleSet } from '../operatingRules.js';
import type { RunwayDirectionInput } from '../runway.js';
import type { ExistingRunwayCheck } from '../runwayCheck.js';
import type { Notice } from '../notices.js';

export type { RunwayDirectionInput } from '../runway.js';
export type { ExistingRunwayCheck } from '../runwayCheck.js';

export interface MonthlyClimate {
  /** Calendar month 1–12. */
  readonly month: number;
  /** Mean daily maximum temperature, °C. */
  readonly meanMax_c: number;
  /** Mean daily minimum temperature, °C. */
  readonly meanMin_c?: number;
  /** Mean temperature, °C (defaults to (max + min)/2). */
  readonly mean_c?: number;
}

export interface SiteClimate {
  /** Where the numbers come from (station, product, period). */
  readonly source: string;
  /** Number of years behind the monthly values, when known. */
  readonly years?: number;
  readonly monthly: readonly MonthlyClimate[];
}

export type Pavement = 'paved' | 'grass';

export interface RunwayInput {
  readonly name: string;
  readonly pavement: Pavement;
  /** Centreline profile, chainage from the threshold of the first direction listed. */
  readonly profile: readonly ProfilePoint[];
  readonly directions: readonly RunwayDirectionInput[];
}

export interface SiteInput {
  readonly name: string;
  /** Aerodrome elevation (highest point of the landing area), m. */
  readonly elevation_m: number;
  /** Design temperature, °C; when absent it is derived from `climate`. */
  readonly designTemperature_c?: number;
  readonly climate?: SiteClimate;
  readonly runways: readonly RunwayInput[];
}

export interface FleetRowInput {
  /** Aircraft id in the study's catalogue. */
  readonly aircraft: string;
  /** Annual operations (takeoffs and landings each count one). */
  readonly annualOperations: number;
  /** Longest regular route (design stage length), km. */
  readonly stageLength_km: number;
  /** Payload on that route, kg. */
  readonly payload_kg: number;
}

export interface ScenarioInput {
  readonly name: string;
  readonly fleet: readonly FleetRowInput[];
}

export type StudyMethod = 'physics' | 'reference-icao' | 'reference-authority' | 'calibrated' | 'planning';
export type ReservePolicyName = 'cruise-45min' | 'international' | 'custom';

export interface StudyReserves {
  readonly policy: ReservePolicyName;
  /** Alternate distance, km (international and custom policies). */
  readonly alternate_km?: number;
  /** Holding time, minutes (custom policy). */
  readonly holding_min?: number;
  /** Contingency as a fraction of trip fuel (custom policy; otherwise the aircraft's own). */
  readonly contingencyFraction?: number;
}

export interface StudyOptions {
  /** Annual operations at or above which a row is in regular use (default 500). */
  readonly regularUseThreshold: number;
  /** Planning increment the recommended length is rounded up to, m (default 50 m; 100 ft in US units). */
  readonly roundingIncrement_m: number;
  /** Runway surface for the design case. */
  readonly surface: Surface;
  readonly method: StudyMethod;
  readonly units: 'si' | 'us';
  readonly reserves: StudyReserves;
  /** Mass per passenger with baggage, for stating payload penalties as passengers, kg. */
  readonly passengerMass_kg: number;
  /** Landing temperature: ISA at the field (certified data basis, default) or the design temperature. */
  readonly landingTemperature: 'isa' | 'design';
  /** Landing mass: maximum landing mass (default, conservative) or the arrival mass of the design route. */
  readonly landingMass: 'mlw' | 'route';
  /** Operating rule set for the landing factors (default 'us-121'; core/operatingRules.ts). */
  readonly operatingRules?: OperatingRuleSet;
  /**
   * Recorded override, reference methods only: when given, a corrected reference length beyond the
   * 35 % limit of the percentage corrections governs anyway, and the reason is printed beside every
   * row it affects. Absent (default): such a length is indicative only and the physics model governs.
   */
  readonly referenceOverrideReason?: string;
}


export interface StudyInput {
  readonly name: string;
  readonly site: SiteInput;
  readonly aircraft: readonly AircraftProfile[];
  readonly scenarios: readonly ScenarioInput[];
  readonly options: StudyOptions;
}

// ---------------------------------------------------------------------------------------------
// Results
// ---------------------------------------------------------------------------------------------

export interface TraceItem {
  readonly label: string;
  readonly value: number;
  readonly unit: string;
}

export interface ClimateSummary {
  readonly source: string;
  readonly years?: number;
  /** Hottest month by mean temperature (Annex 14 criterion), 1–12. */
  readonly hottestMonth: number;
  /** Mean daily maximum of that month: the aerodrome reference temperature, °C. */
  readonly art_c: number;
  /** Month with the highest mean daily maximum, 1–12. */
  readonly maxMeanMaxMonth: number;
  readonly maxMeanMax_c: number;
  /** True when the two criteria pick different months. */
  readonly monthsDiffer: boolean;
  /** Older formula Ta + (Tm − Ta)/3 on the hottest month, °C. */
  readonly olderFormula_c?: number;
}

export interface RunwayDirectionSummary extends RunwayDirectionInput {
  readonly stopway_m: number;
  readonly clearway_m: number;
  /** Average slope in this takeoff direction (+ uphill), ratio. */
  readonly slope: number;
}

export interface RunwaySummary {
  readonly name: string;
  readonly pavement: Pavement;
  readonly length_m: number;
  /** Effective gradient (high − low) / length, ratio. */
  readonly effectiveGradient: number;
  readonly elevationDifference_m: number;
  readonly highPoint_m: number;
  readonly lowPoint_m: number;
  readonly directions: readonly RunwayDirectionSummary[];
  readonly warnings: readonly Notice[];
}

export interface SiteConditions {
  readonly name: string;
  readonly elevation_m: number;
  /** Pressure altitude used for design (= elevation), m. */
  readonly pressureAltitude_m: number;
  readonly designTemperature_c: number;
  readonly designTemperatureSource: 'given' | 'climate';
  readonly climate?: ClimateSummary;
  /** ISA temperature at the elevation, °C. */
  readonly standardTemperature_c: number;
  readonly isaDeviation_c: number;
  readonly density_kgm3: number;
  readonly densityAltitude_m: number;
  readonly runways: readonly RunwaySummary[];
  /** Runway whose effective gradient the design case uses (the first listed). */
  readonly designRunway: string;
  /** Uphill slope applied to the design takeoff case (the design runway's effective gradient), ratio. */
  readonly designSlope: number;
  readonly warnings: readonly Notice[];
}

export interface AircraftClassificationSummary {
  readonly aerodromeCode: string;
  readonly approachCategory: string;
  readonly designGroup: string;
  readonly runwayDesignCode: string;
  /**
   * Aeroplane reference field length used for the code number, m: the profile's planning figure when
   * it gives one, else the physics model's; absent when neither exists (the model finds no takeoff).
   */
  readonly arfl_m?: number;
  /** Which one `arfl_m` is. */
  readonly arflSource: 'planning figure' | 'physics model';
  /** VREF at MLW, sea level, ISA, m/s. */
  readonly vref_mps: number;
}

export interface TakeoffSummary {
  readonly method: StudyMethod;
  /** Which source gave the takeoff requirement, in words (planning chart, calibrated model, model, reference length …). */
  readonly source: string;
  readonly required_m: number;
  readonly governing: string;
  /** Named components for the results table and the appendix (SI). */
  readonly components: readonly TraceItem[];
  readonly v1_mps?: number;
  readonly vr_mps?: number;
  readonly v2_mps?: number;
  readonly climbGradient?: number;
  readonly climbMinimum?: number;
  readonly climbLimited: boolean;
  readonly climbMaxMass_kg?: number;
  /** The physics model's requirement, when it was computed beside another method, m. */
  readonly physics_m?: number;
  /** Every method's takeoff requirement at the design conditions and mass, with a reason where one is missing or far off. */
  readonly spread?: readonly MethodFigure[];
  /** Reference length + corrections, when the aircraft carries reference data, m. */
  /** Temperature below the design temperature at which a climb-limited requirement peaks (the row is sized there), °C. */
  readonly peakTemperature_c?: number;
  readonly reference_m?: number;
  /** Calibration factor applied (calibrated method; the fitted thrust scale under planning data first). */
  readonly calibrationFactor?: number;
  /** The planning chart's length at the design condition, m (planning data first, inside the chart). */
  readonly chart_m?: number;
  /** Indicative empirical cross-checks, m. */
  readonly torenbeek_m?: number;
  readonly roskam_m?: number;
}

/** One method's takeoff requirement at design conditions (the methods table of a row). */
export interface MethodFigure {
  readonly method: 'chart' | 'calibrated-model' | 'model' | 'reference-icao' | 'reference-authority' | 'torenbeek' | 'roskam';
  readonly label: string;
  /** m; absent when the method gives no figure here (the note says why). */
  readonly length_m?: number;
  /** Why the figure is missing, or why it differs by more than 10 % from the row's requirement. */
  readonly note?: Notice;
  /** This method gave the row's number. */
  readonly governs: boolean;
}

export interface LandingSummary {
  readonly mass_kg: number;
  readonly distance_m: number;
  readonly required_m: number;
  readonly rule: string;
  /** Where the rule's factor comes from (rule set, regulation; "from memory" where so). */
  readonly ruleSource?: string;
  readonly factor: number;
  readonly vref_mps: number;
  readonly components: readonly TraceItem[];
  /** Roskam landing field length 0.3 · V_A² (ft, kt), transports only: indicative, never governs, m. */
  readonly roskam_m?: number;
}

export interface RouteSummary {
  readonly status: string;
  readonly reason?: Notice;
  readonly stageLength_km: number;
  readonly payload_kg: number;
  /** Payload that must stay behind to fly the stage within the limits, kg. */
  readonly payloadLeftBehind_kg: number;
  readonly takeoffMass_kg: number;
  readonly arrivalMass_kg: number;
  readonly tripFuel_kg: number;
  readonly reserveFuel_kg: number;
}

export interface RowResult {
  readonly aircraft: string;
  readonly aircraftName: string;
  readonly group: string;
  readonly annualOperations: number;
  /** Operations of the aircraft's group in this scenario (what regular use is judged on). */
  readonly groupOperations: number;
  readonly regularUse: boolean;
  readonly status: 'ok' | 'cannot-operate';
  /** Why the aircraft cannot operate here (status 'cannot-operate'). */
  readonly reason?: Notice;
  readonly takeoffMass_kg: number;
  /**
   * Mass the aircraft must leave behind at design conditions to meet the climb minimum (the route's
   * design mass minus the climb-limited mass the takeoff is sized at), kg; absent when not climb-limited.
   */
  readonly climbOffload_kg?: number;
  /**
   * Requirements, m; null when the row cannot operate (status 'cannot-operate', `reason` says why):
   * a row that cannot operate has no requirement, and never a 0 that reads like one.
   */
  readonly requiredTakeoff_m: number | null;
  readonly requiredLanding_m: number | null;
  readonly required_m: number | null;
  readonly governing: 'takeoff' | 'landing';
  /**
   * Present when a requirement (or a physics distance behind it) is beyond the plausibility bound
   * (core/plausibility.ts): the row is 'cannot-operate' with this finding's reason.
   */
  readonly plausibility?: PlausibilityFinding;
  readonly route: RouteSummary;
  readonly takeoff?: TakeoffSummary;
  readonly landing?: LandingSummary;
  readonly classification: AircraftClassificationSummary;
  readonly existing: readonly ExistingRunwayCheck[];
  readonly warnings: readonly Notice[];
}

export interface OperationsServedPoint {
  readonly length_m: number;
  /** Share of the scenario's annual operations whose requirement fits, 0–1. */
  readonly share: number;
}

export interface ScenarioResult {
  readonly name: string;
  readonly rows: readonly RowResult[];
  /** Id of the critical aircraft, or null when no regular-use aircraft can operate. */
  readonly criticalAircraft: string | null;
  readonly criticalAircraftName: string | null;
  /** Requirement of the critical aircraft before rounding, m. */
  readonly criticalRequired_m: number | null;
  /** Rounded up to the planning increment, m. */
  readonly recommendedLength_m: number | null;
  readonly governing: 'takeoff' | 'landing' | null;
  readonly runwayDesignCode: string | null;
  readonly totalOperations: number;
  readonly operationsServed: readonly OperationsServedPoint[];
  readonly excluded: readonly { readonly aircraft: string; readonly reason: Notice }[];
  readonly warnings: readonly Notice[];
}

export interface SensitivityCurve {
  readonly aircraft: string;
  readonly aircraftName: string;
  /** Mass swept (the greatest design takeoff mass of the aircraft across scenarios, before any climb cap), kg; climb-limited points carry their own. */
  readonly mass_kg: number;
  /** Plausibility bound of the aircraft, m (core/plausibility.ts); points beyond it have no length. */
  readonly plausibilityBound_m: number;
  readonly temperature: readonly SensitivityPoint<'temperature_c'>[];
  readonly elevation: readonly SensitivityPoint<'elevation_m'>[];
}

/**
 * One point of a sensitivity sweep. `required_m` is null where the aircraft cannot operate:
 * `impractical` marks a point whose requirement is beyond the plausibility bound (not a length),
 * otherwise the takeoff or the landing is not possible there.
 */
export type SensitivityPoint<K extends 'temperature_c' | 'elevation_m'> = { readonly [P in K]: number } & {
  readonly required_m: number | null;
  readonly impractical?: true;
  /** The curve's mass misses a climb minimum here: the point is computed at `mass_kg`, the climb-limited mass (or has no length when none down to OEW meets it). */
  readonly climbLimited?: true;
  /** Mass of this point when the climb cap lowered it, kg. */
  readonly mass_kg?: number;
};

export interface StudyResult {
  readonly methodVersion: string;
  readonly name: string;
  readonly cautions: readonly string[];
  readonly options: StudyOptions;
  readonly site: SiteConditions;
  readonly scenarios: readonly ScenarioResult[];
  readonly comparison: readonly {
    readonly scenario: string;
    readonly criticalAircraft: string | null;
    readonly criticalAircraftName: string | null;
    readonly recommendedLength_m: number | null;
    readonly governing: 'takeoff' | 'landing' | null;
    readonly runwayDesignCode: string | null;
    readonly regularUseAircraft: number;
  }[];
  readonly sensitivity: readonly SensitivityCurve[];
  /** Payload-range of each critical aircraft with cruise data, computed with the study (views never run the route model). */
  readonly payloadRange: readonly PayloadRangeSeries[];
  readonly warnings: readonly Notice[];
}

/** A payload-range diagram of one aircraft as the charts draw it (SI: stage length m, payload kg). */
export interface PayloadRangeSeries {
  readonly aircraft: string;
  readonly aircraftName: string;
  /** At MTOW: the corner points of the diagram. */
  readonly points: readonly { readonly stageLength_m: number; readonly payload_kg: number }[];
  /** At the greatest takeoff mass an existing runway direction allows, when below MTOW. */
  readonly runwayLimited?: { readonly takeoffMass_kg: number; readonly points: readonly { readonly stageLength_m: number; readonly payload_kg: number }[] };
  /** The longest design stage of the aircraft's rows, m. */
  readonly designStage_m?: number;
}
