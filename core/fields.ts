/**
 * One range per input field of a study: the study-file and API schemas (the features' schema.ts files), the forms
 * (the features' form.ts files) and core's own checks all read these constants, so a value the edge accepts is never
 * refused by the engine, and both say the same thing when it is out of range. Aircraft profile fields
 * have their ranges in `AIRCRAFT_FIELDS` and `CRUISE_FIELDS` (core/aircraft.ts).
 *
 * Ranges are physical plausibility bounds (common practice, chosen for this project) within the
 * validity of the methods that read the field (docs/methods.md):
 * - temperatures: a design temperature of −30 to 55 °C covers every inhabited climate (the highest
 *   monthly mean maximum on record is under 50 °C, from memory); monthly mean maxima, minima and means
 *   stop at the same 55 °C so that a climate-derived design temperature stays in the range a given
 *   one has (and in the −40..55 °C validity of the length corrections, core/corrections.ts);
 * - runway slope: the average slope of a takeoff direction, ±3 % — the range of the takeoff and
 *   landing models' slope term; steeper runways exist only as special-purpose altiports. Slopes
 *   beyond the ICAO Annex 14 §3.1 limits (1 to 2 %) are accepted with a warning (core/runway.ts);
 * - reserves: an alternate up to 2,000 km (remote aerodromes whose nearest alternate is far away) and
 *   up to 240 minutes of reserve time (the 14 CFR 121.643(c) three hours fit with margin).
 * Every range is inclusive at both ends and in the unit the field is written in.
 */
import type { DomainRange } from './errors.js';

/** A closed range with both limits (all field ranges have both). */
export interface FieldRange extends DomainRange {
  readonly min: number;
  readonly max: number;
}

const range = (min: number, max: number, unit: string): FieldRange => ({ min, max, unit });

/** Identifier rule (aircraft ids): letters, digits, dot, dash or underscore; 1 to 64 characters, starting with a letter or digit. */
export const IDENTIFIER_PATTERN = /^[a-z0-9][a-z0-9._-]{0,63}$/i;
export const IDENTIFIER_RULE = 'letters, digits, dot, dash or underscore; 1 to 64 characters, starting with a letter or digit';

// Site ------------------------------------------------------------------------------------------
/** Aerodrome elevation (= design pressure altitude), m. */
export const SITE_ELEVATION_RANGE = range(-400, 4500, 'm');
/** Design temperature, given or derived from monthly climate data, °C. */
export const DESIGN_TEMPERATURE_RANGE = range(-30, 55, '°C');
/** Monthly mean daily maximum temperature, °C. */
export const MONTHLY_MEAN_MAX_RANGE = range(-60, 55, '°C');
/** Monthly mean daily minimum temperature, °C. */
export const MONTHLY_MEAN_MIN_RANGE = range(-80, 50, '°C');
/** Monthly mean temperature, °C. */
export const MONTHLY_MEAN_RANGE = range(-70, 55, '°C');
/** Years of record behind monthly climate normals. */
export const CLIMATE_YEARS_RANGE = range(1, 200, 'years');

// Runways ---------------------------------------------------------------------------------------
/** Chainage of a runway centreline profile point in a study, m. */
export const RUNWAY_CHAINAGE_RANGE = range(0, 6000, 'm');
/** Elevation of a runway centreline profile point in a study, m. */
export const RUNWAY_POINT_ELEVATION_RANGE = range(-400, 4500, 'm');
/** Average slope of a takeoff direction (ratio, + uphill): the slope the performance models read. */
export const RUNWAY_SLOPE_RANGE = range(-0.03, 0.03, '');
/** Effective gradient (high minus low point over the length): the range of the length corrections. */
export const RUNWAY_EFFECTIVE_GRADIENT_RANGE = range(0, 0.05, '');
/** A declared distance (TORA, TODA, ASDA, LDA) of a study runway, m. */
export const DECLARED_LENGTH_RANGE = range(200, 6000, 'm');

// Fleet rows ------------------------------------------------------------------------------------
export const ANNUAL_OPERATIONS_RANGE = range(0, 1_000_000, 'operations/year');
export const STAGE_LENGTH_RANGE_KM = range(1, 20_000, 'km');
/** Payload of a fleet row, kg (the aircraft's own maximum payload also applies). */
export const FLEET_PAYLOAD_RANGE = range(0, 150_000, 'kg');

// Options ---------------------------------------------------------------------------------------
export const REGULAR_USE_THRESHOLD_RANGE = range(1, 100_000, 'operations/year');
export const ROUNDING_INCREMENT_RANGE = range(1, 500, 'm');
export const PASSENGER_MASS_RANGE = range(50, 200, 'kg');
/** Distance to the alternate aerodrome, km. */
export const ALTERNATE_DISTANCE_RANGE_KM = range(0, 2000, 'km');
/** Reserve (holding or cruise) time after the alternate leg, min. */
export const RESERVE_TIME_RANGE_MIN = range(0, 240, 'min');
/** Contingency fuel as a fraction of trip fuel. */
export const CONTINGENCY_FRACTION_RANGE = range(0, 0.2, '');

// Reference lengths of an aircraft profile -------------------------------------------------------
/** Published reference takeoff or landing length (sea level, ISA, MTOW / MLW), m. */
export const REFERENCE_LENGTH_RANGE = range(100, 5000, 'm');
/** A length in a reference table, m. */
export const REFERENCE_TABLE_LENGTH_RANGE = range(100, 6000, 'm');
export const REFERENCE_TABLE_MASS_RANGE = range(300, 600_000, 'kg');
export const REFERENCE_TABLE_ELEVATION_RANGE = range(-400, 4500, 'm');
export const REFERENCE_TABLE_TEMPERATURE_RANGE = range(-40, 55, '°C');
