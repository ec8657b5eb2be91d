/**
 * Study input and result types (SI). A study is a site, a catalogue of aircraft, fleet scenarios and
 * options; the result gives, per scenario, each row's requirement, the critical aircraft and the
 * recommended runway length. See docs/study-format.md for the file form of the input.
 */
import type { AircraftProfile } from '../aircraft.js';
import type { Surface } from '../surface.js';
import type { ProfilePoint } from '../runway.js';

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

export interface RunwayDirectionInput {
  /** Runway designator of this takeoff/landing direction, e.g. "12". */
  readonly designator: string;
  readonly tora_m: number;
  readonly toda_m: number;
  readonly asda_m: number;
  readonly lda_m: number;
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

export type StudyMethod = 'physics' | 'reference-icao' | 'reference-authority' | 'calibrated';
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
}

export interface StudyInput {
  readonly name: string;
  readonly site: SiteInput;
  readonly aircraft: readonly AircraftProfile[];
  readonly scenarios: readonly ScenarioInput[];
  readonly options: StudyOptions;
}
